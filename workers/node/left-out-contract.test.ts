import { describe, expect, it } from 'vitest';
import before from '../../tests/fixtures/run-results/engine-1.0.0-before-size-bins.json';
import v100 from '../../tests/fixtures/run-results/engine-1.0.0.json';
import v120 from '../../tests/fixtures/run-results/engine-1.2.0.json';
import { RunResultError, parseRunResult } from '../../shared/schemas/run-result-stored';

const leftOut = { share: 0.2, below: 0.05, above: 0.15, lowerPhysical_m: 1e-9, upperAerodynamic_m: 100e-6 };

describe('massLeftOut in stored results', () => {
  it('is absent (unknown) in results of engines that renormalised it away', () => {
    for (const stored of [before, v100, v120]) expect(parseRunResult(stored).massLeftOut).toBeUndefined();
  });

  it('reads back as written', () => {
    expect(parseRunResult({ ...v120, massLeftOut: leftOut }).massLeftOut).toEqual(leftOut);
  });

  it('refuses a share above one, naming the field', () => {
    expect(() => parseRunResult({ ...v120, massLeftOut: { ...leftOut, above: 1.5 } })).toThrow(RunResultError);
    expect(() => parseRunResult({ ...v120, massLeftOut: { ...leftOut, above: 1.5 } })).toThrow(/massLeftOut\.above/);
  });
});
