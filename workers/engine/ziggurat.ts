import type { Xoshiro128 } from './rng';
import { exp, log } from '../../shared/det-math/index';

// 128-layer ziggurat for the standard normal (Marsaglia & Tsang 2000), one 32-bit draw per normal.
const LAYERS = 128;
const R = 3.442619855899;
const kn = new Float64Array(LAYERS);
const wn = new Float64Array(LAYERS);
const fn = new Float64Array(LAYERS);

(function buildTables() {
  const m1 = 2147483648;
  const vn = 9.91256303526217e-3;
  let dn = R;
  let tn = dn;
  const q = vn / exp(-0.5 * dn * dn);
  kn[0] = (dn / q) * m1;
  kn[1] = 0;
  wn[0] = q / m1;
  wn[LAYERS - 1] = dn / m1;
  fn[0] = 1;
  fn[LAYERS - 1] = exp(-0.5 * dn * dn);
  for (let i = LAYERS - 2; i >= 1; i--) {
    dn = Math.sqrt(-2 * log(vn / dn + exp(-0.5 * dn * dn)));
    kn[i + 1] = (dn / tn) * m1;
    tn = dn;
    fn[i] = exp(-0.5 * dn * dn);
    wn[i] = dn / m1;
  }
})();

// The rare slow path: wedge rejection or the exponential tail beyond R.
function normalSlow(rng: Xoshiro128, hz: number, iz: number): number {
  for (;;) {
    const x = hz * wn[iz];
    if (iz === 0) {
      let tx: number;
      let ty: number;
      do {
        tx = -log(rng.nextUniform()) / R;
        ty = -log(rng.nextUniform());
      } while (ty + ty < tx * tx);
      return hz > 0 ? R + tx : -R - tx;
    }
    if (fn[iz] + rng.nextUniform() * (fn[iz - 1] - fn[iz]) < exp(-0.5 * x * x)) return x;
    hz = rng.nextInt32();
    iz = hz & (LAYERS - 1);
    if (Math.abs(hz) < kn[iz]) return hz * wn[iz];
  }
}

// Draws the fast path rejected in the current block: their indices and first 32-bit draws.
let pendingIndex = new Int32Array(0);
let pendingDraw = new Int32Array(0);

/**
 * Fills a block of standard normals. The generator's state lives in locals (xoshiro128** inlined),
 * and the hot loop holds only the ziggurat's rectangle test (about 99 % of draws): the few draws it
 * rejects are noted and finished after the loop by the wedge/tail path, which takes its further
 * draws from the stream after the block. A call inside the loop would force the state back into
 * the object, and tagged, on every draw.
 */
export function fillNormals(rng: Xoshiro128, out: Float64Array): void {
  const n = out.length;
  if (pendingIndex.length < n) {
    pendingIndex = new Int32Array(n);
    pendingDraw = new Int32Array(n);
  }
  const index = pendingIndex;
  const draws = pendingDraw;
  const k = kn;
  const w = wn;
  let s0 = rng.s0 | 0;
  let s1 = rng.s1 | 0;
  let s2 = rng.s2 | 0;
  let s3 = rng.s3 | 0;
  let pending = 0;
  for (let i = 0; i < n; i++) {
    const m = Math.imul(s1, 5);
    const hz = Math.imul((m << 7) | (m >>> 25), 9) | 0;
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = (s3 << 11) | (s3 >>> 21);
    const iz = hz & 127; // LAYERS − 1, as a literal so the loop reads no module binding
    out[i] = hz * w[iz];
    if (Math.abs(hz) >= k[iz]) {
      index[pending] = i;
      draws[pending] = hz;
      pending++;
    }
  }
  rng.s0 = s0;
  rng.s1 = s1;
  rng.s2 = s2;
  rng.s3 = s3;
  for (let j = 0; j < pending; j++) out[index[j]] = normalSlow(rng, draws[j], draws[j] & (LAYERS - 1));
}
