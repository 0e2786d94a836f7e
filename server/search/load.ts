/**
 * What the full-text index reads from MariaDB: the change watermark, the synonym groups, and the
 * published entries with their laws, class and accepted sightings.
 */
import { col, fn } from 'sequelize';
import { ConservationLaw, Entry, EntryLaw, EntryVersion, MechanismClass, Submission, SubmissionEntry, SynonymGroup, SynonymPhrase } from '../models';
import { plainText } from './normalise';
import { SynonymSet } from './synonyms';
import type { IndexedEntry, SearchDoc } from './types';

/** Most accepted sightings indexed with one entry (the newest links). */
export const SIGHTINGS_PER_ENTRY = 50;

/**
 * What changes whenever the indexed data does. Sightings: links are only ever added (with the
 * acceptance), so their count moves. Synonym groups: a new group raises the highest id, a
 * removed one lowers the count, an edit raises the sum of the versions.
 */
export async function readWatermark(): Promise<string> {
  const [published, retired, newest, links, groups] = await Promise.all([
    EntryVersion.count({ where: { state: 'published' } }),
    Entry.count({ where: { status: 'retired' } }),
    Entry.max('updatedAt') as Promise<Date | string | null>,
    SubmissionEntry.count(),
    SynonymGroup.findOne({
      attributes: [
        [fn('COUNT', col('id')), 'n'],
        [fn('MAX', col('id')), 'top'],
        [fn('SUM', col('version')), 'edits'],
      ],
      raw: true,
    }) as unknown as Promise<{ n: number | string; top: number | null; edits: number | string | null } | null>,
  ]);
  const syn = groups ? `${Number(groups.n)}.${Number(groups.top ?? 0)}.${Number(groups.edits ?? 0)}` : '0';
  return `${published}/${retired}/${newest ? new Date(newest).getTime() : 0}/${links}/${syn}`;
}

/** The synonym groups as the index uses them. */
export async function loadSynonyms(): Promise<SynonymSet> {
  const phrases = await SynonymPhrase.findAll({ attributes: ['groupId', 'phrase', 'position', 'id'], order: [['groupId', 'ASC'], ['position', 'ASC'], ['id', 'ASC']], raw: true });
  const byGroup = new Map<number, string[]>();
  for (const p of phrases) {
    const list = byGroup.get(p.groupId) ?? [];
    list.push(p.phrase);
    byGroup.set(p.groupId, list);
  }
  return new SynonymSet([...byGroup].map(([id, terms]) => ({ id, terms })));
}

/** Entry id → the text of its accepted sightings (title and summary, newest link first, at most SIGHTINGS_PER_ENTRY). */
async function loadSightings(entryIds: number[] | undefined): Promise<Map<number, string>> {
  const links = await SubmissionEntry.findAll({
    where: entryIds ? { entryId: entryIds } : {},
    attributes: ['entryId', 'submissionId', 'createdAt'],
    order: [['createdAt', 'DESC'], ['submissionId', 'DESC']],
    raw: true,
  });
  if (!links.length) return new Map();
  const subs = await Submission.findAll({
    where: { id: [...new Set(links.map((l) => l.submissionId))], kind: 'sighting', status: 'accepted' },
    attributes: ['id', 'title', 'summary'],
    raw: true,
  });
  const text = new Map(subs.map((s) => [s.id, `${s.title}. ${s.summary ?? ''}`.trim()]));
  const out = new Map<number, string[]>();
  for (const l of links) {
    const t = text.get(l.submissionId);
    if (!t) continue;
    const list = out.get(l.entryId) ?? [];
    if (list.length < SIGHTINGS_PER_ENTRY) list.push(t);
    out.set(l.entryId, list);
  }
  return new Map([...out].map(([id, list]) => [id, list.join(' · ')]));
}

/** Law slug → name; mechanism slug → { name, parent slug }. */
export interface TaxonomyNames {
  laws: Map<string, string>;
  classes: Map<string, { name: string; parent: string | null }>;
}

async function loadTaxonomy(): Promise<TaxonomyNames & { lawById: Map<number, ConservationLaw>; classById: Map<number, MechanismClass> }> {
  const [laws, classes] = await Promise.all([ConservationLaw.findAll(), MechanismClass.findAll()]);
  const classById = new Map(classes.map((c) => [c.id, c]));
  return {
    laws: new Map(laws.map((l) => [l.slug, l.name])),
    classes: new Map(classes.map((c) => [c.slug, { name: c.name, parent: c.parentId ? (classById.get(c.parentId)?.slug ?? null) : null }])),
    lawById: new Map(laws.map((l) => [l.id, l])),
    classById,
  };
}

/** The ids of every published entry, ascending. */
export async function loadPublishedIds(): Promise<number[]> {
  const rows = await Entry.findAll({ where: { status: 'published' }, attributes: ['id'], order: [['id', 'ASC']], raw: true });
  return rows.map((r) => r.id);
}

/** The id of the entry with this slug, if there is one. */
export async function findEntryId(slug: string): Promise<number | undefined> {
  const row = await Entry.findOne({ where: { slug }, attributes: ['id'] });
  return row?.id;
}

export interface LoadedEntry {
  doc: SearchDoc;
  entry: IndexedEntry;
}

/** Reads entries (all, or those with these ids) that are published, with what the index needs, and the taxonomy's names. */
export async function loadEntries(ids?: number[]): Promise<TaxonomyNames & { items: LoadedEntry[] }> {
  const { laws: lawNames, classes, lawById, classById } = await loadTaxonomy();
  const rows = await Entry.findAll({
    where: ids ? { id: ids, status: 'published' } : { status: 'published' },
    include: [{ model: EntryVersion, as: 'currentVersion' }],
  });
  const links = rows.length ? await EntryLaw.findAll({ where: { entryId: rows.map((r) => r.id) }, attributes: ['entryId', 'lawId'], raw: true }) : [];
  const sightings = rows.length ? await loadSightings(ids ? rows.map((r) => r.id) : undefined) : new Map<number, string>();
  // Grouped once: filtering the links per entry is quadratic at 10,000 entries.
  const lawsOf = new Map<number, Set<string | undefined>>();
  for (const l of links) {
    const set = lawsOf.get(l.entryId) ?? new Set();
    set.add(lawById.get(l.lawId)?.slug);
    lawsOf.set(l.entryId, set);
  }
  const items = rows
    .filter((e) => e.currentVersion)
    .map((e) => {
      const v = e.currentVersion!;
      const c = v.content;
      const own = lawsOf.get(e.id) ?? new Set();
      const laws = c.laws.filter((s) => own.has(s));
      const cls = e.mechanismClassId ? classById.get(e.mechanismClassId) : undefined;
      const inBrief = plainText(c.inBrief);
      const doc: SearchDoc = {
        id: e.id,
        slug: e.slug,
        title: c.title,
        aliases: (c.aliases ?? []).join(' · '),
        inBrief,
        howItIsPitched: plainText(c.howItIsPitched),
        whyItFails: plainText(c.whyItFails),
        whatFakesTheEffect: plainText(c.whatFakesTheEffect ?? ''),
        mechanism: cls?.name ?? '',
        laws: laws.map((s) => lawNames.get(s) ?? s).join(' · '),
        citations: (c.sources ?? []).map((s) => String(s.csl.title)).join(' · '),
        sightings: sightings.get(e.id) ?? '',
      };
      const entry: IndexedEntry = {
        id: e.id,
        slug: e.slug,
        title: c.title,
        version: v.number!,
        publishedAt: (v.publishedAt ?? e.lastPublishedAt ?? new Date(0)).getTime(),
        laws,
        mechanismClass: cls?.slug ?? null,
        inBrief,
        excerptText: `${inBrief} ${doc.whyItFails}`.trim(),
      };
      return { doc, entry };
    });
  return { laws: lawNames, classes, items };
}
