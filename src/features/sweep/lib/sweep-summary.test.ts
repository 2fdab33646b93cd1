import { describe, expect, it } from 'vitest';
import { handCalcAnswer } from './hand-calc';
import { crossingSentence, disagreementSentence, handCalcSentence } from './sweep-summary';
import { stoneBench } from './test-scenario.test-helper';

const hood = stoneBench().hoods[0];

describe('sweep sentences', () => {
  it('says the crossing is interpolated linearly and between which points', () => {
    const text = crossingSentence({ kind: 'interpolated', value: 0.5, meets: 0.6, fails: 0.4 }, 'airflow', 50);
    expect(text).toBe(
      'The least airflow that meets the target (the upper 95 % bound at or below 50 % of the limit) is about 1,800 m³/h, interpolated linearly between the swept points at 2,160 m³/h (meets) and 1,440 m³/h (does not); more points between them would pin it down.',
    );
    expect(crossingSentence({ kind: 'beyond-range', value: 0.6 }, 'distance', 50)).toMatch(
      /^Even the largest distance swept, 0.6 m, meets the target/,
    );
    expect(crossingSentence({ kind: 'none' }, 'faceScale', 50)).toMatch(/^No swept point meets the target/);
  });

  it('names the capture velocity it used and that it is the low end of the range', () => {
    // Flanged 0.35 × 0.25 m at 0.3 m, 2.5 m/s: Q = 2.5 × 0.75 × (10 × 0.09 + 0.0875) = 1.852 m³/s = 6,666 m³/h.
    const text = handCalcSentence(handCalcAnswer(hood, 0.3, 'high', 'airflow'), 'high', 'Q = 0.75 V (10 X² + A)');
    expect(text).toBe(
      'Hand calculation (Q = 0.75 V (10 X² + A)): a capture velocity of 2.5 m/s, the low end of the 2.5–10 m/s range for high-velocity release, at the source distance of 0.3 m, needs 6,666 m³/h.',
    );
  });

  it('reads a simulation that needs more airflow than the rule as the rule falling short', () => {
    const calc = handCalcAnswer(hood, 0.3, 'low', 'airflow');
    expect(disagreementSentence({ kind: 'interpolated', value: 1, meets: 1.2, fails: 0.8 }, calc, 'airflow')).toMatch(
      /needs more airflow than the capture-velocity rule .* would fall short here/,
    );
    expect(disagreementSentence({ kind: 'interpolated', value: 0.1, meets: 0.2, fails: 0.05 }, calc, 'airflow')).toMatch(
      /with less airflow .* more cautious of the two/,
    );
  });

  it('reads distances the other way round: farther is looser', () => {
    const calc = handCalcAnswer(hood, 0.3, 'low', 'distance');
    expect(disagreementSentence({ kind: 'interpolated', value: 2, meets: 1.8, fails: 2.2 }, calc, 'distance')).toMatch(
      /farther from the source/,
    );
    expect(disagreementSentence({ kind: 'none' }, calc, 'distance')).toMatch(/above the target here/);
  });
});
