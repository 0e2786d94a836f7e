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
    repliesAndAnswers: content.repliesAndAnswers.map((r) => `Reply: ${r.reply}\nAnswer: ${r.answer}`).join('\n\n'),
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
