/**
 * The figure reader on text damaged on its way (issue 11): UTF-8 read as Windows-1252, symbols a copy
 * lost to "?", letters in place of digits, units run together, capitals throughout, a slip put right.
 *
 * Against outside references: the byte values of UTF-8 (RFC 3629, §3) and the characters Windows-1252
 * puts at them (WHATWG Encoding Standard, index windows-1252); °C → K by adding 273.15 (NIST SP 811,
 * §4.2.1.1); the mile = 1 609.344 m exactly (NIST SP 811, Appendix B.8); c = 299 792 458 m/s (BIPM SI
 * Brochure, 9th ed., §2.2); the Carnot COP of heating Th/(Th − Tc) (Çengel & Boles, Thermodynamics, ch. 6).
 * Every text here is invented test data.
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { repairTyping } from './repair';
import { expectMapsBack, expectRelClose, expectWellFormed } from './test-support';

const read = (text: string) => {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  return figures;
};
const C = 299_792_458;

describe('repairTyping', () => {
  test('UTF-8 read as Windows-1252 is read back: "Â°C", "â€“", "ÂµN", "Î”T", "Ã—", "â‚¬", "Â±"', () => {
    // "°" is C2 B0 in UTF-8 (RFC 3629); Windows-1252 shows C2 as "Â" and B0 as "°". "–" is E2 80 93: "â", "€", "“".
    const u = repairTyping('7Â°C â€“ 12 ÂµN/W, Î”T 4 K, 4.2 Ã— 10^8, â‚¬ 950, Â±5%')!;
    expect(u.text).toBe('7°C – 12 µN/W, ΔT 4 K, 4.2 × 10^8, € 950, ±5%');
    expectMapsBack(u);
    // A four-byte sequence (F0 9F 94 A5, U+1F525) read back; an overlong or broken one left as it is.
    expect(repairTyping('hot ðŸ”¥ 3 kW')!.text).toBe('hot \u{1F525} 3 kW');
    expect(repairTyping('à€€ and Ã')).toBeNull();
  });

  test('letters in place of digits are read as digits inside a number only', () => {
    expect(repairTyping('2O W, 4O0 W, 14O%, l30 %, O.2 A, l,35 kW, 3l0 s, 1O x 1O mm, 2Omin')!.text).toBe('20 W, 400 W, 140%, 130 %, 0.2 A, 1,35 kW, 310 s, 10 x 10 mm, 20min');
    // Words, formulas and units stay: oxygen, CO2, water, a 2 l bottle, a lot, Oslo, an ordinal.
    expect(repairTyping('an O2 sensor, CO2 and H2O, a 2l bottle, a lot in Oslo, the 2o')).toBeNull();
    // (Thousands groups and an exponent: "11O,OOO BTU/h", "9.8E+O2 W".)
    expect(repairTyping('11O,OOO BTU/h and 9.8E+O2 W')!.text).toBe('110,000 BTU/h and 9.8E+02 W');
  });

  test('a question mark left for a degree or micro sign, units run together, capitals throughout, a slip put right', () => {
    expect(repairTyping('the 20?C difference, 25 ?C air, 12 ?N')!.text).toBe('the 20°C difference, 25 °C air, 12 µN');
    expect(repairTyping('DC in 48V25A, 12v5a')!.text).toBe('DC in 48V 25A, 12v 5a');
    expect(repairTyping('THE CRAFT REACHED 900 MILLION MPH ON ITS THIRD TEST')!.text).toBe('THE craft reached 900 million MPH ON ITS third test');
    // (A heading of a few capital words is left as typed.)
    expect(repairTyping('NEW PRODUCT NEWS: the unit gives 3 kW')).toBeNull();
    expect(repairTyping('a COP of 45 .. sorry 4.5, and 3 kW, I mean 3.5 kW')!.text).toBe('a COP of             4.5, and              3.5 kW');
    // ("12 years, sorry 2 of them" puts no figure right: the units differ.)
    expect(repairTyping('it ran 12 years, sorry 2 of them')).toBeNull();
  });
});

describe('damaged claims are read as meant, each figure pointing at its words in the pasted text', () => {
  test('a heat pump post with mis-encoded degrees, a zero typed as "O" and a slip put right is consistent with Carnot', () => {
    const text = 'Ours is an air to water unit (9kw nominal, cost about Â£7,8OO). Rated at 7Â°C outside air and 35Â°C flow temp. Thats a COP of 45 .. sorry 4.5, phone keeps eating the dot.';
    const figures = read(text);
    expect(figures.find((f) => f.kind === 'cop')?.si).toBe(4.5);
    const carnot = runClaimChecks(figures, { text }).checks.find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
    // COP_max = 308.15 / (308.15 − 280.15) = 11.005; 4.5 / 11.005 = 0.4089.
    expectRelClose(carnot!.outputs.find((o) => o.name === 'cop_heating_ratio')!.si, 4.5 / (308.15 / 28), 1e-9);
    expect(figures.find((f) => f.kind === 'temperature' && f.role === 'cold')?.text).toBe('7Â°C');
  });

  test('a cell said at "14O%" on "4O0 W" in and "56O W" out breaks the first law; a sheet row "48V25A … 113OW" is consistent', () => {
    const cell = 'Our cell runs at 14O% efficiency. Bench supply reads 4O0 W steady and when we burn the gas in the calorimeter we get 56O W of heat.';
    const first = runClaimChecks(read(cell), { text: cell }).checks.find((c) => c.check === 'first-law');
    expect(first?.finding).toBe('breaks');
    expectRelClose(first!.outputs.find((o) => o.name === 'over_unity')!.si, 560 / 400, 1e-9);
    const row = 'Inverter INV-3 | DC in 48V25A | AC out 113OW | 23Ov 5Ohz | fan on';
    const inverter = runClaimChecks(read(row), { text: row }).checks.find((c) => c.check === 'first-law');
    expect(inverter?.finding).toBe('consistent');
    // 48 V × 25 A = 1200 W in; 1130 / 1200 = 0.9417.
    expectRelClose(inverter!.outputs.find((o) => o.name === 'over_unity')!.si, 1130 / 1200, 1e-9);
  });

  test('a speed in capitals, "9OO MILLION MPH", is read and judged against c', () => {
    const text = 'Forwarded (all caps in the original): THE CRAFT REACHED 9OO MILLION MPH ON ITS THIRD TEST, WHICH IS FASTER THAN LIGHT.';
    const speed = read(text).find((f) => f.kind === 'speed');
    // 900 × 10⁶ mi/h × 1609.344 m / 3600 s = 4.02336 × 10⁸ m/s.
    expectRelClose(speed!.si, (900e6 * 1609.344) / 3600, 1e-12);
    const run = runClaimChecks(read(text), { text }).checks.find((c) => c.check === 'light-speed');
    expect(run?.finding).toBe('breaks');
    expectRelClose(run!.outputs.find((o) => o.name === 'ratio')!.si, (900e6 * 1609.344) / 3600 / C, 1e-6);
  });
});
