import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import { approveSchema, assignOperatorsSchema, shareSchema } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import type { PublicUrl } from '../lib/base-url';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { shareMailLimit } from '../middleware/rate-limits';
import { decisionsController } from './decisions.controller';

export function decisionsRoutes(db: Db, mailer: Mailer, publicUrl: PublicUrl): Router {
  const c = decisionsController(db, mailer, publicUrl);
  const shareLimit = shareMailLimit();
  const r = Router();
  r.post(
    '/scenarios/:id/approve',
    requirePermission('scenarios:approve'),
    validate({ params: idParamSchema, body: approveSchema }),
    c.approve,
  );
  r.post(
    '/scenarios/:id/share',
    requirePermission('reports:share'),
    validate({ params: idParamSchema, body: shareSchema }),
    shareLimit,
    c.share,
  );
  r.put(
    '/workstations/:id/operators',
    requirePermission('boards:assign'),
    validate({ params: idParamSchema, body: assignOperatorsSchema }),
    c.assignOperators,
  );
  return r;
}
