/**
 * An entry of the library: the structured objection (DESIGN.md §3). The same schema validates the
 * starter files in content/entries/ (YAML front matter + Markdown body), drafts sent by the Desk, and
 * what the API returns for a version.
 */
import { SECTION_TITLES } from '../api/constants';
import { z } from 'zod';
import { worksheetSchema } from '../worksheet/schema';
import { isWebAddress } from './web-address';

export { isWebAddress };

export const slugSchema = z
  .string({ error: 'lower-case words joined by hyphens, as text' })
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'lower-case words joined by hyphens')
  .min(3, 'at least 3 characters')
  .max(80, 'at most 80 characters');

/** Markdown with TeX math ($…$, $$…$$), rendered by shared/markdown.ts and sanitised. */
const markdown = (max: number) => z.string({ error: 'write this part as text (Markdown)' }).max(max, `at most ${max} characters`);

/** A web address someone typed: http(s) only — javascript:, data:, file:, ftp: and the rest are refused. */
export const webAddressSchema = z
  .string()
  .trim()
  .max(2000, 'at most 2000 characters')
  .refine(isWebAddress, 'a web address starting with http:// or https://');

/**
 * A DOI as the DOI Handbook writes it: "10.", the registrant code (digits, maybe subdivided by "."),
 * "/", a suffix without spaces. Pasted as a resolver address or with "doi:" in front, it is kept bare.
 */
export const DOI_PATTERN = /^10\.\d{4,}(?:\.\d+)*\/\S+$/;
export const doiSchema = z.preprocess(
  (v) => (typeof v === 'string' ? v.trim().replace(/^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:\s*)/i, '') : v),
  z.string().max(300, 'at most 300 characters').regex(DOI_PATTERN, 'a DOI such as 10.1103/PhysRevLett.78.5'),
);

/** A citation as CSL-JSON (what citation-js produces), with a short note on what it supports. */
export const citationSchema = z.object({
  /** CSL-JSON item: at least an id, a type and a title; its address (URL) http(s) only, its DOI a DOI. */
  csl: z
    .object({
      id: z.string({ error: (iss) => (iss.input === undefined ? 'missing' : 'an id as text') }).min(1, 'an id is needed').max(200, 'at most 200 characters'),
      type: z.string({ error: (iss) => (iss.input === undefined ? 'missing' : 'a type as text') }).min(1, 'a type (article, book, webpage …) is needed').max(40, 'at most 40 characters'),
      title: z.string({ error: (iss) => (iss.input === undefined ? 'missing' : 'a title as text') }).min(1, 'the source needs a title').max(500, 'at most 500 characters'),
      URL: webAddressSchema.optional(),
      DOI: doiSchema.optional(),
    })
    .passthrough(),
  note: z.string({ error: 'a note as text' }).max(500, 'at most 500 characters').default(''),
});

export const replySchema = z.object({
  reply: markdown(2000).min(1, 'write what they say, or remove the pair'),
  answer: markdown(4000).min(1, 'write the answer, or remove the pair'),
});

/** The content of one version: every section of DESIGN.md §3, in reading order. */
export const entryContentSchema = z.object({
  title: z.string({ error: 'write a title' }).trim().min(3, 'give the title at least 3 characters').max(160, 'keep the title to 160 characters at most'),
  aliases: z
    .array(z.string({ error: 'each name as text' }).trim().min(1, 'an empty name').max(120, 'keep each name to 120 characters at most'), { error: 'a list of names' })
    .max(20, 'list at most 20 other names')
    .default([]),
  mechanismClass: slugSchema,
  laws: z.array(slugSchema, { error: 'a list of laws' }).min(1, 'name at least one conservation law').max(5, 'name at most 5 laws'),
  /** Plain language, at most 120 words (checked by wordCount). */
  inBrief: markdown(1200).min(1, 'write the brief in plain language'),
  howItIsPitched: markdown(6000).min(1, 'say how the claim is usually pitched'),
  whyItFails: markdown(20000).min(1, 'write the technical objection'),
  worksheets: z.array(worksheetSchema, { error: 'a list of worksheets' }).max(6, 'at most 6 worksheets').default([]),
  whatFakesTheEffect: markdown(12000).default(''),
  repliesAndAnswers: z.array(replySchema, { error: 'a list of replies' }).max(20, 'at most 20 replies').default([]),
  questionsToAsk: z
    .array(z.string({ error: 'each question as text' }).trim().min(1, 'write the question, or remove it').max(600, 'keep each question to 600 characters at most'), { error: 'a list of questions' })
    .max(20, 'at most 20 questions')
    .default([]),
  cautions: markdown(4000).default(''),
  related: z.array(slugSchema, { error: 'a list of entry addresses' }).max(20, 'at most 20 related entries').default([]),
  sources: z.array(citationSchema, { error: 'a list of sources' }).max(60, 'at most 60 sources').default([]),
});

export type EntryContent = z.infer<typeof entryContentSchema>;
export type Citation = z.infer<typeof citationSchema>;

export const IN_BRIEF_MAX_WORDS = 120;
export const wordCount = (s: string) => (s.trim().match(/\S+/g) ?? []).length;

/** A starter file's front matter: the content fields except the Markdown sections kept in the body. */
export const entryFileSchema = entryContentSchema.extend({
  slug: slugSchema,
  /** Demo editors recorded as author and reviewer of version 1 (e-mails from content/demo/accounts.yml). */
  author: z.string().email(),
  reviewer: z.string().email(),
  changeNote: z.string().min(1).max(500).default('First published version.'),
});

export type EntryFile = z.infer<typeof entryFileSchema>;

/**
 * In a starter file the long Markdown sections live in the body, under level-2 headings with these
 * exact titles (in this order); front matter holds everything else.
 */
export const BODY_SECTIONS = {
  inBrief: SECTION_TITLES.inBrief,
  howItIsPitched: SECTION_TITLES.howItIsPitched,
  whyItFails: SECTION_TITLES.whyItFails,
  whatFakesTheEffect: SECTION_TITLES.whatFakesTheEffect,
  cautions: SECTION_TITLES.cautions,
} as const;
