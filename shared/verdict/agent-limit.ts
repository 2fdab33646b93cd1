import type { AgentData } from '../schemas/workspace';
import type { JudgeLimit } from './judge-run';

/** The limit a dust agent's runs are judged against: its override when one is set with its reason, else the published 8-h limit; the 15-min limit beside it. */
export function agentLimit(
  data: Pick<AgentData, 'limitFraction' | 'limit8h_mgPerM3' | 'override'> & { limit15min_mgPerM3?: number | null },
): JudgeLimit {
  const value_mgPerM3 = data.override?.limit8h_mgPerM3 ?? data.limit8h_mgPerM3;
  const shortTerm = data.limit15min_mgPerM3;
  return {
    fraction: data.limitFraction,
    value_mgPerM3,
    ...(typeof shortTerm === 'number' && shortTerm > 0 ? { shortTerm_mgPerM3: shortTerm } : {}),
  };
}
