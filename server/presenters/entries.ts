/**
 * Entries as the API sends them (shared/api/entries.ts, shared/api/drafts.ts): list items,
 * published versions, an entry's state, version summaries, drafts and the Desk's rows. Models in,
 * JSON out; the services load what each needs.
 */
import type {
  DeskResponse,
  DraftDto,
  DraftSummaryDto,
  EntryHtml,
  EntryStateDto,
  EntrySummaryDto,
  EntryVersionDto,
  PublishedSummaryDto,
  VersionSummaryDto,
} from '../../shared/api-types';
import type { Entry, EntryVersion, User } from '../models';
import { person } from './people';

/**
 * A published entry in the library's list; `laws`: its laws' slugs in the version's own order;
 * `inBriefHtml`: the brief rendered (services/render.ts).
 */
export function entrySummary(e: Entry, laws: string[], inBriefHtml: string): EntrySummaryDto {
  const v = e.currentVersion!;
  return {
    slug: e.slug,
    title: v.content.title,
    version: v.number!,
    publishedAt: v.publishedAt!.toISOString(),
    laws,
    mechanismClass: e.mechanismClass?.slug ?? null,
    inBrief: v.content.inBrief,
    inBriefHtml,
  };
}

/** A published version with its rendered Markdown (author and reviewer loaded). */
export function entryVersion(v: EntryVersion, html: EntryHtml): EntryVersionDto {
  return { ...versionSummary(v), content: v.content, html };
}

/** An entry's state; `retired` only for a retired entry, naming its successor when it has one. */
export function entryState(entry: Entry, latestVersion: number, successorSlug?: string | null): EntryStateDto {
  const dto: EntryStateDto = { slug: entry.slug, status: entry.status, title: entry.title, latestVersion };
  if (entry.status === 'retired') {
    dto.retired = successorSlug ? { reason: entry.retiredReason ?? '', successor: successorSlug } : { reason: entry.retiredReason ?? '' };
  }
  return dto;
}

/** A published version in an entry's list of versions (author and reviewer loaded). */
export function versionSummary(v: EntryVersion): VersionSummaryDto {
  return {
    number: v.number!,
    changeNote: v.changeNote ?? '',
    publishedAt: v.publishedAt!.toISOString(),
    author: person(v.author)!,
    reviewer: person(v.reviewer),
  };
}

/** A draft with its entry, author, reviewer and the number of the version it revises. */
export function draft(v: EntryVersion, entry: Entry, author: User | null, reviewer: User | null, basedOn: number | null): DraftDto {
  return {
    id: v.id,
    slug: entry.slug,
    state: v.state as DraftDto['state'],
    lockVersion: v.lockVersion,
    content: v.content,
    author: person(author)!,
    reviewer: person(reviewer),
    updatedAt: v.updatedAt.toISOString(),
    basedOn,
    reviewNote: v.reviewNote,
    entryStatus: entry.status,
  };
}

/** A draft as the Desk lists it (entry and author loaded). */
export function draftSummary(v: EntryVersion): DraftSummaryDto {
  return {
    id: v.id,
    slug: v.entry!.slug,
    title: v.content.title,
    state: v.state as DraftSummaryDto['state'],
    updatedAt: v.updatedAt.toISOString(),
    author: person(v.author)!,
    lockVersion: v.lockVersion,
  };
}

/** A recently published version as the Desk lists it (entry, author and reviewer loaded). */
export function publishedSummary(v: EntryVersion): PublishedSummaryDto {
  return {
    slug: v.entry!.slug,
    title: v.content.title,
    version: v.number!,
    publishedAt: v.publishedAt!.toISOString(),
    changeNote: v.changeNote ?? '',
    author: person(v.author)!,
    reviewer: person(v.reviewer),
  };
}

/** The Desk: my drafts, drafts waiting for my review, recently published versions. */
export function desk(mine: EntryVersion[], toReview: EntryVersion[], recent: EntryVersion[]): DeskResponse {
  return { mine: mine.map(draftSummary), toReview: toReview.map(draftSummary), recent: recent.map(publishedSummary) };
}
