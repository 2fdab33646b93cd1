import type { Scenario } from '../../../../shared/schemas/scenario';
import type { SequentialScale } from '@/features/run-results/lib/colour-scale';
import type { Grid } from '../../../../shared/schemas/run-result';
import { focusPoints, type Projection, projection, viewSpan } from '@/features/run-results/lib/room-projection';
import { useViewZoom } from '@/hooks/use-view-zoom';
import { DRAWING_WIDTH, RoomView } from './room-view';

function gridCells(grid: Grid, p: Projection, scale: SequentialScale, skipZero: boolean, prefix: string) {
  const win = p.window;
  const cells = [];
  for (let ix = 0; ix < grid.nx; ix++) {
    for (let iy = 0; iy < grid.ny; iy++) {
      const v = grid.values[ix * grid.ny + iy];
      if (!Number.isFinite(v) || (skipZero && v <= 0)) continue;
      const x0 = grid.origin_m[0] + ix * grid.cell_m[0];
      const y1 = grid.origin_m[1] + (iy + 1) * grid.cell_m[1];
      if (x0 > win.a1_m || x0 + grid.cell_m[0] < win.a0_m || y1 < win.b0_m || y1 - grid.cell_m[1] > win.b1_m) continue;
      const [sx, sy] = p.toSvg(x0, y1, 0);
      // Half a pixel of overlap hides the hairline seams anti-aliasing leaves between cells.
      cells.push(
        <rect
          key={`${prefix}${ix}-${iy}`}
          x={sx}
          y={sy}
          width={grid.cell_m[0] * p.scale + 0.5}
          height={grid.cell_m[1] * p.scale + 0.5}
          fill={scale.colour(v)}
        />,
      );
    }
  }
  return cells;
}

/**
 * A floor-plane grid ([ix][iy]) painted under the plan, with the source, hoods and breathing zone on top;
 * a finer grid over part of the room (the workstation) is painted over it where given.
 */
export function GridMap({
  grid,
  detail,
  scale,
  scenario,
  label,
  what,
  skipZero = false,
}: {
  grid: Grid;
  detail?: Grid;
  scale: SequentialScale;
  scenario: Scenario;
  label: string;
  what: string;
  skipZero?: boolean;
}) {
  const zoom = useViewZoom(viewSpan(scenario.room, 'plan'), focusPoints(scenario, 'plan'));
  const p = projection(scenario.room, 'plan', DRAWING_WIDTH, zoom.window);
  return (
    <RoomView
      scenario={scenario}
      p={p}
      label={label}
      textScale={1.4}
      zoom={zoom}
      what={what}
      under={
        <g data-testid="map-cells">
          {gridCells(grid, p, scale, skipZero, '')}
          {detail && <g data-testid="map-detail-cells">{gridCells(detail, p, scale, skipZero, 'd')}</g>}
        </g>
      }
    />
  );
}
