import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { listAudit, type AuditQuery } from './audit.repo';

export function auditController(db: Db) {
  return {
    async list(req: Request, res: Response) {
      res.json(await listAudit(db, req.query as unknown as AuditQuery));
    },
  };
}
