/**
 * The signed-in user's own account: display name and password. PATCH /api/account,
 * POST /api/account/password.
 * Tests: tests/server/accounts.test.ts, sessions.test.ts (and the role matrix, csrf.test.ts).
 */
import { Router } from 'express';
import { validated } from '../../http/validate';
import type { Allow } from '../../policies';
import * as present from '../../presenters/accounts';
import type { Accounts } from '../../services/accounts';
import { changePasswordSchema, updateAccountSchema } from './schema';

export function accountRoutes(allow: Allow, accounts: Accounts): Router {
  const r = Router();

  r.patch('/account', allow('account.updateProfile'), validated({ body: updateAccountSchema }), async (req, res) => {
    const { displayName } = res.locals.valid.body;
    const user = await accounts.changeDisplayName(req.user!.id, displayName);
    res.json({ user: present.user(user) });
  });

  r.post('/account/password', allow('account.changePassword'), validated({ body: changePasswordSchema }), async (req, res) => {
    const { currentPassword, newPassword } = res.locals.valid.body;
    await accounts.changePassword(req.user!.id, currentPassword, newPassword, req.sessionID);
    res.json({});
  });

  return r;
}
