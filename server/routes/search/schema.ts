/** Requests of /api/search. */
import { z } from 'zod';
import { slugSchema } from '../../../shared/entries/schema';
import { paging } from '../common-schema';

/** GET /api/search */
export const searchQuerySchema = z.object({
  /** The words searched for; empty lists every entry. */
  q: z.string().max(500, 'at most 500 characters').default(''),
  /** Only entries that break this conservation law (400 naming query.law for one not in the taxonomy). */
  law: slugSchema.optional(),
  /** Only entries of this mechanism class or below it (400 naming query.mechanism for one not in the taxonomy). */
  mechanism: slugSchema.optional(),
  ...paging(50, 20),
});
