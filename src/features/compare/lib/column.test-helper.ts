import { judgeRun } from '../../../../shared/verdict/index';
import type { CaptureVerdictWord } from '../../../../shared/physics/capture-verdict';
import type { CompareColumn, Ci } from './types';

const band = { mean: [0, 1], lo: [0, 0.5], hi: [0, 1.5] };

type Opts = {
  name?: string;
  tier?: CompareColumn['controlTier'];
  airflow_m3PerS?: number;
  twa?: number;
  ci?: Ci;
  run?: boolean;
  captureVelocity?: CaptureVerdictWord;
  zoneHistories?: number;
  /** Peak 15-min average; twice the TWA unless given. */
  peak?: number;
};

/**
 * A column whose every fraction has the given respirable 8-h TWA and 95 % interval; limit 0.025 mg/m³ respirable
 * (ACGIH TLV for respirable crystalline silica), judged by the shared verdict as the server judges a stored run.
 */
export function column(id: number, opts: Opts = {}): CompareColumn {
  const twa = opts.twa ?? 0.01;
  const ci = opts.ci ?? [twa * 0.9, twa * 1.1];
  const verdict = judgeRun(
    { twa8h_mgPerM3: twa, twa8hCi95_mgPerM3: ci, zoneHistories: opts.zoneHistories ?? 5000, histories: 40000 },
    { fraction: 'respirable', value_mgPerM3: 0.025 },
    { captureVelocity: opts.captureVelocity },
  );
  const fraction = { twa8h_mgPerM3: twa, twa8hCi95_mgPerM3: ci, peak15min_mgPerM3: opts.peak ?? 2 * twa };
  const airflow = opts.airflow_m3PerS ?? 0;
  return {
    id,
    name: opts.name ?? `Option ${id}`,
    workstationName: 'Bench',
    siteName: 'Site',
    controlTier: opts.tier ?? (airflow > 0 ? 'engineering' : 'none'),
    controlDescription: airflow > 0 ? 'Hood' : 'No local exhaust',
    hoods: airflow > 0 ? [{ kind: 'flanged', airflow_m3PerS: airflow, faceWidth_m: 0.4, faceHeight_m: 0.3 }] : [],
    totalAirflow_m3PerS: airflow,
    captureVelocity: opts.captureVelocity ?? null,
    run:
      opts.run === false
        ? null
        : {
            id: 100 + id,
            createdAt: '2026-01-01T00:00:00Z',
            outOfDate: false,
            fractions: { total: fraction, inhalable: fraction, thoracic: fraction, respirable: fraction },
            series: { time_s: [0, 60], bands: { total: band, inhalable: band, thoracic: band, respirable: band } },
            fate: { emitted_mg: 100, shares: { captured: 0.5, settled: 0.2, exhausted: 0.2, airborne: 0.1, walls: 0 } },
            limit: verdict,
            ratingName: 'Under half the limit',
          },
  };
}
