import { countText } from '../../../../shared/format/index';
import type { Hood } from '../../../../shared/schemas/scenario';
import { cubicMetresPerHourToPerSecond, cubicMetresPerSecondToPerHour } from '../../../../shared/units';
import { HOOD_KIND_LABEL, isBenchKind } from '../../../../shared/vocabulary/index';
import { sig } from '@/lib/format';
import type { Preferred } from './target-crossing';
import type { SweepParameter } from './sweep-points';

// Distances are entered in metres and face scales are plain ratios: nothing to convert.
const AS_IS = { toSi: (v: number) => v, fromSi: (v: number) => v };

/** The form's unit for each parameter; SI stays inside, the conversion happens here only. */
export const PARAMETER: Record<
  SweepParameter,
  { label: string; unit: string; axis: string; preferred: Preferred; toSi: (v: number) => number; fromSi: (v: number) => number }
> = {
  distance: {
    label: 'Distance from the source along the hood axis',
    unit: 'm',
    axis: 'Source distance along the hood axis (m)',
    preferred: 'largest',
    ...AS_IS,
  },
  airflow: {
    label: 'Hood airflow',
    unit: 'm³/h',
    axis: 'Hood airflow (m³/h)',
    preferred: 'smallest',
    toSi: cubicMetresPerHourToPerSecond,
    fromSi: cubicMetresPerSecondToPerHour,
  },
  faceScale: {
    label: 'Face size (width and height scaled together)',
    unit: '× current',
    axis: 'Face size (× current width and height)',
    preferred: 'smallest',
    ...AS_IS,
  },
};

const plain = (v: number, digits = 3) => sig(v, digits);

/** A parameter value in the form's unit with its unit, e.g. "0.25 m", "1,260 m³/h", "1.2 × current face". */
export function formatValue(parameter: SweepParameter, value_si: number): string {
  if (parameter === 'distance') return `${plain(value_si)} m`;
  if (parameter === 'airflow') return `${countText(cubicMetresPerSecondToPerHour(value_si))} m³/h`;
  return `${plain(value_si)} × current face`;
}

export function faceText(hood: Pick<Hood, 'faceWidth_m' | 'faceHeight_m'>, scale = 1): string {
  return `${Math.round(hood.faceWidth_m * scale * 1000)} × ${Math.round(hood.faceHeight_m * scale * 1000)} mm`;
}

/** Name for a scenario saved from a point: the hood type and where the point sits. */
export function pointScenarioName(hood: Hood, parameter: SweepParameter, value_si: number): string {
  // A bench's axis points up, so its distance is how far the source sits above the work surface.
  if (isBenchKind(hood.kind)) {
    const at =
      parameter === 'faceScale'
        ? `with a ${faceText(hood, value_si)} work surface`
        : parameter === 'distance'
          ? `${formatValue(parameter, value_si)} under the source`
          : `at ${formatValue(parameter, value_si)}`;
    return `${HOOD_KIND_LABEL[hood.kind]} ${at}`.slice(0, 120);
  }
  const at = parameter === 'faceScale' ? `${faceText(hood, value_si)} face` : formatValue(parameter, value_si);
  return `${HOOD_KIND_LABEL[hood.kind]} at ${at}`.slice(0, 120);
}
