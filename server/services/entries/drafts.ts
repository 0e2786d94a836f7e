/**
 * Drafts: a new entry with its first draft, a new draft of a published entry, saving a draft as
 * the editor types (optimistic locking), reading one. Drafts are saved incomplete; the full check
 * is vetting's, at submit. Every write runs in one transaction with its audit event.
 */
import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { DraftDto, DraftPublishedExtra } from '../../../shared/api-types';
import { IN_BRIEF_MAX_WORDS, wordCount, type EntryContent } from '../../../shared/entries/schema';
import { fieldsError, HttpError } from '../../http/errors';
import { audit, ConservationLaw, Entry, EntryVersion, MechanismClass, User } from '../../models';
import { draft } from '../../presenters/entries';
import { draftNotFound, PEOPLE, publishedEntry, type EntriesDeps } from './common';

/** A draft with what its presenter needs, loaded in the caller's transaction. */
export async function presentDraft(v: EntryVersion, transaction?: Transaction): Promise<DraftDto> {
  const entry = v.entry ?? (await Entry.findByPk(v.entryId, { transaction }))!;
  const author = v.author ?? (await User.findByPk(v.authorId, { transaction }));
  const reviewer = v.reviewerId ? (v.reviewer ?? (await User.findByPk(v.reviewerId, { transaction }))) : null;
  const basedOn = v.basedOnId ? await EntryVersion.findByPk(v.basedOnId, { attributes: ['number'], transaction }) : null;
  return draft(v, entry, author, reviewer, basedOn?.number ?? null);
}

/**
 * A draft that was approved is the published version itself (the same row, numbered at approval):
 * its old address answers 404 `draft_published` with the version it became, so that a link in an
 * old e-mail or a reload after approving leads to the entry rather than to nothing.
 */
async function draftPublished(v: EntryVersion): Promise<HttpError> {
  const entry = (await Entry.findByPk(v.entryId, { attributes: ['slug', 'title'] }))!;
  const published: DraftPublishedExtra['published'] = { slug: entry.slug, version: v.number!, title: v.content.title };
  return new HttpError(404, 'draft_published', `Draft ${v.id} is no longer open: it was published as version ${v.number} of “${published.title}”.`, undefined, { published });
}

/** Mechanism class and laws must name the taxonomy; related entries must exist; the brief at most 120 words. */
export async function checkTaxonomy(content: EntryContent, prefix: string, transaction?: Transaction): Promise<{ classId: number; lawIds: number[] }> {
  const fields: Record<string, string> = {};
  const cls = await MechanismClass.findOne({ where: { slug: content.mechanismClass }, attributes: ['id'], transaction });
  if (!cls) fields[`${prefix}.mechanismClass`] = `no mechanism class “${content.mechanismClass}” in the taxonomy`;
  const laws = content.laws.length ? await ConservationLaw.findAll({ where: { slug: content.laws }, attributes: ['id', 'slug'], transaction }) : [];
  content.laws.forEach((s, i) => {
    if (!laws.some((l) => l.slug === s)) fields[`${prefix}.laws.${i}`] ??= `no conservation law “${s}” in the taxonomy`;
  });
  if (new Set(content.laws).size !== content.laws.length) fields[`${prefix}.laws`] = 'a law is named twice';
  // Related entries must exist (a draft may name one not yet published; never itself twice).
  const related = content.related ?? [];
  const known = related.length ? await Entry.findAll({ where: { slug: related }, attributes: ['slug'], transaction }) : [];
  related.forEach((s, i) => {
    if (!known.some((e) => e.slug === s)) fields[`${prefix}.related.${i}`] ??= `no entry “${s}” in the library`;
  });
  if (new Set(related).size !== related.length) fields[`${prefix}.related`] = 'an entry is named twice';
  const words = wordCount(content.inBrief);
  if (words > IN_BRIEF_MAX_WORDS) fields[`${prefix}.inBrief`] = `at most ${IN_BRIEF_MAX_WORDS} words (this has ${words})`;
  if (Object.keys(fields).length) throw fieldsError('validation_failed', fields);
  return { classId: cls!.id, lawIds: content.laws.map((s) => laws.find((l) => l.slug === s)!.id) };
}

/** The open draft (draft or in review), row-locked, or 404. */
export async function openDraft(id: number, transaction: Transaction): Promise<EntryVersion> {
  const v = await EntryVersion.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  if (!v || (v.state !== 'draft' && v.state !== 'in_review')) throw draftNotFound(id);
  return v;
}

/** 409 edit_conflict, with the draft as it now is, when the editor's revision is not the draft's. */
export async function conflictIfStale(v: EntryVersion, sent: number, transaction: Transaction): Promise<void> {
  if (v.lockVersion !== sent) {
    throw new HttpError(
      409,
      'edit_conflict',
      `This draft was changed after you opened it (you have revision ${sent}, it is now at ${v.lockVersion}). Its current text is in this answer: merge your changes into it and save again.`,
      { 'body.lockVersion': `stale: the draft is at ${v.lockVersion}` },
      { draft: await presentDraft(v, transaction) },
    );
  }
}

export class Drafts {
  constructor(private readonly deps: Pick<EntriesDeps, 'sequelize'>) {}

  async getDraft(id: number): Promise<DraftDto> {
    const v = await EntryVersion.findByPk(id, { include: PEOPLE });
    if (v && v.number !== null && (v.state === 'published' || v.state === 'superseded')) throw await draftPublished(v);
    if (!v || (v.state !== 'draft' && v.state !== 'in_review')) throw draftNotFound(id);
    return presentDraft(v);
  }

  /** A new entry with its first draft (inside the caller's transaction when one is given). */
  async createDraft(actor: User, slug: string, content: EntryContent, opts: { transaction?: Transaction } = {}): Promise<DraftDto> {
    const taken = () =>
      new HttpError(409, 'slug_taken', `The permalink “${slug}” belongs to another entry. Choose another.`, { 'body.slug': 'taken by another entry' });
    await checkTaxonomy(content, 'body.content');
    if (await Entry.findOne({ where: { slug }, attributes: ['id'], transaction: opts.transaction })) throw taken();
    const within = <T>(work: (t: Transaction) => Promise<T>) => (opts.transaction ? work(opts.transaction) : this.deps.sequelize.transaction(work));
    try {
      return await within(async (transaction) => {
        const cls = await MechanismClass.findOne({ where: { slug: content.mechanismClass }, attributes: ['id'], transaction });
        const entry = await Entry.create(
          { slug, title: content.title, status: 'draft', mechanismClassId: cls!.id, currentVersionId: null, lastPublishedAt: null, retiredReason: null, successorId: null },
          { transaction },
        );
        const v = await EntryVersion.create(
          { entryId: entry.id, number: null, state: 'draft', basedOnId: null, content, changeNote: null, reviewNote: null, authorId: actor.id, reviewerId: null, submittedAt: null, publishedAt: null },
          { transaction },
        );
        await audit(transaction, { actorId: actor.id, action: 'entry.draft_created', subjectType: 'entry', subjectId: entry.id, after: { slug, draftId: v.id, state: 'draft' } });
        v.entry = entry;
        return presentDraft(v, transaction);
      });
    } catch (err) {
      if (err instanceof UniqueConstraintError) throw taken();
      throw err;
    }
  }

  /** A new draft of a published entry, its content copied from the latest version. */
  async startDraft(actor: User, slug: string): Promise<DraftDto> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const entry = await publishedEntry(slug, transaction);
      if (entry.status === 'retired') {
        throw new HttpError(409, 'entry_retired', `“${entry.title}” is retired; it takes no new drafts.`);
      }
      const open = await EntryVersion.findOne({ where: { entryId: entry.id, state: ['draft', 'in_review'] }, attributes: ['id'], transaction });
      if (open) {
        throw new HttpError(409, 'draft_exists', `“${entry.title}” already has an open draft (${open.id}); continue that one.`, undefined, { draftId: open.id });
      }
      const current = (await EntryVersion.findByPk(entry.currentVersionId!, { transaction }))!;
      const v = await EntryVersion.create(
        {
          entryId: entry.id, number: null, state: 'draft', basedOnId: current.id, content: current.content, changeNote: null, reviewNote: null,
          authorId: actor.id, reviewerId: null, submittedAt: null, publishedAt: null,
        },
        { transaction },
      );
      await audit(transaction, { actorId: actor.id, action: 'entry.draft_started', subjectType: 'entry', subjectId: entry.id, before: { version: current.number }, after: { draftId: v.id, state: 'draft' } });
      v.entry = entry;
      return presentDraft(v, transaction);
    });
  }

  async updateDraft(actor: User, id: number, content: EntryContent, sentLock: number): Promise<DraftDto> {
    await checkTaxonomy(content, 'body.content');
    return this.deps.sequelize.transaction(async (transaction) => {
      const v = await openDraft(id, transaction);
      await conflictIfStale(v, sentLock, transaction);
      if (v.authorId !== actor.id) throw new HttpError(403, 'not_author', 'Only the author of a draft edits it; send it back with your suggestions instead.');
      if (v.state !== 'draft') throw new HttpError(409, 'wrong_state', 'This draft is in review and cannot be edited; it can be approved or sent back.');
      v.content = content;
      v.lockVersion = v.lockVersion + 1;
      await v.save({ transaction });
      const entry = (await Entry.findByPk(v.entryId, { transaction }))!;
      // A never-published entry takes its title and class from its draft (the Desk lists it by them).
      if (!entry.currentVersionId && (entry.title !== content.title)) {
        entry.title = content.title;
        await entry.save({ transaction });
      }
      v.entry = entry;
      return presentDraft(v, transaction);
    });
  }
}
