/** Rough sizing figures, common practice: whole-system total pressure and overall fan efficiency. */
export const FAN_ASSUMPTIONS = { totalPressure_Pa: 1000, efficiency: 0.6 } as const;

// Shaft power P = Q·Δp/η (air power over overall fan efficiency); a first figure, not a fan selection.
export function roughFanPower_W(
  airflow_m3PerS: number,
  { totalPressure_Pa, efficiency }: { totalPressure_Pa: number; efficiency: number } = FAN_ASSUMPTIONS,
): number {
  if (!(airflow_m3PerS >= 0)) throw new RangeError(`airflow_m3PerS must be zero or more, got ${airflow_m3PerS}`);
  if (!(efficiency > 0 && efficiency <= 1)) throw new RangeError(`efficiency must lie in (0, 1], got ${efficiency}`);
  return (airflow_m3PerS * totalPressure_Pa) / efficiency;
}
