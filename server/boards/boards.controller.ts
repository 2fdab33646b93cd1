import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { assertMayReadBoard, boardWorkstationIds } from './board-policy';
import { stationBoard } from './board.service';

export function boardsController(db: Db) {
  return {
    async list(req: Request, res: Response) {
      const ids = await boardWorkstationIds(db, req.user!);
      res.json({ items: await Promise.all(ids.map((id) => stationBoard(db, id))) });
    },
    async get(req: Request, res: Response) {
      const id = Number(req.params.workstationId);
      await assertMayReadBoard(db, req.user!, id);
      res.json(await stationBoard(db, id));
    },
  };
}
