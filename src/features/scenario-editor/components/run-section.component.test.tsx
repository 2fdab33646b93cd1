import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { RunSection } from './run-section';

function Harness({ start, seen }: { start: ScenarioInput; seen: ScenarioInput[] }) {
  const [value, setValue] = useState(start);
  return (
    <RunSection
      value={value}
      errors={{}}
      onChange={(next) => {
        seen.push(next);
        setValue(next);
      }}
    />
  );
}

describe('run settings', () => {
  it('starts a run to a precision with 20 batches of 250 particles, whatever the batches were, and keeps them on switching back', () => {
    // The demo files hold batches of 4,000 particles: a first look at 20 of them would cost 80,000 particles.
    const seen: ScenarioInput[] = [];
    render(<Harness start={{ run: { particles: 40_000, batches: 10, seed: 7 } } as ScenarioInput} seen={seen} />);
    fireEvent.change(screen.getByLabelText('Run until'), { target: { value: 'precision' } });
    expect(seen.at(-1)!.run).toMatchObject({
      particles: 5000,
      batches: 20,
      seed: 7,
      precision: { relativeHalfWidth: 0.1, maxBatches: 640 },
    });
    expect((screen.getByLabelText('Particles') as HTMLInputElement).value).toBe('5000');
    expect(screen.getByText(/Batches of 250 particles \(particles ÷ batches\), looked at only at 20, 40, 80/)).toBeTruthy();
    fireEvent.change(screen.getByLabelText('Run until'), { target: { value: 'particles' } });
    expect(seen.at(-1)!.run).toMatchObject({ particles: 5000, batches: 20, precision: undefined });
  });
});
