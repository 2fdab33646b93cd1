import { describe, expect, it } from 'vitest';
import { changesOf, changesOfPatch } from './changes';

describe('changesOf', () => {
  it('lists each changed leaf with its old and new value, list items counted from 1', () => {
    const before = { name: 'Slot hood', hoods: [{ airflow_m3PerS: 0.5, kind: 'slot' }] };
    const after = { name: 'Slot hood', hoods: [{ airflow_m3PerS: 0.6, kind: 'slot' }] };
    expect(changesOf(before, after)).toEqual([{ field: 'hoods.1.airflow_m3PerS', from: 0.5, to: 0.6 }]);
  });
  it('shows a field that appears or disappears as coming from or going to nothing', () => {
    expect(changesOf({ a: 1 }, { a: 1, b: 'x' })).toEqual([{ field: 'b', from: null, to: 'x' }]);
    expect(changesOf({ a: 1, b: 'x' }, { a: 1 })).toEqual([{ field: 'b', from: 'x', to: null }]);
  });
  it('gives nothing for an edit that changed nothing', () => {
    expect(changesOf({ a: [1, 2], b: { c: true } }, { a: [1, 2], b: { c: true } })).toEqual([]);
  });
  it('stops at 25 changes so one entry never copies a whole scenario', () => {
    const many = (v: number) => Object.fromEntries(Array.from({ length: 40 }, (_, i) => [`f${i}`, v]));
    expect(changesOf(many(1), many(2))).toHaveLength(25);
  });
});

describe('changesOfPatch', () => {
  it('compares only the fields the patch carries', () => {
    const before = { name: 'Old', controlDescription: 'none', version: 3 };
    expect(changesOfPatch(before, { name: 'New' })).toEqual([{ field: 'name', from: 'Old', to: 'New' }]);
  });
});
