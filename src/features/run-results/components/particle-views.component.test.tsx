import { fireEvent, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { PREVIEW_SCENARIO } from '@/features/run-results/dev/preview-scenario';
import { ParticleViews } from './particle-views';

// An invented two-path sample over a 40 s run in the engine's layout: frames every 10 s, ends [released_s, xyz, ended_s, xyz].
const N = NaN;
const trajectories = {
  particles: 2,
  frames: 4,
  frameInterval_s: 10,
  positions_m: Float32Array.from([N, N, N, 3, 2.9, 1, 3.2, 2.8, 1.1, 3.4, 2.7, 1.2, ...Array<number>(12).fill(N)]),
  bins: Int32Array.from([0, 1]),
  fates: Int32Array.from([3, 0]),
  ends: Float32Array.from([5, 3, 3, 0.92, 40, 3.5, 2.6, 1.2, 12, 3, 3, 0.92, 13, 3, 3.28, 0.95]),
};
const view = {
  engine: { sizeBins: 2 },
  sizeBins: { aerodynamic_m: [2e-6, 20e-6], physical_m: [1e-6, 12e-6] },
  trajectories,
} as unknown as RunResult;
const scenario = parseScenario(PREVIEW_SCENARIO);

describe('particle views', () => {
  it('colours by where each particle ends up, with counts in the legend, and switches to size', async () => {
    const user = userEvent.setup();
    render(<ParticleViews view={view} scenario={scenario} />);
    const fates = screen.getByRole('list', { name: 'Particle fates' });
    expect(within(fates).getByText(/Captured by hood/).textContent).toContain('(1)');
    expect(within(fates).getByText(/Still airborne at the end/).textContent).toContain('(1)');
    await user.click(screen.getByRole('radio', { name: 'Size' }));
    expect(screen.queryByRole('list', { name: 'Particle fates' })).toBeNull();
    expect(within(screen.getByRole('list', { name: 'Particle size classes' })).getAllByRole('listitem').length).toBeGreaterThan(1);
  });

  it('shows the particles alive at the scrubbed time: one is captured within a second of release', () => {
    render(<ParticleViews view={view} scenario={scenario} />);
    const scrubber = screen.getByTestId('scrubber');
    expect(scrubber.getAttribute('max')).toBe('40');
    // It opens paused at the first frame with the most particles out (10 s here), not at 0 s with none released.
    expect((scrubber as HTMLInputElement).value).toBe('10');
    expect(screen.getByTestId('airborne-count').textContent).toBe('1');
    fireEvent.change(scrubber, { target: { value: '12.5' } });
    expect(screen.getByTestId('airborne-count').textContent).toBe('2');
    fireEvent.change(scrubber, { target: { value: '20' } });
    expect(screen.getByTestId('airborne-count').textContent).toBe('1');
  });

  it('opens zoomed on the workstation; Whole room and the keys change the zoom, and zoom out stops at the whole room', async () => {
    const user = userEvent.setup();
    render(<ParticleViews view={view} scenario={scenario} />);
    const controls = screen.getByRole('group', { name: 'Zoom of the plan' });
    const level = () => within(controls).getByTestId('zoom-level').textContent;
    expect(level()).not.toBe('1×');
    await user.click(within(controls).getByRole('button', { name: 'Whole room' }));
    expect(level()).toBe('1×');
    expect(within(controls).getByRole('button', { name: 'Zoom out of the plan' })).toHaveProperty('disabled', true);
    const plan = screen.getByRole('group', { name: /^Plan view of the/ });
    fireEvent.keyDown(plan, { key: '+' });
    expect(level()).toBe('1.5×');
    fireEvent.keyDown(plan, { key: '0' });
    expect(level()).toBe('1×');
  });
});
