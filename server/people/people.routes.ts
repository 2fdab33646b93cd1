import { Router } from 'express';
import { idParamSchema, inviteSchema, listQuerySchema, updatePersonSchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import type { PublicUrl } from '../lib/base-url';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { peopleController } from './people.controller';

export function peopleRoutes(db: Db, mailer: Mailer, publicUrl: PublicUrl): Router {
  const c = peopleController(db, mailer, publicUrl);
  const r = Router();
  r.get('/', requirePermission('people:manage'), validate({ query: listQuerySchema }), c.list);
  r.post('/', requirePermission('people:manage'), validate({ body: inviteSchema }), c.invite);
  r.patch('/:id', requirePermission('people:manage'), validate({ params: idParamSchema, body: updatePersonSchema }), c.update);
  r.post('/:id/password-link', requirePermission('people:manage'), validate({ params: idParamSchema }), c.resetLink);
  return r;
}
