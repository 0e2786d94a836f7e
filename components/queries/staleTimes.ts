/**
 * How long each kind of answer counts as fresh (TanStack Query's `staleTime`), in one table: every
 * query of components/queries/ takes its stale time from here. Anything not listed is stale at once
 * (fetched again whenever a screen showing it mounts or the window regains focus).
 */
const MINUTE = 60 * 1000;

export const staleTimes = {
  /** The taxonomy and the starter worksheets change only when editors or a release change them. */
  reference: 5 * MINUTE,
  /** The editors a draft may be given to (the moderators' decision form). */
  editors: 5 * MINUTE,
  /** Who is signed in; fetched again at once after sign-in, sign-out or a reset. */
  session: MINUTE,
  /** The latest published version of an entry, which changes only when a revision is approved. */
  latestVersion: MINUTE,
  /** The sightings linked to an entry, which change when a moderator accepts one. */
  entrySightings: MINUTE,
  /** A published version (and its citation) never changes: its permalink is for good. */
  publishedVersion: Infinity,
  /** An open draft: the editor owns its copy while it is open, and saving writes the answer back. */
  openDraft: Infinity,
} as const;
