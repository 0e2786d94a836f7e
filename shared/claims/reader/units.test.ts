/**
 * The figure reader: each unit converted as the references give it, and each kind read in symbols and in words.
 *
 * Against outside references: NIST SP 811 (2008), "Guide for the Use of the International System of
 * Units (SI)", Appendix B.8 and B.9 conversion factors and §4.2.1.1 (Celsius temperature); the SI
 * prefixes of the BIPM SI Brochure (9th ed., 2019, Table 7). SP 811 prints most factors to seven
 * significant digits, so those checks allow half a unit in the seventh.
 *
 * Every text here is invented test data: invented devices ("QZ-4 cavity", "Helix-7 rig") and an
 * invented organisation ("Example Dynamics"), no real people or products.
 */
import { parseQuantity, QuantityError } from '../../worksheet/quantity';
import { extractFigures } from '../reader';
import { type FigureKind } from '../types';
import { EXACT, expectRelClose, expectWellFormed, only, SEVEN } from './test-support';

describe('unit conversions (NIST SP 811 Appendix B)', () => {
  test('pound-force: 1 lbf = 4.448 222 N (SP 811 B.8)', () => {
    const f = only('The QZ-4 cavity gave 0.2 lbf on the stand (invented test data).');
    expect(f).toMatchObject({ kind: 'thrust', text: '0.2 lbf', quantity: '0.2 lbf', unit: 'N' });
    expectRelClose(f.si, 0.2 * 4.448222, SEVEN); // SP 811 B.8, pound-force → newton 4.448 222 E+00
    expect(f.display).toBe('889.6 mN'); // 0.2 × 4.448 222 N = 0.889 644 N, to 4 digits (the display rule)
  });

  test('horsepower: 1 hp (550 ft·lbf/s) = 745.699 9 W (SP 811 B.8)', () => {
    const f = only('A 3 hp motor turns the Helix-7 rig (invented test data).');
    expectRelClose(f.si, 3 * 745.6999, SEVEN); // SP 811 B.8, horsepower (550 ft·lbf/s) → watt 7.456 999 E+02
  });

  test('kilowatt hour: 1 kWh = 3.6 × 10^6 J (SP 811 B.8)', () => {
    const f = only('It stored 3 kWh overnight (invented test data).');
    expectRelClose(f.si, 3 * 3.6e6, EXACT); // SP 811 B.8, kilowatt hour → joule 3.6 E+06 (exact)
  });

  test('British thermal unit (IT): 1 Btu = 1 055.056 J (SP 811 B.8)', () => {
    const f = only('Each cycle released 10 Btu (invented test data).');
    expect(f.quantity).toBe('10 BTU'); // mathjs spells it BTU
    expectRelClose(f.si, 10 * 1055.056, SEVEN); // SP 811 B.8, British thermal unit_IT → joule 1.055 056 E+03
  });

  test('calorie: mathjs has no "cal", so the extractor uses the thermochemical calorie, 4.184 J (SP 811 B.8)', () => {
    // mathjs 15 knows no calorie at all (so neither the thermochemical nor the IT one): parseQuantity refuses it.
    expect(() => parseQuantity('1 cal', 'J')).toThrow(QuantityError);
    const f = only('The cell gave off 2 cal with each pulse (invented test data).');
    expect(f.text).toBe('2 cal');
    expectRelClose(f.si, 2 * 4.184, EXACT); // SP 811 B.8, calorie_th → joule 4.184 E+00 (exact)
    // and not the International Table calorie, 4.1868 J (SP 811 B.8, calorie_IT): that is 0.07 % off.
    expect(Math.abs(f.si - 2 * 4.1868)).toBeGreaterThan(1e-3);
    const k = only('The pellet holds 3 kcal (invented test data).');
    expectRelClose(k.si, 3 * 4184, EXACT); // SP 811 B.8, kilocalorie_th → joule 4.184 E+03 (exact)
  });

  test('pound (avoirdupois): 1 lb = 0.453 592 37 kg (SP 811 B.8)', () => {
    const f = only('The frame weighs 10 lb (invented test data).');
    expectRelClose(f.si, 10 * 0.45359237, EXACT); // SP 811 B.8, pound (avoirdupois) → kilogram 4.535 924 E-01; exact by definition
  });

  test('mile per hour: 1 mi/h = 0.447 04 m/s (SP 811 B.8); "mph" is written "mi/h" for mathjs', () => {
    expect(() => parseQuantity('1 mph', 'm / s')).toThrow(QuantityError); // mathjs knows no "mph"
    const f = only('The cart reached 60 mph (invented test data).');
    expect(f.quantity).toBe('60 mi/h');
    expectRelClose(f.si, 60 * 0.44704, EXACT); // SP 811 B.8, mile per hour → meter per second 4.4704 E-01 (exact)
  });

  test('Celsius and Fahrenheit: t/°C = T/K − 273.15, t/°F = 1.8·(T/K) − 459.67 (SP 811 §4.2.1.1, B.9)', () => {
    const c = only('The boiler runs at 300 °C (invented test data).');
    expectRelClose(c.si, 300 + 273.15, EXACT); // SP 811 §4.2.1.1: T/K = t/°C + 273.15
    const f = only('The vent reads 100 degrees Fahrenheit (invented test data).');
    expectRelClose(f.si, (100 + 459.67) / 1.8, EXACT); // SP 811 B.9: T/K = (t/°F + 459.67)/1.8
    const m = only('The cold plate sits at −40 °F (invented test data).');
    expectRelClose(m.si, (-40 + 459.67) / 1.8, EXACT); // SP 811 B.9; −40 °F = −40 °C = 233.15 K (from memory)
  });
});

describe('each kind, in symbols and in words (invented test data)', () => {
  // Expected SI values: SI prefixes from the BIPM SI Brochure (9th ed.) Table 7 (m = 10^-3, µ = 10^-6,
  // k = 10^3, M = 10^6, G = 10^9); other factors from NIST SP 811 B.8/B.9 as in the block above.
  const LBF = 4.448222; // SP 811 B.8
  const HP = 745.6999; // SP 811 B.8
  const cases: [string, FigureKind, number, number][] = [
    // [written form, kind, SI value, relative tolerance]
    ['5 N', 'thrust', 5, EXACT],
    ['5 newtons', 'thrust', 5, EXACT],
    ['12 mN', 'thrust', 12e-3, EXACT],
    ['12 millinewtons', 'thrust', 12e-3, EXACT],
    ['40 µN', 'thrust', 40e-6, EXACT],
    ['40 μN', 'thrust', 40e-6, EXACT], // Greek mu (U+03BC), as pasted from some editors
    ['40 uN', 'thrust', 40e-6, EXACT],
    ['40 micronewtons', 'thrust', 40e-6, EXACT],
    ['3 kN', 'thrust', 3e3, EXACT],
    ['3 Kilonewtons', 'thrust', 3e3, EXACT],
    ['0.2 lbf', 'thrust', 0.2 * LBF, SEVEN],
    ['0.2 pounds of thrust', 'thrust', 0.2 * LBF, SEVEN],
    ['0.2 pound-force', 'thrust', 0.2 * LBF, SEVEN],
    ['75 W', 'power', 75, EXACT],
    ['75 watts', 'power', 75, EXACT],
    ['250 mW', 'power', 0.25, EXACT],
    ['250 milliwatts', 'power', 0.25, EXACT],
    ['1.5 kW', 'power', 1500, EXACT],
    ['1.5 kilowatts', 'power', 1500, EXACT],
    ['2 MW', 'power', 2e6, EXACT],
    ['2 Megawatts', 'power', 2e6, EXACT],
    ['1 GW', 'power', 1e9, EXACT],
    ['3 hp', 'power', 3 * HP, SEVEN],
    ['3 horsepower', 'power', 3 * HP, SEVEN],
    ['5 J', 'energy', 5, EXACT],
    ['5 joules', 'energy', 5, EXACT],
    ['2 kJ', 'energy', 2e3, EXACT],
    ['4 MJ', 'energy', 4e6, EXACT],
    ['10 Wh', 'energy', 10 * 3600, EXACT], // 1 W·h = 3600 J (1 h = 3600 s, SI Brochure Table 8)
    ['3 kWh', 'energy', 3 * 3.6e6, EXACT], // SP 811 B.8
    ['3 kilowatt-hours', 'energy', 3 * 3.6e6, EXACT],
    ['3 kilowatt hours', 'energy', 3 * 3.6e6, EXACT],
    ['1 MWh', 'energy', 3.6e9, EXACT],
    ['100 BTU', 'energy', 100 * 1055.056, SEVEN], // SP 811 B.8 (IT)
    ['100 Btu', 'energy', 100 * 1055.056, SEVEN],
    ['2 calories', 'energy', 2 * 4.184, EXACT], // SP 811 B.8, calorie_th
    ['300 K', 'temperature', 300, EXACT],
    ['300 kelvin', 'temperature', 300, EXACT],
    ['25 °C', 'temperature', 298.15, EXACT], // SP 811 §4.2.1.1
    ['25 degC', 'temperature', 298.15, EXACT],
    ['25 degrees Celsius', 'temperature', 298.15, EXACT],
    ['77 °F', 'temperature', (77 + 459.67) / 1.8, EXACT], // SP 811 B.9
    ['77 degrees Fahrenheit', 'temperature', (77 + 459.67) / 1.8, EXACT],
    ['2 kg', 'mass', 2, EXACT],
    ['2 kilograms', 'mass', 2, EXACT],
    ['500 g', 'mass', 0.5, EXACT],
    ['500 grams', 'mass', 0.5, EXACT],
    ['20 mg', 'mass', 20e-6, EXACT],
    ['3 t', 'mass', 3000, EXACT], // 1 t = 1000 kg (SI Brochure Table 8)
    ['3 tonnes', 'mass', 3000, EXACT],
    ['10 lbs', 'mass', 10 * 0.45359237, EXACT], // SP 811 B.8
    ['10 pounds', 'mass', 10 * 0.45359237, EXACT],
    ['3 m/s', 'speed', 3, EXACT],
    ['3 metres per second', 'speed', 3, EXACT],
    ['7.8 km/s', 'speed', 7800, EXACT],
    ['90 km/h', 'speed', 25, EXACT], // 90 000 m / 3600 s (SI Brochure Table 8: 1 h = 3600 s)
    ['60 miles per hour', 'speed', 60 * 0.44704, EXACT], // SP 811 B.8
    ['2 A', 'current', 2, EXACT],
    ['2 amps', 'current', 2, EXACT],
    ['2 amperes', 'current', 2, EXACT],
    ['150 mA', 'current', 0.15, EXACT],
    ['2 TW', 'power', 2e12, EXACT], // prefix tera = 10^12 (SI Brochure Table 7)
    ['2 terawatts', 'power', 2e12, EXACT],
    ['1.9 TWh', 'energy', 1.9e12 * 3600, EXACT], // SP 811 B.8, kilowatt hour 3.6 E+06 J, with the tera prefix
    ['3,700 mWh', 'energy', 3.7 * 3600, EXACT], // milli = 10^-3 (SI Brochure Table 7) of 3600 J
    ['40 TJ', 'energy', 40e12, EXACT],
    ['35 PJ', 'energy', 35e15, EXACT],
    ['2 EJ', 'energy', 2e18, EXACT],
    ['120 therms', 'energy', 120 * 1.05506e8, 5e-6], // SP 811 B.8, therm (EC) → joule 1.055 06 E+08 (six digits printed: half a unit in the sixth)
    ['1.5 MMBtu', 'energy', 1.5e6 * 1055.056, SEVEN], // a million Btu_IT; SP 811 B.8, Btu_IT 1.055 056 E+03 J
    ['100 MBH', 'power', 100e3 * 0.2930711, SEVEN], // thousand Btu_IT/h; SP 811 B.8, Btu_IT per hour → watt 2.930 711 E-01
    ['96 kBtu/h', 'power', 96e3 * 0.2930711, SEVEN],
  ];

  test.each(cases)('"%s" is a %s figure', (written, kind, si, rel) => {
    const text = `On the bench, the Helix-7 rig showed ${written}, which is the claim.`;
    const f = only(text);
    expect(f.kind).toBe(kind);
    expect(f.text).toBe(written);
    expect(f.start).toBe(text.indexOf(written));
    expectRelClose(f.si, si, rel);
  });

  test('a hyphen between number and unit ("a 500-watt heater") and no space ("5kW")', () => {
    const text = 'A 500-watt heater and a 5kW pump (invented test data).';
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures.map((f) => [f.text, f.si])).toEqual([
      ['500-watt', 500],
      ['5kW', 5000],
    ]);
  });
});

describe('old, CGS and trade units (NIST SP 811 Appendix B.8; invented test data)', () => {
  const one = (text: string) => {
    const figures = extractFigures(text);
    expectWellFormed(text, figures);
    expect(figures).toHaveLength(1);
    return figures[0];
  };
  test.each([
    // [text, kind, SI value, relative tolerance, source]
    ['The Example Dynamics pump lifts water at 33,000 ft-lb/min.', 'power', 33_000 * 2.259697e-2, SEVEN], // SP 811 B.8: ft·lbf/min → W 2.259 697 E-02
    ['Its engine gives 400 foot-pounds per second.', 'power', 400 * 1.355818, SEVEN], // SP 811 B.8: ft·lbf/s → W 1.355 818 E+00
    ['The launch engine made 2 H.P. on the brake.', 'power', 2 * 745.6999, SEVEN], // SP 811 B.8: horsepower (550 ft·lbf/s) → W
    ['The pamphlet promises 1e7 erg/s from the wheel.', 'power', 1, EXACT], // SP 811 B.8: erg/s → W 1.0 E-07 (exact)
    ['The coil pushed with a force of 50,000 dynes.', 'thrust', 0.5, EXACT], // SP 811 B.8: dyne → N 1.0 E-05 (exact)
    ['The exercise gives a force of 20 poundals.', 'thrust', 20 * 0.138255, SEVEN], // SP 811 B.8: poundal → N 1.382 550 E-01
    ['Over the shift the engine gave 2 hp-h.', 'energy', 2 * 745.6999 * 3600, SEVEN], // SP 811 B.8 horsepower × 3600 s
    ['The meter logged 12 kW-hr.', 'energy', 12 * 3.6e6, EXACT], // SP 811 B.8: kW·h → J 3.6 E+06 (exact)
    ['The boiler burned 300 B.Th.U. per hour.', 'power', 300 * 0.2930711, SEVEN], // SP 811 B.8: Btu_IT/h → W 2.930 711 E-01
    ['The works used 3 toe last year.', 'energy', 3 * 41.868e9, EXACT], // 10⁷ kcal_IT; SP 811 B.8: calorie_IT → J 4.1868 (exact)
    ['The winch did 1,200 foot-pounds of work.', 'energy', 1200 * 1.355818, SEVEN], // SP 811 B.8: ft·lbf → J 1.355 818 E+00
  ] as [string, FigureKind, number, number][])('%s', (text, kind, si, rel) => {
    const f = one(text);
    expect(f.kind).toBe(kind);
    expectRelClose(f.si, si, rel);
  });
  test('the work a machine does is its output; a torque in foot-pounds is no energy', () => {
    expect(one('A small motor does 2.7 × 10¹¹ erg of work each minute.').role).toBe('out');
    expect(extractFigures('The engine makes 3 ft-lb of torque at idle.')).toEqual([]);
  });
});

describe('vulgar fractions and old horsepower (NIST SP 811 Appendix B.8; invented test data)', () => {
  test('"4½ amperes at 110 volts" and "1¼ horse-power": 495 W in, 1¼ hp out', () => {
    const f = extractFigures('The motor of the Example Dynamics patent, taking a current of 4½ amperes at a pressure of 110 volts, shall give off at its pulley not less than 1¼ horse-power.');
    expect(f.find((x) => x.kind === 'current')?.si).toBe(4.5);
    expect(f.find((x) => x.kind === 'power' && x.role === 'in')?.si).toBeCloseTo(495, 9); // 4.5 A × 110 V
    expectRelClose(f.find((x) => x.kind === 'power' && x.role === 'out')!.si, 1.25 * 745.6999, SEVEN); // SP 811 B.8 horsepower
  });
  test('brake and electrical horse-power: the electric horsepower is 746 W (SP 811 B.8)', () => {
    const f = extractFigures('It delivered 1.28 brake horse-power at the pulley for 0.8 electrical horse-power taken from the mains.');
    expectRelClose(f.find((x) => x.role === 'out')!.si, 1.28 * 745.6999, SEVEN); // SP 811 B.8 horsepower (550 ft·lbf/s)
    expectRelClose(f.find((x) => x.role === 'in')!.si, 0.8 * 746, EXACT); // SP 811 B.8 horsepower (electric) 7.46 E+02 W
  });
  test('a fraction with no unit after it is left alone; "The ½ hp motor turns the generator" is its input', () => {
    expect(extractFigures('Mix ½ of the batch with water.')).toEqual([]);
    const f = extractFigures('The ½ hp motor turns the generator, and the generator puts out 5 hp.');
    expect(f.map((x) => [x.si.toFixed(3), x.role])).toEqual([
      [(0.5 * 745.6999).toFixed(3), 'in'],
      [(5 * 745.6999).toFixed(3), 'out'],
    ]);
  });
});

describe('speeds in CGS and in words of distance each second (c exact, BIPM SI Brochure; invented test data)', () => {
  test('"4,5 × 10¹⁰ cm/sec" and "420,000 km in each second" are speeds above c', () => {
    const a = extractFigures('The pamphlet gives the rays a velocity of 4,5 × 10¹⁰ cm/sec.');
    expect(a.map((f) => [f.kind, f.si])).toEqual([['speed', 4.5e8]]); // 1 cm/s = 0.01 m/s (SI prefix centi, BIPM Table 7)
    const b = extractFigures('His notebook says the current traversed 420,000 km in each second.');
    expect(b.map((f) => [f.kind, f.si])).toEqual([['speed', 4.2e8]]);
    expect(b[0].si).toBeGreaterThan(299_792_458);
  });
});

describe('light itself covering a distance each second is c, not a claim (invented test data)', () => {
  test('"Light covers about 300,000 km in a second" is set aside', () => {
    expect(extractFigures('Light covers about 300,000 km in a second; the probe, at its fastest, covers less than a thousandth of that.').map((f) => f.role)).toEqual(['aside']);
  });
});

describe('car, boat and solar-panel ratings as spec sheets print them (invented test data)', () => {
  test('"0–60 mph in 6.1 s" is the speed a sprint from rest reaches, 60 mph, not a range from zero', () => {
    const f = extractFigures('Example Motors pickup: 300 hp, 0–60 mph in 6.1 s, tows 5,000 lb.');
    const v = f.find((x) => x.kind === 'speed')!;
    expectRelClose(v.si, 60 * 0.44704, EXACT); // SP 811 B.8, mile per hour → metre per second 4.4704 E-01 (exact)
    expect(v.upper).toBeUndefined();
    // ("a 0–100 km/h sprint (7.9 s)": the same, the seconds in brackets.)
    expectRelClose(extractFigures('The 0–100 km/h sprint (7.9 s) still feels brisk.').find((x) => x.kind === 'speed')!.si, 100 / 3.6, EXACT);
    // A spread of speeds from zero with no sprint about it stays a range.
    const r = extractFigures('The fan runs at 0–12 km/h air speed across the grille, depending on the dial.').find((x) => x.kind === 'speed')!;
    expect(r.si).toBe(0);
    expectRelClose(r.upper!.si, 12 / 3.6, EXACT); // 1 km/h = 1000 m / 3600 s
  });

  test('"1.1 kWp" and "400 watts-peak" are a solar array\'s peak (rated) output', () => {
    const f = extractFigures('The boat carries 1.1 kWp of cells on its deck, and the roof 400 watts-peak more.');
    expect(f.map((x) => [x.kind, x.role, x.si])).toEqual([
      ['power', 'out', 1100],
      ['power', 'out', 400],
    ]);
  });

  test('a mass unit said of a force is that mass\'s weight: "thrust 2.8 g (weight)", "a pull of 140 lb."', () => {
    const a = extractFigures('Beam power 1.5 kW; measured thrust 2.8 ± 0.1 g (weight).').find((x) => x.kind === 'thrust')!;
    expectRelClose(a.si, 0.0027 * 9.80665, SEVEN); // SP 811 B.8, gram-force → newton 9.806 65 E-03 (exact); the range's lower end
    const b = extractFigures('A pull of 140 lb. at the end of the lever raises the full load.').find((x) => x.kind === 'thrust')!;
    expectRelClose(b.si, 140 * 4.448222, SEVEN); // SP 811 B.8, pound-force → newton 4.448 222 E+00
    // A weight used to calibrate, and a craft's own weight, stay masses.
    expect(extractFigures('The load cell was calibrated with a 20 g weight.').map((x) => x.kind)).toEqual(['mass']);
    expect(extractFigures('It lifts 3 % of its own 12 kg weight.').find((x) => x.si === 12)?.kind).toBe('mass');
  });

  test('a specific impulse "from beam current and voltage 4,800 s" is a specific impulse, not a run time', () => {
    const f = extractFigures('Specific impulse from beam current and voltage 4,800 s. Run ended after 212 h.');
    expect(f.map((x) => [x.kind, x.si])).toEqual([
      ['specific-impulse', 4800],
      ['duration', 212 * 3600],
    ]);
  });
});

describe('grams of thrust per watt, the propeller trade\'s figure of merit (invented test data)', () => {
  test('"9 g per watt" and "6.5 g/W" of a motor and propeller are thrust per power in gram-force', () => {
    const f = extractFigures('Motor/prop results from the test stand: 9 g per watt at half throttle, about 6.5 g/W flat out. Max thrust per motor 2.6 kg at 410 W.');
    expect(f.map((x) => x.kind)).toEqual(['thrust-per-power', 'thrust-per-power', 'thrust', 'power']);
    expectRelClose(f[0].si, 9 * 9.80665e-3, SEVEN); // SP 811 B.8: gram-force 9.806 65 E-03 N (exact), per W
    expectRelClose(f[1].si, 6.5 * 9.80665e-3, SEVEN);
    expectRelClose(f[2].si, 2.6 * 9.80665, SEVEN); // kilogram-force 9.806 65 E+00 N (exact)
    // A mass per power with no thrust about it is no thrust: "1.2 kg per kW" of an engine's own mass.
    expect(extractFigures('The diesel weighs 1.2 kg per kW of rated output.').some((x) => x.kind === 'thrust-per-power')).toBe(false);
  });
});

describe('a vehicle range said as what the consumption "works out to" (invented test data)', () => {
  test('"3.4 miles per kWh … that works out to a real-world 250 miles" is 250/3.4 kWh from the drive', () => {
    const f = extractFigures('It managed 3.4 miles per kWh on our loop. With 75 kWh usable, that works out to a real-world 250 miles.');
    const out = f.find((x) => x.kind === 'energy' && x.role === 'out')!;
    expectRelClose(out.si, (250 / 3.4) * 3.6e6, 1e-9); // SP 811 B.8: kWh = 3.6 MJ exactly; miles cancel
  });
  test('a decimal comma in the consumption and a round trip on one pack ("arrived with 8 % left") give the drive\'s energy', () => {
    const f = extractFigures('Our test car has a 77,4 kWh battery. On our 420 km round trip at an average of 16,8 kWh/100 km it arrived with 8 % left.');
    const out = f.find((x) => x.kind === 'energy' && x.role === 'out')!;
    expectRelClose(out.si, 16.8 * 4.2 * 3.6e6, 1e-9); // 16.8 kWh per 100 km × 420 km = 70.56 kWh; SP 811 B.8: kWh = 3.6 MJ
  });
  test('a trip with charging on the way is not one pack\'s range', () => {
    const f = extractFigures('We did a 900 km road trip with two charging stops and arrived with 20 % left; the car used 18 kWh/100 km from its 60 kWh pack.');
    expect(f.some((x) => x.kind === 'energy' && x.role === 'out')).toBe(false);
    // Without the stops it is the range the pack must give (18 × 9 = 162 kWh against 60 kWh).
    const g = extractFigures('We did a 900 km road trip and arrived with 20 % left; the car used 18 kWh/100 km from its 60 kWh pack.');
    expectRelClose(g.find((x) => x.kind === 'energy' && x.role === 'out')!.si, 162 * 3.6e6, 1e-9);
    // "with no stop to charge" says the opposite.
    const h = extractFigures('On a 900 km test drive with no stop to charge, the car used 18 kWh/100 km from its 60 kWh pack.');
    expectRelClose(h.find((x) => x.kind === 'energy' && x.role === 'out')!.si, 162 * 3.6e6, 1e-9);
  });
});

test('"the tractor\'s diesel makes 60 horse" is 60 hp; a "two-horse carriage" or a "2 horse trailer" is no power (invented test data)', () => {
  const f = extractFigures("The old tractor's diesel makes 60 horse at full load.");
  expect(f.find((x) => x.kind === 'power')!.si / (60 * 745.69987158227)).toBeCloseTo(1, 9); // hp = 745.699 871 582 27 W (NIST SP 811 B.8)
  expect(extractFigures('We hired a two-horse carriage for 3 hours.').some((x) => x.kind === 'power')).toBe(false);
  expect(extractFigures('A 2 horse trailer weighs 900 kg.').some((x) => x.kind === 'power')).toBe(false);
});
