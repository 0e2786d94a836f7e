/** Drafts (editors): write, save with optimistic locking, submit, approve (never one's own), send back. */
import { Router, type Request } from 'express';
import { z } from 'zod';
import type { EntryContent } from '../../shared/entries/schema';
import { MAX_MARKDOWN_NESTING, markdownNesting } from '../http/depth';
import { fieldsError } from '../http/errors';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import { approveSchema, createDraftSchema, sendBackSchema, submitSchema, updateDraftSchema, validateSized, type Entries } from '../services/entries';

const idParams = z.object({ id: z.coerce.number().int().min(1, 'a draft id (a positive whole number)').max(4_294_967_295) });

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

  r.post('/drafts', allow('drafts.create'), async (req, res) => {
    const { slug, content } = validateSized(createDraftSchema, req.body ?? {}, 'body');
    checkMarkdownNesting(content as EntryContent);
    res.status(201).json({ draft: await entries.createDraft(req.user!, slug, content as EntryContent) });
  });

  r.get('/drafts/:id', allow('drafts.read'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    res.set('Cache-Control', 'no-store').json({ draft: await entries.getDraft(id) });
  });

  r.put('/drafts/:id', allow('drafts.update'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { content, lockVersion } = validateSized(updateDraftSchema, req.body ?? {}, 'body');
    checkMarkdownNesting(content as EntryContent);
    res.json({ draft: await entries.updateDraft(req.user!, id, content as EntryContent, lockVersion) });
  });

  r.post('/drafts/:id/submit', allow('drafts.submit'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { lockVersion } = validate(submitSchema, req.body ?? {}, 'body');
    res.json({ draft: await entries.submit(req.user!, id, lockVersion, origin(req)) });
  });

  r.post('/drafts/:id/approve', allow('drafts.approve'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { changeNote } = validateSized(approveSchema, req.body ?? {}, 'body');
    const { slug, version } = await entries.approve(req.user!, id, changeNote, origin(req));
    res.json(await entries.read(slug, version));
  });

  r.post('/drafts/:id/send-back', allow('drafts.sendBack'), async (req, res) => {
    const { id } = validate(idParams, req.params, 'params');
    const { reason } = validateSized(sendBackSchema, req.body ?? {}, 'body');
    res.json({ draft: await entries.sendBack(req.user!, id, reason, origin(req)) });
  });

  return r;
}
