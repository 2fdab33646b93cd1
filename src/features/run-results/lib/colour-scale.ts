// Our own ramp from paper to the accent's deep teal, then to slate: light is little, dark is much,
// so the map still reads when printed in grey.
export const RAMP = ['#f3efe2', '#cfe3d6', '#8cc4b4', '#3f9389', '#1f6f6a', '#1c4656'];

function hexToRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** Colour at t in [0, 1] along the ramp, linear in RGB between stops. */
export function rampColour(t: number): string {
  const c = Math.min(1, Math.max(0, t)) * (RAMP.length - 1);
  const i = Math.min(RAMP.length - 2, Math.floor(c));
  const a = hexToRgb(RAMP[i]);
  const b = hexToRgb(RAMP[i + 1]);
  const f = c - i;
  const mix = a.map((v, k) => Math.round(v + (b[k] - v) * f));
  return `rgb(${mix[0]}, ${mix[1]}, ${mix[2]})`;
}

export interface SequentialScale {
  min: number;
  max: number;
  log: boolean;
  /** Position in [0, 1]; values at or below zero on a log scale sit at 0. */
  position: (value: number) => number;
  colour: (value: number) => string;
  ticks: number[];
}

// Deposition spans decades between the source and the far corner, so anything wider than two
// decades goes on a log scale; narrower ranges stay linear and read as plain numbers.
export function sequentialScale(values: ArrayLike<number>, options: { log?: boolean } = {}): SequentialScale {
  let max = 0;
  let minPositive = Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!(v > 0)) continue;
    if (v > max) max = v;
    if (v < minPositive) minPositive = v;
  }
  if (max === 0) return { min: 0, max: 1, log: false, position: () => 0, colour: () => RAMP[0], ticks: [0, 1] };
  const log = options.log ?? max / minPositive > 100;
  if (log) {
    const hiExp = Math.ceil(Math.log10(max));
    const loExp = Math.max(Math.floor(Math.log10(minPositive)), hiExp - 4);
    const position = (v: number) => (v > 0 ? Math.min(1, Math.max(0, (Math.log10(v) - loExp) / (hiExp - loExp))) : 0);
    const ticks = Array.from({ length: hiExp - loExp + 1 }, (_, k) => 10 ** (loExp + k));
    return { min: 10 ** loExp, max: 10 ** hiExp, log, position, colour: (v) => rampColour(position(v)), ticks };
  }
  const niceMax = niceCeil(max);
  const position = (v: number) => (v > 0 ? Math.min(1, v / niceMax) : 0);
  const ticks = Array.from({ length: 5 }, (_, k) => (niceMax * k) / 4);
  return { min: 0, max: niceMax, log, position, colour: (v) => rampColour(position(v)), ticks };
}

export function niceCeil(value: number): number {
  const e = 10 ** Math.floor(Math.log10(value));
  const m = value / e;
  const step = [1, 2, 2.5, 5, 10].find((s) => m <= s + 1e-9) ?? 10;
  return step * e;
}
