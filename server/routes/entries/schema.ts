/** Requests of /api/entries: the library's list, its versions, citing a version, and the editors' writes on an entry. */
import { z } from 'zod';
import { slugSchema } from '../../../shared/entries/schema';
import { paging, slugParams } from '../common-schema';

export { slugParams };

/** `:slug/versions/:n`: an entry and one of its published versions. */
export const versionParams = z.object({
  /** The entry's slug. */
  slug: slugSchema,
  /** The version's number, from 1. */
  n: z.coerce.number().int().min(1, 'a version number (1, 2, 3 …)').max(1_000_000),
});

/** GET /api/entries */
export const entryListQuerySchema = z.object({
  /** Only entries that break this conservation law (its slug). */
  law: slugSchema.optional(),
  /** Only entries of this mechanism class or a class below it (its slug). */
  mechanism: slugSchema.optional(),
  ...paging(100, 20),
});

/** GET /api/entries/:slug/cite: declared beside the citation routes, which answer it. */
export { citeQuerySchema } from '../citations/schema';

/** POST /api/entries/:slug/retire (413 too_large for a field over its size). */
export const retireSchema = z
  .object({
    /** Why the entry is retired, shown on the entry. */
    reason: z.string().trim().min(1, 'say why the entry is retired').max(4000),
    /** The entry that takes its place, if any: a published entry, not this one. */
    successor: slugSchema.optional(),
  })
  .strict();
