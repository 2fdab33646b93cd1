import type { ResultLimit, RunResult } from '../schemas/run-result';
import { type JudgeLimit, type JudgeOptions, judgeRun, type Verdict } from './judge-run';

type Judged = Pick<RunResult, 'breathingZone' | 'engine'>;

/** judgeRun on a whole result: the numbers of the limit's fraction, whatever limit the result was run with. */
export function judgeResult(result: Judged, limit: JudgeLimit, options?: JudgeOptions): Verdict {
  const s = result.breathingZone.fractions[limit.fraction];
  return judgeRun(
    {
      twa8h_mgPerM3: s.twa8h_mgPerM3,
      twa8hCi95_mgPerM3: s.twa8hCi95_mgPerM3,
      zoneHistories: s.zoneHistories,
      histories: result.engine.particles,
      peak15min_mgPerM3: s.peak15min_mgPerM3,
      peak15minCi95_mgPerM3: s.peak15minCi95_mgPerM3,
    },
    limit,
    options,
  );
}

/** The verdict in the result's own limit block: every field of the verdict, copied so the two never alias. */
export function limitBlock(v: Verdict): ResultLimit {
  return { ...v, reasons: [...v.reasons] };
}

/** The result with its verdict re-judged against the given limit (or none). */
export function withVerdict<T extends Judged & { limit?: ResultLimit }>(result: T, limit: JudgeLimit | null, options?: JudgeOptions): T {
  const rest = { ...result };
  delete rest.limit;
  return limit ? { ...rest, limit: limitBlock(judgeResult(result, limit, options)) } : rest;
}
