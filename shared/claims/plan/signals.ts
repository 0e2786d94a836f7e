/**
 * What the words of a claim (and the classes of the entries it matched) say about the device, for
 * the planner (shared/claims/plan.ts): it throws out no propellant, or does; it is a heat engine, a
 * heat pump or a machine that cools; it is said to give more energy than it takes.
 */
import { BURNER_RE, NAMED_HEAT_PUMP_RE } from '../reader/context';
import { COOLING_MACHINE_WORDS, HEAT_ENGINE_WORDS, HEAT_PUMP_WORDS, PROPELLANT_FREE_WORDS, PROPELLANT_WORDS } from '../figures-vocabulary';

/** Mechanism classes (content/taxonomy.yml) whose devices throw out nothing. */
const PROPELLANT_FREE_CLASSES = ['propellant-free-thrust', 'internal-mass-motion', 'enclosed-radiation', 'sideways-beams', 'gyroscopic-drive'];
/** Mechanism classes of machines said to give more energy than they take. */
const OVER_UNITY_CLASSES = ['over-unity', 'overbalanced-wheel', 'magnet-motor', 'over-unity-circuit', 'vacuum-energy'];

/** What the planner knows beyond the figures: the text, and the classes of the entries it matched. */
export interface PlanContext {
  text?: string;
  /** Mechanism class slugs of the matched entries (the best first). */
  classes?: string[];
}

const compile = (words: readonly string[]) => new RegExp(`(?<!\\p{L})(?:${words.join('|')})(?!\\p{L})`, 'iu');
const PROPELLANT_FREE_RE = compile(PROPELLANT_FREE_WORDS);
const PROPELLANT_FREE_ALL_RE = new RegExp(PROPELLANT_FREE_RE.source, 'giu');
const PROPELLANT_RE = compile(PROPELLANT_WORDS);
const HEAT_ENGINE_RE = compile(HEAT_ENGINE_WORDS);
/**
 * Words of a heat engine other than a heat sink alone: an LED, a laser or a motor has a heat sink too, and
 * is no heat engine for it.
 */
export const heatEngineBeyondSink = (text: string): boolean => HEAT_ENGINE_RE.test(text.replace(/(?<!\p{L})heat[- ]?sinks?(?!\p{L})/giu, ' '));
const HEAT_PUMP_RE = compile(HEAT_PUMP_WORDS);
const COOLING_RE = compile(COOLING_MACHINE_WORDS);
/** Cooling given as a figure, whatever the machine is called: "3 kW of cooling", "12,000 BTU/h of refrigeration", "cooling capacity 3.5 kW". */
const COOLING_OUTPUT_RE =
  /\d[\d.,]*[^\S\n]*(?:[kM]?W|watts?|kilowatts?|BTU\/h|BTU\/hr|Btu\/h|tons?)[^\S\n]+of[^\S\n]+(?:cooling|refrigeration)(?![^\S\n]+(?:water|fans?|fluids?|oil|air|towers?|jackets?|loops?|circuits?|pumps?))(?!\p{L})|(?<!\p{L})(?:cooling|refrigeration)[^\S\n]+(?:capacity|output|duty)[^\S\n]*(?:of|is|was|:|=)?[^\S\n]*(?:about[^\S\n]+|up[^\S\n]+to[^\S\n]+)?\d/iu;
const OVER_UNITY_RE =
  /(?<!\p{L})(?:power conversion efficiency|wall-?plug efficiency|conversion efficiency|electrical efficiency|over-?unity|overunity|free energy|self-?running|self-?sustaining|self-?charging|perpetual|more (?:energy|power) (?:out )?than|more (?:back )?than (?:you|we|it|they|one) (?:put|puts|feed|feeds) in|more out than (?:in|(?:you|we) put in)|generators?|alternators?|magnet(?:ic)? motors?|motors?|output exceeds|exceeds (?:the|its) input|circuits?|coils?|lamps?|LEDs?|bulbs?|(?:solar|fuel|photovoltaic) cells?|panels?|batter(?:y|ies)|zero-?point|ZPE|vacuum(?![^\S\n]+(?:chambers?|tanks?|vessels?|jars?|pumps?|flasks?|tubes?|bottles?|cleaners?|gauges?|insulat\w*|sealed|packed))(?<!(?:in|under|into|inside)[^\S\n]+(?:a[^\S\n]+|the[^\S\n]+)?(?:hard[^\S\n]+|high[^\S\n]+|deep[^\S\n]+|full[^\S\n]+)?vacuum)|electrolys\w*|HHO|oxyhydrogen|wheels?|amplifiers?|converters?|inverters?|electrical (?:output|energy|power))(?!\p{L})/iu;
/** A device whose output is heat (a solar collector, a boiler, a heater): its efficiency is heat over heat. */
export const HEAT_ONLY_RE = /(?<!\p{L})(?:(?:delivered|given|supplied|collected|recovered|available|comes? out|output) as (?:useful )?heat|heat output|thermal output|(?:solar|flat-?plate|evacuated-?tube) (?:thermal )?collectors?|solar thermal|collector efficiency|water heaters?|boilers?|furnaces?|space heaters?)(?!\p{L})/iu;
/** A machine that moves heat is said to: cooling words name a fridge or chiller the text may only mention as a load. */
const COOLING_ACTION_RE = /(?<!\p{L})(?:(?:remov(?:es?|ing|ed)|pull(?:s|ing|ed)?|extract(?:s|ing|ed)?|pump(?:s|ing|ed)?|draws?|drawing|takes?|taking|mov(?:es?|ing)|lift(?:s|ing)?|reject(?:s|ing)?)(?: \S+){0,3} (?:of )?heat|(?:remov(?:es?|ing|ed)|pull(?:s|ing|ed)?|tak(?:es?|ing)|extract(?:s|ing|ed)?) [^.;!?\n]{0,40}(?:from|out of) (?:the |a |its )?(?:[\w°-]+ ){0,3}(?:loop|room|space|store|cabinet|building|hall|cold room|freezer|water|box|fridge|cooler|interior|compartment|enclosure|container|warehouse|food|cellar|trailer)|chilled[- ]water|tons? of (?:cooling|refrigeration)|refrigeration tons?|kW\/ton|EER|SEER|cooling (?:capacity|power|output|load|duty|COP)|refrigerat(?:ion|ing) (?:capacity|effect|duty|output)|cooling COP|(?:holds?|holding|held|keeps?|keeping|kept|cools?|cooling|cooled|brings?|bringing|brought|pulls?|pulling|pulled)(?: down)? [^.;!?\n]{0,50}?\d+(?:[.,]\d+)? ?(?:°C|°F|K|degrees?(?: C| F| Celsius| Fahrenheit)?) below (?:the )?(?:[\w-]+ ){0,3}?(?:ambient|room|air|laboratory|lab|surroundings|environment|outside)|(?:of|for) (?:cooling|refrigeration)(?! (?:water|fans?|fluids?|oil|air|towers?|jackets?|loops?|circuits?)))(?!\p{L})/iu;

export interface Signals {
  propellantFree: boolean;
  propellant: boolean;
  heatEngine: boolean;
  heatPump: boolean;
  /** A machine that cools is said to do so (not only named as a load). */
  cooling: boolean;
  /** A refrigerator, chiller or cooler is named. */
  coolingWords: boolean;
  overUnity: boolean;
  /**
   * The push is light's, from a beam falling on a vane, a foil or a sail, or from a source that shines
   * (radiation pressure, a lamp on a torsion balance): bounded by P/c, or 2P/c for a mirror, whatever the
   * words of an outside beam say of "propellant".
   */
  lightPush: boolean;
}

/** "works just as well in hard vacuum", "no air needed", "would lift the same 3 grams in a vacuum chamber": a claim that the device needs no air. */
const VACUUM_CLAIM_RE =
  /(?<!\p{L})(?:no air (?:is )?(?:needed|required|present|there|left)|(?:would|will|could|can|does|did)[^\S\n]+(?:still[^\S\n]+|also[^\S\n]+|just[^\S\n]+)?(?:lift|hover|fly|work|push|rise)[^.;!?\n]{0,40}?(?:in|inside)[^\S\n]+(?:a|the)[^\S\n]+(?:vacuum(?:[^\S\n]+(?:chamber|tank|jar))?|bell[- ]jar)|no air to push(?: (?:against|on))?,? so|(?:does not|doesn't|doesn’t|do not|don't|don’t|did not|didn't|didn’t) need (?:any )?air|(?:thrust|lift|force|push|effect)(?:[^\S\n]+[\p{L}-]+){0,3}?[^\S\n]+(?:persists?|remains?|continues?|stays?)?[^\S\n]*(?:in|under)[^\S\n]+(?:a[^\S\n]+|hard[^\S\n]+|high[^\S\n]+|full[^\S\n]+)?vacuum(?![^\S\n]+chambers?)|persists?[^\S\n]+in[^\S\n]+(?:a[^\S\n]+|hard[^\S\n]+|high[^\S\n]+)?vacuum|\d[^\S\n]*(?:µN|μN|uN|mN|N|newtons?|millinewtons?|micronewtons?)(?:[^\S\n]+(?:steady|steadily|of[^\S\n]+thrust|of[^\S\n]+lift|of[^\S\n]+force|sustained|continuously|constant)){0,2}[^\S\n]+(?:in|under)[^\S\n]+(?:a[^\S\n]+|hard[^\S\n]+|high[^\S\n]+|full[^\S\n]+)?vacuum(?![^\S\n]+(?:chambers?|tanks?|jars?|vessels?))|(?<!(?:not|n't|n’t|never|cannot|nor)[^\S\n]+)(?:works?|working|operates?|operating|functions?|functioning)(?:[^\S\n]+(?!not|never)[\p{L}-]+){0,3}?[^\S\n]+(?:in|under)[^\S\n]+(?:a[^\S\n]+|hard[^\S\n]+|high[^\S\n]+|deep[^\S\n]+|full[^\S\n]+)?vacuum)(?!\p{L})/iu;
/** "inside a bell jar pumped down to a high vacuum": the device was run in vacuum (said of a lift or thrust measured there). */
const RUN_IN_VACUUM_RE =
  /(?<!\p{L})(?:(?:ran|run|tested|operated|measured|fired|produced|produces|gave|gives|generated|generates|delivered|delivers|pushed|pushes|showed|shows)(?:[^.;!?\n]|(?<=\d)\.(?=\d)){0,60}?(?:under|inside|in)[^\S\n]+(?:a|the)[^\S\n]+(?:bell[- ]jar|vacuum[^\S\n]+(?:chamber|tank|vessel|jar))|(?:the[^\S\n]+)?(?:air|gas)[^\S\n]+(?:was|had[^\S\n]+been|has[^\S\n]+been|is)[^\S\n]+(?:pumped|evacuated|sucked)[^\S\n]+(?:out|away)|(?:pumped(?:[^\S\n]+down)?|evacuated|held|kept)[^\S\n]+to[^\S\n]+['‘"“]?(?:a[^\S\n]+)?(?:high|hard|deep|full|near)[^\S\n-]+vacuum|(?:in|inside)[^\S\n]+(?:a|the)[^\S\n]+vacuum[^\S\n]+(?:chamber|tank|vessel|jar)[^.;!?\n]{0,60}?(?:still[^\S\n]+)?(?:produced|gave|gives|produces|showed|shows|delivered|delivers)|(?:ran|run|tested|operated|measured)[^\S\n]+(?:it[^\S\n]+|them[^\S\n]+)?(?:in|inside)[^\S\n]+(?:a[^\S\n]+|the[^\S\n]+)?(?:hard[^\S\n]+|high[^\S\n]+)?vacuum(?:[^\S\n]+chamber)?|(?:put|placed|set|hung|mounted|ran|run|tested|operated|measured)[^\S\n]+[^.;!?\n]{0,80}?(?:into|inside|in)[^\S\n]+(?:a|the)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?vacuum[^\S\n]+(?:bell[^\S\n]+jar|chamber|vessel|tank)[^.;!?\n]{0,40}?pumped[^\S\n]+(?:down[^\S\n]+)?(?:hard|fully|to[^\S\n]+(?:a[^\S\n]+)?(?:high|hard|deep|good)))(?!\p{L})/iu;
/** A result that says nothing was left in vacuum ("no lift", "the thrust vanished"): then vacuum is not claimed. */
const NOTHING_IN_VACUUM_RE = /(?<!\p{L})(?:no (?:measurable )?(?:lift|thrust|force)|nothing (?:happened|was (?:measured|seen|detected|recorded|left)|moved|registered|showed|remained)|vanish\w*|disappear\w*|ceased|stopped|fell to zero|dropped to zero|(?:does|did|do|would|will|could|can) not (?:leave|lift|rise|move|hover|fly|budge|work)|cannot (?:leave|lift|rise|move|hover|fly|budge|work)|(?:doesn't|didn't|doesn’t|didn’t|won't|won’t|wouldn't|wouldn’t|can't|can’t|couldn't|couldn’t) (?:leave|lift|rise|move|hover|fly|budge|work)|stay(?:s|ed)? (?:on the (?:table|bench|ground|floor)|put|down))(?!\p{L})/iu;
/** "a chamber pumped to 2 × 10⁻⁵ mbar": run in vacuum, said as a pressure. */
const PUMPED_TO_PRESSURE_RE = /(?<!\p{L})(?:pumped|evacuated)(?:[^\S\n]+down)?[^\S\n]+to[^\S\n]+(?:about[^\S\n]+|below[^\S\n]+)?(?:10[⁻\-−][⁰¹²³⁴⁵⁶⁷⁸⁹\d]+|[\d.,]+(?:[^\S\n]*[×x][^\S\n]*10[⁻\-−]?[⁰¹²³⁴⁵⁶⁷⁸⁹\d]+|e-\d+)?)[^\S\n]*(?:mbar|millibar|Pa|torr)(?!\p{L})/iu;
/** "operated at 10⁻⁶ mbar", "tested at 2 × 10⁻⁵ Pa": run at a pressure written with a negative power of ten. */
const RUN_AT_LOW_PRESSURE_RE =
  /(?<!\p{L})(?:operated|run|ran|tested|measured|held|kept|fired)[^\S\n]+(?:(?:at|in|under)[^\S\n]+(?:a[^\S\n]+pressure[^\S\n]+of[^\S\n]+)?(?:(?:about|below|under)[^\S\n]+)?|below[^\S\n]+)(?:10[⁻\-−][⁰¹²³⁴⁵⁶⁷⁸⁹\d]+|[\d.,]+[^\S\n]*[×x][^\S\n]*10[⁻\-−][⁰¹²³⁴⁵⁶⁷⁸⁹\d]+|[\d.]+e-\d+)[^\S\n]*(?:mbar|millibar|Pa|torr)(?!\p{L})/iu;
const vacuumClaimed = (text: string): boolean =>
  VACUUM_CLAIM_RE.test(text) || ((RUN_IN_VACUUM_RE.test(text) || PUMPED_TO_PRESSURE_RE.test(text) || RUN_AT_LOW_PRESSURE_RE.test(text)) && !NOTHING_IN_VACUUM_RE.test(text));

/** A thruster whose exhaust is light: there "rocket" ("light is a terrible rocket") names no propellant. */
const PHOTON_ROCKET_RE = /(?<!\p{L})(?:photon[- ](?:thrusters?|rockets?|drives?|propulsion)|laser[- ](?:thrusters?|propulsion)|light (?:is|as) (?:its|the|a)[^.;!?\n]{0,20}(?:exhaust|rocket))(?!\p{L})/iu;
const BARE_ROCKET_RE = /(?<!\p{L})rockets?(?!\p{L})/giu;
/**
 * "Your torch is a rocket!", "a rocket with no fuel: the light itself carries the momentum": light said to
 * push, where the text also says plainly that nothing is thrown out — "rocket" is a figure of speech.
 */
function lightAsRocket(text: string): boolean {
  return /(?<!\p{L})(?:light(?:[^\S\n]+itself)?[^\S\n]+carries[^\S\n]+(?:the[^\S\n]+)?momentum|torch(?:es)?|flashlights?|laser(?:s|[- ]beams?)?|(?:a|the|its)[^\S\n]+beam[^\S\n]+(?:shines|of light))(?!\p{L})/iu.test(text) && PLAIN_NO_PROPELLANT_RE.test(text);
}
/** Propellant said not to leave: "nothing, neither propellant nor radiation, leaves", "emits neither propellant nor light". */
const NEGATED_PROPELLANT_RE = /(?<!\p{L})(?:neither|nor)[^\S\n]+(?:any[^\S\n]+)?(?:propellant|reaction mass|exhaust|gas|matter)(?!\p{L})/iu;
const NEGATED_PROPELLANT_ALL_RE = new RegExp(NEGATED_PROPELLANT_RE.source, 'giu');
/** Devices that push on air (and so cannot work in vacuum). */
const AIR_PUSHER_RE = /(?<!\p{L})(?:ion(?:ic)?[- ]wind|corona(?: discharge)?|electrohydrodynamic|EHD|ionocraft|asymmetric[- ]capacitors?|[\p{L}-]*lifters?|in (?:the )?(?:open|room|ambient|free|still|ordinary) air)(?!\p{L})/giu;
/** A machine that pushes air (not a place it works in). */
const AIR_PUSHER_ONE_RE = /(?<!\p{L})(?:ion(?:ic)?[- ]wind|corona(?: discharge)?|electrohydrodynamic|EHD|ionocraft|asymmetric[- ]capacitors?|[\p{L}-]*lifters?)(?!\p{L})/iu;

/** A plain statement that nothing is thrown out ("with no propellant", "needs no propellant at all"). */
const EXPLICIT_NO_PROPELLANT_RE =
  /(?<!\p{L})(?:(?:with |uses |needs |requires )?no propellant|without (?:any |the use of )?propellant|zero propellant|propellant-?free|propellantless|reactionless|no reaction mass|nothing (?:else )?(?:leaves|is expelled|is ejected|comes out|(?:is )?thrown out)|without (?:throwing|expelling|ejecting|blowing) (?:anything|anything at all|any mass|any propellant|any reaction mass)(?: out)?|throws? nothing (?:out|away|overboard)|(?:does|do|did) not (?:need|use|require|carry|expel) (?:any )?propellant|(?:needing |needs |requires |requiring |uses |using |with )?no working fluid|with nothing leaving(?: it)?|(?<!(?:would|could|can|will|does|did|do)(?:n't|n’t| not)[^.;!?\n]{0,60}|cannot[^.;!?\n]{0,60})(?:no air|nothing) to push (?:on|against)|nothing leaving (?:it|the (?:device|craft|spacecraft|satellite|probe|vehicle|module|capacitor|box|drive|cavity|chamber))|(?:ours|our (?:drive|thruster|device|engine|prototype|stack|cavity))(?: (?:certainly|simply))? (?:doesn't|does not|doesn’t)(?= ?[:;.,!—–-]))(?!\p{L})/iu;
/** A propulsion word said not to be there ("no tether", "without a fan"), or a mass inside the device pushed on ("on a brass reaction mass"). */
const NEGATED_ITEM = '(?:(?:any|an?)[^\\S\\n]+)?(?:(?:single[^\\S\\n]+)?(?:gram|kilogram|milligram|ounce|drop|atom|molecule|scrap|bit|speck)[^\\S\\n]+of[^\\S\\n]+)?(?:tethers?|fans?|propellers?|props?|(?:rotor[^\\S\\n]+)?blades?|rotors?|nozzles?|exhaust|fuel tanks?|water[- ]?jets?|paddles?|screws?|ablation|ablative loss|ion(?:ic)?[- ]wind|ionisation|ionization|corona(?: discharge)?|air ?flow|propellant|reaction mass)';
// (A list said not to be there counts whole: "no exhaust, propeller or reaction mass".)
const NEGATED_LIST_SEP = '(?:,[^\\S\\n]*(?:(?:or|nor)[^\\S\\n]+)?|[^\\S\\n]+(?:or|nor)[^\\S\\n]+)';
const NEGATED_LIST_ALL_RE = new RegExp(
  `(?<!\\p{L})(?:(?:expels?|ejects?|emits?|uses?|needs?|has|have|carr(?:y|ies))[^\\S\\n]+)?(?:no|without(?: an?)?|never|nor)[^\\S\\n]+${NEGATED_ITEM}(?:${NEGATED_LIST_SEP}${NEGATED_ITEM}){1,4}(?!\\p{L})`,
  'giu',
);
const NEGATED_WORD_ALL_RE = new RegExp(
  `(?<!\\p{L})(?:(?:no|not|without(?: an?)?|never|nor)[^\\S\\n]+(?:(?:carry|carries|carrying|have|has|having|use|uses|using|need|needs|needing|require|requires)[^\\S\\n]+)?${NEGATED_ITEM}|(?:on|against|between|onto)[^\\S\\n]+(?:a|an|the|its)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+)?reaction mass(?:es)?)(?!\\p{L})`,
  'giu',
);
/** A propulsor said not to be there. */
const PROPULSOR_DENIED_RE = /(?<!\p{L})(?:no|without(?: an?)?|nor)[^\S\n]+(?:any[^\S\n]+)?(?:propellers?|water[- ]?jets?|paddles?|screws?|rotors?|fans?)(?!\p{L})/iu;
/** Craft whose word stands for their propulsor. */
const CRAFT_ALL_RE = /(?<!\p{L})(?:(?:survey|hobby|model|small|RC|R\/C|radio[- ]controlled)[^\S\n]+)?(?:boats?|ships?|hulls?|outboards?|hovercraft|(?:air|aero)planes?|aircraft|drones?|quadcopters?|multicopters?)(?!\p{L})/giu;
/** A craft set against the device: "than a helicopter", "unlike drones", "a hundredth of a helicopter's". */
const COMPARED_CRAFT_ALL_RE =
  /(?<!\p{L})(?:(?:than|unlike|compared[^\S\n]+(?:with|to)|versus|vs\.?|beats?|beating|outperforms?|(?:far[^\S\n]+|well[^\S\n]+|way[^\S\n]+)?ahead[^\S\n]+of|(?:far[^\S\n]+|well[^\S\n]+|way[^\S\n]+)?beyond|surpass(?:es|ing)?|exceeds?|exceeding|superior[^\S\n]+to)[^\S\n]+(?:(?:a|an|the|any|most|all|every|ordinary|conventional|typical|today['’]s)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,2}?(?:helicopters?|drones?|quadcopters?|multicopters?|(?:air|aero)planes?|aircraft|jets?|propellers?|props|(?:ducted[^\S\n]+)?fans?|rotors?|paddles?|ion[^\S\n]+(?:engines?|thrusters?|drives?)|Hall(?:[- ]effect)?[^\S\n]+thrusters?|cold[- ]gas[^\S\n]+thrusters?|(?:chemical[^\S\n]+)?rockets?)(?:['’]s)?|(?:fraction|share|tenth|hundredth|thousandth|half|part)[^\S\n]+of[^\S\n]+what[^\S\n]+(?:a|an|any|the)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:cold[- ]gas[^\S\n]+thrusters?|ion[^\S\n]+(?:engines?|thrusters?)|Hall(?:[- ]effect)?[^\S\n]+thrusters?|rockets?|thrusters?|jets?|drones?)|(?:puts?|putting)[^\S\n]+(?:a|an|the|any|every)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:ion[^\S\n]+(?:engines?|thrusters?|drives?)|Hall(?:[- ]effect)?[^\S\n]+thrusters?|rockets?|thrusters?|helicopters?|drones?|jets?)[^\S\n]+to[^\S\n]+shame|(?:a|an|the|any)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:ion[^\S\n]+(?:engines?|thrusters?|drives?)|Hall(?:[- ]effect)?[^\S\n]+thrusters?|rockets?|thrusters?)[^\S\n]+of[^\S\n]+(?:that|the[^\S\n]+same|similar|equal|comparable|like)[^\S\n]+power|of[^\S\n]+(?:a|an|the|any|most|every)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:helicopter|drone|quadcopter|multicopter|(?:air|aero)plane|aircraft|jet)['’]s)(?!\p{L})/giu;
/** The claimant's own voice. */
const OWN_VOICE_RE = /(?<!\p{L})(?:our|ours|we|us|my|mine)(?!\p{L})/iu;
/** A sentence that compares, asks, or moves on to another subject: its propulsion words are not the claim's. */
const ASIDE_SENTENCE_RE =
  /(?<!\p{L})(?:compare[sd]?|comparison|than|next to|times (?:an?|that of|those of)|versus|vs(?:\.|(?![-\d]))|unlike|rather than|instead of|replaces?|replacing|will replace|(?:it's|it is|it’s|that's|that is|that’s|much|just|rather|a bit|somewhat) like|as if|akin to|analog(?:y|ous)|imagine)(?!\p{L})|\?[\s"'”’)]*$|^[\s>*•-]*(?:next (?:week|time|session|month|lecture|lesson|class|chapter|episode|issue|talk)|also on the agenda)|(?<!\p{L})(?:(?:must|should|need to|needs to|to|first) (?:exclude|rule out)|alternative explanations?|candidate explanations?|artefacts?|artifacts?)(?!\p{L})|^[\s"“'‘>*•-]*(?:(?:an?|the)[\s-]+)?(?:(?:most|all|ordinary|conventional|chemical|electric|ion|plasma|Hall|today's|existing|other|typical|standard|commercial)[\s-]+)*(?:rockets?|engines?|thrusters?|drives|spacecraft|propulsion(?:[^\S\n]+systems?)?|satellites)[^\S\n]+(?:are|is|have|has|need|needs|must|carry|carries|use|uses|burn|burns|work|works|get|gets|throw|throws|depend|depends|rel(?:y|ies)|require|requires|gives?|produces?|delivers?|manages?|reach(?:es)?)(?!\p{L})/iu;
/**
 * Where the text says plainly that nothing is thrown out, the words of propellant that count are those of
 * the claim's own sentences: not of a comparison ("how does that compare with an ion engine?"), a question,
 * or an agenda line ("Next week: Hall thruster erosion").
 */
function onlyTheClaim(text: string, words: string): string {
  if (!EXPLICIT_NO_PROPELLANT_RE.test(text) && !/(?<!\p{L})(?:no|without(?: any)?) (?:exhaust|expelled mass)(?!\p{L})/iu.test(text)) return words;
  return words
    .split(/(?<=[.!?]["'”’)\]]*)\s+|\n/u)
    // (A sentence in the claimant's own voice is never an aside: "Unlike those drives, our thruster uses xenon";
    // of an aside sentence whose own voice is in a clause of its own — "A Hall thruster gives ~60 mN/kW but
    // burns xenon - and our figure of merit improves" — only that clause.)
    .map((sentence) => {
      if (!ASIDE_SENTENCE_RE.test(sentence)) return sentence;
      if (!OWN_VOICE_RE.test(sentence)) return '';
      const clauses = sentence.split(/[;—–]|[^\S\n]-[^\S\n]/u);
      return clauses.length > 1 ? clauses.filter((c) => OWN_VOICE_RE.test(c)).join(' ') : sentence;
    })
    .filter((sentence) => sentence !== '')
    .join(' ');
}

/** A plain statement that the device throws out nothing, as a paragraph's own words ("no exhaust" too). */
const PLAIN_NO_PROPELLANT_RE = new RegExp(`${EXPLICIT_NO_PROPELLANT_RE.source}|(?<!\\p{L})(?:no|without(?: any)?) (?:exhaust|expelled mass)(?!\\p{L})`, 'iu');

/** Words of a push by light: radiation pressure, a light sail, a lamp on a torsion balance, P/c worked out. */
const LIGHT_PUSH_RE =
  /(?<!\p{L})(?:(?:radiation|light|photon|optical)[- ]pressure|pressure of (?:the )?(?:light|radiation|sunlight)|light exerts|(?:light|solar)[- ]?sails?|lightsails?|(?:push|force|momentum) of (?:the )?(?:light|radiation|photons|beam)|radiation balance|P ?\/ ?c(?!\p{L})|(?:power )?divided by the speed of light)(?!\p{L})/iu;
/** Light sent back and forth between mirrors: its push is lawfully many times P/c. */
const RECYCLED_LIGHT_RE = /(?<!\p{L})(?:back and forth|to and fro|recycl\w+|multiple (?:reflections|bounces|passes)|round[- ]trips|(?:many|several|\d+) (?:times|reflections|bounces|passes) between|cavit(?:y|ies)|resonat\w*)(?!\p{L})/iu;
/** An outside beam's words, which count as propellant for the photon-rocket bound of a closed device. */
const OUTSIDE_LIGHT_WORDS_RE =
  /(?<!\p{L})(?:solar sails?|(?:pushed|driven|propelled|illuminated|accelerated) by (?:a |an |the )?(?:[\w-]+ ){0,3}?(?:lasers?|beams?|sunlight|light)|ground(?:-based)? lasers?|laser-pushed|(?:lasers?|beams?|light) (?:pointed|aimed|shone|shining|fired|directed) (?:at|on|onto) (?:a |an |the )?(?:[\w-]+ ){0,3}?(?:mirrors?|sails?|reflectors?|craft|probes?|targets?)|(?:light|beam) (?:bounces|is reflected|reflects) back|(?:twice|2 ?×? ?) ?P ?\/ ?c|beamed (?:power|energy) from)(?!\p{L})/giu;
/** A push by gas the light warms (a radiometer's vanes, thermal creep), lawfully far above light's own. */
const WARMED_GAS_RE = /(?<!\p{L})(?:radiometers?|thermal (?:transpiration|creep)|photophore\w*|convection|outgass\w*)(?!\p{L})/iu;
const lightPushed = (text: string): boolean =>
  LIGHT_PUSH_RE.test(text) && !WARMED_GAS_RE.test(text) && !RECYCLED_LIGHT_RE.test(text) && !PROPELLANT_RE.test(text.replace(OUTSIDE_LIGHT_WORDS_RE, ' ')) && !AIR_WORDS_RE.test(text);

/** A device whose push is its own light: a photon thruster, lasers or emitters shining out of it. */
const LIGHT_SOURCE_RE = /(?<!\p{L})(?:photon[- ](?:thrusters?|rockets?|drives?|propulsion)|lasers?|laser diodes?|light sources?|infrared emitters?|shines? (?:a|its) beam|beam of light)(?!\p{L})/iu;
/** Words of a push on air (an ion wind, a breeze), anywhere in the text: no device of it is a light source's. */
const AIR_WORDS_RE = /(?<!\p{L})(?:ion(?:ic)?[- ]wind|(?:pushing|pushes|push|moving|moves|drag(?:s|ging)?) (?:the )?(?:neutral )?air|breeze|downwash)(?!\p{L})/iu;

/**
 * The paragraphs (blank-line separated) of a text that say plainly the device throws out nothing, as
 * [start, end) places: in a document on several devices (a tender's bids, a fair's stands), the
 * propellant of the others is not the claimed drive's.
 */
export function propellantFreeParagraphs(text: string): [number, number][] {
  const spans: [number, number][] = [];
  // (A transcript's turns — "HOST: …", "FOUNDER (R. A.): …" on lines of their own — are its paragraphs.)
  const turns = !/\n[^\S\n]*\n/u.test(text) && (text.match(/^[^\S\n]*[\p{Lu}][\p{L} .'’()-]{0,40}:[^\S\n]/gmu) ?? []).length >= 3;
  const re = turns ? /\n/gu : /\n[^\S\n]*\n/gu;
  let from = 0;
  for (let m = re.exec(text); ; m = re.exec(text)) {
    const end = m ? m.index : text.length;
    const para = text.slice(from, end);
    // (Or a paragraph on a device that throws out nothing but light — "Photon thrusters … a bank of
    // infrared lasers … 1.5 µN per kilowatt" — with no word of propellant of its own.)
    const lightOnly = () => LIGHT_SOURCE_RE.test(para) && !AIR_WORDS_RE.test(text) && !readSignals({ text: para }).propellant;
    if ((PLAIN_NO_PROPELLANT_RE.test(para) || NEGATED_PROPELLANT_RE.test(para) || lightOnly()) && para.trim()) spans.push([from, end]);
    if (!m) break;
    from = m.index + m[0].length;
  }
  return spans.length === 0 || (spans.length === 1 && spans[0][0] === 0 && spans[0][1] === text.length) ? [] : spans;
}

/** Where the device may be fitted: "bolt it to a cart, a boat or a satellite", "mount one on any small boat". */
const FIT_TO_RE = /(?<!\p{L})(?:(?:bolt|fit|mount|attach|strap|install|put)(?:s|ed|ing)?[^\S\n]+(?:it|them|one|two|several|the[^\S\n]+[\p{L}-]+)[^\S\n]+(?:to|on|onto|in|into)|(?:propos|pitch|market|offer|intend|recommend|suggest)(?:e|es|ed|ing|s)?[^\S\n]+(?:it|them|the[^\S\n]+[\p{L}-]+)[^\S\n]+(?:for|as[^\S\n]+a[^\S\n]+drive[^\S\n]+for))[^\S\n]+[^.;!?\n]{0,80}/giu;

/** Machines of falling water, wind and tide, and their reservoirs: their turbines take in no heat. */
const WATER_OR_WIND_MACHINE_RE =
  /(?<!\p{L})(?:pump[- ]turbines?|(?:hydro|hydraulic|water|wind|tidal|Pelton|Kaplan|Francis|cross[- ]flow|Turgo|reversible|run-of-river|river|stream|low-head|micro-hydro|pico-hydro)[- ]turbines?|(?:upper|lower|storage|pumped[- ]storage|hydro|water|quarry|head|tail)[- ](?:reservoirs?|ponds?)|(?:quarry|pumped[- ]hydro|pumped) reservoirs?|penstocks?)(?!\p{L})/giu;

/** An engine named beside a fuel it burns: a maker of heat and power, not a mover of heat. */
const FUEL_ENGINE_RE =
  /(?<!\p{L})(?:(?:gas|diesel|petrol|biogas)[^\S\n]+engines?|engines?[^\S\n]+(?:on|burning|running[^\S\n]+on|fuelled[^\S\n]+(?:by|with)|fired[^\S\n]+by)[^\S\n]+(?:natural[^\S\n]+)?(?:gas|diesel|petrol|biogas|LPG|propane|fuel|oil|wood|pellets|biomass)|(?:micro-?)?CHP|cogeneration|combined[^\S\n]+heat[^\S\n]+and[^\S\n]+power)(?!\p{L})/iu;

export function readSignals(ctx: PlanContext): Signals {
  const text = ctx.text ?? '';
  const classes = ctx.classes ?? [];
  const top = classes[0];
  // ("laser-ablation-free", "xenon-free": a word made free of is not there.)
  let withoutFree = text.replace(NEGATED_LIST_ALL_RE, ' ').replace(PROPELLANT_FREE_ALL_RE, ' ').replace(NEGATED_PROPELLANT_ALL_RE, ' ').replace(NEGATED_WORD_ALL_RE, ' ').replace(/(?<![\p{L}-])[\p{L}-]+-free(?!\p{L})/giu, ' ');
  // A craft's word stands for its usual propulsor (a boat's screw, an aircraft's propeller): where the text
  // denies the propulsor and says plainly nothing is thrown out ("pushes a small boat … with no propeller
  // and no water jet"), the craft's word says nothing of propellant.
  if (PROPULSOR_DENIED_RE.test(text) && PLAIN_NO_PROPELLANT_RE.test(text)) withoutFree = withoutFree.replace(CRAFT_ALL_RE, ' ');
  // "a hundredth of a helicopter's", "quieter than any drone": a craft the device is set against pushes air,
  // the device is not said to.
  withoutFree = withoutFree.replace(COMPARED_CRAFT_ALL_RE, ' ');
  // "Bolt it to a cart, a boat or a satellite": craft the device could be fitted to, in a text that says it
  // throws out nothing, are no propulsor of its own.
  if (PROPELLANT_FREE_RE.test(text)) withoutFree = withoutFree.replace(FIT_TO_RE, ' ');
  // "no heat pump, no outdoor coil": a machine said not to be one.
  const notDenied = text.replace(/(?<!\p{L})(?:no|not an?|without an?|isn't an?|is not an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:heat[- ]pumps?|refrigerators?|chillers?|compressors?|outdoor[^\S\n]+units?|refrigerants?|evaporators?)(?!\p{L})/giu, ' ');
  // (A text that says a heat pump's parts are absent and names no heat pump: its radiators are a heater's.)
  const deniedPump = notDenied !== text && !NAMED_HEAT_PUMP_RE.test(notDenied);
  return {
    propellantFree:
      PROPELLANT_FREE_RE.test(text) ||
      NEGATED_PROPELLANT_RE.test(text) ||
      (top !== undefined && PROPELLANT_FREE_CLASSES.includes(top)) ||
      // (An air-pusher said to work in vacuum, where it has no air to push: "Ours does not need air at all".)
      (vacuumClaimed(text) && AIR_PUSHER_ONE_RE.test(text)),
    // An air-pusher (a lifter, an ion-wind craft) said to work in vacuum has no air to push: its words no
    // longer count as propellant.
    propellant: PROPELLANT_RE.test(
      onlyTheClaim(text, (vacuumClaimed(text) ? withoutFree.replace(AIR_PUSHER_RE, ' ') : withoutFree).replace(PHOTON_ROCKET_RE.test(text) || lightAsRocket(text) ? BARE_ROCKET_RE : /$^/u, ' ')),
    ),
    // (Water and wind machines are no heat engines: "the reversible pump-turbine", "the upper reservoir".)
    heatEngine: HEAT_ENGINE_RE.test(text.replace(WATER_OR_WIND_MACHINE_RE, ' ')),
    // (A boiler's text names radiators and flow temperatures too: those words alone name no heat pump there.)
    // (Nor an engine that burns fuel: "Stirling engine on natural gas: 1.0 kW electric and 6.0 kW of heat to
    // your radiators" is a combined heat and power unit.)
    heatPump: HEAT_PUMP_RE.test(notDenied) && !deniedPump && !((BURNER_RE.test(text) || FUEL_ENGINE_RE.test(text)) && !NAMED_HEAT_PUMP_RE.test(notDenied)),
    cooling: (COOLING_RE.test(notDenied) && COOLING_ACTION_RE.test(notDenied)) || COOLING_OUTPUT_RE.test(notDenied),
    coolingWords: COOLING_RE.test(notDenied) || COOLING_OUTPUT_RE.test(notDenied),
    overUnity: OVER_UNITY_RE.test(text) || (top !== undefined && OVER_UNITY_CLASSES.includes(top)),
    lightPush: lightPushed(text),
  };
}
