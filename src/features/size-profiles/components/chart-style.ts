import type { AxisSpec } from '@/components/charts/chart-axes';

export * from '@/components/chart-style';

export const CHART = { width: 640, height: 300, margin: { top: 16, right: 20, bottom: 52, left: 64 } } as const;

// The histogram and the cumulative curve read against one diameter axis, labelled alike.
export const diameterAxis = (tickValues: number[]): AxisSpec => ({
  label: 'Aerodynamic diameter (µm, log scale)',
  labelOffset: 16,
  tickValues,
  format: String,
});
