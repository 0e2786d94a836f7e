/**
 * The figures of a pasted claim (issue 6, item 4b): "0.2 lbf", "1.5 kilowatts", "300 °C", "an
 * efficiency of 45%", "COP of 7", with their kind, SI value and role (in/out, hot/cold,
 * heating/cooling) read from the words around them.
 *
 * How it reads a text, in two passes:
 *  1. Every number is found (signs "-", "−"; decimals; English thousands separators "1,500";
 *     "3.4e5", "3.4 × 10^5", "2.5×10⁻³"), and what follows it is looked up in the unit vocabulary
 *     (figures-vocabulary.ts): symbols with their case, words in any case, the longest form winning,
 *     and the unit must not run on into a letter or digit, nor into "/x", "·x", "-x" (a symbol) or
 *     " per " ("5 W/m²", "20 mN/W", "5 N·m", "10 kW per tonne" are not powers or thrusts).
 *  2. Each number becomes a figure or is dropped:
 *     - with a unit: a figure of the unit's kind;
 *     - with "%" or "percent": an efficiency when "efficiency"/"η" comes before it in the same
 *       clause ("an efficiency of 45%") or "efficient"/"efficiency" just after it ("45 % efficient");
 *       other percentages are dropped;
 *     - bare: a COP right after "COP"/"coefficient of performance" ("COP of 7", "COP = 4"), an
 *       efficiency right after "efficiency" ("an efficiency of 0.62"); other bare numbers are dropped.
 *     Numbers after a label word ("Figure 2 A", "Section 3.2", "p. 12", "Eq. 4", "§ 3") are not
 *     figures, nor is a year followed by a one-letter symbol and a full stop or comma ("in 2019 A. N.
 *     Other" is an initial, not 2019 amperes).
 *  Ranges ("10–20 mN", "10 to 20 mN", "between 10 and 20 mN", "40–50 %") give TWO figures, one for
 *  each end, both of the range's kind; the first end's `text` is its number alone ("10"), since the
 *  unit is written once after the second. The planner takes the first (the lower end). The two ends
 *  share a role. "1.2 ± 0.3 mN" is one figure (1.2 mN) whose text spans the uncertainty; the
 *  uncertainty in "1.2 mN ± 0.3 mN" is not a figure.
 *
 * Roles: power and energy 'in'/'out', temperature 'hot'/'cold' from the first words after the figure
 * ("2 kW of input", "20 °C ambient", "300 °C source"), else the nearest role word before it, looked
 * for back to the previous figure or the start of the sentence (at most 80 characters). A COP is
 * 'cooling' when cooling words are within 120 characters, else 'heating' for heating words, else null.
 * When no word says, the role is null (the planner takes the higher of two temperatures as hot).
 *
 * Units mathjs does not know are converted in `quantity`: "mph" is written "mi/h"; calories (mathjs
 * 15 has none) are thermochemical calories, 4.184 J ("1 cal" → "4.184 J", "2 kcal" → "8.368 kJ");
 * grams of thrust are written in kgf. "ton(s)" are not read (short, long or refrigeration ton).
 */
import { QuantityError, formatQuantity, parseQuantity } from '../worksheet/quantity';
import {
  BARE_CONNECTORS,
  COP_COOLING,
  COP_HEATING,
  EFFICIENCY_CHANGE_WORDS,
  LABEL_WORDS,
  POWER_ENERGY_ROLES,
  TEMPERATURE_ROLES,
  UNIT_FORMS,
  type RoleWords,
  type UnitForm,
} from './figures-vocabulary';
import { FIGURE_KINDS, FIGURE_SI_UNIT, type Figure, type FigureInput, type FigureKind, type FigureRole } from './types';

// ---------------------------------------------------------------------------------------------
// The unit vocabulary, compiled

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
const symbolKey = (s: string) => s.replace(/\s+/g, '');
const wordKey = (s: string) => s.toLowerCase().split(/[\s-]+/).join(' ');
const byLength = (a: string, b: string) => b.length - a.length;

const SYMBOLS = new Map<string, UnitForm>();
const WORDS = new Map<string, UnitForm>();
for (const form of UNIT_FORMS) {
  for (const s of form.symbols ?? []) {
    const prior = SYMBOLS.get(symbolKey(s));
    if (prior && prior !== form) throw new Error(`figures-vocabulary: the symbol "${s}" is listed twice`);
    SYMBOLS.set(symbolKey(s), form);
  }
  for (const w of form.words ?? []) {
    const prior = WORDS.get(wordKey(w));
    if (prior && prior !== form) throw new Error(`figures-vocabulary: the word "${w}" is listed twice`);
    WORDS.set(wordKey(w), form);
  }
}

/** Between a number and its unit: up to three spaces (not a line break), or a hyphen ("a 2-A current"). */
const SEP = '(?:[^\\S\\n]{1,3}|-)?';
const symbolAlts = UNIT_FORMS.flatMap((f) => f.symbols ?? [])
  .sort(byLength)
  .map((s) => escapeRe(s).replace(/ /g, '\\s?'))
  .join('|');
const wordAlts = UNIT_FORMS.flatMap((f) => f.words ?? [])
  .sort(byLength)
  .map((w) => w.split(/[\s-]+/).map(escapeRe).join('[\\s-]+'))
  .join('|');
/** A symbol must not run on into a letter, digit, power or a compound ("W/m²", "N·m", "K-type"). */
const SYMBOL_RE = new RegExp(`${SEP}(${symbolAlts})(?![\\p{L}\\p{N}_²³⁻\\^]|[-·⋅/][^\\S\\n]*[\\p{L}\\p{N}]|\\s+per\\s)`, 'uy');
const WORD_RE = new RegExp(`${SEP}(${wordAlts})(?![\\p{L}\\p{N}_]|[/·⋅][^\\S\\n]*\\p{L}|\\s+per\\s)`, 'iuy');
const PERCENT_RE = /[^\S\n]{0,2}(?:%|per[ -]?cent(?!\p{L}))/iuy;

/** A number: sign, digits (English thousands separators allowed), decimals, then e-notation or × 10^n. */
const NUMBER_RE =
  /(?<![\p{L}\p{N}_.,/^])([-−–+](?=\d))?(\d{1,3}(?:,\d{3})+(?!\d)|\d+)(\.\d+)?(?:[eE]([-+−]?\d+)|[^\S\n]*[×x·⋅*][^\S\n]*10[^\S\n]*(?:\^[^\S\n]*([-+−]?\d+)|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)))?/gu;

const SUPERSCRIPT_DIGITS: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '⁺': '' };

const alt = (words: readonly string[]) => words.join('|');
const LABEL_RE = new RegExp(`(?:(?<!\\p{L})(?:${alt(LABEL_WORDS)})|[§#¶])[^\\S\\n]*$`, 'iu');
const PLUS_MINUS_RE = /(?:±|\+\/-|\+-)[^\S\n]*$/u;

const CONNECT = `(?:[^\\S\\n]*(?:[=:≈~]|(?:${alt(BARE_CONNECTORS)})(?!\\p{L})))*[^\\S\\n]*`;
const COP_SYMBOL_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:COPs?|C\\.O\\.P\\.?)(?:[^\\S\\n]*\\(COP\\))?${CONNECT}$`, 'u');
const COP_WORDS_BEFORE_RE = new RegExp(`(?<!\\p{L})coefficients?[\\s-]+of[\\s-]+performance(?:[^\\S\\n]*\\(COP\\))?${CONNECT}$`, 'iu');
const EFFICIENCY_BARE_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:efficienc(?:y|ies)|η)(?!\\p{L})${CONNECT}$`, 'iu');
/** "efficiency … 45%": the keyword, then up to 60 characters without digits or a sentence break. */
const EFFICIENCY_PERCENT_BEFORE_RE = /(?<!\p{L})(?:efficienc(?:y|ies)|η)(?!\p{L})([^\d.;!?\n]{0,60})$/iu;
const EFFICIENCY_CHANGE_RE = new RegExp(`(?<!\\p{L})(?:${alt(EFFICIENCY_CHANGE_WORDS)})(?!\\p{L})`, 'iu');
/** "45 % efficient", "45% conversion efficiency", "45 %-efficient" (not "45% less efficient"). */
const EFFICIENCY_AFTER_RE = /[^\S\n]*-?[^\S\n]*(?:(?!(?:less|more|higher|lower|better|worse|of)(?!\p{L}))\p{L}+[^\S\n]+){0,2}efficien(?:t|cy|cies)(?!\p{L})/iuy;

/** Words that may stand between a figure and the role word after it ("2 kW of electrical input"). */
const AFTER_FILLER =
  '(?:(?:of|the|electrical|electric|thermal|mechanical|heat|net|total|useful|shaft|continuous|peak|rated|gross|average|mean|power|energy)[\\s-]+){0,2}';

interface CompiledRoles {
  groups: readonly RoleWords[];
  before: RegExp;
  after: RegExp;
}

function compileRoles(groups: readonly RoleWords[]): CompiledRoles {
  const named = (key: 'before' | 'after') => groups.map((g, i) => `(?<r${i}>${alt(g[key])})`).join('|');
  return {
    groups,
    before: new RegExp(`(?<!\\p{L})(?:${named('before')})(?!\\p{L})`, 'giu'),
    after: new RegExp(`[^\\S\\n]*-?${AFTER_FILLER}(?:${named('after')})(?!\\p{L})`, 'iuy'),
  };
}

const POWER_ENERGY = compileRoles(POWER_ENERGY_ROLES);
const TEMPERATURE = compileRoles(TEMPERATURE_ROLES);
/** "1.5 kW in, 3 kW out": a bare in/out right after the figure, ending the clause. */
const IN_OUT_AFTER_RE = /[^\S\n]*(in|out)(?=[^\S\n]*(?:[,;.!?)\]\n]|$))/iy;
const COP_COOLING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_COOLING)})(?!\\p{L})`, 'iu');
const COP_HEATING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_HEATING)})(?!\\p{L})`, 'iu');
const COP_WINDOW = 120;
const BEFORE_WINDOW = 80;
const SENTENCE_BREAK_RE = /[.!?;](?:\s|$)|\n/g;

// ---------------------------------------------------------------------------------------------
// Pass 1: numbers and what follows them

type Suffix = { type: 'unit'; form: UnitForm } | { type: 'percent' } | null;

interface NumberToken {
  start: number;
  /** End of the number itself. */
  numEnd: number;
  /** End of the number and its unit or percent sign. */
  end: number;
  /** The number as parseQuantity reads it: "-40", "1500", "3.4e5". */
  num: string;
  suffix: Suffix;
  /** A label's number, a year before an initial: never a figure. */
  skip: boolean;
  /** Written after "±": an uncertainty. */
  plusMinus: boolean;
  consumed: boolean;
}

function cleanNumber(m: RegExpExecArray): string {
  const sign = m[1] === undefined || m[1] === '+' ? '' : '-';
  let exp: string | undefined = m[4] ?? m[5];
  if (exp !== undefined) exp = exp.replace('−', '-');
  else if (m[6] !== undefined) exp = [...m[6]].map((c) => SUPERSCRIPT_DIGITS[c]).join('');
  return `${sign}${m[2].replace(/,/g, '')}${m[3] ?? ''}${exp !== undefined ? `e${exp}` : ''}`;
}

function readSuffix(text: string, at: number): { suffix: Suffix; end: number } {
  SYMBOL_RE.lastIndex = at;
  const s = SYMBOL_RE.exec(text);
  WORD_RE.lastIndex = at;
  const w = WORD_RE.exec(text);
  if (s && (!w || s[0].length >= w[0].length)) return { suffix: { type: 'unit', form: SYMBOLS.get(symbolKey(s[1]))! }, end: at + s[0].length };
  if (w) return { suffix: { type: 'unit', form: WORDS.get(wordKey(w[1]))! }, end: at + w[0].length };
  PERCENT_RE.lastIndex = at;
  const p = PERCENT_RE.exec(text);
  if (p) return { suffix: { type: 'percent' }, end: at + p[0].length };
  return { suffix: null, end: at };
}

function tokenize(text: string): NumberToken[] {
  const tokens: NumberToken[] = [];
  NUMBER_RE.lastIndex = 0;
  for (let m = NUMBER_RE.exec(text); m; m = NUMBER_RE.exec(text)) {
    const start = m.index;
    const numEnd = start + m[0].length;
    const { suffix, end } = readSuffix(text, numEnd);
    const before = text.slice(Math.max(0, start - 16), start);
    let skip = LABEL_RE.test(before);
    if (!skip && suffix?.type === 'unit' && /^\d{4}$/.test(m[0])) {
      // "in 2019 A. N. Other": a year, then an initial.
      const year = Number(m[0]);
      const unitText = text.slice(numEnd, end).trim();
      if (year >= 1800 && year <= 2100 && unitText.length === 1 && /^[.,]/.test(text.slice(end, end + 1))) skip = true;
    }
    tokens.push({ start, numEnd, end, num: cleanNumber(m), suffix, skip, plusMinus: PLUS_MINUS_RE.test(before), consumed: false });
  }
  return tokens;
}

// ---------------------------------------------------------------------------------------------
// Pass 2: figures

interface Draft {
  start: number;
  end: number;
  kind: FigureKind;
  quantity: string;
  role: FigureRole;
  /** Index in the drafts of the other end of a range. */
  rangeWith?: number;
}

function sameSuffixKind(a: Suffix, b: Suffix): boolean {
  if (a === null || b === null) return a === b;
  if (a.type === 'percent' || b.type === 'percent') return a.type === b.type;
  return a.form.kind === b.form.kind;
}

function isRangeGap(text: string, gapStart: number, gapEnd: number, firstStart: number): boolean {
  const gap = text.slice(gapStart, gapEnd);
  if (/^[^\S\n]*(?:[-–—]|to)[^\S\n]*$/i.test(gap)) return true;
  return /^[^\S\n]+and[^\S\n]+$/i.test(gap) && /between[^\S\n]+$/i.test(text.slice(Math.max(0, firstStart - 12), firstStart));
}

/** Start of the window of words before `at`: the previous figure, the sentence start or `at - max`. */
function windowStart(text: string, at: number, floor: number, max: number): number {
  let from = Math.max(floor, at - max);
  SENTENCE_BREAK_RE.lastIndex = 0;
  const slice = text.slice(from, at);
  let cut = -1;
  for (let m = SENTENCE_BREAK_RE.exec(slice); m; m = SENTENCE_BREAK_RE.exec(slice)) cut = m.index + m[0].length;
  if (cut >= 0) from += cut;
  return from;
}

function roleFromWords(text: string, roles: CompiledRoles, start: number, end: number, floor: number): FigureRole {
  roles.after.lastIndex = end;
  const a = roles.after.exec(text);
  if (a?.groups) {
    for (let i = 0; i < roles.groups.length; i++) if (a.groups[`r${i}`] !== undefined) return roles.groups[i].role;
  }
  const from = windowStart(text, start, floor, BEFORE_WINDOW);
  const slice = text.slice(from, start);
  roles.before.lastIndex = 0;
  let last: RegExpExecArray | null = null;
  for (let m = roles.before.exec(slice); m; m = roles.before.exec(slice)) last = m;
  if (last?.groups) {
    for (let i = 0; i < roles.groups.length; i++) if (last.groups[`r${i}`] !== undefined) return roles.groups[i].role;
  }
  return null;
}

function roleFor(text: string, kind: FigureKind, start: number, end: number, floor: number): FigureRole {
  if (kind === 'power' || kind === 'energy') {
    IN_OUT_AFTER_RE.lastIndex = end;
    const io = IN_OUT_AFTER_RE.exec(text);
    if (io) return io[1].toLowerCase() === 'in' ? 'in' : 'out';
    return roleFromWords(text, POWER_ENERGY, start, end, floor);
  }
  if (kind === 'temperature') return roleFromWords(text, TEMPERATURE, start, end, floor);
  if (kind === 'cop') {
    const around = text.slice(Math.max(0, start - COP_WINDOW), Math.min(text.length, end + COP_WINDOW));
    if (COP_COOLING_RE.test(around)) return 'cooling';
    if (COP_HEATING_RE.test(around)) return 'heating';
  }
  return null;
}

function isEfficiencyPercent(text: string, start: number, end: number, floor: number): boolean {
  EFFICIENCY_AFTER_RE.lastIndex = end;
  if (EFFICIENCY_AFTER_RE.test(text)) return true;
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start);
  const m = EFFICIENCY_PERCENT_BEFORE_RE.exec(before);
  return m !== null && !EFFICIENCY_CHANGE_RE.test(m[1]);
}

function bareKind(text: string, start: number, floor: number): FigureKind | null {
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start);
  if (COP_SYMBOL_BEFORE_RE.test(before) || COP_WORDS_BEFORE_RE.test(before)) return 'cop';
  if (EFFICIENCY_BARE_BEFORE_RE.test(before)) return 'efficiency';
  return null;
}

/** The number × factor, written so that parseQuantity reads it back. */
function scaled(num: string, factor: number | undefined): string {
  if (factor === undefined) return num;
  return String(Number((Number(num) * factor).toPrecision(15)));
}

/**
 * The figures in a pasted text, in order of appearance, with ids "f1", "f2", …. See the file's
 * comment for what is read and what is left out.
 */
export function extractFigures(text: string): Figure[] {
  const tokens = tokenize(text);
  const drafts: Draft[] = [];
  /** Kind of the figure a token continues as the second end of a range. */
  const rangeKind = new Map<number, { kind: FigureKind; draft: number }>();
  let floor = 0;

  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    if (t.skip || t.consumed || t.plusMinus) continue;
    let suffix = t.suffix;
    let end = t.end;
    const next: NumberToken | undefined = tokens[i + 1];
    let rangeNext = false;
    if (!suffix && next && !next.skip && next.suffix) {
      if (next.plusMinus && /^[^\S\n]*(?:±|\+\/-|\+-)[^\S\n]*$/.test(text.slice(t.numEnd, next.start))) {
        // "1.2 ± 0.3 mN": one figure, the unit borrowed from the uncertainty.
        suffix = next.suffix;
        end = next.end;
        next.consumed = true;
      } else if (isRangeGap(text, t.numEnd, next.start, t.start)) {
        // "10–20 mN": the first end borrows the unit; its text is the number alone.
        suffix = next.suffix;
        rangeNext = true;
      }
    } else if (next && !next.skip && !next.plusMinus && sameSuffixKind(suffix, next.suffix) && isRangeGap(text, t.end, next.start, t.start)) {
      rangeNext = true;
    }

    const inRange = rangeKind.get(i);
    let kind: FigureKind | null = null;
    let quantity = '';
    if (suffix?.type === 'unit') {
      kind = suffix.form.kind;
      quantity = `${scaled(t.num, suffix.form.factor)} ${suffix.form.unit}`;
    } else if (suffix?.type === 'percent') {
      const percentEnd = rangeNext && !t.suffix ? next!.end : end;
      if (inRange?.kind === 'efficiency' || isEfficiencyPercent(text, t.start, percentEnd, floor)) kind = 'efficiency';
      quantity = `${t.num} %`;
    } else {
      kind = inRange?.kind ?? bareKind(text, t.start, floor);
      quantity = t.num;
    }
    if (kind === null) continue;

    const role = roleFor(text, kind, t.start, end, floor);
    const index = drafts.length;
    const draft: Draft = { start: t.start, end, kind, quantity, role };
    if (inRange && inRange.kind === kind) {
      const first = drafts[inRange.draft];
      draft.rangeWith = inRange.draft;
      first.rangeWith = index;
      if (first.role === null) first.role = draft.role;
      else if (draft.role === null) draft.role = first.role;
    }
    drafts.push(draft);
    floor = end;
    if (rangeNext) rangeKind.set(i + 1, { kind, draft: index });
  }

  const figures: Figure[] = [];
  for (const d of drafts) {
    const unit = FIGURE_SI_UNIT[d.kind];
    let si: number;
    try {
      si = parseQuantity(d.quantity, unit);
    } catch (err) {
      if (err instanceof QuantityError) continue; // not a figure after all (kept out rather than guessed)
      throw err;
    }
    figures.push({
      id: `f${figures.length + 1}`,
      kind: d.kind,
      quantity: d.quantity,
      text: text.slice(d.start, d.end),
      start: d.start,
      end: d.end,
      si,
      unit,
      display: formatQuantity(si, unit),
      role: d.role,
    });
  }
  return figures;
}

/**
 * A figure the reader typed or fixed. The quantity is read for its kind by parseQuantity, whose
 * QuantityError is left to propagate (the server answers 400 naming the figure's field).
 */
/** A typed quantity read in its kind's SI unit: the value and its display, or what is wrong with it. */
export type FigureReading = { ok: true; si: number; display: string } | { ok: false; message: string };

/** Reads a figure as typed ("0.2 lbf" as a thrust) without throwing: for forms that mark a mistyped unit as it is typed. */
export function readQuantityOf(kind: FigureKind, quantity: string): FigureReading {
  const unit = FIGURE_SI_UNIT[kind];
  try {
    const si = parseQuantity(quantity, unit);
    return { ok: true, si, display: formatQuantity(si, unit) };
  } catch (err) {
    if (err instanceof QuantityError) return { ok: false, message: err.message };
    throw err;
  }
}

export function readFigure(input: FigureInput, id: string): Figure {
  if (!(FIGURE_KINDS as readonly string[]).includes(input.kind)) {
    throw new QuantityError('syntax', `"${String(input.kind)}" is not a kind of figure (one of ${FIGURE_KINDS.join(', ')})`);
  }
  const unit = FIGURE_SI_UNIT[input.kind];
  const quantity = typeof input.quantity === 'string' ? input.quantity.trim() : input.quantity;
  const si = parseQuantity(quantity, unit);
  return {
    id,
    kind: input.kind,
    quantity,
    text: input.text ?? quantity,
    start: input.start ?? null,
    end: input.end ?? null,
    si,
    unit,
    display: formatQuantity(si, unit),
    role: input.role ?? null,
  };
}
