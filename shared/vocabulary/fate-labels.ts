import type { Fate } from './fractions';

export const FATE_LABEL: Record<Fate, string> = {
  captured: 'Captured by hood',
  settled: 'Settled on the floor',
  exhausted: 'Exhausted with room air',
  airborne: 'Still airborne at the end',
  walls: 'Deposited on walls and ceiling',
};
