import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { parseRunResult } from '../../../../shared/schemas/run-result-stored';
import v120 from '../../../../tests/fixtures/run-results/engine-1.2.0.json';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { FateSection } from './fate-section';

const withProfile = (median_m: number, gsd: number) =>
  parseRunResult(
    runEngine(
      scenarioInput({
        dust: { density_kgPerM3: 1000, shapeFactor: 1, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m, gsd } },
        run: { particles: 200, seed: 3, batches: 2 },
      }),
    ).result,
  );

describe('where the dust went', () => {
  it('says how much of the emission lies above 100 µm and is not simulated: MMAD 50 µm, σg 2 leaves Φ(−1) = 16 % ([S] standard normal table)', () => {
    render(<FateSection view={withProfile(50e-6, 2)} fileName={(what) => ['run', what]} />);
    expect(screen.getByRole('note').textContent).toBe(
      '16 % of the emitted mass is above 100 µm aerodynamic diameter and is not simulated; the concentrations and fates shown cover the rest.',
    );
  });

  it('says nothing when all but a negligible share is simulated, or when the result predates the figure', () => {
    const { unmount } = render(<FateSection view={withProfile(5e-6, 2)} fileName={(what) => ['run', what]} />);
    expect(screen.queryByRole('note')).toBeNull();
    unmount();
    render(<FateSection view={parseRunResult(v120)} fileName={(what) => ['run', what]} />);
    expect(screen.queryByRole('note')).toBeNull();
  });
});
