export { dateText, dateTimeText, fileDate, timeText } from './dates';
export { countText, percentText } from './figures';
export { decimalOrNaN, parseDecimal } from './parse-decimal';
export { powerOfTen, readableNumber, superscript } from './readable';
export { formatSig, trimSig } from './significant';
export { ciText, NO_WIDTH_TEXT, upperBoundKnown, upperBoundText } from './interval';
