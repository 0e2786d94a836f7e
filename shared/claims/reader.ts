/**
 * The figure reader of the claim check (issue 11, item 1): the figures of a pasted claim, each with
 * its kind, SI value, role, the words it was read from and its place in the text — read the way
 * claims state them, not only as "0.2 lbf".
 *
 * How it reads a text:
 *  1. Numbers. Digits with signs, decimals, English thousands separators ("1,500"), decimal commas
 *     where they cannot be thousands ("2,5 kW", "0,75 kW"), e-notation and "× 10⁻³"/"x 10^-3"; a
 *     thousand written "5K"/"5k" before a noun that is not a temperature ("5K cycles"); and numbers
 *     in words ("two weeks", "three and a half hours", "twelve amps"), recognised by the
 *     `compromise` package (a well-kept English NLP library) and kept only where a unit follows.
 *  2. Units. The vocabulary in figures-vocabulary.ts (symbols with their case, words in any case,
 *     the longest form winning), then mathjs (parseQuantity) for the conversion. Compounds of a
 *     thrust over a power ("mN/kW", "µN per watt") are a thrust per power, of a power over a mass
 *     ("W/kg") a specific power; other compounds ("W/m²", "N·m") are not figures.
 *  3. Kinds by context, in the same sentence:
 *     - a temperature with difference words ("a 20 °C temperature difference", "ΔT of 20 K", "40
 *       degrees above ambient") is a temperature difference (20 °C of difference is 20 K);
 *     - seconds after "Isp"/"specific impulse" are a specific impulse;
 *     - a percentage: with quantum-efficiency words (EQE, IQE, quantum yield, photons per electron)
 *       a quantum efficiency; with heat-pump words ("350 % efficient") a heating COP, with
 *       refrigerator words a cooling COP; with efficiency words an efficiency; "30 % of the speed
 *       of light" a speed; other percentages are not figures;
 *     - a bare number after "COP", "efficiency", "EQE", "over-unity ratio of", or in "1.3 units back for
 *       every unit", "three times the energy it takes", "output is 3 times the input" (a gain, read as
 *       an efficiency).
 *  4. Ranges and hedges: "3–6 mN", "3 to 6 mN", "between 0.5 and 1.5 kW", "from 2 to 4 kW" and
 *     "1.2 ± 0.3 mN" are one figure with an upper end; "up to", "about", "~", "at least", "more
 *     than" … are kept as the figure's hedge.
 *  5. Roles from the words around (figures-vocabulary.ts): in/out/excess for power and energy,
 *     hot/cold for temperatures, heating/cooling for a COP, wet/dry/propellant for masses,
 *     exhaust/delta-v for speeds.
 *  6. Relations, as derived figures with the words they came from:
 *     - a current and a voltage in one clause ("12 A at 24 V") → a power I·V;
 *     - an excess over a stated input ("4 W more heat than the 20 W it draws") → out = in + excess;
 *     - "self-running", "needs no supply" … (not where the device harvests an outside flow) → in = 0;
 *     - one temperature and a difference → the other temperature (hot = cold + ΔT, or cold = hot − ΔT).
 *  Numbers after a label ("Figure 2 A", "Section 3.2", "p. 12", "Eq. 4", "§ 3") and years before an
 *  initial ("in 2019 A. N. Other") are not figures.
 *
 * Which recogniser: `@microsoft/recognizers-text-number-with-unit` (1.3.1) was tried on the claim
 * families and left aside: it found no dimension in "3–6 mN", "1.5 kW" or "40 kWh", read "20 pounds of
 * thrust" as a mass, has no range recogniser in its JavaScript port, and weighs 13 MB with half a second
 * of first call. `compromise` (14.x, kept up to date, MIT) reads numbers in words well ("three and a
 * half", "twenty-four") and is used for that alone; units are our vocabulary (figures-vocabulary.ts,
 * the trade's spellings) converted by mathjs, ranges and relations are ours, as no library reads them.
 */
import nlp from 'compromise';
import { QuantityError, formatQuantity, parseQuantity } from '../worksheet/quantity';
import { formatPrint } from './print';
import {
  BARE_CONNECTORS,
  COOLING_MACHINE_WORDS,
  COP_COOLING,
  COP_HEATING,
  DIFFERENCE_AFTER,
  DIFFERENCE_BEFORE,
  EFFICIENCY_CHANGE_WORDS,
  HARVEST_WORDS,
  HEAT_PUMP_WORDS,
  HEDGES,
  ISP_WORDS,
  LABEL_WORDS,
  MASS_ROLES,
  POWER_ENERGY_ROLES,
  QUANTUM_EFFICIENCY_WORDS,
  SELF_RUNNING_WORDS,
  SPEED_ROLES,
  TEMPERATURE_ROLES,
  THOUSAND_NOUNS,
  UNIT_FORMS,
  C_M_PER_S,
  type RoleWords,
  type UnitForm,
} from './figures-vocabulary';
import { FIGURE_SI_UNIT, type Figure, type FigureHedge, type FigureKind, type FigureRole } from './types';

// ---------------------------------------------------------------------------------------------
// The unit vocabulary, compiled

const escapeRe = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
const symbolKey = (s: string) => s.replace(/\s+/g, '');
const wordKey = (s: string) => s.toLowerCase().split(/[\s-]+/).join(' ');
const byLength = (a: string, b: string) => b.length - a.length;
const alt = (words: readonly string[]) => words.join('|');

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

/** Between a number and its unit: up to three spaces (not a line break), or a hyphen ("a 2-A current", "a 72-hour run"). */
const SEP = '(?:[^\\S\\n]{1,3}|-)?';
const symbolAlts = UNIT_FORMS.flatMap((f) => f.symbols ?? [])
  .sort(byLength)
  .map((s) => escapeRe(s).replace(/ /g, '\\s?'))
  .join('|');
const wordAlts = UNIT_FORMS.flatMap((f) => f.words ?? [])
  .sort(byLength)
  .map((w) => w.split(/[\s-]+/).map(escapeRe).join('[\\s-]+'))
  .join('|');
/** A symbol must not run on into a letter, digit or power ("K-type", "W²"); compounds are read after it. */
const SYMBOL_RE = new RegExp(`${SEP}(${symbolAlts})(?![\\p{L}\\p{N}_²³⁻\\^]|-[^\\S\\n]*\\p{N})`, 'uy');
const WORD_RE = new RegExp(`${SEP}(${wordAlts})(?![\\p{L}\\p{N}_])`, 'iuy');
const PERCENT_RE = /[^\S\n]{0,2}(?:%|per[ -]?cent(?!\p{L})|pct\.?(?!\p{L}))/iuy;
/** A compound after a unit: "/kW", " per kilowatt", "·m", "/m²". */
const COMPOUND_RE = /[^\S\n]*(?:\/|per(?!\p{L})|·|⋅|-(?=[^\S\n]*\p{L}\p{L}?\b))[^\S\n]*/iuy;
const COMPOUND_AFTER_RE = /[^\S\n]*(?:[/·⋅][^\S\n]*[\p{L}\p{N}]|per[^\S\n]+\p{L})/iuy;
/** "1.3c", "0.5 c": a multiple of the speed of light (only attached to the number, or spaced before a non-letter). */
const C_SUFFIX_RE = /(?:c|[^\S\n]c)(?![\p{L}\p{N}_°])/uy;
/** "5K cycles", "5 k hours": a thousand before a counted noun or a unit word. */
const THOUSAND_RE = new RegExp(`(?:[^\\S\\n]?[kK](?=[^\\S\\n]+(?:${alt(THOUSAND_NOUNS)})(?![\\p{L}]))|[^\\S\\n]+thousand(?!\\p{L}))`, 'uy');
const MILLION_RE = /[^\S\n]+(million|billion|trillion|M(?=[^\S\n]+(?:cycles?|hours?|miles?|km|units?)))(?!\p{L})/uy;
const MULTIPLIER: Record<string, number> = { million: 1e6, M: 1e6, billion: 1e9, trillion: 1e12 };

/**
 * A number in digits: sign, digits (English thousands separators), decimals (a point, or a comma
 * that cannot be a thousands separator), then e-notation or × 10^n.
 */
const NUMBER_RE =
  /(?<![\p{L}\p{N}_.,^])(?<![\p{N}.,]\/)([-−–+](?=\d))?(\d{1,3}(?:,\d{3})+(?![\d,])|\d{1,3}(?:[ \u00A0\u2009\u202F]\d{3})+(?![\d]|[^\S\n]\d)(?:,\d+)?|\d+(?:,\d{1,2}(?!\d)|,\d{4,})|0,\d+|\d+)(\.\d+)?(?:[eE]([-+−]?\d+)(?![\p{N}])|[^\S\n]*[×x·⋅*][^\S\n]*10[^\S\n]*(?:\^[^\S\n]*\(?([-+−]?\d+)\)?|([⁻⁺]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)))?/gu;

const SUPERSCRIPT_DIGITS: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '⁺': '' };

const LABEL_RE = new RegExp(`(?:(?<!\\p{L})(?:${alt(LABEL_WORDS)})|[§#¶])[^\\S\\n]*$`, 'iu');
const PLUS_MINUS_RE = /(?:±|\+\/-|\+-)[^\S\n]*$/u;

const CONNECT = `(?:[^\\S\\n]*(?:[=:≈~|)»”"'’]|(?:${alt(BARE_CONNECTORS)})(?!\\p{L})))*[^\\S\\n]*`;
const COP_SYMBOL_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:COPs?|C\\.O\\.P\\.?)(?:_?\\{?(?:h|c|H|C|heat|heating|cool|cooling)\\}?(?!\\p{L}))?(?:[^\\S\\n]*\\([^)]{0,20}\\))?${CONNECT}$`, 'u');
/** An energy efficiency ratio (EER or SEER, in BTU/h of cooling per watt): a cooling COP × 3.412. */
const EER_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:S?EER|energy efficiency ratio)(?:[^\\S\\n]*\\([^)]{0,20}\\))?${CONNECT}$`, 'u');
/** 1 BTU_IT/h = 0.293 071 1 W (NIST SP 811, Appendix B.8). */
const BTU_PER_H_IN_W = 0.29307107;
const COP_WORDS_BEFORE_RE = new RegExp(`(?<!\\p{L})coefficients?[\\s-]+of[\\s-]+performance(?:[^\\S\\n]*\\(COP\\))?${CONNECT}$`, 'iu');
const EFFICIENCY_BARE_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:efficienc(?:y|ies)|η(?:_?(?:th|thermal|c|Carnot))?|eta(?:_?(?:th|thermal))?)(?!\\p{L})${CONNECT}$`, 'iu');
const QE_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:${alt(QUANTUM_EFFICIENCY_WORDS)})(?!\\p{L})([^\\d.;!?\\n]{0,60})$`, 'iu');
const QE_AFTER_RE = new RegExp(`[^\\S\\n]*(?:(?:\\p{L}+|-)[^\\S\\n]+){0,3}(?:${alt(QUANTUM_EFFICIENCY_WORDS)})(?!\\p{L})`, 'iuy');
/** "efficiency … 45%": the keyword, then up to 60 characters without digits or a sentence break. */
const EFFICIENCY_PERCENT_BEFORE_RE = /(?<!\p{L})(?:efficienc(?:y|ies)|η|efficient|conversion|converts?|converting|turns?|turning|round[- ]trip)(?!\p{L})([^\d.;!?\n]{0,60})$/iu;
const EFFICIENCY_CHANGE_RE = new RegExp(`(?<!\\p{L})(?:${alt(EFFICIENCY_CHANGE_WORDS)})(?!\\p{L})`, 'iu');
/** "45 % efficient", "45% conversion efficiency", "45 %-efficient" (not "45% less efficient"). */
const EFFICIENCY_AFTER_RE = /[^\S\n]*-?[^\S\n]*(?:(?:(?!(?:less|more|higher|lower|better|worse|of)(?!\p{L}))[\p{L}-]+[^\S\n]+){0,3}efficien(?:t|tly|cy|cies)|round[- ]?trip(?:[^\S\n]+efficiency)?)(?!\p{L})/iuy;
/** "38 % of its fuel heat into shaft work", "25 % of the heat flowing through it": a share of heat turned into work. */
const PERCENT_OF_HEAT_RE =
  /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|this[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat|thermal energy|fuel energy|fuel's energy|energy in the fuel|heat input|incoming heat|absorbed heat|collected heat|sunlight|light|incident (?:light|radiation|power)|absorbed (?:[\p{L}-]+[^\S\n]+)?(?:light|radiation|power|energy)|radiant (?:power|energy|heat)|solar (?:energy|power|radiation)|input (?:energy|power)|electrical (?:input|energy|power)|energy (?:it|they) (?:takes|draws|consumes))(?!\p{L})(?=[^.;!?\n]{0,80}(?:into|to|as|comes out|becomes|is turned|is converted)[^.;!?\n]{0,40}(?:work|electric|power|motion|mechanical))/iuy;
/** "5 % conversion", "61 % net", ", 25 %, leaves as shaft work": a share turned into work or electricity. */
const SHARE_AS_WORK_RE =
  /[^\S\n]*(?:(?:net|gross|conversion|thermal|electrical|electric|overall|cycle|first-law|brake)(?!\p{L})|[,)]?[^\S\n]*(?:leaves|comes out|emerges|is delivered|is returned|appears|ends up)[^\S\n]+as[^\S\n]+(?:useful[^\S\n]+)?(?:shaft[^\S\n]+|mechanical[^\S\n]+|electrical[^\S\n]+)?(?:work|electricity|power|motion))/iuy;
const SPEED_OF_LIGHT_AFTER_RE = /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+)?(?:speed|velocity)[^\S\n]+of[^\S\n]+light|[^\S\n]*of[^\S\n]+c(?!\p{L})|[^\S\n]*of[^\S\n]+(?:the[^\S\n]+)?light[- ]speed/iuy;
const TEMPERATURE_CONTEXT_RE = /(?<!\p{L})(?:temperatures?|heat(?:ed|s|ing)?|hot|hotter|warm(?:er|s|ed)?|cold|colder|cool(?:er|s|ed)?|ambient|boil\w*|freez\w*|Celsius|Fahrenheit|thermal|room|outdoor|outside|air|water|collector)(?!\p{L})/iu;
const HEAT_PUMP_RE = new RegExp(`(?<!\\p{L})(?:${alt(HEAT_PUMP_WORDS)})(?!\\p{L})`, 'iu');
const COOLING_MACHINE_RE = new RegExp(`(?<!\\p{L})(?:${alt(COOLING_MACHINE_WORDS)})(?!\\p{L})`, 'iu');
const DIFF_BEFORE_RE = new RegExp(`(?<![\\p{L}])(?:${alt(DIFFERENCE_BEFORE)})(?!\\p{L})(?:[^\\S\\n]*(?:[=:≈~]|of|is|was|by|about|around|only|just|a|an|some|up to|nearly|roughly|approximately|just over|just under|over|under))*[^\\S\\n]*$`, 'iu');
const DIFF_AFTER_RE = new RegExp(`[^\\S\\n]*(?:\\)[^\\S\\n]*)?(?:(?:temperature|thermal|of|the)[^\\S\\n]+){0,2}(?:${alt(DIFFERENCE_AFTER)})(?!\\p{L})`, 'iuy');
const ISP_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:${alt(ISP_WORDS)})(?!\\p{L})${CONNECT}$`, 'iu');
const ISP_AFTER_RE = new RegExp(
  `[^\\S\\n]*(?:of[^\\S\\n]+)?(?:${alt(ISP_WORDS)})(?!\\p{L})|(?:-|[^\\S\\n]+)(?:[\\p{L}–-]+[^\\S\\n]+){0,2}?(?:engines?|thrusters?|rocket motors?|motors?)(?!\\p{L})`,
  'iuy',
);
/** Gains: "1.3 units back for every unit", "three times the energy it takes", "output is 3 times the input". */
const GAIN_AFTER_RE =
  /[^\S\n]*(?:(?:units?|joules?|watts?|J|W|kWh|times)[^\S\n]+)?(?:(?:of[^\S\n]+)?(?:(?:electrical|electric|useful|mechanical|thermal)[^\S\n]+)?(?:energy|power|output|heat|work|electricity)[^\S\n]+)?(?:(?:back|out|returned|in return|delivered|produced)[^\S\n]+)?(?:(?:to|into|at)[^\S\n]+(?:the|its|a)[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:for|per)[^\S\n]+(?:every|each|one)[^\S\n]+(?:single[^\S\n]+)?(?:one[^\S\n]+)?(?:unit|joule|watt|J|W|kWh|kilowatt-hour)s?(?:[^\S\n]+(?:of[^\S\n]+)?(?:energy|power|electricity|input|work|fuel))?(?:[^\S\n]+(?:in|put in|supplied|consumed|used|spent|it (?:takes|uses|consumes|draws|is given|receives)|taken|drawn|of input|invested|taken (?:at|from|in) [^.;!?\n]{0,30}|(?:the|its)[^\S\n]+[\p{L}-]+[^\S\n]+(?:takes|uses|draws|consumes|gets|receives))|(?<=electricity|input|work|fuel|energy|power)(?!\p{L}))/iuy;
/** "For every unit of electricity we put in, the amplifier gives back 1.3." */
const GAIN_BEFORE_RE =
  /(?<!\p{L})(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(?:single[^\S\n]+)?(?:unit|joule|watt|kilowatt-hour|kWh|J|W)s?\b[^.;!?\n]{0,80}(?:gives?|returns?|yields?|delivers?|produces?|get|gets|comes? out|back)(?:[^\S\n]+(?:back|out|us|about|roughly|some|nearly))*[^\S\n]*$/iu;
const TIMES_AFTER_RE =
  /[^\S\n]*(?:times|x|×)[^\S\n]+(?:(?:as[^\S\n]+much|more)[^\S\n]+)?(?:(?:energy|power|electricity|heat|work|output)[^\S\n]+)?(?:(?:as|than)[^\S\n]+)?(?:(?:the|its|it)[^\S\n]+)?(?:(?:energy|power|electrical)[^\S\n]+)?(?:input|consumption|in(?!\p{L})|it (?:takes|uses|consumes|draws|needs|is fed|receives)|(?:is|was) (?:put in|supplied|fed in)|supplied|consumed|drawn|needed|fed in|put in|what (?:it|the [\p{L}-]+) (?:is fed|takes|draws|uses|consumes|gets|receives|is given))/iuy;
const TIMES_BEFORE_RE = /(?<!\p{L})(?:output|yield|gain|returns?|delivers?|produces?|generates?|puts? out|gives?(?: back| out)?|makes|provides|supplies|sends? back)(?:[^\S\n]+(?:is|of|was|are|reaches|reached|power|energy|exactly|about|roughly|some|nearly))*[^\S\n]*$/iu;
/** "the output exceeds the input by a factor of 1.5", "output is higher than input by a factor of 2". */
const FACTOR_BEFORE_RE =
  /(?<!\p{L})(?:output|out|yield|production)[^.;!?\n]{0,40}(?:exceeds?|exceeding|is (?:higher|greater|larger|more) than|surpass\w*|outstrips?)[^.;!?\n]{0,30}(?:input|consumption|supply)[^.;!?\n]{0,20}by (?:a factor of|a ratio of)(?:[^\S\n]+(?:at least|about|roughly|some|nearly|over))?[^\S\n]*$/iu;
/** "150 % of its input power", "120 % of the energy supplied": an output as a share of the input. */
const PERCENT_OF_INPUT_RE =
  /[^\S\n]*of[^\S\n]+what[^\S\n]+(?:it|they|the[^\S\n]+[\p{L}-]+)[^\S\n]+(?:draws?|takes?|consumes?|uses?|gets?|is (?:given|fed|supplied)|(?:is )?put in|puts? in|pulls?)(?!\p{L})|[^\S\n]*of[^\S\n]+(?:its|the|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:input|consumption|(?:energy|power) (?:in|supplied|consumed|drawn|fed|put|(?:it|they) (?:receives?|takes?|gets?|draws?|consumes?)|received|taken in)|supply|electrical input)(?!\p{L})/iuy;
/** "1.3 W for each watt in", "1.3 J back per joule supplied": a gain written with a unit. */
const GAIN_PER_UNIT_RE =
  /[^\S\n]*(?:(?:of[^\S\n]+)?(?:energy|power|output|heat|electricity)[^\S\n]+)?(?:(?:back|out|returned)[^\S\n]+)?(?:for|per)[^\S\n]+(?:each|every|one)[^\S\n]+(?:single[^\S\n]+)?(?:watt|joule|kWh|kilowatt-hour|unit|W|J)s?(?!\p{L})/iuy;
/** Multiples in words: "twice the energy it consumes", "three-fold its input". */
const MULTIPLE_WORD_RE = /(?<!\p{L})(half|twice|double|triple|thrice|quadruple|two-?fold|three-?fold|four-?fold|five-?fold|ten-?fold)(?!\p{L})/giu;
const MULTIPLE_VALUE: Record<string, number> = { half: 0.5, twice: 2, double: 2, triple: 3, thrice: 3, quadruple: 4, twofold: 2, threefold: 3, fourfold: 4, fivefold: 5, tenfold: 10 };
/** "a power gain of 2.4": only over an input, or in a text about free energy (not an amplifier's gain in dB). */
const POWER_GAIN_BEFORE_RE = /(?<!\p{L})(?:power|energy)[^\S\n]+gain(?:[^\S\n]*(?:[=:]|of|is|was|reaching|about|around|approximately|roughly|near|up to|over|above|exceeding))*[^\S\n]*$/iu;
const OVER_UNITY_WORDS_RE = /(?<!\p{L})(?:over-?unity|free energy|zero-?point|ZPE|vacuum energy|self-?running|perpetual|magnet motor|more energy than)(?!\p{L})/iu;
const RATIO_BEFORE_RE = /(?<!\p{L})(?:over-?unity|overunity|output[- ]to[- ]input|out(?:put)?\/in(?:put)?|output\/input|energy (?:out|return)[- ]to[- ](?:energy )?in(?:put)?)(?:[^\S\n]+(?:ratio|factor|coefficient))?(?:[^\S\n]*(?:[=:≈~]|of|is|was|reaching|about|around|approximately|roughly|near|up to|over|above|exceeding))*[^\S\n]*$/iu;

/** Words that may stand between a figure and the role word after it ("2 kW of electrical input"). */
const AFTER_FILLER =
  '(?:(?:per|each|every|a)[\\s-]+(?:day|hour|week|month|year|minute|second|cycle)[\\s-]+)?(?:(?:of|the|its|electrical|electric|thermal|mechanical|heat|net|total|useful|shaft|continuous|peak|rated|gross|average|mean|power|energy|DC|AC|battery|mains|grid)[\\s-]+){0,3}';

interface CompiledRoles {
  groups: readonly RoleWords[];
  before: RegExp;
  after: RegExp;
  /** Each group's before-words alone, sticky: which group's words run longest at a place ("battery side" over "battery"). */
  beforeAt: RegExp[];
}

function compileRoles(groups: readonly RoleWords[]): CompiledRoles {
  const named = (key: 'before' | 'after') => groups.map((g, i) => `(?<r${i}>${alt(g[key])})`).join('|');
  return {
    groups,
    before: new RegExp(`(?<!\\p{L})(?:${named('before')})(?!\\p{L})`, 'giu'),
    after: new RegExp(`[^\\S\\n]*-?[^\\S\\n]*${AFTER_FILLER}(?:${named('after')})(?!\\p{L})`, 'iuy'),
    beforeAt: groups.map((g) => new RegExp(`(?:${alt(g.before)})(?!\\p{L})`, 'iuy')),
  };
}

const ROLES: Partial<Record<FigureKind, CompiledRoles>> = {
  power: compileRoles(POWER_ENERGY_ROLES),
  energy: compileRoles(POWER_ENERGY_ROLES),
  temperature: compileRoles(TEMPERATURE_ROLES),
  mass: compileRoles(MASS_ROLES),
  speed: compileRoles(SPEED_ROLES),
};
/** "1.5 kW in, 3 kW out": a bare in/out right after the figure, ending the clause. */
const IN_OUT_AFTER_RE = /[^\S\n]*(?:of[^\S\n]+(?:electricity|electrical power|heat|power|work|energy|light|gas|fuel)[^\S\n]+)?(in|out)(?!\p{L})(?=[^\S\n]*(?:[,;.!?)\]\n:—–]|(?:and|for|from|with|while|against|versus|vs|on|at|to|into|onto|across|through)(?!\p{L})|$))/iuy;
const COP_COOLING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_COOLING)})(?!\\p{L})`, 'iu');
const COP_HEATING_RE = new RegExp(`(?<!\\p{L})(?:${alt(COP_HEATING)})(?!\\p{L})`, 'iu');
const HEDGE_RES = HEDGES.map((h) => ({ hedge: h.hedge, re: new RegExp(`(?:(?<!\\p{L})(?:${alt(h.words.filter((w) => /^\p{L}/u.test(w)))})|${h.words.filter((w) => !/^\p{L}/u.test(w)).map(escapeRe).join('|') || '(?!)'})[^\\S\\n]*$`, 'iu') }));
const SELF_RUNNING_RE = new RegExp(`(?<!\\p{L})(?:${alt(SELF_RUNNING_WORDS)})(?!\\p{L})`, 'giu');
const HARVEST_RE = new RegExp(`(?<!\\p{L})(?:${alt(HARVEST_WORDS)})(?!\\p{L})`, 'iu');
const COP_WINDOW = 120;
const BEFORE_WINDOW = 80;
const SENTENCE_BREAK_RE = /[.!?;]["”’')\]]*(?:\s|$)|\n/g;

// ---------------------------------------------------------------------------------------------
// Pass 1: numbers and what follows them

type Suffix =
  | { type: 'unit'; form: UnitForm; per?: UnitForm; perCount?: number }
  | { type: 'percent' }
  | null;

interface NumberToken {
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

/** "2.5a", "350ma" glued to the number, as forum posts write amperes (never spaced: "a" is the article). */
const GLUED_AMPERE_RE = /(m?)a(?![\p{L}\p{N}_])/uy;
/** "water at 20C", "110F outside", as forum posts write them: a temperature where the sentence speaks of one. */
const GLUED_TEMPERATURE_RE = /([CF])(?![\p{L}\p{N}_/'’-])/uy;
const GLUED_CELSIUS: UnitForm = { kind: 'temperature', unit: 'degC', ambiguous: true };
const GLUED_FAHRENHEIT: UnitForm = { kind: 'temperature', unit: 'degF', ambiguous: true };
/** Words of a battery's charge rate ("charges at 2C") or a capacitance, which a glued C or F may be. */
const NOT_GLUED_TEMPERATURE_RE = /(?<!\p{L})(?:charg\w*|discharg\w*|C-?rates?|rate|batter(?:y|ies)|cells?|capacit\w*|supercap\w*|farads?|coulombs?|ultracap\w*)(?!\p{L})/iu;

function unitAt(text: string, at: number): { form: UnitForm; end: number } | null {
  GLUED_AMPERE_RE.lastIndex = at;
  const amp =
    /\d$/.test(text.slice(Math.max(0, at - 1), at)) && !/(?<!\p{L})(?:claims?|items?|fig\.?|figures?|tables?|steps?|sections?|pages?|rows?|no\.?|parts?|points?|version|rev\.?)[^\S\n]*[\d.]+$/iu.test(text.slice(Math.max(0, at - 24), at))
      ? GLUED_AMPERE_RE.exec(text)
      : null;
  if (amp) {
    const form = SYMBOLS.get(symbolKey(amp[1] ? 'mA' : 'A'));
    if (form) return { form, end: at + amp[0].length };
  }
  GLUED_TEMPERATURE_RE.lastIndex = at;
  const glued = /\d$/.test(text.slice(Math.max(0, at - 1), at)) ? GLUED_TEMPERATURE_RE.exec(text) : null;
  if (glued && !NOT_GLUED_TEMPERATURE_RE.test(sentenceAround(text, at, at + 1))) {
    return { form: glued[1] === 'C' ? GLUED_CELSIUS : GLUED_FAHRENHEIT, end: at + glued[0].length };
  }
  SYMBOL_RE.lastIndex = at;
  const s = SYMBOL_RE.exec(text);
  WORD_RE.lastIndex = at;
  const w = WORD_RE.exec(text);
  if (s && (!w || s[0].length >= w[0].length)) return { form: SYMBOLS.get(symbolKey(s[1]))!, end: at + s[0].length };
  if (w) return { form: WORDS.get(wordKey(w[1]))!, end: at + w[0].length };
  return null;
}

function readSuffix(text: string, at: number): { suffix: Suffix; end: number } {
  const u = unitAt(text, at);
  // "5 N·m", "6 N-m", "2 K-type", "3 W-h": a compound or a name, not a figure.
  if (u && /^(?:[-·⋅][^\S\n]*(?:type|class(?!\p{L})|[mhs](?!\p{L})|m²|m2))/iu.test(text.slice(u.end, u.end + 8))) return { suffix: null, end: at };
  if (u) {
    // A compound: thrust per power, power per mass; any other compound is not a figure.
    COMPOUND_RE.lastIndex = u.end;
    const c = COMPOUND_RE.exec(text);
    if (c && /per/i.test(c[0])) {
      // "1 mN per 100 W": a ratio with a number under it.
      // "one newton per hundred watts": the count in words.
      const under = /^(?:([\d.]+)|(?:(?:a|one)[^\S\n]+)?(ten|hundred|thousand))(?=[^\S\n]*\p{L})/iu.exec(text.slice(u.end + c[0].length));
      if (under) {
        const count = under[1] !== undefined ? Number(under[1]) : { ten: 10, hundred: 100, thousand: 1000 }[under[2].toLowerCase() as 'ten' | 'hundred' | 'thousand'];
        const per = unitAt(text, u.end + c[0].length + under[0].length);
        if (per && !per.form.factor && u.form.kind === 'thrust' && per.form.kind === 'power' && count > 0) {
          return { suffix: { type: 'unit', form: u.form, per: per.form, perCount: count }, end: per.end };
        }
      }
    }
    if (c && c[0].trim() !== '-') {
      // "100 W / output: 130 W": a slash between spaces before a word that is no unit separates two items.
      if (/^[^\S\n]+\/[^\S\n]+$/.test(c[0]) && !unitAt(text, u.end + c[0].length)) return { suffix: { type: 'unit', form: u.form }, end: u.end };
      // "230 V / 6.5 A": a number after the slash starts another figure.
      if (/^[-−+]?\d/.test(text.slice(u.end + c[0].length, u.end + c[0].length + 2))) return { suffix: { type: 'unit', form: u.form }, end: u.end };
      const per = unitAt(text, u.end + c[0].length);
      if (per && !per.form.factor) {
        if (u.form.kind === 'thrust' && per.form.kind === 'power') return { suffix: { type: 'unit', form: u.form, per: per.form }, end: per.end };
        if (u.form.kind === 'power' && per.form.kind === 'mass') return { suffix: { type: 'unit', form: u.form, per: per.form }, end: per.end };
        // "3.6 MJ per day": the energy, over the time said after it (read as a rate below).
        if (u.form.kind === 'energy' && per.form.kind === 'duration') return { suffix: { type: 'unit', form: u.form }, end: u.end };
      }
      // "230 V / 6.5 A", "12 V × 1 A": a voltage and a current side by side, each a figure.
      if (per && ((u.form.kind === 'voltage' && per.form.kind === 'current') || (u.form.kind === 'current' && per.form.kind === 'voltage'))) {
        return { suffix: { type: 'unit', form: u.form }, end: u.end };
      }
      // "1e-22 J per bit", "5 kWh per cycle", "3 min per batch": the figure of one of them.
      if (/per/i.test(c[0]) && PER_COUNT_RE.test(text.slice(u.end + c[0].length, u.end + c[0].length + 30))) return { suffix: { type: 'unit', form: u.form }, end: u.end };
      COMPOUND_AFTER_RE.lastIndex = u.end;
      if (COMPOUND_AFTER_RE.test(text) && !/^[^\S\n]*-/.test(text.slice(u.end))) return { suffix: null, end: at };
    }
    return { suffix: { type: 'unit', form: u.form }, end: u.end };
  }
  C_SUFFIX_RE.lastIndex = at;
  const cm = C_SUFFIX_RE.exec(text);
  const speedContext = /(?<!\p{L})(?:cruis\w*|speeds?|velocit\w*|travel\w*|reach\w*|fl(?:y|ies|ying)|moves?|moving|accelerat\w*|pushed|boosted|driven|goes|going|at|to)(?!\p{L})[^.;!?\n]{0,30}$/iu.test(text.slice(Math.max(0, at - 50), at).replace(/[-−+]?[\d.,]+$/, ''));
  if (cm && (/^c/.test(cm[0]) || speedContext)) {
    return { suffix: { type: 'unit', form: SPEED_OF_LIGHT }, end: at + cm[0].length };
  }
  PERCENT_RE.lastIndex = at;
  const p = PERCENT_RE.exec(text);
  if (p) return { suffix: { type: 'percent' }, end: at + p[0].length };
  return { suffix: null, end: at };
}

const SPEED_OF_LIGHT: UnitForm = { kind: 'speed', unit: 'm/s', factor: C_M_PER_S };

const WORD_NUMBER_HINT = /(?<!\p{L})(?:billion|million|quarter|third|tenth|one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|thirteen|fourteen|fifteen|sixteen|seventeen|eighteen|nineteen|twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety|hundred|thousand|half|dozen|a quarter)(?!\p{L})/iu;

const FRACTION_WORDS_RE = /(?<!\p{L})(half a dozen|half|a quarter|one quarter|three quarters|a third|one third|two thirds|a tenth|one tenth|a dozen|a hundred|a thousand|a million|a billion|a trillion)(?:[^\S\n]+of)?(?:[^\S\n]+an?)?(?=[^\S\n]+\p{L}|-\p{L})/giu;
const FRACTION_VALUE: Record<string, number> = {
  'half a dozen': 6, 'a dozen': 12,
  half: 0.5, 'a quarter': 0.25, 'one quarter': 0.25, 'three quarters': 0.75, 'a third': 1 / 3, 'one third': 1 / 3, 'two thirds': 2 / 3,
  'a tenth': 0.1, 'one tenth': 0.1, 'a hundred': 100, 'a thousand': 1000, 'a million': 1e6, 'a billion': 1e9, 'a trillion': 1e12,
};

/** Numbers in words, through compromise: start, end and value of each. */
function wordNumbers(text: string): { start: number; end: number; value: number }[] {
  if (!WORD_NUMBER_HINT.test(text)) return [];
  const out: { start: number; end: number; value: number }[] = [];
  // compromise takes a capital mid-sentence ("… write: Twenty watts") for a name: read a lower-case
  // copy of the same length, so that the offsets hold.
  const doc = nlp(Array.from(text, (c) => (c.toLowerCase().length === c.length ? c.toLowerCase() : c)).join(''));
  const found = doc.numbers().json({ offset: true }) as { text: string; offset: { start: number; length: number }; number?: { num?: number } }[];
  for (const n of found) {
    // "- twenty watts" (a list item): compromise counts the dash in the length, not in the start.
    const dash = /^[-–—][^\S\n]*/u.exec(n.text)?.[0].length ?? 0;
    const raw = text.slice(n.offset.start, n.offset.start + n.offset.length - dash);
    if (/\d/.test(raw)) continue; // digits are read by NUMBER_RE
    const value = n.number?.num;
    if (typeof value !== 'number' || !Number.isFinite(value)) continue;
    if (value === 0 && !/(?<!\p{L})(?:zero|nought|naught|nil)(?!\p{L})/iu.test(raw)) continue; // "half an", read as 0
    const trimmed = raw.replace(/[\s-]+$/u, '');
    out.push({ start: n.offset.start, end: n.offset.start + trimmed.length, value });
  }
  // "half a kilowatt", "a quarter of a kilowatt", "a billion km/h": compromise leaves these.
  for (const m of text.matchAll(FRACTION_WORDS_RE)) {
    const value = FRACTION_VALUE[m[1].toLowerCase()];
    if (value === undefined) continue;
    // Part of a number compromise read ("two and a half"): leave it.
    if (out.some((o) => o.start < m.index! && m.index! < o.end)) continue;
    // Longer than what compromise read there ("half" of "half a newton"): this reading replaces it.
    const end = m.index! + m[0].length;
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
  out.sort((a, b) => a.start - b.start);
  return out;
}

const SMALL_NUMBER_WORDS = ['zero', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve'];
const AND_A_HALF_RE = new RegExp(`(?<!\\p{L})(${SMALL_NUMBER_WORDS.join('|')})[^\\S\\n]+and[^\\S\\n]+an?[^\\S\\n]+(half|quarter)(?!\\p{L})`, 'giu');

/** A unit given in a label just before a number: "[mN]:", "(kW) =", "/ W:". */
const HEADER_UNIT_RE = /(?:[\[(][^\S\n]*([^\s\])]{1,8})[^\S\n]*[\])]|(?<![\p{L}\d])[\p{L}_{}]+[^\S\n]*\/[^\S\n]*([^\s:=\/]{1,8}))[^\S\n]*[:=][^\S\n]*$/u;

function tokenize(text: string): NumberToken[] {
  const tokens: NumberToken[] = [];
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
    const before = text.slice(Math.max(0, start - 16), start);
    let skip = LABEL_RE.test(before);
    if (!skip && /^\d{4}$/.test(num) && /^\d{4}$/.test(text.slice(start, numEndRaw)) && numEnd === numEndRaw) {
      const year = Number(num);
      const after = text.slice(numEnd, end);
      if (year >= 1800 && year <= 2100) {
        // "in 2019 A. N. Other" (an initial), "the 1990s", "in 2025 s" is not a time.
        if (suffix?.type === 'unit' && after.trim().length === 1 && /^[.,]/.test(text.slice(end, end + 1))) skip = true;
        if (suffix?.type === 'unit' && /^s$/.test(after)) skip = true;
      }
    }
    tokens.push({ start, numEnd, end, num: value, suffix, skip, plusMinus: PLUS_MINUS_RE.test(before), consumed: false, words });
  };
  for (let m = NUMBER_RE.exec(text); m; m = NUMBER_RE.exec(text)) {
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
  for (const m of text.matchAll(/(?<=(?:for|over|in|during|within|after|across|lasting|running)[^\S\n]+)(?:an?|one)(?=[^\S\n]+(?:full[^\S\n]+|whole[^\S\n]+|single[^\S\n]+)?(?:hour|day|week|fortnight|month|year|minute)(?!\p{L}))/giu)) {
    if (tokens.some((t) => t.start <= m.index! && m.index! < t.end)) continue;
    if (/^[^\S\n]+(?:hour|day|week|month|year|minute)[^\S\n]+and[^\S\n]+a[^\S\n]+half/iu.test(text.slice(m.index! + m[0].length))) continue;
    const gap = /^[^\S\n]+(?:(?:full|whole|single)[^\S\n]+)?/u.exec(text.slice(m.index! + m[0].length))![0];
    push(m.index!, m.index! + m[0].length + gap.length - 1, '1', true);
  }
  for (const w of wordNumbers(text)) {
    if (tokens.some((t) => t.start < w.end && w.start < t.end)) continue;
    push(w.start, w.end, String(w.value), true);
  }
  // "a 3/4 hp motor", "1/2 W": a simple fraction before a unit replaces the number before its slash.
  for (const m of text.matchAll(/(?<![\p{N}.,\/])(\d{1,2})\/(\d{1,2})(?![\p{N}.,\/])/gu)) {
    const [a, b] = [Number(m[1]), Number(m[2])];
    const end = m.index! + m[0].length;
    if (!(b > 1 && a < b) || !unitAt(text, end)) continue;
    for (let i = tokens.length - 1; i >= 0; i--) if (tokens[i].start >= m.index! && tokens[i].start < end) tokens.splice(i, 1);
    push(m.index!, end, String(a / b), false);
  }
  tokens.sort((a, b) => a.start - b.start);
  return tokens;
}

// ---------------------------------------------------------------------------------------------
// Pass 2: figures

interface Draft {
  start: number;
  end: number;
  kind: FigureKind;
  quantity: string;
  upper?: string;
  role: FigureRole;
  hedge?: FigureHedge;
  derived?: string;
  assumption?: string;
  /** For a temperature difference: which way the other temperature lies ("30 °C below a 25 °C room"). */
  direction?: 'up' | 'down';
  /** A percentage of the input ("returns 140 % of what it draws"). */
  ofInput?: boolean;
}

function suffixKind(s: Suffix): string | null {
  if (s === null) return null;
  if (s.type === 'percent') return '%';
  return s.per ? `${s.form.kind}/${s.per.kind}` : s.form.kind;
}

function isRangeGap(text: string, gapStart: number, gapEnd: number, firstStart: number): boolean {
  const gap = text.slice(gapStart, gapEnd);
  // "4 °C — 21 °C below the kitchen": a dash set off by spaces on both sides opens an aside.
  if (/^[^\S\n]+—[^\S\n]+$/u.test(gap)) return false;
  if (/^[^\S\n]*(?:[-–—]|to|or|and up to|up to|through|-to-)[^\S\n]*$/i.test(gap)) return !/^[^\S\n]+or[^\S\n]+$/i.test(gap) || /between|from/i.test(text.slice(Math.max(0, firstStart - 12), firstStart));
  return /^[^\S\n]+and[^\S\n]+$/i.test(gap) && /(?:between|from)[^\S\n]+$/i.test(text.slice(Math.max(0, firstStart - 12), firstStart));
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

/** The sentence around [start, end): from the last sentence break before to the next after. */
function sentenceAround(text: string, start: number, end: number): string {
  const from = windowStart(text, start, 0, 400);
  const rest = text.slice(end, end + 400);
  const m = /[.!?;]["”’')\]]*(?:\s|$)|\n/.exec(rest);
  return text.slice(from, m ? end + m.index : end + rest.length);
}

/** "warm end", "cold side", "hot junction" just before a temperature outweigh the words after it. */
const STRONG_SIDE_RE = /(?<!\p{L})(hot|warm|cold|cool|sunlit|sunny|heated|shaded|shady|cooled)(?:er)?[- ](?:end|side|junction|plate|face|reservoir|panel)s?(?:[^\S\n]+(?:\p{L}+))?[^\S\n]+(?:in|at|of|is|sits at|held at|kept at|runs at|near)?[^\S\n]*(?:(?:a|an|the)[^\S\n]+)?$/iu;

/** End of the words after the last figure that gave it its role ("… 3.2 km/s exhaust velocity"): the next figure's words start after them. */
let afterRoleEnd = 0;

const IMMEDIATE_HEDGE = '(?:(?:only|just|about|some|roughly|nearly|around|approximately|up to|a mere|a steady|an average of)[^\\S\\n]+)*';
const IMMEDIATE_IN_RE = new RegExp(`(?<!\\p{L})(?:takes|took|draws|drew|consumes|consumed|uses|used|needs|requires|required|absorbs|absorbed|is fed|was fed|pulls|pulled)[^\\S\\n]+${IMMEDIATE_HEDGE}$`, 'iu');
const IMMEDIATE_OUT_RE = new RegExp(`(?<!\\p{L})(?:delivers|delivered|produces|produced|generates|generated|returns|returned|puts out|put out|yields|yielded|outputs)[^\\S\\n]+${IMMEDIATE_HEDGE}$`, 'iu');

function roleFromWords(text: string, roles: CompiledRoles, start: number, end: number, floor: number): FigureRole {
  if (roles === ROLES.temperature) {
    // A heat pump's or fridge's source is its cold side and its sink the warm one (the other way round for an engine).
    if (HEAT_PUMP_RE.test(text) || COOLING_MACHINE_RE.test(text)) {
      const lead = text.slice(Math.max(floor, start - 40), start);
      if (/(?<!\p{L})(?:heat[^\S\n]+)?sink(?:[^\S\n]+(?:water|temperature|side|loop|air))?[^\S\n]*(?:at|of|is|[:=])?[^\S\n]*$/iu.test(lead)) return 'hot';
      if (/(?<!\p{L})(?:(?:air|ground|water|brine|heat|outdoor)[- ])?source(?:[^\S\n]+(?:water|temperature|side|loop|air))?[^\S\n]*(?:at|of|is|[:=])?[^\S\n]*$/iu.test(lead)) return 'cold';
    }
    const strong = STRONG_SIDE_RE.exec(text.slice(Math.max(floor, start - 40), start));
    if (strong) return /^(?:hot|warm|sun|heated)/i.test(strong[1]) ? 'hot' : 'cold';
    // "the heat it draws from 25 °C room air": where the heat comes from is the hot side.
    // (see below for power and energy)
    if (/(?<!\p{L})(?:heat|energy)(?:[^\S\n]+(?:it|that it|they))?[^\S\n]+(?:draws?|takes?|extracts?|absorbs?|gets?|pulls?|harvests?|collects?)[^\S\n]+from[^\S\n]+(?:(?:the|a|an)[^\S\n]+)?$/iu.test(text.slice(Math.max(floor, start - 60), start))) return 'hot';
  }
  // "filled a 5 kWh battery", "charged the 10 kWh pack": what is filled is what came out.
  if (roles.groups === POWER_ENERGY_ROLES && /(?<!\p{L})(?:fill(?:s|ed|ing)?|charg(?:es|ed|ing)|tops? up|topped up)[^\S\n]+(?:up[^\S\n]+)?(?:a|an|the|its|our|their)[^\S\n]+$/iu.test(text.slice(Math.max(floor, start - 40), start))) return 'out';
  // A verb right before the figure ("takes 50 PS of shaft power", "generates 40 kW") outweighs the
  // words after it.
  if (roles.groups === POWER_ENERGY_ROLES) {
    const lead = text.slice(Math.max(floor, start - 40), start);
    // (Not when a supply is the subject: "the bench supply delivers 5 A" is what the device takes.)
    if (!/(?<!\p{L})(?:suppl(?:y|ies)|batter(?:y|ies)|mains|grid|sources?|sockets?|packs?|alternators?|chargers?|PSUs?|adapters?)[^\S\n]+\p{L}+[^\S\n]+[^.;!?\n]{0,12}$/iu.test(lead)) {
      if (IMMEDIATE_IN_RE.test(lead)) return 'in';
      if (IMMEDIATE_OUT_RE.test(lead)) return 'out';
    }
  }
  roles.after.lastIndex = end;
  const a = roles.after.exec(text);
  if (a?.groups) {
    for (let i = 0; i < roles.groups.length; i++) {
      if (a.groups[`r${i}`] !== undefined) {
        afterRoleEnd = end + a[0].length;
        return roles.groups[i].role;
      }
    }
  }
  const from = windowStart(text, start, floor, BEFORE_WINDOW);
  const slice = text.slice(from, start);
  roles.before.lastIndex = 0;
  let last: RegExpExecArray | null = null;
  for (let m = roles.before.exec(slice); m; m = roles.before.exec(slice)) last = m;
  if (!last) return null;
  let best: FigureRole = null;
  let longest = 0;
  roles.beforeAt.forEach((re, i) => {
    re.lastIndex = last!.index;
    const m = re.exec(slice);
    if (m && m[0].length > longest) {
      longest = m[0].length;
      best = roles.groups[i].role;
    }
  });
  return best;
}

function roleFor(text: string, kind: FigureKind, start: number, end: number, floor: number): FigureRole {
  if (kind === 'power' || kind === 'energy') {
    IN_OUT_AFTER_RE.lastIndex = end;
    const io = IN_OUT_AFTER_RE.exec(text);
    if (io) return io[1].toLowerCase() === 'in' ? 'in' : 'out';
  }
  const roles = ROLES[kind];
  if (roles) return roleFromWords(text, roles, start, end, floor);
  if (kind === 'cop') {
    // "a heating COP of 4.1", "cooling COP 5.0": said right before it.
    const near = /(heating|cooling)[^\S\n]+(?:COP|coefficient of performance)[^.;!?\n]{0,25}$/iu.exec(text.slice(Math.max(0, start - 60), start));
    if (near) return near[1].toLowerCase() === 'cooling' ? 'cooling' : 'heating';
    // "COP_h ≈ 4.5", "COP_c = 3".
    const symbol = /COP_?\{?(h|c|heat|heating|cool|cooling)\}?(?!\p{L})[^.;!?\n]{0,12}$/iu.exec(text.slice(Math.max(0, start - 30), start));
    if (symbol) return /^c/i.test(symbol[1]) ? 'cooling' : 'heating';
    const around = text.slice(Math.max(0, start - COP_WINDOW), Math.min(text.length, end + COP_WINDOW));
    if (COP_COOLING_RE.test(around)) return 'cooling';
    if (COP_HEATING_RE.test(around) || HEAT_PUMP_RE.test(text)) return 'heating';
  }
  return null;
}

/** Hedges that leave a figure's role to the words before them ("delivers approximately 1 kW", "for about 3 kW of electricity"). */
const ROLE_TRANSPARENT_HEDGES = HEDGE_RES.filter((h) => h.hedge === 'about' || h.hedge === 'up-to' || h.hedge === 'at-least' || h.hedge === 'at-most');

/** Where the words that give a figure its role end: before any hedge said right before the figure. */
function roleContextStart(text: string, start: number, floor: number): number {
  let at = start;
  for (let again = true; again; ) {
    again = false;
    const before = text.slice(Math.max(floor, at - 24), at);
    for (const h of ROLE_TRANSPARENT_HEDGES) {
      const m = h.re.exec(before);
      if (m && m.index > 0 && /[^\S\n]$/.test(before.slice(0, m.index))) {
        at -= before.length - m.index;
        again = true;
        break;
      }
    }
  }
  return at;
}

function hedgeBefore(text: string, start: number): FigureHedge | undefined {
  const before = text.slice(Math.max(0, start - 24), start);
  for (const h of HEDGE_RES) if (h.re.test(before)) return h.hedge;
  return undefined;
}

/** For "60 % more energy out than in": the percentage is added to 1. */
type PercentReading = { kind: FigureKind; role?: FigureRole; factor: number; unit: string; assumption?: string; more?: boolean; derived?: string; ofInput?: boolean } | null;

/** "60 % more electrical energy out than in", "30 % more power than it draws": a gain of 1 + p. */
const PERCENT_MORE_RE =
  /[^\S\n]*(?:above|over|more than|in excess of|beyond)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:(?:electrical|electric)[^\S\n]+)?(?:input|consumption|power in|energy in|supply)(?!\p{L})|[^\S\n]*(?:more|extra|excess|surplus|additional)[^\S\n]+(?:(?:electrical|electric|useful|mechanical|thermal)[^\S\n]+)?(?:energy|power|output|heat|work|electricity)?[^\S\n]*(?:out[^\S\n]+)?(?:than|over|above|beyond)[^\S\n]+(?:(?:it|the|its)[^\S\n]+)?(?:[\p{L}\d.,-]+[^\S\n]+){0,4}?(?:in|input|takes|uses|consumes|draws|is fed|goes in|consumption|supply)(?!\p{L})|[^\S\n]*(?:more|extra)[^\S\n]+than[^\S\n]+(?:that|this|it)(?!\p{L})/iuy;

/** "70 % of the Carnot efficiency": a share of the bound, made an efficiency once the temperatures are known. */
const CARNOT_SHARE_AFTER_RE = /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:Carnot|ideal Carnot|reversible)(?:[^\S\n]+(?:efficiency|limit|bound|value|maximum|figure))?(?!\p{L})/iuy;
const CARNOT_SHARE = 'a share of the Carnot efficiency';

/** What a percentage is, by its context. */
function readPercent(text: string, start: number, end: number, floor: number): PercentReading {
  // 'at "about 29 %" efficiency': the words after a closing quote.
  end += /^["”’'»]*/u.exec(text.slice(end, end + 3))![0].length;
  CARNOT_SHARE_AFTER_RE.lastIndex = end;
  if (CARNOT_SHARE_AFTER_RE.test(text)) return { kind: 'efficiency', factor: 0.01, unit: '', derived: CARNOT_SHARE };
  SPEED_OF_LIGHT_AFTER_RE.lastIndex = end;
  const light = SPEED_OF_LIGHT_AFTER_RE.exec(text);
  if (light) return { kind: 'speed', factor: C_M_PER_S / 100, unit: 'm/s' };
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start);
  QE_AFTER_RE.lastIndex = end;
  const qe = QE_BEFORE_RE.exec(before);
  if (QE_AFTER_RE.test(text) || (qe && !EFFICIENCY_CHANGE_RE.test(qe[1]))) return { kind: 'quantum-efficiency', factor: 0.01, unit: '' };
  PERCENT_OF_INPUT_RE.lastIndex = end;
  if (PERCENT_OF_INPUT_RE.test(text) && !QE_BEFORE_RE.test(before)) {
    // "A heat-pump dryer gives 250 % of its electrical input as heat": a heating COP.
    if (HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text.replace(HEAT_PUMP_RE, '')) && /(?<!\p{L})(?:heat|warmth|heating)(?!\p{L})/iu.test(sentenceAround(text, start, end))) {
      return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: "A heat pump's heat out as a percentage of its work in: read as a heating COP." };
    }
    return { kind: 'efficiency', factor: 1, unit: '%', ofInput: true };
  }
  PERCENT_MORE_RE.lastIndex = end;
  if (PERCENT_MORE_RE.test(text)) return { kind: 'efficiency', factor: 0.01, unit: '', more: true };
  if (/(?<!\p{L})(?:output|out|production|yield)[^.;!?\n]{0,40}(?:exceeds?|exceeding|surpass\w*|is higher than|is greater than|beats?|tops?)[^.;!?\n]{0,40}(?:input|consumption|supply)[^.;!?\n]{0,15}?by[^\S\n]*(?:about|some|roughly|nearly|over|fully)?[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 120), start))) {
    return { kind: 'efficiency', factor: 0.01, unit: '', more: true };
  }
  EFFICIENCY_AFTER_RE.lastIndex = end;
  PERCENT_OF_HEAT_RE.lastIndex = end;
  SHARE_AS_WORK_RE.lastIndex = end;
  const after = EFFICIENCY_AFTER_RE.test(text) || PERCENT_OF_HEAT_RE.test(text) || SHARE_AS_WORK_RE.test(text);
  const m = EFFICIENCY_PERCENT_BEFORE_RE.exec(before);
  // "Ammonia–water cycle engine, 19 % at a 120 °C heat source": a percentage said right after a heat
  // engine named, with a temperature in the same sentence, is its efficiency.
  const engineSaid =
    /(?<!\p{L})(?:engines?|turbines?|Stirling|thermoelectric (?:generators?|modules?)|TEGs?|power (?:plants?|stations?|cycles?)|(?:Rankine|Brayton|ORC|steam|Kalina) cycles?)[^\S\n]*[,:–—-]?[^\S\n]*(?:(?:at|of|reaches|reached|achieves|achieved|claims|claimed|with|about|around|roughly|only|just)[^\S\n]+)*$/iu.test(before) &&
    /°|kelvin|degrees|Celsius|Fahrenheit|(?<!\p{L})K(?!\p{L})/iu.test(sentenceAround(text, start, end));
  const efficiency = after || engineSaid || (m !== null && !EFFICIENCY_CHANGE_RE.test(m[1]));
  if (!efficiency) return null;
  // The machine is named anywhere in the claim ("Had our air-to-water unit fitted. … '350 % efficient'").
  const sentence = text;
  const value = Number((/^[\d.,]+/.exec(text.slice(start, end))?.[0] ?? '').replace(',', '.'));
  if (HEAT_PUMP_RE.test(sentence) && !COOLING_MACHINE_RE.test(sentence.replace(HEAT_PUMP_RE, ''))) {
    if (!(value <= 100)) return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: 'A heat pump said to be more than 100 % efficient: read as a heating COP (heat delivered over work put in).' };
    return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: 'A heat pump\'s percentage read as a heating COP (heat delivered over work put in).' };
  }
  if (COOLING_MACHINE_RE.test(sentence) && value > 100) {
    return { kind: 'cop', role: 'cooling', factor: 0.01, unit: '', assumption: 'A refrigerator or air conditioner said to be more than 100 % efficient: read as a cooling COP (heat drawn out over work put in).' };
  }
  return { kind: 'efficiency', factor: 1, unit: '%' };
}

/** The kind of a bare number, from the words before it; a gain or ratio from the words after. */
function bareKind(text: string, start: number, end: number, floor: number): { kind: FigureKind; role?: FigureRole; derived?: string; factor?: number } | null {
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start);
  if (COP_SYMBOL_BEFORE_RE.test(before) || COP_WORDS_BEFORE_RE.test(before)) return { kind: 'cop' };
  if (EER_BEFORE_RE.test(before)) return { kind: 'cop', role: 'cooling', factor: BTU_PER_H_IN_W, derived: 'COP = EER × 0.293 071 (BTU/h per watt to watts per watt)' };
  if (QE_BEFORE_RE.test(before) && /(?:[=:]|of|is|was|reaching|above|over|exceeding)[^\S\n]*$/i.test(before)) return { kind: 'quantum-efficiency' };
  if (EFFICIENCY_BARE_BEFORE_RE.test(before)) return { kind: 'efficiency' };
  if (RATIO_BEFORE_RE.test(before)) return { kind: 'efficiency', derived: 'a ratio of output to input' };
  if (FACTOR_BEFORE_RE.test(before)) return { kind: 'efficiency', derived: 'output as a multiple of the input' };
  if (POWER_GAIN_BEFORE_RE.test(before) && !/^[^\S\n]*(?:dB|decibels?)(?!\p{L})/iu.test(text.slice(end, end + 12))) {
    const rest = text.slice(end, end + 60);
    const sentence = sentenceAround(text, start, end);
    if (
      !/(?<!\p{L})(?:amplifiers?|transistors?|antennas?|dB|decibels?|op-?amps?|preamp\w*)(?!\p{L})/iu.test(text) &&
      (/^[^\S\n]*(?:over|above|relative to|compared (?:with|to)|against)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:input|drive|driving|supply|electronics|power in|consumption)/iu.test(rest) ||
        OVER_UNITY_WORDS_RE.test(sentence) ||
        /(?<!\p{L})(?:generators?|motor-?generators?|alternators?)(?!\p{L})/iu.test(sentence))
    ) {
      return { kind: 'efficiency', derived: 'a power gain over the input' };
    }
  }
  GAIN_AFTER_RE.lastIndex = end;
  if (GAIN_AFTER_RE.test(text)) return { kind: 'efficiency', derived: 'units out for each unit in' };
  PERCENT_OF_HEAT_RE.lastIndex = end;
  if (PERCENT_OF_HEAT_RE.test(text)) return { kind: 'efficiency' };
  if (GAIN_BEFORE_RE.test(text.slice(windowStart(text, start, floor, 160), start))) return { kind: 'efficiency', derived: 'units out for each unit in' };
  TIMES_AFTER_RE.lastIndex = end;
  if (TIMES_AFTER_RE.test(text)) return { kind: 'efficiency', derived: 'output as a multiple of the input' };
  if (
    /^[^\S\n]*(?:times|x|×)(?!\p{L})/iu.test(text.slice(end, end + 8)) &&
    TIMES_BEFORE_RE.test(before) &&
    (/input|consum|draw|put in|supplied|takes|uses/i.test(text.slice(end, end + 60)) || /^[^\S\n]*(?:times|x|×)[^\S\n]+(?:that|this)(?!\p{L})/iu.test(text.slice(end, end + 16)))
  ) {
    return { kind: 'efficiency', derived: 'output as a multiple of the input' };
  }
  return null;
}

/** The number × factor, written so that parseQuantity reads it back. */
function scaled(num: string, factor: number | undefined): string {
  if (factor === undefined) return num;
  return String(Number((Number(num) * factor).toPrecision(15)));
}

function unitQuantity(num: string, s: Extract<Suffix, { type: 'unit' }>): { kind: FigureKind; quantity: string } {
  if (s.per) {
    const kind: FigureKind = s.form.kind === 'thrust' ? 'thrust-per-power' : 'specific-power';
    const n = s.perCount ? String(Number((Number(scaled(num, s.form.factor)) / s.perCount).toPrecision(15))) : scaled(num, s.form.factor);
    return { kind, quantity: `${n} ${s.form.unit} / ${s.per.unit}` };
  }
  return { kind: s.form.kind, quantity: `${scaled(num, s.form.factor)} ${s.form.unit}` };
}

/** A temperature read as a difference: "20 degC" of difference is "20 K"; "36 degF" is 20 K. */
function differenceQuantity(num: string, unit: string): string {
  const n = Number(num);
  if (unit === 'degC' || unit === 'K') return `${num} K`;
  if (unit === 'mK') return `${num} mK`;
  if (unit === 'degF') return `${Number(((n * 5) / 9).toPrecision(15))} K`;
  return `${num} K`;
}

/** Which way a difference points: "30 °C below …", "9 °F cooler" → down; "40 degrees above …" → up. */
function differenceDirection(text: string, end: number): 'up' | 'down' | undefined {
  const after = text.slice(end, end + 30);
  if (/^[^\S\n]*(?:\p{L}+[^\S\n]+)?(?:below|under|cooler|colder|lower)(?!\p{L})/iu.test(after)) return 'down';
  if (/^[^\S\n]*(?:\p{L}+[^\S\n]+)?(?:above|over|warmer|hotter|higher)(?!\p{L})/iu.test(after)) return 'up';
  return undefined;
}

function isDifference(text: string, start: number, end: number, floor: number): boolean {
  const before = text.slice(Math.max(floor, start - 60), start);
  if (DIFF_BEFORE_RE.test(before)) {
    // "only 20 °C" / "just 20 °C" alone are not differences: the clause must speak of one.
    const m = DIFF_BEFORE_RE.exec(before)!;
    if (!/^(?:only|a mere|just)/i.test(m[0].trim()) || /differen|gradient|ΔT|delta|lift|rise/i.test(sentenceAround(text, start, end))) return true;
  }
  DIFF_AFTER_RE.lastIndex = end;
  const a = DIFF_AFTER_RE.exec(text);
  if (!a) return false;
  const word = a[0].trim().toLowerCase();
  // "20 °C above ambient", "heated 40 K over room temperature"; "between" only as "20 K between the plates".
  if (/^(?:warmer|hotter|cooler|colder|higher|lower|above|below|over|under)/.test(word)) {
    const rest = text.slice(end + a[0].length, end + a[0].length + 40);
    if (/^(?:warmer|hotter|cooler|colder|lower|higher)/.test(word) && /^[^\S\n]*(?:[,.;:)!?—–]|(?:and|with|at|in|for|while|but|so|when)\b|$)/.test(rest)) return true;
    // "5 °C below zero", "above freezing": a temperature, not a difference.
    if (/^[^\S\n]*(?:zero|freezing|nought|the freezing point)(?!\p{L})/iu.test(rest)) return false;
    // "21 °C below the kitchen", "38 K above it": measured from something named.
    if (/^[^\S\n]*(?:than[^\S\n]+)?(?:the|a|an|its|their|our|his|her|this|that|it|them)(?!\p{L})/iu.test(rest)) return true;
    return /^[^\S\n]*(?:than[^\S\n]+)?(?:(?:the|a|an|its|their)[^\S\n]+)?(?:(?:mean|average|outside|outdoor|surrounding|local|daytime|night-?time|cooling|inlet|room|deep|surface)[^\S\n]+){0,2}(?:ambient|room|outside|outdoor|surrounding|environment|air|water|inlet|sink|source|cold|hot|other|freezing|surface|\p{N}|[-−])/iu.test(rest) || /^\s*than/.test(rest) || /^[^\S\n]*(?:it|that|this|them)(?!\p{L})/iu.test(rest);
  }
  if (/^apart/.test(word)) return true;
  if (/^between|^across/.test(word)) return /^[^\S\n]*(?:the|its|two|both|hot|cold|plates|sides|ends|junctions|reservoirs)/i.test(text.slice(end + a[0].length, end + a[0].length + 20));
  return true;
}

/**
 * The figures in a pasted text, in order of appearance, with ids "f1", "f2", …; derived figures
 * follow the figures they come from. See the file's comment for what is read.
 */
export function extractFigures(text: string): Figure[] {
  const restated: [number, number][] = [];
  const figures = readFigures(text, restated);
  if (restated.length === 0) return figures;
  // "2 kW (2.7 hp) of electrical input": read again with the restatements blanked out (offsets kept),
  // so that the words after a restatement reach the figure it restates.
  let blanked = text;
  for (const [a, b] of restated) blanked = blanked.slice(0, a) + ' '.repeat(b - a) + blanked.slice(b);
  return readFigures(blanked, []).map((f) => (f.start === null || f.end === null ? f : { ...f, text: text.slice(f.start, f.end) }));
}

function readFigures(text: string, restated: [number, number][]): Figure[] {
  afterRoleEnd = 0;
  const tokens = tokenize(text);
  const drafts: Draft[] = [];
  let floor = 0;

  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    if (t.skip || t.consumed || t.plusMinus) continue;
    let suffix = t.suffix;
    let end = t.end;
    const start = t.start;
    let upperNum: string | undefined;
    const next: NumberToken | undefined = tokens[i + 1];
    // Ranges and uncertainties: "3–6 mN", "3 mN to 6 mN", "between 0.5 and 1.5 kW", "1.2 ± 0.3 mN", "2.31(4) mN".
    if (t.unc !== undefined) {
      const mid = Number(t.num);
      upperNum = String(Number((mid + t.unc).toPrecision(15)));
      t.num = String(Number((mid - t.unc).toPrecision(15)));
    } else if (next && !next.skip) {
      const gapStart = t.suffix ? t.end : t.numEnd;
      const pmGap = /^[^\S\n]*(?:±|\+\/-|\+-)[^\S\n]*$/.test(text.slice(gapStart, next.start));
      // "96 W ± 3 %": an uncertainty in per cent of the figure.
      const relative = pmGap && next.plusMinus && t.suffix !== null && t.suffix.type === 'unit' && next.suffix?.type === 'percent';
      if (pmGap && next.plusMinus && (relative || !t.suffix || suffixKind(t.suffix) === suffixKind(next.suffix) || !next.suffix)) {
        const mid = Number(t.num);
        const unc = relative ? (mid * Number(next.num)) / 100 : Number(next.num);
        suffix = relative ? t.suffix : (t.suffix ?? next.suffix);
        upperNum = String(Number((mid + unc).toPrecision(15)));
        t.num = String(Number((mid - unc).toPrecision(15)));
        end = t.suffix && !next.suffix ? next.numEnd : next.end;
        next.consumed = true;
      } else if (!t.suffix && !next.suffix && !t.words && !next.words && !next.plusMinus && isRangeGap(text, t.numEnd, next.start, t.start) && bareKind(text, t.start, t.numEnd, floor)) {
        // "a COP between 3.2 and 4.1", "an efficiency of 0.3–0.4".
        upperNum = next.num;
        end = next.end;
        next.consumed = true;
      } else if (!next.plusMinus && isRangeGap(text, gapStart, next.start, t.start) && (t.suffix === null || suffixKind(t.suffix) === suffixKind(next.suffix)) && next.suffix) {
        // Two temperatures "between 600 °C and 30 °C" or "from 10 °C to 55 °C" are the two sides, not a range.
        // (A third temperature in the same sentence makes it a range of one side.)
        const thirdTemperature =
          suffixKind(next.suffix) === 'temperature' &&
          tokens.some((o) => o !== t && o !== next && !o.skip && o.suffix?.type === 'unit' && o.suffix.form.kind === 'temperature' && !o.suffix.form.ambiguous && windowStart(text, o.start, 0, 400) === windowStart(text, t.start, 0, 400));
        const dash = /^[^\S\n]*[-–—][^\S\n]*$/.test(text.slice(gapStart, next.start));
        // "burns from 25 t to 9 t": a craft's mass before and after, not a range.
        let fallingMass = false;
        if (suffixKind(next.suffix) === 'mass' && t.suffix?.type === 'unit' && next.suffix?.type === 'unit' && /(?<!\p{L})from[^\S\n]+$/iu.test(text.slice(Math.max(0, t.start - 6), t.start))) {
          try {
            fallingMass = parseQuantity(unitQuantity(t.num, t.suffix).quantity, 'kg') > parseQuantity(unitQuantity(next.num, next.suffix).quantity, 'kg');
          } catch {
            /* not comparable */
          }
        }
        const twoSides =
          fallingMass ||
          (suffixKind(next.suffix) === 'voltage' && !dash) ||
          (!thirdTemperature && suffixKind(next.suffix) === 'temperature' && !dash && !isDifference(text, t.start, next.end, floor));
        suffix = next.suffix;
        if (!twoSides) {
          upperNum = next.num;
          end = next.end;
          next.consumed = true;
        }
      }
    }
    if (t.words && !suffix && !bareKind(text, t.start, t.numEnd, floor)) continue;

    let kind: FigureKind | null = null;
    let quantity = '';
    let upper: string | undefined;
    let role: FigureRole | undefined;
    let derived: string | undefined;
    let assumption: string | undefined;
    let direction: Draft['direction'];
    let ofInput: boolean | undefined;
    if (suffix?.type === 'unit') {
      const q = unitQuantity(t.num, suffix);
      kind = q.kind;
      quantity = q.quantity;
      if (upperNum !== undefined) upper = unitQuantity(upperNum, suffix).quantity;
      // "degrees" alone: a temperature where the sentence speaks of one, else an angle (not a figure).
      if (kind === 'temperature' && suffix.form.ambiguous && !TEMPERATURE_CONTEXT_RE.test(sentenceAround(text, start, end))) continue;
      if (kind === 'temperature' && isDifference(text, start, end, floor)) {
        kind = 'temperature-difference';
        quantity = differenceQuantity(scaled(t.num, suffix.form.factor), suffix.form.unit);
        direction = differenceDirection(text, end);
        if (upperNum !== undefined) upper = differenceQuantity(upperNum, suffix.form.unit);
      } else if (kind === 'duration' && suffix.form.unit === 's' && (ISP_BEFORE_RE.test(text.slice(Math.max(floor, start - BEFORE_WINDOW), start)) || ((ISP_AFTER_RE.lastIndex = end), ISP_AFTER_RE.test(text)))) {
        kind = 'specific-impulse';
      } else if (kind === 'duration' && /(?:(?<!\p{L})at|@)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 4), start))) {
        // "at 10 h": a time of day.
        continue;
      } else if (kind === 'temperature' && suffix.form.ambiguous) {
        assumption = suffix.form === GLUED_CELSIUS ? '"C" read as degrees Celsius.' : suffix.form === GLUED_FAHRENHEIT ? '"F" read as degrees Fahrenheit.' : '"Degrees" read as degrees Celsius.';
      }
    } else if (suffix?.type === 'percent') {
      const reading = readPercent(text, start, end, floor);
      if (reading) {
        kind = reading.kind;
        role = reading.role;
        assumption = reading.assumption;
        ofInput = reading.ofInput;
        const q = (n: string) =>
          reading.more
            ? String(Number((1 + Number(n) * reading.factor).toPrecision(15)))
            : reading.unit === '%'
              ? `${n} %`
              : reading.unit
                ? `${scaled(n, reading.factor)} ${reading.unit}`
                : scaled(n, reading.factor);
        if (reading.more) derived = 'output = input + the percentage more';
        if (reading.derived) derived = reading.derived;
        quantity = q(t.num);
        if (upperNum !== undefined) upper = q(upperNum);
      }
    } else {
      const bare = bareKind(text, start, t.numEnd, floor);
      if (bare) {
        kind = bare.kind;
        role = bare.role;
        derived = bare.derived;
        quantity = scaled(t.num, bare.factor);
        if (upperNum !== undefined) upper = scaled(upperNum, bare.factor);
        // "three times as much heat as the electricity it uses", for a heat pump: a heating COP.
        if (kind === 'efficiency' && derived && HEAT_PUMP_RE.test(sentenceAround(text, start, end))) {
          kind = 'cop';
          role = 'heating';
          derived = undefined;
          assumption = 'A heat pump\'s heat out as a multiple of its work in: read as a heating COP.';
        }
      }
    }
    if (kind === null) continue;
    if ((kind === 'power' || kind === 'energy') && suffix?.type === 'unit' && !suffix.per) {
      GAIN_PER_UNIT_RE.lastIndex = end;
      const g = GAIN_PER_UNIT_RE.exec(text);
      if (g) {
        kind = 'efficiency';
        quantity = t.num;
        upper = upperNum;
        derived = 'units out for each unit in';
      }
    }
    // "12 kW (16 hp)": a restatement in other units, not a second figure.
    const prev = drafts[drafts.length - 1];
    // (A temperature and a difference are one kind here: "4 °C (39 °F)", "a 20 °C (36 °F) lift".)
    const temperatures = suffix?.type === 'unit' && suffix.form.kind === 'temperature' && prev && (prev.kind === 'temperature' || prev.kind === 'temperature-difference');
    if (prev && (prev.kind === kind || temperatures) && /^[^\S\n]*[(\[][^\S\n]*(?:about|approx\.?|~|≈|or)?[^\S\n]*$/.test(text.slice(prev.end, start))) {
      try {
        const b = parseQuantity(temperatures && suffix?.type === 'unit' && prev.kind === 'temperature' ? unitQuantity(t.num, suffix).quantity : quantity, FIGURE_SI_UNIT[prev.kind]);
        // (Either end of a range: "120–150 °C (302 °F)".)
        const near = (a: number, c = b) => Math.abs(a - c) <= 0.05 * Math.max(Math.abs(a), Math.abs(c));
        // Both read as differences: "a 20 °C (36 °F) temperature difference".
        const asDifference = (q: string) => {
          const m = /^(-?[\d.e+-]+) (degC|degF|K|mK)$/.exec(q);
          return m ? parseQuantity(differenceQuantity(m[1], m[2]), 'K') : NaN;
        };
        const bothDifferences =
          temperatures && suffix?.type === 'unit' && prev.kind === 'temperature' && prev.upper === undefined &&
          near(asDifference(prev.quantity), parseQuantity(differenceQuantity(scaled(t.num, suffix.form.factor), suffix.form.unit), 'K'));
        if (bothDifferences || near(parseQuantity(prev.quantity, FIGURE_SI_UNIT[prev.kind])) || (prev.upper !== undefined && near(parseQuantity(prev.upper, FIGURE_SI_UNIT[prev.kind])))) {
          const close = /^[^\S\n]*[)\]]/.exec(text.slice(end));
          if (close && upper === undefined) restated.push([prev.end, end + close[0].length]);
          floor = end;
          continue;
        }
      } catch {
        /* not comparable: keep it */
      }
    }
    if (role === undefined) role = roleFor(text, kind, roleContextStart(text, start, floor), end, floor);
    // "10 kWe", "3 MWe": electrical output.
    if (role === null && kind === 'power' && suffix?.type === 'unit' && /[kMG]?We$/.test(text.slice(t.numEnd, end).trim())) role = 'out';
    let hedge = hedgeBefore(text, start);
    // "over two weeks", "for over 3 hours" speak of the time the claim covers.
    if (kind === 'duration' && (hedge === 'more-than' || hedge === 'less-than')) hedge = undefined;
    // A range's lower end must be the lower number ("6–3 mN" is read as 3 to 6).
    if (upper !== undefined) {
      try {
        const unit = FIGURE_SI_UNIT[kind];
        if (parseQuantity(upper, unit) < parseQuantity(quantity, unit)) [quantity, upper] = [upper, quantity];
      } catch {
        /* left to the final pass */
      }
    }
    drafts.push({ start, end, kind, quantity, upper, role, hedge, derived, assumption, direction, ofInput });
    floor = Math.max(end, afterRoleEnd);
  }

  // "twice the energy it consumes", "a threefold output over its input": a gain in words.
  MULTIPLE_WORD_RE.lastIndex = 0;
  for (let m = MULTIPLE_WORD_RE.exec(text); m; m = MULTIPLE_WORD_RE.exec(text)) {
    const at = m.index + m[0].length;
    const after = text.slice(at, at + 90);
    const light = /^[^\S\n]+(?:the[^\S\n]+)?(?:speed|velocity)[^\S\n]+of[^\S\n]+light(?!\p{L})/iu.exec(after);
    if (light && !drafts.some((d) => d.start <= m!.index && m!.index < d.end)) {
      const value = MULTIPLE_VALUE[m[1].toLowerCase().replace('-', '')];
      if (value) {
        const d: Draft = { start: m.index, end: at + light[0].length, kind: 'speed', quantity: `${value * C_M_PER_S} m/s`, role: null };
        const pos = drafts.findIndex((x) => x.start > m!.index);
        if (pos < 0) drafts.push(d);
        else drafts.splice(pos, 0, d);
      }
      continue;
    }
    // ("draws 200 W and … puts out three times that": a multiple of the input just stated.)
    const ofThat = /^[^\S\n]+(?:that|this)(?!\p{L})/iu.test(after) && drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in' && d.end <= m!.index && d.start >= windowStart(text, m!.index, 0, 400));
    if (!ofThat && !/^[^\S\n]+(?:the|its|as much|as many|more)[^.;!?\n]{0,60}(?:input|consum\w*|draws?|uses?|takes?|supplied|put in|fed|it gets|goes in)/iu.test(after)) continue;
    if (drafts.some((d) => d.start <= m!.index && m!.index < d.end)) continue;
    const value = MULTIPLE_VALUE[m[1].toLowerCase().replace('-', '')];
    if (!value) continue;
    const sentence = sentenceAround(text, m.index, at);
    const heatPump = HEAT_PUMP_RE.test(sentence);
    const d: Draft = heatPump
      ? { start: m.index, end: at, kind: 'cop', quantity: String(value), role: 'heating', assumption: 'A heat pump\'s heat out as a multiple of its work in: read as a heating COP.' }
      : { start: m.index, end: at, kind: 'efficiency', quantity: String(value), role: null, derived: 'output as a multiple of the input' };
    const pos = drafts.findIndex((x) => x.start > m!.index);
    if (pos < 0) drafts.push(d);
    else drafts.splice(pos, 0, d);
  }

  relate(text, drafts);

  const figures: Figure[] = [];
  for (const d of drafts) {
    const unit = FIGURE_SI_UNIT[d.kind];
    let si: number;
    let up: Figure['upper'];
    try {
      si = parseQuantity(d.quantity, unit);
      if (d.upper !== undefined) {
        const u = parseQuantity(d.upper, unit);
        up = { quantity: d.upper, si: u, display: formatQuantity(u, unit) };
      }
    } catch (err) {
      if (err instanceof QuantityError) continue; // not a figure after all (kept out rather than guessed)
      throw err;
    }
    const f: Figure = {
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
    };
    if (up) f.upper = up;
    if (d.hedge) f.hedge = d.hedge;
    if (d.derived) f.derived = d.derived;
    if (d.assumption) f.assumption = d.assumption;
    figures.push(f);
  }
  return figures;
}

// ---------------------------------------------------------------------------------------------
// Pass 3: relations between figures

/** Abbreviations whose full stop ends no sentence ("max. current", "approx. 3 kW"). */
const ABBREVIATIONS_RE = /(?<!\p{L})(?:max|min|approx|nom|avg|ca|cf|e\.g|i\.e|no|vs|incl|excl|resp|est|typ|cont|spec|ref|fig|eq)\./giu;

/** Devices whose "COP" is an output-over-input ratio, not a heat pump's. */
const ELECTRICAL_GAIN_RE = /(?<!\p{L})(?:circuits?|coils?|generators?|alternators?|motors?|batter(?:y|ies)|electrical energy|electricity out|electrical output|magnets?|over-?unity|free energy|zero-?point|ZPE|self-charging|self-running|transformers?|capacitors?|resonators?|electrolys\w*|HHO|oxyhydrogen|palladium|deuterium|deuteride|LENR|cold fusion|low-energy nuclear|nickel[–-]hydrogen|excess heat)(?!\p{L})/iu;

/** A propellant mass fraction: "propellant is 90 % of the mass", "90 % propellant by mass", "a propellant fraction of 85 %". */
const PROPELLANT_FRACTION_RE =
  /(?<!\p{L})propellant(?:[^\S\n]+mass)?(?:[^\S\n]+fraction)?[^\S\n]+(?:is|of|=|:|makes up|accounts for)?[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*%[^\S\n]+of|(\d+(?:\.\d+)?)[^\S\n]*%[^\S\n]+(?:of[^\S\n]+(?:its|the)[^\S\n]+(?:[\p{L}\d-]+[^\S\n]+){0,3})?(?:mass[^\S\n]+)?(?:is[^\S\n]+)?propellant|(?<!\p{L})propellant(?:[^\S\n]+mass)?[^\S\n]+fraction[^\S\n]+(?:of|is|=)[^\S\n]*(\d+(?:\.\d+)?)[^\S\n]*%/iu;

/** Between a temperature and a difference that describes it: "−18 °C, a full 50 K below …", "34 °C, 5 K warmer than …". */
const APPOSITION_RE = /^[\s,;(–—-]*(?:(?:a|an|some|about|roughly|nearly|just|only|full|fully|which is|that is|i\.e\.|or|thus|so|still|at least|at most|over|under)[\s,]+)*$/iu;

/** After a difference: the side it is measured from, named ("… over its source", "… below the kitchen"), not a pronoun. */
const NAMED_OTHER_SIDE_RE = /^[^\S\n]*(?:\p{L}+[^\S\n]+)?(?:above|over|below|under|(?:warmer|hotter|colder|cooler|higher|lower)[^\S\n]+than)[^\S\n]+(?:the|its|their|our|a|an)[^\S\n]+(?!\p{N})/iu;

const ROCKET_RE = /(?<!\p{L})(?:rockets?|propellant|Isp|specific impulse|thrusters?|burn(?:out)?|stages?|spacecraft|lander|probe|satellite|CubeSat|delta-?v|Δv|manoeuvres?|maneuvers?|launch(?:er)?|orbit\w*|engines? (?:fire|burn))(?!\p{L})/iu;

/** Words that make a sentence's mass the craft's: the craft itself, its propellant, its engine. */
const CRAFT_RE =
  /(?<!\p{L})(?:rockets?|propellants?|Isp|specific impulse|thrusters?|burn(?:out)?|stages?|spacecraft|craft|landers?|probes?|satellites?|CubeSats?|smallsats?|microsat\w*|delta-?v|Δv|manoeuvres?|maneuvers?|launch(?:er)?|orbit\w*|engines?|vehicles?|tugs?|stacks?|ships?|modules?|capsules?|boosters?|orbiters?|missiles?|payloads?|tanks?|fuel\w*|oxidi[sz]ers?|xenon|krypton|hydrazine|kerosene|methane|hydrogen|oxygen|nitrogen|argon|exhaust|wet|dry|m[01f]|masses)(?!\p{L})/iu;

/** After "per": one of a counted thing, not a unit ("per bit", "per cycle"). */
const PER_COUNT_RE = /^(?:(?:erased|logical|logic|single|full|complete|charge|working)[^\S\n]+)?(?:bits?|operations?|erasures?|cycles?|batch(?:es)?|flips?|runs?|trips?|laps?|charges?|discharges?|fills?|sessions?)(?!\p{L})/iu;

/** "P_out/P_in =", "output/input:": a ratio of two labelled figures about to be given. */
const RATIO_LABELS_RE = /(?<!\p{L})([PEW]_?\{?(?:out|in|o|i)\}?|outputs?|inputs?|out|in)[^\S\n]*\/[^\S\n]*([PEW]_?\{?(?:out|in|o|i)\}?|outputs?|inputs?|out|in)(?!\p{L})[^\S\n]*[=:≈~][^\S\n]*/giu;

/** A verb that makes a signal bigger, just before the first of two figures ("amplifies a 1 mW signal to 100 mW"). */
const AMPLIFY_BEFORE_RE = /(?<!\p{L})(?:amplif(?:y|ies|ied|ying)|boost(?:s|ed|ing)?|lift(?:s|ed|ing)?|rais(?:e|es|ed|ing)|steps? up|stepped up|stepping up)[^\S\n]+(?:(?:a|an|the|its|their)[^\S\n]+)?(?:(?:input|incoming|weak|small|faint|signal)[^\S\n]+){0,2}(?:(?:signal|input|power|level)[^\S\n]+)?(?:from[^\S\n]+)?$/iu;

/** A distance covered in a time: "4.2 light years in 30 days", "1 AU in 2 hours". */
const TRAVEL_RE = /(?<![\p{L}\p{N}.,])(\d[\d,]*(?:\.\d+)?)[^\S\n]*(light[- ]years?|lightyears?|parsecs?|astronomical units?|AU)[^\S\n]+in[^\S\n]+(?:(?:just|only|about|under|less than|roughly)[^\S\n]+)?(\d[\d,]*(?:\.\d+)?|an?|one)[^\S\n]*(seconds?|minutes?|hours?|days?|weeks?|months?|years?)(?!\p{L})/giu;
const TRAVEL_LENGTH: Record<string, number> = { lightyear: 9460730472580800, parsec: 3.0856775814913673e16, astronomicalunit: 149597870700, au: 149597870700 };
const TRAVEL_TIME: Record<string, number> = { second: 1, minute: 60, hour: 3600, day: 86400, week: 604800, month: 2629800, year: 31557600 };

/** Words before the temperatures a device is rated for. */
const OPERATING_RANGE_RE =
  /(?<!\p{L})(?:(?:operating|operation|storage|ambient|rated|permitted|allowed|working) (?:temperature )?(?:range|temperatures?|limits?|conditions?)(?: (?:of|is|from|between))?[:=]?[^\S\n]*(?:from|between)?|(?:rated|designed|built|certified|specified|guaranteed|able)? ?(?:to )?(?:keep )?(?:work(?:s|ing)?|run(?:s|ning)?|operat(?:e|es|ing)|function(?:s|ing)?|start(?:s|ing)?) (?:(?:reliably|fine|normally|properly|well) )?(?:down|up) to|(?:rated|certified|specified|good) (?:down|up) to|(?:survives?|withstands?|tolerates?)(?: temperatures?)?(?: (?:down|up) to| of)?)[^\S\n]*$/iu;

/** Words of a time that is not how long the device ran. */
const NOT_A_RUN_RE =
  /(?<!\p{L})(?:build|built|develop\w*|design(?:ed|ing)?|research\w*|assembl\w*|construct\w*|ago|warrant\w*|guarantee\w*|founded|old|manufactur\w*|lead time|payback|pays? (?:for )?(?:it|it)self|amorti[sz]\w*|deliver(?:y|ies) (?:time|in)|ship(?:s|ping)? in|funding|grant|contract|project|programme|program|schedule[d]?|planned|deadline)(?!\p{L})/iu;

/** Roles the words leave open, read from the other figures (see the file's comment). */
function rolesByContext(text: string, drafts: Draft[]): void {
  // "covers 4.2 light years in 30 days": a speed, distance over time (IAU 2012 B2 astronomical unit,
  // IAU 2015 B2 parsec, the light-year of the Julian year).
  for (const m of text.matchAll(TRAVEL_RE)) {
    const distance = Number(m[1].replace(/,/g, '')) * (TRAVEL_LENGTH[m[2].toLowerCase().replace(/s$/, '').replace(/[- ]/g, '')] ?? NaN);
    const count = /^(?:a|an|one)$/i.test(m[3]) ? 1 : Number(m[3].replace(/,/g, ''));
    const time = count * (TRAVEL_TIME[m[4].toLowerCase().replace(/s$/, '')] ?? NaN);
    if (!(distance > 0) || !(time > 0) || drafts.some((d) => d.kind === 'speed' && d.start >= m.index! && d.start < m.index! + m[0].length)) continue;
    const d: Draft = {
      start: m.index!,
      end: m.index! + m[0].length,
      kind: 'speed',
      quantity: typedSi(distance / time, 'm/s'),
      role: null,
      derived: `speed = distance / time (${m[1]} ${m[2]} in ${m[3]} ${m[4]})`,
    };
    const at = drafts.findIndex((x) => x.start > d.start);
    if (at < 0) drafts.push(d);
    else drafts.splice(at, 0, d);
  }
  const energyLike = (d: Draft) => d.kind === 'power' || d.kind === 'energy';
  // A thrust and a power: the power drives it.
  if (drafts.some((d) => d.kind === 'thrust' || d.kind === 'thrust-per-power')) {
    for (const d of drafts) if (d.kind === 'power' && d.role === null) d.role = 'in';
    // "emits 8 kW as a collimated beam": what a thruster puts out is what drives it.
    if (!drafts.some((d) => d.kind === 'power' && d.role === 'in')) for (const d of drafts) if (d.kind === 'power' && d.role === 'out') d.role = 'in';
  }
  // "turns 3 kW of shaft power into 2.7 kW of electricity": the first goes in, the second comes out.
  const flowsInto = drafts.filter(energyLike);
  for (let i = 0; i + 1 < flowsInto.length; i++) {
    const [a, b] = [flowsInto[i], flowsInto[i + 1]];
    if (a.kind !== b.kind) continue;
    // "640 MJ of fuel for 60 kWh of electricity": what was burnt, and what it gave.
    if (/^[^\S\n]*of[^\S\n]+(?:fuel|diesel|petrol|gasoline|coal|hydrogen|wood|biomass|propane|kerosene|natural gas|gas)(?!\p{L})[^.;!?\n]{0,25}?(?<!\p{L})for[^\S\n]+(?:(?:a|an|the|about|some|roughly)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'in';
      b.role = 'out';
      continue;
    }
    // "3–5 W of electricity from roughly 100 W of heat": the first came out of the second.
    if (/^[^\S\n]*(?:of[^\S\n]+[\p{L} -]{0,30}?)?[^\S\n]*from[^\S\n]+(?:(?:a|an|the|about|some|roughly|only|just|up to)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'out';
      b.role = 'in';
      continue;
    }
    if (!/^[^.;!?\n]{0,50}?(?<!\p{L})into[^\S\n]+(?:(?:a|an|the|about|some|roughly|up to)[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) continue;
    if (!/(?<!\p{L})(?:turns?|turning|turned|converts?|converting|converted|transforms?|transforming|transformed|changes?|changing|changed|makes?)[^\S\n]+(?:(?:the|its|their|a|an|about|some|roughly|up to)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, a.start - 40), a.start))) continue;
    a.role = 'in';
    b.role = 'out';
  }
  // "35 kW of electricity plus 50 kW of useful heat": the second takes the first's side.
  const flows = drafts.filter(energyLike);
  for (let i = 0; i + 1 < flows.length; i++) {
    const [a, b] = [flows[i], flows[i + 1]];
    if (a.role !== null && b.role === null && a.kind === b.kind && /^[^\S\n]*(?:(?:of|as)[^\S\n]+[\p{L} -]{0,30}?[^\S\n]*(?:,[^\S\n]*)?(?:plus|as well as|along with|together with|and also|on top of|and)|(?:,[^\S\n]*)?(?:plus|as well as|along with|together with|and also|on top of))[^\S\n]+$/iu.test(text.slice(a.end, b.start))) {
      b.role = a.role;
    }
  }
  // One side named, one figure left: the other side.
  const named = drafts.filter((d) => energyLike(d) && (d.role === 'in' || d.role === 'out'));
  const open = drafts.filter((d) => energyLike(d) && d.role === null);
  if (named.length && open.length === 1) {
    if (named.every((d) => d.role === 'in')) open[0].role = 'out';
    else if (named.every((d) => d.role === 'out')) open[0].role = 'in';
  }
  // "propellant is 90 % of the vehicle's mass", "90 % propellant by mass": the propellant from a fraction.
  const fraction = PROPELLANT_FRACTION_RE.exec(text);
  // "puts 3 W into a little cell for 2 hours, and the cell ends up holding 5 Wh": a charging ledger,
  // what went into the store is the input and what it holds at the end the output.
  const held = drafts.find((d) => d.kind === 'energy' && ENDS_UP_HOLDING_RE.test(text.slice(Math.max(0, d.start - 40), d.start)));
  if (held) {
    const into = drafts.filter((d) => energyLike(d) && d.start < held.start && !d.derived && STORE_INTO_RE.test(text.slice(d.end, d.end + 80)));
    if (into.length > 0) {
      held.role = 'out';
      for (const d of into) d.role = 'in';
    }
  }
  // "The supercap bank holds 50 kJ … it powered a 2 kW heater for five minutes": what a store holds
  // before it runs a load is what it has to give.
  const stored = drafts.filter((d) => d.kind === 'energy' && !d.derived && d.role !== 'in' && STORE_HOLDS_RE.test(text.slice(Math.max(0, d.start - 30), d.start)));
  if (stored.length === 1 && !held && !drafts.some((d) => energyLike(d) && d.role === 'in')) {
    const later = drafts.filter((d) => energyLike(d) && d !== stored[0] && d.start > stored[0].end && d.role === 'out');
    if (later.length > 0) stored[0].role = 'in';
  }
  const massDrafts = drafts.filter((d) => d.kind === 'mass');
  // "The test stand itself weighs 85 kg": a mass of the apparatus, in a sentence that names no craft.
  for (const m of massDrafts) {
    const sentence = sentenceAround(text, m.start, m.end);
    if (m.role === null && APPARATUS_RE.test(sentence) && !CRAFT_RE.test(sentence.replace(APPARATUS_RE, ''))) m.role = 'aside';
  }
  const craftMasses = massDrafts.filter((d) => d.role !== 'aside');
  const whole = craftMasses.length === 1 ? craftMasses[0] : craftMasses.find((d) => d.role === null || d.role === 'wet');
  if (fraction && whole && !massDrafts.some((d) => d !== whole && d.role === 'propellant')) {
    const p = Number(fraction[1] ?? fraction[2] ?? fraction[3]) / 100;
    const m = siOf(whole);
    if (p > 0 && p < 1 && m !== null) {
      whole.role = 'wet';
      drafts.splice(drafts.indexOf(whole) + 1, 0, {
        start: Math.min(whole.start, fraction.index),
        end: Math.max(whole.end, fraction.index + fraction[0].length),
        kind: 'mass',
        quantity: typedSi(p * m, 'kg'),
        role: 'propellant',
        derived: `propellant = ${formatPrint(p * 100)} % of ${formatQuantity(m, 'kg')}`,
      });
    }
  }

  // A rocket: masses and speeds.
  const masses = drafts.filter((d) => d.kind === 'mass');
  const rocket =
    drafts.some((d) => d.kind === 'specific-impulse' || (d.kind === 'speed' && (d.role === 'exhaust' || d.role === 'delta-v')) || (d.kind === 'mass' && d.role === 'propellant')) ||
    (masses.some((m) => m.role !== 'aside') && ROCKET_RE.test(text));
  if (!rocket) return;
  // "burns from 25 t to 9 t", "goes from 100 t down to 33 t": the mass at the start and at the end.
  for (let i = 0; i + 1 < masses.length; i++) {
    const [a, b] = [masses[i], masses[i + 1]];
    if (!/(?<!\p{L})from[^\S\n]+$/iu.test(text.slice(Math.max(0, a.start - 6), a.start))) continue;
    if (!/^[^\S\n]*(?:(?:down[^\S\n]+)?to|→|->)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    if ((siOf(a) ?? 0) <= (siOf(b) ?? Infinity)) continue;
    a.role = 'wet';
    b.role = 'dry';
  }
  // A mass in a sentence that speaks of no craft and no propellant ("the test stand weighs 85 kg") is
  // not one of the craft's, when the craft's masses are given elsewhere.
  const craftish = masses.filter((m) => m.role !== null || CRAFT_RE.test(sentenceAround(text, m.start, m.end)));
  if (craftish.length > 0) for (const m of masses) if (!craftish.includes(m)) m.role = 'aside';
  const has = (role: FigureRole) => masses.find((m) => m.role === role);
  const nulls = masses.filter((m) => m.role === null);
  if (has('propellant') && !has('wet') && !has('dry') && nulls.length === 1) nulls[0].role = 'wet';
  else if (!has('wet') && !has('dry') && nulls.length === 2) {
    const [a, b] = [...nulls].sort((x, y) => (siOf(y) ?? 0) - (siOf(x) ?? 0));
    a.role = 'wet';
    b.role = 'dry';
  } else if (has('wet') && !has('dry') && !has('propellant') && nulls.length === 1) nulls[0].role = 'dry';
  else if (has('dry') && !has('wet') && !has('propellant') && nulls.length === 1) nulls[0].role = 'wet';
  const wet = has('wet');
  const dry = has('dry');
  const prop = has('propellant');
  if (wet && prop && !dry) {
    const w = siOf(wet);
    const p = siOf(prop);
    if (w !== null && p !== null && p < w) {
      const last = wet.start > prop.start ? wet : prop;
      drafts.splice(drafts.indexOf(last) + 1, 0, {
        start: Math.min(wet.start, prop.start),
        end: Math.max(wet.end, prop.end),
        kind: 'mass',
        quantity: typedSi(w - p, 'kg'),
        role: 'dry',
        derived: `dry mass = starting mass − propellant (${formatQuantity(w, 'kg')} − ${formatQuantity(p, 'kg')})`,
      });
    }
  } else if (dry && prop && !wet) {
    const d = siOf(dry);
    const p = siOf(prop);
    if (d !== null && p !== null) {
      const last = dry.start > prop.start ? dry : prop;
      drafts.splice(drafts.indexOf(last) + 1, 0, {
        start: Math.min(dry.start, prop.start),
        end: Math.max(dry.end, prop.end),
        kind: 'mass',
        quantity: typedSi(d + p, 'kg'),
        role: 'wet',
        derived: `starting mass = dry mass + propellant (${formatQuantity(d, 'kg')} + ${formatQuantity(p, 'kg')})`,
      });
    }
  }
  for (const d of drafts) if (d.kind === 'speed' && d.role === null && (siOf(d) ?? 0) < 299_792_458) d.role = 'delta-v';
}

/** Words of the place a test was run ("the room was held at 21 °C", "lab temperature 22 °C"). */
const SURROUNDINGS_RE = /(?<!\p{L})(?:room|lab|laboratory|test hall|hall|workshop|building|office|test cell|weather|day|night)(?!\p{L})/iu;
/** A sentence about the test itself ("The test lasted 45 minutes in a room held at 21 °C."). */
const TEST_SETTING_RE = /(?<!\p{L})(?:tests?|trials?|experiments?|measurements?|runs?|demonstrations?|lasted|shown|presented|held|kept|conditioned)(?!\p{L})/iu;
/** Words that make a lone temperature one of the machine's sides, not its surroundings. */
const MACHINE_SIDE_RE = /(?<!\p{L})(?:source|sink|sides?|hot|cold|warm|cool|reservoirs?|ends?|junctions?|plates?|faces?|inlet|outlet|flow|supply|delivery|evaporat\w*|condens\w*|cabinet|compartment|chamber|tank|boiler|emitter|heater|collector|brine|ground|outdoor|outside|exhaust|turbine|T_?[ch]|deep|surface)(?!\p{L})/iu;
/** The apparatus a device is tested on, whose mass is no craft's. */
const APPARATUS_RE = /(?<!\p{L})(?:test[- ]stands?|stands?|test rigs?|rigs?|benches|bench|balances?|pendulums?|mounts?|mounting|tables?|jigs?|fixtures?|housings?|enclosures?|vacuum chambers?|chambers?|counterweights?|scales?)(?!\p{L})/iu;
/** A verb of lifting right before a mass: "lifts 3 lbs", "lifted its own 2 kg frame", "levitates a 40 g disc". */
const LIFTS_BEFORE_RE = /(?<!\p{L})(?:lifts?|lifted|lifting|levitat(?:es?|ed|ing)|raises?|raised|hoists?|hoisted|holds? up|held up|hold(?:s|ing)? aloft|carr(?:y|ies|ied) aloft|hover(?:s|ed|ing)? with)[^\S\n]+(?:(?:its|their|his|her|our|my|the|a|an)[^\S\n]+)?(?:own[^\S\n]+)?(?:(?:about|some|roughly|nearly|over|up to|almost)[^\S\n]+)?$/iu;
/** Machines that lift loads lawfully by pushing on the ground (their lifted mass is no thrust). */
const HOIST_RE = /(?<!\p{L})(?:cranes?|hoists?|winch(?:es)?|forklifts?|lift trucks?|elevators?|lifts? (?:shaft|car)|jacks?|pulleys?|block and tackle|levers?|hydraulic|pistons?|arms?|robots?|weightlift\w*|athletes?|balloons?|airships?|blimps?|buoyan\w*|helium|hydrogen|lifters?|ion(?:ic)?[- ]wind|corona|EHD|electrohydrodynamic|drones?|quadcopters?|multicopters?|propellers?|rotor blades?|helicopters?)(?!\p{L})/iu;
/** Before the energy a store holds: "the bank holds 50 kJ", "stores 13.5 kWh", "a capacity of 10 kWh". */
const STORE_HOLDS_RE = /(?<!\p{L})(?:holds?|holding|stores?|stored|storing|contains?|capacity(?:[^\S\n]+of)?|rated(?:[^\S\n]+at)?|packs?)[^\S\n]+(?:(?:about|some|roughly|only|just|a mere|up to)[^\S\n]+)?$/iu;
/** Before what a store holds at the end of a charge: "the cell ends up holding 5 Wh". */
const ENDS_UP_HOLDING_RE = /(?<!\p{L})(?:ends?|ended|ending)[^\S\n]+up[^\S\n]+(?:holding|with|storing|containing|at)[^\S\n]+(?:(?:about|some|roughly|only|just|a mere)[^\S\n]+)?$/iu;
/** After a power or energy put into a store: "3 W into a little cell", "12 kWh into the pack" (not "back into"). */
const STORE_INTO_RE =
  /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?into[^\S\n]+(?:(?:a|an|the|its|our|my|their)[^\S\n]+)?(?:[\p{L}\d-]+[^\S\n]+){0,2}?(?:cells?|batter(?:y|ies)|packs?|capacitors?|supercaps?|supercapacitors?|accumulators?|flywheels?)(?!\p{L})/iu;

const typedSi = (si: number, unit: string) => `${Number(si.toPrecision(12))} ${unit}`.trim();

function siOf(d: Draft): number | null {
  try {
    return parseQuantity(d.quantity, FIGURE_SI_UNIT[d.kind]);
  } catch {
    return null;
  }
}
function upperSiOf(d: Draft): number | null {
  if (d.upper === undefined) return null;
  try {
    return parseQuantity(d.upper, FIGURE_SI_UNIT[d.kind]);
  } catch {
    return null;
  }
}

/** Derived figures, inserted after the figures they come from (see the file's comment). */
/**
 * Figures said of something the claim is compared with ("For comparison, conventional designs reach
 * about 35 % efficiency.", "A typical household kettle, by comparison, draws 2 kW.", "45 %, against
 * 35 % for conventional engines"): set aside before the relations are read, so that no check and no
 * derived figure uses them.
 */
function relate(text: string, drafts: Draft[]): void {
  const compared = drafts.filter((d) => d.role !== 'aside' && saidInComparison(text, d));
  if (compared.length === 0) return relateFigures(text, drafts);
  const rest = drafts.filter((d) => !compared.includes(d));
  relateFigures(text, rest);
  drafts.length = 0;
  drafts.push(...rest);
  for (const d of compared) {
    d.role = 'aside';
    const at = drafts.findIndex((x) => x.start > d.start);
    if (at < 0) drafts.push(d);
    else drafts.splice(at, 0, d);
  }
}

/** A sentence that speaks of the claim's own device (so its figures are not merely a comparison). */
const OWN_DEVICE_RE = /(?<!\p{L})(?:our|we|us|my|this (?:device|machine|unit|engine|motor|generator|design|cell|module|drive|thruster|system|invention|prototype)|the (?:claimed|invention|inventors?|applicants?|authors?|prototype)|claims?|claimed|invention)(?!\p{L})/iu;
/** A sentence given over to a comparison or a reference value. */
const COMPARISON_SENTENCE_RE =
  /(?<!\p{L})(?:for|by|in) comparison(?!\p{L})|(?<!\p{L})for reference(?!\p{L})|(?<!\p{L})as (?:a )?(?:reference|benchmark|yardstick)(?!\p{L})|^[\s"“(]*(?:(?:a|an|the)[^\S\n]+)?(?:typical|conventional|ordinary|standard(?![^\S\n]+(?:test|conditions?|deviation|atmosphere|temperature|pressure|rating))|commercial|existing|competing|comparable|today's|older|earlier|previous|mainstream|off-the-shelf|state-of-the-art|best commercial|best available)(?!\p{L})/iu;
/** Right after a figure: whose it is, when it is another machine's ("35 % for conventional engines"). */
const OTHERS_AFTER_RE =
  /^[^\S\n]*(?:\p{L}+[^\S\n]+){0,2}?(?:for|of|in|from|by)[^\S\n]+(?:(?:a|an|the|most|many|all)[^\S\n]+)?(?:typical|conventional|ordinary|standard|commercial|existing|competing|comparable|today's|current|older|earlier|previous|mainstream|off-the-shelf|state-of-the-art|other|rival)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:engines?|motors?|units?|designs?|models?|devices?|machines?|thrusters?|cells?|panels?|modules?|pumps?|fridges?|refrigerators?|freezers?|systems?|generators?|turbines?|plants?|cars?|vehicles?|batter(?:y|ies)|boilers?|lamps?|bulbs?|LEDs?|rockets?|drives?|ones|counterparts?|technolog(?:y|ies)|products?|heaters?|chargers?|converters?|inverters?|coolers?|chillers?|conditioners?)(?!\p{L})/iu;
/** Right before a figure, in its clause: "compared with", "against", "versus", "whereas typical ones reach". */
const COMPARED_BEFORE_RE =
  /(?<!\p{L})(?:compared (?:with|to)|in comparison (?:with|to)|as against|as opposed to|versus|vs\.?|whereas|while (?:typical|conventional|ordinary|standard|commercial|existing)|unlike)(?!\p{L})[^.;!?\n]{0,50}$/iu;
/** Right after a comparison's figure: what it was compared with is the input or output of the claim itself ("compared with 1 kW of input"). */
const OWN_FLOW_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+)?(?:(?:electrical|electric|mechanical|thermal|heat|shaft)[^\S\n]+)?(?:input|output|in|out|consumed|drawn|supplied|delivered|it (?:draws|takes|uses|consumes|needs|gives|delivers))(?!\p{L})/iu;

const DEVICE_NOUNS = '(?:prototypes?|models?|versions?|designs?|generations?|units?|builds?|rigs?|devices?|machines?|iterations?|systems?)';
const EARLIER_DEVICE_RE = new RegExp(`(?<!\\p{L})(?:previous|earlier|older|former|first-generation|last year's|original|old|predecessor)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+)?${DEVICE_NOUNS}(?!\\p{L})`, 'iu');
const LATEST_DEVICE_RE = new RegExp(`(?<!\\p{L})(?:new|this|latest|present|current|improved|second|next)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+)?${DEVICE_NOUNS}(?!\\p{L})`, 'iu');
const OWN_FLOW_BETWEEN_RE = /(?<!\p{L})(?:input|output|inputs|outputs|in|out|consumption|supply|P_?\{?(?:in|out)\}?|E_?\{?(?:in|out)\}?)(?!\p{L})/iu;

function saidInComparison(text: string, d: Draft): boolean {
  if (d.derived) return false;
  const sentence = sentenceAround(text, d.start, d.end);
  if (COMPARISON_SENTENCE_RE.test(sentence) && !OWN_DEVICE_RE.test(sentence)) return true;
  // "Our previous prototype reached 35 % at 800 W": an earlier device, not the one claimed.
  if (EARLIER_DEVICE_RE.test(sentence) && !LATEST_DEVICE_RE.test(sentence)) return true;
  if (OTHERS_AFTER_RE.test(text.slice(d.end, d.end + 60))) return true;
  const clauseBefore = text.slice(windowStart(text, d.start, 0, 120), d.start);
  const m = COMPARED_BEFORE_RE.exec(clauseBefore);
  // ("Output 1.5 kW vs input 1.2 kW": the claim's own input, named between.)
  return m !== null && !OWN_FLOW_BETWEEN_RE.test(m[0]) && !OWN_FLOW_AFTER_RE.test(text.slice(d.end, d.end + 40));
}

function relateFigures(text: string, drafts: Draft[]): void {
  const insertAfter = (anchor: Draft, d: Draft) => {
    const at = drafts.indexOf(anchor);
    drafts.splice(at + 1, 0, d);
  };
  const sameSentence = (a: Draft, b: Draft) => {
    const [x, y] = a.start < b.start ? [a, b] : [b, a];
    return !/[.!?;](?:\s|$)|\n/.test(text.slice(x.end, y.start).replace(ABBREVIATIONS_RE, ''));
  };
  const sameClause = (a: Draft, b: Draft) => {
    const [x, y] = a.start < b.start ? [a, b] : [b, a];
    return !/[.!?](?:\s|$)|\n/.test(text.slice(x.end, y.start).replace(ABBREVIATIONS_RE, ''));
  };

  // "P_out/P_in = 3.2 kW / 0.8 kW": the roles in the order the labels give them.
  for (const m of text.matchAll(RATIO_LABELS_RE)) {
    const from = m.index! + m[0].length;
    const [a, b] = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.start >= from);
    if (!a || !b || a.kind !== b.kind || a.start - from > 12 || !/^[^\S\n]*(?:\/|:|to|vs\.?|versus)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    const side = (label: string): FigureRole => (/out|_\{?o\}?$/i.test(label) ? 'out' : 'in');
    a.role = side(m[1]);
    b.role = side(m[2]);
  }

  // "lifts a 1 mW signal to 100 mW", "boosts the input from 2 W to 40 W": what goes in and what comes out.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    const lead = text.slice(Math.max(0, a.start - 50), a.start);
    if (AMPLIFY_BEFORE_RE.test(lead) && /^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,3}?(?:in)?to[^\S\n]+(?:about[^\S\n]+|some[^\S\n]+|roughly[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) {
      a.role = 'in';
      b.role = 'out';
    }
  }

  // "4 W more heat than the 20 W it draws": the first is an excess, the second the input.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const a = drafts[i];
    const b = drafts[i + 1];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    const gap = text.slice(a.end, b.start);
    if (/^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,3}?(?:more|extra|additional|over and above|above|beyond|in excess of|on top of)(?:[^\S\n]+[\p{L}-]+){0,4}?[^\S\n]+(?:than|over|of|on|above)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|an[^\S\n]+|a[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}$/iu.test(gap) ||
      // "1.3 MJ of heat came out beyond the 4.1 MJ supplied"
      /^[^\S\n]*(?:of[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,4}?(?:beyond|over and above|in excess of|on top of)[^\S\n]+(?:the|its|an|a|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?$/iu.test(gap) || /^[^\S\n]+(?:more|extra)[^\S\n]+than[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?$/iu.test(gap)) {
      a.role = 'excess';
      b.role = 'in';
    }
  }

  // Power from a current and a voltage in the same clause: "12 A at 24 V", "3 amps from a 48-volt pack".
  for (const cur of drafts.filter((d) => d.kind === 'current')) {
    // The voltage nearest the current in its sentence ("steps 230 V down to 12 V and delivers 5 A": 12 V).
    const candidates = drafts.filter((d) => d.kind === 'voltage' && sameClause(d, cur) && Math.abs(d.start - cur.start) < 120);
    // "0.9 A at 24 V": the voltage said with the current, right after or right before it; else the nearest.
    // ("5 V in at 2 A, 12 V out at 0.75 A": a comma parts two pairs.)
    const volt =
      candidates.find((d) => d.start >= cur.end && /^[^\S\n]*(?:at|@|from|on|×|x|\*|\/)?[^\S\n]*(?:an?[^\S\n]+)?$/iu.test(text.slice(cur.end, d.start))) ??
      candidates.find((d) => d.end <= cur.start && /^[^\S\n]*(?:(?:in|out|input|output|DC|AC)[^\S\n]+)?(?:at|@|×|x|\*|\/)?[^\S\n]*$/iu.test(text.slice(d.end, cur.start))) ??
      candidates.find((d) => d.start >= cur.end && /^[^\S\n]*,[^\S\n]*(?:an?[^\S\n]+)?$/iu.test(text.slice(cur.end, d.start))) ??
      candidates.find((d) => d.end <= cur.start && /^[^\S\n]*,[^\S\n]*$/iu.test(text.slice(d.end, cur.start))) ??
      candidates.sort((a, b) => Math.abs(a.start - cur.start) - Math.abs(b.start - cur.start))[0];
    if (!volt) continue;
    const i = siOf(cur);
    const v = siOf(volt);
    if (i === null || v === null) continue;
    // The text states that power itself already.
    if (drafts.some((d) => d.kind === 'power' && !d.derived && Math.abs((siOf(d) ?? 0) - i * v) <= 0.01 * i * v)) continue;
    const iu = upperSiOf(cur);
    const vu = upperSiOf(volt);
    const first = cur.start < volt.start ? cur : volt;
    const last = first === cur ? volt : cur;
    // The role: the words around the current or the voltage ("draws 3 A" → in, "delivers 10 A" → out).
    // Words between the two ("12 V supply drawing 2.5 A") are the closest; then those around the pair.
    // "5 V in at 2 A", "12 V out at 0.75 A": in or out said right after either of the two.
    const said = [volt, cur].map((d) => /^[^\S\n]*(in|out|input|output)(?!\p{L})/iu.exec(text.slice(d.end, d.end + 12))).find((x) => x !== null);
    const between = said ? (/^in/i.test(said[1]) ? 'in' : 'out') : /[,;]/.test(text.slice(first.end, last.start)) ? null : roleFor(text, 'power', last.start, last.end, first.end);
    const wordsRole = between ?? roleFor(text, 'power', first.start, last.end, windowStart(text, first.start, 0, BEFORE_WINDOW)) ?? roleFor(text, 'power', cur.start, cur.end, 0);
    const others = drafts.filter((d) => (d.kind === 'power' || d.kind === 'energy') && d.role !== null);
    const role: FigureRole = wordsRole ?? (others.length && others.every((d) => d.role === 'in') ? 'out' : null);
    insertAfter(last, {
      start: first.start,
      end: last.end,
      kind: 'power',
      quantity: typedSi(i * v, 'W'),
      upper: iu !== null || vu !== null ? typedSi((iu ?? i) * (vu ?? v), 'W') : undefined,
      role: role === 'excess' ? 'out' : (role ?? 'in'),
      derived: `power = current × voltage (${formatQuantity(i, 'A')} × ${formatQuantity(v, 'V')})`,
      assumption: role === null ? 'The power of this current and voltage is read as the power supplied to the device.' : undefined,
    });
  }

  // A "COP" of a circuit, a motor or a generator, where nothing moves heat: its output over its input.
  if (!HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text) && ELECTRICAL_GAIN_RE.test(text) && !drafts.some((d) => d.kind === 'temperature')) {
    for (const d of drafts) {
      if (d.kind === 'cop' && d.role === null) {
        d.kind = 'efficiency';
        d.derived = 'a "COP" of a device that moves no heat: output over input';
      }
    }
  }
  rolesByContext(text, drafts);

  // "every kilowatt fed to it gives four hundred millinewtons": a thrust per power.
  for (const d of drafts) {
    if (d.kind !== 'thrust') continue;
    const m = /(?<!\p{L})(?:every|each|per|a)[^\S\n]+(kilowatt|watt|kW|W|megawatt|MW)(?!\p{L})[^.;!?\n]{0,60}?(?:gives?|yields?|produces?|makes?|delivers?|buys?|brings?|returns?)[^\S\n]+(?:(?:about|roughly|some|nearly|over|at least)[^\S\n]+)?$/iu.exec(text.slice(Math.max(0, d.start - 120), d.start));
    if (!m) continue;
    const unit = /^(?:kilowatt|kW)$/i.test(m[1]) ? 'kW' : /^(?:megawatt|MW)$/.test(m[1]) ? 'MW' : 'W';
    d.kind = 'thrust-per-power';
    d.quantity = `${d.quantity} / ${unit}`;
    d.derived = `thrust for each ${unit} of power`;
  }
  // "reduces its weight on the scale by 120 g", "reads 40 g lighter": a force, in grams-force.
  for (const d of drafts) {
    if (d.kind !== 'mass') continue;
    const before = text.slice(Math.max(0, d.start - 60), d.start);
    const after = text.slice(d.end, d.end + 30);
    // "lifts 3 lbs off the scale", "lifted its own 2 kg frame": a weight held up, for a drive (not a rocket's or a crane's load).
    const lifted = LIFTS_BEFORE_RE.test(before) && !ROCKET_RE.test(text) && !HOIST_RE.test(text);
    if (lifted || /(?:weight|reading|reads|scale|balance)[^.;!?\n:"“”]{0,40}(?:by|of)[^\S\n]*(?:about|some|roughly|nearly|up to)?[^\S\n]*$/iu.test(before) || /^[^\S\n]*(?:lighter|heavier|less weight|of (?:lift|weight loss|apparent weight)|off (?:its|the) (?:weight|reading))/iu.test(after)) {
      const kg = siOf(d);
      if (kg === null) continue;
      d.kind = 'thrust';
      d.quantity = `${Number(kg.toPrecision(15))} kgf`;
      d.role = null;
      d.derived = lifted ? 'a weight held up, as a force (kilograms-force)' : 'a change of weight on a scale, as a force (kilograms-force)';
    }
  }

  // "It delivers 5 W less than the 65 W it draws": out = in − the shortfall.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [a, b] = [drafts[i], drafts[i + 1]];
    if (!(a.kind === b.kind && (a.kind === 'power' || a.kind === 'energy'))) continue;
    if (!/^[^\S\n]*(?:[\p{L}-]+[^\S\n]+){0,2}?(?:less|lower|short of)[^\S\n]+(?:than[^\S\n]+)?(?:the[^\S\n]+|its[^\S\n]+)?$/iu.test(text.slice(a.end, b.start))) continue;
    const x = siOf(a);
    const y = siOf(b);
    if (x === null || y === null || x >= y) continue;
    a.role = null;
    b.role = 'in';
    insertAfter(b, { start: a.start, end: b.end, kind: a.kind, quantity: typedSi(y - x, FIGURE_SI_UNIT[a.kind]), role: 'out', derived: `output = input − the shortfall (${formatQuantity(y, FIGURE_SI_UNIT[a.kind])} − ${formatQuantity(x, FIGURE_SI_UNIT[a.kind])})` });
  }

  // out = in + excess, when the text gives no output itself.
  for (const kind of ['power', 'energy'] as const) {
    const excess = drafts.find((d) => d.kind === kind && d.role === 'excess' && !d.derived);
    const input = drafts.find((d) => d.kind === kind && d.role === 'in');
    const output = drafts.find((d) => d.kind === kind && d.role === 'out');
    if (excess && input && !output) {
      const e = siOf(excess);
      const n = siOf(input);
      if (e === null || n === null) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const eu = upperSiOf(excess);
      const anchor = excess.start > input.start ? excess : input;
      insertAfter(anchor, {
        start: Math.min(excess.start, input.start),
        end: Math.max(excess.end, input.end),
        kind,
        quantity: typedSi(n + e, unit),
        upper: eu !== null ? typedSi(n + eu, unit) : undefined,
        role: 'out',
        derived: `output = input + excess (${formatQuantity(n, unit)} + ${formatQuantity(e, unit)})`,
      });
    }
  }

  // "25 % more power than its 2 kW input", "five times the 20 W it takes in": with the input stated,
  // the excess and the output as figures.
  const GAINS = ['output = input + the percentage more', 'output as a multiple of the input', 'units out for each unit in'];
  // ("returns 140 % of what it draws": a percentage of the input above 100 %.)
  const more = drafts.find((d) => d.kind === 'efficiency' && ((d.derived !== undefined && GAINS.includes(d.derived)) || (d.ofInput && (siOf(d) ?? 0) > 1)));
  if (more) {
    const g = siOf(more);
    for (const kind of ['power', 'energy'] as const) {
      const inputs = drafts.filter((d) => d.kind === kind && d.role === 'in' && (!d.derived || d.derived.startsWith('power = current × voltage')) && sameClause(d, more));
      if (g === null || g <= 1 || inputs.length !== 1 || drafts.some((d) => d.kind === kind && (d.role === 'out' || d.role === 'excess'))) continue;
      const input = inputs[0];
      const n = siOf(input);
      if (n === null) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const anchor = more.start > input.start ? more : input;
      const span = { start: Math.min(more.start, input.start), end: Math.max(more.end, input.end), kind };
      insertAfter(anchor, { ...span, quantity: typedSi(n * g, unit), role: 'out', derived: `output = input × ${formatPrint(g)} (${formatQuantity(n, unit)} × ${formatPrint(g)})` });
      insertAfter(anchor, { ...span, quantity: typedSi(n * (g - 1), unit), role: 'excess', derived: `excess = input × ${formatPrint(g - 1)} (${formatQuantity(n, unit)} × ${formatPrint(g - 1)})` });
      break;
    }
  }

  // "96 % of its input … draws 250 W", "80,000 BTU/h input, 95 % efficiency": the output the stated
  // efficiency gives, where the text states only the input.
  const eta = drafts.find((d) => d.kind === 'efficiency' && !d.derived && (siOf(d) ?? 2) <= 1);
  if (eta && !more) {
    for (const kind of ['power', 'energy'] as const) {
      const inputs = drafts.filter((d) => d.kind === kind && d.role === 'in' && !d.derived);
      if (inputs.length !== 1 || drafts.some((d) => d.kind === kind && (d.role === 'out' || d.role === 'excess'))) continue;
      const [input, e, n] = [inputs[0], siOf(eta)!, siOf(inputs[0])];
      if (n === null || n === 0) continue;
      const unit = FIGURE_SI_UNIT[kind];
      const anchor = eta.start > input.start ? eta : input;
      insertAfter(anchor, {
        start: Math.min(eta.start, input.start),
        end: Math.max(eta.end, input.end),
        kind,
        quantity: typedSi(n * e, unit),
        role: 'out',
        derived: `output = efficiency × input (${formatPrint(e)} × ${formatQuantity(n, unit)})`,
      });
      break;
    }
  }

  // "Self-running", "needs no supply": the input is 0 (not where the device harvests a flow from outside).
  if (!drafts.some((d) => (d.kind === 'power' || d.kind === 'energy') && d.role === 'in')) {
    SELF_RUNNING_RE.lastIndex = 0;
    const m = SELF_RUNNING_RE.exec(text);
    const hasThrust = drafts.some((d) => d.kind === 'thrust' || d.kind === 'thrust-per-power');
    const out = drafts.find((d) => (d.kind === 'power' || d.kind === 'energy') && (d.role === 'out' || d.role === 'excess' || (d.role === null && !hasThrust)));
    const inputUnknown = /(?<!\p{L})input(?:[^\S\n]+(?:power|energy|log|logs|data))?[^\S\n]+(?:was|were|is|are|has|have)[^\S\n]+(?:not|still|never|yet to be)[^\S\n]+(?:been[^\S\n]+)?(?:logged|recorded|measured|stated|given|known|analysed|analyzed|being analysed|being analyzed)/iu.test(text);
    if (m && out && !inputUnknown && !HARVEST_RE.test(text.replace(/self-?powered/giu, ''))) {
      const start = m.index;
      const end = m.index + m[0].length;
      const draft: Draft = { start, end, kind: 'power', quantity: '0 W', role: 'in', derived: `no input: "${m[0]}"` };
      // Keep the drafts in order of their place in the text.
      const at = drafts.findIndex((d) => d.start > start);
      if (at < 0) drafts.push(draft);
      else drafts.splice(at, 0, draft);
      if (out.role === null) out.role = 'out';
    }
  }

  // A heat pump's heat out over its work in: its heating COP, as a figure of its own.
  const denied = /(?<!\p{L})(?:no|not an?|without an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?heat[- ]pumps?(?!\p{L})/iu.test(text);
  if (HEAT_PUMP_RE.test(text) && !denied && !drafts.some((d) => d.kind === 'cop')) {
    for (const kind of ['energy', 'power'] as const) {
      const ins = drafts.filter((d) => d.kind === kind && d.role === 'in' && !d.derived);
      // (The heat out may be the input plus a stated excess: "3 kW more heat than the 1 kW it uses".)
      const outs = drafts.filter((d) => d.kind === kind && d.role === 'out' && (!d.derived || d.derived.startsWith('output = input + excess')));
      if (ins.length !== 1 || outs.length !== 1) continue;
      const w = siOf(ins[0]);
      const q = siOf(outs[0]);
      if (!w || q === null || q <= w) continue;
      const last = ins[0].start > outs[0].start ? ins[0] : outs[0];
      insertAfter(last, {
        start: Math.min(ins[0].start, outs[0].start),
        end: Math.max(ins[0].end, outs[0].end),
        kind: 'cop',
        quantity: String(Number((q / w).toPrecision(12))),
        role: 'heating',
        derived: `COP = heat out / work in (${formatQuantity(q, FIGURE_SI_UNIT[kind])} / ${formatQuantity(w, FIGURE_SI_UNIT[kind])})`,
      });
      break;
    }
  }

  // The surroundings said apart from the machine: when one sentence gives the machine's two sides
  // (two temperatures, or one and a difference), a temperature alone in another sentence, with no
  // efficiency, COP or difference beside it ("the room was held at 21 °C"), is set aside.
  const sentenceOf = (d: Draft) => windowStart(text, d.start, 0, 400);
  const thermal = drafts.filter((d) => d.kind === 'temperature' && !d.derived);
  const sides = new Set(
    thermal
      .map(sentenceOf)
      .filter((k) => thermal.reduce((n, t) => n + (sentenceOf(t) === k ? (t.upper ? 2 : 1) : 0), 0) >= 2 || drafts.some((d) => d.kind === 'temperature-difference' && sentenceOf(d) === k)),
  );
  // "operating range −40 to 85 °C", "storage temperature": the conditions it is rated for, not its sides.
  thermal.forEach((t, i) => {
    const prev = thermal[i - 1];
    if (OPERATING_RANGE_RE.test(text.slice(Math.max(0, t.start - 40), t.start)) || (prev?.role === 'aside' && /^[^\S\n]*(?:°[CF]?[^\S\n]*)?(?:to|and|[-–—…])[^\S\n]*$/u.test(text.slice(prev.end, t.start)))) t.role = 'aside';
  });
  // (Not one that the stated difference puts on the other side: "−18 °C; … at 32 °C (a 50 K difference)".)
  const differences = drafts.filter((d) => d.kind === 'temperature-difference').map((d) => siOf(d) ?? NaN);
  const otherSide = (t: Draft) =>
    thermal.some((u) => u !== t && sides.has(sentenceOf(u)) && differences.some((dT) => Math.abs(Math.abs((siOf(u) ?? NaN) - (siOf(t) ?? NaN)) - dT) <= 0.5));
  if (sides.size > 0) {
    for (const t of thermal) {
      const k = sentenceOf(t);
      if (sides.has(k) || otherSide(t)) continue;
      const company = drafts.filter((d) => d !== t && sentenceOf(d) === k && (d.kind === 'temperature' || d.kind === 'temperature-difference' || d.kind === 'efficiency' || d.kind === 'cop'));
      if (company.length === 0) t.role = 'aside';
    }
  } else if (thermal.length === 1 && !drafts.some((d) => d.kind === 'temperature-difference' || d.kind === 'efficiency' || d.kind === 'cop' || d.kind === 'power' || d.kind === 'energy')) {
    // A lone temperature of the place a test ran in, and nothing a machine's sides would serve: aside.
    const t = thermal[0];
    const sentence = sentenceAround(text, t.start, t.end);
    if ((t.role === null || t.role === 'cold') && SURROUNDINGS_RE.test(sentence) && TEST_SETTING_RE.test(sentence) && !MACHINE_SIDE_RE.test(sentence)) t.role = 'aside';
  } else {
    // The sides given across sentences ("supplies 55 °C water; with a 50 K lift over its source, …"):
    // a temperature alone in a sentence of its own that names no side of the machine ("The room was
    // held at 21 °C for the whole series.") is the surroundings, set aside.
    const differenceGiven = drafts.some((d) => d.kind === 'temperature-difference');
    for (const t of thermal) {
      if (t.role === 'aside' || otherSide(t)) continue;
      const others = thermal.filter((u) => u !== t && u.role !== 'aside' && sentenceOf(u) !== sentenceOf(t));
      if (!(others.length >= 2 || (others.length >= 1 && differenceGiven))) continue;
      const k = sentenceOf(t);
      const company = drafts.filter((d) => d !== t && sentenceOf(d) === k && d.kind !== 'duration');
      if (company.length > 0) continue;
      const sentence = sentenceAround(text, t.start, t.end);
      if (MACHINE_SIDE_RE.test(sentence) || !SURROUNDINGS_RE.test(sentence)) continue;
      t.role = 'aside';
    }
  }

  // A heat pump's source is its cold side ("source side sits at 10 °C"), not an engine's hot source.
  if ((HEAT_PUMP_RE.test(text) || drafts.some((d) => d.kind === 'cop' && d.role === 'heating')) && !/(?<!\p{L})(?:engines?|turbines?|generators?)(?!\p{L})/iu.test(text)) {
    for (const t of thermal) {
      if (t.role !== 'hot') continue;
      const near = text.slice(Math.max(0, t.start - 30), t.start) + '|' + text.slice(t.end, t.end + 12);
      if (/(?<!\p{L})source(?!\p{L})/iu.test(near) && !/(?<!\p{L})(?:supply|flow|delivery|output)(?!\p{L})/iu.test(near)) t.role = 'cold';
    }
  }

  // One temperature and a difference: the other temperature.
  const temps = drafts.filter((d) => d.kind === 'temperature' && !d.derived && d.role !== 'aside');
  const diff = drafts.find((d) => d.kind === 'temperature-difference');
  if (diff && temps.length === 1) {
    const t = temps[0];
    const tSi = siOf(t);
    const dSi = siOf(diff);
    if (tSi !== null && dSi !== null) {
      // "30 °C below a 25 °C room": the other lies below; "40 degrees above the 20 °C ambient": above;
      // else by the stated temperature's role (hot → the other is colder).
      // "held at −18 °C, a full 50 K below the room": the difference describes the stated temperature
      // itself (said right after it), so the other side lies the other way.
      const apposition = t.end <= diff.start && APPOSITION_RE.test(text.slice(t.end, diff.start));
      // "supplies 55 °C water; with a 50 K lift over its source": the difference is measured from another
      // side, named after it, so the stated temperature is the one above (or below) that side.
      const fromNamedOther = t.end <= diff.start && NAMED_OTHER_SIDE_RE.test(text.slice(diff.end, diff.end + 60));
      // "between the 25 °C air and the cooler soil": the other side said to be cooler or warmer than this one.
      const other = /^[^\S\n,]*(?:[\p{L}-]+[^\S\n,]+){0,2}?and[^\S\n]+(?:the|a|an|its)[^\S\n]+(cooler|colder|lower|warmer|hotter|higher)(?!\p{L})/iu.exec(text.slice(t.end, t.end + 50));
      const said = other
        ? /^(?:cooler|colder|lower)/i.test(other[1]) ? 'down' : 'up'
        : (apposition || fromNamedOther) && diff.direction ? (diff.direction === 'down' ? 'up' : 'down') : diff.direction;
      // A heat pump's one stated temperature is what it supplies (the hot side); a fridge's is what it keeps (the cold side).
      const side = t.role ?? (HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text) ? 'hot' : COOLING_MACHINE_RE.test(text) && !HEAT_PUMP_RE.test(text) ? 'cold' : null);
      const down = said === 'down' || (said === undefined && side === 'hot');
      const otherSi = down ? tSi - dSi : tSi + dSi;
      const anchor = diff.start > t.start ? diff : t;
      insertAfter(anchor, {
        start: Math.min(t.start, diff.start),
        end: Math.max(t.end, diff.end),
        kind: 'temperature',
        quantity: typedSi(otherSi, 'K'),
        role: down ? 'cold' : 'hot',
        derived: down ? `the colder side = ${formatQuantity(tSi, 'K')} − ${formatQuantity(dSi, 'K')}` : `the hotter side = ${formatQuantity(tSi, 'K')} + ${formatQuantity(dSi, 'K')}`,
        assumption:
          t.role === null && said === undefined
            ? side === 'hot'
              ? 'The stated temperature is read as the hot side (what a heat pump supplies) and the difference is taken from it; mark it as cold if it is the source.'
              : 'The stated temperature is read as the cold side and the difference is added to it; mark it as hot if it is the hot side.'
            : undefined,
      });
      t.role = down ? 'hot' : 'cold';
    }
  }

  // Two or more temperatures of the same machine: the higher is the hot side. Pairs said together
  // ("between 7 °C and 35 °C", "from 10 to 55 °C") are ordered within the pair; otherwise the
  // highest is hot and the lowest cold.
  const absolute = drafts.filter((d) => d.kind === 'temperature' && d.role !== 'aside');
  let paired = false;
  for (let i = 0; i + 1 < absolute.length; i++) {
    const a = absolute[i];
    const b = absolute[i + 1];
    if (!/^[^\S\n]*(?:and|to|–|-|—|\/)[^\S\n]*$/iu.test(text.slice(a.end, b.start))) continue;
    const [hi, lo] = (siOf(a) ?? 0) >= (siOf(b) ?? 0) ? [a, b] : [b, a];
    hi.role = 'hot';
    lo.role = 'cold';
    paired = true;
    i++;
  }
  if (absolute.length >= 2 && !paired) {
    const sorted = [...absolute].sort((a, b) => (siOf(b) ?? 0) - (siOf(a) ?? 0));
    sorted[0].role = 'hot';
    sorted[sorted.length - 1].role = 'cold';
  } else if (absolute.length === 1 && absolute[0].role === null) {
    // One temperature kept by a freezer or a chiller is its cold side; by a heat pump, its hot side.
    if (COOLING_MACHINE_RE.test(text) && !HEAT_PUMP_RE.test(text)) absolute[0].role = 'cold';
    else if (HEAT_PUMP_RE.test(text)) absolute[0].role = 'hot';
  }

  // "70 % of the Carnot efficiency" between two stated temperatures: that share of 1 − Tc/Th.
  const share = drafts.find((d) => d.kind === 'efficiency' && d.derived === CARNOT_SHARE);
  if (share) {
    const hot = drafts.find((d) => d.kind === 'temperature' && d.role === 'hot');
    const cold = drafts.find((d) => d.kind === 'temperature' && d.role === 'cold');
    const [p, th, tc] = [siOf(share), hot && siOf(hot), cold && siOf(cold)];
    if (p !== null && th && tc !== null && tc !== undefined && th > tc) {
      const carnot = 1 - tc / th;
      share.quantity = typedSi(p * carnot, '');
      share.derived = `${formatPrint(p * 100)} % of the Carnot efficiency 1 − Tc/Th = 1 − ${formatQuantity(tc, 'K')}/${formatQuantity(th, 'K')}`;
    } else {
      // Without both temperatures it states no efficiency of its own.
      share.role = 'aside';
    }
  }

  // Times that are not the run's ("took 18 months to build", "pays for itself in 3 years"), said in a
  // sentence with no power or energy: set aside.
  for (const d of drafts) {
    if (d.kind !== 'duration' || d.role !== null) continue;
    const sentence = sentenceAround(text, d.start, d.end);
    if (NOT_A_RUN_RE.test(sentence) && !drafts.some((e) => (e.kind === 'power' || e.kind === 'energy') && sentenceOf(e) === sentenceOf(d))) d.role = 'aside';
  }

  // "30 kWh a day … over a fortnight": an energy per day, where the text states a longer run, is a
  // rate (a power) over that run; the "a day" is no run of its own.
  for (let i = 0; i + 1 < drafts.length; i++) {
    const [e, per] = [drafts[i], drafts[i + 1]];
    if (e.kind !== 'energy' || e.derived || per.kind !== 'duration' || per.role !== null) continue;
    if (!/^[^\S\n]*(?:a|an|per|each|every|\/)[^\S\n]*$/iu.test(text.slice(e.end, per.start)) && !/^(?:a|an|per|each|every)(?!\p{L})/iu.test(text.slice(per.start, per.end))) continue;
    if (!/^[^\S\n]*(?:(?:a|an|per|each|every)[^\S\n]+)?(?:day|hour|week|month|year|minute)s?(?!\p{L})/iu.test(text.slice(e.end, per.end + 1).replace(/^[^\S\n]*\//, ' per '))) continue;
    const unitTime = siOf(per);
    const run = drafts.filter((d) => d.kind === 'duration' && d !== per && d.role !== 'aside' && (siOf(d) ?? 0) > (unitTime ?? Infinity));
    const energy = siOf(e);
    if (run.length === 0 || !unitTime || energy === null) continue;
    e.kind = 'power';
    e.quantity = typedSi(energy / unitTime, 'W');
    if (e.upper !== undefined) {
      const u = upperSiOf(e);
      e.upper = u !== null ? typedSi(u / unitTime, 'W') : undefined;
    }
    e.derived = `power = energy per ${formatQuantity(unitTime, 's')} (${formatQuantity(energy, 'J')} / ${formatQuantity(unitTime, 's')})`;
    per.role = 'aside';
  }

  // Powers and energies over a stated run: energy = power × time.
  const durations = drafts.filter((d) => d.kind === 'duration' && d.role !== 'aside');
  const longest = [...durations].sort((a, b) => (siOf(b) ?? 0) - (siOf(a) ?? 0))[0];
  if (longest) {
    const powers = drafts.filter((d) => d.kind === 'power' && (d.role === 'in' || d.role === 'out'));
    for (const p of powers) {
      // Each power over the time said with it ("charged at 2 kW for 5 hours, then discharged at 1.5 kW
      // for 6 hours"): the nearest duration in its clause, before the next power; else the longest run.
      const nextPower = powers.find((q) => q.start > p.start);
      const prevPower = [...powers].reverse().find((q) => q.start < p.start);
      const own =
        durations.find((d) => d.start > p.end && (!nextPower || d.start < nextPower.start) && sameClause(d, p) && d.start - p.end < 80) ??
        [...durations].reverse().find((d) => d.end <= p.start && (!prevPower || d.start > prevPower.end) && sameClause(d, p) && p.start - d.end < 60);
      const duration = durations.length > 1 && own ? own : longest;
      const tRun = siOf(duration);
      if (!tRun) continue;
      const w = siOf(p);
      if (w === null || (w === 0 && p.role !== 'in')) continue;
      if (drafts.some((d) => d.kind === 'energy' && d.role === p.role && !d.derived)) continue;
      if (drafts.some((d) => d.kind === 'energy' && d.role === p.role && d.derived?.startsWith('energy = power'))) continue;
      const wu = upperSiOf(p);
      const last = p.start > duration.start ? p : duration;
      insertAfter(last, {
        start: Math.min(p.start, duration.start),
        end: Math.max(p.end, duration.end),
        kind: 'energy',
        quantity: typedSi(w * tRun, 'J'),
        upper: wu !== null ? typedSi(wu * tRun, 'J') : undefined,
        role: p.role,
        derived: `energy = power × time (${formatQuantity(w, 'W')} × ${formatQuantity(tRun, 's')})`,
      });
    }
  }

}
