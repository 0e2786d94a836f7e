/**
 * The full-text index (issue 6): minisearch over the current published version of every entry
 * that is not retired. Built from MariaDB at app start, updated at once when this server publishes
 * or retires an entry, and rebuilt whenever the change watermark in the database (published
 * versions, retired entries, the newest entries.updated_at, the sightings linked to entries, the
 * synonym groups) moves, so that what another app server published is found here within one
 * refresh period.
 *
 * Issue 11 adds two things the claim matcher uses:
 *  - the text (title and summary) of every sighting a moderator accepted and linked to an entry,
 *    indexed as that entry's `sightings` field (the newest SIGHTINGS_PER_ENTRY), so that each
 *    decision teaches the matcher how such claims are worded;
 *  - the trade's synonym groups (server/search/synonyms.ts): every field also holds a concept
 *    term for each group phrase found in it. A change of the groups rebuilds the index.
 * Builds and updates run one at a time, so that a slow rebuild cannot overwrite a newer update.
 */
import MiniSearch, { type SearchResult } from 'minisearch';
import type { Logger } from 'pino';
import { findEntryId, loadEntries, loadSynonyms, readWatermark, type LoadedEntry } from './load';
import { fold, normaliseTerm } from './normalise';
import { isConceptTerm, SynonymSet, tokensOf } from './synonyms';
import type { IndexedEntry, SearchDoc, SearchHit, TermsHit, TermsSearchOptions } from './types';

export { excerpt } from './excerpt';
export { SIGHTINGS_PER_ENTRY } from './load';
export type { IndexedEntry, SearchDoc, SearchHit, TermsHit, TermsSearchOptions } from './types';

/**
 * The indexed fields. The long sections are one field, `body`, and class and laws another: each
 * query term then walks five posting lists instead of nine, which is most of a query's time.
 */
/** How many single words' hits query() keeps, and how many hits in all (least recently used dropped first). */
const WORD_CACHE_SIZE = 2000;
const WORD_CACHE_HITS = 1_000_000;
/** Query words shorter than this (normalised) are searched only when they are a known short term. */
export const MIN_WORD = 3;

export const FIELDS = ['title', 'aliases', 'inBrief', 'sightings', 'taxonomy', 'body'] as const;
export type Field = (typeof FIELDS)[number];
/** Sightings weigh below what the entry says of itself, above its long sections. */
export const BOOST: Record<Field, number> = { title: 5, aliases: 4, inBrief: 2.5, sightings: 2, taxonomy: 1.5, body: 1 };

function fieldText(doc: SearchDoc, field: Field): string {
  if (field === 'taxonomy') return `${doc.mechanism} · ${doc.laws}`;
  if (field === 'body') return `${doc.howItIsPitched} ${doc.whyItFails} ${doc.whatFakesTheEffect} ${doc.citations}`;
  return doc[field];
}

/** A field's index tokens: its words, then a concept term for each synonym phrase found in them. */
function docTokens(text: string, synonyms: SynonymSet): string[] {
  const tokens = tokenize(text);
  const concepts = synonyms.conceptTerms(tokens);
  return concepts.length ? tokens.concat(concepts) : tokens;
}

/** Concept terms pass as they are; words are normalised. */
const processDocTerm = (t: string) => (isConceptTerm(t) ? t : normaliseTerm(t));

const newMiniSearch = (synonyms: SynonymSet) =>
  new MiniSearch<SearchDoc>({
    fields: [...FIELDS],
    // The id stays a number (results are looked up by it).
    extractField: (doc, field) => (field === 'id' ? (doc.id as unknown as string) : fieldText(doc, field as Field)),
    storeFields: [],
    tokenize: (text) => docTokens(text, synonyms),
    processTerm: processDocTerm,
    searchOptions: { boost: BOOST, prefix: true, fuzzy: 0.2, processTerm: normaliseTerm, combineWith: 'OR' },
  });

export interface SearchIndexOptions {
  /** How often the watermark is checked (ms); 0 never. */
  refreshMs: number;
  logger?: Logger;
}

export class SearchIndex {
  private syn = new SynonymSet();
  private ms = newMiniSearch(this.syn);
  private docs = new Map<number, SearchDoc>();
  private entries = new Map<number, IndexedEntry>();
  /** Law slug → name; mechanism slug → { name, parent slug }. */
  laws = new Map<string, string>();
  classes = new Map<string, { name: string; parent: string | null }>();
  /** Normalised term → number of indexed entries that hold it in any field. */
  private df = new Map<string, number>();
  /**
   * The one- and two-letter terms a query may search for: the words of the synonym groups' phrases
   * ("RF", the "Q" of "loaded Q") and the abbreviations the entries write in capitals ("EM", "DC").
   * Any other short word of a query is a stray fragment and is left out.
   */
  private shortTerms = new Set<string>();
  /** Scored hits of single words (see query()); emptied whenever the index changes. */
  private wordCache = new Map<string, Map<number, WordHit>>();
  /** Hits held in the word cache in all (bounds its memory: about 100 bytes a hit). */
  private wordCacheHits = 0;
  private watermark = '';
  private building: Promise<void> | null = null;
  private built = false;
  private timer: NodeJS.Timeout | undefined;
  private ticking = false;
  /** The build or update under way: the next one waits for it. */
  private queue: Promise<unknown> = Promise.resolve();

  constructor(private readonly opts: SearchIndexOptions) {}

  /** Starts the first build and the refresh timer. */
  start(): void {
    void this.ready().catch((err) => this.opts.logger?.error({ err }, 'search index build failed'));
    if (this.opts.refreshMs > 0) {
      // Cast: tsc may read the DOM's setInterval (returning a number) before Node's.
      this.timer = setInterval(() => void this.tick(), this.opts.refreshMs) as unknown as NodeJS.Timeout;
      this.timer.unref();
    }
  }

  /** Stops the timer and waits for a build or refresh under way. */
  async stop(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = undefined;
    await Promise.allSettled([this.building, this.tickP].filter(Boolean));
  }

  /** Resolves once the index has been built (a failed build is tried again on the next call). */
  async ready(): Promise<void> {
    if (this.built) return;
    this.building ??= this.rebuild().finally(() => (this.building = null));
    await this.building;
  }

  private tickP: Promise<void> | null = null;

  private tick(): Promise<void> {
    if (this.tickP) return this.tickP;
    this.tickP = this.refresh().finally(() => (this.tickP = null));
    return this.tickP;
  }

  private async refresh(): Promise<void> {
    if (this.ticking) return;
    this.ticking = true;
    try {
      const mark = await readWatermark();
      if (mark !== this.watermark) await this.rebuild();
    } catch (err) {
      this.opts.logger?.warn({ err }, 'search index refresh failed');
    } finally {
      this.ticking = false;
    }
  }

  /** The synonym groups as the index uses them. */
  get synonyms(): SynonymSet {
    return this.syn;
  }

  /** Reads entries (all, or those with these ids) that are published; keeps the taxonomy's names. */
  private async load(ids?: number[]): Promise<LoadedEntry[]> {
    const { laws, classes, items } = await loadEntries(ids);
    this.laws = laws;
    this.classes = classes;
    return items;
  }

  /** Runs index work one piece at a time. */
  private serial<T>(work: () => Promise<T>): Promise<T> {
    const run = this.queue.then(work, work);
    this.queue = run.catch(() => {});
    return run;
  }

  /** Builds the whole index again from the database (also after a change of the synonym groups). */
  rebuild(): Promise<void> {
    return this.serial(() => this.doRebuild());
  }

  private async doRebuild(): Promise<void> {
    const mark = await readWatermark();
    const syn = await loadSynonyms();
    const loaded = await this.load();
    const ms = newMiniSearch(syn);
    ms.addAll(loaded.map((l) => l.doc));
    const df = new Map<string, number>();
    const short = shortTermsOf(syn);
    for (const l of loaded) {
      countTerms(df, l.doc, 1, syn);
      addShortTerms(short, l.doc);
    }
    this.syn = syn;
    this.ms = ms;
    this.df = df;
    this.shortTerms = short;
    this.clearWordCache();
    this.docs = new Map(loaded.map((l) => [l.doc.id, l.doc]));
    this.entries = new Map(loaded.map((l) => [l.entry.id, l.entry]));
    this.watermark = mark;
    this.built = true;
  }

  /** Re-reads one entry after this server published or retired it, or linked a sighting to it. */
  async update(slug: string): Promise<void> {
    if (!this.built) return this.ready();
    return this.serial(() => this.doUpdate(slug));
  }

  private async doUpdate(slug: string): Promise<void> {
    const id = await findEntryId(slug);
    if (id === undefined) return;
    const loaded = await this.load([id]);
    const old = this.docs.get(id);
    if (old) {
      this.ms.remove(old);
      countTerms(this.df, old, -1, this.syn);
      this.clearWordCache();
      this.docs.delete(id);
      this.entries.delete(id);
    }
    for (const { doc, entry } of loaded) {
      this.ms.add(doc);
      countTerms(this.df, doc, 1, this.syn);
      addShortTerms(this.shortTerms, doc);
      this.clearWordCache();
      this.docs.set(doc.id, doc);
      this.entries.set(entry.id, entry);
    }
  }

  /** The class and every class below it. */
  classAndChildren(slug: string): Set<string> {
    const out = new Set([slug]);
    for (let grew = true; grew; ) {
      grew = false;
      for (const [s, c] of this.classes) {
        if (c.parent && out.has(c.parent) && !out.has(s)) {
          out.add(s);
          grew = true;
        }
      }
    }
    return out;
  }

  /** The class and every class above it, nearest first (a facet count of a class includes its children's entries). */
  classAndAncestors(slug: string): string[] {
    const out: string[] = [];
    for (let at: string | null | undefined = slug; at && !out.includes(at); at = this.classes.get(at)?.parent) out.push(at);
    return out;
  }

  /**
   * The words of a query that the index searches for, each as typed and normalised: stop words,
   * and words of one or two letters that are not a known short term (see shortTerms), are left
   * out, so that "ab" or "xq zz" is no search for stray fragments.
   */
  queryWords(q: string): { typed: string; term: string }[] {
    const out: { typed: string; term: string }[] = [];
    for (const typed of tokenize(q)) {
      const term = normaliseTerm(typed);
      if (!term) continue;
      if (term.length < MIN_WORD && !this.shortTerms.has(term)) continue;
      out.push({ typed, term });
    }
    return out;
  }

  /**
   * Ranked hits for q (all entries, newest first, when q is blank; none when q holds no word the
   * index searches for, see queryWords). Every word must match
   * (AND), falling back to any word (OR) when that finds nothing. Only the last word matches as a
   * prefix (it is the one still being typed), and only a word that is not in the index's vocabulary
   * is matched fuzzily, within an edit distance of about a third of its length (at most 2), so that
   * a swapped or dropped letter is forgiven and a correct word does not fan out over its neighbours.
   *
   * Each word is searched on its own and its scored hits are kept in a small cache (most of a
   * query's time is scoring a common word's long posting list, and common words recur from query
   * to query); the words' hits are then intersected from the shortest list, their scores summed
   * and multiplied by the number of words matched, as minisearch itself combines them.
   */
  query(q: string): SearchHit[] {
    if (!/[\p{L}\p{N}]/u.test(q)) {
      return [...this.entries.values()].sort((a, b) => b.publishedAt - a.publishedAt || b.id - a.id).map((entry) => ({ entry, score: 0, terms: [] }));
    }
    // Split as the index splits ("zero-point" is two words), then normalised as the index normalises.
    const words = this.queryWords(q);
    if (!words.length) return [];
    const lists = words.map((w, i) => this.wordHits(w.term, i === words.length - 1, w.typed));
    const combine = (ids: Iterable<number>, need: number) => {
      const out: SearchHit[] = [];
      for (const id of ids) {
        let score = 0;
        let matched = 0;
        const terms = new Set<string>();
        for (const list of lists) {
          const hit = list.get(id);
          if (!hit) continue;
          score += hit.score;
          matched += 1;
          for (const t of hit.terms) terms.add(t);
        }
        const entry = this.entries.get(id);
        if (matched >= need && entry) out.push({ entry, score: score * matched, terms: [...terms] });
      }
      return out.sort((a, b) => b.score - a.score || a.entry.id - b.entry.id);
    };
    const shortest = lists.reduce((a, b) => (b.size < a.size ? b : a));
    const all = combine(shortest.keys(), lists.length);
    if (all.length) return all;
    // Any word, but only an entry that holds one of them as typed (or as the start of a word): a
    // word reached only through a typing error does not carry a hit alone ("hello world" → "would").
    const any = new Set<number>();
    for (const list of lists) for (const [id, hit] of list) if (!hit.fuzzy) any.add(id);
    return combine(any, 1);
  }

  /**
   * The matched words of a hit as a reader should see them, never a stem ("microwav"): each index
   * term the hit matched as the reader typed it, when a word of the query normalises to it
   * ("thrusters"), else as the entry writes it (a prefix or a typing error reached it:
   * "microw" → "microwave"), in lower case unless the entry only ever writes it with capitals
   * ("Carnot", "RF"). Concept terms are left out; duplicates are dropped.
   */
  readerWords(hit: SearchHit, q: string): string[] {
    const typed = new Map<string, string>();
    for (const { typed: word, term } of this.queryWords(q)) if (!typed.has(term)) typed.set(term, word);
    const terms = hit.terms.filter((t) => !isConceptTerm(t));
    const rest = new Set(terms.filter((t) => !typed.has(t)));
    const forms = rest.size ? this.writtenForms(hit.entry.id, rest) : new Map<string, string>();
    const out: string[] = [];
    for (const t of terms) {
      const word = typed.get(t) ?? forms.get(t) ?? t;
      if (!out.some((w) => w.toLowerCase() === word.toLowerCase())) out.push(word);
    }
    return out;
  }

  /**
   * Index term → the word the entry writes for it: written in lower case if it ever is; else as
   * written inside a sentence ("Carnot", "RF"); else, when only ever at the start of a sentence,
   * a title or a name ("Overbalanced wheel"), in lower case.
   */
  private writtenForms(id: number, terms: Set<string>): Map<string, string> {
    const doc = this.docs.get(id);
    const found = new Map<string, { word: string; rank: number }>();
    if (!doc) return new Map();
    let settled = 0;
    for (const field of FIELDS) {
      const text = fieldText(doc, field);
      for (const { token, at } of tokensOf(text)) {
        const t = normaliseTerm(token);
        if (!t || !terms.has(t)) continue;
        const had = found.get(t);
        if (had?.rank === 0) continue;
        const lower = token.toLowerCase();
        // 0: in lower case; 1: capitals inside a sentence; 2: a capital at a sentence's start.
        const rank = token === lower ? 0 : /^\p{Lu}\p{Ll}*$/u.test(token) && SENTENCE_START.test(text.slice(Math.max(0, at - 3), at)) ? 2 : 1;
        if (!had || rank < had.rank) found.set(t, { word: rank === 2 ? lower : token, rank });
        if (rank === 0) settled += 1;
      }
      if (settled === terms.size) break;
    }
    return new Map([...found].map(([t, f]) => [t, f.word]));
  }

  private clearWordCache(): void {
    this.wordCache.clear();
    this.wordCacheHits = 0;
  }

  /**
   * One word's scored hits (id → score and the index terms it matched), through the cache. A term
   * reached through a typing error must begin with the word's first letter (people seldom mistype
   * it, and "lorem" → "more" is no slip); an entry that only such terms reached is a fuzzy hit.
   */
  private wordHits(word: string, last: boolean, typed: string = word): Map<number, WordHit> {
    // A word of one or two letters (a known short term) matches only itself: as a prefix it would fan out.
    const prefix = last && word.length >= MIN_WORD;
    // A word the index lacks is also tried with letters swapped, which depends on how it was typed.
    const key = `${prefix ? 'prefix' : 'exact'}:${word}${this.df.has(word) ? '' : `:${fold(typed)}`}`;
    const cached = this.wordCache.get(key);
    if (cached) {
      this.wordCache.delete(key); // most recently used last
      this.wordCache.set(key, cached);
      return cached;
    }
    const known = this.df.has(word);
    const fuzzy = known ? false : fuzzyDistance(word);
    const hits = new Map<number, WordHit>();
    const direct = (t: string) => t === word || (prefix && t.startsWith(word));
    for (const r of this.ms.search(word, { tokenize: (t) => [t], processTerm: (t) => t, prefix, fuzzy, combineWith: 'OR' })) {
      const terms = fuzzy ? r.terms.filter((t) => direct(t) || t[0] === word[0]) : r.terms;
      if (terms.length) hits.set(r.id as number, { score: r.score, terms, fuzzy: !terms.some(direct) });
    }
    // Two letters typed the wrong way round are one slip, not the two edits minisearch counts.
    if (!known && word.length >= 4) {
      const weight = FUZZY_WEIGHT * (word.length / (word.length + 1));
      for (const variant of swapped(typed)) {
        if (variant === word || !this.df.has(variant)) continue;
        for (const r of this.ms.search(variant, { tokenize: (t) => [t], processTerm: (t) => t, prefix: false, fuzzy: false })) {
          const id = r.id as number;
          const had = hits.get(id);
          const terms = had ? [...new Set([...had.terms, ...r.terms])] : r.terms;
          hits.set(id, { score: (had?.score ?? 0) + r.score * weight, terms, fuzzy: had ? had.fuzzy : true });
        }
      }
    }
    this.wordCache.set(key, hits);
    this.wordCacheHits += hits.size;
    while (this.wordCache.size > WORD_CACHE_SIZE || this.wordCacheHits > WORD_CACHE_HITS) {
      const [oldest, dropped] = this.wordCache.entries().next().value!;
      this.wordCache.delete(oldest);
      this.wordCacheHits -= dropped.size;
    }
    return hits;
  }

  /**
   * Ranked hits for query terms that are already normalised (normaliseTerm), each searched once
   * with these options over the index's field boosts (the claim matcher's way in; GET /api/search
   * uses query()). Minisearch's score is kept as it gives it: the sum over terms and fields,
   * times the number of distinct query terms matched.
   */
  searchTerms(terms: string[], options: TermsSearchOptions = {}): TermsHit[] {
    if (!terms.length) return [];
    return this.ms
      .search(terms.join(' '), { boost: BOOST, combineWith: 'OR', prefix: false, fuzzy: false, ...options, tokenize: (s) => s.split(' '), processTerm: (t) => t })
      .map((r: SearchResult) => ({ entry: this.entries.get(r.id as number)!, score: r.score, terms: r.terms, queryTerms: r.queryTerms, match: r.match }))
      .filter((h) => h.entry);
  }

  /** How many indexed entries hold this normalised term in any field. */
  documentFrequency(term: string): number {
    return this.df.get(term) ?? 0;
  }

  get size(): number {
    return this.entries.size;
  }
}

const tokenize = MiniSearch.getDefault('tokenize') as (text: string) => string[];

/**
 * How many edits a word not in the index may be from an index term: none below 4 letters, one up
 * to 7, two from 8 (its normalised form counted). Closer than minisearch's usual third of the
 * length, which let five letters in two edits reach words that were never meant ("world" → "work",
 * "pqrst" → "part"); a swap of two letters is found apart (swapped()).
 */
const fuzzyDistance = (word: string): number | false => (word.length < 4 ? false : word.length < 8 ? 1 : 2);

/** Minisearch's default weight of a fuzzy match, used for the swapped forms of a word. */
const FUZZY_WEIGHT = 0.45;

/** The normalised forms of a typed word with two neighbouring letters swapped (the first letter kept). */
function swapped(typed: string): string[] {
  const w = fold(typed);
  const out = new Set<string>();
  for (let i = 1; i + 1 < w.length; i++) {
    if (w[i] === w[i + 1]) continue;
    const t = normaliseTerm(w.slice(0, i) + w[i + 1] + w[i] + w.slice(i + 2));
    if (t) out.add(t);
  }
  return [...out];
}

/** What comes before the first word of a sentence, a field or a list item (the text up to the word's last three characters). */
const SENTENCE_START = /(?:^|[.!?:;·•\n]\s*|^\s+)$/u;

/** One entry's match of one query word. */
interface WordHit {
  score: number;
  /** The index terms the word matched in the entry. */
  terms: string[];
  /** Only through a typing error (no term is the word itself, or, for the last word, begins with it). */
  fuzzy: boolean;
}

/** The one- and two-letter words of the synonym groups' phrases, normalised ("rf", "q"). */
function shortTermsOf(synonyms: SynonymSet): Set<string> {
  const out = new Set<string>();
  for (const phrases of synonyms.groups.values()) {
    for (const phrase of phrases) {
      for (const word of tokenize(phrase)) {
        const t = normaliseTerm(word);
        if (t && t.length < MIN_WORD) out.add(t);
      }
    }
  }
  return out;
}

/** Adds the two-letter abbreviations a doc writes in capitals ("EM", "RF"), normalised. */
function addShortTerms(out: Set<string>, doc: SearchDoc): void {
  for (const field of FIELDS) {
    for (const m of fieldText(doc, field).matchAll(/(?<![\p{L}\p{N}])\p{Lu}{2}(?![\p{L}\p{N}])/gu)) {
      const t = normaliseTerm(m[0]);
      if (t) out.add(t);
    }
  }
}

/** Adds `by` to the document frequency of each distinct term of the doc (concept terms too), as the index tokenises and normalises it. */
function countTerms(df: Map<string, number>, doc: SearchDoc, by: 1 | -1, synonyms: SynonymSet): void {
  const terms = new Set<string>();
  for (const field of FIELDS) {
    for (const token of docTokens(fieldText(doc, field), synonyms)) {
      const t = processDocTerm(token);
      if (t) terms.add(t);
    }
  }
  for (const t of terms) {
    const n = (df.get(t) ?? 0) + by;
    if (n > 0) df.set(t, n);
    else df.delete(t);
  }
}
