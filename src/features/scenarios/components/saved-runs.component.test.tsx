import { render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { percentText } from '../../../../shared/format/index';
import type { RunListItem } from '../../../../shared/schemas/workspace-views';
import { SavedRuns } from './saved-runs';

// The demo bakery's no-control run as the server lists it (computed by the engine, [C]): judged on the inhalable limit.
const run: RunListItem = {
  id: 4,
  seed: '1',
  engine_version: '2.0.0',
  input_hash: 'abc',
  particles: 40000,
  limit_fraction: 'inhalable',
  twa8h_mgPerM3: 3.2157,
  twa8h_lo_mgPerM3: 3.0,
  twa8h_hi_mgPerM3: 3.4,
  respirable_twa8h_mgPerM3: 0.188,
  percent_of_limit: 159.2684965,
  rating_category: 4,
  banner: 'act',
  created_by: 1,
  created_at: '2026-12-01T10:00:00Z',
  outOfDate: false,
  decided: true,
  reasons: [],
};

const cellsOf = () => {
  render(
    <MemoryRouter>
      <SavedRuns runs={[run]} />
    </MemoryRouter>,
  );
  const row = within(screen.getByRole('table', { name: 'Saved runs' })).getAllByRole('row')[1];
  return within(row).getAllByRole('cell');
};

describe('saved runs list', () => {
  it("shows the TWA and the % of limit of the limit's own fraction, named in both cells, never the respirable TWA beside an inhalable %", () => {
    const [, twa, pct] = cellsOf();
    expect(twa.textContent).toMatch(/^3\.22 \[3, 3\.4\]inhalable fraction$/);
    expect(pct.textContent).toBe(`${percentText(159.2684965)}inhalable fraction`);
    expect(twa.textContent).not.toMatch(/0\.188/);
  });

  it('rounds % of limit with shared/format as the headline does', () => {
    const [, , pct] = cellsOf();
    expect(pct.textContent).toMatch(/^159 %/);
  });

  it('never writes an interval with no width as a range: the downdraft bench, where no dust reached the zone', () => {
    render(
      <MemoryRouter>
        <SavedRuns runs={[{ ...run, twa8h_mgPerM3: 0.015, twa8h_lo_mgPerM3: 0.015, twa8h_hi_mgPerM3: 0.015 }]} />
      </MemoryRouter>,
    );
    const text = screen.getByRole('table', { name: 'Saved runs' }).textContent ?? '';
    expect(text).toContain('0.015 [CI not known: too few particles reached the zone]');
    expect(text).not.toContain('[0.015, 0.015]');
  });
});
