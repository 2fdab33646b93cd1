import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import { roomInputSchema, siteInputSchema, workstationInputSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { placesController } from './places.controller';

export function placesRoutes(db: Db): Router {
  const c = placesController(db);
  const r = Router();
  r.get('/sites', requirePermission('scenarios:read'), c.tree);
  r.post('/sites', requirePermission('scenarios:write'), validate({ body: siteInputSchema }), c.createSite);
  r.post('/rooms', requirePermission('scenarios:write'), validate({ body: roomInputSchema }), c.createRoom);
  r.get('/workstations/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.getWorkstation);
  r.post('/workstations', requirePermission('scenarios:write'), validate({ body: workstationInputSchema }), c.createWorkstation);
  r.put(
    '/workstations/:id',
    requirePermission('scenarios:write'),
    validate({ params: idParamSchema, body: workstationInputSchema.omit({ roomId: true }) }),
    c.updateWorkstation,
  );
  return r;
}
