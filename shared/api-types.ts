import type { EntryContent } from './entries/schema';

/**
 * Shapes of what the API sends, shared by the Express server and the Expo app.
 * Keep this file free of runtime dependencies: it is imported on both sides.
 */

/** Every error the API sends has this one shape. */
export interface ApiErrorBody {
  error: {
    /** Stable, machine-readable code, e.g. `not_found`, `invalid_json`, `validation_failed`. */
    code: string;
    /** A sentence for people: what happened and how to fix it. */
    message: string;
    /** Per-field messages, keyed by the field's path (`body.title`, `query.page`). */
    fields?: Record<string, string>;
  };
}

/** `GET /api/health` */
export interface HealthResponse {
  status: 'ok' | 'degraded';
  db: 'up' | 'down';
  version: string;
}

/** A conservation law and the symmetry behind it (Noether's theorem), or a second-law/charge rule. */
export interface ConservationLawDto {
  slug: string;
  name: string;
  /** The conserved quantity, e.g. "linear momentum". */
  quantity: string;
  /** The symmetry behind it, e.g. "translation in space"; null where no Noether symmetry applies. */
  symmetry: string | null;
  summary: string;
  position: number;
}

/** A node of the mechanism-class tree. */
export interface MechanismClassDto {
  slug: string;
  name: string;
  parentSlug: string | null;
  summary: string;
  position: number;
}

/** `GET /api/taxonomy` */
export interface TaxonomyResponse {
  laws: ConservationLawDto[];
  classes: MechanismClassDto[];
}

/** The signed-in user as the API shows it to that user (and to admins). */
export interface UserDto {
  id: number;
  email: string;
  displayName: string;
  role: 'contributor' | 'editor' | 'moderator' | 'admin';
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

/** A person as entries show them: author or reviewer of a version. */
export interface PersonDto {
  id: number;
  displayName: string;
}

/** The Markdown sections of a version, rendered and sanitised by the server with shared/markdown.ts. */
export interface EntryHtml {
  inBrief: string;
  howItIsPitched: string;
  whyItFails: string;
  whatFakesTheEffect: string;
  cautions: string;
  replies: { reply: string; answer: string }[];
}

/** One published version of an entry, as `GET /api/entries/:slug[/versions/:n]` sends it. */
export interface EntryVersionDto {
  number: number;
  changeNote: string;
  publishedAt: string;
  author: PersonDto;
  reviewer: PersonDto | null;
  content: EntryContent;
  html: EntryHtml;
}

/** An entry's state beside the version being read. */
export interface EntryStateDto {
  slug: string;
  status: 'draft' | 'in_review' | 'published' | 'retired';
  title: string;
  /** The newest published version's number. */
  latestVersion: number;
  retired?: { reason: string; successor?: string };
}
