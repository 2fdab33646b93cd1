import { z } from 'zod';
import { CONTROL_TIERS, LIMIT_FRACTIONS, POSTURES, RELEASE_TYPES } from '../vocabulary/index';
import { scenarioSchema } from './scenario';
import { airChangesToSupplyAirflow_m3PerH, supplyAirflowToAirChanges_perH } from '../units';

const name = z.string().trim().min(1, 'Enter a name').max(120, 'Use at most 120 characters');
const positive = (what: string) =>
  z
    .number({ message: `${what} must be a number` })
    .gt(0, `${what} must be above zero`)
    .finite();
const nonNegative = (what: string) =>
  z
    .number({ message: `${what} must be a number` })
    .gte(0, `${what} cannot be negative`)
    .finite();

export const siteDataSchema = z
  .object({ address: z.string().trim().max(300).default(''), notes: z.string().trim().max(1000).default('') })
  .strict();
export const siteInputSchema = z.object({ name, data: siteDataSchema.prefault({}) }).strict();
export type SiteInput = z.infer<typeof siteInputSchema>;

// Every edit of a place or an agent names the version it was made from (optimistic concurrency).
const version = z.number({ message: 'Send the version you edited' }).int().positive();
export const siteUpdateSchema = siteInputSchema.extend({ version }).strict();
export type SiteUpdate = z.infer<typeof siteUpdateSchema>;

export const VENTILATION_ENTERED = ['airChanges', 'supplyAirflow'] as const;
const MAX_AIR_CHANGES_perH = 200;

// People give general ventilation either as air changes or as the supply airflow; what they typed is kept as
// typed and the other figure follows from the room's volume, so the engine always reads one consistent ACH.
export const roomDataSchema = z
  .object({
    length_m: positive('Length').max(500),
    width_m: positive('Width').max(500),
    height_m: positive('Height').max(100),
    ventilationEntered: z.enum(VENTILATION_ENTERED).default('airChanges'),
    airChanges_perH: nonNegative('Air changes per hour').max(MAX_AIR_CHANGES_perH).optional(),
    supplyAirflow_m3PerH: nonNegative('Supply airflow').max(1e8).optional(),
    draftSpeed_mPerS: nonNegative('Draft speed').max(10),
    draftDirection_deg: z.number().finite().min(-360).max(360),
    temperature_K: z.number().finite().min(223.15, 'Temperature must be at least −50 °C').max(373.15, 'Temperature must be at most 100 °C'),
  })
  .strict()
  .superRefine((d, ctx) => {
    const volume_m3 = d.length_m * d.width_m * d.height_m;
    if (d.ventilationEntered === 'airChanges' && d.airChanges_perH === undefined)
      ctx.addIssue({ code: 'custom', path: ['airChanges_perH'], message: 'Enter the air changes per hour' });
    if (d.ventilationEntered === 'supplyAirflow') {
      if (d.supplyAirflow_m3PerH === undefined)
        ctx.addIssue({ code: 'custom', path: ['supplyAirflow_m3PerH'], message: 'Enter the supply airflow' });
      else if (supplyAirflowToAirChanges_perH(d.supplyAirflow_m3PerH, volume_m3) > MAX_AIR_CHANGES_perH)
        ctx.addIssue({
          code: 'custom',
          path: ['supplyAirflow_m3PerH'],
          message: `That is more than ${MAX_AIR_CHANGES_perH} air changes per hour for this room`,
        });
    }
  })
  .transform(({ airChanges_perH, supplyAirflow_m3PerH, ...d }) => {
    const volume_m3 = d.length_m * d.width_m * d.height_m;
    const ach =
      d.ventilationEntered === 'supplyAirflow'
        ? supplyAirflowToAirChanges_perH(supplyAirflow_m3PerH ?? 0, volume_m3)
        : (airChanges_perH ?? 0);
    const supply =
      d.ventilationEntered === 'supplyAirflow' ? (supplyAirflow_m3PerH ?? 0) : airChangesToSupplyAirflow_m3PerH(ach, volume_m3);
    return { ...d, airChanges_perH: ach, supplyAirflow_m3PerH: supply };
  });
export const roomInputSchema = z.object({ siteId: z.number().int().positive(), name, data: roomDataSchema }).strict();
export type RoomInput = z.infer<typeof roomInputSchema>;
export const roomUpdateSchema = roomInputSchema.omit({ siteId: true }).extend({ version }).strict();
export type RoomUpdate = z.infer<typeof roomUpdateSchema>;

export const workstationDataSchema = z
  .object({
    description: z.string().trim().max(500).default(''),
    source: z.object({ x_m: nonNegative('Source x'), y_m: nonNegative('Source y'), z_m: nonNegative('Source height') }).strict(),
    worker: z
      .object({
        x_m: nonNegative('Worker x'),
        y_m: nonNegative('Worker y'),
        z_m: nonNegative('Breathing-zone height'),
        posture: z.enum(POSTURES),
      })
      .strict(),
    releaseType: z.enum(RELEASE_TYPES),
  })
  .strict();
export const workstationInputSchema = z.object({ roomId: z.number().int().positive(), name, data: workstationDataSchema }).strict();
export type WorkstationInput = z.infer<typeof workstationInputSchema>;
export const workstationUpdateSchema = workstationInputSchema.omit({ roomId: true }).extend({ version }).strict();
export type WorkstationUpdate = z.infer<typeof workstationUpdateSchema>;

export const agentDataSchema = z
  .object({
    density_kgPerM3: positive('Particle density').max(25_000),
    shapeFactor: z.number().finite().min(1, 'Shape factor is at least 1 (a sphere)').max(5),
    limitFraction: z.enum(LIMIT_FRACTIONS),
    limit8h_mgPerM3: positive('8-h limit').max(1000),
    limit15min_mgPerM3: positive('15-min limit').max(1000).nullable().default(null),
    jurisdiction: z.string().trim().min(1, 'Say where the limit applies').max(120),
    limitSource: z.string().trim().min(1, 'Name the source of the limit').max(300),
    limitDate: z.string().trim().max(40).default(''),
    override: z
      .object({
        limit8h_mgPerM3: positive('Override limit').max(1000),
        reason: z.string().trim().min(3, 'Give a reason for the override').max(300),
      })
      .strict()
      .nullable()
      .default(null),
    notes: z.string().trim().max(1000).default(''),
  })
  .strict();
export const agentInputSchema = z.object({ name, data: agentDataSchema }).strict();
export type AgentInput = z.infer<typeof agentInputSchema>;
export const agentUpdateSchema = agentInputSchema.extend({ version }).strict();
export type AgentUpdate = z.infer<typeof agentUpdateSchema>;
export type AgentData = z.infer<typeof agentDataSchema>;

export { CONTROL_TIERS, type ControlTier } from '../vocabulary/control-tiers';

// The fields without their defaults: an update leaves out what it does not change, and a default
// there would quietly reset it (a name-only edit used to clear the agent).
const scenarioMetaFields = {
  workstationId: z.number().int().positive(),
  agentId: z.number().int().positive().nullable(),
  sizeProfileId: z.number().int().positive().nullable(),
  name,
  controlDescription: z.string().trim().max(500),
  controlTier: z.enum(CONTROL_TIERS),
};

export const scenarioMetaSchema = z
  .object({
    ...scenarioMetaFields,
    agentId: scenarioMetaFields.agentId.default(null),
    sizeProfileId: scenarioMetaFields.sizeProfileId.default(null),
    controlDescription: scenarioMetaFields.controlDescription.default(''),
    controlTier: scenarioMetaFields.controlTier.default('none'),
  })
  .strict();

export const scenarioCreateSchema = scenarioMetaSchema.extend({ input: scenarioSchema }).strict();
export type ScenarioCreate = z.infer<typeof scenarioCreateSchema>;

export const scenarioUpdateSchema = z
  .object(scenarioMetaFields)
  .partial()
  .extend({ input: scenarioSchema.optional(), version: z.number().int().positive() })
  .strict();
export type ScenarioUpdate = z.infer<typeof scenarioUpdateSchema>;

export const scenarioListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
  sort: z
    .enum(['name', 'workstation', 'site', 'agent', 'status', 'updatedAt', 'respirableTwa', 'twa', 'percentOfLimit', 'banner'])
    .default('updatedAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
  siteId: z.coerce.number().int().positive().optional(),
  workstationId: z.coerce.number().int().positive().optional(),
  agentId: z.coerce.number().int().positive().optional(),
  status: z.enum(['draft', 'approved']).optional(),
  q: z.string().trim().max(120).optional(),
});
export type ScenarioListQuery = z.infer<typeof scenarioListQuerySchema>;

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-06-30');

export const approveSchema = z
  .object({
    runId: z.number().int().positive(),
    note: z.string().trim().max(1000).default(''),
    reviewDate: isoDate.optional(),
  })
  .strict();
export type ApproveInput = z.infer<typeof approveSchema>;

export const assignOperatorsSchema = z.object({ personIds: z.array(z.number().int().positive()).max(100) }).strict();

export const shareSchema = z
  .object({
    email: z
      .string()
      .trim()
      .toLowerCase()
      .max(254)
      .pipe(z.email({ message: 'Enter a valid e-mail address' })),
    runId: z.number().int().positive().optional(),
  })
  .strict();
