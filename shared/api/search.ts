/** `GET /api/search`: the full-text index, ranked, with facets (server/search). */

/** The query of `GET /api/search` (server: searchQuerySchema). */
export interface SearchParams {
  /** Up to 500 characters; empty lists every published entry, newest first. */
  q: string;
  /** A conservation-law slug. */
  law?: string;
  /** A mechanism-class slug (matches that class and its children). */
  mechanism?: string;
  /** 1–50, 20 when not given. */
  limit?: number;
  offset?: number;
}

/** One ranked result of `GET /api/search`. */
export interface SearchResult {
  slug: string;
  title: string;
  version: number;
  score: number;
  /** The index terms that matched (normalised, so possibly stems: "microwav"); for programs, not for readers. */
  terms: string[];
  /**
   * The same matches as a reader reads them, never stems: each as the query typed it ("thrusters"),
   * else as the entry writes it ("microwave" for the prefix "microw" or the slip "microwve").
   */
  matched: string[];
  /** Plain text, HTML-escaped, with the matched words wrapped in `<mark>…</mark>`. */
  excerpt: string;
  laws: string[];
  /** The mechanism class's slug; null when the entry has none in the taxonomy. */
  mechanismClass: string | null;
  /** Plain text. */
  inBrief: string;
}

/** `GET /api/search` */
export interface SearchResponse {
  query: string;
  total: number;
  results: SearchResult[];
  /**
   * Counts over the results of q, each ignoring its own facet's filter. A mechanism class counts its
   * own entries and those of every class below it, as filtering by it lists them all.
   */
  facets: { laws: Record<string, number>; mechanisms: Record<string, number> };
  /** Present (true) only while a server that just started builds its index: the results cover the entries indexed so far. */
  partial?: true;
}
