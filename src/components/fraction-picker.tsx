import { FRACTION_LABEL } from '../../shared/vocabulary/fraction-labels';
import type { Fraction } from '../../shared/vocabulary/fractions';
import { ChoiceChips } from '@/components/ui/choice-chips';

type Props = { fractions: readonly Fraction[]; legend: string; value: Fraction; onChange: (f: Fraction) => void; limitFraction?: Fraction };

export function FractionPicker({ fractions, legend, value, onChange, limitFraction }: Props) {
  return (
    <ChoiceChips
      legend={legend}
      caption="Fraction"
      options={fractions}
      value={value}
      onChange={onChange}
      label={(f) => (
        <>
          {FRACTION_LABEL[f]}
          {f === limitFraction && <span className="text-muted"> (limit)</span>}
        </>
      )}
    />
  );
}
