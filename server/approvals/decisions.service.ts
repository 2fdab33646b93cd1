import { withTransaction, type Db } from '../db/knex';
import type { OperatorAssignment } from '../../shared/schemas/workspace-views';
import type { Mailer } from '../mail/mailer';
import { AppError, notFound } from '../lib/app-error';
import { auditOf } from '../audit/audit.repo';
import { replaceOperators, workstations } from '../places/places.repo';
import { rolesOf } from '../people/people.repo';
import { findRunOfScenario } from '../scenarios/runs.repo';
import { findScenario } from '../scenarios/scenarios.repo';

type Actor = { id: number; email: string; name?: string };

const auditScenario = auditOf('scenario');
const auditWorkstation = auditOf('workstation');

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

// The e-mail carries only the link and the scenario's name; the report itself stays behind sign-in.
export async function shareReport(
  db: Db,
  mailer: Mailer,
  actor: Actor,
  scenarioId: number,
  body: { email: string; runId?: number },
  base: string,
) {
  const scenario = await findScenario(db, scenarioId);
  if (!scenario) throw notFound('Scenario');
  if (body.runId && !(await findRunOfScenario(db, body.runId, scenarioId, { includeDeleted: true }))) {
    throw new AppError(400, 'invalid_input', 'That run does not belong to this scenario', [
      { path: 'body.runId', message: `No run ${body.runId} here` },
    ]);
  }
  const link = `${base}/reports/${scenarioId}${body.runId ? `?run=${body.runId}` : ''}`;
  const from = actor.name ?? actor.email;
  await mailer.send({
    to: body.email,
    subject: `Motewalk report: ${scenario.name}`,
    text: `${from} shared a Motewalk report with you: ${scenario.name}\n\nOpen it here (sign-in required):\n${link}\n`,
    html: `<p>${escape(from)} shared a Motewalk report with you: <strong>${escape(scenario.name)}</strong></p><p><a href="${escape(link)}">Open the report</a> (sign-in required)</p>`,
  });
  await auditScenario(db, actor, 'report.shared', scenarioId, { to: body.email, runId: body.runId ?? null });
}

export async function assignOperators(db: Db, actor: Actor, workstationId: number, personIds: number[]): Promise<OperatorAssignment> {
  if (!(await workstations.get(db, workstationId))) throw notFound('Workstation');
  const people = await rolesOf(db, personIds);
  const bad = personIds.filter((id) => !people.some((p) => p.id === id && p.role === 'operator'));
  if (bad.length)
    throw new AppError(
      400,
      'invalid_input',
      'Only operators can be assigned to a station',
      bad.map((id) => ({ path: 'body.personIds', message: `Person ${id} is not an operator` })),
    );
  await withTransaction(db, async (trx) => {
    await replaceOperators(trx, workstationId, personIds);
    await auditWorkstation(trx, actor, 'workstation.operators_assigned', workstationId, { personIds });
  });
  return { workstationId, personIds };
}
