/**
 * The wording of each reader's job (shared/claims/paragraph.ts): how a referee, a patent examiner, a
 * grant reviewer and a journalist open the paragraph, give the results, answer the claim's rejoinder,
 * ask for what is missing and close — each part with its shorter forms (parts.ts).
 */
import { wordCount } from '../../entries/schema';
import type { ParagraphVariant } from '../types';
import type { ParagraphEntry } from './input';
import { COST, part, type Part } from './parts';
import { lawsExplained, lawsPhrase, list, lowerFirst, plain, sentence, unstop, upperFirst, withCite } from './words';

/** How many of the top entry's questions the paragraph asks. */
const PARAGRAPH_QUESTIONS = 2;

export type Mode = 'breaks' | 'consistent' | 'entry' | 'bare';

/** How each practice names the document and speaks to it. */
const DOC: Record<ParagraphVariant, { doc: string; own: string }> = {
  referee: { doc: 'manuscript', own: "the manuscript's own figures" },
  examiner: { doc: 'application', own: 'the figures given in the application' },
  grant: { doc: 'proposal', own: "the proposal's own figures" },
  journalist: { doc: 'claim', own: "the claim's own numbers" },
};

export interface Context {
  variant: ParagraphVariant;
  mode: Mode;
  top?: ParagraphEntry;
  /** "the Counterweight entry “…”, version 2 (URL) [1]". */
  entryName: string;
  /** Marker of the top entry's sources ("[2, 3]" once numbered), '' when it has none. */
  src: string;
  /** The laws the objection rests on: the entry's, else those of the checks that break. */
  laws: string[];
  /** Laws of the checks that break, and of those consistent. */
  breakLaws: string[];
  okLaws: string[];
  results: string[];
  assumptions: string[];
  reply: { reply: string; forms: string[]; cite: string } | null;
  /** Needs in a long form (with the check), a short one, and the first three. */
  needs: string[][];
  questions: string[];
  figures: number;
}

function needsSentence(c: Context): (string | null)[] {
  const [full, short, few] = c.needs;
  if (!full.length) return [];
  const say = (words: string[]): string => {
    const what = list(words);
    switch (c.variant) {
      case 'referee':
        return `The checks the figures call for cannot be run without ${what}, which the manuscript should report.`;
      case 'examiner':
        return c.mode === 'breaks' || c.mode === 'entry'
          ? `That evidence should include ${what}.`
          : `The applicant is asked to supply ${what}, which the remaining checks need.`;
      case 'grant':
        return `To show that its objectives are achievable, the proposal should give ${what}.`;
      case 'journalist':
        return `The claim does not give ${what}, which a check needs.`;
    }
  };
  return [say(full), say(short), short.length > few.length ? say([...few, 'the other figures the checks need']) : null];
}

function questionsSentence(c: Context, qs: string[], afterNeeds: boolean): string | null {
  if (!qs.length) return null;
  const q = qs.map((x) => sentence(x.replace(/\s+/g, ' '))).join(' ');
  switch (c.variant) {
    case 'referee':
      return `${afterNeeds ? 'The manuscript should also answer' : 'Before the claim can be assessed, the manuscript should answer'}: ${q}`;
    case 'examiner':
      return c.mode === 'breaks' || c.mode === 'entry' ? `The evidence should also answer: ${q}` : `The applicant may also be asked: ${q}`;
    case 'grant':
      return `${afterNeeds ? 'It should also address' : 'To show that its objectives are achievable, the proposal should address'}: ${q}`;
    case 'journalist':
      return `Independent physicists would ask: ${q}`;
  }
}

export function buildParts(c: Context): Part[] {
  const v = c.variant;
  const { doc, own } = DOC[v];
  const parts: Part[] = [];
  const laws = lawsPhrase(c.laws);
  const plural = c.laws.length > 1;
  const resultsText = (n: number) => c.results.slice(0, n).join(' ');
  const resultsPart = (lead: (body: string) => string) => {
    const forms = c.results.map((_, i) => lead(resultsText(c.results.length - i)));
    // The shortest form: the one result said up to its first ", and …" (a long sentence of a check that
    // would otherwise take the paragraph past its limit).
    const clipped = c.results[0]?.replace(/,[^\S\n]+and[^\S\n][^]*?(?=[.!?]?$)/u, '');
    if (clipped && clipped !== c.results[0]) forms.push(lead(clipped));
    return part(forms, forms.map(() => COST.results));
  };

  // Opening: the entry and the law(s) it rests on.
  if (c.mode === 'consistent') {
    const okLaws = lawsPhrase(c.okLaws);
    if (c.top) {
      parts.push(
        part([
          {
            referee: `The manuscript's central claim was compared with ${c.entryName}.`,
            examiner: `The application was compared with ${c.entryName}.`,
            grant: `The device at the centre of the proposal was compared with ${c.entryName}.`,
            journalist: `${upperFirst(c.entryName)} explains how claims like this one are checked.`,
          }[v],
        ], []),
      );
    } else {
      parts.push(part([`No entry of the Counterweight library matched the ${doc} closely; its figures were checked against standard physics.`], []));
    }
    const lead = (body: string) =>
      ({
        referee: `On ${own}, the claim is consistent with ${okLaws}${c.src}: ${body}`,
        examiner: `On ${own}, the invention as claimed is consistent with ${okLaws}${c.src}: ${body}`,
        grant: `On ${own}, the proposed work is consistent with ${okLaws}${c.src}: ${body}`,
        journalist: `With ${own}, the figures are consistent with ${okLaws}${c.src}: ${body}`,
      })[v];
    if (v === 'journalist') {
      // Every law explained, then the first only (with every result, then fewer), then none.
      const [all, first, none] = lawsExplained(c.okLaws.length ? c.okLaws : ['the conservation laws of physics']);
      const say = (ls: string, n: number) => `With ${own}, the figures are consistent with ${ls}${c.src}: ${resultsText(n)}`;
      const forms = [say(all, c.results.length)];
      const costs = [COST.someLawsPlainly];
      for (let n = c.results.length; n >= 1; n--) {
        forms.push(say(first, n));
        costs.push(n > 1 ? COST.results : COST.lawsPlainly);
      }
      forms.push(say(none, 1));
      parts.push(part(forms, costs));
    } else {
      parts.push(resultsPart(lead));
    }
  } else if (c.top) {
    const opening = {
      referee: [`The manuscript's central claim concerns a device of the kind treated in ${c.entryName}; the standard objection to such devices rests on ${laws}${c.src}.`],
      examiner: [
        `The invention as claimed would be inoperable, and would therefore lack utility (industrial applicability), because it conflicts with ${plural ? 'well-established laws' : 'a well-established law'} of physics, ${laws}, as set out in ${c.entryName}${c.src ? ` and the literature cited there${c.src}` : ''}.`,
      ],
      grant: [`The feasibility of the proposed work depends on a device of the kind treated in ${c.entryName}, which conflicts with ${laws}${c.src}.`],
      journalist: lawsExplained(c.laws).map((ls) => `Claims like this one are familiar to physicists, and the standard answer is set out in ${c.entryName}. It rests on ${ls}${c.src}.`),
    }[v];
    parts.push(part(opening, [COST.someLawsPlainly, COST.lawsPlainly]));
  } else if (c.mode === 'breaks') {
    parts.push(
      part(
        [
          {
            referee: `No entry of the Counterweight library matched the manuscript closely, but its figures can be checked against ${lawsPhrase(c.breakLaws)}.`,
            examiner: `On the figures given in the application, the invention as claimed would be inoperable, and would therefore lack utility (industrial applicability), because it conflicts with ${c.breakLaws.length > 1 ? 'well-established laws' : 'a well-established law'} of physics, ${lawsPhrase(c.breakLaws)}.`,
            grant: `No entry of the Counterweight library matched the proposal closely, but the feasibility of the proposed work can be judged from its figures against ${lawsPhrase(c.breakLaws)}.`,
            journalist: `No entry of the Counterweight library matched this claim, but its own numbers can be checked against ${lawsExplained(c.breakLaws.length ? c.breakLaws : ['the conservation laws of physics'])[0]}.`,
          }[v],
        ],
        [],
      ),
    );
  } else {
    // Bare: no entry, no check.
    const none = c.figures ? 'the figures it gives are not enough for one of the standard checks' : 'it gives no figures with units on which a standard check could be run';
    parts.push(
      part(
        [
          {
            referee: `No entry of the Counterweight library matched the manuscript closely, and ${none}.`,
            examiner: `No entry of the Counterweight library matched the application, and ${none}; no objection under a conservation law is raised on this basis.`,
            grant: `No entry of the Counterweight library matched the proposal closely, and ${none}, so its feasibility cannot be judged against a conservation law from the text alone.`,
            journalist: `No entry of the Counterweight library matched this claim, and ${c.figures ? 'the numbers it gives are not enough for one of the standard checks' : 'it gives no numbers with units that a standard check could test'}.`,
          }[v],
        ],
        [],
      ),
    );
  }

  // Results that break (with any consistent ones beside them).
  if (c.mode === 'breaks') {
    parts.push(
      resultsPart((body) =>
        c.top || v !== 'examiner'
          ? ({ referee: `On ${own}: ${body}`, examiner: `On ${own}: ${body}`, grant: `Applied to ${own}: ${body}`, journalist: `With ${own}: ${body}` })[v]
          : body,
      ),
    );
  } else if (c.mode === 'entry' && !c.needs[0].length) {
    parts.push(
      part(
        [
          c.figures
            ? `The figures the ${doc} gives are not enough for one of the standard checks.`
            : `The ${doc} gives no figures with units on which a standard check could be run.`,
        ],
        [],
      ),
    );
  }
  if (c.assumptions.length) parts.push(part([`(Assumed beyond the text: ${c.assumptions.map(unstop).join('; ')}.)`], [], COST.assumptions));

  // The claim's own rejoinder, answered from the entry.
  if (c.reply && c.mode !== 'consistent') {
    const quoted = wordCount(c.reply.reply) <= 25 ? `“${unstop(plain(c.reply.reply))}”` : null;
    const say = (answer: string) =>
      ({
        referee: quoted ? `The manuscript raises a familiar point (${quoted}). ${answer}` : `The manuscript raises a familiar point. ${answer}`,
        examiner: quoted ? `The application's point (${quoted}) does not overcome this objection: ${lowerFirst(answer)}` : `The application's further argument does not overcome this objection: ${lowerFirst(answer)}`,
        grant: quoted ? `The proposal's point (${quoted}) has a standard answer: ${lowerFirst(answer)}` : `The proposal's argument has a standard answer: ${lowerFirst(answer)}`,
        journalist: quoted ? `A common reply is ${quoted}. The answer: ${answer}` : `There is a common reply, and a standard answer: ${answer}`,
      })[v];
    parts.push(part(c.reply.forms.map((f) => withCite(say(f), c.reply!.cite)), [COST.secondAnswerSentence], COST.reply));
  }

  // What the claimant should supply.
  if (v === 'examiner' && (c.mode === 'breaks' || c.mode === 'entry')) {
    parts.push(part(['The applicant is asked to supply evidence, such as test data, that the device operates as claimed.'], []));
  }
  const needs = needsSentence(c);
  if (needs.length) parts.push(part(needs, [COST.needsTitles, COST.fewerNeeds]));
  const qs = c.questions.slice(0, PARAGRAPH_QUESTIONS);
  if (qs.length) {
    parts.push(part([questionsSentence(c, qs, needs.length > 0), qs.length > 1 ? questionsSentence(c, qs.slice(0, 1), needs.length > 0) : null], [COST.secondQuestion], COST.firstQuestion));
  }

  // Closing.
  const breakLaws = lawsPhrase(c.breakLaws.length ? c.breakLaws : c.laws);
  const closing: Record<Mode, Record<ParagraphVariant, string[]>> = {
    breaks: {
      referee: [`As it stands, the central claim conflicts with ${breakLaws}, and the evidence presented does not support it.`, `As it stands, the claim conflicts with ${breakLaws}.`],
      examiner: ['Absent such evidence, the objection of inoperability is maintained.'],
      grant: ['As proposed, the objectives do not appear achievable, and the work is not feasible in its present form.', 'As proposed, the objectives do not appear achievable.'],
      journalist: ['Until independent tests show otherwise, this is best reported as an unconfirmed claim that conflicts with well-tested physics.', 'It is best reported as an unconfirmed claim.'],
    },
    entry: {
      referee: [`Until these points are addressed, the central claim conflicts with ${laws}, as the cited entry explains.`, `Until then, the claim conflicts with ${laws}.`],
      examiner: ['Absent such evidence, the objection of inoperability is maintained.'],
      grant: ['Unless these points are answered, the objectives do not appear achievable.'],
      journalist: ['Until independent tests show otherwise, this is best reported as an unconfirmed claim that conflicts with well-tested physics.', 'It is best reported as an unconfirmed claim.'],
    },
    consistent: {
      referee: ['These figures raise no difficulty of principle; what remains to be assessed is the quality of the measurements.', 'What remains is the quality of the measurements.'],
      examiner: ['On these figures, this law gives no ground for an objection to the invention as claimed.'],
      grant: ['On this point the objectives appear achievable in principle; feasibility turns on the methods and the measurements.', 'On this point the objectives appear achievable in principle.'],
      journalist: ['So the numbers break no law of physics; whether the device performs as stated is a question for independent measurement.', 'The numbers break no law of physics.'],
    },
    bare: {
      referee: ['The manuscript should state its central figures with their units and how they were measured.'],
      examiner: [],
      grant: ['The proposal should state its central figures with their units.'],
      journalist: ['It is worth asking for the measured figures, with their units, before reporting it.'],
    },
  };
  const close = closing[c.mode][v];
  if (close.length) parts.push(part(close, [COST.shorterClosing]));
  return parts;
}

export function relatedPart(c: Context, related: string[]): Part | null {
  if (!related.length || c.mode === 'consistent' || c.mode === 'bare') return null;
  return part([`Related objections are set out in ${list(related)}.`], [], COST.related);
}
