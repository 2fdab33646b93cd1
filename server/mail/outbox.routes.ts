import { Router } from 'express';
import { listQuerySchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { outboxController } from './outbox.controller';

export function outboxRoutes(db: Db): Router {
  const c = outboxController(db);
  const r = Router();
  r.get('/', requirePermission('outbox:read'), validate({ query: listQuerySchema }), c.list);
  return r;
}
