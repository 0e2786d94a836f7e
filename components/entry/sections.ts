/**
 * The sections of an entry in reading order (DESIGN.md §3), with the titles readers see. The
 * entry page, the diff between versions and the Desk's editor all go by this one list.
 */
import { SECTION_ORDER, SECTION_TITLES, type SectionField } from '@/shared/api/constants';
import type { EntryContent } from '@/shared/entries/schema';

export type { SectionField };

/** The titles readers see (declared once in the API contract). */
export const sectionTitles = SECTION_TITLES;

export const readingOrder: readonly SectionField[] = SECTION_ORDER;

/** The two halves of each pair in "Counterpoints, answered": what the claim's proponents raise, and our answer. */
export const replyLabels = { reply: 'Counterpoint', answer: 'Why it does not hold' } as const;

/** The anchor (`id` on the web) of an entry section, for the table of contents and the jump menu. */
export const sectionAnchor = (field: SectionField | 'versions' | 'cite' | 'report' | 'sightings') => `section-${field}`;

/** Which sections a version has something in, in reading order (empty optional sections are left out). */
export function presentSections(content: EntryContent): SectionField[] {
  const has: Record<SectionField, boolean> = {
    inBrief: true,
    howItIsPitched: true,
    whyItFails: true,
    worksheets: content.worksheets.length > 0,
    whatFakesTheEffect: content.whatFakesTheEffect.trim() !== '',
    repliesAndAnswers: content.repliesAndAnswers.length > 0,
    questionsToAsk: content.questionsToAsk.length > 0,
    cautions: content.cautions.trim() !== '',
    sources: true,
    related: content.related.length > 0,
  };
  return readingOrder.filter((field) => has[field]);
}

/** Markdown with TeX to one line of plain text (for a page description): markup dropped, math kept as its source. */
export function plainText(markdown: string, max = 200): string {
  const text = markdown
    .replace(/\$\$?([^$]*)\$\$?/g, '$1')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/[*_`#>]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();
  if (text.length <= max) return text;
  const cut = text.slice(0, max - 1);
  return `${cut.slice(0, Math.max(cut.lastIndexOf(' '), max / 2))}…`;
}

/** A citation in one line, for the diff and for a source whose formatted text is not at hand. */
export function citationLine({ csl, note }: EntryContent['sources'][number]): string {
  const authors = Array.isArray(csl.author)
    ? (csl.author as { family?: string; literal?: string }[]).map((a) => a.family ?? a.literal ?? '').filter(Boolean).join(', ')
    : '';
  const issued = (csl.issued as { 'date-parts'?: number[][] } | undefined)?.['date-parts']?.[0]?.[0];
  const head = [authors, issued ? `(${issued})` : '', csl.title].filter(Boolean).join(' ');
  return note ? `${head} — ${note}` : head;
}

/** Every section and the entry's heading fields as plain text, for comparing two versions. */
export function sectionTexts(content: EntryContent): [label: string, text: string][] {
  const text: Record<SectionField, string> = {
    inBrief: content.inBrief,
    howItIsPitched: content.howItIsPitched,
    whyItFails: content.whyItFails,
    worksheets: content.worksheets.map((w) => JSON.stringify(w, null, 2)).join('\n'),
    whatFakesTheEffect: content.whatFakesTheEffect,
    repliesAndAnswers: content.repliesAndAnswers.map((r) => `${replyLabels.reply}: ${r.reply}\n${replyLabels.answer}: ${r.answer}`).join('\n\n'),
    questionsToAsk: content.questionsToAsk.join('\n'),
    cautions: content.cautions,
    sources: content.sources.map(citationLine).join('\n'),
    related: content.related.join('\n'),
  };
  return [
    ['Title', content.title],
    ['Other names', content.aliases.join('\n')],
    ['Mechanism class', content.mechanismClass],
    ['Conservation laws', content.laws.join('\n')],
    ...readingOrder.map((field): [string, string] => [sectionTitles[field], text[field]]),
  ];
}
