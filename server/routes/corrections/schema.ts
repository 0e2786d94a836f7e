/** Requests of /api/corrections: a reported error against one published entry version. */
import { z } from 'zod';
import { slugSchema } from '../../../shared/entries/schema';
import { text } from '../common-schema';
import { CORRECTION_SECTIONS } from '../../../shared/submissions/types';

/** POST /api/corrections */
export const correctionSchema = z
  .object({
    /** The entry's slug (404 naming body.entry when no published entry has it). */
    entry: slugSchema,
    /** The version the error is in (404 naming body.version when it has no such published version). */
    version: z.number({ error: 'the version number the error is in' }).int().min(1),
    /** The section the error is in, or "other". */
    section: z.enum(CORRECTION_SECTIONS),
    /** What is wrong. */
    whatIsWrong: text(10, 5000, 'what is wrong'),
    /** The fix the submitter suggests. */
    suggestedFix: text(1, 5000, 'the fix you suggest'),
    /** Sources for the fix, if any. */
    sources: z.string().trim().max(3000).default(''),
  })
  .strict();

export type CorrectionInput = z.infer<typeof correctionSchema>;
