import type { WorkstationDetail } from '../../../../shared/schemas/workspace-views';

// The new option starts from the workstation as entered: its room, source and worker positions, and its
// release type as the source's (the option's own from then on; the workstation's is only this default).
export function workstationGeometry(ws: WorkstationDetail) {
  const r = ws.room.data;
  return {
    room: {
      length_m: r.length_m,
      width_m: r.width_m,
      height_m: r.height_m,
      airChanges_perH: r.airChanges_perH,
      draftSpeed_mPerS: r.draftSpeed_mPerS,
      draftDirection_deg: r.draftDirection_deg,
      temperature_K: r.temperature_K,
    },
    source: ws.data.source,
    worker: { x_m: ws.data.worker.x_m, y_m: ws.data.worker.y_m, z_m: ws.data.worker.z_m },
    releaseType: ws.data.releaseType,
  };
}
