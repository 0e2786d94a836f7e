/**
 * Admin: users and their roles, the audit log, and the development outbox. /api/admin/*.
 * Tests: tests/server/admin.test.ts, start.test.ts (and the role matrix, csrf.test.ts).
 */
import { Router, type RequestHandler } from 'express';
import { Op, type WhereOptions } from 'sequelize';
import type { AuditListResponse, OutboxResponse, UserListResponse } from '../../../shared/api-types';
import { HttpError } from '../../http/errors';
import { validated } from '../../http/validate';
import { AuditEvent, OutboxMessage, User } from '../../models';
import type { Allow } from '../../policies';
import * as present from '../../presenters/accounts';
import { auditEvents } from '../../presenters/audit';
import type { Accounts } from '../../services/accounts';
import { pageQuerySchema, setRoleSchema, userIdParams, userListQuerySchema } from './schema';

/** `%` and `_` in a search are letters, not wildcards. */
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** The outbox exists in development and tests only: in production the route answers 404 as if absent. */
const developmentOnly =
  (env: string): RequestHandler =>
  (req, res, next) => {
    if (env === 'production') {
      next(new HttpError(404, 'not_found', `There is no API route ${req.method} ${req.originalUrl.split('?')[0]}.`));
      return;
    }
    next();
  };

export function adminRoutes(allow: Allow, accounts: Accounts, env: string): Router {
  const r = Router();

  r.get('/admin/users', allow('users.list'), validated({ query: userListQuerySchema }), async (_req, res) => {
    const { q, role, limit, offset } = res.locals.valid.query;
    const where: WhereOptions<User>[] = [];
    if (q) {
      const like = `%${likeEscape(q.toLowerCase())}%`;
      where.push({ [Op.or]: [{ email: { [Op.like]: like } }, { displayName: { [Op.like]: like } }] });
    }
    if (role) where.push({ role });
    const { rows, count } = await User.findAndCountAll({
      where: { [Op.and]: where },
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
      limit,
      offset,
    });
    const payload: UserListResponse = { users: rows.map(present.user), total: count };
    res.set('Cache-Control', 'no-store').json(payload);
  });

  r.patch('/admin/users/:id/role', allow('users.setRole'), validated({ params: userIdParams, body: setRoleSchema }), async (req, res) => {
    const { params: { id }, body: { role } } = res.locals.valid;
    const user = await accounts.setRole(req.user!.id, id, role);
    res.json({ user: present.user(user) });
  });

  r.get('/admin/audit', allow('audit.list'), validated({ query: pageQuerySchema }), async (_req, res) => {
    const { limit, offset } = res.locals.valid.query;
    const { rows, count } = await AuditEvent.findAndCountAll({
      include: [{ model: User, as: 'actor', attributes: ['id', 'displayName'] }],
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
      limit,
      offset,
    });
    const payload: AuditListResponse = { events: await auditEvents(rows), total: count };
    res.set('Cache-Control', 'no-store').json(payload);
  });

  r.get('/admin/outbox', developmentOnly(env), allow('outbox.list'), async (_req, res) => {
    const rows = await OutboxMessage.findAll({ order: [['receivedAt', 'DESC'], ['id', 'DESC']], limit: 200 });
    const payload: OutboxResponse = { messages: rows.map(present.outboxMessage) };
    res.set('Cache-Control', 'no-store').json(payload);
  });

  return r;
}
