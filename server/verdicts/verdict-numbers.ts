import { captureCheck, type CaptureVerdictWord } from '../../shared/physics/capture-verdict';
import { FRACTIONS, type Fraction } from '../../shared/vocabulary/fractions';

type FractionNumbers = { twa8h_mgPerM3: number; twa8hCi95_mgPerM3: [number, number]; zoneHistories?: number };

/** What a verdict needs from a run, per fraction: kept beside the run so reading never parses its whole result. */
export type VerdictNumbers = { histories: number; fractions: Record<Fraction, FractionNumbers>; captureVelocity?: CaptureVerdictWord };

type ResultLike = {
  engine: { particles: number };
  breathingZone: {
    fractions: Record<
      Fraction,
      { twa8h_mgPerM3: number; twa8hCi95_mgPerM3: readonly [number, number] | number[]; zoneHistories?: number | null }
    >;
  };
};

export function verdictNumbers(result: ResultLike, input?: Parameters<typeof captureCheck>[0]): VerdictNumbers {
  const fractions = {} as VerdictNumbers['fractions'];
  for (const f of FRACTIONS) {
    const s = result.breathingZone.fractions[f];
    fractions[f] = {
      twa8h_mgPerM3: s.twa8h_mgPerM3,
      twa8hCi95_mgPerM3: [s.twa8hCi95_mgPerM3[0], s.twa8hCi95_mgPerM3[1]],
      ...(typeof s.zoneHistories === 'number' ? { zoneHistories: s.zoneHistories } : {}),
    };
  }
  const captureVelocity = input ? captureCheck(input)?.verdict : undefined;
  return { histories: result.engine.particles, fractions, ...(captureVelocity ? { captureVelocity } : {}) };
}
