import { Router } from 'express';
import type passport from 'passport';
import { loginSchema, setPasswordSchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { validate } from '../middleware/validate';
import { requireSignIn } from '../middleware/require-permission';
import { authController } from './auth.controller';
import { loginLimits } from './login-limits';

export function authRoutes(db: Db, pp: passport.Authenticator): Router {
  const c = authController(db, pp);
  const r = Router();
  r.post('/login', ...loginLimits(), validate({ body: loginSchema }), c.login);
  r.post('/logout', requireSignIn, c.logout);
  r.get('/me', c.me);
  r.post('/set-password', validate({ body: setPasswordSchema }), c.setPassword);
  return r;
}
