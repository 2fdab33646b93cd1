import { Router } from 'express';
import { z } from 'zod';
import { idParamSchema } from '../../shared/schemas/auth';
import { runCreateSchema, runTicketRequestSchema } from '../../shared/schemas/runs';
import { scenarioCreateSchema, scenarioListQuerySchema, scenarioUpdateSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { jsonBody } from '../middleware/json-body';
import { scenariosController } from './scenarios.controller';

const duplicateSchema = z.object({ name: z.string().trim().min(1).max(120).optional() }).strict();

// A saved run carries its series, maps and a trajectory sample: allow more than the default body
// limit, but not much more than a result that compresses to the 1 MB a stored run may keep.
const largeJson = jsonBody({ limit: '8mb' });

export function scenariosRoutes(db: Db): Router {
  const c = scenariosController(db);
  const r = Router();
  r.get('/', requirePermission('scenarios:read'), validate({ query: scenarioListQuerySchema }), c.list);
  r.post('/', requirePermission('scenarios:write'), validate({ body: scenarioCreateSchema }), c.create);
  r.get('/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.get);
  r.patch('/:id', requirePermission('scenarios:write'), validate({ params: idParamSchema, body: scenarioUpdateSchema }), c.update);
  r.delete('/:id', requirePermission('scenarios:write'), validate({ params: idParamSchema }), c.remove);
  r.post('/:id/duplicate', requirePermission('scenarios:write'), validate({ params: idParamSchema, body: duplicateSchema }), c.duplicate);
  r.post(
    '/:id/run-tickets',
    requirePermission('runs:write'),
    validate({ params: idParamSchema, body: runTicketRequestSchema }),
    c.issueTicket,
  );
  r.post('/:id/runs', requirePermission('runs:write'), largeJson, validate({ params: idParamSchema, body: runCreateSchema }), c.saveRun);
  return r;
}

export function runsRoutes(db: Db): Router {
  const c = scenariosController(db);
  const r = Router();
  r.get('/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.getRun);
  return r;
}
