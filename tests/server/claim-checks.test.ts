/**
 * POST /api/claim-checks and saved claim checks (supertest, real MariaDB, the starter library):
 * the four parts of the answer, the figures sent back after a fix, the limits and the 4xx errors,
 * and saving, sharing by link and deleting by the owner only. Claim texts are invented test data.
 */
import request from 'supertest';
import type { ClaimCheckResult } from '../../shared/claims/types';
import { SavedClaimCheck } from '../../server/models';
import { demo, startTestApp, type TestApp } from '../support/app';

jest.setTimeout(120_000);

let h: TestApp;
beforeAll(async () => {
  // The pool's 2 s limit per computation is for readers' input; here a generous one, so that a busy
  // machine (two cores shared by the suite) cannot turn these tests into timed ones. The limit itself
  // is tested in compute-pool.test.ts.
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0, compute: { timeoutMs: 60_000 } });
});
afterAll(() => h?.close());

// Invented test data.
const CAVITY =
  'Breakthrough from Pellworth Aerospace Labs: our sealed copper frustum, fed with microwaves at resonance, ' +
  'produced 0.2 lbf of thrust from 1.5 kW of input power on a torsion balance, with no propellant leaving the cavity.';
const ENGINE =
  'The Ostrander ambient engine runs between a hot side at 90 °C and cold river water at 20 °C, ' +
  'and converts that heat to shaft work with an efficiency of 45 %, far above any engine of its size.';

const run = (body: object) => request(h.app).post('/api/claim-checks').send(body);

describe('POST /api/claim-checks', () => {
  let res: request.Response;
  let body: ClaimCheckResult;
  beforeAll(async () => {
    // No CSRF token: a pure computation, like the check kit.
    res = await run({ text: CAVITY });
    body = res.body;
  });

  it('matches the entry, with the words that matched and the permanent URL of its version', () => {
    expect(res.status).toBe(200);
    const top = body.matches[0];
    expect(top).toMatchObject({ slug: 'resonant-cavity-thruster', version: 1 });
    expect(top.url).toMatch(/^http:\/\/127\.0\.0\.1(:\d+)?\/entries\/resonant-cavity-thruster\/v\/1$/);
    expect(top.score).toBeGreaterThan(0);
    expect(top.words.length).toBeGreaterThan(0);
    for (const w of top.words) expect(CAVITY).toContain(w);
  });

  it('finds the figures with their units and their places in the text', () => {
    const thrust = body.figures.find((f) => f.kind === 'thrust')!;
    const power = body.figures.find((f) => f.kind === 'power')!;
    expect(CAVITY.slice(thrust.start!, thrust.end!)).toBe(thrust.text);
    expect(CAVITY.slice(power.start!, power.end!)).toBe(power.text);
    // 1 lbf = 4.448 222 N (NIST SP 811, Appendix B.8).
    expect(thrust.si).toBeCloseTo(0.2 * 4.4482216152605, 9);
    expect(power.si).toBe(1500);
  });

  it('runs the checks that apply, with the results of the check kit, and lists what needs a figure the text does not give', () => {
    expect(body.checks.map((c) => c.check)).toEqual(['photon-bound']);
    // No speed in the text: the break-even speed is not run on a default but listed as needing one.
    expect(body.needs).toEqual([expect.objectContaining({ check: 'break-even-speed', missing: ['a speed of the craft in some inertial frame'] })]);
    // The results worked out here by hand, not by the check kit (the code under test).
    const photon = body.checks.find((c) => c.check === 'photon-bound')!;
    expect(photon.outputs.map((o) => [o.name, o.unit])).toEqual([
      ['F_bound', 'N'],
      ['ratio', ''],
    ]);
    // P/c with c = 299 792 458 m/s (SI Brochure §2.2): 1500 W / c = 5.0035 µN.
    expect(photon.outputs.find((o) => o.name === 'F_bound')!.si).toBeCloseTo(1500 / 299_792_458, 15);
    expect(photon.outputs.find((o) => o.name === 'F_bound')!.display).toContain('µN');
    // The claimed 0.2 lbf = 0.889 644 N (1 lbf = 4.448 221 615 260 5 N, NIST SP 811, Appendix B.8) over the bound: about 1.778 × 10^5.
    expect(photon.outputs.find((o) => o.name === 'ratio')!.si / ((0.2 * 4.4482216152605 * 299_792_458) / 1500)).toBeCloseTo(1, 12);
    // Far above the bound: the check does not hold.
    expect(photon.verdict.holds).toBe(false);
  });

  it('writes the paragraph: the entry with its URL and version, the result, numbered APA references, in four variants', () => {
    const p = body.paragraph;
    expect(p.style).toBe('apa');
    expect(body.variant).toBe('referee');
    expect(p).toEqual(body.paragraphs.referee);
    expect(Object.keys(body.paragraphs).sort()).toEqual(['examiner', 'grant', 'journalist', 'referee']);
    expect(body.paragraphs.examiner.body).toMatch(/inoperable/);
    expect(p.body).toContain(body.matches[0].url);
    expect(p.body).toContain('version 1');
    expect(p.body).toMatch(/times the photon-rocket bound/);
    expect(p.references[0]).toMatchObject({ n: 1, counterweight: true, id: 'resonant-cavity-thruster-v1' });
    expect(p.references[0].text).toMatch(/\(\d{4}\)\. Thrust from microwaves or light trapped in a closed cavity\. In Counterweight \(Version 1\)\. http/);
    expect(p.text).toContain(`\nReferences\n1. ${p.references[0].text}`);
  });

  it.each([
    ['vancouver', /\[cited \d{4} [A-Z][a-z]{2} \d{1,2}\]\. Available from: http/],
    ['harvard', /Available at: http\S+ \(Accessed: .*\d{4}\)\./],
  ])('formats the references in %s', async (style, rule) => {
    const r = await run({ text: CAVITY, style });
    expect(r.status).toBe(200);
    expect(r.body.paragraph.style).toBe(style);
    expect(r.body.paragraph.references[0].text).toMatch(rule);
    // Sources of the entry are listed too, formatted by citation-js like the entry's own list.
    expect(r.body.paragraph.references.length).toBeGreaterThan(1);
  });

  it('runs Carnot on temperatures and an efficiency', async () => {
    const r = await run({ text: ENGINE });
    expect(r.status).toBe(200);
    expect(r.body.matches[0].slug).toBe('ambient-heat-engine');
    const carnot = r.body.checks.find((c: { check: string }) => c.check === 'carnot');
    expect(carnot).toBeDefined();
    // Carnot efficiency 1 − Tc/Th, T/K = t/°C + 273.15 (NIST SP 811 §4.2.1.1).
    expect(carnot.outputs.find((o: { name: string }) => o.name === 'eta_max').si).toBeCloseTo(1 - 293.15 / 363.15, 12);
    expect(carnot.verdict.holds).toBe(false);
  });

  it('reports a lawful heat pump as consistent with the second law, never as breaking it, and answers in the variant asked for', async () => {
    const text = 'Example Climate Ltd says its air-source heat pump is 350 % efficient, heating a 35 °C underfloor loop from 2 °C outdoor air (invented test data).';
    const r = await run({ text, variant: 'journalist' });
    expect(r.status).toBe(200);
    const carnot = r.body.checks.find((c: { check: string }) => c.check === 'carnot');
    // Carnot heating COP Th/(Th − Tc) = 308.15/33 = 9.34 (NIST SP 811 §4.2.1.1 for the kelvins); 3.5 is within it.
    expect(carnot.outputs.find((o: { name: string }) => o.name === 'cop_heating_ratio').si).toBeCloseTo(3.5 / (308.15 / 33), 9);
    expect(carnot.finding).toBe('consistent');
    expect(r.body.checks.filter((c: { finding: string }) => c.finding === 'breaks')).toEqual([]);
    expect(r.body.variant).toBe('journalist');
    expect(r.body.paragraph).toEqual(r.body.paragraphs.journalist);
    expect(r.body.paragraph.body).toMatch(/consistent with the second law of thermodynamics/);
  });

  it('answers 400 naming the field for an unknown variant', async () => {
    const r = await run({ text: CAVITY, variant: 'tabloid' });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields)).toEqual(['body.variant']);
  });

  it('re-runs on figures the reader fixed, without reading the text again', async () => {
    const figures = body.figures.map((f) => (f.kind === 'thrust' ? { kind: f.kind, quantity: '0.2 mN', role: f.role, text: f.text, start: f.start, end: f.end } : { kind: f.kind, quantity: f.quantity, role: f.role }));
    const r = await run({ text: CAVITY, figures });
    expect(r.status).toBe(200);
    expect(r.body.figures.map((f: { quantity: string }) => f.quantity)).toEqual(figures.map((f) => f.quantity));
    const photon = r.body.checks.find((c: { check: string }) => c.check === 'photon-bound');
    expect(photon.inputs.F_claimed).toBe('0.2 mN');
    // Worked by hand: the bound is still 1500 W / c (SI Brochure §2.2); 0.2 mN over it is 2e-4 × c / 1500 = 39.97.
    const si = (name: string) => photon.outputs.find((o: { name: string }) => o.name === name).si;
    expect(si('F_bound')).toBeCloseTo(1500 / 299_792_458, 15);
    expect(si('ratio') / ((2e-4 * 299_792_458) / 1500)).toBeCloseTo(1, 12);
    expect(photon.verdict.holds).toBe(false);
    // The thrust typed by the reader keeps its place in the text.
    expect(r.body.figures.find((f: { kind: string }) => f.kind === 'thrust').start).toBe(body.figures.find((f) => f.kind === 'thrust')!.start);
  });

  it('takes 20,000 characters and answers 413 for more', async () => {
    const filler = ' The balance was read every second.';
    const long = (CAVITY + filler.repeat(1000)).slice(0, 20_000);
    const ok = await run({ text: long });
    expect(ok.status).toBe(200);
    expect(ok.body.textLength).toBe(20_000);
    const over = await run({ text: `${long}x` });
    expect(over.status).toBe(413);
    expect(over.body.error).toMatchObject({ code: 'text_too_long', fields: { 'body.text': expect.any(String) } });
  });

  it.each([
    [{}, 'body.text'],
    [{ text: '   ' }, 'body.text'],
    [{ text: CAVITY, style: 'chicago' }, 'body.style'],
    [{ text: CAVITY, figures: [{ kind: 'thrust', quantity: '0.2 furlongs' }] }, 'body.figures.0.quantity'],
    [{ text: CAVITY, figures: [{ kind: 'thrust', quantity: '1.5 kW' }] }, 'body.figures.0.quantity'],
    [{ text: CAVITY, figures: [{ kind: 'torque', quantity: '1 N m' }] }, 'body.figures.0.kind'],
    [{ text: CAVITY, figures: Array.from({ length: 51 }, () => ({ kind: 'power', quantity: '1 W' })) }, 'body.figures'],
    [{ text: CAVITY, extra: 1 }, 'body'],
  ])('answers 400 naming the field for %j', async (sent, field) => {
    const r = await run(sent);
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields ?? {}).some((k) => k === field || k.startsWith(`${field}.`))).toBe(true);
  });

  it('refuses a request from another site', async () => {
    const r = await request(h.app).post('/api/claim-checks').set('Origin', 'https://elsewhere.example.net').send({ text: CAVITY });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('csrf_failed');
  });
});

describe('saved claim checks', () => {
  it('needs an account to save', async () => {
    const c = await h.client();
    const r = await c.post('/api/claim-checks/saved', { text: CAVITY });
    expect(r.status).toBe(401);
  });

  it('saves, shares by an unguessable link, lists, and lets only the owner delete', async () => {
    const owner = await h.signedIn(demo.contributor.email);
    const saved = await owner.post('/api/claim-checks/saved', { text: CAVITY, style: 'harvard' });
    expect(saved.status).toBe(201);
    const { token, url, result } = saved.body.saved;
    expect(token).toMatch(/^[A-Za-z0-9_-]{32,}$/); // 24 random bytes, base64url
    expect(url).toMatch(new RegExp(`/check/${token}$`));
    expect(result.paragraph.style).toBe('harvard');
    expect(saved.body.saved.mine).toBe(true);
    expect(await SavedClaimCheck.count({ where: { token } })).toBe(1);

    const again = await owner.post('/api/claim-checks/saved', { text: CAVITY });
    expect(again.body.saved.token).not.toBe(token);

    // Anyone with the link reads it; it is not theirs.
    const anon = await request(h.app).get(`/api/claim-checks/saved/${token}`);
    expect(anon.status).toBe(200);
    expect(anon.body.saved).toMatchObject({ token, text: CAVITY, style: 'harvard', mine: false });
    expect(anon.body.saved.result.matches[0].slug).toBe('resonant-cavity-thruster');
    expect(anon.headers['cache-control']).toMatch(/no-store/);

    const mine = await owner.get('/api/claim-checks/saved');
    expect(mine.body.saved.map((s: { token: string }) => s.token)).toEqual([again.body.saved.token, token]);
    expect(mine.body.saved[0]).toMatchObject({ preview: CAVITY.slice(0, 120), topMatch: 'Thrust from microwaves or light trapped in a closed cavity' });

    const other = await h.signedIn(demo.editor.email);
    expect((await other.get('/api/claim-checks/saved')).body.saved).toEqual([]);
    const refused = await other.send('delete', `/api/claim-checks/saved/${token}`);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('not_owner');

    const deleted = await owner.send('delete', `/api/claim-checks/saved/${token}`);
    expect(deleted.status).toBe(204);
    expect((await request(h.app).get(`/api/claim-checks/saved/${token}`)).status).toBe(404);
    expect((await owner.send('delete', `/api/claim-checks/saved/${token}`)).status).toBe(404);
  });

  it('answers 404 for an unknown token and 400 for a malformed one', async () => {
    expect((await request(h.app).get(`/api/claim-checks/saved/${'B'.repeat(32)}`)).status).toBe(404);
    const bad = await request(h.app).get('/api/claim-checks/saved/not!a!token');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['params.token']);
  });

  it('checks the saved body like a run (413 over the limit)', async () => {
    const owner = await h.signedIn(demo.contributor.email);
    const r = await owner.post('/api/claim-checks/saved', { text: 'x'.repeat(20_001) });
    expect(r.status).toBe(413);
    expect(await SavedClaimCheck.count({ where: { text: 'x'.repeat(20_001) } })).toBe(0);
  });
});

it('cites with the formatter the entry pages use', async () => {
  const r = await run({ text: CAVITY, style: 'vancouver' });
  const cite = await request(h.app).get('/api/entries/resonant-cavity-thruster/cite?format=vancouver&version=1');
  // Each supertest request listens on its own port: compare without the origin.
  const local = (t: string) => t.replace(/http:\/\/127\.0\.0\.1:\d+/g, 'ORIGIN');
  expect(local(r.body.paragraph.references[0].text)).toBe(local(cite.body.text));
});

// Entries led to by a claim's own finding (server/search/claim-findings.ts): a claim that says little in
// words and everything in figures gets the entry of the class its finding points to, saying why; a claim
// whose words match entries keeps them (the one of the finding's class lifted); a lawful claim is led to no entry.
const check = async (text: string): Promise<ClaimCheckResult> => {
  const res = await request(h.app).post('/api/claim-checks').send({ text });
  expect(res.status).toBe(200);
  return res.body as ClaimCheckResult;
};

describe('entries a finding leads to', () => {
  it('a bare speed above c gets the faster-than-light entry, with the finding in words and no matched words', async () => {
    // 450 000 km/s = 4.5 × 10⁸ m/s > c = 299 792 458 m/s (SI Brochure, 9th ed., defining constant).
    const body = await check('Probe reaches 450,000 km/s.');
    expect(body.checks.find((c) => c.check === 'light-speed')?.finding).toBe('breaks');
    expect(body.matches[0]).toMatchObject({ slug: 'faster-than-light', words: [] });
    expect(body.matches[0].finding).toMatch(/speed of light/);
    // The paragraph cites the entry it was led to.
    expect(body.paragraph.references.some((r) => r.counterweight && r.id.startsWith('faster-than-light'))).toBe(true);
  });

  it('an electrical first-law ledger with more out than in, in few words of the library, gets the over-unity circuit entry', async () => {
    // 2 A × 12 V = 24 W in < 60 W out.
    const body = await check('Box draws 2 A at 12 V and keeps a 60 W lamp lit.');
    expect(body.checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    expect(body.matches.map((m) => m.slug)).toContain('over-unity-circuit');
    expect(body.matches.find((m) => m.slug === 'over-unity-circuit')?.finding).toMatch(/more out than in/);
  });

  it('among matched entries of one family, the one of the class the finding points to is lifted', async () => {
    // 0.5 A × 12 V = 6 W in < 13.8 V × 0.9 A = 12.42 W out: the first law breaks. The words match the
    // self-charging loops' entry (same family) about as well as the over-unity circuits'; the finding's
    // class, the over-unity circuits, comes first.
    const body = await check('The pulse motor is fed 0.5 A at 12 V, yet its generator coil charges a second battery at 13.8 V and 0.9 A.');
    expect(body.checks.find((c) => c.check === 'first-law')?.finding).toBe('breaks');
    expect(body.matches[0].slug).toBe('over-unity-circuit');
    // A vehicle's words still decide for the vehicle's entry.
    const van = await check('The van charges itself as it drives: its wheel generator puts 3 kW back into the battery that feeds the 2 kW motor.');
    expect(van.matches[0].slug).toBe('self-charging-vehicle');
  });

  it('words that match an entry decide; a lawful claim is led to no entry', async () => {
    const drive = await check('If the tapered-cavity drive scales as the team hopes, a probe could cruise at 1.5 c.');
    expect(drive.matches[0].slug).toBe('resonant-cavity-thruster');
    expect(drive.matches[0].finding).toBeUndefined();
    // 40 W / 48 W = 0.83 < 1: nothing breaks, so no finding leads to an entry (the words may still match one).
    const lawful = await check('The bench unit draws 48 W and puts out 40 W.');
    expect(lawful.checks.some((c) => c.finding === 'breaks')).toBe(false);
    expect(lawful.matches.filter((m) => m.finding !== undefined)).toEqual([]);
  });
});
