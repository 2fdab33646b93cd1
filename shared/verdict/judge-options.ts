import { captureCheck } from '../physics/capture-verdict';
import type { JudgeOptions } from './judge-run';

type Judged = Parameters<typeof captureCheck>[0] & { worker?: { dayToDayGsd?: number } };

/**
 * What a scenario adds to the verdict beyond the numbers: the hood's speed at the source (a downdraft bench's face
 * velocity over its work surface) and the worker's day-to-day GSD.
 */
export function judgeOptions(input: Judged): JudgeOptions {
  const check = captureCheck(input);
  const captureVelocity = check?.verdict;
  const gsd = input.worker?.dayToDayGsd;
  return {
    ...(captureVelocity ? { captureVelocity } : {}),
    ...(check?.basis === 'face-velocity' ? { captureBasis: 'face-velocity' as const } : {}),
    ...(gsd !== undefined ? { gsd } : {}),
  };
}
