import { captureCheck } from '../../shared/physics/capture-verdict';
import { judgeOptions } from '../../shared/verdict/judge-options';
import type { Scenario } from '../../shared/schemas/scenario';
import { airProperties, roomEddyDiffusivity } from '../../shared/physics/index';
import { resolveJet } from '../../shared/physics/release-jets';
import { releaseJet } from './release-jet';
import { surfaceDeposition } from './surfaces';
import { zoneVolume_m3 } from './breathing-zone';
import { packHoods } from './hood-field';
import { CONVENTIONS, buildSizeBins } from './size-bins';
import type { PreparedScenario } from './types';
import { cos, hypot3, sin } from '../../shared/det-math/index';
import { importancePlan } from './importance';

export const TIME_BINS = 120;
// Taylor's D = σ_u²·T_L with σ_u ≈ 0.1 m/s, a typical turbulent speed in a ventilated workroom [P] common practice.
export const ROOM_TURBULENT_SPEED_mPerS = 0.1;
// At least 500 paths over the whole run, shared out over the batches; 120 frames keep a saved run small.
const TRAJECTORY_PATHS = 512;
const TRAJECTORY_FRAMES = 120;

// Only what is released inside the simulated window counts as emitted.
function emissionPlan(source: Scenario['source'], duration_s: number) {
  const e = source.emission;
  const task_s = Math.min(e.taskDuration_min * 60, duration_s);
  if (e.kind === 'continuous') {
    return { kind: e.kind, emitted_mg: (e.rate_mgPerMin * task_s) / 60, release_s: task_s, eventTimes_s: new Float64Array(0) };
  }
  // Events start at t = 0 and repeat every 3600/eventsPerHour s within the task.
  const interval_s = 3600 / e.eventsPerHour;
  const events = Math.max(1, Math.ceil(task_s / interval_s - 1e-9));
  const eventTimes_s = Float64Array.from({ length: events }, (_, j) => j * interval_s);
  return { kind: e.kind, emitted_mg: e.massPerEvent_mg * events, release_s: task_s, eventTimes_s };
}

export function prepareScenario(s: Scenario): PreparedScenario {
  const air = airProperties({ temperature_K: s.room.temperature_K, pressure_Pa: s.room.pressure_Pa });
  const volume_m3 = s.room.length_m * s.room.width_m * s.room.height_m;
  const room = { length_m: s.room.length_m, width_m: s.room.width_m, height_m: s.room.height_m, volume_m3 };
  const estimate = roomEddyDiffusivity(s.room.airChanges_perH, volume_m3);
  const given = s.room.eddyDiffusivity_m2PerS;
  const eddy = given ?? estimate.value_m2PerS;
  const duration_s = s.run.duration_s ?? s.source.emission.taskDuration_min * 60;
  const emission = emissionPlan(s.source, duration_s);
  const particlesPerBatch = Math.max(1, Math.ceil(s.run.particles / s.run.batches));
  // Variance reduction also spends particles where the limit's fraction lies (size-bins.ts allocateParticles).
  const emphasis = s.run.varianceReduction && s.limit ? CONVENTIONS[s.limit.fraction] : undefined;
  const bins = buildSizeBins(s.dust, air, particlesPerBatch, emission.emitted_mg, eddy, emphasis);
  const direction = (s.room.draftDirection_deg * Math.PI) / 180;
  const draft_mPerS: [number, number] = [s.room.draftSpeed_mPerS * cos(direction), s.room.draftSpeed_mPerS * sin(direction)];
  const surfaces = surfaceDeposition(s, bins, air, draft_mPerS);
  const timeBin_s = duration_s / TIME_BINS;
  const jet = releaseJet(s);
  const resolved = resolveJet(s.source, s.worker);
  const lagrangianTime_s = eddy / (ROOM_TURBULENT_SPEED_mPerS * ROOM_TURBULENT_SPEED_mPerS);
  const w = s.worker;
  return {
    seed: s.run.seed,
    batches: s.run.batches,
    particlesPerBatch,
    room,
    exhaustRate_perS: s.room.airChanges_perH / 3600,
    draft_mPerS,
    eddyDiffusivity_m2PerS: eddy,
    lagrangianTime_s,
    jet,
    surfaces,
    bins,
    source: { x_m: s.source.x_m, y_m: s.source.y_m, z_m: s.source.z_m, shape: s.source.shape, size_m: s.source.size_m },
    emission,
    hoods: { count: s.hoods.length, params: packHoods(s.hoods) },
    zone: { x_m: w.x_m, y_m: w.y_m, z_m: w.z_m, radius_m: w.radius_m, volume_m3: zoneVolume_m3(room, w.x_m, w.y_m, w.z_m, w.radius_m) },
    duration_s,
    timeBin_s,
    timeBins: TIME_BINS,
    // A step never spans more than a quarter of a time bin, so residence lands in the right bin.
    maxTimeStep_s: Math.min(s.run.maxTimeStep_s, timeBin_s / 4),
    stepFraction: s.run.stepFraction,
    task: {
      minutesPerShift: s.source.taskMinutesPerShift ?? Math.min(480, s.source.emission.taskDuration_min),
      background_mgPerM3: s.source.background_mgPerM3,
    },
    deposition: { nx: 40, ny: 40 },
    trajectory: {
      particles: Math.ceil(TRAJECTORY_PATHS / s.run.batches),
      frames: TRAJECTORY_FRAMES,
      frameInterval_s: duration_s / TRAJECTORY_FRAMES,
    },
    limit: s.limit
      ? { fraction: s.limit.fraction, value_mgPerM3: s.limit.value_mgPerM3, shortTerm_mgPerM3: s.limit.shortTerm_mgPerM3 }
      : undefined,
    captureVelocity: captureCheck(s)?.verdict,
    judging: judgeOptions(s),
    crossCheck: {
      airflow_m3PerS: (s.room.airChanges_perH * volume_m3) / 3600,
      hoodAirflow_m3PerS: s.hoods.reduce((a, h) => a + h.airflow_m3PerS, 0),
      sourceToZone_m: hypot3(s.source.x_m - w.x_m, s.source.y_m - w.y_m, s.source.z_m - w.z_m),
      // The near-field boundary sees at least the draft; 0.05 m/s stands in for still air (common practice).
      randomAirSpeed_mPerS: Math.max(s.room.draftSpeed_mPerS, 0.05),
      sourceOnFloor: s.source.z_m <= 0.05,
    },
    model: {
      roomDiffusivity_m2PerS: eddy,
      roomDiffusivityRange_m2PerS: given === undefined ? [estimate.range[0], estimate.range[1]] : null,
      roomDiffusivityBasis: given === undefined ? estimate.basis : 'given by the engineer',
      lagrangianTime_s,
      jet: resolved && {
        speed_mPerS: resolved.speed_mPerS,
        diameter_m: resolved.diameter_m,
        direction: resolved.direction,
        fromDefault: resolved.fromDefault,
      },
      wallDeposition: s.room.wallDeposition,
      frictionVelocity_mPerS: surfaces.frictionVelocity_mPerS,
    },
    varianceReduction: importancePlan(
      s.run.varianceReduction,
      w.radius_m,
      hypot3(s.source.x_m - w.x_m, s.source.y_m - w.y_m, s.source.z_m - w.z_m) - w.radius_m,
      s.hoods.length,
    ),
    keepParticles: false,
  };
}
