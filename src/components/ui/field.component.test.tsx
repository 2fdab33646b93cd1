import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { SelectField, TextField } from './field';
import { IdSelectField } from './id-select-field';

// Accessible names and descriptions as WAI-ARIA 1.2 / accname 1.2 compute them: <label for> names the control,
// aria-describedby describes it; an invalid control carries aria-invalid="true".
describe('labelled fields', () => {
  it('names a text field by its label and describes it by its hint until there is an error', () => {
    const { rerender } = render(<TextField label="Particle density" unit="kg/m³" hint="2650 for quartz" />);
    const input = screen.getByRole('textbox', { name: 'Particle density' });
    expect(input.getAttribute('aria-invalid')).toBeNull();
    expect(screen.getByRole('textbox', { description: '2650 for quartz' })).toBe(input);
    rerender(<TextField label="Particle density" unit="kg/m³" hint="2650 for quartz" error="Too large" />);
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('textbox', { description: 'Too large' })).toBe(input);
    expect(screen.queryByText('2650 for quartz')).toBeNull();
    expect(screen.getByRole('alert').textContent).toBe('Too large');
  });

  it('ties a select field to its label and its error the same way', () => {
    render(
      <SelectField label="Release type" error="Choose one">
        <option value="">Choose…</option>
      </SelectField>,
    );
    const select = screen.getByRole('combobox', { name: 'Release type' });
    expect(select.getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('combobox', { description: 'Choose one' })).toBe(select);
  });
});

// A select's value is always a string (HTML Standard, the select element's value IDL attribute); the field turns it back.
describe('select over stored records', () => {
  const options = [
    { id: 7, name: 'Quartz' },
    { id: 12, name: 'Flour' },
  ];

  function Harness({ seen }: { seen: (number | null)[] }) {
    const [value, setValue] = useState<number | null>(null);
    return (
      <IdSelectField
        label="Dust agent"
        options={options}
        none="None"
        value={value}
        onChange={(id) => {
          seen.push(id);
          setValue(id);
        }}
      />
    );
  }

  it('reports the chosen id as a number and the first option as no record', async () => {
    const user = userEvent.setup();
    const seen: (number | null)[] = [];
    render(<Harness seen={seen} />);
    const select = screen.getByRole('combobox', { name: 'Dust agent' });
    expect(screen.getAllByRole('option').map((o) => o.textContent)).toEqual(['None', 'Quartz', 'Flour']);
    await user.selectOptions(select, 'Flour');
    await user.selectOptions(select, 'None');
    expect(seen).toEqual([12, null]);
    expect((select as HTMLSelectElement).value).toBe('');
  });
});
