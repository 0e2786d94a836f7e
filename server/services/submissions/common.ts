/** What the submission services share: their dependencies, the rows they load, the history and the state table. */
import type { Sequelize, Transaction } from 'sequelize';
import type { SubmissionStatus } from '../../../shared/api-types';
import { HttpError } from '../../http/errors';
import type { SendAfterCommit } from '../../mail/after-commit';
import type { Mailer } from '../../mail/mailer';
import { Attachment, Entry, EntryVersion, Submission, SubmissionEvent, User } from '../../models';
import type { ObjectStore } from '../../storage';
import type { Drafts } from '../entries';

export interface SubmissionsDeps {
  sequelize: Sequelize;
  store: ObjectStore;
  /** For the moderators' digest, which is sent by a timer rather than after a request. */
  mailer: Mailer;
  /** Sends mail once a decision is committed and the answer has gone (server/mail/after-commit.ts). */
  mail: SendAfterCommit;
  /** Opens the draft entry a sighting is turned into. */
  drafts: Drafts;
  later: (what: string, job: () => Promise<void>) => void;
  /** How long new items are gathered before the moderators' digest goes out (ms). */
  digestMs: number;
  logger?: { error(obj: object, msg: string): void };
  /** After a sighting is accepted: the slugs of the entries it was linked to (the search index indexes its text with them). */
  linked?: (slugs: string[]) => Promise<void>;
}

/**
 * The state changes of a submission, as data: each step's allowed starting states and where it
 * leads. A decision is taken by the moderator who holds the claim; `ask` leaves it waiting for
 * the submitter, whose answer puts it back in the queue.
 */
export const SUBMISSION_STEPS = {
  claim: { from: ['open', 'claimed', 'waiting'], to: 'claimed' },
  release: { from: ['claimed'], to: 'open' },
  accept: { from: ['claimed'], to: 'accepted' },
  draft: { from: ['claimed'], to: 'drafted' },
  ask: { from: ['claimed'], to: 'waiting' },
  reject: { from: ['claimed'], to: 'rejected' },
  answer: { from: ['waiting'], to: 'open' },
} as const satisfies Record<string, { from: readonly SubmissionStatus[]; to: SubmissionStatus }>;

export type SubmissionStep = keyof typeof SUBMISSION_STEPS;

/** May a submission in `status` take this step? */
export const mayStep = (step: SubmissionStep, status: SubmissionStatus): boolean => (SUBMISSION_STEPS[step].from as readonly SubmissionStatus[]).includes(status);

/** A claim older than this may be taken over by another moderator. */
export const CLAIM_TTL_MS = 2 * 60 * 60 * 1000;

export const notFound = (id: number) => new HttpError(404, 'not_found', `There is no submission ${id}, or it is not yours to see.`);

/** What a submission is loaded with: enough for a list row, or everything its page shows. */
export function include(withDetail: boolean) {
  const base = [
    { model: User, as: 'submitter', attributes: ['id', 'displayName'] },
    { model: User, as: 'claimedBy', attributes: ['id', 'displayName'] },
    { model: Entry, as: 'entry', attributes: ['id', 'slug', 'title'] },
    { model: Attachment, as: 'attachments', attributes: ['id'] },
  ];
  if (!withDetail) return base;
  return [
    ...base.slice(0, 3),
    { model: User, as: 'decidedBy', attributes: ['id', 'displayName'] },
    { model: Entry, as: 'draftEntry', attributes: ['id', 'slug'] },
    { model: Attachment, as: 'attachments' },
    { model: Entry, as: 'linkedEntries', attributes: ['id', 'slug', 'title'] },
    { model: SubmissionEvent, as: 'events', include: [{ model: User, as: 'actor', attributes: ['id', 'displayName'] }] },
  ];
}

/** One submission with everything its page shows, or 404. */
export async function load(id: number, transaction?: Transaction): Promise<Submission> {
  const s = await Submission.findByPk(id, { include: include(true), transaction });
  if (!s) throw notFound(id);
  return s;
}

/** Editors of an entry: the authors and reviewers of its published versions. */
export async function editorsOf(entryId: number, transaction?: Transaction): Promise<User[]> {
  const versions = await EntryVersion.findAll({ where: { entryId, state: 'published' }, attributes: ['authorId', 'reviewerId'], transaction });
  const ids = [...new Set(versions.flatMap((v) => [v.authorId, v.reviewerId]).filter((x): x is number => typeof x === 'number'))];
  return ids.length ? User.findAll({ where: { id: ids }, transaction }) : [];
}

/** A line of the submission's history. */
export function event(transaction: Transaction, submissionId: number, what: string, actorId: number | null, note: string | null = null) {
  return SubmissionEvent.create({ submissionId, what, actorId, note }, { transaction });
}

/** A new submission's fields that its kind, the queue or a decision fill in later. */
export const UNSET = {
  claimedById: null,
  claimedAt: null,
  seenAtUrl: null,
  seenAtCitation: null,
  summary: null,
  figures: null,
  entryId: null,
  entryVersion: null,
  section: null,
  whatIsWrong: null,
  suggestedFix: null,
  sources: null,
  decision: null,
  decisionNote: null,
  decidedById: null,
  decidedAt: null,
  draftEntryId: null,
  moderatorsNotifiedAt: null,
} as const;
