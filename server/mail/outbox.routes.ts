import { Router } from 'express';
import { listQuerySchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';

export function outboxRoutes(db: Db): Router {
  const r = Router();
  r.get('/', requirePermission('outbox:read'), validate({ query: listQuerySchema }), async (req, res) => {
    const q = req.query as unknown as { page: number; pageSize: number };
    const [{ count }] = await db('outbox').count<{ count: number }[]>({ count: '*' });
    const rows = await db('outbox').orderBy('id', 'desc').limit(q.pageSize).offset((q.page - 1) * q.pageSize);
    res.json({
      items: rows.map((m) => ({ id: m.id, to: m.to_address, subject: m.subject, text: m.text_body, html: m.html_body, createdAt: m.created_at })),
      total: Number(count),
      page: q.page,
      pageSize: q.pageSize,
    });
  });
  return r;
}
