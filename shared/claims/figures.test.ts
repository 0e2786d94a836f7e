/**
 * The figures of a pasted claim, against outside references: NIST SP 811 (2008), "Guide for the Use
 * of the International System of Units (SI)", Appendix B.8 and B.9 conversion factors and §4.2.1.1
 * (Celsius temperature); the SI prefixes of the BIPM SI Brochure (9th ed., 2019, Table 7). SP 811
 * prints most factors to seven significant digits, so those checks allow half a unit in the seventh.
 *
 * Every text here is invented test data: invented devices ("QZ-4 cavity", "Helix-7 rig") and an
 * invented organisation ("Example Dynamics"), no real people or products.
 */
import fc from 'fast-check';
import { formatQuantity, parseQuantity, QuantityError } from '../worksheet/quantity';
import { readFigure } from './figures';
import { extractFigures } from './reader';
import { CLAIM_TEXT_MAX, FIGURE_SI_UNIT, type Figure, type FigureKind } from './types';

/** |a − b| ≤ rel·|b|: agreement to the digits a reference prints. */
function expectRelClose(actual: number, expected: number, rel: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}
/** Seven significant digits printed (SP 811 Appendix B) → within half a unit in the seventh digit. */
const SEVEN = 5e-7;
/** Exact factors (SI prefixes, defined units) → floating point only. */
const EXACT = 1e-12;

/** The invariants of the contract (shared/claims/types.ts) that hold for every extracted figure. */
function expectWellFormed(text: string, figures: Figure[]) {
  figures.forEach((f, i) => {
    expect(f.id).toBe(`f${i + 1}`);
    expect(text.slice(f.start!, f.end!)).toBe(f.text);
    expect(f.unit).toBe(FIGURE_SI_UNIT[f.kind]);
    // si and display are parseQuantity and formatQuantity of the quantity (the contract, types.ts).
    expect(f.si).toBe(parseQuantity(f.quantity, f.unit));
    expect(f.display).toBe(formatQuantity(f.si, f.unit));
    // Figures read from the text come in order and do not overlap; a derived figure spans the figures it comes from.
    const prior = figures.slice(0, i).filter((p) => !p.derived);
    if (!f.derived && prior.length) expect(f.start!).toBeGreaterThanOrEqual(prior[prior.length - 1].end!);
  });
}

function only(text: string): Figure {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  expect(figures).toHaveLength(1);
  return figures[0];
}

describe('unit conversions (NIST SP 811 Appendix B)', () => {
  test('pound-force: 1 lbf = 4.448 222 N (SP 811 B.8)', () => {
    const f = only('The QZ-4 cavity gave 0.2 lbf on the stand (invented test data).');
    expect(f).toMatchObject({ kind: 'thrust', text: '0.2 lbf', quantity: '0.2 lbf', unit: 'N' });
    expectRelClose(f.si, 0.2 * 4.448222, SEVEN); // SP 811 B.8, pound-force → newton 4.448 222 E+00
    expect(f.display).toBe('889.6 mN'); // 0.2 × 4.448 222 N = 0.889 644 N, to 4 digits (the display rule)
  });

  test('horsepower: 1 hp (550 ft·lbf/s) = 745.699 9 W (SP 811 B.8)', () => {
    const f = only('A 3 hp motor turns the Helix-7 rig (invented test data).');
    expectRelClose(f.si, 3 * 745.6999, SEVEN); // SP 811 B.8, horsepower (550 ft·lbf/s) → watt 7.456 999 E+02
  });

  test('kilowatt hour: 1 kWh = 3.6 × 10^6 J (SP 811 B.8)', () => {
    const f = only('It stored 3 kWh overnight (invented test data).');
    expectRelClose(f.si, 3 * 3.6e6, EXACT); // SP 811 B.8, kilowatt hour → joule 3.6 E+06 (exact)
  });

  test('British thermal unit (IT): 1 Btu = 1 055.056 J (SP 811 B.8)', () => {
    const f = only('Each cycle released 10 Btu (invented test data).');
    expect(f.quantity).toBe('10 BTU'); // mathjs spells it BTU
    expectRelClose(f.si, 10 * 1055.056, SEVEN); // SP 811 B.8, British thermal unit_IT → joule 1.055 056 E+03
  });

  test('calorie: mathjs has no "cal", so the extractor uses the thermochemical calorie, 4.184 J (SP 811 B.8)', () => {
    // mathjs 15 knows no calorie at all (so neither the thermochemical nor the IT one): parseQuantity refuses it.
    expect(() => parseQuantity('1 cal', 'J')).toThrow(QuantityError);
    const f = only('The cell gave off 2 cal with each pulse (invented test data).');
    expect(f.text).toBe('2 cal');
    expectRelClose(f.si, 2 * 4.184, EXACT); // SP 811 B.8, calorie_th → joule 4.184 E+00 (exact)
    // and not the International Table calorie, 4.1868 J (SP 811 B.8, calorie_IT): that is 0.07 % off.
    expect(Math.abs(f.si - 2 * 4.1868)).toBeGreaterThan(1e-3);
    const k = only('The pellet holds 3 kcal (invented test data).');
    expectRelClose(k.si, 3 * 4184, EXACT); // SP 811 B.8, kilocalorie_th → joule 4.184 E+03 (exact)
  });

  test('pound (avoirdupois): 1 lb = 0.453 592 37 kg (SP 811 B.8)', () => {
    const f = only('The frame weighs 10 lb (invented test data).');
    expectRelClose(f.si, 10 * 0.45359237, EXACT); // SP 811 B.8, pound (avoirdupois) → kilogram 4.535 924 E-01; exact by definition
  });

  test('mile per hour: 1 mi/h = 0.447 04 m/s (SP 811 B.8); "mph" is written "mi/h" for mathjs', () => {
    expect(() => parseQuantity('1 mph', 'm / s')).toThrow(QuantityError); // mathjs knows no "mph"
    const f = only('The cart reached 60 mph (invented test data).');
    expect(f.quantity).toBe('60 mi/h');
    expectRelClose(f.si, 60 * 0.44704, EXACT); // SP 811 B.8, mile per hour → meter per second 4.4704 E-01 (exact)
  });

  test('Celsius and Fahrenheit: t/°C = T/K − 273.15, t/°F = 1.8·(T/K) − 459.67 (SP 811 §4.2.1.1, B.9)', () => {
    const c = only('The boiler runs at 300 °C (invented test data).');
    expectRelClose(c.si, 300 + 273.15, EXACT); // SP 811 §4.2.1.1: T/K = t/°C + 273.15
    const f = only('The vent reads 100 degrees Fahrenheit (invented test data).');
    expectRelClose(f.si, (100 + 459.67) / 1.8, EXACT); // SP 811 B.9: T/K = (t/°F + 459.67)/1.8
    const m = only('The cold plate sits at −40 °F (invented test data).');
    expectRelClose(m.si, (-40 + 459.67) / 1.8, EXACT); // SP 811 B.9; −40 °F = −40 °C = 233.15 K (from memory)
  });
});

describe('each kind, in symbols and in words (invented test data)', () => {
  // Expected SI values: SI prefixes from the BIPM SI Brochure (9th ed.) Table 7 (m = 10^-3, µ = 10^-6,
  // k = 10^3, M = 10^6, G = 10^9); other factors from NIST SP 811 B.8/B.9 as in the block above.
  const LBF = 4.448222; // SP 811 B.8
  const HP = 745.6999; // SP 811 B.8
  const cases: [string, FigureKind, number, number][] = [
    // [written form, kind, SI value, relative tolerance]
    ['5 N', 'thrust', 5, EXACT],
    ['5 newtons', 'thrust', 5, EXACT],
    ['12 mN', 'thrust', 12e-3, EXACT],
    ['12 millinewtons', 'thrust', 12e-3, EXACT],
    ['40 µN', 'thrust', 40e-6, EXACT],
    ['40 μN', 'thrust', 40e-6, EXACT], // Greek mu (U+03BC), as pasted from some editors
    ['40 uN', 'thrust', 40e-6, EXACT],
    ['40 micronewtons', 'thrust', 40e-6, EXACT],
    ['3 kN', 'thrust', 3e3, EXACT],
    ['3 Kilonewtons', 'thrust', 3e3, EXACT],
    ['0.2 lbf', 'thrust', 0.2 * LBF, SEVEN],
    ['0.2 pounds of thrust', 'thrust', 0.2 * LBF, SEVEN],
    ['0.2 pound-force', 'thrust', 0.2 * LBF, SEVEN],
    ['75 W', 'power', 75, EXACT],
    ['75 watts', 'power', 75, EXACT],
    ['250 mW', 'power', 0.25, EXACT],
    ['250 milliwatts', 'power', 0.25, EXACT],
    ['1.5 kW', 'power', 1500, EXACT],
    ['1.5 kilowatts', 'power', 1500, EXACT],
    ['2 MW', 'power', 2e6, EXACT],
    ['2 Megawatts', 'power', 2e6, EXACT],
    ['1 GW', 'power', 1e9, EXACT],
    ['3 hp', 'power', 3 * HP, SEVEN],
    ['3 horsepower', 'power', 3 * HP, SEVEN],
    ['5 J', 'energy', 5, EXACT],
    ['5 joules', 'energy', 5, EXACT],
    ['2 kJ', 'energy', 2e3, EXACT],
    ['4 MJ', 'energy', 4e6, EXACT],
    ['10 Wh', 'energy', 10 * 3600, EXACT], // 1 W·h = 3600 J (1 h = 3600 s, SI Brochure Table 8)
    ['3 kWh', 'energy', 3 * 3.6e6, EXACT], // SP 811 B.8
    ['3 kilowatt-hours', 'energy', 3 * 3.6e6, EXACT],
    ['3 kilowatt hours', 'energy', 3 * 3.6e6, EXACT],
    ['1 MWh', 'energy', 3.6e9, EXACT],
    ['100 BTU', 'energy', 100 * 1055.056, SEVEN], // SP 811 B.8 (IT)
    ['100 Btu', 'energy', 100 * 1055.056, SEVEN],
    ['2 calories', 'energy', 2 * 4.184, EXACT], // SP 811 B.8, calorie_th
    ['300 K', 'temperature', 300, EXACT],
    ['300 kelvin', 'temperature', 300, EXACT],
    ['25 °C', 'temperature', 298.15, EXACT], // SP 811 §4.2.1.1
    ['25 degC', 'temperature', 298.15, EXACT],
    ['25 degrees Celsius', 'temperature', 298.15, EXACT],
    ['77 °F', 'temperature', (77 + 459.67) / 1.8, EXACT], // SP 811 B.9
    ['77 degrees Fahrenheit', 'temperature', (77 + 459.67) / 1.8, EXACT],
    ['2 kg', 'mass', 2, EXACT],
    ['2 kilograms', 'mass', 2, EXACT],
    ['500 g', 'mass', 0.5, EXACT],
    ['500 grams', 'mass', 0.5, EXACT],
    ['20 mg', 'mass', 20e-6, EXACT],
    ['3 t', 'mass', 3000, EXACT], // 1 t = 1000 kg (SI Brochure Table 8)
    ['3 tonnes', 'mass', 3000, EXACT],
    ['10 lbs', 'mass', 10 * 0.45359237, EXACT], // SP 811 B.8
    ['10 pounds', 'mass', 10 * 0.45359237, EXACT],
    ['3 m/s', 'speed', 3, EXACT],
    ['3 metres per second', 'speed', 3, EXACT],
    ['7.8 km/s', 'speed', 7800, EXACT],
    ['90 km/h', 'speed', 25, EXACT], // 90 000 m / 3600 s (SI Brochure Table 8: 1 h = 3600 s)
    ['60 miles per hour', 'speed', 60 * 0.44704, EXACT], // SP 811 B.8
    ['2 A', 'current', 2, EXACT],
    ['2 amps', 'current', 2, EXACT],
    ['2 amperes', 'current', 2, EXACT],
    ['150 mA', 'current', 0.15, EXACT],
  ];

  test.each(cases)('"%s" is a %s figure', (written, kind, si, rel) => {
    const text = `On the bench, the Helix-7 rig showed ${written}, which is the claim.`;
    const f = only(text);
    expect(f.kind).toBe(kind);
    expect(f.text).toBe(written);
    expect(f.start).toBe(text.indexOf(written));
    expectRelClose(f.si, si, rel);
  });

  test('a hyphen between number and unit ("a 500-watt heater") and no space ("5kW")', () => {
    const text = 'A 500-watt heater and a 5kW pump (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.text, f.si])).toEqual([
      ['500-watt', 500],
      ['5kW', 5000],
    ]);
  });
});

describe('numbers', () => {
  test('English thousands separators are dropped in the quantity (parseQuantity refuses them)', () => {
    expect(() => parseQuantity('1,500 W', 'W')).toThrow(QuantityError); // the typed-quantity rule (quantity.ts)
    const text = 'The Example Dynamics stack drew 1,500 W and stored 12,000,000 J (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.text, f.quantity, f.si])).toEqual([
      ['1,500 W', '1500 W', 1500],
      ['12,000,000 J', '12000000 J', 12e6],
    ]);
  });

  test('a comma as a decimal mark where it cannot separate thousands ("1,5 kW", "0,75 kW", "2,25 kW")', () => {
    // One or two digits after the comma, or a leading 0, cannot be a thousands group (NIST SP 811 §10.5.3
    // groups digits by threes); "1,500 W" stays fifteen hundred watts (the test above).
    for (const [written, si] of [['1,5 kW', 1500], ['0,75 kW', 750], ['2,25 kW', 2250]] as const) {
      const f = only(`The unit gives ${written} (invented test data).`);
      expect(f.text).toBe(written);
      expectRelClose(f.si, si, EXACT);
    }
  });

  test.each([
    ['3.4 × 10^5 W', 3.4e5],
    ['3.4×10^5 W', 3.4e5],
    ['3.4 x 10^5 W', 3.4e5],
    ['3.4e5 W', 3.4e5],
    ['3.4E5 W', 3.4e5],
    ['2.5×10⁻³ W', 2.5e-3],
    ['2.5 × 10^-3 W', 2.5e-3],
    ['6 × 10⁵ W', 6e5],
  ])('scientific notation "%s"', (written, si) => {
    const text = `The array produced ${written} at noon (invented test data).`;
    const f = only(text);
    expect(f.text).toBe(written);
    expect(f.kind).toBe('power');
    expectRelClose(f.si, si, EXACT); // the number as written (powers of ten), read by hand
  });

  test('negative temperatures with a minus sign or a hyphen', () => {
    const text = 'It was tested from −40 °C and again at -20 °C (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => f.quantity)).toEqual(['-40 degC', '-20 degC']);
    expectRelClose(figures[0].si, 233.15, EXACT); // SP 811 §4.2.1.1: −40 + 273.15
  });

  test('a range is one figure with an upper end; two temperatures "from … to" are the two sides', () => {
    const text = 'Thrust of 10–20 mN, between 3 and 4 kW drawn, 6 to 9 W out, and from 5 to 7 °C (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.text, f.quantity, f.upper?.quantity])).toEqual([
      ['thrust', '10–20 mN', '10 mN', '20 mN'],
      ['power', '3 and 4 kW', '3 kW', '4 kW'],
      ['power', '6 to 9 W', '6 W', '9 W'],
      ['temperature', '5', '5 degC', undefined],
      ['temperature', '7 °C', '7 degC', undefined],
    ]);
    expect(figures[1]).toMatchObject({ role: 'in', upper: { si: 4000 } });
    expect(figures[2]).toMatchObject({ role: 'out', si: 6, upper: { si: 9 } });
  });

  test('an uncertainty makes a range (value ± uncertainty), not a figure of its own', () => {
    const text = 'We saw 1.2 ± 0.3 mN, later 1.5 mN ± 0.2 mN (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.text, f.quantity, f.upper?.quantity])).toEqual([
      ['1.2 ± 0.3 mN', '0.9 mN', '1.5 mN'],
      ['1.5 mN ± 0.2 mN', '1.3 mN', '1.7 mN'],
    ]);
  });
});

describe('false positives', () => {
  test.each([
    ['a year', 'In 2019 the team at Example Dynamics began the work.'],
    ['a year before an initial', 'In 2019 A. N. Example and, in 2020, W. Example repeated it.'],
    ['a figure number with a panel letter', 'As Figure 2 A shows, and Fig. 3 N too.'],
    ['a citation', 'The result [12] was confirmed [3, 4].'],
    ['a section number', 'Section 3.2 describes the set-up; see also Sec. 4 and Eq. 5.'],
    ['a page range', 'See pp. 12–14 and p. 7.'],
    ['a table number', 'Table 4 N lists the runs.'],
    ['a chemical formula', 'CO2 and H2O were removed.'],
    ['a power per area', 'The flux was 5 W/m² at the surface.'],
    ['a torque', 'The bolts were set to 5 N·m and 6 N-m.'],
    ['a probe type', 'Two 2 K-type probes were fitted.'],
    ['a per-unit figure', 'It gives 2 cal per pulse and 3 W per square metre.'],
    ['a percentage that is not an efficiency', 'Output rose 20% and 45 % of the runs failed.'],
    ['a change of efficiency', 'The efficiency improved by 12% over the year.'],
    ['an acceleration', 'It accelerated at 9.81 m/s² and 2 m/s^2.'],
    ['a ton (short, long or refrigeration: ambiguous)', 'A 5 ton chiller.'],
    ['a bare number', 'It ran 3 times on 2 rigs with 4 coils.'],
    ['an angle', 'The arm swings through 90 degrees and back.'],
    ['a thousand cycles', 'The seal survived 5K cycles and 20k rpm.'],
  ])('%s (invented test data)', (_what, text) => {
    expect(extractFigures(text)).toEqual([]);
  });

  test('"a 2 A current" is a current, "Figure 2 A" is not', () => {
    const text = 'Figure 2 A shows a 2 A current through the leads (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.text, f.start])).toEqual([['current', '2 A', text.indexOf('2 A current')]]);
  });

  test('"pounds" is a mass unless it is pounds of thrust', () => {
    const text = 'The 30 pounds rig made 2 pounds of thrust (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.quantity])).toEqual([
      ['mass', '30 lb'],
      ['thrust', '2 lbf'],
    ]);
  });
});

describe('efficiency and COP', () => {
  test.each([
    ['an efficiency of 45%', '45%', 0.45],
    ['an efficiency of 45 percent', '45 percent', 0.45],
    ['it is 45 % efficient', '45 %', 0.45],
    ['a 45%-efficient engine', '45%', 0.45],
    ['a 45% conversion efficiency', '45%', 0.45],
    ['the efficiency of the engine is 120 %', '120 %', 1.2],
    ['an efficiency of 0.62', '0.62', 0.62],
    ['efficiency η = 0.3', '0.3', 0.3],
  ])('"%s" (invented test data)', (phrase, written, si) => {
    const text = `The Helix-7 engine: ${phrase}.`;
    const f = only(text);
    expect(f).toMatchObject({ kind: 'efficiency', text: written, unit: '', role: null });
    expect(f.start).toBe(text.lastIndexOf(written));
    expectRelClose(f.si, si, EXACT); // a percentage is a hundredth (SI Brochure §5.4.7)
  });

  test.each([
    ['The QZ-4 heat pump has a COP of 7.', '7', 7, 'heating'],
    ['Its coefficient of performance 5.5 beats any heater.', '5.5', 5.5, 'heating'],
    ['The chiller runs at COP 4.', '4', 4, 'cooling'],
    ['In refrigeration mode the COP is 3.2.', '3.2', 3.2, 'cooling'],
    ['A COP of 9 is claimed for the module.', '9', 9, null],
  ])('"%s" (invented test data)', (text, written, si, role) => {
    const f = only(text);
    expect(f).toMatchObject({ kind: 'cop', text: written, quantity: written, role });
    expect(f.si).toBe(si); // a pure number, as written
  });

  test('an efficiency range (40–50 %) is one efficiency with an upper end', () => {
    const text = 'An efficiency of 40–50% is claimed (invented test data).';
    const f = only(text);
    expect([f.kind, f.text, f.si, f.upper?.si]).toEqual(['efficiency', '40–50%', 0.4, 0.5]);
  });
});

describe('roles', () => {
  test.each([
    ['The module draws 2 kW from the mains.', 'in'],
    ['It consumes 2 kW.', 'in'],
    ['An input of 2 kW is needed.', 'in'],
    ['It is supplied with 2 kW.', 'in'],
    ['It runs on 2 kW of electrical input.', 'in'],
    ['It uses 2 kW.', 'in'],
    ['It delivers 2 kW.', 'out'],
    ['It produces 2 kW.', 'out'],
    ['Its output is 2 kW.', 'out'],
    ['It generates 2 kW.', 'out'],
    ['It yields 2 kW.', 'out'],
    ['It returns 2 kW to the grid.', 'out'],
    ['2 kW in, nothing else.', 'in'],
    ['The rating is 2 kW.', null],
  ])('power: "%s" (invented test data)', (text, role) => {
    expect(only(text)).toMatchObject({ kind: 'power', role });
  });

  test.each([
    ['The hot side is at 90 °C.', 'hot'],
    ['Heat comes from a 300 °C source.', 'hot'],
    ['The flame reaches 1200 K.', 'hot'],
    ['Steam at 180 °C drives it.', 'hot'],
    ['Ambient is 20 °C.', 'cold'],
    ['The room is at 21 °C.', 'cold'],
    ['The cold side is held at 5 °C.', 'cold'],
    ['It rejects heat to a 15 °C sink.', 'cold'],
    ['Outside, it is 2 °C.', 'cold'],
    ['River water at 12 °C cools it.', 'cold'],
    ['It was measured at 40 °C.', null],
  ])('temperature: "%s" (invented test data)', (text, role) => {
    expect(only(text)).toMatchObject({ kind: 'temperature', role });
  });

  test('two temperatures of one machine: the higher is the hot side, whatever the order', () => {
    const text = 'It works between 300 K and 400 K (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.si, f.role])).toEqual([
      [300, 'cold'],
      [400, 'hot'],
    ]);
  });

  test('each figure takes the nearest words, not those of its neighbour', () => {
    const text = 'An input of 2 kW yields 5 kW; it uses 1 kW and produces 3 kW (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => f.role)).toEqual(['in', 'out', 'in', 'out']);
  });

  test('thrust, mass, speed, current and efficiency have no role', () => {
    const text = 'It draws 2 A, produces 3 mN, weighs 4 kg, moves at 5 m/s and produces 45% efficiency (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.role])).toEqual([
      ['current', null],
      ['thrust', null],
      ['mass', null],
      ['speed', null],
      ['efficiency', null],
    ]);
  });
});

describe('mixed-unit texts (invented test data)', () => {
  test('a thrust with its power', () => {
    const text =
      'Example Dynamics reports that its QZ-4 resonant cavity, drawing 1.5 kilowatts of RF power, produced a steady thrust of ' +
      '0.2 lbf on a torsion balance (see Figure 3 and [7]). The 12 kg test article was run in 2021 at 25 °C.';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.text, f.role])).toEqual([
      ['power', '1.5 kilowatts', 'in'],
      ['thrust', '0.2 lbf', null],
      ['mass', '12 kg', null],
      ['temperature', '25 °C', null],
    ]);
    expect(figures[0].start).toBe(text.indexOf('1.5 kilowatts'));
    expect(figures[1].start).toBe(text.indexOf('0.2 lbf'));
    expectRelClose(figures[0].si, 1500, EXACT); // k = 10^3 (SI Brochure Table 7)
    expectRelClose(figures[1].si, 0.2 * 4.448222, SEVEN); // SP 811 B.8
  });

  test('two temperatures and an efficiency', () => {
    const text =
      'The Helix-7 engine takes heat from steam at 180 °C and rejects it to river water at 12 °C, ' +
      'with a claimed thermal efficiency of 62%.';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.quantity, f.role])).toEqual([
      ['temperature', '180 degC', 'hot'],
      ['temperature', '12 degC', 'cold'],
      ['efficiency', '62 %', null],
    ]);
    expectRelClose(figures[0].si, 453.15, EXACT); // SP 811 §4.2.1.1: 180 + 273.15
    expectRelClose(figures[1].si, 285.15, EXACT); // SP 811 §4.2.1.1: 12 + 273.15
  });

  test('energy in and energy out', () => {
    const text =
      'In each cycle the QZ-4 cell consumes 3.6 MJ of electrical input and delivers 1,200 Btu of heat ' +
      'plus 2 kWh of output, as set out in Section 4.1 (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.text, f.quantity, f.role])).toEqual([
      ['energy', '3.6 MJ', '3.6 MJ', 'in'],
      ['energy', '1,200 Btu', '1200 BTU', 'out'],
      ['energy', '2 kWh', '2 kWh', 'out'],
    ]);
    expectRelClose(figures[1].si, 1200 * 1055.056, SEVEN); // SP 811 B.8 (IT Btu)
    expectRelClose(figures[2].si, 7.2e6, EXACT); // SP 811 B.8: 2 × 3.6 × 10^6 J
  });
});

test('a text of the longest size the claim check takes (20,000 characters)', () => {
  // Speed is measured by `npm run bench`, never by timed assertions (DEVELOPERS.md); this checks
  // that a text of CLAIM_TEXT_MAX characters is read whole and every offset is right.
  const paragraph =
    'Run 17 of the Helix-7 rig (Example Dynamics, 2022) drew 1.5 kW from the mains and gave 0.2 lbf; ' +
    'the hot side was at 90 °C, ambient 20 °C, efficiency of 45%, see Figure 2 A and [12]. ';
  let text = '';
  let copies = 0;
  while (text.length + paragraph.length <= CLAIM_TEXT_MAX) {
    text += paragraph;
    copies += 1;
  }
  text = text.padEnd(CLAIM_TEXT_MAX, ' lorem');
  expect(text.length).toBe(CLAIM_TEXT_MAX);
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  expect(figures).toHaveLength(5 * copies); // five figures in each paragraph, read by eye
  expect(figures.slice(0, 5).map((f) => [f.kind, f.role])).toEqual([
    ['power', 'in'],
    ['thrust', null],
    ['temperature', 'hot'],
    ['temperature', 'cold'],
    ['efficiency', null],
  ]);
  expect(figures[figures.length - 1].id).toBe(`f${5 * copies}`);
  expect(figures[5].start).toBe(paragraph.length + paragraph.indexOf('1.5 kW'));
});

test('any text: no exception, and every figure well formed (property test, fast-check)', () => {
  // Pieces that look like figures, glued with arbitrary characters, so that the odd cases come up.
  const piece = fc.constantFrom('1,500', '−40', '3.4 × 10^5', '2.5×10⁻³', '0.2', ' ', '-', '–', '±', ' to ', 'kW', 'mN', '°C', 'A', '%', 'efficiency of ', 'COP ', 'Figure ', 'pounds of thrust', 'per', '/', '.', ',', '\n');
  fc.assert(
    fc.property(fc.array(fc.oneof(piece, fc.string({ maxLength: 4 })), { maxLength: 30 }), (parts) => {
      const text = parts.join('');
      expectWellFormed(text, extractFigures(text));
    }),
    { numRuns: 300 },
  );
});

describe('readFigure', () => {
  test('a typed figure: parsed for its kind, text is the quantity, no place in the text', () => {
    const f = readFigure({ kind: 'thrust', quantity: '0.25 lbf' }, 'f3');
    expect(f).toMatchObject({ id: 'f3', kind: 'thrust', quantity: '0.25 lbf', text: '0.25 lbf', start: null, end: null, unit: 'N', role: null });
    expectRelClose(f.si, 0.25 * 4.448222, SEVEN); // SP 811 B.8
    expect(f.display).toBe(formatQuantity(f.si, 'N'));
  });

  test('a fixed figure keeps its text, place and role', () => {
    const f = readFigure({ kind: 'power', quantity: '1.6 kW', role: 'in', text: '1.5 kW', start: 10, end: 16 }, 'f1');
    expect(f).toMatchObject({ text: '1.5 kW', start: 10, end: 16, role: 'in', si: 1600 });
  });

  test('efficiency and COP are pure numbers; a percentage is a hundredth', () => {
    expect(readFigure({ kind: 'efficiency', quantity: '45 %' }, 'f1').si).toBeCloseTo(0.45, 15); // SI Brochure §5.4.7
    expect(readFigure({ kind: 'cop', quantity: '3.2', role: 'cooling' }, 'f2')).toMatchObject({ si: 3.2, unit: '', role: 'cooling' });
  });

  test.each([
    ['1,200 W', 'power'], // thousands separator: refused by parseQuantity, with a hint
    ['fast', 'power'], // not a number
    ['3 kg', 'power'], // a mass where a power is needed
    ['2 mph', 'speed'], // mathjs knows no "mph" (write "mi/h")
  ] as [string, FigureKind][])('"%s" for a %s throws QuantityError (the server answers 400)', (quantity, kind) => {
    expect(() => readFigure({ kind, quantity }, 'f1')).toThrow(QuantityError);
  });

  test('an unknown kind throws QuantityError too', () => {
    expect(() => readFigure({ kind: 'luminance' as FigureKind, quantity: '3 cd' }, 'f1')).toThrow(QuantityError);
  });
});

/**
 * The phrasing families of issue 11, item 1, each read right. Every text is invented test data.
 * Conversion factors: NIST SP 811 (2008), Appendix B.8/B.9; metric horsepower 735.498 75 W and
 * mechanical horsepower 745.699 9 W (B.8); kgf 9.806 65 N (B.8); BTU_IT 1 055.056 J, BTU_IT/h
 * 0.293 071 1 W (B.8); °F → K: (t + 459.67)·5/9 (SP 811 §4.2.1.1 and B.9); c = 299 792 458 m/s (SI Brochure).
 */
describe('phrasing families (issue 11)', () => {
  const read = (text: string) => {
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    return figures;
  };
  const pick = (figures: Figure[], kind: FigureKind) => figures.filter((f) => f.kind === kind);

  test('percentages by context: a heat pump is a COP, an engine an efficiency, a quantum efficiency is neither', () => {
    expect(read('The ground-source heat pump runs at 420 % efficiency.')).toMatchObject([{ kind: 'cop', role: 'heating', si: 4.2 }]);
    expect(read('The marine diesel is 38 % efficient.')).toMatchObject([{ kind: 'efficiency', si: 0.38 }]);
    expect(read('It turns 41 % of the fuel heat into shaft work.')).toMatchObject([{ kind: 'efficiency', si: expect.closeTo(0.41, 12) }]);
    expect(read('An internal quantum efficiency of 140 % was measured.')).toMatchObject([{ kind: 'quantum-efficiency', si: 1.4 }]);
    expect(read('The cell reaches 115 % EQE.')).toMatchObject([{ kind: 'quantum-efficiency', si: 1.15 }]);
    expect(read('Sales rose 35 % last year.')).toEqual([]);
  });

  test('ranges and hedges', () => {
    expect(read('It gave 3–6 mN.')).toMatchObject([{ kind: 'thrust', si: 0.003, upper: { si: 0.006 } }]);
    expect(read('It drew between 0.5 and 1.5 kW.')).toMatchObject([{ kind: 'power', si: 500, upper: { si: 1500 }, role: 'in' }]);
    expect(read('It gives up to 5 mN.')).toMatchObject([{ kind: 'thrust', si: 0.005, hedge: 'up-to' }]);
    expect(read('It draws about 2 kW.')).toMatchObject([{ kind: 'power', si: 2000, hedge: 'about' }]);
    expect(read('It draws ~3 W.')).toMatchObject([{ kind: 'power', si: 3, hedge: 'about' }]);
    expect(read('It delivers more than 3 kW.')).toMatchObject([{ kind: 'power', si: 3000, hedge: 'more-than', role: 'out' }]);
    expect(read('A COP between 3.2 and 4.1.')).toMatchObject([{ kind: 'cop', si: 3.2, upper: { si: 4.1 } }]);
  });

  test('temperature differences are differences, and a cold side is derived from the hot one', () => {
    expect(read('It works across a 20 °C temperature difference.')).toMatchObject([{ kind: 'temperature-difference', si: 20 }]);
    expect(read('A ΔT of 20 K is enough.')).toMatchObject([{ kind: 'temperature-difference', si: 20 }]);
    const f = read('The hot plate sits at 80 °C and the fins run 36 °F cooler.');
    expect(pick(f, 'temperature-difference')[0].si).toBeCloseTo(20, 9); // a difference of 36 °F is 20 K
    const cold = pick(f, 'temperature').find((x) => x.role === 'cold')!;
    expect(cold.si).toBeCloseTo(353.15 - 20, 9);
    expect(cold.derived).toMatch(/colder side/);
    const up = read('Its collector runs 40 degrees above the 20 °C ambient.');
    expect(pick(up, 'temperature').find((x) => x.role === 'hot')!.si).toBeCloseTo(333.15, 9);
  });

  test('figures given through relations', () => {
    const iv = read('The coil draws 12 A at 24 V and lights a 300 W lamp.');
    expect(pick(iv, 'power').find((x) => x.derived)).toMatchObject({ si: 288, role: 'in' });
    expect(pick(iv, 'power').find((x) => !x.derived)).toMatchObject({ si: 300, role: 'out' });
    const ex = read('The reactor gives 4 W more heat than the 20 W it draws.');
    expect(pick(ex, 'power').map((x) => [x.role, x.si])).toEqual([['excess', 4], ['in', 20], ['out', 24]]);
    expect(read('Thrust-to-power of 1.2 mN per kW.')).toMatchObject([{ kind: 'thrust-per-power', si: 1.2e-6 }]);
    expect(read('It gives 5 µN/W.')[0].si).toBeCloseTo(5e-6, 18);
    expect(read('A specific power of 2 kW/kg.')).toMatchObject([{ kind: 'specific-power', si: 2000 }]);
    const self = read('The self-running motor drives a 1.5 kW pump.');
    expect(pick(self, 'power').map((x) => [x.role, x.si])).toEqual([['in', 0], ['out', 1500]]);
    expect(read('It gives back 1.3 units for every unit it takes.')).toMatchObject([{ kind: 'efficiency', si: 1.3 }]);
    expect(read('Its output is three times its input.')).toMatchObject([{ kind: 'efficiency', si: 3 }]);
    const run = read('Over a 72-hour run it drew 400 W.');
    expect(pick(run, 'duration')[0].si).toBe(72 * 3600);
    expect(pick(run, 'energy')[0]).toMatchObject({ role: 'in', si: 400 * 72 * 3600 });
    expect(read('It ran for two weeks.')).toMatchObject([{ kind: 'duration', si: 14 * 86400 }]);
  });

  test('units as people write them', () => {
    expectRelClose(read('It lifts 20 pounds of lift.')[0].si, 20 * 4.448222, SEVEN); // lbf
    expect(read('It gives 3 kilograms of thrust.')[0].si).toBeCloseTo(3 * 9.80665, 12); // kgf
    expect(read('It shows 12 grams of thrust.')[0].si).toBeCloseTo(0.012 * 9.80665, 12); // gf
    expect(read('A thrust of 40 micronewtons.')[0].si).toBeCloseTo(40e-6, 18);
    expect(read('A thrust of 40 uN.')[0].si).toBeCloseTo(40e-6, 18);
    expect(read('A 90 PS engine.')[0].si).toBeCloseTo(90 * 735.49875, 9); // metric horsepower
    expectRelClose(read('A 150 hp engine.')[0].si, 150 * 745.6999, SEVEN); // mechanical horsepower
    expectRelClose(read('It puts out 12,000 BTU/h.')[0].si, 12000 * 0.2930711, SEVEN);
    expect(read('Outdoor air at 41 °F.')[0].si).toBeCloseTo(278.15, 9);
    expect(read('F = 2.4e-3 N.')[0].si).toBeCloseTo(2.4e-3, 15);
    expect(read('F = 2.4 × 10⁻³ N.')[0].si).toBeCloseTo(2.4e-3, 15);
    expect(read('It needs three kilowatts.')).toMatchObject([{ kind: 'power', si: 3000 }]);
    expect(read('Rated for 5K hours.')).toMatchObject([{ kind: 'duration', si: 5000 * 3600 }]);
  });

  test('rocket claims: wet and propellant masses, Isp, Δv; the dry mass derived', () => {
    const f = read('The stage has a wet mass of 1200 kg, carries 800 kg of propellant at an Isp of 320 s and claims a Δv of 6 km/s.');
    expect(pick(f, 'mass').map((x) => [x.role, x.si])).toEqual([['wet', 1200], ['propellant', 800], ['dry', 400]]);
    expect(pick(f, 'specific-impulse')[0].si).toBe(320);
    expect(pick(f, 'speed')[0]).toMatchObject({ role: 'delta-v', si: 6000 });
    expect(read('Exhaust velocity of 4.4 km/s.')).toMatchObject([{ kind: 'speed', role: 'exhaust', si: 4400 }]);
  });

  test('speeds above c are read as stated', () => {
    expect(read('It reaches 450,000 km/s.')).toMatchObject([{ kind: 'speed', si: 4.5e8 }]);
    expect(read('It reaches 1.5c.')[0].si).toBeCloseTo(1.5 * 299_792_458, 3);
    expect(read('It reaches 30 % of the speed of light.')[0].si).toBeCloseTo(0.3 * 299_792_458, 3);
  });
});

describe('more ways claims are written (issue 11)', () => {
  const read = (text: string) => {
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    return figures;
  };

  test('digits grouped by spaces and table rows pasted as text', () => {
    // NIST SP 811 §10.5.3: digits may be grouped by threes with a space.
    const f = read('P_in | 1 500 W\nP_out | 1 234,5 W');
    expect(f.map((x) => [x.role, x.si])).toEqual([['in', 1500], ['out', 1234.5]]);
    const r = read('COP (cooling) | 1.8');
    expect(r).toMatchObject([{ kind: 'cop', si: 1.8 }]);
  });

  test('fractions and large numbers in words', () => {
    expect(read('It draws a quarter of a kilowatt.')).toMatchObject([{ kind: 'power', si: 250 }]);
    expect(read('It lifts half a newton per watt.')).toMatchObject([{ kind: 'thrust-per-power', si: 0.5 }]);
    expect(read('It moves at a billion km/h.')[0].si).toBeCloseTo(1e9 / 3.6, 3);
    expect(read('It reaches 1.2 billion km/h.')[0].si).toBeCloseTo(1.2e9 / 3.6, 3);
  });

  test('an EER is a cooling COP in BTU/h per watt', () => {
    // 1 BTU_IT/h = 0.293 071 1 W (NIST SP 811, Appendix B.8), so EER 11.5 is a COP of 3.370.
    const [f] = read('Cooling capacity 3.5 kW; EER: 11.5.').filter((x) => x.kind === 'cop');
    expect(f.role).toBe('cooling');
    expectRelClose(f.si, 11.5 * 0.2930711, SEVEN);
  });

  test('a voltage and a current side by side give the power, from the nearest voltage', () => {
    const f = read('The transformer steps 230 V down to 12 V and delivers 5 A.');
    expect(f.find((x) => x.kind === 'power')).toMatchObject({ si: 60, role: 'out' });
    const g = read('Output 230 V / 6.5 A; supply 12 V × 1 A.');
    expect(g.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([['out', 1495], ['in', 12]]);
  });

  test('a difference said of the stated temperature itself', () => {
    const f = read('Freezer compartment held at −18 °C, a full 50 K below the room.');
    expect(f.find((x) => x.kind === 'temperature' && x.derived)).toMatchObject({ role: 'hot', si: expect.closeTo(305.15, 9) });
    const g = read('The skin sits at 34 °C, 5 K warmer than the surrounding air.');
    expect(g.find((x) => x.kind === 'temperature' && x.derived)).toMatchObject({ role: 'cold', si: expect.closeTo(302.15, 9) });
  });

  test('a propellant mass fraction', () => {
    const f = read('Propellant is 90 % of the 20 t vehicle\'s mass.');
    expect(f.filter((x) => x.kind === 'mass').map((x) => [x.role, x.si])).toEqual([['wet', 20000], ['dry', 2000], ['propellant', 18000]]);
  });

  test('each power over the time said with it', () => {
    const f = read('Charged at 2 kW for 5 hours, then discharged at 1.5 kW for 6 hours.');
    expect(f.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([['in', 2000 * 5 * 3600], ['out', 1500 * 6 * 3600]]);
  });

  test('numbers in words after a colon, capitalised', () => {
    const f = read('In a 2021 preprint the authors write: Twenty watts in, sixty watts out.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([['in', 20], ['out', 60]]);
  });

  test('figures of something else are set aside: a test stand, a room, the time it took to build', () => {
    const rocket = read('The 500 kg probe, which includes 200 kg of propellant, exhausts at 3.0 km/s. The test stand itself weighs 85 kg.');
    expect(rocket.filter((x) => x.kind === 'mass').map((x) => [x.role, x.si])).toEqual([['wet', 500], ['propellant', 200], ['dry', 300], ['aside', 85]]);
    // 212 °F = 373.15 K and 68 °F = 293.15 K (NIST SP 811 §4.2.1.1 and B.8: T/K = (t/°F + 459.67)/1.8).
    const engine = read('Between 212 °F and 68 °F the engine reaches 35 % efficiency. The room was held at 21 °C for the whole series.');
    expect(engine.filter((x) => x.kind === 'temperature').map((x) => [x.role, x.si])).toEqual([['hot', 373.15], ['cold', 293.15], ['aside', 294.15]].map(([r, t]) => [r, expect.closeTo(t as number, 9)]));
    const build = read('Over a 5-hour shift the pump motor drew 2.2 kW and delivered 1.8 kW. The prototype took 18 months to build.');
    expect(build.filter((x) => x.kind === 'duration').map((x) => x.role)).toEqual([null, 'aside']);
    expect(build.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([['in', 2200 * 5 * 3600], ['out', 1800 * 5 * 3600]]);
  });

  test('gas flows of electrolysers: litres per minute or hour, millilitres per minute', () => {
    // 1 L = 10⁻³ m³ exactly (NIST SP 811 (2008), App. B.8, "liter"); 1 min = 60 s, 1 h = 3600 s.
    const f = read('It makes 3 L/min, then 90 litres per hour, and 250 mL/min of hydrogen at idle.').filter((x) => x.kind === 'gas-flow');
    expect(f.map((x) => x.si)).toEqual([3e-3 / 60, 90e-3 / 3600, 250e-6 / 60].map((v) => expect.closeTo(v, 15)));
  });

  test('an uncertainty in the last digits, in brackets, is a range', () => {
    const f = read('The balance gave 2.31(4) mN at 410(5) W; the probe moved at 163.0(5) km/s.');
    expect(f.map((x) => [x.kind, x.si, x.upper?.si])).toEqual([
      ['thrust', expect.closeTo(0.00227, 15), expect.closeTo(0.00235, 15)],
      ['power', 405, 415],
      ['speed', 162500, 163500],
    ]);
  });

  test('a distance covered in a time is a speed', () => {
    // 1 light-year = 9 460 730 472 580 800 m (c × Julian year, IAU); 30 d = 2 592 000 s.
    const f = read('The drive covers 4.2 light years in 30 days.').find((x) => x.kind === 'speed')!;
    expect(f.si).toBeCloseTo((4.2 * 9460730472580800) / 2592000, 0);
    expect(f.derived).toMatch(/distance \/ time/);
  });

  test('amperes glued to the number as forum posts write them, and units glued after e-notation', () => {
    const f = read('Drawing 350ma from a 12v battery, it lights a 60w lamp (see claim 1a). Thrust 4.0E-6N.');
    expect(f.filter((x) => x.kind === 'current').map((x) => x.si)).toEqual([expect.closeTo(0.35, 12)]);
    expect(f.find((x) => x.kind === 'thrust')!.si).toBeCloseTo(4e-6, 15);
  });

  test('a hedge between a verb and its figure leaves the role to the verb', () => {
    const f = read('The magnet motor gives 1.12 kW mechanical out while the supply delivers approximately 1 kW.');
    expect(f.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['out', 'in']);
    const g = read('The heat pump gives 5 kW of heat for about 1.5 kW of electricity.');
    expect(g.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['out', 'in']);
  });

  test('a restatement in other units, in brackets, is no figure and does not hide the words after it', () => {
    // 1 hp = 745.69987158227 W (NIST SP 811 (2008), App. B.8): 2 kW = 2.68 hp, 5 hp = 3.73 kW.
    const f = read('Delivers 5 hp at the shaft from 2 kW (2.7 hp) of electrical input.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['out', expect.closeTo(5 * 745.69987158227, 6)], // (mathjs's hp agrees to 6e-11)
      ['in', 2000],
    ]);
    // °F → K = (F − 32)·5/9 + 273.15 (NIST SP 811, App. B.9): 302 °F = 150 °C, the upper end of the range.
    const g = read('Brine at 120–150 °C (302 °F) feeds the turbine; it rejects heat to a 20 °C river.');
    expect(g.filter((x) => x.kind === 'temperature').map((x) => [x.si, x.upper?.si])).toEqual([
      [expect.closeTo(393.15, 9), expect.closeTo(423.15, 9)],
      [expect.closeTo(293.15, 9), undefined],
    ]);
    // A difference of 36 °F is 20 K (5/9 K per °F).
    const h = read('A heat engine on a 20 °C (36 °F) temperature difference, cold side 15 °C, claims 12 % efficiency.');
    expect(h.filter((x) => x.kind === 'temperature-difference').map((x) => x.si)).toEqual([20]);
    expect(h.find((x) => x.kind === 'temperature' && x.role === 'hot')!.si).toBeCloseTo(308.15, 9);
  });
  test('forum numbers and units: a dozen, four and a half, miles a second, glued 20C', () => {
    expect(read('input is a dozen volts at 3 A').find((x) => x.kind === 'voltage')!.si).toBe(12);
    expect(read('a heat pump with a COP of four and a half, ground at 8 °C').find((x) => x.kind === 'cop')!.si).toBe(4.5);
    // 1 mi = 1609.344 m exactly (NIST SP 811 (2008), App. B.8).
    expect(read('the probe would go a million miles a second').find((x) => x.kind === 'speed')!.si).toBeCloseTo(1.609344e9, 3);
    const t = read('the pond water at 20C as the hot side, the air at 50F');
    expect(t.map((x) => [x.kind, x.role])).toEqual([['temperature', 'hot'], ['temperature', 'cold']]);
    // °F → K = (F − 32)·5/9 + 273.15 (NIST SP 811, App. B.9).
    expect(t.map((x) => x.si)).toEqual([expect.closeTo(293.15, 9), expect.closeTo(283.15, 9)]);
    // A battery's charge rate is no temperature.
    expect(read('The pack charges at 2C in a warm room.')).toEqual([]);
  });

  test('what a store takes and holds in a charge, and holds before it runs a load', () => {
    const charge = read('The dynamo puts 3 W into a little cell for 2 hours and the cell ends up holding 5 Wh.');
    expect(charge.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([
      ['in', 3 * 7200],
      ['out', 5 * 3600], // 1 Wh = 3600 J
    ]);
    const discharge = read('The bank holds 50 kJ and it powered a 2 kW heater for five minutes.');
    expect(discharge.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([
      ['in', 50000],
      ['out', 2000 * 300],
    ]);
  });

  test('a percentage of what it draws, and in/out said of a voltage with its current', () => {
    const f = read('The coil board "returns 140% of what it draws", input is 12 V at 3 A.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual(
      expect.arrayContaining([
        ['in', 36],
        ['out', expect.closeTo(36 * 1.4, 9)],
      ]),
    );
    const g = read('Boost converter: 5 V in at 2 A, 12 V out at 0.75 A.');
    expect(g.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 10],
      ['out', 9],
    ]);
  });

  test('a weight a propellant-free drive is said to lift is a force', () => {
    // 1 lb = 0.45359237 kg and g0 = 9.80665 m/s² (NIST SP 811 (2008), App. B.8): 3 lbf = 13.3447 N.
    const f = read('The saucer model lifts 3 lbs off the scale with no exhaust using 250 watts.');
    expect(f.find((x) => x.kind === 'thrust')!.si).toBeCloseTo(3 * 4.4482216152605, 6);
    // A crane's load stays a mass.
    expect(read('The crane lifts 3 t with a 20 kW motor.').some((x) => x.kind === 'thrust')).toBe(false);
  });
  test('data-sheet lines: units in a column label, labels before the figure, small prefixes', () => {
    const f = read('Drive FD-2 — Thrust [mN]: 12.3(4); Power [W]: 250; P_in / W: 1.5E+3; P_out / W: 1.62e3.');
    expect(f.map((x) => [x.kind, x.si])).toEqual([
      ['thrust', expect.closeTo(0.0119, 12)],
      ['power', 250],
      ['power', 1500],
      ['power', 1620],
    ]);
    expect(f.slice(2).map((x) => x.role)).toEqual(['in', 'out']);
    const g = read('electricity in 1.5 kW, heat out 4.8 kW; a cell gives 100 nW; a 40 pW detector.');
    expect(g.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual(
      expect.arrayContaining([
        ['in', 1500],
        ['out', 4800],
        [expect.anything(), expect.closeTo(1e-7, 20)],
        [null, expect.closeTo(4e-11, 22)],
      ]),
    );
  });

  test("a heat pump's source is its cold side and its sink the warm one; fuel burnt for electricity", () => {
    const f = read('Heat pump: heating COP 4 with the air source at 2 °C and the sink water at 45 °C.');
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['cold', 'hot']);
    const g = read('Diesel genset: 640 MJ of fuel (18 L) for 60 kWh of electricity over 10 h.');
    expect(g.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['in', 'out']);
  });
  test("a craft's mass before and after a burn, and a percentage in quotes", () => {
    const f = read('The first stage has a specific impulse of 311 s and burns from 25 t to 9 t.');
    expect(f.filter((x) => x.kind === 'mass').map((x) => [x.role, x.si])).toEqual([
      ['wet', 25000],
      ['dry', 9000],
    ]);
    const g = read('The lab puts its single-junction cell at "about 29 %" efficiency.');
    expect(g.map((x) => [x.kind, x.si, x.hedge])).toEqual([['efficiency', 0.29, 'about']]);
  });
  test('a percentage spelled out is read as the sign is; list dashes and quoted claims', () => {
    const f = read('In cooling mode the chiller is rated 420 percent efficient while holding a 7 °C loop against 35 °C air.');
    expect(f.find((x) => x.kind === 'cop')).toMatchObject({ role: 'cooling', si: 4.2 });
    const g = read('- Twenty watts in, sixty watts out, says the inventor.');
    expect(g.map((x) => [x.role, x.si])).toEqual([
      ['in', 20],
      ['out', 60],
    ]);
    const h = read('The claim reads: "A probe of 500 kg fuelled and 450 kg empty, at Isp 220 s, gains 2 km/s."');
    expect(h.filter((x) => x.kind === 'mass').map((x) => x.role)).toEqual(['wet', 'dry']);
    expect(h.some((x) => x.kind === 'thrust')).toBe(false);
  });
  test('a round-trip percentage, and the temperature a machine is rated to work down to', () => {
    expect(read('I put 13.5 kWh in and got 12.8 kWh back out, so ~95% round trip.').find((x) => x.kind === 'efficiency')!.si).toBeCloseTo(0.95, 12);
    const f = read('The heat pump delivers 55 °C water from 7 °C air, works down to -20 °C, COP 3.1.');
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['hot', 'cold', 'aside']);
  });
  test('the room a test ran in is set aside when the sides are given across sentences', () => {
    const f = read('The heat pump supplies 55 °C water; with a 50 K lift over its source, the maker quotes a heating COP of 4.6. The room was held at 21 °C for the whole series.');
    expect(f.filter((x) => x.kind === 'temperature' && !x.derived).map((x) => [x.si, x.role])).toEqual([
      [expect.closeTo(328.15, 9), 'hot'],
      [expect.closeTo(294.15, 9), 'aside'],
    ]);
    // A side said alone in its own sentence stays ("Heat is rejected to cooling water at 20 °C.").
    const g = read('A Stirling engine converts heat supplied at 90 °C into work with an efficiency of 38 %. Heat is rejected to cooling water at 20 °C.');
    expect(g.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['hot', 'cold']);
  });
  test("figures of what the claim is compared with are set aside, not the claim's own", () => {
    const f = read('Fridge: 4 °C inside, 22 °C kitchen, cooling COP of 3. For comparison, conventional designs of this kind reach about 35 % efficiency.');
    expect(f.find((x) => x.kind === 'efficiency')!.role).toBe('aside');
    const g = read('The tapered cavity produced 8 mN of thrust without propellant. A typical household kettle, by comparison, draws 2 kW. Our previous prototype reached 35 % at 800 W.');
    expect(g.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['aside', 'aside']);
    const h = read('Our engine reaches 45 % efficiency, against 35 % for conventional engines.');
    expect(h.map((x) => x.role)).toEqual([null, 'aside']);
    // The claim's own input named after "vs" stays.
    const k = read('Output 1.5×10³ W vs input 1.2×10³ W (bench log #14).');
    expect(k.map((x) => x.role)).toEqual(['out', 'in']);
  });
  test('an energy per day over a longer run is a rate; a store given energy; charging a battery; expelled at', () => {
    // 30 kWh per day = 30 × 3.6e6 J / 86 400 s = 1250 W; a fortnight = 14 × 86 400 s.
    const f = read('Burning wood at 30 kWh a day, the cabin stove supplied 380 kWh of heat over a fortnight.');
    expect(f.find((x) => x.kind === 'power')).toMatchObject({ role: 'in', si: 1250 });
    expect(f.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([
      ['out', 380 * 3.6e6],
      ['in', 1250 * 14 * 86400],
    ]);
    const g = read('A flywheel rig given 500 kJ at spin-up then drove a 2 kW load for 6 minutes.');
    expect(g.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['in', 'out']);
    const h = read('A pulse circuit drawing 0.5 A at 24 V is said to charge a second battery with 2 A at 14 V.');
    expect(h.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 12],
      ['out', 28],
    ]);
    const k = read('The cold-gas system carries 12 kg of nitrogen in a 40 kg total mass and expels it at 700 m/s.');
    expect(k.find((x) => x.kind === 'speed')!.role).toBe('exhaust');
  });

  test('the place a test ran in is no side of a machine', () => {
    expect(read('The test lasted 45 minutes in a room held at 21 °C.').find((x) => x.kind === 'temperature')!.role).toBe('aside');
  });
});
