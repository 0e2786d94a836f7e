/**
 * The claim check over HTTP (issue 6, item 4): POST /api/claim-checks runs it (anyone; a pure
 * computation over the published library), and signed-in readers save a check and share it by an
 * unguessable link; only the owner deletes it.
 */
import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import { readClaimCheckBody, type ClaimChecks } from '../services/claim-checks';

const tokenParams = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'a saved-check token from a share link') });

/** `limit`: the per-address limit on claim checks (run or saved: each reads, searches and computes). */
export function claimCheckRoutes(allow: Allow, claims: ClaimChecks, origin: (req: Request) => string, limit: RequestHandler): Router {
  const r = Router();

  r.post('/claim-checks', allow('claimChecks.run'), limit, async (req, res) => {
    res.json(await claims.run(readClaimCheckBody(req.body), origin(req), res));
  });

  r.post('/claim-checks/saved', allow('claimChecks.save'), limit, async (req, res) => {
    res.status(201).json({ saved: await claims.save(req.user!, readClaimCheckBody(req.body), origin(req), res) });
  });

  r.get('/claim-checks/saved', allow('claimChecks.listMine'), async (req, res) => {
    res.json({ saved: await claims.listMine(req.user!, origin(req)) });
  });

  r.get('/claim-checks/saved/:token', allow('claimChecks.read'), async (req, res) => {
    const { token } = validate(tokenParams, req.params, 'params');
    // A shared link is for those who hold it: not for search engines or shared caches.
    res.set('Cache-Control', 'private, no-store').set('X-Robots-Tag', 'noindex');
    res.json({ saved: await claims.read(token, req.user, origin(req)) });
  });

  r.delete('/claim-checks/saved/:token', allow('claimChecks.delete'), async (req, res) => {
    const { token } = validate(tokenParams, req.params, 'params');
    await claims.delete(req.user!, token);
    res.status(204).end();
  });

  return r;
}
