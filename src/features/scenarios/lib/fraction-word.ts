import { FRACTION_LABEL } from '../../../../shared/vocabulary/fraction-labels';
import { FRACTIONS, type Fraction } from '../../../../shared/vocabulary/fractions';

/** "inhalable fraction" under a figure; a stored word we do not know is shown as it is. */
export const fractionWord = (fraction: string): string =>
  FRACTIONS.includes(fraction as Fraction) ? `${FRACTION_LABEL[fraction as Fraction].toLowerCase()} fraction` : fraction;
