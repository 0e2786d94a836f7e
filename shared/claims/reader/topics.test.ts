/**
 * The figure reader on figures that are not the claimed device's: the items of other business in
 * minutes and newsletters, the photon bound worked out in the text, and words of an unstated quantity.
 *
 * Against outside references: c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th edition, 2.2), so
 * the photon recoil P/c of 1 kW is 3.3356 µN and 1/c = 3.3356 nN per watt; the Carnot COP of a heat
 * pump Th/(Th − Tc) (any thermodynamics textbook, e.g. Çengel & Boles, Thermodynamics, ch. 6). Every
 * text here is invented test data (invented organisations and devices, no real people or products).
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import type { Figure } from '../types';
import { expectWellFormed } from './test-support';

const read = (text: string) => {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  return figures;
};
const roleOf = (figures: Figure[], words: string) => figures.find((f) => f.text === words)?.role;

describe('items of other business in a document of several items', () => {
  const minutes = [
    'Elmbury Rowing Club: minutes of the committee meeting, 3 May',
    '1. Apologies from the treasurer.',
    '2. Boathouse heating. The supplier of the new air-source heat pump quotes a heating COP of 3.8 with outdoor air at 7 °C and water leaving at 35 °C; the leaflet calls it "380 % efficient".',
    '3. Car park. Two 7 kW charging points will be fitted by the gate before the regatta.',
    '4. Kitchen. The new boiler (24 kW) has been commissioned and the old one removed.',
    '5. Next meeting: 7 June.',
  ].join('\n\n');

  test("an item naming another machine and no claim: its figures are set aside; the claim's item keeps its own", () => {
    const f = read(minutes);
    expect(roleOf(f, '7 kW')).toBe('aside');
    expect(roleOf(f, '24 kW')).toBe('aside');
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['cold', 'hot']);
    // Carnot COP = 308.15/28 = 11.005; 3.8/11.005 = 0.345: within the bound (consistent).
    const carnot = runClaimChecks(f, { text: minutes, classes: [] }).checks.find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
  });

  test('a document of one item, or items on the same machine, keeps every figure', () => {
    const report = [
      'Bench test of the Corrow HP-4 heat pump.',
      'Input. The compressor drew 2.1 kW from the supply throughout.',
      'Output. The heat pump delivered 7.4 kW to the water loop.',
      'Remarks. The compressor casing reached 61 °C.',
    ].join('\n\n');
    const f = read(report);
    expect(roleOf(f, '2.1 kW')).toBe('in');
    expect(roleOf(f, '7.4 kW')).toBe('out');
    expect(roleOf(f, '61 °C')).not.toBe('aside');
  });

  test('an item that names no machine of its own is not set aside on a guess', () => {
    const text = ['Notes from the Quarrel Lane workshop, week 12', 'The prototype engine ran at 31 % efficiency between 420 °C and 30 °C.', 'We logged 2 kW at the flue all afternoon.', 'Tea rota unchanged.'].join('\n\n');
    const f = read(text);
    expect(roleOf(f, '2 kW')).not.toBe('aside');
  });
});

describe('the photon bound worked out in the text', () => {
  test('"at most 33.4 µN" for 10 kW of light is the bound, set aside; the claimed thrust is read as such', () => {
    const text = 'A lamp of power P pushes back with P/c, so 10 kW of light can give at most 33.4 µN. The Varrow drive is said to give 2 mN from the same 10 kW with nothing leaving it.';
    const f = read(text);
    // P/c = 10 000 / 299 792 458 = 3.3356e-5 N = 33.4 µN.
    expect(roleOf(f, '33.4 µN')).toBe('aside');
    expect(roleOf(f, '2 mN')).not.toBe('aside');
  });

  test('"about 3.3 µN per kW" said as the limit is set aside where the text claims another thrust per power', () => {
    const text = 'A perfectly collimated beam gives 1/c newtons per watt, about 3.3 µN per kW. The datasheet of the Ostrel cavity claims 1.2 mN per kW with no exhaust.';
    const f = read(text);
    expect(roleOf(f, '3.3 µN per kW')).toBe('aside');
    expect(roleOf(f, '1.2 mN per kW')).not.toBe('aside');
  });

  test('a measured thrust equal to P/c is the measurement, not the bound', () => {
    const text = 'The measured thrust on the torsion balance was 16 µN for 4.8 kW of collimated light. The radiators gave a recoil below 0.5 µN.';
    const f = read(text);
    // 4800/299 792 458 = 1.601e-5 N: the measurement sits at the bound and stays the claim's.
    expect(roleOf(f, '16 µN')).not.toBe('aside');
  });

  test('the bound alone (no other thrust) is kept: it may be a perfect photon thruster\'s claim', () => {
    const text = 'Our laser array gives 3.34 µN per kW, the most light can give.';
    expect(roleOf(read(text), '3.34 µN per kW')).not.toBe('aside');
  });
});

describe('words of an unstated quantity', () => {
  test.each(['where a few micronewtons are useful', 'it gives several watts', 'a couple of kilowatts at most'])('no figure is read from "%s"', (text) => {
    expect(read(`1. The device is small.\n2. The effect is tiny: ${text}.\n3. No objection.`)).toEqual([]);
  });
  test('a number in words is still read', () => {
    expect(read('It draws two kilowatts.').map((f) => f.si)).toEqual([2000]);
  });
});
