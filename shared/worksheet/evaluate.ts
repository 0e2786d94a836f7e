/**
 * The worksheet evaluator (DESIGN.md §4). Pure TypeScript on the locked mathjs instance of math.ts:
 * the browser and the server run this same code and get the same numbers.
 *
 *   const compiled = compileWorksheet(ws, { functions: kit });   // parse and vet every expression once
 *   compiled.evaluate({ P: '1.5 kW', F: '2 mN' });                // many times, fast
 *
 * Semantics:
 *  - Inputs: a missing (or blank) value takes the input's default. Values are typed quantities
 *    (quantity.ts). A value outside [min, max] is an error at that input, kind 'range'. An input of
 *    kind "difference" (a temperature rise, a ΔT) reads offset units by their size only: "2 degC"
 *    is 2 K, "3.6 degF" is 2 K; it is shown the same way.
 *  - Steps run in order; a step may use inputs, constants (constants.ts), the steps above it and
 *    the kit functions. A step whose result does not match its declared unit is a dimension error
 *    at that step. A step that uses a failed input or step reports, kind 'value', which one it
 *    depends on.
 *  - Checks: the condition must give true or false. `{name}` in the messages quotes that input's,
 *    step's or constant's display value.
 *  - Plots: the swept input runs from `from` to `to` (linear or log spacing); every step a series
 *    needs is re-evaluated at each point; a point that fails (or lies outside the input's min/max,
 *    or is ≤ 0 on a log y axis) is null. All series of a plot share one axis, so their values are all
 *    given in the display unit of the first series (each series' `unit` says which).
 *  - Names: an input or step may not be named after a constant, a function worksheets allow, a kit
 *    function or a mathjs keyword. It may be named after a unit (F, W, m …): inside expressions the
 *    worksheet's name then wins over the unit.
 */
import type { EvalFunction, MathNode } from 'mathjs';
import { CONSTANTS, CONSTANT_HINTS, getConstant } from './constants';
import { ALLOWED_FUNCTIONS, ExpressionError, RESERVED_WORDS, vetExpression } from './math';
import { parseQuantity } from './quantity';
import { worksheetSchema, type Worksheet } from './schema';
import type {
  CheckResultRow,
  EvaluationError,
  EvaluationErrorKind,
  InputResult,
  KitFunction,
  PlotResult,
  PlotSeries,
  QuantityValue,
  StepResult,
  WorksheetResult,
} from './types';
import {
  QuantityError,
  asDifference,
  describeDims,
  describeValue,
  fromSI,
  formatAuto,
  formatIn,
  isComplexValue,
  isDimensionless,
  isMatrixValue,
  isUnitValue,
  makeUnit,
  sameDims,
  siOfUnit,
  siUnitFor,
  toSI,
  unitInfo,
  type Dims,
  type UnitInfo,
} from './units';

/* eslint-disable @typescript-eslint/no-explicit-any */

export interface CompileOptions {
  /** Check-kit functions callable from expressions, by name. */
  functions?: Record<string, KitFunction>;
}

export interface EvaluateOptions {
  /** Compute the plots too (default true). Live typing may skip them and ask again when idle. */
  plots?: boolean;
  /**
   * Wall-clock budget for one evaluation, in milliseconds (default 1000). Ordinary worksheets take
   * well under a millisecond; a hostile one (60 steps of 10 000-element lists, swept by plots) could
   * otherwise run for minutes. Steps, checks and plot points not started within the budget are
   * errors of kind 'refused'. A single expression is bounded by its length and MAX_ELEMENTS.
   */
  budgetMs?: number;
}

/** Default for EvaluateOptions.budgetMs. */
export const EVALUATION_BUDGET_MS = 1000;

export interface CompiledWorksheet {
  readonly worksheet: Worksheet;
  /** Problems found while compiling (before any value is typed), by field path such as "steps.2.expression". */
  readonly problems: ReadonlyArray<{ path: (string | number)[]; error: EvaluationError }>;
  evaluate(values?: Record<string, string | undefined>, opts?: EvaluateOptions): WorksheetResult;
}

const DIGITS = 4;

function err(kind: EvaluationErrorKind, message: string): EvaluationError {
  return { kind, message };
}

type Outcome = { ok: true; value: any; si: number; dims: Dims } | { ok: false; error: EvaluationError };

interface CInput {
  index: number;
  name: string;
  label: string;
  unit: string;
  /** A difference (kind "difference"): offset units count only their size, "2 degC" is 2 K. */
  difference: boolean;
  /** The input's unit, read as a difference for a difference input (no offset). */
  info?: UnitInfo;
  staticError?: EvaluationError;
  defaultText: string;
  minSi?: number;
  maxSi?: number;
  lastRaw?: string;
  lastOutcome?: Outcome;
}

interface CExpr {
  code?: EvalFunction;
  node?: MathNode;
  /** Inputs and steps used (direct). */
  deps: string[];
  staticError?: EvaluationError;
}

interface CStep extends CExpr {
  index: number;
  name: string;
  label: string;
  declared?: UnitInfo;
  declaredText?: string;
}

interface CCheck extends CExpr {
  name: string;
  label: string;
  holds: Template;
  fails: Template;
}

type Template = (string | { name: string })[];

interface CPlot {
  name: string;
  label: string;
  input?: CInput;
  xs: number[];
  scale: 'linear' | 'log';
  yScale: 'linear' | 'log';
  series: { name: string; label: string; kind: 'input' | 'step' }[];
  /** Indices of the steps to re-run at each point, in order. */
  steps: number[];
  /** Inputs (other than the swept one) the series need. */
  inputs: string[];
  staticError?: EvaluationError;
}

class KitCallError extends Error {
  constructor(
    readonly kind: EvaluationErrorKind,
    message: string,
  ) {
    super(message);
    Object.setPrototypeOf(this, KitCallError.prototype);
  }
}

function quantityErrorOf(e: unknown): EvaluationError {
  if (e instanceof QuantityError || e instanceof ExpressionError || e instanceof KitCallError) return err(e.kind, e.message);
  return err('value', (e as Error)?.message ?? String(e));
}

function parseTemplate(text: string): Template {
  const parts: Template = [];
  const re = /\{([A-Za-z][A-Za-z0-9_]*)\}/g;
  let last = 0;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    if (m.index > last) parts.push(text.slice(last, m.index));
    parts.push({ name: m[1] });
    last = m.index + m[0].length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return parts;
}

/** Converts an argument of a kit function to a number in the declared unit. */
function kitArgument(fnName: string, argName: string, value: unknown, info: UnitInfo): number {
  if (typeof value === 'number') {
    if (isDimensionless(info.dims)) return fromSI(value, info);
    throw new KitCallError(
      'dimension',
      `${fnName}(): the argument ${argName} must be ${describeDims(info.dims)}, but it is a pure number`,
    );
  }
  if (isUnitValue(value)) {
    if (!sameDims(value.dimensions, info.dims)) {
      throw new KitCallError(
        'dimension',
        `${fnName}(): the argument ${argName} must be ${describeDims(info.dims)}, but it is ${describeDims(value.dimensions)}`,
      );
    }
    return fromSI(siOfUnit(value), info);
  }
  throw new KitCallError('value', `${fnName}(): the argument ${argName} must be a quantity, but it is ${describeValue(value)}`);
}

function makeKitWrapper(name: string, spec: KitFunction): (...args: unknown[]) => unknown {
  const argInfos = spec.args.map((a) => unitInfo(a.unit));
  const resultInfo = unitInfo(spec.unit);
  const signature = spec.args.map((a) => a.name).join(', ');
  return (...args: unknown[]) => {
    if (args.length !== spec.args.length) {
      throw new KitCallError('syntax', `${name}(${signature}) takes ${spec.args.length} argument${spec.args.length === 1 ? '' : 's'}, not ${args.length}`);
    }
    const nums = args.map((a, i) => kitArgument(name, spec.args[i].name, a, argInfos[i]));
    let r: number;
    try {
      r = spec.fn(...nums);
    } catch (e) {
      throw new KitCallError('value', `${name}(): ${(e as Error).message}`);
    }
    if (typeof r !== 'number') throw new KitCallError('value', `${name}() did not give a number`);
    return makeUnit(toSI(r, resultInfo), resultInfo.dims);
  };
}

function nodeChildren(n: any): MathNode[] {
  switch (n.type) {
    case 'ParenthesisNode':
      return [n.content];
    case 'OperatorNode':
    case 'FunctionNode':
      return n.args;
    case 'RelationalNode':
      return n.params;
    case 'ArrayNode':
      return n.items;
    case 'RangeNode':
      return n.step ? [n.start, n.end, n.step] : [n.start, n.end];
    case 'ConditionalNode':
      return [n.condition, n.trueExpr, n.falseExpr];
    default:
      return [];
  }
}

const OPERATOR_WORDS: Record<string, string> = {
  smaller: 'compare',
  larger: 'compare',
  smallerEq: 'compare',
  largerEq: 'compare',
  equal: 'compare',
  unequal: 'compare',
};

const TRIG = new Set(['sin', 'cos', 'tan', 'sec', 'csc', 'cot', 'sinh', 'cosh', 'tanh']);
const PURE = new Set(['exp', 'expm1', 'log', 'ln', 'log10', 'log2', 'log1p', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh', 'gamma', 'factorial', 'erf']);

/** Explains why `node` failed, given the values of its children. */
function describeFailure(node: any, vals: unknown[], cause: Error): EvaluationError {
  const unitRelated = vals.some(isUnitValue) || /unit/i.test(cause.message);
  const kind: EvaluationErrorKind = unitRelated ? 'dimension' : 'value';
  const where = ` in "${node.toString()}"`;
  const d = vals.map(describeValue);
  if (node.type === 'OperatorNode') {
    switch (node.fn) {
      case 'add':
        return err(kind, `cannot add ${d[0]} and ${d[1]}${where}`);
      case 'subtract':
        return err(kind, `cannot subtract ${d[1]} from ${d[0]}${where}`);
      case 'to':
        return err(kind, `cannot convert ${d[0]} to ${node.args[1].toString()}, which is ${d[1]}${where}`);
      case 'pow':
      case 'dotPow':
        return err(kind, `cannot raise ${d[0]} to the power of ${d[1]} (the exponent must be a pure number)${where}`);
      default:
        if (OPERATOR_WORDS[node.fn]) return err(kind, `cannot compare ${d[0]} with ${d[1]}${where}`);
    }
  }
  if (node.type === 'RelationalNode') {
    for (let i = 0; i + 1 < vals.length; i++) {
      const a = vals[i];
      const b = vals[i + 1];
      const ad = isUnitValue(a) ? a.dimensions : typeof a === 'number' ? undefined : null;
      const bd = isUnitValue(b) ? b.dimensions : typeof b === 'number' ? undefined : null;
      if (ad === null || bd === null || (ad === undefined) !== (bd === undefined) || (ad && bd && !sameDims(ad, bd))) {
        return err(kind, `cannot compare ${d[i]} with ${d[i + 1]}${where}`);
      }
    }
  }
  if (node.type === 'FunctionNode') {
    const name: string = node.fn.name;
    const list = d.length ? d.join(' and ') : 'no arguments';
    if (TRIG.has(name)) return err(kind, `${name}() needs an angle or a pure number, but was given ${list}${where}`);
    if (PURE.has(name)) return err(kind, `${name}() needs a pure number, but was given ${list} (divide by a unit to make one)${where}`);
    return err(kind, `${name}() cannot take ${list}: ${cause.message}${where}`);
  }
  if (node.type === 'ConditionalNode') {
    return err('value', `the condition of "?:" must be true or false, but it is ${d[0]}${where}`);
  }
  return err(kind, `${cause.message}${where}`);
}

/** Finds the innermost sub-expression that fails and explains it (only runs on the error path). */
function diagnose(node: any, scope: Map<string, unknown>, depth = 0): EvaluationError | undefined {
  if (depth > 200) return undefined;
  let children = nodeChildren(node);
  if (node.type === 'ConditionalNode') {
    // Only the branch that would be taken is evaluated.
    let cond: unknown;
    try {
      cond = node.condition.compile().evaluate(scope);
    } catch {
      return diagnose(node.condition, scope, depth + 1);
    }
    children = [node.condition, cond ? node.trueExpr : node.falseExpr];
  }
  const vals: unknown[] = [];
  for (const child of children) {
    try {
      vals.push((child as any).compile().evaluate(scope));
    } catch (e) {
      if (e instanceof KitCallError || e instanceof ExpressionError) return err(e.kind, e.message);
      return diagnose(child, scope, depth + 1) ?? describeFailure(child, [], e as Error);
    }
  }
  try {
    node.compile().evaluate(scope);
    return undefined;
  } catch (e) {
    if (e instanceof KitCallError || e instanceof ExpressionError) return err(e.kind, e.message);
    if (node.type === 'ConditionalNode') return describeFailure(node, [vals[0]], e as Error);
    return describeFailure(node, vals, e as Error);
  }
}

function explainRuntime(e: unknown, node: MathNode | undefined, scope: Map<string, unknown>): EvaluationError {
  if (e instanceof KitCallError || e instanceof ExpressionError) return err(e.kind, e.message);
  const cause = e as Error;
  if (cause instanceof RangeError && /call stack/i.test(cause.message)) return err('refused', 'the expression is too deeply nested to evaluate');
  if (node) {
    try {
      const d = diagnose(node, scope);
      if (d) return d;
    } catch {
      // fall through to the plain message
    }
  }
  const unitRelated = /unit/i.test(cause?.message ?? '');
  return err(unitRelated ? 'dimension' : 'value', cause?.message ?? String(e));
}

/** Turns a step's mathjs result into SI number and dimension, or says why it is not a quantity. */
function quantityOf(value: unknown): { si: number; dims: Dims } | EvaluationError {
  if (typeof value === 'number') {
    if (Number.isNaN(value)) return err('value', 'the result is not a number (for example 0/0, or infinity minus infinity)');
    return { si: value, dims: DIMENSIONLESS_DIMS };
  }
  if (isUnitValue(value)) {
    if (isComplexValue(value.value)) return complexError();
    const si = siOfUnit(value);
    if (Number.isNaN(si)) return err('value', 'the result is not a number (for example 0/0, or infinity minus infinity)');
    return { si, dims: value.dimensions };
  }
  if (isComplexValue(value)) return complexError();
  if (typeof value === 'boolean') return err('value', `the result is ${value}, not a quantity; put comparisons in a check`);
  if (isMatrixValue(value)) return err('value', `the result is ${describeValue(value)}, not one quantity; reduce it with sum(), max() or similar`);
  return err('value', `the result is ${describeValue(value)}, not a quantity`);
}

const DIMENSIONLESS_DIMS: Dims = Object.freeze([0, 0, 0, 0, 0, 0, 0, 0, 0]);

function complexError(): EvaluationError {
  return err('value', 'the result is a complex number (a square root or logarithm of a negative value?)');
}

function label(kind: 'Input' | 'Step' | 'Check' | 'Plot', name: string, e: EvaluationError): EvaluationError {
  return { kind: e.kind, message: `${kind} ${name}: ${e.message}` };
}

export function compileWorksheet(ws: Worksheet, opts: CompileOptions = {}): CompiledWorksheet {
  const kit = opts.functions ?? {};
  const kitNames = new Set(Object.keys(kit));
  const problems: { path: (string | number)[]; error: EvaluationError }[] = [];

  const scope = new Map<string, unknown>();
  for (const k of CONSTANTS) scope.set(k.name, makeUnit(k.value, unitInfo(k.unit).dims));
  for (const [name, spec] of Object.entries(kit)) scope.set(name, makeKitWrapper(name, spec));

  const inputNames = new Set(ws.inputs.map((i) => i.name));
  const stepIndex = new Map(ws.steps.map((s, i) => [s.name, i]));
  const checkNames = new Set(ws.checks.map((c) => c.name));
  const plotNames = new Set(ws.plots.map((p) => p.name));
  const valueNames = new Set<string>([...inputNames, ...stepIndex.keys(), ...CONSTANTS.map((k) => k.name)]);

  const nameProblem = (name: string): EvaluationError | undefined => {
    const k = getConstant(name);
    if (k) return err('syntax', `"${name}" is the name of a constant (the ${k.label}); give this another name`);
    if (RESERVED_WORDS.has(name)) return err('syntax', `"${name}" is a reserved word in expressions; give this another name`);
    if (ALLOWED_FUNCTIONS.has(name)) return err('syntax', `"${name}" is the name of the function ${name}(); give this another name`);
    if (kitNames.has(name)) return err('syntax', `"${name}" is the name of a check-kit function; give this another name`);
    if (name === 'pi' || name === 'tau') return err('syntax', `"${name}" is the number ${name}; give this another name`);
    return undefined;
  };

  // ---- inputs
  const inputs: CInput[] = ws.inputs.map((def, index) => {
    const difference = def.kind === 'difference';
    const ci: CInput = { index, name: def.name, label: def.label, unit: def.unit, difference, defaultText: def.default };
    const bad = nameProblem(def.name);
    if (bad) {
      ci.staticError = label('Input', def.name, bad);
      problems.push({ path: ['inputs', index, 'name'], error: ci.staticError });
      return ci;
    }
    try {
      ci.info = difference ? asDifference(unitInfo(def.unit)) : unitInfo(def.unit);
    } catch (e) {
      ci.staticError = label('Input', def.name, quantityErrorOf(e));
      problems.push({ path: ['inputs', index, 'unit'], error: ci.staticError });
      return ci;
    }
    for (const which of ['min', 'max'] as const) {
      const text = def[which];
      if (text === undefined) continue;
      try {
        const si = parseQuantity(text, def.unit, { difference });
        if (which === 'min') ci.minSi = si;
        else ci.maxSi = si;
      } catch (e) {
        ci.staticError = label('Input', def.name, { ...quantityErrorOf(e), message: `${which}: ${quantityErrorOf(e).message}` });
        problems.push({ path: ['inputs', index, which], error: ci.staticError });
        return ci;
      }
    }
    return ci;
  });
  const inputByName = new Map(inputs.map((i) => [i.name, i]));

  // ---- expressions
  const compileExpr = (
    text: string,
    kind: 'Step' | 'Check',
    owner: string,
    path: (string | number)[],
    available: (name: string) => EvaluationError | undefined,
  ): CExpr => {
    try {
      const vetted = vetExpression(text, { valueNames, functions: kitNames, hints: CONSTANT_HINTS });
      for (const sym of vetted.symbols) {
        const problem = available(sym);
        if (problem) throw new ExpressionError(problem.kind, problem.message);
      }
      for (const call of vetted.calls) {
        const spec = kit[call.name];
        if (spec && spec.args.length !== call.argc) {
          const sig = spec.args.map((a) => a.name).join(', ');
          throw new ExpressionError('syntax', `${call.name}(${sig}) takes ${spec.args.length} argument${spec.args.length === 1 ? '' : 's'}, not ${call.argc}`);
        }
      }
      const deps = vetted.symbols.filter((s) => inputNames.has(s) || stepIndex.has(s));
      return { code: vetted.code, node: vetted.node, deps };
    } catch (e) {
      const error = label(kind, owner, quantityErrorOf(e));
      problems.push({ path, error });
      return { deps: [], staticError: error };
    }
  };

  const notAValue = (name: string): EvaluationError | undefined => {
    if (checkNames.has(name)) return err('unknown_symbol', `"${name}" is a check, not a value`);
    if (plotNames.has(name)) return err('unknown_symbol', `"${name}" is a plot, not a value`);
    return undefined;
  };

  const steps: CStep[] = ws.steps.map((def, index) => {
    const bad = nameProblem(def.name);
    if (bad) {
      const error = label('Step', def.name, bad);
      problems.push({ path: ['steps', index, 'name'], error });
      return { index, name: def.name, label: def.label, deps: [], staticError: error };
    }
    let declared: UnitInfo | undefined;
    if (def.unit !== undefined) {
      try {
        declared = unitInfo(def.unit);
      } catch (e) {
        const error = label('Step', def.name, { ...quantityErrorOf(e), message: `its unit: ${quantityErrorOf(e).message}` });
        problems.push({ path: ['steps', index, 'unit'], error });
        return { index, name: def.name, label: def.label, deps: [], staticError: error };
      }
    }
    const expr = compileExpr(def.expression, 'Step', def.name, ['steps', index, 'expression'], (sym) => {
      const j = stepIndex.get(sym);
      if (j !== undefined && j === index) return err('unknown_symbol', `"${sym}" is this step's own name; a step cannot use its own result`);
      if (j !== undefined && j > index) {
        return err('unknown_symbol', `"${sym}" is a later step; a step can use only inputs, constants and the steps above it`);
      }
      return notAValue(sym);
    });
    return { index, name: def.name, label: def.label, declared, declaredText: def.unit, ...expr };
  });

  const quotable = (name: string) => inputNames.has(name) || stepIndex.has(name) || !!getConstant(name);

  const checks: CCheck[] = ws.checks.map((def, index) => {
    const holds = parseTemplate(def.holds);
    const fails = parseTemplate(def.fails);
    const bad = nameProblem(def.name);
    if (bad) {
      const error = label('Check', def.name, bad);
      problems.push({ path: ['checks', index, 'name'], error });
      return { name: def.name, label: def.label, holds, fails, deps: [], staticError: error };
    }
    const expr = compileExpr(def.condition, 'Check', def.name, ['checks', index, 'condition'], notAValue);
    if (!expr.staticError) {
      for (const [field, tpl] of [['holds', holds], ['fails', fails]] as const) {
        for (const part of tpl) {
          if (typeof part === 'string') continue;
          if (!quotable(part.name)) {
            const error = label('Check', def.name, err('unknown_symbol', `the message quotes {${part.name}}, which is not an input, a step or a constant`));
            problems.push({ path: ['checks', index, field], error });
            return { name: def.name, label: def.label, holds, fails, deps: [], staticError: error };
          }
          if ((inputNames.has(part.name) || stepIndex.has(part.name)) && !expr.deps.includes(part.name)) expr.deps.push(part.name);
        }
      }
    }
    return { name: def.name, label: def.label, holds, fails, ...expr };
  });

  // ---- plots
  const plots: CPlot[] = ws.plots.map((def, index) => {
    const series = def.series.map((s) => ({
      name: s,
      label: inputByName.get(s)?.label ?? ws.steps[stepIndex.get(s) ?? -1]?.label ?? s,
      kind: (inputNames.has(s) ? 'input' : 'step') as 'input' | 'step',
    }));
    const cp: CPlot = {
      name: def.name,
      label: def.label,
      xs: [],
      scale: def.sweep.scale ?? 'linear',
      yScale: def.yScale ?? 'linear',
      series,
      steps: [],
      inputs: [],
    };
    const fail = (path: (string | number)[], e: EvaluationError) => {
      cp.staticError = label('Plot', def.name, e);
      problems.push({ path: ['plots', index, ...path], error: cp.staticError });
      return cp;
    };
    const input = inputByName.get(def.sweep.input);
    if (!input) return fail(['sweep', 'input'], err('unknown_symbol', `"${def.sweep.input}" is not an input`));
    cp.input = input;
    for (const [j, s] of def.series.entries()) {
      if (!inputNames.has(s) && !stepIndex.has(s)) return fail(['series', j], err('unknown_symbol', `"${s}" is not an input or a step`));
    }
    if (input.staticError) return fail(['sweep', 'input'], err('value', `its input ${input.name} has an error`));
    let from: number;
    let to: number;
    try {
      from = parseQuantity(def.sweep.from, input.unit, { difference: input.difference });
    } catch (e) {
      return fail(['sweep', 'from'], { ...quantityErrorOf(e), message: `from: ${quantityErrorOf(e).message}` });
    }
    try {
      to = parseQuantity(def.sweep.to, input.unit, { difference: input.difference });
    } catch (e) {
      return fail(['sweep', 'to'], { ...quantityErrorOf(e), message: `to: ${quantityErrorOf(e).message}` });
    }
    const n = def.sweep.points;
    if (cp.scale === 'log') {
      if (!(from > 0 && to > 0)) return fail(['sweep', 'from'], err('range', 'a log sweep needs from and to above zero'));
      const ratio = Math.log(to / from);
      for (let i = 0; i < n; i++) cp.xs.push(from * Math.exp((ratio * i) / (n - 1)));
      cp.xs[n - 1] = to;
    } else {
      for (let i = 0; i < n; i++) cp.xs.push(from + ((to - from) * i) / (n - 1));
      cp.xs[n - 1] = to;
    }
    // Steps to re-run: every step the series need, directly or through other steps.
    const needed = new Set<number>();
    const neededInputs = new Set<string>();
    const visit = (name: string) => {
      if (inputNames.has(name)) {
        if (name !== input.name) neededInputs.add(name);
        return;
      }
      const j = stepIndex.get(name);
      if (j === undefined || needed.has(j)) return;
      needed.add(j);
      for (const dep of steps[j].deps) visit(dep);
    };
    for (const s of def.series) visit(s);
    cp.steps = [...needed].sort((a, b) => a - b);
    cp.inputs = [...neededInputs];
    return cp;
  });

  // ---- evaluation
  const readInput = (ci: CInput, raw: string | undefined): Outcome => {
    if (ci.staticError) return { ok: false, error: ci.staticError };
    const text = raw === undefined || raw === null || String(raw).trim() === '' ? ci.defaultText : String(raw);
    if (ci.lastOutcome && ci.lastRaw === text) return ci.lastOutcome;
    let outcome: Outcome;
    try {
      const si = parseQuantity(text, ci.unit, { difference: ci.difference });
      const info = ci.info as UnitInfo;
      if (ci.minSi !== undefined && si < ci.minSi) {
        outcome = {
          ok: false,
          error: label('Input', ci.name, err('range', `${formatIn(si, info, DIGITS)} is below the lowest value allowed, ${formatIn(ci.minSi, info, DIGITS)}`)),
        };
      } else if (ci.maxSi !== undefined && si > ci.maxSi) {
        outcome = {
          ok: false,
          error: label('Input', ci.name, err('range', `${formatIn(si, info, DIGITS)} is above the highest value allowed, ${formatIn(ci.maxSi, info, DIGITS)}`)),
        };
      } else {
        outcome = { ok: true, value: makeUnit(si, info.dims), si, dims: info.dims };
      }
    } catch (e) {
      const base = quantityErrorOf(e);
      const usedDefault = text === ci.defaultText && (raw === undefined || String(raw).trim() === '');
      outcome = { ok: false, error: label('Input', ci.name, usedDefault ? { ...base, message: `its default: ${base.message}` } : base) };
    }
    ci.lastRaw = text;
    ci.lastOutcome = outcome;
    return outcome;
  };

  const dependencyError = (deps: string[], status: Map<string, Outcome>): EvaluationError | undefined => {
    for (const d of deps) {
      const s = status.get(d);
      if (s && !s.ok) {
        return err('value', inputNames.has(d) ? `depends on input ${d}, which has an error` : `depends on step ${d}, which could not be computed`);
      }
    }
    return undefined;
  };

  const runStep = (st: CStep, status: Map<string, Outcome>): Outcome => {
    if (st.staticError) return { ok: false, error: st.staticError };
    const dep = dependencyError(st.deps, status);
    if (dep) return { ok: false, error: label('Step', st.name, dep) };
    let value: unknown;
    try {
      value = (st.code as EvalFunction).evaluate(scope);
    } catch (e) {
      return { ok: false, error: label('Step', st.name, explainRuntime(e, st.node, scope)) };
    }
    const q = quantityOf(value);
    if ('kind' in q) return { ok: false, error: label('Step', st.name, q) };
    if (st.declared && !sameDims(q.dims, st.declared.dims)) {
      return {
        ok: false,
        error: label(
          'Step',
          st.name,
          err('dimension', `the result is ${describeDims(q.dims)}, but the step's unit "${st.declaredText}" is ${describeDims(st.declared.dims)}`),
        ),
      };
    }
    return { ok: true, value, si: q.si, dims: q.dims };
  };

  const displayOf = (si: number, dims: Dims, shown: UnitInfo | undefined): QuantityValue => ({
    si,
    unit: siUnitFor(dims),
    display: shown ? formatIn(si, shown, DIGITS) : formatAuto(si, dims, DIGITS),
  });

  const inputDisplayInfo = (ci: CInput): UnitInfo | undefined => (ci.unit === '' ? undefined : ci.info);

  const evaluate = (values: Record<string, string | undefined> = {}, evalOpts: EvaluateOptions = {}): WorksheetResult => {
    const budget = evalOpts.budgetMs ?? EVALUATION_BUDGET_MS;
    const deadline = Date.now() + budget;
    const overBudget = () => Date.now() > deadline;
    const budgetError = () => err('refused', `not computed: this worksheet took longer than ${budget} ms to evaluate`);
    const status = new Map<string, Outcome>();
    const shown = new Map<string, QuantityValue>();
    let ok = true;

    const inputResults: InputResult[] = inputs.map((ci) => {
      const o = readInput(ci, values[ci.name]);
      status.set(ci.name, o);
      if (!o.ok) {
        ok = false;
        scope.delete(ci.name);
        return { name: ci.name, label: ci.label, error: o.error };
      }
      // mathjs never mutates its operands, so an unchanged input keeps its Unit between evaluations.
      scope.set(ci.name, o.value);
      const qv = displayOf(o.si, o.dims, inputDisplayInfo(ci));
      shown.set(ci.name, qv);
      return { name: ci.name, label: ci.label, value: qv };
    });

    const stepResults: StepResult[] = steps.map((st) => {
      const o: Outcome = overBudget() ? { ok: false, error: label('Step', st.name, budgetError()) } : runStep(st, status);
      status.set(st.name, o);
      if (!o.ok) {
        ok = false;
        scope.delete(st.name);
        return { name: st.name, label: st.label, error: o.error };
      }
      scope.set(st.name, o.value);
      const qv = displayOf(o.si, o.dims, st.declared && st.declaredText !== '' ? st.declared : undefined);
      shown.set(st.name, qv);
      return { name: st.name, label: st.label, value: qv };
    });

    const fill = (tpl: Template): string =>
      tpl
        .map((part) => {
          if (typeof part === 'string') return part;
          const qv = shown.get(part.name);
          if (qv) return qv.display;
          const k = getConstant(part.name);
          return k ? formatAuto(k.value, unitInfo(k.unit).dims, DIGITS) : `{${part.name}}`;
        })
        .join('');

    const checkResults: CheckResultRow[] = checks.map((ch) => {
      const fail = (error: EvaluationError): CheckResultRow => {
        ok = false;
        return { name: ch.name, label: ch.label, error };
      };
      if (ch.staticError) return fail(ch.staticError);
      if (overBudget()) return fail(label('Check', ch.name, budgetError()));
      const dep = dependencyError(ch.deps, status);
      if (dep) return fail(label('Check', ch.name, dep));
      let value: unknown;
      try {
        value = (ch.code as EvalFunction).evaluate(scope);
      } catch (e) {
        return fail(label('Check', ch.name, explainRuntime(e, ch.node, scope)));
      }
      if (typeof value !== 'boolean') {
        return fail(label('Check', ch.name, err('value', `the condition gives ${describeValue(value)}, not true or false`)));
      }
      return { name: ch.name, label: ch.label, holds: value, message: fill(value ? ch.holds : ch.fails) };
    });

    const plotResults: PlotResult[] =
      evalOpts.plots === false ? [] : plots.map((p) => runPlot(p, status, overBudget, () => label('Plot', p.name, budgetError())));

    return { ok, inputs: inputResults, steps: stepResults, checks: checkResults, plots: plotResults };
  };

  const runPlot = (p: CPlot, mainStatus: Map<string, Outcome>, overBudget: () => boolean, budgetError: () => EvaluationError): PlotResult => {
    const input = p.input;
    const xUnit = input?.unit ?? '';
    const xInfo = input?.info;
    const base: PlotResult = {
      name: p.name,
      label: p.label,
      x: {
        name: input?.name ?? '',
        label: input?.label ?? '',
        unit: xUnit,
        values: xInfo ? p.xs.map((x) => fromSI(x, xInfo)) : [],
        scale: p.scale,
      },
      series: [],
      yScale: p.yScale,
    };
    if (p.staticError || !input) return { ...base, error: p.staticError };
    for (const name of p.inputs) {
      const s = mainStatus.get(name);
      if (s && !s.ok) return { ...base, error: label('Plot', p.name, err('value', `depends on input ${name}, which has an error`)) };
    }

    // Raw SI values per series and point.
    const raw: ({ si: number; dims: Dims } | null)[][] = p.series.map(() => []);
    const status = new Map(mainStatus);
    const saved = new Map<string, unknown>();
    saved.set(input.name, scope.get(input.name));
    for (const j of p.steps) saved.set(steps[j].name, scope.get(steps[j].name));
    let stopped: EvaluationError | undefined;
    try {
      for (const x of p.xs) {
        if (stopped || overBudget()) {
          stopped = stopped ?? budgetError();
          p.series.forEach((_, k) => raw[k].push(null));
          continue;
        }
        const outOfRange = (input.minSi !== undefined && x < input.minSi) || (input.maxSi !== undefined && x > input.maxSi);
        status.set(input.name, outOfRange ? { ok: false, error: err('range', 'outside the input range') } : { ok: true, value: null, si: x, dims: input.info!.dims });
        scope.set(input.name, makeUnit(x, input.info!.dims));
        for (const j of p.steps) {
          const st = steps[j];
          const o = runStep(st, status);
          status.set(st.name, o);
          if (o.ok) scope.set(st.name, o.value);
          else scope.delete(st.name);
        }
        p.series.forEach((s, k) => {
          const o = status.get(s.name);
          raw[k].push(o && o.ok ? { si: o.si, dims: o.dims } : null);
        });
      }
    } finally {
      for (const [name, v] of saved) {
        if (v === undefined) scope.delete(name);
        else scope.set(name, v);
      }
    }

    // The axis: the dimension and display unit of the first series.
    const dimsOf = (k: number): Dims | undefined => {
      const s = p.series[k];
      const main = mainStatus.get(s.name);
      if (main && main.ok) return main.dims;
      return raw[k].find((v) => v !== null)?.dims;
    };
    const firstDims = dimsOf(0);
    for (let k = 1; k < p.series.length; k++) {
      const dk = dimsOf(k);
      if (firstDims && dk && !sameDims(firstDims, dk)) {
        return {
          ...base,
          error: label(
            'Plot',
            p.name,
            err('dimension', `the series ${p.series[0].name} is ${describeDims(firstDims)} but ${p.series[k].name} is ${describeDims(dk)}; a plot's series must share one dimension`),
          ),
        };
      }
    }
    let axisText = firstDims ? siUnitFor(firstDims) : '';
    let axisIsDifference = false;
    const first = p.series[0];
    if (first.kind === 'input') {
      const ci = inputByName.get(first.name);
      if (ci && ci.unit !== '') axisText = ci.unit;
      axisIsDifference = !!ci?.difference;
    } else {
      const st = steps[stepIndex.get(first.name) as number];
      if (st.declared && st.declaredText) axisText = st.declaredText;
    }
    let axis: UnitInfo;
    try {
      axis = axisIsDifference ? asDifference(unitInfo(axisText)) : unitInfo(axisText);
    } catch {
      axis = unitInfo('');
    }
    const series: PlotSeries[] = p.series.map((s, k) => ({
      name: s.name,
      label: s.label,
      unit: axisText,
      values: raw[k].map((v) => {
        if (!v || !firstDims || !sameDims(v.dims, firstDims)) return null;
        const y = fromSI(v.si, axis);
        if (!Number.isFinite(y)) return null;
        if (p.yScale === 'log' && !(y > 0)) return null;
        return y;
      }),
    }));
    return stopped ? { ...base, series, error: stopped } : { ...base, series };
  };

  return { worksheet: ws, problems, evaluate };
}

/** Compiles and evaluates once (prefer compileWorksheet when evaluating many times). */
export function evaluateWorksheet(
  ws: Worksheet,
  values: Record<string, string | undefined> = {},
  opts: CompileOptions & EvaluateOptions = {},
): WorksheetResult {
  return compileWorksheet(ws, opts).evaluate(values, opts);
}

export type ValidationResult = { ok: true; worksheet: Worksheet } | { ok: false; fields: Record<string, string> };

function fieldPath(path: readonly PropertyKey[]): string {
  return ['worksheet', ...path.map((p) => String(p))].join('.');
}

/**
 * Validates a worksheet: the schema (schema.ts) first, then what only compiling can find (syntax,
 * refused constructs, unknown names, bad units and defaults), then an evaluation at the defaults
 * (dimension errors, a condition that is not true/false). Fields are named by path, e.g.
 * "worksheet.steps.2.expression". Errors that only repeat an earlier one ("depends on …") are left out.
 */
export function validateWorksheet(json: unknown, opts: CompileOptions = {}): ValidationResult {
  const parsed = worksheetSchema.safeParse(json);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) {
      const key = fieldPath(issue.path);
      if (!(key in fields)) fields[key] = issue.message;
    }
    return { ok: false, fields };
  }
  const ws = parsed.data;
  const compiled = compileWorksheet(ws, opts);
  const fields: Record<string, string> = {};
  for (const p of compiled.problems) {
    const key = fieldPath(p.path);
    if (!(key in fields)) fields[key] = p.error.message;
  }
  {
    // Evaluate at the defaults too: dimension errors and non-boolean conditions show only then.
    const result = compiled.evaluate({}, { plots: true });
    const isEcho = (e: EvaluationError) => / depends on (input|step) /.test(e.message);
    const reported = new Set(compiled.problems.map((p) => p.error.message));
    const add = (path: (string | number)[], e: EvaluationError | undefined) => {
      if (!e || isEcho(e) || reported.has(e.message)) return;
      const key = fieldPath(path);
      if (!(key in fields)) fields[key] = e.message;
    };
    result.inputs.forEach((r, i) => add(['inputs', i, 'default'], r.error));
    result.steps.forEach((r, i) => add(['steps', i, 'expression'], r.error));
    result.checks.forEach((r, i) => add(['checks', i, 'condition'], r.error));
    result.plots.forEach((r, i) => add(['plots', i], r.error));
  }
  return Object.keys(fields).length ? { ok: false, fields } : { ok: true, worksheet: ws };
}
