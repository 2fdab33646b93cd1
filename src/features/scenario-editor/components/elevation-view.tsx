import { RoomView, type RoomViewProps } from './room-view';

export function ElevationView(props: RoomViewProps) {
  return (
    <RoomView
      view="elevation"
      {...props}
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
