/**
 * Units after a number (the claim reader, shared/claims/reader.ts, pass 1): the unit vocabulary of
 * figures-vocabulary.ts compiled into patterns (symbols with their case, words in any case, the
 * longest form winning), units glued to the number ("2.5a", "20C"), compounds of a thrust over a
 * power or a power over a mass, "1.3c", and the percent sign.
 */
import { C_M_PER_S, UNIT_FORMS, type UnitForm } from '../figures-vocabulary';
import { escapeRe, sentenceAround } from './context';

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
const PERCENT_RE = /[^\S\n]{0,3}(?:%|per[ -]?cent(?!\p{L})|pct\.?(?!\p{L}))/iuy;
/** A compound after a unit: "/kW", " per kilowatt", "·m", "/m²". */
const COMPOUND_RE = /[^\S\n]*(?:\/|per(?!\p{L})|·|⋅|-(?=[^\S\n]*\p{L}\p{L}?\b))[^\S\n]*/iuy;
// (Also "3.1 micronewtons of thrust per kilowatt": the quantity named between the unit and "per"; and
// "fourteen millinewtons a watt", as people say it.)
const FOR_EVERY_RE = /[^\S\n]+(?:(?:of[^\S\n]+(?:thrust|force|push|lift)[^\S\n]+(?:per|for[^\S\n]+(?:every|each)))|for[^\S\n]+(?:every|each)|an?(?=[^\S\n]+(?:watt|kilowatt|kilogram|kilo)s?(?!\p{L})))[^\S\n]+(?:single[^\S\n]+)?/iuy;
/** After "per" and a unit of energy or power: the input that unit is of ("per kWh of electricity", "per kW it draws"). */
export const PER_UNIT_IN_WORDS = String.raw`(?:of[^\S\n]+)?(?:electricity|electrical|electric|input|fuel|gas|drive|work|energy[^\S\n]+(?:in|input|supplied|used)|(?:it|the[^\S\n]+[\p{L}-]+)[^\S\n]+(?:takes|uses|draws|consumes|burns|is[^\S\n]+fed|gets))(?!\p{L})`;
const PER_UNIT_IN_RE = new RegExp(String.raw`^[^\S\n]*(?:watt|joule|kWh|kilowatt-hour|kilowatt|kW|megajoule|MJ|W|J)s?[^\S\n]+${PER_UNIT_IN_WORDS}`, 'iu');
/** After "per" that means "according to": a source named ("the cert sheet", "my calc", "spec", "the manufacturer"). */
const PER_SOURCE_RE =
  /^(?:(?:the|my|our|their|its|his|her|this|that|your)[^\S\n]+(?:[\p{L}'’-]+[^\S\n]+){0,2}?)?(?:manufacturer|maker|spec(?:ification)?s?|data ?sheets?|labels?|manuals?|cert(?:ificate)?s?|sheets?|nameplates?|rating plates?|sims?|simulations?|calcs?|calculations?|data|records?|reports?|docs?|documentation|instructions|catalog(?:ue)?s?|brochures?|websites?|site|vendors?|suppliers?|sellers?|builders?|inventors?|owners?|tests?|measurements?|meters?|scales?|gauges?|readings?|logs?|listings?|ads?|quotes?|invoices?|contracts?|drawings?|plans?)(?!\p{L})/iu;
const COMPOUND_AFTER_RE = /[^\S\n]*(?:[/·⋅][^\S\n]*[\p{L}\p{N}]|per[^\S\n]+\p{L})/iuy;
/** "1.3c", "0.5 c": a multiple of the speed of light (only attached to the number, or spaced before a non-letter). */
const C_SUFFIX_RE = /(?:c|[^\S\n]c)(?![\p{L}\p{N}_°])/uy;

export type Suffix =
  | { type: 'unit'; form: UnitForm; per?: UnitForm; perCount?: number }
  | { type: 'percent' }
  | null;

/** "2.5a", "350ma" glued to the number, as forum posts write amperes (never spaced: "a" is the article). */
const GLUED_AMPERE_RE = /(m?)a(?![\p{L}\p{N}_])/uy;
/** "water at 20C", "110F outside", as forum posts write them: a temperature where the sentence speaks of one. */
const GLUED_TEMPERATURE_RE = /([CF])(?![\p{L}\p{N}_/'’-])/uy;
/** The same, spaced from the number: "120 C" (read only where the sentence speaks of a temperature). */
const SPACED_TEMPERATURE_RE = /[^\S\n]+(C|F)(?![\p{L}\p{N}_'’-])/uy;
export const GLUED_CELSIUS: UnitForm = { kind: 'temperature', unit: 'degC', ambiguous: true };
export const GLUED_FAHRENHEIT: UnitForm = { kind: 'temperature', unit: 'degF', ambiguous: true };
/** Words of a battery's charge rate ("charges at 2C") or a capacitance, which a glued C or F may be. */
const NOT_GLUED_TEMPERATURE_RE = /(?<!\p{L})(?:charg\w*|discharg\w*|C-?rates?|rate|batter(?:y|ies)|cells?|capacit\w*|supercap\w*|farads?|coulombs?|ultracap\w*)(?!\p{L})/iu;

export function unitAt(text: string, at: number): { form: UnitForm; end: number } | null {
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
  // "at 120 C", "one-twenty C", "twenty F outside": a lone capital C or F after a number, spaced.
  SPACED_TEMPERATURE_RE.lastIndex = at;
  const spaced = /[\p{N}\p{L}]$/u.test(text.slice(Math.max(0, at - 1), at)) ? SPACED_TEMPERATURE_RE.exec(text) : null;
  if (spaced && !NOT_GLUED_TEMPERATURE_RE.test(sentenceAround(text, at, at + 1))) {
    return { form: spaced[1] === 'C' ? GLUED_CELSIUS : GLUED_FAHRENHEIT, end: at + spaced[0].length };
  }
  SYMBOL_RE.lastIndex = at;
  const s = SYMBOL_RE.exec(text);
  WORD_RE.lastIndex = at;
  const w = WORD_RE.exec(text);
  if (s && (!w || s[0].length >= w[0].length)) return { form: SYMBOLS.get(symbolKey(s[1]))!, end: at + s[0].length };
  if (w) return { form: WORDS.get(wordKey(w[1]))!, end: at + w[0].length };
  return null;
}

export function readSuffix(text: string, at: number): { suffix: Suffix; end: number } {
  const u = unitAt(text, at);
  // "5 N·m", "6 N-m", "2 K-type", "3 W-h": a compound or a name, not a figure.
  if (u && /^(?:[-·⋅][^\S\n]*(?:type|class(?!\p{L})|[mhs](?!\p{L})|m²|m2))/iu.test(text.slice(u.end, u.end + 8))) return { suffix: null, end: at };
  if (u) {
    // A compound: thrust per power, power per mass; any other compound is not a figure.
    // "3.2 µN for every kilowatt", "500 W for each kilogram": a ratio said in words.
    FOR_EVERY_RE.lastIndex = u.end;
    const every = FOR_EVERY_RE.exec(text);
    if (every) {
      const per = unitAt(text, u.end + every[0].length);
      if (per && !per.form.factor && ((u.form.kind === 'thrust' && per.form.kind === 'power') || (u.form.kind === 'power' && per.form.kind === 'mass'))) {
        return { suffix: { type: 'unit', form: u.form, per: per.form }, end: per.end };
      }
    }
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
        // "9 g per watt", "6.5 g/W" said of a propeller or a thruster: grams of thrust for each watt (the
        // figure of merit of propellers and fans), in gram-force.
        const grams = u.form.kind === 'mass' && per.form.kind === 'power' ? GRAMS_IN_KG[u.form.unit] : undefined;
        if (grams !== undefined && THRUST_TEXT_RE.test(sentenceAround(text, at, per.end))) {
          return { suffix: { type: 'unit', form: { kind: 'thrust', unit: 'kgf', factor: grams * (u.form.factor ?? 1) }, per: per.form }, end: per.end };
        }
        if (u.form.kind === 'power' && per.form.kind === 'mass') return { suffix: { type: 'unit', form: u.form, per: per.form }, end: per.end };
        // "3.6 MJ per day": the energy, over the time said after it (read as a rate below).
        if (u.form.kind === 'energy' && per.form.kind === 'duration') return { suffix: { type: 'unit', form: u.form }, end: u.end };
      }
      // "230 V / 6.5 A", "12 V × 1 A": a voltage and a current side by side, each a figure.
      if (per && ((u.form.kind === 'voltage' && per.form.kind === 'current') || (u.form.kind === 'current' && per.form.kind === 'voltage'))) {
        return { suffix: { type: 'unit', form: u.form }, end: u.end };
      }
      // "Isp ~190 s per the cert sheet", "8.5 kg per the tank datasheet", "5 W per spec": "per" as "according
      // to", no compound.
      if (/per/i.test(c[0]) && PER_SOURCE_RE.test(text.slice(u.end + c[0].length, u.end + c[0].length + 40))) return { suffix: { type: 'unit', form: u.form }, end: u.end };
      // "1.4 kWh per kWh it takes", "3 kW per kW of electricity": units out for each unit in (read as a gain in kinds.ts).
      if (/per/i.test(c[0]) && per && (u.form.kind === 'energy' || u.form.kind === 'power') && per.form.kind === u.form.kind && PER_UNIT_IN_RE.test(text.slice(u.end + c[0].length, u.end + c[0].length + 60))) return { suffix: { type: 'unit', form: u.form }, end: u.end };
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
  // ("Calderon 24c", "Series 30c": a model's name, a word with a capital just before the number, and no
  // speed said around it.)
  const modelName = /(?<!\p{L})\p{Lu}[\p{L}\p{N}&-]*[^\S\n]+$/u.test(text.slice(Math.max(0, at - 50), at).replace(/[-−+]?[\d.,]+$/, '')) && !/(?<![\p{L}])(?:c|speed of light)(?!\p{L})/iu.test(sentenceAround(text, at, at).replace(/\d[\d.,]*c(?!\p{L})/gu, ''));
  // ("The 1.6 c entangled-pair link relays …", "design point: 0.2 c after ten minutes under a 100 GW beam": a
  // spaced "c" in a sentence about light, sails, craft or links beyond the planets — not a price, "20 c per kWh".)
  const lightContext =
    cm !== null &&
    !/^[^\S\n]*c[^\S\n]*(?:per|a|an|each|\/|for|off|coins?|pieces?)(?!\p{L})/iu.test(text.slice(at, at + 16)) &&
    !/[$€£¢]|(?<!\p{L})(?:cents?|price|costs?|pays?|paid|buys?|sells?|tariff|euros?|dollars?)(?!\p{L})/iu.test(sentenceAround(text, at, at)) &&
    /(?<!\p{L})(?:light|photons?|sails?|probes?|craft|starships?|spaceships?|ships?|warp|relativistic|interstellar|Centauri|light-?years?|signals?|links?|telemetry|beams?|faster|FTL|tachyons?|neutrinos?|particles?|jets?|drives?|Mars|Moon|rovers?|stars?)(?!\p{L})/iu.test(sentenceAround(text, at, at));
  if (cm && ((/^c/.test(cm[0]) && !modelName) || speedContext || lightContext)) {
    return { suffix: { type: 'unit', form: SPEED_OF_LIGHT }, end: at + cm[0].length };
  }
  PERCENT_RE.lastIndex = at;
  const p = PERCENT_RE.exec(text);
  if (p) return { suffix: { type: 'percent' }, end: at + p[0].length };
  return { suffix: null, end: at };
}

const SPEED_OF_LIGHT: UnitForm = { kind: 'speed', unit: 'm/s', factor: C_M_PER_S };

/** A mass unit's size in kilograms, for a mass per power said of thrust ("9 g per watt"). */
const GRAMS_IN_KG: Record<string, number> = { g: 0.001, kg: 1, lb: 0.45359237, lbm: 0.45359237, oz: 0.028349523125 };
/** Words of thrust in a sentence: "thrust", "prop(eller)s", "lift", "hover". */
const THRUST_TEXT_RE = /(?<!\p{L})(?:thrust\w*|props?|propellers?|rotors?|fans?|ducted|lift|hover\w*|motor\/prop|test stand|thrust stand)(?!\p{L})/iu;

/** After "per": one of a counted thing, not a unit ("per bit", "per cycle"). */
const PER_COUNT_RE = /^(?:(?:erased|logical|logic|single|full|complete|charge|working)[^\S\n]+)?(?:bits?|operations?|erasures?|cycles?|batch(?:es)?|flips?|runs?|trips?|laps?|charges?|discharges?|fills?|sessions?|pulses?|shots?|strokes?|revolutions?|turns?|swings?|firings?)(?!\p{L})/iu;
