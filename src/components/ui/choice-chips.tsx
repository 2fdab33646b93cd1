import { useId, type ReactNode } from 'react';

type Look = 'pill' | 'box';

const LOOK: Record<Look, { group: string; caption: string; chip: string; off: string }> = {
  pill: {
    group: 'flex flex-wrap items-center gap-2 text-sm',
    caption: 'font-semibold',
    chip: 'rounded-full px-3 py-1',
    off: 'border-line bg-white',
  },
  box: { group: 'flex items-center gap-1', caption: 'mr-1 font-semibold', chip: 'rounded-md px-2 py-1 tabular-nums', off: 'border-line' },
};

type Props<T extends string | number> = {
  legend: string;
  // Shown beside the choices; screen readers hear the legend instead.
  caption: string;
  options: readonly T[];
  value: T;
  onChange: (v: T) => void;
  label: (v: T) => ReactNode;
  look?: Look;
};

// Native radios: arrow keys move between the choices without any extra key handling.
export function ChoiceChips<T extends string | number>({ legend, caption, options, value, onChange, label, look = 'pill' }: Props<T>) {
  const name = useId();
  const style = LOOK[look];
  return (
    <fieldset className={style.group}>
      <legend className="sr-only">{legend}</legend>
      <span aria-hidden="true" className={style.caption}>
        {caption}
      </span>
      {options.map((o) => (
        <label
          key={o}
          className={`cursor-pointer border ${style.chip} has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-accent ${value === o ? 'border-accent bg-accent-soft font-semibold text-accent-strong' : style.off}`}
        >
          <input type="radio" name={name} value={o} checked={value === o} onChange={() => onChange(o)} className="sr-only" />
          {label(o)}
        </label>
      ))}
    </fieldset>
  );
}
