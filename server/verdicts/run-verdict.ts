import type { AgentData } from '../../shared/schemas/workspace';
import { agentLimit, type JudgeLimit, judgeRun, type Verdict } from '../../shared/verdict/index';
import type { VerdictNumbers } from './verdict-numbers';

type ScenarioLimit = { fraction: JudgeLimit['fraction']; value_mgPerM3: number; shortTerm_mgPerM3?: number };

const parse = <T>(text: unknown): T | null => (typeof text === 'string' && text ? (JSON.parse(text) as T) : null);

/**
 * The limit a run is judged against today: the agent's current one (its override when set), else the
 * scenario's own. Read from the stored columns, so a limit change re-judges without re-simulation.
 */
export function currentLimit(agentData: unknown, scenarioInput: unknown): JudgeLimit | null {
  const agent = typeof agentData === 'string' ? parse<AgentData>(agentData) : (agentData as AgentData | null);
  if (agent) return agentLimit(agent);
  const input =
    typeof scenarioInput === 'string'
      ? parse<{ limit?: ScenarioLimit }>(scenarioInput)
      : (scenarioInput as { limit?: ScenarioLimit } | null);
  if (!input?.limit) return null;
  const { fraction, value_mgPerM3, shortTerm_mgPerM3 } = input.limit;
  return { fraction, value_mgPerM3, ...(shortTerm_mgPerM3 !== undefined ? { shortTerm_mgPerM3 } : {}) };
}

/** The server's verdict on a stored run; null without a limit, or for a run whose numbers were never kept. */
export function judgeStored(numbersText: unknown, limit: JudgeLimit | null): Verdict | null {
  const numbers = parse<VerdictNumbers>(numbersText);
  if (!limit || !numbers) return null;
  const s = numbers.fractions[limit.fraction];
  return judgeRun(
    {
      twa8h_mgPerM3: s.twa8h_mgPerM3,
      twa8hCi95_mgPerM3: s.twa8hCi95_mgPerM3,
      zoneHistories: s.zoneHistories,
      histories: numbers.histories,
      peak15min_mgPerM3: s.peak15min_mgPerM3,
      peak15minCi95_mgPerM3: s.peak15minCi95_mgPerM3,
    },
    limit,
    { captureVelocity: numbers.captureVelocity, captureBasis: numbers.captureBasis, gsd: numbers.gsd },
  );
}

/** A stored run's judged figures, in the names the run lists use; the stored columns are only what the run was saved with. */
export function judgedRunFigures(row: Record<string, unknown>, limit: JudgeLimit | null) {
  const verdict = judgeStored(row.verdict_numbers, limit);
  const s = verdict ? parse<VerdictNumbers>(row.verdict_numbers)!.fractions[verdict.fraction] : null;
  return {
    verdict,
    limitFraction: verdict?.fraction ?? (row.limit_fraction as string | null) ?? null,
    twa8h_mgPerM3: s ? s.twa8h_mgPerM3 : ((row.twa8h_mgPerM3 as number | null) ?? null),
    twa8hCi95_mgPerM3: (s ? s.twa8hCi95_mgPerM3 : [row.twa8h_lo_mgPerM3 ?? null, row.twa8h_hi_mgPerM3 ?? null]) as [
      number | null,
      number | null,
    ],
  };
}
