/**
 * Figures the reader types or fixes on the claim check and the sighting form: read for their kind
 * by parseQuantity. The figure reader that finds figures in a pasted text is shared/claims/reader.ts
 * (server side: it loads an English number recogniser the app does not need).
 */
import { QuantityError, formatQuantity, parseQuantity } from '../worksheet/quantity';
import { FIGURE_KINDS, FIGURE_SI_UNIT, type Figure, type FigureInput, type FigureKind } from './types';

/**
 * A figure the reader typed or fixed. The quantity is read for its kind by parseQuantity, whose
 * QuantityError is left to propagate (the server answers 400 naming the figure's field).
 */
/** A typed quantity read in its kind's SI unit: the value and its display, or what is wrong with it. */
export type FigureReading = { ok: true; si: number; display: string } | { ok: false; message: string };

/** Reads a figure as typed ("0.2 lbf" as a thrust) without throwing: for forms that mark a mistyped unit as it is typed. */
export function readQuantityOf(kind: FigureKind, quantity: string): FigureReading {
  const unit = FIGURE_SI_UNIT[kind];
  try {
    const si = parseQuantity(quantity, unit);
    return { ok: true, si, display: formatQuantity(si, unit) };
  } catch (err) {
    if (err instanceof QuantityError) return { ok: false, message: err.message };
    throw err;
  }
}

export function readFigure(input: FigureInput, id: string): Figure {
  if (!(FIGURE_KINDS as readonly string[]).includes(input.kind)) {
    throw new QuantityError('syntax', `"${String(input.kind)}" is not a kind of figure (one of ${FIGURE_KINDS.join(', ')})`);
  }
  const unit = FIGURE_SI_UNIT[input.kind];
  const quantity = typeof input.quantity === 'string' ? input.quantity.trim() : input.quantity;
  const si = parseQuantity(quantity, unit);
  const upperText = typeof input.upper === 'string' ? input.upper.trim() : '';
  let upper: Figure['upper'];
  if (upperText) {
    const u = parseQuantity(upperText, unit);
    upper = u >= si ? { quantity: upperText, si: u, display: formatQuantity(u, unit) } : undefined;
    if (!upper) throw new QuantityError('syntax', `The upper end of the range (${formatQuantity(u, unit)}) is below the lower end (${formatQuantity(si, unit)}).`);
  }
  const figure: Figure = {
    id,
    kind: input.kind,
    quantity,
    text: input.text ?? quantity,
    start: input.start ?? null,
    end: input.end ?? null,
    si,
    unit,
    display: formatQuantity(si, unit),
    role: input.role ?? null,
  };
  if (upper) figure.upper = upper;
  return figure;
}
