/**
 * The referee paragraph of a claim check (issue 6, item 4d): plain, courteous prose a referee,
 * examiner or journalist can paste into a report. It speaks of the claim and its figures, never of
 * the people making it; it names the matched entries with their permanent URLs and versions,
 * states the computed results, and ends with numbered references formatted by citation-js in the
 * chosen style, the Counterweight entry versions among them.
 */
import { formatCitation, type CitationStyle, type CslItem } from '../entries/citations';
import type { ClaimCheckRun, ClaimMatch, ClaimParagraph, Figure, ParagraphReference } from './types';

export interface ParagraphEntry {
  match: ClaimMatch;
  /** The entry version as a CSL item (server/routes/entries.ts citedItem). */
  item: CslItem;
  /** The entry's own sources (CSL), cited for the physics. */
  sources: CslItem[];
  /** The entry's questions to ask of a claim. */
  questions: string[];
  /** The names of the conservation laws the entry rests on ("Conservation of linear momentum"). */
  laws: string[];
  /** The entry's common replies and their answers. */
  replies: { reply: string; answer: string }[];
}

export interface ParagraphInput {
  entries: ParagraphEntry[];
  checks: ClaimCheckRun[];
  figures: Figure[];
  style: CitationStyle;
}

/** How many of the top entry's sources and questions the paragraph uses. */
export const PARAGRAPH_SOURCES = 2;
export const PARAGRAPH_QUESTIONS = 2;

const quoteTitle = (t: string) => `“${t}”`;
const sentence = (s: string) => {
  const t = s.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
};
const list = (items: string[]) => (items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`);

class References {
  readonly items: { id: string; item: CslItem; counterweight: boolean }[] = [];
  cite(item: CslItem, counterweight: boolean): number {
    const at = this.items.findIndex((r) => r.id === item.id);
    if (at >= 0) return at + 1;
    this.items.push({ id: item.id, item, counterweight });
    return this.items.length;
  }
}

const marks = (ns: number[]) => `[${[...new Set(ns)].sort((a, b) => a - b).join(', ')}]`;

export function buildParagraph({ entries, checks, figures, style }: ParagraphInput): ClaimParagraph {
  const refs = new References();
  const parts: string[] = [];
  const [top, ...others] = entries;

  if (top) {
    const n = refs.cite(top.item, true);
    parts.push(
      `The device described in this text belongs to a class of proposals whose standard physics objection is set out in the Counterweight entry ${quoteTitle(top.match.title)}, version ${top.match.version} (${top.match.url}) ${marks([n])}.`,
    );
    if (top.match.inBrief) parts.push(`In brief: ${sentence(top.match.inBrief)}`);
    const sourceNs = top.sources.slice(0, PARAGRAPH_SOURCES).map((s) => refs.cite(s, false));
    if (sourceNs.length) parts.push(`The physics behind this objection is standard and is treated in the literature ${marks(sourceNs)}.`);
    const seeAlso = others.map((e) => `${quoteTitle(e.match.title)}, version ${e.match.version} (${e.match.url}) ${marks([refs.cite(e.item, true)])}`);
    if (seeAlso.length) parts.push(`Related objections are set out in ${list(seeAlso)}.`);
  } else {
    parts.push('No entry of the Counterweight library matched this text closely, so no standard objection is cited; the figures it gives can still be checked against standard physics.');
  }

  if (checks.length) {
    const given = figures.length ? ` (${list(figures.filter((f) => checks.some((c) => c.uses.includes(f.id))).map((f) => `${f.quantity}${f.quantity !== f.display ? ` = ${f.display}` : ''}`))})` : '';
    parts.push(`Running the standard checks on the figures the text gives${given}:`);
    for (const c of checks) {
      const cite = top ? ` ${marks([refs.cite(top.item, true)])}` : '';
      parts.push(`${c.title}: ${sentence(c.verdict.message)}${cite}`);
      if (c.assumptions.length) parts.push(`(Assumed for this check: ${c.assumptions.map((a) => a.replace(/\.$/, '')).join('; ')}.)`);
    }
    parts.push('These figures are read from the text as written; if any has been misread, the same checks can be re-run with corrected values.');
  } else if (figures.length) {
    parts.push('The figures the text gives are not enough on their own for one of the standard checks; stating the input power, the temperatures worked between, or the energy in and out over a full cycle would allow one.');
  } else {
    parts.push('The text gives no figures with units that the standard checks could be run on; stating the measured thrust, input power, temperatures or energies would allow them.');
  }

  const questions = top?.questions.slice(0, PARAGRAPH_QUESTIONS) ?? [];
  if (questions.length) parts.push(`I would ask that the claim be supported by answers to these questions: ${questions.map((q) => sentence(q)).join(' ')}`);
  parts.push(
    top
      ? 'Until then the claim conflicts with well-tested conservation laws, as the cited entry explains, and it should not be reported as established.'
      : 'Until the figures are stated with their measurement conditions, the claim should not be reported as established.',
  );

  const body = parts.join(' ');
  const references: ParagraphReference[] = refs.items.map((r, i) => ({
    n: i + 1,
    id: r.id,
    counterweight: r.counterweight,
    text: formatCitation(r.item, style, 'text'),
  }));
  const text = references.length ? `${body}\n\nReferences\n${references.map((r) => `${r.n}. ${r.text}`).join('\n')}\n` : `${body}\n`;
  return { style, body, references, text };
}
