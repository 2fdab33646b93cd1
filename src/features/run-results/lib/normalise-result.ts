import type { Banner, ExposureRating } from '../../../../shared/physics/index.ts';
import { FATES, type Fate, FRACTIONS, type Fraction } from '../../../../workers/engine/types.ts';
import { describe, toFloat32, toInt32, toNumber, toNumberArray } from './numbers.ts';

export type Ci = [number, number];
export interface FractionView {
  taskMean_mgPerM3: number;
  taskMeanCi95_mgPerM3: Ci;
  twa8h_mgPerM3: number;
  twa8hCi95_mgPerM3: Ci;
  peak15min_mgPerM3: number;
}
export interface BandView {
  mean: number[];
  lo: number[];
  hi: number[];
}
export interface GridView {
  nx: number;
  ny: number;
  cell_m: [number, number];
  origin_m: [number, number];
  /** [ix][iy], as the engine writes it. */
  values: number[];
}

export interface RunView {
  engine: { version: string; seed: number | string; particles: number; batches: number; sizeBins: number };
  fractions: Record<Fraction, FractionView>;
  series: { time_s: number[]; bands: Record<Fraction, BandView> };
  fate: { emitted_mg: number; shares: Record<Fate, number> };
  limit?: { fraction: Fraction; value_mgPerM3: number; percentOfLimit: number; percentOfLimitUpper: number; ratingCategory: ExposureRating; banner: Banner };
  crossChecks: { fraction: Fraction; wellMixed_mgPerM3: number; nearField_mgPerM3: number; farField_mgPerM3: number; eddySteady_mgPerM3: number };
  maps: { deposition_mgPerM2?: GridView; captureVelocity_mPerS?: GridView & { height_m: number } };
  trajectories: {
    particles: number;
    frames: number;
    frameInterval_s: number;
    /** [particle][frame][xyz]; NaN where the particle is not airborne. */
    positions_m: Float32Array;
    /** Size bin per sampled particle, −1 for an unused slot. */
    bins: Int32Array;
    /** Aerodynamic diameter per size bin when the result carries it. */
    binDiameters_m?: number[];
  };
}

type Obj = Record<string, unknown>;

function obj(value: unknown, path: string): Obj {
  if (!value || typeof value !== 'object' || Array.isArray(value)) throw new TypeError(`${path} must be an object, got ${describe(value)}`);
  return value as Obj;
}

function ci(value: unknown, path: string): Ci {
  const [lo, hi] = toNumberArray(value, path);
  return [lo ?? NaN, hi ?? NaN];
}

function fractionName(value: unknown, path: string): Fraction {
  if (!FRACTIONS.includes(value as Fraction)) throw new TypeError(`${path} must be one of ${FRACTIONS.join(', ')}, got ${describe(value)}`);
  return value as Fraction;
}

function bannerName(value: unknown): Banner {
  if (value === 'clear' || value === 'watch' || value === 'act') return value;
  throw new TypeError(`limit.banner must be clear, watch or act, got ${describe(value)}`);
}

function grid(value: unknown, path: string): GridView | undefined {
  if (value == null) return undefined;
  const g = obj(value, path);
  const [cx, cy] = toNumberArray(g.cell_m, `${path}.cell_m`);
  const [ox, oy] = g.origin_m == null ? [0, 0] : toNumberArray(g.origin_m, `${path}.origin_m`);
  const view = { nx: toNumber(g.nx), ny: toNumber(g.ny), cell_m: [cx, cy] as [number, number], origin_m: [ox, oy] as [number, number], values: toNumberArray(g.values, `${path}.values`) };
  if (view.values.length !== view.nx * view.ny) throw new RangeError(`${path}.values must hold nx·ny = ${view.nx * view.ny} numbers, got ${view.values.length}`);
  return view;
}

function fractionView(value: unknown, path: string): FractionView {
  const f = obj(value, path);
  return {
    taskMean_mgPerM3: toNumber(f.taskMean_mgPerM3),
    taskMeanCi95_mgPerM3: ci(f.taskMeanCi95_mgPerM3, `${path}.taskMeanCi95_mgPerM3`),
    twa8h_mgPerM3: toNumber(f.twa8h_mgPerM3),
    twa8hCi95_mgPerM3: ci(f.twa8hCi95_mgPerM3, `${path}.twa8hCi95_mgPerM3`),
    peak15min_mgPerM3: toNumber(f.peak15min_mgPerM3),
  };
}

function trajectories(value: unknown, bins: unknown): RunView['trajectories'] {
  if (value == null) return { particles: 0, frames: 0, frameInterval_s: 1, positions_m: new Float32Array(0), bins: new Int32Array(0) };
  const t = obj(value, 'trajectories');
  const view: RunView['trajectories'] = {
    particles: toNumber(t.particles),
    frames: toNumber(t.frames),
    frameInterval_s: toNumber(t.frameInterval_s),
    positions_m: toFloat32(t.positions_m, 'trajectories.positions_m'),
    bins: toInt32(t.bins, 'trajectories.bins'),
  };
  if (view.positions_m.length !== view.particles * view.frames * 3) {
    throw new RangeError(`trajectories.positions_m must hold particles·frames·3 = ${view.particles * view.frames * 3} numbers, got ${view.positions_m.length}`);
  }
  // Results do not yet carry bin diameters everywhere; take them from wherever a producer put them.
  const diameters = t.binDiameters_m ?? (bins && typeof bins === 'object' ? (bins as Obj).aerodynamic_m : undefined);
  if (diameters != null) view.binDiameters_m = toNumberArray(diameters, 'trajectories.binDiameters_m');
  return view;
}

/** Accepts the engine's Results (typed arrays) or its JSON (plain arrays, null for NaN) and returns one shape. */
export function normaliseResult(input: unknown): RunView {
  const r = obj(input, 'result');
  const engine = obj(r.engine, 'engine');
  const zone = obj(r.breathingZone, 'breathingZone');
  const fractions = obj(zone.fractions, 'breathingZone.fractions');
  const series = obj(zone.series, 'breathingZone.series');
  const fate = obj(r.fate, 'fate');
  const checks = obj(r.crossChecks ?? {}, 'crossChecks');
  const maps = r.maps == null ? {} : obj(r.maps, 'maps');
  const view: RunView = {
    engine: { version: String(engine.version ?? 'unknown'), seed: typeof engine.seed === 'string' ? engine.seed : toNumber(engine.seed), particles: toNumber(engine.particles), batches: toNumber(engine.batches), sizeBins: toNumber(engine.sizeBins) },
    fractions: Object.fromEntries(FRACTIONS.map((f) => [f, fractionView(fractions[f], `breathingZone.fractions.${f}`)])) as Record<Fraction, FractionView>,
    series: {
      time_s: toNumberArray(series.time_s, 'breathingZone.series.time_s'),
      bands: Object.fromEntries(
        FRACTIONS.map((f) => {
          const band = obj(series[f], `breathingZone.series.${f}`);
          return [f, { mean: toNumberArray(band.mean, `breathingZone.series.${f}.mean`), lo: toNumberArray(band.lo, `breathingZone.series.${f}.lo`), hi: toNumberArray(band.hi, `breathingZone.series.${f}.hi`) }];
        }),
      ) as Record<Fraction, BandView>,
    },
    fate: { emitted_mg: toNumber(fate.emitted_mg), shares: Object.fromEntries(FATES.map((f) => [f, toNumber(fate[f])])) as Record<Fate, number> },
    crossChecks: {
      fraction: checks.fraction == null ? 'respirable' : fractionName(checks.fraction, 'crossChecks.fraction'),
      wellMixed_mgPerM3: toNumber(checks.wellMixed_mgPerM3),
      nearField_mgPerM3: toNumber(checks.nearField_mgPerM3),
      farField_mgPerM3: toNumber(checks.farField_mgPerM3),
      eddySteady_mgPerM3: toNumber(checks.eddySteady_mgPerM3),
    },
    maps: {},
    trajectories: trajectories(r.trajectories, r.sizeBins),
  };
  const deposition = grid(maps.deposition_mgPerM2, 'maps.deposition_mgPerM2');
  if (deposition) view.maps.deposition_mgPerM2 = deposition;
  const capture = grid(maps.captureVelocity_mPerS, 'maps.captureVelocity_mPerS');
  if (capture) view.maps.captureVelocity_mPerS = { ...capture, height_m: toNumber(obj(maps.captureVelocity_mPerS, 'maps.captureVelocity_mPerS').height_m) };
  if (r.limit != null) {
    const l = obj(r.limit, 'limit');
    view.limit = {
      fraction: fractionName(l.fraction, 'limit.fraction'),
      value_mgPerM3: toNumber(l.value_mgPerM3),
      percentOfLimit: toNumber(l.percentOfLimit),
      percentOfLimitUpper: toNumber(l.percentOfLimitUpper),
      ratingCategory: toNumber(l.ratingCategory) as ExposureRating,
      banner: bannerName(l.banner),
    };
  }
  return view;
}
