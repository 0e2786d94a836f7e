/** Requests of /api/claim-checks: running a claim check, saving it, and its share link. */
import { z } from 'zod';
import { CLAIM_FIGURES_MAX, CLAIM_TEXT_MAX, FIGURE_KINDS, FIGURE_ROLES, PARAGRAPH_VARIANTS } from '../../../shared/claims/types';
import { CITATION_STYLES } from '../../../shared/entries/citations';

/** A figure the reader typed or corrected (instead of those read from the text). */
export const figureInputSchema = z
  .object({
    /** What the figure is (thrust, power …). */
    kind: z.enum(FIGURE_KINDS),
    /** The figure with its unit ("0.2 lbf"). */
    quantity: z.string().trim().min(1, 'type the figure with its unit, such as "0.2 lbf"').max(80, 'at most 80 characters'),
    /** The upper end of a range, if the claim gives one. */
    upper: z.string().trim().max(80, 'at most 80 characters').nullable().optional(),
    /** Its role in the checks (claimed, input …), when the reader fixed it. */
    role: z.enum(FIGURE_ROLES).nullable().optional(),
    /** The words of the text it was read from. */
    text: z.string().max(200).optional(),
    /** Where in the text those words start and end. */
    start: z.number().int().min(0).max(CLAIM_TEXT_MAX).nullable().optional(),
    end: z.number().int().min(0).max(CLAIM_TEXT_MAX).nullable().optional(),
  })
  .strict();

/** POST /api/claim-checks and POST /api/claim-checks/saved (a text over CLAIM_TEXT_MAX answers 413 text_too_long first). */
export const claimCheckSchema = z
  .object({
    /** The claim as pasted: an abstract, a press release, a pitch. */
    text: z.string({ error: 'paste the text of the claim' }).trim().min(1, 'paste the text of the claim'),
    /** The citation style of the paragraph's references. */
    style: z.enum(CITATION_STYLES).default('apa'),
    /** Which paragraph comes first: referee report, examiner's objection, grant review, journalist's note. */
    variant: z.enum(PARAGRAPH_VARIANTS).default('referee'),
    /** The figures to use instead of those read from the text. */
    figures: z.array(figureInputSchema).max(CLAIM_FIGURES_MAX, `at most ${CLAIM_FIGURES_MAX} figures`).optional(),
  })
  .strict();

export type ClaimCheckInput = z.infer<typeof claimCheckSchema>;

/** `:token` of a saved check: the unguessable part of its share link. */
export const tokenParams = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'a saved-check token from a share link'),
});
