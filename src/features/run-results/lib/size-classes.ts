// Class edges sit at the respirable (4 µm) and thoracic (10 µm) median cut-points of ISO 7708, so a
// dot's colour tells which fraction the particle counts towards.
const EDGES_um = [1, 4, 10, 25];
const COLOURS = ['#6a4fb3', '#2b7bba', '#2f8f5b', '#c7831c', '#b03a2e'];
const RADII = [2.6, 3.1, 3.6, 4.2, 4.8];

export interface SizeClass {
  label: string;
  colour: string;
  radius: number;
}

export interface SizeClasses {
  classes: SizeClass[];
  /** Class index per size bin; −1 for a bin outside every class. */
  classOfBin: (bin: number) => number;
  byDiameter: boolean;
}

function diameterLabel(k: number): string {
  if (k === 0) return `below ${EDGES_um[0]} µm`;
  if (k === EDGES_um.length) return `${EDGES_um[k - 1]} µm and above`;
  return `${EDGES_um[k - 1]}–${EDGES_um[k]} µm`;
}

/** Groups size bins into a handful of legend classes: by aerodynamic diameter when known, else by bin index. */
export function sizeClasses(binCount: number, diameters_m?: readonly number[]): SizeClasses {
  if (diameters_m && diameters_m.length >= binCount && binCount > 0) {
    const classOf = diameters_m.map((d) => EDGES_um.filter((e) => d * 1e6 >= e).length);
    return {
      classes: COLOURS.map((colour, k) => ({ label: `${diameterLabel(k)} aerodynamic`, colour, radius: RADII[k] })),
      classOfBin: (bin) => (bin >= 0 && bin < classOf.length ? classOf[bin] : -1),
      byDiameter: true,
    };
  }
  const groups = Math.max(1, Math.min(COLOURS.length, binCount));
  const per = Math.max(1, Math.ceil(binCount / groups));
  const classes = Array.from({ length: Math.ceil(binCount / per) }, (_, k) => {
    const lo = k * per;
    const hi = Math.min(binCount, lo + per) - 1;
    const ends = k === 0 ? ' (smallest)' : hi === binCount - 1 ? ' (largest)' : '';
    return { label: lo === hi ? `size bin ${lo}${ends}` : `size bins ${lo}–${hi}${ends}`, colour: COLOURS[k], radius: RADII[k] };
  });
  return { classes, classOfBin: (bin) => (bin >= 0 && bin < binCount ? Math.floor(bin / per) : -1), byDiameter: false };
}
