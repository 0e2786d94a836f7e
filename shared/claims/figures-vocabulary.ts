/**
 * The vocabulary the figure extractor (figures.ts) reads: the written forms of each unit a claim
 * uses, with the mathjs unit and the kind of figure, and the words that give a figure its role.
 *
 * Symbols are matched with their case ("mW" is not "MW"); words in any case, with a space or a
 * hyphen between their parts ("kilowatt-hours", "kilowatt hours"). Where mathjs has no unit for a
 * form (it has no calorie and no gram-force), `factor` converts the number into `unit`.
 */
import type { FigureKind, FigureRole } from './types';

export interface UnitForm {
  kind: FigureKind;
  /** The unit written in the figure's quantity, in mathjs syntax (parseQuantity reads it). */
  unit: string;
  /** Written forms matched with case, e.g. "kW", "µN", "°C". */
  symbols?: readonly string[];
  /** Written forms matched in any case, e.g. "kilowatts", "pounds of thrust". */
  words?: readonly string[];
  /** When set, the quantity is (number × factor) in `unit`: for forms that mathjs does not know. */
  factor?: number;
  /** "degrees" alone: a temperature only where the sentence speaks of one (not an angle), read as Celsius. */
  ambiguous?: boolean;
}

const MICRO = ['µ', 'μ', 'u'];
const micro = (rest: string) => MICRO.map((m) => m + rest);

/**
 * Calories: mathjs 15 has no calorie, so "cal" is converted here with the thermochemical calorie,
 * 4.184 J exactly (NIST SP 811, Appendix B.8, "calorie_th"); the International Table calorie is
 * 4.1868 J. The thermochemical one is the one of chemistry and of food labels' kilocalories.
 */
export const CALORIE_J = 4.184;

/** Gram-force: mathjs knows kgf (9.80665 N) but not gf, so grams of thrust are written in kgf. */
export const GRAM_IN_KG = 0.001;

/**
 * Metric horsepower (PS, CV, ch): 75 kgf·m/s = 735.498 75 W exactly (NIST SP 811, Appendix B.8,
 * "horsepower, metric"). mathjs's "hp" is the mechanical one, 550 ft·lbf/s ≈ 745.70 W.
 */
export const METRIC_HP_W = 735.49875;

/** The speed of light in vacuum, m/s (exact; SI Brochure, 9th ed.), for "1.3 times the speed of light". */
export const C_M_PER_S = 299_792_458;

export const UNIT_FORMS: readonly UnitForm[] = [
  // Thrust (force)
  { kind: 'thrust', unit: 'N', symbols: ['N'], words: ['newton', 'newtons'] },
  { kind: 'thrust', unit: 'mN', symbols: ['mN'], words: ['millinewton', 'millinewtons', 'milli-newton', 'milli-newtons'] },
  { kind: 'thrust', unit: 'uN', symbols: micro('N'), words: ['micronewton', 'micronewtons', 'micro-newton', 'micro-newtons'] },
  { kind: 'thrust', unit: 'nN', symbols: ['nN'], words: ['nanonewton', 'nanonewtons'] },
  { kind: 'thrust', unit: 'kN', symbols: ['kN'], words: ['kilonewton', 'kilonewtons'] },
  { kind: 'thrust', unit: 'MN', symbols: ['MN'], words: ['meganewton', 'meganewtons'] },
  {
    kind: 'thrust',
    unit: 'lbf',
    symbols: ['lbf'],
    words: [
      'pound-force', 'pounds-force', 'pound of force', 'pounds of force', 'pound of thrust', 'pounds of thrust', 'lb of thrust', 'lbs of thrust',
      'lbf of thrust', 'pound of lift', 'pounds of lift', 'lb of lift', 'lbs of lift', 'pounds of push', 'pounds of pull', 'lbs of force', 'lb of force',
      'pounds thrust', 'lbs thrust', 'lb thrust',
    ],
  },
  {
    kind: 'thrust',
    unit: 'kgf',
    symbols: ['kgf', 'kp'],
    words: [
      'kilogram-force', 'kilograms-force', 'kg of thrust', 'kilogram of thrust', 'kilograms of thrust', 'kg of lift', 'kilogram of lift',
      'kilograms of lift', 'kilos of thrust', 'kilos of lift', 'kg of force', 'kilopond', 'kiloponds',
    ],
  },
  {
    kind: 'thrust',
    unit: 'kgf',
    factor: GRAM_IN_KG,
    symbols: ['gf'],
    words: ['gram-force', 'grams-force', 'g of thrust', 'gram of thrust', 'grams of thrust', 'g of lift', 'gram of lift', 'grams of lift', 'g of force', 'grams of force'],
  },
  { kind: 'thrust', unit: 'kgf', factor: 1e-6, symbols: ['mgf'], words: ['milligram-force', 'milligrams-force', 'mg of thrust', 'milligrams of thrust'] },

  // Power
  // Lower-case symbols as forum posts write them ("500w", "2kw", "12v"); "mw" and "a" stay out: mW or MW, and the article.
  { kind: 'power', unit: 'W', symbols: ['W', 'We', 'Wt', 'Wth', 'w'], words: ['watt', 'watts'] },
  { kind: 'power', unit: 'uW', symbols: micro('W'), words: ['microwatt', 'microwatts'] },
  { kind: 'power', unit: 'mW', symbols: ['mW'], words: ['milliwatt', 'milliwatts'] },
  { kind: 'power', unit: 'nW', symbols: ['nW'], words: ['nanowatt', 'nanowatts'] },
  { kind: 'power', unit: 'pW', symbols: ['pW'], words: ['picowatt', 'picowatts'] },
  { kind: 'power', unit: 'kW', symbols: ['kW', 'KW', 'kWe', 'kWt', 'kWth', 'kw'], words: ['kilowatt', 'kilowatts'] },
  { kind: 'power', unit: 'MW', symbols: ['MW', 'MWe', 'MWt', 'MWth'], words: ['megawatt', 'megawatts'] },
  { kind: 'power', unit: 'GW', symbols: ['GW', 'GWe', 'GWt', 'GWth'], words: ['gigawatt', 'gigawatts'] },
  { kind: 'power', unit: 'hp', symbols: ['hp', 'HP', 'bhp', 'BHP', 'shp'], words: ['horsepower', 'horse power', 'mechanical horsepower', 'brake horsepower'] },
  {
    kind: 'power',
    unit: 'W',
    factor: METRIC_HP_W,
    symbols: ['PS', 'CV', 'hp(M)', 'hp (M)'],
    words: ['metric horsepower', 'metric horse power', 'Pferdestärke', 'cheval-vapeur', 'chevaux-vapeur', 'cavalli vapore', 'caballos de vapor'],
  },
  {
    kind: 'power',
    unit: 'BTU/h',
    symbols: ['BTU/h', 'Btu/h', 'BTU/hr', 'Btu/hr', 'BTUh', 'Btuh', 'BTU/H'],
    words: ['BTU per hour', 'BTUs per hour', 'Btu per hour', 'British thermal units per hour', 'British thermal unit per hour'],
  },

  // Energy
  { kind: 'energy', unit: 'J', symbols: ['J'], words: ['joule', 'joules'] },
  { kind: 'energy', unit: 'mJ', symbols: ['mJ'], words: ['millijoule', 'millijoules'] },
  { kind: 'energy', unit: 'uJ', symbols: micro('J'), words: ['microjoule', 'microjoules'] },
  { kind: 'energy', unit: 'nJ', symbols: ['nJ'], words: ['nanojoule', 'nanojoules'] },
  { kind: 'energy', unit: 'kJ', symbols: ['kJ'], words: ['kilojoule', 'kilojoules'] },
  { kind: 'energy', unit: 'MJ', symbols: ['MJ'], words: ['megajoule', 'megajoules'] },
  { kind: 'energy', unit: 'GJ', symbols: ['GJ'], words: ['gigajoule', 'gigajoules'] },
  { kind: 'energy', unit: 'Wh', symbols: ['Wh', 'W·h', 'W⋅h', 'wh'], words: ['watt-hour', 'watt-hours'] },
  { kind: 'energy', unit: 'kWh', symbols: ['kWh', 'KWh', 'kW·h', 'kW⋅h', 'kwh'], words: ['kilowatt-hour', 'kilowatt-hours'] },
  { kind: 'energy', unit: 'MWh', symbols: ['MWh', 'MW·h', 'MW⋅h'], words: ['megawatt-hour', 'megawatt-hours'] },
  { kind: 'energy', unit: 'GWh', symbols: ['GWh'], words: ['gigawatt-hour', 'gigawatt-hours'] },
  { kind: 'energy', unit: 'BTU', symbols: ['BTU', 'Btu', 'btu', 'BTUs', 'Btus'], words: ['British thermal unit', 'British thermal units'] },
  { kind: 'energy', unit: 'J', factor: CALORIE_J, symbols: ['cal'], words: ['calorie', 'calories'] },
  { kind: 'energy', unit: 'kJ', factor: CALORIE_J, symbols: ['kcal'], words: ['kilocalorie', 'kilocalories'] },

  // Temperature
  { kind: 'temperature', unit: 'K', symbols: ['K', '°K'], words: ['kelvin', 'kelvins', 'degrees kelvin', 'degree kelvin'] },
  { kind: 'temperature', unit: 'mK', symbols: ['mK'], words: ['millikelvin', 'millikelvins'] },
  {
    kind: 'temperature',
    unit: 'degC',
    symbols: ['°C', '° C', 'ºC', '℃', 'degC', 'deg C'],
    words: ['degree Celsius', 'degrees Celsius', 'degree C', 'degrees C', 'degree centigrade', 'degrees centigrade', 'Celsius', 'centigrade'],
  },
  {
    kind: 'temperature',
    unit: 'degF',
    symbols: ['°F', '° F', 'ºF', '℉', 'degF', 'deg F'],
    words: ['degree Fahrenheit', 'degrees Fahrenheit', 'degree F', 'degrees F', 'Fahrenheit'],
  },

  { kind: 'temperature', unit: 'degC', ambiguous: true, symbols: ['°', 'º'], words: ['degree', 'degrees', 'deg'] },

  // Mass ("pounds" is a mass unless "of thrust"/"of force"/"-force" follows: the longer form wins)
  { kind: 'mass', unit: 'kg', symbols: ['kg'], words: ['kilogram', 'kilograms', 'kilogramme', 'kilogrammes', 'kilo', 'kilos'] },
  { kind: 'mass', unit: 'g', symbols: ['g'], words: ['gram', 'grams', 'gramme', 'grammes'] },
  { kind: 'mass', unit: 'mg', symbols: ['mg'], words: ['milligram', 'milligrams'] },
  { kind: 'mass', unit: 'tonne', symbols: ['t'], words: ['tonne', 'tonnes', 'metric ton', 'metric tons'] },
  { kind: 'mass', unit: 'lb', symbols: ['lb', 'lbs', 'lbm'], words: ['pound', 'pounds'] },

  // Speed (mathjs has no "mph": miles per hour are written "mi/h")
  {
    kind: 'speed',
    unit: 'm/s',
    symbols: ['m/s', 'm s^-1', 'm s⁻¹', 'm·s⁻¹', 'ms⁻¹', 'ms^-1'],
    words: ['metre per second', 'metres per second', 'meter per second', 'meters per second', 'm per second'],
  },
  {
    kind: 'speed',
    unit: 'km/s',
    symbols: ['km/s', 'km s^-1', 'km s⁻¹', 'km·s⁻¹'],
    words: ['kilometre per second', 'kilometres per second', 'kilometer per second', 'kilometers per second', 'km per second', 'km a second', 'kilometres a second', 'kilometers a second'],
  },
  {
    kind: 'speed',
    unit: 'km/h',
    symbols: ['km/h', 'km/hr', 'kph', 'km h^-1', 'km h⁻¹'],
    words: ['kilometre per hour', 'kilometres per hour', 'kilometer per hour', 'kilometers per hour', 'km per hour', 'km an hour', 'kilometres an hour', 'kilometers an hour'],
  },
  { kind: 'speed', unit: 'mi/h', symbols: ['mph', 'MPH', 'mi/h', 'mi/hr'], words: ['mile per hour', 'miles per hour', 'miles an hour', 'mile an hour'] },
  { kind: 'speed', unit: 'mi/s', symbols: ['mi/s'], words: ['mile per second', 'miles per second', 'miles a second', 'mile a second'] },
  // The light-year: 9 460 730 472 580 800 m exactly (IAU 2012 Resolution B2 with the Julian year, as mathjs has none).
  { kind: 'speed', unit: 'm/s', factor: 9460730472580800 / 3600, words: ['light-year per hour', 'light-years per hour', 'light years per hour', 'lightyears per hour'] },
  { kind: 'speed', unit: 'm/s', factor: 9460730472580800 / 86400, words: ['light-year per day', 'light-years per day', 'light years per day', 'lightyears per day'] },
  { kind: 'speed', unit: 'm/s', factor: 9460730472580800 / 31557600, words: ['light-year per year', 'light-years per year', 'light years per year', 'lightyears per year'] },
  { kind: 'speed', unit: 'ft/s', symbols: ['ft/s', 'ft/sec', 'fps', 'ft s^-1', 'ft s⁻¹'], words: ['foot per second', 'feet per second', 'feet a second'] },
  { kind: 'speed', unit: 'cm/s', symbols: ['cm/s', 'cm s^-1', 'cm s⁻¹'], words: ['centimetre per second', 'centimetres per second', 'centimeter per second', 'centimeters per second'] },
  { kind: 'speed', unit: 'mm/s', symbols: ['mm/s'], words: ['millimetre per second', 'millimetres per second', 'millimeter per second', 'millimeters per second'] },
  {
    kind: 'speed',
    unit: 'm/s',
    factor: C_M_PER_S,
    words: ['times the speed of light', 'times light speed', 'times the velocity of light', 'times faster than light', 'times c'],
    symbols: ['× the speed of light', 'x the speed of light', '× light speed', '×c', '× c'],
  },

  // Voltage
  { kind: 'voltage', unit: 'V', symbols: ['V', 'VDC', 'VAC', 'Vdc', 'Vac', 'V DC', 'V AC', 'Vrms', 'V rms', 'v', 'vdc', 'vac'], words: ['volt', 'volts'] },
  { kind: 'voltage', unit: 'mV', symbols: ['mV'], words: ['millivolt', 'millivolts'] },
  { kind: 'voltage', unit: 'kV', symbols: ['kV', 'kv'], words: ['kilovolt', 'kilovolts'] },

  // Duration ("s" alone is left out: seconds are written out, or read as Isp after "Isp"/"specific impulse")
  { kind: 'duration', unit: 's', symbols: ['s', 'sec', 'secs'], words: ['second', 'seconds'] },
  { kind: 'duration', unit: 'min', symbols: ['min', 'mins'], words: ['minute', 'minutes'] },
  { kind: 'duration', unit: 'h', symbols: ['h', 'hr', 'hrs'], words: ['hour', 'hours'] },
  { kind: 'duration', unit: 'day', symbols: ['d'], words: ['day', 'days'] },
  { kind: 'duration', unit: 'week', words: ['week', 'weeks'] },
  { kind: 'duration', unit: 'day', factor: 14, words: ['fortnight', 'fortnights'] },
  { kind: 'duration', unit: 'month', words: ['month', 'months'] },
  { kind: 'duration', unit: 'year', symbols: ['yr', 'yrs'], words: ['year', 'years'] },

  // Electric current
  // Gas flow (electrolysers): mathjs reads "L/min", "L/h", "mL/min", "cm^3/min".
  {
    kind: 'gas-flow',
    unit: 'L/min',
    symbols: ['L/min', 'l/min', 'L/minute', 'LPM', 'lpm', 'SLPM', 'slpm', 'L min^-1', 'L min⁻¹', 'l min⁻¹'],
    words: ['litre per minute', 'litres per minute', 'liter per minute', 'liters per minute'],
  },
  { kind: 'gas-flow', unit: 'L/h', symbols: ['L/h', 'l/h', 'L/hr', 'l/hr', 'LPH', 'lph'], words: ['litre per hour', 'litres per hour', 'liter per hour', 'liters per hour'] },
  {
    kind: 'gas-flow',
    unit: 'mL/min',
    symbols: ['mL/min', 'ml/min', 'cc/min', 'ccm', 'sccm', 'SCCM'],
    words: ['millilitre per minute', 'millilitres per minute', 'milliliter per minute', 'milliliters per minute', 'cc per minute'],
  },
  { kind: 'current', unit: 'A', symbols: ['A'], words: ['amp', 'amps', 'ampere', 'amperes'] },
  { kind: 'current', unit: 'mA', symbols: ['mA'], words: ['milliamp', 'milliamps', 'milliampere', 'milliamperes'] },
  { kind: 'current', unit: 'uA', symbols: micro('A'), words: ['microamp', 'microamps', 'microampere', 'microamperes'] },
  { kind: 'current', unit: 'kA', symbols: ['kA'], words: ['kiloamp', 'kiloamps', 'kiloampere', 'kiloamperes'] },
];

/**
 * Words that give a figure its role. `before`: read in the words before the figure (the nearest one
 * wins); `after`: read in the first words after it ("2 kW of input", "20 °C ambient"). Regex
 * fragments, matched in any case as whole words.
 */
export interface RoleWords {
  role: Exclude<FigureRole, null>;
  before: readonly string[];
  after: readonly string[];
}

export const POWER_ENERGY_ROLES: readonly RoleWords[] = [
  {
    role: 'excess',
    before: ['excess', 'surplus', 'extra', 'net gain', 'net surplus', 'anomalous', 'unexplained', 'over-unity', 'overunity', '(?:output|out) exceeds? (?:the |its )?(?:input|consumption|supply) by', 'exceeds? (?:the |its )?(?:input|consumption|supply) by'],
    after: ['excess', 'surplus', 'extra', 'more(?= than)', 'more(?= (?:[\\p{L}-]+ ){1,3}?than (?:that|this|it|what (?:it|they) (?:draws?|takes?|uses?|consumes?|gets?))(?!\\p{L}))', 'above(?= (?:the|its) input)', 'in excess', 'net gain'],
  },
  {
    role: 'in',
    before: [
      '(?:battery|batteries|supply|mains|grid|source|pack|socket|outlet|rail|bus|line) (?:supplying|supplies|supplied|providing|provides|delivering|delivers|gave up|gives up|feeding|feeds|fed|powering|powers|driving|drives|shows|showed|reads|read)',
      'meter (?:read|reads|recorded|records|showed|shows|measured|logged)', '(?:panel|input|source|PV|primary|supply|generator) side', 'primary',
      'draw(?:s|n|ing)?', 'drew', 'consum(?:e|es|ed|ing|ption)', 'inputs?', 'supplied (?:with|by)', '(?:is|was|are|were|being) supplied', 'supply(?: of| power| voltage| current|:)?', 'power supply', 'fed',
      'mains', 'uses', 'used', 'using', 'requir(?:e|es|ed|ing)', 'absorb(?:s|ed|ing)?', 'takes', 'taking', 'powered by',
      '(?:for|per) (?:every|each)', 'put in', '(?:is|was|were|being)? ?given(?= *$)', '(?:electricity|electric(?:al)?(?: power| energy)?|power|energy|work|fuel|gas|drive) in[:=]?(?=[^\\S\\n]*$)', 'charged (?:with|at)', 'charging at', 'charged', 'fed (?:with|by|from)', '(?:is|are|was|were|being) fed', 'drive power', 'driving power', 'uptake', 'power uptake', 'intake', 'fed with', 'fed by', 'from a', 'from the', 'from (?:about|around|roughly|some|nearly|approximately|approx\\.|ca\\.|~)', 'for (?:only |just |a mere |about |roughly )?(?=$)', '(?<![\\w-])charge(?=[^\\S\\n]*$)', 'comes? from (?:its|the|a|an)', 'powered by (?:its|the|a|an)', 'pumped by (?:its|the|a|an)', 'driven by', 'driven with', 'excited by', 'excited with',
      'pumped with', 'pumping', 'pump power', 'at the input', 'on the input', 'input side', 'electrical input', 'energy cost', 'costs?', 'needs?',
      'needing', 'eats?', 'pulls?', 'pulling', 'runs? (?:on|off)', 'running (?:on|off)', 'operat(?:es|ing|ed) (?:on|at|from)', 'supply of', 'battery',
      'wall socket', 'socket', 'plug', 'in:', 'with only', 'on only', 'on just', 'with just', 'spent', 'spends?', 'dissipat(?:e|es|ed|ing)',
      'took', 'turned by', 'by a', 'fuel', 'containing', 'P_?\\{?in\\}?', 'E_?\\{?in\\}?', 'Pin', 'invest(?:s|ed|ing)?', 'gas input', 'fuel input',
    ],
    after: [
      'of (?:pedall?ing|cranking|muscle power|human power|human effort|effort|shaking|winding)', 'from the (?:wall|mains|socket|outlet|plug|grid)', 'compressors?',
      '(?:that |which )?(?:it|the (?:device|unit|rig|machine|system|motor|circuit|cell|coil)) (?:draws|drew|consumes|consumed|uses|used|takes|took|needs|is fed|was fed|receives|received|is given|was given|pulls|requires)',
      '(?:was|were|is|are) (?:consumed|drawn|used|supplied|burned|burnt|fed in|put in)', 'drive power',
      '(?:which|that) (?:is|are|was|were) (?:put|fed) in(?:to it)?', 'of (?:input|supply|alternator|battery|mains|grid|compressor|drive|motor) (?:power|energy|electricity)', 'of excitation', 'of drive', '(?:battery )?pack', 'battery', 'of (?:chemical|fuel) (?:power|energy)', 'chemical (?:power|energy)', '\\((?:LHV|HHV)\\)', 'of drive(?: power)?', 'uptake',
      'inputs?', 'drawn', 'consumed', 'consumption', 'supplied', 'used', 'absorbed', 'draw', 'fed', '(?:home |storage |lithium |lead-acid )?battery', 'of fuel', 'of gas', 'of diesel', 'in(?=\\s*(?:and\\b|,|to\\b))', 'of input', 'of supply', 'supply'],
  },
  {
    role: 'out',
    before: [
      '(?:loads?|load resistors?|resistors?|dummy loads?|lamps?|heaters?|heating elements?) (?:is |was |are |were )?(?:said to |reported to |measured to )?(?:dissipat\\w*|consum\\w*|absorb\\w*|tak(?:e|es|ing))', '(?:the |its )?(?:batter(?:y|ies)|cells?|capacitors?|water|tank|store|flywheel|load)(?: bank| pack)? (?:accepted|absorbed|received|took up|takes up|stored|gained|was given)', 'deliver(?:s|ed|ing)?', 'produc(?:e|es|ed|ing|tion)', 'outputs?', 'generat(?:e|es|ed|ing|ion)', 'yield(?:s|ed|ing)?',
      '(?:burns?|burned|burnt|burning) (?:for|to give|to yield|to release)', '(?:raised|raises|increased|increases|boosted|added to) (?:the |its )?(?:heat|energy|enthalpy|charge|temperature)(?: [\\w-]+){0,5}? by', '(?:electricity|electric(?:al)?(?: power| energy)?|power|energy|work|heat|light|shaft power) out[:=]?(?=[^\\S\\n]*$)', '(?:powers?|powered|powering|lights?|lit|lighting|keeps?|kept|drives?|drove|driving|driven|ran|run) (?:a|an|the|our|my|their|two|three|four|several)', '(?:shone|shines|shining|glow(?:s|ed|ing)?|burn(?:s|ed|ing)|lit) (?:at|with)(?= *$)', 'charg(?:e|es|ed|ing) (?:a|an|the|its|their|our) (?:[\\w-]+ ){0,2}(?:batter(?:y|ies)|cells?|packs?|capacitors?|banks?) (?:with|at)', 'return(?:s|ed|ing)?', 'provid(?:e|es|ed|ing)', 'releas(?:e|es|ed|ing)', 'gives?', 'giving', 'gave', 'puts? out',
      'emit(?:s|ted|ting)?', 'harvest(?:s|ed|ing)?', 'recover(?:s|ed|ing)?', 'puts? out', 'pumps? out', 'sends? back', 'feeds? back',
      '(?:lights?|lighting|lit|powers?|powering|runs?|running|drives?|driving|feeds?|feeding) (?:a|an|the|its|two|three|four|several)? ?(?:[\\w-]+ ){0,4}?(?:taking|drawing|using|consuming|rated at|that (?:take|takes|draw|draws|use|uses|consume|consumes))', 'drives? (?:a|an|the|its)', 'driving (?:a|an|the|its)', 'running (?:a|an|the|its)', 'turning (?:a|an|the|its)', 'logged', 'feeds', 'feeding', 'sells?', 'sold', 'fill(?:s|ed|ing)? (?:a|an|the)', 'charg(?:es|ed|ing) (?:a|an|the|its) (?:[\\w-]+ ){0,2}(?:batter(?:y|ies)|cells?|capacitors?|accumulators?)(?: (?:bank|pack|stack))?(?: (?:at|with|to))?', 'charg(?:es|ed|ing) (?:a|an|the|its)', 'powers', 'powering', 'export(?:s|ed|ing)?', 'made', 'makes', 'supplies', 'supplying', 'supplied', 'putting out', 'holds',
      'on the (?:dummy )?load', 'into the (?:dummy )?load', 'lights?', 'lighting', 'heats (?:up |the |a |an |our |your )', 'heating (?:up |the |a |an |our |your )', 'load of', 'into a load', 'came out', 'comes out', 'out of it',
      'got out', 'gets out', 'obtained', 'measured at the output', 'at the output', 'on the output', 'output side', 'useful', 'electrical output',
      'supplies a', 'supplying a', 'give', 'gives back', 'returns', 'return of', 'keeps?', 'kept', 'ran (?:a|an|the)', 'runs? (?:a|an|the)', 'gain(?:s|ed)?',
      '(?:battery|output|load|consumer|secondary|grid) side', 'secondary', 'puts', 'put', 'turns? out', 'discharg(?:ed|ing|es)(?: at)?', 'gave back', 'on the shaft', 'at the shaft', 'dump(?:s|ed)?', 'P_?\\{?out\\}?', 'E_?\\{?out\\}?', 'W_?\\{?out\\}?', 'P_?o', 'Pout', 'into the (?:load|grid|house|battery|bath|tank)',
    ],
    after: [
      // A rating said before what makes power: "the 600 MW coal unit", "a 5 kW genset" (not a motor or engine, which may be what drives the device).
      '(?<!(?:of|from|off|by|on)[^\\S\\n]+(?:the[^\\S\\n]+|its[^\\S\\n]+|a[^\\S\\n]+|an[^\\S\\n]+)?)(?:(?!(?:from|off|of|to|by|at|in|on|into|onto|with|for|the|a|an|its|their|our|and|or|per)\\b)[\\w-]+ ){0,2}(?:power plants?|power stations?|plants?|(?:coal|steam|gas|nuclear|geothermal|hydro|wind|solar|CCGT|generating) units?|gensets?|generating sets?|generators?|turbines?)(?! (?:draws?|takes?|consumes?|uses?|needs?|is fed|was fed|runs? on))',
      '(?:that |which )?(?:it|the (?:device|unit|rig|machine|system|motor|circuit|cell|coil)) (?:delivers|delivered|produces|produced|gives|gave|generates|generated|puts out|returns|returned|yields|yielded)',
      'to (?:the|its|their|a|an) (?:house|home|grid|load|network|building|car|motor|lamp|heater|pump|phone|device|string|bulb|lamps|wheel|laptop|computer|tablet|appliance|consumer|user|bank|lights?|heating|tank)', 'into the (?:[\\w-]+ )?(?:battery|grid|load|bank|network|mains|store|tank|reservoir|pond|basin)(?: bank)?', 'net(?= (?:output|from|at|to|into|of electricity|electrical)|[,.;]|$)', '(?:was|were|is|are) (?:delivered|produced|generated|returned|exported|recovered)',
      'on (?:the|its) (?:shaft|output(?: terminals)?|load)', 'at (?:the|its) (?:output )?terminals', 'at the (?:crank|output |drive |propeller |main )?shaft', 'at the (?:wheels?|axles?|flywheel|crank)', 'of shaft power', 'on its output terminals',
      'heating(?: capacity| output| power| duty)?', 'cooling(?: capacity| output| power| duty)', 'of heat(?:ing)? output', 'exported', 'outputs?', 'delivered', 'produced', 'generated', 'comes? out', 'came out', 'out of', 'gained', 'returned', 'yielded', 'recovered', 'released', 'out(?=\\s+of\\s+(?:it|the))', 'of output', 'at the output', '(?:reached|reaches|reach|went to|goes to|got to|arrived at|made it to) (?:the |its )?(?:wheels?|shaft|axles?|load|output|grid|battery|house|motor)', 'back(?! (?:in|into|to (?:the|its) (?:input|supply|source)))'],
  },
];

export const TEMPERATURE_ROLES: readonly RoleWords[] = [
  {
    role: 'hot',
    before: [
      'T_?(?:h|hot|H)', 'surface(?: water)?', 'warm surface', '(?:to )?deliver(?:s|ed|ing)?', 'suppl(?:y|ies|ied|ying)', 'provid(?:es|ed|ing)', 'makes', 'produc(?:es|ed|ing)', 'hot', 'hotter', 'hottest', 'source', 'flames?', 'steam', 'boiler', 'furnace', 'combustion', 'burner', 'heated to', 'high-temperature',
      'exhaust', 'waste heat', 'geothermal', 'deliver(?:s|ed|ing)? (?:water |air |heat )?at', 'supply temperature', 'flow temperature', 'output temperature',
      'radiators?', 'underfloor', 'warm', 'warmer', 'warm (?:end|side)', 'to a', 'into a', 'hot water', 'condensing', 'up to', 'to heat', 'heats? (?:\\w+ )?to', 'heating to',
      'warm(?:s|ing)? (?:\\w+ )?to', 'raise[sd]? (?:\\w+ )?to', 'body heat', 'skin', 'turbine inlet', 'inlet', 'peak', 'top', 'upper', 'firing', 'firing temperature',
    ],
    after: [
      'surface(?: water| layer)?', 'source', 'flames?', 'steam', 'hot', 'boiler', 'furnace', 'exhaust', 'waste heat', 'supply', 'flow', 'output', 'hot side', 'inlet', 'emitter', 'underfloor', 'receiver', 'absorber', 'heater head', 'hot plate', 'hot junction',
      'loop', 'tank', 'radiators?', '(?:turbine|compressor) inlet', 'firing', 'combustion', 'hot gas', 'heater head', 'collector', 'hot end',
      '(?:as|for|is|being) (?:the |its |our |a )?(?:hot|warm|hotter|warmer|heat) (?:side|end|source|reservoir|bath)',
    ],
  },
  {
    role: 'cold',
    before: [
      'T_?(?:c|cold|C|0|amb)', 'brine', 'ground ?water', 'deep(?: water)?', 'bottom water', 'cold', 'colder', 'coldest', 'ambient', 'room', 'sink', 'outside', 'outdoors?', 'river', 'sea', 'seawater', 'lake', 'ocean',
      'ground', 'environment', 'surroundings', 'atmosphere', 'cooling water', 'ice', 'condenser', 'low-temperature', 'air', 'outside air', 'outdoor air',
      'from', 'freezer', 'fridge', 'inside the fridge', 'cabinet', 'cold store', 'evaporator', 'extract(?:s|ed|ing)? heat from', 'draw(?:s|n|ing)? heat from',
      'well water', 'groundwater', 'borehole', 'winter', 'bottom', 'lower', 'rejects? heat (?:to|at)', 'reject(?:s|ed|ing)?', 'cooled to', 'chilled to',
      'cool(?:s|ed|ing)? (?:\\w+ )?to', 'keeps? (?:\\w+ )?at', 'frozen',
    ],
    after: ['deep(?:er)? (?:water|layer)', 'sink', 'ambient', 'borehole', 'brine', 'ground loop', 'ground water', 'groundwater', 'well water', 'chilled water', 'cold water', 'room', 'outside', 'outdoors?', 'environment', 'surroundings', 'cold', 'river', 'seawater', 'cold side', 'air', 'outdoor', 'ground', '(?:as|for|is|being) (?:the |its |our |a )?(?:cold|cool|colder|cooler) (?:side|end|sink|reservoir|bath)'],
  },
];

export const MASS_ROLES: readonly RoleWords[] = [
  {
    role: 'wet',
    before: [
      'wet', 'fuell?ed', 'fully fuell?ed', 'initial', 'starting', 'start', 'launch', 'lift-?off', 'lifts? off (?:at|with)', 'take-?off', 'gross', 'total', 'loaded', 'full',
      'at launch', 'at ignition', 'before the burn',
    ],
    after: [
      '(?:lift-?off|launch|initial|gross|total|wet|fuell?ed|starting|ignition|take-?off) mass', 'wet', 'fuell?ed', 'at launch', 'at lift-?off', 'at the start',
      'initially', 'fully loaded', 'loaded', 'in all', 'in total', 'all told', 'gross', 'total',
    ],
  },
  {
    role: 'dry',
    before: ['dry', 'empty', 'final', 'burn-?out', 'burns? out (?:at|with)', 'end-of-burn', 'after the burn', 'unfuell?ed', 'structural', 'inert'],
    after: ['(?:dry|empty|final|burn-?out|structural) mass', '\\((?:empty|dry|unfuell?ed|when empty)\\)', 'dry', 'empty', 'at burn-?out', 'at cut-?off', 'at (?:engine )?shutdown', 'at MECO', 'after the burn', 'when empty', 'at the end'],
  },
  {
    role: 'propellant',
    before: [
      'propellants?', 'fuel', 'reaction mass', 'propellant (?:mass|load|loading)', 'mass of (?:propellant|fuel|reaction mass)', 'fuel (?:mass|load)', 'propellant[:=]', 'reaction mass (?:of|is)',
      '(?:carries|carrying|loaded with|tanks? (?:hold|holds|of)|burns?|burning|expels?|expelling)',
    ],
    after: [
      '(?:is|are|of) (?:hydrazine|propellant|fuel|xenon|krypton|kerosene|water|reaction mass|nitrogen|helium|butane|propane|iodine|argon|ammonia)', 'of (?:that|it|which)(?: being| is| was)? (?:propellant|fuel)', 'of cold-gas propellant',
      'of (?:[\\w-]+ )?(?:nitrogen|helium|butane|propane|CO2|carbon dioxide|ammonia|iodine|bismuth|caesium|cesium|mercury|argon|nitrous oxide|LOX|liquid oxygen|RP-?1|hydrogen peroxide)', 'of [\\w-]+ propellant', 'of propellant', 'of fuel', 'of reaction mass', 'of xenon', 'of krypton', 'of argon', 'of hydrazine', 'of kerosene', 'of hydrogen', 'of methane',
      'of water', 'of oxidi[sz]er', 'of liquid', 'propellant', 'fuel', 'of bipropellant', 'of monopropellant',
      'of (?:[\\w-]+ )?(?:deuterium|tritium|helium-3|lithium|boron|uranium|plutonium|antimatter|fusion fuel|fissile fuel|pellets|solid fuel|solid propellant|grain|ice)(?: pellets| fuel| propellant)?',
    ],
  },
];

export const SPEED_ROLES: readonly RoleWords[] = [
  {
    role: 'exhaust',
    before: ['v_?e(?:x|xh)?', 'u_?e', 'c_?e', 'exhausts? at', 'exhausts?', '(?:is|are|was|were|being) exhausted at', 'jet', 'ejection', 'effective exhaust', 'exit', 'nozzle', 'expelled at', 'ejected at', 'thrown out at', 'leaves? at', '(?:expels?|expelling|ejects?|ejecting|vents?|venting|throws?|fires?|firing|shoots?)(?: (?:it|them|its [\\w-]+|the [\\w-]+|[\\w-]+ ions|propellant|gas|mass|xenon|nitrogen|ions|plasma))?(?: out)? at', 'leaves? the (?:nozzle|thruster|engine) at'],
    after: ['exhaust', 'jet', 'exhaust velocity', 'exhaust speed'],
  },
  {
    role: 'delta-v',
    before: ['Δv', 'Δ-v', 'delta-?v', 'delta v', 'dv', 'velocity change', 'change in velocity', 'change of velocity', 'speed change', 'change in speed', 'velocity increment', 'Δ ?V'],
    after: ['of Δv', 'of delta-?v', 'of velocity change', 'Δv', 'delta-?v', 'of Δ-v'],
  },
];

/** Words that make a percentage (or a bare ratio) a quantum efficiency: particles out per particle in. */
export const QUANTUM_EFFICIENCY_WORDS = [
  'quantum efficienc(?:y|ies)', 'quantum yields?', 'EQEs?', 'IQEs?', 'QEs?', 'photon yields?', 'photons? per electrons?', 'electrons? per photons?',
  'carrier multiplication', 'exciton multiplication', 'multiple exciton generation', 'singlet fission', 'photon upconversion', 'quantum-cutting', 'quantum cutting',
  'photons? per (?:injected |absorbed )?(?:electrons?|carriers?)', 'electrons? per (?:incident |absorbed )?photons?', 'external quantum', 'internal quantum',
];

/** Words that make "350 % efficient" a heating COP (heat pumps deliver more heat than the work they take). */
export const HEAT_PUMP_WORDS = [
  'heat[- ]pumps?', 'air[- ]source', 'ground[- ]source', 'water[- ]source', 'geothermal heat', 'heat[- ]pumping', 'ASHPs?', 'GSHPs?', 'air[- ]to[- ](?:water|air)',
  'water[- ]to[- ]water', 'brine[- ]to[- ]water', 'flow temperature', 'radiators?', 'underfloor', 'space heating', 'domestic hot water', 'DHW', '(?:mov(?:es?|ing|ed)|pump(?:s|ing|ed)?|lift(?:s|ing|ed)?) heat',
];
/** Words that make a percentage a cooling COP ("300 % efficient" for an air conditioner). */
export const COOLING_MACHINE_WORDS = ['coolers?', 'cold (?:room|store|storage)s?', 'ice makers?', 'refrigerators?', 'air[- ]condition\\w*', 'chillers?', 'fridges?', 'freezers?', 'cryocoolers?', 'heat pumps? in cooling', 'mini-?splits?', 'split (?:units?|systems?|air[- ]conditioners?)', 'AC units?', '(?:window|portable|room|wall|ducted|rooftop|car|central) (?:AC|A/C)', 'A/C', 'air ?cons?', 'aircons?'];

/** Words that make a temperature a difference: before ("ΔT of 20 K") or after ("a 20 K difference"). */
export const DIFFERENCE_BEFORE = [
  'ΔT', 'Δ T', 'delta[- ]?T', 'dT', 'temperature (?:difference|gradient|drop|rise|lift|span|spread|differential|swing|excursion|change|increase)s?',
  'differences? of', 'differential of', 'gradient of', 'rise of', 'drop of', 'lift of', 'spread of', 'span of', 'increase of', 'swing of', 'change of',
  '(?:pump(?:s|ing)?|lift(?:s|ing)?|rais(?:es|ing)|mov(?:es|ing)) (?:the )?heat(?: up)?(?: by| through| across)?', 'through', 'heats? (?:\\w+ )?by', 'warms? (?:\\w+ )?by', 'cools? (?:\\w+ )?by', 'raises? (?:\\w+ )?by', 'lowers? (?:\\w+ )?by', 'rises? by', 'drops? by',
  '(?:only |just )?across(?: (?:only|just|a|an))*', 'spanning', '(?:rais|lower|increas|decreas|heat|warm|cool|drop|lift)(?:e|es|ed|ing|s)? (?:the )?temperature (?:of )?(?:[\\w-]+ ){0,3}by', '(?:colder|cooler|hotter|warmer|lower|higher) than (?:the |its )?(?:[\\w-]+ ){0,3}by', 'differ(?:s|ing)? by', 'apart by', 'separated by', 'rose by', 'fell by', 'falls? by', 'climbs? by', 'warmer by', 'cooler by', 'hotter by', 'colder by', 'increases? by', 'decreases? by', 'only', 'a mere', 'just',
];
export const DIFFERENCE_AFTER = [
  '(?:temperature )?(?:difference|differential|gradient|drop|rise|lift|span|spread|swing|excursion|delta|split|increase|decrease)s?',
  '(?:warmer|hotter|cooler|colder|higher|lower|above|below|over|under)(?: than)?', 'by which', 'ΔT', 'delta[- ]?T', 'of (?:temperature )?(?:difference|gradient|lift|rise|drop)',
  'between', 'apart', 'across', 'of heating', 'of warming', 'of cooling',
];

/** Words before a number of seconds that make it a specific impulse. */
export const ISP_WORDS = ['I_?sp', 'Isp', 'ISP', 'I sp', 'specific impulses?', 'specific impulse \\(Isp\\)'];

/** Words that say a device is a heat engine (so an efficiency is a Carnot claim). */
export const HEAT_ENGINE_WORDS = [
  'heat motors?', 'thermoacoustic', 'of the heat', 'of the heat (?:it|that)', 'heat (?:it|that it) (?:draws|takes|absorbs|collects|gathers)', 'heat engines?', 'engines?', 'turbines?', 'Stirling\\w*', '\\w*motoren?', 'cooling water', 'condenser', 'heat sink', 'hot side', 'cold side', 'reservoirs?',
  'source temperature', 'thermoelectric\\w*', 'thermo-?electric\\w*', 'thermionic', 'thermophotovoltaic\\w*', 'TPV', 'Stirling',
  'Rankine', 'ORC', 'steam', 'heat to (?:work|power|electricity)', 'converts? (?:\\w+ )?heat', 'waste[- ]heat', 'thermal (?:to|into) (?:electric|mechanical)',
  'Seebeck', 'Peltier', 'generators? running on heat', 'heat-driven', 'thermal generator', 'TEG', 'heat recovery', 'power plant', 'power station', 'combustion',
  'diesel', 'petrol', 'gasoline', 'ambient heat', 'heat of the (?:air|sea|room|surroundings)', 'temperature difference', 'thermal gradient',
];

/** A device said to throw out nothing: the photon-rocket bound applies to its thrust. */
export const PROPELLANT_FREE_WORDS = [
  'propellant[- ]?(?:free|less)', 'reaction[- ]?less', 'reactionless', 'without (?:spending|using|burning|consuming|expending) (?:any )?(?:propellant|fuel|reaction mass)',
  '(?:ion(?:ic)? wind|air currents?|convection) (?:cannot|can ?not|can\'t|could not|is not|isn\'t) (?:be )?(?:the )?(?:cause|explanation|source)', 'rul(?:e|es|ed|ing) out (?:ion(?:ic)? wind|air currents?|convection)',
  'without (?:any )?(?:expelling|ejecting|emitting|throwing|shedding|venting)(?: (?:out )?(?:any )?(?:propellant|mass|reaction mass|material|matter|exhaust|gas))?',
  'without (?:any )?(?:propellant|reaction mass|exhaust)', 'nothing (?:else )?(?:leaves|is expelled|is ejected|comes out)', 'photon[- ](?:thruster|rocket|drive|propulsion)(?: (?:bound|limit))?', '(?:no air|nothing) to push (?:on|against)',
  'lasers?', 'laser[- ](?:thrusters?|diodes?|light|propulsion|arrays?|bars?|beams?)', 'photons?', 'beam leaving', 'quantum vacuum', 'virtual particles',
  'pushes? (?:against|on|off) (?:the )?(?:quantum )?vacuum', 'pushing (?:against|on|off) (?:the )?(?:[\\w-]+ ){0,3}?vacuum', 'recoil', 'collimated', 'light (?:alone|only)', 'radiators?',
  'thermal (?:radiation|recoil|photons?)', 'nothing but light', 'only light', 'waste heat (?:rejected|radiated)', 'photon (?:limit|pressure|bound)', 'radiation pressure',
  'no (?:propellers?|air ?flow|fans?|downwash|rotor wash)', 'not (?:a|one) (?:gram|drop|ounce|bit|molecule|atom) of (?:propellant|fuel|reaction mass|gas)',
  'no (?:propellant|fuel|reaction mass|exhaust) (?:at all|whatsoever|of any kind)',
  'no (?:propellant|reaction mass|exhaust|expelled mass|mass is expelled)', 'expels? no (?:propellant|mass|gas|reaction mass|matter)',
  '(?:hard |high )?vacuum,? where no (?:ion(?:ic)? wind|air)', 'no ion(?:ic)? wind (?:can|could) (?:form|arise|act)', 'radiating (?:panel|face|surface|plate)', 'radiat(?:es?|ing|ed)(?: [\\w-]+){0,4}? (?:out of|from|off) (?:one|a single|its|the) (?:face|side|surface)', '(?:infrared|IR|heat) lamps?', 'flashlights?', 'LEDs?(?= [^.;!?]{0,60}(?:push|thrust|recoil))', 'thermal emission', '(?:transient )?mass[- ]fluctuations?', 'mass(?: is (?:said|claimed) to| that)? (?:swings?|fluctuates?|oscillates?|varies)', 'Mach effect', 'expels? nothing', 'ejects? nothing', 'emits? nothing',
  'closed[- ](?:cavity|resonator|system|box|container|frame|vessel|frustum|loop drive)', '(?:hermetically )?sealed', 'enclosed', 'cavity', 'EM ?drive',
  'inertial (?:propulsion|drive|thrust)', 'field propulsion', 'unidirectional (?:force|thrust)', 'net thrust from inside', 'fuel-?less (?:thruster|drive|propulsion)',
  'pushes? (?:itself|against nothing)', 'self-propell\\w*', 'frustum', 'tapered (?:cavity|resonator|copper)',
  'microwave (?:thruster|drive|cavity|resonator)', 'resonant cavity', 'RF (?:thruster|cavity)', 'gyroscopic (?:thrust|lift|propulsion|drive|thruster)',
  'precession (?:drive|thruster|lift)', 'anti-?gravity', 'space drive', 'inertia drive', 'oscillation thruster', 'shuttl\\w+ masses', 'internal masses',
  'no (?:external )?reaction', 'momentum from nothing', 'stationary thruster', '(?:reaction mass|propellant|exhaust|mass expelled)[:,]? (?:none|zero|nil|0 kg)',
  // "with nothing ejected", "no mass leaving it", "nothing escaping": said after the noun as well.
  '(?:with )?nothing (?:being )?(?:ejected|expelled|emitted|escaping|vented|thrown out|leaving(?: it| the \\w+)?)',
  '(?:with )?no (?:mass|matter|material|gas|propellant|particles?) (?:being )?(?:leaving|escaping|ejected|expelled|emitted|vented|thrown out|leaves|escapes)',
];
/** A device said to carry and expel propellant: the photon-rocket bound does not apply, the rocket equation does. */
export const PROPELLANT_WORDS = [
  'propellant', 'xenon', 'krypton', 'argon', 'hydrazine', 'kerosene', 'oxidi[sz]er', 'fuel tanks?', 'exhaust (?:velocity|speed)', 'Isp', 'specific impulse',
  'ion (?:thruster|engine|drive)', 'Hall(?:-effect)? (?:thruster|effect thruster)', 'rocket', 'reaction mass', 'mass flow', 'nozzle', 'ejects?', 'expels?',
  'plasma thruster', 'resistojet', 'arcjet', 'cold[- ]gas', 'monopropellant', 'bipropellant', 'solid motor', 'jet engine', 'turbofan', 'propeller',
  'fans?', 'air-breathing', 'solar sails?', 'ion[- ]wind', 'ionic wind', 'corona(?: discharge)?', 'electrohydrodynamic', 'EHD', 'ionocraft', 'ablation', 'ablative', '(?:pushed|driven|propelled|illuminated|accelerated) by (?:a |an |the )?(?:[\\w-]+ ){0,3}?(?:lasers?|beams?|sunlight|light)',
  'ground(?:-based)? lasers?', 'laser-pushed', 'beamed (?:power|energy) from', 'tether',
  // Things that push on air or water (lawfully far above P/c).
  '(?:drone|quadcopter|multicopter|multirotor) (?:makers?|motors?|propellers?|rotors?|arms?|props?)', 'quadcopters?', 'multicopters?', 'multirotors?', 'helicopters?',
  'lifters?(?=[^.;!?]{0,80}(?:\\d ?kV|kilovolts?))', 'in (?:the )?(?:open|room|ambient|free|still|ordinary) air', 'rotor blades?', 'propellers?', 'props?', '(?:RC|R/C|radio[- ]controlled|model) (?:planes?|aircraft|airplanes?|aeroplanes?|helis?|gliders?|boats?)', '(?:air|aero)planes?', 'aircraft', 'paramotors?', 'hovercraft', 'ducted fans?', 'EDFs?', 'outboards?', 'boats?', 'water jets?', '(?:balsa|foil|ion|ionic|corona|EHD|high-voltage)[\\w-]*(?: [\\w-]+)? lifters?',
  'pushes? (?:on|against) (?:the )?(?:air|water)', 'tractors?', 'wheels? on the ground',
];

/** Phrases that say a device needs no input (the input power is then 0). */
export const SELF_RUNNING_WORDS = [
  'self-?running', 'self-?sustain(?:ing|ed|s)', 'self-?powered', 'self-?looped', 'self-?looping', 'self-?feeding', 'self-?charging', 'self-?perpetuating',
  'needs? no (?:external )?(?:power|energy|input|supply|fuel|battery|electricity|source)', 'requires? no (?:external )?(?:power|energy|input|supply|fuel|electricity|source)',
  'without (?:any )?(?:external )?(?:power|energy|input|supply|fuel|electricity)(?: source| supply| input)?', 'no (?:external )?(?:power|energy) (?:input|source|supply)',
  'no (?:external )?input', 'powers? itself', '(?:drawing|draws|consuming|consumes|using|uses|taking|takes) nothing', 'with nothing (?:going )?in',
  'no connection to (?:the )?(?:grid|mains|supply|power)', 'not connected to (?:the )?(?:grid|mains|any (?:supply|source))', 'zero input', 'runs? on its own (?:output|power)', 'unplugged', 'disconnected from the (?:mains|supply|grid|battery)',
  'feeds? (?:its own )?output back', '(?:takes|draws|uses|consumes|needs) no (?:power|energy|input|current|electricity|fuel)(?: at all)?',
  'with nothing (?:plugged in|connected|attached)(?: to drive it)?', 'nothing (?:plugged in|connected) to (?:drive|power|run) it',
  '(?:with )?nothing (?:driving|powering|feeding|turning|running) it', '(?:turns|spins|runs|keeps going|keeps turning|goes|turning|spinning) (?:on )?by itself',
  '(?:battery|supply|mains|power|source) (?:is |was |being )?(?:disconnected|taken out|removed|unplugged)', '(?:turning|running|spinning|going) on its own', '(?:battery|supply) (?:taken out|removed)',
  'nothing connected to it', 'with nothing connected', 'disconnected from', '(?:any |an )?outside (?:source|supply|power)', 'without (?:drawing|taking|using|consuming) anything(?: from outside)?',
  'no (?:electrical |electric |external |mechanical |outside )?(?:input|supply|power source|energy source)', 'no power at all', 'with no input', 'loop(?:ed|s)? (?:the )?output back', 'perpetual', 'runs? (?:by itself|on its own|forever|indefinitely)',
  'no fuel', 'fuel-?less', 'free energy', 'no (?:motor|engine|drive|battery) and no (?:other )?(?:input|supply|power)', 'no other (?:input|supply|power source|energy source|source of (?:power|energy))',
];
/** Where "self-powered" is lawful: the device harvests an outside flow of energy. */
export const HARVEST_WORDS = [
  'harvest\\w*', 'solar', 'photovoltaic', 'sunlight', 'light', 'vibrations?', 'body heat', 'thermal gradient', 'temperature difference', 'wind', 'tides?',
  'waves?', 'radio waves', 'RF energy', 'ambient (?:light|RF|vibration)', 'piezo\\w*', 'triboelectric',
  'nuclear', 'radioisotope', 'RTG', 'decay', 'chemical', 'fuel cell',
  // A vehicle or set that burns fuel (a "self-charging" hybrid charges from its engine).
  'petrol', 'gasoline', 'diesel', 'combustion engine', '(?:petrol|diesel|gas) engine', 'burns? (?:fuel|petrol|diesel|gas)', 'regenerative braking', 'braking',
];

/** Nouns after "5K" that make the K a thousand ("5K cycles"), not kelvins. */
export const THOUSAND_NOUNS = [
  'start(?:s|[–-]stop)?', 'charges?', 'discharges?', 'operations?', 'actuations?', 'revs?', 'kilomet(?:re|er)s?', 'cycles?', 'hours?', 'hrs?', 'rpm', 'RPM', 'revolutions?', 'rotations?', 'runs?', 'tests?', 'trials?', 'units?', 'miles?', 'km', 'steps?', 'iterations?',
  'shots?', 'pulses?', 'seconds?', 'minutes?', 'days?', 'cells?', 'orders?', 'customers?', 'users?', 'dollars?', 'euros?', 'pounds?', 'USD', 'EUR',
  'homes?', 'households?', 'devices?', 'vehicles?', 'cars?', 'operating hours', 'loops?', 'turns?', 'strokes?', 'rounds?', 'samples?', 'subscribers?',
  'watts?', 'W\\b', 'volts?', 'amps?', 'joules?', 'newtons?', 'feet', 'ft',
];

/** Hedges before a figure, and what they mean. */
export const HEDGES: readonly { hedge: 'up-to' | 'about' | 'at-least' | 'at-most' | 'more-than' | 'less-than'; words: readonly string[] }[] = [
  { hedge: 'up-to', words: ['up to', 'as much as', 'as high as', 'peaks? of', 'peaking at', 'maximum of', 'max(?:imum)?\\.?', 'a peak'] },
  { hedge: 'about', words: ['about', 'around', 'approximately', 'approx\\.?', 'roughly', 'nearly', 'almost', 'close to', 'some', 'circa', 'ca\\.', 'of order', '~', '≈', '∼', 'c\\.'] },
  { hedge: 'at-least', words: ['at least', 'no less than', 'not less than', 'a minimum of', 'minimum', '≥', '>='] },
  { hedge: 'at-most', words: ['at most', 'no more than', 'not more than', '≤', '<='] },
  { hedge: 'more-than', words: ['more than', 'over', 'above', 'in excess of', 'exceeding', 'upwards of', 'greater than', 'better than', 'beyond', '>'] },
  { hedge: 'less-than', words: ['less than', 'under', 'below', 'fewer than', 'lower than', '<'] },
];

/** COP: cooling words are looked for first, then heating words (within COP_WINDOW characters). */
export const COP_COOLING = ['cool(?:s|ed|ing|er|ers)?', 'refrigerat\\w*', 'chillers?', 'freezers?', 'fridges?', 'air[- ]condition\\w*', 'cryocoolers?'];
export const COP_HEATING = ['heating', 'heat[- ]pumps?', 'heaters?', 'warming', 'heat output', 'flow temperature', 'hot water', 'DHW', 'underfloor', 'radiators?'];

/** Words before a number that make it a label, not a figure ("Figure 2 A", "Section 3.2", "p. 12"). */
export const LABEL_WORDS = [
  'fig(?:ure)?s?\\.?', 'tables?', 'tab\\.', 'sections?', 'sec\\.', 'eqs?\\.?', 'equations?', 'refs?\\.?', 'references?',
  'pp?\\.', 'pages?', 'chapters?', 'ch\\.', 'nos?\\.', 'nr\\.', 'appendix', 'items?', 'lines?', 'col\\.', 'vol\\.', 'volume',
  'issue', 'step', 'example', 'grant',
];

/** Words between the efficiency keyword and a percentage that say it is a change, not an efficiency. */
export const EFFICIENCY_CHANGE_WORDS = ['by', 'increas\\w*', 'improv\\w*', 'gains?', 'drops?', 'dropped', 'loss(?:es)?', 'rais\\w*', 'boost\\w*', 'points?'];

/** Words allowed between "efficiency"/"COP" and a bare number ("an efficiency of 0.62", "COP = 4"). */
export const BARE_CONNECTORS = [
  'of', 'is', 'was', 'were', 'be', 'between', 'from', 'ranging from', 'ranges? from', 'lies', 'lay', 'sits', 'stands', 'varies', 'comes? (?:in )?(?:at|to)',
  'came (?:in )?(?:at|to)', 'works? out (?:at|to)', 'measured at', 'rated at', 'runs at', 'ran at', 'reached', 'in the range', 'range', 'reaching', 'ca\\.?', 'approx\\.?', 'c\\.', '~', '≈', 'reached', 'reaches', 'near', 'about', 'around', 'approximately', 'roughly',
  'up to', 'above', 'over', 'exceeding', 'as high as', 'equal to', 'rated', 'value', 'measured', 'a', 'an', 'the', 'somewhere', 'anywhere', 'of the order of', 'on the order of',
  'stated as', 'given as', 'quoted as', 'reported as', '(?:measured|found|determined|reported|estimated|calculated|said|claimed|shown) to be', 'at (?:this|that|the|full|part|rated) (?:operating point|load|conditions?|speed)',
];
