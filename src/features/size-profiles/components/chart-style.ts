export * from '@/components/chart-style';

export const CHART = { width: 640, height: 300, margin: { top: 16, right: 20, bottom: 52, left: 64 } } as const;
