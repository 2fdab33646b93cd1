import { resourceUsage } from 'node:process';
import { parseScenario } from '../../shared/schemas/scenario';
import { prepareScenario, runBatch } from '../engine/index';
import { referenceScenario } from '../engine/reference-scenario';

export const MEMORY_PARTICLES = 1_000_000;
export const MEMORY_TARGET_MB = 200;

export interface MemoryFigure {
  particles: number;
  particleSteps: number;
  before_MB: number;
  peak_MB: number;
  resident_MB: number;
  heapUsed_MB: number;
  typedArrays_MB: number;
}

const MB = 1024 * 1024;

/**
 * Prepares and runs one batch of a million reference particles in this thread, before any worker
 * starts, so the process's resident memory is this batch's and nothing else's. The batch runs as a
 * normal run does (variance reduction on, so with its store of split copies); two batches is the
 * fewest a run may have and keeps the run within its 5-million-particle bound.
 */
export function measureBatchMemory(): MemoryFigure {
  const before = process.memoryUsage();
  const batches = 2;
  const scenario = { ...referenceScenario, run: { ...referenceScenario.run, particles: MEMORY_PARTICLES * batches, batches } };
  const prepared = prepareScenario(parseScenario(scenario));
  const result = runBatch(prepared, 0);
  const after = process.memoryUsage();
  return {
    particles: prepared.particlesPerBatch,
    particleSteps: result.particleSteps,
    before_MB: before.rss / MB,
    // maxRSS is in KiB.
    peak_MB: (resourceUsage().maxRSS * 1024) / MB,
    resident_MB: after.rss / MB,
    heapUsed_MB: after.heapUsed / MB,
    typedArrays_MB: after.arrayBuffers / MB,
  };
}

export function describeMemory(m: MemoryFigure): string {
  const verdict = m.peak_MB <= MEMORY_TARGET_MB ? 'within' : 'over';
  return (
    `one batch of ${m.particles.toLocaleString('en')} reference particles (${(m.particleSteps / 1e6).toFixed(0)} M steps) prepared and run in one thread: ` +
    `peak resident ${m.peak_MB.toFixed(0)} MB (${m.before_MB.toFixed(0)} MB before), after the run ${m.resident_MB.toFixed(0)} MB resident, ` +
    `heap used ${m.heapUsed_MB.toFixed(1)} MB, typed arrays ${m.typedArrays_MB.toFixed(1)} MB; ${verdict} the target of ≤ ${MEMORY_TARGET_MB} MB for a million particles`
  );
}
