/**
 * GET /api/search: the full-text index, ranked, with facets (see server/search/index.ts).
 * Tests: tests/server/search.test.ts, search-cluster.test.ts, claim-match.test.ts (and the role
 * matrix, the fuzzer).
 */
import { Router } from 'express';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import { searchResult } from '../../presenters/search';
import type { SearchIndex } from '../../search';
import { searchQuerySchema } from './schema';

const unknown = (field: string, what: string, slug: string) =>
  new HttpError(400, 'validation_failed', `Check ${field}: no ${what} “${slug}” in the taxonomy.`, { [field]: `no ${what} “${slug}” in the taxonomy` });

export function searchRoutes(allow: Allow, index: SearchIndex): Router {
  const r = Router();
  r.get('/search', allow('search.query'), validated({ query: searchQuerySchema }), async (_req, res) => {
    const q = res.locals.valid.query;
    // A small library's first build is waited for; a large one answers at once from the entries
    // indexed so far, flagged partial (SearchIndex.searchable).
    await index.searchable();
    if (q.law && index.laws.size && !index.laws.has(q.law)) throw unknown('query.law', 'conservation law', q.law);
    if (q.mechanism && index.classes.size && !index.classes.has(q.mechanism)) throw unknown('query.mechanism', 'mechanism class', q.mechanism);
    const page = index.search({ q: q.q, law: q.law, mechanism: q.mechanism, offset: q.offset, limit: q.limit });
    const words = index.readerWordsOfPage(page.hits, q.q);
    const body = {
      query: q.q,
      total: page.total,
      results: page.hits.map((h, i) => searchResult(h, words[i])),
      facets: page.facets,
      ...(page.partial ? { partial: true } : {}),
    };
    // Plain JSON.stringify: the answer holds no typed arrays, so the app's 'json replacer' (called
    // for every key and value) has nothing to do here. Same text and Content-Type as res.json.
    res.type('json').send(JSON.stringify(body));
  });
  return r;
}
