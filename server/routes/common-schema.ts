/**
 * Request pieces many resources share, defined once: numeric ids in the path, entry slugs in the
 * path, and limit/offset paging. Each resource's own schemas live in its folder's schema.ts.
 */
import { z } from 'zod';
import { slugSchema } from '../../shared/entries/schema';
import { paging } from '../../shared/schemas/paging';

export { paging };

/** Largest id of an INT UNSIGNED column. */
export const MAX_UINT = 4_294_967_295;

/**
 * `:id` in the path: a positive whole number, at most `max`. `message` says what the number is
 * ("a draft id (a positive whole number)"); `everywhere` repeats it for a missing or too large id.
 */
export function idParams(message: string, { max = MAX_UINT, everywhere = false }: { max?: number; everywhere?: boolean } = {}) {
  const id = everywhere
    ? z.coerce.number({ error: message }).int().min(1, message).max(max, message)
    : z.coerce.number().int().min(1, message).max(max);
  return z.object({
    /** The record's number. */
    id,
  });
}

/** `:slug` in the path: an entry's permalink name. */
export const slugParams = z.object({
  /** The entry's slug (lower-case words joined by hyphens). */
  slug: slugSchema,
});

/** A text field a person types, trimmed, with its length limits; `what` says what is missing. */
export const text = (min: number, max: number, what: string) =>
  z.string({ error: what }).trim().min(min, min > 1 ? `at least ${min} characters` : what).max(max, `at most ${max} characters`);
