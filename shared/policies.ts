/**
 * Who may do what, as data: the one table read by the server's request guard (server/policies.ts,
 * `allow('<resource>.<action>')` on every route), by the services for the finer rights they check
 * inside a request, and by the app to show or hide what a role cannot do. No express here: the
 * Expo client imports this file too.
 *
 * `policies` holds one action per route (tests/server/role-matrix.test.ts walks the router and
 * expects exactly these actions); `rights` holds the finer rules a service checks on a record once
 * the route has let the request in (who sees a submission, who releases one another moderator
 * holds, who may own a draft).
 */
import type { Role, Viewer } from './schemas/auth';

/** 'public': anyone, signed in or not; 'signed-in': any account; a list: those roles only. */
export type Who = 'public' | 'signed-in' | readonly Role[];

export interface Policy {
  who: Who;
  /** false only for pure computations (no state changed, no session read). Default true. */
  csrf?: boolean;
  /** The account that owns the record (see `Context`) may do it too, whatever its role. */
  owner?: boolean;
}

const PUBLIC: Policy = { who: 'public' };
const COMPUTE: Policy = { who: 'public', csrf: false };
const SIGNED_IN: Policy = { who: 'signed-in' };
const ADMIN: Policy = { who: ['admin'] };
/** Moderators decide submissions; admins may do the same. */
const MODERATOR: Policy = { who: ['moderator', 'admin'] };
/** Editors write and vet entries; admins may do the same. */
const EDITOR: Policy = { who: ['editor', 'admin'] };

/** One action per route. */
export const policies = {
  health: { read: PUBLIC },
  taxonomy: { read: PUBLIC },
  checks: { list: PUBLIC, run: COMPUTE },
  worksheets: { list: PUBLIC, read: PUBLIC, evaluate: COMPUTE },
  session: { read: PUBLIC },
  auth: {
    signUp: PUBLIC,
    verify: PUBLIC,
    resendVerification: PUBLIC,
    signIn: PUBLIC,
    signOut: PUBLIC,
    forgotPassword: PUBLIC,
    resetPassword: PUBLIC,
  },
  account: { updateProfile: SIGNED_IN, changePassword: SIGNED_IN },
  users: { list: ADMIN, setRole: ADMIN },
  audit: { list: ADMIN },
  outbox: { list: ADMIN },
  entries: { list: PUBLIC, read: PUBLIC, versions: PUBLIC, cite: PUBLIC, sightings: PUBLIC, startDraft: EDITOR, retire: EDITOR },
  drafts: { create: EDITOR, read: EDITOR, update: EDITOR, submit: EDITOR, approve: EDITOR, sendBack: EDITOR },
  desk: { read: EDITOR, corrections: EDITOR },
  citations: { parse: EDITOR },
  search: { query: PUBLIC },
  /** The trade's synonym groups the claim matcher expands through: anyone reads them, editors change them. */
  synonyms: { list: PUBLIC, create: EDITOR, update: EDITOR, delete: EDITOR },
  /** Sightings and corrections; who sees one is the right `submissions.see` (and `submissions.seePassedOn`). */
  submissions: { sighting: SIGNED_IN, correction: SIGNED_IN, mine: SIGNED_IN, read: SIGNED_IN, answer: SIGNED_IN },
  attachments: { read: SIGNED_IN },
  queue: { list: MODERATOR, editors: MODERATOR, claim: MODERATOR, release: MODERATOR, decide: MODERATOR },
  /** The claim check; a saved one is read by anyone holding its link and deleted by its owner only (checked in the service). */
  claimChecks: { run: COMPUTE, save: SIGNED_IN, listMine: SIGNED_IN, read: PUBLIC, delete: SIGNED_IN },
} as const satisfies Record<string, Record<string, Policy>>;

/** Finer rights, checked on a record after the route's own policy has let the request in. */
export const rights = {
  submissions: {
    /** See any submission and its attachments (the submitter always sees their own). */
    see: { ...MODERATOR, owner: true },
    /** See a submission passed on to you: an accepted correction of an entry you wrote or reviewed, a sighting turned into your draft. */
    seePassedOn: EDITOR,
  },
  queue: {
    /** Release a submission: the moderator holding it, or an admin. */
    releaseHeld: { ...ADMIN, owner: true },
  },
  drafts: {
    /** Own a draft entry (the editor a moderator hands a sighting to). */
    own: EDITOR,
  },
} as const satisfies Record<string, Record<string, Policy>>;

type Table<T> = { [R in keyof T]: `${R & string}.${keyof T[R] & string}` }[keyof T];
/** A route's action, e.g. 'drafts.approve'. */
export type Action = Table<typeof policies>;
/** A finer right, e.g. 'queue.releaseHeld'. */
export type Right = Table<typeof rights>;

function lookup(table: Record<string, Record<string, Policy>>, name: string): Policy | undefined {
  const [resource, verb] = name.split('.');
  return table[resource]?.[verb];
}

export function policyOf(action: Action | Right): Policy {
  const policy = lookup(policies, action) ?? lookup(rights, action);
  if (!policy) throw new Error(`no policy for action "${action}"`);
  return policy;
}

/** Every route action, e.g. for a test that each one is used by some route. */
export const allActions = (): Action[] =>
  Object.entries(policies).flatMap(([resource, verbs]) => Object.keys(verbs).map((verb) => `${resource}.${verb}` as Action));

/** The roles a rule names (for a query such as "every account that may own a draft"); [] for 'public' and 'signed-in'. */
export function rolesOf(action: Action | Right): readonly Role[] {
  const { who } = policyOf(action);
  return typeof who === 'string' ? [] : who;
}

/** Who asks: a role, 'reader' (no account), an account with its role, or nothing (no account). */
export type Asker = Viewer | { role: Role } | null | undefined;

/** For rules with `owner: true`: the account asking and the account that owns or holds the record. */
export interface Context {
  userId?: number | null;
  ownerId?: number | null;
}

/**
 * May this viewer do this? The server's guard and services and the app all ask here. A rule with
 * `owner: true` also lets the record's owner in when the context names both ids and they match.
 */
export function can(viewer: Asker, action: Action | Right, context?: Context): boolean {
  const policy = policyOf(action);
  const { who } = policy;
  if (who === 'public') return true;
  const role: Viewer = viewer == null ? 'reader' : typeof viewer === 'string' ? viewer : viewer.role;
  if (role === 'reader') return false;
  if (policy.owner && context?.userId != null && context.userId === context.ownerId) return true;
  return who === 'signed-in' || who.includes(role);
}
