/**
 * What a percentage or a bare number is, by its context (the claim reader, shared/claims/reader.ts,
 * pass 2): an efficiency, a COP (heating or cooling, or from an EER), a quantum efficiency, a share
 * of the speed of light or of the Carnot efficiency, a gain ("1.3 units back for every unit", "three
 * times the energy it takes", "60 % more out than in", "150 % of its input"); and the words that make
 * seconds a specific impulse and "degrees" a temperature.
 */
import { BARE_CONNECTORS, C_M_PER_S, EFFICIENCY_CHANGE_WORDS, ISP_WORDS, QUANTUM_EFFICIENCY_WORDS } from '../figures-vocabulary';
import type { FigureKind, FigureRole } from '../types';
import { PER_UNIT_IN_WORDS } from './units';
import { alt, BEFORE_WINDOW, COOLING_MACHINE_RE, HEAT_PUMP_RE, BURNER_RE, NAMED_HEAT_PUMP_RE, paragraphOfAnotherMachine, sentenceAround, windowStart } from './context';


/** ", measured per §7 of the test protocol," between a COP and its value: a clause set off by commas. */
// (Or a span of time or a test it was measured over, before a colon: "heating COP over the test week: 3.9".)
const ASIDE = '(?:(?:[^\\S\\n]+(?:over|during|across|for|in|at)[^\\S\\n]+(?:the|a|an|its|our|this|that|these|those|each|every)[^\\S\\n]+[^\\d,;:.!?\\n]{2,40}?(?=[:,]|[^\\S\\n]+(?:is|was|were|came|averaged|stood|sat|lay|reached|varied|ranged)(?!\\p{L})))?(?:[^\\S\\n]*,[^,;.!?\\n]{3,140},)?)';
const CONNECT = `(?:[^\\S\\n]*(?:[=:≈~|)»”"'’“‘«]|(?:${alt(BARE_CONNECTORS)})(?!\\p{L})))*[^\\S\\n]*`;
/** Between a COP and its value: the mode and whose it is ("COP in cooling of", "heating COP of the BW-8 is"). */
const COP_OWNER = '(?:[^\\S\\n]+(?:in|for|when)[^\\S\\n]+(?:heating|cooling)(?:[^\\S\\n]+mode)?)?(?:[^\\S\\n]+(?:of|for)[^\\S\\n]+(?:the|this|our|its|each|every|a|an)[^\\S\\n]+(?:[\\p{L}\\p{N}-]+[^\\S\\n]+){0,2}?[\\p{L}\\p{N}][\\p{L}\\p{N}-]*(?=[^\\S\\n]+(?:is|was|were|of|at|lay|lies|sits|sat|stands|stood|ranged|ranges|varied|varies|came|comes|=|:)))?';
const COP_SYMBOL_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:S?COPs?|C\\.O\\.P\\.?)(?:_?\\{?(?:h|c|H|C|heat|heating|cool|cooling)\\}?(?!\\p{L}))?(?:[^\\S\\n]*\\([^)]{0,20}\\))?${COP_OWNER}${ASIDE}(?:[^\\S\\n]+at)?${CONNECT}$`, 'u');
/** An energy efficiency ratio (EER or SEER, in BTU/h of cooling per watt): a cooling COP × 3.412. */
const EER_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:S?EER|energy efficiency ratio)(?:[^\\S\\n]*\\([^)]{0,20}\\))?${CONNECT}$`, 'u');
/** 1 BTU_IT/h = 0.293 071 1 W (NIST SP 811, Appendix B.8). */
const BTU_PER_H_IN_W = 0.29307107;
const COP_WORDS_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:(?:seasonal[\\s-]+)?coefficients?[\\s-]+of[\\s-]+performance(?:[^\\S\\n]*\\(S?COP\\))?|seasonal[\\s-]+performance[\\s-]+factor(?:[^\\S\\n]*\\(SPF\\))?)${COP_OWNER}${ASIDE}${CONNECT}$`, 'iu');
/** A worked expression between a symbol and its result: "η = 3.1/172 = 0.018". */
const EXPRESSION = '(?:[^\\S\\n]*(?:[=≈]|(?:is|was)(?:[^\\S\\n]+(?:therefore|then|thus|so|hence))?)[^\\S\\n]*[\\d.,]+(?:[^\\S\\n]*[/×*÷][^\\S\\n]*[\\d.,]+)+[^\\S\\n]*,?)?';
const EFFICIENCY_BARE_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:efficienc(?:y|ies)|η(?:_?(?:th|thermal|c|Carnot))?|eta(?:_?(?:th|thermal))?)(?!\\p{L})${ASIDE}${EXPRESSION}${CONNECT}$`, 'iu');
const QE_BEFORE_RE = new RegExp(`(?<!\\p{L})(?:${alt(QUANTUM_EFFICIENCY_WORDS)})(?!\\p{L})([^\\d.;!?\\n]{0,60})$`, 'iu');
const QE_AFTER_RE = new RegExp(`[^\\S\\n]*(?:(?:\\p{L}+|-)[^\\S\\n]+){0,3}(?:${alt(QUANTUM_EFFICIENCY_WORDS)})(?!\\p{L})`, 'iuy');
/** "efficiency … 45%": the keyword, then up to 60 characters without digits or a sentence break. */
// (", measured as electrical output over heat absorbed at the head, was about 27 %": a clause set off by commas between.)
const EFFICIENCY_PERCENT_BEFORE_RE = /(?<!\p{L})(?:efficienc(?:y|ies)|η|efficient|rendement|rendimento|rendimiento|Wirkungsgrad|(?<!(?:crop|grain|harvest|faradaic|Faradaic|chemical|product|hydrogen|gas|quantum|photon|solar|energy|annual|yearly|specific)[^\S\n]+)yield(?=[^\S\n]+(?:of[^\S\n]+(?:the|this|our|its)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:machine|motor|engine|generator|boiler|device|system|plant|installation|converter|unit|transformer|heater|stove|turbine|module|prototype)s?|is|was|of|at|=|:)(?!\p{L}))|(?:seasonal|heating|cooling|annual)[^\S\n]+performance(?:[^\S\n]+factor)?|conversion|converts?|converting|turns?|turning|round[- ]trip|AFUE|(?<!(?:temperature|drag|friction|loss|absorption|transmission|reflection|discharge|transfer|expansion|correlation|variation|Seebeck|Peltier)[^\S\n]+)coefficients?(?![^\S\n]+of[^\S\n]+(?:performance|friction|drag|variation|thermal|determination|restitution|expansion|correlation)))(?!\p{L})((?:[^,\d.;!?\n]{0,25}?,[^,\d.;!?\n]{3,140}[,:]|[^\S\n]*[—–][^—–\d.;!?\n]{3,100}[—–])?[^\d.;!?\n]{0,60})$/iu;
const EFFICIENCY_CHANGE_RE = new RegExp(`(?<!\\p{L})(?:${alt(EFFICIENCY_CHANGE_WORDS)})(?!\\p{L})`, 'iu');
/** "45 % efficient", "45% conversion efficiency", "45 %-efficient" (not "45% less efficient"). */
const EFFICIENCY_AFTER_RE = /[^\S\n]*-?[^\S\n]*(?:(?:(?!(?:less|more|higher|lower|better|worse|of)(?!\p{L}))[\p{L}-]+[^\S\n]+){0,3}efficien(?:t|tly|cy|cies)|round[- ]?trip(?:[^\S\n]+efficiency)?|AFUE)(?!\p{L})/iuy;
/** "26.1 % for a lab silicon cell", "24 % from the new perovskite tandem module": a photovoltaic cell's efficiency. */
const PV_CELL_AFTER_RE = /[^\S\n]*(?:for|from|by|on)[^\S\n]+(?:(?:an?|the|its|our|their)[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+){0,3}?(?:solar|silicon|photovoltaic|PV|perovskite|tandem|thin-film|organic)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,1}?(?:cells?|modules?|panels?)(?!\p{L})/iuy;
/** "38 % of its fuel heat into shaft work", "25 % of the heat flowing through it": a share of heat turned into work. */
const PERCENT_OF_HEAT_RE =
  /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+|this[^\S\n]+|your[^\S\n]+|their[^\S\n]+|our[^\S\n]+)?(?:[\p{L}'’-]+[^\S\n]+){0,2}?(?:heat|thermal energy|fuel energy|fuel's energy|energy in the fuel|heat input|incoming heat|absorbed heat|collected heat|sunlight|light|incident (?:light|radiation|power)|absorbed (?:[\p{L}-]+[^\S\n]+)?(?:light|radiation|power|energy)|radiant (?:power|energy|heat)|solar (?:energy|power|radiation)|input (?:energy|power)|electrical (?:input|energy|power)|energy (?:it|they) (?:takes|draws|consumes))(?!\p{L})(?=[^.;!?\n]{0,80}(?:into|to|as|comes out|becomes|is turned|is converted)[^.;!?\n]{0,40}(?:work|electric|power|motion|mechanical))/iuy;
/**
 * "0.5 % of the heat that flows through it", said of a machine that turns heat into power (a
 * harvester, a thermoelectric generator, an engine): its efficiency. Not of a heat exchanger, a
 * recovery unit or insulation, where the share is heat passed on, not work.
 */
const PERCENT_OF_HEAT_THROUGH_RE =
  /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?heat[^\S\n]+(?:(?:that|which)[^\S\n]+)?(?:flows?|flowing|passes|passing|goes|going|moves|moving)[^\S\n]+(?:through|across)(?!\p{L})/iuy;
const HEAT_TO_POWER_MACHINE_RE = /(?<!\p{L})(?:harvest\w*|thermoelectric|TEGs?|thermo-?generators?|generators?|engines?|Stirling|turbines?|ORC|Seebeck)(?!\p{L})/iu;
const HEAT_PASSED_ON_RE = /(?<!\p{L})(?:exchangers?|recover\w*|recuperat\w*|ventilat\w*|insulat\w*|regenerat\w*|heat sinks?|radiators?|HRV|ERV)(?!\p{L})/iu;
const percentOfHeatThrough = (text: string, end: number): boolean => {
  PERCENT_OF_HEAT_THROUGH_RE.lastIndex = end;
  return PERCENT_OF_HEAT_THROUGH_RE.test(text) && HEAT_TO_POWER_MACHINE_RE.test(text) && !HEAT_PASSED_ON_RE.test(text);
};
/** "5 % conversion", "61 % net", ", 25 %, leaves as shaft work", "42 % of the coal's energy reaches the grid": a share turned into work or electricity. */
const SHARE_AS_WORK_RE =
  /[^\S\n]*(?:(?:net|gross|conversion|thermal|electrical|electric|overall|cycle|first-law|brake)(?!\p{L})|(?:of[^\S\n]+)?(?:electricity|electrical energy|electric power|shaft work|work)[^\S\n]+(?:from|out of)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:gas|fuel|heat|diesel|petrol|oil|coal|wood|pellets|biomass|hydrogen|steam|sunlight|light)(?!\p{L})|[,)]?[^\S\n]*(?:leaves|comes out|emerges|is delivered|is returned|appears|ends up)[^\S\n]+as[^\S\n]+(?:useful[^\S\n]+)?(?:shaft[^\S\n]+|mechanical[^\S\n]+|electrical[^\S\n]+)?(?:work|electricity|power|motion)|[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:coal|fuel|gas|heat|steam|diesel|petrol|oil|wood|biomass|hydrogen)(?:['’]s)?(?:[^\S\n]+(?:chemical[^\S\n]+)?(?:energy|heat|input))?[^\S\n]+(?:reaches|gets[^\S\n]+to|goes[^\S\n]+(?:out[^\S\n]+)?to|is[^\S\n]+sent[^\S\n]+(?:out[^\S\n]+)?to|arrives[^\S\n]+at)[^\S\n]+(?:the[^\S\n]+)?(?:grid|wire|busbar|shaft|wheels?|network|mains)(?!\p{L}))/iuy;
const SPEED_OF_LIGHT_AFTER_RE = /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+)?(?:speed|velocity)[^\S\n]+of[^\S\n]+light|[^\S\n]*of[^\S\n]+c(?!\p{L})|[^\S\n]*of[^\S\n]+(?:the[^\S\n]+)?light[- ]speed/iuy;
export const TEMPERATURE_CONTEXT_RE = /(?<!\p{L})(?:temperatures?|heat(?:ed|s|ing)?|hot|hotter|hottest|warm(?:er|est|s|ed)?|cold|colder|coldest|cool(?:er|est|s|ed)?|frost\w*|degrees[^\S\n]+out(?:side|doors)?|ambient|boil\w*|freez\w*|Celsius|Fahrenheit|thermal|room|outdoor|outside|indoor|inside|air|water|collector|cooling|chill\w*|COP|radiators?|ground|loop|cabinet|kitchen|brine|evaporat\w*|condens\w*|pond|lake|river|fridge|refrigerat\w*)(?!\p{L})/iu;
/** "Isp 320 s", "Isp (vac): 320 s", "specific impulse (sea level) of 280 s". */
// ("specific impulse in vacuum is 65 s", "Isp at sea level of 250 s", "the thruster's specific impulse of the system is".)
export const ISP_BEFORE_RE = new RegExp(
  `(?<!\\p{L})(?:${alt(ISP_WORDS)})(?!\\p{L})(?:[^\\S\\n]*\\([^()\\n\\d]{1,60}\\))?(?:[^\\S\\n]+(?:in|at|during)[^\\S\\n]+(?:(?:a|an|the|our|its|their)[^\\S\\n]+)?(?:[\\p{L}-]+[^\\S\\n]+){0,2}?(?:vacuum|sea[^\\S\\n]+level|space|tests?|firings?|runs?|chambers?|measurements?|trials?))?(?:[^\\S\\n]+(?:(?:as[^\\S\\n]+)?(?:found|worked out|derived|calculated|computed|measured)[^\\S\\n]+)?(?:from|via)[^\\S\\n]+(?:[\\p{L}-]+[^\\S\\n]+){0,5}?[\\p{L}-]+)?(?:[^\\S\\n]*,[^,\\d.;!?\\n]{3,80},)?${CONNECT}$`,
  'iu',
);
export const ISP_AFTER_RE = new RegExp(
  `[^\\S\\n]*(?:of[^\\S\\n]+)?(?:(?:vacuum|vac|sea[- ]level|SL|delivered|measured|effective|rated)[^\\S\\n]+)?(?:${alt(ISP_WORDS)})(?!\\p{L})|(?:-|[^\\S\\n]+)(?:(?!(?:into|to|for|of|in|over|at|on|the|a|an|from|by|with|after|before|until|while|and|or)(?![\\p{L}–-]))[\\p{L}–-]+[^\\S\\n]+){0,2}?(?:engines?|thrusters?|rocket motors?|motors?)(?!\\p{L})`,
  'iuy',
);
/** Gains: "1.3 units back for every unit", "three times the energy it takes", "output is 3 times the input". */
const GAIN_AFTER_RE =
  /[^\S\n]*(?:(?:units?|joules?|watts?|J|W|kWh|times)[^\S\n]+)?(?:(?:of[^\S\n]+)?(?:(?:electrical|electric|useful|mechanical|thermal)[^\S\n]+)?(?:energy|power|output|heat|work|electricity)[^\S\n]+)?(?:(?:back|out|returned|in return|delivered|produced)[^\S\n]+)?(?:(?:to|into|at|of|from)[^\S\n]+(?:the|its|a)[^\S\n]+[\p{L}-]+[^\S\n]+)?(?:for|per)[^\S\n]+(?:every|each|one)[^\S\n]+(?:single[^\S\n]+)?(?:one[^\S\n]+)?(?:unit|joule|watt|J|W|kWh|kilowatt-hour)s?(?:[^\S\n]+(?:of[^\S\n]+)?(?:energy|power|electricity|input|work|fuel))?(?:[^\S\n]+(?:in|put in|supplied|consumed|used|spent|it (?:takes|uses|consumes|draws|is given|receives)|taken|drawn|of input|invested|taken (?:at|from|in) [^.;!?\n]{0,30}|(?:the|its)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){1,2}?(?:takes|uses|draws|consumes|gets|receives|spends|burns|needs|is given))|(?<=electricity|input|work|fuel|energy|power)(?!\p{L}))/iuy;
/**
 * "3 units of energy for every 4 it takes", "0.92 units of electricity and heat for every unit of
 * fuel": units out for a number of units in (group 1; none for a single unit).
 */
const GAIN_FOR_EVERY_RE =
  /[^\S\n]*units?[^\S\n]+(?:of[^\S\n]+(?:[\p{L}-]+[^\S\n]+){1,4}?)?(?:(?:back|out|returned|delivered)[^\S\n]+)?(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(?:(\d+(?:\.\d+)?|two|three|four|five|six|seven|eight|nine|ten)(?![\p{L}\p{N}])|units?(?!\p{L}))(?=[^.;!?\n]{0,40}(?:in|into|enters?|takes?|took|consumes?|uses?|draws?|of (?:fuel|input|energy|electricity|power|work)|put in|supplied|fed)(?!\p{L}))/iuy;
/** "gives back 1.3 for every 1 it receives": a bare number out for a bare number in (group 1), after a verb of giving back. */
const GAIN_BARE_FOR_EVERY_RE =
  /[^\S\n]+(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(\d+(?:\.\d+)?|one|two|three|four|five|six|seven|eight|nine|ten)(?![\p{L}\p{N}.,])[^\S\n]+(?:(?:(?:that|which)[^\S\n]+)?(?:it|they|the[^\S\n]+[\p{L}-]+)[^\S\n]+(?:receives|received|takes|took|gets|got|consumes|consumed|uses|used|draws|drew|is[^\S\n]+given|was[^\S\n]+given|is[^\S\n]+fed|was[^\S\n]+fed|puts?[^\S\n]+in|takes[^\S\n]+in)|(?:(?:that|which)[^\S\n]+)?(?:you|we|I|one)[^\S\n]+(?:put[^\S\n]+in(?:to[^\S\n]+it)?|feed[^\S\n]+(?:in|it)|give[^\S\n]+it|supply|spend|invest)|(?:going|put|fed)[^\S\n]+in)(?!\p{L})/iuy;
const GAIN_BARE_VERB_RE = /(?<!\p{L})(?:gives?|gave|giving|returns?|returned|returning|yields?|yielded|delivers?|delivered|puts?[^\S\n]+out|sends?[^\S\n]+back|feeds?[^\S\n]+back)(?:[^\S\n]+(?:back|out|us|you|about|roughly|some|nearly))*[^\S\n]*$/iu;
const SMALL_NUMBER: Record<string, number> = { two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10 };
/** "For every unit of electricity we put in, the amplifier gives back 1.3." */
const GAIN_BEFORE_RE =
  /(?<!\p{L})(?:for|per)[^\S\n]+(?:every|each)[^\S\n]+(?:single[^\S\n]+)?(?:unit|joule|watt|kilowatt-hour|kWh|J|W)s?\b[^.;!?\n]{0,80}(?:gives?|returns?|yields?|delivers?|produces?|get|gets|comes? out|back)(?:[^\S\n]+(?:back|out|us|about|roughly|some|nearly))*[^\S\n]*$/iu;
const TIMES_AFTER_RE =
  /[^\S\n]*(?:times|x|×)[^\S\n]+(?:(?:as[^\S\n]+much|more)[^\S\n]+)?(?:(?:energy|power|electricity|heat|work|output)[^\S\n]+(?:(?:out[^\S\n]+of|into|from|to|in)[^\S\n]+(?:[\p{L}'’-]+[^\S\n]+){1,3}?(?=(?:as|than)[^\S\n]))?)?(?:(?:as|than)[^\S\n]+)?(?:(?:the|its|it)[^\S\n]+)?(?:(?:energy|power|electrical|electricity|electric power|work|heat|rate)[^\S\n]+)?(?:input|consumption|in(?=[^\S\n]*(?:[,.;:)]|$))|it (?:takes|uses|consumes|draws|needs|is fed|receives)|(?:is|was) (?:put in|supplied|fed in)|supplied|consumed|drawn|needed|fed in|put in|what (?:it|the [\p{L}-]+) (?:is fed|takes|draws|uses|consumes|gets|receives|is given))/iuy;
const TIMES_BEFORE_RE = /(?<!\p{L})(?:output|yield|gain|returns?|delivers?|produces?|generates?|puts? out|gives?(?: back| out)?|makes|provides|supplies|sends? back)(?:[^\S\n]+(?:is|of|was|are|reaches|reached|power|energy|exactly|about|roughly|some|nearly))*[^\S\n]*$/iu;
/** "the output exceeds the input by a factor of 1.5", "output is higher than input by a factor of 2". */
const FACTOR_BEFORE_RE =
  /(?<!\p{L})(?:output|out|yield|production)[^.;!?\n]{0,40}(?:exceeds?|exceeding|is (?:higher|greater|larger|more) than|surpass\w*|outstrips?)[^.;!?\n]{0,30}(?:input|consumption|supply)[^.;!?\n]{0,20}by (?:a factor of|a ratio of)(?:[^\S\n]+(?:at least|about|roughly|some|nearly|over))?[^\S\n]*$/iu;
/** "150 % of its input power", "120 % of the energy supplied": an output as a share of the input. */
const PERCENT_OF_INPUT_RE =
  /[^\S\n]*of[^\S\n]+(?:what|whatever|all|everything)[^\S\n]+(?:that[^\S\n]+)?(?:went|goes|go|was[^\S\n]+put|is[^\S\n]+put|were[^\S\n]+put|had[^\S\n]+gone)[^\S\n]+in(?:to[^\S\n]+(?:it|them|the[^\S\n]+[\p{L}-]+))?(?!\p{L})|[^\S\n]*of[^\S\n]+(?:what|whatever|all|everything)[^\S\n]+(?:(?:that[^\S\n]+)?(?:it|they|the[^\S\n]+[\p{L}-]+|you|we))[^\S\n]+(?:draws?|takes?|consumes?|uses?|gets?|is (?:given|fed|supplied)|(?:is )?put in|puts? in|pulls?)(?!\p{L})|[^\S\n]*of[^\S\n]+(?:its|the|their)[^\S\n]+(?:[\p{L}-]+[^\S\n]+){0,2}?(?:input|consumption|(?:energy|power) (?:in|supplied|consumed|drawn|fed|put|(?:it|they) (?:receives?|takes?|gets?|draws?|consumes?)|received|taken in)|supply|electrical input)(?!\p{L})/iuy;
/** A label of its own, a table's cell or a list's item, of what a store gave back: "; Returned 81 %", "| Recovered | 74 % |". */
const RETURNED_LABEL_RE = /(?:^|[;|\n])[^\S\n]*(?:returned|given[^\S\n]+back|recovered|energy[^\S\n]+(?:returned|recovered)|back[^\S\n]+out)[^\S\n]*:?[^\S\n]*$/iu;
/** "1.3 W for each watt in", "1.3 J back per joule supplied", "1.3 J to its battery for every joule": a gain written with a unit. */
export const GAIN_PER_UNIT_RE = new RegExp(
  String.raw`[^\S\n]*(?:(?:of[^\S\n]+)?(?:(?:electrical|electric|mechanical|thermal|useful|shaft)[^\S\n]+)?(?:energy|power|output|heat|electricity)[^\S\n]+(?:(?:from|out[^\S\n]+of)[^\S\n]+(?:the|its|a|an|your|our)[^\S\n]+(?:[\p{L}\p{N}°.,-]+[^\S\n]+){1,3}?(?=(?:for|per)[^\S\n]+(?:each|every|one)[^\S\n]))?)?(?:(?:back|out|returned)(?:[^\S\n]+(?:of|from)[^\S\n]+(?:the|its|a|an)[^\S\n]+[\p{L}-]+)?[^\S\n]+|(?<!(?:heat|warmth)[^\S\n]+)(?:back[^\S\n]+)?(?:to|into)[^\S\n]+(?:the|its|their|a|an)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?[\p{L}-]+[^\S\n]+)?(?:(?:for|per)[^\S\n]+(?:each|every|one)[^\S\n]+(?:single[^\S\n]+)?|per[^\S\n]+(?=(?:watt|joule|kWh|kilowatt-hour|kilowatt|kW|megajoule|MJ|W|J)s?[^\S\n]+${PER_UNIT_IN_WORDS}))(watt|joule|kWh|kilowatt-hour|kilowatt|kW|megajoule|MJ|unit|W|J)s?(?!\p{L})`,
  'iuy',
);
/** The unit named after "for every": what one of it is, as a quantity (none for a bare "unit"). */
export const PER_UNIT_QUANTITY: Record<string, { kind: 'power' | 'energy'; quantity: string }> = {
  watt: { kind: 'power', quantity: '1 W' },
  w: { kind: 'power', quantity: '1 W' },
  kilowatt: { kind: 'power', quantity: '1 kW' },
  kw: { kind: 'power', quantity: '1 kW' },
  joule: { kind: 'energy', quantity: '1 J' },
  j: { kind: 'energy', quantity: '1 J' },
  kwh: { kind: 'energy', quantity: '1 kWh' },
  'kilowatt-hour': { kind: 'energy', quantity: '1 kWh' },
  megajoule: { kind: 'energy', quantity: '1 MJ' },
  mj: { kind: 'energy', quantity: '1 MJ' },
};
/** Multiples in words: "twice the energy it consumes", "three-fold its input". */
export const MULTIPLE_WORD_RE = /(?<!\p{L})(half|twice|double|triple|thrice|quadruple|two-?fold|three-?fold|four-?fold|five-?fold|ten-?fold)(?!\p{L})/giu;
export const MULTIPLE_VALUE: Record<string, number> = { half: 0.5, twice: 2, double: 2, triple: 3, thrice: 3, quadruple: 4, twofold: 2, threefold: 3, fourfold: 4, fivefold: 5, tenfold: 10 };
/** "a power gain of 2.4": only over an input, or in a text about free energy (not an amplifier's gain in dB). */
const POWER_GAIN_BEFORE_RE = /(?<!\p{L})(?:power|energy)[^\S\n]+gain(?:[^\S\n]*(?:[=:]|of|is|was|reaching|about|around|approximately|roughly|near|up to|over|above|exceeding))*[^\S\n]*$/iu;
const OVER_UNITY_WORDS_RE = /(?<!\p{L})(?:over-?unity|free energy|zero-?point|ZPE|vacuum energy|self-?running|perpetual|magnet motor|more energy than)(?!\p{L})/iu;
const RATIO_BEFORE_RE = /(?<!\p{L})(?:over-?unity|overunity|output[- ]to[- ]input|out(?:put)?\/in(?:put)?|output\/input|energy (?:out|return)[- ]to[- ](?:energy )?in(?:put)?)(?:[^\S\n]+(?:ratio|factor|coefficient))?(?:[^\S\n]*(?:[=:≈~]|of|is|was|reaching|about|around|approximately|roughly|near|up to|over|above|exceeding))*[^\S\n]*$/iu;

/** For "60 % more energy out than in": the percentage is added to 1. */
export type PercentReading = { kind: FigureKind; role?: FigureRole; factor: number; unit: string; assumption?: string; more?: boolean; derived?: string; ofInput?: boolean } | null;

/** "60 % more electrical energy out than in", "30 % more power than it draws": a gain of 1 + p (not "30 % more than in May", a comparison with another time). */
const PERCENT_MORE_RE =
  /[^\S\n]*(?:above|over|more than|in excess of|beyond)[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:(?:electrical|electric)[^\S\n]+)?(?:input|consumption|power in|energy in|supply)(?!\p{L})|[^\S\n]*(?:more|extra|excess|surplus|additional)[^\S\n]+(?:(?:electrical|electric|useful|mechanical|thermal)[^\S\n]+)?(?:energy|power|output|heat|work|electricity)?[^\S\n]*(?:out[^\S\n]+)?(?:than|over|above|beyond)[^\S\n]+(?:(?:it|the|its)[^\S\n]+)?(?:[\p{L}\d.,-]+[^\S\n]+){0,4}?(?:in(?![^\S\n]+(?:the|a|an|last|previous|prior|earlier|our|my|their|his|her|this|that|those|these|each|every|any|other|winter|summer|spring|autumn|January|February|March|April|May|June|July|August|September|October|November|December|Jan|Feb|Mar|Apr|Jun|Jul|Aug|Sept?|Oct|Nov|Dec|\d+)(?!\p{L}))|input|takes|uses|consumes|draws|is fed|goes in|consumption|supply|supplied|is given|receives|gets)(?!\p{L})|[^\S\n]*(?:more|extra)[^\S\n]+than[^\S\n]+(?:that|this|it)(?!\p{L})/iuy;

/** "70 % of the Carnot efficiency": a share of the bound, made an efficiency once the temperatures are known. */
const CARNOT_SHARE_AFTER_RE = /[^\S\n]*of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:Carnot|ideal Carnot|reversible)(?:[^\S\n]+(?:efficiency|limit|bound|value|maximum|figure))?(?!\p{L})/iuy;
export const CARNOT_SHARE = 'a share of the Carnot efficiency';

/** A heat engine named. */
const ENGINE_NAMED_RE = /(?<!\p{L})(?:engines?|turbines?|Stirling|power (?:plants?|stations?))(?!\p{L})/iu;

/** What a percentage is, by its context. */
/** In a sheet's label: a bracketed test point and leader dots. */
const LABEL_FILLER_RE = /\([^()\n]{0,20}\)|\.{2,}|…+|@[^\S\n]*[-−+]?\d[\d.,]*[^\S\n]*[^\s\d|]{0,5}|(?<![\p{L}\p{N}])[ABW][-−]?\d{1,2}\/W\d{2}(?![\p{L}\p{N}])|(?<!\p{L})(?:[Rr]uns?|Table|Fig\.?|Figure|[Ss]ample|[Tt]est|[Mm]odule|[Pp]oint|[Dd]ay|[Ss]eries|Eq\.?)[^\S\n]*[A-Z]?\d+[a-z]?(?![\p{L}\p{N}.,])/gu;
/** A compressor or a refrigerant named (a machine that moves heat). */
const COMPRESSOR_OR_REFRIGERANT_RE = /(?<!\p{L})(?:compressors?|refrigerants?|R-?(?:32|290|410A|407C|134a|744|1234\w+|454B|513A))(?!\p{L})/iu;
/** A heating output or capacity named. */
const HEATING_OUTPUT_RE = /(?<!\p{L})(?:heating (?:output|capacity|power)|heat output|flow water|flow temperature)(?!\p{L})/iu;

/** A heat pump or its parts said to be absent: "no outdoor unit", "without a heat pump", "not a heat pump". */
const NO_HEAT_PUMP_PARTS_RE = /(?<!\p{L})(?:no|without(?:[^\S\n]+an?)?|not[^\S\n]+an?|nor[^\S\n]+an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:outdoor[^\S\n]+units?|heat[- ]pumps?|compressors?|refrigerants?|evaporators?)(?!\p{L})/giu;

/** A power or an energy written in figures: the number, its prefix and its unit ("31 W", "1.1 kWh", "4,2 MJ"). */
const POWER_OR_ENERGY_WRITTEN_RE = /(?<![\p{L}\d.,])(\d+(?:[.,]\d+)?)[^\S\n]?([mkMG]?)(W|Wh|J)(?![\p{L}\d])/gu;
const PREFIX: Record<string, number> = { '': 1, m: 1e-3, k: 1e3, M: 1e6, G: 1e9 };

/**
 * "… 12 A at 11 V into the load. That's 131 % by my sums", "took 1.1 kWh and delivered 2.4 kWh — a net
 * gain of 1.3 kWh, or 218 %": a percentage that is, to its last written digit, one of two powers (or two
 * energies) said just before it over the other — the claimant's own ratio of output to input, whatever
 * words go with it. (Within the percentage's sentence and the one before, in its paragraph; two figures
 * of the same unit; a ratio other than 1.)
 */
function ratioOfFiguresBefore(text: string, start: number, written: string, value: number): boolean {
  if (!(value > 0) || value === 100) return false;
  // (Not a share said as more or an excess: "4.2 W more heat than the 20 W it draws: 21 % excess".)
  if (/^[^\S\n]*(?:%|per[^\S\n]?cent|percent)?[^\S\n]*(?:of[^\S\n]+)?(?:excess|more|extra|surplus|gain|above|over[^\S\n]+(?:the|its|input|what|unity|parity)|higher|greater|less|lower|loss|losses|lost|of[^\S\n]+(?:the|its|that))(?!\p{L})/iu.test(text.slice(start + written.length, start + written.length + 30))) return false;
  let from = Math.max(0, start - 240);
  const para = text.slice(from, start).search(/\n[^\S\n]*\n(?![\s\S]*\n[^\S\n]*\n)/u);
  if (para >= 0) from += para;
  const ends = [...text.slice(from, start).matchAll(/[.!?](?:\s|$)/gu)];
  if (ends.length > 1) from += ends[ends.length - 2].index! + 1;
  // ("a “gain of 70 percent”", "excess ~1.15 W, ~9 %": a share said as a gain or an excess is over the input.)
  if (/(?<!\p{L})(?:gain|excess|surplus|increase|profit)[^\S\n]*(?:of|:|=|is|was)?[^\S\n]*[\p{Pi}"'“]?[^\S\n]*(?:about|roughly|some|~|≈)?[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 30), start))) return false;
  const figures = [...text.slice(from, start).matchAll(POWER_OR_ENERGY_WRITTEN_RE)].map((m) => {
    const at = from + m.index!;
    // (A figure said as an excess is no side of the ratio: "excess ~1.15 W", "300 W excess heat".)
    const excess =
      /^[^\S\n]*(?:of[^\S\n]+)?(?:excess|extra|surplus|more|net|over[^\S\n]+(?:the|its)|gain|above)(?!\p{L})/iu.test(text.slice(at + m[0].length, at + m[0].length + 20)) ||
      /(?<!\p{L})(?:excess|surplus|gain|net|extra)[^\S\n]*(?:of|:|=|is|was)?[^\S\n]*(?:about|roughly|some|~|≈)?[^\S\n]*$/iu.test(text.slice(Math.max(0, at - 25), at));
    return { si: Number(m[1].replace(',', '.')) * PREFIX[m[2]], unit: m[3] === 'J' ? 'J' : m[3], excess };
  });
  if (figures.length < 2 || figures.length > 4) return false;
  const m = /\d+(?:[.,](\d+))?/u.exec(written);
  const half = (m?.[1] ? 10 ** -m[1].length : 1) / 2;
  const tol = Math.max(half, 0.005 * value);
  for (const a of figures) {
    for (const b of figures) {
      if (a === b || a.excess || b.excess || a.unit !== b.unit || !(b.si > 0) || a.si === b.si) continue;
      if (Math.abs((100 * a.si) / b.si - value) <= tol) return true;
    }
  }
  return false;
}

export function readPercent(text: string, start: number, end: number, floor: number, num?: string): PercentReading {
  // 'at "about 29 %" efficiency': the words after a closing quote.
  end += /^["”’'»]*/u.exec(text.slice(end, end + 3))![0].length;
  CARNOT_SHARE_AFTER_RE.lastIndex = end;
  if (CARNOT_SHARE_AFTER_RE.test(text)) return { kind: 'efficiency', factor: 0.01, unit: '', derived: CARNOT_SHARE };
  SPEED_OF_LIGHT_AFTER_RE.lastIndex = end;
  const light = SPEED_OF_LIGHT_AFTER_RE.exec(text);
  if (light) return { kind: 'speed', factor: C_M_PER_S / 100, unit: 'm/s' };
  // (A sheet's label: "Heating efficiency (A2/W35) ............ 380 %" — the rating point and the leader dots are no words of it.)
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start).replace(LABEL_FILLER_RE, ' ');
  // "a coefficient of performance of 380 %", "COP: 420 %": a COP written as a percentage.
  if (COP_SYMBOL_BEFORE_RE.test(before) || COP_WORDS_BEFORE_RE.test(before)) {
    const cooling = COOLING_MACHINE_RE.test(text) && !HEAT_PUMP_RE.test(text);
    return { kind: 'cop', role: cooling ? 'cooling' : 'heating', factor: 0.01, unit: '', assumption: `A coefficient of performance written as a percentage: read as a ${cooling ? 'cooling' : 'heating'} COP.` };
  }
  // ("a cooling efficiency of 45 %" of a thermoelectric cooler): a cooler's "efficiency" of cooling is the heat
  // it draws out over the work it takes, a cooling COP, whatever its size.
  if (/(?<!\p{L})(?:cooling|refrigerat(?:ing|ion)|chilling)[- ]efficiency(?:[^\S\n]+(?:of|is|was|at|=|:)|[^\S\n]*[:=])?[^\S\n]*(?:(?:about|around|roughly|some|only|just|nearly|~|≈)[^\S\n]*)?[\p{Pi}"“']?[^\S\n]*$/iu.test(before) && COOLING_MACHINE_RE.test(text)) {
    return { kind: 'cop', role: 'cooling', factor: 0.01, unit: '', assumption: "A cooler's cooling efficiency written as a percentage: read as a cooling COP (heat drawn out over work put in)." };
  }
  QE_AFTER_RE.lastIndex = end;
  const qe = QE_BEFORE_RE.exec(before);
  // ("two electrons per photon, and its power conversion efficiency is 130 %": another efficiency named between
  // the particle count and the figure is the figure's.)
  const otherEfficiency = qe !== null && /(?<!\p{L})(?:power|energy|wall-?plug|conversion|electrical|luminous|overall|system)[- ](?:conversion[- ])?efficiency(?!\p{L})/iu.test(qe[1]);
  if (QE_AFTER_RE.test(text) || (qe && !EFFICIENCY_CHANGE_RE.test(qe[1]) && !otherEfficiency)) return { kind: 'quantum-efficiency', factor: 0.01, unit: '' };
  PERCENT_OF_INPUT_RE.lastIndex = end;
  if (PERCENT_OF_INPUT_RE.test(text) && !QE_BEFORE_RE.test(before)) {
    // "A heat-pump dryer gives 250 % of its electrical input as heat": a heating COP.
    if (HEAT_PUMP_RE.test(text) && !COOLING_MACHINE_RE.test(text.replace(HEAT_PUMP_RE, '')) && /(?<!\p{L})(?:heat|warmth|heating)(?!\p{L})/iu.test(sentenceAround(text, start, end))) {
      return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: "A heat pump's heat out as a percentage of its work in: read as a heating COP." };
    }
    return { kind: 'efficiency', factor: 1, unit: '%', ofInput: true };
  }
  // ("Cycle 1; E_in 1.02 kWh; E_out 0.83 kWh; Returned 81 %": a store's column of what it gave back.)
  if (RETURNED_LABEL_RE.test(before) && !HEAT_PUMP_RE.test(text)) return { kind: 'efficiency', factor: 0.01, unit: '' };
  PERCENT_MORE_RE.lastIndex = end;
  if (PERCENT_MORE_RE.test(text)) return { kind: 'efficiency', factor: 0.01, unit: '', more: true };
  if (/(?<!\p{L})(?:output|out|production|yield)[^.;!?\n]{0,40}(?:exceeds?|exceeding|surpass\w*|is higher than|is greater than|beats?|tops?)[^.;!?\n]{0,40}(?:input|consumption|supply)[^.;!?\n]{0,15}?by[^\S\n]*(?:about|some|roughly|nearly|over|fully)?[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 120), start))) {
    return { kind: 'efficiency', factor: 0.01, unit: '', more: true };
  }
  EFFICIENCY_AFTER_RE.lastIndex = end;
  PERCENT_OF_HEAT_RE.lastIndex = end;
  SHARE_AS_WORK_RE.lastIndex = end;
  PV_CELL_AFTER_RE.lastIndex = end;
  const efficientSaid = EFFICIENCY_AFTER_RE.test(text);
  // ("turn 9 % of your radiator's heat into electricity": a share of heat made work, an engine's whatever radiator is named.)
  const heatToWork = PERCENT_OF_HEAT_RE.test(text) || SHARE_AS_WORK_RE.test(text) || percentOfHeatThrough(text, end);
  const after = efficientSaid || heatToWork || PV_CELL_AFTER_RE.test(text);
  // (A clause set off by commas may take the efficiency word further back than the usual window.)
  // (A model's name between the word and the figure is no figure of its own: "The electrical efficiency of
  // the Ardoise S2 is 31 %", "efficiency of the GS-12 was 42 %".)
  const m = EFFICIENCY_PERCENT_BEFORE_RE.exec(maskModelNames(before)) ?? EFFICIENCY_PERCENT_BEFORE_RE.exec(maskModelNames(text.slice(Math.max(floor, start - BEFORE_WINDOW - 90), start)));
  // "Ammonia–water cycle engine, 19 % at a 120 °C heat source": a percentage said right after a heat
  // engine named, with a temperature in the same sentence, is its efficiency.
  const engineSaid =
    /(?<!\p{L})(?:engines?|turbines?|Stirling|thermoelectric (?:generators?|modules?)|TEGs?|power (?:plants?|stations?|cycles?)|(?:Rankine|Brayton|ORC|steam|Kalina) cycles?)[^\S\n]*[,:–—-]?[^\S\n]*(?:(?:at|of|reaches|reached|achieves|achieved|claims|claimed|with|about|around|roughly|only|just)[^\S\n]+)*$/iu.test(before) &&
    /°|kelvin|degrees|Celsius|Fahrenheit|(?<!\p{L})K(?!\p{L})/iu.test(sentenceAround(text, start, end));
  // "Brake 1.85 kW; heat in 6.9 kW → 27 %", "7.8 W electrical from ~150 W passing through it → 5.2 %": a
  // percentage worked out from the two powers said just before it, in a log's shorthand.
  const line = text.slice(Math.max(text.lastIndexOf('\n', start - 1) + 1, start - 160), start);
  const worked = /(?:→|->|=>|⇒|=)[^\S\n]*(?:(?:about|approx\.?|~|≈|ca\.?)[^\S\n]*)?$/u.test(line) && (line.match(/\d[^\S\n]*(?:[kMG]?W|[kMG]?Wh|[kMG]?J)(?![\p{L}\d])/gu) ?? []).length >= 2;
  // ("the conversion efficiency from heat passing through the module to electrical output is 6.5 %": what it
  // converts from and to, said between the word and the figure.)
  const fromTo = /(?<!\p{L})efficiency[^\S\n]+from[^\S\n]+[^\d.;!?\n]{3,110}?[^\S\n]+to[^\S\n]+[^\d.;!?\n]{3,60}?[^\S\n]+(?:is|was|of|=|:)[^\S\n]*(?:(?:about|around|roughly|some|only|just|~|≈)[^\S\n]*)?$/iu.test(text.slice(Math.max(floor, start - 200), start));
  // ("'How much of the heat becomes electricity?' About 11 %.": the answer to a question of efficiency.)
  const answered = /(?:efficien\w*|how[^\S\n]+much[^\S\n]+of[^\S\n]+(?:the[^\S\n]+|its[^\S\n]+)?(?:heat|fuel|energy|light|sunlight|power|input)(?!\p{L})[^?\n]{0,60})\?[^\S\n]*['’"”]?[^\S\n]*\n+[^\S\n]*(?:(?:A|Answer)[^\S\n]*[:.)][^\S\n]*)?(?:(?:yes|no|well|so)[,.!]?[^\S\n]+)?(?:(?:about|around|roughly|some|only|just|nearly|almost|approximately|~|≈)[^\S\n]*)?$/iu.test(text.slice(Math.max(floor, start - 240), start));
  // ("That's 131 % by my sums" after 100.8 W in and 132 W out: the claimant's own ratio of the two.)
  const ratioSaid = () => ratioOfFiguresBefore(text, start, text.slice(start, end), num !== undefined ? Number(num) : Number((/^[\d.,]+/.exec(text.slice(start, end))?.[0] ?? '').replace(',', '.')));
  const efficiency = after || engineSaid || fromTo || answered || (m !== null && !EFFICIENCY_CHANGE_RE.test(m[1].replace(/,[^,\n]{3,140},/u, ' '))) || worked || ratioSaid();
  if (!efficiency) return bareHeatPumpPercent(text, start, end, num);
  // ("95 % AFUE", "AFUE: 96 %": an annual fuel utilisation efficiency is a fuel burner's by definition,
  // whatever heat pump the text also names.)
  if (/^[^\S\n]*[\p{Pi}\p{Pf}"']?[^\S\n]*AFUE(?!\p{L})/u.test(text.slice(end, end + 12)) || /(?<!\p{L})AFUE[^\S\n]*(?:\([^)\n]{0,20}\))?[^\S\n]*(?:[:=]|of|is|was|rating(?:[^\S\n]+of)?)?[^\S\n]*$/u.test(before)) return { kind: 'efficiency', factor: 1, unit: '%' };
  // The machine is named anywhere in the claim ("Had our air-to-water unit fitted. … '350 % efficient'") —
  // unless the percentage's own paragraph is of another machine (a motor and generator set, a circuit) and
  // has no word of heat: in a report on several stands or bids, a heat pump elsewhere is not this one.
  const sentence = paragraphOfAnotherMachine(text, start, end) ?? text;
  // (The number as read, which may have been written in words: "three hundred and fifty percent".)
  const value = num !== undefined ? Number(num) : Number((/^[\d.,]+/.exec(text.slice(start, end))?.[0] ?? '').replace(',', '.'));
  // (Not where the percentage's own sentence names an engine and no heat pump: "the marine engine is
  // '52 % efficient'", in a text that mentions a heat pump's percentage by contrast.)
  const own = sentenceAround(text, start, end);
  // (Nor a conversion efficiency at most 100 %: "a conversion efficiency of 45 % of the heat taken from the
  // pond" is an engine's, whatever radiator the text names.)
  const engineHere =
    (heatToWork && value <= 100 && /(?<!\p{L})(?:electricity|electrical|work|power)(?!\p{L})/iu.test(text.slice(end, end + 90))) ||
    (ENGINE_NAMED_RE.test(own) && !HEAT_PUMP_RE.test(own)) ||
    (value <= 100 && /(?<!\p{L})(?:conversion|thermal|electrical|cycle|net|gross|brake) efficiency[^.;!?\n]{0,25}$/iu.test(text.slice(Math.max(0, start - 60), start)));
  // (A boiler's text names radiators and flow temperatures too: those words alone name no heat pump there.)
  const burnerOnly = BURNER_RE.test(text) && !NAMED_HEAT_PUMP_RE.test(sentence);
  // (A sheet that names a compressor or a refrigerant and a heating output describes a heat pump, whatever its name.)
  // ("no compressor, no outdoor unit": said to be absent.)
  const named = sentence.replace(/(?<!\p{L})(?:no|without(?:[^\S\n]+an?)?|not[^\S\n]+an?)[^\S\n]+(?:[\p{L}-]+[^\S\n]+)?(?:compressors?|refrigerants?)(?!\p{L})/giu, ' ');
  // (Heat pumps spoken of in general, or set against the device, name no heat pump here: "Heat pumps are
  // routinely described as more than 100 % efficient, and we see no reason why a solid-state emitter …".)
  // ("no outdoor unit, no refrigerant": a heat pump's parts said to be absent name none.)
  // (Where the text says the heat pump's parts are absent and names none, its radiators or flow temperature
  // are a heater's.)
  const deniedPump = new RegExp(NO_HEAT_PUMP_PARTS_RE.source, 'iu').test(text) && !NAMED_HEAT_PUMP_RE.test(text.replace(NO_HEAT_PUMP_PARTS_RE, ' '));
  const heatPump = (!deniedPump && HEAT_PUMP_RE.test(sentence.replace(GENERIC_HEAT_PUMPS_RE, ' ').replace(NO_HEAT_PUMP_PARTS_RE, ' '))) || (COMPRESSOR_OR_REFRIGERANT_RE.test(named) && HEATING_OUTPUT_RE.test(sentence) && !BURNER_RE.test(sentence));
  // ("A new oil boiler would have cost least to fit, about 92 % efficient", in a text on the heat pump
  // chosen instead: the percentage's own sentence names a burner and no heat pump — a burner's efficiency.)
  const burnerHere = value <= 100 && BURNER_RE.test(own) && !NAMED_HEAT_PUMP_RE.test(own) && !HEAT_PUMP_RE.test(own);
  if (!engineHere && !burnerOnly && !burnerHere && heatPump && !COOLING_MACHINE_RE.test(sentence.replace(HEAT_PUMP_RE, ''))) {
    if (!(value <= 100)) return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: 'A heat pump said to be more than 100 % efficient: read as a heating COP (heat delivered over work put in).' };
    return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: 'A heat pump\'s percentage read as a heating COP (heat delivered over work put in).' };
  }
  // "three hundred and fifty percent efficient … that number is the heating COP", "in cooling mode it
  // is 300 % efficient": a machine that moves heat, whatever it is called.
  const moves = value > 100 ? MOVES_HEAT_RE.exec(sentence) : null;
  if (moves) {
    const role = /cool/i.test(moves[1] ?? moves[2] ?? moves[3]) ? 'cooling' : 'heating';
    return { kind: 'cop', role, factor: 0.01, unit: '', assumption: `More than 100 % "efficient" where the text speaks of ${role}: read as a ${role} COP (heat moved over work put in).` };
  }
  // ("The 380 % on the commissioning sheet is not an efficiency … It is the coefficient of performance, 3.8":
  // the text itself says what the percentage is.)
  // (Said of the same percentage anywhere in the text: a subject line's "380 % efficiency??" answered below.)
  const sameSaid = value > 100 && [...text.matchAll(new RegExp(`(?<![\\d.,])${String(value).replace('.', '[.,]')}[^\\S\\n]*(?:%|per[^\\S\\n]?cent)`, 'giu'))].some((x) => SAID_TO_BE_COP_RE.test(text.slice(x.index! + x[0].length, x.index! + x[0].length + 200)));
  if (value > 100 && (SAID_TO_BE_COP_RE.test(text.slice(end, end + 300)) || sameSaid)) {
    const cooling = COOLING_MACHINE_RE.test(text) && !/(?<!\p{L})(?:heat(?:ing)?|warm\w*|radiators?)(?!\p{L})/iu.test(text);
    return { kind: 'cop', role: cooling ? 'cooling' : 'heating', factor: 0.01, unit: '', assumption: `The text says the percentage is a coefficient of performance: read as a ${cooling ? 'cooling' : 'heating'} COP.` };
  }
  if (COOLING_MACHINE_RE.test(sentence) && value > 100) {
    return { kind: 'cop', role: 'cooling', factor: 0.01, unit: '', assumption: 'A refrigerator or air conditioner said to be more than 100 % efficient: read as a cooling COP (heat drawn out over work put in).' };
  }
  return { kind: 'efficiency', factor: 1, unit: '%' };
}

/** After a percentage: what makes it no COP — a share, a change, a price ("150 % of the cost", "20 % cheaper"). */
const NOT_A_COP_AFTER_RE =
  /^[^\S\n]*(?:\?|of|more|less|higher|lower|cheaper|dearer|better|worse|increase|rise|jump|growth|gain|saving|savings|reduction|return|ROI|up|down|faster|slower|bigger|larger|smaller|greater|humidity|RH|APR|interest|margin|markup|mark-up|over[^\S\n]+(?:the|last|budget))(?!\p{L})/iu;
/** Before a percentage: a change, a price, a rate of money ("up by 120 %", "prices rose 150 %"). */
const NOT_A_COP_BEFORE_RE =
  /(?<!\p{L})(?:by|increase[sd]?(?:[^\S\n]+of)?|rise[sn]?(?:[^\S\n]+of)?|rose|grew|jumped|fell|dropped|cut|saving(?:[^\S\n]+of)?|up|down|costs?|prices?|tax|VAT|return|ROI|interest|margin|tariff|bills?|over[^\S\n]+budget)[^\S\n]*(?:(?:about|around|roughly|some|nearly|over|almost)[^\S\n]+)?$/iu;

/**
 * "The installer reckons it'll do somewhere between 300 and 350 % over the winter", "our ground source heat
 * pump's monitor says 510 % this week": a percentage above 100 % said bare, with no word of efficiency, in a
 * text on a heat pump (and no other machine that moves heat) is what heat pumps are quoted by — a heating COP.
 */
function bareHeatPumpPercent(text: string, start: number, end: number, num?: string): PercentReading {
  const value = num !== undefined ? Number(num) : Number((/^[\d.,]+/.exec(text.slice(start, end))?.[0] ?? '').replace(',', '.'));
  if (!(value > 100 && value <= 1000)) return null;
  if (!NAMED_HEAT_PUMP_RE.test(text) || COOLING_MACHINE_RE.test(text.replace(HEAT_PUMP_RE, ' ')) || BURNER_RE.test(sentenceAround(text, start, end))) return null;
  if (new RegExp(NO_HEAT_PUMP_PARTS_RE.source, 'iu').test(text)) return null;
  if (NOT_A_COP_AFTER_RE.test(text.slice(end, end + 25)) || NOT_A_COP_BEFORE_RE.test(text.slice(Math.max(0, start - 30), start))) return null;
  return { kind: 'cop', role: 'heating', factor: 0.01, unit: '', assumption: 'A percentage above 100 % said of a heat pump with no word of what it measures: read as a heating COP (heat delivered over work put in).' };
}

/** A model's designation, capital letters with digits ("S2", "GS-12", "Mk3"), with its digits made letters. */
const maskModelNames = (s: string): string => s.replace(/(?<![\p{L}\p{N}.,])(\p{Lu}[\p{L}]*-?)(\d+)(?=[^\S\n]+(?:is|was|are|were|has|had|reaches|reached|achieves|achieved|of|at|came|comes|runs|ran|gives|gave|rated)(?!\p{L}))/gu, (_, a: string, d: string) => a + 'x'.repeat(d.length));

/** A sentence on heat pumps in general ("Heat pumps are routinely described as …", "Like heat pumps, …") or one set against them ("unlike a heat pump"). */
const GENERIC_HEAT_PUMPS_RE =
  /(?:^|(?<=[.!?]["”’)]*\s+))(?:(?:like|as with)[^\S\n]+)?(?:(?:modern|most|all|many|ordinary|conventional|domestic)[^\S\n]+)?heat[- ]pumps[^\S\n]+(?:are|can|have|routinely|often|commonly|typically|usually|normally|may|do|reach|achieve|get)(?!\p{L})[^.!?]*[.!?]?|(?<!\p{L})unlike[^\S\n]+(?:a[^\S\n]+|the[^\S\n]+)?heat[- ]pumps?(?!\p{L})/giu;

/** Words of a machine that moves heat: "heating COP", "COP in cooling", "in heating mode". */
const MOVES_HEAT_RE = /(?<!\p{L})(heating|cooling)[^\S\n]+(?:COP|C\.O\.P\.|coefficient of performance)(?!\p{L})|(?<!\p{L})(?:COP|coefficient of performance)[^\S\n]+(?:for|in|when|of)[^\S\n]+(heating|cooling)(?!\p{L})|(?<!\p{L})(heating|cooling)[^\S\n]+mode(?!\p{L})/iu;

/** After a percentage: the text says what it is, "it is the coefficient of performance", "that figure is the COP". */
const SAID_TO_BE_COP_RE = /(?<!\p{L})(?:it|this|that|the[^\S\n]+(?:figure|number|percentage|value))(?:[^\S\n]+(?:is|was)|['’]s)[^\S\n]+(?:really[^\S\n]+|simply[^\S\n]+|actually[^\S\n]+)?(?:the|a|its)[^\S\n]+(?:(?:heating|cooling|seasonal)[^\S\n]+)?(?:coefficient[^\S\n]+of[^\S\n]+performance|COP)(?!\p{L})/iu;

/** The kind of a bare number, from the words before it; a gain or ratio from the words after. */
/** Just before a figure as it was printed, given or stated: "was printed as", "is given as". */
const PRINTED_AS_BEFORE_RE = /(?<!\p{L})(?:was|were|is|are|had been|has been)[^\S\n]+(?:printed|given|stated|reported|quoted|shown|typeset)[^\S\n]+as[^\S\n]*$/iu;
/** Where the sentence of a place starts. */
function sentenceStart(text: string, at: number): number {
  const m = /[\s\S]*(?:[.!?]["”’')\]]*\s|\n)/u.exec(text.slice(0, at));
  return m ? m[0].length : 0;
}

/** After a number: the things it counts ("six units", "12 houses", "three of the machines"). */
const COUNTED_AFTER_RE = /^[^\S\n]+(?:of[^\S\n]+the[^\S\n]+)?(?:[\p{L}-]+[^\S\n]+)?(?:units(?![^\S\n]+(?:of|for|back|out|per|in|returned|delivered|produced|to)(?!\p{L}))|houses|homes|flats|buildings|machines|models|devices|prototypes|sites|customers|households|people|students|tests|trials|samples|sessions|rows|columns|pages)(?!\p{L})(?![^\S\n]+(?:of|for)[^\S\n]+(?:every|each|one)(?!\p{L}))/iu;

export function bareKind(text: string, start: number, end: number, floor: number): { kind: FigureKind; role?: FigureRole; derived?: string; factor?: number } | null {
  // (A sheet's label: "COP (B0/W35) ........ between 4.3 and 4.7" — the rating point and the leader dots are no words of it.)
  const before = text.slice(Math.max(floor, start - BEFORE_WINDOW), start).replace(LABEL_FILLER_RE, ' ');
  // An operand of a worked division or product ("η = 3.1/172 = 0.018"): a step, not a figure; the
  // result after "=" is read.
  if (/^[^\S\n]*[/×*÷][^\S\n]*\d/u.test(text.slice(end, end + 6)) || /\d[^\S\n]*[/×*÷][^\S\n]*$/u.test(before)) return null;
  // "COP alone: 12,000 BTU/h per ton ÷ 620 W per ton ≈ 5.7": a number with a unit of energy or power after
  // it is a term of the sum, not the ratio.
  if (/^[^\S\n]*(?:BTU|Btu|W|kW|MW|J|kJ|MJ|Wh|kWh|tons?)(?![\p{L}\d])/u.test(text.slice(end, end + 8))) return null;
  // "the heating COP of the six units lay between 3.8 and 4.4": a count of things, not the figure.
  if (/(?<!\p{L})(?:the|these|those|all|our|its|their|your|its)[^\S\n]+$/iu.test(text.slice(Math.max(0, start - 8), start)) && COUNTED_AFTER_RE.test(text.slice(end, end + 30))) return null;
  // "ΔT = 0", "a temperature difference of 0": no difference at all, in any unit.
  // (Only in a text of one temperature: beside another difference or two temperatures — "at ΔT = 0 no
  // engine works; ours runs across 150 K" — it is said of the bound, not of the device.)
  if (
    /^0+(?:\.0+)?$/u.test(text.slice(start, end)) &&
    /(?:ΔT|∆T|(?<!\p{L})delta[- ]?T|temperature[^\S\n]+difference)[^\S\n]*(?:=|:|of|is|was)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 30), start)) &&
    new Set([...text.matchAll(/(-?\d[\d.,]*)[^\S\n]*(?:°[^\S\n]*[CF]|K(?!\p{L})|kelvin|degrees)/giu)].map((x) => x[0].replace(/\s+/gu, ''))).size <= 1
  )
    return { kind: 'temperature-difference' };
  // "about 0.97 of the speed of light": a speed as a fraction of c.
  SPEED_OF_LIGHT_AFTER_RE.lastIndex = end;
  // ("a tenth of the speed of light": the fraction in words took its "of" with it.)
  // ("within 1 part in 10^20 of light speed": a closeness, no speed.)
  if (/(?<!\p{L})parts?[^\S\n]+(?:in|per)[^\S\n]*$/iu.test(text.slice(Math.max(0, start - 12), start))) return null;
  if (SPEED_OF_LIGHT_AFTER_RE.test(text) || (/of$/iu.test(text.slice(start, end)) && /^[^\S\n]+(?:the[^\S\n]+)?(?:speed|velocity)[^\S\n]+of[^\S\n]+light(?!\p{L})/iu.test(text.slice(end, end + 30)))) return { kind: 'speed', factor: C_M_PER_S };
  // (A clause set off by commas may take the COP further back than the usual window.)
  const wide = text.slice(Math.max(floor, start - BEFORE_WINDOW - 160), start);
  if (COP_SYMBOL_BEFORE_RE.test(before) || COP_WORDS_BEFORE_RE.test(before) || COP_SYMBOL_BEFORE_RE.test(wide) || COP_WORDS_BEFORE_RE.test(wide)) return { kind: 'cop' };
  // ("Heat at a coefficient of 4.8", of a heat pump named in its paragraph: its COP, the trade's short form.
  // A coefficient of anything named — of friction, of drag — has its name between.)
  if (/(?<!\p{L})coefficient[^\S\n]+of[^\S\n]+(?:(?:about|around|roughly|some|nearly|up[^\S\n]+to)[^\S\n]+)?$/iu.test(before) && HEAT_PUMP_RE.test(text.slice(Math.max(text.lastIndexOf('\n', start) + 1, start - 400), Math.min(text.length, end + 200)))) return { kind: 'cop' };
  // "Measured COP of the brine-to-water prototype over the six-week trial: between 3.2 and 3.8": a caption
  // or a line that names the COP before its colon.
  if (/^[^.;!?\n]{0,30}?(?<!\p{L})(?:COPs?|coefficients?[^\S\n]+of[^\S\n]+performance)(?!\p{L})[^:;!?\n]{0,100}:[^\S\n]*(?:(?:between|about|approx\.?|around|roughly|ca\.?|~|≈)[^\S\n]*)?$/u.test(text.slice(sentenceStart(text, start), start))) return { kind: 'cop' };
  // "The mean heating COP of the units at the rating point (…) was printed as 0.30": the subject of the
  // sentence names what a printed, given or stated figure is.
  if (PRINTED_AS_BEFORE_RE.test(text.slice(Math.max(0, start - 30), start))) {
    const subject = text.slice(sentenceStart(text, start), Math.min(start, sentenceStart(text, start) + 80));
    if (/(?<!\p{L})(?:COP|coefficient of performance)(?!\p{L})/u.test(subject)) return { kind: 'cop', role: /cooling/iu.test(subject) ? 'cooling' : /heating/iu.test(subject) ? 'heating' : undefined };
    if (/(?<!\p{L})efficiency(?!\p{L})/iu.test(subject)) return { kind: 'efficiency' };
  }
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
  // "the meter shows a gain of 1.3, out/in": a gain said to be output over input.
  if (/(?<!\p{L})gain(?:[^\S\n]*(?:[=:]|of|is|was|about|around|roughly|approximately))*[^\S\n]*$/iu.test(before) && /^[^\S\n]*[,(;]?[^\S\n]*(?:out(?:put)?[^\S\n]*\/[^\S\n]*in(?:put)?|out(?:put)?[^\S\n]+(?:over|to)[^\S\n]+in(?:put)?)(?!\p{L})/iu.test(text.slice(end, end + 30))) {
    return { kind: 'efficiency', derived: 'a gain of output over input' };
  }
  GAIN_AFTER_RE.lastIndex = end;
  if (GAIN_AFTER_RE.test(text)) return { kind: 'efficiency', derived: 'units out for each unit in' };
  // "returns 3 units of energy for every 4 it takes", "0.92 units of electricity and heat for every unit of fuel".
  GAIN_FOR_EVERY_RE.lastIndex = end;
  const every = GAIN_FOR_EVERY_RE.exec(text);
  if (every) {
    const per = every[1] === undefined ? 1 : (SMALL_NUMBER[every[1].toLowerCase()] ?? Number(every[1]));
    if (per > 0) return { kind: 'efficiency', factor: 1 / per, derived: per === 1 ? 'units out for each unit in' : `units out for every ${every[1]} in` };
  }
  GAIN_BARE_FOR_EVERY_RE.lastIndex = end;
  const bare = GAIN_BARE_VERB_RE.test(text.slice(Math.max(floor, start - 40), start)) ? GAIN_BARE_FOR_EVERY_RE.exec(text) : null;
  if (bare) {
    const per = SMALL_NUMBER[bare[1].toLowerCase()] ?? (/^one$/iu.test(bare[1]) ? 1 : Number(bare[1]));
    if (per > 0) return { kind: 'efficiency', factor: 1 / per, derived: per === 1 ? 'units out for each unit in' : `units out for every ${bare[1]} in` };
  }
  PERCENT_OF_HEAT_RE.lastIndex = end;
  if (PERCENT_OF_HEAT_RE.test(text)) return { kind: 'efficiency' };
  if (GAIN_BEFORE_RE.test(text.slice(windowStart(text, start, floor, 160), start))) return { kind: 'efficiency', derived: 'units out for each unit in' };
  TIMES_AFTER_RE.lastIndex = end;
  // ("ten times the voltage it takes in", "100 times the force": a multiple of something that is no energy.)
  const notEnergy = /^[^.;!?\n]{0,25}?(?<!\p{L})(?:voltages?|currents?|forces?|torques?|pressures?|speeds?|velocit(?:y|ies)|intensit(?:y|ies)|brightness|resolution|flow|signals?|amplitudes?|charges?|weights?|loads?)(?!\p{L})/iu.test(text.slice(end, end + 40));
  if (TIMES_AFTER_RE.test(text) && !notEnergy) return { kind: 'efficiency', derived: 'output as a multiple of the input' };
  if (
    !notEnergy &&
    /^[^\S\n]*(?:times|x|×)(?!\p{L})/iu.test(text.slice(end, end + 8)) &&
    TIMES_BEFORE_RE.test(before) &&
    (/input|consum|draw|put in|supplied|takes|uses/i.test(text.slice(end, end + 60)) || /^[^\S\n]*(?:times|x|×)[^\S\n]+(?:that|this)(?!\p{L})/iu.test(text.slice(end, end + 16)))
  ) {
    return { kind: 'efficiency', derived: 'output as a multiple of the input' };
  }
  return null;
}
