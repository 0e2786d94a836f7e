/**
 * The figures of a text (the claim reader, shared/claims/reader.ts, pass 2): each number with its
 * unit made a figure of a kind (units.ts, kinds.ts, temperatures.ts), ranges and uncertainties made
 * one figure with an upper end, restatements in other units ("12 kW (16 hp)") dropped, roles and
 * hedges read (roles.ts, ranges-hedges.ts), multiples in words ("twice the energy it consumes", "half
 * the speed of light") added; then the relations (comparisons.ts, relations.ts) and the SI values.
 */
import { multipliedOut } from './products';
import { multiplesOfABase } from './multiples';
import { asideChanges, asideEmbodied, asideSlips, refills, storeChargeSpans, asidePerDistance, meterReadings, restatedEnergies, statedError, workedLines } from './ledgers';
import { QuantityError, formatQuantity, parseQuantity } from '../../worksheet/quantity';
import { C_M_PER_S } from '../figures-vocabulary';
import { FIGURE_SI_UNIT, type Figure, type FigureKind, type FigureRole } from '../types';
import { asideStatedBounds, statedBound } from './bounds';
import { comparedPercent, relate } from './comparisons';
import { thrustFromRatio } from './relations';
import { BEFORE_WINDOW, BURNER_RE, COOLING_MACHINE_RE, HEAT_PUMP_RE, NAMED_HEAT_PUMP_RE, paragraphAround, sentenceAround, windowStart } from './context';
import { asideApparentSpeeds, asideIdealDeltaV, asideOtherTopics, asideSignals, asideThresholds, asideWorkedBounds, rolesFromLineLabels, rolesFromWordLabels } from './topics';
import { insertAfter, siOf, typedSi, type Draft } from './draft';
import { G0 } from '../../checks/constants';
import { bareKind, GAIN_PER_UNIT_RE, PER_UNIT_QUANTITY, ISP_AFTER_RE, ISP_BEFORE_RE, MULTIPLE_VALUE, MULTIPLE_WORD_RE, readPercent, TEMPERATURE_CONTEXT_RE } from './kinds';
import { tokenize, type NumberToken } from './numbers';
import { hedgeBefore, isRangeGap, roleContextStart } from './ranges-hedges';
import { lastRoleWords, ratingRole, roleFor } from './roles';
import { differenceDirection, differenceQuantity, isDifference, OPERATING_RANGE_RE } from './temperatures';
import { GLUED_CELSIUS, GLUED_FAHRENHEIT, type Suffix } from './units';

/** Words of a temperature in a sentence: what a glued "4K" needs beside it to be read in kelvin. */
const TEMPERATURE_WORDS_RE = /(?<!\p{L})(?:temperatures?|kelvin|cold\w*|hot\w*|cool\w*|warm\w*|heat\w*|cryo\w*|helium|nitrogen|freez\w*|degrees?|thermal|sides?|sinks?|reservoirs?|ΔT|deltaT|superconduct\w*|absolute zero)(?!\p{L})/iu;

/** Seconds said of an engine: "an ion engine at 3,000 s", "a hydrazine thruster of 220 s" (a specific impulse). */
const ENGINE_SECONDS_RE = /(?<!\p{L})(?:engines?|thrusters?|rocket motors?|motors?|rockets?|stages?)[^\S\n]+(?:at|of|rated at|running at|giving|with)[^\S\n]+(?:(?:about|around|roughly|some|nearly|an? Isp of)[^\S\n]+)?$/iu;

function suffixKind(s: Suffix): string | null {
  if (s === null) return null;
  if (s.type === 'percent') return '%';
  return s.per ? `${s.form.kind}/${s.per.kind}` : s.form.kind;
}

/** A text whose temperatures are said in Fahrenheit and none in Celsius. */
function fahrenheitText(text: string): boolean {
  return /\d[^\S\n]*(?:°|º)[^\S\n]*F(?!\p{L})|\d[^\S\n]*degrees?[^\S\n]+F(?:ahrenheit)?(?!\p{L})|Fahrenheit/u.test(text) && !/\d[^\S\n]*(?:°|º)[^\S\n]*C(?!\p{L})|\d[^\S\n]*degrees?[^\S\n]+C(?:elsius)?(?!\p{L})|Celsius|centigrade/iu.test(text);
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

/** Just before a bare number said of a machine's side: "cold end at", "the floor loop at", "inside, about". */
const SIDE_LEAD_RE =
  /(?<!\p{L})(?:(?:hot|cold|warm|cool)(?:[- ](?:side|end|junction|plate|head|reservoir|face))?|sink|source|flow|return|loop|inside|outside|outdoors|indoors|condenser|evaporator|cabinet|exhaust|inlet|outlet|(?:under)?floor|radiators?|emitters?|house|room|water|tank|kitchen|head|plate|(?:rejects?|rejecting|dumps?|dumping|sheds?|shedding)(?:[^\S\n]+(?:its[^\S\n]+|the[^\S\n]+)?(?:waste[^\S\n]+)?heat)?)(?!\p{L})[^\S\n]*(?:(?!(?:is|was|at|with|COP|SCOP|EER|efficiency|of|rated|power|output|input)(?!\p{L}))[\p{L}-]+[^\S\n]+){0,3}?(?:(?:is|was|sits|sat|runs|ran|running|held|kept|stays|stayed|set|goes|went)[^\S\n]+)?(?:at|of|to|around|[:=]|(?<=(?<!\p{L})temperatures?[^\S\n]*))(?:[^\S\n]+(?:about|around|roughly|some|nearly))??[^\S\n]*(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;
/** After a bare number, what part of a craft's mass it is: "… and a hundred and fifty dry", "nine hundred is propellant". */
const MASS_ROLE_AFTER_RE = /^[^\S\n]*(?:(?:dry|empty|wet|fuelled|fueled|full|loaded|unfuelled|unfueled)(?!\p{L})|when[^\S\n]+(?:(?:the|its)[^\S\n]+tanks?[^\S\n]+(?:are|is)[^\S\n]+|it[^\S\n]+is[^\S\n]+|it['’]s[^\S\n]+)?(?:empty|dry)(?!\p{L})|(?:of (?:it|that|them)[^\S\n]+)?(?:is|are|being|was|were|would be|will be|is to be|must be)[^\S\n]+(?:the[^\S\n]+)?(?:propellant|fuel|xenon|cold gas|reaction mass|oxidi[sz]er)(?!\p{L}))/iu;
/** Between a mass and a bare number that is the craft's other mass: "… and ends at", "…, of which", "… down to". */
const MASS_LEAD_RE = /(?<!\p{L})(?:ends?|ending|ended|finishes|finishing|burns? (?:out|down)|down|of which)(?!\p{L})[^\S\n]*(?:at|to|with)?[^\S\n]*(?:(?:about|around|roughly|some|only|just)[^\S\n]+)?$/iu;
/** Just before a mass unit said of a force: "thrust 2.8 g", "a pull of 140 lb", "push of about 3 kg". */
const FORCE_BEFORE_RE = /(?<!\p{L})(?:thrust|pull|push|tension|drag|force)(?:[^\S\n]+(?:per|of each|for each)[^\S\n]+[\p{L}-]+)?(?:[^\S\n]+(?:of|was|is|measured|=|:|about|around|roughly|nearly|some))*[^\S\n]*[=:]?[^\S\n]*$/iu;
/** Just after a mass unit said of a force: "2.8 g (weight)", "12 lb wt". */
const WEIGHT_AFTER_RE = /^\.?[^\S\n]*(?:\([^\S\n]*(?:weight|wt\.?|force)[^\S\n]*\)|wt\.?(?!\p{L}))/iu;
/** Just before a figure that gives a unit's size: "kilocalories of 4,184 joules", "a horse-power being 746 W". */
const UNIT_SIZE_BEFORE_RE = /(?<!\p{L})(?:(?:kilo)?calories|kcals?|cals|B\.?Th\.?U\.?s?|BTUs?|therms?|horse-?[^\S\n]?power|(?:kilo)?calorie|British thermal units?|foot-pounds?)(?:[^\S\n]*\([^()\n]{1,20}\))?[^\S\n]+(?:of|=|equal to|being|each of|worth)[^\S\n]+(?:(?:exactly|about|some)[^\S\n]+)?$/iu;
/** After a "0–60 mph": the seconds it takes ("in 6.1 s", "(7.9 s)", ": 4.2 sec"). */
const SPRINT_AFTER_RE = /^[^\S\n]*(?:in|:|\(|—|–|-)?[^\S\n]*(?:in[^\S\n]+)?(?:(?:about|around|under|just under|less than|roughly)[^\S\n]+)?\d[\d.,]*[^\S\n]*(?:s|sec|secs|seconds)(?!\p{L})/iu;
/** Around a "0–60 mph": the words of a sprint from rest. */
const SPRINT_WORD_RE = /(?<!\p{L})(?:sprint|accelerat\w*|dash|time)(?!\p{L})/iu;
/** After such a number: the clause ends ("… at twenty, and …", "… at 20.", "… at thirty-five)"). */
const BARE_END_RE = /^[^\S\n]*(?:[,;.!?)\]—–]|and(?!\p{L})|$)/u;
/** Just before a bare temperature of the surroundings: "when it's", "while it is", "if it was about". */
const WHEN_ITS_LEAD_RE = /(?<!\p{L})(?:when|while|if|and)[^\S\n]+it(?:['’]s|[^\S\n]+is|[^\S\n]+was)[^\S\n]+(?:(?:about|around|only|just|over|under|nearly)[^\S\n]+)?$/iu;
/** Right after it, the place or the weather: "in the car", "outside", "out in the garage". */
const PLACE_AFTER_RE = /^[^\S\n]+(?:(?:out[^\S\n]+)?in[^\S\n]+the[^\S\n]+(?:car|room|garage|house|sun|shade|kitchen|loft|attic|cabin|tent|van|boot|trunk|shed|office|lab|workshop)|outside|outdoors|out(?=[^\S\n]*[,.;!?]))(?!\p{L})/iu;

/**
 * "3 or 4 kW", "one point eight, one point nine kilowatts": two bare-then-united numbers close together
 * (the second above the first, by at most half as much again; by a quarter after a comma) said as one
 * hedged figure — not a list ("1.8, 2.4 and 3.0 kW" goes on after it).
 */
function spokenRange(text: string, t: NumberToken, next: NumberToken): boolean {
  if (t.suffix !== null || next.suffix === null) return false;
  const gap = text.slice(t.numEnd, next.start);
  const [a, b] = [Number(t.num), Number(next.num)];
  if (!(a > 0) || !(b > a)) return false;
  const or = /^[^\S\n]+or[^\S\n]+$/iu.test(gap);
  const comma = /^,[^\S\n]*$/u.test(gap);
  // (After a comma only as said aloud, both in words: "Table 1, 1.18 kW" is a label and a figure.)
  if (!(or && b <= 1.5 * a) && !(comma && b <= 1.25 * a && t.words && next.words)) return false;
  // (Not a list: nothing listed before the first or after the second.)
  if (/\d[^\S\n]*(?:[\p{L}%°]+[^\S\n]*)?(?:,|or)[^\S\n]*$/u.test(text.slice(Math.max(0, t.start - 30), t.start))) return false;
  return !/^[^\S\n]*(?:,[^\S\n]*\d|(?:and|or)[^\S\n]+\d|,[^\S\n]*(?:and|or)[^\S\n]+\d)/u.test(text.slice(next.end, next.end + 20));
}

/** Just before an erratum's figure: "It should read", "should have read", "should be". */
const SHOULD_READ_BEFORE_RE = /(?<!\p{L})should(?:[^\S\n]+have)?[^\S\n]+(?:read|been|be)[^\S\n]*[:"“'‘]?[^\S\n]*$/iu;

/** A percentage an erratum puts in place of the one before it ("was printed as 45 %. It should read 4.5 %"): that one's kind. */
function erratumPercent(text: string, start: number, drafts: Draft[]): { kind: FigureKind; role: FigureRole; factor: number; unit: string; assumption?: string; ofInput?: boolean; more?: boolean; derived?: string } | null {
  if (!SHOULD_READ_BEFORE_RE.test(text.slice(Math.max(0, start - 40), start))) return null;
  const prev = [...drafts].reverse().find((d) => d.end <= start && start - d.end < 120 && /%\s*$/u.test(text.slice(d.start, d.end)));
  if (!prev || !(prev.kind === 'efficiency' || prev.kind === 'cop' || prev.kind === 'quantum-efficiency')) return null;
  return { kind: prev.kind, role: prev.role ?? null, factor: 0.01, unit: '', assumption: 'A corrected figure, read as the kind of the one it replaces.' };
}

/**
 * A percentage in a list after another ("coefficients of 118 % and 121 %", "efficiencies of 18 %, 19 % and
 * 21 %"): the kind, side and scale of the one before it.
 */
function listedPercent(text: string, start: number, drafts: Draft[]): ReturnType<typeof erratumPercent> {
  const prev = drafts[drafts.length - 1];
  if (!prev || prev.derived || prev.ofInput || prev.upper !== undefined || !/%\s*$/u.test(text.slice(prev.start, prev.end))) return null;
  if (!/^[^\S\n]*(?:,[^\S\n]*(?:and[^\S\n]+|or[^\S\n]+)?|and[^\S\n]+|or[^\S\n]+)$/u.test(text.slice(prev.end, start))) return null;
  if (!(prev.kind === 'efficiency' || prev.kind === 'cop' || prev.kind === 'quantum-efficiency')) return null;
  if (prev.kind === 'efficiency' && !/%$/u.test(prev.quantity)) return null;
  return prev.kind === 'efficiency' ? { kind: 'efficiency', role: prev.role ?? null, factor: 1, unit: '%' } : { kind: prev.kind, role: prev.role ?? null, factor: 0.01, unit: '' };
}

/** Between two figures of a list: a comma or "and", perhaps after the first one's condition ("at 540 rpm (Run A), "). */
const LISTED_AFTER_RE = /^(?:[^\S\n]+(?:at|@|in|for|on|with)[^\S\n]+[^,;.()\n]{1,25}?)?(?:[^\S\n]*\([^()\n]{1,20}\))?[^\S\n]*(?:,[^\S\n]*(?:and[^\S\n]+)?|and[^\S\n]+)$/u;

/** After a figure of such a list: its condition, then the list's next separator or the clause's end (not "28 kWh of it ended up in …"). */
const LIST_GOES_ON_RE = /^(?:[^\S\n]+(?:at|@|in|for|on|with)[^\S\n]+[^,;.()\n]{1,25}?)?(?:[^\S\n]*\([^()\n]{1,20}\))?[^\S\n]*(?:[,;.)]|and(?!\p{L})|$)/u;

/** A bare number an erratum puts in place of the one before it ("printed as 0.30. It should read 3.0"): that one's kind. */
function erratumBare(text: string, start: number, drafts: Draft[]): { kind: FigureKind; role?: FigureRole; derived?: string; factor?: number } | null {
  if (!SHOULD_READ_BEFORE_RE.test(text.slice(Math.max(0, start - 40), start))) return null;
  const prev = [...drafts].reverse().find((d) => d.end <= start && start - d.end < 120);
  if (!prev || !(prev.kind === 'efficiency' || prev.kind === 'cop' || prev.kind === 'quantum-efficiency') || /%\s*$/u.test(text.slice(prev.start, prev.end))) return null;
  return { kind: prev.kind, role: prev.role === 'aside' ? undefined : (prev.role ?? undefined) };
}

/** "for every watt going in," before a figure: the unit in, said first. */
const PER_UNIT_BEFORE_RE = /(?<!\p{L})(?:(?:for|per)[^\S\n]+(?:each|every|one)|each|every)[^\S\n]+(?:single[^\S\n]+)?(watt|joule|kWh|kilowatt-hour|kilowatt|kW|megajoule|MJ|unit|W|J)s?(?:(?:[^\S\n]+(?:of[^\S\n]+)?[\p{L}-]+){1,6}?,(?:[^\S\n]+[\p{L}][\p{L}\p{N}-]*){1,7}?|(?:[^\S\n]+(?:of[^\S\n]+)?[\p{L}-]+){0,9}?)[^\S\n]*[,:;]?[^\S\n]*(?:about|roughly|some|nearly|only|just)?[^\S\n]*$/iu;
/** After a figure: it is what comes out ("1.25 watts would come out", "1.4 J come back"). */
const COMES_OUT_AFTER_RE = /^[^\S\n]*(?:of[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:(?:would|will|should|could|does|do|can|did|must)[^\S\n]+)?(?:come|comes|came|go|goes|went|get|gets|got)[^\S\n]+(?:out|back)(?!\p{L})/iu;

/** Words of heat moved rather than made ("moves three times more heat than it uses"). */
/** Heat said not to be moved: "nothing to pull heat from", "it does not pump heat", "without moving any heat". */
const NOT_MOVING_HEAT_RE =
  /(?<!\p{L})(?:nothing|no(?:[^\S\n]+[\p{L}-]+){1,2}|not|never|n['’]t|without)(?:[^\S\n]+(?:to|that[^\S\n]+can|which[^\S\n]+can|able[^\S\n]+to|any))?[^\S\n]+(?:mov|pump|shift|remov|extract|transferr?|lift|draw|pull)(?:s|es|ed|ing)?[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,3}?heat(?!\p{L})/giu;
const MOVES_HEAT_RE = /(?<!\p{L})(?:mov|pump|shift|remov|extract|transferr?|lift|draw|pull)(?:s|es|ed|ing)?[^\S\n]+(?:[\p{L}\p{N}.,-]+[^\S\n]+){0,4}?heat(?!\p{L})/iu;

/**
 * A gain of heat over work ("three times as much heat as the electricity it uses") is a COP: a heating
 * COP for a heat pump named in its sentence, or where the sentence speaks of heat moved and the paragraph
 * names a heat pump; a cooling COP where it speaks of heat moved and the paragraph names a fridge or a
 * cooler (and no heat pump).
 */
/** Heat drawn out of a cold space: "pulls heat out of the freezer", "removes heat from the cold box". */
const HEAT_OUT_OF_COLD_RE =
  /(?<!\p{L})(?:pulls?|pulling|draws?|drawing|removes?|removing|extracts?|extracting|takes?|taking|pumps?|pumping|moves?|moving)[^\S\n]+heat[^\S\n]+(?:out[^\S\n]+of|from)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?[^.;!?\n]{0,20}?(?:freezer|fridge|refrigerator|cold|chilled|compartment|cabinet|box|inside|interior|food)(?!\p{L})/iu;

/** Words that say a heater makes its heat from nothing or from its electricity alone: then a gain of heat is no COP. */
const NO_AMBIENT_SOURCE_RE =
  /(?<!\p{L})(?:over-?unity|free energy|self-?running|perpetual|zero-?point|vacuum energy|resistive|resistance (?:heater|element|wire)|heating elements?|no (?:heat[- ]pump|compressor|outdoor unit|refrigerant)|nothing to (?:pull|draw|take) heat from|without (?:any )?(?:outside|outdoor|ambient) (?:air|heat)|sealed box|from nothing|more energy than)(?!\p{L})/iu;

/** A machine said to make its heat, not move it: a reactor, an electrolytic cell, a loaded metal, a plasma. */
const HEAT_MAKER_RE =
  /(?<!\p{L})(?:reactors?|electroly\w*|cathodes?|anodes?|nickel|palladium|deuter\w*|LENR|cold[- ]fusion|fusion|plasma|excess[^\S\n]+heat|hydrino\w*)(?!\p{L})/iu;

function gainAsCop(text: string, start: number, end: number): { role: 'heating' | 'cooling'; assumption: string } | null {
  const sentence = sentenceAround(text, start, end);
  const heating = { role: 'heating' as const, assumption: "A heat pump's heat out as a multiple of its work in: read as a heating COP." };
  if (HEAT_PUMP_RE.test(sentence)) return heating;
  // ("The air conditioner gives 3.5 for every 1 you put in": a cooling machine's gain, named in its own sentence.)
  if (COOLING_MACHINE_RE.test(sentence)) return { role: 'cooling', assumption: 'A cooling machine\'s output as a multiple of its work in: read as a cooling COP.' };
  // ("For every kWh it draws, the HP-5 puts 3.4 kWh of heat into your home … 10 years on the compressor": heat
  // given by a machine with a compressor or named a heat pump anywhere in the text.)
  if (/^[^\S\n]*of[^\S\n]+(?:useful[^\S\n]+)?(?:heat|warmth)(?!\p{L})/iu.test(text.slice(end, end + 20)) && /(?<!\p{L})(?:compressors?|refrigerant)(?!\p{L})/iu.test(text.replace(/(?<!\p{L})(?:no|without|not an?|nor|never)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:compressors?|refrigerant(?:[^\S\n]+circuit)?)(?!\p{L})/giu, ' ')) && !COOLING_MACHINE_RE.test(text)) return heating;
  // ("Each kWh of electricity gives 3 kWh of heat": heat out per unit of electricity, by a machine the text
  // does not name and does not say makes its heat from nothing — a heat pump's figure as much as any.)
  if (
    /^[^\S\n]*(?:kWh|kW|W|J|MJ|units?|joules?|watts?)?[^\S\n]*of[^\S\n]+(?:(?:useful|extra|additional)[^\S\n]+)?(?:heat|warmth)(?!\p{L})/iu.test(text.slice(end, end + 30)) &&
    /(?<!\p{L})(?:electricity|electric(?:al)?|kWh of power|you (?:buy|pay for)|from the (?:wall|mains|socket|plug|grid))(?!\p{L})/iu.test(sentence) &&
    // (A heat pump's backup or immersion element, named beside it, is no claim that the heat is made by resistance.)
    !NO_AMBIENT_SOURCE_RE.test(text.replace(/(?<!\p{L})(?:backup|back-up|booster|auxiliary|immersion|supplementary|emergency|top-up)[^\S\n]+(?:heat(?:ing)?[^\S\n]+)?(?:elements?|heaters?)(?!\p{L})/giu, ' ')) &&
    !HEAT_MAKER_RE.test(text) &&
    !COOLING_MACHINE_RE.test(paragraphAround(text, start, end)) &&
    !/(?<!\p{L})(?:cool\w*|chill\w*|refrigerat\w*|freez\w*|remov\w*|out[^\S\n]+of)(?!\p{L})/iu.test(sentence)
  )
    return { role: 'heating', assumption: 'Heat out as a multiple of the electricity in, from a machine the text does not name: what a heat pump gives, read as a heating COP.' };
  // ("from a box with no outdoor unit and nothing to pull heat from": heat said not to be moved.)
  if (!MOVES_HEAT_RE.test(sentence.replace(NOT_MOVING_HEAT_RE, ' '))) return null;
  const paragraph = paragraphAround(text, start, end);
  const pump = HEAT_PUMP_RE.test(paragraph);
  // (A "cooling module", "it cools": a machine that cools, by whatever name.)
  const cooler = COOLING_MACHINE_RE.test(paragraph) || /(?<!\p{L})cool(?:s|ed|ing|er|ers)?(?!\p{L})/iu.test(paragraph);
  if (pump && !cooler) return heating;
  if (cooler && !pump) return { role: 'cooling', assumption: 'The heat a cooling machine moves as a multiple of its work in: read as a cooling COP.' };
  // (Both named — "a fridge-freezer is a heat pump pointed the other way" — its own sentence says which:
  // "pulls heat out of the −18 °C freezer at about 1.8 times the rate it uses electricity".)
  if (pump && cooler && HEAT_OUT_OF_COLD_RE.test(sentence)) return { role: 'cooling', assumption: 'The heat drawn out of the cold space as a multiple of the work in: read as a cooling COP.' };
  // (Heat moved by a machine the text does not name: not energy made, so not an efficiency either.)
  return { role: 'heating', assumption: 'Heat moved as a multiple of the work in, by a machine the text does not name: read as a heating COP.' };
}

/** Between a sheet's label and its value: leader dots, a pipe, a tab or wide spaces, then perhaps a hedge ("between", "approx."). */
const ROW_SEPARATOR_RE = /(?:\.{3,}|…|\||\t|[^\S\n]{3,})[^\S\n]*(?:(?:between|about|approx\.?|ca\.|up to|typ\.?|typically|min\.?|max\.?|[~≈<>≤≥])[^\S\n]*)?$/iu;
/** A test condition in a sheet's label: "(Vin = 12 V)", "@ 121.6 nm", "at 25 °C". */
const LABEL_CONDITION_RE = /\([^()\n]{0,30}\)|(?:@|(?<!\p{L})at)[^\S\n]*[-−+]?\d[\d.,]*[^\S\n]*[^\s\d|]{0,5}/giu;

/**
 * A sheet's row ("Cooling capacity at +5 °C coolant ........ 1,200 W", "Full-load efficiency (Vin = 12 V)⇥89.3 %"):
 * its whole label is the figure's words, whatever figure of a test condition the label holds. Where the
 * value follows a row separator, the floor goes back to the line's start; for reading a figure's kind, only
 * when the label's own numbers are test conditions (not another cell's value).
 */
function sheetRowFloor(text: string, start: number, floor: number, labelOnly: boolean): number {
  const lineStart = text.lastIndexOf('\n', start - 1) + 1;
  if (lineStart >= floor) return floor;
  const sep = ROW_SEPARATOR_RE.exec(text.slice(lineStart, start));
  if (!sep) return floor;
  if (labelOnly && /\d/u.test(text.slice(lineStart, lineStart + sep.index).replace(LABEL_CONDITION_RE, ' '))) return floor;
  return lineStart;
}

export function readFigures(text: string, restated: [number, number][]): Figure[] {
  lastRoleWords.end = 0;
  const tokens = tokenize(text);
  const drafts: Draft[] = [];
  /** Figures said as the writer's ceiling (bounds.ts). */
  const bounds = new Set<Draft>();
  let floor = 0;
  /** Percentages no reading took (asideOtherPercents). */
  const unreadPercents: UnreadPercent[] = [];

  for (let i = 0; i < tokens.length; i++) {
    const t = tokens[i];
    if (t.skip || t.consumed || t.plusMinus) continue;
    let suffix = t.suffix;
    let end = t.end;
    const start = t.start;
    let upperNum: string | undefined;
    /** A bare range's kind, read from the words after its upper end. */
    let bareFromUpper: ReturnType<typeof bareKind> = null;
    const next: NumberToken | undefined = tokens[i + 1];
    // Ranges and uncertainties: "3–6 mN", "3 mN to 6 mN", "between 0.5 and 1.5 kW", "1.2 ± 0.3 mN", "2.31(4) mN".
    if (t.unc !== undefined) {
      const mid = Number(t.num);
      upperNum = String(Number((mid + t.unc).toPrecision(15)));
      t.num = String(Number((mid - t.unc).toPrecision(15)));
    } else if (next && !next.skip) {
      const gapStart = t.suffix ? t.end : t.numEnd;
      const pmGap = /^,?[^\S\n]*(?:±|\+\/-|\+-|plus[^\S\n]+or[^\S\n]+minus|give[^\S\n]+or[^\S\n]+take)[^\S\n]*$/i.test(text.slice(gapStart, next.start)) ||
        // ("1.2 kW (± 5 %)": an uncertainty in per cent, in brackets.)
        (/^[^\S\n]*\([^\S\n]*(?:±|\+\/-|\+-)[^\S\n]*$/.test(text.slice(gapStart, next.start)) && next.suffix?.type === 'percent');
      // "96 W ± 3 %": an uncertainty in per cent of the figure.
      const relative = pmGap && next.plusMinus && t.suffix !== null && t.suffix.type === 'unit' && next.suffix?.type === 'percent';
      if (pmGap && next.plusMinus && (relative || !t.suffix || suffixKind(t.suffix) === suffixKind(next.suffix) || !next.suffix)) {
        const mid = Number(t.num);
        const unc = relative ? (mid * Number(next.num)) / 100 : Number(next.num);
        suffix = relative ? t.suffix : (t.suffix ?? next.suffix);
        upperNum = String(Number((mid + unc).toPrecision(15)));
        t.num = String(Number((mid - unc).toPrecision(15)));
        end = t.suffix && !next.suffix ? next.numEnd : next.end;
        if (/\([^\S\n]*(?:±|\+\/-|\+-|plus)/iu.test(text.slice(gapStart, next.start)) && text[end] === ')') end += 1;
        next.consumed = true;
      } else if (
        !t.suffix &&
        !next.suffix &&
        !t.words &&
        !next.words &&
        !next.plusMinus &&
        isRangeGap(text, t.numEnd, next.start, t.start) &&
        (bareKind(text, t.start, t.numEnd, floor) || (bareFromUpper = bareKind(text, next.start, next.numEnd, floor)))
      ) {
        // "a COP between 3.2 and 4.1", "an efficiency of 0.3–0.4"; "between 3.2 and 3.8 units of heat for
        // every unit of electricity", where the words after the upper end say what both are.
        upperNum = next.num;
        end = next.end;
        next.consumed = true;
      } else if (
        !next.plusMinus &&
        (isRangeGap(text, gapStart, next.start, t.start) || spokenRange(text, t, next)) &&
        (t.suffix === null || suffixKind(t.suffix) === suffixKind(next.suffix)) &&
        next.suffix &&
        // ("a COP of 2.1 to 70 °F indoor air": a bare number its own words give another kind is no lower end.)
        !(t.suffix === null && next.suffix.type === 'unit' && (bareKind(text, t.start, t.numEnd, floor)?.kind ?? next.suffix.form.kind) !== next.suffix.form.kind)
      ) {
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
        // ("Outdoor air temperatures ranged from 18 to 33 °C": one quantity's spread, not two sides.)
        const spread = /(?<!\p{L})(?:rang(?:e|es|ed|ing)|var(?:y|ies|ied|ying)|fluctuat(?:e|es|ed|ing)|swung|swings?|drift(?:s|ed|ing)?)[^\S\n]+(?:(?:anywhere|somewhere)[^\S\n]+)?(?:from|between)[^\S\n]+$/iu.test(text.slice(Math.max(0, t.start - 40), t.start));
        // ("Operating temperature | −20 to +60 °C": the range it is rated for, one figure set aside.)
        const rated = suffixKind(next.suffix) === 'temperature' && OPERATING_RANGE_RE.test(text.slice(Math.max(0, t.start - 40), t.start));
        const twoSides =
          fallingMass ||
          (suffixKind(next.suffix) === 'voltage' && !dash) ||
          (!thirdTemperature && !spread && !rated && suffixKind(next.suffix) === 'temperature' && !dash && !isDifference(text, t.start, next.end, floor));
        suffix = next.suffix;
        // "0–60 mph in 6.1 s", "0-100 km/h (7.9 s)": a sprint from rest, the speed reached, not a range of speeds.
        if (
          Number(t.num) === 0 &&
          suffixKind(next.suffix) === 'speed' &&
          (SPRINT_AFTER_RE.test(text.slice(next.end, next.end + 24)) || SPRINT_WORD_RE.test(text.slice(Math.max(0, t.start - 30), Math.min(text.length, next.end + 30))))
        ) {
          t.num = next.num;
          suffix = next.suffix;
          end = next.end;
          next.consumed = true;
        } else if (!twoSides) {
          upperNum = next.num;
          end = next.end;
          next.consumed = true;
        }
      }
    }
    // "hot head at four hundred degrees Celsius, cold end at twenty": a bare number said of the other
    // side, in the sentence of a temperature, takes that temperature's unit.
    let carried = false;
    if (!suffix && upperNum === undefined) {
      const sibling = [...tokens.slice(0, i)].reverse().find((o) => !o.skip && o.suffix?.type === 'unit' && o.suffix.form.kind === 'temperature');
      // ("with the outside air at minus 10": the sign said in words, before the side's words are read.)
      const minusWord = /^[-−+]/u.test(t.num) ? null : /(?<!\p{L})(?:minus|negative)[^\S\n]+$/iu.exec(text.slice(Math.max(0, start - 12), start));
      const leadEnd = start - (minusWord?.[0].length ?? 0);
      if (
        sibling &&
        // (In its sentence, or the one before in its paragraph: "Inside, the box holds five degrees C, and
        // the hot-side heatsink runs at about thirty.")
        (sentenceAround(text, sibling.start, sibling.end) === sentenceAround(text, start, t.numEnd) ||
          (start - sibling.end < 160 && !/\n/.test(text.slice(sibling.end, start)))) &&
        !isDifference(text, sibling.start, sibling.end, 0) &&
        ((SIDE_LEAD_RE.test(text.slice(Math.max(sibling.end, leadEnd - 40), leadEnd)) && BARE_END_RE.test(text.slice(t.numEnd, t.numEnd + 12))) ||
          // ("keeps the inside at 5 °C when it's 30 in the car": the weather or the place, said as people say it.)
          (WHEN_ITS_LEAD_RE.test(text.slice(Math.max(sibling.end, start - 30), start)) && PLACE_AFTER_RE.test(text.slice(t.numEnd, t.numEnd + 30))))
      ) {
        suffix = sibling.suffix;
        carried = true;
        if (minusWord && !/(?<!\p{L})plus[^\S\n]+or[^\S\n]+$/iu.test(text.slice(Math.max(0, leadEnd - 20), leadEnd))) t.num = `-${t.num}`;
      }
      // "five hundred kilos wet and a hundred and fifty dry", "twelve hundred kilograms, of which nine
      // hundred is propellant", "starts at a thousand kilograms and ends at eight hundred": a craft's
      // other mass, in the unit of the mass before it.
      const massSibling = [...tokens.slice(0, i)].reverse().find((o) => !o.skip && o.suffix?.type === 'unit' && o.suffix.form.kind === 'mass');
      if (
        !carried &&
        massSibling &&
        start - massSibling.end < 80 &&
        !/[\p{N}]/u.test(text.slice(massSibling.end, start)) &&
        sentenceAround(text, massSibling.start, massSibling.end) === sentenceAround(text, start, t.numEnd) &&
        (MASS_ROLE_AFTER_RE.test(text.slice(t.numEnd, t.numEnd + 30)) || (MASS_LEAD_RE.test(text.slice(massSibling.end, start)) && BARE_END_RE.test(text.slice(t.numEnd, t.numEnd + 12))))
      ) {
        suffix = massSibling.suffix;
        carried = true;
      }
      // "took twelve hundred watts in and gave fifteen hundred out", "drew 1200 W and put out 1500": the other
      // side, in the unit of the power or energy said just before it.
      const flowSibling = [...tokens.slice(0, i)].reverse().find((o) => !o.skip && o.suffix?.type === 'unit' && (o.suffix.form.kind === 'power' || o.suffix.form.kind === 'energy') && !o.suffix.per);
      if (
        !carried &&
        flowSibling &&
        start - flowSibling.end < 80 &&
        !/[\p{N}]/u.test(text.slice(flowSibling.end, start)) &&
        ((sentenceAround(text, flowSibling.start, flowSibling.end) !== sentenceAround(text, start, t.numEnd) &&
          // ("The converter takes in two hundred watts. It gives back three hundred and ten, every hour …": the
          // next sentence, of the same device, what it gives.)
          /^[^.!?\n]*[.!?]["”’')]*[^\S\n]+(?:It|They|This|That|The[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:device|unit|box|machine|converter|generator|motor|module|rig|prototype|system))[^.!?\n]*$/u.test(text.slice(flowSibling.end, start)) &&
          /(?<!\p{L})(?:puts?[^\S\n]+out|gives?[^\S\n]+(?:out|back)|gave[^\S\n]+(?:out|back)|returns|returned|delivers|delivered|produces|produced|yields|yielded)[^\S\n]+(?:(?:about|some|nearly|only|just|over|almost)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 30), start)) &&
          /^[^\S\n]*(?:[,.;:!?)\]]|—|–|$)/u.test(text.slice(t.numEnd, t.numEnd + 4))) ||
          (sentenceAround(text, flowSibling.start, flowSibling.end) === sentenceAround(text, start, t.numEnd) &&
        (/^[^\S\n]*(?:in|out|back)(?:[^\S\n]*[,.;:!?)"”’']|[^\S\n]+(?:and|at|of|from|to|with|while|for|on)(?!\p{L})|[^\S\n]*$)/iu.test(text.slice(t.numEnd, t.numEnd + 12)) ||
          // ("drawing two point eight from the grid", "measured about four hundred and fifty at the wheel": the
          // supply or the output named after it.)
          /^[^\S\n]+(?:from[^\S\n]+(?:the[^\S\n]+)?(?:grid|mains|wall|socket|supply|battery|pack)|at[^\S\n]+the[^\S\n]+(?:wheels?|shaft|crank|output|load))(?!\p{L})/iu.test(text.slice(t.numEnd, t.numEnd + 24)) ||
          // ("put back twelve kilowatts while the drive motor is only drawing eight, so …": what the other
          // part draws, said last in its clause.)
          // ("takes in 500 watts and puts out 650.": what it gives, said last in its clause.)
          (/(?<!\p{L})(?:drew|draws|drawing|takes|took|taking|consumes|consumed|consuming|puts?[^\S\n]+out|putting[^\S\n]+out|gives?[^\S\n]+(?:out|back)|gave[^\S\n]+(?:out|back)|returns|returned|delivers|delivered|produces|produced)[^\S\n]+(?:(?:about|some|nearly|only|just)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 30), start)) &&
            /(?<!\p{L})(?:while|whereas|but|and|when)(?!\p{L})/iu.test(text.slice(flowSibling.end, start)) &&
            /^[^\S\n]*(?:[,.;:!?)\]]|—|–|$|[^\S\n]+(?:so|but|and|while|yet)(?!\p{L}))/iu.test(text.slice(t.numEnd, t.numEnd + 8)))))) &&
        /(?<!\p{L})(?:gave|gives|give|put(?:s|ting)?(?:[^\S\n]+out)?|returned|returns|delivered|delivers|produced|produces|yielded|yields|drew|draws|drawing|took|takes|taking|used|uses|using|got|gets|measured|logged|and|with|(?:out|in)[^\S\n]+for)[^\S\n]+(?:(?:back|about|some|nearly|only|just)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 30), start))
      ) {
        suffix = flowSibling.suffix;
        carried = true;
      }
    }
    // "a perfect engine would only reach about 14 %", "the ideal COP … is about 11": the writer's ceiling.
    const bound = !carried && (!suffix || suffix.type === 'percent') ? statedBound(text, start, suffix ? end : t.numEnd, suffix !== null, Number(t.num)) : null;
    if (t.words && !suffix && !bound && !bareKind(text, t.start, t.numEnd, floor)) continue;

    let kind: FigureKind | null = null;
    let quantity = '';
    let upper: string | undefined;
    let role: FigureRole | undefined;
    let derived: string | undefined;
    let assumption: string | undefined;
    let direction: Draft['direction'];
    let ofInput: boolean | undefined;
    let perUnitInput: Draft | undefined;
    // ("At 40 degrees out … the air at the registers around 100°F": "degrees" alone, in a text whose other
    // temperatures are all in Fahrenheit, is in Fahrenheit too.)
    const fahrenheitDegrees = suffix?.type === 'unit' && suffix.form.ambiguous && suffix.form !== GLUED_CELSIUS && suffix.form !== GLUED_FAHRENHEIT && fahrenheitText(text);
    if (fahrenheitDegrees) suffix = { type: 'unit', form: GLUED_FAHRENHEIT };
    if (suffix?.type === 'unit') {
      const q = unitQuantity(t.num, suffix);
      kind = q.kind;
      quantity = q.quantity;
      if (carried) assumption = 'A number written without a unit, read in the unit of the figure said before it.';
      if (upperNum !== undefined) upper = unitQuantity(upperNum, suffix).quantity;
      // "measured thrust 2.8 ± 0.1 g", "a pull of 140 lb.", "2.8 g (weight)": a mass unit said of a force is
      // its weight, the gravitational unit of force (gram-, pound-, kilogram-force).
      if (kind === 'mass' && (FORCE_BEFORE_RE.test(text.slice(Math.max(floor, start - 30), start)) || WEIGHT_AFTER_RE.test(text.slice(end, end + 16)))) {
        try {
          const asForce = (qty: string) => `${Number(parseQuantity(qty, 'kg').toPrecision(15))} kgf`;
          quantity = asForce(quantity);
          if (upper !== undefined) upper = asForce(upper);
          kind = 'thrust';
        } catch {
          /* left a mass */
        }
      }
      // "degrees" alone: a temperature where the sentence speaks of one, else an angle (not a figure).
      if (kind === 'temperature' && suffix.form.ambiguous && !TEMPERATURE_CONTEXT_RE.test(sentenceAround(text, start, end))) continue;
      if (kind === 'temperature' && isDifference(text, start, end, floor)) {
        kind = 'temperature-difference';
        quantity = differenceQuantity(scaled(t.num, suffix.form.factor), suffix.form.unit);
        direction = differenceDirection(text, end);
        // ("Temperature drop, head to cooler 580 K": the other side lies below the one given.)
        if (!direction && /(?<!\p{L})(?:temperature[^\S\n]+(?:drop|fall)|drops?[^\S\n]+(?:by|of)|fell[^\S\n]+by|falls?[^\S\n]+by)(?!\p{L})[^\n\d]{0,40}$/iu.test(text.slice(Math.max(0, text.lastIndexOf('\n', start - 1)), start))) direction = 'down';
        if (upperNum !== undefined) upper = differenceQuantity(upperNum, suffix.form.unit);
      } else if (
        kind === 'duration' &&
        suffix.form.unit === 's' &&
        (ISP_BEFORE_RE.test(text.slice(Math.max(floor, start - BEFORE_WINDOW - 90), start)) ||
          ((ISP_AFTER_RE.lastIndex = end), ISP_AFTER_RE.test(text)) ||
          // "an ion engine at 3,000 s", "a hydrazine thruster of 220 s": seconds said of an engine.
          ENGINE_SECONDS_RE.test(text.slice(Math.max(floor, start - 40), start)))
      ) {
        kind = 'specific-impulse';
      } else if (kind === 'duration' && /(?:(?<!\p{L})at|@)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 4), start))) {
        // "at 10 h": a time of day.
        continue;
      } else if (kind === 'temperature' && suffix.form.unit === 'K' && /^\d+K$/u.test(text.slice(start, end)) && !TEMPERATURE_WORDS_RE.test(sentenceAround(text, start, end))) {
        // "rated for 4K", "a 4K display": a glued K with no word of temperature in its sentence is a
        // thousand or a name, not a kelvin temperature.
        continue;
      } else if (suffix.form.refrigeration) {
        // "a 3-ton heat pump", "Chiller 2 carrying about 3 tons": a ton of refrigeration where the text names
        // a cooling machine or a heat pump, and the ton is no weight ("the unit weighs 2 tons").
        // (Nor a ton of something, "2 tons of CO2 a year", "3 tons of pellets": a mass, whatever machine burns or saves it.)
        if (/^[^\S\n]*(?:of[^\S\n]+(?!refrigeration|cooling)\S|(?:a|per)[^\S\n]+(?:year|month|day|week|annum)|annually|yearly|less|fewer|saved|of[^\S\n]*$)/iu.test(text.slice(end, end + 20)) || /(?<!\p{L})(?:sav\w*|cuts?|avoid\w*|emi\w*|reduc\w*|offset\w*)[^.;!?\n]{0,20}$/iu.test(text.slice(Math.max(0, start - 30), start))) continue;
        if (!REFRIGERATION_TEXT_RE.test(text) || /(?<!\p{L})(?:weigh\w*|mass|heavy|load(?:ed)?|payload|lift\w*|haul\w*|trucks?|lorr(?:y|ies)|cranes?|trailers?|ships?|carr(?:y|ies|ied)[^\S\n]+(?:a|the)[^\S\n]+load|of[^\S\n]+(?:steel|concrete|coal|ice|water|cargo|freight))(?!\p{L})/iu.test(text.slice(Math.max(0, start - 30), end + 25))) continue;
        // ("nominally a 3-ton unit, so 36,000 BTU/h": the same capacity said twice is read once, in BTU/h.)
        const btu = Number(t.num) * 12000;
        if ([...text.matchAll(/(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?)[^\S\n]*(?:BTU|Btu)[^\S\n]*(?:\/[^\S\n]*hr?|h|per[^\S\n]+hour)/gu)].some((x) => Math.abs(Number(x[1].replace(/,/gu, '')) - btu) <= 0.01 * btu)) continue;
        assumption = 'A "ton" of a cooling machine read as a ton of refrigeration, 12 000 BTU/h (3.517 kW).';
      } else if (kind === 'temperature' && suffix.form.ambiguous) {
        assumption = fahrenheitDegrees
          ? '"Degrees" read as degrees Fahrenheit, the scale of the text\'s other temperatures.'
          : suffix.form === GLUED_CELSIUS ? '"C" read as degrees Celsius.' : suffix.form === GLUED_FAHRENHEIT ? '"F" read as degrees Fahrenheit.' : '"Degrees" read as degrees Celsius.';
      }
    } else if (suffix?.type === 'percent') {
      const reading = readPercent(text, start, end, sheetRowFloor(text, start, floor, true), t.num) ?? comparedPercent(text, start, end, drafts) ?? erratumPercent(text, start, drafts) ?? listedPercent(text, start, drafts);
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
      // (Not a term of the writer's working: the "400" of "400/(400 + 4.8) ≈ 98.8 %".)
      const term = /^[^\S\n]*[/÷×*][^\S\n]*\(/u.test(text.slice(t.numEnd, t.numEnd + 6)) || /[(+−–*×÷/][^\S\n]*$/u.test(text.slice(Math.max(0, start - 3), start)) && /^[^\S\n]*[)+−–*×÷/]/u.test(text.slice(t.numEnd, t.numEnd + 4));
      const bare = term ? null : bareKind(text, start, t.numEnd, sheetRowFloor(text, start, floor, true)) ?? bareFromUpper ?? erratumBare(text, start, drafts);
      if (bare) {
        kind = bare.kind;
        role = bare.role;
        derived = bare.derived;
        quantity = scaled(t.num, bare.factor);
        if (upperNum !== undefined) upper = scaled(upperNum, bare.factor);
        // ("ΔT = 0": no difference, said without a unit.)
        if (kind === 'temperature-difference') quantity = `${quantity} K`;
        // "three times as much heat as the electricity it uses", for a heat pump: a heating COP.
        const asCop = kind === 'efficiency' && derived ? gainAsCop(text, start, end) : null;
        if (asCop) {
          kind = 'cop';
          role = asCop.role;
          derived = undefined;
          assumption = asCop.assumption;
        }
      }
    }
    if (kind === null && bound) {
      kind = bound.kind;
      role = 'aside';
      const factor = suffix ? 0.01 : 1;
      quantity = scaled(t.num, factor);
      if (upperNum !== undefined) upper = scaled(upperNum, factor);
    }
    if (kind === null) {
      if (suffix?.type === 'percent') unreadPercents.push({ start, end, num: t.num, upperNum });
      continue;
    }
    // "logged every 10 s for 9 days": an interval between readings, no run.
    if (kind === 'duration' && /(?<!\p{L})(?:logged|sampled|recorded|read|polled|measured|saved|written|averaged)[^\S\n]+(?:once[^\S\n]+)?every[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 30), start))) role = 'aside';
    // "Revenue ×3 year on year": a growth factor over a year, no length of time.
    if (kind === 'duration' && /^[^\S\n]*(?:-|[^\S\n]+)?on[- ]year(?!\p{L})/iu.test(text.slice(end, end + 12))) continue;
    // "makes 45 horse" is horsepower as people say it; "a two-horse carriage", "a 2 horse trailer" count animals.
    if (kind === 'power' && /horse$/iu.test(text.slice(t.numEnd, end)) && (/^[^\S\n]*-/u.test(text.slice(t.numEnd, end)) || /^[^\S\n]+(?:trailers?|box(?:es)?|carriages?|carts?|wagons?|towns?|races?|drawn|teams?|floats?|riders?|shows?|farms?|stables?|ploughs?|plows?|buggy|buggies|sleighs?)(?!\p{L})/iu.test(text.slice(end, end + 20)))) continue;
    if ((kind === 'power' || kind === 'energy') && suffix?.type === 'unit' && !suffix.per) {
      GAIN_PER_UNIT_RE.lastIndex = end;
      const g = GAIN_PER_UNIT_RE.exec(text);
      const one = g ? PER_UNIT_QUANTITY[g[1].toLowerCase()] : undefined;
      if (g && one && one.kind === kind) {
        // "1.4 kWh back for every kWh it is fed", "920 W for every kilowatt it takes": the output, and one
        // of that unit as the input.
        role = 'out';
        const unitAt = g.index + g[0].length - g[1].length - (/s$/i.test(g[0]) && !/s$/i.test(g[1]) ? 1 : 0);
        perUnitInput = { start: unitAt, end: g.index + g[0].length, kind, quantity: one.quantity, role: 'in', derived: `one ${g[1]} in, from "for every ${g[1]}"` };
      } else if (g && !one) {
        kind = 'efficiency';
        quantity = t.num;
        upper = upperNum;
        derived = 'units out for each unit in';
      } else if (!g) {
        // "for every watt going in, 1.25 watts would come out": the unit in said first, then what comes out of it.
        const per = PER_UNIT_BEFORE_RE.exec(text.slice(windowStart(text, start, floor, 120), start));
        const first = per ? PER_UNIT_QUANTITY[per[1].toLowerCase()] : undefined;
        // ("Every watt you pay for turns into nearly two watts of warmth": what each unit in becomes.)
        const becomes = /(?<!\p{L})(?:(?:turns?|turned|converts?|converted)[^\S\n]+into|becomes?|became|gives?|yields?|returns?|produces?|puts?|delivers?|adds?|added|supplies|supplied|provides?|provided|pumps?|pumped|moves?|moved)[^\S\n]+(?:(?:back|nearly|about|roughly|almost|some|over|more than|up to)[^\S\n]+)*$/iu.test(text.slice(Math.max(0, start - 40), start));
        if (per && (!first || first.kind === kind) && (COMES_OUT_AFTER_RE.test(text.slice(end, end + 40)) || becomes)) {
          kind = 'efficiency';
          quantity = t.num;
          upper = upperNum;
          derived = 'units out for each unit in';
          // ("for every kilowatt it takes, the dryer puts 1.6 kW of extra heat into the drum": 1.6 beyond the
          // one unit in, 2.6 in all.)
          if (/^[^\S\n]*of[^\S\n]+(?:extra|additional|surplus)(?!\p{L})/iu.test(text.slice(end, end + 20))) {
            quantity = String(Number((1 + Number(t.num)).toPrecision(15)));
            upper = upperNum !== undefined ? String(Number((1 + Number(upperNum)).toPrecision(15))) : undefined;
            derived = 'units out for each unit in (the one unit in and the extra said)';
          }
          const asCop = gainAsCop(text, start, end);
          if (asCop) {
            kind = 'cop';
            role = asCop.role;
            derived = undefined;
            assumption = asCop.assumption;
          }
        }
      }
    }
    // "12 kW (16 hp)": a restatement in other units, not a second figure.
    const prev = drafts[drafts.length - 1];
    // (A temperature and a difference are one kind here: "4 °C (39 °F)", "a 20 °C (36 °F) lift".)
    const temperatures = suffix?.type === 'unit' && suffix.form.kind === 'temperature' && prev && (prev.kind === 'temperature' || prev.kind === 'temperature-difference');
    // (Or after a comma and "or": "980 W, or 1,33 PS, of useful work".)
    if (prev && (prev.kind === kind || temperatures) && /^[^\S\n]*(?:[([][^\S\n]*(?:about|approx\.?|~|≈|or)?|,[^\S\n]*or(?:[^\S\n]+(?:about|roughly|some|nearly))?)[^\S\n]*$/.test(text.slice(prev.end, start))) {
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
    if (role === undefined) {
      // A sheet's row ("Cooling capacity at +5 °C coolant ........ 1,200 W"): its whole label is the
      // figure's words, whatever figure of a test condition the label holds.
      const rowFloor = sheetRowFloor(text, start, floor, false);
      role = roleFor(text, kind, roleContextStart(text, start, rowFloor), end, rowFloor);
    }
    // A list of runs after a figure with its side ("The dynamometer absorbed 102 W at 540 rpm (Run A), 99 W at
    // 610 rpm (Run B) and 95 W at 480 rpm (Run C)", "daily means of 117 W, 121 W and 122 W"): the same side.
    if (role === null && (kind === 'power' || kind === 'energy')) {
      const prev = drafts[drafts.length - 1];
      if (prev && prev.kind === kind && !prev.derived && (prev.role === 'in' || prev.role === 'out') && LISTED_AFTER_RE.test(text.slice(prev.end, start)) && LIST_GOES_ON_RE.test(text.slice(end, end + 60))) role = prev.role;
    }
    // "10 kWe", "3 MWe": electrical output; "1.1 kWp", "400 watts-peak": a solar array's rated (peak) output.
    if (role === null && kind === 'power' && suffix?.type === 'unit' && /(?:[kMG]?W[ep]|watts?[- ]peak)$/i.test(text.slice(t.numEnd, end).trim())) role = 'out';
    if (role === null && kind === 'power' && suffix?.type === 'unit' && !suffix.per) role = ratingRole(text, start, end);
    // "thermochemical kilocalories of 4,184 joules", "the horse-power of 746 watts": a unit's size, no flow.
    if ((kind === 'energy' || kind === 'power') && UNIT_SIZE_BEFORE_RE.test(text.slice(Math.max(0, start - 40), start))) role = 'aside';
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
    const draft: Draft = { start, end, kind, quantity, upper, role, hedge, derived, assumption, direction, ofInput };
    drafts.push(draft);
    if (bound && (kind === 'efficiency' || kind === 'cop')) bounds.add(draft);
    if (perUnitInput) drafts.push(perUnitInput);
    floor = Math.max(end, lastRoleWords.end);
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
    const times = MULTIPLE_VALUE[m[1].toLowerCase().replace('-', '')];
    if (!times) continue;
    // "half as much again as the input": the input and half of it again (1.5), not half of it.
    const value = /^[^\S\n]+as[^\S\n]+(?:much|many)(?:[^\S\n]+[\p{L}-]+)?[^\S\n]+again(?!\p{L})/iu.test(after) ? 1 + times : times;
    const asCop = gainAsCop(text, m.index, at);
    const d: Draft = asCop
      ? { start: m.index, end: at, kind: 'cop', quantity: String(value), role: asCop.role, assumption: asCop.assumption }
        : { start: m.index, end: at, kind: 'efficiency', quantity: String(value), role: null, derived: 'output as a multiple of the input' };
    const pos = drafts.findIndex((x) => x.start > m!.index);
    if (pos < 0) drafts.push(d);
    else drafts.splice(pos, 0, d);
  }

  workedLines(text, drafts);
  multipliedOut(text, drafts);
  rolesFromLineLabels(text, drafts);
  meterReadings(text, drafts);
  asidePerDistance(text, drafts);
  asideChanges(text, drafts);
  asideEmbodied(text, drafts);
  storeChargeSpans(text, drafts);
  refills(text, drafts);
  relate(text, drafts);
  multiplesOfABase(text, drafts);
  rolesFromWordLabels(text, drafts);
  restatedEnergies(text, drafts);
  statedError(text, drafts);
  asideSlips(text, drafts);
  asideOtherTopics(text, drafts);
  asideWorkedBounds(text, drafts);
  asideStatedBounds(bounds);
  asideIdealDeltaV(text, drafts);
  asideApparentSpeeds(text, drafts);
  asideSignals(text, drafts);
  asideThresholds(drafts);
  weightHeldUp(text, drafts);
  thrustFromRatio(text, drafts);
  heatPumpPercents(text, drafts, unreadPercents);
  asideOtherPercents(text, drafts, unreadPercents);
  asideLoneAmbient(text, drafts);

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

/** A cooling machine or a heat pump named, or the trade's figures of one: where a bare "ton" is a ton of refrigeration. */
const REFRIGERATION_TEXT_RE = /(?<!\p{L})(?:chillers?|air[- ]?condition\w*|AC|A\/C|heat[- ]pumps?|refrigerat\w*|cooling[^\S\n]+(?:capacity|load|tower|plant)|kW\/ton|BTU|Btu|SEER|EER|tonnage|condens\w*|evaporat\w*|compressors?|mini-?splits?|split[^\S\n]+(?:units?|systems?))(?!\p{L})/u;

interface UnreadPercent {
  start: number;
  end: number;
  num: string;
  upperNum?: string;
}

/** Before a percentage: words of another machine it is set against, or of what that machine managed. */
const OTHER_MACHINE_BEFORE_RE =
  /(?<!\p{L})(?:rivals?|competitors?|competing|neighbou?r(?:'s|’s|s)?|older|old|previous|predecessors?|earlier|former|prior|first[^\S\n]+(?:prototype|version|model)|conventional|typical(?:ly)?|commercial|existing|current|replaced|(?:other|another)[^\S\n]+(?:forum|maker|group|firm|company|team|lab|design|unit|engine|cell|panel|model)|fielded|best|record|up[^\S\n]+from|down[^\S\n]+from|compared|comparison|versus|vs\.?|against|(?:1[89]|20)\d0s|reference[^\S\n]*\[|\[\d+\]|ref\.)(?!\p{L})/iu;
/** Before a percentage: what a machine did or is rated at ("managed 32 %", "was rated at 88 %", "claims 52 %"). */
const MANAGED_BEFORE_RE =
  /(?<!\p{L})(?:managed?|manages|reach(?:ed|es)?|achiev(?:ed|es?)|rated(?:[^\S\n]+at)?|quoted(?:[^\S\n]+at)?|claim(?:s|ed)?|gets|got|scored|hit|did|does|at|of)[^\S\n]+(?:(?:about|around|roughly|some|only|just|nearly|almost|perhaps|maybe|over|under|up[^\S\n]+to|~|≈)[^\S\n]+)?$/iu;
/** After a percentage: what makes it no efficiency ("% of the time", "% load", "% cheaper", "% more"). */
const NOT_AN_EFFICIENCY_AFTER_RE =
  /^[^\S\n]*(?:%|per[^\S\n]*cent|percent)?[^\S\n]*(?:of(?![^\S\n]+(?:the[^\S\n]+)?(?:heat|fuel|energy|input|sunlight|light)(?!\p{L}))|load|humidity|RH|discount|off|share|cheaper|dearer|more|less|lower|higher|fewer|savings?|saved|growth|interest|VAT|tax|margin|chance|probability|confidence|duty|throttle|capacity|availability|uptime|charge|charged|full|rebate|deposit|increase|decrease|drop|rise|improvement|better|worse|smaller|larger|bigger|faster|slower|per[^\S\n]+(?:year|annum|month)|a[^\S\n]+year|year[- ]on[- ]year|annually|of[^\S\n]+(?:the[^\S\n]+)?(?:time|rated|nominal|maximum|max|full|market|price|cost))(?!\p{L})/iu;

/**
 * "A rival claims 52 % for a ship engine ten times the size", "Our old oil boiler was rated at 88 %",
 * "a 1960s plant of the same size managed 32 %": in a text that gives the device's own efficiency or COP,
 * a bare percentage said of another machine it is set against is that machine's figure — kept, set aside,
 * so the reader sees it was read and that no check uses it. (A boiler's is an efficiency; beside a COP, one
 * above 100 % is another heat pump's COP.)
 */
/** Before a percentage: a reading taken or a result given ("returned 380 %", "the report shows 450 %"). */
const READING_BEFORE_RE =
  /(?<!\p{L})(?:returned|returns|achieved|achieves|showed|shows|show|delivered|delivers|managed|manages|measured|reached|reaches|hit|hits|gave|gives|recorded|logged|scored|came[^\S\n]+in[^\S\n]+at|runs?[^\S\n]+at|ran[^\S\n]+at|works?[^\S\n]+at|worked[^\S\n]+at|rated[^\S\n]+at|quotes?|quoted|claims?|claimed)[^\S\n]+(?:(?:about|around|roughly|some|nearly|almost|over|just[^\S\n]+over|a[^\S\n]+steady|an?[^\S\n]+average[^\S\n]+of|~|≈)[^\S\n]+)?$/iu;

/**
 * A percentage over 100 said of a heat pump with no word of what it is ("the AW-9 returned 380 % on our
 * rig", "the commissioning report shows 450 % at 7 °C outside"): its heating COP written as a percentage,
 * the trade's loose "efficiency". Another machine's (a rival's, last year's) is set aside by the pass
 * after this one.
 */
function heatPumpPercents(text: string, drafts: Draft[], unread: UnreadPercent[]): void {
  if (!NAMED_HEAT_PUMP_RE.test(text)) return;
  for (let k = unread.length - 1; k >= 0; k--) {
    const u = unread[k];
    const value = Number(u.num);
    const top = u.upperNum !== undefined ? Number(u.upperNum) : value;
    if (!(value >= 100) || !(top <= 1500)) continue;
    if (NOT_AN_EFFICIENCY_AFTER_RE.test(text.slice(u.end, u.end + 30).replace(/^[^\S\n]*%/u, ''))) continue;
    if (!READING_BEFORE_RE.test(text.slice(Math.max(0, u.start - 40), u.start)) || BURNER_RE.test(sentenceAround(text, u.start, u.end))) continue;
    if (OTHER_MACHINE_BEFORE_RE.test(text.slice(windowStart(text, u.start, 0, 60), u.start))) continue;
    const d: Draft = { start: u.start, end: u.end, kind: 'cop', quantity: String(Number((value / 100).toPrecision(12))), role: 'heating', assumption: 'a percentage over 100 said of a heat pump, read as its heating COP' };
    if (u.upperNum !== undefined) d.upper = String(Number((top / 100).toPrecision(12)));
    const pos = drafts.findIndex((x) => x.start > u.start);
    if (pos < 0) drafts.push(d);
    else drafts.splice(pos, 0, d);
    unread.splice(k, 1);
  }
}

function asideOtherPercents(text: string, drafts: Draft[], unread: UnreadPercent[]): void {
  const own = drafts.filter((d) => (d.kind === 'efficiency' || d.kind === 'cop') && d.role !== 'aside' && !d.derived);
  if (own.length === 0) return;
  const ownCop = own.some((d) => d.kind === 'cop');
  for (const u of unread) {
    const value = Number(u.num);
    const top = u.upperNum !== undefined ? Number(u.upperNum) : value;
    if (!(value > 0) || !Number.isFinite(top)) continue;
    if (NOT_AN_EFFICIENCY_AFTER_RE.test(text.slice(u.end, u.end + 30).replace(/^[^\S\n]*%/u, ''))) continue;
    const sentence = sentenceAround(text, u.start, u.end);
    const sentenceBefore = text.slice(windowStart(text, u.start, 0, 200), u.start);
    if (!OTHER_MACHINE_BEFORE_RE.test(sentenceBefore) || !MANAGED_BEFORE_RE.test(text.slice(Math.max(0, u.start - 40), u.start))) continue;
    const burner = BURNER_RE.test(sentence);
    const kind: FigureKind = !burner && ownCop && top > 100 ? 'cop' : 'efficiency';
    if (kind === 'efficiency' && top > 100) continue;
    const d: Draft = { start: u.start, end: u.end, kind, quantity: String(Number((value / 100).toPrecision(12))), role: 'aside' };
    if (u.upperNum !== undefined) d.upper = String(Number((top / 100).toPrecision(12)));
    const pos = drafts.findIndex((x) => x.start > u.start);
    if (pos < 0) drafts.push(d);
    else drafts.splice(pos, 0, d);
  }
}

/** A machine that works on heat: one whose cold side a room or the outdoor air may be. */
const THERMAL_MACHINE_RE =
  /(?<!\p{L})(?:engines?|turbines?|Stirling|thermoelectric\w*|TEGs?|Peltier|Seebeck|thermocouples?|thermophotovoltaic\w*|TPV|Carnot|Rankine|ORC|steam|heat[- ]?(?:engines?|pumps?|exchangers?)|harvest\w*|thermal[- ]to[- ]electric)(?!\p{L})/iu;
/** Just before a temperature: the room, the weather, the test cell it was taken in. */
const AMBIENT_LEAD_RE =
  /(?<!\p{L})(?:room|ambient|outside|outdoors?|outdoor[^\S\n]+(?:air|temperature)|indoors?|lab(?:oratory)?|test[^\S\n]+cell|weather|air[^\S\n]+temperature|overnight|it[^\S\n]+was|gallery|tent|garage|workshop|shed)(?!\p{L})[^.;!?\n\d]{0,30}$/iu;

/**
 * "Run B … Room at 24 °C", "Ambient 11 °C, rain", "outside it was 28 °C": in a text with no machine that
 * works on heat and no efficiency, COP or hot side of its own, the room's or the weather's temperature is
 * a condition of the test, no cold side of anything — set aside.
 */
function asideLoneAmbient(text: string, drafts: Draft[]): void {
  if (THERMAL_MACHINE_RE.test(text) || HEAT_PUMP_RE.test(text) || COOLING_MACHINE_RE.test(text)) return;
  if (drafts.some((d) => d.role !== 'aside' && (d.kind === 'efficiency' || d.kind === 'cop' || d.kind === 'temperature-difference' || (d.kind === 'temperature' && d.role === 'hot')))) return;
  for (const d of drafts) {
    if (d.kind === 'temperature' && d.role === 'cold' && !d.derived && AMBIENT_LEAD_RE.test(text.slice(Math.max(0, d.start - 50), d.start))) d.role = 'aside';
  }
}

/** Said of a body held up with nothing under it: "The 12-gram disc floats 3 cm above any desk", "cancels its own weight", "lifts about 2 grams". */
const HOVERS_RE =
  /(?<!\p{L})(?:floats?|floating|hovers?|hovering|levitat(?:es?|ing|ed)|cancels?[^\S\n]+(?:(?:the|its)[^\S\n]+)?(?:[\p{L}'’-]+[^\S\n]+)?(?:own[^\S\n]+)?weight|holds?[^\S\n]+(?:itself|it)[^\S\n]+(?:up|aloft)|lifts?[^\S\n]+(?:itself|its[^\S\n]+own[^\S\n]+weight)|(?:lifts?|lifting|lifted|hold(?:s|ing)?[^\S\n]+up|held[^\S\n]+up)(?=[^\S\n]+(?:(?:about|around|roughly|some|nearly|exactly|the[^\S\n]+same|a|an)[^\S\n]+)*(?:(?:weight|load|mass|payload)[^\S\n]+of[^\S\n]+(?:(?:about|around|roughly|some|nearly|exactly)[^\S\n]+)?)?[\d.,]+[^\S\n]*(?:g|grams?|kg|kilograms?|mg|milligrams?)(?!\p{L})))(?!\p{L})/iu;
/** Words that deny anything the body could push on or hang from ("no base, no strings", "nothing is blown downwards", "in a vacuum chamber", "no air to push on"). */
const NO_SUPPORT_RE =
  /(?<!\p{L})(?:no[^\S\n]+(?:base|stand|strings?|wires?|threads?|magnets?|support|air[- ]?flow|fans?|propellers?|downwash)|nothing[^\S\n]+(?:pushes|presses|rests|is[^\S\n]+blown|blows)|without[^\S\n]+(?:any[^\S\n]+)?(?:support|magnets|strings|wires)|anti-?gravity|gravity[- ](?:field|shield|cancell?(?:er|ing|ation))|weightless|no[^\S\n]+air[^\S\n]+to[^\S\n]+push(?:[^\S\n]+(?:on|against))?|(?:in|inside|under)[^\S\n]+(?:a|the)[^\S\n]+(?:vacuum(?:[^\S\n]+(?:chamber|tank|jar))?|bell[^\S\n]+jar))(?!\p{L})/iu;
/** A lawful way of holding a body up: a magnet (not denied), a jet of air, sound, a balloon. */
const LAWFUL_HOLD_RE =
  /(?<!\p{L})(?<!no[^\S\n]+)(?:magnets?|magnetic(?:ally)?|electromagnets?|superconduct\w*|maglev|diamagnetic|air[- ]?(?:jets?|cushion|bearing)|acoustic|ultrasonic|balloons?|helium|buoyan\w*)(?!\p{L})/iu;

/**
 * "The 12-gram disc floats 3 cm above any desk. Its 9 W board cancels the disc's own weight … nothing
 * pushes on the desk": a body said to hover with nothing to push on is held up by a force equal to its
 * weight, m·g0 — the thrust the claim rests on, where the text gives no other.
 */
function weightHeldUp(text: string, drafts: Draft[]): void {
  if (drafts.some((d) => d.kind === 'thrust' && d.role !== 'aside') || !NO_SUPPORT_RE.test(text) || LAWFUL_HOLD_RE.test(text)) return;
  const held = drafts.filter((d) => d.kind === 'mass' && !d.derived && d.role !== 'propellant' && HOVERS_RE.test(sentenceAround(text, d.start, d.end)));
  // (The same mass said again — "lifts about 2 grams … would lift exactly the same 2 grams in a vacuum" — is one body.)
  if (held.length === 0 || held.some((d) => siOf(d) !== siOf(held[0]))) return;
  const m = siOf(held[0]);
  if (m === null || !(m > 0)) return;
  insertAfter(drafts, held[0], {
    start: held[0].start,
    end: held[0].end,
    kind: 'thrust',
    quantity: typedSi(m * G0, 'N'),
    role: null,
    derived: `thrust = the weight held up (${formatQuantity(m, 'kg')} × g0)`,
  });
}
