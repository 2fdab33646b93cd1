import { countText } from '../../../../shared/format/index';
import { eddyDiffusivityFromVentilation } from '../../../../shared/physics/index';
import type { Hood, Scenario } from '../../../../shared/schemas/scenario';
import type { AgentData } from '../../../../shared/schemas/workspace';
import { cubicMetresPerSecondToPerHour, kelvinToCelsius, metresToMicrometres, metresToMillimetres } from '../../../../shared/units';
import { resolveJet } from '../../../../shared/physics/release-jets';
import { HOOD_KIND_LABEL, RELEASE_TYPE_LABEL, isBenchKind } from '../../../../shared/vocabulary/index';
import { BENCH_FACE_VELOCITY } from '../../../../shared/physics/bench-face-velocity';
import { sig } from '@/lib/format';

export type Row = [label: string, value: string];
export interface InputSection {
  title: string;
  rows: Row[];
}
export interface AgentInfo {
  name: string;
  data: AgentData;
}

const n = (v: number, digits = 3) => sig(v, digits);
const m3h = (v_m3PerS: number) => `${countText(cubicMetresPerSecondToPerHour(v_m3PerS))} m³/h`;
const at = (p: { x_m: number; y_m: number; z_m: number }) => `x ${n(p.x_m)} m, y ${n(p.y_m)} m, height ${n(p.z_m)} m`;
const FRACTION = { total: 'total', inhalable: 'inhalable', thoracic: 'thoracic', respirable: 'respirable' } as const;

function direction(d: Hood['direction']): string {
  if ('x' in d) return `vector (${n(d.x)}, ${n(d.y)}, ${n(d.z)})`;
  return `azimuth ${n(d.azimuth_deg)}°, tilt ${n(d.elevation_deg)}°`;
}

function releaseRows(s: Scenario): Row[] {
  const release = s.source.releaseType;
  const jet = resolveJet(s.source, s.worker);
  const aim = s.source.jet?.direction ? direction(s.source.jet.direction) : 'at the breathing zone';
  const jetText = jet
    ? `${n(jet.speed_mPerS)} m/s from a ${n(metresToMillimetres(jet.diameter_m))} mm stream, aimed ${aim}${jet.fromDefault ? " (the release type's default)" : ''}`
    : 'none';
  return [
    ['Release type', release ? RELEASE_TYPE_LABEL[release].description : 'not given'],
    ['Release jet', jetText],
  ];
}

function emissionRows(s: Scenario['source']): Row[] {
  const e = s.emission;
  const rate: Row =
    e.kind === 'continuous'
      ? ['Emission', `continuous, ${n(e.rate_mgPerMin)} mg/min`]
      : ['Emission', `bursts of ${n(e.massPerEvent_mg)} mg, ${n(e.eventsPerHour)} per hour`];
  return [
    rate,
    ['Task duration', `${n(e.taskDuration_min)} min`],
    ['Task time in the shift', s.taskMinutesPerShift === undefined ? 'the task duration' : `${n(s.taskMinutesPerShift)} min of 480`],
    ['Background concentration', `${n(s.background_mgPerM3)} mg/m³`],
  ];
}

function profileText(p: Scenario['dust']['sizeProfile']): string {
  if (p.kind === 'lognormal') return `lognormal, ${p.basis.toUpperCase()} ${n(metresToMicrometres(p.median_m))} µm, GSD ${n(p.gsd)}`;
  return `${p.amounts.length} ${p.basis}-weighted bins of ${p.diameter} diameter, ${n(metresToMicrometres(p.edges_m[0]))}–${n(metresToMicrometres(p.edges_m.at(-1)!))} µm`;
}

function agentRows(s: Scenario, agent: AgentInfo | undefined): Row[] {
  const limit = s.limit;
  const rows: Row[] = [
    ['Dust agent', agent?.name ?? s.dust.name ?? 'not named'],
    ['Particle density', `${n(s.dust.density_kgPerM3)} kg/m³`],
    ['Shape factor', n(s.dust.shapeFactor)],
  ];
  if (!limit) return [...rows, ['Exposure limit', 'none entered: concentrations only']];
  rows.push(['8-h limit used', `${n(limit.value_mgPerM3)} mg/m³, ${FRACTION[limit.fraction]} fraction`]);
  if (limit.shortTerm_mgPerM3) rows.push(['Short-term limit', `${n(limit.shortTerm_mgPerM3)} mg/m³ (15 min)`]);
  if (agent) {
    rows.push(
      ['Jurisdiction', agent.data.jurisdiction],
      ['Limit source', `${agent.data.limitSource}${agent.data.limitDate ? ` (${agent.data.limitDate})` : ''}`],
    );
    if (agent.data.override)
      rows.push(['Limit override', `${n(agent.data.override.limit8h_mgPerM3)} mg/m³: ${agent.data.override.reason}`]);
  } else if (limit.source) rows.push(['Limit source', limit.source]);
  return rows;
}

/** The scenario as run, in reading order and plain words with units, for the report's inputs section. */
export function inputSections(s: Scenario, opts: { agent?: AgentInfo; sizeProfileName?: string } = {}): InputSection[] {
  const r = s.room;
  const volume_m3 = r.length_m * r.width_m * r.height_m;
  const eddy = r.eddyDiffusivity_m2PerS;
  return [
    {
      title: 'Room',
      rows: [
        ['Size', `${n(r.length_m)} × ${n(r.width_m)} × ${n(r.height_m)} m (${n(volume_m3)} m³)`],
        ['Air temperature', `${n(kelvinToCelsius(r.temperature_K))} °C`],
        ['Walls and ceiling', r.wallDeposition ? 'collect dust that reaches them' : 'reflect dust'],
      ],
    },
    {
      title: 'Ventilation',
      rows: [
        ['General ventilation', `${n(r.airChanges_perH)} air changes per hour (${m3h((r.airChanges_perH * volume_m3) / 3600)})`],
        ['Background draft', r.draftSpeed_mPerS > 0 ? `${n(r.draftSpeed_mPerS)} m/s toward ${n(r.draftDirection_deg)}° in plan` : 'none'],
        [
          'Eddy diffusivity',
          eddy === undefined
            ? `${n(eddyDiffusivityFromVentilation(r.airChanges_perH, volume_m3))} m²/s, estimated from the ventilation`
            : `${n(eddy)} m²/s, entered`,
        ],
      ],
    },
    {
      title: 'Source and emission',
      rows: [
        ['Source position', `${at(s.source)}, ${s.source.shape}${s.source.size_m > 0 ? ` ${n(s.source.size_m)} m` : ''}`],
        ...releaseRows(s),
        ...emissionRows(s.source),
      ],
    },
    { title: 'Dust agent and limit', rows: agentRows(s, opts.agent) },
    {
      title: 'Size profile',
      rows: [
        ['Profile', opts.sizeProfileName ?? 'entered with the scenario'],
        ['Distribution', profileText(s.dust.sizeProfile)],
      ],
    },
    {
      title: 'Worker',
      rows: [
        ['Breathing-zone centre', at(s.worker)],
        ['Breathing-zone radius', `${n(s.worker.radius_m)} m`],
        ['Posture', s.worker.posture ?? 'not given'],
      ],
    },
    {
      title: 'Simulation settings',
      rows: [
        ['Particles', countText(s.run.particles)],
        ['Seed', String(s.run.seed)],
        ['Batches', String(s.run.batches)],
        ['Largest time step', `${n(s.run.maxTimeStep_s)} s`],
        ['Variance reduction', s.run.varianceReduction === false ? 'off (plain walk)' : 'on (splitting and Russian roulette)'],
      ],
    },
  ];
}

export interface HoodRow {
  name: string;
  kind: string;
  face: string;
  position: string;
  direction: string;
  airflow: string;
  faceVelocity: string;
}

/**
 * One row per hood in words. A downdraft bench's face is its work surface (length × depth), it always faces
 * up, and its face velocity is its check, so the row names the surface and gives the guidance beside the figure.
 */
export function hoodRows(s: Scenario): HoodRow[] {
  return s.hoods.map((h, i) => {
    const size = `${Math.round(h.faceWidth_m * 1000)} × ${Math.round(h.faceHeight_m * 1000)} mm`;
    const velocity = `${n(h.airflow_m3PerS / (h.faceWidth_m * h.faceHeight_m))} m/s`;
    const bench = isBenchKind(h.kind);
    const { min_mPerS, max_mPerS } = BENCH_FACE_VELOCITY;
    return {
      name: h.name ?? `Hood ${i + 1}`,
      kind: HOOD_KIND_LABEL[h.kind],
      face: bench ? `work surface ${size} (length × depth)` : size,
      position: bench ? `surface centre at ${at(h)}` : at(h),
      direction: bench ? 'up, air drawn down through the surface' : direction(h.direction),
      airflow: m3h(h.airflow_m3PerS),
      faceVelocity: bench
        ? `${velocity} down through the surface (common practice: ${min_mPerS.toFixed(1)}–${max_mPerS.toFixed(1)} m/s)`
        : velocity,
    };
  });
}
