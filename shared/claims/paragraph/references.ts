/**
 * References of the paragraph (shared/claims/paragraph.ts): markers are placed as tokens and numbered
 * only once the paragraph is final, so that a part left out for length leaves no number behind.
 */
import type { CslItem } from '../../entries/citations';

const OPEN = '\uE000';
const SEP = '\uE001';
const CLOSE = '\uE002';
const TOKEN = /\uE000([^\uE002]*)\uE002/g;

export class Citer {
  readonly items = new Map<string, { item: CslItem; counterweight: boolean }>();
  cite(items: CslItem[], counterweight: boolean): string {
    if (!items.length) return '';
    for (const item of items) if (!this.items.has(item.id)) this.items.set(item.id, { item, counterweight });
    return `${OPEN}${items.map((i) => i.id).join(SEP)}${CLOSE}`;
  }
}

/** Numbers the markers in order of first appearance: "[1]", "[2, 3]". */
export function number(text: string): { body: string; order: string[] } {
  const order: string[] = [];
  const body = text.replace(TOKEN, (_m, ids: string) => {
    const ns = ids.split(SEP).map((id) => {
      let at = order.indexOf(id);
      if (at < 0) at = order.push(id) - 1;
      return at + 1;
    });
    return `[${[...new Set(ns)].sort((a, b) => a - b).join(', ')}]`;
  });
  return { body, order };
}
