import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { RoomView } from './room-view';

type Props = { value: ScenarioInput; onChange: (next: ScenarioInput) => void; readOnly?: boolean };

export function ElevationView({ value, onChange, readOnly }: Props) {
  return (
    <RoomView
      view="elevation"
      title="Elevation (x–z), looking toward +y"
      testId="elevation-view"
      value={value}
      onChange={onChange}
      readOnly={readOnly}
      overlay={(frame) => (
        <line
          x1={frame.toX(0)}
          x2={frame.toX(frame.span_m.a)}
          y1={frame.toY(0)}
          y2={frame.toY(0)}
          className="stroke-ink"
          strokeWidth={4}
          aria-hidden="true"
        />
      )}
    />
  );
}
