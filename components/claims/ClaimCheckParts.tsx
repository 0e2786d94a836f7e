/**
 * The claim check screen's words and small parts: the safety caution, the status line while a
 * check runs or re-runs, the one-line summary of a result, and how a result's figures are adopted
 * into the figure editor.
 */
import { CITATION_STYLE_LABEL, type CitationStyle, type ClaimCheckRequest, type ClaimCheckResult } from '@/shared/api-types';
import { Notice } from '../ui/Notice';
import { draftOf, draftsOf, figuresKey, type FigureDraft } from './figures';

/** A result on screen and the request that produced it. */
export interface Shown {
  result: ClaimCheckResult;
  /** The request that produced it: what a save stores and what a re-run starts from. */
  request: ClaimCheckRequest;
}

export const count = (n: number) => n.toLocaleString('en-US');

/** The caution every claim check carries. */
export function ClaimCaution() {
  return (
    <Notice tone="warning" testID="claim-caution" title="What this judges">
      The checks judge the claim’s figures and mechanism, not the people making it. Where hardware is involved — high
      voltage, RF, vacuum, rotating machinery — local codes and licensed practice come first.
    </Notice>
  );
}

/** The figures of a new result as drafts, keeping each row's key when the result is for the drafts sent. */
export function adopt(current: FigureDraft[], sent: FigureDraft[] | null, result: ClaimCheckResult): FigureDraft[] {
  if (sent === null) return draftsOf(result.figures);
  // The reader changed the figures while the checks ran: keep their typing; the checks run again.
  if (figuresKey(current) !== figuresKey(sent)) return current;
  const sameRows = sent.length === result.figures.length;
  return result.figures.map((f, i) => draftOf(f, sameRows ? sent[i].key : f.id));
}

interface StatusArgs {
  checking: boolean;
  rerunning: boolean;
  restyling: boolean;
  pendingRequest: ClaimCheckRequest | undefined;
  shown: Shown | null;
  edited: boolean;
  readable: boolean;
  style: CitationStyle;
}

/** One line of what is happening, read out by assistive technology as it changes. */
export function status({ checking, rerunning, restyling, pendingRequest, shown, edited, readable, style }: StatusArgs): string {
  if (checking) return 'Checking the claim: finding the entries, reading the figures, running the checks…';
  if (restyling) return `Setting the references in ${CITATION_STYLE_LABEL[style]}…`;
  if (rerunning) {
    const n = pendingRequest?.figures?.length ?? shown?.result.figures.length ?? 0;
    return `Running the checks again with ${n} ${n === 1 ? 'figure' : 'figures'}; the result below is the previous one until the new one arrives…`;
  }
  if (!shown) return '';
  if (edited && !readable) return 'Fix the marked figure and the checks run again by themselves; the result below is for the figures before the change.';
  if (edited) return 'The checks run again with your figures as soon as you stop typing…';
  return summary(shown.result);
}

function summary(result: ClaimCheckResult): string {
  const n = (k: number, one: string, many: string) => `${k} ${k === 1 ? one : many}`;
  const needs = (result.needs as ClaimCheckResult['needs'] | undefined)?.length ?? 0;
  const parts = [
    `${n(result.matches.length, 'entry', 'entries')} matched`,
    `${n(result.figures.length, 'figure', 'figures')} found`,
    `${n(result.checks.length, 'check', 'checks')} run`,
  ];
  if (needs > 0) parts.push(`${n(needs, 'check needs', 'checks need')} a figure the text does not give`);
  return `${parts.join(', ')}.`;
}

