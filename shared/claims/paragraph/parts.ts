/**
 * The paragraph's parts and their shorter forms (shared/claims/paragraph.ts): each part steps down to
 * a shorter form (or to nothing) at a cost, and the cheapest step is taken until the paragraph is
 * within PARAGRAPH_WORDS_MAX words before its references.
 */
import { wordCount } from '../../entries/schema';
import { number } from './references';

/** Most words of the paragraph before its references (counted as schema.ts wordCount counts them). */
export const PARAGRAPH_WORDS_MAX = 180;

export interface Part {
  /** Fullest form first; '' means left out. */
  forms: string[];
  /** For each step from forms[i] to forms[i + 1]: the lower, the sooner it is taken when too long. */
  steps: number[];
  at: number;
}

/** A part from its forms: each step costs `costs[i]`; `optional` adds a last step to ''. */
export function part(forms: (string | null | undefined)[], costs: number[], optional: number | null = null): Part {
  const fs: string[] = [];
  const steps: number[] = [];
  forms.forEach((f, i) => {
    if (!f) return;
    if (fs.length) steps.push(costs[i - 1] ?? costs[costs.length - 1] ?? 0);
    fs.push(f);
  });
  if (optional !== null && fs.length) {
    fs.push('');
    steps.push(optional);
  }
  return { forms: fs.length ? fs : [''], steps, at: 0 };
}

export const render = (parts: Part[]) =>
  parts
    .map((p) => p.forms[p.at])
    .filter(Boolean)
    .join(' ')
    .replace(/\s+/g, ' ')
    .trim();

/** Shortens the cheapest part, step by step, until the paragraph is within the word limit. */
export function trim(parts: Part[]): string {
  for (;;) {
    const body = number(render(parts)).body;
    if (wordCount(body) <= PARAGRAPH_WORDS_MAX) return render(parts);
    let pick: Part | null = null;
    for (const p of parts) if (p.at < p.steps.length && (!pick || p.steps[p.at] <= pick.steps[pick.at])) pick = p;
    if (!pick) return render(parts);
    pick.at += 1;
  }
}

// Step costs, cheapest first: what is left out first when the paragraph is too long.
export const COST = {
  related: 1,
  assumptions: 2,
  secondQuestion: 3,
  secondAnswerSentence: 4,
  needsTitles: 4.5,
  firstQuestion: 5,
  shorterClosing: 5.5,
  reply: 6,
  someLawsPlainly: 6.5,
  results: 7,
  fewerNeeds: 8,
  lawsPlainly: 8.5,
};
