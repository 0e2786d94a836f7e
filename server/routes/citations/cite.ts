/**
 * GET /api/entries/:slug/cite (registered with the entry routes, answered here): one published
 * version in a text style or a data format. JSON (`CiteResponse`) unless `Accept` asks for the
 * citation itself: a data format's media type (shared/api/constants.ts `CITE_MEDIA_TYPES`) gets the
 * raw file with `Content-Disposition: attachment; filename="<slug>-v<n>.<ext>"`, `text/plain` gets
 * the text of any format (a data format still as an attachment); `?download=1` does the same for a
 * plain link, which cannot set `Accept`. JSON stays the answer to `application/json`, `*` / `*` or
 * no `Accept` at all; an `Accept` that allows none of these is a 406 naming `headers.accept`.
 * Without `format`, a data format's media type in `Accept` chooses that format
 * (`curl -H 'Accept: application/x-bibtex' …/cite` gets a .bib).
 * Tests: tests/server/citations.test.ts.
 */
import type { Request, RequestHandler } from 'express';
import { CITE_DATA_FORMATS, CITE_FILE_EXTENSION, CITE_MEDIA_TYPES, type CiteDataFormat, type CiteFormat } from '../../../shared/api/constants';
import type { CiteResponse } from '../../../shared/api/entries';
import { formatCitation, toOnlineBibtex, toOnlineRis, type CitationStyle } from '../../../shared/entries/citations';
import { permalink } from '../../../shared/permalink';
import { HttpError } from '../../http/errors';
import { citedItem } from '../../presenters/citation';
import type { Entries } from '../../services/entries';

const JSON_TYPE = 'application/json';
const TEXT_TYPE = 'text/plain';
const isData = (f: CiteFormat): f is CiteDataFormat => (CITE_DATA_FORMATS as readonly string[]).includes(f);
const ALL_RAW = CITE_DATA_FORMATS.flatMap((f) => CITE_MEDIA_TYPES[f].map((type) => ({ type, format: f })));

/** The citation of a version as the API's JSON answer (and the text a raw answer sends). */
function citation(format: CiteFormat, item: Record<string, unknown>): Pick<CiteResponse, 'text' | 'html'> {
  if (format === 'bibtex') return { text: toOnlineBibtex(item) };
  if (format === 'ris') return { text: toOnlineRis(item) };
  if (format === 'csl-json') return { text: `${JSON.stringify([item], null, 2)}\n` };
  const style = format as CitationStyle;
  return { text: formatCitation(item, style, 'text'), html: formatCitation(item, style, 'html') };
}

/** The data format a bare `Accept` asks for (no `format` in the query), if any. */
function formatFromAccept(req: Request): CiteDataFormat | undefined {
  if (!req.get('accept')) return undefined;
  const best = req.accepts([JSON_TYPE, ...ALL_RAW.map((r) => r.type)]);
  return ALL_RAW.find((r) => r.type === best)?.format;
}

export function citeHandler(entries: Entries, origin: (req: Request) => string): RequestHandler {
  return async (req, res) => {
    const { params: { slug }, query: { format: asked, version: n, download } } = res.locals.valid as {
      params: { slug: string };
      query: { format?: CiteFormat; version?: number; download: boolean };
    };
    const format: CiteFormat = asked ?? formatFromAccept(req) ?? 'apa';
    const { version, authors } = await entries.library.versionRow(slug, n);
    const url = permalink(origin(req), slug, version.number!);
    const item = citedItem(slug, version, url, { authors });
    const filename = isData(format) ? `${slug}-v${version.number}.${CITE_FILE_EXTENSION[format]}` : `${slug}-v${version.number}-${format}.txt`;
    const body: CiteResponse = {
      format,
      url,
      version: version.number!,
      date: version.publishedAt!.toISOString().slice(0, 10),
      authors: authors.map((a) => a.displayName),
      reviewer: version.reviewer?.displayName ?? null,
      ...(isData(format) ? { filename } : {}),
      ...citation(format, item),
    };
    res.vary('Accept');
    const offered = [JSON_TYPE, ...(isData(format) ? CITE_MEDIA_TYPES[format] : []), TEXT_TYPE];
    const type = download ? (isData(format) ? CITE_MEDIA_TYPES[format][0] : TEXT_TYPE) : req.accepts(offered);
    if (!type) {
      throw new HttpError(406, 'not_acceptable', `This citation can be sent as ${offered.join(', ')}.`, {
        'headers.accept': `ask for one of ${offered.join(', ')}`,
      });
    }
    if (type === JSON_TYPE) return void res.json(body);
    res.set('Content-Type', `${type}; charset=utf-8`);
    if (isData(format) || download) res.set('Content-Disposition', `attachment; filename="${filename}"`);
    res.send(body.text);
  };
}
