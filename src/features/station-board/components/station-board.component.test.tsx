import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { StationBoard as Board, WatchCause } from '../../../../shared/schemas/workspace-views';
import { StationBoard } from './station-board';

const board = (watchCause: WatchCause | null, banner: Board['banner'] = 'watch'): Board => ({
  workstationId: 3,
  workstationName: 'Edge-grinding bench 2',
  banner,
  needsReview: false,
  reviewDate: '2027-06-30',
  control: 'Flanged hood',
  approvedAt: '2026-12-01T10:00:00Z',
  advice: ['Switch the hood on before you start, and leave it on until the dust has cleared.'],
  watchCause,
  checkedAt: '2026-12-02T10:00:00Z',
});

const banner = () => screen.getByTestId('station-banner').textContent ?? '';

describe('the station board headline', () => {
  it('says close to the limit only when that is why it is Watch', () => {
    render(<StationBoard board={board('near-limit')} />);
    expect(banner()).toMatch(/Watch.*Close to the limit/);
  });

  it('says the assessment is not yet confirmed when the run has not decided', () => {
    render(<StationBoard board={board('undecided')} />);
    expect(banner()).toMatch(/Not yet confirmed/);
    expect(banner()).not.toMatch(/limit/);
  });

  it('says the hood may be too weak when the hood is below half its capture velocity', () => {
    render(<StationBoard board={board('capture-short')} />);
    expect(banner()).toMatch(/hood may be too weak/);
    expect(banner()).not.toMatch(/limit/);
  });

  it('keeps the Clear and Act headlines', () => {
    render(<StationBoard board={board(null, 'clear')} />);
    expect(banner()).toMatch(/Clear.*working as assessed/);
  });
});
