/** Requests of /api/citations, and the query of citing a version (GET /api/entries/:slug/cite). */
import { z } from 'zod';
import { CITE_FORMATS } from '../../../shared/api/constants';

/** POST /api/citations/parse (413 too_large over 200 000 characters). */
export const parseBodySchema = z
  .object({
    /** Pasted BibTeX, RIS or CSL-JSON, one or more items. */
    text: z.string().min(1, 'paste BibTeX, RIS or CSL-JSON').max(200_000),
  })
  .strict();

/**
 * GET /api/entries/:slug/cite (answered by server/routes/citations/cite.ts): JSON (a CiteResponse)
 * by default, or the citation itself when `Accept` asks for it — a data format's own media type
 * (BibTeX `application/x-bibtex` or `text/x-bibtex`, RIS `application/x-research-info-systems`,
 * CSL-JSON `application/vnd.citationstyles.csl+json`, with `Content-Disposition: attachment;
 * filename="<slug>-v<n>.bib|ris|json"`) or `text/plain` (any format); 406 naming `headers.accept`
 * when it asks for none of these.
 */
export const citeQuerySchema = z.object({
  /**
   * A text style (apa, vancouver, harvard) or a data format (bibtex, ris, csl-json). When absent:
   * the data format whose media type `Accept` asks for, else apa.
   */
  format: z.enum(CITE_FORMATS, { error: `one of ${CITE_FORMATS.join(', ')}` }).optional(),
  /** The version to cite; the latest when absent. */
  version: z.coerce.number().int().min(1, 'a version number (1, 2, 3 …)').max(1_000_000).optional(),
  /** "1" or "true": answer with the file itself as an attachment, whatever `Accept` says (a plain download link). */
  download: z.enum(['1', 'true', '0', 'false'], { error: 'true or false (1 or 0)' }).optional().transform((v) => v === '1' || v === 'true'),
});
