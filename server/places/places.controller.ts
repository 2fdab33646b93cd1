import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import { placesService } from './places.service';

export function placesController(db: Db) {
  return {
    async tree(_req: Request, res: Response) {
      res.json({ items: await placesService.tree(db) });
    },
    async createSite(req: Request, res: Response) {
      res.status(201).json(await placesService.createSite(db, req.user!, req.body));
    },
    async createRoom(req: Request, res: Response) {
      res.status(201).json(await placesService.createRoom(db, req.user!, req.body));
    },
    async getWorkstation(req: Request, res: Response) {
      res.json(await placesService.getWorkstation(db, Number(req.params.id)));
    },
    async createWorkstation(req: Request, res: Response) {
      res.status(201).json(await placesService.createWorkstation(db, req.user!, req.body));
    },
    async updateWorkstation(req: Request, res: Response) {
      res.json(await placesService.updateWorkstation(db, req.user!, Number(req.params.id), req.body));
    },
  };
}
