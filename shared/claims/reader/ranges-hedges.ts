/**
 * Ranges and hedges (the claim reader, shared/claims/reader.ts, pass 2): the gap that makes two
 * numbers one range ("3–6 mN", "between 0.5 and 1.5 kW", "from 2 to 4 kW"), the hedge said before a
 * figure ("up to", "about", "~", "at least", "more than"), and where the words that give a figure its
 * role end when a hedge stands between them and the figure.
 */
import { HEDGES } from '../figures-vocabulary';
import type { FigureHedge } from '../types';
import { alt, escapeRe } from './context';

const HEDGE_RES = HEDGES.map((h) => ({ hedge: h.hedge, re: new RegExp(`(?:(?<!\\p{L})(?:${alt(h.words.filter((w) => /^\p{L}/u.test(w)))})|${h.words.filter((w) => !/^\p{L}/u.test(w)).map(escapeRe).join('|') || '(?!)'})[^\\S\\n]*$`, 'iu') }));

export function isRangeGap(text: string, gapStart: number, gapEnd: number, firstStart: number): boolean {
  const gap = text.slice(gapStart, gapEnd);
  // "4 °C — 21 °C below the kitchen": a dash set off by spaces on both sides opens an aside.
  if (/^[^\S\n]+—[^\S\n]+$/u.test(gap)) return false;
  if (/^[^\S\n]*(?:[-–—]|to|or|and up to|up to|through|-to-)[^\S\n]*$/i.test(gap)) return !/^[^\S\n]+or[^\S\n]+$/i.test(gap) || /between|from/i.test(text.slice(Math.max(0, firstStart - 12), firstStart));
  return /^[^\S\n]+and[^\S\n]+$/i.test(gap) && /(?:between|from)[^\S\n]+$/i.test(text.slice(Math.max(0, firstStart - 12), firstStart));
}

/** Hedges that leave a figure's role to the words before them ("delivers approximately 1 kW", "for about 3 kW of electricity"). */
const ROLE_TRANSPARENT_HEDGES = HEDGE_RES.filter((h) => h.hedge === 'about' || h.hedge === 'up-to' || h.hedge === 'at-least' || h.hedge === 'at-most');

/** Where the words that give a figure its role end: before any hedge said right before the figure. */
export function roleContextStart(text: string, start: number, floor: number): number {
  let at = start;
  for (let again = true; again; ) {
    again = false;
    const before = text.slice(Math.max(floor, at - 24), at);
    for (const h of ROLE_TRANSPARENT_HEDGES) {
      const m = h.re.exec(before);
      if (m && m.index > 0 && /[^\S\n]$/.test(before.slice(0, m.index))) {
        at -= before.length - m.index;
        again = true;
        break;
      }
    }
  }
  return at;
}

export function hedgeBefore(text: string, start: number): FigureHedge | undefined {
  const before = text.slice(Math.max(0, start - 24), start);
  for (const h of HEDGE_RES) if (h.re.test(before)) return h.hedge;
  return undefined;
}
