/**
 * Our own simple English normalisation for the search index, applied alike to documents and
 * queries: lower case, diacritics stripped, a few stop words dropped, and a light suffix stemmer
 * (ours, not Porter's) that folds -s, -es, -ies, -ing, -ed, -ers, -ion and a final -e, so that
 * "microwaves", "microwave" and "microwaved" meet at "microwav".
 */
const STOP = new Set(
  'a an and are as at be by for from has have in into is it its of on or that the their there this to was were which with'.split(' '),
);

export function stem(word: string): string {
  let w = word;
  if (w.length > 4 && w.endsWith('ies')) return `${w.slice(0, -3)}y`;
  for (const suffix of ['ers', 'ing', 'ion', 'ed', 'es', 's']) {
    if (w.endsWith(suffix) && w.length - suffix.length >= 3) {
      if (suffix === 's' && /(ss|us|is)$/.test(w)) continue;
      w = w.slice(0, -suffix.length);
      break;
    }
  }
  if (w.length > 4 && w.endsWith('e')) w = w.slice(0, -1);
  return w;
}

export const fold = (s: string) => s.normalize('NFD').replace(/\p{M}+/gu, '').toLowerCase();

/** One term as minisearch sees it: null drops it. */
export function normaliseTerm(term: string): string | null {
  const t = fold(term).replace(/[^\p{L}\p{N}]+/gu, '');
  if (!t || STOP.has(t)) return null;
  return stem(t);
}

/** Markdown and TeX to plain text: math dropped, links kept as their words, markup removed. */
export function plainText(md: string): string {
  return md
    .replace(/\$\$[\s\S]*?\$\$/g, ' ')
    .replace(/\$[^$\n]+\$/g, ' ')
    .replace(/```[\s\S]*?```/g, ' ')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/<[^>]+>/g, ' ')
    .replace(/^\s{0,3}(#{1,6}|>|[-*+]|\d+\.)\s+/gm, '')
    .replace(/[*_`~|]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}
