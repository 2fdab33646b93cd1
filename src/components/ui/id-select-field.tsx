import { SelectField } from './field';

export type IdOption = { id: number; name: string };

type Props = {
  label: string;
  options: readonly IdOption[];
  value: number | null | undefined;
  onChange: (id: number | null) => void;
  // The first option: what choosing no stored record means here.
  none: string;
  error?: string;
  className?: string;
};

// Ids travel as numbers; only the select itself sees them as strings.
export function IdSelectField({ options, none, value, onChange, ...field }: Props) {
  return (
    <SelectField {...field} value={value ?? ''} onChange={(e) => onChange(e.target.value === '' ? null : Number(e.target.value))}>
      <option value="">{none}</option>
      {options.map((o) => (
        <option key={o.id} value={o.id}>
          {o.name}
        </option>
      ))}
    </SelectField>
  );
}
