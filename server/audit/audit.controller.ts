import type { Request, Response } from 'express';
import { can } from '../../shared/auth/permissions';
import type { Db } from '../db/knex';
import type { AuditQuery } from './audit.repo';
import { readAudit } from './audit.service';

export function auditController(db: Db) {
  return {
    async list(req: Request, res: Response) {
      // Those who may manage people already see their addresses; everyone else reads names.
      const emails = can(req.user?.role, 'people:manage');
      res.json(await readAudit(db, req.query as unknown as AuditQuery, emails));
    },
  };
}
