import type { CaptureVerdictWord } from '../../shared/physics/capture-verdict';
import type { Verdict } from '../../shared/verdict/index';
import type { WatchCause } from '../../shared/schemas/workspace-views';

/**
 * Why a verdict reads Watch: near the limit only when its daily 95th percentile is at or above half the limit;
 * otherwise the banner was held back from Clear by a hood too slow at the source or by a run that has not decided.
 */
export function watchCause(verdict: Verdict | null, captureVelocity: CaptureVerdictWord | undefined): WatchCause | null {
  if (!verdict || verdict.banner !== 'watch') return null;
  if (verdict.p95_mgPerM3 >= 0.5 * verdict.value_mgPerM3) return 'near-limit';
  if (captureVelocity === 'below-half') return 'capture-short';
  return verdict.decided ? 'near-limit' : 'undecided';
}
