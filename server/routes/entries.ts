/**
 * The library, for everyone: published entries, their versions (each for good at its permalink)
 * and the citation of a version; for editors: a new draft of a published entry, and retiring one.
 */
import { Router, type Request } from 'express';
import { z } from 'zod';
import { formatCitation, toBibtex, toRis, type CitationStyle } from '../../shared/entries/citations';
import { slugSchema } from '../../shared/entries/schema';
import { validate } from '../http/validate';
import type { EntryVersion } from '../models';
import type { Allow } from '../policies';
import { retireSchema, validateSized, type Entries } from '../services/entries';

const slugParams = z.object({ slug: slugSchema });
const versionParams = z.object({ slug: slugSchema, n: z.coerce.number().int().min(1, 'a version number (1, 2, 3 …)').max(1_000_000) });

export const entryListQuerySchema = z.object({
  law: slugSchema.optional(),
  mechanism: slugSchema.optional(),
  limit: z.coerce.number().int().min(1).max(100).default(20),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});

export const CITE_FORMATS = ['apa', 'vancouver', 'harvard', 'bibtex', 'ris', 'csl-json'] as const;
export type CiteFormat = (typeof CITE_FORMATS)[number];
const citeQuerySchema = z.object({
  format: z.enum(CITE_FORMATS).default('apa'),
  version: z.coerce.number().int().min(1).max(1_000_000).optional(),
});

/** The permanent address of version n. */
export const permalink = (origin: string, slug: string, n: number) => `${origin}/entries/${slug}/v/${n}`;

const dateParts = (d: Date) => [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()];

/**
 * The entry version as a CSL-JSON item: an entry in the reference work "Counterweight", by the
 * version's author, dated by its publication, with its version number and permanent URL. No
 * publisher: it would repeat the work's own name, which APA 7 (§9.29) leaves out.
 */
export function citedItem(slug: string, v: EntryVersion, url: string, accessed = new Date()): Record<string, unknown> & { id: string; type: string; title: string } {
  const name = v.author!.displayName.trim();
  const cut = name.lastIndexOf(' ');
  const author = cut > 0 ? { given: name.slice(0, cut), family: name.slice(cut + 1) } : { literal: name };
  return {
    id: `${slug}-v${v.number}`,
    type: 'entry-encyclopedia',
    title: v.content.title,
    'container-title': 'Counterweight',
    version: String(v.number),
    author: [author],
    issued: { 'date-parts': [dateParts(v.publishedAt!)] },
    accessed: { 'date-parts': [dateParts(accessed)] },
    URL: url,
  };
}

export function entryRoutes(allow: Allow, entries: Entries, origin: (req: Request) => string): Router {
  const r = Router();

  r.get('/entries', allow('entries.list'), async (req, res) => {
    const q = validate(entryListQuerySchema, req.query, 'query');
    res.json(await entries.list(q));
  });

  r.get('/entries/:slug', allow('entries.read'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    res.json(await entries.read(slug));
  });

  r.get('/entries/:slug/versions', allow('entries.versions'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    res.json({ versions: await entries.versions(slug) });
  });

  r.get('/entries/:slug/versions/:n', allow('entries.read'), async (req, res) => {
    const { slug, n } = validate(versionParams, req.params, 'params');
    // A published version never changes: caches may keep it.
    res.set('Cache-Control', 'public, max-age=3600');
    res.json(await entries.read(slug, n));
  });

  r.get('/entries/:slug/cite', allow('entries.cite'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    const { format, version: n } = validate(citeQuerySchema, req.query, 'query');
    const { version } = await entries.versionRow(slug, n);
    const url = permalink(origin(req), slug, version.number!);
    const item = citedItem(slug, version, url);
    const date = version.publishedAt!.toISOString().slice(0, 10);
    const base = { format, url, version: version.number!, date };
    if (format === 'bibtex') return void res.json({ ...base, text: toBibtex([item]) });
    if (format === 'ris') return void res.json({ ...base, text: toRis([item]) });
    if (format === 'csl-json') return void res.json({ ...base, text: `${JSON.stringify([item], null, 2)}\n` });
    const style = format as CitationStyle;
    res.json({ ...base, text: formatCitation(item, style, 'text'), html: formatCitation(item, style, 'html') });
  });

  r.post('/entries/:slug/drafts', allow('entries.startDraft'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    res.status(201).json({ draft: await entries.startDraft(req.user!, slug) });
  });

  r.post('/entries/:slug/retire', allow('entries.retire'), async (req, res) => {
    const { slug } = validate(slugParams, req.params, 'params');
    const { reason, successor } = validateSized(retireSchema, req.body ?? {}, 'body');
    res.json({ entry: await entries.retire(req.user!, slug, reason, successor) });
  });

  return r;
}
