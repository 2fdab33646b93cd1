import { randomBytes } from 'node:crypto';
import type { NextFunction, Request, Response } from 'express';
import type passport from 'passport';
import type { Db } from '../db/knex';
import { AppError } from '../lib/app-error';
import { setPasswordWithToken } from '../people/people.service';
import type { AccountDelay } from './account-delay';
import { recordFailedSignIn, recordSignIn, recordSignOut } from './auth.service';

const WRONG = 'The e-mail or password is not right';

export function authController(db: Db, pp: passport.Authenticator, delay: AccountDelay) {
  return {
    login(req: Request, res: Response, next: NextFunction) {
      pp.authenticate('local', async (err: unknown, user: Express.User | false) => {
        try {
          if (err) return next(err);
          if (!user) {
            delay.failed(req.body.email);
            await recordFailedSignIn(db, req.body.email);
            return next(new AppError(401, 'invalid_credentials', WRONG));
          }
          // passport regenerates the session id at login, which defeats session fixation.
          req.login(user, (loginErr) => {
            if (loginErr) return next(loginErr);
            delay.succeeded(req.body.email);
            req.session.signedInAt = Date.now();
            req.session.csrfToken = randomBytes(24).toString('base64url');
            recordSignIn(db, user).then(() => res.json({ user, csrfToken: req.session.csrfToken }), next);
          });
        } catch (e) {
          next(e);
        }
      })(req, res, next);
    },
    logout(req: Request, res: Response, next: NextFunction) {
      const user = req.user;
      req.logout((err) => {
        if (err) return next(err);
        req.session.destroy(async () => {
          if (user) await recordSignOut(db, user);
          res.clearCookie('motewalk.sid');
          res.status(204).end();
        });
      });
    },
    me(req: Request, res: Response) {
      if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in to continue');
      if (!req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
      res.json({ user: req.user, csrfToken: req.session.csrfToken });
    },
    async setPassword(req: Request, res: Response) {
      const email = await setPasswordWithToken(db, req.body.token, req.body.password);
      res.json({ email });
    },
  };
}
