import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseScenario, type Scenario } from '../../../shared/schemas/scenario';
import { runResultSchema, toJsonFriendly } from '../../../shared/schemas/runs';
import { roomDataSchema } from '../../../shared/schemas/workspace';
import { combineBatches, prepareScenario, runBatch, withBatchTallies } from '../../../workers/engine/index';
import type { Db } from '../knex';
import { placesService } from '../../places/places.service';
import { firstWorkstationId, hasAnySite, replaceOperators } from '../../places/places.repo';
import { firstWithRole } from '../../people/people.repo';
import { agentsService } from '../../agents/agents.service';
import { scenariosService } from '../../scenarios/scenarios.service';
import { runsService } from '../../scenarios/runs.service';
import { DEMO_AGENTS, DEMO_SITES } from './places';

const SCENARIO_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../shared/demo-scenarios');

export const loadDemoScenario = (file: string): Scenario =>
  parseScenario(JSON.parse(fs.readFileSync(path.join(SCENARIO_DIR, `${file}.json`), 'utf8')));

// The pure engine runs here in Node exactly as it runs in the browser's workers.
function simulate(scenario: Scenario) {
  const prepared = prepareScenario(scenario);
  const batches = Array.from({ length: prepared.batches }, (_, k) => runBatch(prepared, k));
  return runResultSchema.parse(toJsonFriendly(withBatchTallies(prepared, combineBatches(prepared, batches), batches)));
}

export async function seedDemoWorkspace(
  db: Db,
  actor: { id: number; email: string },
  opts: { particles?: number; log?: (s: string) => void } = {},
) {
  if (await hasAnySite(db)) return false;
  const agentIds: Record<string, number> = {};
  for (const [key, agent] of Object.entries(DEMO_AGENTS)) agentIds[key] = (await agentsService.create(db, actor, agent)).id;
  for (const place of DEMO_SITES) {
    const scenarios = place.files.map(loadDemoScenario);
    const base = scenarios[0];
    const site = await placesService.createSite(db, actor, place.site);
    const { length_m, width_m, height_m, airChanges_perH, draftSpeed_mPerS, draftDirection_deg, temperature_K } = base.room;
    const room = await placesService.createRoom(db, actor, {
      siteId: site.id,
      name: place.room,
      data: roomDataSchema.parse({ length_m, width_m, height_m, airChanges_perH, draftSpeed_mPerS, draftDirection_deg, temperature_K }),
    });
    const ws = await placesService.createWorkstation(db, actor, {
      roomId: room.id,
      name: place.workstation.name,
      data: {
        description: place.workstation.description,
        source: { x_m: base.source.x_m, y_m: base.source.y_m, z_m: base.source.z_m },
        worker: { x_m: base.worker.x_m, y_m: base.worker.y_m, z_m: base.worker.z_m, posture: base.worker.posture ?? 'standing' },
        releaseType: place.workstation.releaseType,
      },
    });
    for (const scenario of scenarios) {
      const input = opts.particles ? { ...scenario, run: { ...scenario.run, particles: opts.particles } } : scenario;
      const hood = input.hoods[0];
      const created = await scenariosService.create(db, actor, {
        workstationId: ws.id,
        agentId: agentIds[place.agent],
        sizeProfileId: null,
        name: (input.name ?? 'Option')
          .split(': ')
          .pop()!
          .replace(/^./, (c) => c.toUpperCase()),
        controlDescription: hood
          ? `${hood.name ?? hood.kind}, ${Math.round(hood.airflow_m3PerS * 3600)} m³/h`
          : 'No local exhaust; general ventilation only',
        controlTier: hood ? 'engineering' : 'none',
        input,
      });
      const t0 = Date.now();
      await runsService.storeComputedRun(db, actor, created.id, input, simulate(input));
      opts.log?.(
        `  ran "${created.name}" at ${place.workstation.name} (${input.run.particles} particles, ${((Date.now() - t0) / 1000).toFixed(1)} s)`,
      );
    }
  }
  const operator = await firstWithRole(db, 'operator');
  const benchId = await firstWorkstationId(db);
  if (operator && benchId !== undefined) await replaceOperators(db, benchId, [operator.id]);
  return true;
}
