/** Requests of /api/worksheets: evaluating any worksheet with given values. */
import { z } from 'zod';
import { quantityTextSchema, worksheetSchema } from '../../../shared/worksheet/schema';

/** POST /api/worksheets/evaluate */
export const evaluateRequestSchema = z
  .object({
    /** The worksheet itself (inputs, steps, checks), as shared/worksheet/schema.ts defines it. */
    worksheet: worksheetSchema,
    /** Values for its inputs by name, each a quantity with its unit ("3 kW"); a missing one takes its default. */
    values: z.record(z.string().max(40), quantityTextSchema).default({}),
  })
  .strict();
