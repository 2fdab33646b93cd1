import type { Banner, StationBoard } from '../../shared/schemas/workspace-views';
import type { Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { currentApproval } from '../approvals/approvals.repo';
import { workstations } from '../places/places.repo';
import { findScenario } from '../scenarios/scenarios.repo';

// Operators get a banner they can act on: no valid assessment counts as Act, a stale one at least as Watch.
function boardBanner(a: Awaited<ReturnType<typeof currentApproval>>): Banner {
  if (!a || a.expired || !a.banner) return 'act';
  if ((a.outOfDate || a.engineChanged) && a.banner === 'clear') return 'watch';
  return a.banner;
}

function hoodDistance_m(input: {
  source: { x_m: number; y_m: number; z_m: number };
  hoods: { x_m: number; y_m: number; z_m: number }[];
}): number | null {
  const d = input.hoods.map((h) => Math.hypot(h.x_m - input.source.x_m, h.y_m - input.source.y_m, h.z_m - input.source.z_m));
  return d.length ? Math.min(...d) : null;
}

function advice(banner: Banner, distance_cm: number | null, reason: string | null): string[] {
  const distance = distance_cm
    ? `Keep the work within ${distance_cm} cm of the hood face (the marked zone).`
    : 'Keep the work where the assessment assumed it.';
  if (banner === 'act') {
    return [
      reason ?? 'The dust controls here are not confirmed to work.',
      'Do not start dusty work at this station until your supervisor says the controls are fixed or re-assessed.',
      'Wear the respiratory protection you were issued if you are told to continue.',
      'Report it to your supervisor now.',
    ];
  }
  const base = [
    'Switch the hood on before you start, and leave it on until the dust has cleared.',
    distance,
    'If the airflow indicator shows low or no flow, stop and report it.',
  ];
  return banner === 'watch'
    ? [
        ...base,
        'Exposure here is close to the limit: follow these rules exactly and report any change in the job, the material or the layout.',
      ]
    : base;
}

export async function stationBoard(db: Db, workstationId: number): Promise<StationBoard> {
  const ws = await workstations.get(db, workstationId);
  if (!ws) throw notFound('Workstation');
  const approval = await currentApproval(db, workstationId);
  const banner = boardBanner(approval);
  let distance_cm: number | null = null;
  if (approval) {
    const s = await findScenario(db, approval.scenarioId, { includeDeleted: true });
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
    advice: advice(banner, distance_cm, reason),
    checkedAt: new Date().toISOString(),
  };
}
