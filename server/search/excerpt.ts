/** The excerpt of a search hit: the text around the first matched word, matched words marked. */
import { fold, normaliseTerm } from './normalise';

const escapeHtml = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');

/**
 * About `width` characters of `text` around the first matched word, every matched word in
 * <mark>…</mark>, all else HTML-escaped. A word matches when its normalised form is one of the
 * index terms that matched.
 */
export function excerpt(text: string, terms: string[], width = 220): string {
  const matched = new Set(terms);
  const isMatch = (word: string) => {
    const t = normaliseTerm(word);
    return t !== null && (matched.has(t) || matched.has(fold(word)));
  };
  const words = [...text.matchAll(/[\p{L}\p{N}]+(?:['’-][\p{L}\p{N}]+)*/gu)];
  const first = words.find((m) => isMatch(m[0]));
  let start = 0;
  if (first && first.index! > width / 3) {
    start = first.index! - Math.floor(width / 3);
    const space = text.indexOf(' ', start);
    if (space >= 0 && space < first.index!) start = space + 1;
  }
  let end = Math.min(text.length, start + width);
  if (end < text.length) {
    const space = text.lastIndexOf(' ', end);
    if (space > start) end = space;
  }
  let out = start > 0 ? '… ' : '';
  let at = start;
  for (const m of words) {
    const i = m.index!;
    if (i < start || i + m[0].length > end) continue;
    if (!isMatch(m[0])) continue;
    out += escapeHtml(text.slice(at, i)) + `<mark>${escapeHtml(m[0])}</mark>`;
    at = i + m[0].length;
  }
  out += escapeHtml(text.slice(at, end));
  if (end < text.length) out += ' …';
  return out;
}
