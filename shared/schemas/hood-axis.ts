import type { ScenarioInput } from './scenario';

type Direction = NonNullable<ScenarioInput['hoods']>[number]['direction'];

// The one convention for where a hood faces: azimuth from +x toward +y in plan, elevation up from horizontal.
export function hoodAxis(direction: Direction): [number, number, number] {
  if ('x' in direction) {
    const l = Math.hypot(direction.x, direction.y, direction.z) || 1;
    return [direction.x / l, direction.y / l, direction.z / l];
  }
  const az = (direction.azimuth_deg * Math.PI) / 180;
  const el = ((direction.elevation_deg ?? 0) * Math.PI) / 180;
  return [Math.cos(el) * Math.cos(az), Math.cos(el) * Math.sin(az), Math.sin(el)];
}
