import type { AgentData } from '../../shared/schemas/workspace';
import { jsonTable } from '../db/json-table';

export const agents = jsonTable<AgentData>('dust_agents');

// The override, when set with its reason, is the limit every result is judged against.
export const effectiveLimit = (data: AgentData) => data.override?.limit8h_mgPerM3 ?? data.limit8h_mgPerM3;
