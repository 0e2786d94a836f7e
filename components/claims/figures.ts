/**
 * The figures as the reader edits them before a re-run: each extracted figure (or one added by
 * hand) with its kind, typed quantity and role, read live in the browser with the same
 * parseQuantity the server uses, so a mistyped unit is marked before anything is sent.
 */
import { readQuantityOf, type FigureReading } from '@/shared/claims/figures';
import { FIGURE_KINDS, type Figure, type FigureInput, type FigureKind, type FigureRole } from '@/shared/claims/types';

export interface FigureDraft {
  /** The result's figure id ("f1") for an extracted figure, "new-1", "new-2" … for one added by hand. */
  id: string;
  kind: FigureKind;
  quantity: string;
  role: FigureRole;
  /** Kept from the extracted figure, so the place in the text is not lost on a re-run. */
  text?: string;
  start?: number | null;
  end?: number | null;
}

export { FIGURE_KINDS };

/** The roles that mean something for each kind ("none" is always offered). */
export const ROLES_FOR: Record<FigureKind, readonly Exclude<FigureRole, null>[]> = {
  thrust: [],
  power: ['in', 'out'],
  energy: ['in', 'out'],
  temperature: ['hot', 'cold'],
  efficiency: [],
  cop: ['heating', 'cooling'],
  mass: [],
  speed: [],
  current: [],
};

export const ROLE_LABEL: Record<Exclude<FigureRole, null>, string> = {
  in: 'Put in (drawn, supplied)',
  out: 'Got out (delivered, produced)',
  hot: 'Hot side (source)',
  cold: 'Cold side (sink, ambient)',
  heating: 'Heating',
  cooling: 'Cooling',
};

/** Short words for a role beside a figure. */
export function roleWords(role: FigureRole): string {
  return role === null ? 'not stated' : ROLE_LABEL[role];
}

/** An example of what to type for each kind, for an added figure's placeholder. */
export const EXAMPLE_FOR: Record<FigureKind, string> = {
  thrust: '0.2 lbf',
  power: '1.5 kW',
  energy: '3 kWh',
  temperature: '300 degC',
  efficiency: '45 %',
  cop: '3.2',
  mass: '12 kg',
  speed: '20 m/s',
  current: '8 A',
};

export function draftsOf(figures: readonly Figure[]): FigureDraft[] {
  return figures.map((f) => ({ id: f.id, kind: f.kind, quantity: f.quantity, role: f.role, text: f.text, start: f.start, end: f.end }));
}

/** What a re-run sends back: the figures as fixed, each with its place in the text kept. */
export function toInputs(drafts: readonly FigureDraft[]): FigureInput[] {
  return drafts.map(({ kind, quantity, role, text, start, end }) => {
    const input: FigureInput = { kind, quantity: quantity.trim(), role };
    if (text !== undefined) input.text = text;
    if (start !== undefined) input.start = start;
    if (end !== undefined) input.end = end;
    return input;
  });
}

/** A role kept only when it still means something for the (new) kind. */
export function withKind(draft: FigureDraft, kind: FigureKind): FigureDraft {
  const role = draft.role !== null && ROLES_FOR[kind].includes(draft.role) ? draft.role : null;
  return { ...draft, kind, role };
}

export type Reading = FigureReading;

/** The typed quantity read as the kind's SI unit: its display ("889.6 mN"), or what is wrong with it. */
export const readDraft = (draft: Pick<FigureDraft, 'kind' | 'quantity'>): Reading => readQuantityOf(draft.kind, draft.quantity);

/** Whether the drafts differ from the figures of the result on screen. */
export function changedFrom(drafts: readonly FigureDraft[], figures: readonly Figure[]): boolean {
  if (drafts.length !== figures.length) return true;
  return drafts.some((d, i) => d.id !== figures[i].id || d.kind !== figures[i].kind || d.quantity.trim() !== figures[i].quantity || d.role !== figures[i].role);
}
