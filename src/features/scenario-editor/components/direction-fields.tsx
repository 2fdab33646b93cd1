import { NumberField } from './number-field';

type Props = {
  angles: { azimuth_deg: number; tilt_deg: number };
  onDirection: (direction: { azimuth_deg: number; elevation_deg: number }) => void;
  errors: Record<string, string>;
  // Where the schema puts this direction's messages, e.g. "hoods.0" or "source.jet".
  path: string;
  labels: { toward: string; tilt: string };
  tiltHint: string;
};

// Hoods and jets are both aimed by a bearing in plan and a tilt, the two angles people can picture and type.
export function DirectionFields({ angles: { azimuth_deg, tilt_deg }, onDirection, errors, path, labels, tiltHint }: Props) {
  const at = (field: string) => errors[`${path}.${field}`];
  return (
    <>
      <NumberField
        label={labels.toward}
        unit="° in plan"
        value={azimuth_deg}
        onValue={(v) => onDirection({ azimuth_deg: v, elevation_deg: tilt_deg })}
        error={at('direction') ?? at('direction.azimuth_deg')}
        hint="0° is +x, 90° is +y"
      />
      <NumberField
        label={labels.tilt}
        unit="°"
        value={tilt_deg}
        onValue={(v) => onDirection({ azimuth_deg, elevation_deg: v })}
        error={at('direction.elevation_deg')}
        hint={tiltHint}
      />
    </>
  );
}
