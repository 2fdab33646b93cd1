import { captureCheck } from '../physics/capture-verdict';
import type { JudgeOptions } from './judge-run';

type Judged = Parameters<typeof captureCheck>[0] & { worker?: { dayToDayGsd?: number } };

/** What a scenario adds to the verdict beyond the numbers: the hood's speed at the source and the worker's day-to-day GSD. */
export function judgeOptions(input: Judged): JudgeOptions {
  const captureVelocity = captureCheck(input)?.verdict;
  const gsd = input.worker?.dayToDayGsd;
  return { ...(captureVelocity ? { captureVelocity } : {}), ...(gsd !== undefined ? { gsd } : {}) };
}
