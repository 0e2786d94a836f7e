/**
 * The figure reader on a ceiling the writer states beside a claim (bounds.ts): kept aside, and never
 * taken for the device's own efficiency or COP.
 *
 * Against outside references: the Carnot efficiency 1 − Tc/Th and the Carnot COPs Th/(Th − Tc) and
 * Tc/(Th − Tc) (any thermodynamics textbook, e.g. Çengel & Boles, Thermodynamics, ch. 6), with
 * T/K = t/°C + 273.15 (BIPM SI Brochure, 9th edition, 2.3.1). Every text here is invented test data
 * (invented organisations and devices, no real people or products).
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import type { Figure } from '../types';
import { expectRelClose, expectWellFormed } from './test-support';

const read = (text: string) => {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  return figures;
};
const at = (figures: Figure[], words: string) => figures.find((f) => f.text === words);
const carnot = (text: string) => runClaimChecks(read(text), { text, classes: [] }).checks.find((c) => c.check === 'carnot');

describe("the writer's own ceiling, said in words of the ideal, a perfect machine or a limit", () => {
  test.each([
    // [text, the ceiling's words, kind, SI value]
    ['The club engine ran from steam at 160 deg C to 100 deg C and reached 4 % overall. Between those two temperatures a perfect engine would only reach about 14 %.', '14 %', 'efficiency', 0.14],
    ['It converts 2.1 % of the heat through it, with the pipe at 70 °C and the room at 25 °C. The best any heat engine could do between those two temperatures is about 13 %.', '13 %', 'efficiency', 0.13],
    ['The module turns 3 % of its heat into electricity between 80 °C and 25 °C; the Carnot limit across that 55 K gap is only 15.6 %.', '15.6 %', 'efficiency', 0.156],
    ['Our heat pump kept the water at 45 deg C with the air at -5 deg C and a COP of 2.7. A perfect heat pump between -5 and 45 would manage about 6.4; ours did less than half of that.', '6.4', 'cop', 6.4],
    ["The chest freezer holds -18 deg C in a 22 deg C pantry with a cooling COP of about 1.6. That's nowhere near the ideal, which for those temperatures is more than six, and that's fine.", 'six', 'cop', 6],
    ['With a hot plate at 60 °C and a cold plate at 30 °C the claimed module converts 11 % of its heat. No heat engine of any kind, thermoelectric or otherwise, can convert more than about 9 % of the heat it takes in.', '9 %', 'efficiency', 0.09],
    ['The plant works between brine at 150 °C and a condenser at 25 °C and converts 9 % of the heat. The Carnot limit between them is 1 − 298.15/423.15 = 0.295.', '0.295', 'efficiency', 0.295],
    ['A tandem cell converted 33.9 % of sunlight, beating the 29.4 per cent ceiling that applies to silicon cells on their own.', '29.4 per cent', 'efficiency', 0.294],
  ])('%s', (text, words, kind, si) => {
    const f = at(read(text), words);
    expect(f?.kind).toBe(kind);
    expect(f?.role).toBe('aside');
    expectRelClose(f!.si, si, 1e-12);
  });

  test("the check works the bound out from the claim's own figures, not from the writer's ceiling", () => {
    // 1 − 373.15/433.15 = 0.13852 (Carnot); the claim's 4 % is 0.289 of it: consistent.
    const run = carnot('The club engine ran from steam at 160 deg C to 100 deg C and reached 4 % overall. Between those two temperatures a perfect engine would only reach about 14 %.');
    expect(run?.finding).toBe('consistent');
    expectRelClose(run!.outputs.find((o) => o.name === 'eta_max')!.si, 1 - 373.15 / 433.15, 1e-9);
    expectRelClose(run!.outputs.find((o) => o.name === 'eta_ratio')!.si, 0.04 / (1 - 373.15 / 433.15), 1e-9);
  });

  test('a text whose only efficiency is the ceiling runs no check on it (the law is not compared with itself)', () => {
    const text = "The brochure says a quarter of the heat becomes electricity. With the warm side at 27 °C and the cold side at 12 °C, even an ideal engine can turn only about 5 % of that heat into work.";
    expect(at(read(text), '5 %')?.role).toBe('aside');
    expect(carnot(text)?.finding).not.toBe('consistent');
  });

  test('numbers that are not the ceiling stay what they were: the sides named in its sentence, a term of the working, a count of things', () => {
    const f = read('The heat pump has a COP of 2.7. A perfect heat pump between -5 °C and 45 °C would manage about 6.4.');
    expect(f.filter((x) => x.kind === 'cop').map((x) => [x.text, x.role])).toEqual([['2.7', 'heating'], ['6.4', 'aside']]);
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['cold', 'hot']);
    const g = read('The module converts 4 % of its heat between 60 °C and 40 °C, and the Carnot limit is 1 − 313.15/333.15 ≈ 6.0 %.');
    expect(g.some((x) => x.text === '1')).toBe(false);
    expect(at(g, '6.0 %')?.role).toBe('aside');
    expect(read('Its COP of 3 is well within the limit for a heat pump working between those two temperatures.').filter((x) => x.kind === 'cop').map((x) => x.si)).toEqual([3]);
  });

  test("a claim that beats the limit keeps its figure: words of the claim between the limit's name and the number", () => {
    const f = read('The makers say the engine breaks the Carnot limit, reaching an efficiency of 45 % between 80 °C and 20 °C.');
    expect(at(f, '45 %')?.role).not.toBe('aside');
    // 1 − 293.15/353.15 = 0.1699 < 0.45: breaks.
    expect(carnot('The makers say the engine breaks the Carnot limit, reaching an efficiency of 45 % between 80 °C and 20 °C.')?.finding).toBe('breaks');
  });
});
