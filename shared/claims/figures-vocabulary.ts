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

export const UNIT_FORMS: readonly UnitForm[] = [
  // Thrust (force)
  { kind: 'thrust', unit: 'N', symbols: ['N'], words: ['newton', 'newtons'] },
  { kind: 'thrust', unit: 'mN', symbols: ['mN'], words: ['millinewton', 'millinewtons'] },
  { kind: 'thrust', unit: 'uN', symbols: micro('N'), words: ['micronewton', 'micronewtons'] },
  { kind: 'thrust', unit: 'nN', symbols: ['nN'], words: ['nanonewton', 'nanonewtons'] },
  { kind: 'thrust', unit: 'kN', symbols: ['kN'], words: ['kilonewton', 'kilonewtons'] },
  {
    kind: 'thrust',
    unit: 'lbf',
    symbols: ['lbf'],
    words: ['pound-force', 'pounds-force', 'pound of force', 'pounds of force', 'pound of thrust', 'pounds of thrust', 'lb of thrust', 'lbs of thrust', 'lbf of thrust'],
  },
  { kind: 'thrust', unit: 'kgf', symbols: ['kgf'], words: ['kilogram-force', 'kilograms-force', 'kg of thrust', 'kilogram of thrust', 'kilograms of thrust'] },
  { kind: 'thrust', unit: 'kgf', factor: GRAM_IN_KG, symbols: ['gf'], words: ['gram-force', 'grams-force', 'g of thrust', 'gram of thrust', 'grams of thrust'] },

  // Power
  { kind: 'power', unit: 'W', symbols: ['W'], words: ['watt', 'watts'] },
  { kind: 'power', unit: 'uW', symbols: micro('W'), words: ['microwatt', 'microwatts'] },
  { kind: 'power', unit: 'mW', symbols: ['mW'], words: ['milliwatt', 'milliwatts'] },
  { kind: 'power', unit: 'kW', symbols: ['kW', 'KW', 'kWe', 'kWt', 'kWth'], words: ['kilowatt', 'kilowatts'] },
  { kind: 'power', unit: 'MW', symbols: ['MW', 'MWe', 'MWt', 'MWth'], words: ['megawatt', 'megawatts'] },
  { kind: 'power', unit: 'GW', symbols: ['GW', 'GWe', 'GWt', 'GWth'], words: ['gigawatt', 'gigawatts'] },
  { kind: 'power', unit: 'hp', symbols: ['hp', 'HP', 'bhp'], words: ['horsepower', 'horse power'] },
  { kind: 'power', unit: 'BTU/h', symbols: ['BTU/h', 'Btu/h', 'BTU/hr', 'Btu/hr'], words: ['BTU per hour', 'BTUs per hour', 'British thermal units per hour'] },

  // Energy
  { kind: 'energy', unit: 'J', symbols: ['J'], words: ['joule', 'joules'] },
  { kind: 'energy', unit: 'mJ', symbols: ['mJ'], words: ['millijoule', 'millijoules'] },
  { kind: 'energy', unit: 'kJ', symbols: ['kJ'], words: ['kilojoule', 'kilojoules'] },
  { kind: 'energy', unit: 'MJ', symbols: ['MJ'], words: ['megajoule', 'megajoules'] },
  { kind: 'energy', unit: 'GJ', symbols: ['GJ'], words: ['gigajoule', 'gigajoules'] },
  { kind: 'energy', unit: 'Wh', symbols: ['Wh', 'W·h', 'W⋅h'], words: ['watt-hour', 'watt-hours'] },
  { kind: 'energy', unit: 'kWh', symbols: ['kWh', 'KWh', 'kW·h', 'kW⋅h'], words: ['kilowatt-hour', 'kilowatt-hours'] },
  { kind: 'energy', unit: 'MWh', symbols: ['MWh', 'MW·h', 'MW⋅h'], words: ['megawatt-hour', 'megawatt-hours'] },
  { kind: 'energy', unit: 'GWh', symbols: ['GWh'], words: ['gigawatt-hour', 'gigawatt-hours'] },
  { kind: 'energy', unit: 'BTU', symbols: ['BTU', 'Btu', 'btu', 'BTUs', 'Btus'], words: ['British thermal unit', 'British thermal units'] },
  { kind: 'energy', unit: 'J', factor: CALORIE_J, symbols: ['cal'], words: ['calorie', 'calories'] },
  { kind: 'energy', unit: 'kJ', factor: CALORIE_J, symbols: ['kcal'], words: ['kilocalorie', 'kilocalories'] },

  // Temperature
  { kind: 'temperature', unit: 'K', symbols: ['K'], words: ['kelvin', 'kelvins', 'degrees kelvin'] },
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
    words: ['metre per second', 'metres per second', 'meter per second', 'meters per second'],
  },
  {
    kind: 'speed',
    unit: 'km/s',
    symbols: ['km/s', 'km s^-1', 'km s⁻¹', 'km·s⁻¹'],
    words: ['kilometre per second', 'kilometres per second', 'kilometer per second', 'kilometers per second'],
  },
  {
    kind: 'speed',
    unit: 'km/h',
    symbols: ['km/h', 'km/hr', 'kph', 'km h^-1', 'km h⁻¹'],
    words: ['kilometre per hour', 'kilometres per hour', 'kilometer per hour', 'kilometers per hour'],
  },
  { kind: 'speed', unit: 'mi/h', symbols: ['mph', 'MPH', 'mi/h', 'mi/hr'], words: ['mile per hour', 'miles per hour'] },

  // Electric current
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
    role: 'in',
    before: [
      'draw(?:s|n|ing)?', 'drew', 'consum(?:e|es|ed|ing|ption)', 'inputs?', 'suppl(?:y|ies|ied|ying)', 'fed',
      'mains', 'uses', 'used', 'using', 'requir(?:e|es|ed|ing)', 'absorb(?:s|ed|ing)?', 'takes', 'taking', 'powered by',
      'put in', 'charged with',
    ],
    after: ['inputs?', 'drawn', 'consumed', 'consumption', 'supplied', 'used', 'absorbed', 'draw', 'fed'],
  },
  {
    role: 'out',
    before: [
      'deliver(?:s|ed|ing)?', 'produc(?:e|es|ed|ing|tion)', 'outputs?', 'generat(?:e|es|ed|ing|ion)', 'yield(?:s|ed|ing)?',
      'return(?:s|ed|ing)?', 'provid(?:e|es|ed|ing)', 'releas(?:e|es|ed|ing)', 'gives?', 'giving', 'gave', 'puts? out',
      'excess', 'surplus', 'emit(?:s|ted|ting)?', 'harvest(?:s|ed|ing)?', 'recover(?:s|ed|ing)?',
    ],
    after: ['outputs?', 'delivered', 'produced', 'generated', 'returned', 'yielded', 'recovered', 'released', 'excess', 'surplus'],
  },
];

export const TEMPERATURE_ROLES: readonly RoleWords[] = [
  {
    role: 'hot',
    before: ['hot', 'hotter', 'hottest', 'source', 'flames?', 'steam', 'boiler', 'furnace', 'combustion', 'burner', 'heated to', 'high-temperature'],
    after: ['source', 'flames?', 'steam', 'hot', 'boiler', 'furnace'],
  },
  {
    role: 'cold',
    before: [
      'cold', 'colder', 'coldest', 'ambient', 'room', 'sink', 'outside', 'outdoors?', 'river', 'sea', 'seawater', 'lake', 'ocean',
      'ground', 'environment', 'surroundings', 'atmosphere', 'cooling water', 'ice', 'condenser', 'low-temperature',
    ],
    after: ['sink', 'ambient', 'room', 'outside', 'outdoors?', 'environment', 'surroundings', 'cold', 'river', 'seawater'],
  },
];

/** COP: cooling words are looked for first, then heating words (within COP_WINDOW characters). */
export const COP_COOLING = ['cool(?:s|ed|ing|er|ers)?', 'refrigerat\\w*', 'chillers?', 'freezers?', 'fridges?', 'air[- ]condition\\w*', 'cryocoolers?'];
export const COP_HEATING = ['heating', 'heat[- ]pumps?', 'heaters?', 'warming'];

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
  'of', 'is', 'was', 'were', 'be', 'reaching', 'reached', 'reaches', 'near', 'about', 'around', 'approximately', 'roughly',
  'up to', 'above', 'over', 'exceeding', 'as high as', 'equal to', 'rated', 'value', 'measured', 'a', 'an', 'the',
];
