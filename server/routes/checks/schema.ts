/** Requests of /api/checks: the standard check kit run on typed inputs. */
import { z } from 'zod';

/** One input: text with its unit ("2 kW"), or a number with its unit apart. */
const rawInput = z.union([
  z.string().max(80),
  z
    .object({
      /** The number, finite. */
      value: z.number().finite(),
      /** Its unit, as the worksheet language writes it ("kW"). */
      unit: z.string().max(40),
    })
    .strict(),
]);

/** POST /api/checks/:check */
export const checkRequestSchema = z
  .object({
    /** The check's inputs by name; a missing one takes its default. Errors are keyed `inputs.<name>`. */
    inputs: z.record(z.string().max(40), rawInput).default({}),
  })
  .strict();
