import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { useState } from 'react';
import { createSizeProfileSchema } from '../../../../shared/schemas/size-profiles';
import { micrometresToMetres } from '../../../../shared/units';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { useSchemaSubmit } from '@/hooks/use-schema-submit';
import { bindFields } from '@/lib/bind-fields';
import { useCreateSizeProfile } from '@/features/size-profiles/api/create-size-profile';

type Mode = 'mmad' | 'cmd' | 'respirable';
const number = (text: string) => (text.trim() === '' ? undefined : decimalOrNaN(text));

export function LognormalForm() {
  const [mode, setMode] = useState<Mode>('mmad');
  const [form, setForm] = useState({ name: '', median_um: '', gsd: '2', density: '', respirable: '' });
  const create = useCreateSizeProfile();
  const median_um = number(form.median_um);
  const input =
    mode === 'respirable'
      ? { kind: 'respirable' as const, name: form.name, respirableFraction: (number(form.respirable) ?? NaN) / 100, gsd: number(form.gsd) }
      : {
          kind: 'lognormal' as const,
          name: form.name,
          basis: mode,
          median_m: median_um === undefined ? NaN : micrometresToMetres(median_um),
          gsd: number(form.gsd) ?? NaN,
          density_kgPerM3: number(form.density),
        };
  const { errors, submit } = useSchemaSubmit(createSizeProfileSchema, input, create);
  const field = bindFields(form, setForm, errors);

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Enter lognormal parameters"
      className="space-y-4 rounded-lg border border-line bg-white p-4"
    >
      <h2 className="text-lg font-semibold">Enter a lognormal or a respirable fraction</h2>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField label="What you know" value={mode} onChange={(e) => setMode(e.target.value as Mode)}>
          <option value="mmad">MMAD and GSD</option>
          <option value="cmd">CMD and GSD (with density)</option>
          <option value="respirable">Respirable fraction only</option>
        </SelectField>
        <TextField label="Name" {...field('name')} />
        {mode === 'respirable' ? (
          <TextField label="Respirable fraction" unit="%" inputMode="decimal" {...field('respirable', 'respirableFraction')} />
        ) : (
          <TextField
            label={mode === 'mmad' ? 'MMAD' : 'CMD (physical)'}
            unit="µm"
            inputMode="decimal"
            {...field('median_um', 'median_m')}
          />
        )}
        <TextField
          label="GSD"
          inputMode="decimal"
          {...field('gsd')}
          hint={mode === 'respirable' ? 'Assumed spread; 2 unless you know better' : undefined}
        />
        {mode === 'cmd' && <TextField label="Particle density" unit="kg/m³" inputMode="decimal" {...field('density', 'density_kgPerM3')} />}
      </div>
      <p className="text-sm text-muted">
        {mode === 'cmd' &&
          'The CMD becomes an MMAD through Hatch–Choate and the density; this is approximate because aerodynamic and physical diameters do not scale alike below about 1 µm. '}
        {mode === 'respirable' &&
          'Stored as given. For the other fractions and the simulation, Motewalk assumes a lognormal of this GSD whose respirable fraction matches: an assumption, not a measurement. '}
      </p>
      <Button type="submit" disabled={create.isPending}>
        {create.isPending ? 'Saving…' : 'Save profile'}
      </Button>
      {create.isSuccess && <Notice>Stored “{create.data.name}”.</Notice>}
      {create.error && <ErrorMessage title="Not stored" error={create.error} />}
    </form>
  );
}
