import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { boardsController } from './boards.controller';

const params = z.object({ workstationId: z.coerce.number().int().positive() });

export function boardsRoutes(db: Db): Router {
  const c = boardsController(db);
  const r = Router();
  r.get('/', requirePermission('boards:read-own'), c.list);
  r.get('/:workstationId', requirePermission('boards:read-own'), validate({ params }), c.get);
  return r;
}
