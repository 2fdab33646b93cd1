import { describe, expect, it } from 'vitest';
import { orderByHierarchy } from './control-order';

describe('ordering options by the hierarchy of controls', () => {
  it('puts elimination first and no control last, ties by name', () => {
    const items = [
      { id: 1, name: 'No control', controlTier: 'none' },
      { id: 2, name: 'Slot hood', controlTier: 'engineering' },
      { id: 3, name: 'Half-mask', controlTier: 'respiratory' },
      { id: 4, name: 'Flanged hood', controlTier: 'engineering' },
      { id: 5, name: 'Wet cutting', controlTier: 'substitution' },
      { id: 6, name: 'Rota', controlTier: 'administrative' },
      { id: 7, name: 'Buy pre-cut', controlTier: 'elimination' },
    ];
    expect(orderByHierarchy(items).map((i) => i.id)).toEqual([7, 5, 4, 2, 6, 3, 1]);
  });

  it('keeps equal names in id order and leaves the input as it was', () => {
    const items = [
      { id: 9, name: 'Hood', controlTier: 'engineering' },
      { id: 2, name: 'Hood', controlTier: 'engineering' },
    ];
    expect(orderByHierarchy(items).map((i) => i.id)).toEqual([2, 9]);
    expect(items[0].id).toBe(9);
  });
});
