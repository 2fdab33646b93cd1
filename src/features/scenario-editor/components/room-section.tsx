import { formatSig } from '../../../../shared/format/index';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { eddyDiffusivityFromVentilation } from '../../../../shared/physics/index';
import { celsiusToKelvin, kelvinToCelsius } from '../../../../shared/units';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import { withRoom } from '@/features/scenario-editor/lib/update';
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
  const estimate = estimatedEddy_m2PerS(room);
  const fromAch = room.eddyDiffusivity_m2PerS === undefined;

  return (
    <Section
      legend="Room and ventilation"
      intro="x runs along the length, y across the width, z up from the floor; the origin is the room's corner."
    >
      <FieldGrid>
        <NumberField
          label="Length (x)"
          unit="m"
          value={room.length_m}
          onValue={(v) => set({ length_m: v })}
          error={errors['room.length_m']}
        />
        <NumberField label="Width (y)" unit="m" value={room.width_m} onValue={(v) => set({ width_m: v })} error={errors['room.width_m']} />
        <NumberField
          label="Height (z)"
          unit="m"
          value={room.height_m}
          onValue={(v) => set({ height_m: v })}
          error={errors['room.height_m']}
        />
        <NumberField
          label="Air changes"
          unit="per h"
          value={room.airChanges_perH ?? DEFAULTS.airChanges_perH}
          onValue={(v) => set({ airChanges_perH: v })}
          error={errors['room.airChanges_perH']}
        />
        <NumberField
          label="Draft speed"
          unit="m/s"
          value={room.draftSpeed_mPerS ?? DEFAULTS.draftSpeed_mPerS}
          onValue={(v) => set({ draftSpeed_mPerS: v })}
          error={errors['room.draftSpeed_mPerS']}
          hint="Rooms average about 0.3 m/s"
        />
        <NumberField
          label="Draft blows toward"
          unit="°"
          value={room.draftDirection_deg ?? DEFAULTS.draftDirection_deg}
          onValue={(v) => set({ draftDirection_deg: v })}
          error={errors['room.draftDirection_deg']}
          hint="0° is +x, 90° is +y"
        />
        <NumberField
          label="Air temperature"
          unit="°C"
          value={room.temperature_K ?? DEFAULTS.temperature_K}
          toDisplay={kelvinToCelsius}
          fromDisplay={celsiusToKelvin}
          onValue={(v) => set({ temperature_K: v })}
          error={errors['room.temperature_K']}
        />
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
            <NumberField
              label="Eddy diffusivity"
              unit="m²/s"
              value={room.eddyDiffusivity_m2PerS}
              onValue={(v) => set({ eddyDiffusivity_m2PerS: v })}
              error={errors['room.eddyDiffusivity_m2PerS']}
            />
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
