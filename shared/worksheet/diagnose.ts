/**
 * Diagnosis: when an expression fails, find the innermost sub-expression that fails and say why in
 * plain words; and turn a step's mathjs result into a quantity, or say why it is not one.
 */
import type { MathNode } from 'mathjs';
import { KitCallError, err } from './compiled';
import { ExpressionError } from './math';
import type { EvaluationError, EvaluationErrorKind } from './types';
import { sameDims, type Dims } from './units';
import { describeValue, isComplexValue, isMatrixValue, isUnitValue, siOfUnit } from './values';

// mathjs's node classes are a wide union whose fields (fn, args, params, content …) differ by type;
// these walkers read them by `node.type`, so the nodes are typed loosely here.
/* eslint-disable @typescript-eslint/no-explicit-any */

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

export function explainRuntime(e: unknown, node: MathNode | undefined, scope: Map<string, unknown>): EvaluationError {
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
export function quantityOf(value: unknown): { si: number; dims: Dims } | EvaluationError {
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
