/** Requests of /api/drafts: writing, saving (optimistic locking), submitting and vetting drafts. */
import { z } from 'zod';
import { slugSchema } from '../../../shared/entries/schema';
import { draftContentSchema } from '../../../shared/schemas/drafts';
import { idParams } from '../common-schema';

export { draftContentSchema };

/** `:id` of a draft (an entry version not yet published). */
export const draftIdParams = idParams('a draft id (a positive whole number)');

/** The draft's revision the editor last read; a stale one answers 409 edit_conflict. */
const lockVersion = z.number({ error: 'the lockVersion you last read (a whole number)' }).int().min(0);

/** POST /api/drafts: a new entry with its first draft. */
export const createDraftSchema = z
  .object({
    /** The new entry's permalink name (409 slug_taken when another entry has it). */
    slug: slugSchema,
    /** The draft's sections. */
    content: draftContentSchema,
  })
  .strict();

/** PUT /api/drafts/:id */
export const updateDraftSchema = z.object({ content: draftContentSchema, lockVersion }).strict();

/** POST /api/drafts/:id/submit */
export const submitSchema = z.object({ lockVersion }).strict();

/** POST /api/drafts/:id/approve */
export const approveSchema = z
  .object({
    /** What this version changes, in a sentence (shown in the entry's versions). */
    changeNote: z.string().trim().min(1, 'say in a sentence what this version changes').max(500),
  })
  .strict();

/** POST /api/drafts/:id/send-back */
export const sendBackSchema = z
  .object({
    /** What needs changing, for the author. */
    reason: z.string().trim().min(1, 'say what needs changing').max(4000),
  })
  .strict();
