/**
 * The scoring core of the full-text index (issue 16): per-field posting lists in plain arrays and
 * one set of dense accumulators (typed arrays the size of the library), so that a query term
 * costs a few nanoseconds per posting and allocates nothing per document.
 *
 * It scores exactly as minisearch 7 did (the index used it until issue 16; the claim matcher's
 * thresholds and the search tests were tuned on its figures): BM25+ per field (k 1.2, b 0.7,
 * d 0.5) with the field's own document frequency and average length, a field's length counted as
 * its distinct tokens, each field's score times its boost, a prefix expansion weighted
 * 0.375 · len / (len + 0.3 · extra letters), a fuzzy one 0.45 · len / (len + distance), and a
 * document's total times the number of distinct query terms it matched. What it adds: fuzzy
 * expansion is bounded (only terms that begin with the word's first letter, found by an
 * edit-distance check banded to the distance allowed) and the vocabulary is kept sorted for
 * prefix expansion (a binary search instead of a tree walk).
 *
 * For the slow tail (issue 16): a posting list, once searched, keeps its documents as a typed
 * array and each one's impact (the BM25+ figure before the weights) until the index changes, so a
 * later search multiplies and adds; the first query term is added straight to the totals; a
 * search returns typed arrays (in ascending order on demand, from one pass over the marks when
 * most documents were reached) and which documents an exact or prefix expansion reached, instead
 * of a log per posting. The sums are the same, in the same order: scores do not change.
 */

/** minisearch's defaults (BM25+ parameters and the weights of expanded terms). */
const K = 1.2;
const B = 0.7;
const D = 0.5;
export const PREFIX_WEIGHT = 0.375;
export const FUZZY_WEIGHT = 0.45;

interface Posting {
  /** Internal document numbers, ascending. */
  docs: number[];
  /** Term frequency in the field, beside docs. */
  tfs: number[];
  /**
   * The list as searched, made when first searched and kept while the engine is unchanged: the
   * documents in a typed array and each one's impact, its BM25+ figure before the weights
   * (idf · (d + tf · (k + 1) / (tf + k · (1 − b + b · length / average length)))).
   */
  scored?: { version: number; docs: Int32Array; impacts: Float64Array };
}

interface TermData {
  /** Per field (null where the term is not in that field). */
  fields: (Posting | null)[];
}

/** One query term: searched exactly, and as a prefix and within an edit distance when asked. */
export interface TermQuery {
  term: string;
  prefix: boolean;
  /** Largest edit distance (0: none); only terms with the query term's first letter are tried. */
  fuzzy: number;
  /** Multiplies the term's scores. */
  boost: number;
  /**
   * Other index terms scored on their own after the term's expansions, each one's total (over its
   * fields, at weight 1) times `alternativeWeight` added to the document's total for this query
   * term; they reach documents as fuzzy ones do (not direct). The word with two letters swapped.
   */
  alternatives?: readonly string[];
  alternativeWeight?: number;
}

/**
 * The outcome of one search: the documents reached, their score, matched query terms and whether
 * an exact or prefix expansion reached them. Its arrays are its own (the accumulators are copied).
 */
export interface RawResults {
  /** Internal numbers of the documents reached: in the order first reached, or ascending (search's `ascending`). */
  docs: Int32Array;
  /** Score of each (the sum over terms and fields times the number of query terms matched), beside docs. */
  scores: Float64Array;
  /** How many distinct query terms each matched, beside docs. */
  matched: Uint16Array;
  /** 1 where an exact or prefix expansion reached the document, 0 where only fuzzy ones and alternatives did, beside docs. */
  direct: Uint8Array;
  /** The index terms reached (exact, expanded, alternatives), in the order scored (a term reached from two query terms is there twice). */
  derived: string[];
  /** Which query term each derived term came from (position in the queries), beside derived. */
  source: number[];
}

export class Engine {
  readonly fieldCount: number;
  private terms = new Map<string, TermData>();
  /** Internal number → external id (-1 once removed). */
  private ids: number[] = [];
  private numberOf_ = new Map<number, number>();
  /** Per field, per internal number: distinct tokens. */
  private lengths: number[][];
  private avg: number[];
  private count = 0;
  /** Sorted vocabulary (prefix expansion) and by first letter (fuzzy expansion); rebuilt when the vocabulary changes. */
  private sorted: string[] | null = null;
  private byFirst: Map<string, { terms: string[]; masks: Int32Array }> | null = null;
  // Accumulators, the size of the internal numbers, reused by every search.
  private acc = new Float64Array(0);
  private termAcc = new Float64Array(0);
  private seen = new Int32Array(0);
  private termSeen = new Int32Array(0);
  private quality = new Uint16Array(0);
  /** Marks (the search's epoch) of the documents an exact or prefix expansion reached. */
  private directSeen = new Int32Array(0);
  /** The documents reached in this search, in order (nReached of them). */
  private reached = new Int32Array(0);
  private nReached = 0;
  /** The documents the current query term reached (nTouched of them). */
  private touched = new Int32Array(0);
  private nTouched = 0;
  private epoch = 0;
  /** Marks of one query term's total (termSeen). */
  private stamp = 0;
  /** Counts the changes (adds, removes): a posting list's impacts hold for the version they were worked out for. */
  private version = 0;

  constructor(private readonly boosts: readonly number[]) {
    this.fieldCount = boosts.length;
    this.lengths = boosts.map(() => []);
    this.avg = boosts.map(() => 0);
  }

  get size(): number {
    return this.count;
  }

  has(id: number): boolean {
    return this.numberOf_.has(id);
  }

  /** The internal number of an external id. */
  numberOf(id: number): number | undefined {
    return this.numberOf_.get(id);
  }

  /** The external id of an internal number. */
  idOf(n: number): number {
    return this.ids[n];
  }

  /** Whether the index holds this term in any field. */
  hasTerm(term: string): boolean {
    return this.terms.has(term);
  }

  /**
   * Adds a document: for each field, its tokens as split (their distinct count is the field's
   * length) and the index terms they give (null: left out). Returns each field's distinct terms.
   */
  add(id: number, fields: { tokens: readonly string[]; terms: readonly (string | null)[] }[]): string[][] {
    if (this.numberOf_.has(id)) throw new Error(`search engine: duplicate id ${id}`);
    const n = this.ids.length;
    this.version++;
    this.ids.push(id);
    this.numberOf_.set(id, n);
    const c = this.count;
    const distinct: string[][] = [];
    for (let f = 0; f < this.fieldCount; f++) {
      const { tokens, terms } = fields[f];
      const length = new Set(tokens).size;
      this.lengths[f][n] = length;
      this.avg[f] = (this.avg[f] * c + length) / (c + 1);
      const tf = new Map<string, number>();
      for (const t of terms) if (t) tf.set(t, (tf.get(t) ?? 0) + 1);
      for (const [t, k] of tf) {
        let data = this.terms.get(t);
        if (!data) {
          this.terms.set(t, (data = { fields: Array.from({ length: this.fieldCount }, () => null) }));
          this.sorted = null;
          this.byFirst = null;
        }
        const p = (data.fields[f] ??= { docs: [], tfs: [] });
        p.docs.push(n);
        p.tfs.push(k);
      }
      distinct.push([...tf.keys()]);
    }
    this.count = c + 1;
    return distinct;
  }

  /** Removes a document (given the same fields it was added with). */
  remove(id: number, fields: { tokens: readonly string[]; terms: readonly (string | null)[] }[]): void {
    const n = this.numberOf_.get(id);
    if (n === undefined) return;
    this.version++;
    const c = this.count;
    for (let f = 0; f < this.fieldCount; f++) {
      const length = this.lengths[f][n];
      this.avg[f] = c > 1 ? (this.avg[f] * c - length) / (c - 1) : 0;
      for (const t of new Set(fields[f].terms)) {
        if (!t) continue;
        const data = this.terms.get(t);
        const p = data?.fields[f];
        if (!data || !p) continue;
        const at = bisect(p.docs, n);
        if (p.docs[at] !== n) continue;
        p.docs.splice(at, 1);
        p.tfs.splice(at, 1);
        if (!p.docs.length) {
          data.fields[f] = null;
          if (data.fields.every((x) => x === null)) {
            this.terms.delete(t);
            this.sorted = null;
            this.byFirst = null;
          }
        }
      }
    }
    this.ids[n] = -1;
    this.numberOf_.delete(id);
    this.count = c - 1;
  }

  /** The fields (their positions) of the document with internal number n that hold the term, in order. */
  fieldsOf(n: number, term: string): number[] {
    const data = this.terms.get(term);
    const out: number[] = [];
    if (!data) return out;
    for (let f = 0; f < this.fieldCount; f++) {
      const p = data.fields[f];
      if (!p) continue;
      const at = bisect(p.docs, n);
      if (p.docs[at] === n) out.push(f);
    }
    return out;
  }

  /** The vocabulary terms that begin with `prefix` (itself included), in sorted order. */
  withPrefix(prefix: string): string[] {
    const sorted = (this.sorted ??= [...this.terms.keys()].sort());
    const out: string[] = [];
    for (let i = bisectStr(sorted, prefix); i < sorted.length && sorted[i].startsWith(prefix); i++) out.push(sorted[i]);
    return out;
  }

  /**
   * The vocabulary terms with the word's first letter within `max` edits of it (the word itself left
   * out), with their distance. A term is only worked out letter by letter when its letters could be
   * within reach: each edit adds at most one letter the other word lacks and takes away at most one,
   * so words within `max` edits differ by at most `max` letters either way (letterMask; a cheap test
   * that never leaves out a term within reach).
   */
  near(word: string, max: number): [string, number][] {
    if (!this.byFirst) {
      const lists = new Map<string, string[]>();
      for (const t of this.terms.keys()) {
        const k = t[0];
        const list = lists.get(k);
        if (list) list.push(t);
        else lists.set(k, [t]);
      }
      this.byFirst = new Map([...lists].map(([k, terms]) => [k, { terms, masks: Int32Array.from(terms, letterMask) }]));
    }
    const out: [string, number][] = [];
    const group = this.byFirst.get(word[0]);
    if (!group) return out;
    const { terms, masks } = group;
    const mine = letterMask(word);
    for (let i = 0; i < terms.length; i++) {
      const t = terms[i];
      if (t === word || Math.abs(t.length - word.length) > max) continue;
      if (bitCount(mine & ~masks[i]) > max || bitCount(masks[i] & ~mine) > max) continue;
      const d = editDistance(word, t, max);
      if (d <= max) out.push([t, d]);
    }
    return out;
  }

  private grow(): void {
    const n = this.ids.length;
    if (this.acc.length >= n) return;
    const size = Math.max(n, Math.ceil(this.acc.length * 1.5), 1024);
    this.acc = new Float64Array(size);
    this.termAcc = new Float64Array(size);
    this.seen = new Int32Array(size);
    this.termSeen = new Int32Array(size);
    this.directSeen = new Int32Array(size);
    this.quality = new Uint16Array(size);
    this.reached = new Int32Array(size);
    this.touched = new Int32Array(size);
    this.epoch = 0;
    this.stamp = 0;
  }

  /** The expansions of one query term: [index term, weight, direct (exact or prefix)], exact first, then prefix ones, then fuzzy ones that are not also prefix ones (as minisearch expands them). */
  private expand(q: TermQuery): [string, number, boolean][] {
    const expansions: [string, number, boolean][] = [[q.term, 1, true]];
    let prefixed: Set<string> | null = null;
    if (q.prefix) {
      prefixed = new Set();
      for (const t of this.withPrefix(q.term)) {
        if (t === q.term) continue;
        prefixed.add(t);
        expansions.push([t, (PREFIX_WEIGHT * t.length) / (t.length + 0.3 * (t.length - q.term.length)), true]);
      }
    }
    if (q.fuzzy > 0) {
      for (const [t, d] of this.near(q.term, q.fuzzy)) {
        if (prefixed?.has(t)) continue;
        expansions.push([t, (FUZZY_WEIGHT * t.length) / (t.length + d), false]);
      }
    }
    return expansions;
  }

  /** A posting list's documents and impacts, worked out now if the engine changed since they were. */
  private scored(p: Posting, f: number): { docs: Int32Array; impacts: Float64Array } {
    if (p.scored?.version === this.version) return p.scored;
    const N = this.count;
    const df = p.docs.length;
    const idf = Math.log(1 + (N - df + 0.5) / (df + 0.5));
    const avg = this.avg[f];
    const lengths = this.lengths[f];
    const docs = Int32Array.from(p.docs);
    const impacts = new Float64Array(df);
    for (let j = 0; j < df; j++) {
      const tf = p.tfs[j];
      // The same expression, in the same order, as minisearch's (the scores stay exactly its own).
      impacts[j] = idf * (D + (tf * (K + 1)) / (tf + K * (1 - B + (B * lengths[docs[j]]) / avg)));
    }
    p.scored = { version: this.version, docs, impacts };
    return p.scored;
  }

  /**
   * score() for the first query term: a document it reaches has no total yet, so the postings
   * are added straight to the document's (the same sums, in the same order, with fewer marks).
   */
  private scoreFirst(data: TermData, weight: number, direct: boolean, epoch: number): void {
    const { seen, directSeen, acc, quality, reached } = this;
    for (let f = 0; f < this.fieldCount; f++) {
      const p = data.fields[f];
      if (!p) continue;
      const { docs: pd, impacts } = this.scored(p, f);
      const w = weight * this.boosts[f];
      let nReached = this.nReached;
      for (let j = 0; j < pd.length; j++) {
        const n = pd[j];
        const s = w * 1 * impacts[j];
        if (seen[n] !== epoch) {
          seen[n] = epoch;
          acc[n] = s;
          quality[n] = 1;
          reached[nReached++] = n;
        } else acc[n] += s;
        if (direct) directSeen[n] = epoch;
      }
      this.nReached = nReached;
    }
  }

  /**
   * Adds one index term's postings, at this weight, to the current query term's totals (termAcc,
   * marked with the stamp); documents reached for the first time in this search are listed.
   */
  private score(data: TermData, weight: number, direct: boolean, epoch: number, stamp: number): void {
    const { termAcc, seen, termSeen, directSeen, acc, quality, reached, touched } = this;
    for (let f = 0; f < this.fieldCount; f++) {
      const p = data.fields[f];
      if (!p) continue;
      const { docs: pd, impacts } = this.scored(p, f);
      const w = weight * this.boosts[f];
      let nTouched = this.nTouched;
      let nReached = this.nReached;
      for (let j = 0; j < pd.length; j++) {
        const n = pd[j];
        const s = w * 1 * impacts[j];
        if (termSeen[n] !== stamp) {
          termSeen[n] = stamp;
          termAcc[n] = s;
          touched[nTouched++] = n;
        } else termAcc[n] += s;
        if (seen[n] !== epoch) {
          seen[n] = epoch;
          acc[n] = 0;
          quality[n] = 0;
          reached[nReached++] = n;
        }
        if (direct) directSeen[n] = epoch;
      }
      this.nTouched = nTouched;
      this.nReached = nReached;
    }
  }

  /**
   * Scores the documents for these query terms, combined with OR: each query term's total (over
   * its expansions and fields) is added to the document's, and the sum is multiplied by the
   * number of query terms matched. With `ascending`, the documents come in ascending order of
   * internal number (else in the order first reached).
   */
  search(queries: readonly TermQuery[], opts: { ascending?: boolean } = {}): RawResults {
    this.grow();
    const epoch = ++this.epoch;
    // A search every 2^31 would wrap the marks: start again from clean arrays.
    if (epoch > 0x3ffffff0 || this.stamp > 0x3ffffff0) {
      this.seen.fill(0);
      this.termSeen.fill(0);
      this.directSeen.fill(0);
      this.epoch = 0;
      this.stamp = 0;
      return this.search(queries, opts);
    }
    const derived: string[] = [];
    const source: number[] = [];
    const { acc, termAcc, quality, touched } = this;
    this.nReached = 0;
    for (let qi = 0; qi < queries.length; qi++) {
      const q = queries[qi];
      const stamp = ++this.stamp;
      this.nTouched = 0;
      for (const [t, weight, direct] of this.expand(q)) {
        const data = this.terms.get(t);
        if (!data) continue;
        derived.push(t);
        source.push(qi);
        if (qi === 0) this.scoreFirst(data, weight * q.boost, direct, epoch);
        else this.score(data, weight * q.boost, direct, epoch, stamp);
      }
      // Each query term's total is added to the document's (as minisearch's OR combines them).
      for (let i = 0; i < this.nTouched; i++) {
        const n = touched[i];
        acc[n] += termAcc[n];
        quality[n] += 1;
      }
      // Alternatives: each one's own total, times their weight, added after.
      const alternativeWeight = q.alternativeWeight ?? 1;
      for (const t of q.alternatives ?? []) {
        const data = this.terms.get(t);
        if (!data) continue;
        derived.push(t);
        source.push(qi);
        const alt = ++this.stamp;
        this.nTouched = 0;
        this.score(data, 1, false, epoch, alt);
        for (let i = 0; i < this.nTouched; i++) {
          const n = touched[i];
          acc[n] += termAcc[n] * alternativeWeight;
        }
      }
    }
    let out: Int32Array;
    if (!opts.ascending) out = this.reached.slice(0, this.nReached);
    else if (this.nReached * 16 < this.ids.length) out = this.reached.slice(0, this.nReached).sort();
    else {
      // Many documents: a pass over the marks gives them in order sooner than a sort would.
      out = new Int32Array(this.nReached);
      const seen = this.seen;
      for (let n = 0, k = 0; k < out.length; n++) if (seen[n] === epoch) out[k++] = n;
    }
    const scores = new Float64Array(out.length);
    const matched = new Uint16Array(out.length);
    const direct = new Uint8Array(out.length);
    const { directSeen } = this;
    for (let i = 0; i < out.length; i++) {
      const n = out[i];
      scores[i] = acc[n] * Math.max(1, quality[n]);
      matched[i] = quality[n];
      direct[i] = directSeen[n] === epoch ? 1 : 0;
    }
    return { docs: out, scores, matched, direct, derived, source };
  }
}

/** First index of a sorted number array whose value is ≥ x. */
function bisect(xs: number[], x: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (xs[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function bisectStr(xs: string[], x: string): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (xs[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The letters of a word as a set of 31 bits (a character's code modulo 31: two letters may share a bit, which only makes near()'s test looser). */
export function letterMask(word: string): number {
  let m = 0;
  for (let i = 0; i < word.length; i++) m |= 1 << (word.charCodeAt(i) % 31);
  return m;
}

/** How many bits are set. */
function bitCount(x: number): number {
  x -= (x >>> 1) & 0x55555555;
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  return (((x + (x >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

/** Rows of editDistance, reused (grown when a longer word comes). */
let rowA = new Int32Array(64);
let rowB = new Int32Array(64);

/** Levenshtein distance of a and b, or max + 1 as soon as it must exceed max. */
export function editDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (rowA.length <= b.length) {
    rowA = new Int32Array(b.length * 2 + 1);
    rowB = new Int32Array(b.length * 2 + 1);
  }
  let prev = rowA;
  let cur = rowB;
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    let best = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j++) {
      const v = Math.min(prev[j - 1] + (ca === b.charCodeAt(j - 1) ? 0 : 1), prev[j] + 1, cur[j - 1] + 1);
      cur[j] = v;
      if (v < best) best = v;
    }
    if (best > max) return max + 1;
    const swap = prev;
    prev = cur;
    cur = swap;
  }
  return prev[b.length] <= max ? prev[b.length] : max + 1;
}
