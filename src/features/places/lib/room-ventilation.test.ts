import { describe, expect, it } from 'vitest';
import { otherVentilationFigure, switchVentilation } from './room-ventilation';

// An 8 × 6 × 3 m room is 144 m³; ACH is supply airflow over volume (its definition).
const room = { length_m: '8', width_m: '6', height_m: '3', airChanges_perH: '4', supplyAirflow_m3PerH: '' };

describe('room ventilation in either unit', () => {
  it('gives the supply airflow for air changes and back, reading a decimal comma', () => {
    expect(otherVentilationFigure(room, 'airChanges')).toBe(576);
    expect(otherVentilationFigure({ ...room, supplyAirflow_m3PerH: '360' }, 'supplyAirflow')).toBe(2.5);
    expect(otherVentilationFigure({ ...room, airChanges_perH: '2,5' }, 'airChanges')).toBe(360);
  });

  it('gives nothing while a dimension or the figure is not a number', () => {
    expect(otherVentilationFigure({ ...room, width_m: '' }, 'airChanges')).toBeNull();
    expect(otherVentilationFigure({ ...room, airChanges_perH: 'x' }, 'airChanges')).toBeNull();
  });

  it('carries the figure across when the unit is switched, and leaves it alone when it cannot', () => {
    const asSupply = switchVentilation(room, 'airChanges', 'supplyAirflow');
    expect(asSupply.supplyAirflow_m3PerH).toBe('576');
    expect(switchVentilation({ ...asSupply, supplyAirflow_m3PerH: '1000' }, 'supplyAirflow', 'airChanges').airChanges_perH).toBe('6.94');
    expect(switchVentilation({ ...room, height_m: '' }, 'airChanges', 'supplyAirflow')).toEqual({ ...room, height_m: '' });
  });
});
