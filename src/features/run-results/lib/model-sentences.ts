import { readableNumber, trimSig } from '../../../../shared/format/index';
import type { RunResult } from '../../../../shared/schemas/run-result';

type Model = NonNullable<RunResult['model']>;

const angle = (v: number) => (Math.abs(v) < 0.05 ? 0 : v);

// Azimuth in the plan (0° along the room's length) and elevation above the horizontal.
function directionWords([x, y, z]: readonly [number, number, number]): string {
  const azimuth = Math.round(angle((Math.atan2(y, x) * 180) / Math.PI) + 360) % 360;
  const elevation = Math.round((Math.asin(Math.max(-1, Math.min(1, z))) * 180) / Math.PI);
  if (Math.abs(elevation) >= 85) return elevation > 0 ? 'straight up' : 'straight down';
  return `at ${azimuth}° in plan, ${elevation}° ${elevation >= 0 ? 'up' : 'down'}`;
}

/** The assumptions a run made beyond its inputs, one plain sentence each. */
export function modelSentences(model: Model | undefined): string[] {
  if (!model) return ['This run predates engine 2.0: it did not model the release jet, surface deposition or young dust’s slower mixing.'];
  const d = readableNumber(model.roomDiffusivity_m2PerS);
  const turbulence = model.roomDiffusivityRange_m2PerS
    ? `Room turbulence: eddy diffusivity ${d} m²/s. The estimate ${model.roomDiffusivityBasis} (Cheng et al. 2011).`
    : `Room turbulence: eddy diffusivity ${d} m²/s, given by the engineer.`;
  const young = `Dust younger than about ${trimSig(3 * model.lagrangianTime_s, 2)} s mixes more slowly (it has not yet met the room’s large eddies).`;
  const jet = model.jet
    ? `Release jet: ${trimSig(model.jet.speed_mPerS, 3)} m/s from a ${trimSig(model.jet.diameter_m * 100, 3)} cm stream, ${directionWords(model.jet.direction)}${model.jet.fromDefault ? ', the release type’s default aimed at the breathing zone' : ', as entered'}.`
    : 'Release jet: none (a quiet release, or no release type given).';
  const surfaces = model.wallDeposition
    ? `Walls, ceiling and floor collect dust (Lai & Nazaroff 2000, friction velocity ${trimSig(model.frictionVelocity_mPerS * 100, 2)} cm/s).`
    : 'Walls and ceiling reflect dust; only the floor collects it, by settling.';
  return [turbulence, young, jet, surfaces];
}
