/**
 * The claim's own rejoinder (shared/claims/paragraph.ts): which of the entry's common replies a
 * pasted text raises, compared by content words in one sentence or two in a row, and the answer's
 * first sentence or two as the forms the paragraph may use.
 */
import { wordCount } from '../../entries/schema';
import { plain, sentencesOf } from './words';

/** Function words and the filler of replies ("we", "our", "so", "cannot"), left out of the comparison. */
const REPLY_STOP = new Set(
  (
    'a about above after again against all also always am an and any are as at be because been before being below between both but by ' +
    'can cannot could did do does doing done down during each either even ever every few for from further get gets got had has have ' +
    'having here how however i if in into is it its itself just let like made make makes many may me might more most much must my ' +
    'never no nor not now of off on once one only onto or other our ours ourselves out over own per same should so some such than that ' +
    'the their theirs them then there therefore these they this those through thus to too under until up upon us very was we were what ' +
    'when where whether which while who whom why will with within without would yet you your'
  ).split(' '),
);

/**
 * The trade's spellings of one idea, folded to one token before comparing: "quality factor",
 * "Q factor", "Q-factor" and a lone "Q" are all the resonator's quality factor.
 */
const REPLY_SYNONYMS: [RegExp, string][] = [
  [/\b(?:quality|q)[\s-]*factors?\b/g, ' qfactor '],
  [/\bq\b/g, ' qfactor '],
  [/\bover[\s-]+unity\b/g, ' overunity '],
  [/\bzero[\s-]+point\b/g, ' zeropoint '],
  [/\bperpetual[\s-]+motion\b/g, ' perpetualmotion '],
];

/**
 * The content words of a text as comparison keys: folded to lower case without diacritics, trade
 * synonyms joined, function words and single letters and numbers dropped, a plural "-s"/"-ies"
 * folded, then cut to their first six letters so that "multiplies", "multiplied" and
 * "multiplication" meet (as do "magnet", "magnets" and "magnetic").
 */
export function contentKeys(text: string): Set<string> {
  let t = text.normalize('NFD').replace(/\p{M}+/gu, '').toLowerCase();
  for (const [re, to] of REPLY_SYNONYMS) t = t.replace(re, to);
  const keys = new Set<string>();
  for (const raw of t.match(/[\p{L}\p{N}]+/gu) ?? []) {
    if (raw.length < 2 || REPLY_STOP.has(raw) || !/\p{L}/u.test(raw)) continue;
    let w = raw;
    if (w.length > 4 && w.endsWith('ies')) w = `${w.slice(0, -3)}y`;
    else if (w.length > 3 && w.endsWith('s') && !/(ss|us|is)$/.test(w)) w = w.slice(0, -1);
    keys.add(w.slice(0, 6));
  }
  return keys;
}

/** Fraction of a reply's content words the text must share, and the fewest shared words. */
const REPLY_SHARE_MIN = 0.6;
const REPLY_SHARED_WORDS_MIN = 2;

/** Most words taken from the answer to a reply (one or two whole sentences). */
const REPLY_ANSWER_WORDS = 60;

export interface ReplyMatch {
  reply: string;
  answer: string;
  /** The reply's content keys found in the text. */
  shared: string[];
  /** shared / the reply's content keys. */
  share: number;
}

/** Sentences of a pasted text: split at a full stop, question or exclamation mark, semicolon or line break. */
const textSentences = (text: string) =>
  text
    .split(/(?<=[.!?;])\s+|\n+/)
    .map((s) => s.trim())
    .filter(Boolean);

/**
 * The reply a text raises, if any. A reply is raised when some stretch of the text — one sentence,
 * or two in a row — shares at least REPLY_SHARE_MIN of the reply's content words and at least
 * REPLY_SHARED_WORDS_MIN of them; of the replies raised, the one with the largest share wins (ties:
 * more words shared, then the entry's order). Asking for the words together, in one place, keeps a
 * long text that uses the subject's common words here and there ("thrust", "energy", "law") from
 * raising a reply it never makes.
 */
export function matchReply(text: string, replies: { reply: string; answer: string }[]): ReplyMatch | null {
  if (!text.trim() || !replies.length) return null;
  const sentences = textSentences(text).map(contentKeys);
  const stretches = sentences.map((keys, i) => (i + 1 < sentences.length ? new Set([...keys, ...sentences[i + 1]]) : keys));
  let best: ReplyMatch | null = null;
  for (const r of replies) {
    const keys = [...contentKeys(plain(r.reply))];
    if (keys.length < REPLY_SHARED_WORDS_MIN) continue;
    for (const inText of stretches) {
      const shared = keys.filter((k) => inText.has(k));
      const share = shared.length / keys.length;
      if (shared.length < REPLY_SHARED_WORDS_MIN || share < REPLY_SHARE_MIN) continue;
      if (!best || share > best.share || (share === best.share && shared.length > best.shared.length)) best = { reply: r.reply, answer: r.answer, shared, share };
    }
  }
  return best;
}

/** The answer's first sentence or first two, as the longer and shorter forms the paragraph may use. */
export function answerForms(answer: string): string[] {
  const s = sentencesOf(answer);
  const forms: string[] = [];
  if (s.length >= 2 && wordCount(`${s[0]} ${s[1]}`) <= REPLY_ANSWER_WORDS) forms.push(`${s[0]} ${s[1]}`);
  // One sentence alone only when it says something by itself ("It can, once." does not).
  if (s.length >= 1 && wordCount(s[0]) >= 8 && wordCount(s[0]) <= REPLY_ANSWER_WORDS) forms.push(s[0]);
  return forms;
}
