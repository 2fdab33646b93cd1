// Paths that have an input of their own in the form; anything else goes in the summary.
const AT_FIELD = [
  /^room\.(length_m|width_m|height_m|airChanges_perH|draftSpeed_mPerS|draftDirection_deg|temperature_K|eddyDiffusivity_m2PerS)$/,
  /^source\.(x_m|y_m|z_m|shape|size_m|taskMinutesPerShift|background_mgPerM3|releaseType)$/,
  /^source\.jet\.(speed_mPerS|diameter_m|direction|direction\.azimuth_deg|direction\.elevation_deg)$/,
  /^source\.emission\.(rate_mgPerMin|massPerEvent_mg|eventsPerHour|taskDuration_min)$/,
  /^dust\.(density_kgPerM3|shapeFactor)$/,
  /^dust\.sizeProfile\./,
  /^hoods\.\d+\.(kind|x_m|y_m|z_m|direction|direction\.azimuth_deg|direction\.elevation_deg|faceWidth_m|faceHeight_m|airflow_m3PerS)$/,
  /^worker\.(x_m|y_m|z_m|radius_m|dayToDayGsd)$/,
  /^run\.(particles|seed|batches|precision\.relativeHalfWidth|precision\.maxBatches)$/,
];

export const isShownAtField = (path: string) => AT_FIELD.some((re) => re.test(path));

const WORDS: Record<string, string> = {
  room: 'Room',
  source: 'Source',
  dust: 'Dust',
  hoods: 'Hood',
  worker: 'Worker',
  limit: 'Limit',
  run: 'Run',
  '(root)': 'Scenario',
};

export function fieldLabel(path: string): string {
  const [head, ...rest] = path.split('.');
  const tail = rest.map((part) => (/^\d+$/.test(part) ? String(Number(part) + 1) : part.replace(/_.*$/, ''))).join(' ');
  return `${WORDS[head] ?? head}${tail ? ` ${tail}` : ''}`;
}
