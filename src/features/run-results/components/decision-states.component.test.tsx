import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { parseRunResult } from '../../../../shared/schemas/run-result-stored';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ConcentrationChart } from './concentration-chart';
import { Headline } from './headline';

const { scenario, result } = runEngine(scenarioInput());
const base = parseRunResult(result);

// The real engine's result, then one state at a time set as a verdict or a thin run would leave it.
const withLimit = (patch: Partial<NonNullable<RunResult['limit']>>): RunResult => ({ ...base, limit: { ...base.limit!, ...patch } });

describe('the states a result shows while it cannot decide', () => {
  it('says how many more particles and batches a decision needs', () => {
    const view = withLimit({
      decided: false,
      banner: 'watch',
      moreHistories: 120_000,
      reasons: ['Not enough particles reached the breathing zone to decide.'],
    });
    render(<Headline view={view} scenario={scenario} />);
    const perBatch = view.engine.particles / view.engine.batches;
    expect(screen.getByTestId('run-more').textContent).toContain(
      `run about 120,000 more particles: about ${Math.ceil(120_000 / perBatch).toLocaleString('en-GB')} more batches`,
    );
  });

  it('shows the peak 15-min average against the short-term limit', () => {
    const view = withLimit({ shortTerm: { value_mgPerM3: 0.1, percentOfLimit: 40, percentOfLimitUpper: 120, exceeds: 'maybe' } });
    render(<Headline view={view} scenario={scenario} />);
    expect(screen.getByTestId('short-term').textContent).toContain('40.0 % of the 15-min limit 0.100 mg/m³ (up to 120 %): possibly above');
  });

  it('gives no peak when no simulated dust reached the zone: "Not known", not 0 mg/m³', () => {
    const limitFraction = base.limit!.fraction;
    const fractions = base.breathingZone.fractions;
    const none = { ...fractions[limitFraction], zoneHistories: 0, peak15min_mgPerM3: 0, peak15minCi95_mgPerM3: [0, 0] as [number, number] };
    const view: RunResult = { ...base, breathingZone: { ...base.breathingZone, fractions: { ...fractions, [limitFraction]: none } } };
    render(<Headline view={view} scenario={scenario} />);
    const peak = screen.getByTestId('peak').textContent ?? '';
    expect(peak).toContain('Not known');
    expect(peak).not.toMatch(/\b0 mg\/m³/);
  });

  it('says how a run to a precision stopped, and at which looks', () => {
    const view: RunResult = {
      ...base,
      engine: {
        ...base.engine,
        stopping: {
          relativeHalfWidth: 0.1,
          maxBatches: 640,
          fraction: 'respirable',
          reason: 'precision',
          looks: [
            { batches: 20, alpha: 0.0016, mean_mgPerM3: 0.01, ci_mgPerM3: [0.005, 0.015], decided: false },
            { batches: 40, alpha: 0.0016, mean_mgPerM3: 0.01, ci_mgPerM3: [0.009, 0.011], decided: false },
          ],
        },
      },
    };
    render(<Headline view={view} scenario={scenario} />);
    expect(screen.getByTestId('stopping').textContent).toContain('because the interval reached its precision');
    expect(screen.getByTestId('stopping').textContent).toContain('looked only at 20, 40 batches');
  });

  it('says when the time series is too sparse to read, and otherwise how wide its bins are', () => {
    const sparse: RunResult = {
      ...base,
      breathingZone: {
        ...base.breathingZone,
        series: {
          ...base.breathingZone.series,
          respirable: {
            ...base.breathingZone.series.respirable,
            sparse: true,
            visits: base.breathingZone.series.respirable.mean.map(() => 2),
          },
        },
      },
    };
    const { unmount } = render(<ConcentrationChart view={sparse} fraction="respirable" />);
    expect(screen.getByTestId('series-sparse').textContent).toMatch(/^Too sparse to read/);
    unmount();
    const readable: RunResult = {
      ...base,
      breathingZone: {
        ...base.breathingZone,
        series: { ...base.breathingZone.series, respirable: { ...base.breathingZone.series.respirable, sparse: false } },
      },
    };
    render(<ConcentrationChart view={readable} fraction="respirable" />);
    expect(screen.queryByTestId('series-sparse')).toBeNull();
    expect(screen.getByTestId('series-bins').textContent).toMatch(/^Each point averages/);
  });

  it('says so when no dust reached the zone at all: no series to draw and an error that is not known, never ± 0 %', () => {
    const respirable = base.breathingZone.series.respirable;
    const empty: RunResult = {
      ...base,
      breathingZone: {
        ...base.breathingZone,
        fractions: {
          ...base.breathingZone.fractions,
          respirable: { ...base.breathingZone.fractions.respirable, taskMean_mgPerM3: 0, taskMeanCi95_mgPerM3: [0, 0] },
        },
        series: { ...base.breathingZone.series, respirable: { ...respirable, sparse: true, visits: respirable.mean.map(() => 0) } },
      },
      limit: { ...base.limit!, fraction: 'respirable', percentOfLimit: 0.75, percentOfLimitUpper: 0.75 },
    };
    const { unmount, container } = render(<ConcentrationChart view={empty} fraction="respirable" />);
    expect(screen.getByTestId('series-sparse').textContent).toMatch(/^No simulated dust of this fraction reached the breathing zone/);
    // No empty plot on a made-up scale beside the note.
    expect(container.querySelector('svg')).toBeNull();
    unmount();
    render(<Headline view={empty} scenario={scenario} />);
    expect(screen.getByTestId('statistical-error').textContent).toMatch(/^Not known/);
    // The category rates the daily 95th percentile from the upper bound; with no width neither is known.
    expect(screen.getByTestId('rating').textContent).toMatch(/^Not rated/);
    expect(screen.getByTestId('percent-of-limit').textContent).toContain('upper 95 % bound not known');
  });
});
