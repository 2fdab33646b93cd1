import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { IdSelectField } from '@/components/ui/id-select-field';
import { applyAgent, type AgentOption } from '@/features/scenario-editor/lib/apply-agent';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withDust } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { NumberField } from './number-field';
import { FieldGrid, Section, Subheading, type SectionProps } from './section';
import { SizeProfileFields, type SizeProfileOption } from './size-profile-fields';

export type DustChoices = {
  agents: AgentOption[];
  agentId: number | null;
  onAgentChange: (id: number | null) => void;
  sizeProfiles: SizeProfileOption[];
  sizeProfileId: number | null;
  onSizeProfileChange: (id: number | null) => void;
};
type Props = SectionProps<ScenarioInput> & DustChoices;

const FRACTION: Record<string, string> = { total: 'total', inhalable: 'inhalable', thoracic: 'thoracic', respirable: 'respirable' };

export function DustSection({ value, onChange, errors, agents, agentId, onAgentChange, ...profiles }: Props) {
  const dust = value.dust;
  const set = (patch: Partial<ScenarioInput['dust']>) => onChange(withDust(value, patch));
  const field = bindNumberFields(dust, set, errors, 'dust');

  const chooseAgent = (id: number | null) => {
    onAgentChange(id);
    const agent = agents.find((a) => a.id === id);
    if (agent) onChange(applyAgent(value, agent));
  };

  return (
    <Section legend="Dust agent and size profile">
      <FieldGrid>
        <IdSelectField
          label="Dust agent"
          className="sm:col-span-2"
          options={agents}
          none="None: enter the density by hand"
          value={agentId}
          onChange={chooseAgent}
        />
        <NumberField label="Particle density" unit="kg/m³" {...field('density_kgPerM3')} />
        <NumberField label="Shape factor" {...field('shapeFactor', DEFAULTS.shapeFactor)} hint="1 for spheres" />
      </FieldGrid>
      {value.limit && (
        <p className="text-sm text-muted" data-testid="agent-limit">
          Limit: {value.limit.value_mgPerM3} mg/m³ 8-h, {FRACTION[value.limit.fraction]}
          {value.limit.shortTerm_mgPerM3 !== undefined && `; ${value.limit.shortTerm_mgPerM3} mg/m³ 15-min`}
          {value.limit.source && ` (${value.limit.source})`}
        </p>
      )}
      <Subheading>Size profile</Subheading>
      <SizeProfileFields value={value} onChange={onChange} errors={errors} {...profiles} />
    </Section>
  );
}
