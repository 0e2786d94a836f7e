/**
 * The figure reader on comparisons, ratings, per-unit gains and labelled table rows.
 *
 * Against outside references: NIST SP 811 (2008), Appendix B.8: mechanical horsepower
 * 745.699 87 W, metric horsepower (PS) 735.498 75 W, BTU_IT/h 0.293 071 1 W, kWh 3.6 MJ.
 * Every text here is invented test data (invented devices, no real people or products).
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
const brief = (figures: Figure[]) => figures.map((f) => [f.kind, f.role, f.si]);

describe('a percentage that is the other side of a comparison', () => {
  test('takes the kind of the percentage it is compared with and is set aside', () => {
    const f = read('The Tarn-3 turbine reaches 41 % efficiency at its design point, against 36 % for the baseline turbine.');
    expect(brief(f)).toEqual([
      ['efficiency', null, expect.closeTo(0.41, 12)],
      ['efficiency', 'aside', expect.closeTo(0.36, 12)],
    ]);
  });

  test('in a sentence of its own that begins "For comparison"', () => {
    const f = read('Our module converts 21.5 % of the sunlight. For comparison, the older module managed 18 %.');
    expect(f.map((x) => [x.kind, x.role])).toEqual([
      ['efficiency', null],
      ['efficiency', 'aside'],
    ]);
    expectRelClose(f[1].si!, 0.18, 1e-12);
  });

  test("a heat pump's COP compared with a boiler's 100 % makes that 100 % the boiler's efficiency", () => {
    const f = read('The air-to-water unit is 380 % efficient at 2 °C outside and 40 °C flow, versus 100 % for the gas boiler it replaced.');
    expect(f.find((x) => x.role === 'aside')).toMatchObject({ kind: 'efficiency', si: 1 });
    expect(f.find((x) => x.kind === 'cop')).toMatchObject({ role: 'heating', si: 3.8 });
  });

  test('a percentage with no comparison and no word of its own is still not a figure', () => {
    expect(read('The drive reached 2 mN. Sales rose 35 % last year.').filter((x) => x.kind !== 'thrust')).toEqual([]);
  });
});

describe('a clause that sets the claim against a reference', () => {
  test("the reference clause is set aside, the claim's own clause is read", () => {
    const f = read('An ideal 5 kW photon rocket would give about 17 µN; our cavity, by contrast, gave 2 mN from the same 5 kW.');
    const thrusts = f.filter((x) => x.kind === 'thrust');
    expect(thrusts.map((x) => [x.role, x.si])).toEqual([
      ['aside', expect.closeTo(17e-6, 12)],
      [null, 0.002],
    ]);
  });

  test('two clauses without a contrast keep both figures', () => {
    expect(brief(read('Our rig draws 2 kW; the output is 3 kW.'))).toEqual([
      ['power', 'in', 2000],
      ['power', 'out', 3000],
    ]);
  });
});

describe("another device's figures, and figures proposed or asked about", () => {
  const roles = (text: string) => read(text).map((f) => [f.kind, f.role]);
  test('the device the claimed one replaced, its predecessor, one set against it', () => {
    expect(roles('The pump motor draws 8.2 kW at full load; the 90 CV diesel it replaced used far more.')).toEqual([
      ['power', 'in'],
      ['power', 'aside'],
    ]);
    expect(roles('It gives 62 mN per kW on xenon, slightly better than the 58 mN per kW of its predecessor.')).toEqual([
      ['thrust-per-power', null],
      ['thrust-per-power', 'aside'],
    ]);
    expect(roles('The marine diesel is rated 38 % efficient, against about 25 % for a petrol outboard; its gas peaks near 1,900 K and the sea is at 290 K.')).toEqual([
      ['efficiency', null],
      ['efficiency', 'aside'],
      ['temperature', 'hot'],
      ['temperature', 'cold'],
    ]);
  });
  test('a figure proposed for a later test, or asked about, beside one measured', () => {
    expect(roles('Prof. Lindqvist proposed repeating it at 5 kW. The drive gave 2 mN at 1 kW.')).toEqual([
      ['power', 'aside'],
      ['thrust', null],
      ['power', 'in'],
    ]);
    expect(roles('A reader asked whether it could do 10 km/s instead. The probe, at an Isp of 300 s, reaches 2 km/s.')).toEqual([
      ['speed', 'aside'],
      ['specific-impulse', null],
      ['speed', 'delta-v'],
    ]);
    expect(roles('It delivered 1.5 kW to the heaters. The company plans a 5 kW version for shops.')).toEqual([
      ['power', 'out'],
      ['power', 'aside'],
    ]);
    // (Alone, a proposed figure is still read: nothing else of its kind is given.)
    expect(roles('We plan to build a 2 kW version next year.')).toEqual([['power', null]]);
  });
});

describe('a gain stated per physical unit', () => {
  test('"for every kWh" is one kilowatt-hour in', () => {
    expect(brief(read('The Orrin box is said to return 1.2 kWh for every kWh it is fed.'))).toEqual([
      ['energy', 'out', 1.2 * 3.6e6],
      ['energy', 'in', 3.6e6],
    ]);
  });

  test('"for every kilowatt of shaft power" is one kilowatt in, in another unit than the output', () => {
    expect(brief(read('The alternator gives 870 W of electrical power for every kilowatt of shaft power it takes.'))).toEqual([
      ['power', 'out', 870],
      ['power', 'in', 1000],
    ]);
  });

  test('"units" with no physical unit stay a ratio', () => {
    expect(read('It gives 1.3 units back for every unit it takes.')).toMatchObject([{ kind: 'efficiency', si: 1.3 }]);
  });
});

describe('ratings before the name of a machine', () => {
  test("an engine's rating as the claim's subject is its output", () => {
    // 120 PS × 735.498 75 W/PS (NIST SP 811, B.8)
    const [p] = read('The 120 PS engine is 35 % efficient at full load.');
    expect(p).toMatchObject({ kind: 'power', role: 'out' });
    expectRelClose(p.si!, 120 * 735.49875, 1e-12);
  });

  test('a motor that drives something else is not read as an output', () => {
    const f = read('A 3 hp motor is said to turn a generator that sends 4 kW back.');
    expect(f[0].role).not.toBe('out');
  });

  test("a cooler's horsepower is its drive, the input; its BTU/h are what it removes", () => {
    // 2 hp × 745.699 87 W/hp; 5000 BTU/h × 0.293 071 1 W (NIST SP 811, B.8)
    const f = read('The 2 hp cryocooler lifts 5000 BTU/h at 80 K and rejects it at 300 K.');
    const powers = f.filter((x) => x.kind === 'power');
    expect(powers[0].role).toBe('in');
    expectRelClose(powers[0].si!, 2 * 745.69987, 1e-7);
    expectRelClose(powers[1].si!, 5000 * 0.2930711, 1e-6);
  });

  test("a pump's horsepower is left to the other rules (its motor's output)", () => {
    expect(read('A 2 hp pump ran for 3 h.')[0].role).not.toBe('in');
  });
});

describe('labels and parts', () => {
  test('a table row labels each current–voltage pair', () => {
    const f = read('Unit K7 | in: 4 A at 24 V | out: 3.5 A at 26 V').filter((x) => x.kind === 'power');
    expect(f.map((x) => [x.role, x.si])).toEqual([
      ['in', 96],
      ['out', expect.closeTo(91, 9)],
    ]);
  });

  test('"(80 kg of it xenon)" is the propellant of the mass before it', () => {
    const masses = read('The 600 kg probe (80 kg of it xenon) is to gain 5 km/s at an Isp of 2500 s.').filter((x) => x.kind === 'mass');
    expect(masses.map((x) => [x.role, x.si])).toEqual([
      ['wet', 600],
      ['propellant', 80],
      ['dry', 520],
    ]);
  });

  test('"starts at … and burns out at …" are the wet and dry masses', () => {
    const masses = read('The exhaust leaves at 3 km/s; the stage starts at 8 t and burns out at 2 t.').filter((x) => x.kind === 'mass');
    expect(masses.map((x) => [x.role, x.si])).toEqual([
      ['wet', 8000],
      ['dry', 2000],
    ]);
  });

  test('an electric radiator is not a heat pump: its percentage of the input is an efficiency', () => {
    const f = read('The panel radiator drew 1.5 kW for 2 hours and gave 3 kWh of heat, 100 % of its input.');
    expect(f.find((x) => x.text === '100 %')).toMatchObject({ kind: 'efficiency', si: 1 });
    expect(f.filter((x) => x.role === 'out')).toHaveLength(1);
  });
});

describe('more roles by the words around', () => {
  test('what a source feeds into a charge controller is its input; the output to the bank is its output', () => {
    const f = read('The string feeds 6 A at 48 V into the charge controller, whose output to the battery is 270 W.').filter((x) => x.kind === 'power');
    expect(f.map((x) => [x.role, x.si])).toEqual([
      ['in', 288],
      ['out', 270],
    ]);
  });

  test('what a pack "is said to have stored" came out of the device that fed it', () => {
    const f = read('The gadget drew 3 W from a USB port for a day, yet the pack it fed is said to have stored 1 kWh.');
    expect(f.find((x) => x.text === '1 kWh')).toMatchObject({ kind: 'energy', role: 'out', si: 3.6e6 });
  });

  test('"than the 2 kW it is supplied with" is the input', () => {
    const f = read('The unit delivers 10 % more power than the 2 kW it is supplied with.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 2000],
      ['excess', expect.closeTo(200, 9)],
      ['out', expect.closeTo(2200, 9)],
    ]);
  });
});

describe('what the text says is not the device', () => {
  test('a heat pump the device is said to beat does not make it a heat pump', () => {
    const f = read('The Lumo panel heater turns 1 kWh of electricity into 1.3 kWh of heat, beating any heat pump.');
    expect(f.some((x) => x.kind === 'cop')).toBe(false);
    expect(f.map((x) => x.role)).toEqual(['in', 'out']);
  });

  test('no input is read from "free energy" when the text says the input was not given', () => {
    const f = read('The seller says the generator gives 500 W of free energy but gives no figure for what it takes in.');
    expect(f.some((x) => x.role === 'in')).toBe(false);
  });

  test('"no air flow or propellant" is a device that throws out nothing', () => {
    const text = 'A bench rig gives 0.2 µN/W, and the builder says no air flow or propellant is involved.';
    const f = read(text);
    expect(f).toMatchObject([{ kind: 'thrust-per-power', si: expect.closeTo(2e-7, 18) }]);
    // The photon-rocket bound: F/P ≤ 1/c (c = 299 792 458 m/s, SI Brochure), so the ratio is (F/P)·c.
    const photon = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'photon-bound');
    expect(photon?.finding).toBe('breaks');
    expectRelClose(photon!.outputs.find((o) => o.name === 'ratio')!.si!, 2e-7 * 299792458, 1e-9);
  });
});

describe('machines that push on air', () => {
  test('a drone whose rotors give its thrust is not judged by the photon-rocket bound, even under a propellant-free class', () => {
    const text = 'Crop-spraying drone, spec sheet: the six rotors give 30 kilograms of thrust while drawing 6 kW in hover.';
    const f = read(text);
    const run = runClaimChecks(f, { text, classes: ['propellant-free-thrust'] });
    expect(run.checks.filter((c) => c.check === 'photon-bound')).toEqual([]);
  });
});

describe('a lone temperature no check could use', () => {
  const roleOf = (text: string) => read(text).find((x) => x.kind === 'temperature')?.role;

  test('is set aside in a text with no heat machine, efficiency, COP, difference or erasure', () => {
    expect(roleOf('The box drew 90 W for a 48-hour run and gave 5 kWh to the load, measured at 20 °C and 40 % humidity.')).toBe('aside');
    expect(roleOf('The probe will pass at 150 km/s while its shield faces 1,300 °C.')).toBe('aside');
  });

  test('is kept where a machine, a COP or a bit erasure could use it', () => {
    expect(roleOf('The Stirling engine runs its hot head at 650 °C.')).not.toBe('aside');
    expect(roleOf('Each switching event dissipates 2 × 10⁻¹⁹ J at 4 K.')).not.toBe('aside');
    expect(roleOf('The heat pump draws from 5 °C brine with a COP of 4.')).not.toBe('aside');
  });
});

describe('errata and corrections: the figure put right is set aside, the right one takes its side (invented test data)', () => {
  test('"stated … an average load of 4 kW …. The correct average load was 400 W"', () => {
    const text = "Erratum. Our test of the HB-30 home battery stated that it supplied an average load of 4 kW throughout its 72-hour run. The correct average load was 400 W. The battery held 30 kWh at the start.";
    const f = read(text);
    expect(f.find((x) => x.text === '4 kW')?.role).toBe('aside');
    expect(f.find((x) => x.text === '400 W')?.role).toBe('out');
    // 400 W × 72 h = 400 × 259 200 s = 103.68 MJ out of 30 kWh = 108 MJ (NIST SP 811: 1 kWh = 3.6 MJ): 0.96, lawful.
    const run = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'first-law');
    expect(run?.finding).toBe('consistent');
    expectRelClose(run!.outputs.find((o) => o.name === 'over_unity')!.si, (400 * 72 * 3600) / (30 * 3.6e6), 1e-9);
  });

  test('"That was our error. The preprint reports 299,700 km/s" and "wrong by a factor of a thousand: the study gives 30 mN"', () => {
    const speeds = read('Corrections. A news brief said the preprint reported protons travelling at 310,000 km/s. That was our error. The preprint reports 299,700 km/s, just under the speed of light.');
    expect(speeds.filter((x) => x.role !== 'aside').map((x) => x.si)).toEqual([299_700_000]);
    const thrust = read("Erratum. We wrote that a 10 MW laser aboard the probe would produce 30 N of thrust. That is wrong by a factor of a thousand: the study gives 30 mN.");
    expect(thrust.filter((x) => x.kind === 'thrust' && x.role !== 'aside').map((x) => x.si)).toEqual([0.03]);
  });

  test('"An earlier version of this story gave the output as 32 kW" withdraws that figure', () => {
    const f = read('Updated. The generator delivers 3.2 kW from a 4 kW diesel input. An earlier version of this story gave the output as 32 kW.');
    expect(f.find((x) => x.text === '32 kW')?.role).toBe('aside');
    expect(f.find((x) => x.text === '3.2 kW')?.role).toBe('out');
  });

  test("a log's correction: 'correction: forgot the 2.0 ns delay … 2.86 × 10⁸ m/s', 'read 3.2 A not 0.32 A'", () => {
    const text = '15:02 edge at the far end 12.0 ns after trigger: 4.00 m / 12.0 ns = 3.33 × 10⁸ m/s ??\n15:30 correction: forgot the 2.0 ns trigger delay. Transit is 14.0 ns, so 2.86 × 10⁸ m/s.';
    const f = read(text);
    expect(f.filter((x) => x.kind === 'speed' && x.role !== 'aside').map((x) => x.si)).toEqual([2.86e8]);
    // 2.86e8 / 299 792 458 = 0.954 (c exact, BIPM SI Brochure): below c, no finding against it.
    expect(runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'light-speed')?.finding).not.toBe('breaks');
    const amps = read('14:02 clamp meter shows 0.32 A at 12 V. 14:20 correction: the meter was on the wrong range, so read 3.2 A not 0.32 A.');
    expect(amps.filter((x) => x.kind === 'current' && x.si < 1).map((x) => x.role)).toEqual(['aside', 'aside']);
    expect(amps.find((x) => x.text === '3.2 A')?.role).not.toBe('aside');
  });

  test("a figure explained away: 'The 3.5 kgf on the swing arm was the stand creeping on its rollers'", () => {
    const text = 'Hung from wires: 1.2 kW in, rotors at 9,000 rpm. Result: no steady deflection. The 3.5 kgf on the swing arm was the stand creeping on its rollers.';
    expect(read(text).find((x) => x.kind === 'thrust')?.role).toBe('aside');
    expect(runClaimChecks(read(text), { text, classes: [] }).checks.some((c) => c.finding === 'breaks')).toBe(false);
    // Said not to be an artefact, it stands.
    expect(read('The 3.5 kgf on the swing arm was not the stand creeping: the rig takes 1.2 kW.').find((x) => x.kind === 'thrust')?.role).not.toBe('aside');
    // Nor is a reading "measured with the ground loop at 0 °C" explained away.
    expect(read('Efficiency of the brine heat pump, 290 %, was measured with the ground loop at 0 °C and the radiators at 35 °C.').find((x) => x.kind === 'cop')?.role).toBe('heating');
  });

  test('an error asked about is no correction: "asked whether this was a misprint"', () => {
    const f = read('The leaflet calls the heat pump "410 % efficient". A councillor asked whether this was a misprint; roughly four units of heat reach the radiators for each unit of electricity.');
    expect(f.find((x) => x.text === '410 %')?.role).not.toBe('aside');
  });
});

test("a cited work's finding beside the text's own measurement is set aside: 'The original report … had found an output of 57 W' (invented test data)", () => {
  const text = 'At the operating point of ref. [3], the electrical input was 50.0 W and the heat output 49.1 W, averaged over five runs. The original report, with a calorimeter of another type, had found an output of 57 W at this input.';
  const f = read(text);
  expect(f.find((x) => x.text === '57 W')?.role).toBe('aside');
  expect(f.find((x) => x.text === '50.0 W')?.role).toBe('in');
  // 49.1 / 50.0 = 0.982: lawful (57 / 50 = 1.14 would have been a false alarm).
  const run = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'first-law');
  expect(run?.finding).toBe('consistent');
  expectRelClose(run!.outputs.find((o) => o.name === 'over_unity')!.si, 49.1 / 50, 1e-9);
  // (Alone, the cited finding is the claim: no other output is stated.)
  expect(read('Ref. [3] reported an output of 57 W for an input of 50 W.').find((x) => x.text === '57 W')?.role).toBe('out');
});

describe("a manuscript's calibrations and control runs beside its runs (invented test data)", () => {
  test("'calibrated beforehand with a 25.0 W reference heater' and 'A control with the switch held open drew 1.9 W' are set aside", () => {
    const text = 'It is powered from a bench supply at about 48 W. The oil bath was calibrated beforehand with a 25.0 W reference heater. In the runs the load dissipated between 62 and 75 W. A control with the switch held permanently open drew 1.9 W.';
    const f = read(text);
    expect(f.find((x) => x.text === '25.0 W')?.role).toBe('aside');
    expect(f.find((x) => x.text === '1.9 W')?.role).toBe('aside');
    expect(f.find((x) => x.text === '48 W')?.role).toBe('in');
    // (Not "the controller drew 8.5 A": a controller is no control run.)
    expect(read('At full assist the controller drew 350 W from the battery, and the roller measured 300 W at the wheel.').find((x) => x.text === '350 W')?.role).toBe('in');
  });

  test("'calibrated with an electrostatic comb delivering 1.0 mN' and 'replaced by a dummy load absorbing 1.2 kW'; 'for forward powers between 0.6 and 1.4 kW' is the drive's input", () => {
    const text = 'The force scale was calibrated with an electrostatic comb delivering 1.0 mN. Across 14 runs the thrust was 2.5–5 mN, for forward microwave powers between 0.6 and 1.4 kW. With the cavity replaced by a water-cooled dummy load absorbing 1.2 kW, no deflection was seen.';
    const f = read(text);
    expect(f.find((x) => x.text === '1.0 mN')?.role).toBe('aside');
    expect(f.find((x) => x.text === '1.2 kW')?.role).toBe('aside');
    expect(f.find((x) => x.text.startsWith('0.6'))?.role).toBe('in');
  });
});

test("an exercise's figure said to be out of reach ('why no accelerator, however powerful, could ever make the label read 3.1 × 10⁸ m/s') is set aside beside the stated one (invented test data)", () => {
  const text = "A museum label says the tube's electron gun fired electrons at 2.9 × 10⁸ m/s. (c) Explain why no accelerator, however powerful, could ever make the label read 3.1 × 10⁸ m/s.";
  const f = read(text);
  expect(f.map((x) => [x.si, x.role])).toEqual([
    [2.9e8, null],
    [3.1e8, 'aside'],
  ]);
  // c = 299 792 458 m/s (SI Brochure, 9th ed., defining constant): 2.9e8 / c = 0.9673, below c (lawful).
  const run = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'light-speed');
  expect(run?.finding).toBe('consistent');
  expectRelClose(run!.outputs[0].si, 2.9e8 / 299_792_458, 1e-9);
});

describe("another machine's percentage, and an instrument's or a bound's force, beside the device's own (invented test data)", () => {
  test("a rival's or an old boiler's bare percentage is kept, set aside, of the right kind", () => {
    const rival = read('Our new marine diesel is 38 % efficient. A rival claims 52 % for a ship engine ten times the size.');
    expect(brief(rival)).toEqual([
      ['efficiency', null, expect.closeTo(0.38, 12)],
      ['efficiency', 'aside', expect.closeTo(0.52, 12)],
    ]);
    const boiler = read('Our old oil boiler was rated at 88 %, which at least sounded honest. The heat pump is 400 % efficient.');
    expect(brief(boiler)).toEqual([
      ['efficiency', 'aside', expect.closeTo(0.88, 12)],
      ['cop', 'heating', expect.closeTo(4, 12)],
    ]);
    // Above 100 %, beside a heat pump's COP: another heat pump's COP.
    const older = read('The brochure says the AW-9 heat pump is 350 % efficient. A neighbour\'s older unit was quoted at 250 %.');
    expect(brief(older)[1]).toEqual(['cop', 'aside', expect.closeTo(2.5, 12)]);
    // A decade named is an earlier machine.
    expect(brief(read('The new plant is 42 % efficient; a 1960s plant of the same size managed 32 %.'))[1]).toEqual(['efficiency', 'aside', expect.closeTo(0.32, 12)]);
  });

  test('a percentage that is no efficiency stays out, and none is made where the text gives no efficiency of its own', () => {
    expect(read('The engine is 42 % efficient. Sales of the older model rose 20 % on last year.').map((f) => f.si)).toEqual([expect.closeTo(0.42, 12)]);
    expect(read('The rival unit was quoted at 52 %; ours weighs 12 kg.').filter((f) => f.kind === 'efficiency')).toEqual([]);
  });

  test("a boiler's percentage in a heat pump text is an efficiency, not a COP", () => {
    const f = read('We looked at three options. A new oil boiler would have cost least to fit, about 92 % efficient. The heat pump we chose runs at a COP of 3.4.');
    expect(brief(f)).toEqual([
      ['efficiency', null, expect.closeTo(0.92, 12)],
      ['cop', 'heating', expect.closeTo(3.4, 12)],
    ]);
  });

  test("a balance's resolution or calibration force, and the photon bound said for the device's power, are set aside", () => {
    const f = read('The cavity drew 40 W and the balance, with 5 × 10⁻⁷ N resolution, read 2.4 mN. Calibration used a 100 µN electrostatic force.');
    expect(f.filter((x) => x.kind === 'thrust').map((x) => [x.role, x.si])).toEqual([
      ['aside', expect.closeTo(5e-7, 15)],
      [null, expect.closeTo(2.4e-3, 12)],
      ['aside', expect.closeTo(1e-4, 15)],
    ]);
    // P/c for 400 W is 1.334 µN (c = 299 792 458 m/s, exact: BIPM SI Brochure, 9th ed.), said rounded to 1.3 µN.
    const text = 'The sealed module draws 400 W, uses no propellant, and was reported to push with 31 mN. Light carrying that power would push with at most 1.3 µN.';
    const g = read(text);
    expect(g.filter((x) => x.kind === 'thrust').map((x) => x.role)).toEqual([null, 'aside']);
    // The check runs on the claimed 31 mN: F·c/P = 0.031 × 299 792 458 / 400 = 23 234 (worked by hand).
    const run = runClaimChecks(g, { text }).checks.find((c) => c.check === 'photon-bound');
    expect(run?.finding).toBe('breaks');
    expectRelClose(run!.outputs.find((o) => o.name === 'ratio')!.si, (0.031 * 299792458) / 400, 1e-9);
    // The bound said after the figure: "the 1.7 µN that 500 W could give even as a perfect photon rocket" (500/c = 1.668 µN).
    const k = read('They shine a 500 W LED array at the vane and report a force of about 1.2 µN. That is below the 1.7 µN that 500 W could give even as a perfect photon rocket.');
    expect(k.filter((x) => x.kind === 'thrust').map((x) => x.role)).toEqual([null, 'aside']);
    // A laser's own thrust said in an explainer ("would produce about 33 µN") is the device's, not a bound.
    const h = read('A laser emitting 10 kW would produce a thrust of about 33 micronewtons. That works out at 3.3 micronewtons per kilowatt.');
    expect(h.find((x) => x.kind === 'thrust')?.role).toBeNull();
  });
});

describe('a room or the weather, in a text with no machine that works on heat (invented test data)', () => {
  test('is a condition of the test, set aside', () => {
    const f = read('Generator set trial: it burned fuel worth 30 kWh and delivered 9.5 kWh to the load bank. Ambient 11 °C, rain.');
    expect(f.find((x) => x.kind === 'temperature')).toMatchObject({ role: 'aside', si: expect.closeTo(284.15, 9) });
  });
  test('but stays the cold side where an engine or a heat pump is named', () => {
    const f = read('The Stirling engine ran off a 90 °C tank; ambient 11 °C.');
    expect(f.find((x) => x.kind === 'temperature' && x.si < 290)?.role).toBe('cold');
  });
});

describe('another machine a claim is set against in marketing words (invented test data)', () => {
  const firstLaw = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
  test('"the same push as a 9.9 hp petrol outboard" is the rival\'s figure, not what the motor gives', () => {
    const text = 'The E6 delivers 6 hp at the propeller shaft from 5.2 kW of battery power, which the maker says gives "the same push as a 9.9 hp petrol outboard".';
    expect(extractFigures(text).find((x) => x.text === '9.9 hp')?.role).toBe('aside');
    // 6 hp = 4,474.2 W (1 hp = 745.699 87 W, NIST SP 811 appendix B) over 5.2 kW: 0.86.
    expect(firstLaw(text)?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo((6 * 745.69987158227) / 5200, 6);
  });
  test('"more thrust than a 2 kW fan", "better than any 90 % motor" are rivals; "more than the 2 kW it draws" is its own input', () => {
    expect(extractFigures('It gives more thrust than a 2 kW fan.').find((x) => x.kind === 'power')?.role).toBe('aside');
    expect(extractFigures('Our motor is 96 % efficient, better than any 90 % induction motor.').find((x) => x.si === 0.9)?.role).toBe('aside');
    expect(firstLaw('It gives out more than the 2 kW it draws: 2.5 kW.')?.finding).toBe('breaks');
  });
});

describe('a claim made as a multiple of another machine\'s figure (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"a good heat pump runs at around 400 % … three times more efficient than that" claims a COP of 12', () => {
    const text =
      'A good air-source heat pump runs at around 400 % efficiency. Our vortex stage makes the unit three times more efficient than that. Even at −5 °C outside it feeds your radiators at 45 °C.';
    const cop = extractFigures(text).find((x) => x.kind === 'cop' && x.role !== 'aside');
    expect(cop?.si).toBe(12);
    // Carnot heating COP between 268.15 K and 318.15 K = 318.15 / 50 = 6.363 (node); 12 is beyond it.
    const c = run(text).checks.find((x) => x.check === 'carnot');
    expect(c?.finding).toBe('breaks');
    expect(c?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(12 / (318.15 / 50), 6);
  });
  test('"ten times faster than the 200,000 km/s at which light crosses fibre" is 2 × 10⁹ m/s', () => {
    const r = run('The start-up says its link carries data ten times faster than the 200,000 km/s at which light crosses optical fibre.').checks.find((c) => c.check === 'light-speed');
    expect(r?.finding).toBe('breaks');
    // c = 299,792,458 m/s (BIPM SI Brochure).
    expect(r?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(2e9 / 299_792_458, 6);
  });
  test('a figure that is itself the multiple, a bound, an expectation or a larger count make no new figure', () => {
    for (const text of [
      'We report a conversion efficiency of 9 %, about three times that of bismuth telluride modules.',
      'Light travels at about 300,000 km/s in vacuum. A speed of 1.9 million km/s would be more than six times that.',
      'Our 3 kW bench unit pushed 36 mN in March, and we expect ten times that from the next case.',
      'The photon bound is about 2.3 µN for 700 W. The claim is over five hundred times that.',
    ]) {
      expect(extractFigures(text).some((x) => x.derived?.includes("another's figure"))).toBe(false);
    }
  });
});

describe('marketing words around a propellant-free claim and a heat pump\'s percentage (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"puts a small ion engine to shame without carrying a gram of propellant" claims no propellant; a rival "of that power" is no propulsor of its own', () => {
    const text =
      'Our sealed microwave resonator "puts a small ion engine to shame without carrying a gram of propellant". In vacuum-chamber runs it gives 4–9 mN of thrust for 0.5–1.5 kW of microwave input. A xenon ion engine of that power gives around 30–50 mN.';
    const r = run(text).checks.find((c) => c.check === 'photon-bound');
    expect(r?.finding).toBe('breaks');
    // The end kindest to the claim: 4 mN against 1.5 kW / c (c exact, BIPM SI Brochure) = 799.4.
    expect(r?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(0.004 / (1500 / 299_792_458), 3);
  });
  test('"proving the effect is not ion wind" names no ion wind', () => {
    const text = 'Our asymmetric-capacitor thruster produced 0.9 mN at 40 W in a vacuum chamber at 10⁻⁶ torr, proving the effect is not ion wind.';
    expect(run(text).checks.find((c) => c.check === 'photon-bound')?.finding).toBe('breaks');
  });
  test('a heat pump that "returned 380 % on our rig" has a heating COP of 3.8; a rival\'s percentage and a saving are not its COP', () => {
    const text = 'At 7 °C outdoor air and 35 °C flow, the air-to-water heat pump returned 380 % on our rig.';
    expect(extractFigures(text).find((x) => x.kind === 'cop')).toMatchObject({ si: 3.8, role: 'heating' });
    expect(run(text).checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
    expect(extractFigures('Since the heat pump went in, our bills showed 120 % more savings than forecast.').some((x) => x.kind === 'cop')).toBe(false);
  });
});

describe('old machines someone keeps are no earlier device (issue 11, invented test data)', () => {
  it('"restores old steam engines and says the launch engine is 9 % efficient": the launch engine\'s figures', () => {
    const f = extractFigures('My grandad restores old steam engines and he says the launch engine he is rebuilding is 9 % efficient, with the boiler at 350 °F and the condenser at 100 °F. He also says it makes 5 PS.');
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['hot', 'cold']);
    expect(f.find((x) => x.kind === 'efficiency')?.role).not.toBe('aside');
  });
  it('a figure said well before the earlier device, and not of it, is the claim\'s own; the one attached to it is the earlier device\'s', () => {
    const f = extractFigures('The new inverter takes 48 V at 25 A from the boat\'s battery bank and delivers 1,140 W, a conversion that beats the 88 % of its previous model. It weighs 3.1 kg.');
    expect(f.filter((x) => x.kind === 'power').map((x) => [x.text, x.role])).toEqual([
      ['48 V at 25 A', 'in'],
      ['1,140 W', 'out'],
    ]);
    expect(f.find((x) => x.text === '88 %')?.role).toBe('aside');
    // (Figures said to be of the earlier device, before it is named, stay its own.)
    const g = extractFigures('The 500 W and the 120 W in the leaflet were measured on the previous model. The unit weighs 2 kg.');
    expect(g.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['aside', 'aside']);
  });
  it('"the older model drew 2.1 kW" is still an earlier device', () => {
    const f = extractFigures('The older model drew 2.1 kW. This new unit gives 3 kW from 4 kW of input.');
    expect(f.find((x) => x.text === '2.1 kW')?.role).toBe('aside');
  });
});

test('a part "out of an old microwave oven (running at about 25 watts)" is no earlier device: its power drives the thrust (invented test data)', () => {
  const f = extractFigures('I made a thruster from a brass can and the magnetron out of an old microwave oven (running at about 25 watts once turned down). My balance shows 4 millinewtons of push with no propellant.');
  expect(f.find((x) => x.text === '25 watts')!.role).toBe('in');
  // An earlier device's figure is still its own.
  expect(extractFigures('Our previous prototype reached 35 % at 800 W; the new unit reaches 41 %.').every((x) => x.text !== '35 %' || x.role === 'aside')).toBe(true);
});

test('"for every 10 kWh we put in, about 8.4 kWh comes back out" is in, then out (invented test data)', () => {
  const f = extractFigures('The sand store returns heat to the network: for every 10 kWh we put in, about 8.4 kWh comes back out after a day.');
  expect(f.find((x) => x.text === '10 kWh')!.role).toBe('in');
  expect(f.find((x) => x.text === '8.4 kWh')!.role).toBe('out');
});

test("a machine's rating beside what it can give is no input; a driving machine's rating still is the driven one's (issue 11, invented test data)", () => {
  const f = extractFigures("The e-bike's motor is rated 250 W, but it can deliver 600 W for short climbs.");
  expect(f.find((x) => x.text === '250 W')?.role).not.toBe('in');
  expect(runClaimChecks(f, { text: "The e-bike's motor is rated 250 W, but it can deliver 600 W for short climbs." }).checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  expect(extractFigures('The coil generator gives 20 A at 110 V while the motor turning it is rated at just 2 hp.').find((x) => x.text === '2 hp')?.role).toBe('in');
  expect(extractFigures('My steam engine makes about 2 hp. The burner is rated 60,000 BTU/h.').find((x) => x.text === '60,000 BTU/h')?.role).toBe('in');
});

test('what leaves the device and what reaches the drum are its output (issue 11, invented test data)', () => {
  const f = extractFigures('The cell was fed 40 W of electrical power while the calorimeter recorded 46 W of heat leaving it. Over the run that is roughly 7 MJ no chemistry explains.');
  expect(f.find((x) => x.text === '46 W')?.role).toBe('out');
  const g = extractFigures('Our winch supplier lists 48 V, 40 A draw and 1.6 kW at the drum for the model.');
  expect(g.find((x) => x.text === '1.6 kW')?.role).toBe('out');
});

test('"gives back 1.3 for every 1 you put in" is a gain; a cooling machine\'s such gain is its cooling COP (issue 11, invented test data)', () => {
  const text = "An inventor says his pulsed coil circuit 'gives back 1.3 for every 1 you put in', measured with two multimeters.";
  const f = extractFigures(text);
  expect(f.map((x) => [x.kind, x.si])).toEqual([['efficiency', 1.3]]);
  expect(runClaimChecks(f, { text }).checks.map((c) => [c.check, c.finding])).toEqual([['first-law', 'breaks']]);
  const ac = 'The air conditioner gives 3.5 for every 1 you put in, the salesman says.';
  const g = extractFigures(ac);
  expect(g.map((x) => [x.kind, x.role, x.si])).toEqual([['cop', 'cooling', 3.5]]);
  expect(runClaimChecks(g, { text: ac }).checks.filter((c) => c.finding === 'breaks')).toEqual([]);
});
