import type { Request, Response } from 'express';
import type { SizeProfileListQuery } from '../../shared/schemas/size-profiles';
import { FORMATS, type UploadFormat } from '../../shared/size-profiles/index';
import type { Db } from '../db/knex';
import { createSizeProfile, deleteSizeProfile, getSizeProfile, listSizeProfilePage, uploadSizeProfile } from './size-profiles.service';

export function sizeProfilesController(db: Db) {
  return {
    async list(req: Request, res: Response) {
      res.json(await listSizeProfilePage(db, req.query as unknown as SizeProfileListQuery));
    },
    async get(req: Request, res: Response) {
      res.json(await getSizeProfile(db, Number(req.params.id)));
    },
    async create(req: Request, res: Response) {
      res.status(201).json(await createSizeProfile(db, req.user!, req.body));
    },
    async upload(req: Request, res: Response) {
      res.status(201).json(await uploadSizeProfile(db, req.user!, req.body, req.file));
    },
    async remove(req: Request, res: Response) {
      await deleteSizeProfile(db, req.user!, Number(req.params.id));
      res.status(204).end();
    },
    template(req: Request, res: Response) {
      const format = req.params.format as UploadFormat;
      res.attachment(`size-profile-${format}.csv`).type('text/csv').send(FORMATS[format].template);
    },
  };
}
