import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import { agentInputSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { agents } from './agents.repo';
import { agentsService } from './agents.service';

export function agentsRoutes(db: Db): Router {
  const r = Router();
  r.get('/', requirePermission('scenarios:read'), async (_req, res) => {
    res.json({ items: await agents.list(db) });
  });
  r.get('/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), async (req, res) => {
    const agent = await agents.get(db, Number(req.params.id));
    if (!agent) throw notFound('Dust agent');
    res.json(agent);
  });
  r.post('/', requirePermission('scenarios:write'), validate({ body: agentInputSchema }), async (req, res) => {
    res.status(201).json(await agentsService.create(db, req.user!, req.body));
  });
  r.put('/:id', requirePermission('scenarios:write'), validate({ params: idParamSchema, body: agentInputSchema }), async (req, res) => {
    res.json(await agentsService.update(db, req.user!, Number(req.params.id), req.body));
  });
  return r;
}
