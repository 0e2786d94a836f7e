/**
 * Submissions as the API sends them (shared/api/submissions.ts): a queue or list row, one item
 * with its attachments and history, an accepted sighting under its entry, an editor to hand a
 * draft to. Models in (with what services/submissions/common.ts includes), JSON out.
 */
import type { AttachmentDto, EntrySightingDto, PersonRef, SubmissionDto, SubmissionSummaryDto } from '../../shared/api-types';
import type { Submission, SubmissionEntry, User } from '../models';
import { person } from './people';

/** A row of the queue, of "my submissions" or of the Desk's corrections. */
export function submissionSummary(s: Submission): SubmissionSummaryDto {
  return {
    id: s.id,
    kind: s.kind,
    status: s.status,
    title: s.title,
    createdAt: s.createdAt.toISOString(),
    submitter: person(s.submitter)!,
    claimedBy: s.status === 'claimed' ? person(s.claimedBy) : null,
    attachments: s.attachments?.length ?? 0,
    entry: s.entry ? { slug: s.entry.slug, title: s.entry.title, version: s.entryVersion! } : null,
  };
}

/** One submission with its details, attachments and history. */
export function submission(s: Submission): SubmissionDto {
  const attachments: AttachmentDto[] = (s.attachments ?? [])
    .sort((a, b) => a.id - b.id)
    .map((a) => ({ id: a.id, name: a.name, mediaType: a.mediaType as AttachmentDto['mediaType'], size: a.size, sha256: a.sha256, url: `/api/attachments/${a.id}` }));
  return {
    ...submissionSummary(s),
    updatedAt: s.updatedAt.toISOString(),
    seenAtUrl: s.seenAtUrl,
    seenAtCitation: s.seenAtCitation,
    summary: s.summary,
    figures: s.figures ?? [],
    attachments,
    section: (s.section as SubmissionDto['section']) ?? null,
    whatIsWrong: s.whatIsWrong,
    suggestedFix: s.suggestedFix,
    sources: s.sources,
    decision: s.decision,
    decisionNote: s.decisionNote,
    decidedAt: s.decidedAt?.toISOString() ?? null,
    decidedBy: person(s.decidedBy),
    linkedEntries: (s.linkedEntries ?? []).map((e) => ({ slug: e.slug, title: e.title })),
    draft: s.draftEntry ? { id: s.draftEntry.id, slug: s.draftEntry.slug } : null,
    events: (s.events ?? [])
      .sort((a, b) => a.id - b.id)
      .map((e) => ({ at: e.createdAt.toISOString(), what: e.what, by: person(e.actor), note: e.note })),
  };
}

/** An accepted sighting as its entry lists it. */
export function entrySighting(s: Submission, link: SubmissionEntry): EntrySightingDto {
  return {
    id: s.id,
    title: s.title,
    seenAtUrl: s.seenAtUrl,
    seenAtCitation: s.seenAtCitation,
    summary: s.summary ?? '',
    submittedAt: s.createdAt.toISOString(),
    linkedAt: link.createdAt.toISOString(),
  };
}

/** An account a moderator may hand a draft to, with its role. */
export const editor = (u: User): PersonRef & { role: string } => ({ id: u.id, displayName: u.displayName, role: u.role });
