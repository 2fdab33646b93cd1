import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import {
  roomInputSchema,
  roomUpdateSchema,
  siteInputSchema,
  siteUpdateSchema,
  workstationInputSchema,
  workstationUpdateSchema,
} from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { placesController } from './places.controller';

// Deletes are soft and refused while the place still holds live rooms, workstations or scenarios: a place's
// scenarios, runs and approvals are the record of how its exposure was judged, so they are never orphaned
// silently; the person deletes or moves what is inside first, and the 409 names it.
export function placesRoutes(db: Db): Router {
  const c = placesController(db);
  const write = requirePermission('scenarios:write');
  const r = Router();
  r.get('/sites', requirePermission('scenarios:read'), c.tree);
  r.post('/sites', write, validate({ body: siteInputSchema }), c.createSite);
  r.put('/sites/:id', write, validate({ params: idParamSchema, body: siteUpdateSchema }), c.updateSite);
  r.delete('/sites/:id', write, validate({ params: idParamSchema }), c.removeSite);
  r.post('/rooms', write, validate({ body: roomInputSchema }), c.createRoom);
  r.put('/rooms/:id', write, validate({ params: idParamSchema, body: roomUpdateSchema }), c.updateRoom);
  r.delete('/rooms/:id', write, validate({ params: idParamSchema }), c.removeRoom);
  r.get('/workstations/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.getWorkstation);
  r.post('/workstations', write, validate({ body: workstationInputSchema }), c.createWorkstation);
  r.put('/workstations/:id', write, validate({ params: idParamSchema, body: workstationUpdateSchema }), c.updateWorkstation);
  r.delete('/workstations/:id', write, validate({ params: idParamSchema }), c.removeWorkstation);
  return r;
}
