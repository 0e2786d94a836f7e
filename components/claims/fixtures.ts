/**
 * Invented test data for the claim-check component tests: a made-up pitch for a sealed microwave
 * cavity (a hedged power and a thrust given as a range), a made-up heat-pump advertisement that
 * keeps within its bound, and results built with the real figure reader (shared/claims/reader.ts)
 * and planner (shared/claims/plan.ts), so the figures, checks, findings, sentences and needs are
 * theirs; only the matches and the paragraphs are made up here (they come from the server).
 */
import { runClaimChecks } from '@/shared/claims/plan';
import { extractFigures } from '@/shared/claims/reader';
import {
  PARAGRAPH_VARIANT_LABEL,
  PARAGRAPH_VARIANTS,
  type ClaimParagraph,
  type ParagraphVariant,
} from '@/shared/claims/types';
import { formatQuantity } from '@/shared/worksheet/quantity';
import type { ClaimCheckResult, ClaimMatch, Figure, SavedClaimCheckDto, SavedClaimCheckResponse } from '@/shared/api-types';
import { permalink } from '@/shared/permalink';

// Invented test data: no real device, company or person.
export const pitch =
  'Our sealed copper cavity, fed up to 1.5 kW of microwaves, produced a steady 0.1–0.2 lbf of thrust with no propellant at all.';

// 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² exactly (NIST SP 811, 2008, appendix B.8).
export const LBF = 0.45359237 * 9.80665;

/** A figure typed by hand (or changed), as the server reads it back. */
export function figure(partial: Partial<Figure> & Pick<Figure, 'id' | 'kind' | 'quantity' | 'si' | 'unit'>): Figure {
  return { text: partial.quantity, start: null, end: null, role: null, display: formatQuantity(partial.si, partial.unit), ...partial };
}

/** The pitch's figures as the reader finds them: f1 the power ("up to"), f2 the thrust (a range). */
export const figures: Figure[] = extractFigures(pitch);

/** Invented: an ordinary heat pump, advertised by its heating COP as a percentage, well within Carnot. */
export const heatPumpText =
  'Invented advertisement: our heat pump is 350% efficient, heating the house at 35 °C from outside air at 5 °C.';
export const heatPumpFigures: Figure[] = extractFigures(heatPumpText);

const entryUrl = permalink('http://127.0.0.1:8080', 'resonant-cavity-thruster', 1);
const reference = 'Counterweight. (2026). Thrust from microwaves in a closed cavity (Version 1).';

/** A paragraph of each variant, marked with `label` so that a test can tell them apart. */
function paragraphOf(variant: ParagraphVariant, style: ClaimCheckResult['style'], label: string): ClaimParagraph {
  const body = `(${label}, ${PARAGRAPH_VARIANT_LABEL[variant]}) The device belongs to a class set out in the Counterweight entry “Thrust from microwaves in a closed cavity”, version 1 (${entryUrl}) [1].`;
  const ref = style === 'vancouver' ? `Counterweight. Thrust from microwaves in a closed cavity [Version 1]. 2026.` : reference;
  return { variant, style, body, references: [{ n: 1, id: 'resonant-cavity-thruster-v1', counterweight: true, text: ref }], text: `${body}\n\nReferences\n1. ${ref}\n` };
}

const matches: ClaimMatch[] = [
  {
    slug: 'resonant-cavity-thruster',
    title: 'Thrust from microwaves in a closed cavity',
    version: 1,
    score: 31.4,
    terms: ['seal', 'caviti', 'microwav'],
    words: ['sealed', 'cavity', 'microwaves'],
    url: entryUrl,
    inBrief: 'Radiation kept inside a closed box cannot push the box.',
  },
  {
    slug: 'photon-rocket',
    title: 'The photon rocket',
    version: 3,
    score: 4.2,
    terms: ['propel'],
    words: ['propellant'],
    url: 'http://127.0.0.1:8080/entries/photon-rocket/v/3',
    inBrief: 'Light carries momentum E/c.',
  },
];

export function resultFor(
  figs: Figure[],
  style: ClaimCheckResult['style'] = 'apa',
  label = 'first',
  variant: ParagraphVariant = 'referee',
  text = pitch,
): ClaimCheckResult {
  const { checks, needs, notes } = runClaimChecks(figs, { text });
  const paragraphs = Object.fromEntries(PARAGRAPH_VARIANTS.map((v) => [v, paragraphOf(v, style, label)])) as Record<ParagraphVariant, ClaimParagraph>;
  return {
    style,
    textLength: text.length,
    matches,
    figures: figs,
    checks,
    needs,
    paragraph: paragraphs[variant],
    paragraphs,
    variant,
    notes: [...notes, 'Invented note: the text names no measurement conditions.'],
  };
}

export const token = 'tok_ABCDEFGHIJKLMNOPQRSTUV';

export function savedDto(mine: boolean, variant: ParagraphVariant = 'referee'): SavedClaimCheckDto {
  return {
    token,
    url: `http://127.0.0.1:8080/check/${token}`,
    createdAt: '2026-05-04T10:00:00.000Z',
    text: pitch,
    style: 'apa',
    figures: null,
    result: resultFor(figures, 'apa', 'saved', variant),
    mine,
  };
}

/** What `GET /api/claim-checks/saved/:token` answers with. */
export const savedResponse = (mine: boolean, variant: ParagraphVariant = 'referee'): SavedClaimCheckResponse => ({ saved: savedDto(mine, variant) });
