/**
 * The compiled form of a worksheet, shared by the evaluator's steps: compile.ts builds it, run.ts
 * and plot.ts read it, diagnose.ts explains failures. Nothing here is part of the public API except
 * the options and CompiledWorksheet, which evaluate.ts re-exports.
 */
import type { EvalFunction, MathNode } from 'mathjs';
import { ExpressionError } from './math';
import type { Worksheet } from './schema';
import type { EvaluationError, EvaluationErrorKind, KitFunction, WorksheetResult } from './types';
import { QuantityError, type Dims, type UnitInfo } from './units';

export interface CompileOptions {
  /** Check-kit functions callable from expressions, by name. */
  functions?: Record<string, KitFunction>;
}

export interface EvaluateOptions {
  /** Compute the plots too (default true). Live typing may skip them and ask again when idle. */
  plots?: boolean;
  /**
   * Time budget for one evaluation, in milliseconds (default 1000): the smaller of wall-clock and
   * process CPU time where the runtime reports it (evaluate.ts, budgetClock). Ordinary worksheets take
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

/** Significant figures of displayed values. */
export const DIGITS = 4;

export function err(kind: EvaluationErrorKind, message: string): EvaluationError {
  return { kind, message };
}

export function label(kind: 'Input' | 'Step' | 'Check' | 'Plot', name: string, e: EvaluationError): EvaluationError {
  return { kind: e.kind, message: `${kind} ${name}: ${e.message}` };
}

/** The result of reading an input or running a step: a mathjs value with its SI number and dimension. */
export type Outcome = { ok: true; value: unknown; si: number; dims: Dims } | { ok: false; error: EvaluationError };

export type Problem = { path: (string | number)[]; error: EvaluationError };

export interface CInput {
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

export interface CExpr {
  code?: EvalFunction;
  node?: MathNode;
  /** Inputs and steps used (direct). */
  deps: string[];
  staticError?: EvaluationError;
}

export interface CStep extends CExpr {
  index: number;
  name: string;
  label: string;
  declared?: UnitInfo;
  declaredText?: string;
}

export type Template = (string | { name: string })[];

export interface CCheck extends CExpr {
  name: string;
  label: string;
  holds: Template;
  fails: Template;
}

export interface CPlot {
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

/** A compiled worksheet: its parts and the one mathjs scope they are evaluated in. */
export interface Program {
  worksheet: Worksheet;
  /** Constants, kit functions, and the current values of inputs and steps. */
  scope: Map<string, unknown>;
  problems: Problem[];
  inputs: CInput[];
  inputNames: Set<string>;
  inputByName: Map<string, CInput>;
  steps: CStep[];
  stepIndex: Map<string, number>;
  checks: CCheck[];
  plots: CPlot[];
}

/** An error thrown by a kit function called from an expression. */
export class KitCallError extends Error {
  constructor(
    readonly kind: EvaluationErrorKind,
    message: string,
  ) {
    super(message);
    Object.setPrototypeOf(this, KitCallError.prototype);
  }
}

export function quantityErrorOf(e: unknown): EvaluationError {
  if (e instanceof QuantityError || e instanceof ExpressionError || e instanceof KitCallError) return err(e.kind, e.message);
  return err('value', (e as Error)?.message ?? String(e));
}

export function parseTemplate(text: string): Template {
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
