/**
 * Ledgers kept over time: a register's two readings are one figure, what it moved by; an energy per
 * mile is a rate of use. Conversions: 1 kWh = 3.6 MJ and 1 h = 3600 s (exact; BIPM SI Brochure, 9th
 * ed., Table 8). Every text here is invented test data.
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { expectWellFormed } from './test-support';

const KWH = 3.6e6;

describe("a register's two readings are what it moved by", () => {
  test("'the meter read 10,412 kWh on 1 March and 10,874 kWh on 31 March'", () => {
    const text = "The electricity meter read 10,412 kWh on 1 March and 10,874 kWh on 31 March; the heat pump's heat meter showed 1,520 kWh delivered over the same month.";
    const f = extractFigures(text);
    expectWellFormed(text, f);
    const used = f.find((x) => x.kind === 'energy' && x.derived);
    // 10,874 − 10,412 = 462 kWh.
    expect(used?.si).toBe(462 * KWH);
    expect(used?.role).toBe('in');
    expect(f.filter((x) => x.kind === 'energy' && x.role === 'aside').map((x) => x.si / KWH)).toEqual([10412, 10874]);
  });

  test("a bare first reading before an arrow takes the second's unit, and the writer's own difference is kept: '88,240 -> 89,770 kWh (1,530 kWh)'", () => {
    const text = 'Hour meter 4,118.0 -> 4,236.5 h. Output kWh meter on the board: 88,240 -> 89,770 kWh (1,530 kWh). Fuel energy in = 4,079 kWh.';
    const f = extractFigures(text);
    expectWellFormed(text, f);
    // 4,236.5 − 4,118.0 = 118.5 h = 426,600 s.
    expect(f.find((x) => x.kind === 'duration' && x.derived)?.si).toBeCloseTo(118.5 * 3600, 6);
    expect(f.filter((x) => x.kind === 'energy' && x.role !== 'aside').map((x) => [x.role, x.si / KWH])).toEqual([
      ['out', 1530],
      ['in', 4079],
    ]);
    // 1,530 / 4,079 = 0.375092 (first law; node): no more out than in.
    const r = runClaimChecks(f, { text });
    expect(r.checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(1530 / 4079, 9);
  });

  test("the register's name gives the side: a heat meter counts what comes out, a sub-meter what goes in", () => {
    const text = 'Heat meter: 21,406 kWh on 1 Jan 00:00, 23,248 kWh on 1 Feb 00:00 -> 1,842 kWh of heat.\nElectricity sub-meter: 6,877 -> 7,389 kWh -> 512 kWh. Heat pump flow 40 °C, outdoor average 3 °C.';
    const f = extractFigures(text);
    expectWellFormed(text, f);
    expect(f.filter((x) => x.kind === 'energy' && x.role !== 'aside').map((x) => [x.role, x.si / KWH])).toEqual([
      ['out', 1842],
      ['in', 512],
    ]);
    // COP 1842/512 = 3.59766 against the Carnot COP 313.15/37 = 8.46351: 0.425078 (node).
    const carnot = runClaimChecks(f, { text }).checks.find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
    expect(carnot?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(1842 / 512 / (313.15 / 37), 6);
  });

  test('two figures of like size are no pair of readings', () => {
    const f = extractFigures('This winter the heat pump used 2,900 kWh and the heat meter says it delivered 10,150 kWh.');
    expect(f.some((x) => x.kind === 'energy' && x.derived?.includes('register'))).toBe(false);
  });
});

test("an energy per mile is a rate of use, not the run's energy: 'Energy per mile from the socket: 0.149 kWh'", () => {
  const f = extractFigures('Depot charger log: 61.4 kWh over four sessions. Energy per mile from the socket: 0.149 kWh.');
  expect(f.find((x) => x.si === 0.149 * KWH)?.role).toBe('aside');
});

test("a power said as the change of one just given is no side of its own: 'RTG output 212 W, down 0.8 W since launch'", () => {
  const text = 'Power: RTG output 212 W, down 0.8 W since launch. Data downlinked this week: 1.9 Gbit.';
  const f = extractFigures(text);
  expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
    ['out', 212],
    ['aside', 0.8],
  ]);
  expect(runClaimChecks(f, { text }).checks.some((c) => c.finding === 'breaks')).toBe(false);
});

test("an energy worked out from a power and a time, read on the other side, is the same flow: 'beam power at the dump 45 kW, so about 345 kWh into the dump'", () => {
  const text = 'Beam on for 7 h 40 min of the 8 h shift. Average beam power at the dump 45 kW, so about 345 kWh into the dump this shift.';
  const f = extractFigures(text);
  // 45 kW × 7 h 40 min = 345 kWh.
  expect(f.find((x) => x.kind === 'energy' && !x.derived && x.si === 345 * KWH)?.role).toBe('aside');
  expect(runClaimChecks(f, { text }).checks.some((c) => c.finding === 'breaks')).toBe(false);
});

test("what is sent on to a load is an output: '1.35 kW going out to the pump'", () => {
  expect(extractFigures('The inverter display said 1.35 kW going out to the pump.').find((x) => x.kind === 'power')?.role).toBe('out');
});

test("a station's weekly return: 'heat released in the boiler' is the engine's input, checked against Carnot", () => {
  const text = 'Weekly return, unit 3 (coal): heat released in the boiler 18.0 GWh; electricity sent out 6.6 GWh; main steam 540 °C; condenser cooling water 18 °C.';
  const f = extractFigures(text);
  expect(f.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['in', 'out']);
  const carnot = runClaimChecks(f, { text }).checks.find((c) => c.check === 'carnot');
  // η = 6.6/18.0 = 0.366667; Carnot 1 − 291.15/813.15 = 0.641948; ratio 0.571179 (node).
  expect(carnot?.finding).toBe('consistent');
  expect(carnot?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(6.6 / 18 / (1 - 291.15 / 813.15), 9);
});

describe('lawful ledgers that once read as more out than in', () => {
  const breaks = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.some((c) => c.finding === 'breaks');
  test.each([
    'Solar log, June: the inverter counter went from 3,112 kWh to 3,598 kWh. The house used 410 kWh from the grid over the same month.',
    'It ran nine days on a single 10 kWh charge, drawing an average of 45 W.',
  ])('%s', (text) => {
    expect(breaks(text)).toBe(false);
  });
  test("a register's two readings read as a range are what it moved by: 3,598 − 3,112 = 486 kWh", () => {
    const f = extractFigures('Solar log, June: the inverter counter went from 3,112 kWh to 3,598 kWh.');
    expect(f.map((x) => [x.role, x.si / KWH, x.upper])).toEqual([['out', 486, undefined]]);
  });
  test('a genuine claim on a store is still judged: a single 1 kWh charge powering a 100 W lamp for nine days', () => {
    // 100 W × 9 × 86,400 s = 77.76 MJ out of 3.6 MJ: 21.6 (first law; node).
    const text = 'The box ran nine days on a single 1 kWh charge while powering a 100 W lamp.';
    expect(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(21.6, 9);
  });
});

describe("a measurement's stated error widens the figures it measured", () => {
  const overUnity = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
  test("'1.1 kW out against 1 kW in, but the meter's error is ±15 %' is within the law at the favourable ends", () => {
    const r = overUnity("We measured 1.1 kW out against 1 kW in, but the meter's error is ±15 %.");
    // 1.1 × 0.85 = 0.935 kW out against 1 × 1.15 = 1.15 kW in: 0.813043 (node).
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.935 / 1.15, 9);
  });
  test("'1.5 kW out against 1 kW in, accurate to ±2 %' still breaks it", () => {
    // 1.5 × 0.98 = 1.47 against 1.02: 1.441176 (node).
    expect(overUnity('We measured 1.5 kW out against 1 kW in, with meters accurate to ±2 %.')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(1.47 / 1.02, 9);
  });
});

test("heat out and electricity in from a machine the text does not name wait for its temperatures: 'Rated 12 kW of heat for 3 kW of electricity'", () => {
  const text = 'Rated 12 kW of heat for 3 kW of electricity: four times the output of the energy input.';
  const r = runClaimChecks(extractFigures(text), { text });
  expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  expect(r.needs.map((n) => n.check)).toContain('carnot');
  // (A heater said to make its heat is judged: "an electric resistance water heater".)
  const made = 'An electric resistance water heater gave 12 kW of heat for 3 kW of electricity.';
  expect(runClaimChecks(extractFigures(made), { text: made }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
});

describe("a store's size with its state of charge moved is the energy moved", () => {
  test("'charging the 75 kWh pack from 10 % to 80 % took 52.5 kWh at the meter': 70 % of 75 kWh went in", () => {
    const text = 'Charging the 75 kWh pack of the Larch van from 10 % to 80 % took 52.5 kWh at the meter, plus about 10 % losses.';
    const f = extractFigures(text);
    expectWellFormed(text, f);
    // (80 − 10) % × 75 kWh = 52.5 kWh.
    expect(f.find((x) => x.kind === 'energy' && x.derived)?.si).toBeCloseTo(52.5 * KWH, 3);
    expect(runClaimChecks(f, { text }).checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
});

test('"It stores 1.5 kWh; 80 W for 15 h is 1.2 kWh": the reader\'s own arithmetic on the claim\'s figures is set aside, and the store\'s energy goes in (invented test data)', () => {
  const text = 'Can the power bank really run an 80 W fridge for 15 hours? It stores 1.5 kWh; 80 W for 15 h is 1.2 kWh, so yes.';
  const f = extractFigures(text);
  expect(f.find((x) => x.text === '1.5 kWh')!.role).toBe('in');
  expect(f.find((x) => x.text === '1.2 kWh')!.role).toBe('aside');
  const c = runClaimChecks(f, { text }).checks.find((x) => x.check === 'first-law')!;
  expect(c.finding).toBe('consistent');
  // A labelled ledger line keeps its sides.
  const g = extractFigures('Charge: 2 kW for 40 minutes. So: in = 2 kW × 2400 s = 4.8 MJ.');
  expect(g.find((x) => x.text === '4.8 MJ')!.role).not.toBe('aside');
});
