/**
 * The locked-down mathjs instance behind worksheets (DESIGN.md §4); the vetting of expressions is
 * in vet.ts. Pure TypeScript, no Node-only
 * APIs: the same module runs in the browser and on the server.
 *
 * Two layers of defence:
 *
 * 1. The instance itself. After it is created, the functions that the mathjs "Security" page names
 *    as the main risks (import, createUnit, evaluate, parse, simplify, derivative) and their
 *    relatives (compile, resolve, reviver, chain, parser, rationalize, …) are replaced with functions
 *    that throw, both in the library namespace and in the expression namespace. Functions that loop
 *    over a matrix with a callback (map, forEach, filter, …) are disabled in the expression namespace,
 *    and range/zeros/ones/matrix are wrapped there so that no call makes more than MAX_ELEMENTS
 *    elements. The parser used here was captured before it was disabled.
 *
 * 2. Every expression is vetted before it is compiled (`vetExpression`): at most
 *    MAX_EXPRESSION_LENGTH characters, brackets nested at most MAX_NESTING deep (checked on the text
 *    before parsing, so 10 000 nested parentheses never reach the recursive parser), then a walk of
 *    the node tree that allows only an explicit list of node types, operators, functions and symbols.
 *    Assignments (`x = 5`), function definitions (`f(x) = x`), several statements (`a; b`), indexing
 *    and property access (`a[1]`, `a.b`), objects, strings and nested (2-D) array literals are refused,
 *    as is any function not on the list. Ranges and zeros/ones with constant arguments are sized at
 *    vetting time; with computed arguments the wrapped functions check at run time.
 *
 * Only one-dimensional lists exist in worksheets (zeros/ones take one size; array literals cannot be
 * nested): mathjs broadcasts element-wise operations, so a column and a row could otherwise be
 * combined into a matrix of millions of elements from two small lists.
 */
import { all, create } from 'mathjs';
import type { MathNode } from 'mathjs';
import type { EvaluationErrorKind } from './types';

/** Most elements any list (range, zeros, ones, matrix) may have. */
export const MAX_ELEMENTS = 10_000;
/** Deepest nesting of brackets ( [ { in an expression's text. */
export const MAX_NESTING = 40;
/** Deepest node tree (operator chains such as a+b+c+… count one level per operator). */
export const MAX_TREE_DEPTH = 100;

/* eslint-disable @typescript-eslint/no-explicit-any */
type AnyFn = (...args: any[]) => any;

/** An error raised while vetting or running an expression, with the kind the evaluator reports. */
export class ExpressionError extends Error {
  readonly kind: EvaluationErrorKind;
  constructor(kind: EvaluationErrorKind, message: string) {
    super(message);
    this.name = 'ExpressionError';
    this.kind = kind;
    Object.setPrototypeOf(this, ExpressionError.prototype);
  }
}

// absTol 0: comparisons are relative only (relTol 1e-12). mathjs's default absolute tolerance of
// 1e-15 made any two quantities below 1e-15 in SI units equal, so "135 eV <= 10 eV" (about 1e-17 J
// each) held.
const instance = create(all, { number: 'number', matrix: 'Matrix', predictable: false, absTol: 0 });

// The electronvolt at its exact value, e × 1 J/C with e = 1.602176634e-19 C (SI Brochure, 9th ed.,
// 2019, Table 8); mathjs carries the CODATA 2010 value 1.602176565e-19 J. Keeps its prefixes (keV, MeV).
instance.createUnit('eV', { definition: '1.602176634e-19 J', prefixes: 'short', aliases: ['electronvolt', 'electronvolts'] }, { override: true });

// Metric horsepower (Pferdestärke, cheval-vapeur) beside mathjs's mechanical horsepower "hp":
// 1 PS = 75 kgf·m/s = 735.49875 W exactly (NIST SP 811 (2008), App. B.8, "horsepower, metric").
// Without it mathjs reads "PS" as a petasiemens. Made before the instance is locked; no prefixes.
instance.createUnit('PS', { definition: '735.49875 W', prefixes: 'none' });

// Capture what this module needs before the instance is locked.
const parseText: (text: string) => MathNode = instance.parse;
const unitClass = instance.Unit;
const isValuelessUnitFn: (name: string) => boolean = (name) => unitClass.isValuelessUnit(name);

const mathWithTransform: Record<string, any> = (instance as any).expression.mathWithTransform;

function disabled(name: string, why = 'is disabled in worksheets'): AnyFn {
  const fn = () => {
    throw new ExpressionError('refused', `${name}() ${why}`);
  };
  Object.defineProperty(fn, 'name', { value: name });
  return fn;
}

/**
 * Disabled in the library and in expressions: they alter the instance or parse text into new
 * expression trees (mathjs "Security" page), or build functions.
 */
export const DISABLED_FUNCTIONS: readonly string[] = Object.freeze([
  'import',
  'createUnit',
  'evaluate',
  'parse',
  'compile',
  'simplify',
  'simplifyCore',
  'simplifyConstant',
  'derivative',
  'resolve',
  'reviver',
  'replacer',
  'chain',
  'parser',
  'rationalize',
  'leafCount',
  'symbolicEqual',
  'help',
  'typed',
  'config',
]);

/** Disabled in expressions only (other library functions depend on them): loops with a callback. */
export const LOOP_FUNCTIONS: readonly string[] = Object.freeze([
  'map',
  'forEach',
  'filter',
  'mapSlices',
  'apply',
  'sort',
  'partitionSelect',
  'solveODE',
]);

{
  const overrides: Record<string, AnyFn> = {};
  // `config` and `typed` are not plain functions of the namespace; leave them to the vetting layer.
  for (const name of DISABLED_FUNCTIONS) if (name !== 'config' && name !== 'typed') overrides[name] = disabled(name);
  // One call, as on the mathjs Security page: `import` itself is among the overridden names.
  instance.import(overrides, { override: true });
  for (const name of LOOP_FUNCTIONS) {
    mathWithTransform[name] = disabled(name, 'is disabled in worksheets: expressions have no loops');
  }
}

function countOf(x: unknown): number {
  if (typeof x === 'number') return x;
  if (x && typeof x === 'object' && 'isUnit' in x && (x as any).isUnit) return Number((x as any).value);
  return Number.NaN;
}

/** Number of elements `range(start, end[, step])` makes (end inclusive, as in expressions). */
export function rangeCount(start: number, end: number, step = 1): number {
  if (![start, end, step].every(Number.isFinite) || step === 0) return Number.POSITIVE_INFINITY;
  const n = (end - start) / step;
  return n < 0 ? 0 : Math.floor(n + 1e-9) + 1;
}

/** The error for a list that would exceed MAX_ELEMENTS. */
export function tooMany(what: string, n: number): ExpressionError {
  const count = Number.isFinite(n) ? String(Math.round(n)) : 'an unbounded number of';
  return new ExpressionError('refused', `${what} would make ${count} elements; the limit is ${MAX_ELEMENTS}`);
}

function elementCount(x: any): number {
  if (Array.isArray(x)) return x.reduce((s: number, v: any) => s + (Array.isArray(v) ? elementCount(v) : 1), 0);
  if (x && typeof x === 'object' && typeof x.size === 'function' && x.isMatrix) {
    return (x.size() as number[]).reduce((a, b) => a * b, 1);
  }
  return 1;
}

{
  // Bounded versions, in the expression namespace only (RangeNode captures `range` from it).
  const range: AnyFn = mathWithTransform.range;
  const zeros: AnyFn = mathWithTransform.zeros;
  const ones: AnyFn = mathWithTransform.ones;
  const matrix: AnyFn = mathWithTransform.matrix;
  const sized = (name: string, make: AnyFn): AnyFn =>
    function bounded(...args: any[]) {
      if (args.length !== 1) {
        throw new ExpressionError('refused', `${name}() takes one size in worksheets (only one-dimensional lists)`);
      }
      const n = countOf(Array.isArray(args[0]) && args[0].length === 1 ? args[0][0] : args[0]);
      if (!(n <= MAX_ELEMENTS)) throw tooMany(`${name}(${String(args[0])})`, n);
      return make(...args);
    };
  mathWithTransform.range = function boundedRange(...args: any[]) {
    if (args.length < 2 || args.length > 3) {
      throw new ExpressionError('refused', 'range() takes a start, an end and an optional step in worksheets');
    }
    const [a, b, s] = args.map(countOf);
    const n = rangeCount(a, b, args.length === 3 ? s : 1);
    if (!(n <= MAX_ELEMENTS)) throw tooMany('this range', n);
    return range(...args);
  };
  mathWithTransform.zeros = sized('zeros', zeros);
  mathWithTransform.ones = sized('ones', ones);
  mathWithTransform.matrix = function boundedMatrix(...args: any[]) {
    if (args.length > 1) throw new ExpressionError('refused', 'matrix() takes one list in worksheets');
    if (args.length === 1 && elementCount(args[0]) > MAX_ELEMENTS) throw tooMany('matrix()', elementCount(args[0]));
    return matrix(...args);
  };
  // ln(x): the natural logarithm under the name physicists write (mathjs calls it log).
  const log: AnyFn = mathWithTransform.log;
  mathWithTransform.ln = function ln(...args: any[]) {
    if (args.length !== 1) throw new ExpressionError('syntax', 'ln() takes one argument (write log(x, base) for other bases)');
    return log(args[0]);
  };
}

/** The locked instance. Its parse/evaluate/import/… throw; use vetExpression to compile. */
export const math = instance;
export const Unit = unitClass;
export const isValuelessUnit = isValuelessUnitFn;
/** The mathjs parser, captured before the instance was locked: call it only through vetExpression (vet.ts). */
export const parseExpressionText = parseText;

/** True when `name` is a function or constant of the mathjs namespace seen by expressions. */
export function isMathName(name: string): boolean {
  return Object.prototype.hasOwnProperty.call(mathWithTransform, name) || name in mathWithTransform;
}
