/**
 * The jobs that a reader's input can make slow, as pure functions of plain data: evaluating a
 * worksheet, running a check of the kit, and the claim check's reading (figures from the text) and
 * planning (the checks those figures allow, run, and the paragraphs). They run in the worker threads
 * of the compute pool (pool.ts, worker.mjs), or on the main thread with COMPUTE_INLINE=1.
 *
 * What goes in and comes out crosses a thread boundary by structured clone, so errors are answered
 * as data (`{ ok: false, error }`, our error shape's status, code, message and fields), never thrown:
 * a thrown class (CheckInputError, QuantityError) would arrive as a plain Error.
 * Only shared/ code is imported here: the worker loads this file with tsx, outside jest and Express.
 */
import { readFigure } from '../../shared/claims/figures';
import { buildParagraphs, type ParagraphEntry } from '../../shared/claims/paragraph';
import { claimSignals, runClaimChecks, type FindingLead } from '../../shared/claims/plan';
import { extractFigures } from '../../shared/claims/reader';
import type { ClaimCheckNeed, ClaimCheckRun, ClaimParagraph, Figure, FigureInput, ParagraphVariant } from '../../shared/claims/types';
import { CheckInputError, isCheckName, runCheck, type CheckRun, type RawInput } from '../../shared/checks/run';
import { evaluateWorksheetWithKit } from '../../shared/compute';
import type { CitationStyle } from '../../shared/entries/citations';
import { QuantityError } from '../../shared/worksheet/quantity';
import type { Worksheet } from '../../shared/worksheet/schema';
import type { WorksheetResult } from '../../shared/worksheet/types';

export type ComputeJob =
  | { kind: 'ping' }
  /** Runs each kind of job once on small invented inputs, so that a new worker's first real job is not slowed by first-use set-up. */
  | { kind: 'warm' }
  | { kind: 'worksheet'; worksheet: Worksheet; values: Record<string, string> }
  | { kind: 'check'; check: string; inputs: Record<string, RawInput> }
  /** The figures: the reader's own list (each checked) or those read from the text; and the classes they signal. */
  | { kind: 'claimRead'; text: string; figures?: FigureInput[] }
  | { kind: 'claimPlan'; text: string; figures: Figure[]; classes: string[]; entries: ParagraphEntry[]; style: CitationStyle };

export interface ComputeResults {
  ping: { pong: true };
  warm: { pong: true };
  worksheet: WorksheetResult;
  check: CheckRun;
  claimRead: { figures: Figure[]; signalled: string[]; leads: FindingLead[] };
  claimPlan: { checks: ClaimCheckRun[]; needs: ClaimCheckNeed[]; notes: string[]; paragraphs: Record<ParagraphVariant, ClaimParagraph> };
}

/** Our error shape (server/http/errors.ts) as data. */
export interface JobError {
  status: number;
  code: string;
  message: string;
  fields?: Record<string, string>;
}

export type JobAnswer<K extends ComputeJob['kind'] = ComputeJob['kind']> = { ok: true; value: ComputeResults[K] } | { ok: false; error: JobError };

const fieldsError = (code: string, fields: Record<string, string>): JobError => {
  const names = Object.keys(fields);
  return { status: 400, code, message: `Check ${names.join(', ')}: ${fields[names[0]]}.`, fields };
};

function claimRead(text: string, figures: FigureInput[] | undefined): JobAnswer<'claimRead'> {
  let out: Figure[];
  if (!figures) out = extractFigures(text);
  else {
    const fields: Record<string, string> = {};
    out = [];
    figures.forEach((f, i) => {
      try {
        out.push(readFigure(f, `f${i + 1}`));
      } catch (err) {
        if (!(err instanceof QuantityError)) throw err;
        fields[`body.figures.${i}.quantity`] = err.message;
      }
    });
    if (Object.keys(fields).length) return { ok: false, error: fieldsError('invalid_figure', fields) };
  }
  const { classes, leads } = claimSignals(out, text);
  return { ok: true, value: { figures: out, signalled: classes, leads } };
}

/** Invented inputs, one of each kind of job. */
function warm(): void {
  const text = 'An invented sealed drive is said to give 2 mN of thrust from 40 W of electric power with no exhaust.';
  const read = claimRead(text, undefined);
  if (read.ok) runJob({ kind: 'claimPlan', text, figures: read.value.figures, classes: read.value.signalled, entries: [], style: 'apa' });
  runJob({ kind: 'check', check: 'photon-bound', inputs: { F_claimed: '2 mN', P: '40 W' } });
  evaluateWorksheetWithKit(
    {
      name: 'warm',
      title: 'Warm',
      inputs: [{ name: 'P', label: 'P', unit: 'W', default: '40 W' }],
      steps: [{ name: 'F', label: 'F', expression: 'P / c', unit: 'mN' }],
      checks: [],
      plots: [],
    },
    {},
  );
}

/** Runs one job; an error of the reader's input comes back as `{ ok: false }`, anything else throws. */
export function runJob(job: ComputeJob): JobAnswer {
  switch (job.kind) {
    case 'ping':
      return { ok: true, value: { pong: true } };
    case 'warm':
      warm();
      return { ok: true, value: { pong: true } };
    case 'worksheet':
      return { ok: true, value: evaluateWorksheetWithKit(job.worksheet, job.values) };
    case 'check': {
      if (!isCheckName(job.check)) return { ok: false, error: { status: 404, code: 'unknown_check', message: `There is no check "${job.check}".` } };
      try {
        return { ok: true, value: runCheck(job.check, job.inputs) };
      } catch (err) {
        if (!(err instanceof CheckInputError)) throw err;
        const fields = Object.fromEntries(Object.entries(err.fields).map(([k, v]) => [`body.${k}`, v]));
        return { ok: false, error: { status: 400, code: 'invalid_input', message: err.message, fields } };
      }
    }
    case 'claimRead':
      return claimRead(job.text, job.figures);
    case 'claimPlan': {
      const { checks, needs, notes } = runClaimChecks(job.figures, { text: job.text, classes: job.classes });
      const paragraphs = buildParagraphs({ entries: job.entries, checks, needs, figures: job.figures, text: job.text, style: job.style });
      return { ok: true, value: { checks, needs, notes, paragraphs } };
    }
    default:
      throw new Error(`unknown compute job ${(job as { kind: string }).kind}`);
  }
}
