/**
 * The locked-down mathjs instance behind worksheets (DESIGN.md §4). Pure TypeScript, no Node-only
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
import type { EvalFunction, MathNode } from 'mathjs';
import { MAX_EXPRESSION_LENGTH } from './schema';
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

function tooMany(what: string, n: number): ExpressionError {
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

/** Operators allowed in expressions (mathjs OperatorNode `fn` names). */
export const ALLOWED_OPERATORS: ReadonlySet<string> = new Set([
  'add',
  'subtract',
  'multiply',
  'divide',
  'pow',
  'unaryMinus',
  'unaryPlus',
  'mod',
  'dotMultiply',
  'dotDivide',
  'dotPow',
  'smaller',
  'larger',
  'smallerEq',
  'largerEq',
  'equal',
  'unequal',
  'and',
  'or',
  'not',
  'xor',
  'to',
  'factorial',
]);

/** Functions allowed in expressions. Every one returns a value no larger than its arguments. */
export const ALLOWED_FUNCTIONS: ReadonlySet<string> = new Set([
  'abs',
  'sqrt',
  'cbrt',
  'square',
  'cube',
  'exp',
  'expm1',
  'log',
  'ln',
  'log10',
  'log2',
  'log1p',
  'pow',
  'nthRoot',
  'hypot',
  'sin',
  'cos',
  'tan',
  'sec',
  'csc',
  'cot',
  'asin',
  'acos',
  'atan',
  'atan2',
  'sinh',
  'cosh',
  'tanh',
  'asinh',
  'acosh',
  'atanh',
  'min',
  'max',
  'sum',
  'prod',
  'mean',
  'median',
  'std',
  'variance',
  'norm',
  'dot',
  'cross',
  'size',
  'floor',
  'ceil',
  'round',
  'fix',
  'sign',
  'mod',
  'gamma',
  'factorial',
  'erf',
  'to',
  'number',
  'range',
  'zeros',
  'ones',
  'matrix',
]);

/** Symbols from the mathjs namespace that expressions may use as values. */
export const ALLOWED_SYMBOLS: ReadonlySet<string> = new Set(['pi', 'tau']);

/** mathjs parser keywords: they cannot be names of inputs or steps. */
export const RESERVED_WORDS: ReadonlySet<string> = new Set([
  'end',
  'mod',
  'to',
  'in',
  'and',
  'or',
  'xor',
  'not',
  'true',
  'false',
  'null',
  'undefined',
  'Infinity',
  'NaN',
]);

/** True when `name` is a function or constant of the mathjs namespace seen by expressions. */
export function isMathName(name: string): boolean {
  return Object.prototype.hasOwnProperty.call(mathWithTransform, name) || name in mathWithTransform;
}

export interface VetOptions {
  /** Names expressions may use as values (inputs, steps, constants), resolved through the scope. */
  valueNames?: ReadonlySet<string>;
  /** Extra functions callable from expressions (the check kit), resolved through the scope. */
  functions?: ReadonlySet<string>;
  /** Hints for unknown names, e.g. { speedOfLight: 'c' }. */
  hints?: Readonly<Record<string, string>>;
}

export interface VettedExpression {
  node: MathNode;
  /** Value symbols the expression uses (inputs, steps, constants; not units or pi). */
  symbols: string[];
  /** Functions called (built-in and extra), with the number of arguments of each call. */
  calls: { name: string; argc: number }[];
  code: EvalFunction;
}

/** Checks the bracket nesting of raw text without parsing it (so deep nesting never reaches the parser). */
function nestingDepth(text: string): number {
  let depth = 0;
  let max = 0;
  let quote: string | null = null;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quote) {
      if (ch === '\\') i++;
      else if (ch === quote) quote = null;
      continue;
    }
    if (ch === '"' || ch === "'") quote = ch;
    else if (ch === '(' || ch === '[' || ch === '{') {
      depth++;
      if (depth > max) max = depth;
    } else if (ch === ')' || ch === ']' || ch === '}') depth--;
  }
  return max;
}

/** The value of a constant sub-expression (numbers and + - * / ^ of them), for sizing ranges. */
export function constantValue(node: MathNode): number | undefined {
  const n = node as any;
  switch (n.type) {
    case 'ConstantNode':
      return typeof n.value === 'number' ? n.value : undefined;
    case 'ParenthesisNode':
      return constantValue(n.content);
    case 'OperatorNode': {
      const args = (n.args as MathNode[]).map(constantValue);
      if (args.some((a) => a === undefined)) return undefined;
      const [a, b] = args as number[];
      switch (n.fn) {
        case 'unaryMinus':
          return -a;
        case 'unaryPlus':
          return a;
        case 'add':
          return a + b;
        case 'subtract':
          return a - b;
        case 'multiply':
          return a * b;
        case 'divide':
          return a / b;
        case 'pow':
          return Math.pow(a, b);
        default:
          return undefined;
      }
    }
    default:
      return undefined;
  }
}

function editDistance(a: string, b: string): number {
  const dp = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = dp[0];
    dp[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = dp[j];
      dp[j] = Math.min(dp[j] + 1, dp[j - 1] + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return dp[b.length];
}

/** "; did you mean "P"?" when a known name is close to an unknown one. */
export function suggestion(name: string, candidates: Iterable<string>): string {
  let best: string | undefined;
  let bestD = Infinity;
  for (const c of candidates) {
    const d = c.toLowerCase() === name.toLowerCase() ? 0.5 : editDistance(name, c);
    if (d < bestD) {
      bestD = d;
      best = c;
    }
  }
  const limit = name.length <= 3 ? 1 : 2;
  return best !== undefined && bestD <= limit ? `; did you mean "${best}"?` : '';
}

const NODE_WORDS: Record<string, string> = {
  AssignmentNode: 'assignment (x = …) is not allowed: a step holds one expression, and its name holds the result',
  FunctionAssignmentNode: 'defining a function (f(x) = …) is not allowed in worksheets',
  BlockNode: 'only one expression is allowed: split "a; b" into separate steps',
  AccessorNode: 'indexing and property access (a[1], a.b) are not allowed in worksheets',
  IndexNode: 'indexing (a[1]) is not allowed in worksheets',
  ObjectNode: 'objects ({a: 1}) are not allowed in worksheets',
};

function cleanSyntaxMessage(message: string): string {
  return message.replace(/\(char (\d+)\)/, 'at character $1').replace(/^./, (c) => c.toLowerCase());
}

/**
 * Parses and vets one expression. Throws ExpressionError with kind 'refused', 'syntax' or
 * 'unknown_symbol' and a plain-words message (without the step's name: the caller adds it).
 */
export function vetExpression(text: string, opts: VetOptions = {}): VettedExpression {
  if (typeof text !== 'string') throw new ExpressionError('syntax', 'the expression must be text');
  if (text.length > MAX_EXPRESSION_LENGTH) {
    throw new ExpressionError('refused', `the expression is ${text.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}`);
  }
  if (text.trim() === '') throw new ExpressionError('syntax', 'the expression is empty');
  if (nestingDepth(text) > MAX_NESTING) {
    throw new ExpressionError('refused', `brackets are nested more than ${MAX_NESTING} levels deep`);
  }
  let node: MathNode;
  try {
    node = parseText(text);
  } catch (err) {
    if (err instanceof RangeError) throw new ExpressionError('refused', 'the expression is too deeply nested to read');
    throw new ExpressionError('syntax', `the expression cannot be read: ${cleanSyntaxMessage((err as Error).message)}`);
  }
  const valueNames = opts.valueNames ?? new Set<string>();
  const extra = opts.functions ?? new Set<string>();
  const hints = opts.hints ?? {};
  const symbols = new Set<string>();
  const calls: { name: string; argc: number }[] = [];

  const unknownValue = (name: string): ExpressionError => {
    if (hints[name]) {
      return new ExpressionError('unknown_symbol', `"${name}" is not an input, a step or a constant; write ${hints[name]}`);
    }
    if (isMathName(name) && isValuelessUnitFn(name)) {
      return new ExpressionError(
        'unknown_symbol',
        `"${name}" means the function ${name}() in expressions; for the unit write its full name (for example minute, second)`,
      );
    }
    if (extra.has(name) || ALLOWED_FUNCTIONS.has(name)) {
      return new ExpressionError('unknown_symbol', `"${name}" is a function; call it with its arguments, as ${name}(…)`);
    }
    if (name === 'E') {
      return new ExpressionError('unknown_symbol', '"E" is not an input, a step or a constant (for Euler\'s number write exp(1); e is the elementary charge)');
    }
    if (name === 'i') return new ExpressionError('unknown_symbol', '"i" is not an input, a step or a constant (complex numbers are not supported)');
    return new ExpressionError('unknown_symbol', `"${name}" is not an input, a step or a constant${suggestion(name, valueNames)}`);
  };

  const walk = (n: any, depth: number, asFunctionName = false): void => {
    if (depth > MAX_TREE_DEPTH) throw new ExpressionError('refused', `the expression is nested more than ${MAX_TREE_DEPTH} levels deep`);
    switch (n.type) {
      case 'ConstantNode':
        if (typeof n.value === 'number' || typeof n.value === 'boolean') return;
        if (typeof n.value === 'string') throw new ExpressionError('refused', 'text in quotes is not allowed in expressions');
        throw new ExpressionError('refused', `the value ${String(n.value)} is not allowed in expressions`);
      case 'SymbolNode': {
        const name: string = n.name;
        if (asFunctionName) return;
        if (valueNames.has(name)) {
          symbols.add(name);
          return;
        }
        if (ALLOWED_SYMBOLS.has(name)) return;
        if (isMathName(name) || extra.has(name)) throw unknownValue(name);
        if (isValuelessUnitFn(name)) return;
        throw unknownValue(name);
      }
      case 'ParenthesisNode':
        walk(n.content, depth + 1);
        return;
      case 'OperatorNode':
        if (!ALLOWED_OPERATORS.has(n.fn)) {
          throw new ExpressionError('refused', `the operator "${n.op}" (${n.fn}) is not allowed in worksheets`);
        }
        for (const a of n.args) walk(a, depth + 1);
        return;
      case 'ConditionalNode':
        walk(n.condition, depth + 1);
        walk(n.trueExpr, depth + 1);
        walk(n.falseExpr, depth + 1);
        return;
      case 'RelationalNode':
        for (const c of n.conditionals) {
          if (!ALLOWED_OPERATORS.has(c)) throw new ExpressionError('refused', `the comparison ${c} is not allowed in worksheets`);
        }
        for (const p of n.params) walk(p, depth + 1);
        return;
      case 'ArrayNode':
        for (const item of n.items) {
          if (item.type === 'ArrayNode') {
            throw new ExpressionError('refused', 'nested lists ([[…]]) are not allowed: worksheets use one-dimensional lists only');
          }
          walk(item, depth + 1);
        }
        return;
      case 'RangeNode': {
        const start = constantValue(n.start);
        const end = constantValue(n.end);
        const step = n.step ? constantValue(n.step) : 1;
        if (start !== undefined && end !== undefined && step !== undefined) {
          const count = rangeCount(start, end, step);
          if (!(count <= MAX_ELEMENTS)) throw tooMany(`the range ${n.toString()}`, count);
        }
        walk(n.start, depth + 1);
        walk(n.end, depth + 1);
        if (n.step) walk(n.step, depth + 1);
        return;
      }
      case 'FunctionNode': {
        if (n.fn.type !== 'SymbolNode') {
          throw new ExpressionError('refused', 'only named functions can be called, as in sqrt(x)');
        }
        const name: string = n.fn.name;
        const argc: number = n.args.length;
        if (extra.has(name) || ALLOWED_FUNCTIONS.has(name)) {
          // a kit function shadows nothing: the scope is consulted first.
        } else if (DISABLED_FUNCTIONS.includes(name)) {
          throw new ExpressionError('refused', `${name}() is disabled in worksheets`);
        } else if (LOOP_FUNCTIONS.includes(name)) {
          throw new ExpressionError('refused', `${name}() is disabled in worksheets: expressions have no loops`);
        } else if (valueNames.has(name)) {
          throw new ExpressionError(
            'syntax',
            `"${name}" is a value, not a function; to multiply, write ${name} * (…)`,
          );
        } else if (isMathName(name)) {
          throw new ExpressionError('refused', `${name}() is not one of the functions worksheets allow`);
        } else {
          throw new ExpressionError(
            'unknown_symbol',
            `"${name}" is not a function worksheets know${suggestion(name, [...ALLOWED_FUNCTIONS, ...extra])}`,
          );
        }
        if (name === 'zeros' || name === 'ones') {
          if (argc !== 1) {
            const sizes = (n.args as MathNode[]).map(constantValue);
            const count = sizes.every((s) => s !== undefined) ? (sizes as number[]).reduce((a, b) => a * b, 1) : NaN;
            if (count > MAX_ELEMENTS) throw tooMany(`${name}(${sizes.join(', ')})`, count);
            throw new ExpressionError('refused', `${name}() takes one size in worksheets (only one-dimensional lists)`);
          }
          const size = constantValue(n.args[0]);
          if (size !== undefined && !(size <= MAX_ELEMENTS)) throw tooMany(`${name}(${size})`, size);
        }
        if (name === 'range' && (argc === 2 || argc === 3)) {
          const vals = (n.args as MathNode[]).map(constantValue);
          if (vals.every((v) => v !== undefined)) {
            const count = rangeCount(vals[0] as number, vals[1] as number, argc === 3 ? (vals[2] as number) : 1);
            if (!(count <= MAX_ELEMENTS)) throw tooMany(`range(${vals.join(', ')})`, count);
          }
        }
        calls.push({ name, argc });
        walk(n.fn, depth + 1, true);
        for (const a of n.args) walk(a, depth + 1);
        return;
      }
      default:
        throw new ExpressionError('refused', NODE_WORDS[n.type] ?? `${n.type} is not allowed in expressions`);
    }
  };
  walk(node, 0);
  let code: EvalFunction;
  try {
    code = node.compile();
  } catch (err) {
    throw new ExpressionError('syntax', `the expression cannot be compiled: ${(err as Error).message}`);
  }
  return { node, symbols: [...symbols], calls, code };
}
