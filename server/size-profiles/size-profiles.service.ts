import type {
  CreateSizeProfileInput,
  SizeProfileDetail,
  SizeProfileList,
  SizeProfileListQuery,
  UploadFields,
} from '../../shared/schemas/size-profiles';
import { buildFromForm, buildFromUpload, type FormInput, type ProfileData } from '../../shared/size-profiles/index';
import { auditOf, type Actor } from '../audit/audit.repo';
import { withTransaction, type Db } from '../db/knex';
import { AppError, notFound } from '../lib/app-error';
import { readCsvRecords } from './csv-records';
import { findSizeProfile, insertSizeProfile, listSizeProfiles, softDeleteSizeProfile } from './size-profiles.repo';

const auditSizeProfile = auditOf('size_profile');
export type UploadedFile = { originalname: string; buffer: Buffer };

export const listSizeProfilePage = (db: Db, q: SizeProfileListQuery): Promise<SizeProfileList> => listSizeProfiles(db, q);

export async function getSizeProfile(db: Db, id: number): Promise<SizeProfileDetail> {
  const profile = await findSizeProfile(db, id);
  if (!profile) throw notFound('Size profile');
  return profile;
}

async function store(db: Db, actor: Actor, name: string, data: ProfileData, detail: Record<string, unknown>): Promise<SizeProfileDetail> {
  const id = await withTransaction(db, async (trx) => {
    const newId = await insertSizeProfile(trx, name, data, actor.id);
    await auditSizeProfile(trx, actor, 'size_profile.created', newId, { name, kind: data.kind, ...detail });
    return newId;
  });
  return (await findSizeProfile(db, id))!;
}

export async function createSizeProfile(db: Db, actor: Actor, input: CreateSizeProfileInput): Promise<SizeProfileDetail> {
  const { name, ...form } = input;
  return store(db, actor, name, buildFromForm(form as FormInput), {});
}

// Nothing is written unless every row passes; one 422 carries every problem found.
export async function uploadSizeProfile(
  db: Db,
  actor: Actor,
  fields: UploadFields,
  file: UploadedFile | undefined,
): Promise<SizeProfileDetail> {
  if (!file) throw new AppError(400, 'invalid_input', 'Choose a CSV file to upload', [{ path: 'file', message: 'No file was sent' }]);
  const records = readCsvRecords(file);
  const built = buildFromUpload(fields.format, records, { fileName: file.originalname, density_kgPerM3: fields.density_kgPerM3 });
  if (!built.ok) {
    const count = built.issues.length;
    const issues = built.issues.map((i) => ({ path: 'file', ...i }));
    throw new AppError(422, 'invalid_file', `${count} problem${count === 1 ? '' : 's'} found in the file`, issues);
  }
  return store(db, actor, fields.name, built.value, { format: fields.format, fileName: file.originalname });
}

export async function deleteSizeProfile(db: Db, actor: Actor, id: number) {
  await withTransaction(db, async (trx) => {
    const found = await findSizeProfile(trx, id);
    if (!found || !(await softDeleteSizeProfile(trx, id))) throw notFound('Size profile');
    await auditSizeProfile(trx, actor, 'size_profile.deleted', id, { name: found.name });
  });
}
