/**
 * Plots: compiling a plot lays out its sweep (linear or log spacing) and finds the steps its series
 * need; running it re-evaluates those steps at each point and gives all series in the display unit
 * of the first. A point that fails, lies outside the input's min/max, or is <= 0 on a log y axis is null.
 */
import { err, label, quantityErrorOf, type CPlot, type Outcome, type Program } from './compiled';
import { parseQuantity } from './quantity';
import { runStep } from './run';
import type { Worksheet } from './schema';
import type { EvaluationError, PlotResult, PlotSeries } from './types';
import { asDifference, describeDims, fromSI, sameDims, siUnitFor, unitInfo, type Dims, type UnitInfo } from './units';
import { makeUnit } from './values';

type PlotDef = Worksheet['plots'][number];

/** Compiles plot `index`; needs the program's inputs and steps compiled already. */
export function compilePlot(def: PlotDef, index: number, prog: Omit<Program, 'plots'>): CPlot {
  const series = def.series.map((s) => ({
    name: s,
    label: prog.inputByName.get(s)?.label ?? prog.worksheet.steps[prog.stepIndex.get(s) ?? -1]?.label ?? s,
    kind: (prog.inputNames.has(s) ? 'input' : 'step') as 'input' | 'step',
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
    prog.problems.push({ path: ['plots', index, ...path], error: cp.staticError });
    return cp;
  };
  const input = prog.inputByName.get(def.sweep.input);
  if (!input) return fail(['sweep', 'input'], err('unknown_symbol', `"${def.sweep.input}" is not an input`));
  cp.input = input;
  for (const [j, s] of def.series.entries()) {
    if (!prog.inputNames.has(s) && !prog.stepIndex.has(s)) return fail(['series', j], err('unknown_symbol', `"${s}" is not an input or a step`));
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
    if (prog.inputNames.has(name)) {
      if (name !== input.name) neededInputs.add(name);
      return;
    }
    const j = prog.stepIndex.get(name);
    if (j === undefined || needed.has(j)) return;
    needed.add(j);
    for (const dep of prog.steps[j].deps) visit(dep);
  };
  for (const s of def.series) visit(s);
  cp.steps = [...needed].sort((a, b) => a - b);
  cp.inputs = [...neededInputs];
  return cp;
}

/** Runs one plot; the program's scope holds the main evaluation's values and is restored afterwards. */
export function runPlot(
  prog: Program,
  p: CPlot,
  mainStatus: Map<string, Outcome>,
  overBudget: () => boolean,
  budgetError: () => EvaluationError,
): PlotResult {
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
  saved.set(input.name, prog.scope.get(input.name));
  for (const j of p.steps) saved.set(prog.steps[j].name, prog.scope.get(prog.steps[j].name));
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
      prog.scope.set(input.name, makeUnit(x, input.info!.dims));
      for (const j of p.steps) {
        const st = prog.steps[j];
        const o = runStep(prog, st, status);
        status.set(st.name, o);
        if (o.ok) prog.scope.set(st.name, o.value);
        else prog.scope.delete(st.name);
      }
      p.series.forEach((s, k) => {
        const o = status.get(s.name);
        raw[k].push(o && o.ok ? { si: o.si, dims: o.dims } : null);
      });
    }
  } finally {
    for (const [name, v] of saved) {
      if (v === undefined) prog.scope.delete(name);
      else prog.scope.set(name, v);
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
    const ci = prog.inputByName.get(first.name);
    if (ci && ci.unit !== '') axisText = ci.unit;
    axisIsDifference = !!ci?.difference;
  } else {
    const st = prog.steps[prog.stepIndex.get(first.name) as number];
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
}
