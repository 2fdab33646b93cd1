import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../../../shared/schemas/scenario';
import { applyAgent } from './apply-agent';
import { defaultScenario } from './default-scenario';
import { issuesByPath } from './field-errors';

const base = defaultScenario({
  room: { length_m: 5, width_m: 4, height_m: 3, airChanges_perH: 4, draftSpeed_mPerS: 0, draftDirection_deg: 0, temperature_K: 293.15 },
  source: { x_m: 2, y_m: 2, z_m: 0.9 },
  worker: { x_m: 2.5, y_m: 2, z_m: 1.5 },
});
const errorsOf = (input: unknown) => issuesByPath(scenarioSchema.safeParse(input).error?.issues ?? []);

describe('field errors', () => {
  it('keys each issue by its dotted path in plain words', () => {
    const hood = {
      kind: 'plain',
      x_m: 1,
      y_m: 1,
      z_m: 1,
      direction: { azimuth_deg: 0 },
      faceWidth_m: 0.3,
      faceHeight_m: 0.3,
      airflow_m3PerS: -0.1,
    };
    const errors = errorsOf({ ...base, hoods: [hood], run: { particles: 1.5 } });
    expect(errors['hoods.0.airflow_m3PerS']).toBe('Must be at least 0');
    expect(errors['run.particles']).toBe('Enter a whole number');
  });

  it('passes the geometry messages through, naming the room bounds', () => {
    const errors = errorsOf({ ...base, worker: { ...base.worker, x_m: 7 } });
    expect(errors['worker.x_m']).toMatch(/inside the room \(0 to 5 m\), got 7/);
  });
});

describe('applyAgent', () => {
  const agent = {
    id: 3,
    name: 'Flour dust',
    data: {
      density_kgPerM3: 1450,
      shapeFactor: 1.3,
      limitFraction: 'inhalable' as const,
      limit8h_mgPerM3: 10,
      limit15min_mgPerM3: null,
      override: { limit8h_mgPerM3: 1, reason: 'sensitiser: site policy' },
      jurisdiction: 'UK',
      limitSource: 'EH40/2005',
    },
  };

  it('sets density, shape factor and the limit, preferring the override', () => {
    const next = applyAgent(base, agent);
    expect(next.dust).toMatchObject({ name: 'Flour dust', density_kgPerM3: 1450, shapeFactor: 1.3 });
    expect(next.limit).toEqual({ fraction: 'inhalable', value_mgPerM3: 1, source: 'UK: EH40/2005; overridden: sensitiser: site policy' });
    expect(scenarioSchema.safeParse(next).success).toBe(true);
  });

  it('keeps the short-term limit when the agent has one', () => {
    const next = applyAgent(base, { ...agent, data: { ...agent.data, override: null, limit15min_mgPerM3: 30 } });
    expect(next.limit).toMatchObject({ value_mgPerM3: 10, shortTerm_mgPerM3: 30, source: 'UK: EH40/2005' });
  });
});
