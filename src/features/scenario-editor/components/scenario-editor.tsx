import { useMemo } from 'react';
import { scenarioSchema, type ScenarioInput } from '../../../../shared/schemas/scenario';
import { issuesByPath } from '@/features/scenario-editor/lib/field-errors';
import { ControlsSection } from './controls-section';
import { DustSection, type DustChoices } from './dust-section';
import { ElevationView } from './elevation-view';
import { PlanView } from './plan-view';
import { RoomSection } from './room-section';
import { RunSection } from './run-section';
import { SourceSection } from './source-section';
import { ValidationSummary } from './validation-summary';
import { ViewsLegend } from './views-legend';
import { WorkerSection } from './worker-section';

export type ScenarioEditorProps = DustChoices & {
  value: ScenarioInput;
  onChange: (next: ScenarioInput) => void;
  readOnly?: boolean;
  serverErrors?: Record<string, string>;
};

export function ScenarioEditor(props: ScenarioEditorProps) {
  const { value, onChange, readOnly, serverErrors } = props;
  const live = useMemo(() => {
    const result = scenarioSchema.safeParse(value);
    return result.success ? {} : issuesByPath(result.error.issues);
  }, [value]);
  // The live check speaks for what is on screen now; a server message stays until its field is valid again.
  const errors = useMemo(() => ({ ...serverErrors, ...live }), [serverErrors, live]);
  const section = { value, onChange, errors };

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-8 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      {/* Sticky beside the form so a typed hood position shows in the drawing at once. */}
      <div
        className="flex flex-col gap-4 xl:sticky xl:top-4 xl:col-start-2 xl:row-start-1 xl:max-h-[calc(100vh-2rem)] xl:overflow-y-auto"
        aria-label="Room drawings"
      >
        <p className="text-sm text-muted">
          {readOnly
            ? 'Positions are shown to scale.'
            : 'Drag the source, hoods and worker, or focus one and use the arrow keys (Shift for 50 cm). Positions snap to 5 cm.'}
        </p>
        <div className="grid gap-4">
          <PlanView value={value} onChange={onChange} readOnly={readOnly} />
          <ElevationView value={value} onChange={onChange} readOnly={readOnly} />
        </div>
        <ViewsLegend />
      </div>
      <form className="xl:col-start-1 xl:row-start-1" onSubmit={(e) => e.preventDefault()} noValidate aria-label="Scenario">
        <fieldset disabled={readOnly} className="flex min-w-0 flex-col gap-8">
          <ValidationSummary errors={errors} />
          <RoomSection {...section} />
          <SourceSection {...section} />
          <DustSection
            {...section}
            agents={props.agents}
            agentId={props.agentId}
            onAgentChange={props.onAgentChange}
            sizeProfiles={props.sizeProfiles}
            sizeProfileId={props.sizeProfileId}
            onSizeProfileChange={props.onSizeProfileChange}
          />
          <ControlsSection {...section} />
          <WorkerSection {...section} />
          <RunSection {...section} />
        </fieldset>
      </form>
    </div>
  );
}
