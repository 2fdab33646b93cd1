import type { Fraction } from './fractions';

export const FRACTION_LABEL: Record<Fraction, string> = {
  total: 'Total',
  inhalable: 'Inhalable',
  thoracic: 'Thoracic',
  respirable: 'Respirable',
};
