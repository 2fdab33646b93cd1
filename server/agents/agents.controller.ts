import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { agentsService } from './agents.service';

export function agentsController(db: Db) {
  const id = (req: Request) => Number(req.params.id);
  return {
    async list(_req: Request, res: Response) {
      res.json({ items: await agentsService.list(db) });
    },
    async get(req: Request, res: Response) {
      res.json(await agentsService.get(db, id(req)));
    },
    async create(req: Request, res: Response) {
      res.status(201).json(await agentsService.create(db, req.user!, req.body));
    },
    async update(req: Request, res: Response) {
      res.json(await agentsService.update(db, req.user!, id(req), req.body));
    },
  };
}
