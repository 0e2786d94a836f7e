/**
 * POST /api/citations/parse: pasted BibTeX, RIS or CSL-JSON → CSL-JSON citations, with each
 * unreadable item reported by position.
 * Tests: tests/server/citations.test.ts (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router } from 'express';
import { parseCitations } from '../../../shared/entries/citations';
import { MAX_TEXT_NESTING, bracketDepth } from '../../http/depth';
import { HttpError, fieldsError } from '../../http/errors';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import { parseBodySchema } from './schema';

export function citationRoutes(allow: Allow): Router {
  const r = Router();
  r.post('/citations/parse', allow('citations.parse'), validated({ body: parseBodySchema, tooLarge: true }), (_req, res) => {
    const { text } = res.locals.valid.body;
    // The parsers recurse into nested CSL-JSON and BibTeX braces: refuse what no citation needs.
    if (bracketDepth(text) > MAX_TEXT_NESTING) throw fieldsError('too_deep', { 'body.text': `brackets or braces nested more than ${MAX_TEXT_NESTING} levels deep` });
    const { items, problems } = parseCitations(text);
    if (!items.length) {
      const first = problems[0];
      throw new HttpError(
        400,
        'citation_unparseable',
        `No citation could be read${first ? ` (item ${first.index + 1}: ${first.reason})` : ''}. Paste BibTeX, RIS or CSL-JSON.`,
        { 'body.text': first ? `item ${first.index + 1}: ${first.reason}` : 'nothing could be read' },
        { problems },
      );
    }
    res.json({ items, problems });
  });
  return r;
}
