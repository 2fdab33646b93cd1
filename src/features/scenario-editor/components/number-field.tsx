import { parseDecimal } from '../../../../shared/format/parse-decimal';
import { useState, type ReactNode } from 'react';
import { TextField } from '@/components/ui/field';
import { formatInput } from '@/features/scenario-editor/lib/format';

type Common = {
  label: string;
  value: number | undefined;
  unit?: string;
  // Conversions from shared/units.ts; the scenario keeps SI, the field shows what people type.
  toDisplay?: (si: number) => number;
  fromDisplay?: (shown: number) => number;
  error?: string;
  hint?: ReactNode;
  placeholder?: string;
  className?: string;
};
// Only an optional field may be cleared back to "not set".
type Props = Common & ({ optional?: false; onValue: (si: number) => void } | { optional: true; onValue: (si: number | undefined) => void });

const same = (v: number) => v;

export function NumberField({
  label,
  value,
  onValue,
  unit,
  toDisplay = same,
  fromDisplay = same,
  optional,
  error,
  hint,
  placeholder,
  className,
}: Props) {
  // Half-typed text ("1.", "-") has no number yet; it stays visible until the scenario moves on without it.
  const [draft, setDraft] = useState<{ text: string; si: number | undefined } | null>(null);
  const editing = draft !== null && Object.is(draft.si, value);
  const text = editing ? draft.text : formatInput(value === undefined ? undefined : toDisplay(value));
  const blank = text.trim() === '';
  const unreadable = editing && parseDecimal(text) === null && !(blank && optional);

  const change = (next: string) => {
    const shown = parseDecimal(next);
    if (shown === null) {
      const cleared = next.trim() === '' && optional;
      setDraft({ text: next, si: cleared ? undefined : value });
      if (cleared) (onValue as (si: number | undefined) => void)(undefined);
      return;
    }
    const si = fromDisplay(shown);
    setDraft({ text: next, si });
    onValue(si);
  };

  return (
    <TextField
      label={label}
      unit={unit}
      value={text}
      inputMode="decimal"
      autoComplete="off"
      placeholder={placeholder}
      className={className}
      onChange={(e) => change(e.target.value)}
      error={unreadable ? 'Enter a number' : error}
      hint={hint}
    />
  );
}
