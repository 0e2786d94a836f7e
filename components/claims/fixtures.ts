/**
 * Invented test data for the claim-check component tests: a made-up pitch for a sealed microwave
 * cavity, the figures in it, and results built with the real planner (shared/claims/plan.ts), so the
 * checks carry the kit's own outputs and verdicts.
 */
import { runClaimChecks } from '@/shared/claims/plan';
import type { ClaimCheckResult, Figure, SavedClaimCheckDto } from './api';

// Invented test data: no real device, company or person.
export const pitch =
  'Our sealed copper cavity, fed 1.5 kW of microwaves, produced a steady 0.2 lbf of thrust with no propellant at all.';

// 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² exactly (NIST SP 811, 2008, appendix B.8).
export const LBF = 0.45359237 * 9.80665;

export function figure(partial: Partial<Figure> & Pick<Figure, 'id' | 'kind' | 'quantity' | 'si' | 'unit' | 'display'>): Figure {
  return { text: partial.quantity, start: null, end: null, role: null, ...partial };
}

const at = (text: string) => ({ start: pitch.indexOf(text), end: pitch.indexOf(text) + text.length, text });

export const figures: Figure[] = [
  figure({ id: 'f1', kind: 'power', quantity: '1.5 kW', ...at('1.5 kW'), si: 1500, unit: 'W', display: '1.5 kW', role: 'in' }),
  figure({ id: 'f2', kind: 'thrust', quantity: '0.2 lbf', ...at('0.2 lbf'), si: 0.2 * LBF, unit: 'N', display: '889.6 mN' }),
];

export function resultFor(figs: Figure[], style: ClaimCheckResult['style'] = 'apa', label = 'first'): ClaimCheckResult {
  const { checks, notes } = runClaimChecks(figs);
  const url = 'http://127.0.0.1:8080/entries/resonant-cavity-thruster/v/1';
  return {
    style,
    textLength: pitch.length,
    matches: [
      {
        slug: 'resonant-cavity-thruster',
        title: 'Thrust from microwaves in a closed cavity',
        version: 1,
        score: 31.4,
        terms: ['seal', 'caviti', 'microwav'],
        words: ['sealed', 'cavity', 'microwaves'],
        url,
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
    ],
    figures: figs,
    checks,
    paragraph: {
      style,
      body: `(${label}) The device belongs to a class set out in the Counterweight entry “Thrust from microwaves in a closed cavity”, version 1 (${url}) [1].`,
      references: [{ n: 1, id: 'resonant-cavity-thruster-v1', counterweight: true, text: 'Counterweight. (2026). Thrust from microwaves in a closed cavity (Version 1).' }],
      text: `(${label}) The device belongs to a class set out in the Counterweight entry “Thrust from microwaves in a closed cavity”, version 1 (${url}) [1].\n\nReferences\n1. Counterweight. (2026). Thrust from microwaves in a closed cavity (Version 1).\n`,
    },
    notes: [...notes, 'Invented note: the text names no measurement conditions.'],
  };
}

export const token = 'tok_ABCDEFGHIJKLMNOPQRSTUV';

export function savedDto(mine: boolean): SavedClaimCheckDto {
  return {
    token,
    url: `http://127.0.0.1:8080/check/${token}`,
    createdAt: '2026-05-04T10:00:00.000Z',
    text: pitch,
    style: 'apa',
    figures: null,
    result: resultFor(figures, 'apa', 'saved'),
    mine,
  };
}
