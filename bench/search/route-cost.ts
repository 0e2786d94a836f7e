/**
 * Tuning aid: the in-process work of GET /api/search per request as the HTTP part of
 * `npm run bench:search` asks for it (the 1,000 queries in turn, three passes, caches as they come):
 * SearchIndex.search, the results presented (reader words, excerpts) and the JSON text.
 * `npx tsx --expose-gc bench/search/route-cost.ts`
 */
import { searchResult } from '../../server/presenters/search';
import { SearchIndex } from '../../server/search';
import { normaliseTerm } from '../../server/search/normalise';
import { loadedLibrary, synonymSet, taxonomyNames } from './library';
import { generateLibrary, makeQueries } from './synthetic';

const lib = generateLibrary(10_000);
const tax = taxonomyNames();
const index = new SearchIndex({ refreshMs: 0 });
index.install(loadedLibrary(lib, tax), synonymSet(), tax);
const queries = makeQueries(lib, normaliseTerm, 1000, 0.3).map((q) => q.q);
const words = new Set(queries.flatMap((q) => index.queryWords(q).map((w) => w.term)));
console.log(`${words.size} distinct words in the 1,000 queries`);
(globalThis as { gc?: () => void }).gc?.();
const sum = { search: 0, present: 0, json: 0, bytes: 0, hits: 0 };
const PASSES = 3;
for (let pass = 0; pass < PASSES; pass++) {
  for (const q of queries) {
    let s = performance.now();
    const page = index.search({ q, offset: 0, limit: 20 });
    sum.search += performance.now() - s;
    s = performance.now();
    const body = { query: q, total: page.total, results: ((w) => page.hits.map((h, i) => searchResult(h, w[i])))(index.readerWordsOfPage(page.hits, q)), facets: page.facets };
    sum.present += performance.now() - s;
    s = performance.now();
    sum.bytes += JSON.stringify(body).length;
    sum.json += performance.now() - s;
    sum.hits += page.hits.length;
  }
}
const n = PASSES * queries.length;
console.log(
  `per request: search ${(sum.search / n).toFixed(3)} ms, present ${(sum.present / n).toFixed(3)} ms, JSON ${(sum.json / n).toFixed(3)} ms; ` +
    `${(sum.hits / n).toFixed(1)} results, ${Math.round(sum.bytes / n)} bytes`,
);
