/**
 * The Carnot check (shared/claims/plan.ts): two temperatures (or one and a difference) with a heat
 * engine's efficiency or a heat pump's or refrigerator's COP; an engine on one reservoir; what is
 * missing otherwise. It also reads what the first-law planner needs: whether the machine moves heat,
 * its COP, the efficiency or gain the text states.
 */
import type { Figure } from '../types';
import { at, heatMoverCop, need, ofKind, outOverIn, paragraphKey, sentenceKey, uniq, type Basis } from './basis';
import { paragraphOfAnotherMachine, sentenceAround } from '../reader/context';
import { HEAT_ONLY_RE, heatEngineBeyondSink } from './signals';

const HEAT_SOURCE_RE = /(?<!\p{L})(?:(?:outdoor|outside|ambient) air|ground loop|ground (?:at|temperature|source)|heat (?:drawn |taken |pulled )?from the (?:ground|earth|soil|outdoor air|outside air|river|lake)(?!')|brine|well water|ground ?water|borehole|source temperature|(?:pulls?|pulled|pulling|draws?|drew|drawn|drawing|takes?|took|taken|taking|extracts?|extracted|extracting|absorbs?|absorbed|absorbing|harvests?|harvested|harvesting|moves?|moved|moving)[^\S\n]+(?:its[^\S\n]+)?heat[^\S\n]+(?:in[^\S\n]+)?from[^\S\n]+(?:the[^\S\n]+)?(?:outside|outdoors|outdoor[^\S\n]+air|outside[^\S\n]+air|air|ground|earth|soil|river|lake|sea|garden|well|borehole)|(?:heat[^\S\n]+)?source(?:[^\S\n]+(?:side|temperature|temp\.?))?[^\S\n]*(?:at|[:=])?[^\S\n]*(?=[-−–]?\d+(?:[.,]\d+)?[^\S\n]*(?:°|degrees?(?!\p{L})|K(?!\p{L})|deg(?!\p{L})))|outdoors?|(?<=\d[^\S\n]*(?:°[^\S\n]*[CFK]?|degrees?(?:[^\S\n]+(?:C|F|Celsius|Fahrenheit|centigrade))?|[CFK])[^\S\n]+)outside)(?!\p{L})/iu;
/** A hot source fluid said to be cooled as it gives its heat ("85 °C brine …, cooled to 40 °C"). */
const HOT_SOURCE_COOLED_RE = /(?<!\p{L})(?:brine|geothermal[^\S\n]+(?:water|fluid)|hot[^\S\n]+water|fluid|steam|flue[^\S\n]+gas(?:es)?|exhaust(?:[^\S\n]+gas(?:es)?)?|thermal[^\S\n]+oil|oil)(?!\p{L})[^.;!?\n]{0,80}?(?<!\p{L})(?:cooled|cooling|cools|chilled)[^\S\n]+(?:(?:down[^\S\n]+)?to|by)[^\S\n]+(?:about[^\S\n]+|around[^\S\n]+)?[-−–]?\d/iu;
const COMPRESSOR_RE = /(?<!\p{L})(?:compressors?|vapou?r[- ]compression)(?!\p{L})/iu;
/** A converter of electricity (its operating temperatures are no reservoirs). */
const ELECTRICAL_CONVERTER_RE = /(?<!\p{L})(?:DC\/DC|DC-DC|AC\/DC|converters?|inverters?|chargers?|power supply|power supplies|PSUs?|transformers?|regulators?|LED drivers?|rectifiers?)(?!\p{L})/iu;
/**
 * Machines whose efficiency is not a heat engine's: they turn electricity or chemical energy into work,
 * heat or light, and a temperature they run at is no reservoir ("the motor is 92 % efficient and ran at
 * 80 °C in a 20 °C workshop", "the kettle heats water from 15 °C to 100 °C").
 */
const NOT_HEAT_ENGINE_RE =
  /(?<!\p{L})(?:(?:electric(?:al)?[^\S\n]+)?motors?|kettles?|(?:electric[^\S\n]+|immersion[^\S\n]+|space[^\S\n]+|water[^\S\n]+)?heaters?|heating elements?|stoves?|wood[- ]?burners?|fireplaces?|ovens?|kilns?|cookers?|hobs?|burners?|grills?|toasters?|(?:clothes |hair |tumble )?dryers?|irons?|lamps?|LEDs?|light bulbs?|bulbs?|fuel cells?|batter(?:y|ies)|electroly[sz]ers?|electrolysis|lasers?|amplifiers?|fans?|(?<!heat[^\S\n]+)pumps?|loudspeakers?|speakers?|cables?|wires?)(?!\p{L})/iu;
/** An engine said to run on one reservoir, or a difference of nothing ("ΔT = 0 K"): equal sides are the claim. */
const oneReservoirSaid = (text: string, figures: Figure[]): boolean => SINGLE_RESERVOIR_RE.test(text) || ofKind(figures, 'temperature-difference').some((f) => f.si === 0);
/** Whether the temperatures give two sides apart: the hot and cold chosen as the Carnot check chooses them, the cold one colder. */
function sidesApart(temps: Figure[]): boolean {
  const hot = temps.find((t) => t.role === 'hot') ?? [...temps].sort((a, b) => b.si - a.si)[0];
  const cold = temps.find((t) => t.role === 'cold' && t !== hot) ?? [...temps].filter((t) => t !== hot).sort((a, b) => a.si - b.si)[0];
  return !!hot && !!cold && cold.si < (hot.upper?.si ?? hot.si);
}

/** Whether every temperature given is said of the same side, 'hot' or 'cold' (and which). */
function oneSideOnly(temps: Figure[]): 'hot' | 'cold' | null {
  const roles = new Set(temps.filter((t) => t.role !== 'aside').map((t) => t.role));
  if (roles.size !== 1) return null;
  const [role] = [...roles];
  return role === 'hot' || role === 'cold' ? role : null;
}

/** An engine said to work on one reservoir: nothing colder to reject heat to. */
const SINGLE_RESERVOIR_RE = /(?<!\p{L})(?:no (?:cold|colder|cooler) (?:sink|side|reservoir|body|end)|(?:single|one|a single) (?:heat )?reservoir|(?:air|heat|water|sea|ocean|atmosphere|room air|ambient air|ambient heat) alone|nothing colder|without (?:a |any )?(?:cold|colder|cooler) (?:sink|side|reservoir|body))(?!\p{L})/iu;

/** What the text says of heat and efficiency, for the first-law planner. */
export interface HeatReading {
  efficiency: Figure | undefined;
  movesHeat: boolean;
  gain: Figure | undefined;
  share: Figure | undefined;
  cop: Figure | undefined;
  acrossDifference: boolean;
  copForCarnot: boolean | undefined;
}

/** A unit that makes heat and power together. */
const CHP_RE = /(?<!\p{L})(?:combined heat and power|CHP|cogeneration|co-generation|trigeneration|micro-?CHP)(?!\p{L})/iu;
/**
 * The "total" efficiency of a combined heat and power unit ("up to 90 % total efficiency", "85 % of the
 * fuel's energy comes back as power and heat"): electricity
 * and recovered heat added up over the fuel — no engine's efficiency, and not bounded by Carnot.
 */
function combinedHeatAndPower(f: Figure, text: string): boolean {
  if (f.start === null || f.end === null || !CHP_RE.test(text)) return false;
  const near = text.slice(Math.max(0, f.start - 40), f.end + 40);
  return /(?<!\p{L})(?:total|overall|combined|fuel utili[sz]ation|system|(?:power|electricity)[^\S\n]+and[^\S\n]+(?:usable[^\S\n]+|useful[^\S\n]+)?heat|heat[^\S\n]+and[^\S\n]+(?:power|electricity))(?!\p{L})/iu.test(near) && !/(?<!\p{L})electrical(?!\p{L})/iu.test(text.slice(Math.max(0, f.start - 25), f.start));
}

/** Before a percentage: a heating appliance's share of its fuel's heat ("Fuel efficiency 92 %", "boiler efficiency: 89 %"). */
const HEATING_SHARE_BEFORE_RE =
  /(?<!\p{L})(?:fuel|combustion|boiler|burner|stove|cooking|heating|heat[- ]transfer|seasonal|AFUE|appliance)[^\S\n]+efficiency[^\S\n]*(?:rating)?[^\S\n]*(?:of|is|was|:|=)?[^\S\n]*(?:(?:about|around|up to|roughly|over)[^\S\n]+)?$/iu;
const heatingShare = (f: Figure, text: string): boolean => f.start !== null && HEATING_SHARE_BEFORE_RE.test(text.slice(Math.max(0, f.start - 40), f.start));

/** Words of a bound worked out, not a claim: "the ideal COP … is 7.3", "the Carnot limit is 4.9 %". */
const BOUND_WORDS_RE = /(?<!\p{L})(?:ideal|Carnot|maximum|max|limit|bound|reversible|at most|theoretical|highest possible)(?!\p{L})/iu;

/**
 * Of several claimed figures (COPs, efficiencies), the one said in a sentence with the machine's sides (a
 * temperature or a difference) and no words of a bound: "Nine products quote COPs between 2.6 and 3.4 …
 * The tenth claims a heating COP of 9 across a ΔT of 45 K to an outlet at 55 °C". Else the first.
 */
function withSides(candidates: Figure[], b: Basis): Figure | undefined {
  if (candidates.length < 2 || !b.text) return candidates[0];
  const sideSentences = new Set(
    b.figures.filter((f) => (f.kind === 'temperature' || f.kind === 'temperature-difference') && f.role !== 'aside' && f.start !== null).map((f) => sentenceKey(b.text, f.start!)),
  );
  const has = (f: Figure) => f.start !== null && f.end !== null && sideSentences.has(sentenceKey(b.text, f.start)) && !BOUND_WORDS_RE.test(sentenceAround(b.text, f.start, f.end));
  // (Only where the first is said in a paragraph with no side at all: a test's reading said beside the
  // sides does not displace the claim's figure said just before them.)
  const paragraphs = new Set(b.figures.filter((f) => (f.kind === 'temperature' || f.kind === 'temperature-difference') && f.role !== 'aside' && f.start !== null).map((f) => paragraphKey(b.text, f.start!)));
  const first = candidates[0];
  if (first.start === null || paragraphs.has(paragraphKey(b.text, first.start))) return first;
  // ("… converts 41 per cent of waste heat" in a headline, said again in the story's first paragraph,
  // the sides in the next: the same figure restated nearest the sides is the one said with them.)
  const sides = b.figures.filter((f) => (f.kind === 'temperature' || f.kind === 'temperature-difference') && f.role !== 'aside' && f.start !== null).map((f) => f.start!);
  const distance = (f: Figure) => Math.min(...sides.map((at) => Math.abs(at - f.start!)));
  const restated = candidates
    .filter((f) => f !== first && f.start !== null && f.role === first.role && f.si === first.si && (f.upper?.si ?? null) === (first.upper?.si ?? null))
    .sort((x, y) => distance(x) - distance(y))[0];
  return candidates.find(has) ?? (restated && sides.length > 0 && distance(restated) < distance(first) ? restated : first);
}

/**
 * Another efficiency the text states (not a bound worked out: "the Carnot limit … is 66 %") that is
 * within the Carnot efficiency of the sides, beside the one checked: "brake thermal efficiency … about
 * 27 % … the alternator by itself converts at 90 %". The text's own reading of its engine is within the
 * law, so a conflict found on the other figure waits for the reader (shared/claims/plan/run.ts).
 */
function otherWithin(b: Basis, checked: Figure, hot: Figure, cold: Figure): Figure | undefined {
  const bound = 1 - cold.si / (hot.upper?.si ?? hot.si);
  return ofKind(b.figures, 'efficiency').find((f) => {
    if (f === checked || f.derived || f.start === null || f.end === null || !(f.si > 0) || (f.upper?.si ?? f.si) > bound) return false;
    // The bound itself, worked out by a critic ("the most any engine can convert is a little over 19 %").
    if (Math.abs(f.si - bound) <= 0.1 * bound) return false;
    const before = b.text.slice(sentenceKey(b.text, f.start), f.start);
    return !BOUND_WORDS_RE.test(b.text.slice(Math.max(0, f.start - 40), f.start)) && !OTHER_MACHINE_BEFORE_RE.test(before) && !combinedHeatAndPower(f, b.text);
  });
}

/** Words before a figure that make it another machine's: a rival's, the prior art's, an earlier record. */
const OTHER_MACHINE_BEFORE_RE =
  /(?<!\p{L})(?:prior[- ]art|reference|references|cited|previous|earlier|older|competing|competitors?|rivals?|conventional|typical|commercial|ordinary|best anyone|record|literature|state[- ]of[- ]the[- ]art)(?!\p{L})/iu;

/** Words before a temperature that make it a combustion engine's coolant, oil, exhaust or casing, not its hot gases. */
const NOT_THE_HOT_GASES_RE = /(?<!\p{L})(?:coolant|cooling water|jacket water|oil|lubricant|exhaust|stack|flue|chimney|tailpipe|casing|block|cylinder head|radiator|surface|bonnet|hood|engine bay)(?!\p{L})[^.;!?\n]{0,30}$/iu;
/** A combustion engine named: its hot side is the burning gas, not a temperature of its cooling. */
const COMBUSTION_ENGINE_RE = /(?<!\p{L})(?:(?:car|diesel|petrol|gasoline|gas|truck|lorry|marine|ship's|boat|motorbike|motorcycle|lawnmower|combustion|piston|outboard|aero|jet) engines?|diesels?|gensets?|generating sets?|diesel generators?|gas turbines?|internal[- ]combustion|combustion engines?)(?!\p{L})/iu;

/** A combustion engine named as the text's own, not one it compares with ("about what a car engine manages"). */
function combustionEngineOwn(text: string): boolean {
  const all = new RegExp(COMBUSTION_ENGINE_RE.source, 'giu');
  for (const m of text.matchAll(all)) {
    if (!/(?<!\p{L})(?:what|like|than|unlike|as|compared[^\S\n]+(?:with|to))[^\S\n]+(?:(?:a|an|any|your|the|most|many|an[^\S\n]+ordinary|a[^\S\n]+typical)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, m.index! - 30), m.index))) return true;
  }
  return false;
}

/**
 * Where an engine's efficiency is checked against temperatures on a guess the text does not make, what
 * the reader must confirm before a conflict is said: the text names no heat engine (a heating plant, a
 * lamp or a motor run at two temperatures turns electricity or fuel into heat, light or motion, and is not
 * bounded by Carnot), or the hot side is a combustion engine's coolant, oil or exhaust rather than its
 * burning gas.
 */
function engineGuess(b: Basis, hot: Figure): string | undefined {
  if (!b.s.heatEngine && !ofKind(b.figures, 'temperature-difference').length) {
    return 'confirmation that the device turns heat into work between these temperatures: the text names no heat engine, and a machine that turns electricity or fuel into heat, light or motion (a boiler, a heating network, a lamp, a motor) is not bounded by Carnot';
  }
  // (Not where the engine is said to run on that heat: "our free-piston engine runs between exhaust-gas heat at
  // 180 °C and cooling water at 25 °C" recovers exhaust heat, its hot side.)
  const lead = hot.start !== null ? b.text.slice(sentenceKey(b.text, hot.start), hot.start) : '';
  const runsOnIt = /(?<!\p{L})(?:runs?|running|ran|works?|working|operates?|operating|driven|powered|fed)[^\S\n]+(?:between|on|from|off|by|with)[^.;!?\n]{0,30}(?:exhaust|flue|stack|waste)[^.;!?\n]{0,30}$|(?<!\p{L})(?:recover\w*|harvest\w*|waste[- ]heat)(?!\p{L})[^.;!?\n]{0,40}$/iu.test(lead);
  if (hot.start !== null && !runsOnIt && combustionEngineOwn(b.text) && NOT_THE_HOT_GASES_RE.test(lead)) {
    return `the temperature of the burning gas the engine works from: ${hot.display} (“${hot.text}”) is a temperature of its cooling, oil or exhaust, not its hot side`;
  }
  return undefined;
}

/**
 * "From 10,000 BTU of waste heat per hour the engine delivers 2.5 hp at the shaft": a heat engine named,
 * with the heat it takes and the work it gives, has the efficiency work out / heat in, as a figure of its
 * own (the temperatures it works between are checked by the caller).
 */
function engineRatio(b: Basis): Figure | undefined {
  const { s, text, pIn, pOut, eIn, eOut, temps } = b;
  const heatIn = pIn ?? eIn;
  const workOut = pOut ?? eOut;
  if (!s.heatEngine || temps.length < 2 || !heatIn || !workOut || heatIn.kind !== workOut.kind || !(heatIn.si > 0) || heatIn.end === null) return undefined;
  // (The input must be heat: "of waste heat", "of heat", BTU, fuel; or sunlight brought to its hot side: "of
  // concentrated sunlight on the receiver".)
  // (Or said before it, as a station's log labels it: "heat released in the boiler 21.4 GWh".)
  const heatBefore = heatIn.start !== null && /(?<!\p{L})(?:heat|thermal (?:input|energy|power)|fuel(?: energy| input)?)(?:[^\S\n]+(?:released|liberated|supplied|input|raised)(?:[^\S\n]+(?:in|by|to|from)[^\S\n]+(?:the[^\S\n]+)?[\p{L}-]+)?)?[^\S\n]*[:=]?[^\S\n]*$/iu.test(text.slice(Math.max(0, heatIn.start - 45), heatIn.start));
  if (!heatBefore && !/^[^.;!?\n]{0,25}?(?<!\p{L})(?:heat|thermal|fuel|steam|sunlight|solar (?:heat|power|radiation|energy))(?!\p{L})/iu.test(text.slice(heatIn.end, heatIn.end + 40)) && !/BTU/u.test(heatIn.text)) return undefined;
  return outOverIn(workOut, heatIn, 'efficiency', null, 'efficiency = work out / heat in');
}

/** Words that say a heater makes its heat from its electricity alone, or from nothing. */
const MADE_HEAT_RE =
  /(?<!\p{L})(?:over-?unity|free energy|self-?running|perpetual|zero-?point|vacuum energy|resistive|resistance|heating elements?|immersion|kettle|cells?|palladium|nickel|deuterium|hydrogen|excess heat|anomalous|electroly\w+|water heaters?|boilers?|furnaces?|burn\w*|combust\w*|flames?|fuel|gas|diesel|petrol|wood|pellets?|electric (?:heaters?|fires?|radiators?)|(?:fan|convector|panel|bar|oil-filled|storage|space|infrared|patio) heaters?|no (?:heat[- ]pump|compressor|outdoor unit|refrigerant)|nothing to (?:pull|draw|take) heat from|sealed|from nothing|more energy than|plasma|cold fusion|LENR|reactor|magnet)(?!\p{L})/iu;

/** Heat said of the output and electricity of the input: "12 kW of heat for 3 kW of electricity". */
function unnamedHeatGain(text: string, inF: Figure | undefined, outF: Figure | undefined): boolean {
  if (!text || !inF || !outF || inF.end === null || outF.end === null || outF.start === null || inF.start === null) return false;
  const heatOut = /^[^\S\n]*of[^\S\n]+(?:useful[^\S\n]+)?(?:heat|warmth)(?!\p{L})/iu.test(text.slice(outF.end, outF.end + 20)) || /(?<!\p{L})heat(?:ing)?[^\S\n]+output[^\S\n]*[:=]?[^\S\n]*$/iu.test(text.slice(Math.max(0, outF.start - 20), outF.start));
  const electricIn = /^[^\S\n]*(?:of[^\S\n]+)?(?:electricity|electric(?:al)?(?:[^\S\n]+(?:power|input|energy))?)(?!\p{L})/iu.test(text.slice(inF.end, inF.end + 25));
  return heatOut && electricIn && !MADE_HEAT_RE.test(text);
}

export function planCarnot(b: Basis): HeatReading {
  const { figures, s, plans, needs, notes, power, energy, text, pIn, pOut, eIn, eOut, temps } = b;
  // A stated efficiency, or one stated as a share of the Carnot efficiency of the stated temperatures.
  const candidates = ofKind(figures, 'efficiency').filter((f) => (!f.derived || / of the Carnot efficiency /.test(f.derived)) && !combinedHeatAndPower(f, text));
  // ("Fuel efficiency 92 % … a thermoelectric module … turns about 5 % of the heat into electricity": a
  // stove's or boiler's share of heat delivered is no engine's efficiency, beside one that is.)
  const engineLike = candidates.filter((f) => !heatingShare(f, text));
  const stated = withSides(engineLike.length > 0 ? engineLike : candidates, b);
  // A heat pump or refrigerator moves heat: its heat out over its work in is a COP, not an over-unity ratio.
  // (In a text about a heat engine, a cooler named beside two temperatures — "lube oil. Cooler duty 95 kW"
  // at a steam turbine — is a heat exchanger, not a machine that moves heat, unless its cooling is said.)
  const cooling = s.coolingWords && (s.cooling || ofKind(figures, 'cop').length > 0 || (!s.heatEngine && (COMPRESSOR_RE.test(text) || temps.length >= 2)));
  // Heat delivered by a machine that names an outdoor, ground or brine source: a heat pump.
  // (Not where what goes in is itself heat: "charged with 41,000 BTU of heat … gave back 450 W of heat" is
  // a store, whose heat out cannot pass its heat in.)
  // (Heat drawn from the outdoor air, the ground or a well, in its own sentence, is a heat pump's source.)
  const inIsHeat = [...power, ...energy].some(
    (f) =>
      f.role === 'in' &&
      f.start !== null &&
      f.end !== null &&
      /^[^\S\n]*(?:of[^\S\n]+)?(?:heat|thermal energy|solar heat)(?!\p{L})/iu.test(text.slice(f.end, f.end + 25)) &&
      !HEAT_SOURCE_RE.test(sentenceAround(text, f.start, f.end)) &&
      !/(?<!\p{L})(?:air|ground|earth|water|river|lake|sea|soil)(?!\p{L})/iu.test(text.slice(f.end, f.end + 60)),
  );
  const heatFromSource = !inIsHeat && HEAT_SOURCE_RE.test(text) && !/(?<!\p{L})no[^\S\n]+(?:heat[- ]pump|outdoor (?:coil|unit))/iu.test(text) && [...power, ...energy].some(
      (f) =>
        f.role === 'out' &&
        (/^[^.;,]{0,30}?(?:heat|heating|warm[^\S\n]+air|hot[^\S\n]+(?:air|water))/i.test(text.slice(f.end ?? 0, (f.end ?? 0) + 40)) || /(?:heat|heating)(?:[^\S\n]+(?:output|delivered|capacity))?[^.;,]{0,12}$/i.test(text.slice(Math.max(0, (f.start ?? 0) - 40), f.start ?? 0))),
    );
  const statedCop = ofKind(figures, 'cop').some((f) => !f.derived && (f.role === 'heating' || f.role === 'cooling'));
  // In a report on several machines, figures all in paragraphs of another kind of machine (a generator
  // set, a circuit) with no word of heat: a heat pump named elsewhere is not theirs.
  const ownFigures = [pIn, pOut, eIn, eOut, ...ofKind(figures, 'efficiency').filter((f) => f.si > 1)].filter((f): f is Figure => f !== undefined && f.start !== null && f.end !== null);
  const elsewhere = ownFigures.length > 0 && ownFigures.every((f) => paragraphOfAnotherMachine(text, f.start!, f.end!) !== null);
  // ("Rated 12 kW of heat for 3 kW of electricity": heat out and electricity in, from a machine the text does
  // not name and does not say makes its heat from nothing — a heat pump's rating as much as any.)
  const heatOutElectricIn = unnamedHeatGain(text, pIn ?? eIn, pOut ?? eOut) && !s.overUnity && !s.heatEngine;
  // ("Unit: 2 kW in; 6.5 kW heat out; 10 °C / 35 °C", "takes 500 W and gives 1.6 kW of heat, working between
  // 0 °C and 35 °C": heat delivered, more than the work in, by a machine given a cold and a hot side and not
  // said to make its heat — what a heat pump does; its bound is the Carnot COP of those sides.)
  const outF = pOut ?? eOut;
  const heatOutAcross =
    !inIsHeat &&
    !!(pIn ?? eIn) &&
    outF !== undefined &&
    outF.start !== null &&
    outF.end !== null &&
    temps.some((t) => t.role === 'hot') &&
    temps.some((t) => t.role === 'cold') &&
    (/^[^\S\n]*(?:[\p{L}]+[^\S\n]+)?(?:of[^\S\n]+)?(?:useful[^\S\n]+)?(?:heat|heating|warmth)(?!\p{L})/iu.test(text.slice(outF.end, outF.end + 25)) || /(?<!\p{L})(?:heat|heating)(?:[^\S\n]+(?:output|out|delivered|capacity))?[^\S\n]*[:=]?[^\S\n]*$/iu.test(text.slice(Math.max(0, outF.start - 25), outF.start))) &&
    !MADE_HEAT_RE.test(text) &&
    // (A heater, a stove or a fire named: a maker of heat, whose heat out cannot pass what it takes.)
    !/(?<!\p{L})(?:heaters?|stoves?|fires?|fireplaces?)(?!\p{L})/iu.test(text) &&
    !s.overUnity &&
    !s.heatEngine;
  // ("85 °C brine at 50 L/s, cooled to 40 °C through exchangers, gives about 9 MW of heat. Circulation pumps
  // use 300 kW": heat taken from a source hotter than where it goes, with no heat pump named — heat that runs
  // downhill through exchangers, which pumps only circulate; no lift for a Carnot COP to bound.)
  const downhill = !s.heatPump && !statedCop && !COMPRESSOR_RE.test(text) && HOT_SOURCE_COOLED_RE.test(text);
  const movesHeat = !elsewhere && !downhill && (s.heatPump || cooling || heatFromSource || statedCop || heatOutElectricIn || heatOutAcross || (COMPRESSOR_RE.test(text) && !s.overUnity && /(?<!\p{L})(?:heat|cool\w*|refrigerant|chill\w*|warm\w*)(?!\p{L})/iu.test(text) && !/no[^\S\n]+compressor/iu.test(text)) || (ofKind(figures, 'cop').length > 0 && !s.overUnity));
  // ("Heating capacity 36,000 BTU/h … drawing 3.1 kW" of a mini-split: heat delivered, whatever cooling words the name has.)
  const outFigure = pOut ?? eOut;
  const outHeating = outFigure?.start != null && /(?<!\p{L})heating(?:[^\S\n]+(?:capacity|output|power|duty))?[^\S\n]*[:=]?[^\S\n]*(?:(?:of|is|was|about|up to)[^\S\n]+)?$/iu.test(text.slice(Math.max(0, outFigure.start - 40), outFigure.start));
  const inOut = movesHeat ? heatMoverCop(pIn ?? eIn, outFigure, { ...s, cooling: cooling && !outHeating }) : undefined;
  const efficiency = stated ?? (movesHeat ? undefined : engineRatio(b));
  const gain = ofKind(figures, 'efficiency').find((f) => f.derived && !movesHeat);
  /** Any efficiency or output-over-input ratio the text states (for one at most 1: a consistent balance). */
  const share = efficiency ?? ofKind(figures, 'efficiency')[0];
  const cop = withSides(ofKind(figures, 'cop'), b) ?? inOut ?? (movesHeat ? ofKind(figures, 'efficiency').find((f) => f.derived && f.si > 1) : undefined);
  // An efficiency is a heat engine's only where the text speaks of work or electricity got from heat:
  // a collector, boiler or heater that delivers heat, or a converter of electricity, is not bounded by Carnot.
  // (A heat sink alone makes no heat engine of an LED, a laser or a motor: "runs at 50 °C on a 25 °C heat sink".)
  const notAnEngine = (!s.heatEngine || (!heatEngineBeyondSink(text) && NOT_HEAT_ENGINE_RE.test(text))) && (HEAT_ONLY_RE.test(text) || ELECTRICAL_CONVERTER_RE.test(text) || NOT_HEAT_ENGINE_RE.test(text));
  // An efficiency said with a temperature difference is one of a machine working across it.
  const acrossDifference = ofKind(figures, 'temperature-difference').length > 0;
  const copForCarnot = cop && (cop.role !== null || s.heatPump || s.cooling || temps.length >= 2 || !s.overUnity);
  // (A heat pump checked on a COP above 1 that the text states is no heat engine: an efficiency beside it —
  // "a gas boiler, which the installation replaced, turns about 90 % of the fuel's heating value into
  // heat" — is another machine's.)
  const engineEfficiency =
    efficiency && !notAnEngine && (s.heatEngine || temps.length >= 2 || acrossDifference) && !(efficiency.si > 1 && temps.length < 2) && !(copForCarnot && movesHeat && cop !== undefined && cop.role !== null && !cop.derived && cop.si > 1);
  if (engineEfficiency && temps.length === 1 && SINGLE_RESERVOIR_RE.test(text)) {
    // "15 % efficiency from 20 °C room air alone, no cold sink": an engine on one reservoir (Th = Tc).
    const only = temps[0];
    plans.push({
      check: 'carnot',
      uses: uniq([only, efficiency]),
      inputs: (e) => ({ Th: at(only, e(only)), Tc: at(only, e(only)), eta_claimed: at(efficiency!, e(efficiency!)), cop_heating_claimed: '0', cop_cooling_claimed: '0' }),
      why: 'The text gives an engine working on one reservoir, with nothing colder to reject heat to.',
      assumptions: [`Both sides at ${only.display}: the text names no colder body.`],
    });
  } else if ((engineEfficiency || copForCarnot) && temps.length >= 2 && !sidesApart(temps) && !oneReservoirSaid(text, figures)) {
    // One temperature said twice ("gas entering at 500 °C … 62 % from a 500 °C source"), or a "cold"
    // side no colder than the hot one: the other side is not given.
    needs.push(
      need(
        'carnot',
        ['the temperature of the other side (the text gives the same temperature for both, or a cold side that is not colder)'],
        cop ? 'A heat pump or refrigerator is bounded by the Carnot COP of the temperatures it works between.' : 'A heat engine is bounded by the Carnot efficiency of the temperatures it works between.',
        uniq([efficiency, cop, ...temps]),
      ),
    );
  } else if ((engineEfficiency || copForCarnot) && temps.length >= 2 && oneSideOnly(temps) !== null) {
    // Several temperatures all said of one side ("Outdoor temp +7 °C … +2 °C … −7 °C" in a heat pump's
    // leaflet): the other side is not given, and none of them stands in for it.
    const side = oneSideOnly(temps);
    needs.push(
      need(
        'carnot',
        [side === 'cold' ? 'the temperature of the hot side (every temperature the text gives is of the cold side)' : 'the temperature of the cold side (every temperature the text gives is of the hot side)'],
        cop ? 'A heat pump or refrigerator is bounded by the Carnot COP of the temperatures it works between.' : 'A heat engine is bounded by the Carnot efficiency of the temperatures it works between.',
        uniq([efficiency, cop, ...temps]),
      ),
    );
  } else if ((engineEfficiency || copForCarnot) && temps.length >= 2) {
    // Of several temperatures said of one side, the one most favourable to the claim: for an engine the
    // hottest source and the coldest sink ("cold tank 290 °C … condensing at 40 °C": 40 °C).
    const engineSides = engineEfficiency && !copForCarnot;
    const hots = temps.filter((t) => t.role === 'hot');
    const colds = temps.filter((t) => t.role === 'cold');
    const hot = (engineSides && hots.length > 1 ? [...hots].sort((a, b) => (b.upper?.si ?? b.si) - (a.upper?.si ?? a.si))[0] : hots[0]) ?? [...temps].sort((a, b) => b.si - a.si)[0];
    const cold = (engineSides && colds.length > 1 ? [...colds].filter((t) => t !== hot).sort((a, b) => a.si - b.si)[0] : colds.find((t) => t !== hot)) ?? [...temps].filter((t) => t !== hot).sort((a, b) => a.si - b.si)[0];
    const extra: string[] = [];
    if (engineSides && (hots.length > 1 || colds.length > 1)) extra.push(`Of the temperatures given for a side, the check takes the one most favourable to the claim: ${hot.display} hot, ${cold.display} cold.`);
    if (hot.role !== 'hot' || cold.role !== 'cold') extra.push(`The higher temperature (${hot.display}) is taken as the hot side and ${cold.display} as the cold side.`);
    const cooling = cop?.role === 'cooling' || (cop?.role === null && s.cooling && !s.heatPump);
    if (cop && cop.role === null) extra.push(cooling ? 'The COP is read as a cooling COP (heat drawn out over work in).' : 'The COP is read as a heating COP (heat delivered over work in); mark it as cooling if the machine is a refrigerator or chiller.');
    const claimed = [engineEfficiency ? efficiency : undefined, copForCarnot ? cop : undefined];
    const engineOnly = engineEfficiency && !copForCarnot;
    plans.push({
      within: engineOnly ? otherWithin(b, efficiency!, hot, cold) : undefined,
      confirmIfBreaks: engineOnly ? engineGuess(b, hot) : undefined,
      check: 'carnot',
      uses: uniq([hot, cold, ...claimed]),
      inputs: (e) => ({
        Th: at(hot, e(hot)),
        Tc: at(cold, e(cold)),
        eta_claimed: engineEfficiency ? at(efficiency!, e(efficiency!)) : '0',
        cop_heating_claimed: copForCarnot && !cooling ? at(cop!, e(cop!)) : '0',
        cop_cooling_claimed: copForCarnot && cooling ? at(cop!, e(cop!)) : '0',
      }),
      why: 'The text gives the temperatures the machine works between and what it claims to achieve there.',
      assumptions: extra,
    });
  } else if ((engineEfficiency || (copForCarnot && (cop.role !== null || s.heatPump || s.cooling || (!cop.derived && /(?<!\p{L})COP(?!\p{L})/u.test(cop.text + b.text.slice(Math.max(0, (cop.start ?? 0) - 12), cop.start ?? 0)))))) && temps.length < 2) {
    // (A COP said as such — "→ COP 6.8" — is a heat mover's, whatever the machine is called.)
    const missing = temps.length === 0 ? ['the temperature of the hot side', 'the temperature of the cold side'] : [temps[0].role === 'hot' ? 'the temperature of the cold side' : temps[0].role === 'cold' ? 'the temperature of the hot side' : 'the temperature of the other side'];
    needs.push(
      need(
        'carnot',
        missing,
        cop ? 'A heat pump or refrigerator is bounded by the Carnot COP of the temperatures it works between.' : 'A heat engine is bounded by the Carnot efficiency of the temperatures it works between.',
        uniq([efficiency, cop, ...temps]),
      ),
    );
    if (cop && cop.si > 1) notes.push('A heat pump or refrigerator moves more heat than the work it takes (a COP above 1) without breaking any law; whether its COP is possible depends on the temperatures.');
  }
  return { efficiency, movesHeat, gain, share, cop, acrossDifference, copForCarnot };
}
