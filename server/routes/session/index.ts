/**
 * GET /api/session: who is signed in, and this session's CSRF token (sent back in X-CSRF-Token).
 * Tests: tests/server/sessions.test.ts, csrf.test.ts, start.test.ts (and the role matrix).
 */
import { Router } from 'express';
import type { SessionResponse } from '../../../shared/api-types';
import { newToken } from '../../auth/tokens';
import type { Allow } from '../../policies';
import * as present from '../../presenters/accounts';

export function sessionRoutes(allow: Allow): Router {
  const r = Router();
  r.get('/session', allow('session.read'), (req, res) => {
    req.session.csrfToken ??= newToken();
    const payload: SessionResponse = { user: req.user ? present.user(req.user) : null, csrfToken: req.session.csrfToken };
    res.set('Cache-Control', 'no-store').json(payload);
  });
  return r;
}
