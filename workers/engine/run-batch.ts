import { releaseParticles } from './release';
import { batchStream } from './rng';
import { type StepProgress, stepParticles } from './step-loop';
import type { BatchResult, PreparedScenario } from './types';

/** One independent batch; depends only on (prepared, batchIndex), never on which worker runs it. */
export function runBatch(p: PreparedScenario, batchIndex: number, onProgress?: StepProgress): BatchResult {
  const started = Date.now();
  const rng = batchStream(p.seed, batchIndex);
  const particles = releaseParticles(p, rng);
  const trajectoryBins = new Int32Array(p.trajectory.particles).fill(-1);
  for (let i = 0; i < particles.count; i++) if (particles.slot[i] >= 0) trajectoryBins[particles.slot[i]] = particles.bin[i];
  const tallies = stepParticles(p, particles, rng, onProgress);
  const zoneHistories = new Int32Array(p.bins.count);
  for (let i = 0; i < particles.count; i++) if (tallies.zoneVisited[i]) zoneHistories[particles.bin[i]]++;
  const result: BatchResult = {
    batchIndex,
    zoneResidence_s: tallies.zoneResidence_s,
    fateMass_mg: tallies.fateMass_mg,
    zoneHistories,
    deposition_mg: tallies.deposition_mg,
    trajectories: tallies.trajectories,
    trajectoryBins,
    particleSteps: tallies.particleSteps,
    wallTime_s: (Date.now() - started) / 1000,
  };
  if (p.keepParticles) {
    result.particles = { x: particles.x, y: particles.y, z: particles.z, t: particles.t, bin: particles.bin, fate: tallies.fate };
  }
  return result;
}

/** The buffers to hand to postMessage's transfer list. */
export function transferables(r: BatchResult): ArrayBuffer[] {
  const arrays: ArrayBufferView[] = [r.zoneResidence_s, r.fateMass_mg, r.zoneHistories, r.deposition_mg, r.trajectories, r.trajectoryBins];
  if (r.particles) arrays.push(r.particles.x, r.particles.y, r.particles.z, r.particles.t, r.particles.bin, r.particles.fate);
  return arrays.map((a) => a.buffer as ArrayBuffer);
}
