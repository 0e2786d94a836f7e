/**
 * Tuning aid: writes what the index answers for the synthetic library's queries (pages, totals,
 * facets, reader words, every hit ranked, and searchTerms as the claim matcher calls it) to a JSON
 * file, so that a change of the index's internals can be checked to answer exactly as before.
 * `npx tsx bench/search/snapshot.ts out.json`, then compare two files with `cmp`.
 */
import fs from 'node:fs';
import { SearchIndex } from '../../server/search';
import { normaliseTerm } from '../../server/search/normalise';
import { loadedLibrary, synonymSet, taxonomyNames } from './library';
import { generateLibrary, makeQueries } from './synthetic';

const lib = generateLibrary(10_000);
const tax = taxonomyNames();
const index = new SearchIndex({ refreshMs: 0 });
index.install(loadedLibrary(lib, tax), synonymSet(), tax);
const queries = makeQueries(lib, normaliseTerm, 1200, 0.3).map((q) => q.q);
// Shorter prefixes, filters, paging and a blank query too.
const extra = ['mag', 'gyro', 'the', 'energ', 'rot wheel', 'perpetual motion', 'free energy device', 'zzqx', 'ab', ''];
const out: unknown[] = [];
for (const q of [...queries, ...extra]) {
  for (const req of [{ q, offset: 0, limit: 20 }, { q, offset: 5, limit: 7, law: 'energy' }, { q, offset: 0, limit: 10, mechanism: 'over-unity' }]) {
    const page = index.search(req);
    out.push({ req, total: page.total, facets: page.facets, hits: page.hits.map((h) => [h.entry.id, h.score, h.terms, index.readerWords(h, q)]) });
  }
  out.push({ all: q, hits: index.query(q).slice(0, 200).map((h) => [h.entry.id, h.score, h.terms]) });
}
// The claim matcher's way in: normalised terms, some as prefixes, with boosts and a floor.
for (let i = 0; i < 300; i++) {
  const terms = queries[i].split(' ').map((w) => normaliseTerm(w)).filter((t): t is string => !!t);
  const hits = index.searchTerms(terms, { prefix: (t) => t.length > 4, boostTerm: (t) => 1 + (t.length % 3) / 2, atLeast: i % 2 ? 3 : undefined });
  out.push({ terms, hits: hits.slice(0, 50).map((h) => [h.entry.id, h.score, h.terms, h.queryTerms, h.match]), n: hits.length });
}
fs.writeFileSync(process.argv[2], JSON.stringify(out));
console.log(`${out.length} answers written to ${process.argv[2]}`);
