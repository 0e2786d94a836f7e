/**
 * Numbers and dimensions as readers see them. Print conventions: SI Brochure 9th ed. (BIPM 2019)
 * §5.4.2 (a multiplication sign, "2.5 × 10⁻¹³"), §5.4.6 (products of units with a half-high dot or
 * a space, powers as superscripts); the minus sign U+2212 as ISO 80000-1 and the Unicode standard
 * (U+2212 MINUS SIGN) give it. Unit names: SI Brochure 9th ed., Table 2 (base units) and Table 4
 * (derived units with special names and symbols).
 */
import { describeDimension } from '../worksheet/quantity';
import { SI_UNIT_NAMES, unitSymbols, unitWords } from './dimensions';
import { readableNumber, readableText } from './numbers';

describe('readableNumber', () => {
  it.each([
    [2.5e-13, 4, '2.5 × 10⁻¹³'], // SI Brochure §5.4.2 style
    [1234.5, 4, '1235'], // four significant figures, rounded half up
    [1234.5, 6, '1234.5'],
    [0, 4, '0'],
    [-42, 4, '\u221242'], // U+2212, not a hyphen
    [-2.5e-13, 4, '\u22122.5 × 10⁻¹³'],
    [1e21, 4, '1 × 10²¹'],
    [6.02214076e23, 4, '6.022 × 10²³'], // N_A, SI Brochure Table 1
  ])('%p to %p figures is %p', (n, digits, text) => {
    expect(readableNumber(n, digits)).toBe(text);
  });

  it('never prints e-notation, a caret or a hyphen-minus', () => {
    for (const n of [1.6e-19, -9.81, 3e8, -1e-30, 299792458, 0.000123]) {
      expect(readableNumber(n)).not.toMatch(/e[+-]?\d|\^|-/);
    }
  });
});

describe('readableText', () => {
  it('rewrites the numbers inside a message', () => {
    expect(readableText('Input F: 2 × 10^6 mN is above 1e6 mN')).toBe('Input F: 2 × 10⁶ mN is above 1 × 10⁶ mN');
    expect(readableText('a drop of -3.4 × 10^-6 J')).toBe('a drop of \u22123.4 × 10⁻⁶ J');
    expect(readableText('9.81 m/s^2')).toBe('9.81 m/s²');
  });
  it('leaves ranges, words and dates alone', () => {
    expect(readableText('3-6 mN on 2026-03-01, a P-type cell')).toBe('3-6 mN on 2026-03-01, a P-type cell');
  });
});

describe('dimension words', () => {
  it.each([
    ['N', 'a force (newtons)'], // SI Brochure Table 4: newton, kg m s^-2
    ['lbf', 'a force (newtons)'],
    ['kWh', 'an energy (joules)'], // Table 4: joule, kg m^2 s^-2
    ['hp', 'a power (watts)'], // Table 4: watt, kg m^2 s^-3
    ['psi', 'a pressure (pascals)'], // Table 4: pascal, kg m^-1 s^-2
    ['V', 'a voltage (volts)'], // Table 4: volt, kg m^2 s^-3 A^-1
    ['T', 'a magnetic flux density (teslas)'], // Table 4: tesla, kg s^-2 A^-1
    ['GHz', 'a frequency (hertz)'], // Table 4: hertz, s^-1
    ['degF', 'a temperature (kelvins)'], // Table 2: kelvin
    ['km/s', 'a speed (m/s)'], // no special name: the coherent unit's symbol
    ['J/(kg K)', 'a specific heat capacity (J/(kg·K))'],
    ['', 'a pure number'],
    ['m^4', 'a quantity in m⁴'],
    ['m^3 kg s^-4', 'a quantity in kg·m³·s⁻⁴'],
  ])('%p is %p', (unit, words) => {
    expect(describeDimension(unit)).toBe(words);
  });

  it('writes unit symbols for print', () => {
    expect(unitSymbols('kg m s^-2')).toBe('kg·m·s⁻²');
    expect(unitSymbols('kg m^2 s^-3')).toBe('kg·m²·s⁻³');
    expect(unitSymbols('m / s^2')).toBe('m/s²');
    expect(unitWords('kg m^2 s^-3')).toBe('watts');
  });

  it('names only units the SI itself names (22 special names and 7 base units at most)', () => {
    expect(Object.keys(SI_UNIT_NAMES).length).toBeLessThanOrEqual(29);
    for (const name of Object.values(SI_UNIT_NAMES)) expect(name).toMatch(/^[a-z]+$/);
  });
});
