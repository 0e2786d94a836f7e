/**
 * A figure while the claim reader (shared/claims/reader.ts) works on it, and the small tools the
 * passes share: its SI value, a derived figure's quantity, its place among the others, and whether
 * two figures stand in one clause or one sentence.
 */
import { parseQuantity } from '../../worksheet/quantity';
import { FIGURE_SI_UNIT, type FigureHedge, type FigureKind, type FigureRole } from '../types';
import { windowStart } from './context';

export interface Draft {
  start: number;
  end: number;
  kind: FigureKind;
  quantity: string;
  upper?: string;
  role: FigureRole;
  hedge?: FigureHedge;
  derived?: string;
  assumption?: string;
  /** For a temperature difference: which way the other temperature lies ("30 °C below a 25 °C room"). */
  direction?: 'up' | 'down';
  /** A percentage of the input ("returns 140 % of what it draws"). */
  ofInput?: boolean;
}

export const typedSi = (si: number, unit: string) => `${Number(si.toPrecision(12))} ${unit}`.trim();

export function siOf(d: Draft): number | null {
  try {
    return parseQuantity(d.quantity, FIGURE_SI_UNIT[d.kind]);
  } catch {
    return null;
  }
}
export function upperSiOf(d: Draft): number | null {
  if (d.upper === undefined) return null;
  try {
    return parseQuantity(d.upper, FIGURE_SI_UNIT[d.kind]);
  } catch {
    return null;
  }
}

/** Abbreviations whose full stop ends no sentence ("max. current", "approx. 3 kW"). */
const ABBREVIATIONS_RE = /(?<!\p{L})(?:max|min|approx|nom|avg|ca|cf|e\.g|i\.e|no|vs|incl|excl|resp|est|typ|cont|spec|ref|fig|eq)\./giu;

/** A derived draft put among the others in the order of the text (by where it starts). */
export function insertInOrder(drafts: Draft[], d: Draft): void {
  const at = drafts.findIndex((x) => x.start > d.start);
  if (at < 0) drafts.push(d);
  else drafts.splice(at, 0, d);
}

/** Puts a derived figure right after the figure it comes from. */
export function insertAfter(drafts: Draft[], anchor: Draft, d: Draft): void {
  const at = drafts.indexOf(anchor);
  drafts.splice(at + 1, 0, d);
}

/** No sentence end between the two ("12 A at 24 V"; a semicolon does not part them). */
export function sameClause(text: string, a: Draft, b: Draft): boolean {
  const [x, y] = a.start < b.start ? [a, b] : [b, a];
  return !/[.!?](?:\s|$)|\n/.test(text.slice(x.end, y.start).replace(ABBREVIATIONS_RE, ''));
}

/** Where the sentence of a figure starts: figures with the same start share a sentence. */
export function sentenceOf(text: string, d: Draft): number {
  return windowStart(text, d.start, 0, 400);
}
