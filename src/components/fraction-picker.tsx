import { useId } from 'react';
import { FRACTION_LABEL } from '../../shared/vocabulary/fraction-labels';
import type { Fraction } from '../../shared/vocabulary/fractions';

type Props = { fractions: readonly Fraction[]; legend: string; value: Fraction; onChange: (f: Fraction) => void; limitFraction?: Fraction };

// Native radios: arrow keys move between fractions without any extra key handling.
export function FractionPicker({ fractions, legend, value, onChange, limitFraction }: Props) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-2 text-sm">
      <legend className="sr-only">{legend}</legend>
      <span aria-hidden="true" className="font-semibold">
        Fraction
      </span>
      {fractions.map((f) => (
        <label
          key={f}
          className={`cursor-pointer rounded-full border px-3 py-1 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent ${value === f ? 'border-accent bg-accent-soft font-semibold text-accent-strong' : 'border-line bg-white'}`}
        >
          <input type="radio" name={name} value={f} checked={value === f} onChange={() => onChange(f)} className="sr-only" />
          {FRACTION_LABEL[f]}
          {f === limitFraction && <span className="text-muted"> (limit)</span>}
        </label>
      ))}
    </fieldset>
  );
}
