/**
 * The figure reader on text copied out of a PDF or a scan: words broken at a line's end, sentences wrapped
 * at the column's edge, ligatures, collapsed table rows and glued footnote markers.
 *
 * Against outside references: the Carnot COP of heating Th/(Th − Tc) and efficiency 1 − Tc/Th (Çengel &
 * Boles, Thermodynamics, ch. 6); °C → K by adding 273.15 (NIST SP 811, §4.2.1.1). Every text here is
 * invented test data (invented devices and makers, no real people or products).
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { labelTableRows, unwrapPdfText } from './pdf-text';
import { expectMapsBack, expectRelClose, expectWellFormed } from './test-support';

const read = (text: string) => {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  return figures;
};

describe('unwrapPdfText', () => {
  test('joins a word broken at a line end, keeps a compound hyphen, reads a wrap as a space and a ligature as letters', () => {
    const u = unwrapPdfText('The unit reaches a coeffi-\ncient of performance of 3.8 with its air-\nsource coil, i.e. with outdoor air at 2 °C\nand flow water at 45 °C; efﬁciency is fine.')!;
    expect(u.text).toBe('The unit reaches a coefficient of performance of 3.8 with its air-source coil, i.e. with outdoor air at 2 °C and flow water at 45 °C; efficiency is fine.');
    // Every offset maps back into the pasted text, in order.
    expectMapsBack(u);
  });

  test('leaves a table row, an indented line and a short heading on their lines, and plain text alone', () => {
    expect(unwrapPdfText('motor input (clamp meter on mains lead) ..... 500 W\n  output into resistive load bank ....... 700 W')).toBeNull();
    expect(unwrapPdfText('Conditions\nindoor test cell, doors shut')).toBeNull();
    expect(unwrapPdfText('A plain sentence. Another one.')).toBeNull();
  });
});

describe('figures in text copied from a PDF (invented test data)', () => {
  test('a COP split across lines and written as a percentage with a footnote mark, with a wrapped rating point', () => {
    const text = 'Varnley AW-series heat pumps · Product information       7\n\nThe AW-9 reaches a coeffi-\ncient of performance of 380 %2 at A2/W45, i.e. with outdoor air at 2 °C\nand flow water at 45 °C.\n\n2 Measured on our own rig.';
    const f = read(text);
    expect(f.find((x) => x.kind === 'cop')).toMatchObject({ role: 'heating', si: 3.8, text: '380 %' });
    const run = runClaimChecks(f, { text }).checks.find((c) => c.check === 'carnot');
    // 3.8 / (318.15 / 43) = 0.513594 (worked by hand).
    expectRelClose(run!.outputs.find((o) => o.name === 'cop_heating_ratio')!.si, 3.8 / (318.15 / 43), 1e-9);
  });

  test("a collapsed table row: a cell's difference label is the next cell's, and it names the cooler side", () => {
    const f = read('Table 5.1  Design point\nReceiver (heater head) temperature     720 °C     Temperature differ-\nence to cooler     680 K     Engine efficiency (heat to shaft)     29 %');
    expect(f.filter((x) => x.kind === 'temperature').map((x) => [x.role, x.si])).toEqual([
      ['hot', expect.closeTo(993.15, 9)],
      ['cold', expect.closeTo(313.15, 9)],
    ]);
    expect(f.find((x) => x.kind === 'temperature-difference')?.si).toBe(680);
  });

  test('a role word past a column gap is the next cell\'s: "Starter draw 100 W     Output 340 W"', () => {
    const f = read('The unit — specifications\nStarter draw 100 W     Output 340 W continuous     Weight 38 kg');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 100],
      ['out', 340],
    ]);
  });
});

describe('more of what a PDF copy leaves (invented test data)', () => {
  test('"2.4 x 10-3 N": a flattened superscript with its minus is read as ten to that power', () => {
    expectRelClose(read('producing a net axial thrust of 2.4 x 10-3 N at an input power of 1.2e1 W.')[0].si, 2.4e-3, 1e-12);
  });
  test('"1.2 kW (± 5 %)": an uncertainty in per cent, in brackets, makes a range (1.14–1.26 kW)', () => {
    const f = read('the load bank dissipated 1.2 kW (± 5 %) for the whole run while the supply side showed about 300 W.')[0];
    expect(f.text).toBe('1.2 kW (± 5 %)');
    expectRelClose(f.si, 1140, 1e-12);
    expectRelClose(f.upper!.si, 1260, 1e-12);
  });
  test("an engine's 'rated 10 hp' is its output, and hours 'between overhauls' are no run", () => {
    const f = read('The restored compound engine runs on steam at 400 °F and exhausts to a condenser at 100 °F; at its rated 10 hp it turns about 12 % of the heat into shaft work, with 5K hrs between over-\nhauls.');
    expect(f.find((x) => x.kind === 'power')).toMatchObject({ role: 'out', si: expect.closeTo(7456.9987, 3) });
    expect(f.find((x) => x.kind === 'duration')?.role).toBe('aside');
  });
});

describe('a table set as text, its labels in a header row (invented test data)', () => {
  test("each value is read after its column's label, with the header's unit where the cell gives none", () => {
    const text = 'Performance at Th = 25 °C\nΔT (K)     Qc (W)     I (A)     U (V)     COP\n40     18.5     4.6     6.7     0.60';
    const f = read(text);
    expect(f.find((x) => x.kind === 'temperature-difference')).toMatchObject({ si: 40, text: '40' });
    expect(f.find((x) => x.kind === 'current')?.si).toBe(4.6);
    expect(f.find((x) => x.kind === 'voltage')?.si).toBe(6.7);
    expect(f.find((x) => x.kind === 'cop')?.si).toBe(0.6);
    // The cold side from the hot side and the difference: 298.15 − 40 K.
    expect(f.find((x) => x.kind === 'temperature' && x.role === 'cold')?.si).toBeCloseTo(258.15, 9);
  });

  test("a rocket stage's row: the Isp column is a specific impulse, and the rocket equation runs", () => {
    const text = 'Stage   Wet mass   Dry mass   Isp (vac)   Δv (claimed)\nUpper     1,250 kg     410 kg     312 s     3.2 km/s';
    const f = read(text);
    expect(f.map((x) => [x.kind, x.role])).toEqual([
      ['mass', 'wet'],
      ['mass', 'dry'],
      ['specific-impulse', null],
      ['speed', 'delta-v'],
    ]);
    // Tsiolkovsky: Δv = Isp·g0·ln(m_wet/m_dry) = 312 × 9.80665 × ln(1250/410) (g0 exact, BIPM SI Brochure 9th ed.).
    const run = runClaimChecks(f, { text }).checks.find((c) => c.check === 'rocket-equation')!;
    expectRelClose(run.outputs.find((o) => o.name === 'dv')!.si, 312 * 9.80665 * Math.log(1250 / 410), 1e-9);
  });

  test('a header with a broken word, then its values: a lamp more than 100 % efficient at the wall', () => {
    const text = 'Table 2   Lamp KL-7\nSupply       Input power      Optical output      Wall-plug effi-\nciency\n230 V AC          5.0 W                7.0 W                  140 %';
    const f = read(text);
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 5],
      ['out', 7],
    ]);
    expect(runClaimChecks(f, { text }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });

  test('rows that do not line up with the header are left as they are; a pipe table and its rule are read like the others', () => {
    expect(labelTableRows('Stage   Wet mass   Dry mass\nThe upper stage weighs 1,250 kg wet.')).toBeNull();
    expect(labelTableRows('| Stage | Wet mass | Dry mass |\n|---|---|---|\n| Upper | 1,250 kg | 410 kg |')?.text).toBe('| Stage | Wet mass | Dry mass |\n|---|---|---|\nStage Upper; Wet mass 1,250 kg; Dry mass 410 kg');
    // (A table with a unit column of its own is left to the sheet reader.)
    expect(labelTableRows('Quantity | Value | Unit\nHeat in | 1.6 | kW\nPower out | 80 | W')).toBeNull();
  });
});
