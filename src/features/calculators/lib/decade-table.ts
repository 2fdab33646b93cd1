import { toCsv } from '@/lib/csv';
import { particleProperties, type ParticleMedium, type ParticleProperties } from './particle-properties';

export const DECADE_DIAMETERS_m = [1e-9, 1e-8, 1e-7, 1e-6, 1e-5, 1e-4] as const;

export interface DecadeColumn {
  key: string;
  header: string;
  value: (p: ParticleProperties) => number;
}

// Headers carry their units so a pasted or downloaded table still says what each number is.
export function decadeColumns(window_s: number): DecadeColumn[] {
  const over = `over ${window_s} s`;
  return [
    { key: 'diameter', header: 'Diameter (µm)', value: (p) => p.diameter_m * 1e6 },
    { key: 'slip', header: 'Slip factor (–)', value: (p) => p.slipFactor },
    { key: 'settling', header: 'Settling velocity (m/s)', value: (p) => p.settlingVelocity_mPerS },
    { key: 'reynolds', header: 'Particle Reynolds number (–)', value: (p) => p.reynolds },
    { key: 'relaxation', header: 'Relaxation time (s)', value: (p) => p.relaxationTime_s },
    { key: 'diffusivity', header: 'Brownian diffusivity (m²/s)', value: (p) => p.diffusivity_m2PerS },
    { key: 'settlingDistance', header: `Settling distance ${over} (m)`, value: (p) => p.settlingDistance_m },
    { key: 'rms', header: `RMS Brownian displacement ${over} (m)`, value: (p) => p.rmsDisplacement_m },
    { key: 'aerodynamic', header: 'Aerodynamic diameter (µm)', value: (p) => p.aerodynamicDiameter_m * 1e6 },
    { key: 'inhalable', header: 'Inhalable (%)', value: (p) => p.inhalable * 100 },
    { key: 'thoracic', header: 'Thoracic (%)', value: (p) => p.thoracic * 100 },
    { key: 'respirable', header: 'Respirable (%)', value: (p) => p.respirable * 100 },
  ];
}

export function decadeRows(medium: ParticleMedium): ParticleProperties[] {
  return DECADE_DIAMETERS_m.map((d) => particleProperties(d, medium));
}

// Six significant digits survive a spreadsheet round trip without pretending to more precision than the formulas have.
function table(medium: ParticleMedium): { header: string[]; rows: number[][] } {
  const columns = decadeColumns(medium.window_s);
  return {
    header: columns.map((c) => c.header),
    rows: decadeRows(medium).map((row) => columns.map((c) => Number(c.value(row).toPrecision(6)))),
  };
}

export function decadeTableCsv(medium: ParticleMedium): string {
  const { header, rows } = table(medium);
  return toCsv(header, rows, 6);
}

// Tab-separated text pastes into spreadsheet cells directly.
export function decadeTableTsv(medium: ParticleMedium): string {
  const { header, rows } = table(medium);
  return [header, ...rows].map((r) => r.join('\t')).join('\r\n') + '\r\n';
}
