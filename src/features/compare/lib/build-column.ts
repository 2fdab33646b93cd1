import { captureCheck, type CaptureHood } from '../../../../shared/physics/capture-verdict';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { ControlTier } from '../../../../shared/schemas/workspace';
import type { CompareColumn, HoodFigures, RunFigures } from './types';

export interface ScenarioLike {
  id: number;
  name: string;
  workstationName: string;
  siteName: string;
  controlTier: string;
  controlDescription: string;
  input: { hoods?: HoodFigures[]; source?: object };
}

export interface RunLike {
  id: number;
  createdAt: string;
  outOfDate: boolean;
  input: { hoods?: HoodFigures[]; source?: object };
}

// Stored inputs are parsed scenarios, so a source and hoods that are there are whole.
function capture(input: { hoods?: HoodFigures[]; source?: object }): Pick<CompareColumn, 'capture' | 'captureVelocity'> {
  if (!input.source || !input.hoods?.length) return { capture: null, captureVelocity: null };
  const check = captureCheck(input as unknown as { source: Scenario['source']; hoods: CaptureHood[] });
  return { capture: check?.sentence ?? 'No release type is given for the source.', captureVelocity: check?.verdict ?? null };
}

// The hoods the run simulated, when there is one, so airflow and exposure describe the same set-up.
export function buildColumn(scenario: ScenarioLike, run: RunLike | null, figures: RunFigures | null): CompareColumn {
  const setup = run && figures ? run.input : scenario.input;
  const hoods = setup.hoods ?? [];
  return {
    id: scenario.id,
    name: scenario.name,
    workstationName: scenario.workstationName,
    siteName: scenario.siteName,
    controlTier: scenario.controlTier as ControlTier,
    controlDescription: scenario.controlDescription,
    hoods: hoods.map(({ name, kind, airflow_m3PerS, faceWidth_m, faceHeight_m }) => ({
      name,
      kind,
      airflow_m3PerS,
      faceWidth_m,
      faceHeight_m,
    })),
    totalAirflow_m3PerS: hoods.reduce((sum, h) => sum + h.airflow_m3PerS, 0),
    ...capture(setup),
    run: run && figures ? { ...figures, id: run.id, createdAt: run.createdAt, outOfDate: run.outOfDate } : null,
  };
}
