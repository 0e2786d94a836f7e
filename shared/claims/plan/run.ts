/**
 * Running the planned checks (shared/claims/plan.ts): each through runCheck, the same function as
 * the check screens, at the ends of its ranges most favourable to the claim, with the law it rests
 * on and its first sentence headed by the finding.
 */
import { textForFocus } from './items';
import { readableLayout } from '../reader/pdf-text';
import { checks } from '../../checks';
import { CheckInputError, runCheck, type CheckRun } from '../../checks/run';
import type { CheckName } from '../../checks/types';
import { printText } from '../print';
import type { ClaimCheckNeed, ClaimCheckRun, Figure, PlannedCheck } from '../types';
import { typed, type End, type Plan } from './basis';
import { FIGURE_SI_UNIT } from '../types';
import { planFor } from './planner';
import type { PlanContext } from './signals';

/** The law each check rests on, in words. */
const CHECK_LAW: Record<CheckName, string> = {
  'photon-bound': 'conservation of linear momentum',
  'break-even-speed': 'conservation of energy',
  carnot: 'the second law of thermodynamics',
  'first-law': 'conservation of energy (the first law of thermodynamics)',
  'momentum-ledger': 'conservation of linear momentum',
  'sideways-beam': 'conservation of linear momentum',
  'artifact-budget': 'conservation of linear momentum',
  'rocket-equation': 'conservation of linear momentum (the rocket equation)',
  'light-speed': 'special relativity',
  'faraday-yield': "conservation of charge (Faraday's law of electrolysis)",
  'nuclear-signature': 'conservation of energy (chemistry gives a few electronvolts per atom; more needs nuclear reactions and their radiation)',
  'road-load': 'conservation of energy',
  'light-converter-limits': 'the second law of thermodynamics (the radiative limits of light conversion)',
  landauer: "the second law of thermodynamics (Landauer's bound)",
};

/** How bad a run is for the claim (larger is worse): the check's ratio of claim to bound. */
function severity(run: CheckRun): number {
  const o = (name: string) => run.outputs.find((x) => x.name === name)?.si;
  switch (run.check) {
    case 'photon-bound':
    case 'light-speed':
      return o('ratio') ?? 0;
    case 'break-even-speed':
      return o('power_ratio') ?? 0;
    case 'carnot':
      return Math.max(0, ...run.outputs.filter((x) => x.name.endsWith('_ratio')).map((x) => x.si));
    case 'first-law': {
      const r = o('over_unity');
      if (r !== undefined) return r;
      return -(o('balance') ?? 0);
    }
    case 'rocket-equation':
      return o('dv_ratio') ?? -(o('dv') ?? 0);
    default:
      return run.verdict.holds ? 0 : 1;
  }
}

/** The first sentence of a verdict, numbers as in print, headed by the finding and its law. */
function sentenceOf(check: CheckName, run: CheckRun): string {
  const law = CHECK_LAW[check];
  const head = run.verdict.holds ? `Consistent with ${law}` : `Conflicts with ${law}`;
  const first = /^(.*?[.:;])(?:\s+[A-Z]|$)/s.exec(run.verdict.message)?.[1] ?? run.verdict.message;
  return `${head}: ${printText(first.replace(/[:;]$/, '.'), { bigIntegers: true })}`;
}

/** Characters a finding's figures may span, across a paragraph break, before they are said apart. */
const APART_CHARS = 500;

/** The figures' own words, quoted and joined ("“2 kW” and “41 MJ”"), when they are said apart; else null. */
/** A paper's section heading on a line of its own: "2 Experimental setup", "3. Results", "II. EXPERIMENTAL SETUP", "Methods". */
const PAPER_SECTION_RE =
  /^[^\S\n]*(?:(?:\d+(?:\.\d+)*\.?|[IVX]+\.)[^\S\n]+)?(?:abstract|introduction|methods?|materials and methods|experimental(?:[^\S\n]+(?:setup|set-up|details|arrangement|procedure))?|apparatus(?:[^\S\n]+and[^\S\n]+methods?)?|test[^\S\n]+(?:arrangement|set-?up|procedure)|(?:[\p{L}-]+[^\S\n]+)?results(?:[^\S\n]+and[^\S\n]+discussion)?|discussion|conclusions?)[^\S\n]*$/gimu;
function paperSections(text: string): number {
  return new Set([...text.matchAll(PAPER_SECTION_RE)].map((m) => m[0].trim().toLowerCase().replace(/^[\dIVX.]+\s+/iu, ''))).size;
}

function saidApart(text: string, uses: Figure[]): string | null {
  const placed = uses.filter((f) => f.start !== null && f.end !== null && !f.derived);
  if (placed.length < 2 || !text) return null;
  const lo = Math.min(...placed.map((f) => f.start!));
  const hi = Math.max(...placed.map((f) => f.end!));
  if (hi - lo <= APART_CHARS || !/\n[^\S\n]*\n/.test(text.slice(lo, hi))) return null;
  // (A paper's sections — methods, then results — report one study: its apparatus and its findings are
  // far apart by the paper's own order.)
  if (paperSections(text) >= 2) return null;
  const words = placed.map((f) => `“${f.text}”`);
  return words.length === 2 ? words.join(' and ') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/**
 * An input and an output the text ties together itself, wherever each is said: an excess stated with
 * the input ("4 W more heat than the 20 W it draws … the 24 W of total heat output") that the two differ by.
 */
function tiedByExcess(figures: Figure[], uses: Figure[]): boolean {
  const inF = uses.find((f) => f.role === 'in');
  const outF = uses.find((f) => f.role === 'out');
  if (!inF || !outF || inF.kind !== outF.kind) return false;
  return figures.some((f) => f.role === 'excess' && f.kind === inF.kind && Math.abs(inF.si + f.si - outF.si) <= 0.01 * outF.si);
}

/** Plans, run: each at the ends of its ranges most favourable to the claim. */
/**
 * The text's own words put the device within its bound ("well under the ideal for those temperatures",
 * "comfortably below its Carnot limit", "under the photon limit"): a reading that finds it past the bound
 * has more likely taken a figure of something else (in the corpus's tuning parts every text so worded is
 * of a lawful device), so the conflict waits for the reader's confirmation.
 */
const WITHIN_BOUND_RE =
  /(?<!(?:not|n't|never|cannot|can't|no longer|supposedly|claim(?:s|ed)? to (?:be|run|stay)|said to (?:be|run|stay))[^\S\n]+(?:(?:well|comfortably|safely|still|clearly|far|just|only)[^\S\n]+)?)(?:below|under|beneath|within|short of|inside)[^\S\n]+(?:(?:the|its|their|that|this|an?)[^\S\n]+)?(?:[\p{L}'’-]+[^\S\n]+){0,2}?(?:Carnot|ideal|theoretical|thermodynamic|reversible|photon)(?![^\S\n]+gas)(?:[^\S\n]+(?:limit|ceiling|bound|maximum|max|value|efficiency|COP|machine|engine|figure|one|cycle))?(?!\p{L})/iu;

const WITHIN_BOUND_ALL_RE = new RegExp(WITHIN_BOUND_RE.source, 'giu');
/** Before the words in their sentence: a condition or a demand, not a statement ("If … the efficiency comes out below the Carnot value"). */
const CONDITION_BEFORE_RE = /(?<!\p{L})(?:if|unless|once|until|whether|should|would|must|needs? to|has to|have to|required to|expected to|ought to|to show|to demonstrate)(?!\p{L})/iu;

/** The text's own words put the device at its bound, as theory gives it: "exactly as P/c says", "just what light pressure predicts". */
const AT_BOUND_RE =
  /(?<!\p{L})(?:exactly|just|precisely|right)[^\S\n]+(?:as|what)[^\S\n]+(?:P[^\S\n]*\/[^\S\n]*c|2P[^\S\n]*\/[^\S\n]*c|(?:the[^\S\n]+)?(?:photon|Carnot|ideal|theoretical)[^\S\n]+(?:limit|bound|value|formula)|light[^\S\n]+pressure|radiation[^\S\n]+pressure|(?:the[^\S\n]+)?theory|the[^\S\n]+rocket[^\S\n]+equation)[^\S\n]+(?:says|predicts|gives|allows|requires|expects)(?!\p{L})/iu;

function saidWithin(text: string, check: CheckName): string | null {
  if (check !== 'carnot' && check !== 'photon-bound' && check !== 'rocket-equation') return null;
  const at = AT_BOUND_RE.exec(text);
  if (at) return at[0];
  for (const m of text.matchAll(WITHIN_BOUND_ALL_RE)) {
    const from = Math.max(0, text.slice(0, m.index).search(/[^.!?\n]*$/u));
    if (!CONDITION_BEFORE_RE.test(text.slice(from, m.index))) return m[0];
  }
  return null;
}

/**
 * The text as the reader read it: a table's value rows with each cell after its column's label ("Turbine
 * output 12 kWh; Load 9 kWh" for "| 12 | 9 |") and a PDF's broken words joined, with the figures' places
 * moved to match — so the planner's words near a figure are its column's words, as they were the reader's.
 * The same figures (ids, quantities) otherwise; unchanged where the text has no such layout.
 */
export function asReadView(figures: Figure[], ctx: PlanContext): { figures: Figure[]; ctx: PlanContext } {
  if (!ctx.text) return { figures, ctx };
  const layout = readableLayout(ctx.text);
  if (!layout) return { figures, ctx };
  // (Each pasted offset to the last place of the read text it gave: a cell's value, not its label's words.)
  const at = new Map<number, number>();
  layout.toPasted.forEach((p, i) => at.set(p, i));
  const moved = figures.map((f) => {
    if (f.start === null || f.end === null) return f;
    const start = at.get(f.start);
    if (start === undefined) return f;
    return { ...f, start, end: start + (f.end - f.start) };
  });
  return { figures: moved, ctx: { ...ctx, text: layout.text } };
}

export function runClaimChecks(pasted: Figure[], pastedCtx: PlanContext = {}): { checks: ClaimCheckRun[]; needs: ClaimCheckNeed[]; notes: string[] } {
  const view = asReadView(pasted, pastedCtx);
  const figures = view.figures;
  // (Figures focused on one item of a list: the other items' words are no words of it.)
  const ctx = view.ctx.text ? { ...view.ctx, text: textForFocus(view.ctx.text, figures) } : view.ctx;
  const { plans, needs, notes } = planFor(figures, ctx);
  const out: ClaimCheckRun[] = [];
  for (const p of plans) {
    const def = checks[p.check];
    const ranged = p.uses.filter((f) => f.upper);
    let best: { run: CheckRun; inputs: Record<string, string>; ends: Map<Figure, End> } | null = null;
    let lastError: CheckInputError | null = null;
    const combos = 1 << Math.min(ranged.length, 5);
    for (let mask = 0; mask < combos; mask++) {
      const ends = new Map<Figure, End>(ranged.map((f, i) => [f, mask & (1 << i) ? 'high' : 'low']));
      const inputs = p.inputs((f) => ends.get(f) ?? 'low');
      try {
        const run = runCheck(p.check, inputs);
        if (!best || severity(run) < severity(best.run)) best = { run, inputs, ends };
      } catch (err) {
        if (!(err instanceof CheckInputError)) throw err;
        lastError = err;
      }
    }
    if (!best) {
      notes.push(`${def.title} could not be run on these figures: ${lastError?.message ?? 'the inputs are not valid'}`);
      continue;
    }
    // A conflict that vanishes within the last stated digit of the figures ("≈ 2.07 km/s" against a budget of
    // 2.068 km/s) is no conflict the figures show: the check is run again at the ends of their rounding most
    // favourable to the claim, and a run that keeps to the law there is the result.
    const roundedRun = !best.run.verdict.holds && barelyOver(best.run) ? withinRounding(p, best.ends) : null;
    if (roundedRun) best = { ...best, run: roundedRun.run, inputs: roundedRun.inputs };
    const assumptions = [...p.assumptions];
    if (roundedRun) assumptions.push(`The figures are read as rounded to their last stated digit (${roundedRun.said}); within that rounding the claim keeps to the law, so no conflict is said.`);
    for (const [f, end] of best.ends) {
      const chosen = end === 'high' ? f.upper!.display : f.display;
      assumptions.push(`The text gives a range, ${f.display} to ${f.upper!.display} ("${f.text}"); the end most favourable to the claim, ${chosen}, is used.`);
    }
    const { run, inputs } = best;
    // Figures of one finding said far apart, in different paragraphs of a long text, may be of
    // different things (a report's device and a load it mentions later): a law is not said broken on
    // them until the reader confirms they belong together (a re-run on figures the reader set has no
    // places in the text, so this does not apply to it).
    const apart = !run.verdict.holds && !tiedByExcess(figures, p.uses) ? saidApart(ctx.text ?? '', p.uses) : null;
    if (apart) {
      needs.push({
        check: p.check,
        title: def.title,
        missing: [`confirmation that ${apart} are figures of one device: they are said in different paragraphs, far apart`],
        why: `${p.why} Run on them, the check would find the claim in conflict with ${CHECK_LAW[p.check]}.`,
        uses: p.uses.map((f) => f.id),
      });
      continue;
    }
    // The text states a figure of its device within the law that this reading contradicts: no conflict
    // is said until the reader confirms which figures are the device's.
    if (!run.verdict.holds && p.within && ctx.text) {
      const words = p.uses.filter((f) => !f.derived && f.start !== null).map((f) => `“${f.text}”`);
      needs.push({
        check: p.check,
        title: def.title,
        missing: [
          `confirmation of which figures are the device's: read as its own, ${words.length ? words.join(' and ') : 'the figures used'} would find it in conflict with ${CHECK_LAW[p.check]}, but the text also states ${p.within.kind === 'efficiency' ? 'an efficiency of' : ''} “${p.within.text}”, which is within it`.replace(/  +/g, ' '),
        ],
        why: p.why,
        uses: p.uses.map((f) => f.id),
      });
      continue;
    }
    const within = !run.verdict.holds && ctx.text ? saidWithin(ctx.text, p.check) : null;
    if (within) {
      needs.push({
        check: p.check,
        title: def.title,
        missing: [`confirmation of which figures are the device's: the text itself says it is “${within}”, but read as the device's, these figures would find it in conflict with ${CHECK_LAW[p.check]}`],
        why: p.why,
        uses: p.uses.map((f) => f.id),
      });
      continue;
    }
    if (!run.verdict.holds && p.confirmIfBreaks) {
      needs.push({ check: p.check, title: def.title, missing: [p.confirmIfBreaks], why: `${p.why} Run on them, the check would find the claim in conflict with ${CHECK_LAW[p.check]}.`, uses: p.uses.map((f) => f.id) });
      continue;
    }
    out.push({
      check: p.check,
      inputs,
      uses: p.uses.map((f) => f.id),
      why: p.why,
      assumptions,
      title: def.title,
      outputs: run.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })),
      verdict: run.verdict,
      inputsUsed: run.inputs,
      permalink: `/checks/${p.check}?${Object.entries(inputs).map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')}`,
      law: CHECK_LAW[p.check],
      finding: run.verdict.holds ? 'consistent' : 'breaks',
      sentence: sentenceOf(p.check, run),
    });
  }
  // A long document with many figures (a report, a feature, worked examples): measured on such texts
  // written blind, the reader takes a figure of something else for the claim's far more often than in
  // a claim stated on its own (README, "How right it is"); the reader is told so, beside the result.
  if ((out.length > 0 || needs.length > 0) && longDocument(ctx.text ?? '', figures)) notes.unshift(LONG_DOCUMENT_NOTE);
  return { checks: out, needs, notes };
}

/** Said beside the result of a long document with many figures. */
export const LONG_DOCUMENT_NOTE =
  'A long text with many figures: a figure of something else (another device, a test rig, a critic’s estimate, a worked step) may have been read as the claim’s. Check the part each figure plays, and correct it, before citing a result.';

/** Over 1,200 characters or several paragraphs, with eight figures or more read from the text. */
function longDocument(text: string, figures: Figure[]): boolean {
  const placed = figures.filter((f) => f.start !== null && !f.derived).length;
  return placed >= 8 && (text.length > 1200 || (text.match(/\n[^\S\n]*\n/g) ?? []).length >= 2);
}

/** The plans as the contract's PlannedCheck (inputs at the lower ends): for tests and the screen. */
export function planChecks(pasted: Figure[], pastedCtx: PlanContext = {}): { planned: PlannedCheck[]; needs: ClaimCheckNeed[]; notes: string[] } {
  const { figures, ctx } = asReadView(pasted, pastedCtx);
  const { plans, needs, notes } = planFor(figures, ctx);
  return {
    planned: plans.map((p) => ({ check: p.check, inputs: p.inputs(() => 'low'), uses: p.uses.map((f) => f.id), why: p.why, assumptions: p.assumptions })),
    needs,
    notes,
  };
}

/**
 * Half a unit of a figure's last stated digit, in SI ("2.07 km/s" → 5 m/s, "25 °C" → 0.5 K, "350 %" → 0.005), or
 * 0 where the text gives no digits to go by (a spelt number, a derived figure).
 */
export function roundingOf(f: Figure): number {
  if (f.derived || f.upper || !f.text) return 0;
  const m = /(\d+(?:[.,]\d+)*)(?:[^\S\n]*(?:[×x·][^\S\n]*10[^\S\n]*(?:\^[^\S\n]*)?([-−⁻]?[\d⁰¹²³⁴⁵⁶⁷⁸⁹]+)|[eE]([-−]?\d+)))?/u.exec(f.text);
  if (!m) return 0;
  const digits = m[1];
  // Which separator is the decimal one: the last of two kinds ("1,234.5", "1.234,5"); a comma alone before groups
  // of three digits is a thousands mark ("2,400"), as are dots in two groups or more ("1.234.567").
  const lastSep = Math.max(digits.lastIndexOf('.'), digits.lastIndexOf(','));
  const both = digits.includes('.') && digits.includes(',');
  const grouped = (!both && /^\d{1,3}(?:,\d{3})+$/u.test(digits)) || /^\d{1,3}(?:\.\d{3}){2,}$/u.test(digits);
  const decimalAt = lastSep >= 0 && !grouped ? lastSep : -1;
  const decimals = decimalAt >= 0 ? digits.length - decimalAt - 1 : 0;
  const value = Number(decimalAt >= 0 ? digits.slice(0, decimalAt).replace(/[.,]/gu, '') + '.' + digits.slice(decimalAt + 1) : digits.replace(/[.,]/gu, ''));
  const sup: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '−': '-' };
  const expText = (m[2] ?? m[3] ?? '0').replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁻−]/gu, (c) => sup[c] ?? c);
  const exp = Number(expText);
  const stated = value * 10 ** exp;
  if (!(stated > 0) || !Number.isFinite(exp)) return 0;
  const half = 0.5 * 10 ** (exp - decimals);
  // (Only a figure stated to three significant digits or more — half its last digit at most 0.5 % of it: "2 kW"
  // may be exact, and a rounding of a quarter of it would excuse any claim.)
  if (half / stated > 0.005) return 0;
  if (f.kind === 'temperature' || f.kind === 'temperature-difference') return half * (/°[^\S\n]*F|fahrenheit/iu.test(f.text) ? 5 / 9 : 1);
  return half * Math.abs(f.si / stated);
}

/**
 * A conflict by a hair: the check's ratio to its bound at most 0.3 % above one — what figures rounded to three
 * significant digits can make of a claim worked out right at the bound ("≈ 3.06 km/s" from 318 s and ln(2400/900)).
 * A rule of thumb (common practice, no source).
 */
const BARELY = 0.003;
/** Outputs that are a claim over its bound (1 at the bound). */
const BOUND_RATIOS = ['over_unity', 'ratio', 'eta_ratio', 'cop_heating_ratio', 'cop_cooling_ratio', 'dv_ratio', 'dv_relativistic_ratio'];
function barelyOver(run: CheckRun): boolean {
  const ratios = run.outputs.filter((o) => BOUND_RATIOS.includes(o.name));
  return ratios.length > 0 && ratios.every((o) => o.si <= 1 + BARELY);
}

/** The plan run again with its figures at the ends of their rounding (all combinations, up to six figures); the first run that keeps to the law. */
function withinRounding(p: Plan, ends: Map<Figure, End>): { run: CheckRun; inputs: Record<string, string>; said: string } | null {
  const nudged = p.uses.filter((f) => roundingOf(f) > 0).slice(0, 6);
  if (nudged.length === 0) return null;
  const saved = nudged.map((f) => ({ f, quantity: f.quantity, si: f.si }));
  try {
    for (let mask = 0; mask < 1 << nudged.length; mask++) {
      nudged.forEach((f, i) => {
        const si = saved[i].si + (mask & (1 << i) ? 1 : -1) * roundingOf({ ...f, si: saved[i].si });
        f.si = si;
        f.quantity = typed(si, FIGURE_SI_UNIT[f.kind]);
      });
      try {
        const inputs = p.inputs((f) => ends.get(f) ?? 'low');
        const run = runCheck(p.check, inputs);
        if (run.verdict.holds) return { run, inputs, said: nudged.map((f) => `“${f.text}”`).join(', ') };
      } catch (err) {
        if (!(err instanceof CheckInputError)) throw err;
      }
    }
    return null;
  } finally {
    for (const { f, quantity, si } of saved) {
      f.quantity = quantity;
      f.si = si;
    }
  }
}
