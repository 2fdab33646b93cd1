import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import { approveSchema, assignOperatorsSchema, shareSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import { baseUrl } from '../lib/base-url';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { approveScenario } from './approvals.service';
import { assignOperators, shareReport } from './decisions.service';

export function decisionsRoutes(db: Db, mailer: Mailer, publicUrl?: string): Router {
  const r = Router();
  r.post('/scenarios/:id/approve', requirePermission('scenarios:approve'), validate({ params: idParamSchema, body: approveSchema }), async (req, res) => {
    res.status(201).json(await approveScenario(db, req.user!, Number(req.params.id), req.body));
  });
  r.post('/scenarios/:id/share', requirePermission('reports:share'), validate({ params: idParamSchema, body: shareSchema }), async (req, res) => {
    await shareReport(db, mailer, req.user!, Number(req.params.id), req.body, baseUrl(req, publicUrl));
    res.status(202).json({ sent: true });
  });
  r.put('/workstations/:id/operators', requirePermission('boards:assign'), validate({ params: idParamSchema, body: assignOperatorsSchema }), async (req, res) => {
    res.json(await assignOperators(db, req.user!, Number(req.params.id), req.body.personIds));
  });
  return r;
}
