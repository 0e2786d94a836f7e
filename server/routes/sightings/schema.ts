/** Requests of /api/sightings: a claim seen in the wild, sent as multipart/form-data with its files. */
import { z } from 'zod';
import type * as Figures from '../../../shared/claims/figures';
import { FIGURE_KINDS } from '../../../shared/claims/types';
import type { ClaimedFigureDto } from '../../../shared/submissions/types';
import { fieldsError } from '../../http/errors';
import { text } from '../common-schema';

/** One figure the claim states. */
export const figureSchema = z
  .object({
    /** What the figure is (thrust, power, efficiency …): decides the units it may take. */
    kind: z.enum(FIGURE_KINDS),
    /** The figure with its unit as the claim gives it ("0.2 lbf"); checked with readClaimedFigures. */
    quantity: z.string().trim().min(1, 'the figure with its unit, such as "0.2 lbf"').max(80),
    /** What the claim calls it. */
    label: z.string().trim().max(120).default(''),
  })
  .strict();

/** POST /api/sightings (the text fields; `figures` arrives as JSON text in the form). */
export const sightingSchema = z
  .object({
    /** A short title for what was seen. */
    title: text(3, 200, 'a short title for what was seen'),
    /** Where it was seen: a web address (http or https) … */
    seenAtUrl: z
      .string()
      .trim()
      .max(2000)
      .transform((s) => s || undefined)
      .pipe(z.url({ protocol: /^https?$/, error: 'a web address starting with http:// or https://' }).optional())
      .optional(),
    /** … or a citation (one of the two is needed). */
    seenAtCitation: z
      .string()
      .trim()
      .max(1000)
      .transform((s) => s || undefined)
      .optional(),
    /** The claim in the submitter's own words. */
    summary: text(10, 5000, 'a summary of the claim in your own words'),
    /** The figures the claim states, at most 20. */
    figures: z.array(figureSchema).max(20, 'at most 20 figures').default([]),
  })
  .strict()
  .refine((s) => s.seenAtUrl || s.seenAtCitation, { path: ['seenAtUrl'], message: 'say where it was seen: a web address or a citation' });

export type SightingInput = z.infer<typeof sightingSchema>;

/** The figures of a sighting, each checked with parseQuantity for its kind (400 naming the one that fails). */
export function readClaimedFigures(figures: z.infer<typeof figureSchema>[], where = 'body.figures'): ClaimedFigureDto[] {
  // Loaded at the first sighting, not with the app: figures.ts brings mathjs (about a second to load).
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { readQuantityOf } = require('../../../shared/claims/figures') as typeof Figures;
  const fields: Record<string, string> = {};
  const out: ClaimedFigureDto[] = [];
  figures.forEach((f, i) => {
    const read = readQuantityOf(f.kind, f.quantity);
    if (read.ok) out.push({ kind: f.kind, quantity: f.quantity, si: read.si, display: read.display, label: f.label });
    else fields[`${where}.${i}.quantity`] = read.message;
  });
  if (Object.keys(fields).length) throw fieldsError('invalid_figure', fields);
  return out;
}
