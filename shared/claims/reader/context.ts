/**
 * Where a figure sits (the claim reader, shared/claims/reader.ts): the window of words before a
 * figure, the sentence around it, and the machine words every pass reads (heat pumps, coolers).
 */
import { COOLING_MACHINE_WORDS, HEAT_PUMP_WORDS } from '../figures-vocabulary';

export const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
export const alt = (words: readonly string[]) => words.join('|');

export const HEAT_PUMP_RE = new RegExp(`(?<!\\p{L})(?:${alt(HEAT_PUMP_WORDS)})(?!\\p{L})`, 'iu');
export const COOLING_MACHINE_RE = new RegExp(`(?<!\\p{L})(?:${alt(COOLING_MACHINE_WORDS)})(?!\\p{L})`, 'iu');
export const BEFORE_WINDOW = 80;
const SENTENCE_BREAK_RE = /[.!?;]["”’')\]]*(?:\s|$)|\n/g;

/** Start of the window of words before `at`: the previous figure, the sentence start or `at - max`. */
export function windowStart(text: string, at: number, floor: number, max: number): number {
  let from = Math.max(floor, at - max);
  SENTENCE_BREAK_RE.lastIndex = 0;
  const slice = text.slice(from, at);
  let cut = -1;
  for (let m = SENTENCE_BREAK_RE.exec(slice); m; m = SENTENCE_BREAK_RE.exec(slice)) cut = m.index + m[0].length;
  if (cut >= 0) from += cut;
  return from;
}

/** The sentence around [start, end): from the last sentence break before to the next after. */
export function sentenceAround(text: string, start: number, end: number): string {
  const from = windowStart(text, start, 0, 400);
  const rest = text.slice(end, end + 400);
  const m = /[.!?;]["”’')\]]*(?:\s|$)|\n/.exec(rest);
  return text.slice(from, m ? end + m.index : end + rest.length);
}
