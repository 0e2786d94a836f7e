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
import type { EvalFunction } from 'mathjs';
import { compileProgram } from './compile';
import {
  DIGITS,
  EVALUATION_BUDGET_MS,
  err,
  label,
  type CompileOptions,
  type CompiledWorksheet,
  type EvaluateOptions,
  type Outcome,
  type Template,
} from './compiled';
import { getConstant } from './constants';
import { explainRuntime } from './diagnose';
import { runPlot } from './plot';
import { dependencyError, displayOf, inputDisplayInfo, readInput, runStep } from './run';
import { worksheetSchema, type Worksheet } from './schema';
import type { CheckResultRow, EvaluationError, InputResult, PlotResult, QuantityValue, StepResult, WorksheetResult } from './types';
import { formatAuto, unitInfo } from './units';
import { describeValue } from './values';

export { EVALUATION_BUDGET_MS, type CompileOptions, type CompiledWorksheet, type EvaluateOptions } from './compiled';

/**
 * Compiles a worksheet once (compile.ts) and returns an evaluator that runs the inputs, steps and
 * checks (run.ts) and the plots (plot.ts) as many times as values are typed.
 */
export function compileWorksheet(ws: Worksheet, opts: CompileOptions = {}): CompiledWorksheet {
  const prog = compileProgram(ws, opts);

  const evaluate = (values: Record<string, string | undefined> = {}, evalOpts: EvaluateOptions = {}): WorksheetResult => {
    const budget = evalOpts.budgetMs ?? EVALUATION_BUDGET_MS;
    const started = budgetClock();
    let exceeded = false;
    const overBudget = () => (exceeded = exceeded || budgetClock.since(started) > budget);
    const budgetError = () => err('refused', `not computed: this worksheet took longer than ${budget} ms to evaluate`);
    const status = new Map<string, Outcome>();
    const shown = new Map<string, QuantityValue>();
    let ok = true;

    const inputResults: InputResult[] = prog.inputs.map((ci) => {
      const o = readInput(ci, values[ci.name]);
      status.set(ci.name, o);
      if (!o.ok) {
        ok = false;
        prog.scope.delete(ci.name);
        return { name: ci.name, label: ci.label, error: o.error };
      }
      // mathjs never mutates its operands, so an unchanged input keeps its Unit between evaluations.
      prog.scope.set(ci.name, o.value);
      const qv = displayOf(o.si, o.dims, inputDisplayInfo(ci));
      shown.set(ci.name, qv);
      return { name: ci.name, label: ci.label, value: qv };
    });

    const stepResults: StepResult[] = prog.steps.map((st) => {
      const o: Outcome = overBudget() ? { ok: false, error: label('Step', st.name, budgetError()) } : runStep(prog, st, status);
      status.set(st.name, o);
      if (!o.ok) {
        ok = false;
        prog.scope.delete(st.name);
        return { name: st.name, label: st.label, error: o.error };
      }
      prog.scope.set(st.name, o.value);
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

    const checkResults: CheckResultRow[] = prog.checks.map((ch) => {
      const fail = (error: EvaluationError): CheckResultRow => {
        ok = false;
        return { name: ch.name, label: ch.label, error };
      };
      if (ch.staticError) return fail(ch.staticError);
      if (overBudget()) return fail(label('Check', ch.name, budgetError()));
      const dep = dependencyError(prog, ch.deps, status);
      if (dep) return fail(label('Check', ch.name, dep));
      let value: unknown;
      try {
        value = (ch.code as EvalFunction).evaluate(prog.scope);
      } catch (e) {
        return fail(label('Check', ch.name, explainRuntime(e, ch.node, prog.scope)));
      }
      if (typeof value !== 'boolean') {
        return fail(label('Check', ch.name, err('value', `the condition gives ${describeValue(value)}, not true or false`)));
      }
      return { name: ch.name, label: ch.label, holds: value, message: fill(value ? ch.holds : ch.fails) };
    });

    const plotResults: PlotResult[] =
      evalOpts.plots === false ? [] : prog.plots.map((p) => runPlot(prog, p, status, overBudget, () => label('Plot', p.name, budgetError())));

    const out: WorksheetResult = { ok, inputs: inputResults, steps: stepResults, checks: checkResults, plots: plotResults };
    if (exceeded) out.overBudget = true;
    return out;
  };

  return { worksheet: ws, problems: prog.problems, evaluate };
}

/**
 * The budget's clock. Elapsed time is the smaller of wall-clock time and, where the runtime reports
 * it (Node), the process's CPU time: a worksheet is not refused because other programs held the
 * processor (wall time grows, CPU time does not) nor because other threads of the process worked
 * (CPU time grows, wall time does not); a hostile worksheet grows both. Browsers have wall time only.
 */
interface Stamp {
  wall: number;
  cpu: number | undefined;
}
const cpuMs = (): number | undefined => {
  const p = (globalThis as { process?: { cpuUsage?: () => { user: number; system: number } } }).process;
  if (typeof p?.cpuUsage !== 'function') return undefined;
  const u = p.cpuUsage();
  return (u.user + u.system) / 1000;
};
const budgetClock = Object.assign((): Stamp => ({ wall: Date.now(), cpu: cpuMs() }), {
  since(s: Stamp): number {
    const wall = Date.now() - s.wall;
    const cpu = s.cpu === undefined ? undefined : (cpuMs() ?? Infinity) - s.cpu;
    return cpu === undefined ? wall : Math.min(wall, cpu);
  },
});

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
    // A first evaluation over the budget is tried once more: the first run in a fresh process pays for
    // loading and compiling code, the second is the worksheet's own cost.
    let result = compiled.evaluate({}, { plots: true });
    if (result.overBudget) result = compiled.evaluate({}, { plots: true });
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
