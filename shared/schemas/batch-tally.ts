import { z } from 'zod';
import { FATES, FRACTIONS, type Fraction } from '../vocabulary/fractions';

const perFraction = <T extends z.ZodType>(schema: T) =>
  z.object(Object.fromEntries(FRACTIONS.map((f) => [f, schema])) as Record<Fraction, T>);

/** One batch of a run as a saved run carries it (workers/engine/batch-tallies): summary figures and a hash of all its tallies. */
export const batchTallySchema = z.object({
  batchIndex: z.number().int().gte(0),
  particleSteps: z.number().int().gte(0),
  taskMean_mgPerM3: perFraction(z.number().finite().gte(0)),
  fateMass_mg: z.array(z.number().finite()).length(FATES.length),
  zoneHistories: perFraction(z.number().int().gte(0)),
  hash: z.string().regex(/^[0-9a-f]{16}$/),
});

export type BatchTally = z.output<typeof batchTallySchema>;
