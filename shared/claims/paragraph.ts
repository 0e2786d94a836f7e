/**
 * The paragraph of a claim check (issue 11, item 4): plain, courteous prose that a referee, a patent
 * examiner, a grant reviewer or a journalist can paste, each in the wording of that practice. It
 * speaks of the claim and its mechanism, never of the people making it. It
 *  - names the best-matching entry (title, version, permanent URL, a numbered reference) and the
 *    law or laws it rests on;
 *  - gives one sentence per check run on the text's own figures (the planner's `sentence`, or one
 *    built from the outputs), numbers as in print ("1.78 × 10⁵", never "10^5");
 *  - answers the claim's own rejoinder when the entry has a reply to it (matchReply below);
 *  - lists what the claimant should supply: the figures the checks still need, and up to two of the
 *    entry's questions;
 *  - when every check run is consistent with its law, says so in those words and does not place
 *    the device in a class that cannot work; with no match and no check, says that plainly;
 *  - never pastes the entry's lay "in brief" text;
 *  - stays within PARAGRAPH_WORDS_MAX words before the references: each part has shorter forms,
 *    and the least needed parts are shortened or left out first (see trim()).
 * References are numbered in order of first citation and formatted by citation-js in APA,
 * Vancouver or Harvard: the Counterweight entry versions and up to two of the top entry's sources.
 */
import { formatCitation, type CitationStyle, type CslItem } from '../entries/citations';
import { wordCount } from '../entries/schema';
import { formatPrint, printText } from './print';
import {
  PARAGRAPH_VARIANTS,
  type ClaimCheckNeed,
  type ClaimCheckRun,
  type ClaimMatch,
  type ClaimParagraph,
  type Figure,
  type ParagraphReference,
  type ParagraphVariant,
} from './types';

export interface ParagraphEntry {
  match: ClaimMatch;
  /** The entry version as a CSL item (server/routes/entries.ts citedItem). */
  item: CslItem;
  /** The entry's own sources (CSL), cited for the physics. */
  sources: CslItem[];
  /** The entry's questions to ask of a claim. */
  questions: string[];
  /** The names of the conservation laws the entry rests on ("Conservation of linear momentum"). */
  laws: string[];
  /** The entry's common replies and their answers. */
  replies: { reply: string; answer: string }[];
}

export interface ParagraphsInput {
  /** Matched entries, best first: the first is named, up to PARAGRAPH_RELATED more are mentioned. */
  entries: ParagraphEntry[];
  checks: ClaimCheckRun[];
  /** Checks that need a figure the text does not give. */
  needs: ClaimCheckNeed[];
  figures: Figure[];
  /** The pasted text (for the claim's own rejoinders). */
  text: string;
  style: CitationStyle;
}

/** One paragraph; `needs`, `text` and `variant` may be left out (none, '' and 'referee'). */
export interface ParagraphInput extends Omit<ParagraphsInput, 'needs' | 'text'> {
  needs?: ClaimCheckNeed[];
  text?: string;
  variant?: ParagraphVariant;
}

/** Most words of the paragraph before its references (counted as schema.ts wordCount counts them). */
export const PARAGRAPH_WORDS_MAX = 180;
/** How many of the top entry's sources and questions the paragraph uses, and how many other entries it mentions. */
export const PARAGRAPH_SOURCES = 2;
export const PARAGRAPH_QUESTIONS = 2;
export const PARAGRAPH_RELATED = 2;
/** Most words taken from the answer to a reply (one or two whole sentences). */
export const REPLY_ANSWER_WORDS = 60;

// ---------------------------------------------------------------------------------------------
// Words

const sentence = (s: string) => {
  const t = s.trim();
  return /[.!?…]["”’)]?$/.test(t) ? t : `${t}.`;
};
const unstop = (s: string) => s.trim().replace(/[.;:,]+$/, '');
const list = (items: string[]) => (items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`);
const quoteTitle = (t: string) => `“${t}”`;
/** A marker placed before the sentence's last stop: "… stays inside [1]." */
const withCite = (s: string, cite: string) => (cite ? sentence(s).replace(/([.!?…]["”’)]?)$/, ` ${cite}$1`) : sentence(s));
/** "Photon-rocket bound" → "photon-rocket bound"; "P/c" and "COP" stay as they are. */
const lowerFirst = (s: string) => (/^[A-Z][a-z\s]/.test(s) ? s[0].toLowerCase() + s.slice(1) : s);
const upperFirst = (s: string) => (s ? s[0].toUpperCase() + s.slice(1) : s);

/**
 * A law's name as it reads inside a sentence: "Conservation of linear momentum" → "conservation of
 * linear momentum", "Second law of thermodynamics" → "the second law of thermodynamics".
 */
export function lawInProse(name: string): string {
  const t = lowerFirst(unstop(name));
  return /^(zeroth|first|second|third) law\b/i.test(t) ? `the ${t}` : t;
}

const sameLaw = (a: string) => lawInProse(a).replace(/^the /, '').replace(/\s*\(.*\)$/, '').toLowerCase();
function uniqueLaws(names: string[]): string[] {
  const seen = new Set<string>();
  const out: string[] = [];
  for (const n of names) {
    if (!n?.trim()) continue;
    const k = sameLaw(n);
    if (seen.has(k)) continue;
    seen.add(k);
    out.push(lawInProse(n));
  }
  return out;
}

/** Each law in a few plain words, for the journalist's note (no jargon unexplained). */
const LAW_PLAINLY: [RegExp, string][] = [
  [/angular momentum/i, 'nothing can set itself spinning on its own'],
  [/momentum/i, 'nothing can push itself along without pushing something else back'],
  [/second law|entropy|thermodynamics/i, 'heat does work only while it flows from hot to cold'],
  [/energy|first law/i, 'no machine gives out more energy than it takes in'],
  [/charge/i, 'electric charge is never made or destroyed'],
];
const plainly = (law: string) => LAW_PLAINLY.find(([re]) => re.test(law))?.[1];

/** Markdown and TeX delimiters off (the words and symbols kept), whitespace folded. */
const plain = (md: string) =>
  md
    .replace(/\$\$?([^$]+?)\$\$?/g, '$1')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/[*`]+/g, '')
    .replace(/\s+/g, ' ')
    .trim();

const sentencesOf = (text: string) =>
  plain(text)
    .split(/(?<=[.!?])\s+(?=[A-Z“"‘'(])/)
    .map((s) => s.trim())
    .filter(Boolean);

// ---------------------------------------------------------------------------------------------
// The claim's own rejoinder

/** Function words and the filler of replies ("we", "our", "so", "cannot"), left out of the comparison. */
const REPLY_STOP = new Set(
  (
    'a about above after again against all also always am an and any are as at be because been before being below between both but by ' +
    'can cannot could did do does doing done down during each either even ever every few for from further get gets got had has have ' +
    'having here how however i if in into is it its itself just let like made make makes many may me might more most much must my ' +
    'never no nor not now of off on once one only onto or other our ours ourselves out over own per same should so some such than that ' +
    'the their theirs them then there therefore these they this those through thus to too under until up upon us very was we were what ' +
    'when where whether which while who whom why will with within without would yet you your'
  ).split(' '),
);

/**
 * The trade's spellings of one idea, folded to one token before comparing: "quality factor",
 * "Q factor", "Q-factor" and a lone "Q" are all the resonator's quality factor.
 */
const REPLY_SYNONYMS: [RegExp, string][] = [
  [/\b(?:quality|q)[\s-]*factors?\b/g, ' qfactor '],
  [/\bq\b/g, ' qfactor '],
  [/\bover[\s-]+unity\b/g, ' overunity '],
  [/\bzero[\s-]+point\b/g, ' zeropoint '],
  [/\bperpetual[\s-]+motion\b/g, ' perpetualmotion '],
];

/**
 * The content words of a text as comparison keys: folded to lower case without diacritics, trade
 * synonyms joined, function words and single letters and numbers dropped, a plural "-s"/"-ies"
 * folded, then cut to their first six letters so that "multiplies", "multiplied" and
 * "multiplication" meet (as do "magnet", "magnets" and "magnetic").
 */
export function contentKeys(text: string): Set<string> {
  let t = text.normalize('NFD').replace(/\p{M}+/gu, '').toLowerCase();
  for (const [re, to] of REPLY_SYNONYMS) t = t.replace(re, to);
  const keys = new Set<string>();
  for (const raw of t.match(/[\p{L}\p{N}]+/gu) ?? []) {
    if (raw.length < 2 || REPLY_STOP.has(raw) || !/\p{L}/u.test(raw)) continue;
    let w = raw;
    if (w.length > 4 && w.endsWith('ies')) w = `${w.slice(0, -3)}y`;
    else if (w.length > 3 && w.endsWith('s') && !/(ss|us|is)$/.test(w)) w = w.slice(0, -1);
    keys.add(w.slice(0, 6));
  }
  return keys;
}

/** Fraction of a reply's content words the text must share, and the fewest shared words. */
export const REPLY_SHARE_MIN = 0.6;
export const REPLY_SHARED_WORDS_MIN = 2;

export interface ReplyMatch {
  reply: string;
  answer: string;
  /** The reply's content keys found in the text. */
  shared: string[];
  /** shared / the reply's content keys. */
  share: number;
}

/** Sentences of a pasted text: split at a full stop, question or exclamation mark, semicolon or line break. */
const textSentences = (text: string) =>
  text
    .split(/(?<=[.!?;])\s+|\n+/)
    .map((s) => s.trim())
    .filter(Boolean);

/**
 * The reply a text raises, if any. A reply is raised when some stretch of the text — one sentence,
 * or two in a row — shares at least REPLY_SHARE_MIN of the reply's content words and at least
 * REPLY_SHARED_WORDS_MIN of them; of the replies raised, the one with the largest share wins (ties:
 * more words shared, then the entry's order). Asking for the words together, in one place, keeps a
 * long text that uses the subject's common words here and there ("thrust", "energy", "law") from
 * raising a reply it never makes.
 */
export function matchReply(text: string, replies: { reply: string; answer: string }[]): ReplyMatch | null {
  if (!text.trim() || !replies.length) return null;
  const sentences = textSentences(text).map(contentKeys);
  const stretches = sentences.map((keys, i) => (i + 1 < sentences.length ? new Set([...keys, ...sentences[i + 1]]) : keys));
  let best: ReplyMatch | null = null;
  for (const r of replies) {
    const keys = [...contentKeys(plain(r.reply))];
    if (keys.length < REPLY_SHARED_WORDS_MIN) continue;
    for (const inText of stretches) {
      const shared = keys.filter((k) => inText.has(k));
      const share = shared.length / keys.length;
      if (shared.length < REPLY_SHARED_WORDS_MIN || share < REPLY_SHARE_MIN) continue;
      if (!best || share > best.share || (share === best.share && shared.length > best.shared.length)) best = { reply: r.reply, answer: r.answer, shared, share };
    }
  }
  return best;
}

/** The answer's first sentence or first two, as the longer and shorter forms the paragraph may use. */
function answerForms(answer: string): string[] {
  const s = sentencesOf(answer);
  const forms: string[] = [];
  if (s.length >= 2 && wordCount(`${s[0]} ${s[1]}`) <= REPLY_ANSWER_WORDS) forms.push(`${s[0]} ${s[1]}`);
  // One sentence alone only when it says something by itself ("It can, once." does not).
  if (s.length >= 1 && wordCount(s[0]) >= 8 && wordCount(s[0]) <= REPLY_ANSWER_WORDS) forms.push(s[0]);
  return forms;
}

// ---------------------------------------------------------------------------------------------
// Results

const breaks = (run: ClaimCheckRun) => (run.finding ?? (run.verdict.holds ? 'consistent' : 'breaks')) === 'breaks';

/** Computed numbers as in print: powers of ten in superscripts, long whole numbers ("177806") in scientific form. */
const printed = (s: string) => printText(s, { bigIntegers: true });

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

// ---------------------------------------------------------------------------------------------
// References: markers are placed as tokens and numbered only once the paragraph is final, so that
// a part left out for length leaves no number behind.

const OPEN = '\uE000';
const SEP = '\uE001';
const CLOSE = '\uE002';
const TOKEN = /\uE000([^\uE002]*)\uE002/g;

class Citer {
  readonly items = new Map<string, { item: CslItem; counterweight: boolean }>();
  cite(items: CslItem[], counterweight: boolean): string {
    if (!items.length) return '';
    for (const item of items) if (!this.items.has(item.id)) this.items.set(item.id, { item, counterweight });
    return `${OPEN}${items.map((i) => i.id).join(SEP)}${CLOSE}`;
  }
}

/** Numbers the markers in order of first appearance: "[1]", "[2, 3]". */
function number(text: string): { body: string; order: string[] } {
  const order: string[] = [];
  const body = text.replace(TOKEN, (_m, ids: string) => {
    const ns = ids.split(SEP).map((id) => {
      let at = order.indexOf(id);
      if (at < 0) at = order.push(id) - 1;
      return at + 1;
    });
    return `[${[...new Set(ns)].sort((a, b) => a - b).join(', ')}]`;
  });
  return { body, order };
}

// ---------------------------------------------------------------------------------------------
// Parts and their shorter forms

interface Part {
  /** Fullest form first; '' means left out. */
  forms: string[];
  /** For each step from forms[i] to forms[i + 1]: the lower, the sooner it is taken when too long. */
  steps: number[];
  at: number;
}

/** A part from its forms: each step costs `costs[i]`; `optional` adds a last step to ''. */
function part(forms: (string | null | undefined)[], costs: number[], optional: number | null = null): Part {
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

const render = (parts: Part[]) =>
  parts
    .map((p) => p.forms[p.at])
    .filter(Boolean)
    .join(' ')
    .replace(/\s+/g, ' ')
    .trim();

/** Shortens the cheapest part, step by step, until the paragraph is within the word limit. */
function trim(parts: Part[]): string {
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
const COST = {
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

// ---------------------------------------------------------------------------------------------
// The paragraph

type Mode = 'breaks' | 'consistent' | 'entry' | 'bare';

/** How each practice names the document and speaks to it. */
const DOC: Record<ParagraphVariant, { doc: string; own: string }> = {
  referee: { doc: 'manuscript', own: "the manuscript's own figures" },
  examiner: { doc: 'application', own: 'the figures given in the application' },
  grant: { doc: 'proposal', own: "the proposal's own figures" },
  journalist: { doc: 'claim', own: "the claim's own numbers" },
};

interface Context {
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

const lawsPhrase = (laws: string[]) => list(laws.length ? laws : ['the conservation laws of physics']);

/** The laws with their plain words (journalist): every law, the first only, none. */
function lawsExplained(laws: string[]): string[] {
  // "conservation of energy (first law)" → "conservation of energy (no machine gives out …)".
  const explain = (l: string) => (plainly(l) ? `${l.replace(/\s*\([^)]*\)$/, '')} (${plainly(l)})` : l);
  return [list(laws.map(explain)), list(laws.map((l, i) => (i === 0 ? explain(l) : l))), list(laws)];
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

function buildParts(c: Context): Part[] {
  const v = c.variant;
  const { doc, own } = DOC[v];
  const parts: Part[] = [];
  const laws = lawsPhrase(c.laws);
  const plural = c.laws.length > 1;
  const resultsText = (n: number) => c.results.slice(0, n).join(' ');
  const resultsPart = (lead: (body: string) => string) => {
    const forms = c.results.map((_, i) => lead(resultsText(c.results.length - i)));
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

function relatedPart(c: Context, related: string[]): Part | null {
  if (!related.length || c.mode === 'consistent' || c.mode === 'bare') return null;
  return part([`Related objections are set out in ${list(related)}.`], [], COST.related);
}

/** The paragraphs of all four variants (each reference is formatted once for all four). */
export function buildParagraphs(input: ParagraphsInput): Record<ParagraphVariant, ClaimParagraph> {
  const formatted = new Map<string, string>();
  return Object.fromEntries(PARAGRAPH_VARIANTS.map((variant) => [variant, paragraph({ ...input, variant }, formatted)])) as Record<ParagraphVariant, ClaimParagraph>;
}

/** One paragraph, of `variant` (default 'referee'). */
export function buildParagraph(input: ParagraphInput): ClaimParagraph {
  return paragraph(input, new Map());
}

function paragraph(input: ParagraphInput, formatted: Map<string, string>): ClaimParagraph {
  const { entries, checks, figures, style } = input;
  const needs = input.needs ?? [];
  const text = input.text ?? '';
  const variant = input.variant ?? 'referee';
  const citer = new Citer();
  const [top, ...others] = entries;

  const topCite = top ? citer.cite([top.item], true) : '';
  const src = top ? citer.cite(top.sources.slice(0, PARAGRAPH_SOURCES), false) : '';
  const entryName = top ? `the Counterweight entry ${quoteTitle(top.match.title)}, version ${top.match.version} (${top.match.url}) ${topCite}` : '';
  const related = others.slice(0, PARAGRAPH_RELATED).map((e) => `${quoteTitle(e.match.title)}, version ${e.match.version} (${e.match.url}) ${citer.cite([e.item], true)}`);

  const broken = checks.filter(breaks);
  const ok = checks.filter((r) => !breaks(r));
  const mode: Mode = broken.length ? 'breaks' : checks.length ? 'consistent' : top ? 'entry' : 'bare';
  const entryLaws = uniqueLaws(top?.laws ?? []);
  const breakLaws = uniqueLaws(broken.map((r) => r.law));
  const okLaws = uniqueLaws(ok.map((r) => r.law));
  const laws = entryLaws.length ? entryLaws : breakLaws;
  const fallbackLaw = lawsPhrase(laws.length ? laws : okLaws);
  // Results that break first, each once, numbers as in print.
  const ordered = [...broken, ...ok];
  // Said with each result, unless every result is consistent (the paragraph then names the law once, around them).
  const results = ordered.map((r) => resultSentence(r, fallbackLaw, mode !== 'consistent'));
  const assumptions = [...new Set(ordered.flatMap((r) => r.assumptions ?? []).map((a) => printed(a)))];

  const m = top ? matchReply(text, top.replies ?? []) : null;
  const forms = m ? answerForms(m.answer) : [];
  const reply = m && forms.length ? { reply: m.reply, forms, cite: topCite } : null;

  const missing = [...new Set(needs.flatMap((n) => n.missing.map((w) => unstop(w))).filter(Boolean))];
  const withTitles = needs.map((n) => `${list(n.missing.map(unstop))} (for the ${lowerFirst(unstop(n.title))} check)`).filter((s) => !s.startsWith(' ('));
  const c: Context = {
    variant,
    mode,
    top,
    entryName,
    src: src ? ` ${src}` : '',
    laws,
    breakLaws,
    okLaws,
    results,
    assumptions,
    reply,
    needs: [withTitles.length ? withTitles : missing, missing, missing.slice(0, 3)],
    questions: (top?.questions ?? []).map((q) => q.trim()).filter(Boolean),
    figures: figures.length,
  };

  const parts = buildParts(c);
  const rel = top ? relatedPart(c, related) : null;
  if (rel) parts.splice(1, 0, rel);
  const { body, order } = number(trim(parts));
  const references: ParagraphReference[] = order.map((id, i) => {
    const r = citer.items.get(id)!;
    let text = formatted.get(id);
    if (text === undefined) formatted.set(id, (text = formatCitation(r.item, style, 'text')));
    return { n: i + 1, id, counterweight: r.counterweight, text };
  });
  const copy = references.length ? `${body}\n\nReferences\n${references.map((r) => `${r.n}. ${r.text}`).join('\n')}\n` : `${body}\n`;
  return { variant, style, body, references, text: copy };
}
