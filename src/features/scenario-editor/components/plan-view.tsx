import { formatSig } from '../../../../shared/format/index';
import { DEFAULTS } from '@/features/scenario-editor/lib/defaults';
import type { ViewFrame } from '@/features/scenario-editor/lib/view-frame';
import { RoomView, type RoomViewProps } from './room-view';
import { arrowPath } from './view-parts';

// Drawn in the top margin, outside the room, so it never hides a marker.
function DraftArrow({ frame, speed_mPerS, direction_deg }: { frame: ViewFrame; speed_mPerS: number; direction_deg: number }) {
  const r = (direction_deg * Math.PI) / 180;
  const cx = frame.width - 110;
  const cy = frame.margin / 2;
  const len = 14;
  const [dx, dy] = [Math.cos(r) * len, -Math.sin(r) * len];
  return (
    <g aria-hidden="true">
      <path d={arrowPath(cx - dx, cy - dy, cx + dx, cy + dy, 6)} className="fill-none stroke-muted" strokeWidth={2} strokeLinecap="round" />
      <text x={cx + 22} y={cy + 4} className="fill-muted text-[11px]">
        draft {formatSig(speed_mPerS, 2)} m/s
      </text>
    </g>
  );
}

export function PlanView(props: RoomViewProps) {
  const speed = props.value.room.draftSpeed_mPerS ?? DEFAULTS.draftSpeed_mPerS;
  const direction = props.value.room.draftDirection_deg ?? DEFAULTS.draftDirection_deg;
  return (
    <RoomView
      view="plan"
      {...props}
      overlay={(frame) => (speed > 0 ? <DraftArrow frame={frame} speed_mPerS={speed} direction_deg={direction} /> : null)}
    />
  );
}
