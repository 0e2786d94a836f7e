/**
 * The figures as the reader edits them: each extracted figure (or one added by hand) with its kind,
 * typed quantity, the upper end when it is a range, and its role, read live in the browser with the
 * same reader the server uses, so a mistyped unit is marked before anything is sent.
 */
import { readQuantityOf, type FigureReading } from '@/shared/claims/figures';
import { printText } from '@/shared/claims/print';
import {
  FIGURE_KINDS,
  type Figure,
  type FigureHedge,
  type FigureInput,
  type FigureKind,
  type FigureRole,
} from '@/shared/claims/types';

export interface FigureDraft {
  /**
   * Stays the same for as long as the row is on screen (React's key), even when a re-run renumbers
   * the figures: the row the reader is typing in keeps its focus.
   */
  key: string;
  /** The result's figure id ("f1") for an extracted figure, "new-1", "new-2" … for one added by hand. */
  id: string;
  kind: FigureKind;
  quantity: string;
  /** The upper end of a range as typed ("6 mN"); "" when the figure is a single value. */
  upper: string;
  role: FigureRole;
  /** Kept from the extracted figure, so the place in the text is not lost on a re-run. */
  text?: string;
  start?: number | null;
  end?: number | null;
}

export { FIGURE_KINDS };

type Role = Exclude<FigureRole, null>;

/** The roles that mean something for each kind ("not stated" is always offered). */
export const ROLES_FOR: Record<FigureKind, readonly Role[]> = {
  thrust: [],
  power: ['in', 'out', 'excess'],
  energy: ['in', 'out', 'excess'],
  temperature: ['hot', 'cold', 'aside'],
  'temperature-difference': [],
  efficiency: [],
  cop: ['heating', 'cooling'],
  'quantum-efficiency': [],
  mass: ['wet', 'dry', 'propellant', 'aside'],
  speed: ['exhaust', 'delta-v'],
  current: [],
  voltage: [],
  duration: ['aside'],
  'specific-impulse': [],
  'thrust-per-power': [],
  'specific-power': [],
  'gas-flow': [],
};

export const ROLE_LABEL: Record<Role, string> = {
  in: 'Put in (drawn, supplied)',
  out: 'Got out (delivered, produced)',
  excess: 'Over and above the input',
  hot: 'Hot side (source)',
  cold: 'Cold side (sink, ambient)',
  heating: 'Heating',
  cooling: 'Cooling',
  wet: 'At the start, with propellant',
  dry: 'At the end, without propellant',
  propellant: 'The propellant alone',
  exhaust: 'Exhaust speed',
  'delta-v': 'Change of speed claimed',
  aside: 'Of something else (not used)',
};

/** Short words for a role beside a figure. */
export function roleWords(role: FigureRole): string {
  return role === null ? 'not stated' : ROLE_LABEL[role];
}

/** A hedge in the words a reader would say it. */
export const HEDGE_WORDS: Record<FigureHedge, string> = {
  'up-to': 'up to',
  about: 'about',
  'at-least': 'at least',
  'at-most': 'at most',
  'more-than': 'more than',
  'less-than': 'less than',
};

/** An example of what to type for each kind, for an added figure's placeholder. */
export const EXAMPLE_FOR: Record<FigureKind, string> = {
  thrust: '0.2 lbf',
  power: '1.5 kW',
  energy: '3 kWh',
  temperature: '300 degC',
  'temperature-difference': '20 K',
  efficiency: '45 %',
  cop: '3.2',
  'quantum-efficiency': '120 %',
  mass: '12 kg',
  speed: '20 m/s',
  current: '8 A',
  voltage: '24 V',
  duration: '72 h',
  'specific-impulse': '300 s',
  'thrust-per-power': '2 mN/kW',
  'specific-power': '500 W/kg',
  'gas-flow': '1.5 L/min',
};

/**
 * A range written as people write it: "3–6 mN" when both ends are in the same unit, else
 * "800 µN – 1.2 mN"; a single value when there is no upper end. Powers of ten are printed.
 */
export function rangeDisplay(rawLower: string, rawUpper?: string): string {
  // Powers of ten as in print ("2.6 × 10⁵ s"), not as typed ("2.6 × 10^5 s").
  const lower = printText(rawLower);
  if (rawUpper === undefined) return lower;
  const upper = printText(rawUpper);
  const split = (s: string) => {
    const m = /^(\S+)(?:\s+(.+))?$/.exec(s.trim());
    return m ? { number: m[1], unit: m[2] ?? '' } : { number: s, unit: '' };
  };
  const a = split(lower);
  const b = split(upper);
  // "2.5 × 10^5 s" has spaces inside its number: only a plain number and a unit are joined.
  const plain = (s: string) => /^[+-]?[\d.,]+$/.test(s);
  if (a.unit === b.unit && plain(a.number) && plain(b.number)) return `${a.number}–${b.number}${a.unit ? ` ${a.unit}` : ''}`;
  return `${lower} – ${upper}`;
}

/** A figure as the result gives it, in words: "up to 3–6 mN". */
export function figureDisplay(f: Pick<Figure, 'display' | 'upper' | 'hedge'>): string {
  const value = rangeDisplay(f.display, f.upper?.display);
  return f.hedge ? `${HEDGE_WORDS[f.hedge]} ${value}` : value;
}

export function draftOf(f: Figure, key: string = f.id): FigureDraft {
  return {
    key,
    id: f.id,
    kind: f.kind,
    quantity: f.quantity,
    upper: f.upper?.quantity ?? '',
    role: f.role,
    text: f.text,
    start: f.start,
    end: f.end,
  };
}

export function draftsOf(figures: readonly Figure[]): FigureDraft[] {
  return figures.map((f) => draftOf(f));
}

/** What a re-run sends back: the figures as fixed, each with its place in the text kept. */
export function toInputs(drafts: readonly FigureDraft[]): FigureInput[] {
  return drafts.map(({ kind, quantity, upper, role, text, start, end }) => {
    const input: FigureInput = { kind, quantity: quantity.trim(), role };
    if (upper.trim() !== '') input.upper = upper.trim();
    if (text !== undefined) input.text = text;
    if (start !== undefined) input.start = start;
    if (end !== undefined) input.end = end;
    return input;
  });
}

/** One string for a list of figures as they would be sent: equal strings, equal requests. */
export const figuresKey = (drafts: readonly FigureDraft[]): string => JSON.stringify(toInputs(drafts));

/** A role kept only when it still means something for the (new) kind. */
export function withKind(draft: FigureDraft, kind: FigureKind): FigureDraft {
  const role = draft.role !== null && ROLES_FOR[kind].includes(draft.role) ? draft.role : null;
  return { ...draft, kind, role };
}

export type Reading = FigureReading;

/** The typed quantity read as the kind's SI unit: its display ("889.6 mN"), or what is wrong with it. */
export const readDraft = (draft: Pick<FigureDraft, 'kind' | 'quantity'>): Reading => readQuantityOf(draft.kind, draft.quantity);

/** What is wrong with a draft as typed, field by field (nothing when it can be sent). */
export interface DraftProblems {
  quantity?: string;
  upper?: string;
}

export interface DraftReading {
  lower?: { si: number; display: string };
  upper?: { si: number; display: string };
  problems: DraftProblems;
}

/** Reads both ends of a draft and says what is wrong with each, in words that say how to fix it. */
export function readDraftFully(draft: Pick<FigureDraft, 'kind' | 'quantity' | 'upper'>, example = EXAMPLE_FOR[draft.kind]): DraftReading {
  const problems: DraftProblems = {};
  let lower: DraftReading['lower'];
  let upper: DraftReading['upper'];
  if (draft.quantity.trim() === '') {
    problems.quantity = `Type the figure with its unit, for example ${example}, or remove the figure.`;
  } else {
    const r = readQuantityOf(draft.kind, draft.quantity);
    if (r.ok) lower = { si: r.si, display: r.display };
    else problems.quantity = r.message;
  }
  if (draft.upper.trim() !== '') {
    const r = readQuantityOf(draft.kind, draft.upper);
    if (!r.ok) problems.upper = r.message;
    else if (lower && r.si < lower.si) {
      problems.upper = `The upper end (${r.display}) is below the lower end (${lower.display}); swap them, or clear the upper end for a single value.`;
    } else upper = { si: r.si, display: r.display };
  }
  return { lower, upper, problems };
}

/** Whether every draft can be sent as it is. */
export const allReadable = (drafts: readonly FigureDraft[]): boolean =>
  drafts.every((d) => Object.keys(readDraftFully(d).problems).length === 0);

/** Whether the drafts differ from the figures of the result on screen. */
export function changedFrom(drafts: readonly FigureDraft[], figures: readonly Figure[]): boolean {
  return figuresKey(drafts) !== figuresKey(draftsOf(figures));
}
