/** Invented submissions for the component tests (no real device, company or person). */
import type { SessionResponse, SubmissionDto, SubmissionResponse, SubmissionSummaryDto, UserDto } from '@/shared/api-types';
import { jsonResponse } from '../testing/render';

export const contributor: UserDto = {
  id: 7,
  email: 'contributor@example.org',
  displayName: 'Ines Okonkwo',
  role: 'contributor',
  verified: true,
  createdAt: '2026-01-01T00:00:00.000Z',
};

export const moderator: UserDto = {
  id: 3,
  email: 'moderator@example.org',
  displayName: 'Rafael Quist',
  role: 'moderator',
  verified: true,
  createdAt: '2026-01-01T00:00:00.000Z',
};

export const session = (user: UserDto | null) => ({
  '/api/session': () => jsonResponse(200, { user, csrfToken: 'csrf-for-tests' } satisfies SessionResponse),
});

export function sighting(over: Partial<SubmissionDto> = {}): SubmissionDto {
  return {
    id: 41,
    kind: 'sighting',
    status: 'open',
    title: 'Sealed cavity drive said to push with no exhaust',
    createdAt: '2026-03-01T10:00:00.000Z',
    updatedAt: '2026-03-01T10:00:00.000Z',
    submitter: { id: contributor.id, displayName: contributor.displayName },
    claimedBy: null,
    seenAtUrl: 'https://news.example.org/cavity-drive',
    seenAtCitation: null,
    summary: 'A press release claims <b>0.2 lbf</b> of thrust from 1.5 kW of microwaves in a closed cavity.',
    figures: [{ kind: 'thrust', quantity: '0.2 lbf', si: 0.8896443230521, display: '889.6 mN', label: 'claimed thrust' }],
    attachments: [
      { id: 5, name: 'release.pdf', mediaType: 'application/pdf', size: 2048, sha256: 'ab'.repeat(32), url: '/api/attachments/5' },
    ],
    entry: null,
    section: null,
    whatIsWrong: null,
    suggestedFix: null,
    sources: null,
    decision: null,
    decisionNote: null,
    decidedAt: null,
    decidedBy: null,
    linkedEntries: [],
    draft: null,
    events: [{ at: '2026-03-01T10:00:00.000Z', what: 'submitted', by: { id: contributor.id, displayName: contributor.displayName }, note: null }],
    ...over,
  };
}

export function correction(over: Partial<SubmissionDto> = {}): SubmissionDto {
  return sighting({
    id: 42,
    kind: 'correction',
    title: 'Correction to “Thrust from light kept in a box”, version 2',
    seenAtUrl: null,
    summary: null,
    figures: [],
    attachments: [],
    entry: { slug: 'light-in-a-box', title: 'Thrust from light kept in a box', version: 2 },
    section: 'whyItFails',
    whatIsWrong: 'The bound uses P/2c where a photon rocket gives P/c.',
    suggestedFix: 'Use F ≤ P/c.',
    sources: null,
    ...over,
  });
}

export function summaryOf(s: SubmissionDto): SubmissionSummaryDto {
  return {
    id: s.id,
    kind: s.kind,
    status: s.status,
    title: s.title,
    createdAt: s.createdAt,
    submitter: s.submitter,
    claimedBy: s.claimedBy,
    attachments: s.attachments.length,
    entry: s.entry,
  };
}

/** What the routes that answer with one submission send (`GET /api/submissions/:id`, claim, decide …). */
export const submissionResponse = (s: SubmissionDto): SubmissionResponse => ({ submission: s });
