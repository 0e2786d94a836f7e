/**
 * Submissions from the public (DESIGN.md §2–§3, §5; issue 7): sightings (a claim seen in the wild,
 * with attachments) and corrections (a reported error in an entry version), the moderators' queue
 * and its decisions. The contract between the server (server/routes/submissions.ts and friends)
 * and the screens (components/submissions/*, components/queue/*).
 */
import type { FigureKind } from '../claims/types';

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

/** Sections of an entry version a correction may concern (the keys of EntryContent, plus "other"). */
export const CORRECTION_SECTIONS = [
  'title',
  'inBrief',
  'howItIsPitched',
  'whyItFails',
  'worksheets',
  'whatFakesTheEffect',
  'repliesAndAnswers',
  'questionsToAsk',
  'cautions',
  'sources',
  'other',
] as const;
export type CorrectionSection = (typeof CORRECTION_SECTIONS)[number];

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
