/**
 * For the figure reader's tests only (the .test.ts files of shared/claims): the agreement a reference's
 * printed digits allow, and the invariants of the contract that every extracted figure keeps.
 */
import { formatQuantity, parseQuantity } from '../../worksheet/quantity';
import { extractFigures } from '../reader';
import { FIGURE_SI_UNIT, type Figure } from '../types';

/** |a − b| ≤ rel·|b|: agreement to the digits a reference prints. */
export function expectRelClose(actual: number, expected: number, rel: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}
/** Seven significant digits printed (SP 811 Appendix B) → within half a unit in the seventh digit. */
export const SEVEN = 5e-7;
/** Exact factors (SI prefixes, defined units) → floating point only. */
export const EXACT = 1e-12;

/** The invariants of the contract (shared/claims/types.ts) that hold for every extracted figure. */
export function expectWellFormed(text: string, figures: Figure[]) {
  figures.forEach((f, i) => {
    expect(f.id).toBe(`f${i + 1}`);
    expect(text.slice(f.start!, f.end!)).toBe(f.text);
    expect(f.unit).toBe(FIGURE_SI_UNIT[f.kind]);
    // si and display are parseQuantity and formatQuantity of the quantity (the contract, types.ts).
    expect(f.si).toBe(parseQuantity(f.quantity, f.unit));
    expect(f.display).toBe(formatQuantity(f.si, f.unit));
    // Figures read from the text come in order and do not overlap; a derived figure spans the figures it comes from.
    const prior = figures.slice(0, i).filter((p) => !p.derived);
    if (!f.derived && prior.length) expect(f.start!).toBeGreaterThanOrEqual(prior[prior.length - 1].end!);
  });
}

export function only(text: string): Figure {
  const figures = extractFigures(text);
  expectWellFormed(text, figures);
  expect(figures).toHaveLength(1);
  return figures[0];
}

/** A rewritten text's offsets: one for each character and one past the end, each into the pasted text, in order. */
export function expectMapsBack(u: { text: string; toPasted: number[] }) {
  expect(u.toPasted).toHaveLength(u.text.length + 1);
  for (let i = 1; i < u.toPasted.length; i++) expect(u.toPasted[i]).toBeGreaterThanOrEqual(u.toPasted[i - 1]);
}
