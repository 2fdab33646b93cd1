import { z } from 'zod';
import { MAX_DENSITY_kgPerM3, MIN_DENSITY_kgPerM3 } from '../size-profiles/counter';
import { UPLOAD_FORMATS } from '../size-profiles/formats';
import type { MassBins } from '../size-profiles/mass-bins';
import type { ProfileInput, ProfileKind } from '../size-profiles/profile';
import type { ScenarioSizeProfile } from '../size-profiles/to-scenario';

const name = z.string().trim().min(1, 'Enter a name').max(120, 'Use at most 120 characters');
const density_kgPerM3 = z
  .number()
  .min(MIN_DENSITY_kgPerM3, `Density must be at least ${MIN_DENSITY_kgPerM3} kg/m³`)
  .max(MAX_DENSITY_kgPerM3, `Density must be at most ${MAX_DENSITY_kgPerM3} kg/m³`);
// Below 1.05 the dust is a test aerosol, above 6 it is rarely one population; both are beyond this form.
const gsd = z.number().min(1.05, 'GSD must be at least 1.05').max(6, 'GSD must be at most 6');

export const lognormalProfileSchema = z
  .object({
    kind: z.literal('lognormal'),
    name,
    basis: z.enum(['mmad', 'cmd']),
    median_m: z.number().min(0.01e-6, 'The median must be at least 0.01 µm').max(200e-6, 'The median must be at most 200 µm'),
    gsd,
    density_kgPerM3: density_kgPerM3.optional(),
    shapeFactor: z.number().min(1).max(5).optional(),
  })
  .refine((v) => v.basis === 'mmad' || v.density_kgPerM3 !== undefined, {
    path: ['density_kgPerM3'],
    message: 'A CMD needs the particle density to find the MMAD',
  });

export const respirableProfileSchema = z.object({
  kind: z.literal('respirable'),
  name,
  respirableFraction: z
    .number()
    .min(0.001, 'The respirable fraction must be at least 0.001')
    .max(0.99, 'The respirable fraction must be at most 0.99'),
  gsd: gsd.default(2),
});

export const createSizeProfileSchema = z.discriminatedUnion('kind', [lognormalProfileSchema, respirableProfileSchema]);
export type CreateSizeProfileInput = z.input<typeof createSizeProfileSchema>;

const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

// Multipart fields arrive as strings.
export const uploadFieldsSchema = z
  .object({
    format: z.enum(UPLOAD_FORMATS, { message: `Choose a format: ${UPLOAD_FORMATS.join(', ')}` }),
    name,
    density_kgPerM3: z.preprocess(blankToUndefined, z.coerce.number().pipe(density_kgPerM3).optional()),
    density_confirmed: z.preprocess(blankToUndefined, z.enum(['true', 'false']).optional()),
  })
  .superRefine((v, ctx) => {
    if (v.format !== 'counter') return;
    if (v.density_kgPerM3 === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['density_kgPerM3'],
        message: 'Counter data needs the particle density to turn counts into mass',
      });
    if (v.density_confirmed !== 'true')
      ctx.addIssue({ code: 'custom', path: ['density_confirmed'], message: 'Confirm the density used to turn counts into mass' });
  });
export type UploadFields = z.output<typeof uploadFieldsSchema>;

export const SIZE_PROFILE_SORTS = ['name', 'kind', 'fittedMmad_m', 'fittedGsd', 'respirableFraction', 'createdAt'] as const;

export const sizeProfileListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
  sort: z.enum(SIZE_PROFILE_SORTS).default('createdAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
});
export type SizeProfileListQuery = z.output<typeof sizeProfileListQuerySchema>;

export const templateParamSchema = z.object({ format: z.enum(UPLOAD_FORMATS) });

export type SizeProfileSummary = {
  id: number;
  name: string;
  kind: ProfileKind;
  fittedMmad_m: number | null;
  fittedGsd: number | null;
  respirableFraction: number;
  thoracicFraction: number;
  inhalableFraction: number;
  createdBy: { id: number; name: string } | null;
  createdAt: string;
};

export type SizeProfileDetail = SizeProfileSummary & { input: ProfileInput; bins: MassBins; sizeProfile: ScenarioSizeProfile };

export type SizeProfileList = { items: SizeProfileSummary[]; total: number; page: number; pageSize: number };
