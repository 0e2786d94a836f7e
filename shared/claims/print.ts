/**
 * Numbers as they are printed in a report (issue 11, item 4): "2.50 × 10¹¹", "−3.40 × 10⁻⁶",
 * "0.00123", "10.0" — a true minus sign (U+2212), a multiplication sign and the exponent in Unicode
 * superscripts, never "10^11" or "2.5e+11". The claim paragraph writes its numbers with these, and
 * rewrites the "× 10^-6" spellings of older messages (formatQuantity, the check kit's verdicts) into
 * the same form, so that a pasted paragraph reads like print wherever its numbers came from.
 *
 * Pure functions, no dependencies: they run in the browser and on the server alike.
 */

/** The minus sign of print (U+2212), used for negative numbers and negative exponents. */
export const MINUS = '\u2212';

const SUPERSCRIPT: Record<string, string> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
  [MINUS]: '⁻',
  '+': '⁺',
};

/**
 * An integer exponent in superscripts: 11 → "¹¹", -6 → "⁻⁶", "+03" → "³" (a plus sign and leading
 * zeros are dropped, as print does).
 */
export function superscript(exponent: number | string): string {
  const raw = String(exponent).trim();
  const m = /^([+\-\u2212]?)0*(\d+)$/.exec(raw);
  if (!m) throw new Error(`not an integer exponent: "${raw}"`);
  const digits = m[2];
  const negative = (m[1] === '-' || m[1] === MINUS) && !/^0+$/.test(digits);
  return (negative ? '⁻' : '') + [...digits].map((d) => SUPERSCRIPT[d]).join('');
}

/** Exponents from FIXED_FROM up to (not including) FIXED_TO are printed without a power of ten. */
const PRINT_FIXED_FROM = -3;
const PRINT_FIXED_TO = 4;

/**
 * A number to `digits` significant figures, as in print. Trailing zeros are kept, since they
 * carry the precision ("10.0" for 9.996 to three figures). Values from 0.001 up to 9999 (after
 * rounding) are printed plainly ("0.00123", "42.0", "1230"); smaller and larger ones as
 * "m × 10ⁿ" ("1.23 × 10⁴", "5.00 × 10⁻⁶"). Zero is "0"; not-a-number and infinities in words.
 */
export function formatPrint(x: number, digits = 3): string {
  if (Number.isNaN(x)) return 'not a number';
  if (x === Number.POSITIVE_INFINITY) return 'infinity';
  if (x === Number.NEGATIVE_INFINITY) return 'minus infinity';
  if (x === 0) return '0';
  const d = Math.min(Math.max(Math.round(digits), 1), 21);
  const sign = x < 0 ? MINUS : '';
  // toExponential rounds correctly and carries into the exponent (9.996 → "1.00e+1").
  const [mantissa, expText] = Math.abs(x).toExponential(d - 1).split('e');
  const exp = Number(expText);
  if (exp >= PRINT_FIXED_FROM && exp < PRINT_FIXED_TO) {
    return sign + Number(`${mantissa}e${exp}`).toFixed(Math.max(0, d - 1 - exp));
  }
  return `${sign}${mantissa} × 10${superscript(exp)}`;
}

/** A number with a space, a multiplication sign or letter x, "10", a caret and an exponent. */
const TIMES_TEN = /(\d)\s*(?:×|\*|·|x|X)\s*10\s*\^\s*(?:\(\s*|\{\s*)?([+\-\u2212]?\d+)(?:\s*\)|\s*\})?/g;
/** "10^-6" standing alone ("a factor of 10^5"). */
const BARE_TEN = /(^|[^\w.])10\s*\^\s*(?:\(\s*|\{\s*)?([+\-\u2212]?\d+)(?:\s*\)|\s*\})?/g;
/** E-notation: "2.4e-3", "2.5E+11", ".5e6" (not part of a longer word or number). */
const E_NOTATION = /(^|[^\w.])(\d+(?:\.\d*)?|\.\d+)[eE]([+\-\u2212]?\d+)(?![\w.])/g;
/** A unit or symbol raised to an integer power: "m^2", "s^-1", "s^(-2)". */
const UNIT_POWER = /([A-Za-zµμΩ°)])\^\s*(?:\(\s*|\{\s*)?([+\-\u2212]?\d+)(?:\s*\)|\s*\})?/g;

/** A whole number of six digits or more standing alone ("177806 times"), not part of a decimal, a word or a code. */
const BIG_INTEGER = /(^|[\s(“"'])(\d{6,})(?=$|[\s,;:)”"'!?]|\.(?!\d))/g;

export interface PrintTextOptions {
  /**
   * Also print whole numbers of six digits or more in scientific form to `digits` significant
   * figures ("177806 times" → "1.78 × 10⁵ times"). For computed values only: it would mangle a
   * reference number or a count that must stay exact.
   */
  bigIntegers?: boolean;
  /** Significant figures for bigIntegers (default 3). */
  digits?: number;
}

/**
 * Rewrites the plain-text powers of older messages into print: "3.4 × 10^5" and "3.4 x 10^-6" →
 * "3.4 × 10⁵", "3.4 × 10⁻⁶"; "2.5e+11" → "2.5 × 10¹¹"; "10^-3" → "10⁻³"; "m/s^2" → "m/s²". The
 * mantissa is kept as written; text without such powers is returned unchanged. With `bigIntegers`,
 * long whole numbers are put in scientific form too (see PrintTextOptions).
 */
export function printText(text: string, options: PrintTextOptions = {}): string {
  const out = text
    .replace(TIMES_TEN, (_m, digit: string, exp: string) => `${digit} × 10${superscript(exp)}`)
    .replace(E_NOTATION, (_m, before: string, mantissa: string, exp: string) => `${before}${mantissa} × 10${superscript(exp)}`)
    .replace(BARE_TEN, (_m, before: string, exp: string) => `${before}10${superscript(exp)}`)
    .replace(UNIT_POWER, (_m, base: string, exp: string) => `${base}${superscript(exp)}`);
  if (!options.bigIntegers) return out;
  return out.replace(BIG_INTEGER, (_m, before: string, digits: string) => `${before}${formatPrint(Number(digits), options.digits ?? 3)}`);
}
