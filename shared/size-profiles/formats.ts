export const UPLOAD_FORMATS = ['impactor', 'counter', 'bins'] as const;
export type UploadFormat = (typeof UPLOAD_FORMATS)[number];

export const MIN_DATA_ROWS = 2;
export const MAX_DATA_ROWS = 200;
// Sizes outside this range are not airborne dust, and would only feed nonsense to the fitting.
export const MIN_SIZE_um = 0.001;
export const MAX_SIZE_um = 1000;
export const MAX_AMOUNT = 1e15;

type FormatInfo = { label: string; columns: readonly string[]; explain: readonly string[]; template: string };

export const FORMATS: Record<UploadFormat, FormatInfo> = {
  impactor: {
    label: 'Cascade-impactor stages',
    columns: ['cut_point_um', 'mass_mg'],
    explain: [
      'cut_point_um: the stage’s aerodynamic cut-point d50 in µm; rows from the largest cut-point down.',
      'mass_mg: the dust mass collected on that stage in mg (any mass unit works; only the shares count).',
      'The last row is the backup filter: leave cut_point_um empty or write 0.',
      'Assumed: the top stage collects up to 2× its cut-point; the backup filter collects down to 0.1× the last cut-point.',
    ],
    // Cut-points halve from stage to stage: a generic set, not any one instrument's.
    template: 'cut_point_um,mass_mg\n20,0.10\n10,0.30\n5,0.62\n2.5,0.70\n1.25,0.45\n0.63,0.18\n,0.06\n',
  },
  counter: {
    label: 'Optical counter bins',
    columns: ['lower_um', 'upper_um', 'count'],
    explain: [
      'lower_um, upper_um: the bin’s edges in µm (the counter’s diameter, taken as the physical diameter of spheres); rows in increasing size, no overlap; a gap between rows counts as an empty bin.',
      'count: particles counted in the bin (or a number concentration; only the shares count).',
      'Turning counts into mass needs the particle density: you give it and confirm it. Each bin’s mass is count × density × π/6 × (geometric mid-diameter)³, and its edges become aerodynamic diameters with that density.',
    ],
    template: 'lower_um,upper_um,count\n0.3,0.5,18200\n0.5,1,7400\n1,2,2100\n2,5,640\n5,10,85\n10,25,9\n',
  },
  bins: {
    label: 'Plain mass bins',
    columns: ['lower_um', 'upper_um', 'mass_fraction'],
    explain: [
      'lower_um, upper_um: the bin’s aerodynamic-diameter edges in µm; rows in increasing size, no overlap; a gap between rows counts as an empty bin.',
      'mass_fraction: the share of the mass in the bin; the shares must add up to 1 (within 0.05) and are rescaled to exactly 1.',
    ],
    template: 'lower_um,upper_um,mass_fraction\n0.5,1,0.04\n1,2,0.12\n2,4,0.26\n4,8,0.31\n8,16,0.19\n16,32,0.08\n',
  },
};
