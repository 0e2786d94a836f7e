/**
 * Requests of /api/account, shared with the app's forms (shared/schemas/auth.ts):
 *  - updateAccountSchema: `displayName` (PATCH /api/account);
 *  - changePasswordSchema: `currentPassword`, `newPassword` (POST /api/account/password).
 */
export { changePasswordSchema, updateAccountSchema } from '../../../shared/schemas/auth';
