/**
 * Requests of /api/submissions: reading one, the submitter's answer, and the moderators' claim,
 * release and four decisions on it.
 */
import { z } from 'zod';
import { slugSchema } from '../../../shared/entries/schema';
import { idParams, text } from '../common-schema';

/** `:id` of a submission (also of an attachment: the same numbering rule). */
export const submissionIdParams = idParams('a submission number', { max: 4_000_000_000 });

/** POST /api/submissions/:id/answer */
export const answerSchema = z
  .object({
    /** The submitter's answer to the moderator's question. */
    message: text(1, 5000, 'your answer'),
  })
  .strict();

/** POST /api/submissions/:id/decide: one of four decisions, told apart by `decision`. */
export const decideSchema = z.discriminatedUnion('decision', [
  z
    .object({
      decision: z.literal('accept'),
      /** A sighting: the published entries it is linked to (at least one); a correction: none. */
      entries: z.array(slugSchema).max(10).default([]),
    })
    .strict(),
  z
    .object({
      decision: z.literal('draft'),
      /** The new entry's permalink name. */
      slug: slugSchema,
      /** Its mechanism class (a slug of the taxonomy). */
      mechanismClass: slugSchema,
      /** The editor who will own the draft. */
      editorId: z.number().int().min(1),
    })
    .strict(),
  z
    .object({
      decision: z.literal('ask'),
      /** The question for the submitter. */
      note: text(1, 2000, 'the question for the submitter'),
    })
    .strict(),
  z
    .object({
      decision: z.literal('reject'),
      /** The reason, sent to the submitter. */
      note: text(1, 2000, 'the reason'),
    })
    .strict(),
]);

export type DecideInput = z.infer<typeof decideSchema>;
export type AcceptInput = Extract<DecideInput, { decision: 'accept' }>;
export type DraftDecisionInput = Extract<DecideInput, { decision: 'draft' }>;
