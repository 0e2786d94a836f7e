/** The signed-in user's own account: display name and password. */
import { Router } from 'express';
import { changePasswordSchema, updateAccountSchema } from '../../shared/schemas/auth';
import { validate } from '../http/validate';
import type { Allow } from '../policies';
import type { Accounts } from '../services/accounts';

export function accountRoutes(allow: Allow, accounts: Accounts): Router {
  const r = Router();

  r.patch('/account', allow('account.updateProfile'), async (req, res) => {
    const { displayName } = validate(updateAccountSchema, req.body ?? {}, 'body');
    const user = await accounts.changeDisplayName(req.user!.id, displayName);
    res.json({ user: user.toDto() });
  });

  r.post('/account/password', allow('account.changePassword'), async (req, res) => {
    const { currentPassword, newPassword } = validate(changePasswordSchema, req.body ?? {}, 'body');
    await accounts.changePassword(req.user!.id, currentPassword, newPassword, req.sessionID);
    res.json({});
  });

  return r;
}
