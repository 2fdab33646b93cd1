import { formatSig } from '../../../../shared/format/index';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { eddyDiffusivityFromVentilation } from '../../../../shared/physics/index';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { SHOWN_IN } from '@/features/scenario-editor/lib/shown-units';
import { withRoom } from '@/features/scenario-editor/lib/update';
import { bindNumberFields } from '@/lib/bind-fields';
import { NumberField } from './number-field';
import { FieldGrid, Section, type SectionProps } from './section';

function estimatedEddy_m2PerS(room: ScenarioInput['room']): number | null {
  const volume_m3 = room.length_m * room.width_m * room.height_m;
  const ach = room.airChanges_perH ?? DEFAULTS.airChanges_perH;
  return volume_m3 > 0 && ach >= 0 ? eddyDiffusivityFromVentilation(ach, volume_m3) : null;
}

export function RoomSection({ value, onChange, errors }: SectionProps<ScenarioInput>) {
  const room = value.room;
  const set = (patch: Partial<ScenarioInput['room']>) => onChange(withRoom(value, patch));
  const field = bindNumberFields(room, set, errors, 'room');
  const estimate = estimatedEddy_m2PerS(room);
  const fromAch = room.eddyDiffusivity_m2PerS === undefined;

  return (
    <Section
      legend="Room and ventilation"
      intro="x runs along the length, y across the width, z up from the floor; the origin is the room's corner."
    >
      <FieldGrid>
        <NumberField label="Length (x)" unit="m" {...field('length_m')} />
        <NumberField label="Width (y)" unit="m" {...field('width_m')} />
        <NumberField label="Height (z)" unit="m" {...field('height_m')} />
        <NumberField label="Air changes" unit="per h" {...field('airChanges_perH', DEFAULTS.airChanges_perH)} />
        <NumberField
          label="Draft speed"
          unit="m/s"
          {...field('draftSpeed_mPerS', DEFAULTS.draftSpeed_mPerS)}
          hint="Rooms average about 0.3 m/s"
        />
        <NumberField
          label="Draft blows toward"
          unit="°"
          {...field('draftDirection_deg', DEFAULTS.draftDirection_deg)}
          hint="0° is +x, 90° is +y"
        />
        <NumberField label="Air temperature" {...SHOWN_IN.celsius} {...field('temperature_K', DEFAULTS.temperature_K)} />
      </FieldGrid>
      <div className="flex flex-col gap-3">
        <label className="inline-flex items-center gap-2 text-sm font-semibold">
          <input
            type="checkbox"
            className="h-4 w-4 accent-accent"
            checked={fromAch}
            onChange={(e) => set({ eddyDiffusivity_m2PerS: e.target.checked ? undefined : (estimate ?? 0.01) })}
          />
          Estimate eddy diffusivity from air changes and room volume
        </label>
        {fromAch ? (
          <p className="text-sm text-muted">
            {estimate === null ? 'Needs a room size and air changes.' : `Estimated ${formatSig(estimate, 2)} m²/s.`}
          </p>
        ) : (
          <FieldGrid>
            <NumberField label="Eddy diffusivity" unit="m²/s" {...field('eddyDiffusivity_m2PerS')} />
          </FieldGrid>
        )}
      </div>
      <label className="inline-flex items-center gap-2 text-sm font-semibold">
        <input
          type="checkbox"
          className="h-4 w-4 accent-accent"
          checked={room.wallDeposition ?? true}
          onChange={(e) => set({ wallDeposition: e.target.checked })}
        />
        Walls and ceiling collect dust that reaches them (untick to let them reflect it)
      </label>
    </Section>
  );
}
