import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { Button } from '@/components/ui/button';
import { newHood } from '@/features/scenario-editor/lib/new-hood';
import { withHood, withoutHood } from '@/features/scenario-editor/lib/update';
import { HoodFields } from './hood-fields';
import { HoodHints } from './hood-hints';
import { Section, type SectionProps } from './section';

// The schema caps a scenario at eight hoods; more is a different kind of study.
const MAX_HOODS = 8;

export function ControlsSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const hoods = value.hoods ?? [];
  const releaseType = value.source.releaseType;

  return (
    <Section
      legend="Controls"
      intro="Capturing hoods, booths and downdraft benches. With none, the run shows the exposure the controls have to fix. Each hood is compared with the capture range of the release type set under Source and emission; a downdraft bench with the face velocity its work surface needs."
    >
      {hoods.length === 0 && <p className="text-sm text-muted">No hoods yet.</p>}
      {hoods.map((hood, i) => (
        <div key={i} className="flex flex-col gap-4 border-t border-line pt-5">
          <HoodFields
            hood={hood}
            index={i}
            errors={errors}
            onChange={(patch) => onChange(withHood(value, i, patch))}
            onRemove={() => onChange(withoutHood(value, i))}
          />
          <HoodHints hood={hood} index={i} source={value.source} releaseType={releaseType} />
        </div>
      ))}
      <div>
        <Button
          variant="secondary"
          disabled={hoods.length >= MAX_HOODS}
          onClick={() => onChange({ ...value, hoods: [...hoods, newHood(value)] })}
        >
          + Add hood
        </Button>
      </div>
    </Section>
  );
}
