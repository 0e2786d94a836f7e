/**
 * Typed quantities against outside references: NIST SP 811 (2008), "Guide for the Use of the
 * International System of Units (SI)", Appendix B.8 (factors in alphabetical order) and B.9 (by kind
 * of quantity), for the imperial and trade units claims arrive in. SP 811 prints most factors to
 * seven significant digits, so those checks allow half a unit in the seventh digit.
 */
import fc from 'fast-check';
import { describeDimension, formatQuantity, parseQuantity, QuantityError, toQuantityValue } from './quantity';

/** |a − b| ≤ rel·|b|: agreement to the digits a reference prints. */
function expectRelClose(actual: number, expected: number, rel: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

function errorOf(fn: () => unknown): QuantityError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(QuantityError);
    return e as QuantityError;
  }
  throw new Error('expected a QuantityError');
}

describe('parseQuantity: NIST SP 811 (2008) Appendix B conversion factors', () => {
  // Seven significant digits printed → half a unit in the seventh digit, relative ≤ 5e-7 of the value.
  const SEVEN = 5e-7;

  test('pound-force to newton: 4.448 222 E+00 (SP 811 B.8)', () => {
    expectRelClose(parseQuantity('1 lbf', 'N'), 4.448222, SEVEN);
    // the brief's exact figure: 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² = 4.448 221 615 260 5 N (both factors exact, SP 811 B.8)
    expect(parseQuantity('1 lbf', 'N')).toBeCloseTo(0.45359237 * 9.80665, 12);
    expect(parseQuantity('0.25 lbf', 'N')).toBeCloseTo(0.25 * 4.4482216152605, 12);
  });

  test('horsepower (550 ft·lbf/s) to watt: 7.456 999 E+02 (SP 811 B.8)', () => {
    expectRelClose(parseQuantity('1 hp', 'W'), 745.6999, SEVEN);
    expectRelClose(parseQuantity('1.5 hp', 'W'), 1.5 * 745.6999, SEVEN);
  });

  test('British thermal unit (IT) to joule: 1.055 056 E+03 (SP 811 B.8)', () => {
    expectRelClose(parseQuantity('1 BTU', 'J'), 1055.056, SEVEN);
  });

  test('kilowatt hour to joule: 3.6 E+06, exact (SP 811 B.8)', () => {
    expect(parseQuantity('3 kWh', 'J')).toBe(3 * 3.6e6);
    expect(parseQuantity('1 kWh', 'MJ')).toBe(3.6e6);
  });

  test('pound-force per square inch to pascal: 6.894 757 E+03 (SP 811 B.8)', () => {
    expectRelClose(parseQuantity('1 psi', 'Pa'), 6894.757, SEVEN);
  });

  test('inch to metre: 2.54 E-02, exact (SP 811 B.8)', () => {
    expect(parseQuantity('1 inch', 'm')).toBe(0.0254);
    expect(parseQuantity('10 inch', 'mm')).toBeCloseTo(0.254, 15);
  });

  test('pound (avoirdupois) to kilogram: 0.453 592 37, exact (SP 811 B.8)', () => {
    expect(parseQuantity('1 lbm', 'kg')).toBe(0.45359237);
    expect(parseQuantity('1 lb', 'kg')).toBe(0.45359237);
  });

  test('foot and mile to metre: 0.3048 and 1609.344, exact (SP 811 B.8)', () => {
    expect(parseQuantity('1 ft', 'm')).toBeCloseTo(0.3048, 15);
    expect(parseQuantity('1 mi', 'm')).toBeCloseTo(1609.344, 9);
  });

  test('degree Celsius and Fahrenheit to kelvin: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8 (SP 811 B.9)', () => {
    expect(parseQuantity('450 degC', 'K')).toBeCloseTo(723.15, 10);
    expect(parseQuantity('0 degC', 'K')).toBeCloseTo(273.15, 10);
    expect(parseQuantity('32 degF', 'K')).toBeCloseTo(273.15, 10);
    expect(parseQuantity('212 degF', 'K')).toBeCloseTo((212 + 459.67) / 1.8, 10); // 373.15 K
    expect(parseQuantity('-40 degF', 'degC')).toBeCloseTo((-40 + 459.67) / 1.8, 10); // −40 °C = 233.15 K
    expect(parseQuantity('450 °C', 'K')).toBeCloseTo(723.15, 10);
  });

  test('standard atmosphere and bar to pascal: 1.013 25 E+05 and 1.0 E+05, exact (SP 811 B.8)', () => {
    expect(parseQuantity('1 atm', 'Pa')).toBeCloseTo(101325, 8);
    expect(parseQuantity('1 bar', 'Pa')).toBeCloseTo(1e5, 8);
  });

  test('kilogram-force to newton: 9.806 65, exact (SP 811 B.8)', () => {
    expect(parseQuantity('1 kgf', 'N')).toBeCloseTo(9.80665, 12);
  });
});

describe('parseQuantity: what may be typed', () => {
  test('SI prefixes and scientific notation', () => {
    expect(parseQuantity('2.5e-3 N', 'N')).toBe(0.0025);
    expect(parseQuantity('1.33 mN', 'N')).toBeCloseTo(0.00133, 15);
    expect(parseQuantity('4.2 GW', 'W')).toBe(4.2e9);
    expect(parseQuantity('3.4 × 10^5 W', 'W')).toBe(340000);
    expect(parseQuantity('3.4 x 10^-5 W', 'W')).toBe(3.4e-5);
    expect(parseQuantity('1 µN', 'N')).toBeCloseTo(1e-6, 18);
    expect(parseQuantity('1 uN', 'N')).toBeCloseTo(1e-6, 18);
    expect(parseQuantity('5 kΩ', 'ohm')).toBe(5000);
    expect(parseQuantity('9.81 m/s²', 'm/s^2')).toBe(9.81);
  });

  test('a bare number takes the unit asked for; pure numbers and percentages', () => {
    expect(parseQuantity('0.8', '')).toBe(0.8);
    expect(parseQuantity('2', 'mN')).toBeCloseTo(0.002, 15);
    expect(parseQuantity('450', 'degC')).toBeCloseTo(723.15, 10);
    expect(parseQuantity('80 %', '')).toBeCloseTo(0.8, 15);
    expect(parseQuantity('80', '%')).toBeCloseTo(0.8, 15);
  });

  test('the result is in coherent SI whatever prefix the asked-for unit has', () => {
    expect(parseQuantity('1 kN', 'mN')).toBe(1000);
    expect(parseQuantity('1 h', 's')).toBe(3600); // in a typed quantity h is the hour
    expect(parseQuantity('5 min', 's')).toBe(300);
  });

  test('the object form takes a value and its unit', () => {
    expect(parseQuantity({ value: 1, unit: 'lbf' }, 'N')).toBeCloseTo(4.4482216152605, 12);
    expect(parseQuantity({ value: 450, unit: 'degC' }, 'K')).toBeCloseTo(723.15, 10);
    expect(errorOf(() => parseQuantity({ value: Number.NaN, unit: 'N' }, 'N')).kind).toBe('value');
  });

  test('a dimension mismatch spells out both dimensions', () => {
    const e = errorOf(() => parseQuantity('3 kWh', 'N'));
    expect(e.kind).toBe('dimension');
    expect(e.message).toBe('"3 kWh" is an energy (joules), but this needs a force (newtons)');
    expect(errorOf(() => parseQuantity('0.8 N', '')).message).toBe('"0.8 N" is a force (newtons), but this needs a pure number');
    expect(errorOf(() => parseQuantity('1.5 hp', 'K')).message).toContain('a power (watts), but this needs a temperature (kelvins)');
  });

  test('an unknown unit is named', () => {
    const e = errorOf(() => parseQuantity('0.25 lbff', 'N'));
    expect(e.kind).toBe('unknown_symbol');
    expect(e.message).toContain('"lbff" is not a unit');
    expect(e.message).toContain('0.25 lbff');
  });

  test('constants are refused in typed quantities, with the reason', () => {
    const e = errorOf(() => parseQuantity('0.5 c', 'm/s'));
    expect(e.kind).toBe('unknown_symbol');
    expect(e.message).toContain('"c" is a constant (the speed of light in vacuum), not a unit');
  });

  test('thousands separators and decimal commas are refused with a way to write the number', () => {
    const e = errorOf(() => parseQuantity('1,200 W', 'W'));
    expect(e.kind).toBe('syntax');
    expect(e.message).toContain('thousands separator');
    expect(e.message).toContain('1200');
    expect(errorOf(() => parseQuantity('1,234,567.5 W', 'W')).message).toContain('1234567.5');
    expect(errorOf(() => parseQuantity('0,25 N', 'N')).message).toContain('use a point for decimals');
    expect(errorOf(() => parseQuantity('1 200 W', 'W')).message).toContain('more than one number');
  });

  test('arithmetic, functions and empty or oversized text are refused', () => {
    expect(errorOf(() => parseQuantity('2 * 3 N', 'N')).kind).toBe('syntax');
    expect(errorOf(() => parseQuantity('sqrt(4) N', 'N')).kind).toBe('syntax');
    expect(errorOf(() => parseQuantity('N', 'N')).message).toContain('does not start with a number');
    expect(errorOf(() => parseQuantity('', 'N')).message).toContain('a value is needed');
    expect(errorOf(() => parseQuantity('1' + '0'.repeat(100) + ' N', 'N')).kind).toBe('refused');
    expect(errorOf(() => parseQuantity('1e400 N', 'N')).kind).toBe('value');
  });
});

describe('formatQuantity', () => {
  test('sensible SI prefixes, 4 significant figures, trailing zeros trimmed', () => {
    expect(formatQuantity(0.00133, 'N')).toBe('1.33 mN');
    expect(formatQuantity(4.2e9, 'W')).toBe('4.2 GW');
    expect(formatQuantity(4.4482216152605, 'N')).toBe('4.448 N');
    expect(formatQuantity(0.99996, 'N')).toBe('1 N'); // rounding carries into the next prefix
    expect(formatQuantity(999.96, 'N')).toBe('1 kN');
    expect(formatQuantity(0, 'N')).toBe('0 N');
    expect(formatQuantity(-0.00133, 'N')).toBe('-1.33 mN');
    expect(formatQuantity(2e-6, 's')).toBe('2 µs');
    expect(formatQuantity(3200, 'm/s')).toBe('3.2 km/s');
    expect(formatQuantity(1000, 'ohm')).toBe('1 kΩ');
  });

  test('masses use grams with prefixes up to the kilogram', () => {
    expect(formatQuantity(0.0013, 'kg')).toBe('1.3 g');
    expect(formatQuantity(1, 'kg')).toBe('1 kg');
    expect(formatQuantity(1500, 'kg')).toBe('1500 kg');
    expect(formatQuantity(9.1093837139e-31, 'kg')).toBe('9.109 × 10^-31 kg');
  });

  test('pure numbers: scientific notation when very large or small', () => {
    expect(formatQuantity(340000, '')).toBe('3.4 × 10^5');
    expect(formatQuantity(1234, '')).toBe('1234');
    expect(formatQuantity(0.00123, '')).toBe('0.00123');
    expect(formatQuantity(0.000123, '')).toBe('1.23 × 10^-4');
    expect(formatQuantity(299.792458, '')).toBe('299.8');
  });

  test('NaN and infinities in words', () => {
    expect(formatQuantity(Number.NaN, 'N')).toBe('not a number');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'W')).toBe('infinity');
    expect(formatQuantity(Number.NEGATIVE_INFINITY, '')).toBe('minus infinity');
  });

  test('a display unit converts', () => {
    expect(formatQuantity(4.4482216152605, 'N', { displayUnit: 'lbf' })).toBe('1 lbf');
    expect(formatQuantity(723.15, 'K', { displayUnit: 'degC' })).toBe('450 °C');
    expect(formatQuantity(273.15, 'K', { displayUnit: 'degF' })).toBe('32 °F');
    expect(formatQuantity(3200, 'm/s', { displayUnit: 'km/s' })).toBe('3.2 km/s');
    expect(formatQuantity(0.45, '', { displayUnit: '%' })).toBe('45 %');
    expect(formatQuantity(1 / 3, '', { digits: 6 })).toBe('0.333333');
    expect(() => formatQuantity(1, 'N', { displayUnit: 'W' })).toThrow('"W" is a power');
  });

  test('toQuantityValue gives the SI unit of the dimension and the display', () => {
    expect(toQuantityValue(0.5, 'mN', 'mN')).toEqual({ si: 0.5, unit: 'N', display: '500 mN' });
    expect(toQuantityValue(3200, 'km/s')).toEqual({ si: 3200, unit: 'm / s', display: '3.2 km/s' });
    expect(toQuantityValue(0.8, '')).toEqual({ si: 0.8, unit: '', display: '0.8' });
  });
});

describe('describeDimension', () => {
  test('names the kind of quantity and its SI base dimension', () => {
    expect(describeDimension('N')).toBe('a force (newtons)');
    expect(describeDimension('lbf')).toBe('a force (newtons)');
    expect(describeDimension('kWh')).toBe('an energy (joules)');
    expect(describeDimension('hp')).toBe('a power (watts)');
    expect(describeDimension('psi')).toBe('a pressure (pascals)');
    expect(describeDimension('km/s')).toBe('a speed (m/s)');
    expect(describeDimension('degF')).toBe('a temperature (kelvins)');
    expect(describeDimension('')).toBe('a pure number');
    expect(describeDimension('m^4')).toBe('a quantity in m⁴');
  });
});

describe('round trips (fast-check)', () => {
  const UNITS = ['N', 'W', 'J', 'Pa', 'kg', 'm', 's', 'm/s', 'K', 'C', 'V', 'ohm', 'Hz', 'N s', 'J s', 'kg/s', 'W/m^2', ''];
  const magnitude = fc.double({ min: -30, max: 30, noNaN: true }).map((p) => Math.pow(10, p));
  const value = fc.tuple(magnitude, fc.boolean()).map(([m, neg]) => (neg ? -m : m));

  test('parse(format(x)) ≈ x to the digits shown (4 significant figures: within 5e-4)', () => {
    fc.assert(
      fc.property(value, fc.constantFrom(...UNITS), (x, unit) => {
        const shown = formatQuantity(x, unit);
        const back = parseQuantity(shown, unit);
        expect(Math.abs(back - x)).toBeLessThanOrEqual(5e-4 * Math.abs(x));
      }),
      { numRuns: 500 },
    );
  });

  test('with 15 significant figures the round trip is exact to 1e-14', () => {
    fc.assert(
      fc.property(value, fc.constantFrom(...UNITS), (x, unit) => {
        const back = parseQuantity(formatQuantity(x, unit, { digits: 15 }), unit);
        expect(Math.abs(back - x)).toBeLessThanOrEqual(1e-14 * Math.abs(x));
      }),
      { numRuns: 500 },
    );
  });

  test('unit conversions there and back: typed in one unit, shown in another, read back', () => {
    const pairs: [string, string][] = [
      ['lbf', 'N'],
      ['hp', 'kW'],
      ['BTU', 'kWh'],
      ['psi', 'kPa'],
      ['inch', 'mm'],
      ['lbm', 'g'],
      ['degF', 'degC'],
      ['degC', 'K'],
      ['km/s', 'mi/hour'],
    ];
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom(...pairs), (x, [from, to]) => {
        const si = parseQuantity({ value: x, unit: from }, to);
        const shownInTo = formatQuantity(si, to, { displayUnit: to, digits: 15 });
        const si2 = parseQuantity(shownInTo, to);
        const backInFrom = parseQuantity(formatQuantity(si2, from, { displayUnit: from, digits: 15 }), from);
        const scale = Math.max(Math.abs(si), 1e-9);
        expect(Math.abs(si2 - si)).toBeLessThanOrEqual(1e-13 * scale + 1e-12);
        expect(Math.abs(backInFrom - si)).toBeLessThanOrEqual(1e-13 * scale + 1e-12);
      }),
      { numRuns: 500 },
    );
  });
});
