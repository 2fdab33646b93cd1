import seedrandom from 'seedrandom';

// xoshiro128** (Blackman & Vigna 2018): 32-bit integer ops only, so it stays fast in V8.
export class Xoshiro128 {
  s0: number;
  s1: number;
  s2: number;
  s3: number;

  constructor(s0: number, s1: number, s2: number, s3: number) {
    // An all-zero state is the one fixed point of the generator.
    if ((s0 | s1 | s2 | s3) === 0) s0 = 0x9e3779b9 | 0;
    this.s0 = s0 | 0;
    this.s1 = s1 | 0;
    this.s2 = s2 | 0;
    this.s3 = s3 | 0;
  }

  nextInt32(): number {
    const s1 = this.s1;
    const m = Math.imul(s1, 5);
    const result = Math.imul((m << 7) | (m >>> 25), 9);
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= s1;
    this.s1 = s1 ^ this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result | 0;
  }

  // Open interval (0, 1): safe for logarithms.
  nextUniform(): number {
    return ((this.nextInt32() >>> 0) + 0.5) * 2.3283064365386963e-10;
  }
}

// seedrandom only turns (seed, batch) into the 128-bit state, so batch k's stream is the same
// whichever worker runs it and however many workers there are.
export function batchStream(seed: number | string, batchIndex: number): Xoshiro128 {
  const init = seedrandom(`motewalk:${String(seed)}:batch:${batchIndex}`);
  return new Xoshiro128(init.int32(), init.int32(), init.int32(), init.int32());
}
