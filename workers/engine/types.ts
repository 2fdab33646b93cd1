import type { ImportancePlan } from './importance';
import type { RoundJet } from '../../shared/physics/round-jet';
import type { CaptureVerdictWord } from '../../shared/physics/capture-verdict';
import type { MassLeftOut, RunResult } from '../../shared/schemas/run-result';
import type { modelSchema } from '../../shared/schemas/run-result';
import type { JudgeOptions } from '../../shared/verdict/index';
import type { z } from 'zod';
import type { Fraction } from '../../shared/vocabulary/fractions';

export { FATES, FRACTIONS, type Fate, type Fraction } from '../../shared/vocabulary/fractions';

/** Per-size-bin tables; index b is one bin. Everything the step loop reads is here. */
export interface SizeBins {
  count: number;
  aerodynamic_m: Float64Array;
  physical_m: Float64Array;
  /** Share of the emitted mass each simulated particle's bin carries; bins without particles carry none. */
  massFraction: Float64Array;
  /** Share of the emitted mass in each bin from the size profile itself, whatever the particle count. */
  profileMassFraction: Float64Array;
  settling_mPerS: Float64Array;
  /** Eddy plus Brownian. */
  diffusivity_m2PerS: Float64Array;
  /** Brownian diffusivity alone (Stokes–Einstein with slip, divided by the shape factor). */
  brownianDiffusivity_m2PerS: Float64Array;
  /** Mass carried by one simulated particle of the bin, mg. */
  particleMass_mg: Float64Array;
  particlesPerBatch: Int32Array;
  /** Convention efficiency per fraction, row-major [fraction][bin]. */
  conventionWeight: Float64Array;
  /** Emitted mass outside the simulated sizes, as shares of the emission. */
  massLeftOut: MassLeftOut;
}

/** Plain data (typed arrays and numbers) so it can be structured-cloned into a worker. */
export interface PreparedScenario {
  seed: number | string;
  batches: number;
  particlesPerBatch: number;
  room: { length_m: number; width_m: number; height_m: number; volume_m3: number };
  exhaustRate_perS: number;
  draft_mPerS: [number, number];
  /** The room's eddy diffusivity once dust has met the room's large eddies (clamped to measured values). */
  eddyDiffusivity_m2PerS: number;
  /** Lagrangian time T_L over which young dust's room diffusivity grows to eddyDiffusivity_m2PerS. */
  lagrangianTime_s: number;
  /** The release jet (nozzle just behind the source), if the release has one. */
  jet?: RoundJet;
  /** Deposition on room surfaces (Lai & Nazaroff 2000) per size bin; zeros when room.wallDeposition is off. */
  surfaces: {
    enabled: boolean;
    wall_mPerS: Float64Array;
    floorExtra_mPerS: Float64Array;
    ceiling_mPerS: Float64Array;
    /** Loss rate to walls that a draft wraps through (periodic sides), per bin, 1/s. */
    wrappedWallRate_perS: Float64Array;
    frictionVelocity_mPerS: number;
  };
  bins: SizeBins;
  source: { x_m: number; y_m: number; z_m: number; shape: 'point' | 'disc' | 'box'; size_m: number };
  /** Release schedule: continuous over [0, release_s], or events at eventTimes_s. */
  emission: { kind: 'continuous' | 'bursts'; emitted_mg: number; release_s: number; eventTimes_s: Float64Array };
  hoods: { count: number; params: Float64Array };
  zone: { x_m: number; y_m: number; z_m: number; radius_m: number; volume_m3: number };
  duration_s: number;
  timeBin_s: number;
  timeBins: number;
  maxTimeStep_s: number;
  stepFraction: number;
  task: { minutesPerShift: number; background_mgPerM3: number };
  deposition: { nx: number; ny: number };
  trajectory: { particles: number; frames: number; frameInterval_s: number };
  limit?: { fraction: Fraction; value_mgPerM3: number; shortTerm_mgPerM3?: number };
  /** The hood's hand-calculated speed at the source against the release type's range (shared/physics/capture-verdict). */
  captureVelocity?: CaptureVerdictWord;
  /** What the verdict takes from the scenario besides the numbers: that speed and the day-to-day GSD (shared/verdict/judge-options). */
  judging: JudgeOptions;
  /** Inputs of the analytic cross-checks, derived from the scenario in prepareScenario. */
  crossCheck: {
    airflow_m3PerS: number;
    hoodAirflow_m3PerS: number;
    sourceToZone_m: number;
    randomAirSpeed_mPerS: number;
    sourceOnFloor: boolean;
  };
  /** What the engine assumed beyond the inputs, reported with the result. */
  model: z.output<typeof modelSchema>;
  /** run.varianceReduction: splitting and Russian roulette over an importance map (workers/engine/importance.ts). */
  varianceReduction: ImportancePlan;
  /** Tests ask for the final particle states (the plain walk then, whatever varianceReduction says); normal runs leave it off. */
  keepParticles: boolean;
}

export interface ParticleStates {
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  t: Float64Array;
  bin: Int32Array;
  fate: Int8Array;
}

export interface BatchResult {
  batchIndex: number;
  /** Particle-seconds inside the breathing zone, [timeBin][sizeBin]. */
  zoneResidence_s: Float64Array;
  /** Mass per fate (FATES order), mg. */
  fateMass_mg: Float64Array;
  /** Simulated particles per size bin that spent any time in the breathing zone. */
  zoneHistories: Int32Array;
  /** Deposited mass per floor cell, mg, [ix][iy]. */
  deposition_mg: Float64Array;
  /** x, y, z per frame per sampled particle, NaN when not airborne. */
  trajectories: Float32Array;
  trajectoryBins: Int32Array;
  /** Fate (FATES index) each sampled particle met, −1 for an unused slot. */
  trajectoryFates: Int8Array;
  /** Per sampled particle: release time (s) and point (m), end time and point; NaN for an unused slot. */
  trajectoryEnds: Float32Array;
  particleSteps: number;
  /** Variance reduction: copies that splitting made and particles that Russian roulette removed. */
  splitCopies: number;
  rouletteRemoved: number;
  wallTime_s: number;
  particles?: ParticleStates;
}

export type { FractionSummary, Grid, SeriesBand, Stopping } from '../../shared/schemas/run-result';
export type Results = RunResult;
