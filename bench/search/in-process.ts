/**
 * Quick in-process run of the search index over the synthetic library, no database (for tuning;
 * `npm run bench:search` is the full run): build time, query percentiles, hits first, slowest queries.
 * `npx tsx --expose-gc bench/search/in-process.ts`
 */
import { SearchIndex } from '../../server/search';
import { normaliseTerm } from '../../server/search/normalise';
import { loadedLibrary, synonymSet, taxonomyNames } from './library';
import { generateLibrary, makeQueries } from './synthetic';

const lib = generateLibrary(10_000);
const loaded = loadedLibrary(lib, taxonomyNames());
const syn = synonymSet();
const index = new SearchIndex({ refreshMs: 0 });
let t = performance.now();
index.install(loaded, syn);
console.log(`build ${(performance.now() - t).toFixed(0)} ms`);
t = performance.now();
index.install(loaded, syn);
console.log(`build again ${(performance.now() - t).toFixed(0)} ms`);
const generated = makeQueries(lib, normaliseTerm, 1200, 0.3);
const queries = generated.slice(0, 1000);
for (const q of generated.slice(1000)) index.query(q.q);
const times: [number, string][] = [];
let typoOk = 0, typoN = 0, cleanOk = 0, cleanN = 0;
for (const q of queries) {
  const s = performance.now();
  const hits = index.query(q.q);
  times.push([performance.now() - s, q.q]);
  const ok = hits[0]?.entry.id === q.target;
  if (q.typo) { typoN++; if (ok) typoOk++; } else { cleanN++; if (ok) cleanOk++; }
}
const s = times.map((x) => x[0]).sort((a, b) => a - b);
const at = (p: number) => s[Math.min(s.length - 1, Math.ceil(p * s.length) - 1)];
console.log(`p50 ${at(0.5).toFixed(3)} p95 ${at(0.95).toFixed(3)} p99 ${at(0.99).toFixed(3)} max ${s[s.length - 1].toFixed(1)} ms; typo first ${(typoOk / typoN * 100).toFixed(1)} %, clean ${(cleanOk / cleanN * 100).toFixed(1)} %`);
console.log(times.sort((a, b) => b[0] - a[0]).slice(0, 15).map(([ms, q]) => `${ms.toFixed(2)} ms  ${q}`).join('\n'));

const index2 = new SearchIndex({ refreshMs: 0 });
index2.install(loaded, syn);
for (const q of generated.slice(1000)) index2.search({ q: q.q, offset: 0, limit: 20 });
const ts: number[] = [];
const slow: [number, string][] = [];
for (const q of queries) {
  const s0 = performance.now();
  index2.search({ q: q.q, offset: 0, limit: 20 });
  ts.push(performance.now() - s0);
  slow.push([ts[ts.length - 1], q.q]);
}
ts.sort((a, b) => a - b);
console.log(slow.sort((a, b) => b[0] - a[0]).slice(0, 12).map(([ms, q]) => `${ms.toFixed(2)} ms  ${q}`).join('\n'));
const at2 = (p: number) => ts[Math.min(ts.length - 1, Math.ceil(p * ts.length) - 1)];
console.log(`search(): p50 ${at2(0.5).toFixed(3)} p95 ${at2(0.95).toFixed(3)} p99 ${at2(0.99).toFixed(3)} max ${ts[ts.length - 1].toFixed(2)}`);
