import { describe, expect, it } from 'vitest';
import { wellMixedConcentration } from '../../shared/physics/index';
import { crossChecks } from './cross-checks';
import { prepareTest } from './engine.test-helper';
import { workstation } from './workstation.test-helper';

const broad = { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 4e-6, gsd: 2.5 } };

describe('analytic cross-checks', () => {
  it('come from the size profile, so 20 particles give the same figures as 20 000', () => {
    const few = prepareTest({ ...workstation, dust: broad, run: { particles: 20, batches: 2, seed: 1 } });
    const many = prepareTest({ ...workstation, dust: broad, run: { particles: 20_000, batches: 2, seed: 1 } });
    // The check means something only if the 20-particle sample leaves mass-carrying bins empty.
    const empty = Array.from(few.bins.profileMassFraction).filter((m, b) => m > 1e-3 && few.bins.particlesPerBatch[b] === 0);
    expect(empty.length).toBeGreaterThan(3);
    for (const fraction of ['total', 'respirable'] as const) {
      const a = crossChecks(few, fraction);
      expect(a.wellMixed_mgPerM3).toBeGreaterThan(0);
      expect(a).toEqual(crossChecks(many, fraction));
    }
  });

  it('give the well-mixed box model for a one-size dust, with loss V_TS/H (box model, common practice)', () => {
    const p = prepareTest({
      ...workstation,
      hoods: [],
      dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 5e-6, gsd: 1 } },
      run: { particles: 20, batches: 2, seed: 1 },
    });
    const b = p.bins.profileMassFraction.findIndex((m) => m === 1);
    const g = 5 / 60;
    const room = { generation_mgPerS: g, airflow_m3PerS: (4 * 90) / 3600, volume_m3: 90, lossRate_perS: p.bins.settling_mPerS[b] / 3 };
    // Continuous source over the whole 20-min window: the time mean of C(t) by the midpoint rule.
    let mean = 0;
    for (let i = 0; i < 200; i++) mean += wellMixedConcentration(room, ((i + 0.5) / 200) * 1200) / 200;
    expect(crossChecks(p, 'total').wellMixed_mgPerM3).toBeCloseTo(mean, 12);
  });
});
