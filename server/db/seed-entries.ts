/**
 * The starter library as files (DESIGN.md §7): `content/entries/*.md` → an empty entries table, and
 * the live library → the same files again (`npm run content:export`).
 *
 * Import: every file becomes an entry with a published version 1, its author and reviewer the demo
 * editors the file names; all files in one transaction (all land or none does); a malformed file is
 * refused with its name and line (EntryFileError from shared/entries/load.ts); a table that already
 * holds entries is left as it is.
 *
 * Export: each entry's latest published version (retired entries too), with its author, reviewer
 * and change note, written with serializeEntryFile.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type * as EntryLoad from '../../shared/entries/load';
import type { EntryContent, EntryFile } from '../../shared/entries/schema';
import { audit, ConservationLaw, Entry, EntryLaw, EntryVersion, MechanismClass, User } from '../models';

/**
 * shared/entries/load.ts, loaded at first use: it checks each worksheet with the evaluator, which
 * brings mathjs (about a second to load), and most test apps import this module and seed no entries.
 */
// eslint-disable-next-line @typescript-eslint/no-require-imports
const entryLoad = () => require('../../shared/entries/load') as typeof EntryLoad;

export class EntryImportError extends Error {
  override readonly name = 'EntryImportError';
}

/** The files of content/entries, parsed; throws EntryFileError for the first malformed one. */
export function readEntryFiles(contentDir: string): { file: string; entry: EntryFile }[] {
  const dir = path.join(contentDir, 'entries');
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith('.md'))
    .sort()
    .map((f) => ({ file: f, entry: entryLoad().parseEntryFile(fs.readFileSync(path.join(dir, f), 'utf8'), f) }));
}

/** The content of a version: every field of the file but the file's own bookkeeping. */
export function contentOf(file: EntryFile): EntryContent {
  const { slug: _slug, author: _author, reviewer: _reviewer, changeNote: _note, ...content } = file;
  return content;
}

/**
 * Imports content/entries into an empty entries table. Returns the number of entries imported
 * (0 when the table held entries already, or there are no files).
 */
export async function importEntriesIfEmpty(sequelize: Sequelize, contentDir: string): Promise<number> {
  if ((await Entry.count()) > 0) return 0;
  const files = readEntryFiles(contentDir);
  if (!files.length) return 0;
  return sequelize.transaction(async (transaction) => {
    if ((await Entry.count({ transaction })) > 0) return 0;
    const classes = new Map((await MechanismClass.findAll({ transaction })).map((c) => [c.slug, c.id]));
    const laws = new Map((await ConservationLaw.findAll({ transaction })).map((l) => [l.slug, l.id]));
    const users = new Map((await User.findAll({ transaction })).map((u) => [u.email, u]));
    const slugs = new Set<string>();
    const when = new Date();
    for (const { file, entry } of files) {
      const fail = (field: string, why: string) => {
        throw new EntryImportError(`content/entries/${file}: ${field}: ${why}`);
      };
      if (slugs.has(entry.slug)) fail('slug', `“${entry.slug}” is used by another file`);
      slugs.add(entry.slug);
      const classId = classes.get(entry.mechanismClass) ?? fail('mechanismClass', `no mechanism class “${entry.mechanismClass}” in content/taxonomy.yml`);
      const lawIds = entry.laws.map((s) => laws.get(s) ?? fail('laws', `no conservation law “${s}” in content/taxonomy.yml`));
      const author = users.get(entry.author) ?? fail('author', `no account ${entry.author} (the demo editors are seeded first)`);
      const reviewer = users.get(entry.reviewer) ?? fail('reviewer', `no account ${entry.reviewer}`);
      if (author.id === reviewer.id) fail('reviewer', 'the reviewer must be another editor than the author');
      const content = contentOf(entry);
      const row = await Entry.create(
        { slug: entry.slug, title: content.title, status: 'published', mechanismClassId: classId, currentVersionId: null, lastPublishedAt: when, retiredReason: null, successorId: null },
        { transaction },
      );
      const v = await EntryVersion.create(
        {
          entryId: row.id, number: 1, state: 'published', basedOnId: null, content, changeNote: entry.changeNote, reviewNote: null,
          authorId: author.id, reviewerId: reviewer.id, submittedAt: when, publishedAt: when,
        },
        { transaction },
      );
      row.currentVersionId = v.id;
      await row.save({ transaction });
      await EntryLaw.bulkCreate(lawIds.map((lawId) => ({ entryId: row.id, lawId })), { transaction });
      await audit(transaction, {
        actorId: null, action: 'entry.imported', subjectType: 'entry', subjectId: row.id,
        after: { slug: entry.slug, version: 1, file: `content/entries/${file}`, authorId: author.id, reviewerId: reviewer.id },
      });
    }
    return files.length;
  });
}

/** The live library as entry files (latest published version of each entry), by file name. */
export async function exportEntries(): Promise<{ file: string; text: string }[]> {
  const entries = await Entry.findAll({ order: [['slug', 'ASC']] });
  const out: { file: string; text: string }[] = [];
  for (const e of entries) {
    if (!e.currentVersionId) continue;
    const v = await EntryVersion.findByPk(e.currentVersionId, {
      include: [
        { model: User, as: 'author', attributes: ['email'] },
        { model: User, as: 'reviewer', attributes: ['email'] },
      ],
    });
    if (!v) continue;
    const file: EntryFile = {
      slug: e.slug,
      ...v.content,
      author: v.author!.email,
      reviewer: v.reviewer?.email ?? v.author!.email,
      changeNote: v.changeNote ?? 'First published version.',
    };
    out.push({ file: `${e.slug}.md`, text: entryLoad().serializeEntryFile(file) });
  }
  return out;
}

/** Writes the export into `dir` (created when missing); returns the files written. */
export async function writeExport(dir: string): Promise<string[]> {
  const files = await exportEntries();
  fs.mkdirSync(dir, { recursive: true });
  for (const f of files) fs.writeFileSync(path.join(dir, f.file), f.text);
  return files.map((f) => f.file);
}
