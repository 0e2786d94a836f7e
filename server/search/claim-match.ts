/**
 * The claim matcher (issue 6): which library entries a pasted claim — a paragraph of a manuscript,
 * a press release or a patent, 50 to 20,000 characters — describes.
 *
 * The text becomes a weighted bag of index terms, searched through the same minisearch index as
 * GET /api/search (same normalisation, same field boosts, BM25+ per field), with other options:
 *
 *  - Terms: each word of the text through normaliseTerm (the index's own folding and stemmer);
 *    left out are words with a digit (figures and units: "800", "2.45", "mN"), terms of fewer than
 *    three letters, and the common words of running prose (COMMON_WORDS in normalise.ts: function
 *    words, numbers in words, the stock phrases of abstracts, press releases and patent claims).
 *  - Weights: each distinct term is searched once, boosted by (1 + ln n) for n uses in the text
 *    (said five times counts more than once, not five times more) times its idf over whole entries
 *    (SearchIndex.documentFrequency) relative to a term only one entry holds. Minisearch's own idf
 *    is per field, so a common word in one entry's title ("mass") outweighed a rare word of the
 *    brief ("microwave"); the entry-level idf corrects that.
 *  - Long texts: at most MAX_TERMS distinct terms, those that weigh most (a term no entry holds
 *    weighs nothing). A 20,000-character text costs about what a long paragraph does.
 *  - Word forms: while the text has at most PREFIX_MAX_TERMS distinct terms, a term of PREFIX_MIN
 *    letters or more also matches the index terms it begins ("gyroscop" finds "gyroscopic"), at
 *    minisearch's reduced prefix weight; beyond that only exact terms (prefix search on hundreds of
 *    terms is slow on a large library). No fuzzy matching: a pasted text is spelled as published,
 *    and edit-distance search over hundreds of terms is slow and noisy ("heat" ~ "head").
 *  - Score: minisearch multiplies its sum by the number of query terms matched, which favours the
 *    longest entries when the query has a hundred terms; the matcher takes that factor out and
 *    uses the weighted sum of the term scores itself.
 *  - Weak hits are left out: a hit needs at least MIN_STRONG_TERMS of the text's terms in the
 *    entry's title, aliases or brief (what the entry is about, not words its long sections happen
 *    to use), a score of at least MIN_SCORE, and at least RELATIVE_FLOOR of the best hit's score.
 *    These are rules of thumb (common practice, no source), set on the invented texts of
 *    tests/fixtures/claim-texts.ts: there the 36 claims' top hits score 59–371 and match 6–18
 *    strong terms, while a recipe, a weather report and a match report match at most 3.
 *
 * `terms` of a hit are the index terms that matched; `words` the words of the text (as written, each
 * once, in order of first appearance) whose normalised form is a query term that matched — equal to
 * one of `terms`, or its beginning when matched as a prefix.
 */
import { COMMON_WORDS, fold, normaliseTerm } from './normalise';
import type { IndexedEntry, SearchIndex, TermsHit } from './index';

export interface ClaimHit {
  entry: IndexedEntry;
  score: number;
  /** The normalised index terms that matched. */
  terms: string[];
  /** The words of the text whose normalised form matched (as written, each once, in order of first appearance). */
  words: string[];
}

export interface MatchClaimOptions {
  /** Most hits returned (default 5). */
  limit?: number;
}

/** Most distinct terms searched for one text. */
export const MAX_TERMS = 120;
/** Shortest term searched as a prefix too. */
export const PREFIX_MIN = 5;
/** Texts with more distinct terms than this are searched for exact terms only. */
export const PREFIX_MAX_TERMS = 150;
/** Least score of a hit (the sum of its BM25+ term scores with the field and term boosts). */
export const MIN_SCORE = 15;
/** Least number of the text's terms a hit must match in its title, aliases or brief. */
export const MIN_STRONG_TERMS = 4;
/** Least score of a hit as a fraction of the best hit's. */
export const RELATIVE_FLOOR = 0.4;

interface QueryTerm {
  term: string;
  count: number;
  /** Rank of its first appearance among the terms. */
  first: number;
  /** The words (as written) that normalise to it, each once (case-insensitively), with the offset of its first appearance. */
  words: { word: string; at: number }[];
}

const WORD = /[\p{L}\p{M}\p{N}]+/gu;

/** The text's terms, each with its count, first position and the words that gave it. */
export function claimTerms(text: string): QueryTerm[] {
  const byTerm = new Map<string, QueryTerm & { seen: Set<string> }>();
  let i = 0;
  // word as written → [folded, term] (null: left out); a long text repeats most of its words.
  const seenWord = new Map<string, [string, string] | null>();
  for (const m of text.matchAll(WORD)) {
    const word = m[0];
    let known = seenWord.get(word);
    if (known === undefined) {
      const folded = fold(word);
      const term = /\p{N}/u.test(word) || COMMON_WORDS.has(folded) ? null : normaliseTerm(folded);
      known = term && term.length >= 3 ? [folded, term] : null;
      seenWord.set(word, known);
    }
    if (!known) continue;
    const [folded, term] = known;
    let q = byTerm.get(term);
    if (!q) byTerm.set(term, (q = { term, count: 0, first: i++, words: [], seen: new Set() }));
    q.count += 1;
    if (!q.seen.has(folded)) {
      q.seen.add(folded);
      q.words.push({ word, at: m.index! });
    }
  }
  return [...byTerm.values()].map(({ seen: _seen, ...q }) => q);
}

/** Weight of a term by how few entries hold it: BM25's idf over whole entries, as a fraction of that of a term only one entry holds (0 when none does). */
function idfWeight(index: SearchIndex, term: string): number {
  const n = Math.max(1, index.size);
  const df = Math.min(n, index.documentFrequency(term));
  if (df === 0) return 0;
  const idf = (x: number) => Math.log(1 + (n - x + 0.5) / (x + 0.5));
  return idf(df) / idf(1);
}

/** The fields that say what an entry is about. */
const STRONG_FIELDS = new Set(['title', 'aliases', 'inBrief']);

/** How many of the hit's query terms matched in its title, aliases or brief. */
function strongTerms(h: TermsHit): number {
  const strong = Object.entries(h.match).filter(([, fields]) => fields.some((f) => STRONG_FIELDS.has(f))).map(([t]) => t);
  return h.queryTerms.filter((q) => strong.some((t) => t.startsWith(q))).length;
}

/** The entries the text describes, best first, weak hits left out. */
export function matchClaim(index: SearchIndex, text: string, opts: MatchClaimOptions = {}): ClaimHit[] {
  const limit = opts.limit ?? 5;
  if (limit <= 0) return [];
  let terms = claimTerms(text);
  const prefixOk = terms.length <= PREFIX_MAX_TERMS;
  const weight = new Map(terms.map((q) => [q.term, (1 + Math.log(q.count)) * idfWeight(index, q.term)]));
  if (terms.length > MAX_TERMS) {
    // Keep the terms that weigh most; a term no entry holds weighs nothing, and without prefix
    // search it could not match anyway.
    terms = terms
      .filter((q) => prefixOk || weight.get(q.term)! > 0)
      .sort((a, b) => weight.get(b.term)! - weight.get(a.term)! || b.term.length - a.term.length || a.first - b.first)
      .slice(0, MAX_TERMS);
  }
  if (!terms.length) return [];
  const hits = index.searchTerms(
    terms.map((q) => q.term),
    {
      prefix: prefixOk ? (t) => t.length >= PREFIX_MIN : false,
      fuzzy: false,
      // A term no entry holds exactly can still match as a prefix: weigh it as one only one entry holds.
      boostTerm: (t) => weight.get(t) || 1,
    },
  );
  const scored = hits
    .map((h) => ({ h, score: h.score / Math.max(1, h.queryTerms.length) }))
    .filter((s) => s.score >= MIN_SCORE && strongTerms(s.h) >= MIN_STRONG_TERMS)
    .sort((a, b) => b.score - a.score || a.h.entry.slug.localeCompare(b.h.entry.slug));
  if (!scored.length) return [];
  const floor = scored[0].score * RELATIVE_FLOOR;
  return scored
    .filter((s) => s.score >= floor)
    .slice(0, limit)
    .map(({ h, score }) => {
      const matched = new Set(h.queryTerms);
      const words = terms
        .filter((q) => matched.has(q.term))
        .flatMap((q) => q.words)
        .sort((a, b) => a.at - b.at)
        .map((w) => w.word);
      return { entry: h.entry, score, terms: h.terms, words };
    });
}
