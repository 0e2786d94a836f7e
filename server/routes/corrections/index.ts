/**
 * POST /api/corrections: a reported error against one published entry version (issue 7).
 * Tests: tests/server/submissions.test.ts (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router } from 'express';
import { validated } from '../../http/validate';
import type { SubmitRouteDeps } from '../sightings';
import { correctionSchema } from './schema';

export function correctionRoutes({ allow, submissions, origin, limits }: SubmitRouteDeps): Router {
  const r = Router();
  r.post('/corrections', allow('submissions.correction'), limits.submitAddress, limits.submitAccount, validated({ body: correctionSchema }), async (req, res) => {
    res.status(201).json({ submission: await submissions.corrections.create(req.user!, res.locals.valid.body, origin(req)) });
  });
  return r;
}
