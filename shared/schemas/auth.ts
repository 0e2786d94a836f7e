/**
 * Accounts: the forms' schemas, shared by the server (request validation) and the app (the same
 * field errors beside the same fields). Password strength beyond the length (common passwords) is
 * judged on the server, which answers 400 naming the field.
 */
import { z } from 'zod';
import { paging } from './paging';

export const ROLES = ['contributor', 'editor', 'moderator', 'admin'] as const;
export type Role = (typeof ROLES)[number];
/** A visitor without an account. */
export type Viewer = Role | 'reader';

export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 200;

export const emailSchema = z
  .string()
  .trim()
  .max(254, 'an e-mail address has at most 254 characters')
  .email('an e-mail address such as name@example.org')
  .transform((s) => s.toLowerCase());

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN, `at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `at most ${PASSWORD_MAX} characters`);

export const displayNameSchema = z
  .string()
  .trim()
  .min(2, 'at least 2 characters')
  .max(80, 'at most 80 characters')
  .regex(/^[^<>\u0000-\u001f]*$/, 'letters, digits, spaces and ordinary punctuation');

/** Single-use tokens from e-mailed links: 43 base64url characters (32 random bytes). */
export const tokenSchema = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'the link is incomplete: open it from the e-mail again');

export const signUpSchema = z.object({ email: emailSchema, displayName: displayNameSchema, password: passwordSchema }).strict();
export const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, 'a password is needed').max(PASSWORD_MAX) }).strict();
export const verifySchema = z.object({ token: tokenSchema }).strict();
export const emailOnlySchema = z.object({ email: emailSchema }).strict();
export const resetSchema = z.object({ token: tokenSchema, password: passwordSchema }).strict();
export const changePasswordSchema = z
  .object({ currentPassword: z.string().min(1, 'your current password is needed').max(PASSWORD_MAX), newPassword: passwordSchema })
  .strict();
export const updateAccountSchema = z.object({ displayName: displayNameSchema }).strict();
export const setRoleSchema = z.object({ role: z.enum(ROLES) }).strict();
export const userListQuerySchema = z
  .object({
    q: z.string().trim().max(100).optional(),
    role: z.enum(ROLES).optional(),
    ...paging(100, 25),
  })
  .strict();
export const pageQuerySchema = z
  .object(paging(200, 50))
  .strict();

/** Turns a zod error into `{ field: message }` for a form (paths without the `body.` prefix). */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) out[issue.path.join('.')] ??= issue.message;
  return out;
}
