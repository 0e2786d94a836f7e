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
// (A sheet's leader dots, four or more, end no sentence: "Power input .... between 2.9 and 3.2 kW".)
// (Not the point of a title or a common abbreviation: "said Mr. Ferreira-Lund", "see Fig. 3", "vs. the old model".)
const SENTENCE_BREAK_RE = /(?:(?<!\.{3})(?<!(?<![A-Za-z])(?:Mr|Mrs|Ms|Dr|Prof|St|Mt|No|vs|approx|ca|Fig|fig|Eq|eq|Ref|ref|Nr|nr|Inc|Ltd|Co|e\.g|i\.e|max|min|nom|typ|avg|cont|est|resp))\.|[!?;])["”’')\]]*(?:\s|$)|\n/g;

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

/** The paragraph (blank-line separated) around a place in the text; the whole text when it has one. */
export function paragraphAround(text: string, start: number, end: number): string {
  const before = text.slice(0, start);
  const breakBefore = /\n[^\S\n]*\n(?![\s\S]*\n[^\S\n]*\n)/u.exec(before);
  const from = breakBefore ? breakBefore.index + breakBefore[0].length : 0;
  const breakAfter = /\n[^\S\n]*\n/u.exec(text.slice(end));
  return text.slice(from, breakAfter ? end + breakAfter.index : text.length);
}

/** Machines whose input and output are electrical or mechanical (no heat pump among them). */
// (Not motors, inverters or converters: a heat pump has them.)
const OTHER_MACHINE_RE = /(?<!\p{L})(?:generators?|alternators?|dynamos?|circuits?|amplifiers?|batter(?:y|ies)|lamps?|LEDs?|coils?|transformers?|flywheels?)(?!\p{L})/iu;
/** Words of heat: a paragraph with them may be about a machine that moves heat. */
const HEAT_WORDS_RE = /(?<!\p{L})(?:heat\w*|warm\w*|thermal|refrigera\w*|compressors?|cool\w*|chill\w*|°C|°F|kelvin|degrees|temperatures?|COP)(?!\p{L})/iu;

/**
 * A paragraph of a longer text that is about a machine of another kind (a motor and generator set, a
 * circuit) and has no word of heat: a heat pump named elsewhere in a report on several stands or bids is
 * not the one this paragraph's figures are of.
 */
export function paragraphOfAnotherMachine(text: string, start: number, end: number): string | null {
  const paragraph = paragraphAround(text, start, end);
  if (paragraph.length >= text.length) return null;
  if (HEAT_PUMP_RE.test(paragraph) || COOLING_MACHINE_RE.test(paragraph) || !OTHER_MACHINE_RE.test(paragraph) || HEAT_WORDS_RE.test(paragraph)) return null;
  return paragraph;
}

/** A heater that burns fuel. */
export const BURNER_RE = /(?<!\p{L})(?:boilers?|furnaces?|stoves?|burners?|pellets?|oil-fired|gas-fired|wood-fired|combustion)(?!\p{L})/iu;
/** A heat pump named as such (not only by the radiators or the flow temperature it serves). */
export const NAMED_HEAT_PUMP_RE = /(?<!\p{L})(?:heat[- ]pumps?|air[- ]source|ground[- ]source|ground[- ]loops?|water[- ]source|ASHPs?|GSHPs?|air[- ]to[- ](?:water|air)|water[- ]to[- ]water|brine[- ]to[- ]water|heat[- ]pumping)(?!\p{L})/iu;

