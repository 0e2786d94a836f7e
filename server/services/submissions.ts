/**
 * Submissions from the public (issue 7): sightings with attachments and corrections, the
 * moderators' queue (claim, release, decide), who may see what, the history of each item and the
 * e-mails (the submitter on every decision, moderators in batches when items arrive, the entry's
 * editors when a correction is passed on). Every decision is audit-logged in its transaction; mail
 * goes after the commit.
 */
import { Op, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import {
  OPEN_STATUSES,
  type AttachmentDto,
  type ClaimedFigureDto,
  type EntrySightingDto,
  type PersonRef,
  type QueueResponse,
  type SubmissionDto,
  type SubmissionStatus,
  type SubmissionSummaryDto,
} from '../../shared/submissions/types';
import { can, rolesOf } from '../../shared/policies';
import { HttpError } from '../http/errors';
import type { Mailer, OutgoingMessage } from '../mail/mailer';
import { correctionForwardedMessage, queueDigestMessage, submissionDecidedMessage } from '../mail/messages';
import { Attachment, audit, Entry, EntryVersion, Submission, SubmissionEntry, SubmissionEvent, User } from '../models';
import { ObjectNotFoundError, type ObjectStore } from '../storage';
import { removeStored, type StoredFile } from '../uploads/attachments';
import { draftContentSchema } from '../../shared/schemas/drafts';
import type { CorrectionInput } from '../routes/corrections/schema';
import type { QueueQueryInput } from '../routes/queue/schema';
import type { SightingInput } from '../routes/sightings/schema';
import type { DecideInput } from '../routes/submissions/schema';
import type { Entries } from './entries';

// ---------------------------------------------------------------------------------------------

const person = (u: User | null | undefined): PersonRef | null => (u ? { id: u.id, displayName: u.displayName } : null);
const notFound = (id: number) => new HttpError(404, 'not_found', `There is no submission ${id}, or it is not yours to see.`);

/** A claim older than this may be taken over by another moderator. */
export const CLAIM_TTL_MS = 2 * 60 * 60 * 1000;

const SECTION_WORDS: Record<string, string> = {
  title: 'title',
  inBrief: 'in brief',
  howItIsPitched: 'how it is pitched',
  whyItFails: 'why it fails',
  worksheets: 'run the numbers',
  whatFakesTheEffect: 'artifacts that can look like the effect',
  repliesAndAnswers: 'replies and answers',
  questionsToAsk: 'questions to ask',
  cautions: 'cautions',
  sources: 'sources',
  other: 'other',
};

/** A new submission's fields that its kind, the queue or a decision fill in later. */
const UNSET = {
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

export interface SubmissionsDeps {
  sequelize: Sequelize;
  store: ObjectStore;
  mailer: Mailer;
  entries: Entries;
  later: (what: string, job: () => Promise<void>) => void;
  /** How long new items are gathered before the moderators' digest goes out (ms). */
  digestMs: number;
  logger?: { error(obj: object, msg: string): void };
  /** After a sighting is accepted: the slugs of the entries it was linked to (the search index indexes its text with them). */
  linked?: (slugs: string[]) => Promise<void>;
}

export class Submissions {
  private digestTimer: NodeJS.Timeout | null = null;
  private digestRun: Promise<void> | null = null;

  constructor(private readonly deps: SubmissionsDeps) {}

  // ---- reading -------------------------------------------------------------------------------

  private include(withDetail: boolean) {
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

  private summary(s: Submission): SubmissionSummaryDto {
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

  private dto(s: Submission): SubmissionDto {
    const attachments: AttachmentDto[] = (s.attachments ?? [])
      .sort((a, b) => a.id - b.id)
      .map((a) => ({ id: a.id, name: a.name, mediaType: a.mediaType as AttachmentDto['mediaType'], size: a.size, sha256: a.sha256, url: `/api/attachments/${a.id}` }));
    return {
      ...this.summary(s),
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

  private async load(id: number, transaction?: Transaction): Promise<Submission> {
    const s = await Submission.findByPk(id, { include: this.include(true), transaction });
    if (!s) throw notFound(id);
    return s;
  }

  /** Editors of an entry: the authors and reviewers of its published versions. */
  private async editorsOf(entryId: number, transaction?: Transaction): Promise<User[]> {
    const versions = await EntryVersion.findAll({ where: { entryId, state: 'published' }, attributes: ['authorId', 'reviewerId'], transaction });
    const ids = [...new Set(versions.flatMap((v) => [v.authorId, v.reviewerId]).filter((x): x is number => typeof x === 'number'))];
    return ids.length ? User.findAll({ where: { id: ids }, transaction }) : [];
  }

  /** Who may see a submission (and its attachments): the submitter, moderators and admins, and editors it was passed to. */
  private async maySee(viewer: User, s: Submission): Promise<boolean> {
    if (can(viewer, 'submissions.see', { userId: viewer.id, ownerId: s.submitterId })) return true;
    if (!can(viewer, 'submissions.seePassedOn')) return false;
    if (s.kind === 'correction' && s.status === 'accepted' && s.entryId) return (await this.editorsOf(s.entryId)).some((u) => u.id === viewer.id);
    if (s.kind === 'sighting' && s.status === 'drafted' && s.draftEntryId) {
      return (await EntryVersion.count({ where: { entryId: s.draftEntryId, authorId: viewer.id } })) > 0;
    }
    return false;
  }

  async read(viewer: User, id: number): Promise<SubmissionDto> {
    const s = await this.load(id);
    if (!(await this.maySee(viewer, s))) throw notFound(id);
    return this.dto(s);
  }

  async mine(viewer: User): Promise<SubmissionSummaryDto[]> {
    const rows = await Submission.findAll({ where: { submitterId: viewer.id }, include: this.include(false), order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 });
    return rows.map((s) => this.summary(s));
  }

  async queue(viewer: User, q: QueueQueryInput): Promise<QueueResponse> {
    const where: WhereOptions<Submission> = { status: q.status ? q.status : [...OPEN_STATUSES] };
    if (q.kind) Object.assign(where, { kind: q.kind });
    if (q.mine) Object.assign(where, { claimedById: viewer.id, status: 'claimed' });
    const [rows, total, byStatus, byKind] = await Promise.all([
      Submission.findAll({ where, include: this.include(false), order: [['createdAt', 'ASC'], ['id', 'ASC']], limit: q.limit, offset: q.offset }),
      Submission.count({ where }),
      Submission.count({ where: { status: [...OPEN_STATUSES] }, group: ['status'] }),
      Submission.count({ where: { status: [...OPEN_STATUSES] }, group: ['kind'] }),
    ]);
    const counted = (rowsOf: { count: number; [k: string]: unknown }[], key: string, value: string) => Number(rowsOf.find((r) => r[key] === value)?.count ?? 0);
    const st = byStatus as unknown as { status: string; count: number }[];
    const kd = byKind as unknown as { kind: string; count: number }[];
    return {
      items: rows.map((s) => this.summary(s)),
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

  async entrySightings(slug: string): Promise<EntrySightingDto[]> {
    const entry = await Entry.findOne({ where: { slug, status: ['published', 'retired'] }, attributes: ['id'] });
    if (!entry) throw new HttpError(404, 'not_found', `There is no published entry “${slug}”.`);
    const links = await SubmissionEntry.findAll({ where: { entryId: entry.id }, order: [['createdAt', 'DESC']], limit: 100 });
    if (!links.length) return [];
    const subs = await Submission.findAll({ where: { id: links.map((l) => l.submissionId), kind: 'sighting', status: 'accepted' } });
    const byId = new Map(subs.map((s) => [s.id, s]));
    return links
      .filter((l) => byId.has(l.submissionId))
      .map((l) => {
        const s = byId.get(l.submissionId)!;
        return { id: s.id, title: s.title, seenAtUrl: s.seenAtUrl, seenAtCitation: s.seenAtCitation, summary: s.summary ?? '', submittedAt: s.createdAt.toISOString(), linkedAt: l.createdAt.toISOString() };
      });
  }

  /** Accepted corrections of the entries this editor wrote or reviewed, newest first. */
  async deskCorrections(viewer: User): Promise<SubmissionSummaryDto[]> {
    const versions = await EntryVersion.findAll({
      where: { state: 'published', [Op.or]: [{ authorId: viewer.id }, { reviewerId: viewer.id }] },
      attributes: ['entryId'],
    });
    const entryIds = [...new Set(versions.map((v) => v.entryId))];
    if (!entryIds.length) return [];
    const rows = await Submission.findAll({ where: { kind: 'correction', status: 'accepted', entryId: entryIds }, include: this.include(false), order: [['decidedAt', 'DESC'], ['id', 'DESC']], limit: 100 });
    return rows.map((s) => this.summary(s));
  }

  /** Who can own a draft made from a sighting: editors and admins, by name. */
  async editors(): Promise<(PersonRef & { role: string })[]> {
    const rows = await User.findAll({ where: { role: [...rolesOf('drafts.own')] }, attributes: ['id', 'displayName', 'role'], order: [['displayName', 'ASC']] });
    return rows.map((u) => ({ id: u.id, displayName: u.displayName, role: u.role }));
  }

  /** An attachment's bytes for a viewer allowed to see its submission. */
  async attachment(viewer: User, id: number): Promise<{ row: Attachment; body: NodeJS.ReadableStream }> {
    const row = await Attachment.findByPk(id);
    const gone = new HttpError(404, 'not_found', `There is no attachment ${id}, or it is not yours to see.`);
    if (!row) throw gone;
    const s = await Submission.findByPk(row.submissionId);
    if (!s || !(await this.maySee(viewer, s))) throw gone;
    try {
      const { body } = await this.deps.store.get(row.storageKey);
      return { row, body };
    } catch (err) {
      if (err instanceof ObjectNotFoundError) throw new HttpError(404, 'not_found', `The file of attachment ${id} is missing from storage.`);
      throw err;
    }
  }

  // ---- submitting ----------------------------------------------------------------------------

  private event(transaction: Transaction, submissionId: number, what: string, actorId: number | null, note: string | null = null) {
    return SubmissionEvent.create({ submissionId, what, actorId, note }, { transaction });
  }

  /**
   * A sighting with its stored files. The files are already in the store; if the database write
   * fails they are removed again, so that nothing is left half-stored.
   */
  async createSighting(actor: User, input: SightingInput, figures: ClaimedFigureDto[], files: StoredFile[], origin: string): Promise<SubmissionDto> {
    let id: number;
    try {
      id = await this.deps.sequelize.transaction(async (transaction) => {
        const s = await Submission.create(
          {
            ...UNSET,
            kind: 'sighting',
            title: input.title,
            submitterId: actor.id,
            seenAtUrl: input.seenAtUrl ?? null,
            seenAtCitation: input.seenAtCitation ?? null,
            summary: input.summary,
            figures,
          },
          { transaction },
        );
        for (const f of files) {
          await Attachment.create({ submissionId: s.id, storageKey: f.key, name: f.name, mediaType: f.mediaType, size: f.size, sha256: f.sha256 }, { transaction });
        }
        await this.event(transaction, s.id, 'submitted', actor.id);
        await audit(transaction, { actorId: actor.id, action: 'submission.created', subjectType: 'submission', subjectId: s.id, after: { kind: 'sighting', title: s.title, attachments: files.length } });
        return s.id;
      });
    } catch (err) {
      await removeStored(this.deps.store, files, (key, e) => this.deps.logger?.error({ err: e, key }, 'could not remove a file of a failed sighting'));
      throw err;
    }
    this.scheduleDigest(origin);
    return this.dto(await this.load(id));
  }

  async createCorrection(actor: User, input: CorrectionInput, origin: string): Promise<SubmissionDto> {
    const entry = await Entry.findOne({ where: { slug: input.entry, status: ['published', 'retired'] } });
    if (!entry) throw new HttpError(404, 'not_found', `There is no published entry “${input.entry}”.`, { 'body.entry': 'no published entry with this permalink' });
    const version = await EntryVersion.findOne({ where: { entryId: entry.id, number: input.version, state: 'published' }, attributes: ['id', 'number'] });
    if (!version) throw new HttpError(404, 'not_found', `“${entry.title}” has no version ${input.version}.`, { 'body.version': 'no such published version' });
    const id = await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.create(
        {
          ...UNSET,
          kind: 'correction',
          title: `${entry.title} (version ${input.version}): ${SECTION_WORDS[input.section]}`.slice(0, 200),
          submitterId: actor.id,
          entryId: entry.id,
          entryVersion: input.version,
          section: input.section,
          whatIsWrong: input.whatIsWrong,
          suggestedFix: input.suggestedFix,
          sources: input.sources || null,
        },
        { transaction },
      );
      await this.event(transaction, s.id, 'submitted', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.created', subjectType: 'submission', subjectId: s.id, after: { kind: 'correction', entry: entry.slug, version: input.version, section: input.section } });
      return s.id;
    });
    this.scheduleDigest(origin);
    return this.dto(await this.load(id));
  }

  async answer(actor: User, id: number, message: string, origin: string): Promise<SubmissionDto> {
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!s || s.submitterId !== actor.id) throw notFound(id);
      if (s.status !== 'waiting') throw new HttpError(409, 'not_waiting', 'This submission is not waiting for an answer from you.');
      s.status = 'open';
      s.moderatorsNotifiedAt = null; // back in the queue: the moderators hear of it again
      await s.save({ transaction });
      await this.event(transaction, s.id, 'answered', actor.id, message);
      await audit(transaction, { actorId: actor.id, action: 'submission.answered', subjectType: 'submission', subjectId: s.id, before: { status: 'waiting' }, after: { status: 'open' } });
    });
    this.scheduleDigest(origin);
    return this.dto(await this.load(id));
  }

  // ---- the queue -----------------------------------------------------------------------------

  /** Locks the row and checks what every moderator action needs. */
  private async forModerator(actor: User, id: number, transaction: Transaction): Promise<Submission> {
    const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!s) throw notFound(id);
    if (s.submitterId === actor.id) throw new HttpError(403, 'own_submission', 'You sent this submission yourself; another moderator must decide it.');
    if (!(OPEN_STATUSES as readonly string[]).includes(s.status)) throw new HttpError(409, 'already_decided', `This submission was already decided (${s.status}).`);
    return s;
  }

  async claim(actor: User, id: number): Promise<SubmissionDto> {
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await this.forModerator(actor, id, transaction);
      if (s.status === 'claimed' && s.claimedById === actor.id) return;
      if (s.status === 'claimed' && s.claimedById !== actor.id && s.claimedAt && Date.now() - s.claimedAt.getTime() < CLAIM_TTL_MS) {
        const holder = await User.findByPk(s.claimedById!, { attributes: ['displayName'], transaction });
        throw new HttpError(409, 'claimed_by_other', `${holder?.displayName ?? 'Another moderator'} is deciding this submission.`);
      }
      const before = { status: s.status, claimedById: s.claimedById };
      s.status = 'claimed';
      s.claimedById = actor.id;
      s.claimedAt = new Date();
      await s.save({ transaction });
      await this.event(transaction, s.id, 'claimed', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.claimed', subjectType: 'submission', subjectId: s.id, before, after: { status: 'claimed', claimedById: actor.id } });
    });
    return this.dto(await this.load(id));
  }

  async release(actor: User, id: number): Promise<SubmissionDto> {
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!s) throw notFound(id);
      if (s.status !== 'claimed') throw new HttpError(409, 'not_claimed', 'Nobody holds this submission.');
      if (!can(actor, 'queue.releaseHeld', { userId: actor.id, ownerId: s.claimedById })) throw new HttpError(409, 'claimed_by_other', 'Another moderator holds this submission; only they (or an admin) can release it.');
      s.status = 'open';
      s.claimedById = null;
      s.claimedAt = null;
      await s.save({ transaction });
      await this.event(transaction, s.id, 'released', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.released', subjectType: 'submission', subjectId: s.id, before: { status: 'claimed' }, after: { status: 'open' } });
    });
    return this.dto(await this.load(id));
  }

  async decide(actor: User, id: number, input: DecideInput, origin: string): Promise<SubmissionDto> {
    const notify: OutgoingMessage[] = [];
    let linkedSlugs: string[] = [];
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await this.forModerator(actor, id, transaction);
      if (s.status !== 'claimed' || s.claimedById !== actor.id) {
        throw new HttpError(409, 'not_claimed', 'Claim this submission before deciding it, so that no other moderator decides it at the same time.');
      }
      const submitter = (await User.findByPk(s.submitterId, { transaction }))!;
      const link = `${origin}/submissions/${s.id}`;
      const before = { status: s.status };
      let status: SubmissionStatus;
      let note: string | null = null;
      let linked: string[] = [];
      let after: Record<string, unknown> = {};

      if (input.decision === 'accept') {
        if (s.kind === 'sighting') {
          if (!input.entries.length) throw new HttpError(400, 'validation_failed', 'Check body.entries: name at least one entry to link the sighting to.', { 'body.entries': 'at least one entry' });
          const entries = await Entry.findAll({ where: { slug: input.entries, status: 'published' }, transaction });
          const missing = input.entries.filter((slug) => !entries.some((e) => e.slug === slug));
          if (missing.length) throw new HttpError(400, 'validation_failed', `Check body.entries: no published entry “${missing[0]}”.`, { 'body.entries': `no published entry “${missing[0]}”` });
          for (const e of entries) await SubmissionEntry.findOrCreate({ where: { submissionId: s.id, entryId: e.id }, transaction });
          linked = entries.map((e) => e.title);
          linkedSlugs = entries.map((e) => e.slug);
          after = { entries: linkedSlugs };
        } else {
          if (input.entries.length) throw new HttpError(400, 'validation_failed', 'Check body.entries: a correction belongs to its own entry; send no entries.', { 'body.entries': 'not for a correction' });
          const entry = (await Entry.findByPk(s.entryId!, { transaction }))!;
          for (const editor of await this.editorsOf(entry.id, transaction)) {
            notify.push(correctionForwardedMessage(editor.email, editor.displayName, entry.title, s.entryVersion!, SECTION_WORDS[s.section ?? 'other'], link));
          }
          after = { entry: entry.slug, forwardedTo: notify.length };
        }
        status = 'accepted';
      } else if (input.decision === 'draft') {
        if (s.kind !== 'sighting') throw new HttpError(400, 'validation_failed', 'Check body.decision: only a sighting can be turned into a draft entry.', { 'body.decision': 'only for sightings' });
        const editor = await User.findByPk(input.editorId, { transaction });
        if (!editor || !can(editor, 'drafts.own')) throw new HttpError(400, 'validation_failed', 'Check body.editorId: choose an editor to own the draft.', { 'body.editorId': 'not an editor' });
        const where = [s.seenAtUrl, s.seenAtCitation].filter(Boolean).join(' — ');
        const figures = (s.figures ?? []).map((f) => `- ${f.label ? `${f.label}: ` : ''}${f.quantity} (${f.display})`).join('\n');
        const content = draftContentSchema.parse({
          title: s.title.length >= 3 ? s.title.slice(0, 160) : `Sighting ${s.id}`,
          mechanismClass: input.mechanismClass,
          howItIsPitched: [`Seen in the wild (sighting ${s.id}): ${where}`, '', s.summary ?? '', figures ? `\nClaimed figures:\n${figures}` : ''].join('\n').slice(0, 6000),
        });
        const draft = await this.deps.entries.createDraft(editor, input.slug, content, { transaction });
        const entry = (await Entry.findOne({ where: { slug: input.slug }, transaction }))!;
        s.draftEntryId = entry.id;
        status = 'drafted';
        after = { draftId: draft.id, slug: input.slug, editorId: editor.id };
      } else if (input.decision === 'ask') {
        status = 'waiting';
        note = input.note;
      } else {
        status = 'rejected';
        note = input.note;
      }

      s.status = status;
      s.claimedById = null;
      s.claimedAt = null;
      if (status !== 'waiting') {
        s.decision = input.decision;
        s.decidedById = actor.id;
        s.decidedAt = new Date();
      }
      s.decisionNote = note ?? (status === 'waiting' ? s.decisionNote : null);
      await s.save({ transaction });
      const what = { accept: 'accepted', draft: 'drafted', ask: 'asked', reject: 'rejected' }[input.decision];
      await this.event(transaction, s.id, what, actor.id, note);
      await audit(transaction, { actorId: actor.id, action: `submission.${what}`, subjectType: 'submission', subjectId: s.id, before, after: { status, ...after, ...(note ? { note } : {}) } });
      notify.push(submissionDecidedMessage(submitter.email, submitter.displayName, s, input.decision, note, linked, link));
    });
    this.mail('submission decision mail', notify);
    // Accepted sightings teach the claim matcher: re-index the linked entries before answering.
    if (linkedSlugs.length) await this.deps.linked?.(linkedSlugs);
    return this.dto(await this.load(id));
  }

  // ---- mail ----------------------------------------------------------------------------------

  private mail(what: string, messages: OutgoingMessage[]): void {
    if (!messages.length) return;
    this.deps.later(what, async () => {
      for (const m of messages) await this.deps.mailer.send(m);
    });
  }

  /** Gathers what arrives within digestMs into one message per moderator. */
  scheduleDigest(origin?: string): void {
    if (origin) this.origin = origin;
    if (this.digestTimer) return;
    this.digestTimer = setTimeout(() => {
      this.digestTimer = null;
      this.deps.later('moderators digest', async () => {
        await this.sendDigest();
      });
    }, this.deps.digestMs) as unknown as NodeJS.Timeout;
    this.digestTimer.unref();
  }

  /**
   * Sends the digest of submissions no digest has listed yet. The rows are marked inside a
   * transaction with SKIP LOCKED, so that two app servers never list the same item twice.
   */
  async sendDigest(): Promise<number> {
    if (this.digestRun) await this.digestRun.catch(() => {});
    let count = 0;
    this.digestRun = (async () => {
      const items = await this.deps.sequelize.transaction(async (transaction) => {
        const rows = await Submission.findAll({
          where: { moderatorsNotifiedAt: null, status: 'open' },
          order: [['id', 'ASC']],
          limit: 500,
          lock: transaction.LOCK.UPDATE,
          skipLocked: true,
          transaction,
        });
        if (!rows.length) return [];
        await Submission.update({ moderatorsNotifiedAt: new Date() }, { where: { id: rows.map((r) => r.id) }, transaction, silent: true });
        return rows.map((r) => ({ kind: r.kind, title: r.title }));
      });
      count = items.length;
      if (!items.length) return;
      const moderators = await User.findAll({ where: { role: 'moderator', emailVerifiedAt: { [Op.ne]: null } } });
      for (const m of moderators) await this.deps.mailer.send(queueDigestMessage(m.email, m.displayName, items, `${this.origin}/queue`));
    })();
    await this.digestRun;
    return count;
  }

  /** The origin for the digest's link: PUBLIC_URL, else that of the request that scheduled it. */
  origin = '';

  stop(): void {
    if (this.digestTimer) clearTimeout(this.digestTimer);
    this.digestTimer = null;
  }
}
