/**
 * The moderators' queue: GET /api/queue (waiting items, oldest first, with counts) and
 * GET /api/queue/editors (who may own a draft made from a sighting). Claiming, releasing and
 * deciding one item are under /api/submissions/:id (server/routes/submissions).
 * Tests: tests/server/submissions.test.ts (and the role matrix, the fuzzer).
 */
import { Router } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { Submissions } from '../../services/submissions';
import { queueQuerySchema } from './schema';

export function queueRoutes(allow: Allow, submissions: Submissions): Router {
  const r = Router();
  r.get('/queue', allow('queue.list'), validated({ query: queueQuerySchema }), async (req, res) => {
    res.json(await submissions.queue.list(req.user!, res.locals.valid.query));
  });
  r.get('/queue/editors', allow('queue.editors'), async (_req, res) => {
    res.json({ editors: await submissions.queue.editors() });
  });
  return r;
}
