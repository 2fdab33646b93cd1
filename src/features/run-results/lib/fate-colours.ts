import type { Fate } from '../../../../shared/vocabulary/index';

// Fate colours are our own; wherever they appear the fate's word is beside them, never colour alone.
export const FATE_COLOUR: Record<Fate, string> = {
  captured: '#1f6f6a',
  settled: '#a07a3c',
  exhausted: '#7d8796',
  airborne: '#b8a46a',
  walls: '#5b4a6e',
};
