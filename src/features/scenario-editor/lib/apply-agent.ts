import type { ScenarioInput } from '../../../../shared/schemas/scenario';

export interface AgentData {
  density_kgPerM3: number;
  shapeFactor: number;
  limitFraction: 'inhalable' | 'thoracic' | 'respirable';
  limit8h_mgPerM3: number;
  limit15min_mgPerM3: number | null;
  override: { limit8h_mgPerM3: number; reason: string } | null;
  jurisdiction: string;
  limitSource: string;
}
export interface AgentOption {
  id: number;
  name: string;
  data: AgentData;
}

// The override is the team's own decision, so it replaces the published 8-h value and says why.
export function limitFromAgent(data: AgentData): NonNullable<ScenarioInput['limit']> {
  const published = `${data.jurisdiction}: ${data.limitSource}`;
  return {
    fraction: data.limitFraction,
    value_mgPerM3: data.override?.limit8h_mgPerM3 ?? data.limit8h_mgPerM3,
    ...(data.limit15min_mgPerM3 !== null ? { shortTerm_mgPerM3: data.limit15min_mgPerM3 } : {}),
    source: data.override ? `${published}; overridden: ${data.override.reason}` : published,
  };
}

export function applyAgent(value: ScenarioInput, agent: AgentOption): ScenarioInput {
  return {
    ...value,
    dust: { ...value.dust, name: agent.name, density_kgPerM3: agent.data.density_kgPerM3, shapeFactor: agent.data.shapeFactor },
    limit: limitFromAgent(agent.data),
  };
}
