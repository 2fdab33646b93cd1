import type { AgentData } from '../schemas/workspace';
import type { JudgeLimit } from './judge-run';

/** The limit a dust agent's runs are judged against: its override when one is set with its reason, else the published 8-h limit. */
export function agentLimit(data: Pick<AgentData, 'limitFraction' | 'limit8h_mgPerM3' | 'override'>): JudgeLimit {
  return { fraction: data.limitFraction, value_mgPerM3: data.override?.limit8h_mgPerM3 ?? data.limit8h_mgPerM3 };
}
