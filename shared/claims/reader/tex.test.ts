/**
 * TeX left in pasted text (abstracts from preprints, text extracted from a manuscript) is read as if
 * written plainly, and each figure still points at the words it was read from in the pasted text.
 * Conversions: NIST SP 811 (2008) Appendix B.8 (µ = 10⁻⁶; °C → K adds 273.15).
 */
import { extractFigures } from '../reader';
import { detex } from './tex';

const brief = (text: string) => extractFigures(text).map((f) => [f.kind, f.si, text.slice(f.start ?? 0, f.end ?? 0) === f.text]);

describe('TeX in a pasted claim', () => {
  test('plain text is left alone, and a price is no math', () => {
    expect(detex('A 2 kW heater gives 2 kW of heat.')).toBeNull();
    expect(detex('It cost $2 million and $3 more.')).toBeNull();
  });

  test('times-ten powers in TeX are scientific notation', () => {
    expect(brief('A recoil force F = 1.7 \\times 10^{-6} N is measured from a 600 W laser.')).toEqual([
      ['thrust', 1.7e-6, true],
      ['power', 600, true],
    ]);
    expect(extractFigures('signals at 4.7 \\times 10^8 m/s').map((f) => f.si)).toEqual([4.7e8]);
    expect(extractFigures('P = 3\\cdot10^{4} W').map((f) => f.si)).toEqual([3e4]);
  });

  test('Greek symbols, escaped percent signs, thin spaces and math dollars', () => {
    const text = 'a power conversion efficiency $\\eta_{PCE} = 44.7\\,\\%$ under one sun';
    const [eff] = extractFigures(text);
    expect(eff.kind).toBe('efficiency');
    expect(eff.si).toBeCloseTo(0.447, 12);
    expect(text.slice(eff.start ?? 0, eff.end ?? 0)).toBe(eff.text);
    expect(eff.text).toBe('44.7\\,\\%');
    expect(extractFigures('The harvester reaches $\\eta$ = 1.1 % between 80 °C and 55 °C.').find((f) => f.kind === 'efficiency')?.si).toBeCloseTo(0.011, 12);
  });

  test('a micro prefix and a degree sign in TeX join their units', () => {
    // 5 µN = 5 × 10⁻⁶ N; 300 °C = 573.15 K.
    const text = 'A thrust of $5\\,\\mu\\mathrm{N}$ at $P = 1.5$ kW, the head at $300^{\\circ}$C.';
    const f = extractFigures(text);
    expect(f.map((x) => x.kind)).toEqual(['thrust', 'power', 'temperature']);
    expect(f[0].si).toBeCloseTo(5e-6, 15);
    expect(f[1].si).toBeCloseTo(1500, 9);
    expect(f[2].si).toBeCloseTo(573.15, 9);
    for (const x of f) expect(text.slice(x.start ?? 0, x.end ?? 0)).toBe(x.text);
    expect(f[0].text).toBe('5\\,\\mu\\mathrm{N}');
  });
});
