/**
 * Claim-check latency at 10,000 entries (issue 16), a section of `npm run bench:search` (it reuses
 * that bench's synthetic library, database and index): for 50 claim texts of the corpus's tuning
 * part (tests/fixtures/claims-corpus/tuning.ts, every other claim; never the held-out part), and
 * for a few long texts made of twenty of them each,
 *  - the matcher alone (matchClaim on the index, the classes the figures signal worked out
 *    beforehand), for the claims and for the long texts;
 *  - the whole claim check as POST /api/claim-checks runs it, minus HTTP: ClaimChecks.run with the
 *    app's compute pool (the figure reader and the checks in worker threads), the matcher, and the
 *    cited versions read from MariaDB, for the claims (a long text's many figures make its
 *    checks, not its matching, the slow part: they have their own limit in the compute pool).
 * Figures only, printed with their aim; never asserted.
 */
import type { Response } from 'express';
import pino from 'pino';
import type { Sequelize } from 'sequelize';
import { ComputePool } from '../server/compute/pool';
import { computeConfig } from '../server/config';
import type { ClaimCheckInput } from '../server/routes/claim-checks/schema';
import type { SearchIndex } from '../server/search';
import { matchClaim } from '../server/search/claim-match';
import { ClaimChecks } from '../server/services/claim-checks';
import { Library } from '../server/services/entries/library';
import { signalledClasses } from '../shared/claims/plan';
import { extractFigures } from '../shared/claims/reader';
import { claims } from '../tests/fixtures/claims-corpus/tuning';

/** Aim of issue 16: the claim check's p95 in process at 10,000 entries. */
export const AIM_CLAIM_P95_MS = 50;
const ROUNDS = 3;

const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1))];
const fmt = (t: number) => (t < 10 ? t.toFixed(2) : t.toFixed(1));

/** The claim texts: every other claim of the tuning part (53), and five long texts of twenty claims each. */
export function claimTexts(): { short: string[]; long: string[] } {
  const short = claims.filter((_, i) => i % 2 === 0).map((c) => c.text);
  const long = Array.from({ length: 5 }, (_, k) => claims.slice(k * 20, k * 20 + 20).map((c) => c.text).join(' '));
  return { short, long };
}

async function timed(texts: string[], run: (text: string) => unknown | Promise<unknown>): Promise<{ p50: number; p95: number; max: number }> {
  // One round to warm up, then ROUNDS timed rounds over every text.
  for (const t of texts) await run(t);
  const times: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    for (const t of texts) {
      const s = performance.now();
      await run(t);
      times.push(performance.now() - s);
    }
  }
  times.sort((a, b) => a - b);
  return { p50: percentile(times, 0.5), p95: percentile(times, 0.95), max: times[times.length - 1] };
}

export interface ClaimLatency {
  matcher: { p50: number; p95: number };
  check: { p50: number; p95: number };
  /** The matcher on the long texts. */
  long: { p50: number; p95: number };
}

/** Runs the section; `say` prints a line. */
export async function benchClaimLatency(index: SearchIndex, sequelize: Sequelize, say: (m: string) => void): Promise<ClaimLatency> {
  const { short, long } = claimTexts();
  const classes = new Map([...short, ...long].map((t) => [t, signalledClasses(extractFigures(t), t)]));
  const chars = (xs: string[]) => Math.round(xs.reduce((a, s) => a + s.length, 0) / xs.length);

  const matcher = await timed(short, (t) => matchClaim(index, t, { classes: classes.get(t) }));
  say(`claim matcher (matchClaim, ${short.length} tuning claims of ~${chars(short)} characters, ×${ROUNDS}): p50 ${fmt(matcher.p50)} ms, p95 ${fmt(matcher.p95)} ms, max ${fmt(matcher.max)} ms`);
  const longMatcher = await timed(long, (t) => matchClaim(index, t, { classes: classes.get(t) }));
  say(`claim matcher, ${long.length} long texts of ~${chars(long)} characters: p50 ${fmt(longMatcher.p50)} ms, p95 ${fmt(longMatcher.p95)} ms`);

  // The app's pool, with a time limit generous enough for a worker's first job on busy cores (it
  // loads the figure reader); the warm-up round takes that cost before anything is timed.
  const compute = new ComputePool({ ...computeConfig(), timeoutMs: 60_000 }, pino({ level: 'silent' }));
  await compute.start();
  try {
    const service = new ClaimChecks({ sequelize, index, library: new Library(), compute });
    // ClaimChecks.run sets Retry-After on this when the pool's queue is full (it never is here).
    const res = { set: () => res } as unknown as Response;
    const input = (text: string): ClaimCheckInput => ({ text, style: 'apa', variant: 'referee' });
    const check = await timed(short, (t) => service.run(input(t), 'http://127.0.0.1', res));
    say(`whole claim check (ClaimChecks.run as POST /api/claim-checks runs it, minus HTTP: reader and checks in the compute pool's workers, matcher, cited versions from MariaDB): p50 ${fmt(check.p50)} ms, p95 ${fmt(check.p95)} ms, max ${fmt(check.max)} ms`);
    return { matcher, check, long: longMatcher };
  } finally {
    await compute.close();
  }
}
