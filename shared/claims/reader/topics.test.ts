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
/** The first-law run on a text's own figures, and its ratio of out to in. */
const firstLaw = (text: string) => runClaimChecks(read(text), { text, classes: [] }).checks.find((c) => c.check === 'first-law');
const overUnity = (text: string) => firstLaw(text)?.outputs.find((o) => o.name === 'over_unity')?.si;

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

describe('speeds above c that carry nothing', () => {
  test('an apparent motion or a phase velocity above c is set aside; a craft said to travel so is kept', () => {
    // 4c = 4 × 299 792 458 m/s = 1.199 × 10⁹ m/s (c exact, SI Brochure 2.2).
    expect(read('A bright knot in the jet appears to have moved sideways across the sky at four times the speed of light.')).toMatchObject([{ kind: 'speed', role: 'aside', si: 4 * 299792458 }]);
    expect(read('The phase velocity in the guide is 1.3c.')[0].role).toBe('aside');
    expect(read('The craft travels at four times the speed of light.')[0].role).not.toBe('aside');
    // ("appeared at the receiving station sooner than light" is no apparent motion.)
    expect(read('A change at the sender appeared at the receiver sooner than light could cross, corresponding to signalling at 4.2 times the speed of light.')[0].role).not.toBe('aside');
  });
  test('"about 0.97 of the speed of light" is a speed', () => {
    expect(read('The knot really moves at about 0.97 of the speed of light.')).toMatchObject([{ kind: 'speed', si: 0.97 * 299792458 }]);
  });
});

describe('the power a bound asks for, worked backwards from the claimed thrust', () => {
  test('"would need about 330 kW" for 1.1 mN at P/c is set aside; a stated 330 kW is the device\'s', () => {
    // F·c = 1.1e-3 N × 299 792 458 m/s = 329.8 kW.
    const f = read('The cavity produced a thrust of 1.1 mN. For that thrust to sit at the photon limit, the device would need about 330 kW of power going out as a beam.');
    expect(roleOf(f, '330 kW')).toBe('aside');
    expect(roleOf(read('Our 330 kW searchlight gives 1.1 mN of recoil.'), '330 kW')).toBe('in');
    // (A plain "needs" may be the claim itself: "1 N of thrust needs 300 MW of beam".)
    expect(roleOf(read('Photon rocket study note: 1 N of thrust needs 300 MW of collimated beam power.'), '300 MW')).not.toBe('aside');
  });
  test('"a few hundred watts", "several hundred watts" are no figures', () => {
    expect(read('If the cavity was driven by an amplifier of a few hundred watts, the thrust is far above the ceiling.')).toEqual([]);
    expect(read('It is driven by several hundred watts.')).toEqual([]);
    expect(read('It is driven by two hundred watts.').map((x) => x.si)).toEqual([200]);
  });
});

describe('explainers that work the numbers', () => {
  test('"turn 9 % of your radiator\'s heat into electricity" is an efficiency, whatever radiator is named', () => {
    expect(read("Can the charger really turn 9 % of your radiator's heat into electricity?")).toMatchObject([{ kind: 'efficiency', si: 0.09 }]);
  });
  test('"for every watt going in, 1.25 watts would come out" is a gain of 1.25', () => {
    expect(read('So for every watt going in, 1.25 watts would come out.')).toMatchObject([{ kind: 'efficiency', si: 1.25 }]);
    expect(read('For every watt, the lamp gives 0.3 W of light.')).toMatchObject([{ kind: 'power', si: 0.3 }]);
  });
});

describe('a bare range whose words come after its upper end', () => {
  test('"between 3.2 and 3.8 units of heat for every unit of electricity" is one range, and the check takes its lower end', () => {
    // (Heat over electricity from a machine the text does not name: a heating COP.)
    expect(read("It delivers 'between 3.2 and 3.8 units of heat for every unit of electricity'.")).toMatchObject([{ kind: 'cop', role: 'heating', si: 3.2, upper: { si: 3.8 } }]);
    const text = 'The box returns between 1.2 and 1.4 units of energy for every unit it takes.';
    const run = runClaimChecks(read(text), { text, classes: [] }).checks.find((c) => c.check === 'first-law');
    // The end most favourable to the claim (issue 11, item 1): 1.2, not 1.4.
    expect(run?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(1.2, 9);
    // (A range reaching below 1 is no finding of more out than in.)
    const lawful = 'The box returns between 0.9 and 1.1 units of energy for every unit it takes.';
    expect(runClaimChecks(read(lawful), { text: lawful, classes: [] }).checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
});

describe('lawful devices that sound impossible', () => {
  const checks = (text: string) => runClaimChecks(read(text), { text, classes: [] }).checks;
  test('the same speed said again as a headline is the same appearance; a phase velocity named in the next sentence', () => {
    const jet = 'Poster: "Quasar jet caught moving at four and a half times the speed of light". From its shift across the sky the blob appears to move sideways at 4.5 c. Its real speed comes out at about 0.98 c.';
    expect(checks(jet).some((c) => c.finding === 'breaks')).toBe(false);
    const guide = 'The crests of the wave inside the guide move along it at about 1.4 times the speed of light. This is the phase velocity, and nothing is carried by it.';
    expect(read(guide)[0].role).toBe('aside');
  });
  test("an amplifier's signal is no input where the text says what it draws from the mains", () => {
    const text = 'My amplifier turns the 1 W signal from my preamp into 100 W at the speakers. Its rating plate says it draws 180 W from the mains at full volume.';
    expect(roleOf(read(text), '1 W')).toBe('aside');
    // 100 W out of 180 W in: 0.556, within the first law.
    expect(checks(text).find((c) => c.check === 'first-law')?.finding).toBe('consistent');
    // (With no supply named, the signal stays the input: the claim is then more out than in.)
    expect(roleOf(read('The box turns a 1 W signal into 100 W.'), '1 W')).toBe('in');
  });
  test("a current and a voltage \"at the charger's output\" are its output; sunlight falling on a panel is its input", () => {
    const text = "We measured 1.1 A at 18 V at the charger's output going into a power bank. The maker says about 120 W of sunlight falls on its folds.";
    const f = read(text);
    expect(f.find((x) => x.derived?.startsWith('power = current × voltage'))).toMatchObject({ role: 'out', si: expect.closeTo(19.8, 9) });
    expect(roleOf(f, '120 W')).toBe('in');
    expect(checks(text).some((c) => c.finding === 'breaks')).toBe(false);
  });
  test('"1 h 40 min" is one run of 6,000 s', () => {
    // 1 h = 3600 s, 1 min = 60 s (SI Brochure, Table 8): 3600 + 40 × 60 = 6000 s.
    expect(read('It delivered 1.25 kW for 1 h 40 min.').filter((x) => x.kind === 'duration').map((x) => x.si)).toEqual([6000]);
    expect(read('Tests of 3 hours, 2 hours and 1 hour.').map((x) => x.si)).toEqual([10800, 7200, 3600]);
  });
});

describe('from technical notes near their limits (invented test data)', () => {
  const checks = (text: string) => runClaimChecks(read(text), { text, classes: [] }).checks;
  test('"the dry mass, including … residual propellant, is 610 kg" is the dry mass; the rocket equation then holds', () => {
    const text = 'The engine has a vacuum specific impulse of 452 s. The loaded stage has a wet mass of 2,450 kg; after the burns the dry mass, including the payload adapter and residual propellant, is 610 kg. The mission requires a total Δv of 6.05 km/s.';
    expect(roleOf(read(text), '610 kg')).toBe('dry');
    // Δv = 452 × 9.80665 × ln(2450/610) = 6163 m/s (Tsiolkovsky; g0 exact, SI Brochure): 6.05 km/s is within it.
    expect(checks(text).find((c) => c.check === 'rocket-equation')?.finding).toBe('consistent');
  });
  test('"at burnout, with the landing propellant reserve on board, the stack weighs 148 t" is the mass after the burn', () => {
    const text = 'The engines give an effective exhaust speed of 3.1 km/s. The stage lifts off at 540 t, and at burnout, with the landing propellant reserve on board, the stack weighs 148 t. It must deliver a Δv of 3.95 km/s.';
    expect(roleOf(read(text), '148 t')).toBe('dry');
    // 3100 × ln(540/148) = 4012 m/s ≥ 3950 m/s.
    expect(checks(text).find((c) => c.check === 'rocket-equation')?.finding).toBe('consistent');
  });
  test('"the heating COP of the six units lay between 3.8 and 4.4": six is a count; the COP is the range', () => {
    expect(read('At that point the daily heating COP of the six units lay between 3.8 and 4.4.')).toMatchObject([{ kind: 'cop', si: 3.8, upper: { si: 4.4 } }]);
    expect(read('For every unit of energy it takes, the converter gives back 1.3 units, says the maker.')).toMatchObject([{ kind: 'efficiency', si: 1.3 }]);
  });
  test('"No fuel!" of a battery pack is no nil input; "no battery, no mains, no fuel" of a module is', () => {
    const pack = 'Pack 75 kWh, 290 kg\nPeak discharge 1.2 kW/kg for ten seconds\n"Instant torque, silent, no fuel!" The energy comes from the charger.';
    expect(checks(pack).some((c) => c.finding === 'breaks')).toBe(false);
    const module = 'No battery, no mains, no fuel: the zero-point module has kept a 2 kW heater going for three weeks.';
    expect(checks(module).find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
  test('a line opening with "P_in (…) =" gives its figure the input side; "P_in = 48 V × 10 A" gives it through a voltage and a current', () => {
    const log = 'P_in (electrolysis, logged) = 40 ± 0.5 W\nP_out (flow calorimetry) = 48–55 W over the steady section';
    const f = read(log);
    expect(roleOf(f, '40 ± 0.5 W')).toBe('in');
    expect(roleOf(f, '48–55 W')).toBe('out');
    // Least output over most input: 48/40.5 = 1.185 > 1.
    expect(checks(log).find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(48 / 40.5, 9);
    expect(roleOf(read('P_in = 48 V × 10 A; P_out = 520 W at the shaft.'), '520 W')).toBe('out');
  });
  test('energy "drawn from the vacuum" is no input', () => {
    expect(roleOf(read('In the test it powered a 100 W load for 48 hours, that is 4.8 kWh "drawn from the vacuum".'), '4.8 kWh')).not.toBe('in');
    expect(roleOf(read('It used 4.8 kWh drawn from the grid.'), '4.8 kWh')).toBe('in');
  });
});

describe("from examiners' and reviewers' prose (invented test data)", () => {
  test('a chiller "rejecting heat on deck at 32 °C with a lift of 30 K": 32 °C is its warm side, the cold one 30 K below', () => {
    const f = read('The chiller removes 11.5 units of heat for every unit of electricity (a cooling COP of 11.5), rejecting heat on deck at 32 °C with a lift of 30 K across the machine.');
    const temps = f.filter((x) => x.kind === 'temperature');
    expect(temps.map((x) => [x.role, x.si])).toEqual([
      ['hot', expect.closeTo(305.15, 9)],
      ['cold', expect.closeTo(275.15, 9)],
    ]);
    // (An engine's rejected heat stays its cold side.)
    expect(read('The engine rejects heat to the river at 15 °C.')[0].role).toBe('cold');
  });
  test('"an electric motor of 5 hp drives, through a gearbox, a generator delivering 6.2 kW": the motor is the input', () => {
    const text = 'The set is one in which an electric motor of 5 hp drives, through a flywheel and a step-up gearbox, a generator delivering 6.2 kW.';
    const f = read(text);
    expect(roleOf(f, '5 hp')).toBe('in');
    // 5 hp = 3728.5 W (NIST SP 811 B.8); 6200/3728.5 = 1.66 > 1.
    expect(runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
  test('"well under a ten-thousandth of the speed of light" is a bound beside the stated speed; "a tenth of the speed of light" is a speed', () => {
    const f = read('The claim recites a probe reaching 40,000 mph. It is well under a ten-thousandth of the speed of light.');
    expect(f.map((x) => [x.kind, x.role])).toEqual([
      ['speed', null],
      ['speed', 'aside'],
    ]);
    expect(read('The craft flies at a tenth of the speed of light.')).toMatchObject([{ kind: 'speed', si: expect.closeTo(29979245.8, 3) }]);
  });
});

test('"OVER 100% EFFICIENT SOLAR???" is a threshold, not a figure: the cell is checked on the 18.5 % it is said to reach; "95 % AFUE" is an efficiency (invented test data)', () => {
  const text = 'TITLE: OVER 100% EFFICIENT SOLAR??? SURELY NOT\nClaimed performance: "Internal quantum efficiency of 135 % in the blue." The same note says the finished cell turns 18.5 % of the sunlight falling on it into electricity.';
  const f = read(text);
  expect(roleOf(f, '100%')).toBe('aside');
  expect(runClaimChecks(f, { text, classes: [] }).checks.some((c) => c.finding === 'breaks')).toBe(false);
  expect(read('Claimed performance: 80,000 BTU/h input, 76,000 BTU/h output, "95 % AFUE".').find((x) => x.kind === 'efficiency')?.si).toBeCloseTo(0.95, 12);
});

describe('from historical notes (invented test data)', () => {
  const checks = (text: string) => runClaimChecks(read(text), { text, classes: [] }).checks;
  test('"the engine gave the dynamo about two kilowatts …, and the dynamo turned it into one and a half kilowatts": 2 kW in, 1.5 kW out', () => {
    const text = 'The engine gave the dynamo about two kilowatts of shaft power, and the dynamo turned it into one and a half kilowatts of electricity.';
    const f = read(text);
    expect(roleOf(f, 'two kilowatts')).toBe('in');
    expect(roleOf(f, 'one and a half kilowatts')).toBe('out');
    expect(checks(text).find((c) => c.check === 'first-law')?.finding).toBe('consistent');
  });
  test('"a fuelled mass of 12 tonnes, of which 9 tonnes would be propellant, leaving 3 tonnes": propellant 9 t, dry 3 t', () => {
    const f = read('A vehicle with a fuelled mass of 12 tonnes, of which 9 tonnes would be propellant, leaving 3 tonnes for structure, engines and payload.');
    expect(f.filter((x) => x.kind === 'mass' && !x.derived).map((x) => [x.role, x.si])).toEqual([
      ['wet', 12000],
      ['propellant', 9000],
      ['dry', 3000],
    ]);
  });
  test('"flew three times in 1998" is no gain', () => {
    const text = 'The Gannet had a loaded mass of 28 kg and an empty mass of 11 kg. It flew three times in 1998 from a coastal range.';
    expect(read(text).some((x) => x.kind === 'efficiency')).toBe(false);
    expect(checks(text).some((c) => c.finding === 'breaks')).toBe(false);
  });
});

describe('first-law ledgers read from explanations and trials (invented test data)', () => {
  test.each([
    [
      // A month supposed over powers stated plainly is the writer's sum: 175/140 = 1.25 > 1, more out than in.
      'The heater takes 140 W; the company says the tube gives off 175 W of heat in steady operation. If that held for a month of 30 days, the tube would have delivered about 91 megajoules more than it received.',
      [['91 megajoules', 'aside'], ['30 days', 'aside']],
      'breaks',
      1.25,
    ],
    [
      // The power fed into a line is the output, the store what went in: 500 W × 30 h = 54 MJ of 72 MJ = 0.75.
      'Grid support trial: a 20 kWh flywheel bank fed 500 W into the local line for 30 hours before it had to be spun up again.',
      [['20 kWh', 'in'], ['500 W', 'out']],
      'consistent',
      0.75,
    ],
  ])('%s', (text, roles, finding, ratio) => {
    expect(roles.map(([words]) => roleOf(read(text), words))).toEqual(roles.map(([, role]) => role));
    expect(firstLaw(text)?.finding).toBe(finding);
    expect(overUnity(text)).toBeCloseTo(ratio, 9);
  });
});

test('an "ideal delta-v" worked out beside the flight\'s own speed change is the writer\'s bound; a claimed one is the claim (invented test data)', () => {
  const text = 'Liftoff mass 1.8 kg, 1.25 kg once the rocket motor has burned out, and a specific impulse of 180 s. That gives an ideal delta-v a bit over 640 m/s. The altimeter showed a peak delta-v of 210 m/s.';
  const f = extractFigures(text);
  expect(f.filter((x) => x.kind === 'speed').map((x) => [x.role, x.si])).toEqual([
    ['aside', 640],
    ['delta-v', 210],
  ]);
  const claimed = extractFigures('Claimed ideal burnout delta-v of the rocket: 2.8 km/s. Check: 80/32 = 2.5, ln 2.5 ≈ 0.92, times 3.1 km/s gives a delta-v of 2.84 km/s.');
  expect(claimed.find((x) => x.si === 2800)?.role).not.toBe('aside');
});

test('a group velocity above c is set aside, unless the text says a message is sent at it (invented test data)', () => {
  const lawful = 'The group velocity in the fibre\'s anomalous region was measured at 1.7 c, a well-known effect that carries no information faster than light.';
  expect(extractFigures(lawful).find((x) => x.kind === 'speed')!.role).toBe('aside');
  expect(runClaimChecks(extractFigures(lawful), { text: lawful }).checks.some((c) => c.finding === 'breaks')).toBe(false);
  const claim = 'We measured the group velocity of the pulse at 1.7 c and used it to send a message from A to B faster than light.';
  expect(runClaimChecks(extractFigures(claim), { text: claim }).checks.find((c) => c.check === 'light-speed')!.finding).toBe('breaks');
});
