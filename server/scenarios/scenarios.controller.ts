import type { Request, Response } from 'express';
import type { ScenarioListQuery } from '../../shared/schemas/workspace';
import type { Db } from '../db/knex';
import { runsService } from './runs.service';
import { getRun, getScenario, listScenariosForReview, scenariosService } from './scenarios.service';

export function scenariosController(db: Db) {
  const id = (req: Request) => Number(req.params.id);
  return {
    async list(req: Request, res: Response) {
      res.json(await listScenariosForReview(db, req.query as unknown as ScenarioListQuery));
    },
    async get(req: Request, res: Response) {
      res.json(await getScenario(db, id(req)));
    },
    async create(req: Request, res: Response) {
      res.status(201).json(await scenariosService.create(db, req.user!, req.body));
    },
    async update(req: Request, res: Response) {
      res.json(await scenariosService.update(db, req.user!, id(req), req.body));
    },
    async remove(req: Request, res: Response) {
      await scenariosService.remove(db, req.user!, id(req));
      res.status(204).end();
    },
    async duplicate(req: Request, res: Response) {
      res.status(201).json(await scenariosService.duplicate(db, req.user!, id(req), req.body.name));
    },
    async saveRun(req: Request, res: Response) {
      res.status(201).json(await runsService.saveRun(db, req.user!, id(req), req.body));
    },
    async issueTicket(req: Request, res: Response) {
      res.status(201).json(await runsService.issueRunTicket(db, req.user!, id(req)));
    },
    async getRun(req: Request, res: Response) {
      res.json(await getRun(db, id(req)));
    },
  };
}
