/**
 * Numbers (the claim reader, shared/claims/reader.ts, pass 1): digits with signs, decimals, English
 * thousands separators, decimal commas, e-notation and "× 10⁻³"; "5K cycles", "2 million"; numbers
 * in words through `compromise` ("three and a half hours", "half a kilowatt"); "an hour and a half";
 * "3/4 hp"; uncertainties in brackets ("2.31(4) mN"); and the numbers that are never figures (labels
 * such as "Figure 2", "§ 3", years before an initial). Each number comes with the unit or percent
 * sign after it (units.ts).
 */
import nlp from 'compromise';
import { THOUSAND_NOUNS, LABEL_WORDS } from '../figures-vocabulary';
import { alt } from './context';
import { readSuffix, unitAt, type Suffix } from './units';

/** "5K cycles", "5 k hours", "6K full cycles": a thousand before a counted noun or a unit word (a word of its kind between). */
const THOUSAND_RE = new RegExp(`(?:[^\\S\\n]?[kK](?=[^\\S\\n]+(?:(?:full|charge|charging|operating|running|test|duty|load|power|flight|service|life|deep|complete|partial)[^\\S\\n]+)?(?:${alt(THOUSAND_NOUNS)})(?![\\p{L}]))|[^\\S\\n]+thousand(?!\\p{L}))`, 'uy');
// ("1,2 billions km/h": the plural, as some writers put it.)
const MILLION_RE = /[^\S\n]+(million|billion|trillion|M(?=[^\S\n]+(?:cycles?|hours?|miles?|km|units?)))s?(?!\p{L})/uy;
const MULTIPLIER: Record<string, number> = { million: 1e6, M: 1e6, billion: 1e9, trillion: 1e12 };

/**
 * A number in digits: sign, digits (English thousands separators), decimals (a point, or a comma
 * that cannot be a thousands separator), then e-notation or × 10^n.
 */
const NUMBER_RE =
  /(?:(?<![\p{L}\p{N}_.,^])|(?<=(?<![\p{L}])\p{Lu}?\p{Ll}*\p{Ll}{4})(?=\d)|(?<=(?<!\p{L})COP)(?=\d))(?<![\p{N}.,]\/)([-−–+](?=\d))?(\d{1,3}(?:,\d{3})+(?![\d,])|\d{1,3}(?:[ \u00A0\u2009\u202F]\d{3})+(?![\d]|[^\S\n]\d)(?:,\d+)?|\d+(?:,\d{1,2}(?!\d)|,\d{4,})|0,\d+|\d+)(\.\d+)?(?:[eE]([-+−]?\d+)(?![\p{N}])|[^\S\n]*[×x·⋅*][^\S\n]*10[^\S\n]*(?:\^[^\S\n]*\(?([-+−]?\d+)\)?|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)|(?<=10)[-−–](\d{1,2})(?![\d.,]|[^\S\n]*[-−–]?[^\S\n]*\d)))?(?:(?<=(?<![\d.,])10)(?:\^\(?([-+−]?\d+)\)?|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)))?/gu;

/** "(5.1 ± 0.4)", "(3.1 ± 0.4) × 10⁻⁵", "(2.2 +/- 0.3) x 10^-3": a value and its uncertainty in brackets. */
const BRACKETED_UNCERTAINTY_RE =
  /(?<![\p{L}\p{N}])\([^\S\n]*([-−+]?\d+(?:\.\d+)?)[^\S\n]*(?:±|\+\/-|\+-)[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*\)(?:[^\S\n]*[×x·⋅*][^\S\n]*10[^\S\n]*(?:\^[^\S\n]*\(?([-+−]?\d+)\)?|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)))?/gu;

const SUPERSCRIPT_DIGITS: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '⁺': '' };

const LABEL_RE = new RegExp(`(?:(?<!\\p{L})(?:${alt(LABEL_WORDS)})|[§#¶])[^\\S\\n]*$`, 'iu');
/** "±", "+/-", and said in words: "twelve per cent, plus or minus three". */
// ("give or take 10 %" too.)
const PLUS_MINUS_RE = /(?:±|\+\/-|\+-|(?<!\p{L})plus[^\S\n]+or[^\S\n]+minus|(?<!\p{L})give[^\S\n]+or[^\S\n]+take)[^\S\n]*$/iu;

export interface NumberToken {
  start: number;
  /** End of the number itself (a thousand multiplier included). */
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
  /** "2.31(4) mN": the standard uncertainty in the last digits (here 0.04). */
  unc?: number;
  consumed: boolean;
  /** Written in words ("two weeks"): kept only with a unit. */
  words: boolean;
}

function cleanNumber(m: RegExpExecArray): string {
  const sign = m[1] === undefined || m[1] === '+' ? '' : '-';
  let exp: string | undefined = m[4] ?? m[5];
  if (exp !== undefined) exp = exp.replace('−', '-');
  else if (m[6] !== undefined) exp = [...m[6]].map((c) => SUPERSCRIPT_DIGITS[c]).join('');
  // "2.4 x 10-3 N": a superscript flattened by a copy out of a PDF, the minus kept.
  else if (m[7] !== undefined) exp = `-${m[7]}`;
  // A power of ten written alone ("10¹⁰ m/s", "10^10 J"): one times it.
  const bare = m[8] !== undefined ? m[8].replace('−', '-') : m[9] !== undefined ? [...m[9]].map((c) => SUPERSCRIPT_DIGITS[c]).join('') : undefined;
  if (bare !== undefined && m[3] === undefined) return `${sign}1e${bare}`;
  // Digits grouped by spaces ("1 500", SI style) are one number.
  let int = m[2].replace(/[ \u00A0\u2009\u202F]/g, '');
  let frac = m[3] ?? '';
  if (/^\d{1,3}(?:,\d{3})+$/.test(int)) int = int.replace(/,/g, '');
  else if (int.includes(',')) {
    // A decimal comma: "2,5", "0,75", "3,14159".
    const [a, b] = int.split(',');
    int = a;
    frac = `.${b}`;
  }
  return `${sign}${int}${frac}${exp !== undefined ? `e${exp}` : ''}`;
}

const WORD_NUMBER_HINT = /(?<!\p{L})(?:billion|million|quarter|third|tenth|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|thirteen|fourteen|fifteen|sixteen|seventeen|eighteen|nineteen|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|hundred|thousand|half|dozen|a quarter)(?!\p{L})/iu;

const FRACTION_WORDS_RE = /(?<!\p{L})(a ten-thousandth|one ten-thousandth|a hundred-thousandth|a millionth|one millionth|a thousandth|one thousandth|a hundredth|one hundredth|half a dozen|half|a quarter|one quarter|three[- ]quarters|a third|one third|two[- ]thirds|a tenth|one tenth|a dozen|a hundred|a thousand|a million|a billion|a trillion)(?:[^\S\n]+of)?(?:[^\S\n]+an?)?(?=[^\S\n]+\p{L}|-\p{L})/giu;
const FRACTION_VALUE: Record<string, number> = {
  'half a dozen': 6, 'a dozen': 12,
  half: 0.5, 'a quarter': 0.25, 'one quarter': 0.25, 'three quarters': 0.75, 'a third': 1 / 3, 'one third': 1 / 3, 'two thirds': 2 / 3,
  'a ten-thousandth': 1e-4, 'one ten-thousandth': 1e-4, 'a hundred-thousandth': 1e-5, 'a millionth': 1e-6, 'one millionth': 1e-6, 'a thousandth': 1e-3, 'one thousandth': 1e-3, 'a hundredth': 0.01, 'one hundredth': 0.01,
  'a tenth': 0.1, 'one tenth': 0.1, 'a hundred': 100, 'a thousand': 1000, 'a million': 1e6, 'a billion': 1e9, 'a trillion': 1e12,
};

/** Words of an unstated quantity that compromise reads as a number ("a few" as 3). */
const VAGUE_QUANTITY_RE = /^(?:an?[^\S\n]+)?(?:few|several|couple|handful|some|many|numerous|various|multiple)(?:[^\S\n]+of)?[\s.,;:!?]*$/iu;

/** "a few hundred watts", "several thousand": a round number made vague, which is no figure either. */
const VAGUE_BEFORE_RE = /(?<!\p{L})(?:a[^\S\n]+few|few|several|a[^\S\n]+couple[^\S\n]+of|some|many)[^\S\n]+(?:hundreds?|thousands?|millions?|dozens?|tens)(?!\p{L})/iu;

/** Numbers in words, through compromise: start, end and value of each. */
function wordNumbers(text: string): { start: number; end: number; value: number }[] {
  if (!WORD_NUMBER_HINT.test(text)) return [];
  const out: { start: number; end: number; value: number }[] = [];
  // compromise takes a capital mid-sentence ("… write: Twenty watts") for a name: read a lower-case
  // copy of the same length, so that the offsets hold.
  // And "seconds" is a unit, not a fraction: compromise reads "seventy seconds" as seventy halves (35);
  // it gets a word of the same length that means nothing to it.
  const lower = Array.from(text, (c) => (c.toLowerCase().length === c.length ? c.toLowerCase() : c)).join('');
  // ("one point eight, one point nine kilowatts": compromise runs two numbers said in a row into one; a
  // full stop of the same length keeps them apart.)
  const apart = lower.replace(/(?<=\p{L}),(?=[^\S\n]+(?:one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|a hundred)(?!\p{L}))/gu, '.');
  const doc = nlp(apart.replace(/(?<!\p{L})second(s?)(?!\p{L})/gu, 'secund$1'));
  const found = doc.numbers().json({ offset: true }) as { text: string; offset: { start: number; length: number }; number?: { num?: number } }[];
  for (const n of found) {
    // "- twenty watts" (a list item): compromise counts the dash in the length, not in the start.
    const dash = /^[-–—][^\S\n]*/u.exec(n.text)?.[0].length ?? 0;
    const raw = text.slice(n.offset.start, n.offset.start + n.offset.length - dash);
    if (/\d/.test(raw)) continue; // digits are read by NUMBER_RE
    const value = n.number?.num;
    if (typeof value !== 'number' || !Number.isFinite(value)) continue;
    if (value === 0 && !/(?<!\p{L})(?:zero|nought|naught|nil)(?!\p{L})/iu.test(raw)) continue; // "half an", read as 0
    // "a few micronewtons", "several watts": compromise gives these a number (3) the text never gave.
    if (VAGUE_QUANTITY_RE.test(raw.trim()) || VAGUE_BEFORE_RE.test(text.slice(Math.max(0, n.offset.start - 12), n.offset.start) + raw)) continue;
    const trimmed = raw.replace(/[\s\-.,;:!?]+$/u, ''); // (compromise may keep a full stop or a comma)
    // "plus or minus two": an uncertainty of two, not a number below zero.
    const sign = /^(?:minus|negative)[^\S\n]+/iu.exec(raw);
    if (sign && value < 0 && /(?<!\p{L})plus[^\S\n]+or[^\S\n]+$/iu.test(text.slice(Math.max(0, n.offset.start - 10), n.offset.start))) {
      out.push({ start: n.offset.start + sign[0].length, end: n.offset.start + trimmed.length, value: -value });
      continue;
    }
    out.push({ start: n.offset.start, end: n.offset.start + trimmed.length, value });
  }
  // "half a kilowatt", "a quarter of a kilowatt", "a billion km/h": compromise leaves these.
  for (const m of text.matchAll(FRACTION_WORDS_RE)) {
    const value = FRACTION_VALUE[m[1].toLowerCase().replace(/^(three|two)-/u, '$1 ')];
    if (value === undefined) continue;
    // Part of a number compromise read ("two and a half"): leave it.
    const end = m.index! + m[0].length;
    if (out.some((o) => (o.start < m.index! && m.index! < o.end) || (o.start === m.index! && o.end > end))) continue;
    // "a hundred and fifty", where compromise read "hundred and fifty" (150): its reading, from the "a".
    const longer = out.find((o) => o.start > m.index! && o.start < end && o.end > end);
    if (longer && /^an?$/i.test(m[1].split(/\s+/)[0])) {
      longer.start = m.index!;
      continue;
    }
    // Longer than what compromise read there ("half" of "half a newton"): this reading replaces it.
    for (let i = out.length - 1; i >= 0; i--) if (out[i].start < end && m.index! < out[i].end) out.splice(i, 1);
    out.push({ start: m.index!, end, value });
  }
  // "four and a half," where compromise stops at "four and a".
  for (const m of text.matchAll(AND_A_HALF_RE)) {
    const whole = SMALL_NUMBER_WORDS.indexOf(m[1].toLowerCase());
    if (whole < 0) continue;
    const end = m.index! + m[0].length;
    for (let i = out.length - 1; i >= 0; i--) if (out[i].start < end && m.index! < out[i].end) out.splice(i, 1);
    out.push({ start: m.index!, end, value: whole + (m[2].toLowerCase() === 'half' ? 0.5 : 0.25) });
  }
  // "twenty-three and a half kilowatts": any number in words, then "and a half" or "and a quarter".
  for (const o of out) {
    const m = /^[^\S\n]+and[^\S\n]+an?[^\S\n]+(half|quarter)(?!\p{L})/iu.exec(text.slice(o.end));
    if (!m || !Number.isInteger(o.value)) continue;
    o.value += m[1].toLowerCase() === 'half' ? 0.5 : 0.25;
    o.end += m[0].length;
  }
  // "three-twenty seconds", "four-fifty", "one-twenty C": hundreds said the short way (320, 450, 120).
  for (const m of text.matchAll(SPOKEN_HUNDREDS_RE)) {
    const hundreds = SMALL_NUMBER_WORDS.indexOf(m[1].toLowerCase());
    const tens = TENS_WORDS[m[2].toLowerCase()];
    const ones = m[3] ? SMALL_NUMBER_WORDS.indexOf(m[3].toLowerCase()) : 0;
    if (hundreds < 1 || tens === undefined || ones < 0) continue;
    const end = m.index! + m[0].length;
    for (let i = out.length - 1; i >= 0; i--) if (out[i].start < end && m.index! < out[i].end) out.splice(i, 1);
    out.push({ start: m.index!, end, value: hundreds * 100 + tens + ones });
  }
  // "two point four times ten to the minus three": scientific notation said aloud.
  for (const o of [...out]) {
    const m = SPOKEN_POWER_OF_TEN_RE.exec(text.slice(o.end));
    if (!m) continue;
    const exp = /^\d+$/u.test(m[2]) ? Number(m[2]) : SMALL_NUMBER_WORDS.indexOf(m[2].toLowerCase());
    if (!(exp >= 0)) continue;
    const end = o.end + m[0].length;
    o.value *= 10 ** (m[1] ? -exp : exp);
    for (let i = out.length - 1; i >= 0; i--) if (out[i] !== o && out[i].start < end && o.start < out[i].end) out.splice(i, 1);
    o.end = end;
  }
  // "nought point five", "point eight", "oh point two five": a decimal said digit by digit with no whole
  // number (or a nought), which compromise reads as the digits after the point alone.
  for (const m of text.matchAll(SPOKEN_DECIMAL_RE)) {
    const before = text.slice(Math.max(0, m.index! - 12), m.index!);
    if (!m[1] && /(?:\p{L}|\d)[^\S\n]*$/u.test(before) && NUMBER_WORD_BEFORE_RE.test(before)) continue; // "two point one": compromise's
    const digits = m[2].toLowerCase().split(/[^\S\n]+/u).map((w) => DIGIT_WORDS[w]);
    if (digits.some((d) => d === undefined)) continue;
    const end = m.index! + m[0].length;
    for (let i = out.length - 1; i >= 0; i--) if (out[i].start < end && m.index! < out[i].end) out.splice(i, 1);
    out.push({ start: m.index!, end, value: Number(`0.${digits.join('')}`) });
  }
  out.sort((a, b) => a.start - b.start);
  return out;
}

/** After a number said aloud: "times ten to the minus three", "times ten to the power of six". */
// (Or "two point nine e four", the calculator's "e" said aloud.)
const SPOKEN_POWER_OF_TEN_RE = /^[^\S\n]+(?:times[^\S\n]+ten[^\S\n]+to[^\S\n]+the[^\S\n]+(?:power[^\S\n]+of[^\S\n]+)?|e[^\S\n]+)(minus[^\S\n]+|negative[^\S\n]+)?(\d+|zero|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve)(?![\p{L}\d])/iu;

const DIGIT_WORDS: Record<string, number> = { zero: 0, nought: 0, naught: 0, oh: 0, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9 };
/** "nought point five", "point eight", "oh point two five" (a leading nought, or none). */
const SPOKEN_DECIMAL_RE = /(?<![\p{L}-])(?:(nought|naught|zero|oh)[^\S\n]+)?point[^\S\n]+((?:zero|nought|naught|oh|one|two|three|four|five|six|seven|eight|nine)(?:[^\S\n]+(?:zero|nought|naught|oh|one|two|three|four|five|six|seven|eight|nine))*)(?![\p{L}-])/giu;
/** A number word right before "point": "two point one" is compromise's to read. */
const NUMBER_WORD_BEFORE_RE = /(?<![\p{L}-])(?:one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|\w+teen|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|hundred|thousand)[^\S\n]*$/iu;

const TENS_WORDS: Record<string, number> = {
  ten: 10, eleven: 11, twelve: 12, thirteen: 13, fourteen: 14, fifteen: 15, sixteen: 16, seventeen: 17, eighteen: 18, nineteen: 19,
  twenty: 20, thirty: 30, forty: 40, fifty: 50, sixty: 60, seventy: 70, eighty: 80, ninety: 90,
};
/** One to nine, a hyphen, then ten to ninety (and a one to nine): "three-twenty", "four-fifty-five". */
const SPOKEN_HUNDREDS_RE = new RegExp(
  `(?<![\\p{L}-])(one|two|three|four|five|six|seven|eight|nine)-(${Object.keys(TENS_WORDS).join('|')})(?:-(one|two|three|four|five|six|seven|eight|nine))?(?![\\p{L}-])`,
  'giu',
);
const SMALL_NUMBER_WORDS = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve'];
const AND_A_HALF_RE = new RegExp(`(?<![\\p{L}-])(${SMALL_NUMBER_WORDS.join('|')})[^\\S\\n]+and[^\\S\\n]+an?[^\\S\\n]+(half|quarter)(?!\\p{L})`, 'giu');

/** "in watts, about", "in kilowatts:", "(in newtons) roughly": a unit's name said before its number. */
// (A mark or a hedge between: "in month 14" is a point in a project, not fourteen months.)
const UNIT_NAMED_BEFORE_RE = /(?<!\p{L})in[^\S\n]+(\p{L}+(?:[- ]\p{L}+)?)(?:[^\S\n]*[,:)][^\S\n]*(?:(?:about|around|roughly|some|approximately|maybe|say|call it|just under|just over)[^\S\n]+)?|[^\S\n]+(?:about|around|roughly|some|approximately|maybe|say|call it|just under|just over)[^\S\n]+)$/iu;
/** A unit given in a label just before a number: "[mN]:", "(kW) =", "/ W:". */
const HEADER_UNIT_RE = /(?:[[(][^\S\n]*([^\s\])]{1,8})[^\S\n]*[\])]|(?<![\p{L}\d])[\p{L}_{}]+[^\S\n]*\/[^\S\n]*([^\s:=/]{1,8}))[^\S\n]*[:=][^\S\n]*$/u;

/** A comma that can only be a decimal comma: "1,5 kW", "0,75", "38,5 %", "3,14159". */
const DECIMAL_COMMA_RE = /(?<![\p{N}.,])(?:\d+,\d{1,2}(?![\p{N}]|,\d)|0,\d+|\d+,\d{4,})(?![\p{N}])/u;
/** Digits grouped by dots: "1.800", "12.500.000", "1.234,5". */
const DOT_GROUPED_RE = /(?<![\p{N}.,])\d{1,3}(?:\.\d{3})+(?![\p{N}]|\.\d)/u;
/** A point that can only be a decimal point: "1.35", "0.5", "3.14159". */
const DECIMAL_POINT_RE = /(?<![\p{N}.,])\d+\.(?:\d{1,2}|\d{4,})(?![\p{N}])/u;
/** At a number: its sign, dot-grouped digits and a decimal comma part. */
const DOT_GROUPED_AT_RE = /([-−–+](?=\d))?(\d{1,3}(?:\.\d{3})+)(,\d+)?(?![\p{N}]|\.\d)/uy;

/**
 * Whether the text writes numbers the continental way: a decimal comma somewhere ("1,35 kW"), digits
 * grouped by dots somewhere ("Isp 1.600 s"), and no decimal point anywhere. Only then is "1.600" one
 * thousand six hundred; otherwise a point is a decimal point, as in English.
 */
export const groupsByDots = (text: string): boolean => DECIMAL_COMMA_RE.test(text) && DOT_GROUPED_RE.test(text) && !DECIMAL_POINT_RE.test(text);

export function tokenize(text: string): NumberToken[] {
  const tokens: NumberToken[] = [];
  const dots = groupsByDots(text);
  NUMBER_RE.lastIndex = 0;
  const push = (start: number, numEndRaw: number, num: string, words: boolean) => {
    let numEnd = numEndRaw;
    let value = num;
    THOUSAND_RE.lastIndex = numEnd;
    const k = THOUSAND_RE.exec(text);
    if (k) {
      value = String(Number(num) * 1000);
      numEnd += k[0].length;
    } else {
      MILLION_RE.lastIndex = numEnd;
      const mm = MILLION_RE.exec(text);
      if (mm) {
        value = String(Number((Number(num) * MULTIPLIER[mm[1]]).toPrecision(15)));
        numEnd += mm[0].length;
      }
    }
    const read = readSuffix(text, numEnd);
    let { suffix } = read;
    const { end } = read;
    // A unit in a column label: "Thrust [mN]: 12.3", "P_in / W: 1.5E+3", "Power (kW) = 2".
    if (suffix === null && !words) {
      const label = HEADER_UNIT_RE.exec(text.slice(Math.max(0, start - 40), start));
      const u = label ? unitAt(label[1] ?? label[2], 0) : null;
      if (u && u.end === (label![1] ?? label![2]).length) suffix = { type: 'unit', form: u.form };
    }
    // The unit named first, as people say it: "Output, in watts, about four hundred", "in kilowatts, 2.5".
    if (suffix === null) {
      const named = UNIT_NAMED_BEFORE_RE.exec(text.slice(Math.max(0, start - 40), start));
      const u = named ? unitAt(named[1], 0) : null;
      if (u && u.end === named![1].length && !u.form.ambiguous) suffix = { type: 'unit', form: u.form };
    }
    const before = text.slice(Math.max(0, start - 24), start);
    // ("R-448A", "R-410A": a refrigerant's designation, not 448 amperes.)
    let skip = LABEL_RE.test(before) || /(?<![\p{L}\p{N}])R-$/u.test(before);
    if (!skip && /^\d{4}$/.test(num) && /^\d{4}$/.test(text.slice(start, numEndRaw)) && numEnd === numEndRaw) {
      const year = Number(num);
      const after = text.slice(numEnd, end);
      if (year >= 1800 && year <= 2100) {
        // "in 2019 A. N. Other" (an initial), "the 1990s", "in 2025 s" is not a time.
        if (suffix?.type === 'unit' && after.trim().length === 1 && /^[.,]/.test(text.slice(end, end + 1))) skip = true;
        if (suffix?.type === 'unit' && /^s$/.test(after)) skip = true;
      }
    }
    // "minus 15 deg C", "negative 40 °F": a temperature below zero with its sign in words.
    let from = start;
    const minus = !words && !value.startsWith('-') && suffix?.type === 'unit' && suffix.form.kind === 'temperature' ? /(?<!\p{L})(?:minus|negative)[^\S\n]+$/iu.exec(text.slice(Math.max(0, start - 12), start)) : null;
    if (minus && !/(?<!\p{L})plus[^\S\n]+or[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 20), start - minus[0].length))) {
      value = `-${value}`;
      from = start - minus[0].length;
    }
    tokens.push({ start: from, numEnd, end, num: value, suffix, skip, plusMinus: PLUS_MINUS_RE.test(before), consumed: false, words });
  };
  // "(5.1 ± 0.4) %", "(3.1 ± 0.15) µN/kW", "(3.1 ± 0.4) × 10⁻⁵ N": a value and its uncertainty in brackets,
  // the unit (and a power of ten) after them.
  const bracketed: [number, number][] = [];
  for (const m of text.matchAll(BRACKETED_UNCERTAINTY_RE)) {
    const sup = m[4] !== undefined ? Number([...m[4]].map((c) => SUPERSCRIPT_DIGITS[c]).join('')) : undefined;
    const exp = m[3] !== undefined ? Number(m[3].replace('−', '-')) : sup;
    const scale = exp === undefined ? 1 : 10 ** exp;
    const mid = Number(m[1].replace('−', '-')) * scale;
    const end = m.index! + m[0].length;
    push(m.index!, end, String(Number(mid.toPrecision(15))), false);
    tokens[tokens.length - 1].unc = Number((Number(m[2]) * scale).toPrecision(15));
    bracketed.push([m.index!, end]);
  }
  for (let m = NUMBER_RE.exec(text); m; m = NUMBER_RE.exec(text)) {
    if (bracketed.some(([a, b]) => m!.index >= a && m!.index < b)) continue;
    if (dots) {
      // "1.800 K", "12.500.000 km", "1.234,5 kWh" in a text that writes decimal commas.
      DOT_GROUPED_AT_RE.lastIndex = m.index;
      const g = DOT_GROUPED_AT_RE.exec(text);
      if (g) {
        const sign = g[1] === undefined || g[1] === '+' ? '' : '-';
        const end = m.index + g[0].length;
        push(m.index, end, `${sign}${g[2].replace(/\./g, '')}${g[3] ? `.${g[3].slice(1)}` : ''}`, false);
        NUMBER_RE.lastIndex = end;
        continue;
      }
    }
    // "2.31(4) mN", "410(5) W", "163.0(5) km/s": the uncertainty in the last digits, in brackets.
    const end = m.index + m[0].length;
    const u = /^\((\d{1,3})\)/.exec(text.slice(end));
    if (u && /^[\d.]+$/.test(m[0])) {
      const decimals = (m[0].split('.')[1] ?? '').length;
      push(m.index, end + u[0].length, cleanNumber(m), false);
      tokens[tokens.length - 1].unc = Number(u[1]) / 10 ** decimals;
      NUMBER_RE.lastIndex = end + u[0].length;
      continue;
    }
    push(m.index, end, cleanNumber(m), false);
  }
  // "an hour and a half", "a day and a half": one and a half of the unit.
  for (const m of text.matchAll(/(?<!\p{L})(?:an?|one)[^\S\n]+(hour|day|week|month|year|minute)[^\S\n]+and[^\S\n]+a[^\S\n]+half(?!\p{L})/giu)) {
    const unit = unitAt(text, m.index! + m[0].indexOf(m[1]) - 1);
    if (!unit) continue;
    tokens.push({ start: m.index!, numEnd: m.index!, end: m.index! + m[0].length, num: '1.5', suffix: { type: 'unit', form: unit.form }, skip: false, plusMinus: false, consumed: false, words: true });
  }
  // "3 kWh each day", "1.8·10⁴ J each minute": a rate over one of the unit.
  for (const m of text.matchAll(/(?<!\p{L})(?:each|every|per|a)(?=[^\S\n]+(?:day|hour|week|month|year|minute)(?!\p{L}))/giu)) {
    if (tokens.some((t) => t.start <= m.index! && m.index! < t.end)) continue;
    if (!/(?<!\p{L})(?:kWh|MWh|Wh|J|kJ|MJ|GJ|BTU|joules?|kilowatt-hours?)[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,4}$/iu.test(text.slice(Math.max(0, m.index! - 40), m.index!))) continue;
    push(m.index!, m.index! + m[0].length, '1', true);
  }
  // "for an hour", "over a day": one of the unit.
  for (const m of text.matchAll(/(?<=(?:for|over|in|during|within|after|across|lasting|running)[^\S\n]+)(?:an?|one)(?=[^\S\n]+(?:(?:full|whole|single|steady|solid|straight|continuous|entire|complete)[^\S\n]+)?(?:hour|day|week|fortnight|month|year|minute)(?!\p{L}))/giu)) {
    if (tokens.some((t) => t.start <= m.index! && m.index! < t.end)) continue;
    if (/^[^\S\n]+(?:hour|day|week|month|year|minute)[^\S\n]+and[^\S\n]+a[^\S\n]+half/iu.test(text.slice(m.index! + m[0].length))) continue;
    const gap = /^[^\S\n]+(?:(?:full|whole|single|steady|solid|straight|continuous|entire|complete)[^\S\n]+)?/u.exec(text.slice(m.index! + m[0].length))![0];
    push(m.index!, m.index! + m[0].length + gap.length - 1, '1', true);
  }
  // "a minute of cranking", "an hour of charging": one of the unit, spent doing something.
  for (const m of text.matchAll(/(?<!\p{L})(?<!(?:half|quarter|third)[^\S\n]+)an?(?=[^\S\n]+(?:hour|day|week|fortnight|month|year|minute)[^\S\n]+of[^\S\n]+\p{L}+ing(?!\p{L}))/giu)) {
    if (tokens.some((t) => t.start <= m.index! && m.index! < t.end)) continue;
    push(m.index!, m.index! + m[0].length, '1', true);
  }
  for (const w of wordNumbers(text)) {
    if (tokens.some((t) => t.start < w.end && w.start < t.end)) continue;
    push(w.start, w.end, String(w.value), true);
  }
  // "a 3/4 hp motor", "1/2 W": a simple fraction before a unit replaces the number before its slash; with a
  // whole number before it, "1-1/2 hp", "1 1/2 ton", a mixed number (one and a half).
  for (const m of text.matchAll(/(?<![\p{N}.,/-])(?:(\d{1,3})(?:-|[^\S\n]))?(\d{1,2})\/(\d{1,2})(?![\p{N}.,/])/gu)) {
    const [a, b] = [Number(m[2]), Number(m[3])];
    const end = m.index! + m[0].length;
    if (!(b > 1 && a < b) || !unitAt(text, end)) continue;
    const whole = m[1] !== undefined ? Number(m[1]) : 0;
    for (let i = tokens.length - 1; i >= 0; i--) if (tokens[i].start >= m.index! && tokens[i].start < end) tokens.splice(i, 1);
    push(m.index!, end, String(whole + a / b), false);
  }
  // "4½ amperes", "1¼ horse-power", "¾ hp": a vulgar fraction, alone or after a whole number.
  for (const m of text.matchAll(/(?<![\p{N}.,])(\d{1,4})?([½¼¾⅓⅔⅛⅜⅝⅞⅕⅖⅗⅘⅙⅚])(?![\p{N}])/gu)) {
    const end = m.index! + m[0].length;
    if (!unitAt(text, end)) continue;
    const whole = m[1] !== undefined ? Number(m[1]) : 0;
    for (let i = tokens.length - 1; i >= 0; i--) if (tokens[i].start >= m.index! && tokens[i].start < end) tokens.splice(i, 1);
    push(m.index!, end, String(whole + VULGAR_FRACTIONS[m[2]]), false);
  }
  tokens.sort((a, b) => a.start - b.start);
  return tokens;
}

/** Unicode's vulgar fractions (Number Forms and Latin-1), by value. */
const VULGAR_FRACTIONS: Record<string, number> = {
  '½': 1 / 2, '¼': 1 / 4, '¾': 3 / 4, '⅓': 1 / 3, '⅔': 2 / 3, '⅛': 1 / 8, '⅜': 3 / 8, '⅝': 5 / 8, '⅞': 7 / 8,
  '⅕': 1 / 5, '⅖': 2 / 5, '⅗': 3 / 5, '⅘': 4 / 5, '⅙': 1 / 6, '⅚': 5 / 6,
};
