import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { canonicalJson } from './canonical-json';

describe('canonicalJson', () => {
  it('gives the same text whatever the key order', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, 2], c: 'x' } })).toBe(canonicalJson({ a: { c: 'x', d: [1, 2] }, b: 1 }));
  });

  it('round-trips through JSON.parse to an equal value', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        expect(JSON.parse(canonicalJson(v))).toEqual(JSON.parse(JSON.stringify(v)));
      }),
    );
  });
});
