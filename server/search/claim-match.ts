/**
 * The claim matcher (issues 6 and 11): which library entries a pasted claim — a sentence, a
 * paragraph of a manuscript, a press release or a patent, up to 20,000 characters — describes.
 *
 * `matchClaim(index, text, { limit, classes })`. The text becomes a weighted bag of index terms,
 * searched through the same minisearch index as GET /api/search (same normalisation, same field
 * boosts, BM25+ per field), with other options:
 *
 *  - Terms: each word of the text through normaliseTerm (the index's own folding and stemmer);
 *    left out are words with a digit (figures and units: "800", "2.45", "mN"), terms of fewer than
 *    three letters, and the common words of running prose (COMMON_WORDS in normalise.ts: function
 *    words, numbers in words, the stock phrases of abstracts, press releases and patent claims, and
 *    verbs and nouns such as "put", "take", "point", "test" that say nothing of a mechanism).
 *  - Synonyms (issue 11): the trade's synonym groups (content/synonyms.yml, edited by editors; see
 *    synonyms.ts) are concept terms of the index. Each group the text names, by a word or a phrase
 *    of several words (the longest at each place), is one more query term, weighted SYNONYM_WEIGHT
 *    of a word of the same rarity: "frustum" in the text finds "cavity" in an entry, and an entry
 *    holding the text's own word scores that word as well as the group, so the word itself always
 *    weighs more. Words that matched only through a group are reported in `synonyms`.
 *  - Weights: each distinct term is searched once, boosted by (1 + ln n) for n uses in the text
 *    (said five times counts more than once, not five times more) times its idf over whole entries
 *    (SearchIndex.documentFrequency) relative to a term only one entry holds. Minisearch's own idf
 *    is per field, so a common word in one entry's title ("mass") outweighed a rare word of the
 *    brief ("microwave"); the entry-level idf corrects that.
 *  - Long texts: at most MAX_TERMS distinct terms, those that weigh most (a term no entry holds
 *    weighs nothing). A 20,000-character text costs about what a long paragraph does.
 *  - Word forms: while the text has at most PREFIX_MAX_TERMS distinct terms, a term of PREFIX_MIN
 *    letters or more also matches the index terms it begins ("gyroscop" finds "gyroscopic"), at
 *    minisearch's reduced prefix weight; beyond that only exact terms. No fuzzy matching: a pasted
 *    text is spelled as published, and edit-distance search over hundreds of terms is slow and
 *    noisy ("heat" ~ "head").
 *  - Score: minisearch multiplies its sum by the number of query terms matched, which favours the
 *    longest entries when the query has a hundred terms; the matcher takes that factor out and
 *    uses the weighted sum of the term scores itself.
 *  - Accepted sightings (issue 11): the index holds the title and summary of every sighting a
 *    moderator accepted and linked to an entry as that entry's `sightings` field (boost 2, below
 *    the brief); it counts as a strong field, so a claim worded like an accepted sighting finds
 *    its entry even when it shares few words with the entry itself.
 *  - Classes (issue 11): `opts.classes` are mechanism classes the claim's figures point to (a
 *    thrust with a power and no propellant → 'propellant-free-thrust'). An entry in one of them or
 *    below it scores (1 + CLASS_BOOST) times as much and needs one strong term and about one term's
 *    weight less (strongNeeded): enough to break a near-tie or admit an entry one strong term
 *    short, never enough for one whose words do not match (the boost multiplies its own score).
 *  - Weak hits are left out, and a text about nothing in the library gets an empty list, never a
 *    fall-back on stray words: a hit needs strong evidence — enough of the text's terms in the
 *    entry's title, aliases, brief or accepted sightings (what the entry is about, not words its
 *    long sections happen to use), one for every STRONG_TERMS_PER terms of the text, between
 *    MIN_STRONG_TERMS_SHORT and MIN_STRONG_TERMS, whose idf weights add up to STRONG_WEIGHT_PER_TERM
 *    a term of the text, between MIN_STRONG_WEIGHT_SHORT and MIN_STRONG_WEIGHT (a few words every
 *    entry uses, "energy", "power", "battery", are not enough for an abstract about something
 *    else; a sentence needs less than an abstract, which touches more words by chance); a score of
 *    at least MIN_SCORE; and at least RELATIVE_FLOOR of the best hit's score. A group counts as a
 *    strong term unless it came from single words that already counted; a phrase of several words
 *    whose words all matched counts at a word's weight. These are rules of thumb (common practice,
 *    no source), set on the invented texts of tests/fixtures/claim-texts.ts, the paraphrases and
 *    off-topic texts of tests/server/claim-match.test.ts and the tuning parts of the claim corpus
 *    (never its held-out part). `claimCandidates` returns every entry reached with the evidence
 *    judged, for diagnostics.
 *
 * `terms` of a hit are the index terms that matched (concept terms left out); `words` the words of
 * the text (as written, each once, in order of first appearance) whose normalised form is a query
 * term that matched — equal to one of `terms`, or its beginning when matched as a prefix — or that
 * belong to a synonym phrase whose group matched (those also in `synonyms`).
 */
import { COMMON_WORDS, fold, normaliseTerm } from './normalise';
import { conceptTerm, isConceptTerm, tokensOf, wordKey } from './synonyms';
import type { IndexedEntry, SearchIndex, TermsHit } from './index';

export interface ClaimHit {
  entry: IndexedEntry;
  score: number;
  /** The normalised index terms that matched (words; the synonym groups' concept terms are left out). */
  terms: string[];
  /**
   * The words of the text that matched (as written, each once, in order of first appearance): its
   * own words found in the entry, and the words of a synonym phrase whose group the entry holds.
   */
  words: string[];
  /** Those of `words` that matched only through a synonym group (the entry uses another word of the group). */
  synonyms: string[];
  /** True when the entry's class is one the figures point to (opts.classes) and it was boosted. */
  classSignalled: boolean;
  /** Set when the claim's own finding led to the entry (claim-findings.ts), in words: why. */
  finding?: string;
}

export interface MatchClaimOptions {
  /** Most hits returned (default 5). */
  limit?: number;
  /**
   * Mechanism classes (slugs of content/taxonomy.yml) that the claim's figures point to, e.g.
   * 'propellant-free-thrust' for a thrust with a power and no propellant. Entries in these classes
   * or below them get a moderate boost (CLASS_BOOST) and need one strong term fewer; unknown
   * slugs are ignored.
   */
  classes?: readonly string[];
}

/** Most distinct terms searched for one text. */
export const MAX_TERMS = 120;
/** Shortest term searched as a prefix too. */
export const PREFIX_MIN = 5;
/** Texts with more distinct terms than this are searched for exact terms only. */
export const PREFIX_MAX_TERMS = 150;
/** Least score of a hit (the sum of its BM25+ term scores with the field and term boosts). */
export const MIN_SCORE = 15;
/**
 * Strong evidence a hit needs: at least this many of the text's terms matched in the entry's title,
 * aliases, brief or accepted sightings, one for every STRONG_TERMS_PER of the text's distinct
 * terms, and no fewer than MIN_STRONG_TERMS_SHORT nor more than MIN_STRONG_TERMS (a long text
 * touches more words of an entry by chance than a sentence does).
 */
export const MIN_STRONG_TERMS = 5;
export const MIN_STRONG_TERMS_SHORT = 2;
export const STRONG_TERMS_PER = 7;
/**
 * …and their idf weights added up (a term only one entry holds weighs 1, one that most entries
 * hold next to nothing) at least STRONG_WEIGHT_PER_TERM for each of the text's distinct terms,
 * between MIN_STRONG_WEIGHT_SHORT and MIN_STRONG_WEIGHT: a few words every entry uses ("energy",
 * "power", "battery", "deliver") are not enough for an abstract about something else.
 */
export const MIN_STRONG_WEIGHT = 2;
export const MIN_STRONG_WEIGHT_SHORT = 1;
export const STRONG_WEIGHT_PER_TERM = 0.05;
/**
 * An entry in a class the figures point to needs one strong term fewer (at least one) and about one
 * term's weight less (never under CLASS_MIN_WEIGHT): the figures are evidence of their own.
 */
export const CLASS_WEIGHT_RELIEF = 0.4;
export const CLASS_MIN_WEIGHT = 0.6;
/** Least score of a hit as a fraction of the best hit's. */
export const RELATIVE_FLOOR = 0.4;
/** Weight of a synonym group's concept term, relative to a word of the same rarity (the word itself always weighs more). */
export const SYNONYM_WEIGHT = 0.5;
/**
 * Score factor for an entry in a class the figures point to (1 + CLASS_BOOST). 0.25 at first; 0.6
 * put the right entry first for three more claims of the corpus's tuning part and for none fewer
 * (bench:claims). A rule of thumb (common practice, no source).
 */
export const CLASS_BOOST = 0.6;

interface QueryTerm {
  term: string;
  count: number;
  /** Rank of its first appearance among the terms. */
  first: number;
  /** The words (as written) that normalise to it, each once (case-insensitively), with the offset of its first appearance. */
  words: { word: string; at: number }[];
}

/** A synonym group's concept term in the text: also the word terms of the phrases that gave it. */
interface ConceptQueryTerm extends QueryTerm {
  sources: Set<string>;
  /** Some phrase that gave it has several words ("zero-point", "reaction mass"). */
  phrase: boolean;
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

/**
 * The synonym groups the text names (index.synonyms), one concept term per group, each with the
 * words of its phrases as written and the word terms they normalise to. `first` continues after
 * `after` (the number of word terms).
 */
export function claimConcepts(index: SearchIndex, text: string, after = 0): ConceptQueryTerm[] {
  if (!index.synonyms.size) return [];
  const tokens = tokensOf(text);
  const byTerm = new Map<string, ConceptQueryTerm & { seen: Set<string> }>();
  let i = after;
  for (const hit of index.synonyms.find(tokens.map((t) => t.token))) {
    const term = conceptTerm(hit.group);
    let q = byTerm.get(term);
    if (!q) byTerm.set(term, (q = { term, count: 0, first: i++, words: [], seen: new Set(), sources: new Set(), phrase: false }));
    q.count += 1;
    if (tokens.slice(hit.start, hit.end).filter((t) => wordKey(t.token) !== null).length > 1) q.phrase = true;
    for (const { token, at } of tokens.slice(hit.start, hit.end)) {
      const folded = fold(token);
      // Figures, stop words and the common words of prose are not shown as matched words.
      if (/\p{N}/u.test(token) || wordKey(token) === null || COMMON_WORDS.has(folded)) continue;
      const t = normaliseTerm(folded);
      if (t) q.sources.add(t);
      if (!q.seen.has(folded)) {
        q.seen.add(folded);
        q.words.push({ word: token, at });
      }
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

/** The fields that say what an entry is about (its accepted sightings say how such claims are put). */
const STRONG_FIELDS = new Set(['title', 'aliases', 'inBrief', 'sightings']);

/** How much a hit rests on what the entry is about: its terms matched in a strong field. */
export interface StrongEvidence {
  /** How many of the text's terms matched in a strong field. */
  count: number;
  /** Their idf weights (idfWeight) added up, a synonym group's at SYNONYM_WEIGHT. */
  weight: number;
}

/**
 * The text's terms the hit matched in a strong field: its words, and each synonym group unless
 * it came from single words that all counted already (so that "cavity" matching "cavity" is not
 * counted again through the group that holds both "cavity" and "resonator", while "isothermal
 * engine" meeting "single-reservoir engine" counts though "engine" did, and so does the phrase
 * "zero-point", which says more than "zero" and "point" apart).
 */
function strongEvidence(index: SearchIndex, h: TermsHit, concepts: Map<string, ConceptQueryTerm>): StrongEvidence {
  const strong = Object.entries(h.match)
    .filter(([, fields]) => fields.some((f) => STRONG_FIELDS.has(f)))
    .map(([t]) => t);
  const strongWordTerms = strong.filter((t) => !isConceptTerm(t));
  const strongWords = new Set<string>();
  let count = 0;
  let weight = 0;
  for (const q of h.queryTerms) {
    if (isConceptTerm(q)) continue;
    const matched = strongWordTerms.filter((t) => t.startsWith(q));
    if (!matched.length) continue;
    strongWords.add(q);
    count += 1;
    weight += Math.max(...matched.map((t) => idfWeight(index, t)));
  }
  for (const q of h.queryTerms) {
    const c = concepts.get(q);
    if (!c || !strong.includes(q)) continue;
    const allWords = [...c.sources].every((t) => strongWords.has(t));
    if (!c.phrase && allWords) continue;
    count += 1;
    // A phrase whose words all matched is most likely the entry's own phrase: it weighs as a word.
    weight += (c.phrase && allWords ? 1 : SYNONYM_WEIGHT) * idfWeight(index, q);
  }
  return { count, weight };
}

/** The strong evidence a hit needs for a text of `terms` distinct word terms (less for a sentence than for an abstract). */
export function strongNeeded(terms: number, classSignalled = false): StrongEvidence {
  const count = Math.min(MIN_STRONG_TERMS, Math.max(MIN_STRONG_TERMS_SHORT, Math.ceil(terms / STRONG_TERMS_PER)));
  const weight = Math.min(MIN_STRONG_WEIGHT, Math.max(MIN_STRONG_WEIGHT_SHORT, terms * STRONG_WEIGHT_PER_TERM));
  return classSignalled
    ? { count: Math.max(1, count - 1), weight: Math.max(CLASS_MIN_WEIGHT, weight - CLASS_WEIGHT_RELIEF) }
    : { count, weight };
}

/** One entry the text's terms reach, before weak hits are left out (see matchClaim; for diagnostics and tests). */
export interface ClaimCandidate {
  hit: TermsHit;
  /** The score without the class boost. */
  raw: number;
  /** The score the hits are ranked by. */
  score: number;
  strong: StrongEvidence;
  /** The strong evidence it needs (strongNeeded). */
  needed: StrongEvidence;
  /** The entry's class is one the figures point to. */
  classSignalled: boolean;
  /** Whether it passes MIN_SCORE and the strong-evidence rules (the relative floor aside). */
  passes: boolean;
}

interface Prepared {
  terms: QueryTerm[];
  candidates: ClaimCandidate[];
}

/**
 * The text's query terms and the index's hits for them, unranked, with each hit's score (class
 * boost included) and, on demand, the candidate judged (its matches worked out).
 * `candidatesOnly`: leave out hits that cannot reach MIN_SCORE even with the class boost.
 */
function search(index: SearchIndex, text: string, opts: MatchClaimOptions, candidatesOnly: boolean) {
  const words = claimTerms(text);
  const concepts = claimConcepts(index, text, words.length);
  let terms: QueryTerm[] = [...words, ...concepts];
  const prefixOk = terms.length <= PREFIX_MAX_TERMS;
  const weight = new Map(terms.map((q) => [q.term, (isConceptTerm(q.term) ? SYNONYM_WEIGHT : 1) * (1 + Math.log(q.count)) * idfWeight(index, q.term)]));
  if (terms.length > MAX_TERMS) {
    // Keep the terms that weigh most; a term no entry holds weighs nothing, and without prefix
    // search it could not match anyway.
    terms = terms
      .filter((q) => prefixOk || weight.get(q.term)! > 0)
      .sort((a, b) => weight.get(b.term)! - weight.get(a.term)! || b.term.length - a.term.length || a.first - b.first)
      .slice(0, MAX_TERMS);
  }
  // A concept term no entry holds cannot match.
  terms = terms.filter((q) => !isConceptTerm(q.term) || weight.get(q.term)! > 0);
  const conceptOf = new Map(concepts.map((c) => [c.term, c]));
  const signalled = new Set<string>();
  for (const c of opts.classes ?? []) if (index.classes.has(c)) for (const s of index.classAndChildren(c)) signalled.add(s);

  const found = index.searchTermsLazily(
    terms.map((q) => q.term),
    {
      prefix: prefixOk ? (t) => t.length >= PREFIX_MIN && !isConceptTerm(t) : false,
      // A term no entry holds exactly can still match as a prefix: weigh it as one only one entry holds.
      boostTerm: (t) => weight.get(t) || 1,
      // A hit below MIN_SCORE, even with the class boost, cannot pass: its matches are never worked out.
      atLeast: candidatesOnly ? (MIN_SCORE / (signalled.size ? 1 + CLASS_BOOST : 1)) * 0.999 : undefined,
    },
  );
  const isSignalled = (i: number) => {
    const cls = found.entry(i).mechanismClass;
    return cls !== null && signalled.has(cls);
  };
  const raw = (i: number) => found.score(i) / Math.max(1, found.matched(i));
  return {
    terms,
    length: found.length,
    entry: (i: number) => found.entry(i),
    /** The score hits are ranked by (raw, times the class boost where it applies). */
    score: (i: number) => (isSignalled(i) ? raw(i) * (1 + CLASS_BOOST) : raw(i)),
    candidate: (i: number): ClaimCandidate => {
      const hit = found.hit(i);
      const r = hit.score / Math.max(1, hit.queryTerms.length);
      const classSignalled = isSignalled(i);
      const strong = strongEvidence(index, hit, conceptOf);
      const needed = strongNeeded(words.length, classSignalled);
      const score = classSignalled ? r * (1 + CLASS_BOOST) : r;
      return { hit, raw: r, score, strong, needed, classSignalled, passes: score >= MIN_SCORE && strong.count >= needed.count && strong.weight >= needed.weight };
    },
  };
}

function prepare(index: SearchIndex, text: string, opts: MatchClaimOptions): Prepared {
  const found = search(index, text, opts, false);
  const candidates = Array.from({ length: found.length }, (_, i) => found.candidate(i));
  candidates.sort((a, b) => b.score - a.score || a.hit.entry.slug.localeCompare(b.hit.entry.slug));
  return { terms: found.terms, candidates };
}

/** Every entry the text's terms reach, best first, with the evidence matchClaim judges (for diagnostics and tests). */
export function claimCandidates(index: SearchIndex, text: string, opts: MatchClaimOptions = {}): ClaimCandidate[] {
  return prepare(index, text, opts).candidates;
}

/**
 * The entries the text describes, best first, weak hits left out. Hits are judged best first and
 * only until `limit` have passed or the scores fall below the relative floor: the many weak hits
 * of a long text are never worked out (the outcome is claimCandidates' passing ones, floored and cut).
 */
export function matchClaim(index: SearchIndex, text: string, opts: MatchClaimOptions = {}): ClaimHit[] {
  const limit = opts.limit ?? 5;
  if (limit <= 0) return [];
  const found = search(index, text, opts, true);
  const terms = found.terms;
  // Best first, ties by slug, as claimCandidates ranks them; each score worked out once.
  const scores = Array.from({ length: found.length }, (_, i) => found.score(i));
  const order = scores.map((_, i) => i).filter((i) => scores[i] >= MIN_SCORE * 0.999);
  order.sort((a, b) => scores[b] - scores[a] || found.entry(a).slug.localeCompare(found.entry(b).slug));
  const scored: ClaimCandidate[] = [];
  for (const i of order) {
    if (scored.length >= limit || (scored.length && scores[i] < scored[0].score * RELATIVE_FLOOR)) break;
    const c = found.candidate(i);
    if (c.passes) scored.push(c);
  }
  if (!scored.length) return [];
  const floor = scored[0].score * RELATIVE_FLOOR;
  return scored
    .filter((s) => s.score >= floor)
    .slice(0, limit)
    .map(({ hit: h, score, classSignalled }) => {
      const matched = new Set(h.queryTerms);
      const direct = new Set<string>();
      const all = new Map<string, { word: string; at: number }>();
      for (const q of terms) {
        if (!matched.has(q.term)) continue;
        for (const w of q.words) {
          const key = fold(w.word);
          if (!isConceptTerm(q.term)) direct.add(key);
          const seen = all.get(key);
          if (!seen || w.at < seen.at) all.set(key, w);
        }
      }
      const ordered = [...all.values()].sort((a, b) => a.at - b.at);
      return {
        entry: h.entry,
        score,
        terms: h.terms.filter((t) => !isConceptTerm(t)),
        words: ordered.map((w) => w.word),
        synonyms: ordered.filter((w) => !direct.has(fold(w.word))).map((w) => w.word),
        classSignalled,
      };
    });
}
