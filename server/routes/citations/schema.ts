/** Requests of /api/citations. */
import { z } from 'zod';

/** POST /api/citations/parse (413 too_large over 200 000 characters). */
export const parseBodySchema = z
  .object({
    /** Pasted BibTeX, RIS or CSL-JSON, one or more items. */
    text: z.string().min(1, 'paste BibTeX, RIS or CSL-JSON').max(200_000),
  })
  .strict();
