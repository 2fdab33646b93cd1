import { ACT } from '@/components/chart-style';

// A limit or a target across the whole plot, dashed so it never reads as data.
export function ReferenceLine({ y, width, testId }: { y: number; width: number; testId?: string }) {
  return <line x1={0} x2={width} y1={y} y2={y} stroke={ACT} strokeWidth={1.5} strokeDasharray="7 5" data-testid={testId} />;
}
