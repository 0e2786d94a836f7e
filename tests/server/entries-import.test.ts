/**
 * The starter library as files: content/entries/*.md imported into an empty database (each a
 * published version 1 by two demo editors), idempotent, all-or-nothing, a malformed file refused
 * with its name and line; and import → export → import gives the same library.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { exportEntries, importEntriesIfEmpty, readEntryFiles, writeExport } from '../../server/db/seed-entries';
import { seedIfEmpty } from '../../server/db/seed';
import { seedDemoAccounts } from '../../server/db/seed-accounts';
import { Entry, EntryVersion, User } from '../../server/models';
import { initModels } from '../../server/models';
import { serializeEntryFile } from '../../shared/entries/load';
import type { EntryFile } from '../../shared/entries/schema';
import { CONTENT_DIR, startTestApp, type TestApp } from '../support/app';
import { createTestDatabase } from '../support/db';

jest.setTimeout(180_000);

const starter = readEntryFiles(CONTENT_DIR);

/** Our own small entry file (not a starter file), for the malformed-file and all-or-nothing cases. */
const fixture = (slug: string): EntryFile => ({
  slug,
  title: `Fixture entry ${slug}`,
  aliases: [],
  mechanismClass: 'magnet-motor',
  laws: ['energy'],
  inBrief: 'A ring of permanent magnets cannot keep a rotor turning: the field is conservative.',
  howItIsPitched: 'Magnets arranged in a slanted track are said to pull a ball round for ever.',
  whyItFails: 'The work done by a static magnetic field on a closed path is zero.',
  worksheets: [],
  whatFakesTheEffect: '',
  repliesAndAnswers: [],
  questionsToAsk: [],
  cautions: '',
  related: [],
  sources: [],
  author: 'editor.one@example.org',
  reviewer: 'editor.two@example.org',
  changeNote: 'First published version.',
});

const tmpContent = (files: Record<string, string>) => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-entries-'));
  fs.mkdirSync(path.join(dir, 'entries'));
  for (const [name, text] of Object.entries(files)) fs.writeFileSync(path.join(dir, 'entries', name), text);
  return dir;
};

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ starterEntries: true });
});
afterAll(() => h?.close());

describe('the import', () => {
  it('turns every starter file into a published version 1 by its two editors', async () => {
    expect(starter.length).toBeGreaterThan(0);
    expect(await Entry.count()).toBe(starter.length);
    for (const { entry } of starter) {
      const res = await request(h.app).get(`/api/entries/${entry.slug}`).expect(200);
      expect(res.body.entry).toMatchObject({ slug: entry.slug, status: 'published', latestVersion: 1 });
      const author = await User.findOne({ where: { email: entry.author } });
      const reviewer = await User.findOne({ where: { email: entry.reviewer } });
      expect(res.body.version).toMatchObject({ number: 1, changeNote: entry.changeNote, author: { id: author!.id }, reviewer: { id: reviewer!.id } });
      expect(res.body.version.content.title).toBe(entry.title);
    }
    expect((await request(h.app).get('/api/entries?limit=100')).body.total).toBe(starter.length);
  });

  it('is idempotent: a second run into a library that has entries adds nothing', async () => {
    expect(await importEntriesIfEmpty(h.t.sequelize, CONTENT_DIR)).toBe(0);
    expect(await Entry.count()).toBe(starter.length);
  });

  it('refuses a malformed file with its name and line, and imports nothing of the batch', async () => {
    const t = await createTestDatabase();
    try {
      initModels(t.sequelize);
      await seedIfEmpty(t.sequelize, CONTENT_DIR);
      await seedDemoAccounts(t.sequelize, CONTENT_DIR, 'development');
      const broken = serializeEntryFile(fixture('broken-fixture')).replace(/^mechanismClass: .*$/m, 'mechanismClass: [unclosed');
      const line = broken.split('\n').findIndex((l) => l.startsWith('mechanismClass:')) + 1;
      const dir = tmpContent({ 'a-good-fixture.md': serializeEntryFile(fixture('a-good-fixture')), 'broken-fixture.md': broken });
      await expect(importEntriesIfEmpty(t.sequelize, dir)).rejects.toThrow(new RegExp(`^broken-fixture\\.md:(${line}|${line + 1}): `));
      expect(await Entry.count()).toBe(0);

      // A file naming an account that does not exist: refused with the file and field, nothing imported.
      const ghost = { ...fixture('ghost-author'), author: 'nobody@example.org' };
      const dir2 = tmpContent({ 'a-good-fixture.md': serializeEntryFile(fixture('a-good-fixture')), 'ghost-author.md': serializeEntryFile(ghost) });
      await expect(importEntriesIfEmpty(t.sequelize, dir2)).rejects.toThrow('content/entries/ghost-author.md: author: no account nobody@example.org');
      expect(await Entry.count()).toBe(0);
      expect(await EntryVersion.count()).toBe(0);
    } finally {
      await t.drop();
      // Back to the suite's own database for the model classes.
      initModels(h.t.sequelize);
    }
  });
});

describe('export', () => {
  it('writes the library back in the same format, and import → export → import gives the same library', async () => {
    const first = await exportEntries();
    expect(first.map((f) => f.file).sort()).toEqual(starter.map((s) => `${s.entry.slug}.md`).sort());
    // The same entries, field for field, as the starter files.
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-export-'));
    await writeExport(path.join(dir, 'entries'));
    const reread = readEntryFiles(dir);
    expect(Object.fromEntries(reread.map((r) => [r.entry.slug, r.entry]))).toEqual(Object.fromEntries(starter.map((s) => [s.entry.slug, s.entry])));

    // Into a fresh database, and out again: the same texts.
    const t = await createTestDatabase();
    try {
      initModels(t.sequelize);
      await seedIfEmpty(t.sequelize, CONTENT_DIR);
      await seedDemoAccounts(t.sequelize, CONTENT_DIR, 'development');
      expect(await importEntriesIfEmpty(t.sequelize, dir)).toBe(starter.length);
      expect(await exportEntries()).toEqual(first);
    } finally {
      await t.drop();
      initModels(h.t.sequelize);
    }
  });
});
