/**
 * The audit log reads as sentences: every action a service writes has one (found by reading the
 * services, so a new action without a sentence fails here), and GET /api/admin/audit names the
 * actor and the record by name and title, never by a dotted code or a bare id.
 */
import fs from 'node:fs';
import path from 'node:path';
import { User } from '../../server/models';
import { SENTENCES } from '../../server/presenters/audit';
import { demo, startTestApp, type Client, type TestApp } from '../support/app';
import { claimSubmission, submitSighting } from '../support/workflow';

jest.setTimeout(120_000);

const SERVER = path.join(__dirname, '..', '..', 'server');

function sources(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return sources(p);
    return /\.ts$/.test(e.name) && !/\.test\.ts$/.test(e.name) ? [p] : [];
  });
}

/** Every action the server writes: literal `action: '…'` values, and `submission.${what}` over the decision words. */
function writtenActions(): string[] {
  const found = new Set<string>();
  let templates = 0;
  for (const file of sources(SERVER)) {
    const text = fs.readFileSync(file, 'utf8');
    for (const m of text.matchAll(/action:\s*'([a-z_]+\.[a-z_]+)'/g)) found.add(m[1]);
    for (const m of text.matchAll(/action:\s*`([a-z_]+)\.\$\{(\w+)\}`/g)) {
      templates += 1;
      // The template's words come from a Record literal in the same file: `const DECIDED: Record<…> = { accept: 'accepted', … }`.
      const table = new RegExp(`const ${m[2] === 'what' ? 'DECIDED' : m[2]}[^=]*=\\s*\\{([^}]*)\\}`).exec(text);
      if (!table) throw new Error(`cannot read the words of ${m[0]} in ${file}`);
      for (const w of table[1].matchAll(/:\s*'([a-z_]+)'/g)) found.add(`${m[1]}.${w[1]}`);
    }
  }
  expect(templates).toBeGreaterThan(0);
  return [...found].sort();
}

describe('the sentence table', () => {
  it('has a sentence for every action a service or the starter import writes', () => {
    const actions = writtenActions();
    // A sanity floor: users, synonyms, submissions and entries all write events (counted from the code, 2026-12).
    expect(actions.length).toBeGreaterThanOrEqual(20);
    expect(actions).toEqual(expect.arrayContaining(['user.role_changed', 'submission.accepted', 'entry.published', 'entry.imported']));
    const missing = actions.filter((a) => !(a in SENTENCES));
    expect(missing).toEqual([]);
  });
});

describe('GET /api/admin/audit', () => {
  let h: TestApp;
  let admin: Client;
  beforeAll(async () => {
    h = await startTestApp({ starterEntries: true, searchRefreshMs: 0 });
    admin = await h.signedIn(demo.admin.email);
  });
  afterAll(() => h?.close());

  const text = (e: { sentence: { text: string }[] }) => e.sentence.map((p) => p.text).join('');
  const nameOf = async (email: string) => (await User.findOne({ where: { email } }))!.displayName;

  it('tells each event as a sentence naming the actor and the record', async () => {
    const contributor = await h.signedIn(demo.contributor.email);
    const moderator = await h.signedIn(demo.moderator.email);
    const title = 'Sealed resonator drive shown at a trade fair';
    const id = await submitSighting(contributor, {
      title,
      seenAtUrl: 'https://news.example.org/2026/resonator-drive',
      summary: 'A stand by an invented firm claimed thrust from a closed copper cavity.',
    });
    await claimSubmission(moderator, id);
    const accepted = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept', entries: ['resonant-cavity-thruster'] });
    expect(accepted.status).toBe(200);
    const entryTitle: string = (await h.client().then((c) => c.get('/api/entries/resonant-cavity-thruster'))).body.entry.title;
    expect(entryTitle).toBeTruthy();

    const log = await admin.get('/api/admin/audit?limit=200').expect(200);
    const events: { action: string; sentence: { text: string; title?: boolean }[] }[] = log.body.events;
    const mod = await nameOf(demo.moderator.email);
    const who = await nameOf(demo.contributor.email);

    const accept = events.find((e) => e.action === 'submission.accepted')!;
    expect(text(accept)).toBe(`${mod} accepted the sighting “${title}” onto ${entryTitle}.`);
    expect(accept.sentence.find((p) => p.title)?.text).toBe(entryTitle);
    expect(text(events.find((e) => e.action === 'submission.claimed')!)).toBe(`${mod} picked up the sighting “${title}” to decide it.`);
    expect(text(events.find((e) => e.action === 'submission.created')!)).toBe(`${who} reported the sighting “${title}”.`);
    const imported = events.find((e) => e.action === 'entry.imported')!;
    expect(text(imported)).toMatch(/^The system added version 1 of .+ from the starter library\.$/);

    // No sentence carries a dotted code, a raw id or a JSON fragment.
    for (const e of events) {
      expect(text(e)).not.toMatch(/\b[a-z_]+\.[a-z_]+\b|[{}[\]]|undefined|null/);
      expect(text(e)).toMatch(/\.$/);
    }
  });

  it('names the user whose role changed, and the new role in words', async () => {
    const users = (await admin.get('/api/admin/users?q=lindqvist').expect(200)).body.users;
    await admin.patch(`/api/admin/users/${users[0].id}/role`, { role: 'moderator' }).expect(200);
    const [event] = (await admin.get('/api/admin/audit?limit=1').expect(200)).body.events;
    const me = await nameOf(demo.admin.email);
    expect(text(event)).toBe(`${me} made ${users[0].displayName} a moderator (before: an editor).`);
  });
});
