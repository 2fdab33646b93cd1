import type { PreparedScenario } from '../../workers/engine/index';

/** A worker as its warm-up sees it: the two calls a run makes, prepare and then run with a progress callback. */
export interface WarmUpApi {
  prepare(scenario: PreparedScenario): void | Promise<void>;
  run(batchIndex: number, onProgress: (fraction: number, particleSteps: number) => void): Promise<unknown>;
}

export interface WarmingWorker {
  api: WarmUpApi;
  /** Set while a run has the worker: from then on the warm-up sends nothing. */
  claimed: boolean;
  /** A warm-up loop is going on this worker. */
  warming: boolean;
  /** Generic pieces done, and the version of the page's own scenario it last warmed up on. */
  pieces: number;
  ownVersion: number;
}

export interface WarmUpWork {
  /** The page's own scenario as a warm-up and its version, newest first; undefined before the page names one. */
  own(): { piece: PreparedScenario; version: number } | undefined;
  /** Batches of it a worker runs. */
  ownBatches: number;
  /** Generic piece i, prepared; undefined past the last. */
  piece(i: number): PreparedScenario | undefined;
  /** Wraps the progress callback the way a run sends it (Comlink.proxy in the page). */
  progress(callback: (fraction: number, particleSteps: number) => void): (fraction: number, particleSteps: number) => void;
}

const ignoreProgress = () => {};

/**
 * Warms one idle worker: batches of the page's own scenario first (the branches a run of it will take), then the
 * generic pieces, each sent as a run sends its scenario and batches, and thrown away. Warm-up once had a call of its own
 * in the worker (a batch of a scenario sent with it), and the step loop it compiled did not serve the run: in Chromium a
 * page's first run still began with a wave of deoptimisations and about 70 recompiled functions per worker, and ran
 * its first second at 1.2 M steps/s against 1.8 once warm (bakery slot hood, a trace of the first run, 2026-12-04).
 *
 * Every message goes out in the same synchronous stretch as a check that the worker is not claimed, so nothing of the
 * warm-up's follows a run's own prepare in the worker's queue, and the run's batches never run on a warm-up scenario.
 * A warm-up that fails for any reason ends quietly: the run then compiles the loop itself.
 */
export async function warmUp(w: WarmingWorker, work: WarmUpWork): Promise<void> {
  if (w.warming) return;
  w.warming = true;
  const batch = (b: number) => w.api.run(b, work.progress(ignoreProgress));
  try {
    while (!w.claimed) {
      const own = work.own();
      if (own && w.ownVersion !== own.version) {
        await w.api.prepare(own.piece);
        for (let b = 0; b < work.ownBatches && !w.claimed && work.own()?.version === own.version; b++) await batch(b);
        if (!w.claimed) w.ownVersion = own.version;
        continue;
      }
      const piece = work.piece(w.pieces);
      if (!piece) return;
      await w.api.prepare(piece);
      if (w.claimed) return;
      await batch(0);
      w.pieces += 1;
    }
  } catch {
    /* optional work: the run will compile the loop itself */
  } finally {
    w.warming = false;
  }
}
