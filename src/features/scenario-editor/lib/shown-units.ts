import {
  celsiusToKelvin,
  cubicMetresPerHourToPerSecond,
  cubicMetresPerSecondToPerHour,
  kelvinToCelsius,
  metresToMicrometres,
  metresToMillimetres,
  micrometresToMetres,
  millimetresToMetres,
} from '../../../../shared/units';

// The units the editor shows instead of SI, each with its label and both conversions, so a number field takes one spread.
export const SHOWN_IN = {
  millimetres: { unit: 'mm', toDisplay: metresToMillimetres, fromDisplay: millimetresToMetres },
  micrometres: { unit: 'µm', toDisplay: metresToMicrometres, fromDisplay: micrometresToMetres },
  cubicMetresPerHour: { unit: 'm³/h', toDisplay: cubicMetresPerSecondToPerHour, fromDisplay: cubicMetresPerHourToPerSecond },
  celsius: { unit: '°C', toDisplay: kelvinToCelsius, fromDisplay: celsiusToKelvin },
} as const;
