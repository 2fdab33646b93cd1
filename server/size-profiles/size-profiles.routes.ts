import { Router } from 'express';
import { idParamSchema } from '../../shared/schemas/auth';
import {
  createSizeProfileSchema,
  sizeProfileListQuerySchema,
  templateParamSchema,
  uploadFieldsSchema,
} from '../../shared/schemas/size-profiles';
import type { Db } from '../db/knex';
import { requirePermission } from '../middleware/require-permission';
import { validate } from '../middleware/validate';
import { sizeProfilesController } from './size-profiles.controller';
import { uploadFile } from './upload-file';

export function sizeProfileRoutes(db: Db): Router {
  const c = sizeProfilesController(db);
  const r = Router();
  r.get('/', requirePermission('scenarios:read'), validate({ query: sizeProfileListQuerySchema }), c.list);
  r.get('/templates/:format.csv', requirePermission('scenarios:read'), validate({ params: templateParamSchema }), c.template);
  r.get('/:id', requirePermission('scenarios:read'), validate({ params: idParamSchema }), c.get);
  r.post('/', requirePermission('scenarios:write'), validate({ body: createSizeProfileSchema }), c.create);
  r.post('/upload', requirePermission('scenarios:write'), uploadFile, validate({ body: uploadFieldsSchema }), c.upload);
  r.delete('/:id', requirePermission('scenarios:write'), validate({ params: idParamSchema }), c.remove);
  return r;
}
