/**
 * The claim check over HTTP (issue 6, item 4): POST /api/claim-checks runs it (anyone; a pure
 * computation over the published library), and signed-in readers save a check and share it by an
 * unguessable link; only the owner deletes it. /api/claim-checks/*.
 * Tests: tests/server/claim-checks.test.ts, compute-pool.test.ts, rate-limit.test.ts, durability.test.ts
 * (and the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router, type Request, type RequestHandler } from 'express';
import { CLAIM_TEXT_MAX } from '../../../shared/claims/types';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import type { ClaimChecks } from '../../services/claim-checks';
import { claimCheckSchema, tokenParams } from './schema';

/** 413 for a text over the limit, before anything else is checked. */
const textNotTooLong: RequestHandler = (req, _res, next) => {
  const text = (req.body as { text?: unknown } | null | undefined)?.text;
  if (typeof text === 'string' && text.length > CLAIM_TEXT_MAX) {
    return next(
      new HttpError(
        413,
        'text_too_long',
        `The text is ${text.length.toLocaleString('en-US')} characters long; the claim check takes at most ${CLAIM_TEXT_MAX.toLocaleString('en-US')}. Paste the part that states the claim and its figures.`,
        { 'body.text': `at most ${CLAIM_TEXT_MAX} characters` },
      ),
    );
  }
  next();
};

/** `limit`: the per-address limit on claim checks (run or saved: each reads, searches and computes). */
export function claimCheckRoutes(allow: Allow, claims: ClaimChecks, origin: (req: Request) => string, limit: RequestHandler): Router {
  const r = Router();
  const body = validated({ body: claimCheckSchema });
  const byToken = validated({ params: tokenParams });

  r.post('/claim-checks', allow('claimChecks.run'), limit, textNotTooLong, body, async (req, res) => {
    res.json(await claims.run(res.locals.valid.body, origin(req), res));
  });

  r.post('/claim-checks/saved', allow('claimChecks.save'), limit, textNotTooLong, body, async (req, res) => {
    res.status(201).json({ saved: await claims.save(req.user!, res.locals.valid.body, origin(req), res) });
  });

  r.get('/claim-checks/saved', allow('claimChecks.listMine'), async (req, res) => {
    res.json({ saved: await claims.listMine(req.user!, origin(req)) });
  });

  r.get('/claim-checks/saved/:token', allow('claimChecks.read'), byToken, async (req, res) => {
    // A shared link is for those who hold it: not for search engines or shared caches.
    res.set('Cache-Control', 'private, no-store').set('X-Robots-Tag', 'noindex');
    res.json({ saved: await claims.read(res.locals.valid.params.token, req.user, origin(req)) });
  });

  r.delete('/claim-checks/saved/:token', allow('claimChecks.delete'), byToken, async (req, res) => {
    await claims.delete(req.user!, res.locals.valid.params.token);
    res.status(204).end();
  });

  return r;
}
