/**
 * Which checks a claim's figures allow, and their results (issue 11, item 2): compared with the
 * check kit (runCheck on the same typed inputs) and with textbook formulas. Verdicts a referee can
 * stand behind: nothing run on a default the text never gave, ranges at their ends most favourable
 * to the claim, lawful devices reported as consistent. The figures are invented test data.
 */
import { runCheck } from '../checks/run';
import { formatQuantity, parseQuantity } from '../worksheet/quantity';
import { claimSignals, planChecks, readSignals, runClaimChecks, signalledClasses } from './plan';
import { LONG_DOCUMENT_NOTE } from './plan/run';
import { extractFigures } from './reader';
import { FIGURE_SI_UNIT, type Figure, type FigureKind, type FigureRole } from './types';

let n = 0;
function fig(kind: FigureKind, quantity: string, role: FigureRole = null, upper?: string): Figure {
  const unit = FIGURE_SI_UNIT[kind];
  const si = parseQuantity(quantity, unit);
  n += 1;
  const f: Figure = { id: `f${n}`, kind, quantity, text: quantity, start: null, end: null, si, unit, display: formatQuantity(si, unit), role };
  if (upper) {
    const u = parseQuantity(upper, unit);
    f.upper = { quantity: upper, si: u, display: formatQuantity(u, unit) };
  }
  return f;
}
beforeEach(() => (n = 0));

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., §2.2, a defining constant).
const C = 299_792_458;
// g0 = 9.806 65 m/s² exactly (3rd CGPM, 1901; NIST SP 811 Appendix B.8 footnote).
const G0 = 9.80665;
const out = (run: { outputs: { name: string; si: number }[] }, name: string) => run.outputs.find((o) => o.name === name)!.si;
const FREE = { text: 'A sealed, propellant-free drive (invented test data).' };

describe('nothing is run on a default', () => {
  it('asks for the input when a text gives only what a device puts out, claim of gain or not', () => {
    for (const text of [
      'The tidal kite should supply somewhere around 300 to 500 kW on a good spring tide, its engineer said.',
      'The fuel-cell stack supplies twelve kilowatts of electricity to the ferry\'s hotel load.',
      'The community flywheel returned 18 kWh to the village grid across the evening peak.',
    ]) {
      const { checks, needs } = runClaimChecks(extractFigures(text), { text });
      expect(checks).toEqual([]);
      expect(needs).toEqual([expect.objectContaining({ check: 'first-law', missing: ['the energy or power put in (all of it: electrical, mechanical, chemical, heat)'] })]);
    }
  });

  it('plans nothing for no figures', () => {
    expect(planChecks([])).toEqual({ planned: [], needs: [], notes: [] });
  });

  it('a propellant-free thrust and power: the photon bound runs; the break-even speed needs a speed the text does not give', () => {
    const { checks, needs } = runClaimChecks([fig('thrust', '0.2 lbf'), fig('power', '1.5 kW', 'in')], FREE);
    expect(checks.map((c) => c.check)).toEqual(['photon-bound']);
    const photon = checks[0];
    const kit = runCheck('photon-bound', { F_claimed: '0.2 lbf', P: '1.5 kW' });
    expect(photon.outputs).toEqual(kit.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })));
    // Photon-rocket bound F = P/c (any text on radiation pressure, e.g. Jackson, Classical Electrodynamics, §6.7; from memory);
    // 1 lbf = 4.448 221 615 260 5 N (NIST SP 811, Appendix B.8).
    expect(out(photon, 'ratio')).toBeCloseTo((0.2 * 4.4482216152605) / (1500 / C), 6);
    expect(photon).toMatchObject({ finding: 'breaks', law: 'conservation of linear momentum' });
    expect(photon.sentence).toMatch(/^Conflicts with conservation of linear momentum: /);
    expect(photon.sentence).not.toMatch(/\^|e\+/); // numbers as in print
    expect(needs).toEqual([expect.objectContaining({ check: 'break-even-speed', missing: ['a speed of the craft in some inertial frame'] })]);
  });

  it('runs the break-even speed when the text gives a speed, and takes no mass it was not given', () => {
    const { checks } = runClaimChecks([fig('thrust', '2 mN'), fig('power', '1 kW', 'in'), fig('speed', '30 km/s')], FREE);
    const be = checks.find((c) => c.check === 'break-even-speed')!;
    // Break-even speed v = P/F: the kinetic power F·v equals the input power.
    expect(out(be, 'v_break_even')).toBeCloseTo(1000 / 0.002, 6);
    expect(be.inputs).toMatchObject({ F: '2 mN', P: '1 kW', v: '30 km/s', m: '0 kg' });
  });

  it('a thrust with no word of propellant either way: the photon bound needs to know, and is not run', () => {
    const { checks, needs } = runClaimChecks([fig('thrust', '90 mN'), fig('power', '1.5 kW', 'in')], { text: 'The thruster gives 90 mN on 1.5 kW.' });
    expect(checks).toEqual([]);
    expect(needs[0].check).toBe('photon-bound');
  });

  it('a device that expels propellant never gets the photon bound (an ion thruster is lawful)', () => {
    const text = 'Our xenon ion thruster gives 90 mN on 1.5 kW of input power (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text, classes: ['enclosed-radiation'] });
    expect(checks.find((c) => c.check === 'photon-bound')).toBeUndefined();
  });

  it('a thrust with no power: the photon bound is listed as needing the input power', () => {
    const { checks, needs } = runClaimChecks([fig('thrust', '3 mN')], FREE);
    expect(checks).toEqual([]);
    expect(needs).toEqual([expect.objectContaining({ check: 'photon-bound', missing: ['the input power'] })]);
  });

  it('a heat-pump COP with no temperatures needs them; it is never judged over-unity', () => {
    const { checks, needs, notes } = runClaimChecks([fig('cop', '3.5', 'heating')], { text: 'The heat pump has a COP of 3.5.' });
    expect(checks).toEqual([]);
    expect(needs[0]).toMatchObject({ check: 'carnot', missing: ['the temperature of the hot side', 'the temperature of the cold side'] });
    expect(notes.join(' ')).toMatch(/without breaking any law/);
  });

  it('an engine efficiency with one temperature needs the other', () => {
    const { needs } = runClaimChecks([fig('efficiency', '45 %'), fig('temperature', '600 degC', 'hot')], { text: 'The engine is 45 % efficient at 600 °C.' });
    expect(needs[0]).toMatchObject({ check: 'carnot', missing: ['the temperature of the cold side'] });
  });
});

describe('texts that say no propellant in other words, or leave out the thrust (invented test data)', () => {
  const planned = (text: string) => {
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    return { checks: checks.map((c) => [c.check, c.finding]), needs: needs.map((x) => [x.check, x.missing]) };
  };
  it('"no mass was expelled", "independent of any reaction mass", "does not use any propellant" bring the photon bound', () => {
    for (const text of [
      'A thrust of 2.4e-3 N was measured at an input power of 500 W. No mass was expelled during the run.',
      'The drive gives 2 mN from 100 W, independent of any reaction mass.',
      'The thruster does not use any propellant and gives 2 mN from 100 W.',
    ]) {
      expect(planned(text).checks).toContainEqual(['photon-bound', 'breaks']);
    }
  });
  it('"no rotor blades" denies a propulsor; a thrust "held in hard vacuum" by an air-pusher is propellant-free; a thrust with no power asks for it', () => {
    for (const text of [
      'Our spinning-mass drive lifts itself with 1.5 N. It carries no propellant and no rotor blades, and weighs 300 g.',
      'The asymmetric capacitor lifter keeps 4 mN steady in high vacuum for a whole afternoon, so no ion wind explains it.',
    ]) {
      expect(planned(text).needs).toContainEqual(['photon-bound', ['the input power']]);
    }
    // A drone's rotors still push air.
    expect(readSignals({ text: 'The drone lifts 2 kg with its four rotors.' })).toMatchObject({ propellant: true });
  });
  it('"no gas, no ions leaving the jar" is propellant-free, and a drive set "far ahead of any ion engine" names no propellant of its own', () => {
    // 2 mN from 25 W: 2e-3 × c / 25 = 2.4e4 times the photon bound P/c.
    const text = 'The stacked capacitor rig showed 2 mN on the balance at 25 W input, far ahead of any ion engine. No gas, no ions leaving the chamber.';
    expect(planned(text).checks).toContainEqual(['photon-bound', 'breaks']);
  });
  it('"lifts a weight of 250 g" with no support is a thrust of its weight; "1,5 billions km/h" is a speed', () => {
    // 0.25 kg × 9.80665 m/s² = 2.45 N (g0, SI Brochure 9th ed.); 60 W / c = 2e-7 N.
    expect(planned('The antigravity disc lifts a weight of 250 g with 40 W of electric power.').checks).toContainEqual(['photon-bound', 'breaks']);
    // 1.5e9 km/h = 4.17e8 m/s > c = 299 792 458 m/s (SI Brochure, 9th ed.).
    expect(planned('The new drive will carry the probe at 1,5 billions km/h.').checks).toContainEqual(['light-speed', 'breaks']);
  });
  it('"311 s vacuum Isp" is a specific impulse', () => {
    // Tsiolkovsky (NASA Glenn, "Ideal Rocket Equation"): 311 × 9.80665 × ln(5400/1150) = 4716 m/s ≥ 4.5 km/s.
    const text = 'Our upper stage does 4.5 km/s: 5,400 kg fuelled, 1,150 kg dry, 311 s vacuum Isp.';
    expect(planned(text).checks).toContainEqual(['rocket-equation', 'consistent']);
  });
  it('"1.8 litres of gas a minute" is a gas flow', () => {
    const f = extractFigures('The dry cell under the bonnet gives 1.5 litres of gas a minute from tap water at 25 A.');
    // 1 L/min = 1e-3 m³ / 60 s = 1.6667e-5 m³/s (SI Brochure, 9th ed., Table 8: 1 L = 1 dm³).
    expect(f.find((x) => x.kind === 'gas-flow')?.si).toBeCloseTo((1.5 * 1e-3) / 60, 12);
  });
  it('"without throwing anything out", "no tether": the claim is propellant-free though other drives\' propellant is named', () => {
    // 0.4 N/kW = 4e-4 N/W; × c = 1.2e5 times the photon bound.
    const text =
      'A startup says its gyroscope drive will replace rocket engines. It produces 0.4 newtons of thrust for every kilowatt of electricity, without throwing anything out of the back. "Ion engines are lovely, but they have to carry their propellant," the inventor says.';
    expect(planned(text).checks).toContainEqual(['photon-bound', 'breaks']);
    // A mass inside the device that it pushes on is no reaction mass thrown out (0.8 mN ≫ 150 W / c = 0.5 µN).
    const stack = 'A piezo stack driven with 150 W pushes and pulls on a brass reaction mass, giving a steady thrust of 0.8 mN with no propellant.';
    expect(planned(stack).checks).toContainEqual(['photon-bound', 'breaks']);
    const cart = 'The cart gives a steady push of 0.9 N from a 200 W motor swinging two weights; nothing leaves the cart. Try it floating freely, no tether, and see if it accelerates.';
    expect(planned(cart).checks).toContainEqual(['photon-bound', 'breaks']);
  });
  it('a list said not to be there counts whole; a tether the device is weighed on pushes nothing; an electrodynamic tether does', () => {
    // 0.9 N from 1.1 kW: 0.9 / (1100 / c) ≈ 2.5 × 10⁵ times the photon bound.
    const list = 'Our sealed drive gives 0.9 N of thrust from 1.1 kW. There is no exhaust, propeller or reaction mass: eccentric masses shuttle inside the housing.';
    expect(planned(list).checks).toContainEqual(['photon-bound', 'breaks']);
    const gauge = 'Trial note: 400 W from the cart\'s own batteries, and the force gauge on the tether read 12 N throughout. Nothing leaves the cart.';
    expect(planned(gauge).checks).toContainEqual(['photon-bound', 'breaks']);
    // A conducting tether pushes on the planet's magnetic field: no photon bound for it.
    const tether = 'An electrodynamic tether drives 1.5 A along a 5 km tape and gives 0.2 N from 1 kW, with no propellant.';
    expect(planned(tether).checks.map((c) => c[0])).not.toContain('photon-bound');
  });
  it('an asymmetric capacitor said to push in vacuum ("held below 10⁻⁵ mbar", "in the vacuum chamber … still produced", "pumped to \'near vacuum\'") is held to the photon bound', () => {
    // 22 µN/W × c ≈ 6.6 × 10³ times the photon bound.
    const held = 'In the vacuum chamber, held below 1 × 10⁻⁵ mbar, the asymmetric capacitor stack, charged to 30 kV by a supply drawing 60 W, produced a sustained 22 µN per watt of input.';
    expect(planned(held).checks).toContainEqual(['photon-bound', 'breaks']);
    const still = 'In the vacuum chamber (10-5 mbar) the asymmetric capacitor still produced 1.1 mN at 80 W, showing that the force is not ion wind but a field effect.';
    expect(planned(still).checks).toContainEqual(['photon-bound', 'breaks']);
    const jar = "The same lifter, still at 30 kV and 0.4 mA, under a bell jar pumped to 'near vacuum': the student reports 50 mN of lift still there.";
    expect(planned(jar).checks).toContainEqual(['photon-bound', 'breaks']);
    // In open air it is an ion-wind device: no photon bound.
    expect(planned('The asymmetric capacitor lifter produced 1.1 mN at 80 W in room air.').checks.map((c) => c[0])).not.toContain('photon-bound');
  });
  it('a run in a chamber pumped to a low pressure is in vacuum; an agenda line or a list of artefacts to rule out names no propellant of the claim', () => {
    // 85 µN ≫ P/c = 15 W / c = 5.0e-8 N.
    const vac =
      'In air the familiar ion wind explains everything. They now report 85 µN from the capacitor at 15 W of input in a chamber pumped to 2 × 10⁻⁵ mbar, and state that nothing leaves the electrodes. They must exclude field emission, which does eject mass.';
    expect(planned(vac).checks).toContainEqual(['photon-bound', 'breaks']);
    // 0.44 µN < P/c = 200 W / c = 0.67 µN: consistent, with the photon bound run.
    const lecture = 'Not all propellant-free forces are exotic: a probe radiating 200 W of waste heat recoils with about 0.44 µN.\nNext lecture: solar radiation pressure, where reflection can give up to twice P/c.';
    expect(planned(lecture).checks).toContainEqual(['photon-bound', 'consistent']);
  });

  it('an electrospray thruster emitting droplets carries propellant, whatever class the matcher names', () => {
    const text = 'Electrospray thrusters of this design manage 50–70 µN/W while emitting droplets of ionic liquid.';
    const { checks } = runClaimChecks(extractFigures(text), { text, classes: ['propellant-free-thrust'] });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  });
  it('a propellant-free thruster with a power and no thrust figure needs the thrust', () => {
    expect(planned('Without any propellant, our thruster turns 3 kW of electricity into steady thrust.').needs).toContainEqual(['photon-bound', ['the thrust measured']]);
  });
  it('a self-running machine with no figure needs its output; a named Shockley–Queisser limit with no efficiency needs the efficiency', () => {
    expect(planned('The weighted wheel is self-running and has turned for three weeks, its builder says; no output figure is given.').needs.map(([c]) => c)).toEqual(['first-law']);
    expect(planned("The cell 'breaks the Shockley–Queisser limit' under one sun, the release says, but quotes no efficiency.").needs.map(([c]) => c)).toEqual(['light-converter-limits']);
  });
  it('a rated motor power is not run over a charging time: no false alarm against the pack', () => {
    const r = planned('The electric van has a 75 kWh pack and a 150 kW motor, and charges to 80 % in 40 minutes.');
    expect(r.checks.filter(([, finding]) => finding === 'breaks')).toEqual([]);
  });
});

describe('ranges: the end most favourable to the claim, and said', () => {
  it('photon bound: the lowest thrust and the highest power', () => {
    const { checks } = runClaimChecks([fig('thrust', '3 mN', null, '6 mN'), fig('power', '0.5 kW', 'in', '1.5 kW')], FREE);
    const photon = checks[0];
    expect(photon.inputs).toEqual({ F_claimed: '3 mN', P: '1.5 kW' });
    expect(out(photon, 'ratio')).toBeCloseTo(0.003 / (1500 / C), 6); // F/(P/c)
    expect(photon.assumptions.join(' ')).toMatch(/end most favourable to the claim, 3 mN/);
    expect(photon.assumptions.join(' ')).toMatch(/end most favourable to the claim, 1.5 kW/);
  });

  it('Carnot: the lowest claimed COP', () => {
    const figures = [fig('cop', '3.2', 'heating', '4.1'), fig('temperature', '35 degC', 'hot'), fig('temperature', '8 degC', 'cold')];
    const carnot = runClaimChecks(figures, { text: 'heat pump' }).checks[0];
    // Carnot heating COP Th/(Th − Tc) with T/K = t/°C + 273.15 (NIST SP 811 §4.2.1.1).
    expect(out(carnot, 'cop_heating_ratio')).toBeCloseTo(3.2 / (308.15 / 27), 9);
    expect(carnot.finding).toBe('consistent');
  });
});

describe('lawful devices are reported as consistent with the law', () => {
  it('a heat pump below its Carnot COP', () => {
    const text = 'The air-source heat pump is 350 % efficient, heating water to 45 °C when it is 5 °C outside (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const carnot = checks.find((c) => c.check === 'carnot')!;
    expect(carnot.inputs).toMatchObject({ cop_heating_claimed: '3.5', eta_claimed: '0' });
    expect(out(carnot, 'cop_heating_ratio')).toBeCloseTo(3.5 / (318.15 / 40), 9);
    expect(carnot).toMatchObject({ finding: 'consistent', law: 'the second law of thermodynamics' });
    expect(carnot.sentence).toMatch(/^Consistent with the second law of thermodynamics/);
    expect(checks.some((c) => c.finding === 'breaks')).toBe(false);
  });

  it('a thermoelectric harvester below Carnot', () => {
    const text = 'The thermoelectric generator converts 5 % of the heat into electricity between a 300 °C exhaust and 80 °C coolant (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const carnot = checks.find((c) => c.check === 'carnot')!;
    // Carnot efficiency 1 − Tc/Th.
    expect(out(carnot, 'eta_ratio')).toBeCloseTo(0.05 / (1 - 353.15 / 573.15), 9);
    expect(carnot.finding).toBe('consistent');
  });

  it('a rocket that carries propellant and keeps to its equation', () => {
    const text = 'The stage has a wet mass of 1,200 kg with 800 kg of propellant at an Isp of 320 s, and claims a delta-v of 3 km/s (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const rocket = checks.find((c) => c.check === 'rocket-equation')!;
    // Tsiolkovsky: Δv = Isp·g0·ln(m0/m1) (Sutton & Biblarz, Rocket Propulsion Elements, eq. 4-7; from memory).
    expect(out(rocket, 'dv')).toBeCloseTo(320 * G0 * Math.log(1200 / 400), 6);
    expect(rocket.finding).toBe('consistent');
    expect(checks.find((c) => c.check === 'photon-bound')).toBeUndefined();
  });

  it('a rocket that claims more than its propellant allows breaks it', () => {
    const text = 'A 4 kg CubeSat carrying 200 g of propellant at a specific impulse of 70 s will achieve 300 m/s of delta-v (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const rocket = checks.find((c) => c.check === 'rocket-equation')!;
    expect(out(rocket, 'dv')).toBeCloseTo(70 * G0 * Math.log(4 / 3.8), 6);
    expect(rocket.finding).toBe('breaks');
  });

  it('a quantum efficiency above 100 % is not an energy claim', () => {
    const text = 'Our LED shows an external quantum efficiency of 130 % (invented test data).';
    const { checks, notes } = runClaimChecks(extractFigures(text), { text });
    expect(checks).toEqual([]);
    expect(notes.join(' ')).toMatch(/counts particles/);
  });
});

describe('first-law balances', () => {
  it('powers in and out: the ratio, over one second of steady running (said)', () => {
    const { checks } = runClaimChecks([fig('power', '500 W', 'in'), fig('power', '2 kW', 'out')], { text: 'coil' });
    const fl = checks[0];
    expect(out(fl, 'over_unity')).toBeCloseTo(4, 12);
    expect(fl.finding).toBe('breaks');
    expect(fl.assumptions.join(' ')).toMatch(/does not depend on how long/);
  });

  it('inputs said in different sentences are statements of one input (the largest taken); named forms, or parts in one sentence, are added', () => {
    const ledger = (text: string) => out(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')!, 'over_unity');
    // The claim's 25.2 W in, 32.4 W out; a tester's 28 W drawn in another sentence: the larger input, 28 W.
    expect(ledger('The manuscript claims 25.2 W in and 32.4 W out. Our calorimeter found the unit drew 28 W from the battery (invented test data).')).toBeCloseTo(32.4 / 28, 9);
    // Electricity and gas, each named: all that goes in, 2 kW + 3 kW.
    expect(ledger('It takes 2 kW of electricity. It also burns 3 kW of gas. It delivers 4 kW of heat (invented test data).')).toBeCloseTo(4 / 5, 9);
    // Two parts in one sentence: added.
    expect(ledger('It draws 40 W from the mains and draws 60 W from its battery, and delivers 90 W (invented test data).')).toBeCloseTo(90 / 100, 9);
  });

  it('a power in and an energy out over a stated run', () => {
    const text = 'Over a 72-hour run the generator delivered 90 kWh while its controller drew 400 W (invented test data).';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const fl = checks.find((c) => c.check === 'first-law')!;
    // 1 kWh = 3.6 × 10^6 J (NIST SP 811 Appendix B.8); E_in = 400 W × 72 h.
    expect(out(fl, 'over_unity')).toBeCloseTo((90 * 3.6e6) / (400 * 72 * 3600), 9);
  });

  it('a self-running device with an output breaks it; a self-powered harvester does not get an input of 0', () => {
    const text = 'The self-running generator delivers 2 kW to the house (invented test data).';
    const fl = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')!;
    expect(fl.finding).toBe('breaks');
    const lawful = 'A self-powered sensor harvests 50 µW from vibrations and delivers 20 µW to its radio (invented test data).';
    expect(runClaimChecks(extractFigures(lawful), { text: lawful }).checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  });

  it('an excess over the input: out = in + excess', () => {
    const text = 'The cell gives off 4 W more heat than the 20 W it draws (invented test data).';
    const fl = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')!;
    expect(out(fl, 'over_unity')).toBeCloseTo(24 / 20, 12);
  });

  it('a gain in words', () => {
    const text = 'For every unit of electricity we put in, the amplifier gives back 1.3 (invented test data).';
    const fl = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')!;
    expect(out(fl, 'over_unity')).toBeCloseTo(1.3, 12);
  });
});

describe('speeds against c', () => {
  it('a speed above c is a finding; ordinary speeds are not checked', () => {
    const text = 'The capsule will reach 450,000 km/s (invented test data).';
    const ls = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'light-speed')!;
    expect(out(ls, 'ratio')).toBeCloseTo(4.5e8 / C, 12);
    expect(ls.finding).toBe('breaks');
    expect(runClaimChecks([fig('speed', '30 m/s')]).checks).toEqual([]);
  });
});

describe('signals for the matcher', () => {
  it('a thrust with a power and no propellant points to the propellant-free classes; an over-unity balance to over-unity', () => {
    expect(signalledClasses([fig('thrust', '1 mN'), fig('power', '1 kW')], 'a drive')).toEqual(['propellant-free-thrust']);
    expect(signalledClasses([fig('thrust', '1 mN'), fig('power', '1 kW')], 'a xenon thruster')).toEqual([]);
    expect(signalledClasses([fig('power', '1 kW', 'in'), fig('power', '3 kW', 'out')], 'a coil')).toEqual(['over-unity']);
    expect(readSignals({ text: 'without expelling any propellant' })).toMatchObject({ propellantFree: true, propellant: false });
  });

  it("a converter's Carnot check or a speed set against c points to its entry's class whatever it finds, with no lead for a lawful claim", () => {
    const teg = 'The stove-top thermoelectric generator runs between 180 °C and 40 °C and turns 4.5 % of the heat into electricity.';
    expect(claimSignals(extractFigures(teg), teg)).toEqual({ classes: ['converter-beyond-limit'], leads: [] });
    const beam = 'The accelerator hurls electrons at 0.99 c, a hair below the speed of light.';
    expect(claimSignals(extractFigures(beam), beam).classes).toContain('faster-than-light');
    expect(claimSignals(extractFigures(beam), beam).leads).toEqual([]);
  });

  it('long reports: neither propellant nor radiation leaving, "without the emission of any propellant", a restated rating, a fuel\'s energy content "put at"', () => {
    const checks = (text: string) => runClaimChecks(extractFigures(text), { text });
    // 2 mN ≫ P/c = 900 / 299 792 458 = 3.0 µN.
    expect(checks('A steady thrust of between 2 and 5 mN with 900 W of microwave power; nothing, neither propellant nor radiation, leaves the cavity.').checks.map((c) => [c.check, c.finding])).toContainEqual(['photon-bound', 'breaks']);
    expect(checks('A sealed thruster producing a continuous thrust of 2 mN without the emission of any propellant.').needs.map((n) => n.check)).toContain('photon-bound');
    // 20 Wh = 72 kJ < 5 W × 30 days = 12.96 MJ; "its rated 5 W" restates the radio's draw.
    const pack = 'A 20 Wh lithium pack has powered a 5 W radio continuously for 30 days without recharging. The radio may have drawn far less than its rated 5 W.';
    expect(checks(pack).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    // 52 kWh of fuel in, 2.5 kW × 6 h = 54 MJ out: 0.288.
    const genset = 'The 2.5 kW generator ran a stall through a 6-hour event. The fuel, whose energy content the expert put at 52 kWh, gave a steady 2.5 kW output.';
    expect(checks(genset).checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(54e6 / 187.2e6, 6);
  });

  it('a drive said to need no propellant is held to the photon bound, though a comparison, a question or an agenda line names a propellant engine', () => {
    const photon = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'photon-bound')?.finding;
    // 1.2 N/kW ≫ 1/c = 3.34 µN/kW.
    expect(photon('Your deck says the drive makes 1.2 N/kW with no propellant. How does that compare with an ion engine?')).toBe('breaks');
    // 30 µN from 10 kW of light: under P/c = 33.4 µN.
    expect(photon('A 10 kW fibre-laser photon thruster gave 30 micronewtons; it needs no propellant at all. Next week: two papers on Hall thruster erosion.')).toBe('consistent');
    // "Unlike the propellant-free drives …, our Hall thruster uses xenon": the claimant's own sentence counts.
    expect(photon('Unlike the propellant-free drives in the news, our Hall thruster uses xenon: it produced 80 mN at 1.35 kW. Is that the same as the drives you criticise?')).toBeUndefined();
    // A thruster that does throw out xenon stays out of the photon bound, whatever else the text says.
    expect(photon('It needs no propellant? No: it ejects xenon at 2 mg/s and gives 50 mN on 1 kW.')).toBeUndefined();
  });

  it("an expert's supposed case ('a heater turning 1 kW into 4 kW would break the first law') is not the heat pump's COP", () => {
    // 3.4 kW / 1 kW = 3.4; Carnot COP at 7 °C / 35 °C = 308.15 / 28 = 11.0.
    const text = 'Review: the heat pump gave 3.4 kW of heat for 1 kW of electricity with 7 °C outside and 35 °C flow water. Our expert notes that an ordinary electric heater turning 1 kW into 4 kW would break the first law; a heat pump does not.';
    const carnot = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
    expect(carnot?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(3.4 / (308.15 / 28), 6);
  });

  it('a heat store charged with metered heat is held to the first law, an outdoor temperature elsewhere notwithstanding', () => {
    // 41 000 BTU × 1055.05585262 J/BTU = 43.26 MJ in (NIST SP 811 B.8); 450 W × 20 h = 32.4 MJ out; 0.749.
    const text = 'The store was charged from the roof collectors with 41,000 BTU of heat. Over the following 20-hour stretch it gave back a steady 450 W of heat to the room. The outdoor temperature fell to −3 °C overnight.';
    const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
    expect(run?.finding).toBe('consistent');
    expect(run?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(32.4e6 / (41000 * 1055.05585262), 6);
  });

  it('a lifter said to lift as much in a pumped-down bell jar as in air is held to the photon bound', () => {
    // 30 kV × 1.1 mA = 33 W; 3.5 gf = 3.5 × 9.80665e-3 N = 0.0343 N; P/c = 1.1e-7 N.
    const text = 'A 9 g foil lifter inside a bell jar pumped down to a high vacuum, at 30 kV and 1.1 mA, gives a steady lift of 3.5 grams-force, the same as in air, from a field effect that needs no propellant.';
    expect(runClaimChecks(extractFigures(text), { text }).checks.map((c) => [c.check, c.finding])).toContainEqual(['photon-bound', 'breaks']);
  });

  it('a speed above c and a converter over its limit point to their own classes; a percentage above 100 % leads to its entry', () => {
    const classes = (text: string) => signalledClasses(extractFigures(text), text);
    // 900 million mph × 0.44704 m/s per mph (NIST SP 811 B.8) = 4.02 × 10⁸ m/s > c = 299 792 458 m/s.
    expect(classes('The craft cruised at 900 million mph.')).toContain('faster-than-light');
    // Carnot between 40 °C and 20 °C: 20 / 313.15 = 6.4 % < 12 % claimed.
    expect(classes('With the hot plate at 40 °C and the cold at 20 °C, the thermoelectric module converts 12 % of the heat into electricity.')).toEqual(['converter-beyond-limit']);
    // A figure above 100 % leads to its entry when the words match none (a lead, not a boost).
    const leads = (text: string) => claimSignals(extractFigures(text), text).leads.map((l) => l.mechanismClass);
    expect(classes('The EQE reaches 126 % near the absorption peak.')).toEqual([]);
    expect(leads('The EQE reaches 126 % near the absorption peak.')).toEqual(['efficiency-above-unity']);
    expect(leads('The ordinary heat pump is 350 % efficient.')).toEqual(['efficiency-above-unity']);
  });
});

describe('figures of one finding said far apart', () => {
  const filler = 'The work plan, the budget and the ethics review follow the usual form of the programme. '.repeat(6);
  it('in different paragraphs of a long text: no law is said broken until the reader confirms they belong together', () => {
    // 200 W in < 350 W out would break the first law, but the two figures are some 550 characters and a paragraph apart.
    const text = `The bench unit draws 200 W from the mains.\n\n${filler}\n\nIt puts out 350 W.`;
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.check === 'first-law')).toEqual([]);
    const need = needs.find((n) => n.check === 'first-law');
    expect(need?.missing[0]).toMatch(/^confirmation that “200 W” and “350 W” are figures of one device/);
  });
  it('in one paragraph, or as figures the reader set, the finding stands', () => {
    const text = `The bench unit draws 200 W from the mains. ${filler} It puts out 350 W.`;
    expect(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    // (Typed by hand: no places in the text.)
    const apart = `The bench unit draws 200 W from the mains.\n\n${filler}\n\nIt puts out 350 W.`;
    const typed = extractFigures(apart).map((f) => ({ ...f, start: null, end: null }));
    expect(runClaimChecks(typed, { text: apart }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
  it("in a paper's sections (methods, then results), the apparatus and the findings are one study's", () => {
    // Invented manuscript: 200 W in (methods) < 350 W out (results) breaks the first law.
    const text = `2 Methods\n\nThe bench unit draws 200 W from the mains.\n\n${filler}\n\n3 Results\n\nIt puts out 350 W.`;
    expect(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
});

describe('a reading the text itself contradicts (issue 11: no false alarm)', () => {
  it('in and out figures that give more out than in, where the text states its own efficiency of at most 100 %, wait for the reader', () => {
    // Invented test-sheet: the reader pairs the 24 V nominal rail with the measured current (24 × 10.8 = 259 W)
    // against 48 V × 5.2 A = 249.6 W, but the sheet says the converter's efficiency is 94.6 %.
    const text = 'Converter 48 V in / 24 V out. It drew 249.6 W and delivered 259 W into the load. Efficiency 94.6 %.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
    expect(needs.find((n) => n.check === 'first-law')?.missing[0]).toMatch(/^confirmation of which figures are the device's: .*“249\.6 W” and “259 W”.*“94\.6 %”, which is within it$/);
  });
  it('an efficiency said in another paragraph, of a device the text cites, does not hold back the finding', () => {
    // 1.1 kW in, 1.6 ± 0.2 kW out: at the end kinder to the claim, 1.4/1.1 = 1.27 (over-unity ratio).
    const text =
      'When the converter is fed 1.1 kW from the bench supply, the resistive load bank receives 1.6 ± 0.2 kW.\n\nThe authors compare it with a grid transformer whose efficiency they give as 98.6 %.';
    expectFinding(firstLaw(text), 'breaks', 'over_unity', 1.4 / 1.1, 6);
  });
  it('the same figures with no efficiency stated, or with one above 100 %, are a conflict', () => {
    expect(firstLaw('The box drew 249.6 W and delivered 259 W into the load.')?.finding).toBe('breaks');
    expect(firstLaw('The box drew 249.6 W and delivered 259 W into the load, an efficiency of 104 %.')?.finding).toBe('breaks');
  });
  it('an engine whose stated efficiency is within Carnot is not said to break it on another of its efficiencies', () => {
    // Carnot efficiency between 650 °C and 40 °C: 1 − 313.15/923.15 = 0.661 (textbook formula); the
    // alternator's 90 % is read as the engine's, but the text states 27 % for the engine.
    const text = 'Between a 650 °C head and a 40 °C rejector the generator converts 90 % of its shaft work into electricity, and the engine as a whole is about 27 % efficient.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
    expect(needs.some((n) => n.check === 'carnot' && /“27 %”/.test(n.missing[0]))).toBe(true);
  });
  it('a critic\'s Carnot bound or a rival\'s figure is no statement of the engine\'s own efficiency', () => {
    // 1 − 293.15/363.15 = 0.193 (textbook formula): 71 % breaks Carnot; 19 % is that bound, 12 % a rival's.
    expect(carnot('The engine works between 90 °C and 20 °C and converts 71 % of the heat into electricity. The most any engine can convert there is a little over 19 %.')?.finding).toBe('breaks');
    expect(carnot('The engine works between 90 °C and 20 °C and converts 71 % of the heat into electricity. Competing units reach 12 %.')?.finding).toBe('breaks');
  });
});

describe('outputs in bursts and inputs tied to outputs by an excess (issue 11)', () => {
  it('an output given only in bursts is not multiplied by a run to set against a stored energy', () => {
    // Invented flywheel array: 25 kWh stored, "can deliver 2 MW for short periods", one year in service.
    const text = 'One year in service at the substation.\n\nEach flywheel stores 25 kWh. The array can deliver 2 MW for short periods.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
    expect(needs.find((n) => n.check === 'first-law')?.missing[0]).toMatch(/how long the device ran/);
  });
  it('a steady output over the same run is still compared', () => {
    // 2 kW × 24 h = 48 kWh out against 25 kWh in: ratio 1.92 (energy = power × time, NIST SP 811 §B.8: 1 kWh = 3.6 MJ).
    const text = 'The unit ran for 24 hours.\n\nIt was charged with 25 kWh and delivered a steady 2 kW throughout.';
    expectFinding(firstLaw(text), 'breaks', 'over_unity', 48 / 25, 3);
  });
  it('an input and an output said paragraphs apart are one device\'s when an excess said with the input ties them', () => {
    const filler = 'The calorimeter, its calibration and the gas handling are described in the methods section. '.repeat(6);
    // 20 W in + 4 W excess = 24 W out: over-unity 24/20 = 1.2.
    const text = `After loading, the cell produced 4 W more heat than the 20 W its heater drew.\n\n${filler}\n\nWe read the 24 W of total heat output as evidence of a new process.`;
    expectFinding(firstLaw(text), 'breaks', 'over_unity', 1.2, 6);
  });
});

describe('an excess said with its input, and an output of another paragraph (issue 11)', () => {
  it('the output is the input plus the excess, not a calibration run\'s output said elsewhere', () => {
    // 40 W in + 12 W excess = 52 W out: over-unity 52/40 = 1.3.
    const text = 'In steady operation the cell releases 12 W more heat than the 40 W it draws.\n\nIn calibration, at 40 W the heater was recovered as 39.6 W.';
    expectFinding(firstLaw(text), 'breaks', 'over_unity', 1.3, 6);
  });
});

describe('powers in and out said together, an energy of something else said apart (issue 11)', () => {
  it('the ledger is the powers, not a stated energy of another paragraph against one worked out from them', () => {
    const text =
      "A listener's own figures, a battery charged with five kilowatt-hours, were the worked example.\n\n" +
      'The gadget: it takes in two kilowatts and puts out three point one kilowatts, tested through 10K hours of operation.';
    // 3.1 kW / 2 kW = 1.55 (over-unity ratio); not 3.1 kW × 10 000 h against 5 kWh.
    expectFinding(firstLaw(text), 'breaks', 'over_unity', 1.55, 6);
  });
});

describe('the rocket equation on masses said together (issue 11)', () => {
  it('a wet mass and its propellant on one slide, not that wet mass against a dry mass in a later memo', () => {
    const text =
      "Slide 2. Vehicle: 2.2 t at lift-off, of which 1.6 t is propellant. Engine specific impulse 320 s.\n\nSlide 3. Performance: 9.5 km/s of Δv.\n\n" +
      'Memo. With 2.2 t at lift-off and 0.6 t once the propellant is spent, the mass ratio is 3.67; the rocket equation gives about 4.1 km/s.';
    // Tsiolkovsky: Δv = Isp·g0·ln(m0/m1) = 320 × 9.80665 × ln(2.2/0.6) = 4077 m/s; 9500/4077 = 2.33.
    expectFinding(checkRun(text, 'rocket-equation'), 'breaks', 'dv_ratio', 9500 / (320 * 9.80665 * Math.log(2.2 / 0.6)), 4);
  });
  it('"12 kg fully fuelled and 10.5 kg once the propellant is spent" are the wet and dry masses', () => {
    const masses = extractFigures('The proposal gives the mass as 12 kg fully fuelled and 10.5 kg once the propellant is spent.').filter((f) => f.kind === 'mass');
    expect(masses.map((f) => [f.role, f.si])).toEqual([
      ['wet', 12],
      ['dry', 10.5],
    ]);
    const stage = extractFigures('The stage weighs 24 tonnes fully fuelled, of which 18 tonnes is liquid oxygen and methane.').filter((f) => f.kind === 'mass');
    expect(stage.map((f) => [f.role, f.si])).toEqual([
      ['wet', 24000],
      ['propellant', 18000],
      ['dry', 6000], // worked out: 24 t − 18 t
    ]);
  });
});

describe('no input said in one paragraph, an output in another (issue 11)', () => {
  it('a label for one model is no nil input of another model\'s stored energy', () => {
    const text =
      'Model S: stored energy 5 kWh; rated power 20 kW.\n\nModel M: stored energy 25 kWh; rated power 50 kW.\n\n' +
      "Notes on model M. Journalists call it 'perpetual motion in a box', because a video of a spinning rotor with its cable unplugged circulated. The description is wrong: the rotor slows whenever energy is taken out.\n\nMaintenance: vacuum pump service every three years.";
    const { checks } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  });
  it('a manuscript whose apparatus section says it needs no supply and whose results give its output still breaks the first law', () => {
    const text =
      'Apparatus. The machine is self-running: once started by hand it needs no supply of any kind.\n\nResults. After a hand start it ran for 48 hours without interruption, delivering 250 W to the load bank throughout.';
    // Balance = in − out = 0 − 250 W × 48 h = −4.32 × 10⁷ J (energy = power × time).
    expectFinding(firstLaw(text), 'breaks', 'balance', -250 * 48 * 3600, 0);
  });
});

describe('a heat pump checked on its stated COP (issue 11)', () => {
  it('a gas boiler\'s efficiency in another paragraph is not checked as the heat pump\'s engine efficiency', () => {
    const text =
      "Two heating seasons of a wastewater heat pump with a 1.1 MW compressor. The board calls it 'a machine that gives back 3.1 units of heat for every unit of electricity it takes'; it is a heating COP of 3.1, measured with the outfall water leaving the evaporator at 8 °C and the network supplied at 45 °C, about a third of the Carnot limit.\n\n" +
      "Comparison. A river-source heat pump elsewhere supplies water at 60 °C and achieves a COP of 2.7. A gas boiler, which the installation replaced, turns about 90 % of the fuel's heating value into heat.";
    // Carnot heating COP = Th / (Th − Tc) = 318.15 / 37 = 8.599; 3.1 / 8.599 = 0.3605.
    expectFinding(carnot(text), 'consistent', 'cop_heating_ratio', 3.1 / (318.15 / 37), 4);
  });
});

describe('a store drained by a load, in a comparison of several stations (issue 11)', () => {
  it('the draw over the run said as an energy is what came out; another station\'s solar panel is no source of this one', () => {
    const text =
      'Station A has an 18 kg mast kit with a 100 W solar panel and a small battery.\n\n' +
      "Station C claims it will 'run for two weeks with no sun and no charging at all'. Its battery stores 2.4 kWh when full. The sensors and radio together draw an average of 6 W. Over two weeks at that rate the station uses a little over 2 kWh, which is less than the battery holds.";
    // 2 kWh out of 2.4 kWh stored: over-unity ratio 2/2.4 = 0.833 (within the first law).
    expectFinding(firstLaw(text), 'consistent', 'over_unity', 2 / 2.4, 6);
  });
});

describe('a product family: the model said with its run, and the fuel it brings in (issue 11)', () => {
  it('the power said with its own run is the one taken over it; "a chemical energy of 120 MJ" is what goes in', () => {
    const text =
      'H-500: continuous output 500 W.\n\nH-1100: continuous output 1.1 kW.\n\n' +
      'A full cylinder pack holds hydrogen with a chemical energy of 120 MJ. At full output of 1.1 kW, the H-1100 runs for 15 hours on one pack.';
    // 1.1 kW × 15 h = 59.4 MJ out of 120 MJ: over-unity ratio 0.495 (energy = power × time).
    expectFinding(firstLaw(text), 'consistent', 'over_unity', (1100 * 15 * 3600) / 120e6, 6);
  });
  it('masses that cannot be one craft\'s are asked for, not run', () => {
    const text =
      'A support company delivered a trailer which carries 9 tonnes of liquid oxygen. A 300 g flight computer passed qualification.\n\n' +
      'The upper stage is said to provide a velocity change of 9 km/s with an engine of specific impulse 450 s.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.find((c) => c.check === 'rocket-equation')).toBeUndefined();
    expect(needs.find((n) => n.check === 'rocket-equation')?.missing.join(' ')).toMatch(/masses of the craft/);
  });
});

describe('bounds worked out and stores\' rates (issue 11)', () => {
  it('"for one kilowatt this is 3.34 µN" is the bound worked out; the claimed 3.1 µN per kW is checked', () => {
    const text = 'The satellite steers by the recoil of its infrared laser diodes. Claim 3 recites a thrust of at least 3.1 µN per kW of optical power emitted. A beam pushes back on its source with P/c: for one kilowatt this is 3.34 µN.';
    // 3.1e-6 / (1000 / c) = 0.9294 (F ≤ P/c).
    expectFinding(photon(text), 'consistent', 'ratio', 3.1e-9 * C, 4);
  });
  it('a flywheel charged at 20 kW that can release 250 kW is asked for its energies, not said to break the first law', () => {
    const text = 'The flywheel stores 50 kWh and can release it at 250 kW. It is charged from the grid overnight at a modest rate of 20 kW.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.filter((c) => c.finding === 'breaks')).toEqual([]);
    expect(needs.find((n) => n.check === 'first-law')?.missing[0]).toMatch(/energy put into the store/);
  });
});

describe('the rocket equation in a text on several craft (issue 11)', () => {
  it('takes the masses and exhaust speed from the paragraph that says the claimed Δv', () => {
    const text =
      'Option 1, lander A. Pressure-fed propulsion with a specific impulse of 320 s and a fuelled mass of 900 kg.\n\n' +
      'Option 3, lander C. An engine with an exhaust velocity of 4.4 km/s. Its fuelled mass is 550 kg, and it would arrive with an empty mass of 410 kg. The supplier claims a total velocity change of 1.3 km/s.';
    // Tsiolkovsky: Δv = v_e ln(m0/m1) = 4400 ln(550/410) = 1293.5 m/s; 1300 / 1293.5 = 1.005 (breaks, barely).
    expectFinding(checkRun(text, 'rocket-equation'), 'breaks', 'dv_ratio', 1300 / (4400 * Math.log(550 / 410)), 6);
  });
});

describe('a long document with many figures', () => {
  it('is said to need its figures checked before a result is cited; a short claim is not', () => {
    const para = (i: number) => `Run ${i}: the rig drew ${100 + i} W and gave ${50 + i} W; the room was at ${20 + i} °C.`;
    const long = [1, 2, 3, 4].map(para).join('\n\n');
    expect(runClaimChecks(extractFigures(long), { text: long }).notes[0]).toBe(LONG_DOCUMENT_NOTE);
    const short = 'The rig drew 100 W and gave 50 W.';
    expect(runClaimChecks(extractFigures(short), { text: short }).notes).not.toContain(LONG_DOCUMENT_NOTE);
  });
});

/** The run of one check on a text's own figures (the describe blocks below). */
const checkRun = (text: string, check: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === check);
/** A run's finding and one of its outputs, to `digits` decimals. */
function expectFinding(run: ReturnType<typeof checkRun>, finding: string, output: string, value: number, digits: number): void {
  expect(run?.finding).toBe(finding);
  expect(run!.outputs.find((o) => o.name === output)!.si).toBeCloseTo(value, digits);
}
const carnot = (text: string) => checkRun(text, 'carnot');
const firstLaw = (text: string) => checkRun(text, 'first-law');
const photon = (text: string) => checkRun(text, 'photon-bound');

describe('a document on several devices: the propellant-free one read in its own paragraph (issue 11)', () => {
  it('a bid that says it throws out nothing is held to F ≤ P/c though another bid carries xenon', () => {
    const text =
      'Tender evaluation, lot 2 (invented).\n\nBid A. Two Hall thrusters with a xenon tank; 80 mN per thruster at 1.4 kW.\n\n' +
      "Bid B. A sealed copper cavity giving 'between 2 and 4 mN' from 900 W of microwaves, with no propellant and no plume.\n\nRanking: A first.";
    // The least thrust (2 mN) over the bound of 900 W: 2e-3 / (900 / c) (F ≤ P/c, c exact: BIPM SI Brochure).
    expectFinding(photon(text), 'breaks', 'ratio', 2e-3 / (900 / C), 3);
  });
  it('a lawful thruster is not held to the bound because another paragraph speaks of propellant-free drives', () => {
    const text =
      'Propellant-free drives are sometimes proposed; none has survived a vacuum test.\n\n' +
      'Our gridded ion thruster gives 25 mN at 750 W, with xenon from a 12 kg tank.';
    expect(photon(text)).toBeUndefined();
  });
  it('the bound itself, said as a thrust per power (1/c), is no claim', () => {
    const text = 'Light of power P carries momentum at the rate P/c, so a drive with no propellant gets at best 3.34 nN/W.\n\nA Hall thruster, which uses xenon, gets some 60 mN/kW.';
    expect(photon(text)?.finding).not.toBe('breaks');
  });
});

describe('several COPs in a review: the one said with the sides (issue 11)', () => {
  it("a product's COP said with its ΔT and outlet is checked, not the other products' range in an earlier paragraph", () => {
    const text =
      'Nine datasheets quote heating COPs between 2.6 and 3.4 at their rating points (invented test data).\n\n' +
      'The tenth claims a heating COP of 9 while lifting heat across a ΔT of 45 K to an outlet at 55 °C.';
    // Th = 328.15 K, Tc = 283.15 K; COP_max = 328.15/45 = 7.292 (reversed Carnot); 9 / 7.292 = 1.234.
    expectFinding(carnot(text), 'breaks', 'cop_heating_ratio', 9 / (328.15 / 45), 6);
  });
  it("in one paragraph, the claim's COP said first stands before a test's reading said with the temperatures", () => {
    const text = 'The box says "up to 350 % efficient" for the heat pump. Our lab ran it at 7 °C outside with a flow at 35 °C and measured a COP of 3.3.';
    // COP_max = 308.15/28 = 11.005; 3.5 / 11.005 = 0.318.
    expect(carnot(text)!.outputs.find((o) => o.name === 'cop_heating_ratio')!.si).toBeCloseTo(3.5 / (308.15 / 28), 6);
  });
});

test('a ratio said outright is the claim where the energy in and the power out have no time to join them (invented test data)', () => {
  const text = "The home battery 'gives back 0.91 units for every unit it takes'. The unit stores 13.5 kWh and can deliver up to 5 kW at once.";
  expectFinding(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law'), 'consistent', 'over_unity', 0.91, 9);
});

describe('what a text says of its own figures (issue 11, invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"No input figure was given" is an input not known, not an input of nothing', () => {
    const r = run("The inventor says the generator 'puts out 3 kW, far more than it takes in'. No input figure was given at any point.");
    expect(r.checks.find((c) => c.check === 'first-law')).toBeUndefined();
    expect(r.needs.map((n) => n.check)).toContain('first-law');
  });
  it('"lift without wings, rotors or propellant" says the device throws out nothing', () => {
    const text = 'Slide 1. Lift without wings, rotors or propellant.\n\nSlide 3. The bench unit delivers 1.2 N/kW of electrical input.';
    const photon = run(text).checks.find((c) => c.check === 'photon-bound');
    expect(photon?.finding).toBe('breaks');
    // 1.2 N/kW = 1.2e-3 N/W against 1/c (F ≤ P/c; c exact, BIPM SI Brochure): 1.2e-3 × c = 359 751.
    expect(photon!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo(1.2e-3 * C, 0);
  });
  it("a CHP unit's total efficiency (heat and electricity over fuel) is not held to Carnot; its electrical efficiency is", () => {
    const text =
      "The HL-50 is a gas-engine combined heat and power unit. 'Up to 90 % total efficiency!' Electrical efficiency 41 %. The gas in the cylinders peaks near 1,400 °C; the cooling water leaves at 90 °C.";
    const carnot = run(text).checks.find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
    // η_C = 1 − 363.15/1673.15 = 0.7830; 0.41 / 0.7830 = 0.5237.
    expect(carnot!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.41 / (1 - 363.15 / 1673.15), 6);
  });
});

test("a paragraph that gives both sides is the ledger; a rating alone in another paragraph is not set against its input (invented test data)", () => {
  const text =
    "Complaint: the motor is sold as '500 W' but feels weak on hills.\n\n" +
    'Workshop test: at full assist the controller drew 8.5 A at 48 V from the battery, and the roller measured 340 W at the wheel.';
  // P_in = 8.5 A × 48 V = 408 W; 340 / 408 = 0.8333.
  expectFinding(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law'), 'consistent', 'over_unity', 340 / 408, 9);
});

describe('a craft whose propulsor is denied (issue 11, invented test data)', () => {
  it('"pushes a small boat with 2.5 pounds of thrust from a 3 hp motor, with no propeller and no water jet", nothing leaving the case, is held to F ≤ P/c', () => {
    const run = photon("The sheet says the unit 'pushes a small boat with 2.5 pounds of thrust from a 3 hp electric motor, with no propeller and no water jet'. The case is sealed; nothing leaves it.");
    expect(run?.finding).toBe('breaks');
    // lbf = 4.448 221 615 260 5 N, hp = 745.699 871 582 27 W (NIST SP 811, B.8): F·c/P.
    expect(run!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo((2.5 * 4.4482216152605 * C) / (3 * 745.69987158227), -2);
  });
  it('a boat pushed by a water jet, with no propeller and no exhaust, still throws water out', () => {
    expect(photon('The electric boat has no propeller: a water jet pushes it with 200 N from 3 kW, and there is no exhaust.')).toBeUndefined();
  });
});

test('the speed of light said as a reference ("light travels at about 300,000 km/s") is not judged against c (invented test data)', () => {
  const text = 'The tool shows an effective speed of 156,000 km/s for our fibre link, against about 200,000 km/s for light in glass. In a vacuum light travels at about 300,000 km/s.';
  // The fastest speed judged is the 200,000 km/s of light in glass: 2e8 / c = 0.6671 (c exact, BIPM SI Brochure).
  expectFinding(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'light-speed'), 'consistent', 'ratio', 2e8 / C, 6);
  // A claim of a speed near c is still judged: "the probe reached 300,500 km/s".
  const claim = 'The team says its probe reached 300,500 km/s.';
  expect(runClaimChecks(extractFigures(claim), { text: claim }).checks.find((c) => c.check === 'light-speed')?.finding).toBe('breaks');
});

test('"how much power the falling water carries, and got 12 W": "power the" there is a noun, no output verb (invented test data)', () => {
  const f = extractFigures('We worked out how much power the falling water carries, and got 12 W.');
  expect(f.find((x) => x.kind === 'power')?.role).not.toBe('out');
});

test("a steam turbine's lube-oil cooler is a heat exchanger, not a machine that moves heat (invented test data)", () => {
  const text =
    'Cycle. Live steam at the stop valve 480 °C; condenser saturation 40 °C. Gross cycle efficiency is 31 %.\nGenerator rated 6.2 MW at the terminals.\nLube oil. Cooler duty is 95 kW.';
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.map((o) => o.name)).not.toContain('cop_cooling_ratio');
  // η_C = 1 − 313.15/753.15 = 0.5842; 0.31 / 0.5842 = 0.5306.
  expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.31 / (1 - 313.15 / 753.15), 6);
});

test('a thrust per power near the bound and said as the limit is passed over for the claimed one; alone it is a photon thruster\'s claim (invented test data)', () => {
  const review =
    'The presenter said the sealed box gives a net force with no propellant and nothing leaving the box. ' +
    'The most any device can get from electrical power without expelling mass is about 3.3 µN per kW. The claimed 1.2 N per kW is far beyond that.';
  // 1.2 N/kW = 1.2e-3 N/W; × c = 359 751 (F ≤ P/c; c exact, BIPM SI Brochure).
  expectFinding(photon(review), 'breaks', 'ratio', 1.2e-3 * C, 0);
  const alone = 'For a laser thruster the ideal is 3.3 µN per kW, and our collimated diode array, which emits nothing but light, reaches that figure.';
  // 3.3e-9 × c = 0.9893.
  expect(photon(alone)!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo(3.3e-9 * C, 6);
});

describe('a nil input: said of the device, not asked, not harvested (issue 11, invented test data)', () => {
  it('"needs no supply: no fuel, no sun, no wind" denies a harvest; the run with nothing going in breaks the first law', () => {
    // balance = 0 − 1.5 kW × 14 d × 86 400 s/d = −1.8144 GJ.
    expectFinding(firstLaw('It needs no supply: no fuel, no sun, no wind, no grid connection. It powered a house load of 1.5 kW continuously for two weeks.'), 'breaks', 'balance', -1500 * 14 * 86400, -3);
  });
  it('a buyer\'s answer about a lamp is no harvest of light for a generator said to need no supply', () => {
    const text = "FOR SALE: magnetic generator, self-running, needs no supply once started. Ran our 300 W freezer for 24 hours straight.\n\nQ: Was the freezer running? A: The light was on whenever we looked.";
    expect(firstLaw(text)?.finding).toBe('breaks');
  });
  it('"So it\'s a perpetual motion machine?" asked by a visitor claims no nil input', () => {
    const text = "The flywheel held 25 kWh and could deliver 200 kW for a six-minute burst.\n\nVisitor's question: 'So it's a perpetual motion machine?' Curator: not quite, it only stores what the trams recovered.";
    expect(firstLaw(text)?.finding).not.toBe('breaks');
  });
  it('an engine that draws heat from the surrounding air takes heat in: "no fuel" is no nil input', () => {
    const text = 'A closed-cycle engine draws heat from the surrounding air and converts 35 % of it into shaft work, with no fuel and no sunlight. A unit delivers 3 kW.';
    expect(firstLaw(text)?.finding).not.toBe('breaks');
  });
});

describe('propellant-free drives described the way letters and posters describe them (issue 11, invented test data)', () => {
  it('light bouncing back and forth inside a sealed box is no light sent out', () => {
    // 2.4e-3 / (15 / c) = 47 966.8 (F ≤ P/c).
    expectFinding(photon('A sealed, mirrored box with LEDs inside: the light bounces back and forth many times. Measured force 2.4 × 10⁻³ N with 15 W to the LEDs. No light leaves the box, so there is no exhaust.'), 'breaks', 'ratio', 2.4e-3 / (15 / C), 0);
  });
  it('a stack between a brass reaction mass and a cap pushes on a mass inside the device', () => {
    expect(photon('A stack of piezo discs sandwiched between a brass reaction mass and an aluminium cap produces 0.8 mN at 90 W of drive power. There is no propellant.')?.finding).toBe('breaks');
  });
  it('a lifter put into a vacuum bell jar pumped down hard has no air to push', () => {
    const text = 'We put a sealed lifter into a borrowed vacuum bell jar pumped down hard and measured 45 mN per kW, with nothing coming out of it. In air, lifters work by ion wind.';
    expect(photon(text)?.finding).toBe('breaks');
    // In a jar where the lift vanished, nothing is claimed in vacuum.
    expect(photon('We put the lifter into a vacuum bell jar pumped down hard: the lift vanished. In air it gives 45 mN per kW by ion wind, with nothing coming out of it.')).toBeUndefined();
  });
  it('a lifter said to keep its lift with the air pumped out, or not to need air, or run at 10⁻⁵ mbar', () => {
    // 12 mN against 30 W / c: 0.012 × c / 30 = 119 917 (F ≤ P/c).
    const pumpedOut = 'Ion-wind lifters hover in air. The makers say that in a vacuum chamber their lifter gave 12 mN of thrust from 30 W. "The air was pumped out and the lift remained: it is a true space drive."';
    expectFinding(photon(pumpedOut), 'breaks', 'ratio', (0.012 * C) / 30, 0);
    const noAir = 'Lifters rise in air by ion wind, most say. Ours does not need air at all: in a bell jar it drew 180 W and gave 0.2 N, close to what it gives in open air.';
    expect(photon(noAir)?.finding).toBe('breaks');
    const lowPressure = "Asymmetric capacitor 'lifters' are usually explained by ion wind. In a chamber pumped to 10⁻⁵ mbar we recorded 4 mN at 1 kW, with no ablation of the electrodes and no reaction mass expelled.";
    expect(photon(lowPressure)?.finding).toBe('breaks');
    // The same words, the lift gone in the chamber: nothing is claimed in vacuum.
    expect(photon("Asymmetric capacitor 'lifters' are explained by ion wind: in a chamber pumped to 10⁻⁵ mbar the 4 mN at 1 kW vanished.")?.finding).not.toBe('breaks');
  });
  it('a body said to hover with nothing to push on is held up by its weight, m·g0', () => {
    // 12 g × 9.80665 m/s² (g0 exact, BIPM SI Brochure) = 0.11768 N against 9 W / c: ratio 0.11768 × c / 9 = 3.92 × 10⁶.
    const disc = 'No magnets, no base, no strings. The 12-gram disc floats 3 cm above any desk. Its 9 W board cancels the disc\'s own weight, so nothing pushes on the desk and nothing is blown downwards.';
    expectFinding(photon(disc), 'breaks', 'ratio', (0.012 * 9.80665 * C) / 9, 0);
    // A magnet holds a body up lawfully: no thrust is read from its weight.
    const maglev = 'The 50 g globe floats above its magnetic base, drawing 3 W, with no strings and nothing touching it.';
    expect(extractFigures(maglev).some((f) => f.kind === 'thrust')).toBe(false);
    expect(photon(maglev)).toBeUndefined();
  });
  it("'Ours doesn't': a comparison with engines that need propellant names none of the claim's", () => {
    // 1.2 N/kW = 1.2 × 10⁻³ N/W; × c = 359 751 (F/P ≤ 1/c).
    const text = 'The cavity drive has shown 1.2 N/kW on our torsion balance. For comparison, the best ion engines manage around 0.06 N/kW, and they need propellant. Ours doesn\'t: the microwaves stay in the cavity.';
    expectFinding(photon(text), 'breaks', 'ratio', 1.2e-3 * C, 0);
  });
  it("a stack 'whose mass is modulated in step with the push' is a propellant-free claim", () => {
    // 2.4e-3 N × c / 1100 W = 654.09 (F ≤ P/c).
    expectFinding(photon('The stack (piezo capacitors whose mass is modulated in step with the push) measured 2.4 × 10⁻³ N at 1.1e3 W input.'), 'breaks', 'ratio', (2.4e-3 * C) / 1100, 0);
  });
  it("a comparison after a quoted claim, or in a clause apart from the claimant's own, names no propellant of the claim's", () => {
    // 0.18 N × c / 900 W = 59 958 (F ≤ P/c).
    const quoted = "'The tube itself is pushed: 0.18 N from 900 W on our pendulum stand, with no propellant.' For comparison, a 900 W Hall thruster gives about 50 mN and needs xenon.";
    expectFinding(photon(quoted), 'breaks', 'ratio', (0.18 * C) / 900, 0);
    // 4.7 mN/kW × c = 1409.0.
    const clause = 'The sealed cavity produces thrust with nothing leaving the spacecraft: 4.7 mN per kW. A Hall thruster gives ~60 mN/kW but burns xenon - and our figure of merit improves every quarter.';
    expectFinding(photon(clause), 'breaks', 'ratio', 4.7e-6 * C, 0);
    // The claimant's own thruster that burns xenon keeps its propellant.
    expect(photon('Our Hall thruster gives 60 mN per kW; it burns xenon, with nothing leaving the spacecraft but the plume.')?.finding).not.toBe('breaks');
  });
  it('an analogy or a use proposed for the drive names no propellant of its own', () => {
    const rowing = 'The device gives 0.4 N of thrust from 250 W without expelling any propellant. "It\'s like rowing a boat where the oar gets heavier on the stroke," he said.';
    expectFinding(photon(rowing), 'breaks', 'ratio', (0.4 * C) / 250, 0);
    const uses = 'The brochure claimed 1.2 N per kilowatt and proposed the drive for road vehicles, boats and spacecraft, which would need no propellant at all.';
    expect(photon(uses)?.finding).toBe('breaks');
    // A boat's own propeller is still a propellant word where the text says no more than that.
    expect(photon('Our boat thruster gives 0.4 N of thrust from 250 W, pushing on the water.')?.finding).not.toBe('breaks');
  });
});

describe('labels of a nil input that claim none (issue 11, invented test data)', () => {
  it('"This is not a perpetual motion" denies it', () => {
    expect(firstLaw('The train gives back up to 30 % of its energy when braking; each has a traction power of 1 200 kW. This is not a perpetual motion: it only returns part of what it used.')?.finding).not.toBe('breaks');
  });
  it('"free energy" as a newspaper\'s word for a flywheel bank that stores what it gives is no nil input', () => {
    const text = 'The flywheel bank delivered 100 kW for 15 minutes. The paper wants to write "spinning wheel powers town with free energy". The bank stores 30 kWh when fully spun up.';
    expect(firstLaw(text)?.finding).not.toBe('breaks');
  });
  it('"free energy" with no store named is still a claim of nothing going in', () => {
    expect(firstLaw('The free energy generator powered a 300 W load for 24 hours.')?.finding).toBe('breaks');
  });
});

test('"the speed of light, which is just under 300 000 km/s" is the reference, not a claim (invented test data)', () => {
  const text = 'Electrons race around the ring at 299 000 km/s – almost exactly the speed of light, which is just under 300 000 km/s.';
  // 2.99e8 / c = 0.99736.
  expectFinding(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'light-speed'), 'consistent', 'ratio', 2.99e8 / C, 6);
});

describe('more ways a text says nothing is thrown out, and an engine\'s conversion efficiency (issue 11, invented test data)', () => {
  it('"could hold its orbit without carrying any propellant" says the device throws out nothing', () => {
    const text = 'With 60 W into the sealed cavity the pendulum shows a force of 0,9 mN. A satellite using it could hold its orbit without carrying any propellant.';
    // 0.9e-3 / (60 / c) = 4 496.9 (F ≤ P/c).
    expectFinding(photon(text), 'breaks', 'ratio', 0.9e-3 / (60 / C), 0);
  });
  it('"needing no working fluid", "with nothing leaving it": a poster among other contributions that carry propellant', () => {
    const text =
      'Contribution B presented an electrospray thruster that uses an ionic liquid as propellant, 1.2e-4 N per array.\n\n' +
      "Contribution C reports that a flat capacitor produced a thrust of 2.4 × 10⁻³ N while drawing 1.5 × 10² W in a vacuum chamber, 'needing no working fluid'. If it pushes itself with nothing leaving it, it is bound by P/c.";
    // 2.4e-3 / (150 / c) = 4 796.7 (F ≤ P/c, c exact: BIPM SI Brochure).
    expectFinding(photon(text), 'breaks', 'ratio', 2.4e-3 / (150 / C), 0);
  });
  it('a general sentence on propulsion ("Electric propulsion is limited by its propellant supply") is no propellant of the device', () => {
    const text = 'Electric propulsion is limited by its propellant supply. We report a closed cavity which needs no propellant; at the 250 W used this gave 0.3 N.';
    // 0.3 / (250 / c) = 359 751 (F ≤ P/c).
    expectFinding(photon(text), 'breaks', 'ratio', 0.3 / (250 / C), 0);
  });
  it('"pushes with pure light — no fuel", "never runs out of propellant": a lawful photon thruster below P/c is consistent', () => {
    const text = "The module 'pushes a satellite with pure light — no fuel, no moving parts'. The datasheet gives a thrust of 1.1 µN at an electrical input of 400 W. A module that never runs out of propellant suits long missions.";
    // 1.1e-6 / (400 / c) = 0.8244 (F ≤ P/c).
    expectFinding(photon(text), 'consistent', 'ratio', 1.1e-6 / (400 / C), 4);
  });
  it('a "laser-ablation-free" photon thruster that "does not need propellant": F ≤ P/c, and one figure said twice is no first-law ledger', () => {
    const text =
      "'Laser-ablation-free photon thruster demonstrator'. The demonstrator emits a beam with a total optical output of 2.0e3 W and recorded a force of 6.5e-6 N.\n\nTable 2: optical power 2.0e3 W; measured force 6.5e-6 N.\n\nSuch a thruster does not need propellant in the usual sense.";
    // 6.5e-6 / (2000 / c) = 0.9743 (F ≤ P/c).
    expectFinding(photon(text), 'consistent', 'ratio', 6.5e-6 / (2000 / C), 4);
    expect(firstLaw(text)).toBeUndefined();
  });
  it('a paragraph on a photon thruster is read on its own beside sails and tethers; a lifter pushing air is not a light source', () => {
    const text =
      'Solar sails. A sail pushes against sunlight.\n\nElectrodynamic tethers. A tape pushes against the magnetic field when a current flows.\n\n' +
      'Photon thrusters. The module uses a bank of infrared lasers and is rated at 1.5 µN per kilowatt of electrical input.';
    // 1.5e-6 N per 1000 W against 1/c per watt: 1.5e-9 / (1 / c) = 0.4497 (F ≤ P/c).
    expectFinding(photon(text), 'consistent', 'ratio', 1.5e-9 * C, 4);
    const lifter =
      'The kettle draws 2.2 kW.\n\nThe lifter kit rises on its 30 kV supply; the manual gives 6 mN per watt and calls it field propulsion.\n\nThe lifter is pushing air, like a silent fan: an ion wind.';
    expect(runClaimChecks(extractFigures(lifter), { text: lifter }).checks.filter((c) => c.finding === 'breaks')).toEqual([]);
  });
  it('"no propeller … nothing thrown out of the box" lets the boat of a comparison go', () => {
    const text = 'The box moves forward by itself, like a person in a boat pulling on the rope. With the motor taking 900 W, the box pushed with 18 N. There is no propeller and nothing thrown out of the box.';
    expect(photon(text)?.finding).toBe('breaks');
  });
  it('"a conversion efficiency of 45 % of the heat" is an engine\'s efficiency though a radiator is named', () => {
    const text = 'The working fluid is warmed by pipes in the pond at 25 °C and cooled by a radiator in air 20 °C colder. Our engineers calculate a conversion efficiency of 45 % of the heat taken from the pond.';
    // η_C = 20 / 298.15 = 0.06708; 0.45 / 0.06708 = 6.708.
    expectFinding(carnot(text), 'breaks', 'eta_ratio', 0.45 / (20 / 298.15), 6);
  });
});

describe('false-alarm traps: lawful devices stay consistent (issue 11)', () => {
  const breaks = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.filter((c) => c.finding === 'breaks');
  it.each([
    'The heat pump uses 1 kW of electricity to deliver 4 kW of heat.',
    // An unnamed heat pump drawing heat from the outdoor air: its work in is not stated.
    'The unit collects 3 kW of heat from the outdoor air and delivers 4 kW of heat to the house.',
    // An earlier device in one clause, the new one in the next: the new one is the claim.
    "The inventor's earlier box was said to give 500 W from 100 W; the new unit, tested by the lab, gave 90 W out for 100 W in.",
    // A figure corrected in an erratum: the corrected one stands (Carnot 200 °C / 30 °C: 35.9 % > 4.5 %).
    'The claimed 45 % efficiency was corrected to 4.5 % in the erratum; the thermoelectric module works between 200 °C and 30 °C.',
    // A critic's supposition beside the measured figures (P/c for 900 W = 3.0 µN ≥ 2.9 µN measured).
    "Even if all 900 W left the device as a beam, the recoil would be about 3 µN; the team's laser thruster, measured at 2.9 µN on 900 W, is consistent with that.",
    // A thrust per power said with the quantity between (3.1 µN/kW = 3.1e-9 N/W < 1/c = 3.34e-9 N/W).
    'We measured 3.1 micronewtons of thrust per kilowatt of electrical power; our small satellite gives the laser 20 W.',
    // A store's rating "up to 5 kW at once", and a week of a supposition, are no run of 5 kW for a week.
    "The battery gives back 0.91 units for every unit it takes. It stores 13.5 kWh and can deliver up to 5 kW at once. If the panels are covered in snow for a week it will be empty.",
    // A heat engine's load is not its input (Carnot 33 °C / 28 °C: 1.6 % > 0.25 %).
    'The thermoelectric module sees skin at 33 °C and air at 28 °C and converts 0.25 % of the heat; it delivers 40 µW, and the sensor node needs 25 µW.',
    // The same side at another point is no input (Carnot 300 °C / 50 °C: 43.6 % > 4.5 %).
    'The exhaust generator runs between 300 °C and 50 °C at 4.5 %, delivering 380 W on the motorway, and under 100 W in town traffic.',
    // A store charged: what it holds was calculated "from the temperature rise", not fed from it (43.2 MJ in, 41 MJ stored).
    'The element drew 2 kW for six hours, and the heat stored, calculated from the temperature rise of the salt, was 41 MJ: a charging efficiency of about 95 %.',
    // A report mentioning photovoltaics in passing: no cell's efficiency to hold to the light limits.
    'The heat store charges at about 95 % efficiency.\n\nA referee asked whether it can be charged from photovoltaic surplus; it can.',
    // A worked example: "η = 3.1/172 = 0.018" is 1.8 %, not 3.1 (Carnot 90 °C / 50 °C: 11 %).
    'Its hot face sits at 90 °C with a 40 °C difference across the module; it delivers 3.1 W while 172 W of heat passes through it. (b) η = 3.1/172 = 0.018, or 1.8 %.',
    // The engine's efficiency set off by a clause, and a part's own (Carnot 650 °C / 40 °C: 66 % > 27 %).
    'Brake thermal efficiency, measured as electrical output over heat absorbed at the head, was about 27 %. The heater head ran at about 650 °C and the rejector at 40 °C. The linear alternator by itself converts at 90 %.',
    // Another machine's power beside a thrust given with none: the photon bound needs the drive's own.
    "The sealed cone produced 40 mN of thrust with no propellant; its builder will not say the power. The exhibition also includes a ship's diesel rated at 400 hp.",
    // Light from outside reflected by the craft (up to 2P/c), and a galaxy's recession with the expansion of space.
    'A 1 kW laser pointed at a mirror on the craft pushes it with 6.7 µN (twice P/c, because the light bounces back).',
    'The galaxy recedes at 1.5 c because space itself expands; nothing moves through space faster than light.',
    // A supply's rating is no flow of the load it feeds (12 V × 2 A = 24 W drawn).
    'The 100 W bench supply powers a 12 V, 2 A load for 10 hours.',
    // Machines that turn electricity or fuel into work, heat or light: the temperatures they run at are no reservoirs.
    'Our motor is 92 % efficient, and in the test it ran at 80 °C with the workshop at 20 °C.',
    'The electric kettle is 90 % efficient and heats water from 15 °C to 100 °C in three minutes on 2.2 kW.',
    'The LED lamp converts 45 % of its electricity into light and runs at 60 °C in a 25 °C room.',
    'The fuel cell is 60 % efficient at 80 °C, turning hydrogen into electricity; the room is at 20 °C.',
    'The wood stove is 80 % efficient and heats the room to 21 °C with a flue at 200 °C.',
    // A 500 Wh pack feeding a 5 W average draw for 72 hours (360 Wh), a solar panel named beside it.
    '12 Aug: installed the sensor package, 5 W average draw, on the 500 Wh lithium pack. Solar panel left disconnected for the endurance test. 15 Aug: a 72-hour run completed; the pack still shows charge left. Reconnect the panel before the storm.',
    // Others' claims and a recalled old claim beside the device weighed.
    'Competitors claim their boxes give 500 W from 100 W. The Harlow inverter we tested turned 1,000 W of DC into 940 W of AC.',
    'The expert recalled a 1990s claim of a motor giving 5 kW from 1 kW, which was never shown; the present motor gives 0.9 kW from 1 kW.',
    // An old engine alone is the text's device (Carnot 400 °F / 100 °F: 34.9 % > 18 %).
    'The old mill engine worked between 400 °F steam and a 100 °F condenser at 18 % efficiency, which was good for its day.',
    // One temperature said twice is no pair of sides ("gas entering at 500 °C … 62 % from a 500 °C source").
    'The prototype reaches 62 % thermal efficiency with gas entering at 500 °C. For engines rejecting heat near room temperature, 62 % from a 500 °C source would be close to the limit.',
    // A drone maker as a hoped-for buyer says nothing of the device; as a claimant, of a drone.
    'A drone maker advertises 12 g of thrust per watt for its quadcopter.',
    // A lifter tested in a vacuum chamber that stopped there pushes on air.
    'We tested the ion-wind lifter in a vacuum chamber: 3 grams of lift on 30 W, and it stopped at once when the air was gone.',
    // A photon thruster is a photon rocket: 40 µN from 30 kW of light is under P/c = 100 µN.
    "It's a photon thruster: a fibre laser firing out the back, about 30 kW of light. We'll get up to forty micronewtons; light is a terrible rocket.",
    // A lifter that lifts in air and stops in vacuum pushes on air.
    'Our ion-wind lifter raised 3 grams-force on 33 W in room air; in a bell jar pumped down to a high vacuum it produced no lift at all.',
    // A cell that gives back what it draws has no excess for a nuclear question.
    'A nickel–hydrogen cell with 25 g of nickel gave 20 W of heat for the 20 W of electrical power it drew, over 11 days.',
    // A thermoelectric fan between a stove and the room takes heat in: "without fuel" is not "without input".
    'The stove fan carries a thermoelectric module at 250 °C on the stove, its cold face at 25 °C; it makes 1.5 W, and critics said electricity from a stove without fuel must be perpetual motion.',
    // A battery that carried a 600 W load for 7 hours and was recharged with 5.6 kWh (15.12 MJ out, 20.16 MJ in).
    'The battery was charged in full and then carried the cabinet, a steady 600 W load, for 7 hours. Recharging from the mains afterwards took 5.6 kWh.',
    'Heat output 1.5E+3 W from a 4.0E+2 W compressor; source 5 °C, sink 35 °C.',
    'The beverage cooler removes 2,400 BTU/h from a 35 °F box in a 75 °F room while its compressor draws 200 W.',
    'The 40 dB power amplifier turns a 10 mW input signal into 100 W of output, drawing 180 W from its 48 V supply.',
    'The amplifier has a gain of 30 dB.',
    'An ion-wind lifter (corona discharge in room air) raises 12 gf of payload using 150 W.',
    'The ion engine produces 236 mN on 6.9 kW with an Isp of 4,100 s.',
    'Condensing boiler: 108 % efficient (net CV).',
    'Our 3 kW electric kettle boils 1.5 litres in 2 minutes.',
    'During the outage our 5 kWh home battery ran the 250 W fridge for 18 hours before cutting out.',
    '5-day endurance test of the motor-generator set: mean input 410 W, mean output 395 W. The prototype cost 3,000 € and took 18 months to build.',
    'A temperature difference of 10 K, with the warm side at 300 K, drives the demonstration engine at 2 % efficiency. The room was held at 21 °C for the whole series.',
    'The 12 kg CubeSat carries 1.5 kg of propellant with a specific impulse of 220 s, enough for 280 m/s. The test stand itself weighs 85 kg.',
    'A drone maker advertises 12 g of thrust per watt. Is that beyond the photon limit?',
    'The RF amplifier has 30 dB of gain, 1 mW in and 1 W out, with its 12 V supply drawing 2.5 A.',
    'In the waveguide the phase velocity is 1.3 c, while the group velocity that carries the signal stays at 0.77 c.',
    'The balsa-and-foil lifter raises 9 g (88 mN) at 32 kV and 0.6 mA in room air, with no moving parts.',
    'Datasheet: DC/DC module, input 250 W, output 240 W, efficiency 96 %. Operating range −40 to 85 °C.',
    'The compartment is held at 4 °C while the condenser runs 38 K above it; the measured cooling COP is 2.8.',
    'Bike dynamo: 6 V, 0.5 A for the lamps, from about 10 W of pedalling.',
    'The "self-charging" hybrid recovers about 60 kJ per braking stop; its petrol engine makes 72 kW and does all the real charging.',
    "The jet's blob appears to move at 4c across the sky: apparent superluminal motion, a projection effect.",
    'The bench supply delivers 5 A at 13.8 V to the winch motor, which raises its load at a steady 52 W of mechanical power.',
  ])('"%s" (invented test data) breaks no law', (text) => {
    expect(breaks(text)).toEqual([]);
  });

  it('a heat pump given as heat out and electricity in is judged by its Carnot COP', () => {
    const text = 'Heat output 1.5E+3 W from a 4.0E+2 W compressor; source 5 °C, sink 35 °C (invented test data).';
    const carnot = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot')!;
    // COP = 1500/400 = 3.75 against the Carnot heating COP Th/(Th − Tc) = 308.15/30 (NIST SP 811 §4.2.1.1 for the kelvins).
    expect(out(carnot, 'cop_heating_ratio')).toBeCloseTo(3.75 / (308.15 / 30), 9);
    expect(carnot.finding).toBe('consistent');
  });

  it('a supply and a signal going in are added up; outputs of different forms too', () => {
    const amp = 'The power amplifier turns a 10 mW input signal into 100 W of output, drawing 180 W from its supply (invented test data).';
    expect(out(runClaimChecks(extractFigures(amp), { text: amp }).checks.find((c) => c.check === 'first-law')!, 'over_unity')).toBeCloseTo(100 / 180.01, 9);
    const chp = 'The gas engine burns 100 kW of fuel and supplies 35 kW of electricity plus 50 kW of useful heat (invented test data).';
    expect(out(runClaimChecks(extractFigures(chp), { text: chp }).checks.find((c) => c.check === 'first-law')!, 'over_unity')).toBeCloseTo(0.85, 9);
  });
});

describe('the checks of issue 12, planned from a claim (invented test data)', () => {
  const run = (text: string, classes: string[] = []) => runClaimChecks(extractFigures(text), { text, classes });

  it("Landauer's bound for an energy per bit at a stated temperature", () => {
    const r = run('Our logic gate erases a bit with 1e-22 J per bit at 300 K.');
    const l = r.checks.find((c) => c.check === 'landauer')!;
    // k_B·T·ln 2 with k_B = 1.380649e-23 J/K exactly (SI Brochure, 9th ed., 2019) and T = 300 K.
    expect(out(l, 'E_min')).toBeCloseTo(1.380649e-23 * 300 * Math.LN2, 30);
    expect(l.finding).toBe('breaks');
    // Without a temperature: what it needs, not a default.
    expect(run('Our logic gate erases a bit with 1e-22 J per bit.').needs.map((n) => n.check)).toContain('landauer');
  });

  it('the radiative limits for a solar cell; Shockley–Queisser only where one junction is said', () => {
    const single = run('The single-junction perovskite film converts 52 percent of plain sunlight to electricity.').checks.find((c) => c.check === 'light-converter-limits')!;
    // Landsberg 1 − 4/3·(Ta/Ts) + 1/3·(Ta/Ts)⁴ with Ts = 6000 K, Ta = 300 K (Landsberg and Tonge 1980).
    expect(out(single, 'eta_landsberg')).toBeCloseTo(1 - (4 / 3) * 0.05 + (1 / 3) * 0.05 ** 4, 12);
    expect(single.finding).toBe('breaks'); // above the one-junction limit of about 31 % at one sun
    const any = run('Our solar panel converts 52 percent of plain sunlight to electricity.').checks.find((c) => c.check === 'light-converter-limits')!;
    expect(any.finding).toBe('consistent'); // junctions not said: Landsberg and Carnot only
    expect(any.assumptions.join(' ')).toMatch(/junctions/);
  });

  it('a crystalline-silicon cell has one junction; a tandem two; a panel "in full sun" converts sunlight', () => {
    const mono = run('Our monocrystalline panels are 45 % efficient.').checks.find((c) => c.check === 'light-converter-limits')!;
    expect(mono.inputs).toMatchObject({ junctions: '1' });
    // One junction, even at the sun's full concentration: about 41 % at most (Shockley and Queisser 1961,
    // the detailed-balance limit); 45 % is above it.
    expect(mono.finding).toBe('breaks');
    expect(mono.assumptions.join(' ')).toMatch(/one junction/);
    const tandem = run('Our perovskite-on-silicon tandem panels are 33 % efficient.').checks.find((c) => c.check === 'light-converter-limits')!;
    expect(tandem.inputs).toMatchObject({ junctions: '2' });
    expect(tandem.finding).toBe('consistent');
    const module = run('The module gives 400 W under full sun and is 22 % efficient.').checks.find((c) => c.check === 'light-converter-limits');
    expect(module?.finding).toBe('consistent');
    // A panel that is no solar panel.
    expect(run('The engine panel shows 30 % efficiency at 2000 rpm.').checks.some((c) => c.check === 'light-converter-limits')).toBe(false);
    // The efficiency of an electrical converter behind a panel is no light converter's (invented test data):
    // 9.0 A × 5.0 V = 45 W out for 2.0 A × 24 V = 48 W in, a ratio of 0.9375 and a first-law matter.
    const buck = run('A 94 %-efficient converter for small solar panels: 2.0 A drawn at 24 V on the input side and 9.0 A delivered at 5.0 V on the output side.');
    expect(buck.checks.some((c) => c.check === 'light-converter-limits')).toBe(false);
    expect(buck.checks.some((c) => c.finding === 'breaks')).toBe(false);
  });

  it('says what electrolysis, excess-heat and self-charging-vehicle claims need', () => {
    expect(run('The HHO cell runs on 20 A at 13.8 V and doubles the mileage.').needs.map((n) => n.check)).toContain('faraday-yield');
    expect(run('The palladium cell gave 5 W of excess heat over its 20 W input.').needs.map((n) => n.check)).toContain('nuclear-signature');
    expect(run('This self-charging electric car never needs to be plugged in; its roof turbine gives 3 kW.').needs.map((n) => n.check)).toContain('road-load');
    // And not for a lawful electrolyser or an ordinary car.
    expect(run('The car drew 15 kW on the motorway.').needs.map((n) => n.check)).not.toContain('road-load');
  });
});

describe("Faraday's law for an electrolyser's gas flow (invented test data)", () => {
  it('runs with the cells stated, and says what it needs without them', () => {
    const text = 'The 6-cell HHO generator makes 3 L/min of gas from 20 A at 13.8 V.';
    const f = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'faraday-yield')!;
    // 6 × 20 A / (2F) mol/s of hydrogen, × 1.5 for the mixture, × RT/p at 25 °C and 101.325 kPa;
    // F = e·N_A and R = k_B·N_A exactly (SI Brochure, 9th ed., 2019).
    const F = 1.602176634e-19 * 6.02214076e23;
    const R = 1.380649e-23 * 6.02214076e23;
    const flowMax = ((6 * 20) / (2 * F)) * 1.5 * ((R * 298.15) / 101325);
    expect(out(f, 'flow_max')).toBeCloseTo(flowMax, 12);
    expect(out(f, 'ratio')).toBeCloseTo(3 / 60_000 / flowMax, 9);
    expect(f.finding).toBe('breaks');
    const without = 'The HHO cell makes 3 L/min of gas from 20 A at 13.8 V.';
    const r = runClaimChecks(extractFigures(without), { text: without });
    expect(r.checks.map((c) => c.check)).not.toContain('faraday-yield');
    expect(r.needs.find((n) => n.check === 'faraday-yield')!.missing).toEqual(['how many cells are in series']);
  });
});

describe('the energy per atom of a metal–hydrogen cell (invented test data)', () => {
  it('puts the claimed excess heat on the chemical scale, per atom of the named metal', () => {
    const text = 'The cell is said to have released 4.2 MJ of excess heat over 6 days from 12 g of palladium.';
    const n = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'nuclear-signature')!;
    // Atoms: 12 g / 106.42 g/mol (IUPAC standard atomic weight of Pd) × N_A (6.02214076e23, exact).
    const atoms = (12 / 106.42) * 6.02214076e23;
    expect(out(n, 'atoms_n')).toBeCloseTo(atoms, -10);
    expect(out(n, 'E_per_atom')).toBeCloseTo(4.2e6 / atoms, 25);
    expect(n.finding).toBe('breaks'); // hundreds of electronvolts per atom: beyond chemistry
  });
});

describe('the operation named before its energy (issue 11)', () => {
  test("'each switching event dissipates 1e-18 J at 77 K' runs Landauer's bound", () => {
    const text = 'Each switching event in the cryogenic chip dissipates 1.0 × 10⁻¹⁸ J at 77 K.';
    const { checks } = runClaimChecks(extractFigures(text), { text });
    const c = checks.find((x) => x.check === 'landauer')!;
    // k_B·T·ln 2 with k_B = 1.380649e-23 J/K exactly (SI Brochure, 9th ed., 2019): 7.3688e-22 J at 77 K.
    expect(c.outputs.find((o) => o.name === 'E_min')!.si).toBeCloseTo(1.380649e-23 * 77 * Math.LN2, 30);
    expect(c.finding).toBe('consistent');
  });
});

describe('what a claim lacks, named (issue 11)', () => {
  test('a speed change alone, said of a stage, asks for the rocket equation inputs', () => {
    const text = 'The upper stage is claimed to give its payload 11 km/s of Δv.';
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks).toEqual([]);
    expect(needs.map((n) => n.check)).toEqual(['rocket-equation']);
  });

  test('a current alone in an over-unity claim asks for the voltage and the output', () => {
    const text = 'The pulse motor is said to return more energy than it takes while drawing 1.8 A from its battery.';
    const { needs } = runClaimChecks(extractFigures(text), { text });
    expect(needs.find((n) => n.check === 'first-law')!.missing.join(' ')).toMatch(/voltage/);
  });

  test('a plate radiating from one face in vacuum is held to the photon bound', () => {
    const text = 'A hot plate radiating 2 kW from one face in vacuum gives its mount a push of 4 µN.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'photon-bound')!;
    // F ≤ P/c with c = 299 792 458 m/s exactly (SI Brochure, 9th ed.): 4 µN / (2 kW / c) = 0.5996.
    expect(c.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo((4e-6 * 299792458) / 2000, 9);
    expect(c.finding).toBe('consistent');
  });
});

describe('an engine efficiency checked on a guess the text does not make (invented test data)', () => {
  const plan = (text: string) => runClaimChecks(extractFigures(text), { text, classes: [] });
  test('an efficiency and two temperatures with no heat engine named ask for confirmation instead of a conflict', () => {
    // Carnot bound 1 − 323.15/363.15 = 11.0 %: a 90 % heating plant would "break" it only if it were a heat engine.
    const r = plan('The district heating plant is 90 % efficient, sending water at 90 °C and getting it back at 50 °C.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(r.needs.find((n) => n.check === 'carnot')?.missing[0]).toMatch(/turns heat into work/);
    // (Within the bound, the result stands: 10 % against 19.3 %.)
    expect(plan('The box is 10 % efficient between 90 °C and 20 °C.').checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });
  test("a combustion engine's coolant is not its hot side; an engine said to work between two temperatures is checked", () => {
    const r = plan('Our car engine is 40 % efficient; coolant at 90 °C, air at 20 °C.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(r.needs.find((n) => n.check === 'carnot')?.missing[0]).toMatch(/burning gas/);
    // 1 − 293.15/363.15 = 19.3 % < 40 %: an engine between those temperatures breaks Carnot.
    expect(plan('The engine is 40 % efficient between 90 °C and 20 °C.').checks.find((c) => c.check === 'carnot')?.finding).toBe('breaks');
  });
  test("the text's own words putting the device within its bound ask for confirmation of a reading that breaks it", () => {
    // 1 − 293.15/363.15 = 19.3 % < 40 %: read alone, the check finds the engine past the Carnot bound.
    const text = 'The engine is 40 % efficient between 90 °C and 20 °C, comfortably below the Carnot limit.';
    const r = plan(text);
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(r.needs.find((n) => n.check === 'carnot')?.missing[0]).toMatch(/says it is “below the Carnot limit”/);
    // (A denial or a claim to be within it changes nothing.)
    expect(plan('The engine is 40 % efficient between 90 °C and 20 °C, which is not below the Carnot limit.').checks.find((c) => c.check === 'carnot')?.finding).toBe('breaks');
    expect(plan('The engine is 40 % efficient between 90 °C and 20 °C, claimed to be within the Carnot limit.').checks.find((c) => c.check === 'carnot')?.finding).toBe('breaks');
  });
  test('an LED on a heat sink is no heat engine', () => {
    const r = plan('The LED converts 60 % of its electrical input into light and runs at 50 °C on a 25 °C heat sink.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
});

test("a heat pump's COP past the Carnot bound leads to the entry on figures above 100 %, an engine's efficiency to the engines' (invented test data)", () => {
  // Carnot COP between −10 °C and 55 °C: 328.15/65 = 5.05 < 6.2 claimed (breaks).
  const pump = 'The Orrin 9 heat pump keeps a house on 55 °C radiator water even at −10 °C outdoors, and there it is 620 % efficient.';
  const leads = claimSignals(extractFigures(pump), pump).leads.map((l) => l.mechanismClass);
  expect(leads).toContain('efficiency-above-unity');
  expect(leads).not.toContain('single-reservoir-engine');
  const engine = 'The engine is 40 % efficient between 90 °C and 20 °C.';
  expect(claimSignals(extractFigures(engine), engine).leads.map((l) => l.mechanismClass)).toContain('single-reservoir-engine');
  // (Heat "flowing through it" made electricity: a converter's.)
  const stove = 'The stovepipe generator works across a 20 °C temperature difference, its hot plate at 90 °C, and converts 6 % of the heat flowing through it into electricity.';
  expect(claimSignals(extractFigures(stove), stove).leads.map((l) => l.mechanismClass)).toContain('converter-beyond-limit');
  // (A heat pump within its bound leads there too: the entry explains why its figure is above 100 %.
  // 4.0 against 318.15/40 = 7.95.)
  const lawful = 'On a 5 °C day the air-source heat pump puts 3 kW more heat into the house than the 1 kW of electricity it draws, with 45 °C flow.';
  expect(claimSignals(extractFigures(lawful), lawful).leads.map((l) => l.mechanismClass)).toEqual(['efficiency-above-unity']);
});

test('a water heater whose compressor "pumps warmth out of the air" is a heat pump, whatever entry its words match (invented test data)', () => {
  const text = "Instead of heating water with an element, the unit's small compressor pumps warmth out of the surrounding air. It puts 2.9 kW more heat into your tank than the 1.1 kW of electricity it draws, tested with 5 °C outdoor air and water heated to 45 °C.";
  // COP 4.0/1.1 = 3.636 against the Carnot heating COP 318.15/40 = 7.954 (textbook formula): 0.457 of it.
  const r = runClaimChecks(extractFigures(text), { text, classes: ['overbalanced-wheel'] });
  expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  expect(r.checks.find((c) => c.check === 'carnot')?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(4 / 1.1 / (318.15 / 40), 6);
});

test('a power bank that "refills in about two hours" has not delivered its rated power for those hours (invented test data)', () => {
  const text = 'The power bank can deliver 3 A at 20 V through its USB-C port. Its cells hold 100 Wh, and the pack refills in about two hours from a suitable adapter.';
  const r = runClaimChecks(extractFigures(text), { text });
  expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  expect(extractFigures(text).some((f) => f.kind === 'energy' && f.derived)).toBe(false);
});

test('"needs nothing to push against" says plainly nothing is thrown out: the rockets it is to replace are no propellant of its own (invented test data)', () => {
  const text = "A gyroscopic unit precesses a pair of flywheels. Its builder quotes 0.45 mN per W of motor power, maintains that the unit needs nothing to push against, and expects it to replace rocket engines on satellites.";
  // 0.45 mN/W × c = 1.349 × 10⁵ times the photon bound (c exact, SI Brochure).
  const run = runClaimChecks(extractFigures(text), { text, classes: ['gyroscopic-drive'] }).checks.find((c) => c.check === 'photon-bound');
  expect(run?.finding).toBe('breaks');
  expect(run?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(0.45e-3 * 299792458, 3);
});

test('a distance covered in a stated time, in a text about a signal, is the speed it implies (invented test data)', () => {
  // 12 km / 20 µs = 6 × 10⁸ m/s = 2.001 c (c exact, SI Brochure).
  const text = 'A telecoms company says its new microwave relay sends a pulse across a 12 km link in 20 µs.';
  const f = extractFigures(text);
  expect(f.find((x) => x.kind === 'speed')).toMatchObject({ si: expect.closeTo(6e8, 0), derived: expect.stringMatching(/^speed = distance \/ time/) });
  const run = runClaimChecks(f, { text }).checks.find((c) => c.check === 'light-speed');
  expect(run?.finding).toBe('breaks');
  expect(run?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(6e8 / 299792458, 9);
  // 1,000 km / 2.1 ms; "about 5 ms" for the same distance in ordinary fibre gives no speed of its own.
  const fibre = extractFigures('A light pulse sent through 1,000 km of its new fibre arrived after 2.1 ms. Ordinary telecom fibre would need about 5 ms for the same distance.');
  expect(fibre.filter((x) => x.kind === 'speed').map((x) => x.si)).toEqual([expect.closeTo(1e6 / 2.1e-3, 0)]);
  // (A car's trip is no signal: no speed is made of it.)
  expect(extractFigures('The car drove 100 km in 1 hour.').some((x) => x.kind === 'speed')).toBe(false);
});

test("a pulse's length is no run of a power said apart from it (invented test data)", () => {
  const text = 'The pulsed laser emits 2 J in 10 ns, a peak power of 200 MW, from a flashlamp supply that draws 1.5 kW from the wall.';
  const r = runClaimChecks(extractFigures(text), { text });
  expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  // (A power right beside its pulse still is: 300 kW × 2 ms = 600 J out of 500 J stored.)
  const coil = 'A capacitor bank stores 500 J and the coil then gives 300 kW for 2 ms.';
  expect(runClaimChecks(extractFigures(coil), { text: coil }).checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(1.2, 9);
});

test('"your torch is a rocket!", light that carries the momentum with nothing thrown out: held to the photon bound, and within it (invented test data)', () => {
  const text = 'Fun fact Friday: your torch is a rocket! A torch putting out 1 W of light pushes back on your hand with about 1 nanonewton, because light carries momentum. No fuel, no exhaust.';
  // 1 nN against 1 W / c = 3.336 nN (c exact, SI Brochure): 0.2998.
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'photon-bound');
  expect(run?.finding).toBe('consistent');
  expect(run?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(1e-9 * 299792458, 9);
});

test('"a minute of winding at twenty watts gives forty minutes of listening at a quarter of a watt": each power over its own time (invented test data)', () => {
  const text = 'One minute of winding, which the maker reckons at roughly twenty watts of effort, gives forty minutes of listening at a quarter of a watt.';
  // 0.25 W × 2400 s = 600 J out of 20 W × 60 s = 1200 J in: 0.5.
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
  expect(run?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.5, 9);
  // (A log's "for 5 hours, then discharged at 1.5 kW" keeps its hours: 1.5 kW × 6 h over 2 kW × 5 h = 0.9.)
  const log = 'Battery log: charged at 2 kW for 5 hours, then discharged at 1.5 kW for 6 hours.';
  expect(runClaimChecks(extractFigures(log), { text: log }).checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.9, 9);
});

test("a mini-split's stated heating capacity over its draw is a heating COP, whatever cooling words its name has (invented test data)", () => {
  const text = 'Calloway MiniSplit ductless system. Heating capacity 36,000 BTU/h at 47 °F outdoors with 95 °F supply air, drawing 3.1 kW.';
  // 36,000 BTU/h = 10.55 kW (BTU/h = 0.29307107 W, NIST SP 811 B.8); COP 3.403 against 308.15/26.667 = 11.556.
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo((36000 * 0.29307107) / 3100 / (308.15 / (308.15 - 281.4833333)), 4);
});

test('"130 % efficiency" of a solar cell in a text that says the figure counts electrons per photon is a quantum efficiency: no energy claim (invented test data)', () => {
  const text = "The headline says a lab built a solar cell with 130 % efficiency. Read past it and the figure is an external quantum efficiency: the cell delivers 1.3 electrons to the circuit for each photon that lands on it.";
  const f = extractFigures(text);
  expect(f).toMatchObject([{ kind: 'quantum-efficiency', si: 1.3 }]);
  expect(runClaimChecks(f, { text }).checks.some((c) => c.finding === 'breaks')).toBe(false);
  // (Alone, "130 % efficiency" of a solar cell is an energy claim.)
  expect(extractFigures('The solar cell reached 130 % efficiency, the startup says.')).toMatchObject([{ kind: 'efficiency', si: 1.3 }]);
});

test('a heat engine with the heat it takes and the work it gives is held to Carnot on work out over heat in (invented test data)', () => {
  const text = 'A low-temperature heat engine driven by waste hot water. Hot water at 180 °F enters the heat exchanger, and heat is rejected through a cooling tower at 70 °F. From 10,000 BTU of waste heat per hour the engine delivers 2.5 hp at the shaft.';
  // η = 2.5 hp (745.69987158227 W) / (10,000 BTU_IT/h = 2930.71 W) = 0.6361 (NIST SP 811 B.8);
  // Carnot 1 − 294.261/355.372 = 0.1720 (°F → K = (F − 32)·5/9 + 273.15); ratio 3.699.
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('breaks');
  const eta = (2.5 * 745.69987158227) / ((10000 * 1055.05585262) / 3600);
  const carnot = 1 - ((70 - 32) * 5 / 9 + 273.15) / ((180 - 32) * 5 / 9 + 273.15);
  expect(run?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(eta / carnot, 6);
});

test('a dish engine with the sunlight brought to its receiver and the electricity it gives is held to Carnot on their ratio (invented test data)', () => {
  const text = 'Our Stirling dish delivered two kilowatts of electricity from six point five kilowatts of concentrated sunlight on the receiver. The hot head of the engine was at 650 °C and the cooler at 40 °C.';
  // η = 2/6.5 = 0.3077; Carnot 1 − 313.15/923.15 = 0.6608 (°C → K = C + 273.15); ratio 0.4656.
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(2 / 6.5 / (1 - 313.15 / 923.15), 6);
  // A panel's sunlight is no engine's heat: no Carnot check on a solar cell's output over its light.
  const panel = 'The panel delivered 200 W from 1 kW of sunlight at a cell temperature of 45 °C on a 25 °C day.';
  expect(runClaimChecks(extractFigures(panel), { text: panel }).checks.find((c) => c.check === 'carnot')).toBeUndefined();
});

test("a stove's 'Fuel efficiency 92 %' beside its thermoelectric module's 5 % is no engine's efficiency (invented test data)", () => {
  const text = 'Fuel efficiency 92 %. The fan needs no batteries: a thermoelectric module turns about 5 % of the heat flowing through it into electricity (hot side 230 °C, fins 45 °C), enough to run the 0.9 W fan.';
  // 0.05 / (1 − 318.15/503.15) = 0.05 / 0.36768 = 0.13599 (Carnot, °C → K = C + 273.15).
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(0.05 / (1 - 318.15 / 503.15), 6);
});

test("'For every kWh from the socket its heat pump gives back about 3.2 kWh of heat' is a gain of 3.2 (invented test data)", () => {
  const text = 'For every kWh from the socket its heat pump gives back about 3.2 kWh of heat to the drying air. It picks heat up at 20 °C and delivers it at 65 °C. My old vented dryer used 4.5 kWh a load.';
  const f = extractFigures(text);
  expect(f.find((x) => x.text === '4.5 kWh')?.role).toBe('aside');
  // 3.2 / (338.15 / 45) = 0.42585 (heating COP against Th/(Th − Tc)).
  const run = runClaimChecks(f, { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(3.2 / (338.15 / 45), 6);
  // The new machine that replaced an old one keeps its figures.
  const replaced = extractFigures("The school replaced the old oil boiler with a ground-source heat pump that delivers between 3.2 and 3.8 units of heat for every unit of electricity.");
  expect(replaced.find((x) => x.si === 3.2)?.role).not.toBe('aside');
});

test("a log's shorthand result: 'Brake 1.85 kW; heat in 6.9 kW → 27 %' is the engine's efficiency (invented test data)", () => {
  const text = 'Stirling on the dyno. Heater head 550 °C, cooler water in 35 °C.\nBrake 1.85 kW; heat in 6.9 kW (electric heater head, metered) → 27 %.';
  // 0.27 / (1 − 308.15/823.15) = 0.27 / 0.62565 = 0.43155 (Carnot, °C → K = C + 273.15).
  const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
  expect(run?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(0.27 / (1 - 308.15 / 823.15), 6);
  // A percentage after an arrow with no powers before it is no efficiency of theirs.
  expect(extractFigures('Humidity in the lab → 45 %.').some((f) => f.kind === 'efficiency')).toBe(false);
});

test("a COP said as such with one side logged asks for the other: 'flow 35 °C, compressor 1.45 kW, heat 9.9 kW → COP 6.8' (invented test data)", () => {
  const text = 'HP-12 spot reading: flow 35 °C, compressor 1.45 kW, heat 9.9 kW → COP 6.8. Source side not logged.';
  const r = runClaimChecks(extractFigures(text), { text });
  expect(r.checks.find((c) => c.check === 'carnot')).toBeUndefined();
  expect(r.needs.find((n) => n.check === 'carnot')).toBeDefined();
});

test("a test log of an 'air/water HP prototype' is a heat pump's, whatever entry the matcher ranks first (invented test data)", () => {
  const log = 'Bench 2, air/water HP prototype S/N 0117\n09:10 inlet air 7 °C. Flow setpoint 45 °C.\n09:45 heat to loop 9.47 kW, compressor + fan 2.31 kW on the bench power meter.\nCOP 4.1.';
  // Even with an over-unity class from the matcher, 9.47 kW of heat from 2.31 kW is a heat pump's COP, not a breach.
  const r = runClaimChecks(extractFigures(log), { text: log, classes: ['over-unity-circuit'] });
  expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  // 4.1 / (318.15 / 38) = 0.4897 (heating COP against Th/(Th − Tc)).
  expect(r.checks.find((c) => c.check === 'carnot')?.outputs.find((o) => o.name === 'cop_heating_ratio')?.si).toBeCloseTo(4.1 / (318.15 / 38), 6);
  // A "10 hp unit" is a motor's rating, no heat pump.
  expect(readSignals({ text: 'The pump motor is a 10 hp unit drawing 8.2 kW at full load.' }).heatPump).toBe(false);
});

describe('review texts (invented test data)', () => {
  const runOf = (text: string, check: string) => runClaimChecks(extractFigures(text), { text, classes: [] }).checks.find((c) => c.check === check);
  it('"if … the efficiency comes out below the Carnot value" is a condition, not a statement that the device is within it', () => {
    // 24 °C = 297.15 K, 12 K lower = 285.15 K; Carnot 1 − 285.15/297.15 = 0.0404 (textbook); 9 % is 2.23 times it.
    const r = runOf('The engine works on a temperature difference of only 12 K, with surface water at 24 °C, and the manuscript reports that it converts 9 % of the heat it draws. If the heat input is re-measured and the efficiency comes out below the Carnot value, I would consider a new submission.', 'carnot');
    expect(r?.finding).toBe('breaks');
    expect(r!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.09 / (1 - 285.15 / 297.15), 6);
  });
  it('a binary geothermal plant is a heat engine; a pumped store with a pump-turbine is not', () => {
    expect(runOf('A binary-cycle plant: brine at 140 °C, condensers cooled by air at 25 °C, pumps and fans. The net thermal efficiency is reported as 11 %.', 'carnot')?.finding).toBe('consistent');
    // A gain of 0.78 with a reservoir and a reversible pump-turbine named: the first law on the ratio, consistent.
    const store = runOf("The quarry reservoir, the penstock and the reversible pump-turbine are sound. The summary says the scheme 'gives back 0.78 units for every unit it takes — almost perpetual motion'.", 'first-law');
    expect(store?.finding).toBe('consistent');
    expect(store!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(0.78, 12);
  });
  it('a thrust in vacuum "where no ion wind is possible" is held to the photon bound', () => {
    // 25 W / c = 8.339e-8 N (c exact, SI Brochure); 1.1 mN is 13 191 times that.
    const r = runOf('Our device produces 1.1 mN in high vacuum with 25 W of input power, where no ion wind is possible.', 'photon-bound');
    expect(r?.finding).toBe('breaks');
    expect(r!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo(0.0011 / (25 / 299792458), 0);
  });
});

describe('a headline figure said again beside the sides (invented test data)', () => {
  // Carnot efficiency 1 − Tc/Th = 1 − 303.15/423.15 = 0.28359 (Çengel & Boles, Thermodynamics, ch. 6).
  const story = (restated: boolean) =>
    [
      "Exhaust generator 'turns 41 per cent of waste heat into electricity'",
      '',
      'The firm was founded by two former students of a regional university, who built the first prototypes in a rented workshop and say they spent most of their savings on test equipment before the first investors arrived. The trial will run through the winter on routes between the ports and the inland depots.',
      '',
      `A start-up says its thermoelectric module, fitted inside a lorry's exhaust pipe, ${restated ? 'converts 41 per cent of the heat passing through it into electricity' : 'is ready for a fleet trial'}, and it is seeking investors for a trial with a haulier running sixty vehicles across the north of the country.`,

      '',
      "The company's chief executive told a logistics conference that the module's hot face runs at 150 °C while its cold face, cooled by the engine coolant loop, sits at 30 °C.",
    ].join('\n');
  test('the restatement nearest the sides is checked: the claim breaks Carnot', () => {
    const text = story(true);
    const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot');
    expect(run?.finding).toBe('breaks');
    expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.41 / (1 - 303.15 / 423.15), 9);
  });
  test('said only in the headline, paragraphs from the sides, it waits for the reader to confirm', () => {
    const text = story(false);
    const { checks, needs } = runClaimChecks(extractFigures(text), { text });
    expect(checks.find((c) => c.check === 'carnot')).toBeUndefined();
    expect(needs.find((n) => n.check === 'carnot')?.missing[0]).toMatch(/far apart/);
  });
});

describe("an engine's radiator names no heat pump (invented test data)", () => {
  test('a generator set whose waste heat goes "out through the radiator" is checked against the first law', () => {
    const text = 'The silent generator delivered 5 kW into the load bank for two weeks, and burnt diesel worth 4,800 kWh of chemical energy. The rest went up the exhaust and out through the radiator.';
    const run = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
    expect(run?.finding).toBe('consistent');
    // 5 kW × 14 days × 86 400 s = 6.048 GJ out, against 4,800 kWh = 17.28 GJ in (1 kWh = 3.6 MJ, NIST SP 811 B.8).
    expect(run!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo((5000 * 14 * 86400) / (4800 * 3.6e6), 9);
  });
  test("a house's radiators still speak of space heating", () => {
    expect(readSignals({ text: 'The unit feeds the radiators at 45 °C flow.' }).heatPump).toBe(true);
  });
});

describe('light pushing a mirror (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('a mirror or a sail that light falls on is bounded by 2P/c, a source by P/c', () => {
    // Radiation pressure on a perfect reflector at normal incidence: F = 2P/c (textbook result; c exact,
    // BIPM SI Brochure 9th ed.). 2 × 10 000 W / 299 792 458 m/s = 6.6713e-5 N; 27 µN is 0.4047 of it.
    const sail = run('A 10 kW beam shines on a small sail hanging in a vacuum tank, and the sail is pushed with 27 µN. Nothing is thrown out; the light itself carries the momentum.').checks.find((c) => c.check === 'photon-bound');
    expect(sail?.finding).toBe('consistent');
    expect(sail?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((27e-6 * 299792458) / 20000, 7);
    // A lamp behind its reflector emits: P/c = 3.3356e-6 N for 1 kW; 2.0 µN is 0.5996 of it.
    const lamp = run('A 1 kW infrared emitter behind a parabolic reflector showed 2.0 µN on the balance, all of it attributed to photon pressure.').checks.find((c) => c.check === 'photon-bound');
    expect(lamp?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((2e-6 * 299792458) / 1000, 7);
    // Mirrors inside a sealed cavity push on nothing outside: P/c.
    const cavity = run('The closed optical cavity, two mirrors in a sealed tube, produced 2.6 mN at 600 W of laser input. No gas leaves the tube.').checks.find((c) => c.check === 'photon-bound');
    expect(cavity?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((2.6e-3 * 299792458) / 600, 4);
  });
});

describe('a lifter run under a bell jar, a gyro drive with "nothing coming out" (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"Ran the lifter at 30 kV and 0.5 mA under the bell jar and it held 3 gf of lift. No air to push": the photon bound applies', () => {
    const r = run('Ran the balsa lifter at 30 kV and 0.5 mA under the bell jar and it held 3 gf of lift on the scale. No air to push, so this has to be a field effect.');
    // 30 kV × 0.5 mA = 15 W; P/c = 5.0035e-8 N; 3 gf = 0.0294200 N (NIST SP 811 B.8: gf = 9.80665e-3 N).
    expect(r.checks.find((c) => c.check === 'photon-bound')?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((3 * 9.80665e-3 * 299792458) / 15, 0);
  });
  test('but not where the lift is said to vanish in vacuum ("at 10⁻³ mbar it does not leave the table")', () => {
    const r = run('Triangular lifter driven at 30 kV and 0.8 mA, tested in room air and in a bell jar. In air it hovers with about 25 mN of lift; at 10⁻³ mbar it does not leave the table.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
  test('"No props, no air blowing, nothing coming out": a thrust with only a motor\'s power', () => {
    const r = run('Gyro thruster test: 10 lbs of lift from a 2 hp motor driving the gyros. No props, no air blowing, nothing coming out.');
    expect(r.checks.find((c) => c.check === 'photon-bound')?.finding).toBe('breaks');
  });
});

/** The run of one check on a text's own figures. */
const checkOf = (text: string, check: string) => runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === check);
/** That check's finding on a text, and one of its outputs to the digits given. */
function expectRun(text: string, check: string, finding: string, output: string, value: number, digits = 9) {
  const run = checkOf(text, check);
  expect(run?.finding).toBe(finding);
  expect(out(run!, output)).toBeCloseTo(value, digits);
}

describe("light's own push: a lamp on a vane, a source's recoil (issue 11, invented test data)", () => {
  const photonRun = (text: string) => checkOf(text, 'photon-bound');
  it('a lamp shone on a black vane on a torsion balance is held to P/c though the beam is an outside one', () => {
    const run = photonRun('In the vacuum tank a 500 W xenon arc lamp was focused on a blackened vane hung from a torsion balance; the radiation pressure measured was 1.4 µN.');
    expect(run?.finding).toBe('consistent');
    // F·c/P = 1.4e-6 × 299 792 458 / 500 = 0.8394 (c exact, BIPM SI Brochure).
    expect(out(run!, 'ratio')).toBeCloseTo((1.4e-6 * C) / 500, 6);
  });
  it('a mirror or a foil not said to be black may send the light back: the bound is 2P/c, and said', () => {
    const run = photonRun('Light pressure demo: a 1 kW lamp lights an aluminised foil in the bell jar, and the push read off the balance is 5 µN.');
    expect(run?.finding).toBe('consistent');
    // 2P/c = 2 × 1000 / 299 792 458 = 6.671 µN; 5 µN / 6.671 µN = 0.7495.
    expect(out(run!, 'ratio')).toBeCloseTo((5e-6 * C) / 2000, 6);
    expect(run!.assumptions.join(' ')).toMatch(/2P\/c/u);
  });
  it("a transmitter's own recoil, beamed one way, is P/c", () => {
    const run = photonRun("The probe's 50 W transmitter, beaming in one direction, pushes it with about 0.15 micronewtons.");
    expect(run?.finding).toBe('consistent');
    // 0.15e-6 × c / 50 = 0.8994.
    expect(out(run!, 'ratio')).toBeCloseTo((0.15e-6 * C) / 50, 6);
  });
  it("a radiometer's vanes, pushed by the gas the light warms, and light recycled between mirrors are not held to light's own push", () => {
    expect(photonRun("The radiometer's vanes spin in sunlight: not radiation pressure but the warmed gas pushes them, about 2 mN from 100 W of light.")).toBeUndefined();
    expect(photonRun('Radiation pressure, recycled: the beam bounces back and forth 500 times between two mirrors, so 10 W gives 30 µN.')).toBeUndefined();
    // (The count said after the mirrors: 100 passes of 2P/c = 100 × 2 × 1000 / 299 792 458 = 0.67 mN, lawful only with a mirror elsewhere.)
    expect(photonRun('The photon drive sends a 1 kW laser between two mirrors 100 times over, giving 0.6 mN.')).toBeUndefined();
  });
});

describe('times, totals and sides said in passing (issue 11, invented test data)', () => {
  const firstLaw = (text: string) => checkOf(text, 'first-law');
  it('a store charged slowly and emptied fast: each power over the time said with it, not over the other', () => {
    const run = firstLaw('The unit spins its rotor up over about 10 minutes from a modest ~2 kW motor, then gives up to 500 kW for 1.5-2 seconds.');
    expect(run?.finding).toBe('consistent');
    // In: 2 kW × 600 s = 1.2 MJ; out: 500 kW × 1.5 s (the shortest end) = 0.75 MJ; 0.75 / 1.2 = 0.625.
    expect(out(run!, 'over_unity')).toBeCloseTo(0.625, 9);
    expect(run!.assumptions.join(' ')).toMatch(/1\.5 s.*shortest end/u);
  });
  it('"no supply connected at all", an average output over 30 days and its total: nothing in, the total out', () => {
    const run = firstLaw('Month report, module ZP-4 (no supply connected at all): 30 days, average output 550 W into the test load, 396 kWh total.');
    expect(run?.finding).toBe('breaks');
    // 396 kWh = 396 × 3.6 MJ = 1.4256 GJ out (kWh = 3.6 MJ, NIST SP 811 B.8); nothing in.
    expect(out(run!, 'E_out')).toBeCloseTo(396 * 3.6e6, 0);
    expect(out(run!, 'E_net_in')).toBe(0);
  });
  it('"650 °C hot head / 45 °C cooler water": the second side named in parallel, not a difference of 45 K', () => {
    const text = 'Stirling rig: 27.5 % thermal at 650 °C hot head / 45 °C cooler water.';
    const carnot = checkOf(text, 'carnot');
    expect(carnot?.finding).toBe('consistent');
    // η_C = 1 − 318.15/923.15 = 0.65536; 0.275 / 0.65536 = 0.4196.
    expect(out(carnot!, 'eta_ratio')).toBeCloseTo(0.275 / (1 - 318.15 / 923.15), 6);
  });
});

describe("a year's ledger of a plant and a heat pump's proposal (issue 11, invented test data)", () => {
  const checks = (text: string) => runClaimChecks(extractFigures(text), { text }).checks;
  it('labels name the forms: electricity and heat recovered are added against the gas in, and the gas is no auxiliary load', () => {
    const text =
      "Farm AD plant, notes for the accounts. Gas to the engine over the year, by the analyser's count: 780 MWh. Electricity exported plus own use: 301 MWh. Heat recovered off the jacket and exhaust to the dryer: 340 MWh.";
    const first = checks(text).find((c) => c.check === 'first-law');
    expect(first?.finding).toBe('consistent');
    // (301 + 340) / 780 = 0.8218 (energies in one unit; no conversion).
    expect(out(first!, 'over_unity')).toBeCloseTo((301 + 340) / 780, 9);
  });
  it('"3.4 kWh of heat for every kWh of electricity" is the heating COP, whatever annual totals the proposal gives', () => {
    const text =
      'Recommended system: 8 kW air-to-water heat pump. Rated at A7/W35, that is with outdoor air at 7 °C and water leaving at 35 °C it delivers 3.4 kWh of heat for every kWh of electricity. Annual demand is 11,200 kWh; we expect it to use about 3,300 kWh of electricity a year.';
    const carnot = checks(text).find((c) => c.check === 'carnot');
    expect(carnot?.finding).toBe('consistent');
    // COP_max = 308.15 / 28 = 11.005 (Çengel & Boles, ch. 6); 3.4 / 11.005 = 0.3089.
    expect(out(carnot!, 'cop_heating_ratio')).toBeCloseTo(3.4 / (308.15 / 28), 6);
  });
});

test('"runs 6 h a day … say 120 days" is a run of 720 h, not of 120 days round the clock; a rating "(output)" in brackets is the output (invented test data)', () => {
  const text = 'Irrigation pump. Motor plate: 1.1 kW (output), 230 V single phase. Runs 6 h a day from mid-May to mid-September, say 120 days, so about 1,190 kWh on the meter for the season.';
  const run = checkOf(text, 'first-law');
  expect(run?.finding).toBe('consistent');
  // Out: 1.1 kW × 6 h × 120 = 792 kWh; in: 1,190 kWh; 792 / 1190 = 0.6655.
  expect(out(run!, 'over_unity')).toBeCloseTo((1.1 * 6 * 120) / 1190, 9);
});

test('a battery that supplies the driver board is the input; "24 hours a day" is how it runs, and a year of savings no run (invented test data)', () => {
  const text =
    'It runs from an ordinary 12 V leisure battery, which supplies 8 A to the driver board. Out of the other side you get 230 V at 1.5 A, enough to run a fridge, lights and a TV, 24 hours a day. In a year it saves about €1,100 on electricity.';
  const run = checkOf(text, 'first-law');
  expect(run?.finding).toBe('breaks');
  // In: 12 V × 8 A = 96 W; out: 230 V × 1.5 A = 345 W; 345 / 96 = 3.594.
  expect(out(run!, 'over_unity')).toBeCloseTo(345 / 96, 9);
  // (A store that delivers to the motor it runs gives out what it delivers.)
  const pack = 'Over eight hours the pack delivered 9.6 kWh to the drive motor; the charger had drawn 11.2 kWh from the grid to fill it.';
  expect(out(checkOf(pack, 'first-law')!, 'over_unity')).toBeCloseTo(9.6 / 11.2, 9);
});

describe('what a text totals, compares and labels (issue 11, invented test data)', () => {
  const checks = (text: string, classes: string[] = []) => runClaimChecks(extractFigures(text), { text, classes }).checks;
  it('"45 m/s a year for 15 years: 675 m/s in all" — the total is the Δv claimed', () => {
    const run = checks('Our platform carries 12 kg of green monopropellant (Isp 230 s) on an 88 kg dry bus. That gives it 45 m/s of station-keeping a year for 15 years: 675 m/s in all.').find((c) => c.check === 'rocket-equation');
    expect(run?.finding).toBe('breaks');
    // Δv = 230 × 9.80665 × ln(100/88) = 288.33 m/s (Tsiolkovsky; g0 exact, NIST SP 811); 675 / 288.33 = 2.341.
    expect(out(run!, 'dv_ratio')).toBeCloseTo(675 / (230 * G0 * Math.log(100 / 88)), 4);
  });
  it('a helicopter the device is set against ("a hundredth of a helicopter\'s") is no propellant of its own', () => {
    const run = checks('The four counter-rotating gyros, precessed in sequence, gave 250 N of lift on the load cell while the motors drew 1.5 kW. The energy cost is a hundredth of a helicopter\'s.', ['gyroscopic-drive']).find((c) => c.check === 'photon-bound');
    expect(run?.finding).toBe('breaks');
    expect(out(run!, 'ratio')).toBeCloseTo((250 * C) / 1500, -2);
  });
  it('"Energy to the driver over a 24-hour run: 0.96 kWh" is the input, its power over the run the power of a propellant-free thrust', () => {
    const run = checks('Mass-modulation thruster MM-4. Net thrust 25 µN over five runs. Energy to the driver over a 24-hour run: 0.96 kWh. No propellant; the device is sealed in a vacuum can.').find((c) => c.check === 'photon-bound');
    expect(run?.finding).toBe('breaks');
    // P = 0.96 × 3.6 MJ / 86 400 s = 40 W; F·c/P = 25e-6 × c / 40 = 187.4.
    expect(out(run!, 'ratio')).toBeCloseTo((25e-6 * C) / 40, 3);
  });
  it('a current drawn from the battery whose voltage another sentence gives makes the input', () => {
    const text = 'A ten-stage ladder fed from a flyback oscillator, all running off one 9 V PP3 battery. With the corona wire in place the battery draws somewhere between 150 and 180 mA. Output is ~6 kV and I am getting roughly 0.6 W out.';
    const run = checks(text).find((c) => c.check === 'first-law');
    expect(run?.finding).toBe('consistent');
    // In: 9 V × 0.18 A = 1.62 W (the end kinder to the claim); 0.6 / 1.62 = 0.3704.
    expect(out(run!, 'over_unity')).toBeCloseTo(0.6 / 1.62, 9);
  });
});

test('"going into the coil" and "coming out into the cap"; a current and voltage said again as a power with its side (invented test data)', () => {
  const coil = 'Scope says 2.4e-3 J going into the coil per pulse (integrated V×I on the input channel) and 3.1e-2 J coming out into the cap on the collector side.';
  const first = checkOf(coil, 'first-law');
  expect(first?.finding).toBe('breaks');
  expect(out(first!, 'over_unity')).toBeCloseTo(3.1e-2 / 2.4e-3, 9);
  const motor = 'I put the clamp meter on it under a steady cut: 7.2 A at 120 V. That is 864 W going in, for a motor rated at about 560 W out.';
  const m = checkOf(motor, 'first-law');
  expect(m?.finding).toBe('consistent');
  // 560 / (7.2 × 120) = 0.6481.
  expect(out(m!, 'over_unity')).toBeCloseTo(560 / 864, 9);
});

describe('a COP said after an aside, a fuel tank said not needed, energies per pulse (issue 11, invented test data)', () => {
  const checks = (text: string) => runClaimChecks(extractFigures(text), { text }).checks;
  it('"The compressor\'s cooling COP at that condition, from our calorimeter, is 2.1" is the cooling COP', () => {
    const run = checks('Chest freezer test: we held the cabinet at −18 °C in a 32 °C test room. The compressor\'s cooling COP at that condition, from our calorimeter, is 2.1.').find((c) => c.check === 'carnot');
    expect(run?.finding).toBe('consistent');
    // COP_c,max = 255.15 / 50 = 5.103 (Çengel & Boles, ch. 6); 2.1 / 5.103 = 0.4115.
    expect(out(run!, 'cop_cooling_ratio')).toBeCloseTo(2.1 / (255.15 / 50), 6);
  });
  it('"a satellite need never carry a fuel tank again" names no propellant of the drive', () => {
    const run = checks('Result: 12 mN per kW, with no propellant and no exhaust. Our 3 kW bench unit pushed 36 mN on the pendulum. A 1,000 kg satellite need never carry a fuel tank again.').find((c) => c.check === 'photon-bound');
    expect(run?.finding).toBe('breaks');
    expect(out(run!, 'ratio')).toBeCloseTo((0.036 * C) / 3000, 0);
  });
  it('"charges its coil with 50 J per cycle … delivers 600 J per pulse" are the energies in and out of one pulse', () => {
    const run = checks('Our pulse generator charges its coil with 50 J per cycle and, with a loaded Q of 12, delivers 600 J per pulse to the load bank.').find((c) => c.check === 'first-law');
    expect(run?.finding).toBe('breaks');
    expect(out(run!, 'over_unity')).toBeCloseTo(12, 9);
  });
});

test('"72 hours later the lamps were still lit" is the run ("were" names no supposition) (invented test data)', () => {
  const text = 'The 5 kWh battery bank powers the drive motor, which turns the generator, which recharges the bank. Last week we connected a 400 W lamp load and let it run. 72 hours later the lamps were still lit.';
  const run = checkOf(text, 'first-law');
  expect(run?.finding).toBe('breaks');
  // Out: 400 W × 72 h = 28.8 kWh against the 5 kWh bank: 5.76.
  expect(out(run!, 'over_unity')).toBeCloseTo((400 * 72) / 5000, 9);
});

test('a heater said to have no outdoor unit and no refrigerant gets no COP from its heat over its electricity; an output "added to the engine\'s output" is output (invented test data)', () => {
  const heater = "Independent test, hydrodynamic heater (no outdoor unit, no refrigerant). During a 72-hour run the electricity meter logged 86.4 kWh. Over the same period the heat meter recorded 105–110 kWh delivered to the radiators.";
  // The lower end of the heat, kinder to the claim: 105 / 86.4 = 1.2153.
  expectRun(heater, 'first-law', 'breaks', 'over_unity', 105 / 86.4, 9);
  const booster = "The cell runs from your vehicle's alternator at 14.2 V, drawing about 45 A. The gas it makes is piped into the air intake, where its combustion adds up to 2.1 kW to the engine's output.";
  // 2100 / (14.2 × 45) = 3.2864.
  expectRun(booster, 'first-law', 'breaks', 'over_unity', 2100 / (14.2 * 45), 9);
});

test('"with no mains connection and no solar panel" is nothing in (invented test data)', () => {
  const text = 'The charger keeps its own 12 V gel battery topped up while running a 60 W lamp. We ran it for a 72-hour stretch with no mains connection and no solar panel; the battery read full at the start and still full at the end.';
  // 60 W × 72 h = 15.552 MJ out of nothing.
  expectRun(text, 'first-law', 'breaks', 'E_out', 60 * 72 * 3600, 0);
  expect(out(checkOf(text, 'first-law')!, 'E_net_in')).toBe(0);
});

test('"give or take 10 %" is an uncertainty; a battery\'s size beside what was drawn from it is no input (invented test data)', () => {
  const unit = 'In our bench runs it draws between 350 and 400 W from the mains and feeds about 3 kW, give or take 10 %, back into the house circuit.';
  // The ends kinder to the claim: 2.7 kW out (3 kW − 10 %) over 400 W in = 6.75.
  expectRun(unit, 'first-law', 'breaks', 'over_unity', 2700 / 400, 9);
  const car = "Drove to my sister's, 2 h on the motorway. Car says 18.4 kWh used from the battery; the logger shows an average 7.2 kW at the wheels. Battery is 58 kWh, was at 80 % when I left.";
  // 7.2 kW × 2 h = 14.4 kWh out of 18.4 kWh: 0.7826.
  expectRun(car, 'first-law', 'consistent', 'over_unity', 14.4 / 18.4, 9);
});

test('an output with what went in said to be unknown ("without a charge", "we don\'t have the readings") needs the input, and is not judged (invented test data)', () => {
  for (const text of [
    'They sent us one of their cells to try. It has run our 5 W router for three weeks now without a charge.',
    'The unit makes 1 kW of electricity and 6 kW of heat when it runs, 4,000 running hours last year. The gas bill was paid by the council and we don\'t have the readings.',
  ]) {
    const r = runClaimChecks(extractFigures(text), { text });
    expect(r.checks.find((c) => c.check === 'first-law')).toBeUndefined();
    expect(r.needs.map((n) => n.check)).toContain('first-law');
  }
});

describe('a current at a three-phase line voltage (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('said three-phase, the current and voltage give √3 × V × I (the most a power factor of 1 allows)', () => {
    // √3 × 400 V × 10.6 A = 7,344 W (the three-phase power formula, P = √3 V_L I_L cos φ; textbook, from memory).
    const f = extractFigures('Motor plate: 5.5 kW, 400 V 3~, 10.6 A.').find((x) => x.kind === 'power' && x.derived);
    expect(f?.si).toBeCloseTo(Math.sqrt(3) * 400 * 10.6, 6);
    expect(f?.derived).toMatch(/√3/u);
    // Said single-phase, the plain product stands: 230 V × 7.2 A = 1,656 W.
    expect(extractFigures('Pump motor, single phase: 7.2 A at 230 V.').find((x) => x.kind === 'power' && x.derived)?.si).toBeCloseTo(1656, 6);
  });
  it('an output above current × voltage at 400 V, phases unsaid, but within √3 of it is no claim of more out than in', () => {
    // 2.2 kW > 4.8 A × 400 V = 1,920 W, but < √3 × 1,920 W = 3,326 W.
    const r = run('Your 2.2 kW borehole pump motor has a full-load current of 4.8 A at 400 V.');
    expect(r.checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
    // Beyond √3 it still breaks: 6 kW out from 4.8 A × 400 V (6,000 / 3,326 = 1.8).
    const beyond = run('Our generator head gives 6 kW out while its drive motor draws 4.8 A at 400 V.');
    expect(beyond.checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    // From a battery at 400 V the product is the power: 1.4 kW from 2.5 A × 400 V = 1 kW breaks.
    const stack = run('At 400 volts on the battery (the current stays near 2.5 amperes) the discharge engine delivers 1.4 kW.');
    expect(stack.checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
});

describe("a store's size, a bracket's own figure, and several temperatures of one side (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it("a pack's size read as what it gave is set aside where the device's own powers are given", () => {
    const text = 'The 1.2 kWh Li-ion pack is sized for one 45-minute firing per orbit. Thruster: 600 W discharge power, 38 mN.';
    const f = extractFigures(text);
    expect(f.find((x) => x.text === '1.2 kWh')?.role).not.toBe('out');
    expect(run(text).checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
  });
  it('the words in a bracket that holds its own figure are not the figure before it', () => {
    const f = extractFigures('Optical output 5.0 kW (draw from the pack about 12 kW).');
    expect(f.map((x) => [x.text, x.role])).toEqual([
      ['5.0 kW', 'out'],
      ['12 kW', 'in'],
    ]);
  });
  it('an engine with two cold temperatures is checked against the colder (most favourable to the claim)', () => {
    // Carnot: 1 − 313.15 / 838.15 = 0.6264 (textbook); 0.41 / 0.6264 = 0.6546. Against the 290 °C tank it would be 0.41 / 0.3281 = 1.25.
    const r = run('Hot tank 565 °C, cold tank 290 °C. The steam cycle, condensing at 40 °C, converts 41 % of the heat drawn from the salt into electricity.').checks.find((c) => c.check === 'carnot');
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'eta_ratio')?.si).toBeCloseTo(0.41 / (1 - 313.15 / 838.15), 6);
  });
  it('"max." is no end of a sentence: an inverter\'s "max. efficiency" is no solar cell\'s', () => {
    const text = 'Nameplate on my 5 kW hybrid inverter: 5000 W AC continuous, 6500 W max PV input, max. efficiency 97.6 %.';
    expect(run(text).checks.map((c) => c.check)).not.toContain('light-converter-limits');
    // A panel's own efficiency is still checked against the limits of light conversion.
    expect(run('The PV module is rated at 400 W, with a max. efficiency of 21.3 % under one sun.').checks.map((c) => c.check)).toContain('light-converter-limits');
  });
});

describe("a store's sheet and a store said to run with nothing charging it (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"Charging …:" and "Discharge …:" label a store\'s two sides; "under charge:" in another label does not', () => {
    const f = extractFigures('Charging from standstill: 2,04 kWh on the DC side. Discharge into the resistor bank down to standstill: 1,79 kWh.');
    expect(f.map((x) => [x.text, x.role])).toEqual([
      ['2,04 kWh', 'in'],
      ['1,79 kWh', 'out'],
    ]);
    // 1.79 / 2.04 = 0.8775: consistent.
    expect(run('Charge energy: 2.04 kWh. Discharge energy: 1.79 kWh.').checks.find((c) => c.check === 'first-law')?.finding).toBe('consistent');
    const charger = extractFigures('Input: 12 V DC, 0.4 A. Output to the battery under charge: 13.8 V at 2.1 A.');
    expect(charger.find((x) => x.kind === 'power' && x.si > 20)?.role).not.toBe('in');
  });
  it("with nothing charging it, a store's size is all that went in", () => {
    // 350 W × 72 h = 25.2 kWh out of a 5 kWh pack: 5.04 times.
    const text = 'The pack is only 5 kWh, but over 72 hours it ran the base load, around 350 W, with the panels disconnected and no generator.';
    const r = run(text).checks.find((c) => c.check === 'first-law');
    expect(r?.finding).toBe('breaks');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo((350 * 72) / 5000, 6);
    // The same pack over 12 hours: 4.2 kWh of 5 kWh, consistent.
    expect(run('The pack is only 5 kWh, but over 12 hours it ran the base load, around 350 W, with the panels disconnected.').checks.find((c) => c.check === 'first-law')?.finding).toBe('consistent');
    // 12 V × 100 Ah = 1.2 kWh; 5 A × 12 V × 168 h = 10.08 kWh: 8.4 times.
    const battery = run('Pair any 12 V 100 Ah battery with the board and run a 5 A load for 168 hours without plugging in.').checks.find((c) => c.check === 'first-law');
    expect(battery?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(8.4, 6);
  });
});

describe('an appliance plugged into a store, and what a device pushes out (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"Plug in your 900 W heater … without ever going back on the mains": the heater is the load and the battery all that went in', () => {
    // 900 W × 8 h = 7.2 kWh from a 1.2 kWh battery: 6 times.
    const r = run('NightPack: a 1.2 kWh battery with a built-in alternator. Plug in your 900 W heater and it runs 8 hours every night without ever going back on the mains.').checks.find((c) => c.check === 'first-law');
    expect(r?.finding).toBe('breaks');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(6, 6);
  });
  it('"pushes 150 W into your appliances" is given out; a battery that pushes a current gives the device its input', () => {
    expect(extractFigures('Once primed, it draws only 2 A at 12 V from its starter battery and pushes 150 W of clean AC into your appliances.').find((x) => x.text === '150 W')?.role).toBe('out');
    // 1.2 kW at the wheel of 48 V × 30 A = 1,440 W: 0.83, consistent.
    const bike = run('Its 48 V battery can push up to 30 A into the hub motor on steep climbs, and the motor turns about 1.2 kW of that into work at the wheel.');
    expect(bike.checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
  });
});

describe('a COP that "measures", a wet mass below the dry, "more than you put in" (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"the unit\'s COP measures 1.9" is a COP', () => {
    expect(extractFigures("With the condenser at 32 °C, the refrigeration unit's COP measures 1.9.").find((x) => x.kind === 'cop')?.si).toBe(1.9);
  });
  it('a mass read as wet but below the dry mass is the propellant loaded', () => {
    // Tsiolkovsky: 1600 m/s × ln(80 / 62) = 407.8 m/s ≥ 350 m/s claimed: consistent.
    const r = run('Hydrogen-peroxide monopropellant, 18 kg loaded, spacecraft dry mass 62 kg. Exhaust velocity 1.6 km/s. Δv available: up to 350 m/s.').checks.find((c) => c.check === 'rocket-equation');
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'dv_ratio')?.si).toBeCloseTo(350 / (1600 * Math.log(80 / 62)), 6);
  });
  it('"gives you back more than you put in" with only an output needs the input', () => {
    const r = run('The flywheel UPS gives you back more than you put in: a full-speed rotor delivers 3.6 MJ to your critical load.');
    expect(r.needs.map((n) => n.check)).toContain('first-law');
  });
});

describe('spoken claims: a loop asked about, what a tank holds, a fridge run as a load (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const firstLaw = (text: string) => run(text).checks.find((c) => c.check === 'first-law');
  it('a loop someone asked about is no claim of running on nothing', () => {
    const text = "Output on the genny side he reckons one point eight kilowatts. He asked whether we could loop the output back to the motor and drop the mains; told him no, and why.";
    expect(firstLaw(text)?.finding).not.toBe('breaks');
  });
  it('what a tank holds goes in; what reaches the wheels comes out', () => {
    // 7 kW × 80 min = 9.33 kWh of 12 kWh: 0.778, consistent.
    const r = firstLaw('GUEST: The tank holds the equivalent of, say, twelve kilowatt-hours. On the test loop I did eighty minutes at an average of seven kilowatts to the wheels, and then it was empty.');
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo((7 * 80) / 60 / 12, 6);
  });
  it('a fridge the battery runs is its load, not a heat mover whose ledger is its Carnot COP', () => {
    // 150 W × 12 h = 1.8 kWh of 2 kWh: 0.9.
    const r = firstLaw('The lithium battery holds two kilowatt-hours. Overnight it runs the compressor fridge, which pulls about a hundred and fifty watts, and it ran for twelve hours.');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.9, 6);
  });
});

describe('a sum that shows its terms, a quotation of parts, a year against two days (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('a number with a unit after it is no COP ("COP alone: 12,000 BTU/h per ton ÷ 620 W per ton ≈ 5.7")', () => {
    const f = extractFigures('Chiller COP alone: 12,000 BTU/h per ton ÷ 620 W per ton ≈ 5.7.');
    expect(f.some((x) => x.kind === 'cop' && x.si === 12000)).toBe(false);
  });
  it("a quotation's battery beside its panels, and a yearly yield against a scaffold's two days, break nothing", () => {
    const text =
      'Supply and fit: 16 × 430 W panels (6.88 kWp), one 6 kW hybrid inverter, one 13.5 kWh battery. Scaffold two days. Estimated annual yield 5,900 kWh (standard estimate, not a guarantee).';
    expect(run(text).checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
    expect(extractFigures(text).find((x) => x.text === '13.5 kWh')?.role).not.toBe('in');
  });
  it('a store beside its panel that ran through days with no sun keeps its size as what went in', () => {
    const text = 'A small solar panel and a 60 Wh lithium battery. The logger and radio draw only 0.15 W, so after a fortnight of fog with no useful sun at all the station was still reporting.';
    expect(extractFigures(text).find((x) => x.text === '60 Wh')?.role).toBe('in');
  });
});

describe('a chain: the water power a turbine takes, what the battery sees, an idle draw, people charging (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const firstLaw = (text: string) => run(text).checks.find((c) => c.check === 'first-law');
  it('"puts the water power at roughly 1.2 kW … the battery sees 300 to 400 W" is 0.25 to 0.33 of what went in', () => {
    const r = firstLaw('The bucket test puts the water power at roughly 1.2 kW. After the wheel, the alternator, the cable and the rectifier, the battery sees somewhere between 300 and 400 W.');
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.25, 6);
    // A pump's delivered hydraulic power is still its output.
    expect(extractFigures('The delivered hydraulic power was unchanged at 1.1 kW.').find((x) => x.kind === 'power')?.role).not.toBe('in');
  });
  it("an inverter's idle draw is set aside; what people charge a unit with goes in", () => {
    expect(extractFigures('The rest is battery and inverter losses (the inverter alone idles at 25 W).').find((x) => x.kind === 'power')?.role).toBe('aside');
    expect(extractFigures('We charged the unit with 1.8e4 J of electrical energy in electrolysis mode.').find((x) => x.kind === 'energy')?.role).toBe('in');
  });
  it('"two point nine e four metres per second" is 2.9 × 10⁴ m/s', () => {
    expect(extractFigures('Exhaust velocity two point nine e four metres per second.').find((x) => x.kind === 'speed')?.si).toBeCloseTo(29000, 6);
  });
});

describe('heat and power from one fuel, said in pairs (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const firstLaw = (text: string) => run(text).checks.find((c) => c.check === 'first-law');
  it('"1.0 kW electric and 6.0 kW of heat to your radiators from 7.5 kW of gas" is 7 kW out of 7.5 kW in', () => {
    const r = firstLaw('Wall-hung micro-CHP. Stirling engine on natural gas: 1.0 kW electric and 6.0 kW of heat to your radiators from 7.5 kW of gas input.');
    expect(r?.finding).toBe('consistent');
    // (1.0 + 6.0) / 7.5 = 0.93333 (node).
    expect(r?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(7 / 7.5, 6);
  });
  it('radiators beside a heat pump named keep it a heat pump; radiators beside a sun-heated engine make no fuel engine', () => {
    expect(run('The air-source heat pump gives 9 kW of heat to the radiators from 3 kW of electricity.').checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
    expect(extractFigures('The boiler gives 20 kW to the radiators and 4 kW to hot water, using 26 kW of gas.').filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['out', 'out', 'in']);
  });
});

describe('speeds a signal is said to reach without a speed said (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const lightSpeed = (text: string) => run(text).checks.find((c) => c.check === 'light-speed');
  // c = 299,792,458 m/s exactly (BIPM SI Brochure, 9th edition, the defining constants).
  it('a path over its one-way latency faster than light breaks; a round trip counts the path twice', () => {
    const r = lightSpeed('Northline Links: 1,200 km between our two exchanges with a guaranteed one-way latency of 3.2 ms.');
    expect(r?.finding).toBe('breaks');
    expect(r?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(1_200_000 / 0.0032 / 299_792_458, 6);
    const trip = lightSpeed('Our route from Arlby to Vesk (640 km) has a round-trip latency of 8.2 ms.');
    expect(trip?.finding).toBe('consistent');
    expect(trip?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((2 * 640_000) / 0.0082 / 299_792_458, 6);
    // 500 miles (1 mile = 1,609.344 m, NIST SP 811 appendix B) in 2 ms one way: 1.34 c.
    expect(lightSpeed('The two sites are 500 miles apart and the one-way delay is 2 ms.')?.finding).toBe('breaks');
  });
  it("a network's length, a saving and a lower bound on latency give no speed", () => {
    for (const text of [
      'Under 1 ms latency across our 1,200 km of motorway coverage.',
      'Our 2,000 km fibre network delivers latency under 1 ms.',
      'The new route between the exchanges saves 1.6 ms over 1,200 km.',
      'The 1,200 km link between the two sites has a latency of more than 6 ms.',
    ]) {
      expect(lightSpeed(text)).toBeUndefined();
    }
  });
  it("a cable's velocity of propagation is that fraction of c", () => {
    const r = lightSpeed('Low-loss coaxial cable. Impedance 50 Ω. Velocity of propagation 83 %. Max. power 1.9 kW at 100 MHz.');
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(0.83, 6);
    expect(lightSpeed('Our new dielectric gives a velocity factor of 1.2, so signals outrun light.')?.finding).toBe('breaks');
  });
});

describe("a generator's ratings and the loads it carries (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const roles = (text: string) => extractFigures(text).filter((x) => x.kind === 'power').map((x) => [x.si, x.role]);
  it('"5 kW rated, 5.5 kW max … up to 10 hours at half load (2.5 kW)" are all what the generator gives, and the fuel is wanted', () => {
    const text = 'Open-frame generator. 5 kW rated, 5.5 kW max. 12-litre tank: up to 10 hours at half load (2.5 kW).';
    expect(roles(text)).toEqual([
      [5000, 'out'],
      [5500, 'out'],
      [2500, 'out'],
    ]);
    expect(run(text).checks.find((c) => c.check === 'first-law')).toBeUndefined();
    expect(run(text).needs.some((n) => n.check === 'first-law')).toBe(true);
    // A rating said second keeps the side of the first.
    expect(roles('It draws 800 W continuous, 1,200 W peak.')).toEqual([
      [800, 'in'],
      [1200, 'in'],
    ]);
  });
  it("a fuel input at rated load stays the input; what a generator's loads need breaks nothing", () => {
    expect(extractFigures('Fuel input at rated load 95,000 BTU/h. Shaft output 9 hp.').find((x) => x.text === '95,000 BTU/h')?.role).toBe('in');
    const text = 'Your generator is 3,500 W running / 4,000 W starting. The fridge needs about 1,200 W for a second or so to start, then about 200 W running.';
    expect(run(text).checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
  });
});

describe('a pair of outputs after a rating, and a cold-gas thruster set against a photon thruster (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"Rated output is 1 kW electric and 6 kW of heat": both are outputs', () => {
    expect(extractFigures('The Stirling unit sits beside your boiler. Rated output is 1 kW electric and 6 kW of heat.').filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['out', 'out']);
  });
  it('"a tiny fraction of what a cold-gas thruster gives" is no propellant of the photon thruster', () => {
    const r = run('The photon thruster, a flat array of laser diodes firing aft, draws 40 W from the bus and produces 0.08 µN. That is a tiny fraction of what a cold-gas thruster gives.').checks.find((c) => c.check === 'photon-bound');
    expect(r?.finding).toBe('consistent');
    // 0.08 µN against 40 W / c (c exact, BIPM SI Brochure): 0.5996.
    expect(r?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo(8e-8 / (40 / 299_792_458), 6);
  });
});

describe('a table pasted with pipes: the planner reads each cell under its column (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const TABLE = 'Wind turbine and battery, two days.\n| Day | Turbine output (kWh) | Load (kWh) | Battery change (kWh) |\n| 1 | 12 | 9 | 3 |\n| 2 | 5 | 8 | -3 |';
  it("a turbine's output beside its battery's change is no ledger of one machine", () => {
    const r = run(TABLE);
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(r.needs.find((n) => n.check === 'first-law')?.missing.join(' ')).toMatch(/outside flow/u);
  });
  it('the same words in prose are read alike', () => {
    const r = run('Day 1: wind turbine output 12 kWh; load 9 kWh; battery change 3 kWh.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
  it('a sealed box with a battery, set against its own output, still breaks the first law', () => {
    // 3 kWh in from its battery, 12 kWh out: over-unity ratio 12/3 = 4 (arithmetic).
    const r = run('The sealed box drew 3 kWh from its battery and gave out 12 kWh over the week.');
    const fl = r.checks.find((c) => c.check === 'first-law');
    expect(fl?.finding).toBe('breaks');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(4, 6);
  });
});

describe("a site's generation beside its own use (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('"| PV generation (kWh) | House consumption (kWh) |" is no ledger of one machine', () => {
    const r = run('Rooftop array, a week in June.\n| Day | PV generation (kWh) | House consumption (kWh) | Surplus (kWh) |\n| Mon | 24 | 10 | 14 |\n| Tue | 20 | 11 | 9 |');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
  it('a generator said to consume less than it generates, with no sun or wind named, still breaks the first law', () => {
    // 1 kW in, 5 kW out: over-unity ratio 5 (arithmetic).
    const fl = run('Our generator has a consumption of 1 kW and a generation of 5 kW.').checks.find((c) => c.check === 'first-law');
    expect(fl?.finding).toBe('breaks');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(5, 6);
  });
});

describe("a vehicle's range against its pack: consumption × distance (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  const firstLaw = (text: string) => run(text).checks.find((c) => c.check === 'first-law');
  it('a van said to do 600–700 km per charge from a 38–42 kWh pack at 19–21 kWh/100 km breaks the first law', () => {
    const fl = firstLaw('The Example Motors van will do "between 600 and 700 km per charge" from a 38–42 kWh battery, its turbine topping the pack up as it drives. The brochure gives 19–21 kWh/100 km laden.');
    expect(fl?.finding).toBe('breaks');
    // End most favourable to the claim: 19 kWh/100 km × 600 km = 114 kWh against 42 kWh → 2.714 (arithmetic).
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(114 / 42, 6);
  });
  it('miles per kWh: 4 mi/kWh over 280 miles is 70 kWh, within a 75 kWh pack', () => {
    const fl = firstLaw('The saloon gets 4 miles per kWh and its 75 kWh pack gives a range of 280 miles.');
    expect(fl?.finding).toBe('consistent');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(70 / 75, 6);
  });
  it('an e-bike within its pack is consistent; a solar car in sun is not set against its pack', () => {
    // 6 Wh/km × 70 km = 420 Wh against 625 Wh → 0.672 (arithmetic).
    const fl = firstLaw('• 625 Wh battery\n• 250 W mid-drive, assistance to 25 km/h\n• Range: 70–90 km in Eco (about 6 Wh/km average)');
    expect(fl?.finding).toBe('consistent');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(420 / 625, 6);
    expect(run('Our 5 m² solar array gave 7.7 kWh over the day. The car used 5.5 kWh per 100 km and we covered 120 km on its 4.9 kWh battery.').checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
});

describe('a rival propeller set against a thrust, and power said to come from the vacuum (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text, classes: ['gyroscopic-drive'] });
  it('"19 newtons per kilowatt, which beats any propeller": the propeller is a rival, not the cart\'s propellant', () => {
    const r = run('The Example gyro-cart: four flywheels driven by a 0.8 kW motor, no driven wheels. Its builder says the gyros give a net push of 15 N, "which beats any propeller at walking pace".');
    const pb = r.checks.find((c) => c.check === 'photon-bound');
    expect(pb?.finding).toBe('breaks');
    // F·c/P = 15 × 299 792 458 / 800 (c exact, BIPM SI Brochure).
    expect(pb?.outputs.find((o) => o.name === 'ratio')?.si).toBeCloseTo((15 * 299_792_458) / 800, 0);
  });
  it('"draws 3.2 × 10⁴ W of power from the quantum vacuum for an input of 150 W" is an output of 32 kW', () => {
    const text = 'The Example zero-point module draws 3.2 × 10⁴ W of continuous power from the quantum vacuum for an electrical input of only 1.5e2 W.';
    expect(extractFigures(text).map((f) => f.role)).toEqual(['out', 'in']);
    const fl = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
    expect(fl?.finding).toBe('breaks');
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(32000 / 150, 6);
  });
});

describe('a sailing drone and a ferry on its shore charger are lawful (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  it('a wing sail\'s 400 N beside 120 W of solar panels is no propellant-free thrust', () => {
    const r = run('The Example SD-7 uncrewed sailing drone has no engine and carries no propellant. Its rigid wing sail gives up to 400 N of drive in 20 km/h winds, and 120 W of solar panels run the sensors.');
    expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(r.checks.find((c) => c.check === 'photon-bound')).toBeUndefined();
  });
  it("a shore charger's 2 MW is what the ferry's pack takes in, not an output", () => {
    const text = 'The Example ferry runs on a 1.2 MWh battery. Each crossing takes 20 minutes at an average draw of around 850 kW, plugging in at the 2 MW shore charger for about 40 minutes between runs.';
    expect(extractFigures(text).find((f) => f.text === '2 MW')?.role).toBe('in');
    expect(run(text).checks.some((c) => c.finding === 'breaks')).toBe(false);
  });
  it('a light sail is still pushed by light', () => {
    const r = runClaimChecks(extractFigures('In vacuum, a laser-driven sail recorded 3.1 µN/kW from the light reflected off it.'), { text: 'In vacuum, a laser-driven sail recorded 3.1 µN/kW from the light reflected off it.' });
    expect(r.checks.find((c) => c.check === 'photon-bound')?.finding).toBe('consistent');
  });
});

describe('a range and a consumption said in words (invented test data)', () => {
  it('"twelve kilowatt-hours … one thousand one hundred kilometres, using eleven kilowatt-hours for every hundred kilometres" breaks the first law', () => {
    const text = 'Our Example city car carries a battery of only twelve kilowatt-hours, yet on a test drive it covered one thousand one hundred kilometres, using eleven kilowatt-hours for every hundred kilometres, with no stop to charge.';
    const fl = runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'first-law');
    expect(fl?.finding).toBe('breaks');
    // 11 kWh/100 km × 1,100 km = 121 kWh against 12 kWh → 10.083 (arithmetic).
    expect(fl?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(121 / 12, 6);
  });
});

describe('a table of readings is read line by line: no line\'s input set against another line\'s output (invented test data)', () => {
  it('a turbine, a house load and a battery hour by hour is no conflict: each hour balances', () => {
    const text = 'Site day, turbine and house\nTime | Turbine (kW) | House load (kW) | Battery (kW)\n06:00 | 1.2 | 0.4 | 0.8\n12:00 | 0.3 | 1.5 | -1.2\n18:00 | 2.1 | 2.3 | -0.2';
    const run = checkOf(text, 'first-law');
    expect(run?.finding).not.toBe('breaks');
  });
  it("a table's own average row is its ledger: 456 W out of 405 W in", () => {
    const text = 'Loop test, motor driving its own alternator.\n\nRun   P_in [W]   P_out [W]\n1     412        455\n2     398        451\n3     405        462\nAvg   405        456';
    // over-unity ratio = 456 / 405 (the table's own average row)
    expectRun(text, 'first-law', 'breaks', 'over_unity', 456 / 405, 6);
  });
  it('a sweep whose largest input and output share a line keeps that line: the full-load point', () => {
    const text = 'Dyno sweep\n\nPoint | Input (W) | Shaft (W)\n1 | 197 | 162\n2 | 398 | 338\n3 | 571 | 480';
    expectRun(text, 'first-law', 'consistent', 'over_unity', 480 / 571, 6);
  });
});

describe('claims read from this session\'s tuning parts 102–103 (invented test data)', () => {
  test('a pulse "detected at the far end 21 µs later" through a 12 km fibre spool is a speed above c', () => {
    const text = 'The authors report that a pulse launched into the 12 km fibre spool was detected at the far end 21 µs later.';
    const f = extractFigures(text);
    const v = f.find((x) => x.kind === 'speed')!;
    expect(v.si).toBeCloseTo(12000 / 21e-6, 3); // path / time = 12,000 m / 21 µs (arithmetic)
    const c = runClaimChecks(f, { text }).checks.find((x) => x.check === 'light-speed')!;
    expect(c.finding).toBe('breaks');
    // Through a 10 km spool in 50 µs: 2 × 10⁸ m/s, two-thirds of c (c = 299 792 458 m/s exactly, BIPM SI Brochure).
    const t2 = 'A pulse launched into the 10 km fibre spool was detected at the far end 50 µs later.';
    expect(runClaimChecks(extractFigures(t2), { text: t2 }).checks.find((x) => x.check === 'light-speed')!.finding).toBe('consistent');
    // A time with no signal in its sentence gives no speed: "the 12 km cable was laid in 21 days".
    expect(extractFigures('The 12 km cable was laid and tested 21 days later.').some((x) => x.kind === 'speed')).toBe(false);
  });
  test('"gives back 1.3 for every 1 it receives" on 500 W from the wall breaks the first law', () => {
    const text = 'Our resonant converter takes 500 W from the wall socket and gives back 1.3 for every 1 it receives.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'first-law')!;
    expect(c.finding).toBe('breaks');
    // "returns 3 for every 4 it takes" is 0.75, within the law.
    const t2 = 'The regenerative unit returns 3 for every 4 it takes.';
    expect(extractFigures(t2).find((x) => x.kind === 'efficiency')!.si).toBeCloseTo(0.75, 12);
    expect(runClaimChecks(extractFigures(t2), { text: t2 }).checks.some((x) => x.finding === 'breaks')).toBe(false);
  });
  test('a lift from gyroscopes "free of any exhaust or propeller" is held to the photon bound', () => {
    const text = 'Two counter-rotating gyroscopes, precessed by a 1.5 PS drive motor, generate a vertical lift of 12 kgf on the platform, which is free of any exhaust or propeller.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'photon-bound')!;
    expect(c.finding).toBe('breaks');
    // 12 kgf × c / (1.5 × 735.49875 W): kgf = 9.806 65 N, PS = 735.498 75 W (NIST SP 811 B.8); c exact (BIPM).
    const ratio = out(c, 'ratio');
    expect(Math.abs(ratio / ((12 * 9.80665 * 299792458) / (1.5 * 735.49875)) - 1)).toBeLessThan(1e-9);
  });
  test('"a full 2 Ah cell at 3.7 V holds under 27 kJ" is what the cell has to give, an input', () => {
    const f = extractFigures('A full 2 Ah cell at 3.7 V holds under 27 kJ; the beacon is said to draw 0.5 W for 90 days from it.');
    const held = f.find((x) => x.text === '27 kJ')!;
    expect([held.kind, held.role]).toEqual(['energy', 'in']);
    // What a generator "holds" (a speed, a load) is no store: "the turbine holds 2 MW" stays an output.
    expect(extractFigures('At rated wind the turbine holds 2 MW for hours.').find((x) => x.text === '2 MW')!.role).not.toBe('in');
  });
  test('a heat pump lifting heat "from the 25 °C cooling-water return" has a heating COP', () => {
    const f = extractFigures('The ammonia heat pump lifts waste heat from the 25 °C cooling-water return by 30 K, delivering 55 °C process water at a COP of 3.2.');
    expect(f.find((x) => x.kind === 'cop')!.role).toBe('heating');
    // A chiller's COP beside its chilled water stays a cooling COP.
    expect(extractFigures('The chiller cools the water loop to 7 °C at a COP of 5.1.').find((x) => x.kind === 'cop')!.role).toBe('cooling');
  });
  test('a solar collector\'s pump electricity against the heat it gives is no ledger, in prose or in a table with an "extra over pump" column', () => {
    const prose = 'Our solar thermal collector: pump electricity 0.4 kWh, heat to tank 12 kWh, extra over pump 11.6 kWh.';
    const table = 'Solar thermal\n| Day | Pump electricity (kWh) | Heat to tank (kWh) | Extra over pump (kWh) |\n| 1 | 0.4 | 12 | 11.6 |\n| 2 | 0.3 | 8 | 7.7 |';
    for (const text of [prose, table]) {
      const r = runClaimChecks(extractFigures(text), { text });
      expect(r.checks.some((c) => c.finding === 'breaks')).toBe(false);
      expect(r.needs.some((n) => n.check === 'first-law')).toBe(true);
    }
  });
});

describe('claims read from this session\'s tuning parts 104–105 (invented test data)', () => {
  const breaks = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.some((c) => c.finding === 'breaks');
  test('a lifter "on 30 kV at 1.1 mA, just 33 W and no fuel at all" takes 33 W in: no power out of nothing', () => {
    const text = 'My lifter rises off the bench on 30 kV at 1.1 mA, just 33 W and no fuel at all.';
    const f = extractFigures(text);
    expect(f.find((x) => x.text === '33 W')!.role).toBe('in');
    expect(breaks(text)).toBe(false);
  });
  test('a collector giving "up to 2.1 kW of heat from a 45 W pump" in sun: the pump is no input of the heat', () => {
    const text = "The evacuated-tube collector is said to 'deliver up to 2.1 kW of heat from a 45 W pump' in full sun.";
    expect(breaks(text)).toBe(false);
    expect(runClaimChecks(extractFigures(text), { text }).needs.some((n) => n.check === 'first-law')).toBe(true);
  });
  test('"0.65 kWh for every kWh of braking … 1.3 kWh recovered of the 2.0 kWh spent": the ratio\'s own pair, within the law', () => {
    const text = "The supplier says the bus's regenerative brakes 'give back 0.65 kWh for every kWh of braking', and quotes 1.3 kWh recovered of the 2.0 kWh spent in braking.";
    const f = extractFigures(text);
    expect(f.find((x) => x.text === '2.0 kWh')!.role).toBe('in');
    expect(breaks(text)).toBe(false);
  });
  test('"13.5 kWh went into the battery … the house took 12.4 kWh back out of it": a store\'s round trip, within the law', () => {
    const text = 'The app says 13.5 kWh went into the battery from the panels, and overnight the house took 12.4 kWh back out of it.';
    const f = extractFigures(text);
    expect(f.find((x) => x.text === '13.5 kWh')!.role).toBe('in');
    expect(f.find((x) => x.text === '12.4 kWh')!.role).toBe('out');
    const c = runClaimChecks(f, { text }).checks.find((x) => x.check === 'first-law')!;
    expect(c.finding).toBe('consistent');
    expect(out(c, 'over_unity')).toBeCloseTo(12.4 / 13.5, 9); // out / in (arithmetic)
  });
  test('a mini split "(heat mode)" making "over 3 times the heat it uses" is a heat pump, not over-unity', () => {
    const text = 'My 12,000 BTU mini split (heat mode) pulls 1.1 kW from the wall when it is 47°F outside and I keep the living room at 70. So it is making over 3 times the heat it uses?';
    expect(breaks(text)).toBe(false);
  });
  test("a surge's ten seconds is no run of a power worked out paragraphs later", () => {
    const text = 'Evidence\nThe inverter can deliver a short surge of 3.6 kW for ten seconds when a motor starts.\n\nAssessment\nOur adviser calculated the power drawn from the battery in the test as 48 V times 40 A, or 1.92 kW, against 1.8 kW delivered.';
    expect(breaks(text)).toBe(false);
  });
  test('a heat pump "will do between 300 and 350 %" or whose "monitor says 510 %" is read as a heating COP; prices and changes are not', () => {
    const text = "Our new ground source heat pump's monitor says 510% this week. The ground loop comes in at 10 °C and the floor heating runs at 30 °C.";
    const cop = extractFigures(text).find((x) => x.kind === 'cop')!;
    expect([cop.role, cop.si]).toEqual(['heating', 5.1]);
    // Carnot COP for 30 °C from 10 °C: 303.15 / 20 = 15.16 (Carnot's heating COP, Th/(Th − Tc)); 5.1 is within it.
    expect(runClaimChecks(extractFigures(text), { text }).checks.find((c) => c.check === 'carnot')!.finding).toBe('consistent');
    expect(extractFigures('Since the heat pump went in, our gas bills are down and electricity prices rose 150% this year.').some((x) => x.kind === 'cop')).toBe(false);
    expect(extractFigures('The heat pump covers 120% of our heating demand on mild days.').some((x) => x.kind === 'cop')).toBe(false);
  });
  test('"with no battery and no plug", "nothing drives it but gravity", "turns all on its own": nothing goes in', () => {
    for (const text of [
      'Our module powered a 500 watt heater for a 72-hour run with no battery and no plug.',
      'My wheel turns all on its own and its dynamo gave about eighty watts, steady, for three days. Nothing drives it but gravity.',
    ]) {
      expect(extractFigures(text).some((x) => x.kind === 'power' && x.role === 'in' && x.si === 0)).toBe(true);
      expect(breaks(text)).toBe(true);
    }
    // A lamp on sunlight "with no battery and no plug" harvests light: not self-running.
    const solar = 'The solar garden light runs with no battery and no plug, giving 0.5 W while the sun is on its panel.';
    expect(breaks(solar)).toBe(false);
  });
  test('an engine that "runs between exhaust-gas heat at 180 °C and cooling water at 25 °C" has that heat as its hot side', () => {
    const text = 'Our free-piston engine runs between exhaust-gas heat at 180 °C and cooling water at 25 °C and turns 52 % of the heat it takes in into shaft work.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'carnot')!;
    expect(c.finding).toBe('breaks');
    // η_max = 1 − 298.15/453.15 = 0.342 (Carnot; °C + 273.15 = K, NIST SP 811 §4.2.1.1); 0.52 / 0.342 = 1.52.
    expect(out(c, 'eta_ratio')).toBeCloseTo(0.52 / (1 - 298.15 / 453.15), 9);
    // A car engine's coolant temperature is still no hot side.
    const car = 'The car engine is 38 % efficient; its coolant runs at 90 °C and the air outside is 15 °C.';
    expect(runClaimChecks(extractFigures(car), { text: car }).checks.some((x) => x.finding === 'breaks')).toBe(false);
  });
  test('"η = 0.62 for the cycle operating between T_h = 5.5 × 10² K and T_c = 3.0 × 10² K" is a heat engine\'s claim', () => {
    const text = 'The revised manuscript still gives η = 0.62 for the cycle operating between T_h = 5.5 × 10² K and T_c = 3.0 × 10² K.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'carnot')!;
    expect(c.finding).toBe('breaks');
    expect(out(c, 'eta_ratio')).toBeCloseTo(0.62 / (1 - 300 / 550), 9); // η / (1 − Tc/Th) (Carnot)
  });
  test('"we put 10 kWh into the battery … took 9.2 kWh back out of it": the store gave back less than it took', () => {
    for (const text of ['We put 10 kWh into the battery at night and took 9.2 kWh back out of it in the evening.', 'My panel array put 14 kWh into the home battery today, and the house took 12.9 kWh back out of it overnight.']) {
      const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'first-law')!;
      expect(c.finding).toBe('consistent');
    }
  });
  test('heat out beyond the electricity in, with the temperature outside given ("It was 38°F outside"), is a heat pump\'s COP, not a first-law breach (invented test data)', () => {
    const text = 'The installer says our new system puts out 30,000 BTU/h of heat while pulling about 2.6 kW from the panel. It was 38°F outside and the supply air was 100°F. How is that more heat than electricity?';
    const r = runClaimChecks(extractFigures(text), { text });
    expect(r.checks.some((x) => x.finding === 'breaks')).toBe(false);
    const c = r.checks.find((x) => x.check === 'carnot')!;
    expect(c.finding).toBe('consistent');
    // Heating COP = 30,000 BTU/h × 0.29307107 W/(BTU/h) / 2,600 W (NIST SP 811 B.8); Carnot bound Th/(Th − Tc), °F → K (NIST SP 811 §4.2.1.1).
    const th = (100 - 32) * 5 / 9 + 273.15;
    const tc = (38 - 32) * 5 / 9 + 273.15;
    expect(out(c, 'cop_heating_ratio')).toBeCloseTo((30000 * 0.29307107) / 2600 / (th / (th - tc)), 4);
  });
});

describe('gains said with a bare second figure, and a lifter\'s lift (invented test data)', () => {
  test('"takes in 400 watts and puts out 520" and "nine hundred watts out for seven hundred in" carry the watts to the bare figure', () => {
    for (const [text, pin, pout] of [
      ['On the demo their box takes in 400 watts and puts out 520.', 400, 520],
      ['The plans describe a machine giving nine hundred watts out for seven hundred in.', 700, 900],
    ] as const) {
      const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'first-law')!;
      expect(c.finding).toBe('breaks');
      expect(out(c, 'over_unity')).toBeCloseTo(pout / pin, 9); // out / in
    }
  });
  test('"returns 1.2 J to its capacitor for every joule it takes out" is a gain of 1.2', () => {
    const text = 'The pulse board is said to return 1.2 J to its capacitor for every joule it takes out.';
    const c = runClaimChecks(extractFigures(text), { text }).checks.find((x) => x.check === 'first-law')!;
    expect(c.finding).toBe('breaks');
    expect(out(c, 'over_unity')).toBeCloseTo(1.2, 9);
  });
  test('a lifter said to "lift the same 3 grams in a vacuum chamber" breaks the photon bound; one that "would not lift at all" there does not', () => {
    const claim = 'The foil lifter lifts about 3 grams on 15 watts, and its builder says it would lift the same 3 grams in a vacuum chamber, with no propellant at all.';
    const r = runClaimChecks(extractFigures(claim), { text: claim }).checks.find((x) => x.check === 'photon-bound')!;
    expect(r.finding).toBe('breaks');
    // F = m·g0 = 0.003 kg × 9.80665 m/s² (g0 exact, BIPM SI Brochure 9th ed.); bound P/c, c = 299 792 458 m/s.
    expect(out(r, 'ratio')).toBeCloseTo((0.003 * 9.80665 * 299792458) / 15, 0);
    const lawful = 'The lifter holds up 2.5 g at 25 kV and 0.4 mA in a room; in a vacuum chamber it would not lift at all, as there is no air to push on.';
    expect(runClaimChecks(extractFigures(lawful), { text: lawful }).checks.some((x) => x.finding === 'breaks')).toBe(false);
  });
});

test('a cryocooler that "lifts 3 W of heat at 80 K, with rejection to a 300 K room" for 90 W of compressor input is within Carnot (invented test data)', () => {
  const text = 'Cryocooler test: 90 W of compressor input lifts 3 W of heat at 80 K, with rejection to a 300 K room.';
  const f = extractFigures(text);
  expect(f.find((x) => x.text === '3 W')!.role).toBe('out');
  expect(f.find((x) => x.text === '80 K')!.role).toBe('cold');
  expect(f.find((x) => x.text === '300 K')!.role).toBe('hot');
  const c = runClaimChecks(f, { text }).checks.find((x) => x.check === 'carnot')!;
  expect(c.finding).toBe('consistent');
  // Cooling COP 3/90 against the Carnot bound Tc/(Th − Tc) = 80/220 (Carnot).
  expect(out(c, 'cop_cooling_ratio')).toBeCloseTo(3 / 90 / (80 / 220), 9);
});

describe('nothing in, said of every input at once, and heat passed on with nothing driving it (issue 11, invented test data)', () => {
  const verdicts = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.map((c) => [c.check, c.finding]);

  it('"produced 2 hp continuously with no electrical or fuel input" breaks the first law; the size it is to be scaled up to is no input', () => {
    const text = 'The applicant states that the magnet motor has produced 2 hp continuously with no electrical or fuel input for 5K hours, and asks for £250,000 to scale it up to 50 hp.';
    const figures = extractFigures(text);
    expect(figures.find((f) => f.text === '50 hp')?.role).toBe('aside');
    expect(figures.find((f) => f.kind === 'power' && f.role === 'in')?.si).toBe(0);
    expect(verdicts(text)).toEqual([['first-law', 'breaks']]);
  });

  it('a heat pipe, a thermosiphon or a passive cooler moving heat "with no electrical input" is no machine making energy', () => {
    for (const text of [
      'The heat pipe moves 200 W with no electrical or mechanical input.',
      'The thermosiphon loop carries 3 kW of heat from the collector to the store with no electrical input.',
      'The passive cooling tower has no external power source and rejects 40 kW of heat.',
    ]) {
      expect(verdicts(text).filter(([, finding]) => finding === 'breaks')).toEqual([]);
    }
    // "taking the rest as heat from the lattice": a second input named, not measured, so the check asks for it.
    const led = 'Our thermoelectric LED delivered 69 pW of light from 30 pW of electrical input, taking the rest as heat from the lattice.';
    expect(verdicts(led)).toEqual([]);
    expect(runClaimChecks(extractFigures(led), { text: led }).needs.map((n) => n.check)).toEqual(['first-law']);
    // (A box said to give heat with nothing going in still breaks it.)
    expect(verdicts('The sealed box gives 40 W of heat with no electrical or fuel input.')).toEqual([['first-law', 'breaks']]);
  });
});

describe('heat delivered across a cold and a hot side by an unnamed machine (issue 11, invented test data)', () => {
  const findings = (text: string) => runClaimChecks(extractFigures(text), { text }).checks.map((c) => [c.check, c.finding]);

  it('"2 kW in; 6.5 kW heat out; source 10 °C; sink 35 °C" is a heat pump within its Carnot COP, not a first-law break', () => {
    // Carnot heating COP Th/(Th − Tc) = 308.15/25 = 12.3 (any thermodynamics text; from memory); 6.5/2 = 3.25 is below it.
    expect(findings('Unit: 2 kW in; 6.5 kW heat out; source 10 °C; sink 35 °C.')).toEqual([['carnot', 'consistent']]);
    expect(findings('The device takes 500 W and gives 1.6 kW of heat, working between 0 °C and 35 °C.')).toEqual([['carnot', 'consistent']]);
  });

  it('"3 kW of warm air … pulls heat from outside at 7 °C into the 21 °C lounge": a heat pump, whatever its seller calls it', () => {
    expect(findings("My neighbour's 'free heat' box: 1 kW from the socket, 3 kW of warm air, pulls heat from outside at 7 °C into the 21 °C lounge.")).toEqual([['carnot', 'consistent']]);
  });

  it('a heater named still cannot give more heat than it takes', () => {
    expect(findings('The heater takes 500 W and gives 1.6 kW of heat; room 20 °C, outside 0 °C.')).toEqual([['first-law', 'breaks']]);
  });
});
