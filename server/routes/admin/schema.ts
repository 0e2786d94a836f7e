/**
 * Requests of /api/admin. The list queries and the role change are shared with the app's admin
 * screens (shared/schemas/auth.ts):
 *  - userListQuerySchema: `q` (part of a name or address), `role`, `limit`, `offset` (GET /api/admin/users);
 *  - setRoleSchema: `role` (PATCH /api/admin/users/:id/role);
 *  - pageQuerySchema: `limit`, `offset` (GET /api/admin/audit).
 */
import { idParams } from '../common-schema';

export { pageQuerySchema, setRoleSchema, userListQuerySchema } from '../../../shared/schemas/auth';

/** `:id` of a user. */
export const userIdParams = idParams('a user id (a positive whole number)');
