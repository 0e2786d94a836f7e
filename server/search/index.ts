/**
 * The full-text index (issue 6): the current published version of every entry
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
 *
 * Issue 16: scored by our own engine (engine.ts: minisearch's BM25+ figures over flat posting
 * lists and typed-array accumulators, fuzzy expansion bounded); a build works in slices that
 * yield to the event loop, so the server answers while it builds: a rebuild from the old index,
 * the first build from the entries indexed so far, flagged `partial` (see search()).
 */
import type { Logger } from 'pino';
import { Engine, FUZZY_WEIGHT, type RawResults } from './engine';
import { findEntryId, loadEntries, loadPublishedIds, loadSynonyms, readWatermark, type LoadedEntry } from './load';
import { fold, normaliseTerm } from './normalise';
import { isConceptTerm, SynonymSet, tokensOf } from './synonyms';
import type { IndexedEntry, SearchDoc, SearchHit, TermsHit, TermsSearchOptions } from './types';

export { excerpt } from './excerpt';
export { SIGHTINGS_PER_ENTRY } from './load';
export type { IndexedEntry, SearchDoc, SearchHit, TermsHit, TermsSearchOptions } from './types';

/** Entries added to the index between two yields to the event loop while it builds. */
const BUILD_SLICE = 250;
/** Entries read from the database at a time by the first build (each slice is searchable at once). */
const READ_PAGE = 1000;

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

/** A document's fields as the engine takes them: tokens as split (a field's length is their distinct count) and the terms they give. */
function docFields(doc: SearchDoc, synonyms: SynonymSet): { tokens: string[]; terms: (string | null)[] }[] {
  return FIELDS.map((field) => {
    const tokens = docTokens(fieldText(doc, field), synonyms);
    return { tokens, terms: tokens.map(processDocTerm) };
  });
}

/** Everything one build of the index holds; a rebuild makes a new one and swaps it in when done. */
class IndexState {
  readonly engine = new Engine(FIELDS.map((f) => BOOST[f]));
  readonly docs = new Map<number, SearchDoc>();
  readonly entries = new Map<number, IndexedEntry>();
  /** Internal number of the engine → entry. */
  readonly byNumber: (IndexedEntry | undefined)[] = [];
  /** Internal number → each field's distinct terms (to tell which terms a claim's hit matched where). */
  readonly fieldTerms: (string[][] | undefined)[] = [];
  /** Normalised term → number of indexed entries that hold it in any field. */
  readonly df = new Map<string, number>();
  /**
   * The one- and two-letter terms a query may search for: the words of the synonym groups' phrases
   * ("RF", the "Q" of "loaded Q") and the abbreviations the entries write in capitals ("EM", "DC").
   * Any other short word of a query is a stray fragment and is left out.
   */
  readonly shortTerms: Set<string>;
  /** Scored hits of single words (see query()); emptied whenever the index changes. */
  readonly wordCache = new Map<string, WordHits>();
  /** Hits held in the word cache in all (bounds its memory). */
  wordCacheHits = 0;
  /** Dense accumulators of a search for any word (SearchIndex.anyWord), by internal number, reused. */
  orScore = new Float64Array(0);
  orCount = new Uint16Array(0);
  orSeen = new Int32Array(0);
  orDirect = new Int32Array(0);
  orEpoch = 0;
  /** Every entry, newest first (the answer to a blank query), made when first asked for. */
  newest: IndexedEntry[] | null = null;
  /** The entries of each mechanism class (exactly that class), oldest first, made when first asked for. */
  byClass: Map<string, IndexedEntry[]> | null = null;
  /** The internal numbers of newest, beside it. */
  newestNumbers: Int32Array | null = null;
  /** Per internal number: the entry's laws and its class (-1: none) as small numbers, for counting facets. */
  readonly facetLaws: number[][] = [];
  readonly facetClass: number[] = [];
  /** Law and class slugs ↔ those numbers. */
  readonly lawIds = new Map<string, number>();
  readonly lawSlugs: string[] = [];
  readonly classIds = new Map<string, number>();
  readonly classSlugs: string[] = [];
  /** Index term → the word an entry writes for it, per entry (readerWords), made when first asked for. */
  readonly forms = new Map<number, Map<string, string>>();

  constructor(readonly syn: SynonymSet) {
    this.shortTerms = shortTermsOf(syn);
  }

  add({ doc, entry }: LoadedEntry): void {
    const fields = docFields(doc, this.syn);
    const distinct = this.engine.add(doc.id, fields);
    countTerms(this.df, distinct, 1);
    addShortTerms(this.shortTerms, doc);
    this.docs.set(doc.id, doc);
    this.entries.set(entry.id, entry);
    this.byNumber.push(entry);
    this.fieldTerms.push(distinct);
    this.facetLaws.push(entry.laws.map((l) => this.lawId(l)));
    this.facetClass.push(entry.mechanismClass === null ? -1 : this.classId(entry.mechanismClass));
    this.changed();
  }

  remove(id: number): void {
    const doc = this.docs.get(id);
    if (!doc) return;
    const fields = docFields(doc, this.syn);
    // Internal numbers are never reused: the removed one maps to nothing.
    const n = this.engine.numberOf(id);
    if (n !== undefined) {
      this.byNumber[n] = undefined;
      this.fieldTerms[n] = undefined;
    }
    this.engine.remove(id, fields);
    countTerms(
      this.df,
      fields.map((f) => f.terms.filter((t): t is string => t !== null)),
      -1,
    );
    this.docs.delete(id);
    this.entries.delete(id);
    this.changed();
  }

  lawId(slug: string): number {
    let id = this.lawIds.get(slug);
    if (id === undefined) {
      this.lawIds.set(slug, (id = this.lawSlugs.length));
      this.lawSlugs.push(slug);
    }
    return id;
  }

  classId(slug: string): number {
    let id = this.classIds.get(slug);
    if (id === undefined) {
      this.classIds.set(slug, (id = this.classSlugs.length));
      this.classSlugs.push(slug);
    }
    return id;
  }

  private changed(): void {
    this.wordCache.clear();
    this.wordCacheHits = 0;
    this.newest = null;
    this.newestNumbers = null;
    this.byClass = null;
    this.forms.clear();
  }
}

export interface SearchIndexOptions {
  /** How often the watermark is checked (ms); 0 never. */
  refreshMs: number;
  logger?: Logger;
  /**
   * Searches wait for a first build of at most this many entries (a moment's work: their answer
   * is then complete); a larger library is searched at once, its answer covering the entries
   * indexed so far and flagged partial (default WAIT_BELOW; 0 never waits).
   */
  waitBelow?: number;
}

/** Default of SearchIndexOptions.waitBelow: a first build of this many entries takes a few tenths of a second. */
export const WAIT_BELOW = 1000;

/** What GET /api/search asks of the index (SearchIndex.search). */
export interface SearchRequest {
  q: string;
  /** Only entries that break this law. */
  law?: string;
  /** Only entries of this class or below it. */
  mechanism?: string;
  offset: number;
  limit: number;
}

export interface SearchPage {
  total: number;
  /** The hits from offset, at most limit, ranked. */
  hits: SearchHit[];
  /** Counts over the hits of q, each ignoring its own filter; a class counts the classes below it too. */
  facets: { laws: Record<string, number>; mechanisms: Record<string, number> };
  /** True while the first build after a start is under way: the hits are those of the entries indexed so far. */
  partial: boolean;
}

export class SearchIndex {
  private state = new IndexState(new SynonymSet());
  /** Law slug → name; mechanism slug → { name, parent slug }. */
  laws = new Map<string, string>();
  classes = new Map<string, { name: string; parent: string | null }>();
  private watermark = '';
  private building: Promise<void> | null = null;
  private built = false;
  private timer: NodeJS.Timeout | undefined;
  private ticking = false;
  /** The build or update under way: the next one waits for it. */
  private queue: Promise<unknown> = Promise.resolve();

  /** Entries the first build reads (null until it knows). */
  private expected: number | null = null;
  /** Resolves when the first build knows how many entries it reads (or has failed). */
  private sized: Promise<void>;
  private onSized: () => void = () => {};

  constructor(private readonly opts: SearchIndexOptions) {
    this.sized = new Promise((resolve) => (this.onSized = resolve));
  }

  /**
   * What a search waits for before it reads the index: nothing once it is built, or while a
   * large first build is under way (the answer is partial, see search()); else the first build.
   */
  async searchable(): Promise<void> {
    const limit = this.opts.waitBelow ?? WAIT_BELOW;
    if (this.built || limit <= 0) return;
    const small = () => this.expected === null || this.expected <= limit;
    if (!small()) return;
    const build = this.ready();
    await Promise.race([build, this.sized]);
    if (!this.built && small()) await build;
  }

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
    this.building ??= this.serial(() => this.firstBuild()).finally(() => (this.building = null));
    await this.building;
  }

  /** Whether the first build has finished (until then searches answer from the entries indexed so far). */
  get isReady(): boolean {
    return this.built;
  }

  private tickP: Promise<void> | null = null;

  private tick(): Promise<void> {
    if (this.tickP) return this.tickP;
    this.tickP = this.refresh().finally(() => (this.tickP = null));
    return this.tickP;
  }

  private async refresh(): Promise<void> {
    if (this.ticking || !this.built) return;
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
    return this.state.syn;
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

  /**
   * The first build: entries read a page at a time and added to the live index in slices, so
   * that searches meanwhile answer from what is indexed so far (flagged partial).
   */
  private async firstBuild(): Promise<void> {
    if (this.built) return;
    const mark = await readWatermark();
    const syn = await loadSynonyms();
    const state = new IndexState(syn);
    this.state = state;
    let ids: number[];
    try {
      ids = await loadPublishedIds();
    } finally {
      // A failed read lets waiting searches go on to ready(), which fails them or tries again.
      this.onSized();
    }
    this.expected = ids.length;
    for (let i = 0; i < ids.length; i += READ_PAGE) {
      const loaded = await this.load(ids.slice(i, i + READ_PAGE));
      await addInSlices(state, loaded);
    }
    if (!ids.length) await this.load([]);
    this.watermark = mark;
    this.built = true;
  }

  /** Builds the whole index again from the database (also after a change of the synonym groups); the old one answers meanwhile. */
  rebuild(): Promise<void> {
    return this.serial(() => this.doRebuild());
  }

  private async doRebuild(): Promise<void> {
    const mark = await readWatermark();
    const syn = await loadSynonyms();
    const loaded = await this.load();
    const state = new IndexState(syn);
    await addInSlices(state, loaded);
    this.state = state;
    this.watermark = mark;
    this.built = true;
  }

  /** Builds the index at once from entries already read (for benches: the build without the database). */
  install(loaded: LoadedEntry[], syn: SynonymSet, names?: { laws: Map<string, string>; classes: Map<string, { name: string; parent: string | null }> }): void {
    const state = new IndexState(syn);
    for (const l of loaded) state.add(l);
    if (names) {
      this.laws = names.laws;
      this.classes = names.classes;
    }
    this.state = state;
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
    const state = this.state;
    state.remove(id);
    for (const l of loaded) state.add(l);
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
      if (term.length < MIN_WORD && !this.state.shortTerms.has(term)) continue;
      out.push({ typed, term });
    }
    return out;
  }

  /**
   * The hits of q, unranked: each entry's internal number, score and (through the word lists) its
   * matched terms; null for a blank query (every entry). Every word must match (AND), falling
   * back to any word (OR) when that finds nothing. Only the last word matches as a prefix (it is
   * the one still being typed), and only a word that is not in the index's vocabulary is matched
   * fuzzily, within an edit distance of about a third of its length (at most 2), so that a swapped
   * or dropped letter is forgiven and a correct word does not fan out over its neighbours.
   *
   * Each word is searched on its own and its scored hits are kept in a small cache (common words
   * recur from query to query); the words' hits are then intersected from the shortest list,
   * their scores summed and multiplied by the number of words matched.
   */
  private hits(q: string): { numbers: number[]; scores: number[]; lists: WordHits[] } | null {
    if (!/[\p{L}\p{N}]/u.test(q)) return null;
    // Split as the index splits ("zero-point" is two words), then normalised as the index normalises.
    const words = this.queryWords(q);
    if (!words.length) return { numbers: [], scores: [], lists: [] };
    const lists = words.map((w, i) => this.wordHits(w.term, i === words.length - 1, w.typed));
    const combine = (candidates: Iterable<number>, need: number) => {
      const numbers: number[] = [];
      const scores: number[] = [];
      for (const n of candidates) {
        let score = 0;
        let matched = 0;
        for (const list of lists) {
          const at = list.find(n);
          if (at < 0) continue;
          score += list.scores[at];
          matched += 1;
        }
        if (matched >= need && this.state.byNumber[n]) {
          numbers.push(n);
          scores.push(score * matched);
        }
      }
      return { numbers, scores, lists };
    };
    const shortest = lists.reduce((a, b) => (b.numbers.length < a.numbers.length ? b : a));
    const all = combine(shortest.numbers, lists.length);
    if (all.numbers.length) return all;
    // Any word, but only an entry that holds one of them as typed (or as the start of a word): a
    // word reached only through a typing error does not carry a hit alone ("hello world" → "would").
    return this.anyWord(lists);
  }

  /**
   * The hits of any of the words' lists (see hits()), summed in one pass over the lists in dense
   * accumulators (the lists are long when a word matched nothing and the others are common).
   */
  private anyWord(lists: WordHits[]): { numbers: number[]; scores: number[]; lists: WordHits[] } {
    const state = this.state;
    const size = state.byNumber.length;
    if (state.orScore.length < size) {
      state.orScore = new Float64Array(size);
      state.orCount = new Uint16Array(size);
      state.orSeen = new Int32Array(size);
      state.orDirect = new Int32Array(size);
      state.orEpoch = 0;
    }
    const { orScore, orCount, orSeen, orDirect } = state;
    const epoch = ++state.orEpoch;
    let reached = 0;
    for (const list of lists) {
      const { numbers, scores, fuzzy } = list;
      for (let i = 0; i < numbers.length; i++) {
        const n = numbers[i];
        if (orSeen[n] !== epoch) {
          orSeen[n] = epoch;
          orScore[n] = 0;
          orCount[n] = 0;
        }
        orScore[n] += scores[i];
        orCount[n] += 1;
        if (!fuzzy[i] && orDirect[n] !== epoch) {
          orDirect[n] = epoch;
          reached++;
        }
      }
    }
    const candidates = new Int32Array(reached);
    let k = 0;
    for (const list of lists) {
      const { numbers, fuzzy } = list;
      for (let i = 0; i < numbers.length; i++) {
        const n = numbers[i];
        if (!fuzzy[i] && orDirect[n] === epoch) {
          orDirect[n] = -epoch;
          candidates[k++] = n;
        }
      }
    }
    candidates.sort();
    const numbers: number[] = [];
    const scores: number[] = [];
    for (let i = 0; i < candidates.length; i++) {
      const n = candidates[i];
      if (!state.byNumber[n]) continue;
      numbers.push(n);
      scores.push(orScore[n] * orCount[n]);
    }
    return { numbers, scores, lists };
  }

  /** The hit of internal number n with its matched terms (the union over the words' lists). */
  private hitOf(n: number, score: number, lists: WordHits[]): SearchHit {
    const terms: string[] = [];
    for (const list of lists) {
      const at = list.find(n);
      if (at < 0) continue;
      for (const t of list.terms(at)) if (!terms.includes(t)) terms.push(t);
    }
    return { entry: this.state.byNumber[n]!, score, terms };
  }

  /** The entries of exactly this mechanism class (not its children), oldest first. */
  entriesOfClass(slug: string): readonly IndexedEntry[] {
    const state = this.state;
    if (!state.byClass) {
      const byClass = new Map<string, IndexedEntry[]>();
      for (const e of [...state.entries.values()].sort((a, b) => a.id - b.id)) {
        if (e.mechanismClass === null) continue;
        const list = byClass.get(e.mechanismClass);
        if (list) list.push(e);
        else byClass.set(e.mechanismClass, [e]);
      }
      state.byClass = byClass;
    }
    return state.byClass.get(slug) ?? [];
  }

  /** Every entry, newest first (a blank query). */
  private newestEntries(): IndexedEntry[] {
    const state = this.state;
    return (state.newest ??= [...state.entries.values()].sort((a, b) => b.publishedAt - a.publishedAt || b.id - a.id));
  }

  private newest(): SearchHit[] {
    return this.newestEntries().map((entry) => ({ entry, score: 0, terms: [] }));
  }

  /** Ranked hits for q (all entries, newest first, when q is blank; none when q holds no word the index searches for, see queryWords). */
  query(q: string): SearchHit[] {
    const found = this.hits(q);
    if (!found) return this.newest();
    const order = found.numbers.map((_, i) => i);
    const byNumber = this.state.byNumber;
    order.sort((a, b) => found.scores[b] - found.scores[a] || byNumber[found.numbers[a]]!.id - byNumber[found.numbers[b]]!.id);
    return order.map((i) => this.hitOf(found.numbers[i], found.scores[i], found.lists));
  }

  /**
   * What GET /api/search answers: the number of hits of q under the filters, one page of them
   * ranked (only the page is sorted and given its terms), and the facet counts, each ignoring its
   * own filter (a class counts the entries of the classes below it too, as choosing it lists them).
   */
  search(req: SearchRequest): SearchPage {
    const found = this.hits(req.q);
    const state = this.state;
    const byNumber = state.byNumber;
    const blank = found ? null : this.newestEntries();
    const numbers = found ? found.numbers : (state.newestNumbers ??= Int32Array.from(blank!, (e) => state.engine.numberOf(e.id)!));
    const count = numbers.length;
    // Laws and classes counted as small numbers, then named in the order first counted.
    const classes = req.mechanism ? this.classAndChildren(req.mechanism) : null;
    const wantLaw = req.law ? (state.lawIds.get(req.law) ?? -2) : -1;
    const inClasses = classes ? new Uint8Array(state.classSlugs.length) : null;
    if (inClasses) for (const s of classes!) if (state.classIds.has(s)) inClasses[state.classIds.get(s)!] = 1;
    // Each class with those above it (which may add numbers for classes no entry has).
    const lineage: number[][] = [];
    for (let c = 0; c < state.classSlugs.length; c++) lineage.push(this.classAndAncestors(state.classSlugs[c]).map((s) => state.classId(s)));
    const lawCount = new Int32Array(state.lawSlugs.length);
    const classCount = new Int32Array(state.classSlugs.length);
    const lawOrder: number[] = [];
    const classOrder: number[] = [];
    const kept: number[] = [];
    const { facetLaws, facetClass } = state;
    for (let i = 0; i < count; i++) {
      const n = numbers[i];
      const ls = facetLaws[n];
      const cls = facetClass[n];
      const byLaw = wantLaw === -1 || ls.includes(wantLaw);
      const byClass = !inClasses || (cls >= 0 && inClasses[cls] === 1);
      if (byClass) for (const l of ls) if (lawCount[l]++ === 0) lawOrder.push(l);
      if (byLaw && cls >= 0) for (const c of lineage[cls]) if (classCount[c]++ === 0) classOrder.push(c);
      if (byLaw && byClass) kept.push(i);
    }
    const laws: Record<string, number> = {};
    for (const l of lawOrder) laws[state.lawSlugs[l]] = lawCount[l];
    const mechanisms: Record<string, number> = {};
    for (const c of classOrder) mechanisms[state.classSlugs[c]] = classCount[c];
    const end = req.offset + req.limit;
    let hits: SearchHit[];
    if (!found) {
      // Blank query: already newest first.
      hits = kept.slice(req.offset, end).map((i) => ({ entry: blank![i], score: 0, terms: [] }));
    } else {
      // Best first, ties by id; only the first `end` are needed, and only the page gets its terms.
      const better = (a: number, b: number) => found.scores[b] - found.scores[a] || byNumber[found.numbers[a]]!.id - byNumber[found.numbers[b]]!.id;
      hits = topK(kept, end, better)
        .slice(req.offset, end)
        .map((i) => this.hitOf(found.numbers[i], found.scores[i], found.lists));
    }
    return { total: kept.length, hits, facets: { laws, mechanisms }, partial: !this.built };
  }

  /**
   * The matched words of a hit as a reader should see them, never a stem ("microwav"): each index
   * term the hit matched as the reader typed it, when a word of the query normalises to it
   * ("thrusters"), else as the entry writes it (a prefix or a typing error reached it:
   * "microw" → "microwave"), in lower case unless the entry only ever writes it with capitals
   * ("Carnot", "RF"). Concept terms are left out; duplicates are dropped.
   */
  readerWords(hit: SearchHit, q: string): string[] {
    return this.readerWordsOf(hit, this.typedWords(q));
  }

  /** readerWords of each hit of a page, the query's words worked out once. */
  readerWordsOfPage(hits: readonly SearchHit[], q: string): string[][] {
    const typed = this.typedWords(q);
    return hits.map((h) => this.readerWordsOf(h, typed));
  }

  /** Index term → the query's word for it, as typed (the first one typed). */
  private typedWords(q: string): Map<string, string> {
    const typed = new Map<string, string>();
    for (const { typed: word, term } of this.queryWords(q)) if (!typed.has(term)) typed.set(term, word);
    return typed;
  }

  private readerWordsOf(hit: SearchHit, typed: Map<string, string>): string[] {
    const terms = hit.terms.filter((t) => !isConceptTerm(t));
    const rest = terms.filter((t) => !typed.has(t));
    const forms = rest.length ? this.writtenForms(hit.entry.id, rest) : new Map<string, string>();
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
   * a title or a name ("Overbalanced wheel"), in lower case. Each entry's forms are worked out
   * once, for all its terms, and kept until the index changes (a bounded number of entries).
   */
  private writtenForms(id: number, terms: string[]): Map<string, string> {
    const state = this.state;
    let forms = state.forms.get(id);
    if (!forms) {
      const doc = state.docs.get(id);
      if (!doc) return new Map();
      const found = new Map<string, { word: string; rank: number }>();
      for (const field of FIELDS) {
        const text = fieldText(doc, field);
        for (const { token, at } of tokensOf(text)) {
          const t = normaliseTerm(token);
          if (!t) continue;
          const had = found.get(t);
          if (had?.rank === 0) continue;
          const lower = token.toLowerCase();
          // 0: in lower case; 1: capitals inside a sentence; 2: a capital at a sentence's start.
          const rank = token === lower ? 0 : /^\p{Lu}\p{Ll}*$/u.test(token) && SENTENCE_START.test(text.slice(Math.max(0, at - 3), at)) ? 2 : 1;
          if (!had || rank < had.rank) found.set(t, { word: rank === 2 ? lower : token, rank });
        }
      }
      forms = new Map([...found].map(([t, f]) => [t, f.word]));
      if (state.forms.size >= FORMS_CACHE_SIZE) state.forms.delete(state.forms.keys().next().value!);
      state.forms.set(id, forms);
    }
    return new Map(terms.filter((t) => forms.has(t)).map((t) => [t, forms.get(t)!]));
  }

  /**
   * One word's scored hits (entries, scores and the index terms it matched), through the cache. A
   * term reached through a typing error must begin with the word's first letter (people seldom
   * mistype it, and "lorem" → "more" is no slip); an entry that only such terms reached is a
   * fuzzy hit.
   */
  private wordHits(word: string, last: boolean, typed: string = word): WordHits {
    const state = this.state;
    // A word of one or two letters (a known short term) matches only itself: as a prefix it would fan out.
    const prefix = last && word.length >= MIN_WORD;
    const known = state.df.has(word);
    // A word the index lacks is also tried with letters swapped, which depends on how it was typed.
    const key = `${prefix ? 'prefix' : 'exact'}:${word}${known ? '' : `:${fold(typed)}`}`;
    const cached = state.wordCache.get(key);
    if (cached) {
      state.wordCache.delete(key); // most recently used last
      state.wordCache.set(key, cached);
      return cached;
    }
    const fuzzy = known ? 0 : fuzzyDistance(word);
    // A word the index lacks (4 letters or more) is also tried with two neighbouring letters
    // swapped: one slip, not the two edits an edit distance counts, so at a fuzzy weight of one edit.
    const swaps = !known && word.length >= 4 ? swapped(typed).filter((v) => v !== word) : [];
    const r = state.engine.search(
      [{ term: word, prefix, fuzzy, boost: 1, alternatives: swaps, alternativeWeight: FUZZY_WEIGHT * (word.length / (word.length + 1)) }],
      { ascending: true },
    );
    const hits = wordHitsOf(r, state.fieldTerms);
    state.wordCache.set(key, hits);
    state.wordCacheHits += hits.numbers.length;
    while (state.wordCache.size > WORD_CACHE_SIZE || state.wordCacheHits > WORD_CACHE_HITS) {
      const [oldest, dropped] = state.wordCache.entries().next().value!;
      state.wordCache.delete(oldest);
      state.wordCacheHits -= dropped.numbers.length;
    }
    return hits;
  }

  /**
   * Ranked hits for query terms that are already normalised (normaliseTerm), each searched once
   * with these options over the index's field boosts (the claim matcher's way in; GET /api/search
   * uses search()). The score is BM25+ as minisearch gives it: the sum over terms and fields,
   * times the number of distinct query terms matched. With `atLeast`, hits whose sum (the score
   * divided by that number) is below it are left out before their matches are worked out.
   */
  searchTerms(terms: string[], options: TermsSearchOptions = {}): TermsHit[] {
    const found = this.searchTermsLazily(terms, options);
    const out: TermsHit[] = [];
    for (let i = 0; i < found.length; i++) out.push(found.hit(i));
    return out.sort((a, b) => b.score - a.score);
  }

  /**
   * searchTerms' hits before their matches are worked out: entry and score of each (unranked,
   * `atLeast` applied), and the whole hit on demand (its matched terms and fields, found by a
   * look-up in each matched term's posting lists). The claim matcher works out only the hits it
   * may keep. Read it before the index changes.
   */
  searchTermsLazily(terms: string[], options: TermsSearchOptions = {}): LazyTermsHits {
    const state = this.state;
    if (!terms.length) return { length: 0, entry: () => undefined as never, score: () => 0, matched: () => 0, hit: () => undefined as never };
    const { prefix = false, boostTerm, atLeast } = options;
    const r = state.engine.search(
      terms.map((term) => ({ term, prefix: typeof prefix === 'function' ? prefix(term) : prefix, fuzzy: 0, boost: boostTerm ? boostTerm(term) : 1 })),
    );
    let derivedAt: Map<string, number> | undefined;
    const kept: number[] = [];
    for (let i = 0; i < r.docs.length; i++) {
      if (!state.byNumber[r.docs[i]]) continue;
      if (atLeast !== undefined && r.scores[i] / Math.max(1, r.matched[i]) < atLeast) continue;
      kept.push(i);
    }
    return {
      length: kept.length,
      entry: (k) => state.byNumber[r.docs[kept[k]]]!,
      score: (k) => r.scores[kept[k]],
      matched: (k) => r.matched[kept[k]],
      hit: (k) => {
        const i = kept[k];
        const n = r.docs[i];
        // The entry's own terms looked up among those searched (fewer than the other way round),
        // then put in the order scored: by term searched, then by field.
        derivedAt ??= new Map(r.derived.map((t, ti) => [t, ti]));
        const pairs: number[] = [];
        const own = state.fieldTerms[n] ?? [];
        for (let f = 0; f < own.length; f++) {
          for (const t of own[f]) {
            const ti = derivedAt.get(t);
            if (ti !== undefined) pairs.push(ti * FIELDS.length + f);
          }
        }
        pairs.sort((a, b) => a - b);
        const match: Record<string, string[]> = {};
        const queryTerms: string[] = [];
        for (const p of pairs) {
          const ti = Math.floor(p / FIELDS.length);
          const t = r.derived[ti];
          (match[t] ??= []).push(FIELDS[p % FIELDS.length]);
          const q = terms[r.source[ti]];
          if (!queryTerms.includes(q)) queryTerms.push(q);
        }
        return { entry: state.byNumber[n]!, score: r.scores[i], terms: Object.keys(match), queryTerms, match };
      },
    };
  }

  /** How many indexed entries hold this normalised term in any field. */
  documentFrequency(term: string): number {
    return this.state.df.get(term) ?? 0;
  }

  get size(): number {
    return this.state.entries.size;
  }
}

/** Adds entries to an index state in slices, yielding to the event loop between them. */
async function addInSlices(state: IndexState, loaded: LoadedEntry[]): Promise<void> {
  for (let i = 0; i < loaded.length; i += BUILD_SLICE) {
    for (const l of loaded.slice(i, i + BUILD_SLICE)) {
      state.remove(l.doc.id);
      state.add(l);
    }
    await new Promise<void>((resolve) => setImmediate(resolve));
  }
}

/** searchTerms' hits, their matches worked out on demand (SearchIndex.searchTermsLazily). */
export interface LazyTermsHits {
  length: number;
  entry(i: number): IndexedEntry;
  score(i: number): number;
  /** How many of the query terms it matched. */
  matched(i: number): number;
  hit(i: number): TermsHit;
}

/** How many entries' written forms (readerWords) are kept. */
const FORMS_CACHE_SIZE = 2000;

/**
 * One word's hits: internal numbers ascending, each with its score and whether only a typing
 * error reached it; the index terms each matched are worked out on demand (only a page's hits
 * need them).
 */
interface WordHits {
  numbers: Int32Array;
  scores: Float64Array;
  fuzzy: Uint8Array;
  /** Position of internal number n in numbers, or -1. */
  find(n: number): number;
  /** The index terms the hit at this position matched, in the order scored. */
  terms(at: number): string[];
}

/** A word's hits from one engine search (its documents in ascending order). */
function wordHitsOf(r: RawResults, fieldTerms: readonly (string[][] | undefined)[]): WordHits {
  const numbers = r.docs;
  const fuzzy = r.direct.map((d) => 1 - d);
  // The terms reached, each once, in the order scored.
  const derived = [...new Set(r.derived)];
  let order: Map<string, number> | undefined;
  const only = derived.length === 1 ? [derived[0]] : null;
  return {
    numbers,
    scores: r.scores,
    fuzzy,
    find(n) {
      let lo = 0;
      let hi = numbers.length;
      while (lo < hi) {
        const mid = (lo + hi) >>> 1;
        if (numbers[mid] < n) lo = mid + 1;
        else hi = mid;
      }
      return lo < numbers.length && numbers[lo] === n ? lo : -1;
    },
    terms(at) {
      if (only) return only;
      // The document's own terms looked up among those reached (a hit holds a term it matched in one of its fields).
      order ??= new Map(derived.map((t, i) => [t, i]));
      const found: number[] = [];
      for (const field of fieldTerms[numbers[at]] ?? []) {
        for (const t of field) {
          const i = order.get(t);
          if (i !== undefined && !found.includes(i)) found.push(i);
        }
      }
      return found.sort((x, y) => x - y).map((i) => derived[i]);
    },
  };
}

/** The first k of the items, best first by `better` (a partial selection: the rest are never sorted). */
function topK<T>(items: T[], k: number, better: (a: T, b: T) => number): T[] {
  if (k <= 0) return [];
  if (items.length <= k || items.length <= 64) return [...items].sort(better).slice(0, k);
  // Keep the k best in a sorted buffer; most items fall below its last and cost one comparison.
  const best: T[] = [];
  for (const h of items) {
    if (best.length === k && better(h, best[k - 1]) >= 0) continue;
    let lo = 0;
    let hi = best.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (better(best[mid], h) <= 0) lo = mid + 1;
      else hi = mid;
    }
    best.splice(lo, 0, h);
    if (best.length > k) best.pop();
  }
  return best;
}

/** Splits text as the index always has (minisearch's default tokenizer: spaces and punctuation). */
const SPACE_OR_PUNCTUATION = /[\n\r\p{Z}\p{P}]+/u;
const tokenize = (text: string): string[] => text.split(SPACE_OR_PUNCTUATION);

/**
 * How many edits a word not in the index may be from an index term: none below 4 letters, one up
 * to 7, two from 8 (its normalised form counted). Closer than minisearch's usual third of the
 * length, which let five letters in two edits reach words that were never meant ("world" → "work",
 * "pqrst" → "part"); a swap of two letters is found apart (swapped()).
 */
const fuzzyDistance = (word: string): number => (word.length < 4 ? 0 : word.length < 8 ? 1 : 2);

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

/** Adds `by` to the document frequency of each distinct term of a doc's fields (concept terms too). */
function countTerms(df: Map<string, number>, fields: readonly (readonly string[])[], by: 1 | -1): void {
  const terms = new Set<string>();
  for (const f of fields) for (const t of f) terms.add(t);
  for (const t of terms) {
    const n = (df.get(t) ?? 0) + by;
    if (n > 0) df.set(t, n);
    else df.delete(t);
  }
}
