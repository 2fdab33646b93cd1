import type { ReleaseCondition } from '../../../../shared/physics/index';
import type { Hood } from '../../../../shared/schemas/scenario';
import { benchHandCalcSentence, handCalcAnswer, handCalcCovers, HOOD_EQUATION } from '@/features/sweep/lib/hand-calc';
import { PARAMETER } from '@/features/sweep/lib/parameter-format';
import { crossingSentence, disagreementSentence, handCalcSentence } from '@/features/sweep/lib/sweep-summary';
import type { SweepParameter } from '@/features/sweep/lib/sweep-points';
import { targetCrossing, type CrossingPoint } from '@/features/sweep/lib/target-crossing';

type Props = {
  points: CrossingPoint[];
  parameter: SweepParameter;
  targetPercent: number;
  hood: Hood;
  distance_m: number;
  release: ReleaseCondition;
};

// Both answers side by side: the simulated dose and the capture-velocity rule disagree often enough that the engineer must see both.
export function SweepAnswer({ points, parameter, targetPercent, hood, distance_m, release }: Props) {
  const crossing = targetCrossing(points, targetPercent, PARAMETER[parameter].preferred);
  // A downdraft bench has no centre-line hand calculation: its face velocity is quoted instead.
  const covered = handCalcCovers(hood.kind) ? hood.kind : null;
  const calc = covered ? handCalcAnswer(hood, distance_m, release, parameter) : null;
  return (
    <section aria-labelledby="sweep-answer-heading" className="grid gap-3 md:grid-cols-2">
      <h2 id="sweep-answer-heading" className="md:col-span-2">
        What the sweep says
      </h2>
      <div className="rounded-lg border border-accent bg-accent-soft p-4 text-sm">
        <h3 className="mb-1 font-semibold">Simulation</h3>
        <p data-testid="sweep-meets">{crossingSentence(crossing, parameter, targetPercent)}</p>
      </div>
      <div className="rounded-lg border border-line bg-white p-4 text-sm">
        <h3 className="mb-1 font-semibold">{calc ? 'Capture-velocity rule' : 'Face-velocity guidance'}</h3>
        <p data-testid="sweep-hand-calc">
          {calc && covered
            ? handCalcSentence(calc, release, `Dalla Valle / ACGIH, ${HOOD_EQUATION[covered]}`)
            : benchHandCalcSentence(hood)}
        </p>
      </div>
      <p data-testid="sweep-disagreement" className="rounded-lg border border-line bg-paper-deep p-4 text-sm md:col-span-2">
        <strong>Where they differ: </strong>
        {calc
          ? disagreementSentence(crossing, calc, parameter)
          : 'There is no hand calculation to set beside the sweep for a downdraft bench, so only the simulated exposure can guide the choice.'}
      </p>
    </section>
  );
}
