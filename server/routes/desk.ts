/** The Desk (editors): my drafts, drafts waiting for my review, recently published. */
import { Router } from 'express';
import type { Allow } from '../policies';
import type { Entries } from '../services/entries';

export function deskRoutes(allow: Allow, entries: Entries): Router {
  const r = Router();
  r.get('/desk', allow('desk.read'), async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await entries.desk(req.user!));
  });
  return r;
}
