import type { PreparedScenario } from './types';
import { pow } from '../../shared/det-math/index';

type Room = PreparedScenario['room'];

// The sphere may poke through a wall or the floor; only the part inside the room holds air.
export function zoneVolume_m3(room: Room, x: number, y: number, z: number, radius_m: number): number {
  const inside =
    x - radius_m >= 0 &&
    x + radius_m <= room.length_m &&
    y - radius_m >= 0 &&
    y + radius_m <= room.width_m &&
    z - radius_m >= 0 &&
    z + radius_m <= room.height_m;
  const sphere = (4 / 3) * Math.PI * pow(radius_m, 3);
  if (inside) return sphere;
  const n = 64;
  const h = (2 * radius_m) / n;
  let hits = 0;
  let total = 0;
  for (let i = 0; i < n; i++) {
    const px = x - radius_m + (i + 0.5) * h;
    for (let j = 0; j < n; j++) {
      const py = y - radius_m + (j + 0.5) * h;
      for (let k = 0; k < n; k++) {
        const pz = z - radius_m + (k + 0.5) * h;
        if ((px - x) * (px - x) + (py - y) * (py - y) + (pz - z) * (pz - z) > radius_m * radius_m) continue;
        total++;
        if (px >= 0 && px <= room.length_m && py >= 0 && py <= room.width_m && pz >= 0 && pz <= room.height_m) hits++;
      }
    }
  }
  return (sphere * hits) / total;
}
