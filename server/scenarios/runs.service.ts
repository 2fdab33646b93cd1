import { randomBytes, randomInt } from 'node:crypto';
import type { RunResult } from '../../shared/schemas/run-result';
import { parseRunResult } from '../../shared/schemas/run-result-stored';
import type { RunCreate, RunTicket } from '../../shared/schemas/runs';
import type { Scenario } from '../../shared/schemas/scenario';
import type { SavedRun } from '../../shared/schemas/workspace-views';
import { judgeOptions, withVerdict } from '../../shared/verdict/index';
import { ENGINE_VERSION } from '../../workers/engine/index';
import { auditOf, type Actor } from '../audit/audit.repo';
import { withTransaction, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { inputHash } from '../lib/hash';
import { replayRun, REPLAY_SAMPLE, type ReplayOutcome } from '../verdicts/replay-run';
import { currentLimit } from '../verdicts/run-verdict';
import { verdictNumbers } from '../verdicts/verdict-numbers';
import { claimTicket, findTicket, insertTicket, linkTicketToRun } from './run-tickets.repo';
import { findRun, insertRun } from './runs.repo';
import { findScenario, scenarioLimitSource } from './scenarios.repo';
import { getRun } from './scenarios.service';
import { packResult } from './stored-result';

const auditScenario = auditOf('scenario');

const engineMismatch = (theirs: string) =>
  new AppError(
    409,
    'engine_version',
    `This page ran engine ${theirs}; the server now runs engine ${ENGINE_VERSION}. Reload the page (the new engine loads with it) and run again.`,
  );

const notIssued = () =>
  new AppError(
    400,
    'seed_not_issued',
    "This run's seed was not issued by the server for this scenario. Start the run from the scenario's page, which asks for a run ticket first.",
  );

/** A fresh seed for one savable run of the scenario, good for one save. */
export async function issueRunTicket(db: Db, actor: Actor, scenarioId: number): Promise<RunTicket> {
  if (!(await findScenario(db, scenarioId))) throw notFound('Scenario');
  const ticket = randomBytes(16).toString('hex');
  const seed = randomInt(1, 2 ** 31);
  await insertTicket(db, { ticket, scenarioId, seed: String(seed), engineVersion: ENGINE_VERSION, issuedTo: actor.id });
  return { ticket, seed, engineVersion: ENGINE_VERSION };
}

/** An audit entry for every replay that disagrees: someone's numbers did not come from the engine they name. */
export async function auditReplayMismatch(
  db: Db,
  actor: Actor,
  scenarioId: number,
  stage: 'save' | 'approval',
  seed: string,
  outcome: Extract<ReplayOutcome, { ok: false }>,
  runId?: number,
): Promise<AppError> {
  await auditScenario(db, actor, 'run.replay_mismatch', scenarioId, {
    stage,
    ...(runId ? { runId } : {}),
    seed,
    replayedBatches: outcome.replayed,
    problems: outcome.problems.slice(0, 10),
  });
  return new AppError(
    422,
    'replay_mismatch',
    `The server re-ran this run's batches and they do not agree with what was uploaded: ${outcome.problems.slice(0, 3).join('; ')}.`,
  );
}

type Verified = { input: Scenario; result: RunResult; ticket?: string; replay: { batches: number[]; seconds: number } | null };

async function storeRun(db: Db, actor: Actor, scenarioId: number, run: Verified): Promise<SavedRun> {
  const runId = await withTransaction(db, async (trx) => {
    const current = await findScenario(trx, scenarioId);
    if (!current) throw notFound('Scenario');
    // Whatever verdict the client sent is dropped: the server judges from the numbers and today's limit.
    const source = await scenarioLimitSource(trx, scenarioId);
    const limit = currentLimit(source?.agentData ?? null, current.input);
    const result = withVerdict(run.result, limit, judgeOptions(run.input));
    const verdict = result.limit ?? null;
    const summary = run.result.breathingZone.fractions[verdict?.fraction ?? 'respirable'];
    // The run is of the stored scenario with the ticket's seed in place of its own.
    const asStored = { ...run.input, run: { ...run.input.run, seed: (current.input as Scenario).run.seed } };
    const newId = await insertRun(trx, {
      scenarioId,
      seed: String(run.result.engine.seed),
      engineVersion: run.result.engine.version,
      inputHash: inputHash(asStored),
      particles: run.result.engine.particles,
      limitFraction: verdict?.fraction ?? null,
      twa8h_mgPerM3: summary.twa8h_mgPerM3,
      twa8hCi95_mgPerM3: [summary.twa8hCi95_mgPerM3[0], summary.twa8hCi95_mgPerM3[1]],
      respirableTwa8h_mgPerM3: run.result.breathingZone.fractions.respirable.twa8h_mgPerM3,
      percentOfLimit: verdict?.percentOfLimit ?? null,
      ratingCategory: verdict?.ratingCategory ?? null,
      banner: verdict?.banner ?? null,
      verdictNumbers: verdictNumbers(run.result, run.input),
      input: run.input,
      resultGz: packResult(result),
      createdBy: actor.id,
    });
    if (run.ticket) await linkTicketToRun(trx, run.ticket, newId);
    await auditScenario(trx, actor, 'run.saved', scenarioId, {
      runId: newId,
      particles: run.result.engine.particles,
      seed: String(run.result.engine.seed),
      ...(run.replay ? { replayedBatches: run.replay.batches, replaySeconds: Number(run.replay.seconds.toFixed(2)) } : {}),
    });
    return newId;
  });
  return getRun(db, runId);
}

export const runsService = {
  issueRunTicket,

  /**
   * A browser's run is stored only with an unused ticket of this scenario whose seed it ran, from
   * the engine the server runs, within the size bound, and after a sample of its batches, replayed
   * here, matched its uploaded tallies bit for bit.
   */
  async saveRun(db: Db, actor: Actor, scenarioId: number, run: RunCreate): Promise<SavedRun> {
    if (!(await findScenario(db, scenarioId))) throw notFound('Scenario');
    const ticket = await findTicket(db, run.ticket);
    if (!ticket || ticket.scenarioId !== scenarioId) throw notIssued();
    if (ticket.usedAt)
      throw new AppError(409, 'ticket_used', 'This run ticket was already used for a save. Run the scenario again to save a new run.');
    if (run.result.engine.version !== ENGINE_VERSION) throw engineMismatch(run.result.engine.version);
    if (ticket.engineVersion !== ENGINE_VERSION) throw engineMismatch(ticket.engineVersion);
    if (String(run.input.run.seed) !== ticket.seed || String(run.result.engine.seed) !== ticket.seed) throw notIssued();
    packResult(run.result);
    if (!(await claimTicket(db, run.ticket)))
      throw new AppError(409, 'ticket_used', 'This run ticket was already used for a save. Run the scenario again to save a new run.');
    const outcome = await replayRun(run.input, run.result, REPLAY_SAMPLE);
    if (!outcome.ok) throw await auditReplayMismatch(db, actor, scenarioId, 'save', ticket.seed, outcome);
    return storeRun(db, actor, scenarioId, {
      input: run.input,
      result: run.result,
      ticket: run.ticket,
      replay: { batches: outcome.replayed, seconds: outcome.seconds },
    });
  },

  /**
   * Approval replays every batch of the run: the approved control's numbers are the engine's,
   * whatever the sample at save time missed. A run of another engine version or from before
   * replay checks cannot be vouched for and must be run again.
   */
  async replayWholeRun(db: Db, actor: Actor, scenarioId: number, runId: number): Promise<void> {
    const run = await findRun(db, runId);
    if (!run || run.scenarioId !== scenarioId) return;
    const result = parseRunResult(run.result);
    if (result.engine.version !== ENGINE_VERSION)
      throw new AppError(
        409,
        'engine_version',
        `This run came from engine ${result.engine.version}; the server runs engine ${ENGINE_VERSION} and cannot replay it. Run the scenario again and save the run before approving.`,
      );
    if (!result.batchTallies?.length)
      throw new AppError(
        409,
        'not_replayable',
        'This run was saved before runs carried their batch tallies, so the server cannot replay it. Run the scenario again and save the run before approving.',
      );
    const outcome = await replayRun(run.input, result, null);
    if (!outcome.ok) throw await auditReplayMismatch(db, actor, scenarioId, 'approval', run.seed, outcome, runId);
  },

  /** A run the server computed itself (the demo workspace): nothing to replay. */
  storeComputedRun(db: Db, actor: Actor, scenarioId: number, input: Scenario, result: RunResult): Promise<SavedRun> {
    return storeRun(db, actor, scenarioId, { input, result, replay: null });
  },
};
