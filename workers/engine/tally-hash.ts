/**
 * A 64-bit fingerprint of a batch's tallies (two 32-bit lanes of MurmurHash3's mixing, Appleby
 * 2011) over each value's IEEE words. It only has to tell one engine's bits from another's: the
 * server recomputes it from its own replay, so nothing rests on it being hard to forge.
 */
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);

export class TallyHash {
  private a = 0x9747b28c;
  private b = 0x85ebca6b;

  word(w: number): void {
    let k = Math.imul(w | 0, 0xcc9e2d51);
    k = Math.imul((k << 15) | (k >>> 17), 0x1b873593);
    this.a ^= k;
    this.a = Math.imul((this.a << 13) | (this.a >>> 19), 5) + 0xe6546b64;
    this.b ^= Math.imul(k ^ (k >>> 16), 0x85ebca6b);
    this.b = Math.imul((this.b << 17) | (this.b >>> 15), 0x2c1b3c6d) + 0x297a2d39;
  }

  /** NaN hashes as one fixed pattern: engines may write different NaN payloads. */
  number(v: number): void {
    if (v !== v) {
      this.word(0x7ff80000);
      this.word(0);
      return;
    }
    f64[0] = v;
    this.word(u32[0]);
    this.word(u32[1]);
  }

  numbers(values: ArrayLike<number>): void {
    this.word(values.length);
    for (let i = 0; i < values.length; i++) this.number(values[i]);
  }

  hex(): string {
    const fin = (h: number) => {
      h ^= h >>> 16;
      h = Math.imul(h, 0x85ebca6b);
      h ^= h >>> 13;
      h = Math.imul(h, 0xc2b2ae35);
      return ((h ^ (h >>> 16)) >>> 0).toString(16).padStart(8, '0');
    };
    return fin(this.a ^ this.b) + fin(this.b + Math.imul(this.a, 0x9e3779b1));
  }
}
