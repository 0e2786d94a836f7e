/**
 * The figure reader: numbers as claims write them, and numbers that are not figures.
 *
 * Against outside references: NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units (SI)", Appendix B.8 and B.9 conversion factors and §4.2.1.1 (Celsius temperature); the SI
 * prefixes of the BIPM SI Brochure (9th ed., 2019, Table 7). SP 811 prints most factors to seven
 * significant digits, so those checks allow half a unit in the seventh.
 *
 * Every text here is invented test data: invented devices ("QZ-4 cavity", "Helix-7 rig") and an
 * invented organisation ("Example Dynamics"), no real people or products.
 */
import { parseQuantity, QuantityError } from '../../worksheet/quantity';
import { extractFigures } from '../reader';
import { EXACT, expectRelClose, expectWellFormed, only } from './test-support';
import { tokenize } from './numbers';

describe('numbers', () => {
  test.each([
    ['The heater takes a hundred and fifty watts.', 'a hundred and fifty watts', 150],
    ['It lifts about a hundred and twenty newtons.', 'a hundred and twenty newtons', 120],
    ['We pull eight hundred watts off it.', 'eight hundred watts', 800],
  ])('numbers in words with "a" and "and": %s', (text, figure, si) => {
    expect(extractFigures(text).map((f) => [f.text, f.si])).toEqual([[figure, si]]);
  });

  test.each([
    ['The stage has an Isp of three thousand seconds.', 'three thousand seconds', 'specific-impulse', 3000],
    ['It fired for seventy seconds.', 'seventy seconds', 'duration', 70],
    ['A specific impulse of three-twenty seconds.', 'three-twenty seconds', 'specific-impulse', 320],
    ['Isp four-fifty seconds in vacuum.', 'four-fifty seconds', 'specific-impulse', 450],
    ['It ran on twenty-three watts.', 'twenty-three watts', 'power', 23],
    ['About twenty-three and a half kilowatts ends up in the water.', 'twenty-three and a half kilowatts', 'power', 23500],
    ['It ran for four and a half hours.', 'four and a half hours', 'duration', 4.5 * 3600],
  ])('"seconds" after a number in words is the unit, not a fraction; hundreds said short: %s', (text, figure, kind, si) => {
    expect(extractFigures(text).map((f) => [f.text, f.kind, f.si])).toEqual([[figure, kind, si]]);
  });

  test.each([
    ['Output, in watts, about four hundred, into the resistor bank.', 'four hundred', 'power', 400],
    ['Thrust in newtons: 0.2, measured twice.', '0.2', 'thrust', 0.2],
  ])('the unit named before its number: %s', (text, figure, kind, si) => {
    expect(extractFigures(text).map((f) => [f.text, f.kind, f.si])).toEqual([[figure, kind, si]]);
  });

  test('"in March, about 40 W" names no unit', () => {
    expect(extractFigures('We measured it in March, about 40 W.').map((f) => f.si)).toEqual([40]);
  });

  test.each([
    ['The hot plate is at 120 C and the cold one at 20 C.', 2],
    ['The hot plate sits at one-twenty C.', 1],
    ['A charge of 120 C passed through the cell.', 0],
  ])('a spaced capital C is degrees Celsius only where the sentence speaks of a temperature: %s', (text, n) => {
    expect(extractFigures(text).filter((f) => f.kind === 'temperature')).toHaveLength(n);
  });

  test.each([
    ['The Helix-7 thruster gives about 80 mN at approx. 1,35 kW, Isp ~1.600 s.', '1.600 s', 1600],
    ['Dry mass 1.200 kg, propellant 8.800 kg, and a Δv of 9,5 km/s is claimed.', '8.800 kg', 8800],
    ['Combustion gas at c. 1.800 K, sea water at 15 °C, and 38,5 % efficient.', '1.800 K', 1800],
    ['The store holds 1.234,5 kWh after 2,5 h of charging.', '1.234,5 kWh', 1234.5 * 3.6e6],
  ])('a text that writes decimal commas groups digits by dots: %s', (text, figure, si) => {
    const f = extractFigures(text).find((x) => x.text === figure);
    // 1 kWh = 3.6 × 10⁶ J (NIST SP 811, B.8).
    expectRelClose(f!.si!, si, 1e-12);
  });

  test.each([
    ['The engine gives 1.800 kW at 38.5 % efficiency.', '1.800 kW', 1800],
    ['A mass of 1.200 kg sits on the scale.', '1.200 kg', 1.2],
  ])('otherwise a point is a decimal point: %s', (text, figure, si) => {
    const f = extractFigures(text).find((x) => x.text === figure);
    expectRelClose(f!.si!, si, 1e-12);
  });

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

  test.each([
    [
      // A value and its uncertainty in brackets, the unit and a power of ten after them.
      'The efficiency was (5.1 ± 0.4) %, the force per unit power (3.1 ± 0.15) µN/kW, the thrust (3.1 ± 0.4) × 10⁻⁵ N, later (2.2 +/- 0.3) x 10^-3 N (invented test data).',
      [
        ['efficiency', 0.047, 0.055],
        ['thrust-per-power', 2.95e-9, 3.25e-9],
        ['thrust', 2.7e-5, 3.5e-5],
        ['thrust', 1.9e-3, 2.5e-3],
      ],
    ],
    [
      // "Plus or minus" said in words; "minus two" after it is no number below zero.
      "The engine's efficiency was twelve percent, plus or minus three; the COP 3.1 plus or minus 0.2; efficiency 40 percent plus or minus two percent (invented test data).",
      [
        ['efficiency', 0.09, 0.15],
        ['cop', 2.9, 3.3],
        ['efficiency', 0.38, 0.42],
      ],
    ],
  ] as [string, [string, number, number][]][])('an uncertainty in brackets or in words makes a range: %s', (text, want) => {
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.si, f.upper?.si])).toEqual(want.map(([kind, lo, hi]) => [kind, expect.closeTo(lo, 15), expect.closeTo(hi, 15)]));
  });
});

describe('a power of ten written alone', () => {
  test.each([
    ["It carries heat into the room 'at 10¹⁰ m/s'.", 1e10],
    ['The cell stored 10^4 J.', 1e4],
    ['A force of 10⁻³ N was read.', 1e-3],
  ])('%s (invented test data)', (text, si) => {
    expectRelClose(only(text).si, si, EXACT);
  });
  test('but a plain 10 stays 10, and a mantissa times ten to a power is read as before', () => {
    expect(only('a 10 kW heater').si).toBe(10000);
    expectRelClose(only('It reached 3 × 10⁸ m/s.').si, 3e8, EXACT);
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
    ['a per-unit figure', 'It gives 2 cal per litre and 3 W per square metre.'],
    ['a percentage that is not an efficiency', 'Output rose 20% and 45 % of the runs failed.'],
    ['a change of efficiency', 'The efficiency improved by 12% over the year.'],
    ['an acceleration', 'It accelerated at 9.81 m/s² and 2 m/s^2.'],
    // (A ton said of a cooling machine is a ton of refrigeration: see phrasings.test.ts.)
    ['a ton with no cooling machine named (short or long: a weight)', 'A 5 ton crate.'],
    ['a bare number', 'It ran 3 times on 2 rigs with 4 coils.'],
    ['an angle', 'The arm swings through 90 degrees and back.'],
    ['a thousand cycles', 'The seal survived 5K cycles and 20k rpm.'],
    ['a thousand with a word of its kind between', 'One wall unit is rated for 6K full cycles, the other for 10K charge cycles.'],
    ['a glued K with no word of temperature in its sentence', 'The other unit is rated for 4K, and a 4K display is fitted.'],
  ])('%s (invented test data)', (_what, text) => {
    expect(extractFigures(text)).toEqual([]);
  });

  test('a glued K beside a word of temperature is still a kelvin temperature (invented test data)', () => {
    // T = 4 K (SI Brochure, 9th ed., 2.3.1: the kelvin).
    expect(extractFigures('The cryocooler holds the stage at 4K.').map((f) => [f.kind, f.si])).toEqual([['temperature', 4]]);
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

test("a mixed number before a unit: '1-1/2 hp', '2 1/4 kW' (invented test data)", () => {
  // 1 hp = 745.699 871 582 27 W (NIST SP 811 B.8): 1.5 hp = 1 118.55 W.
  expect(extractFigures('New one is 1-1/2 hp.').map((x) => x.si)).toEqual([expect.closeTo(1.5 * 745.69987158227, 3)]);
  expect(extractFigures('The heater is rated 2 1/4 kW.').map((x) => x.si)).toEqual([2250]);
  // (a bare fraction stays one)
  expect(extractFigures('a 3/4 hp motor').map((x) => x.si)).toEqual([expect.closeTo(0.75 * 745.69987158227, 3)]);
});

describe('numbers said one after another (invented test data)', () => {
  it('"one point eight, one point nine kilowatts" are two numbers, not one', () => {
    const values = tokenize("he reckons 'one point eight, one point nine kilowatts', depending on the meter").map((t) => Number(t.num));
    expect(values).toEqual([1.8, 1.9]);
  });
});
