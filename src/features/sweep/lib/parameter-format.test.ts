import { describe, expect, it } from 'vitest';
import type { Hood } from '../../../../shared/schemas/scenario';
import { pointScenarioName } from './parameter-format';

const flanged: Hood = {
  kind: 'flanged',
  x_m: 1,
  y_m: 1,
  z_m: 1,
  direction: { azimuth_deg: 0, elevation_deg: 0 },
  faceWidth_m: 0.4,
  faceHeight_m: 0.3,
  airflow_m3PerS: 0.25,
};
const bench: Hood = { ...flanged, kind: 'downdraft-bench', direction: { x: 0, y: 0, z: 1 }, faceWidth_m: 1, faceHeight_m: 0.6 };

describe('names of scenarios saved from a sweep point', () => {
  it('put a capturing hood at its distance, airflow or face', () => {
    expect(pointScenarioName(flanged, 'distance', 0.25)).toBe('Flanged opening at 0.25 m');
    expect(pointScenarioName(flanged, 'faceScale', 1.5)).toBe('Flanged opening at 600 × 450 mm face');
  });

  it('put a downdraft bench under the source, and name its work surface', () => {
    expect(pointScenarioName(bench, 'distance', 0.1)).toBe('Downdraft bench 0.1 m under the source');
    expect(pointScenarioName(bench, 'faceScale', 1.2)).toBe('Downdraft bench with a 1200 × 720 mm work surface');
    expect(pointScenarioName(bench, 'airflow', 0.6)).toBe('Downdraft bench at 2,160 m³/h');
  });
});
