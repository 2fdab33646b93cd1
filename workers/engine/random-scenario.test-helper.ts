import fc from 'fast-check';
import { combineBatches } from './combine';
import type { BatchResult, PreparedScenario } from './types';

const inside = (size: number) => fc.double({ min: 0, max: 1, noNaN: true }).map((u) => u * size);

/** Random valid scenarios for the engine's property tests. */
export const scenarioArb = fc
  .record({
    L: fc.double({ min: 2, max: 10, noNaN: true }),
    W: fc.double({ min: 2, max: 8, noNaN: true }),
    H: fc.double({ min: 2, max: 4, noNaN: true }),
  })
  .chain(({ L, W, H }) =>
    fc.record({
      room: fc.record({
        length_m: fc.constant(L),
        width_m: fc.constant(W),
        height_m: fc.constant(H),
        airChanges_perH: fc.double({ min: 0, max: 12, noNaN: true }),
        draftSpeed_mPerS: fc.double({ min: 0, max: 0.4, noNaN: true }),
        draftDirection_deg: fc.double({ min: 0, max: 360, noNaN: true }),
      }),
      source: fc.record({
        x_m: inside(L),
        y_m: inside(W),
        z_m: inside(H),
        shape: fc.constantFrom('point', 'disc', 'box'),
        size_m: fc.double({ min: 0, max: 0.3, noNaN: true }),
        emission: fc.oneof(
          fc.record({
            kind: fc.constant('continuous'),
            rate_mgPerMin: fc.double({ min: 0.1, max: 50, noNaN: true }),
            taskDuration_min: fc.double({ min: 0.5, max: 5, noNaN: true }),
          }),
          fc.record({
            kind: fc.constant('bursts'),
            massPerEvent_mg: fc.double({ min: 0.1, max: 50, noNaN: true }),
            eventsPerHour: fc.double({ min: 10, max: 120, noNaN: true }),
            taskDuration_min: fc.double({ min: 0.5, max: 5, noNaN: true }),
          }),
        ),
      }),
      dust: fc.record({
        density_kgPerM3: fc.double({ min: 500, max: 4000, noNaN: true }),
        sizeProfile: fc.record({
          kind: fc.constant('lognormal'),
          basis: fc.constantFrom('mmad', 'cmd'),
          median_m: fc.double({ min: 1e-6, max: 30e-6, noNaN: true }),
          gsd: fc.double({ min: 1.2, max: 3, noNaN: true }),
        }),
      }),
      hoods: fc.array(
        fc.record({
          kind: fc.constantFrom('plain', 'flanged', 'slot', 'flanged-slot', 'booth'),
          x_m: inside(L),
          y_m: inside(W),
          z_m: inside(H),
          direction: fc.record({
            azimuth_deg: fc.double({ min: -180, max: 180, noNaN: true }),
            elevation_deg: fc.double({ min: -90, max: 90, noNaN: true }),
          }),
          faceWidth_m: fc.double({ min: 0.1, max: 1, noNaN: true }),
          faceHeight_m: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
          airflow_m3PerS: fc.double({ min: 0, max: 1, noNaN: true }),
        }),
        { maxLength: 2 },
      ),
      worker: fc.record({ x_m: inside(L), y_m: inside(W), z_m: inside(H) }),
      run: fc.record({
        particles: fc.integer({ min: 30, max: 120 }),
        batches: fc.integer({ min: 2, max: 4 }),
        seed: fc.integer(),
        duration_s: fc.double({ min: 20, max: 200, noNaN: true }),
      }),
    }),
  );

// This file is also typechecked without Node or DOM types, so the structured clone is spelled out.
export function cloneLikePostMessage<T>(value: T): T {
  if (ArrayBuffer.isView(value)) return (value as unknown as Float64Array).slice() as T;
  if (Array.isArray(value)) return value.map(cloneLikePostMessage) as T;
  if (value && typeof value === 'object')
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, cloneLikePostMessage(v)])) as T;
  return value;
}

// Results minus wall-clock timing, which is the one thing allowed to differ between runs.
export function comparable(p: PreparedScenario, batches: BatchResult[]): string {
  const r = combineBatches(p, batches, 1);
  return JSON.stringify({ ...r, performance: r.performance.particleSteps }, (_k, v: unknown) =>
    ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v,
  );
}
