import { decimalOrNaN } from '../../../../shared/format/parse-decimal';
import { useState, type FormEvent } from 'react';
import { agentInputSchema } from '../../../../shared/schemas/workspace';
import { FRACTION_LABEL, LIMIT_FRACTIONS } from '../../../../shared/vocabulary/index';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorMessage, Notice } from '@/components/ui/status';
import { bindFields } from '@/lib/bind-fields';
import { fieldErrors } from '@/lib/form-errors';
import { useSaveAgent } from '@/features/agents/api/save-agent';
import { VersionConflict } from '@/components/version-conflict';
import { useVersionConflict } from '@/hooks/use-version-conflict';

const num = decimalOrNaN;
const str = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

const fromAgent = (agent?: AgentRecord) => {
  const d = agent?.data;
  return {
    name: agent?.name ?? '',
    density: str(d?.density_kgPerM3 ?? 2650),
    shape: str(d?.shapeFactor ?? 1),
    fraction: d?.limitFraction ?? 'respirable',
    limit8h: str(d?.limit8h_mgPerM3),
    limit15: str(d?.limit15min_mgPerM3),
    jurisdiction: d?.jurisdiction ?? '',
    source: d?.limitSource ?? '',
    date: d?.limitDate ?? '',
    overrideOn: Boolean(d?.override),
    override: str(d?.override?.limit8h_mgPerM3),
    reason: d?.override?.reason ?? '',
  };
};

const LABELS: Record<string, string> = {
  name: 'Name',
  'data.density_kgPerM3': 'Particle density (kg/m³)',
  'data.shapeFactor': 'Dynamic shape factor',
  'data.limitFraction': 'Limit applies to',
  'data.limit8h_mgPerM3': '8-h limit (mg/m³)',
  'data.limit15min_mgPerM3': '15-min limit (mg/m³)',
  'data.jurisdiction': 'Jurisdiction',
  'data.limitSource': 'Source of the limit',
  'data.limitDate': 'Date of the limit',
  'data.override': 'Override',
  'data.override.limit8h_mgPerM3': 'Override 8-h limit (mg/m³)',
  'data.override.reason': 'Reason for the override',
  'data.notes': 'Notes',
};

export function AgentForm({ agent, onDone }: { agent?: AgentRecord; onDone?: () => void }) {
  // The stored agent this edit starts from: after a conflict, the one the person chose to build on.
  const [base, setBase] = useState(agent);
  const d = base?.data;
  const [f, setF] = useState(() => fromAgent(agent));
  const conflict = useVersionConflict<AgentRecord>();
  const [submitted, setSubmitted] = useState(false);
  const save = useSaveAgent();
  const body = {
    name: f.name,
    data: {
      density_kgPerM3: num(f.density),
      shapeFactor: num(f.shape),
      limitFraction: f.fraction,
      limit8h_mgPerM3: num(f.limit8h),
      limit15min_mgPerM3: f.limit15.trim() ? num(f.limit15) : null,
      jurisdiction: f.jurisdiction,
      limitSource: f.source,
      limitDate: f.date,
      override: f.overrideOn ? { limit8h_mgPerM3: num(f.override), reason: f.reason } : null,
      notes: d?.notes ?? '',
    },
  };
  const parsed = agentInputSchema.safeParse(body);
  const e = submitted ? fieldErrors(parsed, save.error) : {};
  const field = bindFields(f, setF, e);
  const send = (version: number | undefined) => {
    if (parsed.success)
      save.mutate({ id: agent?.id, version, body: parsed.data }, { onSuccess: () => onDone?.(), onError: conflict.onError });
  };
  const submit = (ev: FormEvent) => {
    ev.preventDefault();
    setSubmitted(true);
    conflict.clear();
    send(base?.version);
  };
  const saved = conflict.saved;

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label={agent ? `Edit ${agent.name}` : 'New dust agent'}
      className="grid gap-3 rounded-lg border border-line bg-white p-4 sm:grid-cols-3"
    >
      <TextField label="Name" {...field('name')} />
      <TextField label="Particle density" unit="kg/m³" inputMode="decimal" {...field('density', 'data.density_kgPerM3')} />
      <TextField label="Dynamic shape factor" unit="–" inputMode="decimal" {...field('shape', 'data.shapeFactor')} hint="1 for a sphere" />
      <SelectField label="Limit applies to" {...field('fraction', 'data.limitFraction')}>
        {LIMIT_FRACTIONS.map((x) => (
          <option key={x} value={x}>
            {FRACTION_LABEL[x]} fraction
          </option>
        ))}
      </SelectField>
      <TextField label="8-h limit (TWA)" unit="mg/m³" inputMode="decimal" {...field('limit8h', 'data.limit8h_mgPerM3')} />
      <TextField
        label="15-min limit"
        unit="mg/m³"
        inputMode="decimal"
        {...field('limit15', 'data.limit15min_mgPerM3')}
        hint="Leave empty if none"
      />
      <TextField label="Jurisdiction" {...field('jurisdiction', 'data.jurisdiction')} />
      <TextField label="Source of the limit" {...field('source', 'data.limitSource')} />
      <TextField label="Date of the limit" {...field('date', 'data.limitDate')} />
      <label className="flex items-center gap-2 text-sm font-semibold sm:col-span-3">
        <input type="checkbox" checked={f.overrideOn} onChange={(ev) => setF({ ...f, overrideOn: ev.target.checked })} /> Use a different
        limit here (override)
      </label>
      {f.overrideOn && (
        <>
          <TextField label="Override 8-h limit" unit="mg/m³" inputMode="decimal" {...field('override', 'data.override.limit8h_mgPerM3')} />
          <TextField label="Reason for the override" className="sm:col-span-2" {...field('reason', 'data.override.reason')} />
        </>
      )}
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" disabled={save.isPending}>
          {agent ? 'Save changes' : 'Add dust agent'}
        </Button>
        {onDone && agent && (
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
      {save.isSuccess && !agent && (
        <div className="sm:col-span-3">
          <Notice>Saved “{save.data.name}”.</Notice>
        </div>
      )}
      {save.error && !saved && (
        <div className="sm:col-span-3">
          <ErrorMessage title="Not saved" error={save.error} />
        </div>
      )}
      {saved && (
        <div className="sm:col-span-3">
          <VersionConflict
            what="dust agent"
            mine={parsed.success ? parsed.data : body}
            saved={saved}
            savedFields={{ name: saved.name, data: saved.data }}
            labels={LABELS}
            onKeepMine={() => {
              setBase(saved);
              conflict.clear();
              send(saved.version);
            }}
            onTakeSaved={() => {
              setBase(saved);
              setF(fromAgent(saved));
              conflict.clear();
              save.reset();
            }}
          />
        </div>
      )}
    </form>
  );
}
