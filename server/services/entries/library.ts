/**
 * The published library: the list, one version (the latest or version n, for good), the version
 * as a model for citing, and an entry's versions. Reading only.
 */
import { Op } from 'sequelize';
import type { EntryHtml, EntryListQuery, EntryListResponse, EntryResponse, VersionSummaryDto } from '../../../shared/api-types';
import { HttpError } from '../../http/errors';
import { ConservationLaw, Entry, EntryLaw, EntryVersion, MechanismClass, User } from '../../models';
import { entryState, entrySummary, entryVersion, versionSummary } from '../../presenters/entries';
import { renderHtml } from '../render';
import { PEOPLE, publishedEntry } from './common';

export class Library {
  private readonly htmlCache = new Map<number, EntryHtml>();

  async list(q: Required<Pick<EntryListQuery, 'limit' | 'offset'>> & EntryListQuery): Promise<EntryListResponse> {
    const where: Record<string | symbol, unknown> = { status: 'published' };
    if (q.mechanism) {
      // A class and every class below it in the tree.
      const classes = await MechanismClass.findAll({ attributes: ['id', 'slug', 'parentId'] });
      const root = classes.find((c) => c.slug === q.mechanism);
      if (!root) return { entries: [], total: 0 };
      const ids = new Set([root.id]);
      for (let grew = true; grew; ) {
        grew = false;
        for (const c of classes) {
          if (c.parentId && ids.has(c.parentId) && !ids.has(c.id)) {
            ids.add(c.id);
            grew = true;
          }
        }
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
      entries: rows.map((e) =>
        // The laws in the version's own order.
        entrySummary(
          e,
          e.currentVersion!.content.laws.filter((s) => laws.some((l) => l.entryId === e.id && lawSlugs.get(l.lawId) === s)),
          renderHtml(this.htmlCache, e.currentVersion!.id, e.currentVersion!.content).inBrief,
        ),
      ),
    };
  }

  /** The latest published version, or version `n` for good. */
  async read(slug: string, n?: number): Promise<EntryResponse> {
    const entry = await publishedEntry(slug);
    const current = await EntryVersion.findByPk(entry.currentVersionId!, { attributes: ['number'] });
    const version = await EntryVersion.findOne({
      where: n === undefined ? { id: entry.currentVersionId! } : { entryId: entry.id, number: n, state: 'published' },
      include: PEOPLE,
    });
    if (!version) throw new HttpError(404, 'not_found', `Entry “${slug}” has no version ${n}; its latest is version ${current?.number}.`);
    const successor = entry.status === 'retired' && entry.successorId ? await Entry.findByPk(entry.successorId, { attributes: ['slug'] }) : null;
    return {
      entry: entryState(entry, current!.number!, successor?.slug),
      version: entryVersion(version, renderHtml(this.htmlCache, version.id, version.content)),
    };
  }

  /**
   * The published version itself as a model (for citing), with its authors: every editor who wrote
   * a published version up to and including it, in order of first contribution, each once.
   */
  async versionRow(slug: string, n?: number): Promise<{ entry: Entry; version: EntryVersion; authors: User[] }> {
    const entry = await publishedEntry(slug);
    const version = await EntryVersion.findOne({
      where: n === undefined ? { id: entry.currentVersionId! } : { entryId: entry.id, number: n, state: 'published' },
      include: PEOPLE,
    });
    if (!version) throw new HttpError(404, 'not_found', `Entry “${slug}” has no version ${n}.`);
    const upTo = await EntryVersion.findAll({
      where: { entryId: entry.id, state: 'published', number: { [Op.lte]: version.number! } },
      attributes: ['id', 'number'],
      include: [{ model: User, as: 'author', attributes: ['id', 'displayName'] }],
      order: [['number', 'ASC']],
    });
    // A Map keeps each key where it was first set: the order of first contribution.
    const authors = [...new Map(upTo.map((v) => [v.author!.id, v.author!] as const)).values()];
    return { entry, version, authors };
  }

  async versions(slug: string): Promise<VersionSummaryDto[]> {
    const entry = await publishedEntry(slug);
    const rows = await EntryVersion.findAll({ where: { entryId: entry.id, state: 'published' }, include: PEOPLE, order: [['number', 'DESC']] });
    return rows.map(versionSummary);
  }
}
