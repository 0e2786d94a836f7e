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
import type { SearchHit, SearchIndex } from '../../search';
import { searchQuerySchema } from './schema';

const unknown = (field: string, what: string, slug: string) =>
  new HttpError(400, 'validation_failed', `Check ${field}: no ${what} “${slug}” in the taxonomy.`, { [field]: `no ${what} “${slug}” in the taxonomy` });

export function searchRoutes(allow: Allow, index: SearchIndex): Router {
  const r = Router();
  r.get('/search', allow('search.query'), validated({ query: searchQuerySchema }), async (_req, res) => {
    const q = res.locals.valid.query;
    await index.ready();
    if (q.law && !index.laws.has(q.law)) throw unknown('query.law', 'conservation law', q.law);
    if (q.mechanism && !index.classes.has(q.mechanism)) throw unknown('query.mechanism', 'mechanism class', q.mechanism);
    const hits = index.query(q.q);
    const classes = q.mechanism ? index.classAndChildren(q.mechanism) : null;
    const byLaw = (h: SearchHit) => !q.law || h.entry.laws.includes(q.law);
    const byClass = (h: SearchHit) => !classes || (h.entry.mechanismClass !== null && classes.has(h.entry.mechanismClass));
    // Each facet ignores its own filter, so that a chip shows what choosing it would give; a class
    // counts the entries of the classes below it too, as choosing it lists them.
    const laws: Record<string, number> = {};
    for (const h of hits.filter(byClass)) for (const l of h.entry.laws) laws[l] = (laws[l] ?? 0) + 1;
    const mechanisms: Record<string, number> = {};
    const lineage = new Map<string, string[]>();
    for (const h of hits.filter(byLaw)) {
      const cls = h.entry.mechanismClass;
      if (!cls) continue;
      let up = lineage.get(cls);
      if (!up) lineage.set(cls, (up = index.classAndAncestors(cls)));
      for (const c of up) mechanisms[c] = (mechanisms[c] ?? 0) + 1;
    }
    const filtered = hits.filter((h) => byLaw(h) && byClass(h));
    res.json({
      query: q.q,
      total: filtered.length,
      results: filtered.slice(q.offset, q.offset + q.limit).map((h) => searchResult(h, index.readerWords(h, q.q))),
      facets: { laws, mechanisms },
    });
  });
  return r;
}
