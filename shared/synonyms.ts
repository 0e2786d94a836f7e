/**
 * The trade's synonyms (issue 11): the contract of `/api/synonyms` for the server and the Desk.
 * A group is two or more words or phrases that practitioners use for one thing; the claim matcher
 * lets each stand for the others (at a lower weight than the word itself).
 */
import { z } from 'zod';

/** Longest word or phrase, and most of them in one group. */
export const SYNONYM_TERM_MAX = 80;
export const SYNONYM_TERMS_MAX = 30;
export const SYNONYM_NOTE_MAX = 500;

const term = z
  .string({ error: 'a word or phrase' })
  .trim()
  .min(1, 'a word or phrase (empty)')
  .max(SYNONYM_TERM_MAX, `at most ${SYNONYM_TERM_MAX} characters`)
  .regex(/\p{L}/u, 'needs at least one letter');

export const synonymTermsSchema = z
  .array(term, { error: 'a list of words or phrases' })
  .min(2, 'at least two words or phrases that mean the same')
  .max(SYNONYM_TERMS_MAX, `at most ${SYNONYM_TERMS_MAX} words or phrases`);

const note = z
  .string({ error: 'text' })
  .trim()
  .max(SYNONYM_NOTE_MAX, `at most ${SYNONYM_NOTE_MAX} characters`)
  .nullish()
  .transform((s) => s || null);

/** `POST /api/synonyms`. */
export const synonymGroupCreateSchema = z.object({ terms: synonymTermsSchema, note }).strict();

/** `PUT /api/synonyms/:id`: `version` is the one the editor read (409 edit_conflict when the group changed since). */
export const synonymGroupUpdateSchema = z
  .object({ terms: synonymTermsSchema, note, version: z.number({ error: 'the version you edited' }).int().min(1) })
  .strict();

/** One group of words or phrases in content/synonyms.yml (no version there). */
export const synonymFileSchema = z.object({ groups: z.array(z.object({ terms: synonymTermsSchema, note }).strict()) }).strict();

export type SynonymGroupInput = z.output<typeof synonymGroupCreateSchema>;
export type SynonymGroupUpdate = z.output<typeof synonymGroupUpdateSchema>;

// The DTOs are part of the API contract: shared/api/synonyms.ts.
