import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { listOutbox } from './outbox.repo';

export function outboxController(db: Db) {
  return {
    async list(req: Request, res: Response) {
      res.json(await listOutbox(db, req.query as unknown as { page: number; pageSize: number }));
    },
  };
}
