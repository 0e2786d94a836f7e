/**
 * The figure reader: efficiencies and COPs by their context, and the roles the words give.
 *
 * Against outside references: NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units (SI)", Appendix B.8 and B.9 conversion factors and §4.2.1.1 (Celsius temperature); the SI
 * prefixes of the BIPM SI Brochure (9th ed., 2019, Table 7). SP 811 prints most factors to seven
 * significant digits, so those checks allow half a unit in the seventh.
 *
 * Every text here is invented test data: invented devices ("QZ-4 cavity", "Helix-7 rig") and an
 * invented organisation ("Example Dynamics"), no real people or products.
 */
import { extractFigures } from '../reader';
import { EXACT, expectRelClose, expectWellFormed, only } from './test-support';

describe('efficiency and COP', () => {
  test.each([
    ['an efficiency of 45%', '45%', 0.45],
    ['an efficiency of 45 percent', '45 percent', 0.45],
    ['it is 45 % efficient', '45 %', 0.45],
    ['a 45%-efficient engine', '45%', 0.45],
    ['a 45% conversion efficiency', '45%', 0.45],
    ['the efficiency of the engine is 120 %', '120 %', 1.2],
    ['an efficiency of 0.62', '0.62', 0.62],
    ['efficiency η = 0.3', '0.3', 0.3],
  ])('"%s" (invented test data)', (phrase, written, si) => {
    const text = `The Helix-7 engine: ${phrase}.`;
    const f = only(text);
    expect(f).toMatchObject({ kind: 'efficiency', text: written, unit: '', role: null });
    expect(f.start).toBe(text.lastIndexOf(written));
    expectRelClose(f.si, si, EXACT); // a percentage is a hundredth (SI Brochure §5.4.7)
  });

  test.each([
    ['The QZ-4 heat pump has a COP of 7.', '7', 7, 'heating'],
    ['Its coefficient of performance 5.5 beats any heater.', '5.5', 5.5, 'heating'],
    ['The chiller runs at COP 4.', '4', 4, 'cooling'],
    ['In refrigeration mode the COP is 3.2.', '3.2', 3.2, 'cooling'],
    ['A COP of 9 is claimed for the module.', '9', 9, null],
  ])('"%s" (invented test data)', (text, written, si, role) => {
    const f = only(text);
    expect(f).toMatchObject({ kind: 'cop', text: written, quantity: written, role });
    expect(f.si).toBe(si); // a pure number, as written
  });

  test('an efficiency range (40–50 %) is one efficiency with an upper end', () => {
    const text = 'An efficiency of 40–50% is claimed (invented test data).';
    const f = only(text);
    expect([f.kind, f.text, f.si, f.upper?.si]).toEqual(['efficiency', '40–50%', 0.4, 0.5]);
  });
});

describe('roles', () => {
  test.each([
    ['The module draws 2 kW from the mains.', 'in'],
    ['It consumes 2 kW.', 'in'],
    ['An input of 2 kW is needed.', 'in'],
    ['It is supplied with 2 kW.', 'in'],
    ['It runs on 2 kW of electrical input.', 'in'],
    ['It uses 2 kW.', 'in'],
    ['It delivers 2 kW.', 'out'],
    ['It produces 2 kW.', 'out'],
    ['Its output is 2 kW.', 'out'],
    ['It generates 2 kW.', 'out'],
    ['It yields 2 kW.', 'out'],
    ['It returns 2 kW to the grid.', 'out'],
    ['2 kW in, nothing else.', 'in'],
    ['The rating is 2 kW.', null],
  ])('power: "%s" (invented test data)', (text, role) => {
    expect(only(text)).toMatchObject({ kind: 'power', role });
  });

  test.each([
    ['The hot side is at 90 °C.', 'hot'],
    ['Heat comes from a 300 °C source.', 'hot'],
    ['The flame reaches 1200 K.', 'hot'],
    ['Steam at 180 °C drives it.', 'hot'],
    ['The engine runs off a hot tank; ambient is 20 °C.', 'cold'],
    ['The heat pump sits in a room at 21 °C.', 'cold'],
    ['The cold side is held at 5 °C.', 'cold'],
    ['It rejects heat to a 15 °C sink.', 'cold'],
    ['Outside the Stirling engine, it is 2 °C.', 'cold'],
    ['River water at 12 °C cools it.', 'cold'],
    // A lone temperature of no side, in a text that names nothing a check could use it for, is set aside.
    ['It was measured at 40 °C.', 'aside'],
    // So is the room's or the weather's, with no machine that works on heat and no hot side named.
    ['Ambient is 20 °C.', 'aside'],
    ['The room is at 21 °C.', 'aside'],
    ['Outside, it is 2 °C.', 'aside'],
  ])('temperature: "%s" (invented test data)', (text, role) => {
    expect(only(text)).toMatchObject({ kind: 'temperature', role });
  });

  test('two temperatures of one machine: the higher is the hot side, whatever the order', () => {
    const text = 'It works between 300 K and 400 K (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.si, f.role])).toEqual([
      [300, 'cold'],
      [400, 'hot'],
    ]);
  });

  test('each figure takes the nearest words, not those of its neighbour', () => {
    const text = 'An input of 2 kW yields 5 kW; it uses 1 kW and produces 3 kW (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => f.role)).toEqual(['in', 'out', 'in', 'out']);
  });

  test('thrust, speed, current and efficiency have no role; a mass no check takes is set aside', () => {
    const text = 'It draws 2 A, produces 3 mN, weighs 4 kg, moves at 5 m/s and produces 45% efficiency (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.kind, f.role])).toEqual([
      ['current', null],
      ['thrust', null],
      ['mass', 'aside'],
      ['speed', null],
      ['efficiency', null],
    ]);
  });

  test('a mass keeps its part where a check takes it: a rocket, or the metal of an excess-heat cell', () => {
    const rocket = 'The 40 kg probe carries 12 kg of propellant and fires at an Isp of 220 s (invented test data).';
    expect(extractFigures(rocket).filter((f) => f.kind === 'mass').map((f) => f.role)).toEqual(['wet', 'propellant', 'dry']);
    const cell = 'A cell with 2 g of palladium loaded with deuterium gave 40 kJ of heat for 25 kJ of electricity (invented test data).';
    expect(extractFigures(cell).filter((f) => f.kind === 'mass').map((f) => f.role)).toEqual([null]);
    // A thruster's datasheet with masses but no speed, nor a mass said wet or dry: no rocket to run.
    const sheet = 'Thrust: 84 mN. Thrust-to-power: 62 mN per kW. Thruster mass: 4.2 kg; cathode mass 0.4 kg (invented test data).';
    expect(extractFigures(sheet).filter((f) => f.kind === 'mass').map((f) => f.role)).toEqual(['aside', 'aside']);
    // An appliance "48 kg empty" is no rocket's dry mass.
    const fridge = 'The 210-litre cabinet weighs 48 kg empty and draws 90 W (invented test data).';
    expect(extractFigures(fridge).filter((f) => f.kind === 'mass').map((f) => f.role)).toEqual(['aside']);
    const pump = 'The outdoor unit weighs 96 kg; the heat pump gives a COP of 3.1 between 2 °C and 45 °C (invented test data).';
    expect(extractFigures(pump).filter((f) => f.kind === 'mass').map((f) => f.role)).toEqual(['aside']);
  });
});

describe('stores and sides across paragraphs (issue 11, invented test data)', () => {
  const roles = (text: string) => extractFigures(text).filter((f) => f.kind === 'energy' || f.kind === 'power').map((f) => [f.text, f.role]);
  test('what a store holds is its capacity, not what it gives out, even "of heat"', () => {
    expect(roles('Its first silo holds 8 MWh of heat at up to 500 °C.')).toEqual([['8 MWh', null]]);
  });
  test('a side named in another paragraph does not give an open figure the other side', () => {
    const text = "The lorry's 300 kWh battery still has to be charged every night.\n\nAnother holding builds containers of 2 MWh.";
    expect(roles(text)).toEqual([
      ['300 kWh', 'in'],
      ['2 MWh', null],
    ]);
    // In one paragraph it does.
    expect(roles("The lorry's 300 kWh battery has to be charged every night, and it delivered 250 kWh.")).toEqual([
      ['300 kWh', 'in'],
      ['250 kWh', 'out'],
    ]);
  });
  test('a store drained by a load over a run: the store is what goes in, also where the text says what the load got', () => {
    const text = 'The lantern holds one cell rated at 2 Wh and an LED drawing a constant 0.5 W. In a run of two weeks it never dimmed; it delivered about 0.6 MJ to the LED.';
    const f = extractFigures(text);
    expect(f.find((x) => x.text === '2 Wh')?.role).toBe('in');
    expect(f.find((x) => x.text === '0.6 MJ')?.role).toBe('out');
  });
});

test('a current takes the voltage said with it, not one already said with another current (invented test data)', () => {
  // P = I × V: 6.1 A × 36 V = 219.6 W in; 17.2 A × 12.6 V = 216.72 W out (ratio 0.987, within the first law).
  const text = 'The display shows the panel sending 6.1 A at 36 V into the controller, while 17.2 A goes into the batteries at 12.6 V.';
  const powers = extractFigures(text).filter((f) => f.kind === 'power');
  expect(powers.map((f) => [f.role, Math.round(f.si * 100) / 100])).toEqual([
    ['in', 219.6],
    ['out', 216.72],
  ]);
});

test('"half as much again as the input" is an output 1.5 times the input, not half of it (invented test data)', () => {
  const gain = (text: string) => extractFigures(text).find((f) => f.kind === 'efficiency')?.si;
  expect(gain('The claimed heat output is nearly half as much again as the input.')).toBeCloseTo(1.5, 12);
  expect(gain('It gives twice as much as the input.')).toBeCloseTo(2, 12);
  expect(gain('It gives half as much as the input.')).toBeCloseTo(0.5, 12);
});

describe('errata (invented test data)', () => {
  test('"the value 2.4 W in Table 2 should read 4.2 W": the corrected figure counts, the misprint is set aside', () => {
    const f = extractFigures('Erratum: the input power 2.4 W in Table 2 should read 4.2 W; the output stays 3.9 W.');
    expect(f.map((x) => [x.text, x.role])).toEqual([
      ['2.4 W', 'aside'],
      ['4.2 W', 'in'],
      ['3.9 W', 'out'],
    ]);
  });
  test('"was printed as 45 %. It should read 4.5 %": the correction keeps the kind of the figure it replaces', () => {
    const f = extractFigures('The engine between 300 °C and 40 °C: its efficiency was printed as 45 %. It should read 4.5 %.');
    expect(f.filter((x) => x.kind === 'efficiency').map((x) => [x.role, x.si])).toEqual([
      ['aside', 0.45],
      [null, 0.045],
    ]);
    // The cold side stays a side: only the figure right before "should read" is superseded.
    expect(f.find((x) => x.text === '40 °C')?.role).toBe('cold');
  });
  test('"the mean heating COP … (…) was printed as 0.30. It should read 3.0": the subject names the printed figure, the correction keeps its kind', () => {
    const text = 'The mean heating COP of the water heaters at the rating point (air at 20 °C, water heated to 55 °C) was printed as 0.30. It should read 3.0.';
    const cops = extractFigures(text).filter((x) => x.kind === 'cop');
    expect(cops.map((x) => [x.role, x.si])).toEqual([
      ['aside', 0.3],
      ['heating', 3],
    ]);
  });
  test('"the shaft output … was printed as 105 hp. It should read 150 hp": the correction takes the side of the misprint', () => {
    // 150 hp × 745.699 872 W/hp = 111 855 W (NIST SP 811 Appendix B.8, horsepower, mechanical).
    const f = extractFigures('The shaft output at the continuous rating was printed as 105 hp. It should read 150 hp.');
    const out = f.find((x) => x.text === '150 hp');
    expect(out?.role).toBe('out');
    expect(out?.si).toBeCloseTo(150 * 745.6999, 1); // SP 811 prints the factor to seven digits
  });
});

describe('what a store gave back, as a share (issue 11, invented test data)', () => {
  const eff = (text: string) => extractFigures(text).filter((f) => f.kind === 'efficiency').map((f) => f.si);
  it('"returned 81 % of what went in" and a table\'s "Returned" column are efficiencies', () => {
    expect(eff('The Example Dynamics flywheel returned 81 % of what went in.')).toEqual([0.81]);
    expect(eff('Cycle | E_in (kWh) | E_out (kWh) | Returned\n1 | 1.02 | 0.83 | 81 %\n2 | 1.00 | 0.82 | 82 %')).toEqual([0.81, 0.82]);
    expect(eff('The box gives back 130 % of what was put into it.')).toEqual([1.3]);
  });
  it('a return on money or a heat pump\'s "returned 380 %" is no such efficiency', () => {
    expect(eff('Investors were promised returns of 12 % a year.')).toEqual([]);
    expect(extractFigures('On our rig the air-to-water heat pump returned 380 %.').find((f) => f.text.startsWith('380'))?.kind).toBe('cop');
  });
});

describe('a bracketed note between a label and its colon (issue 11, invented test data)', () => {
  const role = (text: string) => extractFigures(text).map((f) => f.role);
  it('"Electricity in (sub-meter): 512 kWh" is what went in, "Heat out (meter):" what came out', () => {
    expect(role('Electricity in (sub-meter): 512 kWh')).toEqual(['in']);
    expect(role('Heat out (heat meter): 1,840 kWh')).toEqual(['out']);
    expect(role('Input (W, measured): 40 W')).toEqual(['in']);
  });
});

describe('what an engine develops or is indicated at (issue 11, invented test data)', () => {
  it('"it developed 412 indicated horse-power", "indicated 140 H.P. on test" are outputs', () => {
    expect(extractFigures('On its acceptance trial the Example Works engine developed 412 indicated horse-power.').map((f) => f.role)).toEqual(['out']);
    expect(extractFigures('Cylinder bore unknown; indicated 140 H.P. on test.').map((f) => f.role)).toEqual(['out']);
  });
});

describe('the work a machine does, and work of another kind (issue 11, invented test data)', () => {
  it('"does 2.7 × 10¹¹ erg of work each minute" is an output; "needs 50 J of work to wind" is not', () => {
    expect(extractFigures('A small motor does 2.7 × 10¹¹ erg of work each minute.').map((f) => f.role)).toEqual(['out']);
    expect(extractFigures('The spring needs 50 J of work to wind it fully.').map((f) => f.role)).not.toEqual(['out']);
  });
});

describe('excesses and differences said the long way (invented test data)', () => {
  test('"2.1 kW more heat out than electricity in" and "800 W more power at the crank than the cell takes" are excesses', () => {
    const a = extractFigures('It puts 3.2 kW of heat into the cabin while drawing only 1.1 kW — 2.1 kW more heat out than electricity in.');
    expect(a.filter((x) => x.kind === 'power' && !x.derived).map((x) => [x.role, x.si])).toEqual([
      ['out', 3200],
      ['in', 1100],
      ['excess', 2100],
    ]);
    const b = extractFigures('The cell uses about 300 W from the alternator, and the gas gives back 800 W more power at the crank than the cell takes.');
    expect(b.find((x) => x.si === 800)?.role).toBe('excess');
    // ("more than in winter": a season, no input.)
    expect(extractFigures('The pump gave 2 kW more heat than in winter.').find((x) => x.si === 2000)?.role).not.toBe('excess');
  });

  test('"the temperature difference between the tarmac and the air — about 25 K" is a difference', () => {
    const f = extractFigures('The cart runs on “the temperature difference between the tarmac and the air” — about 25 K on a summer afternoon.');
    expect(f.map((x) => [x.kind, x.si])).toEqual([['temperature-difference', 25]]);
  });

  test('the time it takes to fit a kit is no run: "bolts under the bonnet in an hour"', () => {
    const f = extractFigures('The kit bolts under the bonnet in an hour. It uses about 300 W from your alternator.');
    expect(f.find((x) => x.kind === 'duration')?.role).toBe('aside');
    expect(f.some((x) => x.kind === 'energy')).toBe(false);
  });
});

describe('inputs, differences, runs and unit sizes in older prose (invented test data)', () => {
  test('"110 volts at 5 amperes go into the primary", "85 watts going into the element" are inputs', () => {
    const a = extractFigures('110 volts at 5 amperes go into the primary, and 1,100 volts at 0.45 ampere come out of the secondary.');
    expect(a.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
      ['in', 550], // 110 V × 5 A
      ['out', 495], // 1,100 V × 0.45 A
    ]);
    expect(extractFigures('With 85 watts going into the element, the cartridge grew warm.')[0].role).toBe('in');
  });

  test('"the difference — some 15 degrees Fahrenheit on a summer day — between …" is a difference of 15 °F', () => {
    const f = extractFigures('It was to run on nothing but the difference — some 15 degrees Fahrenheit on a summer day — between the air and the water of a well.');
    expect(f[0].kind).toBe('temperature-difference');
    expectRelClose(f[0].si, (15 * 5) / 9, EXACT); // NIST SP 811 B.9: a Fahrenheit interval is 5/9 K
  });

  test('"over a steady week" is a run of seven days', () => {
    const f = extractFigures('With 85 watts going into the element it gave off, over a steady week, an excess of 6 W.');
    expect(f.find((x) => x.kind === 'duration')?.si).toBe(7 * 86400);
  });

  test('a unit\'s size is no flow: "thermochemical kilocalories of 4,184 joules"', () => {
    const f = extractFigures('An excess of 6 kcal per hour — he means thermochemical kilocalories of 4,184 joules.');
    expect(f.map((x) => [x.kind, x.role])).toEqual([
      ['power', 'excess'],
      ['energy', 'aside'],
    ]);
  });
});

describe('spoken and hedged figures (invented test data)', () => {
  test('a bare number after "underfloor at", "the radiators at" or "Flow temperature" takes the unit of a temperature said before', () => {
    const a = extractFigures('Ground loop at ten degrees, underfloor at thirty, and it has averaged a COP of four point six.');
    expect(a.filter((x) => x.kind === 'temperature').map((x) => [x.role, x.si])).toEqual([
      ['cold', 283.15], // 10 °C + 273.15 (NIST SP 811 §4.2.1.1)
      ['hot', 303.15],
    ]);
    const b = extractFigures('The coldest day it was two degrees out. It put eleven kilowatts of heat into the house. Flow temperature forty-five.');
    expect(b.filter((x) => x.kind === 'temperature').map((x) => x.si)).toEqual([275.15, 318.15]);
  });

  test('"drawing two point eight from the grid" and "about four hundred and fifty at the wheel" take the unit of the power before', () => {
    const a = extractFigures('It was putting eleven kilowatts of heat into the house and drawing two point eight from the grid.');
    expect(a.filter((x) => x.kind === 'power' && !x.derived).map((x) => [x.role, x.si])).toEqual([
      ['out', 11000],
      ['in', 2800],
    ]);
    const b = extractFigures("So you're feeding it, what, five hundred and forty watts, and we measured about four hundred and fifty at the wheel.");
    expect(b.map((x) => [x.role, x.si])).toEqual([
      ['in', 540],
      ['out', 450],
    ]);
  });

  test('"3 or 4 kW" and "one point eight, one point nine kilowatts" are ranges; a list is not', () => {
    expect(extractFigures('The heater gives 3 or 4 kW.').map((x) => [x.si, x.upper?.si])).toEqual([[3000, 4000]]);
    expect(extractFigures('Output on the genny side: one point eight, one point nine kilowatts.').map((x) => [x.si, x.upper?.si])).toEqual([[1800, 1900]]);
    // ("1.8, 2.4 and 3.0 kW": a list, each its own; "2 or 5 kW": too far apart to be one hedged figure.)
    expect(extractFigures('Readings were 1.8, 2.4 and 3.0 kW.').some((x) => x.upper !== undefined)).toBe(false);
    expect(extractFigures('It gives 2 or 5 kW.').some((x) => x.upper !== undefined)).toBe(false);
  });

  test('the wind\'s speed is set aside: "in 20 km/h winds", "Wind was light, 8–12 km/h"', () => {
    expect(extractFigures('The wing sail gives up to 400 N of drive in 20 km/h winds.').find((x) => x.kind === 'speed')?.role).toBe('aside');
    expect(extractFigures('Wind was light, 8–12 km/h. It stayed aloft for 46 minutes.').find((x) => x.kind === 'speed')?.role).toBe('aside');
    expect(extractFigures('The boat reached 20 km/h.').find((x) => x.kind === 'speed')?.role).not.toBe('aside');
  });

  test('"twin 250 hp outboards" are 500 hp in all', () => {
    const f = extractFigures('Ours had twin 250 hp outboards and topped out at 50 mph.');
    const total = f.find((x) => x.kind === 'power' && x.derived);
    expectRelClose(total!.si, 2 * 250 * 745.6999, 1e-6); // NIST SP 811 B.8: 1 hp = 745.699 9 W
  });
});

describe('a thrust per power and one power give the thrust (invented test data)', () => {
  test('"3.2 N per kW … will run at 12 kW" is 38.4 N; "fourteen millinewtons a watt" is a thrust per power', () => {
    const f = extractFigures('The unit produced 3.2 N per kW in hover tests, and the production version will run at 12 kW.');
    const thrust = f.find((x) => x.kind === 'thrust')!;
    expectRelClose(thrust.si, 3.2e-3 * 12000, EXACT);
    expect(thrust.derived).toBeTruthy();
    const g = extractFigures('Call it fourteen millinewtons a watt.');
    expect(g.map((x) => [x.kind, x.si])).toEqual([['thrust-per-power', 0.014]]);
    // (A thrust already said is not worked out again.)
    expect(extractFigures('A pull of 4.9 mN, which is 14 mN per kW of the 350 W input.').filter((x) => x.kind === 'thrust')).toHaveLength(1);
  });
});

describe('a noun before a verb of driving, and a speed glossed as a multiple of c (invented test data)', () => {
  test('"a drive motor drawing roughly 1 kW" is the motor\'s input, not a load it drives', () => {
    expect(extractFigures('A drive motor drawing roughly 1 kW spins the rotor.')[0].role).toBe('in');
    // (A verb still makes a load: "it drives a pump drawing 1 kW".)
    expect(extractFigures('The rig drives a pump drawing 1 kW.')[0].role).toBe('out');
  });
  test('"1.2 billion mph – nearly twice the speed of light" is 1.2 billion mph; the gloss is set aside', () => {
    const f = extractFigures('It will reach a top speed of 1.2 billion mph – nearly twice the speed of light.');
    expect(f.map((x) => x.role)).toEqual([null, 'aside']);
    expectRelClose(f[0].si, 1.2e9 * 0.44704, EXACT); // NIST SP 811 B.8: mile per hour = 0.447 04 m/s (exact)
  });
});

describe('ratings, surges and service times (invented test data)', () => {
  test('how long a surge lasts, or when to replace a set, is no run', () => {
    const a = extractFigures('Plate says 3 kW continuous, 6 kW surge for 3 s.');
    expect(a.find((x) => x.kind === 'duration')?.role).toBe('aside');
    expect(a.some((x) => x.kind === 'energy')).toBe(false);
    const b = extractFigures('Peak: up to 7.5 kW for 10 seconds for motor starting.');
    expect(b.find((x) => x.kind === 'duration')?.role).toBe('aside');
    const c = extractFigures('Measured output 2.6 kW with the car at full load. Recommend replacement within 2 years.');
    expect(c.find((x) => x.kind === 'duration')?.role).toBe('aside');
    expect(c.some((x) => x.kind === 'energy')).toBe(false);
  });
  test('"alternator 10 kW continuous (10,5 kW peak)" are the alternator\'s outputs', () => {
    const f = extractFigures('Diesel generator: engine 15 CV, alternator 10 kW continuous (10,5 kW peak), tank 25 litres.');
    expect(f.filter((x) => x.kind === 'power' && x.si !== f[0].si).map((x) => [x.role, x.si])).toEqual([
      ['out', 10000],
      ['out', 10500],
    ]);
  });
  test('"chilled water leaving at 7 °C; condensing 28 K above" puts the condensing side 28 K above 7 °C', () => {
    const f = extractFigures('Test conditions: chilled water leaving at 7 °C; condensing 28 K above the leaving chilled-water temperature. COP (cooling): 3.49');
    const t = f.filter((x) => x.kind === 'temperature');
    expect(t.map((x) => [x.role, Number(x.si.toFixed(2))])).toEqual([
      ['cold', 280.15], // 7 °C + 273.15 (NIST SP 811 §4.2.1.1)
      ['hot', 308.15], // + 28 K
    ]);
  });
});

describe('a store\'s energy in brackets (invented test data)', () => {
  test('"its 22.2 V, 10 Ah pack (222 Wh)" holds 222 Wh, the energy it has to give', () => {
    const f = extractFigures('It stayed aloft for 46 minutes on its 22.2 V, 10 Ah pack (222 Wh).');
    const e = f.find((x) => x.kind === 'energy' && x.text === '222 Wh')!;
    expect(e.role).toBe('in');
    expectRelClose(e.si, 222 * 3600, EXACT); // 1 Wh = 3600 J (NIST SP 811 B.8)
  });
});

describe("a cooler's cooling efficiency, a propellant named by its make-up (invented test data)", () => {
  test('"a cooling efficiency of 45 %" of a thermoelectric cooler is a cooling COP of 0.45, not an engine efficiency', () => {
    const text = 'The thermoelectric cooler holds the plate 25 K below the 30 °C heat sink while removing 18 W of heat on 40 W; the maker calls this a cooling efficiency of 45 %.';
    const f = extractFigures(text);
    const cop = f.find((x) => x.text === '45 %')!;
    expect([cop.kind, cop.role]).toEqual(['cop', 'cooling']);
    expectRelClose(cop.si, 0.45, EXACT);
    // An engine's percentage beside it stays an efficiency.
    expect(extractFigures('The engine runs at a thermal efficiency of 45 % between 600 °C and 40 °C.').find((x) => x.text === '45 %')!.kind).toBe('efficiency');
  });
  test('"2.4 t including 1.65 t of MMH/MON propellant" is propellant; "0.4 t of empty propellant tanks" is not', () => {
    const f = extractFigures('The descent stage has a wet mass of 2.4 t including 1.65 t of MMH/MON propellant and an Isp of 318 s.');
    const p = f.find((x) => x.text === '1.65 t')!;
    expect(p.role).toBe('propellant');
    expectRelClose(p.si, 1650, EXACT); // 1 t = 1000 kg (BIPM SI Brochure, Table 8)
    expect(extractFigures('The stage masses 3 t, of which 0.4 t of empty propellant tanks; it carries 2 t of propellant.').find((x) => x.text === '0.4 t')!.role).not.toBe('propellant');
  });
});

describe('inputs said by what the device is run at or given (invented test data)', () => {
  test('"the input stage supplied at 12 V and 2.1 A" is the input; "the output delivered 0.9 A into a 48 V load" the output', () => {
    const f = extractFigures('The authors report that with the input stage supplied at 12 V and 2.1 A, the output delivered 0.9 A into a 48 V load.');
    const p = f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si]);
    expect(p).toHaveLength(2);
    expect(p[0][0]).toBe('in');
    expectRelClose(p[0][1] as number, 25.2, 1e-12); // P = I × V = 2.1 A × 12 V (W = V·A, BIPM SI Brochure Table 4)
    expect(p[1][0]).toBe('out');
    expectRelClose(p[1][1] as number, 43.2, 1e-12); // 0.9 A × 48 V
  });
  test('"a rider puts about 120 W into the cranks" is what the machine takes', () => {
    expect(extractFigures('A reasonably fit rider puts about 120 W into the cranks and the hub generator gives back 100 W.').find((x) => x.text === '120 W')!.role).toBe('in');
  });
  test('"put back twelve kilowatts while the drive motor is only drawing eight" reads eight kilowatts drawn', () => {
    const f = extractFigures('Our axle generators put back twelve kilowatts while the drive motor is only drawing eight, so the battery gains charge.');
    const eight = f.find((x) => x.text === 'eight')!;
    expect([eight.kind, eight.role]).toEqual(['power', 'in']);
    expectRelClose(eight.si, 8000, EXACT); // 1 kW = 1000 W (SI prefix kilo, BIPM SI Brochure Table 7)
  });
});

describe('outputs said by where the energy ends up (invented test data)', () => {
  test('"4.4 W of the input leaves as visible light" is the lamp\'s output; its "11 W" what it takes', () => {
    const f = extractFigures('Their 11 W LED bulb is "40 % efficient, i.e. 4.4 W of the input leaves as visible light".');
    expect(f.find((x) => x.text === '4.4 W')!.role).toBe('out');
    expect(f.find((x) => x.text === '11 W')!.role).toBe('in');
    // The input itself is still the input.
    expect(extractFigures('The heater takes 2 kW of input and gives 1.9 kW of heat.').find((x) => x.text === '2 kW')!.role).toBe('in');
  });
  test('"took 9.6 kWh from the meter and 8.9 kWh ended up in the stored water": out of the element', () => {
    const f = extractFigures('Over the 48-hour run the element took 9.6 kWh from the meter and 8.9 kWh ended up in the stored water.');
    expect(f.find((x) => x.text === '9.6 kWh')!.role).toBe('in');
    const out = f.find((x) => x.text === '8.9 kWh')!;
    expect(out.role).toBe('out');
    expectRelClose(out.si, 8.9 * 3.6e6, 1e-12); // 1 kWh = 3.6 MJ (NIST SP 811 B.8)
  });
  test('"three-quarters of a horsepower" is 0.75 hp', () => {
    const f = extractFigures('The wheel put out three-quarters of a horsepower for six hours.');
    expectRelClose(f.find((x) => x.kind === 'power')!.si, 0.75 * 745.69987158227, 1e-9); // hp = 745.699 871 582 27 W (NIST SP 811 B.8)
  });
});

test('"nothing was driving it but its own weights" says the wheel takes nothing in (invented test data)', () => {
  const f = extractFigures('The overbalanced wheel put out half a horsepower for six hours, and nothing was driving it but its own weights.');
  expect(f.some((x) => x.kind === 'power' && x.role === 'in' && x.si === 0)).toBe(true);
  // A wheel a motor drives takes what the motor gives.
  expect(extractFigures('The wheel put out half a horsepower for six hours while a 1 kW motor was driving it.').some((x) => x.role === 'in' && x.si === 0)).toBe(false);
});

test('"fully fuelled, the storable-propellant stage weighs 2,300 kg" is the stage\'s wet mass, not its propellant (invented test data)', () => {
  const f = extractFigures('Fully fuelled, the storable-propellant stage weighs 2,300 kg and, firing at 320 s Isp, will deliver 6 km/s.');
  expect(f.find((x) => x.text === '2,300 kg')!.role).toBe('wet');
  // Propellant said as such stays propellant.
  expect(extractFigures('The stage carries 1,900 kg of propellant.').find((x) => x.text === '1,900 kg')!.role).toBe('propellant');
});

test('"converting 4.5 % of the heat it passes into electricity — 12 W" is the converter\'s output (invented test data)', () => {
  const f = extractFigures('The stove-top thermoelectric generator runs with its hot plate at 300 °C and its fins at 60 °C, converting 4.5 % of the heat it passes into electricity — 12 W, enough to charge phones.');
  expect(f.find((x) => x.text === '12 W')!.role).toBe('out');
});

test('"9 kW of cooling", "16 kW nominal heating output": what a cooler or a heat pump gives (invented test data)', () => {
  expect(extractFigures('Model C-9: 9 kW of cooling, COP 3.4 with 35 °C outdoors and the hall at 26 °C.').find((x) => x.text === '9 kW')!.role).toBe('out');
  expect(extractFigures('The plant room has an air-to-water unit, 14 kW nominal heating output.').find((x) => x.text === '14 kW')!.role).toBe('out');
  // Cooling water and a cooling fan are no cooling given.
  expect(extractFigures('The rig needs 2 kW of cooling water flow.').find((x) => x.text === '2 kW')!.role).not.toBe('out');
});

test('"puts 2.0e-3 J of work into the piezo stack … 5.0e-4 J of it reaches the sensor": in, then the part that comes out (invented test data)', () => {
  const f = extractFigures('Every footstep puts 2.0e-3 J of mechanical work into the piezo stack, and 5.0e-4 J of it reaches the sensor node.');
  expect(f.find((x) => x.text === '2.0e-3 J')!.role).toBe('in');
  expect(f.find((x) => x.text === '5.0e-4 J')!.role).toBe('out');
});

test('a quantum efficiency asked about again ("how was the 140 % measured", beside a question on the power conversion efficiency) stays a quantum efficiency (invented test data)', () => {
  const f = extractFigures('The group reports "140 % external quantum efficiency" from its singlet-fission photodiode: more than one electron per photon. We would ask: what is the power conversion efficiency, and how was the 140 % measured?');
  expect(f.filter((x) => x.text === '140 %').map((x) => x.kind)).toEqual(['quantum-efficiency', 'quantum-efficiency']);
  // A power conversion efficiency stated above 100 % is still an energy claim.
  expect(extractFigures('The cell counts two electrons per photon, and its power conversion efficiency is 130 %.').find((x) => x.text === '130 %')!.kind).toBe('efficiency');
});

test('"over a 96-hour run the unit, which draws 0.3 kW …, fed 40 kWh into the export meter": the run is a noun, the draw goes in and the meter counts the output (invented test data)', () => {
  const f = extractFigures('Over a 96-hour run the unit, which draws 0.3 kW for its controller, fed 40 kWh into the export meter.');
  expect(f.find((x) => x.text === '0.3 kW')!.role).toBe('in');
  expect(f.find((x) => x.text === '40 kWh')!.role).toBe('out');
  // A load the device runs still draws its output.
  expect(extractFigures('The battery ran a chest freezer drawing 300 W.').find((x) => x.text === '300 W')!.role).toBe('out');
});

test('"keeps the inside at 4 °C when it\'s 32 in the car" gives the car\'s temperature in the same scale (invented test data)', () => {
  const text = 'The Peltier cool box keeps the inside at 4 °C when it\'s 32 in the car, and the label says COP 0.45.';
  const f = extractFigures(text);
  expect(f.find((x) => x.text === '32')!.si).toBeCloseTo(32 + 273.15, 9); // °C + 273.15 = K (NIST SP 811 §4.2.1.1)
  // No sibling in °C in the sentence: the bare number stays unread.
  expect(extractFigures("It keeps drinks cold when it's 32 in the car.").some((x) => x.kind === 'temperature')).toBe(false);
});

test('"puts out about 1.4 kW more heat than it takes from the socket" is an excess, not the output (invented test data)', () => {
  const f = extractFigures('The heat-pump dryer puts out about 1.4 kW more heat than it takes from the socket.');
  expect(f.find((x) => x.text === '1.4 kW')!.role).toBe('excess');
  expect(extractFigures('The heater puts out about 1.4 kW.').find((x) => x.text === '1.4 kW')!.role).toBe('out');
});

test('"water to 55 °C with the outside air at minus 8" carries °C to the bare figure with its sign said in words (invented test data)', () => {
  const f = extractFigures('The heat pump heats water to 55 °C with the outside air at minus 8, and the firm says COP 7.');
  expect(f.find((x) => x.text === '55 °C')!.role).toBe('hot');
  const cold = f.find((x) => x.kind === 'temperature' && x.role === 'cold')!;
  expect(cold.si).toBeCloseTo(-8 + 273.15, 9); // °C + 273.15 = K (NIST SP 811 §4.2.1.1)
});

test('"The 10 kg cubesat (dry) carries 1.2 kg of butane": the craft named, then said dry (invented test data)', () => {
  const f = extractFigures('The 10 kg cubesat (dry) carries 1.2 kg of butane for its cold-gas thruster.');
  expect(f.find((x) => x.text === '10 kg')!.role).toBe('dry');
  expect(f.find((x) => x.text === '1.2 kg')!.role).toBe('propellant');
});

test('"Eighteen tonnes on the pad, nine when the tanks are dry": the bare second mass is the dry one, in tonnes (invented test data)', () => {
  const f = extractFigures('Eighteen tonnes on the pad, nine when the tanks are dry, and the engine is 300 seconds Isp.');
  const dry = f.find((x) => x.kind === 'mass' && x.role === 'dry')!;
  expect(dry.si).toBeCloseTo(9000, 6); // t = 1000 kg (BIPM SI Brochure, Table 8)
});
