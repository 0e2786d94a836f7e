/**
 * The worksheet evaluator: inputs, steps, checks, plots, kit functions, errors and validation.
 * Physics check values come from textbook formulas named beside them.
 */
import { compileWorksheet, evaluateWorksheet, validateWorksheet } from './evaluate';
import { worksheetSchema, type Worksheet } from './schema';
import type { KitFunction } from './types';

const C = 299792458; // m/s, exact (BIPM SI Brochure, 9th ed., Table 1)

/** Photon-rocket sheet: F_bound = P/c (radiation of power P carries momentum P/c per second). */
function photonSheet(overrides: Partial<Worksheet> = {}): Worksheet {
  return worksheetSchema.parse({
    name: 'photon',
    title: 'Photon rocket bound',
    inputs: [
      { name: 'F', label: 'Claimed thrust', unit: 'mN', default: '1 mN', min: '0 N', max: '1 kN' },
      { name: 'P', label: 'Input power', unit: 'W', default: '1 kW', min: '0 W' },
    ],
    steps: [
      { name: 'F_bound', label: 'Bound P/c', expression: 'P / c' },
      { name: 'ratio', label: 'Ratio', expression: 'F / F_bound', unit: '' },
    ],
    checks: [
      {
        name: 'within',
        label: 'Within bound',
        condition: 'F <= F_bound',
        holds: '{F} is within {F_bound}.',
        fails: '{F} is {ratio} times the bound {F_bound} for {P}.',
      },
    ],
    plots: [],
    ...overrides,
  });
}

describe('inputs', () => {
  test('defaults apply when a value is missing or blank; typed values in any compatible unit', () => {
    const c = compileWorksheet(photonSheet());
    const r1 = c.evaluate({});
    expect(r1.ok).toBe(true);
    expect(r1.inputs[0].value).toEqual({ si: 0.001, unit: 'N', display: '1 mN' });
    expect(r1.inputs[1].value?.si).toBe(1000);
    const r2 = c.evaluate({ F: '  ', P: '1.5 hp' });
    expect(r2.inputs[0].value?.si).toBe(0.001);
    // 1.5 hp = 1.5 × 745.6999 W (NIST SP 811 (2008) App. B.8)
    expect(r2.inputs[1].value?.si).toBeCloseTo(1.5 * 745.6999, 3);
    const r3 = c.evaluate({ F: '0.25 lbf' });
    expect(r3.inputs[0].value?.si).toBeCloseTo(0.25 * 4.4482216152605, 12);
    expect(r3.inputs[0].value?.display).toBe('1112 mN');
  });

  test('a value outside min/max is a range error at that input, and dependents say so', () => {
    const r = compileWorksheet(photonSheet()).evaluate({ F: '-1 mN' });
    expect(r.ok).toBe(false);
    expect(r.inputs[0].error).toEqual({ kind: 'range', message: 'Input F: -1 mN is below the lowest value allowed, 0 mN' });
    expect(r.steps[0].error).toBeUndefined(); // F_bound does not use F
    expect(r.steps[1].error).toEqual({ kind: 'value', message: 'Step ratio: depends on input F, which has an error' });
    expect(r.checks[0].error?.message).toBe('Check within: depends on input F, which has an error');
    const high = compileWorksheet(photonSheet()).evaluate({ F: '2 kN' });
    expect(high.inputs[0].error?.message).toBe('Input F: 2 × 10^6 mN is above the highest value allowed, 1 × 10^6 mN');
  });

  test('unparsable input values are errors at the input, naming the cause', () => {
    const r = compileWorksheet(photonSheet()).evaluate({ F: '3 kWh', P: '1 kWW' });
    expect(r.inputs[0].error).toEqual({
      kind: 'dimension',
      message: 'Input F: "3 kWh" is an energy (joules), but this needs a force (newtons)',
    });
    expect(r.inputs[1].error?.kind).toBe('unknown_symbol');
    expect(r.inputs[1].error?.message).toMatch(/^Input P: "kWW" is not a unit/);
    expect(r.steps[0].error?.message).toBe('Step F_bound: depends on input P, which has an error');
  });
});

describe('steps', () => {
  test('P/c and the ratio match the photon-rocket formula F = P/c', () => {
    const r = evaluateWorksheet(photonSheet(), { F: '1 mN', P: '1 kW' });
    // F_bound = 1000 W / 299 792 458 m/s = 3.335 640 952 × 10^-6 N
    expect(r.steps[0].value?.si).toBeCloseTo(3.3356409519815205e-6, 18);
    expect(r.steps[0].value?.unit).toBe('N');
    expect(r.steps[0].value?.display).toBe('3.336 µN');
    // ratio = F c / P = 0.001 × 299 792 458 / 1000 = 299.792458
    expect(r.steps[1].value?.si).toBeCloseTo(299.792458, 9);
    expect(r.steps[1].value?.unit).toBe('');
  });

  test('an unknown symbol names the step and the symbol', () => {
    const ws = photonSheet({ steps: [{ name: 'F_bound', label: 'Bound', expression: 'Pp / c' }], checks: [] });
    const r = evaluateWorksheet(ws);
    expect(r.steps[0].error?.kind).toBe('unknown_symbol');
    expect(r.steps[0].error?.message).toMatch(/^Step F_bound: "Pp" is not an input, a step or a constant/);
    expect(r.steps[0].error?.message).toContain('did you mean "P"?');
  });

  test('a later step, a step\'s own name and mathjs constant names are explained', () => {
    const ws = photonSheet({
      steps: [
        { name: 'a', label: 'a', expression: 'b * 2' },
        { name: 'b', label: 'b', expression: 'b + 1' },
        { name: 'k', label: 'k', expression: 'speedOfLight' },
      ],
      checks: [],
    });
    const r = evaluateWorksheet(ws);
    expect(r.steps[0].error?.message).toBe('Step a: "b" is a later step; a step can use only inputs, constants and the steps above it');
    expect(r.steps[1].error?.message).toContain("this step's own name");
    expect(r.steps[2].error?.message).toContain('write c');
  });

  test('a dimension mismatch spells out both dimensions, at the step that caused it', () => {
    const ws = photonSheet({
      steps: [
        { name: 'bad', label: 'bad', expression: '2 * (P + F)' },
        { name: 'later', label: 'later', expression: 'bad * 2' },
        { name: 'ok', label: 'ok', expression: 'P / c' },
      ],
      checks: [],
    });
    const r = evaluateWorksheet(ws);
    expect(r.steps[0].error).toEqual({
      kind: 'dimension',
      message: 'Step bad: cannot add a power (watts) and a force (newtons) in "P + F"',
    });
    expect(r.steps[1].error).toEqual({ kind: 'value', message: 'Step later: depends on step bad, which could not be computed' });
    expect(r.steps[2].value?.si).toBeCloseTo(1000 / C, 18);
  });

  test('other unit errors inside functions and comparisons are rewritten in plain words', () => {
    const run = (expression: string) =>
      evaluateWorksheet(photonSheet({ steps: [{ name: 's', label: 's', expression }], checks: [] })).steps[0].error;
    expect(run('sin(P)')).toEqual({ kind: 'dimension', message: 'Step s: sin() needs an angle or a pure number, but was given a power (watts) in "sin(P)"' });
    expect(run('log(F)')?.message).toContain('log() needs a pure number, but was given a force (newtons)');
    expect(run('P to N')?.message).toContain('cannot convert a power (watts) to N');
    expect(run('P ^ F')?.message).toContain('the exponent must be a pure number');
    expect(run('sqrt(-1)')?.message).toContain('complex number');
    expect(run('P > 1 W')?.message).toContain('true, not a quantity');
    expect(run('P > F')?.message).toContain('cannot compare a power (watts) with a force (newtons)');
  });

  test('a result that does not match the declared unit is a dimension error at that step', () => {
    const ws = photonSheet({ steps: [{ name: 'F_bound', label: 'Bound', expression: 'P * c', unit: 'mN' }], checks: [] });
    const r = evaluateWorksheet(ws);
    expect(r.steps[0].error).toEqual({
      kind: 'dimension',
      message: 'Step F_bound: the result is a quantity in kg·m³·s⁻⁴, but the step\'s unit "mN" is a force (newtons)',
    });
  });

  test('a declared unit sets the display; mathjs conversions with `to` work', () => {
    const ws = photonSheet({
      steps: [
        { name: 'F_bound', label: 'Bound', expression: 'P / c', unit: 'uN' },
        { name: 'in_lbf', label: 'in lbf', expression: '(F to lbf) * 1', unit: 'lbf' },
      ],
      checks: [],
    });
    const r = evaluateWorksheet(ws, { F: '4.4482216152605 N' });
    expect(r.steps[0].value?.display).toBe('3.336 µN');
    expect(r.steps[1].value?.si).toBeCloseTo(4.4482216152605, 12);
    expect(r.steps[1].value?.display).toBe('1 lbf');
  });

  test('syntax errors name the step', () => {
    const r = evaluateWorksheet(photonSheet({ steps: [{ name: 'x', label: 'x', expression: 'P / (c' }], checks: [] }));
    expect(r.steps[0].error?.kind).toBe('syntax');
    expect(r.steps[0].error?.message).toMatch(/^Step x: the expression cannot be read/);
  });

  test('temperatures enter as kelvins, so ratios and differences follow Carnot: η = 1 − Tc/Th', () => {
    const ws = worksheetSchema.parse({
      name: 'carnot',
      title: 'Carnot',
      inputs: [
        { name: 'Th', label: 'Th', unit: 'degC', default: '450 degC' },
        { name: 'Tc', label: 'Tc', unit: 'degF', default: '77 degF' },
      ],
      steps: [
        { name: 'eta', label: 'eta', expression: '1 - Tc / Th', unit: '' },
        { name: 'dT', label: 'dT', expression: 'Th - Tc', unit: 'K' },
      ],
    });
    const r = evaluateWorksheet(ws);
    // Th = 723.15 K, Tc = (77 + 459.67)/1.8 = 298.15 K (NIST SP 811 B.9); η = 1 − 298.15/723.15
    expect(r.steps[0].value?.si).toBeCloseTo(1 - 298.15 / 723.15, 12);
    expect(r.steps[1].value?.si).toBeCloseTo(425, 10);
    expect(r.inputs[0].value?.display).toBe('450 °C');
    expect(r.inputs[1].value?.display).toBe('77 °F');
  });

  test('names that would shadow functions or keywords are refused; unit names may be used', () => {
    const ws = photonSheet({
      inputs: [
        { name: 'sqrt', label: 'x', unit: '', default: '1' },
        { name: 'to', label: 'x', unit: '', default: '1' },
        { name: 'W', label: 'work', unit: 'J', default: '5 J' },
      ],
      steps: [{ name: 'twice', label: 'twice', expression: '2 * W' }],
      checks: [],
    });
    const r = evaluateWorksheet(ws);
    expect(r.inputs[0].error?.message).toContain('the function sqrt()');
    expect(r.inputs[1].error?.message).toContain('reserved word');
    expect(r.steps[0].value?.si).toBe(10);
    expect(r.steps[0].value?.unit).toBe('J');
  });
});

describe('checks', () => {
  test('messages quote display values; holds and fails both reachable', () => {
    const c = compileWorksheet(photonSheet());
    const fails = c.evaluate({ F: '1 mN', P: '1 kW' }).checks[0];
    expect(fails.holds).toBe(false);
    expect(fails.message).toBe('1 mN is 299.8 times the bound 3.336 µN for 1000 W.');
    const holds = c.evaluate({ F: '1 uN', P: '1 kW' }).checks[0];
    expect(holds.holds).toBe(true);
    expect(holds.message).toBe('0.001 mN is within 3.336 µN.');
  });

  test('a condition must give true or false', () => {
    const ws = photonSheet({ checks: [{ name: 'k', label: 'k', condition: 'F + 1 mN', holds: 'h', fails: 'f' }] });
    const r = evaluateWorksheet(ws);
    expect(r.ok).toBe(false);
    expect(r.checks[0].error).toEqual({ kind: 'value', message: 'Check k: the condition gives a force (newtons), not true or false' });
  });

  test('quoting an unknown name is an error at the check', () => {
    const ws = photonSheet({ checks: [{ name: 'k', label: 'k', condition: 'F < F_bound', holds: '{nope}', fails: 'f' }] });
    expect(evaluateWorksheet(ws).checks[0].error?.message).toBe(
      'Check k: the message quotes {nope}, which is not an input, a step or a constant',
    );
  });
});

describe('plots', () => {
  const plotSheet = (scale: 'linear' | 'log', yScale: 'linear' | 'log' = 'linear') =>
    photonSheet({
      plots: [
        {
          name: 'bound',
          label: 'Bound against power',
          sweep: { input: 'P', from: '1 W', to: '1 GW', points: 10, scale },
          series: ['F_bound', 'F'],
          yScale,
        },
      ],
    });

  test('a log sweep spaces points evenly in log, series in the display unit of the first series', () => {
    const r = evaluateWorksheet(plotSheet('log', 'log'));
    const p = r.plots[0];
    expect(p.error).toBeUndefined();
    expect(p.x.unit).toBe('W');
    expect(p.x.values).toHaveLength(10);
    p.x.values.forEach((x, i) => expect(x / Math.pow(10, i) - 1).toBeCloseTo(0, 12)); // 1, 10, …, 1e9 W
    expect(p.series[0].unit).toBe('N');
    expect(p.series[1].unit).toBe('N');
    p.series[0].values.forEach((y, i) => expect((y as number) / (Math.pow(10, i) / C) - 1).toBeCloseTo(0, 12));
    expect(p.series[1].values.every((y) => y === 0.001)).toBe(true);
    // the main results are those of the typed values, not the last sweep point
    expect(r.steps[0].value?.si).toBeCloseTo(1000 / C, 18);
  });

  test('a linear sweep spaces points evenly', () => {
    const p = evaluateWorksheet(plotSheet('linear')).plots[0];
    const step = (1e9 - 1) / 9;
    p.x.values.forEach((x, i) => expect(x).toBeCloseTo(1 + step * i, 3));
  });

  test('points that fail are null, and two plots sweeping different inputs do not disturb each other', () => {
    const ws = worksheetSchema.parse({
      name: 'two',
      title: 'two plots',
      inputs: [
        { name: 'a', label: 'a', unit: '', default: '4', min: '0' },
        { name: 'b', label: 'b', unit: 'm', default: '2 m' },
      ],
      steps: [
        { name: 'root', label: 'root', expression: 'sqrt(a) * b' },
        { name: 'area', label: 'area', expression: 'b^2' },
      ],
      plots: [
        { name: 'p1', label: 'p1', sweep: { input: 'a', from: '-2', to: '2', points: 5 }, series: ['root'] },
        { name: 'p2', label: 'p2', sweep: { input: 'b', from: '1 m', to: '3 m', points: 3 }, series: ['area', 'root'] },
      ],
    });
    const r = evaluateWorksheet(ws);
    // a = −2 and −1 are below min 0: null; sqrt(0)·2, sqrt(1)·2, sqrt(2)·2
    expect(r.plots[0].series[0].values.slice(0, 2)).toEqual([null, null]);
    expect(r.plots[0].series[0].values.slice(2)).toEqual([0, 2, 2 * Math.SQRT2]);
    expect(r.plots[1].error?.kind).toBe('dimension'); // area is m^2, root is m
    expect(r.plots[1].error?.message).toContain('must share one dimension');
    expect(r.steps[0].value?.si).toBe(4); // sqrt(4) · 2 m, after both plots
  });

  test('evaluate({plots: false}) skips the plots', () => {
    expect(compileWorksheet(plotSheet('log')).evaluate({}, { plots: false }).plots).toEqual([]);
  });
});

describe('kit functions', () => {
  const kit: Record<string, KitFunction> = {
    photon_bound: { summary: 'P/c', args: [{ name: 'P', unit: 'W' }], unit: 'N', fn: (p) => p / C },
    in_kw: { summary: 'P in kW', args: [{ name: 'P', unit: 'kW' }], unit: '', fn: (p) => p },
  };
  const ws = (expression: string) =>
    photonSheet({ steps: [{ name: 's', label: 's', expression }], checks: [] });

  test('arguments arrive in the declared units; the result carries the declared unit', () => {
    const r = evaluateWorksheet(ws('photon_bound(P)'), {}, { functions: kit });
    expect(r.steps[0].value?.si).toBeCloseTo(1000 / C, 18);
    expect(r.steps[0].value?.unit).toBe('N');
    expect(evaluateWorksheet(ws('in_kw(P)'), {}, { functions: kit }).steps[0].value?.si).toBe(1);
    expect(evaluateWorksheet(ws('photon_bound(P) / F'), {}, { functions: kit }).steps[0].value?.unit).toBe('');
  });

  test('a dimension mismatch in an argument is a clear error at the step', () => {
    const r = evaluateWorksheet(ws('photon_bound(F)'), {}, { functions: kit });
    expect(r.steps[0].error).toEqual({
      kind: 'dimension',
      message: 'Step s: photon_bound(): the argument P must be a power (watts), but it is a force (newtons)',
    });
  });

  test('the wrong number of arguments is found when compiling; unknown without the kit', () => {
    expect(evaluateWorksheet(ws('photon_bound(P, P)'), {}, { functions: kit }).steps[0].error?.message).toBe(
      'Step s: photon_bound(P) takes 1 argument, not 2',
    );
    expect(evaluateWorksheet(ws('photon_bound(P)')).steps[0].error?.kind).toBe('unknown_symbol');
  });
});

describe('compile once, evaluate many times', () => {
  test('repeated evaluation gives identical results, and an error does not leak into the next run', () => {
    const c = compileWorksheet(photonSheet());
    const first = c.evaluate({ F: '2 mN', P: '3 kW' });
    c.evaluate({ F: 'nonsense', P: '-5 W' });
    c.evaluate({ P: '1e30 W' });
    expect(c.evaluate({ F: '2 mN', P: '3 kW' })).toEqual(first);
    expect(evaluateWorksheet(photonSheet(), { F: '2 mN', P: '3 kW' })).toEqual(first);
  });
});

describe('validateWorksheet', () => {
  test('a valid worksheet is returned parsed', () => {
    const v = validateWorksheet(photonSheet());
    expect(v.ok).toBe(true);
  });

  test('schema errors are named by field path', () => {
    const bad = { ...photonSheet(), name: 'Not A Slug', steps: [{ name: '1x', label: 'x', expression: '' }] };
    const v = validateWorksheet(bad);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(Object.keys(v.fields)).toEqual(expect.arrayContaining(['worksheet.name', 'worksheet.steps.0.name', 'worksheet.steps.0.expression']));
  });

  test('compile and evaluation errors are named by field path too', () => {
    const ws = photonSheet({
      steps: [
        { name: 'F_bound', label: 'Bound', expression: 'P / c' },
        { name: 'ratio', label: 'Ratio', expression: 'F / F_bound' },
        { name: 'oops', label: 'Oops', expression: 'Pp + 1' },
        { name: 'mix', label: 'Mix', expression: 'P + F' },
      ],
    });
    const v = validateWorksheet(ws);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(v.fields['worksheet.steps.2.expression']).toMatch(/^Step oops: "Pp" is not an input/);
    expect(v.fields['worksheet.steps.3.expression']).toContain('cannot add a power');
  });
});
