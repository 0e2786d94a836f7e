/**
 * Entries led to by a claim's own finding (server/search/claim-findings.ts), through POST
 * /api/claim-checks (supertest, real MariaDB, the starter library): a claim that says little in words
 * and everything in figures gets the entry of the class its finding points to, saying why; a claim
 * whose words match entries keeps them; a lawful claim with no words of the library gets none.
 * Claim texts are invented test data.
 */
import request from 'supertest';
import type { ClaimCheckResult } from '../../shared/claims/types';
import { startTestApp, type TestApp } from '../support/app';

jest.setTimeout(120_000);

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0, compute: { timeoutMs: 60_000 } });
});
afterAll(() => h?.close());

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
