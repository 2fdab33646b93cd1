import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { dailyP95, DEFAULT_DAY_TO_DAY_GSD } from '../../../../shared/verdict/index';
import { column } from '@/features/compare/lib/column.test-helper';
import { orderByHierarchy } from '@/features/compare/lib/control-order';
import { targetFor } from '@/features/compare/lib/target';
import { CompareResults } from './compare-results';

// An upper bound whose daily 95th percentile (default day-to-day GSD, shared/verdict) is the given share of the
// helper's 0.025 mg/m³ limit.
const at = (share: number) => {
  const hi = (share * 0.025) / dailyP95(1, DEFAULT_DAY_TO_DAY_GSD);
  return { twa: hi * 0.9, ci: [hi * 0.8, hi] as [number, number] };
};

const show = (columns: ReturnType<typeof column>[]) =>
  render(
    <MemoryRouter>
      <CompareResults
        columns={orderByHierarchy(columns)}
        target={targetFor('half')}
        onTargetChange={() => {}}
        chartFraction={null}
        onChartFractionChange={() => {}}
      />
    </MemoryRouter>,
  );

describe('side by side results', () => {
  it('says so when the option that meets the target is the one without a control, which the hierarchy puts last', () => {
    show([
      column(1, { name: 'No local exhaust', ...at(0.2) }),
      column(2, { name: 'Slot hood', airflow_m3PerS: 0.15, ...at(0.2), captureVelocity: 'below-half' }),
    ]);
    expect(screen.getByRole('status').textContent).toMatch(/^No local exhaust meets the target/);
    expect(screen.getByTestId('no-control-meets').textContent).toMatch(/No local exhaust has no control, and it is the option that meets/);
    const headers = screen.getAllByTestId('compare-column').map((h) => h.textContent);
    expect(headers[0]).toMatch(/^Slot hood/);
  });

  it('has no such note when a hooded option meets the target', () => {
    show([column(1, { name: 'No local exhaust', ...at(3) }), column(2, { name: 'Slot hood', airflow_m3PerS: 0.15, ...at(0.2) })]);
    expect(screen.getByRole('status').textContent).toMatch(/^Slot hood meets the target/);
    expect(screen.queryByTestId('no-control-meets')).toBeNull();
  });

  it('never writes a zero-width interval as a range: a bench where no dust reached the zone says the error is not known', () => {
    // Only the rest-of-shift background: the interval collapses onto 0.015 mg/m³.
    show([
      column(1, { name: 'Downdraft bench', airflow_m3PerS: 0.6, twa: 0.015, ci: [0.015, 0.015], zoneHistories: 0, peak: 0 }),
      column(2, { name: 'No local exhaust', ...at(3) }),
    ]);
    const text = screen.getByRole('table').textContent ?? '';
    expect(text).toContain('CI not known: too few particles reached the zone · peak not known');
    expect(text).not.toMatch(/peak 0 mg/);
    expect(text).toContain('of 0.025 mg/m³, upper bound not known (no width), respirable');
    expect(text).not.toMatch(/CI 0\.015–0\.015/);
    // Nor a rating category: it rates a daily 95th percentile that is not known here.
    expect(text).toContain('Not rated (no width)');
    // The downdraft bench is the reference column: with no error of its own, the other's alone would make the z-value.
    expect(text).toContain('not judged: an interval is not known');
    expect(text).not.toMatch(/z = /);
  });
});
