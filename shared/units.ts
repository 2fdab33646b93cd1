// Conversions for forms and formatters only; physics code stays in SI throughout.
export const metresToMicrometres = (length_m: number): number => length_m * 1e6;
export const micrometresToMetres = (length_um: number): number => length_um * 1e-6;
export const metresToNanometres = (length_m: number): number => length_m * 1e9;
export const nanometresToMetres = (length_nm: number): number => length_nm * 1e-9;
export const metresToMillimetres = (length_m: number): number => length_m * 1e3;
export const millimetresToMetres = (length_mm: number): number => length_mm * 1e-3;

export const cubicMetresPerSecondToPerHour = (airflow_m3PerS: number): number => airflow_m3PerS * 3600;
export const cubicMetresPerHourToPerSecond = (airflow_m3PerH: number): number => airflow_m3PerH / 3600;

export const secondsToMinutes = (time_s: number): number => time_s / 60;
export const minutesToSeconds = (time_min: number): number => time_min * 60;
export const secondsToHours = (time_s: number): number => time_s / 3600;
export const hoursToSeconds = (time_h: number): number => time_h * 3600;

export const milligramsToMicrograms = (mass_mg: number): number => mass_mg * 1e3;
export const microgramsToMilligrams = (mass_ug: number): number => mass_ug * 1e-3;
export const mgPerM3ToUgPerM3 = (concentration_mgPerM3: number): number => concentration_mgPerM3 * 1e3;
export const ugPerM3ToMgPerM3 = (concentration_ugPerM3: number): number => concentration_ugPerM3 * 1e-3;
export const mgPerSToMgPerMin = (rate_mgPerS: number): number => rate_mgPerS * 60;
export const mgPerMinToMgPerS = (rate_mgPerMin: number): number => rate_mgPerMin / 60;
export const mgPerSToMgPerH = (rate_mgPerS: number): number => rate_mgPerS * 3600;
export const mgPerHToMgPerS = (rate_mgPerH: number): number => rate_mgPerH / 3600;

export const kelvinToCelsius = (temperature_K: number): number => temperature_K - 273.15;
export const celsiusToKelvin = (temperature_C: number): number => temperature_C + 273.15;

export const pascalsToKilopascals = (pressure_Pa: number): number => pressure_Pa / 1e3;
export const kilopascalsToPascals = (pressure_kPa: number): number => pressure_kPa * 1e3;

// Air changes per hour: the supply airflow over the room volume (the definition of ACH).
export const supplyAirflowToAirChanges_perH = (airflow_m3PerH: number, volume_m3: number): number => airflow_m3PerH / volume_m3;
export const airChangesToSupplyAirflow_m3PerH = (airChanges_perH: number, volume_m3: number): number => airChanges_perH * volume_m3;
