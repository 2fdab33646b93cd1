import { useId } from 'react';
import { TARGETS, type Target, type TargetId } from '@/features/compare/lib/target';

// Native radios: arrow keys move between targets without extra key handling.
export function TargetPicker({ value, onChange }: { value: Target; onChange: (id: TargetId) => void }) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-2 text-sm">
      <legend className="mb-1 font-semibold">Target for the daily 95th percentile (as the banner judges it)</legend>
      {TARGETS.map((t) => (
        <label
          key={t.id}
          className={`cursor-pointer rounded-full border px-3 py-1 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent ${value.id === t.id ? 'border-accent bg-accent-soft font-semibold text-accent-strong' : 'border-line bg-white'}`}
        >
          <input type="radio" name={name} value={t.id} checked={value.id === t.id} onChange={() => onChange(t.id)} className="sr-only" />
          {t.label}
        </label>
      ))}
      {value.note && <p className="w-full text-xs text-muted">{value.note}</p>}
    </fieldset>
  );
}
