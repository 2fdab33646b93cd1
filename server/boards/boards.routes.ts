import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { assertMayReadBoard, boardWorkstationIds } from './board-policy';
import { stationBoard } from './board.service';

const params = z.object({ workstationId: z.coerce.number().int().positive() });

export function boardsRoutes(db: Db): Router {
  const r = Router();
  r.get('/', requirePermission('boards:read-own'), async (req, res) => {
    const ids = await boardWorkstationIds(db, req.user!);
    res.json({ items: await Promise.all(ids.map((id) => stationBoard(db, id))) });
  });
  r.get('/:workstationId', requirePermission('boards:read-own'), validate({ params }), async (req, res) => {
    const id = Number(req.params.workstationId);
    await assertMayReadBoard(db, req.user!, id);
    res.json(await stationBoard(db, id));
  });
  return r;
}
