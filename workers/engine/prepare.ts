import { captureCheck } from '../../shared/physics/capture-verdict';
import { judgeOptions } from '../../shared/verdict/judge-options';
import type { Scenario } from '../../shared/schemas/scenario';
import { airProperties, eddyDiffusivityFromVentilation } from '../../shared/physics/index';
import { zoneVolume_m3 } from './breathing-zone';
import { packHoods } from './hood-field';
import { buildSizeBins } from './size-bins';
import type { PreparedScenario } from './types';

export const TIME_BINS = 120;
const TRAJECTORY_PARTICLES = 64;
const TRAJECTORY_FRAMES = 150;

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
  const eddy = s.room.eddyDiffusivity_m2PerS ?? eddyDiffusivityFromVentilation(s.room.airChanges_perH, volume_m3);
  const duration_s = s.run.duration_s ?? s.source.emission.taskDuration_min * 60;
  const emission = emissionPlan(s.source, duration_s);
  const particlesPerBatch = Math.max(1, Math.ceil(s.run.particles / s.run.batches));
  const bins = buildSizeBins(s.dust, air, particlesPerBatch, emission.emitted_mg, eddy);
  const timeBin_s = duration_s / TIME_BINS;
  const direction = (s.room.draftDirection_deg * Math.PI) / 180;
  const w = s.worker;
  return {
    seed: s.run.seed,
    batches: s.run.batches,
    particlesPerBatch,
    room,
    exhaustRate_perS: s.room.airChanges_perH / 3600,
    draft_mPerS: [s.room.draftSpeed_mPerS * Math.cos(direction), s.room.draftSpeed_mPerS * Math.sin(direction)],
    eddyDiffusivity_m2PerS: eddy,
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
      particles: TRAJECTORY_PARTICLES,
      frames: TRAJECTORY_FRAMES,
      frameInterval_s: Math.min(duration_s, 300) / TRAJECTORY_FRAMES,
    },
    limit: s.limit
      ? { fraction: s.limit.fraction, value_mgPerM3: s.limit.value_mgPerM3, shortTerm_mgPerM3: s.limit.shortTerm_mgPerM3 }
      : undefined,
    captureVelocity: captureCheck(s)?.verdict,
    judging: judgeOptions(s),
    crossCheck: {
      airflow_m3PerS: (s.room.airChanges_perH * volume_m3) / 3600,
      hoodAirflow_m3PerS: s.hoods.reduce((a, h) => a + h.airflow_m3PerS, 0),
      sourceToZone_m: Math.hypot(s.source.x_m - w.x_m, s.source.y_m - w.y_m, s.source.z_m - w.z_m),
      // The near-field boundary sees at least the draft; 0.05 m/s stands in for still air (common practice).
      randomAirSpeed_mPerS: Math.max(s.room.draftSpeed_mPerS, 0.05),
      sourceOnFloor: s.source.z_m <= 0.05,
    },
    keepParticles: false,
  };
}
