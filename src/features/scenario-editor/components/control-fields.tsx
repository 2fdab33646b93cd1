import { CONTROL_TIER_LABEL, CONTROL_TIERS, type ControlTier } from '../../../../shared/vocabulary/control-tiers';
import { SelectField } from '@/components/ui/field';

type Props = {
  tier: ControlTier;
  description: string;
  onChange: (next: { tier: ControlTier; description: string }) => void;
};

// The option's place in the hierarchy of controls orders side by side; the description is what reports print as "Control".
export function ControlFields({ tier, description, onChange }: Props) {
  return (
    <div className="grid gap-4 sm:grid-cols-[16rem_minmax(0,1fr)]">
      <SelectField
        label="Control tier"
        value={tier}
        onChange={(e) => onChange({ tier: e.target.value as ControlTier, description })}
        hint="Its place in the hierarchy of controls; side by side lists options in this order."
      >
        {CONTROL_TIERS.map((t) => (
          <option key={t} value={t}>
            {CONTROL_TIER_LABEL[t]}
          </option>
        ))}
      </SelectField>
      <label className="flex flex-col gap-1 text-sm font-semibold">
        Control description
        <textarea
          className="min-h-[2.6rem] rounded-md border border-line bg-white px-3 py-2 text-sm font-normal"
          rows={2}
          maxLength={500}
          value={description}
          placeholder="e.g. flanged hood behind the grinder, 800 m³/h, switched on with the tool"
          onChange={(e) => onChange({ tier, description: e.target.value })}
        />
      </label>
    </div>
  );
}
