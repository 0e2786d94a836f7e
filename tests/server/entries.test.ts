/**
 * Entries through the API with two editors (supertest, real MariaDB): write a draft, a conflicting
 * save, submit, self-approval refused, approval by the other editor → version 1; a revision →
 * version 2 while version 1 stays unchanged at its permalink; published versions immutable (model
 * hooks and the database trigger); retiring; audit events; e-mails to the people concerned.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { parse } from 'yaml';
import { AuditEvent, Entry, EntryVersion, PublishedVersionImmutable, User } from '../../server/models';
import { demo, startTestApp, type Client, type TestApp } from '../support/app';
import { approveDraft, createDraft, publishNewEntry, startRevision, submitDraft } from '../support/workflow';

jest.setTimeout(120_000);

// The two demo editors (content/demo/accounts.yml).
const EDITOR_ONE = 'editor.one@example.org';
const EDITOR_TWO = 'editor.two@example.org';

const worksheet = parse(fs.readFileSync(path.join(__dirname, '../../content/worksheets/photon-rocket-bound.yml'), 'utf8'));

/** A small but complete entry (our own fixture, not a starter file). */
const content = (over: Record<string, unknown> = {}) => ({
  title: 'Thrust from light bouncing inside a closed box',
  aliases: ['photon box drive'],
  mechanismClass: 'enclosed-radiation',
  laws: ['linear-momentum'],
  inBrief: 'Light trapped in a sealed box pushes on every wall equally, so the box as a whole goes nowhere.',
  howItIsPitched: 'A cavity of a special shape is said to push harder on one end than the other.',
  whyItFails: 'The momentum of the light and the box together is conserved: $p = E/c$ for light, and $F \\le P/c$ for anything that emits.',
  worksheets: [worksheet],
  whatFakesTheEffect: 'Thermal drift of the balance and the Lorentz force on the supply leads.',
  repliesAndAnswers: [{ reply: 'The group velocity differs at each end.', answer: 'Momentum is still conserved for the closed system.' }],
  questionsToAsk: ['Was the device run upside down, with the thrust reversing?'],
  cautions: 'Microwave sources can burn; follow local RF exposure rules.',
  related: [],
  sources: [
    {
      csl: { id: 'feynman1964', type: 'book', title: 'The Feynman lectures on physics, vol. II', author: [{ family: 'Feynman', given: 'Richard P.' }], issued: { 'date-parts': [[1964]] }, publisher: 'Addison-Wesley' },
      note: 'Momentum of the electromagnetic field (ch. 27).',
    },
  ],
  ...over,
});

let h: TestApp;
let one: Client;
let two: Client;
let oneId: number;
let twoId: number;
beforeAll(async () => {
  h = await startTestApp({ taxonomy: true, publicUrl: 'https://counterweight.example.org' });
  one = await h.signedIn(EDITOR_ONE);
  two = await h.signedIn(EDITOR_TWO);
  oneId = (await User.findOne({ where: { email: EDITOR_ONE } }))!.id;
  twoId = (await User.findOne({ where: { email: EDITOR_TWO } }))!.id;
});
afterAll(() => h?.close());

const eventsFor = async (action: string) =>
  (await AuditEvent.findAll({ where: { action }, include: [{ model: User, as: 'actor' }], order: [['id', 'ASC']] })).map((e) => e.toDto());

describe('the two-editor workflow', () => {
  it('creates a draft that only its author edits, with a clear conflict on a stale save', async () => {
    const res = await one.post('/api/drafts', { slug: 'photon-box', content: content() });
    expect(res.status).toBe(201);
    expect(res.body.draft).toMatchObject({ slug: 'photon-box', state: 'draft', lockVersion: 0, author: { id: oneId }, reviewer: null, basedOn: null });
    const draftId = res.body.draft.id;

    // Not published yet: readers do not see it.
    expect((await request(h.app).get('/api/entries/photon-box')).status).toBe(404);

    const saved = await one.put(`/api/drafts/${draftId}`, { content: content({ title: 'Thrust from light inside a closed box' }), lockVersion: 0 });
    expect(saved.status).toBe(200);
    expect(saved.body.draft.lockVersion).toBe(1);

    // A second tab still at revision 0: 409 with the current draft in the answer, nothing overwritten.
    const stale = await one.put(`/api/drafts/${draftId}`, { content: content({ title: 'Overwritten?' }), lockVersion: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('edit_conflict');
    expect(stale.body.error.fields).toHaveProperty(['body.lockVersion']);
    expect(stale.body.draft).toMatchObject({ id: draftId, lockVersion: 1, content: { title: 'Thrust from light inside a closed box' } });

    // The other editor may read it but not edit it.
    expect((await two.get(`/api/drafts/${draftId}`)).status).toBe(200);
    const foreign = await two.put(`/api/drafts/${draftId}`, { content: content(), lockVersion: 1 });
    expect([foreign.status, foreign.body.error.code]).toEqual([403, 'not_author']);
  });

  it('refuses bad content naming the fields, oversized fields with 413, and a taken slug with 409', async () => {
    // An entry of our own that the slug check and the related list can name.
    await createDraft(one, 'taken-box', content());
    const bad = await one.post('/api/drafts', { slug: 'Not A Slug', content: content({ laws: ['no-such-law'] }) });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['body.slug']));
    const law = await one.post('/api/drafts', { slug: 'another-box', content: content({ laws: ['no-such-law'] }) });
    expect([law.status, Object.keys(law.body.error.fields)]).toEqual([400, ['body.content.laws.0']]);
    const brief = await one.post('/api/drafts', { slug: 'another-box', content: content({ inBrief: 'word '.repeat(121) }) });
    expect([brief.status, Object.keys(brief.body.error.fields)]).toEqual([400, ['body.content.inBrief']]);
    const related = await one.post('/api/drafts', { slug: 'another-box', content: content({ related: ['taken-box', 'no-such-entry'] }) });
    expect([related.status, Object.keys(related.body.error.fields)]).toEqual([400, ['body.content.related.1']]);
    const twice = await one.post('/api/drafts', { slug: 'another-box', content: content({ related: ['taken-box', 'taken-box'] }) });
    expect([twice.status, Object.keys(twice.body.error.fields)]).toEqual([400, ['body.content.related']]);
    const big = await one.post('/api/drafts', { slug: 'another-box', content: content({ whyItFails: 'x'.repeat(20_001) }) });
    expect([big.status, big.body.error.code, Object.keys(big.body.error.fields)]).toEqual([413, 'too_large', ['body.content.whyItFails']]);
    const taken = await two.post('/api/drafts', { slug: 'taken-box', content: content() });
    expect([taken.status, taken.body.error.code, taken.body.error.fields]).toEqual([409, 'slug_taken', { 'body.slug': expect.any(String) }]);
  });

  it('saves an incomplete draft but refuses to submit it, naming what is missing', async () => {
    const res = await two.post('/api/drafts', { slug: 'half-written', content: { title: 'Half written', mechanismClass: 'over-unity' } });
    expect(res.status).toBe(201);
    const submit = await two.post(`/api/drafts/${res.body.draft.id}/submit`, { lockVersion: 0 });
    expect(submit.status).toBe(400);
    expect(submit.body.error.code).toBe('draft_incomplete');
    expect(Object.keys(submit.body.error.fields)).toEqual(expect.arrayContaining(['content.laws', 'content.inBrief', 'content.whyItFails']));
  });

  it('submits for review and e-mails the other editor', async () => {
    // A draft saved once (lock version 1), as after the first test's save.
    const created = await createDraft(one, 'review-box', content());
    const saved = await one.put(`/api/drafts/${created.id}`, { content: content({ title: 'Light in a box, for review' }), lockVersion: 0 });
    expect(saved.status).toBe(200);
    const draftId = created.id;
    const res = await one.post(`/api/drafts/${draftId}/submit`, { lockVersion: 1 });
    expect(res.status).toBe(200);
    expect(res.body.draft).toMatchObject({ state: 'in_review', lockVersion: 2 });
    const mail = await h.mail.next(EDITOR_TWO, { subject: /^Waiting for review: Light in a box, for review$/ });
    expect(mail.subject).toBe('Waiting for review: Light in a box, for review');
    expect(mail.text).toContain(`https://counterweight.example.org/desk/drafts/${draftId}`);
    expect(mail.text).toContain('Bruno Salazar');
    // In review: the author cannot edit it any more.
    expect((await one.put(`/api/drafts/${draftId}`, { content: content(), lockVersion: 2 })).status).toBe(409);
    // The Desk: the author's own list, and the other editor's review list.
    expect((await one.get('/api/desk')).body.mine).toContainEqual(expect.objectContaining({ id: draftId, state: 'in_review', slug: 'review-box' }));
    expect((await two.get('/api/desk')).body.toReview).toContainEqual(expect.objectContaining({ id: draftId, author: expect.objectContaining({ displayName: 'Bruno Salazar' }) }));
    expect((await one.get('/api/desk')).body.toReview).not.toContainEqual(expect.objectContaining({ id: draftId }));
  });

  it('refuses approval by the draft’s own author with 403 own_draft', async () => {
    const draft = await submitDraft(one, await createDraft(one, 'own-review-box', content({ title: 'Light in a box, own review' })));
    const res = await one.post(`/api/drafts/${draft.id}/approve`, { changeNote: 'First published version.' });
    expect([res.status, res.body.error.code]).toEqual([403, 'own_draft']);
  });

  it('publishes version 1 when the other editor approves, and e-mails the author', async () => {
    const listed = async (query = '') => (await request(h.app).get(`/api/entries${query}`).expect(200)).body;
    const before = await listed();
    const [byLaw, byOtherLaw, byParent, byOtherClass] = [
      (await listed('?law=linear-momentum')).total,
      (await listed('?law=energy')).total,
      (await listed('?mechanism=propellant-free-thrust')).total,
      (await listed('?mechanism=over-unity')).total,
    ];
    const created = await createDraft(one, 'photon-box-v1', content());
    await one.put(`/api/drafts/${created.id}`, { content: content({ title: 'Thrust from light inside a closed box' }), lockVersion: 0 }).expect(200);
    const draftId = created.id;
    await submitDraft(one, { id: draftId, lockVersion: 1 });

    const res = await two.post(`/api/drafts/${draftId}/approve`, { changeNote: 'First published version.' });
    expect(res.status).toBe(200);
    expect(res.body.version).toMatchObject({ number: 1, changeNote: 'First published version.', author: { id: oneId, displayName: 'Bruno Salazar' }, reviewer: { id: twoId, displayName: 'Chiara Lindqvist' } });
    const mail = await h.mail.next(EDITOR_ONE, { subject: /^Published: Thrust from light inside a closed box, version 1$/ });
    expect(mail.subject).toBe('Published: Thrust from light inside a closed box, version 1');
    expect(mail.text).toContain('https://counterweight.example.org/entries/photon-box-v1/v/1');

    const latest = await request(h.app).get('/api/entries/photon-box-v1').expect(200);
    expect(latest.body.entry).toEqual({ slug: 'photon-box-v1', status: 'published', title: 'Thrust from light inside a closed box', latestVersion: 1 });
    expect(latest.body.version.number).toBe(1);
    // The sections come rendered by the shared pipeline: math through KaTeX.
    expect(latest.body.version.html.whyItFails).toContain('class="katex"');
    const list = await listed();
    // One more entry in the list: this one (entries other tests published may be listed beside it).
    expect(list.total).toBe(before.total + 1);
    expect(list.entries.find((e: { slug: string }) => e.slug === 'photon-box-v1')).toEqual({
      slug: 'photon-box-v1', title: 'Thrust from light inside a closed box', version: 1, publishedAt: expect.any(String), laws: ['linear-momentum'], mechanismClass: 'enclosed-radiation', inBrief: content().inBrief,
      // The brief rendered by the server, as the entry's own page has it.
      inBriefHtml: latest.body.version.html.inBrief,
    });
    // Filters: by law, and by a parent class in the tree (enclosed-radiation sits under propellant-free-thrust).
    expect((await listed('?law=linear-momentum')).total).toBe(byLaw + 1);
    expect((await listed('?law=energy')).total).toBe(byOtherLaw);
    expect((await listed('?mechanism=propellant-free-thrust')).total).toBe(byParent + 1);
    expect((await listed('?mechanism=over-unity')).total).toBe(byOtherClass);
  });

  it('starts a revision while readers keep version 1; its approval publishes version 2 and leaves version 1 as it was', async () => {
    await publishNewEntry(one, two, 'photon-box-rev', content({ title: 'Thrust from light inside a closed box' }));
    const v1Body = (await request(h.app).get('/api/entries/photon-box-rev/versions/1').expect(200)).body;
    const start = await two.post('/api/entries/photon-box-rev/drafts');
    expect(start.status).toBe(201);
    expect(start.body.draft).toMatchObject({ state: 'draft', basedOn: 1, author: { id: twoId }, content: { title: 'Thrust from light inside a closed box' } });
    const revId = start.body.draft.id;
    const again = await one.post('/api/entries/photon-box-rev/drafts');
    expect([again.status, again.body.error.code, again.body.draftId]).toEqual([409, 'draft_exists', revId]);

    const edited = await two.put(`/api/drafts/${revId}`, { content: content({ title: 'Thrust from light inside a closed box', cautions: 'Revised cautions.' }), lockVersion: 0 });
    expect(edited.status).toBe(200);
    // Readers still see version 1.
    expect((await request(h.app).get('/api/entries/photon-box-rev')).body.version.content.cautions).toBe(content().cautions);

    expect((await two.post(`/api/drafts/${revId}/submit`, { lockVersion: 1 })).status).toBe(200);
    await h.mail.next(EDITOR_ONE, { subject: /Waiting for review/ });
    const approved = await one.post(`/api/drafts/${revId}/approve`, { changeNote: 'Cautions revised.' });
    expect(approved.status).toBe(200);
    expect(approved.body.version).toMatchObject({ number: 2, changeNote: 'Cautions revised.', author: { id: twoId }, reviewer: { id: oneId } });

    const latest = (await request(h.app).get('/api/entries/photon-box-rev').expect(200)).body;
    expect([latest.version.number, latest.version.content.cautions, latest.entry.latestVersion]).toEqual([2, 'Revised cautions.', 2]);
    const v1 = await request(h.app).get('/api/entries/photon-box-rev/versions/1').expect(200);
    expect({ ...v1.body, entry: undefined }).toEqual({ ...(v1Body as object), entry: undefined });
    expect(v1.body.entry.latestVersion).toBe(2);
    const versions = (await request(h.app).get('/api/entries/photon-box-rev/versions').expect(200)).body.versions;
    expect(versions.map((v: { number: number; changeNote: string }) => [v.number, v.changeNote])).toEqual([
      [2, 'Cautions revised.'],
      [1, 'First published version.'],
    ]);
    expect((await request(h.app).get('/api/entries/photon-box-rev/versions/3')).status).toBe(404);
  });

  it('sends a draft back with a reason, e-mailing the author, and lets the author edit it again', async () => {
    await publishNewEntry(two, one, 'photon-box-back', content());
    const start = await one.post('/api/entries/photon-box-back/drafts');
    const id = start.body.draft.id;
    await one.post(`/api/drafts/${id}/submit`, { lockVersion: 0 });
    await h.mail.next(EDITOR_TWO, { subject: /Waiting for review/ });
    const back = await two.post(`/api/drafts/${id}/send-back`, { reason: 'Add the upside-down test to the questions.' });
    expect(back.status).toBe(200);
    expect(back.body.draft).toMatchObject({ state: 'draft', reviewNote: 'Add the upside-down test to the questions.' });
    const mail = await h.mail.next(EDITOR_ONE, { subject: /Sent back/ });
    expect(mail.text).toContain('Add the upside-down test to the questions.');
    expect((await one.put(`/api/drafts/${id}`, { content: content(), lockVersion: back.body.draft.lockVersion })).status).toBe(200);
  });

  it('writes an audit event for every transition', async () => {
    // Its own run through every transition: one writes and submits, two approves (version 1); two
    // revises and one approves (version 2); one starts a third draft, which two sends back.
    const first = await createDraft(one, 'audit-box', content());
    const half = await two.post('/api/drafts', { slug: 'audit-half', content: { title: 'Half written', mechanismClass: 'over-unity' } });
    expect(half.status).toBe(201);
    await approveDraft(two, await submitDraft(one, first));
    await approveDraft(one, await submitDraft(two, await startRevision(two, 'audit-box')), 'Cautions revised.');
    const third = await submitDraft(one, await startRevision(one, 'audit-box'));
    expect((await two.post(`/api/drafts/${third.id}/send-back`, { reason: 'Add the upside-down test.' })).status).toBe(200);

    // The events of these two entries only (other tests of this file write their own).
    const ids = (await Entry.findAll({ where: { slug: ['audit-box', 'audit-half'] } })).map((e) => e.id);
    const ours = async (action: string) => (await eventsFor(action)).filter((e) => ids.includes(Number(e.subjectId)));
    const created = await ours('entry.draft_created');
    expect(created.map((e) => (e.after as { slug: string }).slug)).toEqual(['audit-box', 'audit-half']);
    expect((await ours('entry.draft_submitted')).length).toBe(3);
    const published = await ours('entry.published');
    expect(published.map((e) => [e.actor?.id, (e.after as { version: number }).version])).toEqual([
      [twoId, 1],
      [oneId, 2],
    ]);
    expect((await ours('entry.draft_started')).length).toBe(2);
    expect((await ours('entry.sent_back')).map((e) => e.actor?.id)).toEqual([twoId]);
  });
});

describe('published versions are immutable', () => {
  it('refuses, in the model, to change or delete a published version', async () => {
    await publishNewEntry(one, two, 'immutable-box', content());
    const entryId = (await Entry.findOne({ where: { slug: 'immutable-box' } }))!.id;
    const v1 = (await EntryVersion.findOne({ where: { entryId, number: 1, state: 'published' } }))!;
    v1.content = { ...v1.content, title: 'Changed after publication' };
    await expect(v1.save()).rejects.toBeInstanceOf(PublishedVersionImmutable);
    await expect(v1.destroy()).rejects.toBeInstanceOf(PublishedVersionImmutable);
    await expect(EntryVersion.update({ changeNote: 'rewritten' }, { where: { state: 'published' } })).rejects.toBeInstanceOf(PublishedVersionImmutable);
    await expect(EntryVersion.destroy({ where: { state: 'published' } })).rejects.toBeInstanceOf(PublishedVersionImmutable);
  });

  it('refuses, in the database itself, to change or delete a published version', async () => {
    await publishNewEntry(one, two, 'immutable-row-box', content());
    await expect(h.t.sequelize.query("UPDATE entry_versions SET change_note = 'rewritten' WHERE state = 'published'")).rejects.toThrow(/cannot be changed/);
    await expect(h.t.sequelize.query("DELETE FROM entry_versions WHERE state = 'published'")).rejects.toThrow(/cannot be deleted/);
    const v1 = (await request(h.app).get('/api/entries/immutable-row-box/versions/1').expect(200)).body.version;
    expect(v1.changeNote).toBe('First published version.');
  });
});

describe('retiring', () => {
  it('needs a reason, points to a published successor, and keeps the pages reachable with a notice', async () => {
    // The entry to retire, and a successor entry, published by the two editors.
    await publishNewEntry(one, two, 'retired-box', content(), 'First published version.');
    await publishNewEntry(two, one, 'photon-box-revisited', content({ title: 'Light in a closed box, revisited' }));
    const listedBefore = (await request(h.app).get('/api/entries?limit=100')).body.entries.map((e: { slug: string }) => e.slug);
    expect(listedBefore).toEqual(expect.arrayContaining(['retired-box', 'photon-box-revisited']));

    expect((await one.post('/api/entries/retired-box/retire', {})).status).toBe(400);
    const self = await one.post('/api/entries/retired-box/retire', { reason: 'Merged.', successor: 'retired-box' });
    expect([self.status, Object.keys(self.body.error.fields)]).toEqual([400, ['body.successor']]);
    const res = await one.post('/api/entries/retired-box/retire', { reason: 'Merged into a fuller entry.', successor: 'photon-box-revisited' });
    expect(res.status).toBe(200);
    expect(res.body.entry).toMatchObject({ status: 'retired', retired: { reason: 'Merged into a fuller entry.', successor: 'photon-box-revisited' } });

    const page = await request(h.app).get('/api/entries/retired-box').expect(200);
    expect(page.body.entry.retired).toEqual({ reason: 'Merged into a fuller entry.', successor: 'photon-box-revisited' });
    expect((await request(h.app).get('/api/entries/retired-box/versions/1')).status).toBe(200);
    // Out of the list (the rest of it unchanged), and closed to new drafts.
    expect((await request(h.app).get('/api/entries?limit=100')).body.entries.map((e: { slug: string }) => e.slug)).toEqual(listedBefore.filter((s: string) => s !== 'retired-box'));
    expect((await two.post('/api/entries/retired-box/drafts')).body.error.code).toBe('entry_retired');
    const [event] = await eventsFor('entry.retired');
    expect(event).toMatchObject({ actor: { displayName: 'Bruno Salazar' }, before: { status: 'published' }, after: { status: 'retired', successor: 'photon-box-revisited' } });
  });
});

describe('who may', () => {
  it('keeps contributors and moderators off the Desk and the drafts', async () => {
    const contributor = await h.signedIn(demo.contributor.email);
    expect((await contributor.post('/api/drafts', { slug: 'nope-entry', content: content() })).status).toBe(403);
    expect((await contributor.get('/api/desk')).status).toBe(403);
    const reader = await h.client();
    expect((await reader.post('/api/drafts', { slug: 'nope-entry', content: content() })).status).toBe(401);
  });
});
