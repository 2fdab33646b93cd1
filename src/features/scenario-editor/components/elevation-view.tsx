import { RoomView, type RoomViewProps } from './room-view';

export function ElevationView(props: RoomViewProps) {
  return (
    <RoomView
      view="elevation"
      {...props}
      overlay={(frame) =>
        // The floor, only while the zoom window reaches down to it.
        frame.toY(0) <= frame.plot.y0 + 0.5 ? (
          <line
            x1={Math.max(frame.toX(0), frame.plot.x0)}
            x2={Math.min(frame.toX(frame.span_m.a), frame.plot.x1)}
            y1={frame.toY(0)}
            y2={frame.toY(0)}
            className="stroke-ink"
            strokeWidth={4}
            aria-hidden="true"
          />
        ) : null
      }
    />
  );
}
