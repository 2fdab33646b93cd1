import { describe, expect, it } from 'vitest';
import { parseScenario } from '../../../../shared/schemas/scenario';
import { hoodRows, inputSections } from './input-sections';

const scenario = parseScenario({
  room: { length_m: 8, width_m: 6, height_m: 3.5, airChanges_perH: 3, draftSpeed_mPerS: 0.15, draftDirection_deg: 0 },
  source: {
    x_m: 3,
    y_m: 3,
    z_m: 0.92,
    emission: { kind: 'continuous', rate_mgPerMin: 20, taskDuration_min: 60 },
    taskMinutesPerShift: 240,
  },
  dust: { density_kgPerM3: 2650, sizeProfile: { kind: 'lognormal', basis: 'mmad', median_m: 1e-5, gsd: 2.5 } },
  worker: { x_m: 3, y_m: 2.35, z_m: 1.5 },
  limit: { fraction: 'respirable', value_mgPerM3: 0.025 },
  hoods: [
    {
      kind: 'flanged',
      x_m: 3,
      y_m: 3.3,
      z_m: 0.95,
      direction: { azimuth_deg: -90 },
      faceWidth_m: 0.35,
      faceHeight_m: 0.25,
      airflow_m3PerS: 0.35,
    },
  ],
});
const agent = {
  name: 'Respirable crystalline silica',
  data: {
    density_kgPerM3: 2650,
    shapeFactor: 1,
    limitFraction: 'respirable' as const,
    limit8h_mgPerM3: 0.025,
    limit15min_mgPerM3: null,
    jurisdiction: 'ACGIH (US)',
    limitSource: 'ACGIH TLV-TWA',
    limitDate: '2024',
    override: null,
    notes: '',
  },
};
const find = (title: string, label: string) =>
  inputSections(scenario, { agent })
    .find((s) => s.title === title)
    ?.rows.find(([l]) => l === label)?.[1];

describe('report inputs', () => {
  it('states the room with its volume and the ventilation as ACH and airflow', () => {
    expect(find('Room', 'Size')).toBe('8 × 6 × 3.5 m (168 m³)');
    // 3 ACH × 168 m³ = 504 m³/h.
    expect(find('Ventilation', 'General ventilation')).toBe('3 air changes per hour (504 m³/h)');
  });

  it('carries the limit with its source, jurisdiction and date', () => {
    expect(find('Dust agent and limit', '8-h limit used')).toBe('0.025 mg/m³, respirable fraction');
    expect(find('Dust agent and limit', 'Jurisdiction')).toBe('ACGIH (US)');
    expect(find('Dust agent and limit', 'Limit source')).toBe('ACGIH TLV-TWA (2024)');
  });

  it('shows the size profile in micrometres and the hood with its face velocity', () => {
    expect(find('Size profile', 'Distribution')).toBe('lognormal, MMAD 10 µm, GSD 2.5');
    // 0.35 m³/s over 0.0875 m² is 4 m/s; 0.35 m³/s is 1,260 m³/h.
    expect(hoodRows(scenario)[0]).toMatchObject({
      kind: 'Flanged opening',
      face: '350 × 250 mm',
      airflow: '1,260 m³/h',
      faceVelocity: '4 m/s',
    });
  });

  it('names a downdraft bench by its work surface, facing up, with the face-velocity guidance beside its figure', () => {
    const bench = parseScenario({
      ...scenario,
      hoods: [
        {
          kind: 'downdraft-bench',
          x_m: 3,
          y_m: 3,
          z_m: 0.85,
          direction: { x: 0, y: 0, z: 1 },
          faceWidth_m: 1,
          faceHeight_m: 0.6,
          airflow_m3PerS: 0.42,
        },
      ],
    });
    // 0.42 m³/s over 1 m × 0.6 m is 0.7 m/s; the 0.5–1.0 m/s guidance is common practice (no published source).
    expect(hoodRows(bench)[0]).toMatchObject({
      kind: 'Downdraft bench',
      face: 'work surface 1000 × 600 mm (length × depth)',
      direction: 'up, air drawn down through the surface',
      faceVelocity: '0.7 m/s down through the surface (common practice: 0.5–1.0 m/s)',
    });
    expect(hoodRows(bench)[0].position).toMatch(/^surface centre at x 3 m/);
  });

  it('says so when there is no limit', () => {
    const rows = inputSections({ ...scenario, limit: undefined }).find((s) => s.title === 'Dust agent and limit')!.rows;
    expect(rows.at(-1)).toEqual(['Exposure limit', 'none entered: concentrations only']);
  });

  it('reads the release type and its jet from the source, and says whether walls collect', () => {
    expect(find('Source and emission', 'Release type')).toBe('not given');
    expect(find('Source and emission', 'Release jet')).toBe('none');
    expect(find('Room', 'Walls and ceiling')).toBe('collect dust that reaches them');
    const high = parseScenario({ ...scenario, source: { ...scenario.source, releaseType: 'high' } });
    const rows = inputSections(high).find((x) => x.title === 'Source and emission')!.rows;
    expect(Object.fromEntries(rows)['Release jet']).toBe(
      "5 m/s from a 50 mm stream, aimed at the breathing zone (the release type's default)",
    );
  });
});
