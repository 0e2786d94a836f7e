/**
 * The library, for everyone: published entries, their versions (each for good at its permalink),
 * the citation of a version and the accepted sightings linked to an entry; for editors: a new draft
 * of a published entry, and retiring one. /api/entries/*.
 * Tests: tests/server/entries.test.ts, citations.test.ts, entries-import.test.ts, submissions.test.ts
 * (sightings), security.test.ts (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router, type Request } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import { citeHandler } from '../citations/cite';
import type { Entries } from '../../services/entries';
import type { Submissions } from '../../services/submissions';
import { citeQuerySchema, entryListQuerySchema, retireSchema, slugParams, versionParams } from './schema';

export interface EntryRouteDeps {
  allow: Allow;
  entries: Entries;
  submissions: Submissions;
  origin: (req: Request) => string;
}

export function entryRoutes({ allow, entries, submissions, origin }: EntryRouteDeps): Router {
  const r = Router();

  r.get('/entries', allow('entries.list'), validated({ query: entryListQuerySchema }), async (_req, res) => {
    res.json(await entries.library.list(res.locals.valid.query));
  });

  r.get('/entries/:slug', allow('entries.read'), validated({ params: slugParams }), async (_req, res) => {
    res.json(await entries.library.read(res.locals.valid.params.slug));
  });

  r.get('/entries/:slug/versions', allow('entries.versions'), validated({ params: slugParams }), async (_req, res) => {
    res.json({ versions: await entries.library.versions(res.locals.valid.params.slug) });
  });

  r.get('/entries/:slug/versions/:n', allow('entries.read'), validated({ params: versionParams }), async (_req, res) => {
    const { slug, n } = res.locals.valid.params;
    // A published version never changes: caches may keep it.
    res.set('Cache-Control', 'public, max-age=3600');
    res.json(await entries.library.read(slug, n));
  });

  // JSON, or the citation itself as `Accept` (or ?download=1) asks: server/routes/citations/cite.ts.
  r.get('/entries/:slug/cite', allow('entries.cite'), validated({ params: slugParams, query: citeQuerySchema }), citeHandler(entries, origin));

  r.get('/entries/:slug/sightings', allow('entries.sightings'), validated({ params: slugParams }), async (_req, res) => {
    res.json({ sightings: await submissions.sightings.ofEntry(res.locals.valid.params.slug) });
  });

  r.post('/entries/:slug/drafts', allow('entries.startDraft'), validated({ params: slugParams }), async (req, res) => {
    res.status(201).json({ draft: await entries.drafts.startDraft(req.user!, res.locals.valid.params.slug) });
  });

  r.post('/entries/:slug/retire', allow('entries.retire'), validated({ params: slugParams, body: retireSchema, tooLarge: true }), async (req, res) => {
    const { params: { slug }, body: { reason, successor } } = res.locals.valid;
    res.json({ entry: await entries.vetting.retire(req.user!, slug, reason, successor) });
  });

  return r;
}
