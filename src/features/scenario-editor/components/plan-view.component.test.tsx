import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { sampleScenario } from '@/features/scenario-editor/dev/sample-data';
import { PlanView } from './plan-view';

function Harness({ onValue }: { onValue: (v: ScenarioInput) => void }) {
  const [value, setValue] = useState(sampleScenario);
  return (
    <PlanView
      value={value}
      onChange={(next) => {
        setValue(next);
        onValue(next);
      }}
    />
  );
}

describe('plan view zoom', () => {
  it('opens on the workstation, zooms and pans from the keyboard, and leaves a marker’s arrow keys to the marker', () => {
    let last = sampleScenario();
    render(<Harness onValue={(v) => (last = v)} />);
    const plan = screen.getByTestId('plan-view');
    const zoom = () => Number(plan.getAttribute('data-zoom'));
    const opened = zoom();
    expect(opened).toBeGreaterThan(1);
    fireEvent.keyDown(plan, { key: '0' });
    expect(zoom()).toBe(1);
    fireEvent.keyDown(plan, { key: '+' });
    fireEvent.keyDown(plan, { key: '+' });
    expect(zoom()).toBeCloseTo(2.25, 3);
    const ticks = () => Array.from(plan.querySelectorAll('text')).map((t) => t.textContent);
    const before = ticks();
    fireEvent.keyDown(plan, { key: 'ArrowRight' });
    expect(ticks()).not.toEqual(before);
    const x = last.worker.x_m;
    const shown = ticks();
    fireEvent.keyDown(screen.getByTestId('drag-worker'), { key: 'ArrowRight' });
    expect(last.worker.x_m).toBeCloseTo(x + 0.05, 9);
    expect(ticks().filter((t) => /^\d/.test(t ?? ''))).toEqual(shown.filter((t) => /^\d/.test(t ?? '')));
    fireEvent.click(screen.getByRole('button', { name: 'Workstation' }));
    expect(zoom()).toBeGreaterThan(1);
  });
});
