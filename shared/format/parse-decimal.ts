// Spaces (plain, no-break, narrow no-break) group digits in threes, and the decimal sign is a comma or a point,
// as ISO 80000-1 and the SI Brochure allow; the typographic minus is what a copied figure often holds.
const GROUP_SPACE = /(?<=\d)[ \u00a0\u202f](?=\d{3}(?!\d))/g;
const NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?$/i;
// "1,250" is 1.25 in Lyon and 1250 in Leeds: a factor of a thousand is worse than asking again.
const AMBIGUOUS_COMMA = /^[-+]?[1-9]\d{0,2},\d{3}$/;

/**
 * A number typed into a form, or null when the text is blank or cannot be read as one number.
 * Accepts "0,5", "0.5", "1 000,5", "−2", "2.5e-6"; refuses "1,2,3", "1.000,5", "1,250" (ambiguous), "0x10", "Infinity".
 */
export function parseDecimal(text: string): number | null {
  const trimmed = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(GROUP_SPACE, '');
  if (trimmed === '' || AMBIGUOUS_COMMA.test(trimmed)) return null;
  const commas = trimmed.split(',').length - 1;
  if (commas > 1 || (commas === 1 && trimmed.includes('.'))) return null;
  const normal = trimmed.replace(',', '.');
  if (!NUMBER.test(normal)) return null;
  const value = Number(normal);
  return Number.isFinite(value) ? value : null;
}

// Zod's number() reports NaN as "Enter a number", so forms validated by a schema want NaN rather than null.
export const decimalOrNaN = (text: string): number => parseDecimal(text) ?? Number.NaN;
