/**
 * Entries: reading the published library, and the vetting workflow behind the Desk —
 * draft → in review → published (version N+1, immutable), sent back, retired. Every write runs in
 * one transaction and every transition writes an audit event; the e-mails to the people concerned
 * go after the commit (a mail failure is logged and never undoes a transition).
 *
 * Drafts are saved as the editor types, so a draft may be incomplete (empty sections, no law yet);
 * the full schema (entryContentSchema), the taxonomy, the 120-word brief and every worksheet are
 * checked when the draft is submitted.
 */
import { Op, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { kitFunctions } from '../../shared/checks/kit-functions';
import { entryContentSchema, IN_BRIEF_MAX_WORDS, wordCount, type EntryContent } from '../../shared/entries/schema';
import { validateWorksheet } from '../../shared/worksheet/evaluate';
import { worksheetSchema } from '../../shared/worksheet/schema';
import { fieldsError, HttpError, validationError } from '../http/errors';
import type { Mailer, OutgoingMessage } from '../mail/mailer';
import { draftApprovedMessage, draftSentBackMessage, reviewRequestedMessage } from '../mail/messages';
import { audit, ConservationLaw, Entry, EntryLaw, EntryVersion, MechanismClass, User } from '../models';
import { renderHtml } from './render';
import type { EntryHtml, EntryStateDto, EntryVersionDto, PersonDto } from '../../shared/api-types';
export type { EntryHtml, EntryStateDto, EntryVersionDto, PersonDto };

// ---------------------------------------------------------------------------------------------
// What the API returns (the shared DTOs live in shared/api-types.ts)





export interface EntryListItemDto {
  slug: string;
  title: string;
  version: number;
  publishedAt: string;
  laws: string[];
  mechanismClass: string | null;
  /** Markdown source of the brief. */
  inBrief: string;
}

export interface VersionSummaryDto {
  number: number;
  changeNote: string;
  publishedAt: string;
  author: PersonDto;
  reviewer: PersonDto | null;
}

export interface DraftDto {
  id: number;
  slug: string;
  state: 'draft' | 'in_review';
  lockVersion: number;
  content: EntryContent;
  author: PersonDto;
  reviewer: PersonDto | null;
  updatedAt: string;
  /** The published version this draft revises (null for a new entry). */
  basedOn: number | null;
  /** The reason given when the draft was last sent back, if it was. */
  reviewNote: string | null;
  entryStatus: EntryStateDto['status'];
}

export interface DraftSummaryDto {
  id: number;
  slug: string;
  title: string;
  state: 'draft' | 'in_review';
  updatedAt: string;
  author: PersonDto;
  lockVersion: number;
}

export interface PublishedSummaryDto {
  slug: string;
  title: string;
  version: number;
  publishedAt: string;
  changeNote: string;
  author: PersonDto;
  reviewer: PersonDto | null;
}

const person = (u: User | null | undefined): PersonDto | null => (u ? { id: u.id, displayName: u.displayName } : null);

// ---------------------------------------------------------------------------------------------

const notFound = (slug: string) => new HttpError(404, 'not_found', `There is no published entry “${slug}”.`);
const draftNotFound = (id: number) => new HttpError(404, 'not_found', `There is no open draft ${id}.`);

const PEOPLE = [
  { model: User, as: 'author', attributes: ['id', 'displayName', 'email'] },
  { model: User, as: 'reviewer', attributes: ['id', 'displayName', 'email'] },
];

export interface EntriesDeps {
  sequelize: Sequelize;
  mailer: Mailer;
  /** Runs mail work after the answer has gone (app.ts), logging a failure. */
  later: (what: string, job: () => Promise<void>) => void;
  /** Called after an entry was published or retired (the search index re-reads it). */
  changed?: (slug: string) => Promise<void>;
}

export class Entries {
  constructor(private readonly deps: EntriesDeps) {}

  private readonly htmlCache = new Map<number, EntryHtml>();

  // ------------------------------------------------------------------------------- reading

  private renderVersion(v: EntryVersion): EntryVersionDto {
    return {
      number: v.number!,
      changeNote: v.changeNote ?? '',
      publishedAt: v.publishedAt!.toISOString(),
      author: person(v.author)!,
      reviewer: person(v.reviewer),
      content: v.content,
      html: renderHtml(this.htmlCache, v.id, v.content),
    };
  }

  private async stateOf(entry: Entry, latest: number): Promise<EntryStateDto> {
    const dto: EntryStateDto = { slug: entry.slug, status: entry.status, title: entry.title, latestVersion: latest };
    if (entry.status === 'retired') {
      const successor = entry.successorId ? await Entry.findByPk(entry.successorId, { attributes: ['slug'] }) : null;
      dto.retired = successor ? { reason: entry.retiredReason ?? '', successor: successor.slug } : { reason: entry.retiredReason ?? '' };
    }
    return dto;
  }

  /** An entry that has a published version (published or retired), or 404. */
  private async publishedEntry(slug: string, transaction?: Transaction): Promise<Entry> {
    const entry = await Entry.findOne({ where: { slug }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
    if (!entry || !entry.currentVersionId) throw notFound(slug);
    return entry;
  }

  async list(q: { law?: string; mechanism?: string; limit: number; offset: number }): Promise<{ entries: EntryListItemDto[]; total: number }> {
    const where: Record<string | symbol, unknown> = { status: 'published' };
    if (q.mechanism) {
      // A class and every class below it in the tree.
      const classes = await MechanismClass.findAll({ attributes: ['id', 'slug', 'parentId'] });
      const root = classes.find((c) => c.slug === q.mechanism);
      if (!root) return { entries: [], total: 0 };
      const ids = new Set([root.id]);
      for (let grew = true; grew; ) {
        grew = false;
        for (const c of classes) if (c.parentId && ids.has(c.parentId) && !ids.has(c.id)) (ids.add(c.id), (grew = true));
      }
      where.mechanismClassId = { [Op.in]: [...ids] };
    }
    if (q.law) {
      const law = await ConservationLaw.findOne({ where: { slug: q.law }, attributes: ['id'] });
      if (!law) return { entries: [], total: 0 };
      const links = await EntryLaw.findAll({ where: { lawId: law.id }, attributes: ['entryId'] });
      where.id = { [Op.in]: links.map((l) => l.entryId) };
    }
    const { rows, count } = await Entry.findAndCountAll({
      where,
      include: [
        { model: EntryVersion, as: 'currentVersion' },
        { model: MechanismClass, as: 'mechanismClass', attributes: ['slug'] },
      ],
      order: [['lastPublishedAt', 'DESC'], ['id', 'DESC']],
      limit: q.limit,
      offset: q.offset,
      distinct: true,
    });
    const laws = rows.length ? await EntryLaw.findAll({ where: { entryId: rows.map((r) => r.id) } }) : [];
    const lawSlugs = new Map((await ConservationLaw.findAll({ attributes: ['id', 'slug'] })).map((l) => [l.id, l.slug]));
    return {
      total: count,
      entries: rows.map((e) => {
        const v = e.currentVersion!;
        return {
          slug: e.slug,
          title: v.content.title,
          version: v.number!,
          publishedAt: v.publishedAt!.toISOString(),
          // In the version's own order.
          laws: v.content.laws.filter((s) => laws.some((l) => l.entryId === e.id && lawSlugs.get(l.lawId) === s)),
          mechanismClass: e.mechanismClass?.slug ?? null,
          inBrief: v.content.inBrief,
        };
      }),
    };
  }

  /** The latest published version, or version `n` for good. */
  async read(slug: string, n?: number): Promise<{ entry: EntryStateDto; version: EntryVersionDto }> {
    const entry = await this.publishedEntry(slug);
    const current = await EntryVersion.findByPk(entry.currentVersionId!, { attributes: ['number'] });
    const version = await EntryVersion.findOne({
      where: n === undefined ? { id: entry.currentVersionId! } : { entryId: entry.id, number: n, state: 'published' },
      include: PEOPLE,
    });
    if (!version) throw new HttpError(404, 'not_found', `Entry “${slug}” has no version ${n}; its latest is version ${current?.number}.`);
    return { entry: await this.stateOf(entry, current!.number!), version: this.renderVersion(version) };
  }

  /** The published version itself as a model (for citing). */
  async versionRow(slug: string, n?: number): Promise<{ entry: Entry; version: EntryVersion }> {
    const entry = await this.publishedEntry(slug);
    const version = await EntryVersion.findOne({
      where: n === undefined ? { id: entry.currentVersionId! } : { entryId: entry.id, number: n, state: 'published' },
      include: PEOPLE,
    });
    if (!version) throw new HttpError(404, 'not_found', `Entry “${slug}” has no version ${n}.`);
    return { entry, version };
  }

  async versions(slug: string): Promise<VersionSummaryDto[]> {
    const entry = await this.publishedEntry(slug);
    const rows = await EntryVersion.findAll({ where: { entryId: entry.id, state: 'published' }, include: PEOPLE, order: [['number', 'DESC']] });
    return rows.map((v) => ({
      number: v.number!,
      changeNote: v.changeNote ?? '',
      publishedAt: v.publishedAt!.toISOString(),
      author: person(v.author)!,
      reviewer: person(v.reviewer),
    }));
  }

  // ------------------------------------------------------------------------------- drafts

  private async draftDto(v: EntryVersion, transaction?: Transaction): Promise<DraftDto> {
    const entry = v.entry ?? (await Entry.findByPk(v.entryId, { transaction }))!;
    const author = v.author ?? (await User.findByPk(v.authorId, { transaction }));
    const reviewer = v.reviewerId ? (v.reviewer ?? (await User.findByPk(v.reviewerId, { transaction }))) : null;
    const basedOn = v.basedOnId ? await EntryVersion.findByPk(v.basedOnId, { attributes: ['number'], transaction }) : null;
    return {
      id: v.id,
      slug: entry.slug,
      state: v.state as DraftDto['state'],
      lockVersion: v.lockVersion,
      content: v.content,
      author: person(author)!,
      reviewer: person(reviewer),
      updatedAt: v.updatedAt.toISOString(),
      basedOn: basedOn?.number ?? null,
      reviewNote: v.reviewNote,
      entryStatus: entry.status,
    };
  }

  /** Mechanism class and laws must name the taxonomy; the brief at most 120 words. */
  private async checkTaxonomy(content: EntryContent, prefix: string, transaction?: Transaction): Promise<{ classId: number; lawIds: number[] }> {
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

  /** The draft, row-locked, that this editor may change, in one of `states`. */
  private async openDraft(id: number, transaction: Transaction): Promise<EntryVersion> {
    const v = await EntryVersion.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!v || (v.state !== 'draft' && v.state !== 'in_review')) throw draftNotFound(id);
    return v;
  }

  private async conflictIfStale(v: EntryVersion, sent: number, transaction: Transaction): Promise<void> {
    if (v.lockVersion !== sent) {
      throw new HttpError(
        409,
        'edit_conflict',
        `This draft was changed after you opened it (you have revision ${sent}, it is now at ${v.lockVersion}). Its current text is in this answer: merge your changes into it and save again.`,
        { 'body.lockVersion': `stale: the draft is at ${v.lockVersion}` },
        { draft: await this.draftDto(v, transaction) },
      );
    }
  }

  async getDraft(id: number): Promise<DraftDto> {
    const v = await EntryVersion.findByPk(id, { include: PEOPLE });
    if (!v || (v.state !== 'draft' && v.state !== 'in_review')) throw draftNotFound(id);
    return this.draftDto(v);
  }

  /** A new entry with its first draft (inside the caller's transaction when one is given). */
  async createDraft(actor: User, slug: string, content: EntryContent, opts: { transaction?: Transaction } = {}): Promise<DraftDto> {
    const taken = () =>
      new HttpError(409, 'slug_taken', `The permalink “${slug}” belongs to another entry. Choose another.`, { 'body.slug': 'taken by another entry' });
    await this.checkTaxonomy(content, 'body.content');
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
        return this.draftDto(v, transaction);
      });
    } catch (err) {
      if (err instanceof UniqueConstraintError) throw taken();
      throw err;
    }
  }

  /** A new draft of a published entry, its content copied from the latest version. */
  async startDraft(actor: User, slug: string): Promise<DraftDto> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const entry = await this.publishedEntry(slug, transaction);
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
      return this.draftDto(v, transaction);
    });
  }

  async updateDraft(actor: User, id: number, content: EntryContent, sentLock: number): Promise<DraftDto> {
    await this.checkTaxonomy(content, 'body.content');
    return this.deps.sequelize.transaction(async (transaction) => {
      const v = await this.openDraft(id, transaction);
      await this.conflictIfStale(v, sentLock, transaction);
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
      return this.draftDto(v, transaction);
    });
  }

  /** The full check of a draft before review: schema, taxonomy, brief, worksheets. */
  private async checkComplete(content: unknown, transaction: Transaction): Promise<EntryContent> {
    const parsed = entryContentSchema.safeParse(content);
    if (!parsed.success) {
      const e = validationError('content', parsed.error);
      throw new HttpError(400, 'draft_incomplete', `The draft is not ready for review. ${e.message}`, e.fields);
    }
    const full = parsed.data;
    try {
      await this.checkTaxonomy(full, 'content', transaction);
    } catch (err) {
      if (err instanceof HttpError) throw new HttpError(400, 'draft_incomplete', `The draft is not ready for review. ${err.message}`, err.fields);
      throw err;
    }
    const fields: Record<string, string> = {};
    full.worksheets.forEach((ws, i) => {
      const r = validateWorksheet(worksheetSchema.parse(ws), { functions: kitFunctions });
      if (!r.ok) for (const [k, m] of Object.entries(r.fields)) fields[`content.worksheets.${i}.${k}`] ??= m;
    });
    const names = Object.keys(fields);
    if (names.length) throw new HttpError(400, 'draft_incomplete', `The draft is not ready for review: a worksheet does not run (${names[0]}: ${fields[names[0]]}).`, fields);
    return full;
  }

  async submit(actor: User, id: number, sentLock: number, origin: string): Promise<DraftDto> {
    const { dto, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await this.openDraft(id, transaction);
      await this.conflictIfStale(v, sentLock, transaction);
      if (v.authorId !== actor.id) throw new HttpError(403, 'not_author', 'Only the author of a draft submits it for review.');
      if (v.state !== 'draft') throw new HttpError(409, 'wrong_state', 'This draft is already waiting for review.');
      v.content = await this.checkComplete(v.content, transaction);
      v.state = 'in_review';
      v.submittedAt = new Date();
      v.lockVersion = v.lockVersion + 1;
      await v.save({ transaction });
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (!entry.currentVersionId) {
        entry.status = 'in_review';
        await entry.save({ transaction });
      }
      await audit(transaction, { actorId: actor.id, action: 'entry.draft_submitted', subjectType: 'entry', subjectId: entry.id, before: { draftId: v.id, state: 'draft' }, after: { draftId: v.id, state: 'in_review' } });
      v.entry = entry;
      const editors = await User.findAll({ where: { role: 'editor', id: { [Op.ne]: actor.id }, emailVerifiedAt: { [Op.ne]: null } }, transaction });
      const link = `${origin}/desk/drafts/${v.id}`;
      return {
        dto: await this.draftDto(v, transaction),
        notify: editors.map((e) => reviewRequestedMessage(e.email, e.displayName, actor.displayName, v.content.title, link)),
      };
    });
    this.mail('review-request mail', notify);
    return dto;
  }

  async approve(actor: User, id: number, changeNote: string, origin: string): Promise<{ slug: string; version: number }> {
    const { result, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await this.openDraft(id, transaction);
      if (v.authorId === actor.id) {
        throw new HttpError(403, 'own_draft', 'You wrote this draft, so another editor must approve it: a second pair of eyes is the point of the review.');
      }
      if (v.state !== 'in_review') throw new HttpError(409, 'wrong_state', 'This draft has not been submitted for review yet.');
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (entry.status === 'retired') throw new HttpError(409, 'entry_retired', `“${entry.title}” is retired; it takes no new versions.`);
      const content = await this.checkComplete(v.content, transaction);
      const { classId, lawIds } = await this.checkTaxonomy(content, 'content', transaction);
      const last = (await EntryVersion.max('number', { where: { entryId: entry.id }, transaction })) as number | null;
      const number = (last ?? 0) + 1;
      const now = new Date();
      const before = { status: entry.status, version: last ?? null };
      // The last write to this row: from here on it is a published version and never changes.
      Object.assign(v, { content, state: 'published', number, reviewerId: actor.id, changeNote, publishedAt: now, lockVersion: v.lockVersion + 1 });
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
        notify: [draftApprovedMessage(author.email, author.displayName, actor.displayName, content.title, number, `${origin}/entries/${entry.slug}/v/${number}`)],
      };
    });
    this.mail('approval mail', notify);
    await this.deps.changed?.(result.slug);
    return result;
  }

  async sendBack(actor: User, id: number, reason: string, origin: string): Promise<DraftDto> {
    const { dto, notify } = await this.deps.sequelize.transaction(async (transaction) => {
      const v = await this.openDraft(id, transaction);
      if (v.state !== 'in_review') throw new HttpError(409, 'wrong_state', 'Only a draft waiting for review can be sent back.');
      v.state = 'draft';
      v.reviewNote = reason;
      v.lockVersion = v.lockVersion + 1;
      await v.save({ transaction });
      const entry = (await Entry.findByPk(v.entryId, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (!entry.currentVersionId) {
        entry.status = 'draft';
        await entry.save({ transaction });
      }
      await audit(transaction, { actorId: actor.id, action: 'entry.sent_back', subjectType: 'entry', subjectId: entry.id, before: { draftId: v.id, state: 'in_review' }, after: { draftId: v.id, state: 'draft', reason } });
      v.entry = entry;
      const author = (await User.findByPk(v.authorId, { transaction }))!;
      const notify: OutgoingMessage[] =
        author.id === actor.id ? [] : [draftSentBackMessage(author.email, author.displayName, actor.displayName, v.content.title, reason, `${origin}/desk/drafts/${v.id}`)];
      return { dto: await this.draftDto(v, transaction), notify };
    });
    this.mail('send-back mail', notify);
    return dto;
  }

  async retire(actor: User, slug: string, reason: string, successorSlug?: string): Promise<EntryStateDto> {
    const state = await this.deps.sequelize.transaction(async (transaction) => {
      const entry = await this.publishedEntry(slug, transaction);
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
      return {
        slug: entry.slug,
        status: entry.status,
        title: entry.title,
        latestVersion: current!.number!,
        retired: successor ? { reason, successor: successor.slug } : { reason },
      } satisfies EntryStateDto;
    });
    await this.deps.changed?.(state.slug);
    return state;
  }

  // ------------------------------------------------------------------------------- the Desk

  async desk(actor: User): Promise<{ mine: DraftSummaryDto[]; toReview: DraftSummaryDto[]; recent: PublishedSummaryDto[] }> {
    const include = [{ model: Entry, as: 'entry', attributes: ['slug'] }, ...PEOPLE];
    const summary = (v: EntryVersion): DraftSummaryDto => ({
      id: v.id,
      slug: v.entry!.slug,
      title: v.content.title,
      state: v.state as DraftSummaryDto['state'],
      updatedAt: v.updatedAt.toISOString(),
      author: person(v.author)!,
      lockVersion: v.lockVersion,
    });
    const [mine, toReview, recent] = await Promise.all([
      EntryVersion.findAll({ where: { authorId: actor.id, state: ['draft', 'in_review'] }, include, order: [['updatedAt', 'DESC'], ['id', 'DESC']], limit: 100 }),
      EntryVersion.findAll({ where: { authorId: { [Op.ne]: actor.id }, state: 'in_review' }, include, order: [['submittedAt', 'ASC'], ['id', 'ASC']], limit: 100 }),
      EntryVersion.findAll({ where: { state: 'published' }, include, order: [['publishedAt', 'DESC'], ['id', 'DESC']], limit: 20 }),
    ]);
    return {
      mine: mine.map(summary),
      toReview: toReview.map(summary),
      recent: recent.map((v) => ({
        slug: v.entry!.slug,
        title: v.content.title,
        version: v.number!,
        publishedAt: v.publishedAt!.toISOString(),
        changeNote: v.changeNote ?? '',
        author: person(v.author)!,
        reviewer: person(v.reviewer),
      })),
    };
  }

  private mail(what: string, messages: OutgoingMessage[]): void {
    if (!messages.length) return;
    this.deps.later(what, async () => {
      for (const m of messages) await this.deps.mailer.send(m);
    });
  }
}
