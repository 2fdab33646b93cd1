import { captureVelocityRange, type ReleaseCondition } from '../../../../shared/physics/index';
import { RELEASE_TYPE_LABEL } from '../../../../shared/vocabulary/index';
import { sig } from '@/lib/format';
import type { HandCalc } from './hand-calc';
import { formatValue } from './parameter-format';
import type { SweepParameter } from './sweep-points';
import type { Crossing } from './target-crossing';

const QUANTITY: Record<SweepParameter, string> = { distance: 'distance', airflow: 'airflow', faceScale: 'face size' };
// Differences smaller than this are within what a swept grid and an interpolation can resolve.
const AGREE_WITHIN = 0.1;

export function crossingSentence(crossing: Crossing, parameter: SweepParameter, targetPercent: number): string {
  const f = (v: number) => formatValue(parameter, v);
  const target = `the upper 95 % bound at or below ${sig(targetPercent, 3)} % of the limit`;
  const best = parameter === 'distance' ? 'largest distance' : `least ${QUANTITY[parameter]}`;
  if (crossing.kind === 'none') return `No swept point meets the target (${target}); the ${best} that does lies outside the range swept.`;
  if (crossing.kind === 'beyond-range') {
    return `Even the ${parameter === 'distance' ? 'largest' : 'smallest'} ${QUANTITY[parameter]} swept, ${f(crossing.value)}, meets the target (${target}), so the ${best} that does lies beyond the range swept.`;
  }
  return `The ${best} that meets the target (${target}) is about ${f(crossing.value)}, interpolated linearly between the swept points at ${f(crossing.meets)} (meets) and ${f(crossing.fails)} (does not); more points between them would pin it down.`;
}

export function handCalcSentence(calc: HandCalc, release: ReleaseCondition, equation: string): string {
  const range = captureVelocityRange(release);
  const v = `${sig(calc.captureVelocity_mPerS, 2)} m/s, the low end of the ${sig(range.min_mPerS, 2)}–${sig(range.max_mPerS, 2)} m/s range for ${RELEASE_TYPE_LABEL[release].phrase}`;
  if (calc.kind === 'airflow')
    return `Hand calculation (${equation}): a capture velocity of ${v}, at the source distance of ${formatValue('distance', calc.distance_m)}, needs ${formatValue('airflow', calc.airflow_m3PerS)}.`;
  if (calc.kind === 'distance') {
    return calc.distance_m === null
      ? `Hand calculation (${equation}): at ${formatValue('airflow', calc.airflow_m3PerS)} the hood never reaches a capture velocity of ${v}, even at its face.`
      : `Hand calculation (${equation}): at ${formatValue('airflow', calc.airflow_m3PerS)} the centre-line velocity falls to the capture velocity of ${v} at ${formatValue('distance', calc.distance_m)} from the face.`;
  }
  return calc.faceScale === null
    ? `Hand calculation (${equation}): at ${formatValue('airflow', calc.airflow_m3PerS)} no face size gives a capture velocity of ${v} at the source distance of ${formatValue('distance', calc.distance_m)}.`
    : `Hand calculation (${equation}): at ${formatValue('airflow', calc.airflow_m3PerS)} faces up to ${formatValue('faceScale', calc.faceScale)} still give a capture velocity of ${v} at the source distance of ${formatValue('distance', calc.distance_m)}.`;
}

const handValue = (calc: HandCalc) =>
  calc.kind === 'airflow' ? calc.airflow_m3PerS : calc.kind === 'distance' ? calc.distance_m : calc.faceScale;

/** One sentence on where the simulated dose and the capture-velocity rule part ways, and what that means for the design. */
export function disagreementSentence(crossing: Crossing, calc: HandCalc, parameter: SweepParameter): string {
  const hand = handValue(calc);
  if (hand === null) return 'The hand calculation gives no answer here, so only the simulated exposure can guide the choice.';
  if (crossing.kind === 'none')
    return `The simulation does not meet the target anywhere in the range while the rule gives ${formatValue(parameter, hand)}: sizing by the capture velocity alone would leave the worker above the target here.`;
  const mc = crossing.value;
  const beyond = crossing.kind === 'beyond-range';
  if (!beyond && Math.abs(mc - hand) <= AGREE_WITHIN * Math.max(Math.abs(hand), Math.abs(mc)))
    return `The two agree within ${AGREE_WITHIN * 100} %, so the capture-velocity rule and the simulated dose point to the same design.`;
  if (parameter === 'faceScale') {
    return mc <= hand
      ? `Faces from about ${formatValue(parameter, mc)} to ${formatValue(parameter, hand)} satisfy both the simulated target and the capture-velocity rule; outside that span one of the two fails.`
      : `No face size satisfies both: the simulation needs at least ${formatValue(parameter, mc)} to meet the target, while above ${formatValue(parameter, hand)} the rule's capture velocity is lost at this airflow.`;
  }
  // For distance more is better; for airflow less is better. "Simulation looser" means the rule is the cautious one.
  const simulationLooser = parameter === 'distance' ? mc > hand : mc < hand;
  if (beyond && !simulationLooser)
    return `The simulation meets the target across the whole range, so it cannot yet say how it compares with the rule's ${formatValue(parameter, hand)}; widen the range.`;
  return simulationLooser
    ? `The simulation meets the target ${parameter === 'distance' ? 'farther from the source' : 'with less airflow'} than the capture-velocity rule allows (${formatValue(parameter, hand)}): the rule checks only the air speed at the source, so here it is the more cautious of the two.`
    : `The simulation needs ${parameter === 'distance' ? 'the hood closer' : 'more airflow'} than the capture-velocity rule (${formatValue(parameter, hand)}): drafts, diffusion and where the worker breathes carry dust past a hood the rule would pass, so designing by the rule alone would fall short here.`;
}
