import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SizeProfileDetail as Detail } from '../../../../shared/schemas/size-profiles';
import { SizeProfileDetail } from './size-profile-detail';

// Three invented impactor-like bins; the fit figures are the ones the server would have stored.
const profile = (fit: boolean): Detail =>
  ({
    id: 1,
    name: 'Grinding dust, bench 2',
    kind: 'bins',
    fittedMmad_m: fit ? 8e-6 : null,
    fittedGsd: fit ? 2.2 : null,
    respirableFraction: 0.2,
    thoracicFraction: 0.5,
    inhalableFraction: 0.9,
    createdBy: null,
    createdAt: '2026-12-02T10:00:00Z',
    bins: { edges_m: [1e-6, 4e-6, 10e-6, 40e-6], massFraction: [0.2, 0.4, 0.4] },
  }) as unknown as Detail;

describe('size-profile preview', () => {
  it('draws the fitted lognormal over both charts and names it in each legend', () => {
    render(<SizeProfileDetail profile={profile(true)} />);
    expect(screen.getAllByText('Lognormal fit: MMAD 8.00 µm, GSD 2.20')).toHaveLength(2);
    expect(screen.getByText('Bins as given')).toBeTruthy();
    expect(screen.getByText('At the bin edges')).toBeTruthy();
    const perDecade = screen.getByTestId('fit-per-decade').getAttribute('d') ?? '';
    const cumulative = screen.getByTestId('fit-cumulative').getAttribute('d') ?? '';
    // 121 points each, so a smooth curve rather than the three bins' outline.
    expect(perDecade.split('L').length).toBeGreaterThan(100);
    expect(cumulative.split('L').length).toBeGreaterThan(100);
  });

  it('says there is no fit to draw when the profile has none', () => {
    render(<SizeProfileDetail profile={profile(false)} />);
    expect(screen.getAllByText('No lognormal fit to draw')).toHaveLength(2);
    expect(screen.queryByTestId('fit-cumulative')).toBeNull();
  });
});
