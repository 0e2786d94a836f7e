/**
 * A draft entry as saved while it is written: the same fields and limits as entryContentSchema,
 * but the sections and the laws may still be empty (the full schema is checked at submit). Read
 * by the drafts routes and by the moderators' "turn this sighting into a draft" decision.
 */
import { z } from 'zod';
import { entryContentSchema, slugSchema } from '../entries/schema';

const md = (max: number) => z.string().max(max, `at most ${max} characters`);

export const draftContentSchema = entryContentSchema.extend({
  /** The brief in plain language (at most 120 words once submitted). */
  inBrief: md(1200).default(''),
  /** The claim pattern and the phrases that give it away. */
  howItIsPitched: md(6000).default(''),
  /** The technical objection (Markdown with TeX math). */
  whyItFails: md(20000).default(''),
  /** The conservation laws the claim breaks (their slugs); at least one once submitted. */
  laws: z.array(slugSchema).max(5).default([]),
});
