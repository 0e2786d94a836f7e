/**
 * The Desk (editors): my drafts, drafts waiting for my review, recently published (GET /api/desk),
 * and the accepted corrections of the entries I wrote or reviewed (GET /api/desk/corrections).
 * Tests: tests/server/entries.test.ts, submissions.test.ts (and the role matrix).
 */
import { Router } from 'express';
import type { Allow } from '../../policies';
import type { Entries } from '../../services/entries';
import type { Submissions } from '../../services/submissions';

export function deskRoutes(allow: Allow, entries: Entries, submissions: Submissions): Router {
  const r = Router();
  r.get('/desk', allow('desk.read'), async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await entries.desk.read(req.user!));
  });
  r.get('/desk/corrections', allow('desk.corrections'), async (req, res) => {
    res.json({ items: await submissions.corrections.onDesk(req.user!) });
  });
  return r;
}
