/**
 * A search hit as GET /api/search lists it (shared/api/search.ts), with its excerpt around the
 * matched terms and the matched words as the reader reads them (SearchIndex.readerWords).
 */
import type { SearchResult } from '../../shared/api-types';
import { excerpt, type SearchHit } from '../search';

export function searchResult(h: SearchHit, matched: string[]): SearchResult {
  return {
    slug: h.entry.slug,
    title: h.entry.title,
    version: h.entry.version,
    score: h.score,
    terms: h.terms,
    matched,
    excerpt: excerpt(h.entry.excerptText, h.terms),
    laws: h.entry.laws,
    mechanismClass: h.entry.mechanismClass,
    inBrief: h.entry.inBrief,
  };
}
