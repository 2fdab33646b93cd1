import type { ControlTier } from '../../../../shared/schemas/workspace';
import type { CompareColumn, HoodFigures, RunFigures } from './types';

export interface ScenarioLike {
  id: number;
  name: string;
  workstationName: string;
  siteName: string;
  controlTier: string;
  controlDescription: string;
  input: { hoods?: HoodFigures[] };
}

export interface RunLike {
  id: number;
  createdAt: string;
  outOfDate: boolean;
  input: { hoods?: HoodFigures[] };
}

// The hoods the run simulated, when there is one, so airflow and exposure describe the same set-up.
export function buildColumn(scenario: ScenarioLike, run: RunLike | null, figures: RunFigures | null): CompareColumn {
  const hoods = (run && figures ? run.input.hoods : scenario.input.hoods) ?? [];
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
    run: run && figures ? { ...figures, id: run.id, createdAt: run.createdAt, outOfDate: run.outOfDate } : null,
  };
}
