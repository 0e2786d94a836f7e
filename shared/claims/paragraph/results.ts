/**
 * One sentence per check run (shared/claims/paragraph.ts): the planner's first sentence, or one built
 * from the outputs, numbers as in print, ending with the law it was checked against.
 */
import { wordCount } from '../../entries/schema';
import { formatPrint, printText } from '../print';
import type { ClaimCheckRun } from '../types';
import { lawInProse, list, lowerFirst, sameLaw, sentence, sentencesOf } from './words';

export const breaks = (run: ClaimCheckRun) => (run.finding ?? (run.verdict.holds ? 'consistent' : 'breaks')) === 'breaks';

/** Computed numbers as in print: powers of ten in superscripts, long whole numbers ("177806") in scientific form. */
export const printed = (s: string) => printText(s, { bigIntegers: true });

/** A planner's sentence may open with its finding ("Conflicts with …: ", "Consistent with …: "). */
const FINDING_HEAD = /^(?:conflicts|consistent) with [^:]+:\s+(?=[A-Z“"(])/i;

/**
 * One sentence of a run's result, numbers as in print: the first sentence of the planner's (the
 * rest of a longer verdict is the check screen's to show), else one built from the outputs. With
 * `withLaw`, it ends by naming the law it was checked against ("…, in conflict with conservation of
 * linear momentum."), unless it names it already; without, the paragraph has said the law around it.
 */
export function resultSentence(run: ClaimCheckRun, fallbackLaw = 'the law it rests on', withLaw = true): string {
  const law = run.law?.trim() ? lawInProse(run.law) : fallbackLaw;
  const given = run.sentence?.trim().replace(FINDING_HEAD, '');
  let core: string;
  if (given) {
    const [first, second] = sentencesOf(given);
    core = printed(second && wordCount(first) < 8 ? `${first} ${second}` : first);
  } else {
    // A pure number (a ratio) to three figures; a quantity as displayed, in print.
    const outs = run.outputs.map((o) => `the ${lowerFirst(o.label)} is ${o.unit ? printed(o.display) : formatPrint(o.si, 3)}`);
    core = `${run.title}: ${outs.length ? list(outs) : 'no output'}`;
  }
  core = core.trim().replace(/[.;:,]+$/, '');
  const named = core.toLowerCase().includes(sameLaw(law));
  if (!withLaw || named) return sentence(core);
  return sentence(`${core}${given ? ',' : ';'} ${breaks(run) ? (given ? 'in conflict with' : 'the figures break') : given ? 'consistent with' : 'the figures are consistent with'} ${law}`);
}
