import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { notFound } from '../lib/app-error';
import { currentApproval } from '../approvals/approvals.repo';
import { operatorIds, placesTree, rooms, workstations } from './places.repo';
import { placesService } from './places.service';

export function placesController(db: Db) {
  return {
    async tree(_req: Request, res: Response) {
      res.json({ items: await placesTree(db) });
    },
    async createSite(req: Request, res: Response) {
      res.status(201).json(await placesService.createSite(db, req.user!, req.body));
    },
    async createRoom(req: Request, res: Response) {
      res.status(201).json(await placesService.createRoom(db, req.user!, req.body));
    },
    async getWorkstation(req: Request, res: Response) {
      const ws = await workstations.get(db, Number(req.params.id));
      if (!ws) throw notFound('Workstation');
      const room = await rooms.get(db, ws.roomId as number);
      res.json({ ...ws, room, approval: await currentApproval(db, ws.id), operatorIds: await operatorIds(db, ws.id) });
    },
    async createWorkstation(req: Request, res: Response) {
      res.status(201).json(await placesService.createWorkstation(db, req.user!, req.body));
    },
    async updateWorkstation(req: Request, res: Response) {
      res.json(await placesService.updateWorkstation(db, req.user!, Number(req.params.id), req.body));
    },
  };
}
