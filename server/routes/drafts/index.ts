/**
 * Drafts (editors): write, save with optimistic locking, submit, approve (never one's own), send
 * back. /api/drafts/*.
 * Tests: tests/server/entries.test.ts, citations.test.ts, security.test.ts (and the role matrix,
 * csrf.test.ts, the fuzzer).
 */
import { Router, type Request } from 'express';
import type { EntryContent } from '../../../shared/entries/schema';
import { ourWords } from '../../../shared/schemas/drafts';
import { MAX_MARKDOWN_NESTING, markdownNesting } from '../../http/depth';
import { fieldsError } from '../../http/errors';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Entries } from '../../services/entries';
import { approveSchema, createDraftSchema, draftIdParams, sendBackSchema, submitSchema, updateDraftSchema } from './schema';

/**
 * The Markdown sections are rendered on the server once published (services/render.ts), by a
 * pipeline that recurses per level: a draft nesting quotes or lists deeper than any text needs is
 * refused when saved, naming the field, rather than failing every later read of the version.
 */
function checkMarkdownNesting(content: EntryContent): void {
  const sections: [string, string][] = [
    ['inBrief', content.inBrief],
    ['howItIsPitched', content.howItIsPitched],
    ['whyItFails', content.whyItFails],
    ['whatFakesTheEffect', content.whatFakesTheEffect],
    ['cautions', content.cautions],
    ...content.repliesAndAnswers.flatMap((x, i): [string, string][] => [
      [`repliesAndAnswers.${i}.reply`, x.reply],
      [`repliesAndAnswers.${i}.answer`, x.answer],
    ]),
  ];
  const fields: Record<string, string> = {};
  for (const [name, text] of sections) {
    if (text && markdownNesting(text) > MAX_MARKDOWN_NESTING) fields[`body.content.${name}`] = `quotes or lists nested more than ${MAX_MARKDOWN_NESTING} levels deep`;
  }
  if (Object.keys(fields).length) throw fieldsError('too_deep', fields);
}

export function draftRoutes(allow: Allow, entries: Entries, origin: (req: Request) => string): Router {
  const r = Router();

  r.post('/drafts', allow('drafts.create'), validated({ body: createDraftSchema, tooLarge: true, error: ourWords }), async (req, res) => {
    const { slug, content } = res.locals.valid.body;
    checkMarkdownNesting(content as EntryContent);
    res.status(201).json({ draft: await entries.drafts.createDraft(req.user!, slug, content as EntryContent) });
  });

  r.get('/drafts/:id', allow('drafts.read'), validated({ params: draftIdParams }), async (_req, res) => {
    const { id } = res.locals.valid.params;
    res.set('Cache-Control', 'no-store').json({ draft: await entries.drafts.getDraft(id) });
  });

  r.put('/drafts/:id', allow('drafts.update'), validated({ params: draftIdParams, body: updateDraftSchema, tooLarge: true, error: ourWords }), async (req, res) => {
    const { params: { id }, body: { content, lockVersion } } = res.locals.valid;
    checkMarkdownNesting(content as EntryContent);
    res.json({ draft: await entries.drafts.updateDraft(req.user!, id, content as EntryContent, lockVersion) });
  });

  r.post('/drafts/:id/submit', allow('drafts.submit'), validated({ params: draftIdParams, body: submitSchema }), async (req, res) => {
    const { params: { id }, body: { lockVersion } } = res.locals.valid;
    res.json({ draft: await entries.vetting.submit(req.user!, id, lockVersion, origin(req)) });
  });

  r.post('/drafts/:id/approve', allow('drafts.approve'), validated({ params: draftIdParams, body: approveSchema, tooLarge: true }), async (req, res) => {
    const { params: { id }, body: { changeNote } } = res.locals.valid;
    const { slug, version } = await entries.vetting.approve(req.user!, id, changeNote, origin(req));
    res.json(await entries.library.read(slug, version));
  });

  r.post('/drafts/:id/send-back', allow('drafts.sendBack'), validated({ params: draftIdParams, body: sendBackSchema, tooLarge: true }), async (req, res) => {
    const { params: { id }, body: { reason } } = res.locals.valid;
    res.json({ draft: await entries.vetting.sendBack(req.user!, id, reason, origin(req)) });
  });

  return r;
}
