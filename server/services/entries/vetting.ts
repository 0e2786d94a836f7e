/**
 * Vetting: a draft submitted for review (the full check), approved by another editor (version N+1,
 * immutable from then on), sent back to its author; and retiring a published entry. Every step
 * runs in one transaction with its audit event; the e-mails to the people concerned go after the
 * commit (a mail failure is logged and never undoes a step).
 */
import { Op, type Transaction } from 'sequelize';
import type { DraftDto, EntryStateDto } from '../../../shared/api-types';
import { kitFunctions } from '../../../shared/checks/kit-functions';
import { entryContentSchema, type EntryContent } from '../../../shared/entries/schema';
import { contentTexProblems, texProblemWords } from '../../../shared/entries/tex-check';
import { permalink } from '../../../shared/permalink';
import { fieldSentence, ourWords } from '../../../shared/schemas/drafts';
import type * as Evaluate from '../../../shared/worksheet/evaluate';
import { worksheetSchema } from '../../../shared/worksheet/schema';
import { HttpError, validationError } from '../../http/errors';
import type { OutgoingMessage } from '../../mail/mailer';
import { draftApprovedMessage, draftSentBackMessage, reviewRequestedMessage } from '../../mail/messages';
import { audit, Entry, EntryLaw, EntryVersion, User } from '../../models';
import { entryState } from '../../presenters/entries';
import { publishedEntry, type EntriesDeps } from './common';
import { checkTaxonomy, conflictIfStale, openDraft, presentDraft } from './drafts';

/** The states a version passes through in review, as data: each step's allowed starting state and where it leads. */
export const VERSION_STEPS = {
  submit: { from: 'draft', to: 'in_review' },
  approve: { from: 'in_review', to: 'published' },
  sendBack: { from: 'in_review', to: 'draft' },
} as const satisfies Record<string, { from: EntryVersion['state']; to: EntryVersion['state'] }>;

/**
 * The full check of a draft before review: schema (in our words, never zod's defaults), taxonomy,
 * brief, TeX that KaTeX cannot read (named by field and line), worksheets.
 */
async function checkComplete(content: unknown, transaction: Transaction): Promise<EntryContent> {
  const notReady = (fields: Record<string, string>) => {
    const [first] = Object.keys(fields);
    return new HttpError(400, 'draft_incomplete', `The draft is not ready for review. ${fieldSentence(first, fields[first])}`, fields);
  };
  const parsed = entryContentSchema.safeParse(content, { error: ourWords });
  if (!parsed.success) throw notReady(validationError('content', parsed.error).fields!);
  const full = parsed.data;
  try {
    await checkTaxonomy(full, 'content', transaction);
  } catch (err) {
    if (err instanceof HttpError && err.fields) throw notReady(err.fields);
    throw err;
  }
  const tex: Record<string, string> = {};
  for (const [path, problem] of Object.entries(contentTexProblems(full))) tex[`content.${path}`] = texProblemWords(problem);
  if (Object.keys(tex).length) throw notReady(tex);
  // Loaded at the first submission, not with the app: the evaluator brings mathjs (about a second to load).
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { validateWorksheet } = require('../../../shared/worksheet/evaluate') as typeof Evaluate;
  const fields: Record<string, string> = {};
  full.worksheets.forEach((ws, i) => {
    const r = validateWorksheet(worksheetSchema.parse(ws), { functions: kitFunctions });
    if (!r.ok) for (const [k, m] of Object.entries(r.fields)) fields[`content.worksheets.${i}.${k}`] ??= m;
  });
  const names = Object.keys(fields);
  if (names.length) throw new HttpError(400, 'draft_incomplete', `The draft is not ready for review: a worksheet does not run (${fieldSentence(names[0], fields[names[0]])})`, fields);
  return full;
}

export class Vetting {
  constructor(private readonly deps: EntriesDeps) {}

  async submit(actor: User, id: number, sentLock: number, origin: string): Promise<DraftDto> {
    const step = VERSION_STEPS.submit;
    const { dto, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await openDraft(id, transaction);
      await conflictIfStale(v, sentLock, transaction);
      if (v.authorId !== actor.id) throw new HttpError(403, 'not_author', 'Only the author of a draft submits it for review.');
      if (v.state !== step.from) throw new HttpError(409, 'wrong_state', 'This draft is already waiting for review.');
      v.content = await checkComplete(v.content, transaction);
      v.state = step.to;
      v.submittedAt = new Date();
      v.lockVersion = v.lockVersion + 1;
      await v.save({ transaction });
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (!entry.currentVersionId) {
        entry.status = 'in_review';
        await entry.save({ transaction });
      }
      await audit(transaction, { actorId: actor.id, action: 'entry.draft_submitted', subjectType: 'entry', subjectId: entry.id, before: { draftId: v.id, state: step.from }, after: { draftId: v.id, state: step.to } });
      v.entry = entry;
      const editors = await User.findAll({ where: { role: 'editor', id: { [Op.ne]: actor.id }, emailVerifiedAt: { [Op.ne]: null } }, transaction });
      const link = `${origin}/desk/drafts/${v.id}`;
      return {
        dto: await presentDraft(v, transaction),
        notify: editors.map((e) => reviewRequestedMessage(e.email, e.displayName, actor.displayName, v.content.title, link)),
      };
    });
    this.deps.mail('review-request mail', notify);
    return dto;
  }

  async approve(actor: User, id: number, changeNote: string, origin: string): Promise<{ slug: string; version: number }> {
    const step = VERSION_STEPS.approve;
    const { result, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await openDraft(id, transaction);
      if (v.authorId === actor.id) {
        throw new HttpError(403, 'own_draft', 'You wrote this draft, so another editor must approve it: a second pair of eyes is the point of the review.');
      }
      if (v.state !== step.from) throw new HttpError(409, 'wrong_state', 'This draft has not been submitted for review yet.');
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (entry.status === 'retired') throw new HttpError(409, 'entry_retired', `“${entry.title}” is retired; it takes no new versions.`);
      const content = await checkComplete(v.content, transaction);
      const { classId, lawIds } = await checkTaxonomy(content, 'content', transaction);
      const last = (await EntryVersion.max('number', { where: { entryId: entry.id }, transaction })) as number | null;
      const number = (last ?? 0) + 1;
      const now = new Date();
      const before = { status: entry.status, version: last ?? null };
      // The last write to this row: from here on it is a published version and never changes.
      Object.assign(v, { content, state: step.to, number, reviewerId: actor.id, changeNote, publishedAt: now, lockVersion: v.lockVersion + 1 });
      await v.save({ transaction });
      Object.assign(entry, { status: 'published', currentVersionId: v.id, lastPublishedAt: now, title: content.title, mechanismClassId: classId });
      await entry.save({ transaction });
      await EntryLaw.destroy({ where: { entryId: entry.id }, transaction });
      await EntryLaw.bulkCreate(lawIds.map((lawId) => ({ entryId: entry.id, lawId })), { transaction });
      await audit(transaction, {
        actorId: actor.id, action: 'entry.published', subjectType: 'entry', subjectId: entry.id,
        before, after: { status: 'published', version: number, versionId: v.id, authorId: v.authorId, reviewerId: actor.id, changeNote },
      });
      const author = (await User.findByPk(v.authorId, { transaction }))!;
      return {
        result: { slug: entry.slug, version: number },
        notify: [draftApprovedMessage(author.email, author.displayName, actor.displayName, content.title, number, permalink(origin, entry.slug, number))],
      };
    });
    this.deps.mail('approval mail', notify);
    await this.deps.changed?.(result.slug);
    return result;
  }

  async sendBack(actor: User, id: number, reason: string, origin: string): Promise<DraftDto> {
    const step = VERSION_STEPS.sendBack;
    const { dto, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await openDraft(id, transaction);
      if (v.state !== step.from) throw new HttpError(409, 'wrong_state', 'Only a draft waiting for review can be sent back.');
      v.state = step.to;
      v.reviewNote = reason;
      v.lockVersion = v.lockVersion + 1;
      await v.save({ transaction });
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (!entry.currentVersionId) {
        entry.status = 'draft';
        await entry.save({ transaction });
      }
      await audit(transaction, { actorId: actor.id, action: 'entry.sent_back', subjectType: 'entry', subjectId: entry.id, before: { draftId: v.id, state: step.from }, after: { draftId: v.id, state: step.to, reason } });
      v.entry = entry;
      const author = (await User.findByPk(v.authorId, { transaction }))!;
      const notify: OutgoingMessage[] =
        author.id === actor.id ? [] : [draftSentBackMessage(author.email, author.displayName, actor.displayName, v.content.title, reason, `${origin}/desk/drafts/${v.id}`)];
      return { dto: await presentDraft(v, transaction), notify };
    });
    this.deps.mail('send-back mail', notify);
    return dto;
  }

  async retire(actor: User, slug: string, reason: string, successorSlug?: string): Promise<EntryStateDto> {
    const state = await this.deps.sequelize.transaction(async (transaction) => {
      const entry = await publishedEntry(slug, transaction);
      if (entry.status === 'retired') throw new HttpError(409, 'entry_retired', `“${entry.title}” is retired already.`);
      let successor: Entry | null = null;
      if (successorSlug) {
        successor = await Entry.findOne({ where: { slug: successorSlug }, transaction });
        const why =
          successorSlug === slug ? 'an entry cannot succeed itself'
          : !successor || successor.status !== 'published' ? `no published entry “${successorSlug}”`
          : null;
        if (why) throw new HttpError(400, 'validation_failed', `Check body.successor: ${why}.`, { 'body.successor': why });
      }
      const before = { status: entry.status };
      Object.assign(entry, { status: 'retired', retiredReason: reason, successorId: successor?.id ?? null });
      await entry.save({ transaction });
      await audit(transaction, { actorId: actor.id, action: 'entry.retired', subjectType: 'entry', subjectId: entry.id, before, after: { status: 'retired', reason, successor: successor?.slug ?? null } });
      const current = await EntryVersion.findByPk(entry.currentVersionId!, { attributes: ['number'], transaction });
      return entryState(entry, current!.number!, successor?.slug);
    });
    await this.deps.changed?.(state.slug);
    return state;
  }
}
