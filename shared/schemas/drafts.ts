/**
 * A draft entry as saved while it is written: the same fields and limits as entryContentSchema,
 * but the sections and the laws may still be empty (the full schema is checked at submit). Read
 * by the drafts routes and by the moderators' "turn this sighting into a draft" decision.
 *
 * Also the words in which a draft's problems are told: `ourWords`, an error map for any check that
 * carries no message of its own (zod's defaults read "Too small: expected string to have >=3
 * characters"), and `fieldLabel`, the editor's name for a field's path.
 */
import { z } from 'zod';
import { SECTION_TITLES } from '../api/constants';
import { entryContentSchema, slugSchema } from '../entries/schema';

const md = (max: number) => z.string({ error: 'write this part as text (Markdown)' }).max(max, `at most ${max} characters`);

export const draftContentSchema = entryContentSchema.extend({
  /** The brief in plain language (at most 120 words once submitted). */
  inBrief: md(1200).default(''),
  /** The claim pattern and the phrases that give it away. */
  howItIsPitched: md(6000).default(''),
  /** The technical objection (Markdown with TeX math). */
  whyItFails: md(20000).default(''),
  /** The conservation laws the claim breaks (their slugs); at least one once submitted. */
  laws: z.array(slugSchema, { error: 'a list of laws' }).max(5, 'name at most 5 laws').default([]),
});

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What a kind of value is called in a message ("a number", "text"). */
const kinds: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  boolean: 'yes or no',
  array: 'a list',
  object: 'a group of fields',
};

/**
 * Our words for the issues a schema raises without a message of its own: pass as
 * `schema.safeParse(value, { error: ourWords })`. Messages are lower-case phrases without a final
 * stop, like the schemas' own ("at most 80 characters"), so that they read after a field's name.
 */
export const ourWords: z.core.$ZodErrorMap = (issue) => {
  switch (issue.code) {
    case 'invalid_type':
      return issue.input === undefined ? 'this is missing' : `this should be ${kinds[issue.expected] ?? issue.expected}`;
    case 'too_small': {
      const n = Number(issue.minimum);
      if (issue.origin === 'string') return n <= 1 ? 'this cannot be empty' : `at least ${plural(n, 'character', 'characters')}`;
      if (issue.origin === 'array' || issue.origin === 'set') return n <= 1 ? 'add at least one' : `add at least ${n}`;
      return `at least ${n}`;
    }
    case 'too_big': {
      const n = Number(issue.maximum);
      if (issue.origin === 'string') return `at most ${plural(n, 'character', 'characters')}`;
      if (issue.origin === 'array' || issue.origin === 'set') return `at most ${n}`;
      return `at most ${n}`;
    }
    case 'invalid_format':
      return 'not in the form this field takes';
    case 'invalid_value':
      return `one of ${issue.values.map((v) => `“${String(v)}”`).join(', ')}`;
    case 'unrecognized_keys':
      return `fields this form does not take: ${issue.keys.join(', ')}`;
    case 'not_multiple_of':
      return `a multiple of ${String(issue.divisor)}`;
    default:
      return 'this value is not taken here';
  }
};

/** The editor's names of an entry's fields (the section titles readers see, and the naming fields). */
const LABELS: Record<string, string> = {
  slug: 'Address',
  title: 'Title',
  aliases: 'Other names',
  mechanismClass: 'Mechanism class',
  laws: 'Conservation laws',
  inBrief: SECTION_TITLES.inBrief,
  howItIsPitched: SECTION_TITLES.howItIsPitched,
  whyItFails: SECTION_TITLES.whyItFails,
  worksheets: SECTION_TITLES.worksheets,
  whatFakesTheEffect: SECTION_TITLES.whatFakesTheEffect,
  repliesAndAnswers: SECTION_TITLES.repliesAndAnswers,
  questionsToAsk: SECTION_TITLES.questionsToAsk,
  cautions: SECTION_TITLES.cautions,
  related: SECTION_TITLES.related,
  sources: SECTION_TITLES.sources,
  lockVersion: 'The draft’s revision',
  changeNote: 'Change note',
  reason: 'Reason',
};

const PARTS: Record<string, string> = { reply: 'what they say', answer: 'the answer', steps: 'steps', inputs: 'inputs', checks: 'checks' };

/**
 * A field's path as the server names it (`body.content.repliesAndAnswers.2.answer`, `content.title`)
 * or as a schema issue has it, in the editor's words: "Replies and answers, number 3, the answer".
 */
export function fieldLabel(path: string | readonly PropertyKey[]): string {
  const parts = (typeof path === 'string' ? path.split('.') : path.map(String)).filter((p) => p !== 'body' && p !== 'content');
  if (parts.length === 0) return 'The draft';
  const words = parts.map((part, i) => {
    if (/^\d+$/.test(part)) return `number ${Number(part) + 1}`;
    return (i === 0 ? LABELS[part] : PARTS[part]) ?? part;
  });
  const text = words.join(', ');
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}`;
}

/** "Title: give the title at least 3 characters." as a sentence, from a path and a schema's or the server's message. */
export function fieldSentence(path: string | readonly PropertyKey[], message: string): string {
  const text = message.trim().replace(/[.]$/, '');
  return `${fieldLabel(path)}: ${text}.`;
}
