import { Router } from 'express';
import { z } from 'zod';
import { listQuerySchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { auditController } from './audit.controller';

const auditQuery = listQuerySchema.extend({
  action: z.string().max(60).optional(),
  actor: z.string().max(254).optional(),
  workstationId: z.coerce.number().int().positive().optional(),
});

export function auditRoutes(db: Db): Router {
  const c = auditController(db);
  const r = Router();
  r.get('/', requirePermission('audit:read'), validate({ query: auditQuery }), c.list);
  return r;
}
