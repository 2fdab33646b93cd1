import { DIAMETER_UNITS, type DiameterUnit } from '../../../../shared/schemas/calculators';
import { SelectField, TextField } from '@/components/ui/field';

export type ParticleFormState = {
  diameter: string;
  diameterUnit: DiameterUnit;
  density_kgPerM3: string;
  shapeFactor: string;
  temperature_C: string;
  pressure_kPa: string;
  window_s: string;
};

export const PARTICLE_DEFAULTS: ParticleFormState = {
  diameter: '10',
  diameterUnit: 'um',
  density_kgPerM3: '1000',
  shapeFactor: '1',
  temperature_C: '20',
  pressure_kPa: '101.325',
  window_s: '1',
};

const UNIT_LABELS: Record<DiameterUnit, string> = { nm: 'nm', um: 'µm', mm: 'mm' };

// type="text" with inputMode keeps half-typed values like "1e-" in the field instead of the browser blanking them.
const numeric = { type: 'text', inputMode: 'decimal', autoComplete: 'off', spellCheck: false } as const;

export function ParticleForm({
  form,
  errors,
  onChange,
}: {
  form: ParticleFormState;
  errors: Record<string, string>;
  onChange: (patch: Partial<ParticleFormState>) => void;
}) {
  return (
    <form
      aria-label="Particle and air"
      onSubmit={(e) => e.preventDefault()}
      className="grid gap-4 rounded-lg border border-line bg-white p-4 md:grid-cols-3 lg:grid-cols-1"
    >
      <div className="grid grid-cols-[1fr_6rem] items-start gap-2">
        <TextField
          label="Diameter"
          {...numeric}
          value={form.diameter}
          error={errors.diameter}
          hint="Physical, volume-equivalent."
          onChange={(e) => onChange({ diameter: e.target.value })}
        />
        <SelectField label="Unit" value={form.diameterUnit} onChange={(e) => onChange({ diameterUnit: e.target.value as DiameterUnit })}>
          {DIAMETER_UNITS.map((u) => (
            <option key={u} value={u}>
              {UNIT_LABELS[u]}
            </option>
          ))}
        </SelectField>
      </div>
      <TextField
        label="Particle density"
        unit="kg/m³"
        {...numeric}
        value={form.density_kgPerM3}
        error={errors.density_kgPerM3}
        hint="Unit density is 1000; quartz 2650."
        onChange={(e) => onChange({ density_kgPerM3: e.target.value })}
      />
      <TextField
        label="Dynamic shape factor"
        unit="–"
        {...numeric}
        value={form.shapeFactor}
        error={errors.shapeFactor}
        hint="1 for a sphere; about 1.4–2 for angular mineral dust."
        onChange={(e) => onChange({ shapeFactor: e.target.value })}
      />
      <TextField
        label="Air temperature"
        unit="°C"
        {...numeric}
        value={form.temperature_C}
        error={errors.temperature_C}
        onChange={(e) => onChange({ temperature_C: e.target.value })}
      />
      <TextField
        label="Air pressure"
        unit="kPa"
        {...numeric}
        value={form.pressure_kPa}
        error={errors.pressure_kPa}
        hint="101.325 kPa at sea level."
        onChange={(e) => onChange({ pressure_kPa: e.target.value })}
      />
      <TextField
        label="Time window"
        unit="s"
        {...numeric}
        value={form.window_s}
        error={errors.window_s}
        hint="Distances below are over this time."
        onChange={(e) => onChange({ window_s: e.target.value })}
      />
    </form>
  );
}
