/**
 * An entry of the library: the structured objection (DESIGN.md §3). The same schema validates the
 * starter files in content/entries/ (YAML front matter + Markdown body), drafts sent by the Desk, and
 * what the API returns for a version.
 */
import { SECTION_TITLES } from '../api/constants';
import { z } from 'zod';
import { worksheetSchema } from '../worksheet/schema';

export const slugSchema = z
  .string()
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'lower-case words joined by hyphens')
  .min(3)
  .max(80);

/** Markdown with TeX math ($…$, $$…$$), rendered by shared/markdown.ts and sanitised. */
const markdown = (max: number) => z.string().max(max, `at most ${max} characters`);

/** True for an absolute http: or https: address with a host: the only addresses a reader is ever sent to. */
export function isWebAddress(s: string): boolean {
  try {
    const u = new URL(s);
    return (u.protocol === 'http:' || u.protocol === 'https:') && u.hostname !== '';
  } catch {
    return false;
  }
}

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
      id: z.string().min(1).max(200),
      type: z.string().min(1).max(40),
      title: z.string().min(1).max(500),
      URL: webAddressSchema.optional(),
      DOI: doiSchema.optional(),
    })
    .passthrough(),
  note: z.string().max(500).default(''),
});

export const replySchema = z.object({
  reply: markdown(2000).min(1),
  answer: markdown(4000).min(1),
});

/** The content of one version: every section of DESIGN.md §3, in reading order. */
export const entryContentSchema = z.object({
  title: z.string().trim().min(3).max(160),
  aliases: z.array(z.string().trim().min(1).max(120)).max(20).default([]),
  mechanismClass: slugSchema,
  laws: z.array(slugSchema).min(1, 'name at least one conservation law').max(5),
  /** Plain language, at most 120 words (checked by wordCount). */
  inBrief: markdown(1200).min(1),
  howItIsPitched: markdown(6000).min(1),
  whyItFails: markdown(20000).min(1),
  worksheets: z.array(worksheetSchema).max(6).default([]),
  whatFakesTheEffect: markdown(12000).default(''),
  repliesAndAnswers: z.array(replySchema).max(20).default([]),
  questionsToAsk: z.array(z.string().trim().min(1).max(600)).max(20).default([]),
  cautions: markdown(4000).default(''),
  related: z.array(slugSchema).max(20).default([]),
  sources: z.array(citationSchema).max(60).default([]),
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
