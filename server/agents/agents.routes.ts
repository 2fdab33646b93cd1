import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import { agentInputSchema, agentUpdateSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { agentsController } from './agents.controller';

export function agentsRoutes(db: Db): Router {
  const c = agentsController(db);
  const r = Router();
  r.get('/', requirePermission('scenarios:read'), c.list);
  r.get('/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.get);
  r.post('/', requirePermission('scenarios:write'), validate({ body: agentInputSchema }), c.create);
  r.put('/:id', requirePermission('scenarios:write'), validate({ params: idParamSchema, body: agentUpdateSchema }), c.update);
  return r;
}
