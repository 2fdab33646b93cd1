import { Router } from 'express';
import type passport from 'passport';
import { loginSchema, setPasswordSchema } from '../../shared/schemas/auth';
import type { Db } from '../db/knex';
import { validate } from '../middleware/validate';
import { requireSignIn } from '../middleware/require-permission';
import { setPasswordLimit } from '../middleware/rate-limits';
import { authController } from './auth.controller';
import { accountDelay, DEFAULT_DELAY, type DelayPolicy } from './account-delay';
import { loginLimits, waitForAccount } from './login-limits';

export function authRoutes(db: Db, pp: passport.Authenticator, delayPolicy: DelayPolicy = DEFAULT_DELAY): Router {
  const delay = accountDelay(delayPolicy);
  const c = authController(db, pp, delay);
  const r = Router();
  r.post('/login', ...loginLimits(), validate({ body: loginSchema }), waitForAccount(delay), c.login);
  r.post('/logout', requireSignIn, c.logout);
  r.get('/me', c.me);
  r.post('/set-password', validate({ body: setPasswordSchema }), setPasswordLimit(), c.setPassword);
  return r;
}
