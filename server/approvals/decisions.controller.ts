import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import { baseUrl, type PublicUrl } from '../lib/base-url';
import { approveScenario } from './approvals.service';
import { assignOperators, shareReport } from './decisions.service';

export function decisionsController(db: Db, mailer: Mailer, publicUrl: PublicUrl) {
  const id = (req: Request) => Number(req.params.id);
  return {
    async approve(req: Request, res: Response) {
      res.status(201).json(await approveScenario(db, req.user!, id(req), req.body));
    },
    async share(req: Request, res: Response) {
      await shareReport(db, mailer, req.user!, id(req), req.body, baseUrl(publicUrl));
      res.status(202).json({ sent: true });
    },
    async assignOperators(req: Request, res: Response) {
      res.json(await assignOperators(db, req.user!, id(req), req.body.personIds));
    },
  };
}
