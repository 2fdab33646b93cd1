import type { CaptureVerdictWord } from '../../shared/physics/capture-verdict';
import { judgeOptions } from '../../shared/verdict/judge-options';
import { FRACTIONS, type Fraction } from '../../shared/vocabulary/fractions';

type FractionNumbers = {
  twa8h_mgPerM3: number;
  twa8hCi95_mgPerM3: [number, number];
  zoneHistories?: number;
  peak15min_mgPerM3?: number;
  peak15minCi95_mgPerM3?: [number, number];
};

/** What a verdict needs from a run, per fraction: kept beside the run so reading never parses its whole result. */
export type VerdictNumbers = {
  histories: number;
  fractions: Record<Fraction, FractionNumbers>;
  captureVelocity?: CaptureVerdictWord;
  /** 'face-velocity' when the check was a downdraft bench's face velocity, not a speed at the source. */
  captureBasis?: 'face-velocity';
  /** The day-to-day GSD the run's scenario set; absent means the default. */
  gsd?: number;
};

type ResultLike = {
  engine: { particles: number };
  breathingZone: {
    fractions: Record<
      Fraction,
      {
        twa8h_mgPerM3: number;
        twa8hCi95_mgPerM3: readonly [number, number] | number[];
        zoneHistories?: number | null;
        peak15min_mgPerM3?: number;
        peak15minCi95_mgPerM3?: readonly [number, number] | number[];
      }
    >;
  };
};

export function verdictNumbers(result: ResultLike, input?: Parameters<typeof judgeOptions>[0]): VerdictNumbers {
  const fractions = {} as VerdictNumbers['fractions'];
  for (const f of FRACTIONS) {
    const s = result.breathingZone.fractions[f];
    fractions[f] = {
      twa8h_mgPerM3: s.twa8h_mgPerM3,
      twa8hCi95_mgPerM3: [s.twa8hCi95_mgPerM3[0], s.twa8hCi95_mgPerM3[1]],
      ...(typeof s.zoneHistories === 'number' ? { zoneHistories: s.zoneHistories } : {}),
      ...(typeof s.peak15min_mgPerM3 === 'number' ? { peak15min_mgPerM3: s.peak15min_mgPerM3 } : {}),
      ...(s.peak15minCi95_mgPerM3
        ? { peak15minCi95_mgPerM3: [s.peak15minCi95_mgPerM3[0], s.peak15minCi95_mgPerM3[1]] as [number, number] }
        : {}),
    };
  }
  const options = input ? judgeOptions(input) : {};
  return { histories: result.engine.particles, fractions, ...options };
}
