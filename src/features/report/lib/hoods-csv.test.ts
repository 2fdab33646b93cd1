import { describe, expect, it } from 'vitest';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { HOODS_HEADER, hoodCsvRows } from './hoods-csv';

describe('the report’s hoods as CSV', () => {
  it('gives each hood its face in mm, airflow in m³/h and the face velocity that follows', () => {
    const s = parseScenario(scenarioInput());
    const rows = hoodCsvRows(s);
    expect(rows).toHaveLength(s.hoods.length);
    const h = s.hoods[0];
    const row = Object.fromEntries(HOODS_HEADER.map((k, i) => [k, rows[0][i]]));
    expect(row['Face width (mm)']).toBeCloseTo(h.faceWidth_m * 1000, 9);
    // 1 m³/s is 3600 m³/h; face velocity is airflow over face area (Q = V A).
    expect(row['Airflow (m³/h)']).toBeCloseTo(h.airflow_m3PerS * 3600, 9);
    expect(row['Face velocity (m/s)']).toBeCloseTo(h.airflow_m3PerS / (h.faceWidth_m * h.faceHeight_m), 12);
  });
});
