/**
 * The Desk's server side of issue 15 (supertest, real MariaDB): a formula KaTeX cannot parse blocks
 * submitting (and approving) a draft with a 400 naming the field and the line; a draft's problems
 * are told in our words, never zod's defaults; a published draft's old address says which version
 * it became.
 */
import katex from 'katex';
import { startTestApp, type Client, type TestApp } from '../support/app';
import { approveDraft, createDraft, submitDraft } from '../support/workflow';

jest.setTimeout(120_000);

const EDITOR_ONE = 'editor.one@example.org';
const EDITOR_TWO = 'editor.two@example.org';

/** A small complete entry of our own, without worksheets (none is needed here). */
const content = (over: Record<string, unknown> = {}) => ({
  title: 'Thrust from a sealed box of light',
  aliases: [],
  mechanismClass: 'enclosed-radiation',
  laws: ['linear-momentum'],
  inBrief: 'Light sealed in a box pushes on every wall alike, so the box goes nowhere.',
  howItIsPitched: 'A cavity of a special shape is said to push harder on one end.',
  whyItFails: 'Momentum of light and box together is conserved: $p = E/c$.',
  worksheets: [],
  whatFakesTheEffect: '',
  repliesAndAnswers: [],
  questionsToAsk: [],
  cautions: '',
  related: [],
  sources: [],
  ...over,
});

/** zod 4's default wording ("Too small: expected string to have >=3 characters", "Invalid input: expected string"). */
const ZOD_DEFAULTS = /expected|Too small|Too big|Invalid input|>=|<=/;

/** KaTeX's own message for a formula (the reference the server's words must quote). */
function katexSays(tex: string, displayMode = false): string {
  try {
    katex.renderToString(tex, { throwOnError: true, displayMode, strict: 'ignore' });
  } catch (err) {
    return (err as { rawMessage: string }).rawMessage;
  }
  throw new Error(`KaTeX read ${tex} without complaint`);
}

let h: TestApp;
let one: Client;
let two: Client;
beforeAll(async () => {
  h = await startTestApp({ taxonomy: true });
  one = await h.signedIn(EDITOR_ONE);
  two = await h.signedIn(EDITOR_TWO);
});
afterAll(() => h?.close());

describe('TeX that KaTeX cannot parse', () => {
  it('is saved while writing, but blocks submitting with a 400 naming the field and the line', async () => {
    // The bad formula sits on line 4 of the field, inside a display block that starts on line 3.
    const whyItFails = 'Momentum is conserved.\n\n$$\nF = \\fra{P}{c}\n$$\n\nSo nothing moves.';
    const draft = await createDraft(one, 'bad-tex-box', content({ whyItFails }));
    const res = await one.post(`/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('draft_incomplete');
    expect(Object.keys(res.body.error.fields)).toEqual(['content.whyItFails']);
    const said = katexSays('F = \\fra{P}{c}', true);
    expect(said).toMatch(/\\fra/);
    expect(res.body.error.fields['content.whyItFails']).toBe(`line 4: KaTeX says ${said}`);
    expect(res.body.error.message).toContain('Why it fails: line 4: KaTeX says');
  });

  it('names a reply\'s answer and an inline formula\'s line', async () => {
    const answer = 'First line.\nSecond line with $x^$ in it.';
    const draft = await createDraft(one, 'bad-tex-reply', content({ repliesAndAnswers: [{ reply: 'It works.', answer }] }));
    const res = await one.post(`/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ 'content.repliesAndAnswers.0.answer': `line 2: KaTeX says ${katexSays('x^')}` });
  });

  it('lets a draft whose formulas all parse through', async () => {
    const whyItFails = 'Inline $F \\le P/c$, and on one line $$E = mc^2$$, and a block:\n\n$$\n\\frac{dp}{dt} = 0\n$$';
    const draft = await createDraft(one, 'good-tex-box', content({ whyItFails }));
    const res = await one.post(`/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion });
    expect(res.status).toBe(200);
  });
});

describe('our words', () => {
  it('tells a short title and a missing section in our words, on saving and on submitting', async () => {
    const save = await one.post('/api/drafts', { slug: 'short-title', content: content({ title: 'ab' }) });
    expect(save.status).toBe(400);
    expect(save.body.error.fields['body.content.title']).toBe('give the title at least 3 characters');
    expect(JSON.stringify(save.body)).not.toMatch(ZOD_DEFAULTS);

    const typed = await one.post('/api/drafts', { slug: 'typed-title', content: content({ title: 42, questionsToAsk: [''] }) });
    expect(typed.status).toBe(400);
    expect(typed.body.error.fields['body.content.title']).toBe('write a title');
    expect(typed.body.error.fields['body.content.questionsToAsk.0']).toBe('write the question, or remove it');
    expect(JSON.stringify(typed.body)).not.toMatch(ZOD_DEFAULTS);

    const half = await one.post('/api/drafts', { slug: 'half-a-draft', content: { title: 'Half a draft', mechanismClass: 'over-unity' } });
    expect(half.status).toBe(201);
    const submit = await one.post(`/api/drafts/${half.body.draft.id}/submit`, { lockVersion: 0 });
    expect(submit.status).toBe(400);
    expect(submit.body.error.fields).toMatchObject({
      'content.laws': 'name at least one conservation law',
      'content.inBrief': 'write the brief in plain language',
      'content.whyItFails': 'write the technical objection',
    });
    expect(JSON.stringify(submit.body)).not.toMatch(ZOD_DEFAULTS);
  });

  it('tells a worksheet that breaks its schema in our words', async () => {
    // A worksheet with an empty title and no steps: checks of the worksheet schema that carry no message of their own.
    const worksheets = [{ name: 'box', title: '', inputs: [], steps: [], checks: [], plots: [] }];
    const put = await one.post('/api/drafts', { slug: 'bad-sheet-box', content: content({ worksheets }) });
    expect(put.status).toBe(400);
    expect(Object.keys(put.body.error.fields)).toEqual(expect.arrayContaining(['body.content.worksheets.0.title', 'body.content.worksheets.0.steps']));
    expect(JSON.stringify(put.body)).not.toMatch(ZOD_DEFAULTS);
  });
});

describe("a published draft's old address", () => {
  it('answers 404 draft_published with the version it became', async () => {
    const draft = await submitDraft(one, await createDraft(one, 'published-box', content()));
    const number = await approveDraft(two, draft, 'First version.');
    expect(number).toBe(1);
    const res = await one.get(`/api/drafts/${draft.id}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('draft_published');
    expect(res.body.published).toEqual({ slug: 'published-box', version: 1, title: 'Thrust from a sealed box of light' });
    // A draft that never existed stays a plain 404.
    const none = await one.get('/api/drafts/987654');
    expect([none.status, none.body.error.code, none.body.published]).toEqual([404, 'not_found', undefined]);
  });
});
