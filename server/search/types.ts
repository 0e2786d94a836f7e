/** The shapes of the full-text index (index.ts): what is indexed and what a search returns. */
export interface SearchDoc {
  id: number;
  slug: string;
  title: string;
  aliases: string;
  inBrief: string;
  howItIsPitched: string;
  whyItFails: string;
  whatFakesTheEffect: string;
  mechanism: string;
  laws: string;
  citations: string;
  /** Title and summary of the accepted sightings linked to the entry, newest first. */
  sightings: string;
}

export interface IndexedEntry {
  id: number;
  slug: string;
  title: string;
  version: number;
  publishedAt: number;
  laws: string[];
  mechanismClass: string | null;
  /** Plain text of the brief. */
  inBrief: string;
  /** Plain text used for the excerpt: the brief, then why it fails. */
  excerptText: string;
}

export interface SearchHit {
  entry: IndexedEntry;
  score: number;
  terms: string[];
}

/** A hit of {@link SearchIndex.searchTerms}: also the query terms it matched and the index terms each field matched. */
export interface TermsHit extends SearchHit {
  /** The query terms (as given) that matched. */
  queryTerms: string[];
  /** Index term → the fields it matched in. */
  match: Record<string, string[]>;
}

/** Options of {@link SearchIndex.searchTerms} (the terms come already normalised; no fuzzy matching). */
export interface TermsSearchOptions {
  /** Which terms also match the index terms they begin (at the reduced prefix weight). */
  prefix?: boolean | ((term: string) => boolean);
  /** A factor for each term's scores. */
  boostTerm?: (term: string) => number;
  /** Leave out hits whose summed score (before the factor of terms matched) is below this. */
  atLeast?: number;
}
