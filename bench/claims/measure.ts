/**
 * The measures of `npm run bench:claims` (issue 11, item 6), over one part of the claim corpus
 * (tests/fixtures/claims-corpus): figures read right, check values within 0.5 %, verdicts right,
 * the right entry first, and false alarms. Pure: the matcher comes in as a function, so the same
 * measures run with the real search index (the bench) or with none (a quick look at the reader).
 */
import { runClaimChecks } from '../../shared/claims/plan';
import { extractFigures } from '../../shared/claims/reader';
import type { ClaimCheckRun, Figure } from '../../shared/claims/types';
import type { CorpusClaim, CorpusFigure } from '../../tests/fixtures/claims-corpus/types';

/** Agreement of a value with the corpus (issue 11: "check values within 0.5 %"). */
export const VALUE_TOLERANCE = 0.005;

export interface Matched {
  /** Slugs, best first. */
  slugs: string[];
  /** Mechanism classes of those entries, best first. */
  classes: string[];
}

export type Matcher = (text: string) => Matched | Promise<Matched>;

export interface ClaimOutcome {
  id: string;
  family: string;
  figuresRight: boolean;
  /** Expected figures not found (as "kind role si"). */
  missing: string[];
  /** Figures found beyond the expected ones. */
  stray: number;
  /** null when the claim has no value to compare. */
  valueRight: boolean | null;
  value: number | null;
  verdictRight: boolean;
  verdict: string;
  /** null when no entry is expected. */
  entryRight: boolean | null;
  topEntry: string | null;
  falseAlarm: boolean;
  /**
   * A "false alarm" on a claim labelled 'needs' whose figures give nothing in (a device said to need no
   * supply) and no run: the writers of parts 37 on were asked to label these as needing the run's
   * length, where the check finds power out with nothing in against the first law at any length of
   * run. Counted apart, from the labels alone (no text read), so the report can say how many there are.
   */
  nilInputLabel: boolean;
}

const close = (a: number, b: number, rel = VALUE_TOLERANCE) => (b === 0 ? Math.abs(a) <= 1e-9 : Math.abs(a - b) <= rel * Math.abs(b));

function figureFound(want: CorpusFigure, got: Figure[]): boolean {
  return got.some(
    (f) =>
      f.kind === want.kind &&
      (want.role === undefined || f.role === want.role) &&
      close(f.si, want.si) &&
      (want.upper === undefined ? true : f.upper !== undefined && close(f.upper.si, want.upper)),
  );
}

function verdictOf(claim: CorpusClaim, runs: ClaimCheckRun[], needs: { check: string }[]): string {
  const run = runs.find((r) => r.check === claim.check);
  if (run) return run.finding;
  if (needs.some((n) => n.check === claim.check)) return 'needs';
  return 'none';
}

/** The corpus's nil-input convention: a first-law claim labelled 'needs', its input 0, no duration among its figures. */
export function isNilInputLabel(claim: CorpusClaim): boolean {
  return (
    claim.check === 'first-law' &&
    claim.figures.some((f) => (f.kind === 'power' || f.kind === 'energy') && f.role === 'in' && f.si === 0) &&
    !claim.figures.some((f) => f.kind === 'duration' && f.role !== 'aside')
  );
}

export async function measureClaim(claim: CorpusClaim, match: Matcher): Promise<ClaimOutcome> {
  const figures = extractFigures(claim.text);
  const matched = await match(claim.text);
  const { checks, needs } = runClaimChecks(figures, { text: claim.text, classes: matched.classes });
  const missing = claim.figures.filter((w) => !figureFound(w, figures)).map((w) => `${w.kind} ${w.role ?? ''} ${w.si}${w.upper !== undefined ? `–${w.upper}` : ''}`);
  const stray = Math.max(0, figures.length - claim.figures.length);
  const verdict = verdictOf(claim, checks, needs);
  let valueRight: boolean | null = null;
  let value: number | null = null;
  if (claim.value) {
    const run = checks.find((r) => r.check === claim.check);
    const out = run?.outputs.find((o) => o.name === claim.value!.output);
    value = out?.si ?? null;
    valueRight = out !== undefined && close(out.si, claim.value.si);
  }
  const breaks = checks.some((r) => r.finding === 'breaks');
  return {
    id: claim.id,
    family: claim.family,
    figuresRight: missing.length === 0,
    missing,
    stray,
    valueRight,
    value,
    verdictRight: verdict === claim.verdict,
    verdict,
    entryRight: claim.entry === null ? null : matched.slugs[0] === claim.entry,
    topEntry: matched.slugs[0] ?? null,
    falseAlarm: claim.verdict !== 'breaks' && breaks,
    nilInputLabel: claim.verdict === 'needs' && breaks && isNilInputLabel(claim),
  };
}

export interface PartSummary {
  claims: number;
  figures: { right: number; of: number };
  values: { right: number; of: number };
  verdicts: { right: number; of: number };
  entries: { right: number; of: number };
  falseAlarms: number;
  /** Of those, the nil-input labelling (ClaimOutcome.nilInputLabel). */
  nilInputLabels: number;
  /** Claims that should not break a law (verdict other than 'breaks'). */
  lawful: number;
}

export function summarise(outcomes: ClaimOutcome[]): PartSummary {
  const count = (pred: (o: ClaimOutcome) => boolean) => outcomes.filter(pred).length;
  return {
    claims: outcomes.length,
    figures: { right: count((o) => o.figuresRight), of: outcomes.length },
    values: { right: count((o) => o.valueRight === true), of: count((o) => o.valueRight !== null) },
    verdicts: { right: count((o) => o.verdictRight), of: outcomes.length },
    entries: { right: count((o) => o.entryRight === true), of: count((o) => o.entryRight !== null) },
    falseAlarms: count((o) => o.falseAlarm),
    nilInputLabels: count((o) => o.falseAlarm && o.nilInputLabel),
    lawful: outcomes.length - count((o) => o.verdict === 'breaks' && o.verdictRight),
  };
}

export const pct = (r: { right: number; of: number }) => (r.of === 0 ? 'n/a' : `${((100 * r.right) / r.of).toFixed(1)} %`);
