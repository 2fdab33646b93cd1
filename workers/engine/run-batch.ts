import { releaseParticles } from './release';
import { batchStream } from './rng';
import { type StepProgress, stepParticles } from './step-loop';
import { END_STRIDE, quantisePositions, recordPathEnds, sampledParticles } from './trajectory-sample';
import type { BatchResult, PreparedScenario } from './types';

/** One independent batch; depends only on (prepared, batchIndex), never on which worker runs it. */
export function runBatch(p: PreparedScenario, batchIndex: number, onProgress?: StepProgress): BatchResult {
  const started = Date.now();
  const rng = batchStream(p.seed, batchIndex);
  const particles = releaseParticles(p, rng);
  const trajectoryBins = new Int32Array(p.trajectory.particles).fill(-1);
  for (let i = 0; i < particles.count; i++) if (particles.slot[i] >= 0) trajectoryBins[particles.slot[i]] = particles.bin[i];
  const sampled = sampledParticles(p, particles.slot, particles.count);
  const trajectoryEnds = new Float32Array(p.trajectory.particles * END_STRIDE).fill(NaN);
  recordPathEnds(trajectoryEnds, sampled, particles, 'release');
  const tallies = stepParticles(p, particles, rng, onProgress);
  recordPathEnds(trajectoryEnds, sampled, particles, 'end');
  const zoneHistories = new Int32Array(p.bins.count);
  for (let i = 0; i < particles.count; i++) if (tallies.zoneVisited[i]) zoneHistories[particles.bin[i]]++;
  const result: BatchResult = {
    batchIndex,
    zoneResidence_s: tallies.zoneResidence_s,
    fateMass_mg: tallies.fateMass_mg,
    zoneHistories,
    deposition_mg: tallies.deposition_mg,
    trajectories: quantisePositions(tallies.trajectories),
    trajectoryBins,
    trajectoryFates: Int8Array.from(sampled, (i) => (i >= 0 ? tallies.fate[i] : -1)),
    trajectoryEnds,
    particleSteps: tallies.particleSteps,
    splitCopies: tallies.copies,
    rouletteRemoved: tallies.rouletteRemoved,
    wallTime_s: (Date.now() - started) / 1000,
  };
  if (p.keepParticles) {
    result.particles = { x: particles.x, y: particles.y, z: particles.z, t: particles.t, bin: particles.bin, fate: tallies.fate };
  }
  return result;
}

/** The buffers to hand to postMessage's transfer list. */
export function transferables(r: BatchResult): ArrayBuffer[] {
  const arrays: ArrayBufferView[] = [
    r.zoneResidence_s,
    r.fateMass_mg,
    r.zoneHistories,
    r.deposition_mg,
    r.trajectories,
    r.trajectoryBins,
    r.trajectoryFates,
    r.trajectoryEnds,
  ];
  if (r.particles) arrays.push(r.particles.x, r.particles.y, r.particles.z, r.particles.t, r.particles.bin, r.particles.fate);
  return arrays.map((a) => a.buffer as ArrayBuffer);
}
