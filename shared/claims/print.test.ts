/**
 * Numbers as printed: significant figures and rounding against JavaScript's own Number
 * formatting (ECMA-262 Number.prototype.toExponential / toPrecision, which round half away from
 * zero on the exact binary value), superscript digits against the Unicode code charts
 * (Superscripts and Subscripts block U+2070–U+209F; ¹ ² ³ are U+00B9, U+00B2, U+00B3 in Latin-1),
 * and the minus sign U+2212 of typeset mathematics (Unicode "MINUS SIGN"; ISO 80000-1 writes
 * powers of ten as "× 10ⁿ"; from memory). Each expected string is checked by reading it back.
 */
import fc from 'fast-check';
import { formatPrint, MINUS, printText, superscript } from './print';

/** Reads a printed number back into a JavaScript number (the inverse the tests rely on). */
function readPrint(s: string): number {
  const sup: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-' };
  const m = /^(\u2212?)(\d+(?:\.\d+)?)(?: × 10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?$/.exec(s);
  if (!m) throw new Error(`not a printed number: ${s}`);
  const exp = m[3] ? Number([...m[3]].map((c) => sup[c]).join('')) : 0;
  return (m[1] ? -1 : 1) * Number(`${m[2]}e${exp}`);
}

describe('superscript', () => {
  it('writes each digit and the minus sign with its Unicode superscript', () => {
    // Code points from the Unicode charts: U+2070 ⁰, U+00B9 ¹, U+00B2 ², U+00B3 ³, U+2074–U+2079 ⁴–⁹, U+207B ⁻.
    expect(superscript(1234567890)).toBe('\u00B9\u00B2\u00B3\u2074\u2075\u2076\u2077\u2078\u2079\u2070');
    expect(superscript(-6)).toBe('\u207B\u2076');
    expect(superscript(`${MINUS}12`)).toBe('⁻¹²');
  });
  it('drops a plus sign and leading zeros, and never writes minus zero', () => {
    expect(superscript('+03')).toBe('³');
    expect(superscript('-0')).toBe('⁰');
    expect(superscript('-007')).toBe('⁻⁷');
  });
  it('refuses what is not an integer', () => {
    expect(() => superscript('1.5')).toThrow(/integer/);
    expect(() => superscript('x')).toThrow(/integer/);
  });
});

describe('formatPrint', () => {
  it('prints large and small values with a power of ten in superscripts', () => {
    expect(formatPrint(2.5e11, 2)).toBe('2.5 × 10¹¹');
    expect(formatPrint(2.5e11, 3)).toBe('2.50 × 10¹¹');
    // 177 805.77 is the ratio of 0.2 lbf (0.2 × 4.448 221 615 260 5 N, NIST SP 811 B.8) to
    // 1.5 kW / c (c = 299 792 458 m/s, SI Brochure): 0.889 644 N / 5.003 461 µN.
    expect(formatPrint(0.2 * 4.4482216152605 / (1500 / 299792458), 3)).toBe('1.78 × 10⁵');
    expect(formatPrint(12345, 3)).toBe('1.23 × 10⁴');
  });

  it('prints negative exponents and negative values with the minus sign of print', () => {
    expect(formatPrint(3.336e-6, 3)).toBe('3.34 × 10⁻⁶');
    expect(formatPrint(-4.2e-9, 2)).toBe(`${MINUS}4.2 × 10⁻⁹`);
    expect(formatPrint(-273.16, 4)).toBe(`${MINUS}273.2`);
    // 273.15 is 273.149 999… in binary, so to four figures it is 273.1 (as toPrecision gives).
    expect(formatPrint(-273.15, 4)).toBe(`${MINUS}${(273.15).toPrecision(4)}`);
    expect(formatPrint(0.000123, 3)).toBe('1.23 × 10⁻⁴');
    expect(formatPrint(0.00123, 3)).toBe('0.00123');
  });

  it('rounds to significant figures and carries into the next power (9.996 → 10.0)', () => {
    expect(formatPrint(9.996, 3)).toBe('10.0');
    expect(formatPrint(9999.6, 4)).toBe('1.000 × 10⁴');
    expect(formatPrint(9.9996e-7, 3)).toBe('1.00 × 10⁻⁶');
    expect(formatPrint(0.0009996, 3)).toBe('0.00100');
    expect(formatPrint(1, 3)).toBe('1.00');
    expect(formatPrint(42, 1)).toBe('40');
  });

  it('prints zero as 0, and the non-finite values in words', () => {
    expect(formatPrint(0)).toBe('0');
    expect(formatPrint(-0)).toBe('0');
    expect(formatPrint(Number.NaN)).toBe('not a number');
    expect(formatPrint(Infinity)).toBe('infinity');
    expect(formatPrint(-Infinity)).toBe('minus infinity');
  });

  it('prints the tiniest and the hugest doubles', () => {
    // Number.MIN_VALUE = 2^-1074 ≈ 4.94 × 10^-324 and Number.MAX_VALUE ≈ 1.80 × 10^308 (ECMA-262 §6.1.6.1).
    expect(formatPrint(Number.MIN_VALUE, 3)).toBe('4.94 × 10⁻³²⁴');
    expect(formatPrint(Number.MAX_VALUE, 3)).toBe('1.80 × 10³⁰⁸');
    expect(formatPrint(6.02214076e23, 4)).toBe('6.022 × 10²³');
  });

  it('never writes a caret, an e-notation or a hyphen-minus, and reads back to the rounded value', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 6 }), (x, digits) => {
        const s = formatPrint(x, digits);
        expect(s).not.toMatch(/\^|e[+-]?\d|-/);
        if (x === 0) return;
        // The printed value is x rounded to `digits` figures, as toPrecision rounds it.
        expect(readPrint(s)).toBe(Number(x.toPrecision(digits)));
        // It shows `digits` significant figures: exactly so with a power of ten; a plain integer
        // such as "1230" (three figures) may need placeholder zeros beyond them.
        const shown = s.replace(MINUS, '').replace(/ × 10.*$/, '').replace('.', '').replace(/^0+/, '');
        if (/ × /.test(s)) expect(shown).toHaveLength(digits);
        else expect(shown.length).toBeGreaterThanOrEqual(digits);
      }),
    );
  });
});

describe('printText', () => {
  it('rewrites the "× 10^n" of older messages into superscripts', () => {
    expect(printText('The claimed thrust is 3.4 × 10^5 times the bound.')).toBe('The claimed thrust is 3.4 × 10⁵ times the bound.');
    expect(printText('a bound of 5.00 × 10^-6 N')).toBe('a bound of 5.00 × 10⁻⁶ N');
    expect(printText('2.4 x 10^-3 N and 7*10^(12) J and 1.2×10^{−9} s')).toBe('2.4 × 10⁻³ N and 7 × 10¹² J and 1.2 × 10⁻⁹ s');
  });

  it('rewrites e-notation, a bare power of ten and powers of units', () => {
    expect(printText('at 2.5e+11 W, then 2.4e-03 N and .5E6 J')).toBe('at 2.5 × 10¹¹ W, then 2.4 × 10⁻³ N and .5 × 10⁶ J');
    expect(printText('a factor of 10^5 in m/s^2 and kg m^2 s^-1')).toBe('a factor of 10⁵ in m/s² and kg m² s⁻¹');
  });

  it('leaves alone words, identifiers and text already in print', () => {
    const plain = 'Version 2 of the entry at https://counterweight.example.org/entries/x2e5/v/2 says 3.4 × 10⁵ and e.g. 12 A at 24 V.';
    expect(printText(plain)).toBe(plain);
    expect(printText('the 2e-class cells and item 1e')).toBe('the 2e-class cells and item 1e');
  });

  it('prints long whole numbers of computed values in scientific form when asked, and only then', () => {
    const verdict = 'The claimed thrust, 890 mN, is 177806 times the bound (1000000 W).';
    expect(printText(verdict)).toBe(verdict);
    // 177 806 to three figures is 1.78 × 10⁵; 1 000 000 is 1.00 × 10⁶ (by hand).
    expect(printText(verdict, { bigIntegers: true })).toBe('The claimed thrust, 890 mN, is 1.78 × 10⁵ times the bound (1.00 × 10⁶ W).');
    expect(printText('ends at 123456.', { bigIntegers: true, digits: 2 })).toBe('ends at 1.2 × 10⁵.');
    // Five digits, decimals, codes and words stay as written.
    const keep = 'In 2026, 12345 runs gave 1234567.5 J; ISBN 9780486603612-x and run-1234567 and v1234567.';
    expect(printText(keep, { bigIntegers: true })).toBe(keep);
  });

  it('leaves no caret power or e-notation in any formatted output it rewrites', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e300, max: 1e300 }), (x) => {
        const out = printText(`value ${x.toExponential(3)} and ${x.toExponential(3).replace('e', ' × 10^')}`);
        expect(out).not.toMatch(/\^|\de[+-]?\d/);
      }),
    );
  });
});
