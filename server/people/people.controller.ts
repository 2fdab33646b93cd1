import type { Request, Response } from 'express';
import type { Db } from '../db/knex';
import type { Mailer } from '../mail/mailer';
import { baseUrl, type PublicUrl } from '../lib/base-url';
import type { PeopleQuery } from './people.repo';
import { changePerson, invitePerson, listPeoplePage, sendResetLink } from './people.service';

export function peopleController(db: Db, mailer: Mailer, publicUrl: PublicUrl) {
  return {
    async list(req: Request, res: Response) {
      res.json(await listPeoplePage(db, req.query as unknown as PeopleQuery));
    },
    async invite(req: Request, res: Response) {
      const person = await invitePerson(db, mailer, req.user!, req.body, baseUrl(publicUrl));
      res.status(201).json(person);
    },
    async update(req: Request, res: Response) {
      res.json(await changePerson(db, req.user!, Number(req.params.id), req.body));
    },
    async resetLink(req: Request, res: Response) {
      await sendResetLink(db, mailer, req.user!, Number(req.params.id), baseUrl(publicUrl));
      res.status(202).json({ sent: true });
    },
  };
}
