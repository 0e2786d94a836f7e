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
  const words = wordsOf(text);
  const isMatch = (w: Word) => w.term !== null && (matched.has(w.term) || matched.has(w.folded));
  const first = words.find(isMatch);
  let start = 0;
  if (first && first.index > width / 3) {
    start = first.index - Math.floor(width / 3);
    const space = text.indexOf(' ', start);
    if (space >= 0 && space < first.index) start = space + 1;
  }
  let end = Math.min(text.length, start + width);
  if (end < text.length) {
    const space = text.lastIndexOf(' ', end);
    if (space > start) end = space;
  }
  let out = start > 0 ? '… ' : '';
  let at = start;
  for (const w of words) {
    const i = w.index;
    if (i < start || i + w.word.length > end) continue;
    if (!isMatch(w)) continue;
    out += escapeHtml(text.slice(at, i)) + `<mark>${escapeHtml(w.word)}</mark>`;
    at = i + w.word.length;
  }
  out += escapeHtml(text.slice(at, end));
  if (end < text.length) out += ' …';
  return out;
}

/** A word of an excerpt's text: where it is, and its normalised and folded forms (what a matched term is compared with). */
interface Word {
  word: string;
  index: number;
  term: string | null;
  folded: string;
}

/** How many texts' words are kept (the texts of the hits most recently shown; least recently used dropped first). */
const WORDS_CACHE_SIZE = 2000;
const wordsCache = new Map<string, Word[]>();

/** The words of a text with their forms, worked out once per text (an entry's excerpt text is shown again and again). */
function wordsOf(text: string): Word[] {
  const cached = wordsCache.get(text);
  if (cached) {
    wordsCache.delete(text);
    wordsCache.set(text, cached);
    return cached;
  }
  const words: Word[] = [];
  for (const m of text.matchAll(/[\p{L}\p{N}]+(?:['’-][\p{L}\p{N}]+)*/gu)) {
    const word = m[0];
    const term = normaliseTerm(word);
    words.push({ word, index: m.index!, term, folded: term === null ? '' : fold(word) });
  }
  wordsCache.set(text, words);
  if (wordsCache.size > WORDS_CACHE_SIZE) wordsCache.delete(wordsCache.keys().next().value!);
  return words;
}
