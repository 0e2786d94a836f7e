/**
 * The figures of a pasted claim: texts of mixed units and of the longest size, any text (a property
 * test), and a figure typed by hand (readFigure). The reader's other tests are in
 * shared/claims/reader/ (units, numbers, kinds and roles, phrasings).
 *
 * Against outside references: NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units (SI)", Appendix B.8 and B.9 conversion factors and §4.2.1.1 (Celsius temperature); the SI
 * prefixes of the BIPM SI Brochure (9th ed., 2019, Table 7). SP 811 prints most factors to seven
 * significant digits, so those checks allow half a unit in the seventh.
 *
 * Every text here is invented test data: invented devices ("QZ-4 cavity", "Helix-7 rig") and an
 * invented organisation ("Example Dynamics"), no real people or products.
 */
import fc from 'fast-check';
import { formatQuantity, QuantityError } from '../worksheet/quantity';
import { readFigure } from './figures';
import { extractFigures } from './reader';
import { CLAIM_TEXT_MAX, type FigureKind } from './types';
import { EXACT, expectRelClose, expectWellFormed, SEVEN } from './reader/test-support';

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
      // (No rocket in the text, so no check takes a mass: the test article's is set aside.)
      ['mass', '12 kg', 'aside'],
      // (The test's temperature: nothing in the text could use it, so it is set aside.)
      ['temperature', '25 °C', 'aside'],
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
