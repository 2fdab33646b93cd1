import { describe, expect, it } from 'vitest';
import { wellMixedConcentration } from '../../shared/physics/index';
import { meanAndError, onlyBin, prepareTest, runAll, windowMeans } from './engine.test-helper';

describe('small, strongly mixed room with ventilation and settling', () => {
  it('matches the well-mixed model with loss ACH/3600 + V_TS/H (box model, common practice)', () => {
    const p = prepareTest({
      room: { length_m: 3, width_m: 3, height_m: 3, airChanges_perH: 6, eddyDiffusivity_m2PerS: 0.3 },
      source: { x_m: 1, y_m: 1.5, z_m: 1.5, emission: { kind: 'continuous', rate_mgPerMin: 60, taskDuration_min: 10 } },
      dust: { density_kgPerM3: 1000, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 10e-6, gsd: 1 } },
      worker: { x_m: 2.2, y_m: 1.5, z_m: 1.5 },
      run: { particles: 1600, batches: 8, seed: 3 },
    });
    const b = onlyBin(p);
    const loss = p.bins.settling_mPerS[b] / 3;
    const batches = runAll(p);
    for (const [from, to] of [
      [12, 40],
      [40, 80],
      [80, 120],
    ]) {
      const { mean, se } = meanAndError(windowMeans(p, batches, from, to));
      let expected = 0;
      for (let tb = from; tb < to; tb++) {
        const t = (tb + 0.5) * p.timeBin_s;
        expected +=
          wellMixedConcentration({ generation_mgPerS: 1, airflow_m3PerS: (6 * 27) / 3600, volume_m3: 27, lossRate_perS: loss }, t) /
          (to - from);
      }
      // 3.5 standard errors of the batch mean (common practice).
      expect(Math.abs(mean - expected), `${mean} vs ${expected} ± ${se}`).toBeLessThan(3.5 * se);
    }
  });
});
