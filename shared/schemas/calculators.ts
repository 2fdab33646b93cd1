import { z } from 'zod';
import { airProperties } from '../physics/index';
import { RELEASE_TYPES, type HoodKind } from '../vocabulary/index';
import {
  celsiusToKelvin,
  cubicMetresPerHourToPerSecond,
  kilopascalsToPascals,
  micrometresToMetres,
  millimetresToMetres,
  nanometresToMetres,
} from '../units';

// NaN arrives from an empty or half-typed field; z.number() refuses it, and the message says what to do.
const number = () => z.number({ error: 'Enter a number' });

export const DIAMETER_UNITS = ['nm', 'um', 'mm'] as const;
export type DiameterUnit = (typeof DIAMETER_UNITS)[number];
const TO_METRES: Record<DiameterUnit, (value: number) => number> = {
  nm: nanometresToMetres,
  um: micrometresToMetres,
  mm: millimetresToMetres,
};

// Below 1 nm a "particle" is a molecule cluster; above 1 mm it falls out of the air before anyone breathes it.
const MIN_DIAMETER_m = 1e-9;
const MAX_DIAMETER_m = 1e-3;

export const particleCalculatorSchema = z
  .object({
    diameter: number().gt(0, 'A diameter must be larger than zero'),
    diameterUnit: z.enum(DIAMETER_UNITS),
    density_kgPerM3: number().gt(0, 'Density must be larger than zero').max(23000, 'No solid is denser than about 22 600 kg/m³ (osmium)'),
    shapeFactor: number()
      .gte(1, 'The shape factor is 1 for a sphere and larger for any other shape')
      .max(10, 'Shape factors above 10 are outside the drag data'),
    temperature_C: number().gte(-50, 'Use a temperature from −50 °C').lte(300, 'Use a temperature up to 300 °C'),
    pressure_kPa: number().gte(50, 'Use a pressure from 50 kPa').lte(150, 'Use a pressure up to 150 kPa'),
    window_s: number().gt(0, 'The time window must be longer than zero').lte(86400, 'Use a window of at most one day (86 400 s)'),
  })
  .superRefine((v, ctx) => {
    const diameter_m = TO_METRES[v.diameterUnit](v.diameter);
    if (diameter_m < MIN_DIAMETER_m || diameter_m > MAX_DIAMETER_m) {
      ctx.addIssue({ code: 'custom', path: ['diameter'], message: 'Use a diameter from 1 nm to 1 mm' });
    }
    // A particle lighter than the surrounding air would rise, and the settling formulas would not apply.
    const air = airProperties({ temperature_K: celsiusToKelvin(v.temperature_C), pressure_Pa: kilopascalsToPascals(v.pressure_kPa) });
    if (v.density_kgPerM3 <= air.density_kgPerM3) {
      ctx.addIssue({
        code: 'custom',
        path: ['density_kgPerM3'],
        message: `A particle must be denser than the air (${air.density_kgPerM3.toFixed(2)} kg/m³)`,
      });
    }
  })
  .transform((v) => ({
    diameter_m: TO_METRES[v.diameterUnit](v.diameter),
    density_kgPerM3: v.density_kgPerM3,
    shapeFactor: v.shapeFactor,
    temperature_K: celsiusToKelvin(v.temperature_C),
    pressure_Pa: kilopascalsToPascals(v.pressure_kPa),
    window_s: v.window_s,
  }));
export type ParticleCalculatorInput = z.input<typeof particleCalculatorSchema>;
export type ParticleCalculatorValues = z.output<typeof particleCalculatorSchema>;

/**
 * The hood calculator works the centre-line (Dalla Valle / ACGIH) equations, which do not describe a downdraft
 * bench: a bench is checked by its face velocity over the work surface, in the scenario's capture check.
 */
export const CALCULATOR_HOOD_KINDS = ['plain', 'flanged', 'slot', 'flanged-slot', 'booth'] as const satisfies readonly HoodKind[];
export type CalculatorHoodKind = (typeof CALCULATOR_HOOD_KINDS)[number];
export { RELEASE_TYPES as RELEASE_CONDITIONS };
export const AIRFLOW_UNITS = ['m3PerH', 'm3PerS'] as const;
export type AirflowUnit = (typeof AIRFLOW_UNITS)[number];
export const airflowToPerSecond = (value: number, unit: AirflowUnit): number =>
  unit === 'm3PerH' ? cubicMetresPerHourToPerSecond(value) : value;

// Larger than any single capturing hood or booth fan; beyond it a typo is more likely than a design.
const MAX_AIRFLOW_m3PerS = 100;

const face = (side: string) =>
  number().gt(0, `The face ${side} must be larger than zero`).lte(20, `A face ${side} above 20 m is not a hood`);
const distance = number().gt(0, 'The distance must be larger than zero').lte(10, 'Use a distance up to 10 m');

const hoodCommon = {
  kind: z.enum(CALCULATOR_HOOD_KINDS, {
    error: 'The hood calculator covers openings, slots and booths; a downdraft bench is checked by its face velocity in a scenario',
  }),
  width_m: face('width'),
  height_m: face('height'),
  distance_m: distance,
  release: z.enum(RELEASE_TYPES),
};

// The engineer knows either the fan's airflow or the capture velocity they need; the other one is computed.
export const hoodCalculatorSchema = z
  .discriminatedUnion('basis', [
    z.object({
      ...hoodCommon,
      basis: z.literal('airflow'),
      airflow: number().gt(0, 'The airflow must be larger than zero'),
      airflowUnit: z.enum(AIRFLOW_UNITS),
    }),
    z.object({
      ...hoodCommon,
      basis: z.literal('capture'),
      captureVelocity_mPerS: number().gt(0, 'The capture velocity must be larger than zero').lte(50, 'Use a capture velocity up to 50 m/s'),
    }),
  ])
  .superRefine((v, ctx) => {
    if (v.basis === 'airflow' && airflowToPerSecond(v.airflow, v.airflowUnit) > MAX_AIRFLOW_m3PerS) {
      ctx.addIssue({ code: 'custom', path: ['airflow'], message: 'Use an airflow up to 100 m³/s (360 000 m³/h)' });
    }
  });
export type HoodCalculatorInput = z.infer<typeof hoodCalculatorSchema>;
