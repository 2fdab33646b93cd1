import type { Banner, StationBoard, WatchCause } from '../../shared/schemas/workspace-views';
import type { Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { currentApproval } from '../approvals/approvals.repo';
import { workstations } from '../places/places.repo';
import { findScenario } from '../scenarios/scenarios.repo';
import { boardAdvice } from './board-advice';

// Operators get a banner they can act on: no valid assessment counts as Act, a stale one at least as Watch.
function boardBanner(a: Awaited<ReturnType<typeof currentApproval>>): Banner {
  if (!a || a.expired || !a.banner) return 'act';
  if ((a.outOfDate || a.engineChanged) && a.banner === 'clear') return 'watch';
  return a.banner;
}

// A Clear held at Watch because the assessment went stale says so, not that exposure is near the limit.
function boardWatchCause(a: Awaited<ReturnType<typeof currentApproval>>, banner: Banner): WatchCause | null {
  if (banner !== 'watch' || !a) return null;
  return a.banner === 'clear' ? 'out-of-date' : (a.watchCause ?? 'near-limit');
}

function hoodDistance_m(input: {
  source: { x_m: number; y_m: number; z_m: number };
  hoods: { x_m: number; y_m: number; z_m: number }[];
}): number | null {
  const d = input.hoods.map((h) => Math.hypot(h.x_m - input.source.x_m, h.y_m - input.source.y_m, h.z_m - input.source.z_m));
  return d.length ? Math.min(...d) : null;
}

export async function stationBoard(db: Db, workstationId: number): Promise<StationBoard> {
  const ws = await workstations.get(db, workstationId);
  if (!ws) throw notFound('Workstation');
  const approval = await currentApproval(db, workstationId);
  const banner = boardBanner(approval);
  let distance_cm: number | null = null;
  let hasHood = true;
  if (approval) {
    const s = await findScenario(db, approval.scenarioId, { includeDeleted: true });
    if (s) hasHood = s.input.hoods.length > 0;
    const d = s ? hoodDistance_m(s.input) : null;
    distance_cm = d === null ? null : Math.round((d * 100) / 5) * 5;
  }
  const reason = !approval
    ? 'There is no approved assessment for this station.'
    : approval.expired
      ? `The assessment was due for review on ${approval.reviewDate}.`
      : approval.limitChanged
        ? 'The exposure limit for this dust changed after the assessment was approved: it is being checked again.'
        : null;
  return {
    workstationId,
    workstationName: ws.name,
    banner,
    needsReview: !approval || approval.needsReview,
    reviewDate: approval?.reviewDate ?? null,
    control: approval?.scenarioName ?? null,
    approvedAt: approval?.approvedAt ?? null,
    advice: boardAdvice(banner, distance_cm, reason, boardWatchCause(approval, banner), hasHood),
    watchCause: boardWatchCause(approval, banner),
    checkedAt: new Date().toISOString(),
  };
}
