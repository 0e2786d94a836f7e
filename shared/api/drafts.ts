/**
 * The vetting workflow behind the Desk (editors): `/api/desk`, `/api/drafts/*` and
 * `POST /api/entries/:slug/drafts`. Drafts are saved as the editor types, so their content may be
 * incomplete; the full schema is checked when a draft is submitted.
 */
import type { EntryContent } from '../entries/schema';
import type { EntryStatus, PersonDto } from './entries';

export type DraftState = 'draft' | 'in_review';

/** What every draft route answers with (`{ draft }`). */
export interface DraftDto {
  id: number;
  slug: string;
  state: DraftState;
  lockVersion: number;
  content: EntryContent;
  author: PersonDto;
  reviewer: PersonDto | null;
  updatedAt: string;
  /** The published version this draft revises (null for a new entry). */
  basedOn: number | null;
  /** The reason given when the draft was last sent back, if it was. */
  reviewNote: string | null;
  entryStatus: EntryStatus;
}

/** `GET /api/drafts/:id`, `POST /api/drafts`, `PUT /api/drafts/:id`, submit, send back, and a new draft of an entry. */
export interface DraftResponse {
  draft: DraftDto;
}

/** A draft as the Desk lists it. */
export interface DraftSummaryDto {
  id: number;
  slug: string;
  title: string;
  state: DraftState;
  updatedAt: string;
  author: PersonDto;
  lockVersion: number;
}

/** A recently published version as the Desk lists it (one entry may appear once per version). */
export interface PublishedSummaryDto {
  slug: string;
  title: string;
  version: number;
  publishedAt: string;
  changeNote: string;
  author: PersonDto;
  reviewer: PersonDto | null;
}

/** `GET /api/desk`: my drafts, drafts waiting for my review, recently published versions. */
export interface DeskResponse {
  mine: DraftSummaryDto[];
  toReview: DraftSummaryDto[];
  recent: PublishedSummaryDto[];
}

/** `POST /api/drafts`: a new entry (409 `slug_taken` naming `body.slug`). */
export interface CreateDraftBody {
  slug: string;
  content: EntryContent;
}

/** `PUT /api/drafts/:id`: 409 `edit_conflict` when `lockVersion` is stale, with the current draft beside the error. */
export interface UpdateDraftBody {
  content: EntryContent;
  lockVersion: number;
}

/** `POST /api/drafts/:id/submit` */
export interface SubmitDraftBody {
  lockVersion: number;
}

/** `POST /api/drafts/:id/approve` (answers with the published version, as EntryResponse). */
export interface ApproveDraftBody {
  changeNote: string;
}

/** `POST /api/drafts/:id/send-back` */
export interface SendBackBody {
  reason: string;
}

/** The body of a 409 `edit_conflict` beside its error: the draft as it now is. */
export type EditConflictExtra = DraftResponse;

/** The body of a 409 `draft_exists` beside its error (revising an entry that already has an open draft). */
export interface DraftExistsExtra {
  draftId: number;
}

/** The body of a 404 `draft_published` beside its error: the draft asked for was published as this version. */
export interface DraftPublishedExtra {
  published: { slug: string; version: number; title: string };
}
