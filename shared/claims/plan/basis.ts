/**
 * What every per-check planner of shared/claims/plan.ts starts from: the figures of one kind, each
 * side's power and energy (several figures on one side added up or the largest taken), the longest
 * duration, the signals of the words; a figure at one end of its range; a plan and a need.
 */
import { checks } from '../../checks';
import type { CheckName } from '../../checks/types';
import { formatPrint } from '../print';
import type { ClaimCheckNeed, Figure, FigureKind } from '../types';
import { readSignals, type PlanContext, type Signals } from './signals';

export type End = 'low' | 'high';
/** A figure's typed quantity at one end of its range (the figure itself when it is no range). */
export const at = (f: Figure, end: End) => (end === 'high' && f.upper ? f.upper.quantity : f.quantity);
export const siAt = (f: Figure, end: End) => (end === 'high' && f.upper ? f.upper.si : f.si);
/** A typed quantity for an SI value, exact enough to read back (15 significant figures). */
export const typed = (si: number, unit: string) => `${Number(si.toPrecision(15))} ${unit}`.trim();

export interface Plan {
  check: CheckName;
  /** The figures used; those with an upper end are tried at both ends. */
  uses: Figure[];
  /** The inputs for one choice of ends. */
  inputs: (end: (f: Figure) => End) => Record<string, string>;
  why: string;
  assumptions: string[];
  /**
   * A figure the text itself states of the device that is within the law (an efficiency of 94.6 %) where
   * this plan's figures would find a conflict: the text contradicts that reading of it, so a conflict
   * found on them waits for the reader to confirm which figures are the device's.
   */
  within?: Figure;
  /**
   * What the reader must confirm before a conflict found on this plan is said: the reading rests on a
   * guess the text does not make (two temperatures taken as a heat engine's reservoirs where it names no
   * heat engine; an engine's coolant taken as its hot side).
   */
  confirmIfBreaks?: string;
}

/** The figures of one kind that are the device's (a figure set aside is of something else). */
export const ofKind = (figures: Figure[], kind: FigureKind) => figures.filter((f) => f.kind === kind && f.role !== 'aside');
export const largest = (fs: Figure[]) => [...fs].sort((a, b) => (b.upper?.si ?? b.si) - (a.upper?.si ?? a.si))[0];

export function uniq<T>(xs: (T | undefined)[]): T[] {
  return [...new Set(xs.filter((x): x is T => x !== undefined))];
}

/** Heat out over work in, for a machine that moves heat: a COP (heating, or cooling with cooling words), as a figure of its own. */
export function heatMoverCop(input: Figure | undefined, output: Figure | undefined, s: Signals): Figure | undefined {
  if (!input || !output || input.kind !== output.kind || !(input.si > 0)) return undefined;
  const cooling = s.cooling && !s.heatPump;
  return outOverIn(output, input, 'cop', cooling ? 'cooling' : 'heating', 'COP = heat out / work in');
}

/** Output over input as a ratio figure of its own, at the output's place in the text (a COP, an engine's efficiency). */
export function outOverIn(output: Figure, input: Figure, kind: 'cop' | 'efficiency', role: Figure['role'], what: string): Figure {
  const value = output.si / input.si;
  return {
    id: output.id,
    kind,
    quantity: String(Number(value.toPrecision(12))),
    text: output.text,
    start: output.start,
    end: output.end,
    si: value,
    unit: '',
    display: formatPrint(value),
    role,
    derived: `${what} (${output.display} / ${input.display})`,
  };
}

/**
 * The form of an energy said right after a figure ("35 kW of electricity", "50 kW of useful heat"), or in
 * the label before it ("Electricity exported plus own use: 301 MWh", "Heat recovered off the jacket: 340 MWh").
 */
function formOf(f: Figure, text: string): string | null {
  if (f.end === null) return null;
  const label = f.start === null ? undefined : /(?:^|[.!?\n])[^\S\n]*([^.!?\n:]{0,80}):[^\S\n]*$/u.exec(text.slice(Math.max(0, f.start - 90), f.start))?.[1].toLowerCase();
  if (label) {
    const heat = /(?<!\p{L})(?:heat|thermal)(?!\p{L})/u.test(label);
    const electric = /(?<!\p{L})(?:electric\w*|power exported|exported)(?!\p{L})/u.test(label);
    if (heat !== electric) return heat ? 'heat' : 'electric';
  }
  const after = text.slice(f.end, f.end + 40).toLowerCase();
  if (/^[^.;,]{0,25}?(?:heat|thermal)/.test(after)) return 'heat';
  if (/^[^.;,]{0,25}?(?:electric|electricity|\bdc\b|\bac\b|\bac\b|kwe|we\b)/.test(after)) return 'electric';
  if (/^[^.;,]{0,25}?(?:shaft|mechanical|work)/.test(after)) return 'mechanical';
  if (/^[^.;,]{0,25}?(?:signal)/.test(after)) return 'signal';
  return null;
}

/** Which paragraph (blank-line separated) a place in the text is in (its start). */
export function paragraphKey(text: string, at: number): number {
  const m = /[\s\S]*\n[^\S\n]*\n/u.exec(text.slice(0, at));
  return m ? m[0].length : 0;
}

/** Which sentence a place in the text is in (its start). */
export function sentenceKey(text: string, at: number): number {
  const head = text.slice(0, at);
  const m = /[\s\S]*(?:[.!?]["”’')\]]*\s|\n)/u.exec(head);
  return m ? m[0].length : 0;
}

/** The form of an input named after it: electricity, fuel or gas, heat, work. */
function inputFormOf(f: Figure, text: string): string | null {
  if (f.end === null || f.start === null) return null;
  const near = text.slice(Math.max(0, f.start - 30), f.end + 40).toLowerCase();
  if (/(?:fuel|gas|diesel|petrol|gasoline|propane|wood|coal|hydrogen)/.test(near)) return 'fuel';
  return formOf(f, text);
}

/** After an input: words that it is heat drawn from a source ("20 W is drawn from the ambient air", "of heat from the borehole"). */
export const HEAT_SOURCE_AFTER_RE = /^[^\S\n]*(?:(?:is|are|was|were|being)[^\S\n]+)?(?:of[^\S\n]+(?:low-grade[^\S\n]+|ambient[^\S\n]+)?heat[^\S\n]+)?(?:from|out of|drawn from|taken from|extracted from)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:borehole|ground|earth|soil|outside|outdoor|ambient|air|source|environment|surroundings|well|river|lake|sea|brine|loop)(?!\p{L})/iu;

/**
 * Several figures on one side: all that goes in is added up (a supply and a signal; counting more in is
 * kinder to the claim); what comes out is added up only where the text names different forms of it
 * (electricity and heat), else the largest is taken (a repeated figure is not counted twice).
 */
function combine(figs: Figure[], side: 'in' | 'out', text: string): Figure | undefined {
  const distinct = figs.filter((f, i) => !figs.slice(0, i).some((g) => Math.abs(g.si - f.si) <= 0.01 * Math.max(Math.abs(g.si), Math.abs(f.si))));
  if (distinct.length <= 1) return distinct[0];
  let parts = distinct;
  if (side === 'out') {
    const forms = distinct.map((f) => formOf(f, text));
    const allNamed = forms.every((x) => x !== null) && new Set(forms).size === forms.length;
    if (!allNamed) return [...distinct].sort((a, b) => b.si - a.si)[0];
  } else {
    // "moving about 0.6 W of heat out of the box for each watt of electricity": the one unit in that the
    // text sets against its output is the input of the ratio it states, whatever else it says it draws.
    const perUnit = distinct.filter((f) => f.derived !== undefined && /^one .+ in, from "for every /u.test(f.derived));
    if (perUnit.length === 1) return perUnit[0];
    // A derived input (a power from a current and a voltage) that equals the others added up repeats them.
    parts = distinct.filter((f) => !(f.derived && Math.abs(f.si - distinct.filter((g) => g !== f).reduce((a, g) => a + g.si, 0)) <= 0.01 * f.si));
    // Inputs said in different sentences, not named as different forms (electricity and gas), are
    // several statements of one input — the claim's and a tester's, a rating and a reading, one
    // device's and another's — not parts of it: the largest is taken (still the end kinder to the claim).
    const sentences = new Set(parts.map((f) => (f.start === null ? null : sentenceKey(text, f.start))));
    const forms = parts.map((f) => inputFormOf(f, text));
    const named = forms.every((x) => x !== null) && new Set(forms).size === forms.length;
    if (parts.length > 1 && !sentences.has(null) && sentences.size === parts.length && !named) {
      const largest = (fs: Figure[]) => [...fs].sort((a, b) => (b.upper?.si ?? b.si) - (a.upper?.si ?? a.si))[0];
      // (Heat said to be drawn from a source — "the remaining 20 W is drawn from the ambient air" — is an
      // input of another form beside the work, whatever sentence says it: both go in.)
      const fromSource = parts.filter((f) => f.end !== null && HEAT_SOURCE_AFTER_RE.test(text.slice(f.end, f.end + 50)));
      const others = parts.filter((f) => !fromSource.includes(f));
      if (fromSource.length === 0 || others.length === 0) return largest(parts);
      parts = [largest(others), ...fromSource];
    }
  }
  const si = parts.reduce((a, f) => a + f.si, 0);
  const up = parts.reduce((a, f) => a + (f.upper?.si ?? f.si), 0);
  const first = parts[0];
  const sum: Figure = {
    ...first,
    quantity: typed(si, first.unit),
    si,
    text: parts.map((f) => f.text).join(' + '),
    display: parts.map((f) => f.display).join(' + '),
    derived: `${side === 'in' ? 'all that goes in' : 'all that comes out'}, added up (${parts.map((f) => f.display).join(' + ')})`,
  };
  if (parts.some((f) => f.upper)) sum.upper = { quantity: typed(up, first.unit), si: up, display: formatPrint(up) };
  else delete sum.upper;
  return sum;
}

/**
 * In a text of several paragraphs where some paragraph gives both what goes in and what comes out (a
 * workshop's test: "drew 8.5 A at 48 V … 340 W at the wheel"), the ledger is read from such paragraphs
 * only: an output alone in another paragraph ("the motor is sold as '500 W'") is a rating or another
 * device's, not a figure to set against that input.
 */
function ledgerParagraphs(figs: Figure[], text: string): [Figure[], Figure[]] {
  const ins = figs.filter((f) => f.role === 'in');
  const outs = figs.filter((f) => f.role === 'out');
  if (!text || ins.length === 0 || outs.length === 0 || [...ins, ...outs].some((f) => f.start === null)) return [ins, outs];
  const key = (f: Figure) => paragraphKey(text, f.start!);
  const outKeys = new Set(outs.map(key));
  const both = new Set(ins.map(key).filter((k) => outKeys.has(k)));
  if (both.size === 0) return [ins, outs];
  return [ins.filter((f) => both.has(key(f))), outs.filter((f) => both.has(key(f)))];
}

/** The label of a table's summary row: "Avg", "Total", "Mean", "Overall" (after its column's label, in the reader's view: "Run Avg"). */
const SUMMARY_ROW_RE = /^[^\S\n]*\|?[^\S\n]*(?:[\p{L}][\p{L}\p{N}_.-]*[^\S\n]+){0,2}?(?:avg\.?|average|mean|total|totals|sum|overall|whole (?:run|test|period))(?!\p{L})/iu;

/**
 * A table or a log of several readings, one per line, each line with what went in and what came out
 * ("06:00 | 1.2 | 0.4 | 0.8", "Run 2: 45 kW fuel, 14.8 kW out"): each line is a ledger of its own, and
 * one line's input is never set against another line's output. Where the largest of each stand on one
 * line (a sweep's full-load point, a total row), that line is the ledger; else a summary row ("Avg",
 * "Total"); else the line that claims the
 * most (the highest ratio of out to in, each line's own) is checked: a table conflicts with the first law
 * only where one of its own lines does.
 */
function oneRow(ins: Figure[], outs: Figure[], text: string): [Figure[], Figure[]] {
  if (!text || ins.length < 2 || outs.length < 2 || [...ins, ...outs].some((f) => f.start === null)) return [ins, outs];
  const line = (f: Figure) => text.lastIndexOf('\n', f.start! - 1);
  const lines = new Set([...ins, ...outs].map(line));
  if (lines.size < 2) return [ins, outs];
  // (Every line with a figure gives both sides, and reads as a table's row — cells set apart by bars, tabs,
  // wide gaps, or the "; " the reader puts between a row's labelled cells — or this is no table of readings.)
  for (const l of lines) {
    if (!ins.some((f) => line(f) === l) || !outs.some((f) => line(f) === l)) return [ins, outs];
    const end = text.indexOf('\n', l + 1);
    const row = text.slice(l + 1, end < 0 ? text.length : end);
    if (row.length > 200 || !(/[|\t]|\S[^\S\n]{3,}\S/u.test(row) || (row.match(/; /gu) ?? []).length >= 2)) return [ins, outs];
  }
  // (Where the largest input and the largest output stand on one line — a sweep's full-load point, a
  // total row — that line is the ledger already.)
  const top = (fs: Figure[]) => [...fs].sort((a, b) => (b.upper?.si ?? b.si) - (a.upper?.si ?? a.si))[0];
  if (line(top(ins)) === line(top(outs))) return [ins, outs];
  // (A table's own summary row — "Avg", "Total", "Mean" — is its ledger.)
  const summary = [...lines].filter((l) => SUMMARY_ROW_RE.test(text.slice(l + 1, l + 40)));
  if (summary.length === 1) return [ins.filter((f) => line(f) === summary[0]), outs.filter((f) => line(f) === summary[0])];
  let best: { l: number; ratio: number } | null = null;
  for (const l of lines) {
    const i = ins.filter((f) => line(f) === l).reduce((a, f) => a + (f.upper?.si ?? f.si), 0);
    const o = outs.filter((f) => line(f) === l).reduce((a, f) => a + f.si, 0);
    // (A line whose input is nil or negative — a store charging — gives no ratio; it is passed over.)
    if (!(i > 0)) continue;
    const ratio = o / i;
    if (!best || ratio > best.ratio) best = { l, ratio };
  }
  if (!best) return [ins, outs];
  return [ins.filter((f) => line(f) === best!.l), outs.filter((f) => line(f) === best!.l)];
}

export interface PlanResult {
  plans: Plan[];
  needs: ClaimCheckNeed[];
  notes: string[];
}

export function need(check: CheckName, missing: string[], why: string, uses: Figure[]): ClaimCheckNeed {
  return { check, title: checks[check].title, missing, why, uses: uses.map((f) => f.id) };
}

/** The figures and words every planner reads, and the plans, needs and notes they add to. */
export interface Basis {
  figures: Figure[];
  ctx: PlanContext;
  s: Signals;
  plans: Plan[];
  needs: ClaimCheckNeed[];
  notes: string[];
  power: Figure[];
  energy: Figure[];
  text: string;
  pIn: Figure | undefined;
  pOut: Figure | undefined;
  eIn: Figure | undefined;
  eOut: Figure | undefined;
  duration: Figure | undefined;
  speeds: Figure[];
  temps: Figure[];
}

/**
 * "gives back 0.65 kWh for every kWh of braking, … 1.3 kWh recovered of the 2.0 kWh spent": where the input
 * taken is the one unit of a stated ratio, its output is the one said with it (in its sentence, before it),
 * not a total said elsewhere.
 */
function ratioPartner(input: Figure | undefined, outs: Figure[], text: string): Figure | undefined {
  if (!input?.derived || !/^one .+ in, from "for every /u.test(input.derived) || input.start === null || outs.length < 2) return undefined;
  // (One such ratio in the text: "for every kWh of electricity … 3.2 kWh … a boiler gives 0.9 kWh per kWh of gas"
  // sets two ratios side by side, and which is the device's is not said by where they stand.)
  if ((text.match(/(?<!\p{L})(?:for[^\S\n]+every|for[^\S\n]+each|per)[^\S\n]+(?:single[^\S\n]+)?(?:one[^\S\n]+)?(?:kWh|kilowatt[- ]hours?|units?|joules?|J|Wh|watts?|W|kW)(?!\p{L})/giu) ?? []).length !== 1) return undefined;
  const key = sentenceKey(text, input.start);
  const said = outs.filter((f) => f.start !== null && f.start < input.start! && input.start! - f.start < 80 && sentenceKey(text, f.start) === key);
  return said.length ? said[said.length - 1] : undefined;
}

export function basisFor(figures: Figure[], ctx: PlanContext): Basis {
  const s = readSignals(ctx);
  const plans: Plan[] = [];
  const needs: ClaimCheckNeed[] = [];
  const notes: string[] = [];

  const power = ofKind(figures, 'power');
  const energy = ofKind(figures, 'energy');
  const text = ctx.text ?? '';
  const [pIns, pOuts] = oneRow(...ledgerParagraphs(power, text), text);
  const [eIns, eOuts] = oneRow(...ledgerParagraphs(energy, text), text);
  const pIn = combine(pIns, 'in', text);
  const eIn = combine(eIns, 'in', text);
  const pOut = ratioPartner(pIn, pOuts, text) ?? combine(pOuts, 'out', text);
  const eOut = ratioPartner(eIn, eOuts, text) ?? combine(eOuts, 'out', text);
  const duration = largest(ofKind(figures, 'duration'));
  const speeds = ofKind(figures, 'speed');
  const temps = ofKind(figures, 'temperature');
  return { figures, ctx, s, plans, needs, notes, power, energy, text, pIn, pOut, eIn, eOut, duration, speeds, temps };
}
