/**
 * Running a compiled worksheet, one input or step at a time: reading typed values against their
 * unit and range, running a step in the shared scope and checking its declared unit.
 */
import type { EvalFunction } from 'mathjs';
import { DIGITS, err, label, quantityErrorOf, type CInput, type CStep, type Outcome, type Program } from './compiled';
import { explainRuntime, quantityOf } from './diagnose';
import { parseQuantity } from './quantity';
import type { EvaluationError, QuantityValue } from './types';
import { describeDims, formatAuto, formatIn, sameDims, siUnitFor, type Dims, type UnitInfo } from './units';
import { makeUnit } from './values';

/** Reads one input's typed value (or its default); remembers the last text and outcome. */
export function readInput(ci: CInput, raw: string | undefined): Outcome {
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
}

/** The first of `deps` that failed, as an error of the step or check that needs it. */
export function dependencyError(p: Program, deps: string[], status: Map<string, Outcome>): EvaluationError | undefined {
  for (const d of deps) {
    const s = status.get(d);
    if (s && !s.ok) {
      return err('value', p.inputNames.has(d) ? `depends on input ${d}, which has an error` : `depends on step ${d}, which could not be computed`);
    }
  }
  return undefined;
}

/** Runs one step in the program's scope, given the outcomes so far. */
export function runStep(p: Program, st: CStep, status: Map<string, Outcome>): Outcome {
  if (st.staticError) return { ok: false, error: st.staticError };
  const dep = dependencyError(p, st.deps, status);
  if (dep) return { ok: false, error: label('Step', st.name, dep) };
  let value: unknown;
  try {
    value = (st.code as EvalFunction).evaluate(p.scope);
  } catch (e) {
    return { ok: false, error: label('Step', st.name, explainRuntime(e, st.node, p.scope)) };
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
}

/** A value for display: in the unit shown, or with an automatic SI prefix. */
export const displayOf = (si: number, dims: Dims, shown: UnitInfo | undefined): QuantityValue => ({
  si,
  unit: siUnitFor(dims),
  display: shown ? formatIn(si, shown, DIGITS) : formatAuto(si, dims, DIGITS),
});

export const inputDisplayInfo = (ci: CInput): UnitInfo | undefined => (ci.unit === '' ? undefined : ci.info);
