/**
 * The locked-down mathjs instance: hostile expressions are refused with a clear message, and the
 * process stays up and keeps evaluating. (The mathjs "Security" page names import, createUnit,
 * evaluate, parse, simplify and derivative as the main risks; the rest follow from them.)
 */
import { ExpressionError, MAX_ELEMENTS, MAX_NESTING, math } from './math';
import { vetExpression } from './vet';
import { compileWorksheet, evaluateWorksheet } from './evaluate';
import type { Worksheet } from './schema';

function refusal(text: string): ExpressionError {
  try {
    vetExpression(text, { valueNames: new Set(['x', 'P']) });
  } catch (e) {
    expect(e).toBeInstanceOf(ExpressionError);
    return e as ExpressionError;
  }
  throw new Error(`"${text.slice(0, 60)}" was not refused`);
}

const sheet = (expression: string): Worksheet => ({
  name: 'hostile',
  title: 'hostile',
  inputs: [{ name: 'n', label: 'n', unit: '', default: '1e9' }],
  steps: [
    { name: 'bad', label: 'bad', expression },
    { name: 'after', label: 'after', expression: 'n + 1' },
  ],
  checks: [],
  plots: [],
});

describe('hostile expressions are refused at the step that holds them', () => {
  const cases: [string, string, RegExp][] = [
    ['import', 'import({}, {override:true})', /import\(\) is disabled/],
    ['createUnit', "createUnit('x')", /createUnit\(\) is disabled/],
    ['evaluate', 'evaluate("1+1")', /evaluate\(\) is disabled/],
    ['parse', 'parse("1")', /parse\(\) is disabled/],
    ['compile', 'compile("1")', /compile\(\) is disabled/],
    ['simplify', 'simplify("x")', /simplify\(\) is disabled/],
    ['derivative', 'derivative("x^2", "x")', /derivative\(\) is disabled/],
    ['resolve', 'resolve(x)', /resolve\(\) is disabled/],
    ['chain', 'chain(1)', /chain\(\) is disabled/],
    ['function definition', 'f(x) = x', /defining a function/],
    ['assignment', 'x = 5', /assignment/],
    ['several statements', '1; 2', /only one expression/],
    ['huge range', '1:1e9', /would make 1000000000 elements; the limit is 10000/],
    ['huge range(…)', 'range(1, 1e9)', /would make 1000000000 elements/],
    ['huge zeros', 'zeros(1e6)', /zeros\(1000000\) would make 1000000 elements/],
    ['huge ones', 'ones(5000,5000)', /ones\(5000, 5000\) would make 25000000 elements/],
    ['loop via map', 'map(1:1e7, sqrt)', /map\(\) is disabled in worksheets: expressions have no loops/],
    ['forEach', 'forEach([1,2], sqrt)', /forEach\(\) is disabled/],
    ['filter', 'filter([1,2], isPositive)', /filter\(\) is disabled/],
    ['2-D array (broadcasting)', '[[1],[2]] + [1,2,3]', /nested lists/],
    ['property access', 'x.constructor', /property access/],
    ['indexing', 'x[1]', /indexing/],
    ['object', '{a: 1}', /objects/],
    ['string', '"abc"', /text in quotes/],
    ['bitwise operator', 'x & 1', /operator "&"/],
    ['unlisted mathjs function', 'lup(1)', /lup\(\) is not one of the functions/],
  ];
  test.each(cases)('%s: %s', (_what, text, message) => {
    const e = refusal(text);
    expect(e.kind).toBe('refused');
    expect(e.message).toMatch(message);
    const r = evaluateWorksheet(sheet(text));
    expect(r.steps[0].error?.kind).toBe('refused');
    expect(r.steps[0].error?.message).toMatch(/^Step bad: /);
    // the worksheet still evaluates the rest
    expect(r.steps[1].value?.si).toBe(1e9 + 1);
  });

  test('10 000 nested parentheses are refused before the parser sees them', () => {
    const text = '('.repeat(10000) + '1' + ')'.repeat(10000);
    expect(refusal(text).kind).toBe('refused');
    const r = evaluateWorksheet(sheet(text));
    expect(r.steps[0].error?.kind).toBe('refused');
  });

  test(`nesting deeper than ${MAX_NESTING} levels (within the length limit) is refused; ${MAX_NESTING} levels are fine`, () => {
    const deep = '('.repeat(MAX_NESTING + 1) + '1' + ')'.repeat(MAX_NESTING + 1);
    expect(refusal(deep).message).toContain(`nested more than ${MAX_NESTING} levels`);
    const ok = '('.repeat(MAX_NESTING) + '1' + ')'.repeat(MAX_NESTING);
    expect(evaluateWorksheet(sheet(ok)).steps[0].value?.si).toBe(1);
    expect(refusal('sqrt('.repeat(45) + '1' + ')'.repeat(45)).kind).toBe('refused');
  });

  test('a long chain of unary operators is refused by the tree depth limit', () => {
    expect(refusal('-'.repeat(200) + '1').message).toContain('nested more than');
  });

  test('a 100 kB expression is refused by its length', () => {
    const text = '1+'.repeat(50000) + '1';
    const e = refusal(text);
    expect(e.kind).toBe('refused');
    expect(e.message).toContain('the limit is 500');
  });

  test('ranges and lists sized at run time are bounded too', () => {
    const r = evaluateWorksheet(sheet('sum(1:n)'));
    expect(r.steps[0].error?.kind).toBe('refused');
    expect(r.steps[0].error?.message).toContain(`the limit is ${MAX_ELEMENTS}`);
    expect(evaluateWorksheet(sheet('sum(zeros(n))')).steps[0].error?.kind).toBe('refused');
    expect(evaluateWorksheet(sheet('sum(ones(n / 1e5))')).steps[0].value?.si).toBe(10000);
    // the inclusive range 1:10000 is the largest allowed, and sums to n(n+1)/2 (Gauss)
    expect(evaluateWorksheet(sheet('sum(1:10000)')).steps[0].value?.si).toBe((10000 * 10001) / 2);
  });

  test('syntax errors are reported with kind syntax', () => {
    const e = (() => {
      try {
        vetExpression('P / (c');
      } catch (err) {
        return err as ExpressionError;
      }
      throw new Error('not refused');
    })();
    expect(e.kind).toBe('syntax');
    expect(e.message).toContain('cannot be read');
  });
});

describe('the instance itself is locked', () => {
  test('import, createUnit, evaluate, parse, compile, simplify, derivative, resolve, chain throw', () => {
    const m = math as unknown as Record<string, (...a: unknown[]) => unknown>;
    expect(() => m.import({ pi: 3 }, { override: true })).toThrow('import() is disabled');
    expect(() => m.createUnit('furlong')).toThrow('createUnit() is disabled');
    expect(() => m.evaluate('1+1')).toThrow('evaluate() is disabled');
    expect(() => m.parse('1')).toThrow('parse() is disabled');
    expect(() => m.compile('1')).toThrow('compile() is disabled');
    expect(() => m.simplify('x')).toThrow('simplify() is disabled');
    expect(() => m.derivative('x^2', 'x')).toThrow('derivative() is disabled');
    expect(() => m.resolve('x')).toThrow('resolve() is disabled');
    expect(() => m.chain(1)).toThrow('chain() is disabled');
    expect(math.pi).toBe(Math.PI);
  });

  test('after all of the above the evaluator still works', () => {
    const c = compileWorksheet({
      name: 'after',
      title: 'after',
      inputs: [{ name: 'P', label: 'P', unit: 'W', default: '1 kW' }],
      steps: [{ name: 'F', label: 'F', expression: 'P / c' }],
      checks: [],
      plots: [],
    });
    // P/c for 1 kW: 1000 / 299 792 458 N (photon momentum flux, p = E/c)
    expect(c.evaluate({}).steps[0].value?.si).toBeCloseTo(1000 / 299792458, 20);
  });
});

describe('a time budget bounds hostile worksheets', () => {
  test('steps, checks and plot points beyond the budget are refused, and the call returns', () => {
    // Each step sums 10 000 squared lengths (about 10–100 ms); 60 of them, swept by a plot, would run for minutes.
    const heavy = 'sum(((1:10000) m).^2) + sum(((1:10000) m).^2)';
    const ws: Worksheet = {
      name: 'heavy',
      title: 'heavy',
      inputs: [{ name: 'n', label: 'n', unit: '', default: '1' }],
      steps: Array.from({ length: 60 }, (_, i) => ({ name: `s${i}`, label: `s${i}`, expression: `${heavy} + n m^2` })),
      checks: [{ name: 'k', label: 'k', condition: 's59 > 0 m^2', holds: 'yes', fails: 'no' }],
      plots: [{ name: 'p', label: 'p', sweep: { input: 'n', from: '1', to: '2', points: 200, scale: 'linear' }, series: ['s59'], yScale: 'linear' }],
    };
    const t0 = Date.now();
    const r = compileWorksheet(ws).evaluate({}, { budgetMs: 50 });
    const elapsed = Date.now() - t0; // not asserted on (speed belongs to the bench); shown if the test fails
    expect({ elapsed, last: r.steps[59].error?.kind }).toMatchObject({ last: 'refused' });
    expect(r.steps[59].error?.message).toBe('Step s59: not computed: this worksheet took longer than 50 ms to evaluate');
    expect(r.checks[0].error?.kind).toBe('refused');
    expect(r.plots[0].error?.kind).toBe('refused');
    expect(r.plots[0].series[0].values).toHaveLength(200);
    expect(r.overBudget).toBe(true);
  });

  test('an ordinary worksheet within its budget is not flagged', () => {
    const ws: Worksheet = {
      name: 'light',
      title: 'light',
      inputs: [{ name: 'n', label: 'n', unit: '', default: '2' }],
      steps: [{ name: 's', label: 's', expression: 'n * 3 m' }],
      checks: [],
      plots: [],
    };
    const r = compileWorksheet(ws).evaluate({});
    expect(r.ok).toBe(true);
    expect(r.overBudget).toBeUndefined();
  });
});

describe('units and comparisons at atomic scales', () => {
  test('the electronvolt is exact: e = 1.602176634e-19 C (SI Brochure, 9th ed., 2019, Table 8)', () => {
    expect(math.unit('1 eV').toNumber('J')).toBe(1.602176634e-19);
    expect(math.unit('1 MeV').toNumber('J')).toBeCloseTo(1.602176634e-13, 25);
    expect(math.unit('3 electronvolt').toNumber('eV')).toBeCloseTo(3, 12);
  });

  test('quantities below 1e-15 in SI units compare by value (no absolute tolerance)', () => {
    // 135 eV and 10 eV are about 2.2e-17 J and 1.6e-18 J: mathjs's default absTol of 1e-15 made them equal.
    expect(math.smallerEq(math.unit('135 eV'), math.unit('10 eV'))).toBe(false);
    expect(math.larger(math.unit('2e-21 J'), math.unit('1e-21 J'))).toBe(true);
    expect(math.equal(math.unit('1 eV'), math.unit('1.602176634e-19 J'))).toBe(true);
  });
});
