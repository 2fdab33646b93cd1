import type { RequestHandler } from 'express';
import { can, type Permission } from '../../shared/auth/permissions';
import { forbidden, unauthenticated } from '../lib/app-error';

export const requireSignIn: RequestHandler = (req, _res, next) => {
  if (!req.user) throw unauthenticated();
  next();
};

export function requirePermission(permission: Permission): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    if (!can(req.user.role, permission)) throw forbidden();
    next();
  };
}
