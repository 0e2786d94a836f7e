/**
 * Numbers as readers see them, everywhere the product prints one: "2.5 × 10⁻¹³", "−42", "1235",
 * never "2.5e-13", "2.5 × 10^-13" or a hyphen for a minus. A multiplication sign, the exponent in
 * Unicode superscripts and a true minus sign (U+2212), as the SI Brochure (9th ed., 2019, §5.4.2
 * and §5.4.6) and ISO 80000-1 print them. Built on the claim paragraph's printer
 * (shared/claims/print.ts), so that every screen and the pasted paragraph agree.
 *
 * The typed forms ("2.5e-13 N", "3.4 × 10^5 W") stay what the API and the inputs carry (and what
 * parseQuantity reads back); these functions are for what is shown. Exact values stay on `data-si`.
 */
import { MINUS, printText } from '../claims/print';
import { formatQuantity } from '../worksheet/quantity';

export { MINUS };

/** A hyphen-minus before a number, at the start or after a space, bracket or relation sign. */
const HYPHEN_MINUS = /(^|[\s([=≈~<>≤≥:;,/])-(?=\.?\d)/g;

/**
 * Rewrites the numbers of a text for print: "× 10^-6" and "2.5e-13" → "× 10⁻⁶", "2.5 × 10⁻¹³";
 * "m/s^2" → "m/s²"; a leading hyphen of a number → "−". Text without such numbers is returned as is.
 */
export function readableText(text: string): string {
  return printText(text).replace(HYPHEN_MINUS, `$1${MINUS}`);
}

/**
 * A number to `digits` significant figures (default 4) for a reader: trailing zeros trimmed, plain
 * from 0.001 to below 10^digits, otherwise "m × 10ⁿ"; zero is "0"; not-a-number and the infinities
 * in words.
 */
export function readableNumber(n: number, digits = 4): string {
  return readableText(formatQuantity(n, '', { digits }));
}
