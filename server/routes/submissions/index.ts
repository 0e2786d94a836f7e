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
    res.json({ items: await submissions.mine(req.user!) });
  });

  r.get('/submissions/:id', allow('submissions.read'), byId, async (req, res) => {
    res.set('Cache-Control', 'private, no-store');
    res.json({ submission: await submissions.read(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/answer', allow('submissions.answer'), validated({ params: submissionIdParams, body: answerSchema }), async (req, res) => {
    const { params: { id }, body: { message } } = res.locals.valid;
    res.json({ submission: await submissions.answer(req.user!, id, message, origin(req)) });
  });

  r.post('/submissions/:id/claim', allow('queue.claim'), byId, async (req, res) => {
    res.json({ submission: await submissions.claim(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/release', allow('queue.release'), byId, async (req, res) => {
    res.json({ submission: await submissions.release(req.user!, res.locals.valid.params.id) });
  });

  r.post('/submissions/:id/decide', allow('queue.decide'), validated({ params: submissionIdParams, body: decideSchema }), async (req, res) => {
    const { params: { id }, body } = res.locals.valid;
    res.json({ submission: await submissions.decide(req.user!, id, body, origin(req)) });
  });

  return r;
}
