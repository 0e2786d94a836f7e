/**
 * Vetting of worksheet expressions (the second layer of defence described in math.ts): every
 * expression is checked on its text, parsed with the captured parser and walked node by node
 * against explicit lists of node types, operators, functions and symbols before it is compiled.
 */
import type { EvalFunction, MathNode } from 'mathjs';
import {
  DISABLED_FUNCTIONS,
  ExpressionError,
  LOOP_FUNCTIONS,
  MAX_ELEMENTS,
  MAX_NESTING,
  MAX_TREE_DEPTH,
  isMathName,
  isValuelessUnit,
  parseExpressionText,
  rangeCount,
  tooMany,
} from './math';
import { ALLOWED_FUNCTIONS, ALLOWED_OPERATORS, ALLOWED_SYMBOLS } from './allowed';
import { MAX_EXPRESSION_LENGTH } from './schema';

/* eslint-disable @typescript-eslint/no-explicit-any */

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
    node = parseExpressionText(text);
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
    if (isMathName(name) && isValuelessUnit(name)) {
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
        if (isValuelessUnit(name)) return;
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
