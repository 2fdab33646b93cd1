import type { Agent, Response } from 'supertest';
import { parseScenario, type ScenarioInput } from '../../shared/schemas/scenario';
import { toJsonFriendly } from '../../shared/schemas/runs';
import { combineBatches, prepareScenario, runBatch, withBatchTallies } from '../../workers/engine/index';

// The real engine, in-process, as the browser would run it (just without workers), with the
// per-batch tallies the browser uploads.
export function runEngine(input: ScenarioInput) {
  const scenario = parseScenario(input);
  const prepared = prepareScenario(scenario);
  const batches = Array.from({ length: prepared.batches }, (_, k) => runBatch(prepared, k));
  return {
    scenario,
    result: toJsonFriendly(withBatchTallies(prepared, combineBatches(prepared, batches), batches)) as Record<string, unknown>,
  };
}

/** What the run panel does: ask for a run ticket, run with its seed; the body to save is returned, not sent. */
export async function ticketedRun(agent: Agent, scenarioId: number, input: ScenarioInput, scenarioVersion = 1) {
  const issued = await agent.post(`/api/scenarios/${scenarioId}/run-tickets`).send({});
  if (issued.status !== 201) throw new Error(`run ticket refused: ${issued.status} ${JSON.stringify(issued.body)}`);
  const run = runEngine({ ...input, run: { ...(input.run ?? {}), seed: issued.body.seed } } as ScenarioInput);
  return { ...run, body: { scenarioVersion, ticket: issued.body.ticket as string, input: run.scenario, result: run.result } };
}

/** Ticket, run and save in one go; answers the save's response. */
export async function saveTicketedRun(agent: Agent, scenarioId: number, input: ScenarioInput, scenarioVersion = 1): Promise<Response> {
  const { body } = await ticketedRun(agent, scenarioId, input, scenarioVersion);
  return agent.post(`/api/scenarios/${scenarioId}/runs`).send(body);
}

/**
 * The stone-bench demo options are Act since engine 2.0 (the grinder's induced jet beats both
 * hoods), so approval tests first make an option approvable: the same hood at a low-energy
 * release with no jet, which its 0.47–0.58 m/s reaches (ACGIH 0.5–1.0 m/s, not below half), run
 * with `particles` and saved, with any further `changes` to the input (a worker standing nearer, say).
 * Answers the scenario's new version and the saved run's response.
 */
export async function saveLowEnergyRun(agent: Agent, scenarioId: number, particles: number, changes: Partial<ScenarioInput> = {}) {
  const detail = (await agent.get(`/api/scenarios/${scenarioId}`)).body;
  const { jet: _jet, ...source } = detail.input.source;
  const input = { ...detail.input, ...changes, source: { ...source, releaseType: 'low' }, run: { ...detail.input.run, particles } };
  const edited = await agent.patch(`/api/scenarios/${scenarioId}`).send({ version: detail.version, input });
  if (edited.status !== 200) throw new Error(`edit refused: ${edited.status} ${JSON.stringify(edited.body)}`);
  const saved = await saveTicketedRun(agent, scenarioId, input, edited.body.version);
  if (saved.status !== 201) throw new Error(`run refused: ${saved.status} ${JSON.stringify(saved.body)}`);
  return { version: edited.body.version as number, run: saved };
}
