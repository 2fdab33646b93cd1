import { describe, expect, it } from 'vitest';
import { IO, f64, u32 } from './words';
import { scratchFloat64 } from './scratch';

// A cache line is 64 bytes on the x86-64 and ARM cores browsers run on (Intel and Arm optimisation manuals, from memory).
const LINE = 64;

describe('scratch arrays own their cache lines', () => {
  it('leaves at least a line free before and after the values, whatever the length', () => {
    for (const n of [1, 2, 3, 7, 8, 9]) {
      const a = scratchFloat64(n);
      expect(a.length).toBe(n);
      expect(a.byteOffset).toBeGreaterThanOrEqual(LINE);
      expect(a.buffer.byteLength - (a.byteOffset + a.byteLength)).toBeGreaterThanOrEqual(LINE);
      expect([...a]).toEqual(new Array(n).fill(0));
    }
  });

  it('keeps the word view on the same double as f64, and IO apart from it', () => {
    f64[0] = 1;
    expect(u32.buffer).toBe(f64.buffer);
    expect(u32[0] === 0x3ff00000 || u32[1] === 0x3ff00000).toBe(true);
    expect(IO.buffer).not.toBe(f64.buffer);
  });
});
