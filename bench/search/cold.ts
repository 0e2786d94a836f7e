/**
 * Tuning aid: SearchIndex.search and the route's presenting over the synthetic library with the
 * word cache emptied before every query (every word looked up cold), no database.
 * `npx tsx --expose-gc bench/search/cold.ts [cold|warm]`
 */
import { searchResult } from '../../server/presenters/search';
import { SearchIndex } from '../../server/search';
import { normaliseTerm } from '../../server/search/normalise';
import { loadedLibrary, synonymSet, taxonomyNames } from './library';
import { generateLibrary, makeQueries } from './synthetic';

const mode = process.argv[2] ?? 'cold';
const lib = generateLibrary(10_000);
const tax = taxonomyNames();
const loaded = loadedLibrary(lib, tax);
const syn = synonymSet();
const index = new SearchIndex({ refreshMs: 0 });
const t = performance.now();
index.install(loaded, syn, tax);
console.log(`build ${(performance.now() - t).toFixed(0)} ms`);
const generated = makeQueries(lib, normaliseTerm, 1200, 0.3);
const queries = generated.slice(0, 1000);
const state = () => (index as unknown as { state: { wordCache: Map<string, unknown>; wordCacheHits: number } }).state;
const clear = () => {
  if (mode !== 'cold') return;
  state().wordCache.clear();
  state().wordCacheHits = 0;
};
for (const q of generated.slice(1000)) index.search({ q: q.q, offset: 0, limit: 20 });
(globalThis as { gc?: () => void }).gc?.();
const pct = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.ceil(p * s.length) - 1)];
  return `p50 ${at(0.5).toFixed(3)} p95 ${at(0.95).toFixed(3)} p99 ${at(0.99).toFixed(3)} max ${s[s.length - 1].toFixed(2)} mean ${(s.reduce((a, b) => a + b, 0) / s.length).toFixed(3)}`;
};
const ts: number[] = [];
const cs: number[] = [];
const ps: number[] = [];
const js: number[] = [];
const slow: [number, string, number][] = [];
let ok = 0;
let sig = 0;
for (const q of queries) {
  clear();
  const c0 = process.cpuUsage();
  let s = performance.now();
  const page = index.search({ q: q.q, offset: 0, limit: 20 });
  ts.push(performance.now() - s);
  const c1 = process.cpuUsage(c0);
  cs.push((c1.user + c1.system) / 1000);
  slow.push([ts[ts.length - 1], q.q, page.total]);
  if (page.hits[0]?.entry.id === q.target) ok++;
  for (const h of page.hits) sig = (sig * 31 + Math.round(h.score * 1e6) + h.entry.id) % 1e9;
  s = performance.now();
  const body = { query: q.q, total: page.total, results: page.hits.map((h) => searchResult(h, index.readerWords(h, q.q))), facets: page.facets };
  ps.push(performance.now() - s);
  s = performance.now();
  JSON.stringify(body);
  js.push(performance.now() - s);
}
console.log(`search() ${mode}: ${pct(ts)}; first ${ok}/1000; signature ${sig}`);
console.log(`search() cpu time: ${pct(cs)}`);
console.log(`present: ${pct(ps)}`);
console.log(`json: ${pct(js)}`);
console.log(slow.sort((a, b) => b[0] - a[0]).slice(0, 12).map(([ms, q, n]) => `${ms.toFixed(2)} ms  ${n} hits  ${q}`).join('\n'));
