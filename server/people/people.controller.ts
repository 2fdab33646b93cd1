import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import { baseUrl } from '../lib/base-url';
import { listPeople } from './people.repo';
import { changePerson, invitePerson, sendResetLink } from './people.service';

type Query = { page: number; pageSize: number; sort?: string; order: 'asc' | 'desc' };

export function peopleController(db: Db, mailer: Mailer, publicUrl?: string) {
  return {
    async list(req: Request, res: Response) {
      res.json(await listPeople(db, req.query as unknown as Query));
    },
    async invite(req: Request, res: Response) {
      const person = await invitePerson(db, mailer, req.user!, req.body, baseUrl(req, publicUrl));
      res.status(201).json(person);
    },
    async update(req: Request, res: Response) {
      res.json(await changePerson(db, req.user!, Number(req.params.id), req.body));
    },
    async resetLink(req: Request, res: Response) {
      await sendResetLink(db, mailer, req.user!, Number(req.params.id), baseUrl(req, publicUrl));
      res.status(202).json({ sent: true });
    },
  };
}
