/**
 * Temperatures (the claim reader, shared/claims/reader.ts): a temperature read as a difference ("a
 * 20 °C temperature difference", "ΔT of 20 K", "40 degrees above ambient") and which way it points;
 * then, among the figures read, the surroundings and rated ranges set aside, a heat pump's source
 * as its cold side, the other side from one temperature and a difference, hot and cold by order,
 * and a share of the Carnot efficiency between the two sides.
 */
import { DIFFERENCE_AFTER, DIFFERENCE_BEFORE, HEAT_ENGINE_WORDS } from '../figures-vocabulary';
import { formatQuantity } from '../../worksheet/quantity';
import { formatPrint } from '../print';
import { alt, COOLING_MACHINE_RE, HEAT_PUMP_RE, sentenceAround } from './context';
import { insertAfter, sentenceOf, siOf, typedSi, type Draft } from './draft';
import { CARNOT_SHARE } from './kinds';

// ("ΔT across the engine 170 °C", "ΔT between the plates of 40 K": what the difference is across, between.)
const DIFF_BEFORE_RE = new RegExp(
  `(?<![\\p{L}])(?:${alt(DIFFERENCE_BEFORE)})(?!\\p{L})(?:[^\\S\\n]+(?:across|between|over|on)[^\\S\\n]+(?:the[^\\S\\n]+|its[^\\S\\n]+)(?!(?:a|an)[^\\S\\n])[\\p{L}-]+(?:[^\\S\\n]+(?!(?:a|an)[^\\S\\n])[\\p{L}-]+)?|[^\\S\\n]+between[^\\S\\n]+(?:the[^\\S\\n]+|its[^\\S\\n]+)?[\\p{L}-]+(?:[^\\S\\n]+[\\p{L}-]+)?[^\\S\\n]+and[^\\S\\n]+(?:the[^\\S\\n]+|its[^\\S\\n]+)?[\\p{L}-]+(?:[^\\S\\n]+[\\p{L}-]+)?[”"’')]?[^\\S\\n]*[—–,]?)?(?:[^\\S\\n]*(?:[=:≈~]|~~|of|is|was|by|about|around|only|just|a|an|some|up to|nearly|roughly|approximately|just over|just under|over|under))*[^\\S\\n]*$`,
  'iu',
);
/** Just before a figure that corrects the one before it: "170 °C, corrected to", "~~170 °C~~ corrected to". */
const CORRECTED_FROM_RE = /(\d[\d.,]*)[^\S\n]*(?:°[^\S\n]*[CF]|K|degrees?(?:[^\S\n]+[CF])?)[^\S\n]*(?:~~)?[^\S\n]*,?[^\S\n]*(?:(?:was|were|since|later|then)[^\S\n]+)?(?:corrected|revised|amended|changed)(?:[^\S\n]+(?:down|up))?[^\S\n]+to[^\S\n]*$/iu;
const DIFF_AFTER_RE = new RegExp(`[^\\S\\n]*(?:\\)[^\\S\\n]*)?(?:(?:temperature|thermal|of|the)[^\\S\\n]+){0,2}(?:${alt(DIFFERENCE_AFTER)})(?!\\p{L})`, 'iuy');

/** A temperature read as a difference: "20 degC" of difference is "20 K"; "36 degF" is 20 K. */
export function differenceQuantity(num: string, unit: string): string {
  const n = Number(num);
  if (unit === 'degC' || unit === 'K') return `${num} K`;
  if (unit === 'mK') return `${num} mK`;
  if (unit === 'degF') return `${Number(((n * 5) / 9).toPrecision(15))} K`;
  return `${num} K`;
}

/** A difference's label at the head of a line or a list item, a few words, then ":" or "=". */
const DIFF_LABEL_RE = new RegExp(
  `(?:^|[\\n|•·;]|[-*][^\\S\\n])[^\\S\\n]*(?:ΔT|∆T|Δ T|delta[- ]?T|dT|temperature (?:difference|differential|lift|rise|drop|span|spread)|temp\\.? diff\\.?|lift|rise)(?![\\p{L}\\p{N}])[^\\n:=|•;]{0,30}[:=][^\\S\\n]*(?:(?:about|approx\\.?|ca\\.|~|≈|up to)[^\\S\\n]*)?$`,
  'iu',
);
/** Which way a difference points: "30 °C below …", "9 °F cooler" → down; "40 degrees above …" → up. */
export function differenceDirection(text: string, end: number): 'up' | 'down' | undefined {
  const after = text.slice(end, end + 30);
  if (/^[^\S\n]*(?:\p{L}+[^\S\n]+){0,2}?(?:below|under|cooler|colder|lower)(?!\p{L})/iu.test(after)) return 'down';
  if (/^[^\S\n]*(?:\p{L}+[^\S\n]+){0,2}?(?:above|over|warmer|hotter|higher)(?!\p{L})/iu.test(after)) return 'up';
  return undefined;
}

/** After "over": a stretch of time ("over the period", "over the winter", "over a week"). */
const OVER_A_TIME_RE = /^[^\S\n]*(?:the|a|an|its|this|that|each|every|one|two|three|several)[^\S\n]+(?:(?:whole|entire|full|test|trial|heating|cooling|first|last|same|following|next|past|reporting)[^\S\n]+)?(?:period|year|season|winter|summer|spring|autumn|day|night|week|fortnight|month|test|run|trial|campaign|hours?|days?|weeks?|months?|years?|decade|lifetime|duration|course|quarter)(?!\p{L})/iu;

/** Words of the very cold or of space, where a temperature of a few tens of kelvin is a temperature. */
const CRYOGENIC_RE = /(?<!\p{L})(?:cryo\w*|liquid (?:nitrogen|helium|hydrogen|oxygen|air)|LN2|superconduct\w*|millikelvin|mK|absolute zero|cosmic|interstellar|deep space|outer space|in space|orbit\w*|planet\w*|moons?|Mars|Pluto|comets?|dilution|cold head|Joule-Thomson)(?!\p{L})/iu;
/** A temperature in degrees Celsius or Fahrenheit. */
const DEGREES_RE = /\d[^\S\n]*(?:°[^\S\n]*[CF]|deg(?:rees)?\.?[^\S\n]*(?:C|F|Celsius|Fahrenheit)(?!\p{L}))/iu;

/**
 * "Temperature lift (sink outlet minus source inlet): 40 K", "lifting it by 45 K", beside a source "at
 * 10 °C": engineering practice (and EN standards) write temperatures in °C and their differences in
 * kelvin, so a figure of a few tens of kelvin in a text whose temperatures are in degrees is a
 * difference, not a side colder than liquid nitrogen — unless the text speaks of the very cold.
 */
function kelvinBesideCelsius(text: string, start: number, end: number): boolean {
  const m = /^([\d.,]+)[^\S\n]*(?:K|kelvins?)$/u.exec(text.slice(start, end).trim());
  // (Not "1.800 K" in a text of decimal commas: a thousand and eight hundred.)
  if (!m || /^\d{1,3}(?:[.,]\d{3})+$/u.test(m[1])) return false;
  const value = Number(m[1].replace(/,/g, ''));
  return value > 0 && value < 200 && DEGREES_RE.test(text) && !CRYOGENIC_RE.test(text);
}

export function isDifference(text: string, start: number, end: number, floor: number): boolean {
  // (A sheet's leader dots are no words: "Working temperature difference .. 5 °C".)
  const before = text.slice(Math.max(floor, start - 90), start).replace(/\.{2,}|…+/gu, ' ');
  // A label of a sheet or a list: "ΔT source to flow: 40 K", "• Temperature lift (W35): 30 K".
  if (DIFF_LABEL_RE.test(before)) return true;
  // A table's row label with no colon: "Temperature drop, head to cooler580K", "ΔT hot to cold 40 K".
  // (Or a cell's label after a wide gap, in a row collapsed onto one line.)
  if (/(?:[^\S\n]{3,}|\t)(?:ΔT|∆T|[Tt]emperature[^\S\n]+(?:difference|differential|lift|rise|drop|span|spread))(?![\p{L}\p{N}])[^\n:=|•;,\d]{0,40}$/u.test(text.slice(Math.max(0, text.lastIndexOf('\n', start - 1)), start))) return true;
  if (/(?:^|\n)[^\S\n]*(?:ΔT|∆T|temperature[^\S\n]+(?:difference|differential|lift|rise|drop|span|spread))(?![\p{L}\p{N}])[^\n:=|•;\d]{0,40}$/iu.test(text.slice(Math.max(0, text.lastIndexOf('\n', start - 1)), start))) return true;
  // A figure that corrects a difference just before it is a difference.
  // (Looked for behind the floor: the corrected figure is the one read just before.)
  const corrected = CORRECTED_FROM_RE.exec(text.slice(Math.max(0, start - 60), start));
  if (corrected) {
    const prevStart = Math.max(0, start - 60) + corrected.index;
    if (isDifference(text, prevStart, prevStart + corrected[0].length, 0)) return true;
  }
  // ("holds −18 °C through a 32 °C day": the weather's temperature, not a lift.)
  const ofWeather = /^[^\S\n]+(?:days?|nights?|afternoons?|mornings?|evenings?|summers?|winters?|heat[- ]?waves?|spells?|weeks?|weather)(?!\p{L})/iu.test(text.slice(end, end + 16));
  if (DIFF_BEFORE_RE.test(before) && !ofWeather) {
    // "only 20 °C" / "just 20 °C" alone are not differences: the clause must speak of one.
    const m = DIFF_BEFORE_RE.exec(before)!;
    // ("with the hot face at just 60 °C and a 30 K difference": a side named just before it is that side's.)
    const sideNamed = /(?<!\p{L})(?:sides?|faces?|plates?|ends?|junctions?|sinks?|sources?|reservoirs?|inlets?|outlets?|heads?|water|air)[^\S\n]+(?:(?:is|was|sits|runs|stays|kept|held|at)[^\S\n]+){0,2}(?:only|just|a[^\S\n]+mere)[^\S\n]*$/iu.test(before);
    if (!sideNamed && (!/^(?:only|a mere|just)/i.test(m[0].trim()) || /differen|gradient|ΔT|delta|lift|rise/i.test(sentenceAround(text, start, end)))) return true;
  }
  if (kelvinBesideCelsius(text, start, end)) return true;
  // (Words past a table's column gap are the next cell's: "… temperature   720 °C     Temperature difference to cooler   680 K".)
  if (/^(?:[^\S\n]{3,}|\t)[^\S\n]*\p{Lu}/u.test(text.slice(end, end + 40))) return false;
  DIFF_AFTER_RE.lastIndex = end;
  const a = DIFF_AFTER_RE.exec(text);
  if (!a) return false;
  const word = a[0].trim().toLowerCase();
  // "20 °C above ambient", "heated 40 K over room temperature"; "between" only as "20 K between the plates".
  if (/^(?:warmer|hotter|cooler|colder|higher|lower|above|below|over|under)/.test(word)) {
    const rest = text.slice(end + a[0].length, end + a[0].length + 40);
    // "at an average of 15 °C over the period": a time, not a reference temperature.
    if (/^(?:over|under)$/.test(word) && OVER_A_TIME_RE.test(rest)) return false;
    // "between 650 °C heater head and 50 °C cooler": the second of two sides named in parallel, "cooler" the
    // part (a noun), not a comparison; without "than" a comparative there names no difference.
    // (Or just after another side's temperature and its name: "65O °C hot head / 45 °C cooler water".)
    const pairedSide =
      /between[^\S\n]+[^,;.\n]{0,40}?\p{N}[^,;.\n]{0,40}?[^\S\n]and[^\S\n]+(?:(?:the|a|an|its)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, start - 90), start)) ||
      /\d[^\S\n]*(?:°[^\S\n]*[CF]|K)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){1,3}?(?:\/|&)[^\S\n]*$/u.test(text.slice(Math.max(0, start - 60), start));
    if (pairedSide && !/^\s*than/.test(rest)) return false;
    if (/^(?:warmer|hotter|cooler|colder|lower|higher)/.test(word) && /^[^\S\n]*(?:[,.;:)!?—–]|(?:and|with|at|in|for|while|but|so|when|or|can|could|would|will|may|might|must|should|is|are|was|were|has|have|had|does|do|did|near|nearer|by|on|down|up|deeper|further|underneath|beneath|inside|there|here)\b|$)/.test(rest)) return true;
    // "a cold side 3 K below, the most …": the side it is measured from left unsaid, as just named.
    if (/^(?:above|below)$/.test(word) && /^[^\S\n]*(?:[,.;:)!?—–]|(?:and|while|but)\b|$)/.test(rest)) return true;
    // "5 °C below zero", "above freezing": a temperature, not a difference.
    if (/^[^\S\n]*(?:zero|freezing|nought|the freezing point)(?!\p{L})/iu.test(rest)) return false;
    // "21 °C below the kitchen", "38 K above it": measured from something named.
    if (/^[^\S\n]*(?:than[^\S\n]+)?(?:the|a|an|its|their|our|his|her|this|that|it|them)(?!\p{L})/iu.test(rest)) return true;
    return /^[^\S\n]*(?:than[^\S\n]+)?(?:(?:the|a|an|its|their)[^\S\n]+)?(?:(?:mean|average|outside|outdoor|surrounding|local|daytime|night-?time|cooling|inlet|room|deep|surface)[^\S\n]+){0,2}(?:ambient|room|outside|outdoor|surrounding|environment|air|water|inlet|sink|source|cold|hot|other|freezing|surface|\p{N}|[-−])/iu.test(rest) || /^\s*than/.test(rest) || /^[^\S\n]*(?:it|that|this|them)(?!\p{L})/iu.test(rest);
  }
  if (/^apart/.test(word)) return true;
  if (/^between|^across/.test(word)) return /^[^\S\n]*(?:the|its|it(?![a-z])|them|this|that|two|both|hot|cold|plates|sides|ends|junctions|reservoirs)/i.test(text.slice(end + a[0].length, end + a[0].length + 20));
  return true;
}

/** A machine that turns heat into work or electricity, named. */
const HEAT_ENGINE_TEXT_RE = /(?<!\p{L})(?:engines?|Stirling|thermoelectric|TEGs?|Seebeck|thermo-?generators?|harvest\w*|turbines?|ORC|Rankine|thermocouples?|(?:free|electric) power from (?:the )?heat)(?!\p{L})/iu;
/** Just before a temperature of the surroundings or a sink: the room, the air, the weather, cooling water. */
const SURROUNDINGS_BEFORE_RE = /(?<!\p{L})(?:room|ambient|air|outside|outdoors?|weather|sink|cooling water|cold(?:er)?|cool(?:er)?|surroundings|environment|fins?|radiator|river|sea|lake|ground|soil)(?!\p{L})[^.;!?\n\d]{0,25}$/iu;

/** Just after a temperature: what holds it there, cold water or air ("held at 15 °C by tap water"). */
const COOLED_BY_AFTER_RE = /^[^\S\n]*(?:by|with|from|in)[^\S\n]+(?:the[^\S\n]+|a[^\S\n]+)?(?:tap|cold|cooling|mains|running|river|sea|ground|well|chilled|ice)?[^\S\n]*(?:water|air|ice|snow|brine)(?!\p{L})/iu;

/** Between a temperature and a difference that describes it: "−18 °C, a full 50 K below …", "34 °C, 5 K warmer than …". */
const APPOSITION_RE = /^[\s,;(–—-]*(?:(?:a|an|some|about|roughly|nearly|just|only|full|fully|which is|that is|i\.e\.|or|thus|so|still|at least|at most|over|under)[\s,]+)*$/iu;

/** After a difference: the side it is measured from, named ("… over its source", "… below the kitchen"), not a pronoun. */
const NAMED_OTHER_SIDE_RE = /^[^\S\n]*(?:\p{L}+[^\S\n]+)?(?:above|over|below|under|(?:warmer|hotter|colder|cooler|higher|lower)[^\S\n]+than)[^\S\n]+(?:the|its|their|our|a|an)[^\S\n]+(?!\p{N})/iu;

/** Words before the temperatures a device is rated for. */
export const OPERATING_RANGE_RE =
  /(?<!\p{L})(?:(?:operating|operation|storage|ambient|rated|permitted|allowed|working) (?:temperature )?(?:range|temperatures?|limits?|conditions?)(?: (?:of|is|from|between))?(?:[^\S\n]*(?:[:=|]|\.{2,}|…|\t))*[^\S\n]*(?:from|between)?|derat(?:e|es|ed|ing)(?: (?:linearly|output|power|current))? (?:above|over|from)|(?:rated|designed|built|certified|specified|guaranteed|able)? ?(?:to )?(?:keep )?(?:work(?:s|ing)?|run(?:s|ning)?|operat(?:e|es|ing)|function(?:s|ing)?|start(?:s|ing)?) (?:(?:reliably|fine|normally|properly|well) )?(?:down|up) to|(?:rated|certified|specified|good) (?:down|up) to|(?:survives?|withstands?|tolerates?)(?: temperatures?)?(?: (?:down|up) to| of)?)[^\S\n]*$/iu;

/** Words of the place a test was run ("the room was held at 21 °C", "lab temperature 22 °C"). */
const SURROUNDINGS_RE = /(?<!\p{L})(?:room|lab|laboratory|test hall|hall|workshop|building|office|test cell|weather|day|night)(?!\p{L})/iu;
/** A sentence about the test itself ("The test lasted 45 minutes in a room held at 21 °C."). */
const TEST_SETTING_RE = /(?<!\p{L})(?:tests?|trials?|experiments?|measurements?|runs?|demonstrations?|lasted|shown|presented|held|kept|conditioned)(?!\p{L})/iu;
/** A side named just before its temperature: "hot side 300 °C", "cold junction at 90 °C", "T_h = 600 K". */
const NAMED_SIDE_BEFORE_RE = {
  hot: /(?<!\p{L})(?:(?:hot|warm|heated)[- ](?:side|end|junction|plate|face|reservoir)s?|T_?\{?h(?:ot)?\}?)[^\S\n]*(?:temperature[^\S\n]+)?(?:at|of|is|[:=≈~])?[^\S\n]*(?:about|around|roughly|some)?[^\S\n]*$/iu,
  cold: /(?<!\p{L})(?:(?:cold|cool|cooled)[- ](?:side|end|junction|plate|face|reservoir)s?|T_?\{?c(?:old)?\}?)[^\S\n]*(?:temperature[^\S\n]+)?(?:at|of|is|[:=≈~])?[^\S\n]*(?:about|around|roughly|some)?[^\S\n]*$/iu,
};
/** Said of the day or the surroundings: "on a 15 °C day", "a 30 °C afternoon", "(25 °C ambient)". */
const DAY_AFTER_RE = /^[^\S\n]*(?:days?|nights?|afternoons?|mornings?|evenings?|ambient|room temperature|outside)(?!\p{L})/iu;
const AMBIENT_BEFORE_RE = /(?<!\p{L})(?:ambient|room|lab|laboratory|surroundings?)[^\S\n]+(?:air[^\S\n]+)?(?:temperature[^\S\n]+)?(?:was[^\S\n]+|is[^\S\n]+)?(?:at|of|[:=≈~])?[^\S\n]*(?:about|around|roughly|some)?[^\S\n]*$/iu;
/** Words that make a lone temperature one of the machine's sides, not its surroundings. */
const MACHINE_SIDE_RE = /(?<!\p{L})(?:source|sink|sides?|hot|cold|warm|cool|reservoirs?|ends?|junctions?|plates?|faces?|inlet|outlet|flow|supply|delivery|evaporat\w*|condens\w*|cabinet|compartment|chamber|tank|boiler|emitter|heater|collector|brine|ground|outdoor|outside|exhaust|turbine|T_?[ch]|deep|surface)(?!\p{L})/iu;

/** Sides, surroundings and the other temperature, among the figures read (see the file's comment). */
/** Words of a machine or a bound that a single temperature can serve (its hot or cold side, kT ln 2). */
const LONE_TEMPERATURE_USED_RE = new RegExp(
  `(?<!\\p{L})(?:${alt([...HEAT_ENGINE_WORDS, 'hot (?:side|end|junction|reservoir|plate)', 'cold (?:side|end|junction|reservoir|plate)', 'heat sink', 'reservoirs?', 'bits?', 'eras(?:e|es|ed|ing|ure)', 'Landauer', 'logic', 'comput\\w*', 'information', 'memory', 'switch\\w*', 'gates?', 'transistors?', 'chips?', 'operations?', 'flips?', 'qubits?', 'cryogenic'])})(?!\\p{L})`,
  'iu',
);

/** Words of heat moved or delivered ("heat output", "source 5 °C, sink 35 °C", "a compressor"): a machine's sides may be meant. */
const HEAT_WORDS_RE = /(?<!\p{L})(?:heat\w*|warmth|compressors?|sources?|sinks?|supply (?:air|water)|flow temperature|BTU\w*|COP|furnaces?|boilers?|kilns?|ovens?)(?!\p{L})/iu;

/** Words of heat moved in a sentence: then its temperatures may be a machine's sides. */
const HEAT_FLOW_RE =
  /(?<!\p{L})(?:(?:draws?|drawing|drew|takes?|taking|took|extracts?|extracting|pulls?|pulling|absorbs?|collects?|harvests?|pumps?|moves?|rejects?|rejecting|dumps?|sheds?|gives? off|delivers?|supplies|releases?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:heat|warmth)|heat[^\S\n]+(?:(?:is|was|are|were|being)[^\S\n]+)?(?:(?:drawn|taken|extracted|pumped|moved|delivered|rejected|released|dumped|carried)[^\S\n]+)?(?:from|to|into|out of)|(?:hot|cold|warm|cool) (?:side|end|face|plate|junction|reservoir)|source|sink|evaporat\w*|condens\w*|Carnot)(?!\p{L})/iu;
/** Just before a temperature: the place or the test it was of. */
const PLACE_CONDITION_BEFORE_RE =
  /(?<!\p{L})(?:(?:room|hall|lab|laboratory|workshop|building|chamber|gallery|clubroom|classroom|kiosk|garage|shed|office|site|field|venue|warehouse|cellar|basement|studio|hangar|barn|attic|loft)(?:[^\S\n]+(?:temperature|air))?(?:[^\S\n]+(?:was|is|were|stays?|stayed|must stay|remained|felt))?(?:[^\S\n]+(?:kept|held|heated|cooled|maintained|conditioned|set|air-conditioned))?(?:[^\S\n]+(?:at|to|between|of|:))?|(?:in|inside)[^\S\n]+(?:a|an|the)[^\S\n]+(?:closed[^\S\n]+|cold[^\S\n]+|warm[^\S\n]+|heated[^\S\n]+)?(?:room|hall|lab|workshop|building|chamber|garage|shed)[^\S\n]+(?:at|of|kept at|held at)|thermostat(?:[^\S\n]+(?:says|read|reads|set to|showed|shows))?|thermometer(?:[^\S\n]+(?:said|read|reads|showed|shows))?|outside(?:,)?[^\S\n]+it[^\S\n]+was|(?:outdoor|outside|ambient)[^\S\n]+(?:air[^\S\n]+)?temperatures?[^\S\n]+(?:was|were|fell to|rose to|of|reached|(?:ranged|varied|lay|stayed)[^\S\n]+(?:from|between))|(?:air[- ]conditioning|heating)[^\S\n]+(?:now[^\S\n]+)?holds|weather[^\S\n]+(?:was|of)|(?:at|on)[^\S\n]+(?:a|an)|in[^\S\n]+(?:a|an))[^\S\n]*(?:(?:about|around|roughly|some|nearly|only|just|a steady|a constant)[^\S\n]+)?$/iu;
/** An efficiency or a COP of the device (not one set aside: a part's, a writer's ceiling), which its sides serve. */
const ratioOfDevice = (d: Draft) => (d.kind === 'efficiency' || d.kind === 'cop') && d.role !== 'aside';

/** Right after a temperature: the place it was of ("a 31 °C workshop", "18 °C room temperature", "that evening"). */
const PLACE_AFTER_RE = /^[^\S\n]*(?:(?:room|hall|lab|laboratory|workshop|building|gallery|clubroom|classroom|garage|shed|office|studio|hangar)(?:[^\S\n]+temperature)?(?!\p{L})|(?:that|this|the)[^\S\n]+(?:evening|day|morning|night|afternoon)|overnight)/iu;

/** A unit that makes heat and power together. */
const CHP_NAMED_RE = /(?<!\p{L})(?:combined heat and power|CHP|cogeneration|co-generation|trigeneration|micro-?CHP)(?!\p{L})/iu;
/** Just before a temperature of the circuit such a unit heats: "heating water: return", "flow", "supply water at". */
const HEATING_CIRCUIT_BEFORE_RE =
  /(?<!\p{L})(?:heating[^\S\n]+(?:water|circuit|loop)|hot[^\S\n]+water|return|flow|supply[^\S\n]+water|district[^\S\n]+heating)(?!\p{L})[^\d\n]{0,25}$/iu;

export function relateTemperatures(text: string, drafts: Draft[]): void {
  // A temperature said again ("pipes at 120 °C … 'With 120 °C on the hot face …'", a critic quoting the
  // claim): the same side said twice, not the other side — set aside, the first one read.
  {
    const seen: Draft[] = [];
    for (const d of drafts) {
      if (d.kind !== 'temperature' || d.derived || d.upper !== undefined) continue;
      const v = siOf(d);
      // (Within half a kelvin: "230 °C … the hot side at 503 K" rounds the same side. And a side said
      // again under the other side's name is still the same side: one machine's two sides are not equal.)
      if (v !== null && seen.some((e) => Math.abs((siOf(e) ?? NaN) - v) <= 0.5)) d.role = 'aside';
      else seen.push(d);
    }
  }
  // A heat pump's condenser is its warm side and its evaporator its cold one ("water leaving the
  // condenser at 35 °C"); an engine's condenser is its cold side, as the role words read it.
  if ((HEAT_PUMP_RE.test(text) || drafts.some((d) => d.kind === 'cop' && d.role === 'heating')) && !/(?<!\p{L})(?:engines?|turbines?|generators?|Rankine|steam cycle)(?!\p{L})/iu.test(text)) {
    for (const d of drafts) {
      if (d.kind !== 'temperature' || d.derived) continue;
      const before = text.slice(Math.max(0, d.start - 40), d.start);
      if (d.role === 'cold' && /(?<!\p{L})condensers?(?:[^\S\n]+(?:outlet|side|water|leaving))?[^\S\n]+(?:at|of|is|=|:)?[^\S\n]*(?:(?:about|around|some)[^\S\n]+)?$/iu.test(before)) d.role = 'hot';
    }
  }
  // The surroundings said apart from the machine: when one sentence gives the machine's two sides
  // (two temperatures, or one and a difference), a temperature alone in another sentence, with no
  // efficiency, COP or difference beside it ("the room was held at 21 °C"), is set aside.
  const thermal = drafts.filter((d) => d.kind === 'temperature' && !d.derived);
  // (Not a sentence whose temperatures only say again sides given before: "Ideal COP between 255.15 K and 305.15 K".)
  const sides = new Set(
    thermal
      .filter((d) => d.role !== 'aside')
      .map((d) => sentenceOf(text, d))
      .filter((k) => thermal.reduce((n, t) => n + (sentenceOf(text, t) === k && t.role !== 'aside' ? (t.upper ? 2 : 1) : 0), 0) >= 2 || drafts.some((d) => d.kind === 'temperature-difference' && sentenceOf(text, d) === k)),
  );
  // "operating range −40 to 85 °C", "storage temperature": the conditions it is rated for, not its sides.
  thermal.forEach((t, i) => {
    const prev = thermal[i - 1];
    if (OPERATING_RANGE_RE.test(text.slice(Math.max(0, t.start - 40), t.start)) || (prev?.role === 'aside' && /^[^\S\n]*(?:°[CF]?[^\S\n]*)?(?:to|and|[-–—…])[^\S\n]*$/u.test(text.slice(prev.end, t.start)))) t.role = 'aside';
  });
  // "hot side 300 °C, cold side 90 °C, … on a 15 °C day": with both sides named in so many words, a
  // third temperature said of the day or the room is the surroundings. (Only then: an outdoor or
  // room temperature is a heat pump's or a fridge's side when no side is named.)
  const named = (side: 'hot' | 'cold') => thermal.some((u) => u.role === side && NAMED_SIDE_BEFORE_RE[side].test(text.slice(Math.max(0, u.start - 30), u.start)));
  if (named('hot') && named('cold')) {
    for (const t of thermal) {
      if (NAMED_SIDE_BEFORE_RE.hot.test(text.slice(Math.max(0, t.start - 30), t.start)) || NAMED_SIDE_BEFORE_RE.cold.test(text.slice(Math.max(0, t.start - 30), t.start))) continue;
      if (DAY_AFTER_RE.test(text.slice(t.end, t.end + 20)) || AMBIENT_BEFORE_RE.test(text.slice(Math.max(0, t.start - 40), t.start))) t.role = 'aside';
    }
  }
  // (Not one that the stated difference puts on the other side: "−18 °C; … at 32 °C (a 50 K difference)".)
  const differences = drafts.filter((d) => d.kind === 'temperature-difference').map((d) => siOf(d) ?? NaN);
  const otherSide = (t: Draft) =>
    thermal.some((u) => u !== t && sides.has(sentenceOf(text, u)) && differences.some((dT) => Math.abs(Math.abs((siOf(u) ?? NaN) - (siOf(t) ?? NaN)) - dT) <= 0.5));
  if (sides.size > 0) {
    for (const t of thermal) {
      const k = sentenceOf(text, t);
      if (sides.has(k) || otherSide(t)) continue;
      const company = drafts.filter((d) => d !== t && sentenceOf(text, d) === k && (d.kind === 'temperature' || d.kind === 'temperature-difference' || ratioOfDevice(d)));
      if (company.length === 0) t.role = 'aside';
    }
  } else if (thermal.length === 1 && !drafts.some((d) => d.kind === 'temperature-difference' || ratioOfDevice(d) || d.kind === 'power' || d.kind === 'energy')) {
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
      const others = thermal.filter((u) => u !== t && u.role !== 'aside' && sentenceOf(text, u) !== sentenceOf(text, t));
      if (!(others.length >= 2 || (others.length >= 1 && differenceGiven))) continue;
      const k = sentenceOf(text, t);
      const company = drafts.filter((d) => d !== t && sentenceOf(text, d) === k && d.kind !== 'duration');
      if (company.length > 0) continue;
      const sentence = sentenceAround(text, t.start, t.end);
      if (MACHINE_SIDE_RE.test(sentence) || !SURROUNDINGS_RE.test(sentence)) continue;
      t.role = 'aside';
    }
  }

  // A lone temperature, of no side, where no check could use one: no heat engine, heat pump or cooler
  // named, no efficiency, COP or difference, nothing of a bit's erasure ("measured at 21 °C and 40 %
  // relative humidity", "its heat shield faces 1,400 °C"): set aside. (One said of the surroundings
  // keeps its side: a text may give the machine's other side later.)
  if (
    thermal.length === 1 &&
    thermal[0].role === null &&
    !drafts.some((d) => d.kind === 'temperature-difference' || ratioOfDevice(d)) &&
    !LONE_TEMPERATURE_USED_RE.test(text) &&
    !HEAT_PUMP_RE.test(text) &&
    !COOLING_MACHINE_RE.test(text)
  ) {
    thermal[0].role = 'aside';
  }
  // Nor any, in a text that names no heat engine, heat pump or cooler, speaks of no heat moved, and
  // gives no efficiency, COP or difference, but figures of some other working ("drew 150 W … the room
  // was at 19 °C", "the board reached 47 °C in still air at 23 °C"): a side read from the words around
  // them serves no check, and is the surroundings of that working. (A text of temperatures alone keeps
  // its sides: the reader may add the efficiency.)
  if (
    thermal.length > 0 &&
    drafts.some((d) => d.kind !== 'temperature') &&
    !drafts.some((d) => d.kind === 'temperature-difference' || ratioOfDevice(d)) &&
    !LONE_TEMPERATURE_USED_RE.test(text) &&
    !HEAT_PUMP_RE.test(text) &&
    !COOLING_MACHINE_RE.test(text) &&
    !HEAT_WORDS_RE.test(text)
  ) {
    for (const t of thermal) t.role = 'aside';
  }

  // The conditions of a test or a place, in words of the place ("tested in a room at 20 °C", "the hall
  // is kept at 24 °C", "the thermometer read 4 °C", "a 31 °C workshop", "the room must stay between
  // 0 °C and 40 °C"), in a sentence that moves no heat and gives no efficiency or COP: the
  // surroundings, set aside. (Where a heat pump or cooler is named, only when two other temperatures
  // in other sentences are left to be its sides: its room may be its warm side.)
  {
    const movesHeat =
      HEAT_PUMP_RE.test(text) || COOLING_MACHINE_RE.test(text) || /(?<!\p{L})(?:BTU\w*|heating (?:output|capacity|power)|heat output)(?!\p{L})|(?<![\p{L}])(?:[kKMG]?W|kWh|[kM]?J|watts?|kilowatts?)[^\S\n]+of[^\S\n]+heat(?:ing)?(?!\p{L})/u.test(text) || drafts.some((d) => d.kind === 'cop');
    // (A text of temperatures alone keeps its sides: "The room is at 21 °C.")
    const otherWorking = drafts.some((d) => d.kind !== 'temperature' && d.kind !== 'temperature-difference');
    const engineEfficiency = drafts.some((d) => d.kind === 'efficiency' && d.role !== 'aside' && !d.derived) && LONE_TEMPERATURE_USED_RE.test(text) && !movesHeat;
    for (const t of otherWorking ? thermal : []) {
      if (t.role === 'aside') continue;
      const sentence = sentenceAround(text, t.start, t.end);
      if (HEAT_FLOW_RE.test(sentence)) continue;
      const k = sentenceOf(text, t);
      if (drafts.some((d) => sentenceOf(text, d) === k && (ratioOfDevice(d) || d.kind === 'temperature-difference'))) continue;
      const before = text.slice(Math.max(0, t.start - 60), t.start);
      if (!PLACE_CONDITION_BEFORE_RE.test(before) && !PLACE_AFTER_RE.test(text.slice(t.end, t.end + 30))) continue;
      if (movesHeat && thermal.filter((u) => u !== t && u.role !== 'aside' && sentenceOf(text, u) !== k).length < 2) continue;
      // (Nor where a heat engine's efficiency is given and this is one of its two temperatures: "turns 12 %
      // of the heat from a hot plate into work. The plate runs at about 90 °C and the fins sit in room air
      // at roughly 20 °C" — the room is its cold side.)
      if (engineEfficiency && thermal.filter((u) => u !== t && u.role !== 'aside').length === 1) continue;
      t.role = 'aside';
      // (And the other end of a range said with it: "between 5 °C and 35 °C".)
      const next = thermal[thermal.indexOf(t) + 1];
      if (next && /^[^\S\n]*(?:°[CF]?[^\S\n]*)?(?:to|and|[-–—…])[^\S\n]*$/u.test(text.slice(t.end, next.start))) next.role = 'aside';
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
  let temps = drafts.filter((d) => d.kind === 'temperature' && !d.derived && d.role !== 'aside');
  const diff = drafts.find((d) => d.kind === 'temperature-difference');
  /** The other side, from one stated temperature and the difference. */
  const derivedSide = (t: Draft, diff: Draft) => {
    const tSi = siOf(t);
    const dSi = siOf(diff);
    if (tSi === null || dSi === null) return null;
    // "30 °C below a 25 °C room": the other lies below; "40 degrees above the 20 °C ambient": above;
    // else by the stated temperature's role (hot → the other is colder).
    // "held at −18 °C, a full 50 K below the room": the difference describes the stated temperature
    // itself (said right after it), so the other side lies the other way.
    const apposition = t.end <= diff.start && APPOSITION_RE.test(text.slice(t.end, diff.start));
    // "supplies 55 °C water; with a 50 K lift over its source": the difference is measured from another
    // side, named after it, so the stated temperature is the one above (or below) that side.
    // But "… and a sink 50 °C cooler than the head", "hot side 40 K above the cold side": a side named
    // right before the difference is the one it describes, so the direction stands as said.
    const sideBeforeDiff = /(?<!\p{L})(?:sinks?|reservoirs?|sides?|plates?|ends?|sources?|condensers?|condensing|evaporators?|evaporating|coolers?|heaters?|baths?|loops?|exhaust|outlets?|inlets?|heads?|junctions?|faces?)[^\S\n]+(?:(?:is|sits|runs|at|being|was|lies|stays|kept|held|some|about|only|just|a|full)[^\S\n]+){0,3}$/iu.test(
      text.slice(Math.max(0, diff.start - 50), diff.start),
    );
    const fromNamedOther = t.end <= diff.start && !sideBeforeDiff && NAMED_OTHER_SIDE_RE.test(text.slice(diff.end, diff.end + 60));
    // "between the 25 °C air and the cooler soil": the other side said to be cooler or warmer than this one.
    const other = /^[^\S\n,]*(?:[\p{L}-]+[^\S\n,]+){0,2}?and[^\S\n]+(?:the|a|an|its)[^\S\n]+(cooler|colder|lower|warmer|hotter|higher)(?!\p{L})/iu.exec(text.slice(t.end, t.end + 50));
    // ("Temperature difference to cooler   680 K", a label naming the other side as the colder or the hotter one.)
    const label = /(?<!\p{L})(?:difference|ΔT|∆T|drop|lift|rise)[^\S\n]+(?:from[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:to|down to|up to)[^\S\n]+(?:the[^\S\n]+)?(cooler|cold(?:[^\S\n]+(?:side|end|plate|sink))?|sink|ambient|condenser|heater(?:[^\S\n]+head)?|hot(?:[^\S\n]+(?:side|end|plate|source))?|source)(?!\p{L})[^\d\n]{0,12}$/iu.exec(text.slice(Math.max(0, diff.start - 60), diff.start));
    const said = other
      ? /^(?:cooler|colder|lower)/i.test(other[1]) ? 'down' : 'up'
      : label && t.end <= diff.start
        ? /^(?:cooler|cold|sink|ambient|condenser)/i.test(label[1]) ? 'down' : 'up'
        : (apposition || fromNamedOther) && diff.direction ? (diff.direction === 'down' ? 'up' : 'down') : diff.direction;
    // A heat pump's one stated temperature is what it supplies (the hot side); a fridge's is what it keeps (the cold side).
    // A heat engine's or a harvester's one stated temperature, said of no room, air or sink, is the heat it
    // runs on (the hot side): "laid along a hot-water pipe … across a 40 °C difference, with the pipe side
    // at 80 °C", "the 15°F difference between a 105°F summer attic and the house below".
    const engineSource =
      HEAT_ENGINE_TEXT_RE.test(text) && !HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text) && !SURROUNDINGS_BEFORE_RE.test(text.slice(Math.max(0, t.start - 40), t.start)) && !COOLED_BY_AFTER_RE.test(text.slice(t.end, t.end + 40)) ? 'hot' : null;
    const side = t.role ?? (HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text) ? 'hot' : COOLING_MACHINE_RE.test(text) && !HEAT_PUMP_RE.test(text) ? 'cold' : engineSource);
    const down = said === 'down' || (said === undefined && side === 'hot');
    return { tSi, dSi, said, side, down, otherSi: down ? tSi - dSi : tSi + dSi };
  };
  // "a surface at 60 °C and a ΔT of 20 K across the module … the fins are at 40 °C": the other side worked
  // out later, in another sentence, from the side said with the difference — the first statement stands,
  // and the worked-out one is set aside (the other side is derived beside its first statement), where
  // that derivation gives the same temperature.
  if (diff && temps.length === 2) {
    const [a, b] = temps;
    const o = derivedSide(a, diff);
    const bSi = siOf(b);
    if (o && bSi !== null && sentenceOf(text, a) === sentenceOf(text, diff) && sentenceOf(text, b) !== sentenceOf(text, a) && Math.abs(o.otherSi - bSi) <= 0.5) {
      b.role = 'aside';
      temps = [a];
    }
  }
  if (diff && temps.length === 1) {
    const t = temps[0];
    const o = derivedSide(t, diff);
    if (o) {
      const { tSi, dSi, said, side, down, otherSi } = o;
      const anchor = diff.start > t.start ? diff : t;
      insertAfter(drafts, anchor, {
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
  // A combined heat and power unit's heating-water flow and return, with no other temperature ("Heating
  // water: return 62 °C, flow 80 °C"), are the circuit it heats — its engine's sink — not its two sides.
  // (Beside its heater head's, the return water is its cold side: "heater head at 550 °C … rejects heat
  // to the return water at 40 °C".)
  if (CHP_NAMED_RE.test(text)) {
    const temps = drafts.filter((d) => d.kind === 'temperature' && d.role !== 'aside');
    const circuit = temps.filter((d) => HEATING_CIRCUIT_BEFORE_RE.test(text.slice(Math.max(0, d.start - 40), d.start)));
    if (circuit.length >= 2 && circuit.length === temps.length) for (const d of circuit) d.role = 'aside';
  }
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
    // ("At 100 % of Carnot, the 60 °C / 20 °C engine would give 12 %": a share supposed, to work out a bound.)
    const supposed = /(?<!\p{L})(?:would|could|might)(?!\p{L})/iu.test(sentenceAround(text, share.start, share.end) + text.slice(share.end, share.end + 80).split(/[.;!?\n]/u)[0]);
    if (supposed) share.role = 'aside';
    else if (p !== null && th && tc !== null && tc !== undefined && th > tc) {
      const carnot = 1 - tc / th;
      share.quantity = typedSi(p * carnot, '');
      share.derived = `${formatPrint(p * 100)} % of the Carnot efficiency 1 − Tc/Th = 1 − ${formatQuantity(tc, 'K')}/${formatQuantity(th, 'K')}`;
    } else {
      // Without both temperatures it states no efficiency of its own.
      share.role = 'aside';
    }
  }
}
