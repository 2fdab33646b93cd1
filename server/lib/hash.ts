import { createHash } from 'node:crypto';
import { canonicalJson } from '../../shared/schemas/canonical-json';

type WithRun = { run?: Record<string, unknown> };

// run.varianceReduction changes how precisely a run estimates, not what it estimates (both walks
// are unbiased), so it stays out of the hash: a scenario saved before the switch existed and a run
// of it made with the switch on describe the same thing, and neither reads as out of date.
function withoutEstimatorChoice(input: unknown): unknown {
  if (!input || typeof input !== 'object' || Array.isArray(input)) return input;
  const run = (input as WithRun).run;
  if (!run || typeof run !== 'object' || !('varianceReduction' in run)) return input;
  const { varianceReduction: _choice, ...rest } = run;
  return { ...input, run: rest };
}

export const inputHash = (input: unknown) =>
  createHash('sha256')
    .update(canonicalJson(withoutEstimatorChoice(input)))
    .digest('hex');
