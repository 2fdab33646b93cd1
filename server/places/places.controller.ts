import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { placesService } from './places.service';

export function placesController(db: Db) {
  const id = (req: Request) => Number(req.params.id);
  const remove = (kind: 'site' | 'room' | 'workstation') => async (req: Request, res: Response) => {
    await placesService.remove(db, req.user!, kind, id(req));
    res.status(204).end();
  };
  return {
    async tree(_req: Request, res: Response) {
      res.json({ items: await placesService.tree(db) });
    },
    async createSite(req: Request, res: Response) {
      res.status(201).json(await placesService.createSite(db, req.user!, req.body));
    },
    async updateSite(req: Request, res: Response) {
      res.json(await placesService.updateSite(db, req.user!, id(req), req.body));
    },
    async createRoom(req: Request, res: Response) {
      res.status(201).json(await placesService.createRoom(db, req.user!, req.body));
    },
    async updateRoom(req: Request, res: Response) {
      res.json(await placesService.updateRoom(db, req.user!, id(req), req.body));
    },
    async getWorkstation(req: Request, res: Response) {
      res.json(await placesService.getWorkstation(db, id(req)));
    },
    async createWorkstation(req: Request, res: Response) {
      res.status(201).json(await placesService.createWorkstation(db, req.user!, req.body));
    },
    async updateWorkstation(req: Request, res: Response) {
      res.json(await placesService.updateWorkstation(db, req.user!, id(req), req.body));
    },
    removeSite: remove('site'),
    removeRoom: remove('room'),
    removeWorkstation: remove('workstation'),
  };
}
