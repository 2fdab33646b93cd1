export { agentLimit } from './agent-limit';
export { DAY_TO_DAY_GSD_SOURCE, DEFAULT_DAY_TO_DAY_GSD, dailyP95 } from './day-to-day';
export {
  type CaptureVelocityVerdict,
  type JudgeLimit,
  type JudgeOptions,
  judgeRun,
  type RunNumbers,
  type ShortTermVerdict,
  type Verdict,
} from './judge-run';
export { judgeResult, limitBlock, withVerdict } from './judge-result';
export { checkZoneHistories, MIN_ZONE_HISTORIES } from './zone-histories';
export { judgeOptions } from './judge-options';
