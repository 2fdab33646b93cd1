import { describe, expect, it } from 'vitest';
import { FAN_ASSUMPTIONS, roughFanPower_W } from './fan-power';

describe('rough fan power', () => {
  it('is Q·Δp/η: 0.45 m³/s at 1000 Pa and 60 % gives 750 W', () => {
    expect(FAN_ASSUMPTIONS).toEqual({ totalPressure_Pa: 1000, efficiency: 0.6 });
    expect(roughFanPower_W(0.45)).toBeCloseTo(750, 10);
  });

  it('is zero without airflow and refuses impossible inputs, quoting them', () => {
    expect(roughFanPower_W(0)).toBe(0);
    expect(() => roughFanPower_W(-1)).toThrow('got -1');
    expect(() => roughFanPower_W(1, { totalPressure_Pa: 1000, efficiency: 0 })).toThrow('got 0');
  });
});
