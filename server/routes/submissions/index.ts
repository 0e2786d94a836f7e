/**
 * Submissions (sightings and corrections) once sent: the submitter's own list, one item with its
 * history, the submitter's answer, and the moderators' claim, release and decision on an item.
 * /api/submissions/*. Sending one: server/routes/sightings, server/routes/corrections.
 * Tests: tests/server/submissions.test.ts, claim-match.test.ts, durability.test.ts (and the role
 * matrix, csrf.test.ts, the fuzzer).
 */
import { Router, type Request } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Submissions } from '../../services/submissions';
import { answerSchema, decideSchema, submissionIdParams } from './schema';

export function submissionRoutes(allow: Allow, submissions: Submissions, origin: (req: Request) => string): Router {
  const r = Router();
  const byId = validated({ params: submissionIdParams });

  r.get('/submissions/mine', allow('submissions.mine'), async (req, res) => {
    res.json({ items: await submissions.items.mine(req.user!) });
  });

  r.get('/submissions/:id', allow('submissions.read'), byId, async (req, res) => {
    res.set('Cache-Control', 'private, no-store');
    res.json({ submission: await submissions.items.read(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/answer', allow('submissions.answer'), validated({ params: submissionIdParams, body: answerSchema }), async (req, res) => {
    const { params: { id }, body: { message } } = res.locals.valid;
    res.json({ submission: await submissions.items.answer(req.user!, id, message, origin(req)) });
  });

  r.post('/submissions/:id/claim', allow('queue.claim'), byId, async (req, res) => {
    res.json({ submission: await submissions.queue.claim(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/release', allow('queue.release'), byId, async (req, res) => {
    res.json({ submission: await submissions.queue.release(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/decide', allow('queue.decide'), validated({ params: submissionIdParams, body: decideSchema }), async (req, res) => {
    const { params: { id }, body } = res.locals.valid;
    const { decisions } = submissions;
    const actor = req.user!;
    const at = origin(req);
    // One function per decision (services/submissions/decisions.ts).
    const submission =
      body.decision === 'accept' ? await decisions.accept(actor, id, body, at)
      : body.decision === 'draft' ? await decisions.draft(actor, id, body, at)
      : body.decision === 'ask' ? await decisions.ask(actor, id, body.note, at)
      : await decisions.reject(actor, id, body.note, at);
    res.json({ submission });
  });

  return r;
}
