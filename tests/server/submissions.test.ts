/**
 * Sightings, corrections and the queue through the real app (supertest, real MariaDB, the starter
 * library, attachments on local disk, mail through the fake SMTP server): submit with files, the
 * queue, claims, each of the four decisions with the e-mails they send, the sighting on the entry,
 * corrections reaching the entry's editors, the batched digest, who may see what, and bad input
 * (wrong file types, sizes, counts, missing fields, rate limits) leaving nothing half-stored.
 * All texts are invented test data.
 */
import fs from 'node:fs';
import path from 'node:path';
import crypto from 'node:crypto';
import request from 'supertest';
import { Attachment, AuditEvent, Submission } from '../../server/models';
import { LocalStore } from '../../server/storage';
import { elfHeader, largePdf, minimalPdf, minimalPng, plainText } from '../fixtures/files/samples';
import { demo, HIGH_LIMITS, startTestApp, type Client, type TestApp } from '../support/app';
import { until } from '../support/poll';
import { claimSubmission } from '../support/workflow';

jest.setTimeout(120_000);

let h: TestApp;
beforeAll(async () => {
  // The digest gathers for 2 s: long enough that items sent together fall into one even on a busy machine.
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0, submissionDigestMs: 2_000 });
});
afterAll(() => h?.close());

const uploadDir = () => (h.store as LocalStore).dir;
const storedFiles = (): string[] => {
  const out: string[] = [];
  const walk = (d: string) => {
    if (!fs.existsSync(d)) return;
    for (const e of fs.readdirSync(d, { withFileTypes: true })) {
      if (e.isDirectory()) walk(path.join(d, e.name));
      else out.push(path.join(d, e.name));
    }
  };
  walk(uploadDir());
  // The local store keeps each object's type and hash in <key>.meta.json beside it.
  return out.filter((f) => !path.basename(f).startsWith('.') && !f.endsWith('.meta.json'));
};

interface SightingFields {
  title?: string;
  seenAtUrl?: string;
  seenAtCitation?: string;
  summary?: string;
  figures?: string;
}
const sighting = (c: Client, fields: SightingFields, files: { name: string; bytes: Buffer; type?: string }[] = []) => {
  let req = c.agent.post('/api/sightings').set('X-CSRF-Token', c.csrf);
  for (const [k, v] of Object.entries(fields)) if (v !== undefined) req = req.field(k, v);
  for (const f of files) req = req.attach('files', f.bytes, { filename: f.name, contentType: f.type ?? 'application/pdf' });
  return req;
};
const good: SightingFields = {
  title: 'Sealed resonator drive shown at a trade fair',
  seenAtUrl: 'https://news.example.org/2026/resonator-drive',
  summary: 'A stand by Pellworth Aerospace Labs claimed 0.2 lbf of thrust from a closed copper cavity fed with 1.5 kW of microwaves.',
  figures: JSON.stringify([
    { kind: 'thrust', quantity: '0.2 lbf', label: 'claimed thrust' },
    { kind: 'power', quantity: '1.5 kW', label: 'input power' },
  ]),
};

describe('a sighting, from submission to the entry', () => {
  let contributor: Client;
  let moderator: Client;

  beforeAll(async () => {
    contributor = await h.signedIn(demo.contributor.email);
    moderator = await h.signedIn(demo.moderator.email);
  });

  /** Each test submits its own sighting (the invented one above, under its own title), with a PDF and a PNG. */
  const submitOwn = async (title: string) => {
    const res = await sighting(contributor, { ...good, title }, [
      { name: 'brochure.pdf', bytes: minimalPdf() },
      { name: 'photo.bin', bytes: minimalPng(), type: 'application/octet-stream' },
    ]);
    expect(res.status).toBe(201);
    return res.body.submission.id as number;
  };

  it('is submitted with attachments whose type, size and SHA-256 are kept', async () => {
    const pdf = minimalPdf();
    const png = minimalPng();
    const filesBefore = storedFiles().length;
    const res = await sighting(contributor, good, [
      { name: 'brochure.pdf', bytes: pdf },
      // The type comes from the bytes, not from the name or the header the client sends.
      { name: 'photo.bin', bytes: png, type: 'application/octet-stream' },
    ]);
    expect(res.status).toBe(201);
    const s = res.body.submission;
    expect(s).toMatchObject({ kind: 'sighting', status: 'open', title: good.title, seenAtUrl: good.seenAtUrl });
    expect(s.figures.map((f: { quantity: string }) => f.quantity)).toEqual(['0.2 lbf', '1.5 kW']);
    // 1 lbf = 4.448 222 N (NIST SP 811, Appendix B.8).
    expect(s.figures[0].si).toBeCloseTo(0.2 * 4.4482216152605, 9);
    // SHA-256 from Node's crypto (OpenSSL), not from the server's own hashing code.
    expect(s.attachments.map((a: { name: string; mediaType: string; size: number; sha256: string }) => [a.name, a.mediaType, a.size, a.sha256])).toEqual([
      ['brochure.pdf', 'application/pdf', pdf.length, crypto.createHash('sha256').update(pdf).digest('hex')],
      ['photo.bin', 'image/png', png.length, crypto.createHash('sha256').update(png).digest('hex')],
    ]);
    expect(storedFiles()).toHaveLength(filesBefore + 2);
  });

  it('shows on the submitter’s own list, and not to another contributor', async () => {
    const id = await submitOwn('Sealed resonator drive, seen on a stand');
    const mine = await contributor.get('/api/submissions/mine');
    expect(mine.body.items.map((i: { id: number; status: string }) => [i.id, i.status])).toContainEqual([id, 'open']);
    const other = await h.signedIn(demo.editor.email);
    expect((await other.get(`/api/submissions/${id}`)).status).toBe(404);
    expect((await other.get(`/api/attachments/${(await Attachment.findOne({ where: { submissionId: id } }))!.id}`)).status).toBe(404);
  });

  it('tells the moderators in one digest', async () => {
    const title = 'Sealed resonator drive, for the digest';
    await submitOwn(title);
    const mail = await h.mail.next(demo.moderator.email, { subject: /queue/i, text: title, timeoutMs: 30_000 });
    expect(mail.text).toContain(title);
  });

  it('serves attachments as downloads with a restrictive policy, to the moderator', async () => {
    const id = await submitOwn('Sealed resonator drive, with a brochure');
    const s = (await moderator.get(`/api/submissions/${id}`)).body.submission;
    const res = await moderator.get(s.attachments[0].url).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="brochure\.pdf"/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toBe("default-src 'none'; sandbox");
    expect(crypto.createHash('sha256').update(res.body as Buffer).digest('hex')).toBe(s.attachments[0].sha256);
    expect((await request(h.app).get(s.attachments[0].url)).status).toBe(401);
  });

  it('serves an image or a PDF inline for a preview, to the moderator and the submitter only, never scriptable', async () => {
    const id = await submitOwn('Sealed resonator drive, previewed');
    const s = (await moderator.get(`/api/submissions/${id}`)).body.submission;
    const [pdf, png] = s.attachments;
    const bytes = (c: Client, url: string) =>
      c.get(url).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (chunk: Buffer) => chunks.push(chunk));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    for (const who of [moderator, contributor]) {
      const image = await bytes(who, `${png.url}?view=inline`);
      expect(image.status).toBe(200);
      // The type read from the bytes at upload (the sender said application/octet-stream).
      expect(image.headers['content-type']).toBe('image/png');
      expect(image.headers['content-disposition']).toMatch(/^inline; filename="photo\.bin"/);
      expect(image.headers['x-content-type-options']).toBe('nosniff');
      // No script, no frames, nothing loaded but the image itself; sandboxed (CSP Level 3, W3C).
      expect(image.headers['content-security-policy']).toMatch(/^default-src 'none';/);
      expect(image.headers['content-security-policy']).toMatch(/sandbox/);
      expect(image.headers['content-security-policy']).not.toMatch(/script-src|unsafe-eval/);
      expect(crypto.createHash('sha256').update(image.body as Buffer).digest('hex')).toBe(png.sha256);
    }
    const doc = await bytes(moderator, `${pdf.url}?view=inline`);
    expect([doc.status, doc.headers['content-type']]).toEqual([200, 'application/pdf']);
    expect(doc.headers['content-disposition']).toMatch(/^inline; filename="brochure\.pdf"/);
    expect(doc.headers['x-content-type-options']).toBe('nosniff');
    expect(doc.headers['content-security-policy']).toMatch(/^default-src 'none';/);
    expect(doc.headers['content-security-policy']).not.toMatch(/script-src/);
    // The default stays a download; a bad view is a 400 naming the field; others still see nothing.
    expect((await moderator.get(png.url)).headers['content-disposition']).toMatch(/^attachment;/);
    const bad = await moderator.get(`${png.url}?view=html`);
    expect([bad.status, Object.keys(bad.body.error.fields)]).toEqual([400, ['query.view']]);
    const editor = await h.signedIn(demo.editor.email);
    expect((await editor.get(`${png.url}?view=inline`)).status).toBe(404);
    expect((await request(h.app).get(`${png.url}?view=inline`)).status).toBe(401);
  });

  it('is listed in the queue, oldest first, with counts', async () => {
    const id = await submitOwn('Sealed resonator drive, in the queue');
    const q = await moderator.get('/api/queue');
    expect(q.status).toBe(200);
    expect(q.body.items.map((i: { id: number }) => i.id)).toContain(id);
    const times = q.body.items.map((i: { createdAt: string }) => i.createdAt);
    expect([...times].sort()).toEqual(times);
    expect(q.body.counts.open).toBeGreaterThanOrEqual(1);
    expect(q.body.counts.sighting).toBeGreaterThanOrEqual(1);
    expect((await moderator.get('/api/queue?kind=correction')).body.items.map((i: { id: number }) => i.id)).not.toContain(id);
  });

  it('is claimed by one moderator at a time, and decided only by the holder', async () => {
    const id = await submitOwn('Sealed resonator drive, claimed once');
    const admin = await h.signedIn(demo.admin.email);
    expect((await moderator.post(`/api/submissions/${id}/decide`, { decision: 'reject', note: 'No.' })).body.error.code).toBe('not_claimed');
    const claimed = await moderator.post(`/api/submissions/${id}/claim`);
    expect(claimed.status).toBe(200);
    expect(claimed.body.submission).toMatchObject({ status: 'claimed', claimedBy: { displayName: expect.any(String) } });
    const second = await admin.post(`/api/submissions/${id}/claim`);
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('claimed_by_other');
    expect((await admin.post(`/api/submissions/${id}/decide`, { decision: 'reject', note: 'No.' })).body.error.code).toBe('not_claimed');
  });

  it('is accepted onto an entry: it shows there, the submitter is told, and the decision is audited', async () => {
    const id = await submitOwn(good.title!);
    await claimSubmission(moderator, id);
    const bad = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept', entries: ['no-such-entry'] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['body.entries']);
    const res = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept', entries: ['resonant-cavity-thruster'] });
    expect(res.status).toBe(200);
    expect(res.body.submission).toMatchObject({ status: 'accepted', decision: 'accept', linkedEntries: [{ slug: 'resonant-cavity-thruster' }] });
    expect(res.body.submission.events.map((e: { what: string }) => e.what)).toEqual(['submitted', 'claimed', 'accepted']);

    const onEntry = await request(h.app).get('/api/entries/resonant-cavity-thruster/sightings');
    expect(onEntry.status).toBe(200);
    expect(onEntry.body.sightings[0]).toMatchObject({ id, title: good.title, seenAtUrl: good.seenAtUrl });

    const mail = await h.mail.next(demo.contributor.email, { subject: /Accepted/, text: `/submissions/${id}` });
    expect(mail.text).toContain('Thrust from microwaves or light trapped in a closed cavity');
    expect(mail.text).toContain(`/submissions/${id}`);

    const events = await AuditEvent.findAll({ where: { subjectType: 'submission', subjectId: String(id) }, order: [['id', 'ASC']] });
    expect(events.map((e) => e.action)).toEqual(['submission.created', 'submission.claimed', 'submission.accepted']);
    expect((await moderator.post(`/api/submissions/${id}/claim`)).body.error.code).toBe('already_decided');
  });
});

describe('the other decisions', () => {
  let contributor: Client;
  let moderator: Client;
  const submit = async (title: string) => {
    const res = await sighting(contributor, { ...good, title });
    expect(res.status).toBe(201);
    return res.body.submission.id as number;
  };
  beforeAll(async () => {
    contributor = await h.signedIn(demo.contributor.email);
    moderator = await h.signedIn(demo.moderator.email);
  });

  it('asks for more: the item waits, the submitter is asked, answers, and it is back in the queue', async () => {
    const id = await submit('Wheel that keeps turning in a shop window');
    await moderator.post(`/api/submissions/${id}/claim`).expect(200);
    const asked = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'ask', note: 'Where and when was it filmed?' });
    expect(asked.body.submission).toMatchObject({ status: 'waiting', decisionNote: 'Where and when was it filmed?', claimedBy: null });
    const mail = await h.mail.next(demo.contributor.email, { subject: /question/i });
    expect(mail.text).toContain('Where and when was it filmed?');
    expect((await moderator.post(`/api/submissions/${id}/answer`, { message: 'x' })).status).toBe(404);
    const answered = await contributor.post(`/api/submissions/${id}/answer`, { message: 'At a fair in Brenford, in March.' });
    expect(answered.body.submission.status).toBe('open');
    expect(answered.body.submission.events.map((e: { what: string; note: string | null }) => [e.what, e.note]).slice(-2)).toEqual([
      ['asked', 'Where and when was it filmed?'],
      ['answered', 'At a fair in Brenford, in March.'],
    ]);
    expect((await contributor.post(`/api/submissions/${id}/answer`, { message: 'again' })).body.error.code).toBe('not_waiting');
  });

  it('rejects with a reason, which the submitter receives', async () => {
    const id = await submit('A duplicate report');
    await moderator.post(`/api/submissions/${id}/claim`).expect(200);
    expect((await moderator.post(`/api/submissions/${id}/decide`, { decision: 'reject' })).body.error.fields).toHaveProperty(['body.note']);
    const res = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'reject', note: 'Already reported as submission 1.' });
    expect(res.body.submission).toMatchObject({ status: 'rejected', decision: 'reject', decisionNote: 'Already reported as submission 1.' });
    const mail = await h.mail.next(demo.contributor.email, { subject: /Not accepted/ });
    expect(mail.text).toContain('Already reported as submission 1.');
  });

  it('turns a sighting into a draft entry owned by an editor, who can then see the sighting', async () => {
    const id = await submit('Magnet motor that runs a fan forever');
    const editors = (await moderator.get('/api/queue/editors')).body.editors as { id: number; displayName: string }[];
    const editorRow = editors.find((e) => e.displayName)!;
    await moderator.post(`/api/submissions/${id}/claim`).expect(200);
    const notEditor = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'draft', slug: 'fan-magnet-motor', mechanismClass: 'over-unity', editorId: 4_000_000 });
    expect(notEditor.body.error.fields).toHaveProperty(['body.editorId']);
    const classes = (await request(h.app).get('/api/taxonomy')).body.classes as { slug: string }[];
    const res = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'draft', slug: 'fan-magnet-motor', mechanismClass: classes[0].slug, editorId: editorRow.id });
    expect(res.status).toBe(200);
    expect(res.body.submission).toMatchObject({ status: 'drafted', decision: 'draft', draft: { slug: 'fan-magnet-motor' } });
    await h.mail.next(demo.contributor.email, { subject: /new entry will be written/i });
    // The draft is the editor's, with the sighting in it.
    const editorEmail = [demo.editor, demo.editor2, demo.admin].map((d) => d.email);
    const owners = await Promise.all(editorEmail.map(async (email) => ({ email, c: await h.signedIn(email) })));
    let seen = false;
    for (const { c } of owners) {
      const desk = await c.get('/api/desk');
      if (desk.status !== 200) continue;
      const draft = desk.body.mine.find((d: { slug: string }) => d.slug === 'fan-magnet-motor');
      if (!draft) continue;
      const full = await c.get(`/api/drafts/${draft.id}`);
      expect(full.body.draft.content.howItIsPitched).toContain(`sighting ${id}`);
      expect((await c.get(`/api/submissions/${id}`)).status).toBe(200);
      seen = true;
    }
    expect(seen).toBe(true);
  });

  it('refuses a moderator their own submission', async () => {
    const res = await sighting(moderator, { ...good, title: 'Seen by the moderator themself' });
    expect(res.status).toBe(201);
    const claim = await moderator.post(`/api/submissions/${res.body.submission.id}/claim`);
    expect(claim.status).toBe(403);
    expect(claim.body.error.code).toBe('own_submission');
  });
});

describe('corrections', () => {
  it('reach the queue and, once passed on, the entry’s editors by mail and on their Desk', async () => {
    const reader = await h.signedIn(demo.contributor.email);
    const moderator = await h.signedIn(demo.moderator.email);
    const missing = await reader.post('/api/corrections', { entry: 'resonant-cavity-thruster', version: 1, section: 'whyItFails' });
    expect(missing.status).toBe(400);
    expect(Object.keys(missing.body.error.fields)).toEqual(expect.arrayContaining(['body.whatIsWrong', 'body.suggestedFix']));
    expect((await reader.post('/api/corrections', { entry: 'resonant-cavity-thruster', version: 99, section: 'whyItFails', whatIsWrong: 'The bound is misquoted.', suggestedFix: 'Fix it.' })).status).toBe(404);
    const res = await reader.post('/api/corrections', {
      entry: 'resonant-cavity-thruster',
      version: 1,
      section: 'whyItFails',
      whatIsWrong: 'The photon bound per kilowatt is given with the wrong power of ten.',
      suggestedFix: 'Write 3.34 µN per kW.',
      sources: 'Any mechanics text.',
    });
    expect(res.status).toBe(201);
    const id = res.body.submission.id;
    expect(res.body.submission).toMatchObject({ kind: 'correction', entry: { slug: 'resonant-cavity-thruster', version: 1 }, section: 'whyItFails' });
    await moderator.post(`/api/submissions/${id}/claim`).expect(200);
    expect((await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept', entries: ['overbalanced-wheel'] })).status).toBe(400);
    const accepted = await moderator.post(`/api/submissions/${id}/decide`, { decision: 'accept' });
    expect(accepted.body.submission.status).toBe('accepted');
    // The entry's author (content/entries: editor.two) and reviewer (editor.one) are told.
    for (const email of [demo.editor.email, demo.editor2.email]) {
      const mail = await h.mail.next(email, { subject: /A correction to/ });
      expect(mail.text).toContain('version 1');
      const editor = await h.signedIn(email);
      expect((await editor.get('/api/desk/corrections')).body.items.map((i: { id: number }) => i.id)).toContain(id);
      expect((await editor.get(`/api/submissions/${id}`)).body.submission.suggestedFix).toBe('Write 3.34 µN per kW.');
    }
    await h.mail.next(demo.contributor.email, { subject: /Accepted/ });
  });
});

describe('the moderators’ digest', () => {
  it('gathers items that arrive together into one message per moderator', async () => {
    const c = await h.signedIn(demo.contributor.email);
    // Earlier items of this file may still wait for their digest: wait until every open item has been
    // listed (the digest marks them), so that none joins the batch below.
    await until('no open item waits for a digest', async () => (await Submission.count({ where: { moderatorsNotifiedAt: null, status: 'open' } })) === 0, 30_000);
    const titles = [1, 2, 3].map((n) => `Batch item ${n}`);
    // Sent together, as the test's name says.
    const sent = await Promise.all(titles.map((title) => sighting(c, { ...good, title })));
    expect(sent.map((r) => r.status)).toEqual([201, 201, 201]);
    const mail = await h.mail.next(demo.moderator.email, { subject: /3 new submissions/, text: 'Batch item 1', timeoutMs: 30_000 });
    for (const title of titles) expect(mail.text).toContain(title);
    // No fixed wait for a second message: a digest marks the items it lists (in the same transaction
    // that reads them) before it is sent, so once all three are marked, no later digest can list them.
    const batch = await Submission.findAll({ where: { title: titles } });
    expect(batch.map((s) => s.moderatorsNotifiedAt)).toEqual([expect.any(Date), expect.any(Date), expect.any(Date)]);
    const toModerator = (await h.mail.all()).filter((m) => m.to.includes(demo.moderator.email));
    expect(toModerator.filter((m) => titles.some((t) => m.text.includes(t)))).toHaveLength(1);
  });
});

describe('bad input loses nothing', () => {
  let c: Client;
  let files0: number;
  let rows0: number;
  beforeAll(async () => {
    c = await h.signedIn(demo.contributor.email);
  });
  beforeEach(async () => {
    files0 = storedFiles().length;
    rows0 = await Submission.count();
  });
  afterEach(async () => {
    expect(storedFiles().length).toBe(files0);
    expect(await Submission.count()).toBe(rows0);
  });

  it('refuses an executable renamed .pdf with 415, naming the file', async () => {
    const res = await sighting(c, good, [{ name: 'ok.pdf', bytes: minimalPdf() }, { name: 'report.pdf', bytes: elfHeader() }]);
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
    expect(Object.keys(res.body.error.fields)).toEqual(['files.1']);
  });

  it('refuses a text file with 415', async () => {
    expect((await sighting(c, good, [{ name: 'notes.pdf', bytes: plainText() }])).status).toBe(415);
  });

  it('refuses a file over 10 MB with 413', async () => {
    const res = await sighting(c, good, [{ name: 'big.pdf', bytes: largePdf(10 * 1024 * 1024 + 1) }]);
    expect(res.status).toBe(413);
    expect(res.body.error.fields).toHaveProperty(['files']);
  });

  it('refuses six files with 400', async () => {
    const res = await sighting(c, good, Array.from({ length: 6 }, (_, i) => ({ name: `p${i}.pdf`, bytes: minimalPdf() })));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('too_many_files');
  });

  it.each([
    ['title', { ...good, title: undefined }, 'body.title'],
    ['summary', { ...good, summary: undefined }, 'body.summary'],
    ['where it was seen', { ...good, seenAtUrl: undefined }, 'body.seenAtUrl'],
    ['a web address', { ...good, seenAtUrl: 'javascript:alert(1)' }, 'body.seenAtUrl'],
    ['a figure', { ...good, figures: JSON.stringify([{ kind: 'thrust', quantity: '3 kW' }]) }, 'body.figures.0.quantity'],
    ['the figures JSON', { ...good, figures: '[{' }, 'body.figures'],
  ])('answers 400 naming the field when %s is missing or wrong', async (_what, fields, field) => {
    const res = await sighting(c, fields, [{ name: 'a.pdf', bytes: minimalPdf() }]);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
  });

  it('removes the stored files when the database write fails', async () => {
    // The files are stored before the row is written; when the write fails they must go again.
    const spy = jest.spyOn(Submission, 'create').mockRejectedValueOnce(new Error('simulated database failure'));
    const res = await sighting(c, good, [{ name: 'a.pdf', bytes: minimalPdf() }, { name: 'b.png', bytes: minimalPng(), type: 'image/png' }]);
    spy.mockRestore();
    expect(res.status).toBe(500);
  });
});

it('keeps user text as text: markup is stored and returned as typed, for the screens to show as text', async () => {
  const c = await h.signedIn(demo.contributor.email);
  const title = '<img src=x onerror=alert(1)> resonator';
  const res = await sighting(c, { ...good, title });
  expect(res.status).toBe(201);
  expect(res.body.submission.title).toBe(title);
  expect(res.headers['content-type']).toMatch(/application\/json/);
});

describe('rate limits', () => {
  it('limit submissions per address, whichever account sends them', async () => {
    const limited = await startTestApp({ starterEntries: false, rateLimits: { ...HIGH_LIMITS, submitAddress: { limit: 2, windowMs: 60_000 } } });
    try {
      const body = { entry: 'x-entry', version: 1, section: 'other', whatIsWrong: 'Something is off here.', suggestedFix: 'Fix it.' };
      const a = await limited.signedIn(demo.contributor.email);
      const b = await limited.signedIn(demo.editor.email);
      expect((await a.post('/api/corrections', body)).status).toBe(404);
      expect((await b.post('/api/corrections', body)).status).toBe(404);
      const third = await a.post('/api/corrections', body);
      expect(third.status).toBe(429);
      expect(third.body.error).toMatchObject({ code: 'rate_limited', message: expect.stringMatching(/from your network/) });
      expect(third.headers['retry-after']).toBeDefined();
    } finally {
      await limited.close();
    }
  });

  it('limit submissions per account', async () => {
    const limited = await startTestApp({ starterEntries: false, rateLimits: { ...HIGH_LIMITS, submitAccount: { limit: 2, windowMs: 60_000 } } });
    try {
      const c = await limited.signedIn(demo.contributor.email);
      const body = { entry: 'x-entry', version: 1, section: 'other', whatIsWrong: 'Something is off here.', suggestedFix: 'Fix it.' };
      expect((await c.post('/api/corrections', body)).status).toBe(404);
      expect((await c.post('/api/corrections', body)).status).toBe(404);
      const third = await c.post('/api/corrections', body);
      expect(third.status).toBe(429);
      expect(third.body.error.message).toMatch(/from this account/);
      // Another account from the same address is not limited by the first one's count.
      const other = await limited.signedIn(demo.editor.email);
      expect((await other.post('/api/corrections', body)).status).toBe(404);
    } finally {
      await limited.close();
    }
  });
});
