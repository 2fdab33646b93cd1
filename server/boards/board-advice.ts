import type { Banner, WatchCause } from '../../shared/schemas/workspace-views';

// The last line of a Watch board says why it is Watch; "close to the limit" only when the exposure is.
const WATCH_LINE: Record<WatchCause, string> = {
  'near-limit':
    'Exposure here is close to the limit: follow these rules exactly and report any change in the job, the material or the layout.',
  undecided:
    'The assessment could not yet tell how far below the limit exposure here is, so it is being checked further: follow these rules exactly until it is.',
  'capture-short':
    'The hood draws less air at the work than this kind of dust release needs: keep the work as close to the hood as you can and ask your supervisor to have the airflow measured.',
  'out-of-date':
    'The assessment is out of date and is being checked again: follow these rules exactly and report any change in the job, the material or the layout.',
};

/**
 * The numbered lines of the board, from the banner and, for Watch, its cause. `reason` (no
 * assessment, review due, limit changed) leads an Act board and precedes a Watch board's last
 * line; a station whose approved control has no hood gets no hood instructions.
 */
export function boardAdvice(
  banner: Banner,
  distance_cm: number | null,
  reason: string | null,
  cause: WatchCause | null,
  hasHood = true,
): string[] {
  const distance = distance_cm
    ? `Keep the work within ${distance_cm} cm of the hood face (the marked zone).`
    : 'Keep the work where the assessment assumed it.';
  if (banner === 'act') {
    return [
      reason ?? 'The dust controls here are not confirmed to work.',
      'Do not start dusty work at this station until your supervisor says the controls are fixed or re-assessed.',
      'Wear the respiratory protection you were issued if you are told to continue.',
      'Report it to your supervisor now.',
    ];
  }
  const base = hasHood
    ? [
        'Switch the hood on before you start, and leave it on until the dust has cleared.',
        distance,
        'If the airflow indicator shows low or no flow, stop and report it.',
      ]
    : [
        'This station has no extraction: the assessment rests on the room ventilation and on how the work is done.',
        distance,
        'Keep doors, windows and fans as they were when the station was assessed, and report any change.',
      ];
  return banner === 'watch' ? [...base, ...(reason ? [reason] : []), WATCH_LINE[cause ?? 'near-limit']] : base;
}
