import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { SelectField } from '@/components/ui/field';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { SHOWN_IN } from '@/features/scenario-editor/lib/shown-units';
import { withSource } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { EmissionFields } from './emission-fields';
import { NumberField } from './number-field';
import { ReleaseFields } from './release-fields';
import { FieldGrid, Section, Subheading, type SectionProps } from './section';

type Shape = NonNullable<ScenarioInput['source']['shape']>;
const SIZE_LABEL: Record<Shape, string> = { point: 'Size', disc: 'Disc diameter', box: 'Box edge' };

export function SourceSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const source = value.source;
  const set = (patch: Partial<ScenarioInput['source']>) => onChange(withSource(value, patch));
  const field = bindNumberFields(source, set, errors, 'source');
  const shape = source.shape ?? DEFAULTS.shape;

  return (
    <Section legend="Source and emission">
      <FieldGrid>
        <NumberField label="Source x" unit="m" {...field('x_m')} />
        <NumberField label="Source y" unit="m" {...field('y_m')} />
        <NumberField label="Release height" unit="m" {...field('z_m')} hint="Above the floor" />
        <SelectField label="Shape" value={shape} onChange={(e) => set({ shape: e.target.value as Shape })} error={errors['source.shape']}>
          <option value="point">Point</option>
          <option value="disc">Disc (flat, horizontal)</option>
          <option value="box">Box</option>
        </SelectField>
        {shape !== 'point' && <NumberField label={SIZE_LABEL[shape]} {...SHOWN_IN.millimetres} {...field('size_m', DEFAULTS.size_m)} />}
      </FieldGrid>
      <Subheading>Release</Subheading>
      <ReleaseFields value={value} onChange={onChange} errors={errors} />
      <Subheading>Emission</Subheading>
      <EmissionFields value={value} onChange={onChange} errors={errors} />
    </Section>
  );
}
