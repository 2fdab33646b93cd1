import { describe, expect, it } from 'vitest';
import type { ScenarioInput } from '../../../../shared/schemas/scenario';
import { tierAfterEdit, tierOf } from './control-tier';

const hood = { kind: 'flanged' } as NonNullable<ScenarioInput['hoods']>[number];
const none = { hoods: [] };
const one = { hoods: [hood] };

// The hierarchy of controls counts a local exhaust hood as an engineering control (common practice, NIOSH hierarchy).
describe('control tier of an option', () => {
  it('becomes an engineering control when the first hood is added to an option without a control', () => {
    expect(tierAfterEdit('none', none, one)).toBe('engineering');
  });

  it('keeps a tier the engineer chose, even when a hood is added', () => {
    expect(tierAfterEdit('administrative', none, one)).toBe('administrative');
    expect(tierAfterEdit('substitution', none, { hoods: [hood, hood] })).toBe('substitution');
  });

  it('leaves "no control" alone for an edit that keeps the hoods, so an engineer can set it back by hand', () => {
    expect(tierAfterEdit('none', one, { hoods: [hood, hood] })).toBe('none');
    expect(tierAfterEdit('none', one, none)).toBe('none');
    expect(tierAfterEdit('none', none, none)).toBe('none');
  });

  it('reads an unknown stored tier as no control', () => {
    expect(tierOf('ventilation (old record)')).toBe('none');
    expect(tierOf('respiratory')).toBe('respiratory');
  });
});
