import { describe, expect, it } from 'vitest';
import { judgeStored } from './run-verdict';

// Stored numbers far below the limit with plenty of zone histories: only the capture guard keeps the banner from Clear.
const numbers = (extra: object) =>
  JSON.stringify({
    histories: 40000,
    fractions: Object.fromEntries(
      ['total', 'inhalable', 'thoracic', 'respirable'].map((f) => [
        f,
        { twa8h_mgPerM3: 0.01, twa8hCi95_mgPerM3: [0.009, 0.011], zoneHistories: 5000 },
      ]),
    ),
    ...extra,
  });
const limit = { fraction: 'inhalable' as const, value_mgPerM3: 2 };

describe('a stored run re-judged on the server', () => {
  it('keeps a slow downdraft bench from Clear and names the bench guidance, as the browser does', () => {
    const v = judgeStored(numbers({ captureVelocity: 'below-half', captureBasis: 'face-velocity' }), limit)!;
    expect(v.banner).toBe('watch');
    expect(v.reasons.join(' ')).toMatch(/face velocity is below half the lower end of the downdraft-bench guidance/);
  });

  it('names the speed at the source for other hoods', () => {
    const v = judgeStored(numbers({ captureVelocity: 'below-half' }), limit)!;
    expect(v.banner).toBe('watch');
    expect(v.reasons.join(' ')).toMatch(/speed at the source is below half/);
  });
});
