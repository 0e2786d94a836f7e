/**
 * The paragraph of a claim check (issue 11, item 4): plain, courteous prose that a referee, a patent
 * examiner, a grant reviewer or a journalist can paste, each in the wording of that practice. It
 * speaks of the claim and its mechanism, never of the people making it. It
 *  - names the best-matching entry (title, version, permanent URL, a numbered reference) and the
 *    law or laws it rests on;
 *  - gives one sentence per check run on the text's own figures (the planner's `sentence`, or one
 *    built from the outputs), numbers as in print ("1.78 × 10⁵", never "10^5");
 *  - answers the claim's own rejoinder when the entry has a reply to it (paragraph/replies.ts);
 *  - lists what the claimant should supply: the figures the checks still need, and up to two of the
 *    entry's questions;
 *  - when every check run is consistent with its law, says so in those words and does not place
 *    the device in a class that cannot work; with no match and no check, says that plainly;
 *  - never pastes the entry's lay "in brief" text;
 *  - stays within PARAGRAPH_WORDS_MAX words before the references: each part has shorter forms,
 *    and the least needed parts are shortened or left out first (paragraph/parts.ts).
 * References are numbered in order of first citation and formatted by citation-js in APA,
 * Vancouver or Harvard: the Counterweight entry versions and up to two of the top entry's sources.
 *
 * The parts, in shared/claims/paragraph/: input.ts (what it is built from), words.ts, replies.ts,
 * results.ts (one sentence per check), references.ts, parts.ts (shorter forms and the word limit)
 * and wording.ts (the wording of each reader's job); this file puts them together.
 */
import { formatCitation } from '../entries/citations';
import { PARAGRAPH_VARIANTS, type ClaimParagraph, type ParagraphReference, type ParagraphVariant } from './types';
import type { ParagraphInput, ParagraphsInput } from './paragraph/input';
import { number, Citer } from './paragraph/references';
import { answerForms, matchReply } from './paragraph/replies';
import { breaks, printed, resultSentence } from './paragraph/results';
import { trim } from './paragraph/parts';
import { buildParts, relatedPart, type Context, type Mode } from './paragraph/wording';
import { lawsPhrase, list, lowerFirst, quoteTitle, uniqueLaws, unstop } from './paragraph/words';

export type { ParagraphEntry, ParagraphInput, ParagraphsInput } from './paragraph/input';
export { PARAGRAPH_WORDS_MAX } from './paragraph/parts';
export { contentKeys, matchReply } from './paragraph/replies';
export { resultSentence } from './paragraph/results';
export { lawInProse } from './paragraph/words';

/** How many of the top entry's sources the paragraph cites, and how many other entries it mentions. */
const PARAGRAPH_SOURCES = 2;
const PARAGRAPH_RELATED = 2;

/** The paragraphs of all four variants (each reference is formatted once for all four). */
export function buildParagraphs(input: ParagraphsInput): Record<ParagraphVariant, ClaimParagraph> {
  const formatted = new Map<string, string>();
  return Object.fromEntries(PARAGRAPH_VARIANTS.map((variant) => [variant, paragraph({ ...input, variant }, formatted)])) as Record<ParagraphVariant, ClaimParagraph>;
}

/** One paragraph, of `variant` (default 'referee'). */
export function buildParagraph(input: ParagraphInput): ClaimParagraph {
  return paragraph(input, new Map());
}

function paragraph(input: ParagraphInput, formatted: Map<string, string>): ClaimParagraph {
  const { entries, checks, figures, style } = input;
  const needs = input.needs ?? [];
  const text = input.text ?? '';
  const variant = input.variant ?? 'referee';
  const citer = new Citer();
  const [top, ...others] = entries;

  const topCite = top ? citer.cite([top.item], true) : '';
  const src = top ? citer.cite(top.sources.slice(0, PARAGRAPH_SOURCES), false) : '';
  const entryName = top ? `the Counterweight entry ${quoteTitle(top.match.title)}, version ${top.match.version} (${top.match.url}) ${topCite}` : '';
  const related = others.slice(0, PARAGRAPH_RELATED).map((e) => `${quoteTitle(e.match.title)}, version ${e.match.version} (${e.match.url}) ${citer.cite([e.item], true)}`);

  const broken = checks.filter(breaks);
  const ok = checks.filter((r) => !breaks(r));
  const mode: Mode = broken.length ? 'breaks' : checks.length ? 'consistent' : top ? 'entry' : 'bare';
  const entryLaws = uniqueLaws(top?.laws ?? []);
  const breakLaws = uniqueLaws(broken.map((r) => r.law));
  const okLaws = uniqueLaws(ok.map((r) => r.law));
  const laws = entryLaws.length ? entryLaws : breakLaws;
  const fallbackLaw = lawsPhrase(laws.length ? laws : okLaws);
  // Results that break first, each once, numbers as in print.
  const ordered = [...broken, ...ok];
  // Said with each result, unless every result is consistent (the paragraph then names the law once, around them).
  const results = ordered.map((r) => resultSentence(r, fallbackLaw, mode !== 'consistent'));
  const assumptions = [...new Set(ordered.flatMap((r) => r.assumptions ?? []).map((a) => printed(a)))];

  const m = top ? matchReply(text, top.replies ?? []) : null;
  const forms = m ? answerForms(m.answer) : [];
  const reply = m && forms.length ? { reply: m.reply, forms, cite: topCite } : null;

  const missing = [...new Set(needs.flatMap((n) => n.missing.map((w) => unstop(w))).filter(Boolean))];
  const withTitles = needs.map((n) => `${list(n.missing.map(unstop))} (for the ${lowerFirst(unstop(n.title))} check)`).filter((s) => !s.startsWith(' ('));
  const c: Context = {
    variant,
    mode,
    top,
    entryName,
    src: src ? ` ${src}` : '',
    laws,
    breakLaws,
    okLaws,
    results,
    assumptions,
    reply,
    needs: [withTitles.length ? withTitles : missing, missing, missing.slice(0, 3)],
    questions: (top?.questions ?? []).map((q) => q.trim()).filter(Boolean),
    figures: figures.length,
  };

  const parts = buildParts(c);
  const rel = top ? relatedPart(c, related) : null;
  if (rel) parts.splice(1, 0, rel);
  const { body, order } = number(trim(parts));
  const references: ParagraphReference[] = order.map((id, i) => {
    const r = citer.items.get(id)!;
    let text = formatted.get(id);
    if (text === undefined) formatted.set(id, (text = formatCitation(r.item, style, 'text')));
    return { n: i + 1, id, counterweight: r.counterweight, text };
  });
  const copy = references.length ? `${body}\n\nReferences\n${references.map((r) => `${r.n}. ${r.text}`).join('\n')}\n` : `${body}\n`;
  return { variant, style, body, references, text: copy };
}
