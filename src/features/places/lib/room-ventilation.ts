import { decimalOrNaN, trimSig } from '../../../../shared/format/index';
import { airChangesToSupplyAirflow_m3PerH, supplyAirflowToAirChanges_perH } from '../../../../shared/units';

export type VentilationEntered = 'airChanges' | 'supplyAirflow';
export type RoomFigures = { length_m: string; width_m: string; height_m: string; airChanges_perH: string; supplyAirflow_m3PerH: string };

const volumeOf = (v: RoomFigures) => decimalOrNaN(v.length_m) * decimalOrNaN(v.width_m) * decimalOrNaN(v.height_m);

// The figure the other unit gives for this room, or null while the dimensions or the entered figure are not numbers.
export function otherVentilationFigure(v: RoomFigures, entered: VentilationEntered): number | null {
  const volume_m3 = volumeOf(v);
  const value = decimalOrNaN(entered === 'airChanges' ? v.airChanges_perH : v.supplyAirflow_m3PerH);
  if (!(volume_m3 > 0) || !Number.isFinite(value)) return null;
  return entered === 'airChanges' ? airChangesToSupplyAirflow_m3PerH(value, volume_m3) : supplyAirflowToAirChanges_perH(value, volume_m3);
}

// Switching the unit carries the figure across, so the room's ventilation does not change by choosing how to type it.
export function switchVentilation<T extends RoomFigures>(v: T, from: VentilationEntered, to: VentilationEntered): T {
  if (from === to) return v;
  const other = otherVentilationFigure(v, from);
  if (other === null) return v;
  return to === 'supplyAirflow' ? { ...v, supplyAirflow_m3PerH: trimSig(other, 4) } : { ...v, airChanges_perH: trimSig(other, 3) };
}
