import { useState } from 'react';
import type { ScenarioSummary } from '../../../../shared/schemas/workspace-views';
import { BannerBadge } from '@/components/banner-badge';
import { TextField } from '@/components/ui/field';
import { ErrorMessage, Spinner } from '@/components/ui/status';
import { MAX_SELECTED } from '@/features/compare/lib/selection';

type Props = {
  scenarios: ScenarioSummary[] | undefined;
  pending: boolean;
  error: unknown;
  selected: readonly number[];
  onToggle: (id: number) => void;
};

const matches = (s: ScenarioSummary, q: string) =>
  [s.name, s.workstationName, s.siteName, s.controlDescription].some((t) => t.toLowerCase().includes(q));

export function ScenarioPicker({ scenarios, pending, error, selected, onToggle }: Props) {
  const [query, setQuery] = useState('');
  const full = selected.length >= MAX_SELECTED;
  const q = query.trim().toLowerCase();
  const shown = (scenarios ?? []).filter((s) => !q || matches(s, q) || selected.includes(s.id));

  return (
    <section aria-labelledby="picker-heading" className="mb-6 rounded-lg border border-line bg-white p-4">
      <div className="mb-3 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 id="picker-heading">Scenarios to compare</h2>
          <p className="text-sm text-muted">
            Tick 2 to {MAX_SELECTED}, from any workstation. {selected.length} chosen{full ? `; untick one to choose another` : ''}.
          </p>
        </div>
        <TextField
          label="Search scenarios"
          type="search"
          value={query}
          onChange={(e) => setQuery(e.target.value)}
          placeholder="Name, workstation or site"
          className="w-72"
        />
      </div>
      {pending && <Spinner label="Loading the scenarios…" />}
      {error ? <ErrorMessage error={error} title="The scenarios could not be loaded" /> : null}
      {scenarios && shown.length === 0 && <p className="py-3 text-sm text-muted">No scenario matches “{query}”.</p>}
      <ul className="grid max-h-80 gap-1 overflow-y-auto sm:grid-cols-2 lg:grid-cols-3">
        {shown.map((s) => {
          const checked = selected.includes(s.id);
          return (
            <li key={s.id}>
              <label
                className={`flex cursor-pointer items-start gap-2 rounded-md border p-2 text-sm ${checked ? 'border-accent bg-accent-soft' : 'border-transparent hover:bg-paper-deep'} ${!checked && full ? 'cursor-not-allowed opacity-60' : ''}`}
              >
                <input
                  type="checkbox"
                  className="mt-1 accent-accent"
                  checked={checked}
                  disabled={!checked && full}
                  onChange={() => onToggle(s.id)}
                  aria-label={`${s.name} at ${s.workstationName}`}
                />
                <span className="min-w-0 flex-1">
                  <span className="block font-semibold">{s.name}</span>
                  <span className="block text-xs text-muted">
                    {s.workstationName} · {s.siteName}
                  </span>
                </span>
                <BannerBadge banner={s.lastRun?.banner} />
              </label>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
