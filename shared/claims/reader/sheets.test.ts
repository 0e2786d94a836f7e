/**
 * Claims pasted from specification sheets, data sheets and bullet lists: labels with a colon, one
 * figure a line, the trade's notation. Conversions: NIST SP 811 (2008) Appendix B.8 (°C → K adds
 * 273.15; 1 Wh = 3600 J; 1 week = 604 800 s). Rating points: EN 14511 writes a heat pump's test
 * condition as source and sink temperatures, "A7/W35" = outdoor air 7 °C, water flow 35 °C.
 */
import { runClaimChecks } from '../plan';
import { extractFigures } from '../reader';
import { expectWellFormed } from './test-support';

const read = (text: string) => {
  const f = extractFigures(text);
  expectWellFormed(text, f);
  return f;
};
const brief = (text: string) => read(text).map((f) => [f.kind, f.role, Math.round(f.si * 1000) / 1000]);

describe('claims pasted from sheets and lists', () => {
  test('a difference given by its label ("ΔT source to flow: 40 K") is a difference, and the other side follows', () => {
    // 55 °C = 328.15 K; 328.15 − 40 = 288.15 K.
    expect(brief('Flow temperature: 55 °C\nΔT source to flow: 40 K\nHeating COP: 3.2')).toEqual([
      ['temperature', 'hot', 328.15],
      ['temperature-difference', null, 40],
      ['temperature', 'cold', 288.15],
      ['cop', 'heating', 3.2],
    ]);
    // Before: 40 K read as an absolute cold side made a lawful heat pump break Carnot (a false alarm).
    const text = 'Flow temperature: 55 °C\nΔT source to flow: 40 K\nHeating COP: 3.2';
    const run = runClaimChecks(extractFigures(text), { text, classes: [] });
    expect(run.checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });

  test("a store drained by a load: the store's energy is the input, the load's draw over the run the output", () => {
    // 20 Wh = 72 000 J; 0.05 W × 2 weeks = 0.05 × 1 209 600 s = 60 480 J ≤ 72 000 J (lawful).
    const text = 'Cell: 20 Wh lithium pack\nLamp draw: 0.05 W continuous\nRan two weeks before the cell was flat';
    expect(brief(text)).toEqual([
      ['energy', 'in', 72000],
      ['power', 'out', 0.05],
      ['duration', null, 1209600],
      ['energy', 'out', 60480],
    ]);
    expect(runClaimChecks(extractFigures(text), { text, classes: [] }).checks.find((c) => c.check === 'first-law')?.finding).toBe('consistent');
    // Not where something else feeds the load or the store is charged.
    expect(read('A 20 Wh pack and a small solar panel keep a lamp drawing 1 W lit for 3 days.').find((f) => f.kind === 'power')?.role).toBe('in');
    expect(read('The charger draws 60 W and fills a 20 Wh pack in 30 minutes.').find((f) => f.kind === 'power')?.role).toBe('in');
  });

  test('"Input: none" on a sheet is an input of 0', () => {
    // 5 hp × 745.69987158227 W/hp = 3728.5 W.
    expect(brief('Flyer, magnet motor\n• 5 hp continuous\n• Input: none, runs on its magnets')).toEqual([
      ['power', 'out', 3728.499],
      ['power', 'in', 0],
    ]);
  });

  test('"Isp (vac): 320 s" is a specific impulse', () => {
    expect(brief('m0 = 1,250 kg; propellant: 800 kg\nIsp (vac): 320 s').find(([k]) => k === 'specific-impulse')).toEqual(['specific-impulse', null, 320]);
  });

  test('one rating point "A7/W35" gives the two sides; two different points are left alone', () => {
    // 7 °C = 280.15 K (cold, source air); 35 °C = 308.15 K (hot, water flow).
    const f = read('Air-to-water heat pump\nHeat output (A7/W35): 9.2 kW\nElectrical input: 2.0 kW\nCOP: 4.6').filter((x) => x.kind === 'temperature');
    expect(f.map((x) => [x.role, Math.round(x.si * 100) / 100])).toEqual([
      ['cold', 280.15],
      ['hot', 308.15],
    ]);
    expect(read('Ground source unit, COP 5.1 at B0/W35 and 3.4 at B0/W55.').filter((x) => x.kind === 'temperature')).toEqual([]);
  });
  test('a store that "stores" its energy and a load over a run with "no sun at all"; people charging a store; seconds into a motor', () => {
    // 3 Wh = 10 800 J in; 0.1 W × 2 weeks = 0.1 × 1 209 600 s = 120 960 J out: more out than the store holds.
    const lamp = 'The garden lamp\'s cell stores three watt-hours, and the LED draws a tenth of a watt. And it runs two weeks with no sun at all.';
    expect(brief(lamp).filter(([k]) => k === 'energy' || k === 'power')).toEqual([
      ['energy', 'in', 10800],
      ['power', 'out', 0.1],
      ['energy', 'out', 120960],
    ]);
    expect(runClaimChecks(extractFigures(lamp), { text: lamp }).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    // 480 J out of 500 J in: 0.96.
    const cap = 'We charged the supercapacitor with five hundred joules, and it gave back 480 J over ten seconds into the motor.';
    expect(brief(cap)).toEqual([
      ['energy', 'in', 500],
      ['energy', 'out', 480],
      ['duration', null, 10],
    ]);
    expect(read('The probe has a 3,000 s ion engine.').map((x) => x.kind)).toEqual(['specific-impulse']);
  });
});

describe('a table set as text with dotted leaders (invented test data)', () => {
  test('the leader stands for the colon between a label and its value', () => {
    const text = 'Key data:\n  Thermal power of the heat source ........ 2.0 × 10³ W\n  Electrical output ....................... 1.1e2 W\n  Conversion efficiency ................... 5,5 %\n';
    const f = extractFigures(text);
    expect(f.map((x) => [x.kind, x.role, x.text])).toEqual([
      ['power', 'in', '2.0 × 10³ W'],
      ['power', 'out', '1.1e2 W'],
      ['efficiency', null, '5,5 %'],
    ]);
    expect(f[2].si).toBeCloseTo(0.055, 12);
    for (const x of f) expect(text.slice(x.start!, x.end!)).toBe(x.text);
  });
});

test('a table with its units in a column of their own, pipe- or tab-separated, reads each value with its unit (invented test data)', () => {
  const piped =
    'Parameter | Value | Unit | Note\nHot-side surface | 300 | °C | mean\nHeat through the modules | 1.6 | kW | from coolant flow\nElectrical output | 80 | W | DC bus\nConversion efficiency | 5.0 | % | output / heat\nDC bus voltage | 28 | V | —';
  const f = extractFigures(piped);
  expect(f.map((x) => [x.kind, x.si])).toEqual([
    ['temperature', 573.15],
    ['power', 1600],
    ['power', 80],
    ['efficiency', 0.05],
    ['voltage', 28],
  ]);
  // Offsets still point into the pasted text.
  for (const x of f) expect(piped.slice(x.start!, x.end!)).toBe(x.text);
  // The 5 % efficiency, not 500 %: η_C = 1 − 353.15/573.15 would need the cold side; with it the check is consistent.
  const tabbed = 'Item\tValue\tUnit\nThrust\t2.5\tmN\nInput power\t1.2\tkW';
  expect(extractFigures(tabbed).map((x) => [x.kind, x.si])).toEqual([
    ['thrust', 0.0025],
    ['power', 1200],
  ]);
});

test('a padded Markdown table whose headers name the units ("Heater head (°C)") reads its bare numbers with them (invented test data)', () => {
  const table =
    '| Run | Heater head (°C) | Cooler jacket (°C) | Notes |\n|-----|------------------|--------------------|-------|\n| 14  | 250              | 20                 | mesh C |';
  const f = extractFigures(table);
  // T(K) = t(°C) + 273.15 (SI Brochure, 9th ed., 2.3.1).
  expect(f.map((x) => [x.kind, x.si])).toEqual([
    ['temperature', 523.15],
    ['temperature', 293.15],
  ]);
  for (const x of f) expect(table.slice(x.start!, x.end!)).toBe(x.text);
  expect(f.map((x) => x.text)).toEqual(['250', '20']);
});

test('a row with no "Unit" header whose number is followed by a cell holding a unit alone reads them together (invented test data)', () => {
  const row = 'Engine between 300 °C and 80 °C | Output 80 W | Efficiency 5.0 | % | rig B';
  const f = extractFigures(row);
  // The 5 % efficiency, not 5 (500 %): η_C = 1 − 353.15/573.15 = 0.384 (textbook formula), so 0.05 is within it.
  expect(f.find((x) => x.kind === 'efficiency')?.si).toBeCloseTo(0.05, 12);
  for (const x of f) expect(row.slice(x.start!, x.end!)).toBe(x.text);
  expect(runClaimChecks(f, { text: row }).checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  const tabbed = 'Thrust\t2.5\tmN\nInput power\t1.2\tkW';
  expect(extractFigures(tabbed).map((x) => [x.kind, x.si])).toEqual([
    ['thrust', 0.0025],
    ['power', 1200],
  ]);
  // A cell that is no unit ("Y", "—", a note) is left as it is: a count stays a count.
  expect(extractFigures('Modules | 24 | — | skutterudite\nPass | 3 | Y')).toEqual([]);
});

test("a condensing unit's rating block: the refrigerant's designation is no current, and heat removed over power in is a cooling COP (invented test data)", () => {
  const sheet = [
    'Refrigerating capacity .......... 5,000 BTU/h',
    'Box (evaporator) temperature .... 0 °F',
    'Ambient air at condenser ........ 90 °F',
    'Power input ..................... 780 W',
    'Refrigerant ..................... R-448A',
    'For walk-in freezers.',
  ].join('\n');
  const f = read(sheet);
  expect(f.some((x) => x.kind === 'current')).toBe(false);
  // 5,000 BTU/h × 0.29307107 W per BTU/h (NIST SP 811 B.8) = 1465.355 W; / 780 W = 1.8787.
  const cop = f.find((x) => x.kind === 'cop');
  expect(cop?.role).toBe('cooling');
  expect(cop!.si).toBeCloseTo((5000 * 0.29307107) / 780, 4);
  // Heat removed beyond the power in is no first-law breach: the bound is the Carnot cooling COP,
  // Tc/(Th − Tc) with 0 °F = 255.372 K and 90 °F = 305.372 K (°F → K per SP 811), = 5.107.
  const run = runClaimChecks(f, { text: sheet, classes: [] });
  expect(run.checks.find((c) => c.check === 'first-law')?.finding).not.toBe('breaks');
  const carnot = run.checks.find((c) => c.check === 'carnot');
  expect(carnot?.finding).toBe('consistent');
  expect(carnot!.outputs.find((o) => o.name === 'cop_cooling_max')!.si).toBeCloseTo(255.3722222 / 50, 3);
});

test('a lift in kelvin beside temperatures in degrees is a difference, not a side colder than liquid nitrogen (invented test data)', () => {
  // Engineering practice writes temperatures in °C and their differences in K.
  const text = 'The consortium proposes a 4 MW heat pump drawing on river water at 10 °C and lifting it by 45 K, with a heating COP of 3.4.';
  const f = read(text);
  expect(f.find((x) => x.text === '45 K')?.kind).toBe('temperature-difference');
  // 10 °C = 283.15 K (SP 811); hot side 328.15 K; Carnot COP = 328.15/45 = 7.292; 3.4 is within it.
  const run = runClaimChecks(f, { text, classes: [] }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'cop_heating_max')!.si).toBeCloseTo(328.15 / 45, 3);
  // Where the text speaks of the very cold, a few tens of kelvin is a temperature.
  const cryo = read('The cryocooler holds its cold head at 40 K while the room is at 20 °C.');
  expect(cryo.find((x) => x.text === '40 K')?.kind).toBe('temperature');
  // A thousands point in a text of decimal commas is no small kelvin figure: "1.800 K" is 1800 K.
  expect(read('A marine diesel is quoted as 38,5 % efficient, with combustion gas at c. 1.800 K and sea water at 15 °C.').find((x) => x.kind === 'temperature' && x.role === 'hot')?.si).toBe(1800);
});

test("a clamping force on a thermoelectric module's data block is no thrust, and the matched-load output stays an output (invented test data)", () => {
  const sheet = ['Hot-side temperature | 350 °C', 'Temperature difference across module | ΔT = 300 K', 'Matched-load output | 21.5 W', 'Conversion efficiency | 6.5 %', 'Hot-side clamping force | 2.2 kN'].join('\n');
  const f = read(sheet);
  expect(f.find((x) => x.text === '2.2 kN')?.role).toBe('aside');
  expect(f.find((x) => x.text === '21.5 W')?.role).toBe('out');
  const run = runClaimChecks(f, { text: sheet, classes: [] });
  // No photon bound on a clamp: nothing here claims propulsion.
  expect(run.checks.some((c) => c.check === 'photon-bound')).toBe(false);
  // Carnot: 1 − 323.15/623.15 = 0.4814 (hot 350 °C = 623.15 K, cold 300 K below); 6.5 % is within it.
  expect(run.checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  // A thrust beside the holding force keeps its own reading.
  expect(read('The magnet has a holding force of 400 N and the drive gives 2 mN of thrust from 1 kW.').map((x) => [x.text, x.role])).toEqual([
    ['400 N', 'aside'],
    ['2 mN', null],
    ['1 kW', 'in'],
  ]);
});

test('"no fuel" of a portable power station whose sheet gives its capacity is no claim of nothing in (invented test data)', () => {
  const sheet = ['Cell chemistry | LiFePO4', 'Capacity | 2,048 Wh', 'AC output rating | 2,000 W continuous', 'Runtime test (250 W AC load) | 7.1 h', '"A whole weekend of camping power with no fuel."'].join('\n');
  const f = read(sheet);
  expect(f.some((x) => x.role === 'in' && x.si === 0)).toBe(false);
  expect(runClaimChecks(f, { text: sheet, classes: [] }).checks.some((c) => c.finding === 'breaks')).toBe(false);
});

test('a rating condition in a label is no role ("Fuel energy input (LHV) at rated output"), and "no battery for start-up" is no claim of nothing in (invented test data)', () => {
  const sheet = ['PEM fuel cell module', 'Rated electrical output | 1.35 kW', 'Fuel energy input (LHV) at rated output | 2.6 kW', 'The module needs no battery for start-up beyond the controller’s own.'].join('\n');
  const f = read(sheet);
  expect(f.map((x) => [x.text, x.role])).toEqual([
    ['1.35 kW', 'out'],
    ['2.6 kW', 'in'],
  ]);
  // 1.35 / 2.6 = 0.519: less out than in, consistent with the first law.
  const run = runClaimChecks(f, { text: sheet, classes: [] }).checks.find((c) => c.check === 'first-law');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(1.35 / 2.6, 9);
  // The condition said with its own figure keeps its role: "at the rated output of 310 kW".
  expect(read('A brake thermal efficiency of 44 % at the rated output of 310 kW.').find((x) => x.text === '310 kW')?.role).toBe('out');
});

test("a heat pump sheet's line labelled with the side: the source is the cold side (invented test data)", () => {
  expect(brief('Industrial heat pump\nSource: process cooling water, inlet 10 °C\nTemperature lift: 40 K\nHeating COP: 3.1')).toEqual([
    ['temperature', 'cold', 283.15],
    ['temperature-difference', null, 40],
    ['temperature', 'hot', 323.15],
    ['cop', 'heating', 3.1],
  ]);
});

test("a sheet's percentage after a label with a test point and leader dots, and a machine with a compressor and a heating output, read as a heating COP (invented test data)", () => {
  // "Heating efficiency (A2/W35) ... 380 %": heat delivered over electricity used = COP 3.8; A2/W35 = air 2 °C, water 35 °C (EN 14511 notation).
  expect(brief('Air-to-water heat pump\nHeating efficiency (A2/W35) ............ 380 %')).toEqual([
    ['temperature', 'cold', 275.15],
    ['temperature', 'hot', 308.15],
    ['cop', 'heating', 3.8],
  ]);
  expect(brief('Compressor: twin rotary\nHeating output ...... 14.1 kW\nEfficiency ...... 910 %')).toContainEqual(['cop', 'heating', 9.1]);
  // A heater said to have no compressor is no heat pump: its 250 % stays an efficiency (more out than in).
  expect(brief('Infrared panel heater (no compressor, no outdoor unit)\n• 250 % efficient\n• Heat output: 2.5 kW')).toContainEqual(['efficiency', null, 2.5]);
});

test('a test card\'s row "Propellant ....... none" says the thruster throws out nothing: the photon bound applies (invented test data)', () => {
  const card = ['RF input power ........... 0.5–1.5 kW', 'Measured thrust .......... 3–6 mN', 'Propellant ............... none (closed copper cavity)'].join('\n');
  const run = runClaimChecks(read(card), { text: card, classes: [] }).checks.find((c) => c.check === 'photon-bound');
  // The end most favourable to the claim: the least thrust over the most power, 3 mN against 1.5 kW / c
  // (c = 299 792 458 m/s exactly, SI Brochure 2.2) = 5.0035 µN: 599.6 times the bound.
  expect(run?.finding).toBe('breaks');
  expect(run!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo(0.003 / (1500 / 299792458), 3);
  // Craft it could be bolted to are no propulsor of its own: 3.5 lbf (4.4482216152605 N each, SP 811 B.8)
  // against 1.5 hp (745.69987 W each) / c.
  const gyro = ['Drive motor ...... 1.5 hp, 115 V AC', 'Net unidirectional thrust .. 3.5 lbf', 'Propellant / exhaust ....... none', '', 'Bolt it to a cart, a boat or a satellite.'].join('\n');
  const g = runClaimChecks(read(gyro), { text: gyro, classes: [] }).checks.find((c) => c.check === 'photon-bound');
  expect(g?.finding).toBe('breaks');
  expect(g!.outputs.find((o) => o.name === 'ratio')!.si).toBeCloseTo((3.5 * 4.4482216152605) / ((1.5 * 745.69987158227) / 299792458), -3);
  // A row that names a propellant is no such claim.
  const ion = ['Input power | 1.5 kW', 'Thrust | 60 mN', 'Propellant | xenon, 3 mg/s'].join('\n');
  expect(runClaimChecks(read(ion), { text: ion, classes: [] }).checks.some((c) => c.check === 'photon-bound' && c.finding === 'breaks')).toBe(false);
});

test("a sheet giving each side under its heading ('INPUT' / 'OUTPUT', one figure a line): each side's voltage and current make its power (invented test data)", () => {
  const sheet = ['FLUX-CELL FC-24', '', 'INPUT', '  Voltage ............ 36 V DC', '  Current ............ 2.5 A', 'OUTPUT', '  Voltage ............ 24 V DC (regulated)', '  Current ............ 14 A continuous', 'Weight ............... 3.8 kg'].join('\n');
  const f = read(sheet);
  // P = IV: 2.5 A × 36 V = 90 W in, 14 A × 24 V = 336 W out; 336 / 90 = 3.73 times the input.
  expect(f.filter((x) => x.kind === 'power').map((x) => [x.role, x.si])).toEqual([
    ['in', 90],
    ['out', 336],
  ]);
  const run = runClaimChecks(f, { text: sheet, classes: [] }).checks.find((c) => c.check === 'first-law');
  expect(run?.finding).toBe('breaks');
  expect(run!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(336 / 90, 9);
});

test("a sheet's one data block beside a blurb is the device's own data, and a row's whole label gives its figure's side (invented test data)", () => {
  const sheet = ['RC-1200 recirculating chiller', 'Specifications at 30 °C ambient', '', 'Cooling capacity at +5 °C coolant ........ 1,200 W', 'Power consumption (at +5 °C point) ....... 450 W', 'Refrigerant .............................. R290, 150 g', '', 'Pulls more heat out of your rotary evaporator than it takes from the wall.'].join('\n');
  const f = read(sheet);
  expect(f.find((x) => x.text === '1,200 W')?.role).not.toBe('aside');
  expect(f.find((x) => x.text === '450 W')?.role).toBe('in');
});

test("an engine's label: 'Heat source ..... surrounding air, 20 °C' is its hot side, and 'Working temperature difference .. 5 °C' a difference (invented test data)", () => {
  const label = ['Heat source ..................... surrounding air, 20 °C', 'Working temperature difference .. 5 °C', 'Shaft power ..................... 450 W', 'Conversion efficiency ........... 12 %'].join('\n');
  expect(brief(label).filter(([k]) => k === 'temperature' || k === 'temperature-difference')).toEqual([
    ['temperature', 'hot', 293.15],
    ['temperature-difference', null, 5],
    ['temperature', 'cold', 288.15],
  ]);
  // Carnot: 1 − 288.15/293.15 = 0.01706; 12 % is 7.04 times it.
  const run = runClaimChecks(read(label), { text: label, classes: [] }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('breaks');
  expect(run!.outputs.find((o) => o.name === 'eta_ratio')!.si).toBeCloseTo(0.12 / (1 - 288.15 / 293.15), 6);
});

describe("a sheet's row whose label holds a test condition (invented test data)", () => {
  test("'@ 121.6 nm' and '(Vin = 12 V)' in a label leave the label's words to the value after the separator", () => {
    // 145 % = 1.45 carriers per photon; 89.3 % = 0.893.
    expect(brief('Active area | 10 mm²\nExternal quantum efficiency @ 121.6 nm | 145 %\nExternal quantum efficiency @ 254 nm | 82 %').filter(([k]) => k === 'quantum-efficiency')).toEqual([
      ['quantum-efficiency', null, 1.45],
      ['quantum-efficiency', null, 0.82],
    ]);
    expect(brief('Output voltage\t48 V\nFull-load efficiency (Vin = 12 V)\t89.3 %').find(([k]) => k === 'efficiency')).toEqual(['efficiency', null, 0.893]);
    // (Not where the label holds another cell's value: "DC input | 48.0 V | 65.0 A | 93 %" keeps its floor.)
    expect(brief('DC input | 48.0 V | 65.0 A | 93 %').filter(([k]) => k === 'efficiency')).toEqual([]);
  });

  test("leader dots end no sentence: 'COP ....... between 4.3 and 4.7' and 'Electrical power input .... between 2.9 and 3.2 kW' keep their labels", () => {
    const sheet = ['GS-14 brine-to-water heat pump — results block', 'Test point ................ B0/W35', 'Heating capacity .......... 13.6–14.2 kW', 'Electrical power input .... between 2.9 and 3.2 kW', 'COP ....................... between 4.3 and 4.7', 'Ambient in test room ...... 20 ± 2 °C'].join('\n');
    const f = read(sheet);
    // B0/W35 (EN 14511): brine 0 °C = 273.15 K, water out 35 °C = 308.15 K; the test room's 20 ± 2 °C = 291.15–295.15 K is set aside.
    expect(f.map((x) => [x.kind, x.role, Math.round(x.si * 100) / 100, x.upper === undefined ? null : Math.round(x.upper.si * 100) / 100])).toEqual([
      ['temperature', 'cold', 273.15, null],
      ['temperature', 'hot', 308.15, null],
      ['power', 'out', 13600, 14200],
      ['power', 'in', 2900, 3200],
      ['cop', 'heating', 4.3, 4.7],
      ['temperature', 'aside', 291.15, 295.15],
    ]);
    // Carnot heating COP = 308.15 / 35 = 8.804; 4.3 / 8.804 = 0.4884 (lawful).
    const run = runClaimChecks(f, { text: sheet, classes: [] }).checks.find((c) => c.check === 'carnot');
    expect(run?.finding).toBe('consistent');
  });

  test("an operating range in a row is one figure set aside; 'derate above 60 °C' is no side", () => {
    // −20 °C = 253.15 K, +60 °C = 333.15 K.
    expect(brief('Operating temperature | −20 to +60 °C')).toEqual([['temperature', 'aside', 253.15]]);
    expect(read('Operating temperature ........ −20 to +60 °C')[0].upper?.si).toBeCloseTo(333.15, 9);
    expect(brief('Output is short-circuit proof; derate above 60 °C case temperature.')).toEqual([['temperature', 'aside', 333.15]]);
    // (Sides said in prose stay two: "between 5 and 35 °C".)
    expect(brief('The engine runs between 5 and 35 °C.').map(([, r]) => r)).toEqual(['cold', 'hot']);
  });

  test("a chiller's 'Cooling capacity at +5 °C coolant' is its output at its cold side", () => {
    const f = read('RC-1200 recirculating chiller\nSpecifications at 30 °C ambient\nCooling capacity at +5 °C coolant ........ 1,200 W\nPower consumption (at +5 °C point) ....... 450 W');
    expect(f.slice(0, 3).map((x) => [x.kind, x.role, Math.round(x.si * 100) / 100])).toEqual([
      ['temperature', 'hot', 303.15],
      ['temperature', 'cold', 278.15],
      ['power', 'out', 1200],
    ]);
  });
});

test("a sheet with a row for each rating point: each point's temperatures where it is written, a side said before not said again (invented test data)", () => {
  const sheet = ['LWP 8 air/water heat pump', 'Heating output A7/W35 ............. 8,2 kW', 'Power input A7/W35 ................ 1,9 kW', 'COP A7/W35 ........................ 4,32', 'Heating output A-7/W35 ............ 6,1 kW'].join('\n');
  // EN 14511: A7/W35 = air 7 °C (280.15 K), water 35 °C (308.15 K); A-7/W35 adds air −7 °C (266.15 K).
  expect(brief(sheet)).toEqual([
    ['temperature', 'cold', 280.15],
    ['temperature', 'hot', 308.15],
    ['power', 'out', 8200],
    ['power', 'in', 1900],
    ['cop', 'heating', 4.32],
    ['temperature', 'cold', 266.15],
    ['power', 'out', 6100],
  ]);
  // Carnot heating COP at A7/W35 = 308.15 / 28 = 11.005; 4.32 / 11.005 = 0.3925 (lawful).
  const run = runClaimChecks(read(sheet), { text: sheet, classes: [] }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'cop_heating_ratio')!.si).toBeCloseTo(4.32 / (308.15 / 28), 6);
  // A heading per point, the first glossed in words: the gloss's temperatures are that point's.
  const headed = ['Operating point A-7/W55 (outdoor air −7 °C, flow water 55 °C)', '  Heating output ............ 11.8 kW', '  COP ....................... 2.6', 'Operating point A7/W35', '  Heating output ............ 14.1 kW', '  COP ....................... 4.9'].join('\n');
  expect(brief(headed).filter(([k]) => k === 'temperature')).toEqual([
    ['temperature', 'cold', 266.15],
    ['temperature', 'hot', 328.15],
    ['temperature', 'cold', 280.15],
    ['temperature', 'hot', 308.15],
  ]);
});

test("a cooler's sheet with its COP row far below the name: a cooling COP (invented test data)", () => {
  const sheet = ['TEC1-127 thermoelectric cooler module', 'Performance at hot-side temperature Th = 50 °C (dry nitrogen)', '', 'Operating point shown on p. 2:', '  ΔT (hot side minus cold side) ... 30 K', '  Heat pumped, Qc ................. 12 W', '  Drive ........................... 4.2 A at 8.1 V', '  COP ............................. 0.35'].join('\n');
  expect(read(sheet).find((f) => f.kind === 'cop')?.role).toBe('cooling');
  // Carnot cooling COP: Tc = 323.15 − 30 = 293.15 K; 293.15 / 30 = 9.772; 0.35 / 9.772 = 0.0358 (lawful).
  const run = runClaimChecks(read(sheet), { text: sheet, classes: [] }).checks.find((c) => c.check === 'carnot');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'cop_cooling_ratio')!.si).toBeCloseTo(0.35 / (293.15 / 30), 6);
});

test("a runtime row: the test's AC load is what the store gives, over the row's own time (invented test data)", () => {
  const sheet = ['PS-2000 portable power station — spec list', 'Capacity | 2,048 Wh', 'AC output rating | 2,000 W continuous, pure sine', 'Runtime test (250 W AC load, 25 °C) | 7.1 h to shutdown'].join('\n');
  const f = read(sheet);
  expect(f.find((x) => x.text === '250 W')?.role).toBe('out');
  // 250 W × 7.1 h = 250 × 25 560 s = 6.39 MJ out of 2,048 Wh = 7.3728 MJ (NIST SP 811: 1 Wh = 3600 J): 0.8667.
  const run = runClaimChecks(f, { text: sheet, classes: [] }).checks.find((c) => c.check === 'first-law');
  expect(run?.finding).toBe('consistent');
  expect(run!.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo((250 * 7.1 * 3600) / (2048 * 3600), 6);
});

test("a flattened table's 'lift 35 °C' is a temperature difference (a heat pump's temperature lift), not an absolute temperature (invented test data)", () => {
  const text = 'The unit supplied an underfloor circuit at 40 °C. Point A: lift 35 °C, COP 5.2. Point B: lift 30 °C, COP 5.9.';
  // 40 °C = 313.15 K; 313.15 − 35 = 278.15 K.
  expect(brief(text).filter(([k]) => k === 'temperature' || k === 'temperature-difference').slice(0, 3)).toEqual([
    ['temperature', 'hot', 313.15],
    ['temperature-difference', null, 35],
    ['temperature', 'cold', 278.15],
  ]);
  // (A crane's lift is no temperature: "can lift 35 kg".)
  expect(brief('The crane can lift 35 kg.').map(([k]) => k)).toEqual(['mass']);
});

test("a spacecraft's radiator ('Radiator area: 0.8 m²', 'Unit mass incl. radiator') names no heat pump: the array's 61 % stays an efficiency (invented test data)", () => {
  const sheet = ['PR-2 photon recoil thruster — spec list', 'Electrical input power: 2.0 kW', 'Wall-plug efficiency of array: 61 %', 'Radiator area: 0.8 m²', 'Unit mass incl. radiator: 17 kg'].join('\n');
  expect(brief(sheet).find(([, , si]) => si === 0.61)).toEqual(['efficiency', null, 0.61]);
  // (A house's radiators still speak of space heating: "Our heat pump feeds the radiators … '350 % efficient'".)
  expect(brief('It feeds the radiators at 45 °C and is "350 % efficient".').find(([k]) => k === 'cop')).toEqual(['cop', 'heating', 3.5]);
});

describe('tables of readings pasted with pipes, semicolons or tabs, units in the header (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('a pipe table is read cell by cell under its header, with the header unit; the light given out bounds the push', () => {
    const text =
      'A 500 W LED panel on a ballistic pendulum in the vacuum tank, emitting from one face only: a photon rocket.\n\nRun | Electrical in (W) | Optical out (W) | Thrust (µN)\n1 | 500 | 180 | 0.40\n2 | 500 | 182 | 0.41\n';
    const f = read(text);
    const thrusts = f.filter((x) => x.kind === 'thrust').map((x) => x.si);
    expect(thrusts).toHaveLength(2);
    expect(thrusts[0]).toBeCloseTo(4e-7, 12);
    expect(thrusts[1]).toBeCloseTo(4.1e-7, 12);
    expect(f.find((x) => x.text === '180')).toMatchObject({ kind: 'power', role: 'out', si: 180 });
    // 0.41 µN against 182 W / c = 0.607 µN (c exact, BIPM SI Brochure): within the photon bound.
    expect(run(text).checks.find((c) => c.check === 'photon-bound')?.finding).toBe('consistent');
  });
  test('a header unit written after a space ("T_out °C", "Eff. %") and a rule line under a markdown header', () => {
    const f = read('| Hot side °C | Cold side °C | Efficiency % |\n|---|---|---|\n| 90 | 30 | 12 |\n| 90 | 50 | 8 |\n');
    // (The second row's 90 °C restates the first's and may be set aside.)
    expect(f.filter((x) => x.kind === 'temperature' && x.role !== 'aside').map((x) => [x.role, Math.round(x.si * 100) / 100])).toEqual([
      ['hot', 363.15],
      ['cold', 303.15],
      ['cold', 323.15],
    ]);
    expect(f.filter((x) => x.kind === 'efficiency').map((x) => x.si)).toEqual([0.12, 0.08]);
  });
  test("one column's temperatures are one side: a receiver logged hourly is no hot and cold pair", () => {
    const text =
      'Field log, dish-Stirling unit:\n\nTime   Receiver °C   Net AC (kW)   Dish-to-grid η\n10:00  705           21.9          29.1 %\n12:00  720           24.6          29.6 %\n\nThe engine converts 38 % of the heat the receiver hands it.';
    expect(run(text).checks.find((c) => c.check === 'carnot')?.finding).not.toBe('breaks');
    expect(read(text).filter((x) => x.kind === 'temperature').every((x) => x.role === 'hot')).toBe(true);
  });
  test("a row's volts and amps pair by the part their columns name; the column names the side", () => {
    const text =
      'A starter cell turns the rotor; the generator coil lights a lamp.\n\nTime | Start cell V | Start cell A | Generator V | Generator A\n0:00 | 12.4 | 0.78 | 13.1 | 1.10\n';
    const powers = read(text).filter((x) => x.kind === 'power');
    // 12.4 V × 0.78 A = 9.672 W in; 13.1 V × 1.10 A = 14.41 W out (node).
    expect(powers.map((x) => [Math.round(x.si * 1000) / 1000, x.role])).toEqual([
      [9.672, 'in'],
      [14.41, 'out'],
    ]);
    expect(run(text).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
});

describe("a column's side named by its form and 'in' or 'out' (invented test data)", () => {
  test('"DC in (W) | AC out (W)" and "Battery in: … battery out: …" name the sides', () => {
    const f = read('Inverter check.\n| Point | DC in (W) | AC out (W) |\n| 1 | 520 | 490 |\n| 2 | 1040 | 995 |');
    expect(f.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['in', 'out', 'in', 'out']);
    expect(read('Battery in: 1,020 Wh, battery out: 950 Wh').map((x) => x.role)).toEqual(['in', 'out']);
  });
});

describe('bare "In" and "Out" columns, comma-separated rows, numbers in words (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"In (W)   Out (W)" columns give the sides; a gain above one in the rows breaks the first law', () => {
    const text = 'Bench supply in, resistor bank out.\nFreq (kHz)   In (W)   Out (W)   Gain\n18.0         60.2     71.0      1.18\n19.5         60.0     78.1      1.30';
    expect(read(text).filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['in', 'out', 'in', 'out']);
    expect(run(text).checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
  });
  test('a comma-separated table is read under its header; "1,150" in a prose line stays one number', () => {
    const f = read('Sealed frame on an air track; nothing is expelled.\nRun,Input (W),Thrust (N),Duration (s)\n1,150,0.80,60\n2,148,0.78,60');
    expect(f.filter((x) => x.kind === 'thrust').map((x) => x.si)).toEqual([0.8, 0.78]);
    expect(read('The unit drew 1,150 W, then 1,200 W.').map((x) => x.si)).toEqual([1150, 1200]);
  });
  test('a table of numbers written in words is read', () => {
    const text = 'Motor-generator set feeding the arc lamp.\nTrial    Input            Output\nFirst    two kilowatts    one thousand five hundred and twenty watts\nSecond   two kilowatts    fifteen hundred watts';
    // 1,520 W out of 2,000 W in: 0.76.
    expect(run(text).checks.find((c) => c.check === 'first-law')?.outputs.find((o) => o.name === 'over_unity')?.si).toBeCloseTo(0.76, 9);
  });
  test('lawful logs of machines in tables break nothing', () => {
    for (const text of [
      'Heat pump log, air-to-water unit.\n| Day | Outdoor °C | Flow °C | Electricity (kWh) | Heat (kWh) |\n| Mon | 4 | 40 | 20.1 | 72.3 |\n| Tue | 2 | 42 | 23.0 | 78.1 |\n| Total | | | 43.1 | 150.4 |',
      'Motor on the dynamometer.\n| Load % | Input (W) | Shaft output (W) | Efficiency % |\n| 25 | 310 | 240 | 77.4 |\n| 100 | 1150 | 1010 | 87.8 |',
      'Inverter check.\n| Point | DC in (W) | AC out (W) |\n| 1 | 520 | 490 |\n| 2 | 2080 | 1990 |',
      'Transformer test (step-up, 20:1).\n| Primary V | Primary A | Secondary V | Secondary A |\n| 12 | 8.3 | 240 | 0.39 |\n| 12 | 16.1 | 240 | 0.76 |',
      'Fridge test.\n| Hour | Power draw (W) | Heat removed (W) | Box °C |\n| 1 | 95 | 180 | 8 |\n| 2 | 88 | 165 | 5 |',
      'Heat pump water heater.\n| Time | Tank °C | Energy used (kWh) | Heat into water (kWh) |\n| 2 h | 35 | 1.1 | 3.6 |\n| 4 h | 52 | 2.3 | 6.8 |',
    ]) {
      expect(run(text).checks.filter((c) => c.finding === 'breaks').map((c) => c.check)).toEqual([]);
    }
  });
});

describe("a heat pump's log in a table: electricity in, heat out, a note after the unit (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"Elec kWh   Heat kWh   Outdoor °C (mean)   Flow °C (mean)" under a heat pump named is a Carnot check', () => {
    const text =
      'Village hall heat pump, three weeks on the new controller.\nWeek   Elec kWh   Heat kWh   Outdoor °C (mean)   Flow °C (mean)\n1      212        718        5.2                 42\n2      240        782        3.1                 43';
    const f = read(text);
    expect(f.filter((x) => x.kind === 'energy').map((x) => x.role)).toEqual(['in', 'out', 'in', 'out']);
    expect(f.filter((x) => x.kind === 'temperature').map((x) => x.role)).toEqual(['cold', 'hot', 'cold', 'hot']);
    expect(run(text).checks.find((c) => c.check === 'carnot')?.finding).toBe('consistent');
  });
  test('"Time (min)" keeps its unit: the bracket is no note', () => {
    const f = read('Heat run.\nTime (min)  Winding °C  Frame °C  Ambient °C\n60          96          63        23\n120         104         68        24');
    expect(f.filter((x) => x.kind === 'duration').map((x) => x.si)).toEqual([3600, 7200]);
  });
});

describe("a table's column said to be drawn or to be the load (invented test data)", () => {
  test('"Supply drawn (W)" goes in and "Lamp load (W)" comes out; words of prose around a semicolon give no side', () => {
    const f = read('Bench run.\n| Hour | Supply drawn (W) | Lamp load (W) |\n| 1 | 64 | 60 |\n| 2 | 65 | 60 |');
    expect(f.filter((x) => x.kind === 'power').map((x) => x.role)).toEqual(['in', 'out', 'in', 'out']);
    const prose = read('A wet fortnight in the middle; best day 29.8 kWh on the 21st, worst 4.1 kWh on the 9th; exported approx 310 kWh.');
    expect(prose.find((x) => x.text === '4.1 kWh')?.role).not.toBe('in');
  });
});

describe("a stage's masses in a list under a unit, a dry mass 'incl. payload' (invented test data)", () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test('"Mass item   t" over "Propellant   420": tonnes; the rocket equation runs', () => {
    const text = 'Concept table for an upper stage.\nMass item             t\nPropellant            420\nDry + payload         120\nTotal at ignition     540\nExhaust speed (vacuum): 3.6 km/s. Δv we claim for the stage: 4.4 km/s.';
    expect(read(text).filter((x) => x.kind === 'mass').map((x) => [x.role, x.si])).toEqual([
      ['propellant', 420000],
      ['dry', 120000],
      ['wet', 540000],
    ]);
    const r = run(text).checks.find((c) => c.check === 'rocket-equation');
    // Tsiolkovsky: 3,600 × ln(540 / 120) = 5,414.7 m/s (node); 4.4 km/s is within it.
    expect(r?.finding).toBe('consistent');
    expect(r?.outputs.find((o) => o.name === 'dv')?.si).toBeCloseTo(3600 * Math.log(540 / 120), 6);
  });
  test('"Stage dry mass incl. payload" is the dry mass', () => {
    expect(read('Stage dry mass incl. payload           1.8 kg').map((x) => x.role)).toEqual(['dry']);
  });
});

describe('a log whose temperatures are all of one side, and a chiller\'s ambient column (invented test data)', () => {
  const run = (text: string) => runClaimChecks(extractFigures(text), { text });
  test("a heat pump's leaflet giving only outdoor temperatures needs the flow temperature", () => {
    const text = 'Leaflet for an air-to-water heat pump:\nOutdoor temp | Heating output | Power input | COP\n+7 °C | 10.2 kW | 1.76 kW | 5.8\n−7 °C | 7.4 kW | 2.47 kW | 3.0';
    const r = run(text);
    expect(r.checks.find((c) => c.check === 'carnot')).toBeUndefined();
    expect(r.needs.find((n) => n.check === 'carnot')?.missing.join(' ')).toMatch(/hot side/);
  });
  test("a chiller's ambient column is its warm side and the chilled water its cold one", () => {
    const f = read('Trend export, air-cooled chiller. Temperatures in °F.\nTime    CHWS °F   Ambient °F   kW\n14:00   44        95           11.4\n15:00   45        97           12.1');
    expect(f.filter((x) => x.kind === 'temperature' && x.role !== 'aside').map((x) => x.role)).toEqual(['cold', 'hot', 'cold', 'hot']);
  });
});
