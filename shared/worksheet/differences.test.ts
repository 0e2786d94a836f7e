/**
 * Issue 12, corrections 6 and 10 on the worksheet side: temperature differences are an input kind of
 * their own ("2 degC" of rise is 2 K, not 275.15 K), and metric horsepower (PS) is a unit beside
 * mechanical horsepower (hp). Each test here fails on the code before the correction: parseQuantity
 * had no difference option (it read every "degC" as a temperature), the worksheet schema had no
 * `kind`, and "1 PS" was read by mathjs as a petasiemens (a conductance), so it was refused as a power.
 */
import { compileWorksheet, validateWorksheet } from './evaluate';
import { formatQuantity, parseQuantity, toQuantityValue } from './quantity';
import { worksheetSchema } from './schema';

// 0 °C = 273.15 K exactly, and a Celsius *interval* equals a kelvin interval (BIPM SI Brochure, 9th ed.,
// 2019, section 2.3.1: "the numerical value of a temperature difference is the same when expressed in
// either unit"). A Fahrenheit interval is 5/9 K (NIST SP 811 (2008), App. B.9: "degree Fahrenheit
// (temperature interval) = 5.555 556 E-01 K"; exactly 5/9 by t/°F = 1.8 t/°C + 32, ibid. 4.2.1.1).
const ZERO_CELSIUS = 273.15;
const FAHRENHEIT_STEP = 5 / 9;

describe('parseQuantity: differences (correction 6)', () => {
  test('"2 degC", "2 K" and "3.6 degF" read as differences are all 2 K', () => {
    expect(parseQuantity('2 degC', 'K', { difference: true })).toBeCloseTo(2, 12);
    expect(parseQuantity('2 °C', 'K', { difference: true })).toBeCloseTo(2, 12);
    expect(parseQuantity('2 K', 'K', { difference: true })).toBe(2);
    expect(parseQuantity('3.6 degF', 'K', { difference: true })).toBeCloseTo(3.6 * FAHRENHEIT_STEP, 12); // = 2 K
    expect(parseQuantity('3.6 degF', 'K', { difference: true })).toBeCloseTo(2, 12);
    // A bare number takes the asked unit, also as a difference: 2 in degC is 2 K of difference.
    expect(parseQuantity('2', 'degC', { difference: true })).toBeCloseTo(2, 12);
    expect(parseQuantity({ value: 3.6, unit: 'degF' }, 'K', { difference: true })).toBeCloseTo(2, 12);
    // Negative differences (a fall) keep their sign: -1.8 °F is -1 K.
    expect(parseQuantity('-1.8 degF', 'K', { difference: true })).toBeCloseTo(-1, 12);
  });

  test('read as temperatures (the default), the same texts are points on their scale', () => {
    expect(parseQuantity('2 degC', 'K')).toBeCloseTo(2 + ZERO_CELSIUS, 12); // 275.15 K
    expect(parseQuantity('3.6 degF', 'K')).toBeCloseTo((3.6 + 459.67) * FAHRENHEIT_STEP, 10); // 258.15 K
  });

  test('units without an offset are the same either way', () => {
    expect(parseQuantity('2 mK', 'K', { difference: true })).toBe(parseQuantity('2 mK', 'K'));
    expect(parseQuantity('1 uN/degC', 'N/K', { difference: true })).toBeCloseTo(1e-6, 18);
  });

  test('shown as a difference, 2 K in degC is "2 °C" (not "-271.1 °C")', () => {
    expect(formatQuantity(2, 'K', { displayUnit: 'degC', difference: true })).toBe('2 °C');
    expect(formatQuantity(2, 'K', { displayUnit: 'degF', difference: true })).toBe('3.6 °F');
    expect(formatQuantity(2, 'K', { displayUnit: 'degC' })).toBe('-271.1 °C');
    expect(toQuantityValue(2, 'K', 'degC', { difference: true })).toEqual({ si: 2, unit: 'K', display: '2 °C' });
  });
});

describe('worksheet inputs of kind "difference" (correction 6)', () => {
  const sheet = worksheetSchema.parse({
    name: 'drift-by-hand',
    title: 'Thermal drift by hand',
    inputs: [
      { name: 'k', label: 'Drift per kelvin', unit: 'uN/K', default: '1 uN/K' },
      { name: 'dT', label: 'Temperature rise', unit: 'degC', kind: 'difference', default: '2 degC', min: '0 degC', max: '100 degC' },
      { name: 'T_room', label: 'Room temperature', unit: 'degC', default: '20 degC' },
    ],
    steps: [
      { name: 'F', label: 'Apparent force k dT', expression: 'k * dT', unit: 'uN' },
      { name: 'T_end', label: 'Temperature at the end', expression: 'T_room + dT', unit: 'K' },
    ],
    plots: [{ name: 'F_against_rise', label: 'Force against the rise', sweep: { input: 'dT', from: '1 degC', to: '10 degC', points: 10 }, series: ['F'] }],
  });
  const compiled = compileWorksheet(sheet);
  const input = (r: ReturnType<typeof compiled.evaluate>, name: string) => r.inputs.find((x) => x.name === name);
  const step = (r: ReturnType<typeof compiled.evaluate>, name: string) => r.steps.find((x) => x.name === name)?.value?.si;

  test('the schema takes kind "absolute" or "difference" and nothing else', () => {
    expect(sheet.inputs[1].kind).toBe('difference');
    expect(sheet.inputs[0].kind).toBeUndefined();
    const bad = validateWorksheet({ ...sheet, inputs: [{ ...sheet.inputs[1], kind: 'relative' }], steps: [{ name: 'x', label: 'x', expression: 'dT' }], plots: [] });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(Object.keys(bad.fields)).toContain('worksheet.inputs.0.kind');
  });

  test('"2 degC", "2 K" and "3.6 degF" of rise give the same 2 K and the same force', () => {
    for (const typed of ['2 degC', '2 K', '3.6 degF', '']) {
      const r = compiled.evaluate({ dT: typed });
      expect(r.ok).toBe(true);
      expect(input(r, 'dT')?.value?.si).toBeCloseTo(2, 12);
      expect(input(r, 'dT')?.value?.display).toBe('2 °C'); // shown in the input's unit, as a difference
      expect(step(r, 'F')).toBeCloseTo(2e-6, 18); // 1 µN/K × 2 K
    }
  });

  test('a temperature input beside it still reads degC on its scale: 20 °C + 2 K of rise = 295.15 K', () => {
    const r = compiled.evaluate({ dT: '3.6 degF' });
    expect(input(r, 'T_room')?.value?.si).toBeCloseTo(20 + ZERO_CELSIUS, 12);
    expect(step(r, 'T_end')).toBeCloseTo(22 + ZERO_CELSIUS, 10);
  });

  test('min and max are read as differences too: -1 degC is below 0 degC of rise, 99 degC within 100', () => {
    const below = compiled.evaluate({ dT: '-1 degC' });
    expect(input(below, 'dT')?.error?.kind).toBe('range');
    expect(input(below, 'dT')?.error?.message).toContain('below the lowest value allowed, 0 °C');
    expect(compiled.evaluate({ dT: '99 degC' }).ok).toBe(true);
    expect(input(compiled.evaluate({ dT: '101 degC' }), 'dT')?.error?.kind).toBe('range');
  });

  test('a sweep of a difference runs over its sizes: 1 … 10 °C of rise, 1 … 10 µN', () => {
    const p = compiled.evaluate({}).plots[0];
    expect(p.error).toBeUndefined();
    expect(p.x.values[0]).toBeCloseTo(1, 12);
    expect(p.x.values[9]).toBeCloseTo(10, 12);
    p.series[0].values.forEach((v, i) => expect(v as number).toBeCloseTo(p.x.values[i], 9)); // µN = °C × 1 µN/K
  });
});

describe('metric horsepower (correction 10)', () => {
  // 1 PS (metric horsepower) = 75 kgf·m/s = 75 × 9.806 65 W = 735.498 75 W exactly (NIST SP 811 (2008),
  // App. B.8: "horsepower, metric ... 7.354 988 E+02 W"); 1 hp (mechanical, 550 ft·lbf/s) = 745.699 9 W
  // (ibid.; 550 × 0.3048 × 0.453 592 37 × 9.806 65 W, exact by the definitions of ft, lb and g0).
  const PS = 75 * 9.80665;
  const HP = 550 * 0.3048 * 0.45359237 * 9.80665;

  test('"1 PS" is 735.49875 W and "1 hp" is still 745.6999 W', () => {
    expect(PS).toBeCloseTo(735.49875, 10);
    expect(parseQuantity('1 PS', 'W')).toBeCloseTo(PS, 9);
    expect(parseQuantity('150 PS', 'kW')).toBeCloseTo(150 * PS, 6);
    expect(Math.abs(parseQuantity('1 hp', 'W') / HP - 1)).toBeLessThan(1e-9); // mathjs's hp, to SP 811's 7 figures and beyond
    expect(parseQuantity('1 PS', 'hp')).toBeCloseTo(PS, 9); // the SI value, whatever unit is asked
  });

  test('PS converts in expressions too, and is shown as typed', () => {
    const ws = worksheetSchema.parse({
      name: 'engine-power',
      title: 'Engine power',
      inputs: [{ name: 'P', label: 'Engine power', unit: 'PS', default: '100 PS' }],
      steps: [{ name: 'P_hp', label: 'In hp', expression: 'P to hp', unit: 'hp' }],
    });
    const r = compileWorksheet(ws).evaluate({});
    expect(r.ok).toBe(true);
    expect(r.inputs[0].value?.display).toBe('100 PS');
    expect(r.steps[0].value?.si).toBeCloseTo(100 * PS, 6);
    expect(r.steps[0].value?.display).toBe('98.63 hp'); // 73 549.875 W / 745.6999 W = 98.632, to 4 figures
  });
});
