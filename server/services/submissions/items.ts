/**
 * One submission once sent: who may see it and its files, reading it, the submitter's own list,
 * and the submitter's answer to a moderator's question.
 */
import type { SubmissionDto, SubmissionSummaryDto } from '../../../shared/api-types';
import { can } from '../../../shared/policies';
import { HttpError } from '../../http/errors';
import { Attachment, audit, EntryVersion, Submission, type User } from '../../models';
import { submission, submissionSummary } from '../../presenters/submissions';
import { ObjectNotFoundError } from '../../storage';
import { editorsOf, event, include, load, mayStep, notFound, SUBMISSION_STEPS, type SubmissionsDeps } from './common';
import type { Digest } from './digest';

/** Who may see a submission (and its attachments): the submitter, moderators and admins, and editors it was passed to. */
async function maySee(viewer: User, s: Submission): Promise<boolean> {
  if (can(viewer, 'submissions.see', { userId: viewer.id, ownerId: s.submitterId })) return true;
  if (!can(viewer, 'submissions.seePassedOn')) return false;
  if (s.kind === 'correction' && s.status === 'accepted' && s.entryId) return (await editorsOf(s.entryId)).some((u) => u.id === viewer.id);
  if (s.kind === 'sighting' && s.status === 'drafted' && s.draftEntryId) {
    return (await EntryVersion.count({ where: { entryId: s.draftEntryId, authorId: viewer.id } })) > 0;
  }
  return false;
}

export class Items {
  constructor(
    private readonly deps: SubmissionsDeps,
    private readonly digest: Digest,
  ) {}

  async read(viewer: User, id: number): Promise<SubmissionDto> {
    const s = await load(id);
    if (!(await maySee(viewer, s))) throw notFound(id);
    return submission(s);
  }

  async mine(viewer: User): Promise<SubmissionSummaryDto[]> {
    const rows = await Submission.findAll({ where: { submitterId: viewer.id }, include: include(false), order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 });
    return rows.map(submissionSummary);
  }

  /** An attachment's bytes for a viewer allowed to see its submission. */
  async attachment(viewer: User, id: number): Promise<{ row: Attachment; body: NodeJS.ReadableStream }> {
    const row = await Attachment.findByPk(id);
    const gone = new HttpError(404, 'not_found', `There is no attachment ${id}, or it is not yours to see.`);
    if (!row) throw gone;
    const s = await Submission.findByPk(row.submissionId);
    if (!s || !(await maySee(viewer, s))) throw gone;
    try {
      const { body } = await this.deps.store.get(row.storageKey);
      return { row, body };
    } catch (err) {
      if (err instanceof ObjectNotFoundError) throw new HttpError(404, 'not_found', `The file of attachment ${id} is missing from storage.`);
      throw err;
    }
  }

  /** The submitter answers the moderator's question: the item goes back to the queue. */
  async answer(actor: User, id: number, message: string, origin: string): Promise<SubmissionDto> {
    const step = SUBMISSION_STEPS.answer;
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!s || s.submitterId !== actor.id) throw notFound(id);
      if (!mayStep('answer', s.status)) throw new HttpError(409, 'not_waiting', 'This submission is not waiting for an answer from you.');
      const before = { status: s.status };
      s.status = step.to;
      s.moderatorsNotifiedAt = null; // back in the queue: the moderators hear of it again
      await s.save({ transaction });
      await event(transaction, s.id, 'answered', actor.id, message);
      await audit(transaction, { actorId: actor.id, action: 'submission.answered', subjectType: 'submission', subjectId: s.id, before, after: { status: step.to } });
    });
    this.digest.schedule(origin);
    return submission(await load(id));
  }
}
