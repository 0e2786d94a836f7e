/**
 * The moderators' queue: the waiting items with their counts, the editors a draft may be handed
 * to, and claiming and releasing an item (a claim keeps two moderators from deciding it at once).
 */
import type { Transaction, WhereOptions } from 'sequelize';
import { OPEN_STATUSES, type PersonRef, type QueueResponse, type SubmissionDto } from '../../../shared/api-types';
import { can, rolesOf } from '../../../shared/policies';
import { HttpError } from '../../http/errors';
import { audit, Submission, User } from '../../models';
import { editor, submission, submissionSummary } from '../../presenters/submissions';
import type { QueueQueryInput } from '../../routes/queue/schema';
import { CLAIM_TTL_MS, event, include, load, mayStep, notFound, SUBMISSION_STEPS, type SubmissionsDeps } from './common';

/** Locks the row and checks what every moderator action needs: not one's own, not decided yet. */
export async function forModerator(actor: User, id: number, transaction: Transaction): Promise<Submission> {
  const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!s) throw notFound(id);
  if (s.submitterId === actor.id) throw new HttpError(403, 'own_submission', 'You sent this submission yourself; another moderator must decide it.');
  if (!mayStep('claim', s.status)) throw new HttpError(409, 'already_decided', `This submission was already decided (${s.status}).`);
  return s;
}

export class Queue {
  constructor(private readonly deps: Pick<SubmissionsDeps, 'sequelize'>) {}

  async list(viewer: User, q: QueueQueryInput): Promise<QueueResponse> {
    const where: WhereOptions<Submission> = { status: q.status ? q.status : [...OPEN_STATUSES] };
    if (q.kind) Object.assign(where, { kind: q.kind });
    if (q.mine) Object.assign(where, { claimedById: viewer.id, status: 'claimed' });
    const [rows, total, byStatus, byKind] = await Promise.all([
      Submission.findAll({ where, include: include(false), order: [['createdAt', 'ASC'], ['id', 'ASC']], limit: q.limit, offset: q.offset }),
      Submission.count({ where }),
      Submission.count({ where: { status: [...OPEN_STATUSES] }, group: ['status'] }),
      Submission.count({ where: { status: [...OPEN_STATUSES] }, group: ['kind'] }),
    ]);
    const counted = (rowsOf: { count: number; [k: string]: unknown }[], key: string, value: string) => Number(rowsOf.find((r) => r[key] === value)?.count ?? 0);
    const st = byStatus as unknown as { status: string; count: number }[];
    const kd = byKind as unknown as { kind: string; count: number }[];
    return {
      items: rows.map(submissionSummary),
      total,
      counts: {
        open: counted(st, 'status', 'open'),
        claimed: counted(st, 'status', 'claimed'),
        waiting: counted(st, 'status', 'waiting'),
        sighting: counted(kd, 'kind', 'sighting'),
        correction: counted(kd, 'kind', 'correction'),
      },
    };
  }

  /** Who can own a draft made from a sighting: editors and admins, by name. */
  async editors(): Promise<(PersonRef & { role: string })[]> {
    const rows = await User.findAll({ where: { role: [...rolesOf('drafts.own')] }, attributes: ['id', 'displayName', 'role'], order: [['displayName', 'ASC']] });
    return rows.map(editor);
  }

  async claim(actor: User, id: number): Promise<SubmissionDto> {
    const step = SUBMISSION_STEPS.claim;
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await forModerator(actor, id, transaction);
      if (s.status === 'claimed' && s.claimedById === actor.id) return;
      if (s.status === 'claimed' && s.claimedById !== actor.id && s.claimedAt && Date.now() - s.claimedAt.getTime() < CLAIM_TTL_MS) {
        const holder = await User.findByPk(s.claimedById!, { attributes: ['displayName'], transaction });
        throw new HttpError(409, 'claimed_by_other', `${holder?.displayName ?? 'Another moderator'} is deciding this submission.`);
      }
      const before = { status: s.status, claimedById: s.claimedById };
      s.status = step.to;
      s.claimedById = actor.id;
      s.claimedAt = new Date();
      await s.save({ transaction });
      await event(transaction, s.id, 'claimed', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.claimed', subjectType: 'submission', subjectId: s.id, before, after: { status: step.to, claimedById: actor.id } });
    });
    return submission(await load(id));
  }

  async release(actor: User, id: number): Promise<SubmissionDto> {
    const step = SUBMISSION_STEPS.release;
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!s) throw notFound(id);
      if (!mayStep('release', s.status)) throw new HttpError(409, 'not_claimed', 'Nobody holds this submission.');
      if (!can(actor, 'queue.releaseHeld', { userId: actor.id, ownerId: s.claimedById })) throw new HttpError(409, 'claimed_by_other', 'Another moderator holds this submission; only they (or an admin) can release it.');
      s.status = step.to;
      s.claimedById = null;
      s.claimedAt = null;
      await s.save({ transaction });
      await event(transaction, s.id, 'released', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.released', subjectType: 'submission', subjectId: s.id, before: { status: 'claimed' }, after: { status: step.to } });
    });
    return submission(await load(id));
  }
}
