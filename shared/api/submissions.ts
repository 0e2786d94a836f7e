/**
 * Submissions from the public (DESIGN.md §2–§3, §5; issue 7): sightings (a claim seen in the wild,
 * with attachments) and corrections (a reported error in an entry version), the moderators' queue
 * and its decisions. The contract between the server (server/routes/submissions.ts and friends)
 * and the screens (components/submissions/*, components/queue/*). shared/submissions/types.ts
 * re-exports it.
 */
import type { FigureKind } from '../claims/types';
import type { CorrectionSection } from './constants';

export const SUBMISSION_KINDS = ['sighting', 'correction'] as const;
export type SubmissionKind = (typeof SUBMISSION_KINDS)[number];

/**
 * open: waiting for a moderator; claimed: a moderator is deciding it; waiting: the moderator asked
 * the submitter for more (back to open when they answer); accepted, drafted, rejected: decided.
 */
export const SUBMISSION_STATUSES = ['open', 'claimed', 'waiting', 'accepted', 'drafted', 'rejected'] as const;
export type SubmissionStatus = (typeof SUBMISSION_STATUSES)[number];
export const OPEN_STATUSES: readonly SubmissionStatus[] = ['open', 'claimed', 'waiting'];

/** accept: link a sighting to entries (or forward a correction to the entry's editors); draft: a new draft entry for an editor (sightings); ask: ask the submitter for more; reject: with a reason. */
export const DECISIONS = ['accept', 'draft', 'ask', 'reject'] as const;
export type Decision = (typeof DECISIONS)[number];

/** Media types an attachment may have, decided by the file's content. */
export const ATTACHMENT_TYPES = ['application/pdf', 'image/png', 'image/jpeg', 'image/webp'] as const;
export type AttachmentType = (typeof ATTACHMENT_TYPES)[number];
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
export const ATTACHMENTS_MAX = 5;

export { CORRECTION_SECTIONS, type CorrectionSection } from './constants';

export interface ClaimedFigureDto {
  kind: FigureKind;
  /** As typed, e.g. "0.2 lbf"; checked with parseQuantity for the kind. */
  quantity: string;
  /** Its value in the kind's SI unit (FIGURE_SI_UNIT) and shown, e.g. "889.6 mN". */
  si: number;
  display: string;
  /** What it is, in the submitter's words (optional), e.g. "claimed thrust". */
  label: string;
}

export interface AttachmentDto {
  id: number;
  /** The name the file had on the submitter's machine (shown only; never used as a path). */
  name: string;
  mediaType: AttachmentType;
  size: number;
  sha256: string;
  /** GET this to download (Content-Disposition: attachment); only for those allowed to see it. */
  url: string;
}

export interface PersonRef {
  id: number;
  displayName: string;
}

export interface SubmissionEventDto {
  at: string;
  /** submitted, claimed, released, asked, answered, accepted, drafted, rejected */
  what: string;
  by: PersonRef | null;
  /** The reason, the question asked, or the submitter's answer. */
  note: string | null;
}

export interface SubmissionDto {
  id: number;
  kind: SubmissionKind;
  status: SubmissionStatus;
  title: string;
  createdAt: string;
  updatedAt: string;
  submitter: PersonRef;
  /** The moderator holding it while status is 'claimed'. */
  claimedBy: PersonRef | null;
  // Sightings
  /** Where it was seen: a URL or a citation (one of them, or both). */
  seenAtUrl: string | null;
  seenAtCitation: string | null;
  summary: string | null;
  figures: ClaimedFigureDto[];
  attachments: AttachmentDto[];
  // Corrections
  entry: { slug: string; title: string; version: number } | null;
  section: CorrectionSection | null;
  whatIsWrong: string | null;
  suggestedFix: string | null;
  sources: string | null;
  // Decisions
  decision: Decision | null;
  /** The reason of a rejection, or the question of an 'ask'. */
  decisionNote: string | null;
  decidedAt: string | null;
  decidedBy: PersonRef | null;
  /** Entries an accepted sighting is linked to. */
  linkedEntries: { slug: string; title: string }[];
  /** The draft a 'draft' decision made. */
  draft: { id: number; slug: string } | null;
  events: SubmissionEventDto[];
}

export interface SubmissionSummaryDto {
  id: number;
  kind: SubmissionKind;
  status: SubmissionStatus;
  title: string;
  createdAt: string;
  submitter: PersonRef;
  claimedBy: PersonRef | null;
  attachments: number;
  entry: { slug: string; title: string; version: number } | null;
}

export interface QueueResponse {
  items: SubmissionSummaryDto[];
  total: number;
  /** Counts of open items by status and kind, whatever the filters. */
  counts: { open: number; claimed: number; waiting: number; sighting: number; correction: number };
}

/** A sighting as it shows on an entry page: seen in the wild. */
export interface EntrySightingDto {
  id: number;
  title: string;
  seenAtUrl: string | null;
  seenAtCitation: string | null;
  summary: string;
  /** When it was seen reported (submitted) and linked (accepted). */
  submittedAt: string;
  linkedAt: string;
}

/** `POST /api/sightings`, `POST /api/corrections` (201), `GET /api/submissions/:id`, answer, claim, release, decide. */
export interface SubmissionResponse {
  submission: SubmissionDto;
}

/** `GET /api/submissions/mine` (own submissions, newest first) and `GET /api/desk/corrections` (editors). */
export interface SubmissionListResponse {
  items: SubmissionSummaryDto[];
}

/** `GET /api/entries/:slug/sightings` (public): accepted sightings linked to the entry, newest first. */
export interface EntrySightingsResponse {
  sightings: EntrySightingDto[];
}

/** `POST /api/corrections` (signed in): a reported error against one entry version. */
export interface CorrectionBody {
  /** The entry's slug. */
  entry: string;
  version: number;
  section: CorrectionSection;
  whatIsWrong: string;
  suggestedFix: string;
  sources?: string;
}

/** `POST /api/submissions/:id/answer` (the submitter, while it is waiting). */
export interface AnswerBody {
  message: string;
}

/** The query of `GET /api/queue` (moderators). */
export interface QueueQuery {
  kind?: SubmissionKind;
  status?: 'open' | 'claimed' | 'waiting';
  /** Only the items the moderator holds. */
  mine?: boolean;
}

/** `POST /api/submissions/:id/decide` (the holder of the claim): one of four decisions. */
export type DecideBody =
  | { decision: 'accept'; entries?: string[] }
  | { decision: 'draft'; slug: string; mechanismClass: string; editorId: number }
  | { decision: 'ask'; note: string }
  | { decision: 'reject'; note: string };

/** `GET /api/queue/editors`: the editors a new draft may be given to. */
export interface EditorsResponse {
  editors: PersonRef[];
}
