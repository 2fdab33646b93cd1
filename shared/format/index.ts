export { countText, percentText } from './figures.ts';
export { decimalOrNaN, parseDecimal } from './parse-decimal.ts';
export { powerOfTen, readableNumber, superscript } from './readable.ts';
export { formatSig, trimSig } from './significant.ts';
