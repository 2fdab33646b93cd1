/**
 * A small Float64Array that shares no cache line with any other allocation. The step loop writes its scratch
 * arrays at every step; in Chromium, workers of one page share an allocator that packs small buffers next to each
 * other, so two workers writing neighbouring buffers keep taking the line from each other's core (false sharing).
 * Measured on two cores: two workers each ran at half the speed of one alone until these arrays were padded
 * (`npm run bench:browser`). Node's threads allocate from separate arenas and never showed it.
 */
const LINE_BYTES = 64;
const PAD_BYTES = 2 * LINE_BYTES;

export function scratchFloat64(length: number): Float64Array {
  return new Float64Array(new ArrayBuffer(PAD_BYTES + 8 * length + PAD_BYTES), PAD_BYTES, length);
}
