import { parseScenario, type ScenarioInput } from '../../shared/schemas/scenario';
import { toJsonFriendly } from '../../shared/schemas/runs';
import { combineBatches, prepareScenario, runBatch } from '../../workers/engine/index';

// The real engine, in-process, as the browser would run it (just without workers).
export function runEngine(input: ScenarioInput) {
  const scenario = parseScenario(input);
  const prepared = prepareScenario(scenario);
  const batches = Array.from({ length: prepared.batches }, (_, k) => runBatch(prepared, k));
  return { scenario, result: toJsonFriendly(combineBatches(prepared, batches)) as Record<string, unknown> };
}
