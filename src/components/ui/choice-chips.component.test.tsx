import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { ChoiceChips } from './choice-chips';

function Speeds() {
  const [speed, setSpeed] = useState(1);
  return (
    <ChoiceChips legend="Playback speed" caption="Speed" options={[0.5, 1, 2]} value={speed} onChange={setSpeed} label={(s) => `${s}×`} />
  );
}

// Roles from WAI-ARIA 1.2: a fieldset is a group named by its legend; each choice is a radio named by its label.
describe('choice chips', () => {
  it('is a group named by its legend, with the shown caption hidden from the accessible name', () => {
    render(<Speeds />);
    const group = screen.getByRole('group', { name: 'Playback speed' });
    expect(group.querySelector('[aria-hidden="true"]')?.textContent).toBe('Speed');
    expect(screen.getAllByRole('radio').map((r) => r.closest('label')?.textContent)).toEqual(['0.5×', '1×', '2×']);
  });

  it('checks exactly one choice and moves the check on a click', async () => {
    const user = userEvent.setup();
    render(<Speeds />);
    expect(screen.getByRole('radio', { name: '1×' })).toHaveProperty('checked', true);
    await user.click(screen.getByRole('radio', { name: '2×' }));
    expect(screen.getAllByRole('radio').map((r) => (r as HTMLInputElement).checked)).toEqual([false, false, true]);
  });
});
