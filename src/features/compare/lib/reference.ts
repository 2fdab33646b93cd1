import type { Fraction } from '../../../../shared/vocabulary/fractions';
import type { Estimate } from './differ';
import type { CompareColumn } from './types';

// Every column is compared on one fraction (the first column's limit fraction), so a difference never mixes two.
export function comparedFraction(columns: readonly CompareColumn[]): Fraction {
  return columns.find((c) => c.run?.limit)?.run?.limit?.fraction ?? 'respirable';
}

export function estimateOf(column: CompareColumn, fraction: Fraction): Estimate | null {
  const f = column.run?.fractions[fraction];
  return f ? { mean: f.twa8h_mgPerM3, ci95: f.twa8hCi95_mgPerM3 } : null;
}
