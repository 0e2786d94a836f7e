/**
 * Accounts, sessions and the admin's screens: `/api/session`, `/api/auth/*`, `/api/account*`,
 * `/api/admin/*`. Request bodies are the outputs of the shared zod schemas (shared/schemas/auth.ts),
 * imported as types only so that this file stays free of runtime code.
 */
import type { z } from 'zod';
import type {
  changePasswordSchema,
  emailOnlySchema,
  pageQuerySchema,
  resetSchema,
  Role,
  setRoleSchema,
  signInSchema,
  signUpSchema,
  updateAccountSchema,
  userListQuerySchema,
  verifySchema,
} from '../schemas/auth';

export type { Role };

/** The signed-in user as the API shows it to that user (and to admins). */
export interface UserDto {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  verified: boolean;
  createdAt: string;
}

/**
 * `GET /api/session`: who is signed in (null for a reader) and the CSRF token that every
 * state-changing request must carry in the `X-CSRF-Token` header.
 */
export interface SessionResponse {
  user: UserDto | null;
  csrfToken: string;
}

/** What sign-up, verify, sign-in, `PATCH /api/account` and a role change answer with. */
export interface UserResponse {
  user: UserDto;
}

/** `POST /api/auth/sign-up` */
export type SignUpBody = z.output<typeof signUpSchema>;
/** `POST /api/auth/sign-in` */
export type SignInBody = z.output<typeof signInSchema>;
/** `POST /api/auth/verify` */
export type VerifyBody = z.output<typeof verifySchema>;
/** `POST /api/auth/resend-verification` and `POST /api/auth/forgot` (both answer 202 `{}`). */
export type EmailOnlyBody = z.output<typeof emailOnlySchema>;
/** `POST /api/auth/reset` */
export type ResetBody = z.output<typeof resetSchema>;
/** `POST /api/account/password` */
export type ChangePasswordBody = z.output<typeof changePasswordSchema>;
/** `PATCH /api/account` */
export type UpdateAccountBody = z.output<typeof updateAccountSchema>;
/** `PATCH /api/admin/users/:id/role` */
export type SetRoleBody = z.output<typeof setRoleSchema>;
/** The query of `GET /api/admin/users`. */
export type UserListQuery = z.output<typeof userListQuerySchema>;
/** limit and offset of a page (`GET /api/admin/audit`). */
export type PageQuery = z.output<typeof pageQuerySchema>;

/** `GET /api/admin/users` */
export interface UserListResponse {
  users: UserDto[];
  total: number;
}

/** One row of the append-only audit log. */
export interface AuditEventDto {
  id: number;
  at: string;
  actor: { id: number; displayName: string } | null;
  action: string;
  subjectType: string;
  subjectId: string;
  before: unknown;
  after: unknown;
  /** What happened as a sentence naming the actor and the record (parts with `title` are titles, set in italics). */
  sentence: AuditSentencePart[];
}

/** A run of an audit sentence; `title` marks an entry's title. */
export interface AuditSentencePart {
  text: string;
  title?: boolean;
}

/** `GET /api/admin/audit` */
export interface AuditListResponse {
  events: AuditEventDto[];
  total: number;
}

/** A message caught by the development outbox (the local fake SMTP server). */
export interface OutboxMessageDto {
  id: number;
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

/** `GET /api/admin/outbox` (development only) */
export interface OutboxResponse {
  messages: OutboxMessageDto[];
}
