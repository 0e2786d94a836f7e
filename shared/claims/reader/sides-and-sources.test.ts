/**
 * The figure reader and the planner on which side a temperature or a power is on, and on inputs the
 * text names without measuring.
 *
 * Against outside references: NIST SP 811 (2008), Appendix B.8: metric horsepower (CV, PS)
 * 735.498 75 W, pound (avoirdupois) 0.453 592 37 kg; the Carnot efficiency 1 − Tc/Th (any
 * thermodynamics textbook, e.g. Çengel & Boles, Thermodynamics, ch. 6). Every text here is invented
 * test data (invented devices, no real people or products).
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
const temps = (f: Figure[]) => f.filter((x) => x.kind === 'temperature').map((x) => [x.role, x.si]);
const verdicts = (text: string) => runClaimChecks(read(text), { text, classes: [] });

describe('two sides of a heat engine', () => {
  test.each([
    ['Hot head at four hundred degrees Celsius, cold end at twenty, and eighty-five percent efficient.', 673.15, 293.15, 'breaks'],
    ['The hot side is held at 400 °C, the cold side at 20, and it is 30 % efficient.', 673.15, 293.15, 'consistent'],
    ['The dish heats the engine head to four hundred degrees C, it rejects heat at twenty, and it is thirty percent efficient.', 673.15, 293.15, 'consistent'],
  ])('a bare number said of the other side takes the unit of the temperature before it: %s', (text, hot, cold, finding) => {
    const f = read(text);
    // T(K) = t(°C) + 273.15 (SI Brochure, 9th ed., 2.3.1); η_max = 1 − 293.15/673.15 = 0.5645.
    expect(temps(f)).toEqual([
      ['hot', expect.closeTo(hot, 9)],
      ['cold', expect.closeTo(cold, 9)],
    ]);
    expect(f.find((x) => x.si === cold)?.assumption).toMatch(/unit of the figure said before it/);
    expect(verdicts(text).checks.find((c) => c.check === 'carnot')?.finding).toBe(finding);
  });

  test.each([
    ['The stage is five hundred kilos wet and a hundred and fifty dry.', 'dry', 150],
    ['Total mass at launch is twelve hundred kilograms, of which nine hundred is propellant.', 'propellant', 900],
    ['The probe starts at a thousand kilograms and ends at eight hundred.', 'dry', 800],
  ])("a bare number that is a craft's other mass takes the unit of the mass before it: %s", (text, role, si) => {
    expect(read(text).find((x) => x.kind === 'mass' && x.role === role)).toMatchObject({ si });
  });

  test('"40 kg and 3 of them were built": no mass from a count', () => {
    expect(read('The rover weighs 40 kg and 3 of them were built.').filter((x) => x.kind === 'mass')).toHaveLength(1);
  });

  test.each(['The heating COP comes out at four point five.', 'Its COP turned out at 4.5 on the day.'])('"comes out at", "turned out at" lead to the COP: %s', (text) => {
    expect(read(text).find((x) => x.kind === 'cop')).toMatchObject({ si: 4.5 });
  });

  test('"twenty units were sold" is no temperature', () => {
    expect(temps(read('The hot side was 400 °C; 20 units were sold.'))).toHaveLength(1);
  });

  test('"three hundred and fifty percent efficient", where the text speaks of a heating COP, is that COP', () => {
    const text = 'In heating mode people call it three hundred and fifty percent efficient; that number is the heating COP. Outside it was two degrees C and the floor loop ran at thirty-five.';
    const f = read(text);
    expect(f.find((x) => x.kind === 'cop')).toMatchObject({ role: 'heating', si: 3.5 });
    expect(f.some((x) => x.kind === 'efficiency')).toBe(false);
    // COP_max = 308.15 / (308.15 − 275.15) = 9.34 (Carnot, heating); 3.5 is lawful.
    expect(verdicts(text).checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });

  test.each([
    ['A generator on the stove pipe: hot side 280 °C, cold side 70 °C, 5 % conversion on a 12 °C day.', 553.15, 343.15, 285.15],
    ['Hot junction 520 K and cold junction 310 K, room temperature 293 K, and 9 % efficient.', 520, 310, 293],
  ])('with both sides named, the day or the room is set aside: %s', (text, hot, cold, aside) => {
    const f = read(text);
    // T(K) = t(°C) + 273.15 (SI Brochure, 9th ed., 2.3.1).
    expect(temps(f)).toEqual([
      ['hot', expect.closeTo(hot, 9)],
      ['cold', expect.closeTo(cold, 9)],
      ['aside', expect.closeTo(aside, 9)],
    ]);
    expect(verdicts(text).checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });

  test('a heat pump that names no side keeps its outdoor air as the cold side', () => {
    const f = read('The heat pump takes heat from outdoor air at 5 °C into 35 °C floor water with a COP of 4.');
    expect(temps(f).map(([role]) => role)).toEqual(['cold', 'hot']);
  });

  test('"between 650 °C heater head and 50 °C cooler": the cooler is the cold side, not a difference', () => {
    const text = 'The Stirling engine converts 25 % of the heat to work between a 650 °C heater head and 50 °C cooler.';
    const f = read(text);
    expect(f.some((x) => x.kind === 'temperature-difference')).toBe(false);
    expect(temps(f)).toEqual([
      ['hot', expect.closeTo(923.15, 9)],
      ['cold', expect.closeTo(323.15, 9)],
    ]);
    // η_max = 1 − 323.15/923.15 = 0.650; 25 % is lawful.
    const run = verdicts(text);
    expect(run.checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });

  test('"a sink 50 °C cooler than the head": the side named before the difference is the colder one', () => {
    const f = read('The engine works between 650 °C and a sink 50 °C cooler than the head.');
    const cold = f.find((x) => x.kind === 'temperature' && x.role === 'cold');
    expectRelClose(cold!.si!, 923.15 - 50, 1e-12);
  });

  test('"hot side 40 K above the cold side", the cold side given: the hot side is above it', () => {
    const f = read('Cold side at 20 °C, hot side 40 K above the cold side; the converter turns 3 % of the heat into electricity.');
    const hot = f.find((x) => x.kind === 'temperature' && x.role === 'hot');
    expectRelClose(hot!.si!, 293.15 + 40, 1e-12);
  });

  test('a difference measured from another side named after it still puts the stated side above', () => {
    const f = read('The heat pump supplies 55 °C water, with a 50 K lift over its source, at a COP of 4.');
    expect(temps(f)).toEqual([
      ['hot', expect.closeTo(328.15, 9)],
      ['cold', expect.closeTo(278.15, 9)],
    ]);
  });

  test('an efficiency across a ΔT with no absolute temperatures needs them: nothing is run on a default', () => {
    const run = verdicts('The thermal converter of claim 2 produces 3.2 W at a conversion efficiency of 5 % across a ΔT of 40 K.');
    expect(run.checks.filter((c) => c.check === 'carnot')).toEqual([]);
    expect(run.needs.map((n) => n.check)).toContain('carnot');
  });

  test('heat rejected "to a cooling loop at 90 °C" is the cold side, and the hot side is then needed', () => {
    const text = 'The engine rejects its heat to a cooling loop at 90 °C and is 30 % efficient; the hot-side temperature is not given.';
    expect(temps(read(text))).toEqual([['cold', expect.closeTo(363.15, 9)]]);
    expect(verdicts(text).checks.filter((c) => c.check === 'carnot')).toEqual([]);
  });

  test('temperatures in a text of some other working, with no heat moved, are its surroundings: aside', () => {
    const box = read('The power box drew 150 W for 72 hours and delivered 14 kWh. The room was at 19 °C throughout (invented test data).');
    expect(temps(box)).toEqual([['aside', 292.15]]);
    const board = read('The converter took 240 W and gave 226 W; the board reached 47 °C in still air at 23 °C (invented test data).');
    expect(temps(board)).toEqual([
      ['aside', 320.15],
      ['aside', 296.15],
    ]);
    // (Heat moved keeps the sides, though no machine is named: a source and a sink.)
    const pump = read('Heat output 1.5 kW from a 400 W compressor; source 5 °C, sink 35 °C (invented test data).');
    expect(temps(pump)).toEqual([
      ['cold', 278.15],
      ['hot', 308.15],
    ]);
  });

  test('the temperature of a test room, a hall or a workshop, in a sentence that moves no heat, is set aside', () => {
    const pendulum = read('The drive gave 2 mN from 40 W with no propellant. It was tested hanging from a 3 m pendulum in a room at 20 °C (invented test data).');
    expect(temps(pendulum)).toEqual([['aside', 293.15]]);
    const engine = read('The Stirling engine runs between a 90 °C head and a 25 °C jacket at 12 % efficiency. The thermostat says 24 °C in the hall; the cooling water leaves at 27 °C (invented test data).');
    // (24 °C: the hall's; 27 °C: a third temperature beside the two sides named.)
    expect(temps(engine)).toEqual([
      ['hot', 363.15],
      ['cold', 298.15],
      ['aside', 297.15],
      ['aside', 300.15],
    ]);
    // (A heat pump's room is its warm side: "heat is drawn from outdoor air at 14 °F and delivered to a room at 70 °F".)
    const pump = read('The unit delivers 36,000 BTU/h of heat for 0.9 kW. Heat is drawn from outdoor air at 14 °F and delivered to a room at 70 °F (invented test data).');
    expect(temps(pump).map(([r]) => r)).toEqual(['cold', 'hot']);
  });

  test('"ΔT across the engine 170 °C", and a difference corrected to another, are differences', () => {
    const f = read('Hot cap at 200 °C. ΔT across the engine 170 °C, corrected to 175 °C; shaft 2.4 W from 60 W (invented test data).');
    expect(f.filter((x) => x.kind === 'temperature-difference').map((x) => [x.role, x.si])).toEqual([
      ['aside', 170],
      [null, 175],
    ]);
    // (A temperature "on a 35 °C pipe" after a difference named is a temperature.)
    const pipe = read('It makes 50 mW from a 20 °C temperature difference on a 35 °C hot-water pipe (invented test data).');
    expect(pipe.filter((x) => x.kind === 'temperature-difference').map((x) => x.si)).toEqual([20]);
  });

  test("a heat pump's condenser is its warm side, an engine's its cold side", () => {
    const pump = read('With water leaving the condenser at 35 °C and a 30 °C difference between that flow and the brine entering the evaporator, the heating COP of the BW-8 is 4.6 (invented test data).');
    expect(temps(pump)).toEqual([
      ['hot', 308.15],
      ['cold', 278.15],
    ]);
    expect(pump.find((f) => f.kind === 'cop')).toMatchObject({ role: 'heating', si: 4.6 });
    const turbine = read('The steam turbine exhausts into a condenser at 40 °C; steam enters at 500 °C and the efficiency is 38 % (invented test data).');
    expect(temps(turbine)).toEqual([
      ['cold', 313.15],
      ['hot', 773.15],
    ]);
  });

  test('a COP with its mode or its owner between it and its value, or "at least"', () => {
    const cop = (text: string) => read(text).filter((f) => f.kind === 'cop').map((f) => [f.role, f.si]);
    expect(cop('The heating COP of the unit is 4.6 (invented test data).')).toEqual([['heating', 4.6]]);
    expect(cop('The module has a coefficient of performance in cooling of at least 9 (invented test data).')).toEqual([['cooling', 9]]);
    expect(cop('The COP of each module was 3.2 (invented test data).')).toEqual([[null, 3.2]]);
  });

  test('a COP set off from its value by a clause between commas', () => {
    const f = read('Its cooling COP, measured per §7 of the test protocol, is 2.8.');
    expect(f.find((x) => x.kind === 'cop')).toMatchObject({ role: 'cooling', si: 2.8 });
  });
});

describe('inputs', () => {
  test('"the rest is sunlight": a further input named but not measured, so the first law is not run', () => {
    const run = verdicts('Our solar-assisted water heater gives 2 kW of heat but only 300 W comes from the wall, the rest is sunlight on the roof collector.');
    expect(run.checks.filter((c) => c.check === 'first-law')).toEqual([]);
    expect(run.needs.map((n) => n.check)).toContain('first-law');
  });

  test('"the rest is free energy from the magnets" is no measured source: the ledger still runs', () => {
    const run = verdicts('The heater gives 2 kW of heat from 300 W off the wall; the rest is free energy from the magnets.');
    expect(run.checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });

  test('"the input power itself is not stated" is not a claim of no input', () => {
    const text = 'The resonant coil generator produces 5 kW of electrical output, more than its input; the input power itself is not stated.';
    expect(read(text).some((x) => x.role === 'in')).toBe(false);
    expect(verdicts(text).checks.filter((c) => c.check === 'first-law')).toEqual([]);
  });

  test('"the motor powers itself" still is', () => {
    const f = read('The motor powers itself and delivers 200 W to the pump.');
    expect(f.find((x) => x.role === 'in')).toMatchObject({ kind: 'power', si: 0 });
  });

  test('"delivers 1.8 kW, which is 0.6 kW more than it consumes": the input is the output less the excess', () => {
    const f = read('The resonant transformer circuit delivers 1.8 kW to the load, which is 0.6 kW more than it consumes.');
    const input = f.find((x) => x.kind === 'power' && x.role === 'in');
    expectRelClose(input!.si!, 1200, 1e-12);
    expect(input!.derived).toBeTruthy();
  });

  test("a generating set: the engine's shaft power is the alternator's input", () => {
    const f = read('The generator set: the engine develops 25 CV at the shaft and the alternator delivers 2.2 × 10⁴ W of electrical output.');
    const input = f.find((x) => x.kind === 'power' && x.role === 'in');
    // 25 CV × 735.49875 W/CV = 18 387.468 75 W (NIST SP 811 B.8).
    expectRelClose(input!.si!, 25 * 735.49875, 1e-12);
    expect(f.find((x) => x.kind === 'power' && x.role === 'out')).toMatchObject({ si: 22000 });
  });

  test('"the coil charges a 12 V battery at 3 A" is an output, though a battery is often a source', () => {
    const f = read('The pulse motor takes 24 V at 1.5 A, and meanwhile its pick-up coil recharges a 12 V battery at 4 A.');
    const powers = f.filter((x) => x.kind === 'power');
    // P = V × I (Ohm's-law power, any circuits textbook): 24 × 1.5 = 36 W in, 12 × 4 = 48 W out.
    expect(powers.map((x) => [x.role, x.si])).toEqual([
      ['in', 36],
      ['out', 48],
    ]);
  });

  test('a round trip through a store: what went in is the input, what the store gave back the output', () => {
    const text = 'Over ten days the charger put 150 kWh into the battery pack and the pack delivered 131 kWh.';
    const f = read(text);
    // 1 kWh = 3.6 × 10⁶ J (NIST SP 811, B.8).
    expect(f.filter((x) => x.kind === 'energy').map((x) => [x.role, x.si])).toEqual([
      ['in', 150 * 3.6e6],
      ['out', 131 * 3.6e6],
    ]);
    expect(verdicts(text).checks.find((c) => c.check === 'first-law')?.finding).toBe('consistent');
    const more = 'We pushed 10 kWh into the flywheel and got back 12 kWh an hour later.';
    expect(verdicts(more).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });

  test.each([
    'Our 9 W LED gives as much light as a 60 W incandescent bulb.',
    'The 8 W lamp is sold as a 60 W-equivalent.',
    'It replaces the old 150 kW diesel with a 90 kW electric motor.',
  ])('what a device stands in for is no output of its own: %s', (text) => {
    expect(verdicts(text).checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  });

  test('"as much as 5 kW" is a hedge, not a comparison', () => {
    expect(verdicts('The motor delivers as much as 5 kW from 1 kW of input.').checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });

  test('"we pull 800 W off it" is what the device gives; with "needs no supply" the ledger runs', () => {
    const text = 'It is self-running and needs no supply; we pull eight hundred watts off it for six hours at a time.';
    expect(read(text).find((x) => x.kind === 'power' && x.si === 800)).toMatchObject({ role: 'out' });
    expect(verdicts(text).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    // The device itself drawing from a supply stays an input.
    expect(read('The heater pulls 2 kW from the wall.').find((x) => x.kind === 'power')).toMatchObject({ role: 'in' });
  });

  test('"runs from a 12 V battery at 3 A" stays an input', () => {
    const f = read('The fan runs from a 12 V battery at 3 A and moves 300 litres of air a minute.');
    expect(f.find((x) => x.kind === 'power')).toMatchObject({ role: 'in', si: 36 });
  });
});

describe('masses and thrust without propellant', () => {
  test('"a gross lift-off weight of 2400 lb" is a mass, not a change of weight read as a force', () => {
    const f = read('The vehicle has a gross lift-off weight of 2400 lb, of which 1700 lb is propellant, an Isp of 240 s.');
    const wet = f.find((x) => x.kind === 'mass' && x.role === 'wet');
    // 2400 lb × 0.45359237 kg/lb (NIST SP 811 B.8).
    expectRelClose(wet!.si!, 2400 * 0.45359237, 1e-12);
    expect(f.some((x) => x.kind === 'thrust')).toBe(false);
  });

  test('"a weight loss of 40 g" is still a force', () => {
    const f = read('The scale showed a weight loss of 40 g when the drive was on.');
    expect(f.find((x) => x.kind === 'thrust')).toBeTruthy();
  });

  test.each([
    'The gyroscope propulsion unit, which ejects no reaction mass, reaches a thrust-to-power figure of 85 µN/W.',
    'up to 5 mN of thrust from just 50 W, w/o any propellant on board',
    'The ionocraft gives 0.5 lb of lift at 30kV and 2mA, and we say it works just as well in hard vacuum (no air needed).',
  ])('propellant-free, so the photon bound runs: %s', (text) => {
    expect(verdicts(text).checks.find((c) => c.check === 'photon-bound')?.finding).toBe('breaks');
  });

  test.each([
    'The lifter gives 2 g of lift at 30 kV and 1 mA; it does not work in vacuum.',
    'The ion engine works in vacuum and gives 90 mN on 2.5 kW of xenon.',
  ])('an air-pusher or a thruster with propellant is not: %s', (text) => {
    expect(verdicts(text).checks.filter((c) => c.check === 'photon-bound')).toEqual([]);
  });
});

describe('a side said again, and where the heat comes from (issue 11)', () => {
  test('"230 °C … the hot side at 503 K" is one side said twice; the cold side is derived from the difference', () => {
    const text = 'Hot plate at 230 °C, with a ΔT of 180 K across the modules (invented test data). For a difference of 180 K with the hot side at 503 K, the limit is several times the 5 % declared.';
    const f = read(text);
    // T(K) = t(°C) + 273.15 (SI Brochure, 9th ed., 2.3.1): 503.15 K; cold = 503.15 − 180 = 323.15 K.
    expect(temps(f).filter(([role]) => role === 'hot' || role === 'cold')).toEqual([
      ['hot', 503.15],
      ['cold', expect.closeTo(323.15, 9)],
    ]);
    expect(f.find((x) => x.text === '503 K')?.role).toBe('aside');
  });
  test('an engine taking heat from water at 30 °C has its hot side there; a heat pump taking heat from the ground has its cold side there', () => {
    const engine = 'The engine works from a ΔT of just 8 K, taking heat from water at 30 °C and rejecting it to the cooler intake water; it converts 12 % of that heat.';
    const f = read(engine);
    expect(temps(f)).toEqual([
      ['hot', 303.15],
      ['cold', expect.closeTo(295.15, 9)],
    ]);
    // η_max = 8 / 303.15 = 0.02639; 0.12 / 0.02639 = 4.547 (Carnot, 1 − Tc/Th).
    const run = verdicts(engine).checks.find((c) => c.check === 'carnot');
    expect(run?.finding).toBe('breaks');
    expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.12 / (8 / 303.15), 6);
    expect(temps(read('The heat pump takes heat from the ground at 8 °C and supplies water at 45 °C.'))).toEqual([
      ['cold', 281.15],
      ['hot', 318.15],
    ]);
  });
});

test('"36 W for a heat flow of 150 W", "from a thermal input of 150 W": the heat a converter takes is its input (invented test data)', () => {
  for (const text of ['Measured conversion efficiency was 24 % (electrical output 36 W for a heat flow of 150 W).', 'The module gives 36 W from a thermal input of 150 W.']) {
    expect(read(text).filter((f) => f.kind === 'power').map((f) => [f.role, f.si])).toEqual([
      ['out', 36],
      ['in', 150],
    ]);
  }
});

test("what a cooler removes is its cooling output: a cooling COP against the reversed-Carnot bound (invented test data)", () => {
  const text = 'A student-built wine cooler keeps its cabinet at 4 °C in a kitchen at most 25 K warmer. The compressor draws 60 W and the cooler removes 126 W of heat from the cabinet.';
  expect(read(text).filter((f) => f.kind === 'power').map((f) => [f.role, f.si])).toEqual([
    ['in', 60],
    ['out', 126],
  ]);
  // COP = 126/60 = 2.1; COP_max = Tc/(Th − Tc) = 277.15/25 = 11.086 (reversed Carnot; T = t + 273.15).
  const run = verdicts(text).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'cop_cooling_ratio')!.si).toBeCloseTo(2.1 / (277.15 / 25), 6);
});

test('sides said again in a worked step later ("between 255.15 K and 305.15 K") do not make the first statement of them the surroundings (invented test data)', () => {
  const text =
    'The freezer cabinet held steady at −18 °C with the compressor running. The condenser skin temperature was 32 °C. The laboratory air was at 21 °C.\n' +
    'Heat removed: 112 W; compressor electrical input: 70 W; cooling COP 1.6.\n' +
    'Analysis. Ideal cooling COP between 255.15 K and 305.15 K: 255.15/50 = 5.10.';
  const f = read(text);
  expect(temps(f).filter(([role]) => role === 'hot' || role === 'cold')).toEqual([
    ['cold', expect.closeTo(255.15, 9)],
    ['hot', 305.15],
  ]);
  // COP_max = 255.15/50 = 5.103 (reversed Carnot); 1.6 / 5.103 = 0.3135.
  const run = verdicts(text).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'cop_cooling_ratio')!.si).toBeCloseTo(1.6 / (255.15 / 50), 4);
});

test('worked lines "in = … = 4.8 MJ; out = … = 4.05 MJ" and sunlight a collector received are inputs and outputs (invented test data)', () => {
  const flywheel = 'So: in = 2 kW × 2400 s = 4.8 MJ; out = 1.5 kW × 2700 s = 4.05 MJ.';
  expect(read(flywheel).filter((f) => f.kind === 'power').map((f) => [f.role, f.si])).toEqual([
    ['in', 2000],
    ['out', 1500],
  ]);
  // 4.05 / 4.8 = 0.84375 (first law: out over in).
  expect(verdicts(flywheel).checks.find((c) => c.check === 'first-law')!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(4.05 / 4.8, 9);
  const collector = 'A flat-plate collector received solar energy on its aperture totalling 27 kWh over the day and delivered 14.2 kWh of heat to the tank.';
  // kWh = 3.6 MJ (NIST SP 811, B.8).
  expect(read(collector).filter((f) => f.kind === 'energy').map((f) => [f.role, f.si])).toEqual([
    ['in', 27 * 3.6e6],
    ['out', expect.closeTo(14.2 * 3.6e6, 3)],
  ]);
});

test('"mass after all usable propellant is burned" is the dry mass, and the rocket equation runs on it (invented test data)', () => {
  const text =
    'Propulsion annex:\nmass at separation, fully fuelled and with the payload attached: 1450 kg;\nmass after all usable propellant is burned, stage and payload: 520 kg;\nspecific impulse in vacuum: 318 s;\nplanned velocity change: 3.05 km/s.';
  expect(read(text).filter((f) => f.kind === 'mass').map((f) => [f.role, f.si])).toEqual([
    ['wet', 1450],
    ['dry', 520],
  ]);
  // Δv = Isp·g0·ln(m0/m1) = 318 × 9.806 65 × ln(1450/520) = 3198 m/s (Tsiolkovsky; g0 exact, NIST SP 811 B.8 note).
  const run = verdicts(text).checks.find((c) => c.check === 'rocket-equation');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'dv')!.si).toBeCloseTo(318 * 9.80665 * Math.log(1450 / 520), 3);
});

test('the other side worked out later from the side said with the difference is that derivation said again (invented test data)', () => {
  const text =
    'Slide 2. The tile wraps pipes with a surface at 60 °C and holds a ΔT of 20 K across the module.\n\nSlide 3. 12 % conversion efficiency, heat to electricity.\n\n' +
    'Analyst: with 60 °C on the hot face and 20 K across the tile, the fins are at 40 °C; the limit is about 6 %.';
  const f = read(text);
  const sides = temps(f).filter(([role]) => role === 'hot' || role === 'cold');
  expect(sides).toEqual([
    ['hot', 333.15],
    ['cold', expect.closeTo(313.15, 9)],
  ]);
  // The cold side is the one derived beside the hot side, not the analyst's (η_C = 20/333.15 = 0.06003; 0.12 / 0.06003 = 1.999).
  expect(f.find((x) => x.kind === 'temperature' && x.role === 'cold')?.derived).toBeTruthy();
  const run = verdicts(text).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('breaks');
  expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.12 / (20 / 333.15), 6);
});

test('an efficiency worked as a quotient: the numerator is the output, the denominator the input (invented test data)', () => {
  const text = 'QA asked why efficiency is not shown as output power over input power on the label. It is: 24.1 V × 9.80 A over 48.0 V × 5.20 A.';
  const powers = read(text).filter((f) => f.kind === 'power');
  expect(powers.map((f) => [f.role, f.si])).toEqual([
    ['out', expect.closeTo(24.1 * 9.8, 9)],
    ['in', expect.closeTo(48 * 5.2, 9)],
  ]);
  // 236.18 / 249.6 = 0.9462 (first law: out over in).
  expect(verdicts(text).checks.find((c) => c.check === 'first-law')!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo((24.1 * 9.8) / (48 * 5.2), 9);
});

test('"Hydrogen feed (lower heating value) | 2.6 kW" is what a fuel cell takes in (invented test data)', () => {
  const text = '| Hydrogen feed (lower heating value) | 2.6 kW | flow meter |\n| Electrical output | between 0.9 and 1.4 kW | stack temperature |';
  const powers = read(text).filter((f) => f.kind === 'power');
  expect(powers.map((f) => [f.role, f.si])).toEqual([
    ['in', 2600],
    ['out', 900],
  ]);
  // Run at the end of the range least in conflict with the law: 0.9 / 2.6 = 0.3462 (first law).
  expect(verdicts(text).checks.find((c) => c.check === 'first-law')!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(0.9 / 2.6, 9);
});

test("a heat engine's two temperatures, one of them room air: the room is its cold side, not the surroundings (invented test data)", () => {
  const text = "A kit catalogue says its tabletop Stirling engine turns up to 12 % of the heat from a hot plate into shaft work. The plate runs at about 90 °C and the engine's top fins sit in room air at roughly 20 °C.";
  const f = extractFigures(text);
  expect(f.filter((x) => x.kind === 'temperature').map((x) => [x.role, x.si])).toEqual([
    ['hot', 363.15],
    ['cold', 293.15],
  ]);
  // Carnot: 1 − 293.15/363.15 = 0.1928; 0.12 / 0.1928 = 0.6225 (lawful).
  const run = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.12 / (1 - 293.15 / 363.15), 6);
});

describe('energy audits: chillers, cold stores, heat meters and the grid (invented test data)', () => {
  // Carnot COP of cooling Tc/(Th − Tc) (Çengel & Boles, ch. 6); °F → K = (F − 32)·5/9 + 273.15 (NIST SP 811, B.8);
  // 1 BTU_IT/h = 0.293 071 07 W (NIST SP 811, Appendix B.8).
  test("a chiller removing heat from its chilled-water loop is checked on its COP, not against the first law, and a payback is no run", () => {
    const text = 'Chiller 2 was removing 120,000 BTU/h from the chilled-water loop while drawing 9.8 kW, with 44°F supply water and 95°F entering condenser water. Replacement payback est. 6–7 years at $0.14/kWh.';
    const f = read(text);
    expect(f.find((x) => x.kind === 'duration')?.role).toBe('aside');
    expect(f.some((x) => x.kind === 'energy')).toBe(false);
    const { checks } = verdicts(text);
    expect(checks.map((c) => c.check)).toEqual(['carnot']);
    const tc = ((44 - 32) * 5) / 9 + 273.15;
    const th = ((95 - 32) * 5) / 9 + 273.15;
    const cop = (120000 * 0.29307107) / 9800;
    expect(checks[0].finding).toBe('consistent');
    expectRelClose(checks[0].outputs.find((o) => o.name === 'cop_cooling_ratio')!.si, cop / (tc / (th - tc)), 1e-6);
  });

  test("a cold store's condensers are its warm side, and the lift down to the freezer gives the cold one", () => {
    // (A power cycle's condenser, in a text that also names a heat pump, stays its cold side.)
    expect(temps(read('The binary plant runs its turbine on brine at 120 °C and its condenser at 30 °C. The offices use a heat pump.'))).toEqual([
      ['hot', expect.closeTo(393.15, 9)],
      ['cold', expect.closeTo(303.15, 9)],
    ]);
    const text = "Cold store audit. The rooftop condensers run at 30 °C and the lift down to the freezer room is 52 K. The plant's cooling COP averages 2.1.";
    expect(temps(read(text))).toEqual([
      ['hot', expect.closeTo(303.15, 9)],
      ['cold', expect.closeTo(251.15, 9)],
    ]);
    expect(read(text).find((x) => x.kind === 'cop')).toMatchObject({ role: 'cooling', si: 2.1 });
    expect(read('The Peltier cooler holds 25 °C in a 40 °C room. Its datasheet COP at that difference is 0.6.').find((x) => x.kind === 'cop')?.si).toBe(0.6);
  });

  test('what a heat meter read is heat out; what goes back into the ring main is output', () => {
    const f = read('Ground-source heat pump: loop at 6 °C, flow 35 °C. At steady state the heat meter read 8.4 kW against 1.9 kW electrical input.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['out', 8400],
      ['in', 1900],
    ]);
    // Heat words after the figure still say so themselves, and the input after them keeps its side.
    const g = read('Over a 30-day test, the heat meter recorded 1,450 kWh of heat delivered against 410 kWh of electricity consumed.');
    expect(g.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['out', 'in']);
    const h = read("The rep said the box was 'putting 1.5 kW back into the ring main'. My clamp meter read 3.2 A at 230 V going in.");
    expect(h.find((x) => x.kind === 'power' && x.si === 1500)?.role).toBe('out');
    expect(h.find((x) => x.kind === 'power' && x.derived)).toMatchObject({ role: 'in', si: expect.closeTo(736, 9) });
  });

  test('heat moved out of a box for each watt of electricity is a cooling output per watt in', () => {
    const text = 'The Peltier cool box holds 5 °C inside with the van at 30 °C. It is moving about 0.6 W of heat out of the box for each watt of electricity.';
    const { checks } = verdicts(text);
    const carnot = checks.find((c) => c.check === 'carnot');
    // COP 0.6 against Tc/(Th − Tc) = 278.15/25.
    expectRelClose(carnot!.outputs.find((o) => o.name === 'cop_cooling_ratio')!.si, 0.6 / (278.15 / 25), 1e-9);
  });
});

describe('energy audits: ratings, meters and times that are no run (invented test data)', () => {
  test("a heat pump's or a chiller's size is the heat it moves", () => {
    const power = (text: string) => read(text).find((x) => x.kind === 'power');
    expect(power('Commissioning narrative, plot 7 (air-source heat pump, 7 kW). Daily COP came out between 3.4 and 3.9.')?.role).toBe('out');
    expect(power('Chiller witness test — CH-2 (450 kW screw chiller).')?.role).toBe('out');
    // "The unit is rated 9 kW" says no side: a shop's or a backer's text gives as often what it draws.
    expect(power('The owners have a new air-to-water heat pump. The unit is rated 9 kW.')?.role).toBeNull();
    // An immersion heater is still rated by what it takes.
    expect(power('An immersion heater rated at 3 kW.')?.role).toBe('in');
  });

  test('"COP came out between 3.4 and 3.9" is a COP range', () => {
    expect(read('Daily COP came out between 3.4 and 3.9 at 7 °C outdoors and 45 °C flow.').find((x) => x.kind === 'cop')).toMatchObject({ si: 3.4, upper: { si: 3.9 } });
  });

  test("a gas meter's reading is the input and the heat meter's on the flow the output; a hydrogen's heating value made by an electrolyser is not an input", () => {
    // A power said well after a gas meter is named is not what the meter read.
    expect(read('We will fit a gas meter and log the boiler for a year; the pilot engine then delivers 5 kW to the grid.').find((x) => x.kind === 'power')?.role).not.toBe('in');
    const f = read("Boiler check. Gas meter: 2.61 m³, which at the supplier's stated calorific value comes to about 28.4 kWh. Heat meter on the flow: 26.0 kWh over the same hour.");
    expect(f.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['in', 'out']);
    const g = read('Heat pump commissioning: measured COP 4.3 over a two-hour run (heat meter 11.2 kWh, electricity 2.6 kWh).');
    expect(g.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['out', 'in']);
    const text = 'The electrolyser drew 500 W for a 10-hour run, which is 18 MJ of electricity. The hydrogen collected has a heating value of 12 MJ.';
    expect(verdicts(text).checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
  });

  test("a fluid's freeze point, one cycle's length and a chiller sized for a load are no figures of the run", () => {
    const f = read('Ground-source system: flow at 40 °C; the unit was lifting across 38 K from the ground loop. Antifreeze 25 % MEG, freeze point checked at −11 °C.');
    expect(temps(f)).toEqual([
      ['hot', expect.closeTo(313.15, 9)],
      ['cold', expect.closeTo(275.15, 9)],
      ['aside', expect.closeTo(262.15, 9)],
    ]);
    expect(read('Defrost cycles: 3–5 a day, each under four minutes.').find((x) => x.kind === 'duration')?.role).toBe('aside');
    expect(read('The laser draws 2 kW. The replacement chiller is sized for 2.4 kW of heat.').map((x) => x.role)).toEqual(['in', 'aside']);
  });
});
