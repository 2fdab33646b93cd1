import { SelectField, TextField } from '@/components/ui/field';
import { IdSelectField } from '@/components/ui/id-select-field';

export type FilterOption = { id: number; name: string };
export type FilterValue = { siteId?: number; workstationId?: number; agentId?: number; status?: 'draft' | 'approved'; q?: string };

type Props = {
  sites: FilterOption[];
  workstations: FilterOption[];
  agents: FilterOption[];
  value: FilterValue;
  onChange: (v: FilterValue) => void;
};

const PICKERS = [
  { key: 'siteId', list: 'sites', label: 'Site', none: 'All sites' },
  { key: 'workstationId', list: 'workstations', label: 'Workstation', none: 'All workstations' },
  { key: 'agentId', list: 'agents', label: 'Dust agent', none: 'All agents' },
] as const;

export function ScenarioFilters({ value, onChange, ...lists }: Props) {
  return (
    <div role="search" aria-label="Filter scenarios" className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
      <TextField label="Name contains" value={value.q ?? ''} onChange={(e) => onChange({ ...value, q: e.target.value || undefined })} />
      {PICKERS.map((p) => (
        <IdSelectField
          key={p.key}
          label={p.label}
          options={lists[p.list]}
          none={p.none}
          value={value[p.key]}
          onChange={(id) => onChange({ ...value, [p.key]: id ?? undefined })}
        />
      ))}
      <SelectField
        label="Status"
        value={value.status ?? ''}
        onChange={(e) => onChange({ ...value, status: (e.target.value || undefined) as FilterValue['status'] })}
      >
        <option value="">Any status</option>
        <option value="draft">Draft</option>
        <option value="approved">Approved</option>
      </SelectField>
    </div>
  );
}
