import { Router } from 'express';
import { z } from 'zod';
import { listQuerySchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';

const auditQuery = listQuerySchema.extend({ action: z.string().max(60).optional(), actor: z.string().max(254).optional(), workstationId: z.coerce.number().int().positive().optional() });

export function auditRoutes(db: Db): Router {
  const r = Router();
  r.get('/', requirePermission('audit:read'), validate({ query: auditQuery }), async (req, res) => {
    const q = req.query as unknown as z.infer<typeof auditQuery>;
    const base = db('audit_log').modify((b) => {
      if (q.action) b.where('action', q.action);
      if (q.actor) b.where('actor_email', q.actor.toLowerCase());
      // A workstation's trail includes what happened to its scenarios.
      if (q.workstationId) {
        const id = q.workstationId;
        b.where((w) =>
          w
            .where({ target_type: 'workstation', target_id: String(id) })
            .orWhere((s) => s.where('target_type', 'scenario').whereIn('target_id', db('scenarios').where('workstation_id', id).select(db.raw('cast(id as text)')))),
        );
      }
    });
    const [{ count }] = await base.clone().count<{ count: number }[]>({ count: '*' });
    const rows = await base.clone().orderBy('id', 'desc').limit(q.pageSize).offset((q.page - 1) * q.pageSize);
    res.json({
      items: rows.map((a: Record<string, string | number | null>) => ({ id: a.id, actorEmail: a.actor_email, action: a.action, targetType: a.target_type, targetId: a.target_id, detail: a.detail ? JSON.parse(String(a.detail)) : null, createdAt: a.created_at })),
      total: Number(count),
      page: q.page,
      pageSize: q.pageSize,
    });
  });
  return r;
}
