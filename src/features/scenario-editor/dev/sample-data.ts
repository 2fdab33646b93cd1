import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { cubicMetresPerHourToPerSecond, micrometresToMetres } from '../../../../shared/units';
import type { AgentOption } from '@/features/scenario-editor/lib/apply-agent';
import type { SizeProfileOption } from '@/features/scenario-editor/components/size-profile-fields';
import { defaultScenario } from '@/features/scenario-editor/lib/default-scenario';

// Invented figures for looking at the editor; the real agents and profiles come from the server.
export const SAMPLE_AGENTS: AgentOption[] = [
  {
    id: 1,
    name: 'Sample mineral dust',
    data: {
      density_kgPerM3: 2650,
      shapeFactor: 1.4,
      limitFraction: 'respirable',
      limit8h_mgPerM3: 0.1,
      limit15min_mgPerM3: null,
      override: null,
      jurisdiction: 'Sample',
      limitSource: 'preview data',
    },
  },
  {
    id: 2,
    name: 'Sample organic dust',
    data: {
      density_kgPerM3: 1450,
      shapeFactor: 1.2,
      limitFraction: 'inhalable',
      limit8h_mgPerM3: 10,
      limit15min_mgPerM3: 30,
      override: { limit8h_mgPerM3: 1, reason: 'site policy' },
      jurisdiction: 'Sample',
      limitSource: 'preview data',
    },
  },
];

export const SAMPLE_PROFILES: SizeProfileOption[] = [
  {
    id: 10,
    name: 'Fine powder (lognormal)',
    sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: micrometresToMetres(3), gsd: 2.2 },
  },
  {
    id: 11,
    name: 'Sieved grit (bins)',
    sizeProfile: { kind: 'bins', basis: 'mass', diameter: 'aerodynamic', edges_m: [1e-6, 5e-6, 10e-6, 30e-6], amounts: [0.1, 0.3, 0.6] },
  },
];

export function sampleScenario(): ScenarioInput {
  const base = defaultScenario({
    room: {
      length_m: 6,
      width_m: 4,
      height_m: 3,
      airChanges_perH: 4,
      draftSpeed_mPerS: 0.2,
      draftDirection_deg: 90,
      temperature_K: 293.15,
    },
    source: { x_m: 2, y_m: 2.7, z_m: 0.9 },
    worker: { x_m: 2.6, y_m: 2.7, z_m: 1.5 },
  });
  return {
    ...base,
    source: { ...base.source, releaseType: 'low' },
    hoods: [
      {
        kind: 'flanged',
        x_m: 1.7,
        y_m: 3,
        z_m: 0.95,
        direction: { azimuth_deg: 315, elevation_deg: 0 },
        faceWidth_m: 0.4,
        faceHeight_m: 0.25,
        airflow_m3PerS: cubicMetresPerHourToPerSecond(1200),
      },
    ],
  };
}
