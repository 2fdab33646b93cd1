import seedrandom from 'seedrandom';

const word = new Float64Array(1);
const bits = new BigInt64Array(word.buffer);

/** How many representable doubles lie between a and b (0 when equal, Infinity across a sign change). */
export function ulpsApart(a: number, b: number): number {
  if (a === b) return 0;
  if (Math.sign(a) !== Math.sign(b)) return Infinity;
  word[0] = a;
  const x = bits[0];
  word[0] = b;
  const y = bits[0];
  return Number(x > y ? x - y : y - x);
}

const random = seedrandom('det-math');

/** n values made from uniform draws on [0, 1) of a fixed stream. */
export const draws = (n: number, make: (u: number) => number) => Array.from({ length: n }, () => make(random()));

/** The largest distance in ulps between mine and the reference over xs. */
export const worst = (xs: number[], mine: (x: number) => number, ref: (x: number) => number) =>
  xs.reduce((m, x) => Math.max(m, ulpsApart(mine(x), ref(x))), 0);
