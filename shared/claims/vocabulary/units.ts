/**
 * The units of the figure reader's vocabulary (shared/claims/figures-vocabulary.ts): the written forms
 * of each unit a claim uses, with the mathjs unit and the kind of figure.
 *
 * Symbols are matched with their case ("mW" is not "MW"); words in any case, with a space or a
 * hyphen between their parts ("kilowatt-hours", "kilowatt hours"). Where mathjs has no unit for a
 * form (it has no calorie and no gram-force), `factor` converts the number into `unit`.
 */
import type { FigureKind } from '../types';

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
  /** A bare "ton": a ton of refrigeration only where the text names a cooling machine or a heat pump. */
  refrigeration?: boolean;
}

const MICRO = ['µ', 'μ', 'u'];
const micro = (rest: string) => MICRO.map((m) => m + rest);
/**
 * A volume of gas per minute or per hour in words: "litres per minute", "litres a minute", "liters of gas
 * each hour", "litres of hydrogen per minute".
 */
const flowWords = (time: 'minute' | 'hour') =>
  ['litre', 'litres', 'liter', 'liters'].flatMap((l) =>
    ['', ' of gas', ' of hydrogen', ' of HHO', ' of oxyhydrogen', ' of hydroxy gas', ' of mixed gas'].flatMap((of) => ['per', 'a', 'each', 'every'].map((a) => `${l}${of} ${a} ${time}`)),
  );

/**
 * Calories: mathjs 15 has no calorie, so "cal" is converted here with the thermochemical calorie,
 * 4.184 J exactly (NIST SP 811, Appendix B.8, "calorie_th"); the International Table calorie is
 * 4.1868 J. The thermochemical one is the one of chemistry and of food labels' kilocalories.
 */
const CALORIE_J = 4.184;
/** kcal_IT/h in W: 4186.8 / 3600 (NIST SP 811 Appendix B.8, calorie_IT = 4.1868 J). */
const KCAL_IT_PER_HOUR_W = 4186.8 / 3600;

/** Gram-force: mathjs knows kgf (9.80665 N) but not gf, so grams of thrust are written in kgf. */
const GRAM_IN_KG = 0.001;

/**
 * Metric horsepower (PS, CV, ch): 75 kgf·m/s = 735.498 75 W exactly (NIST SP 811, Appendix B.8,
 * "horsepower, metric"). mathjs's "hp" is the mechanical one, 550 ft·lbf/s ≈ 745.70 W.
 */
const METRIC_HP_W = 735.49875;

/** Foot pound-force in J: 0.3048 m × 4.448 221 615 260 5 N (NIST SP 811 Appendix B.8 prints 1.355 818). */
const FOOT_POUND_J = 0.3048 * 4.4482216152605;
/** Mechanical horsepower in W: 550 ft·lbf/s (NIST SP 811 Appendix B.8 prints 745.699 9). */
const HP_W = 550 * FOOT_POUND_J;

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
  // CGS force and the poundal (NIST SP 811 Appendix B.8: dyne = 1e-5 N; poundal = 0.453 592 37 kg × 0.3048 m/s², 0.138 255 N).
  { kind: 'thrust', unit: 'N', factor: 1e-5, symbols: ['dyn'], words: ['dyne', 'dynes'] },
  { kind: 'thrust', unit: 'N', factor: 0.45359237 * 0.3048, symbols: ['pdl'], words: ['poundal', 'poundals'] },
  { kind: 'thrust', unit: 'kgf', factor: 1e-6, symbols: ['mgf'], words: ['milligram-force', 'milligrams-force', 'mg of thrust', 'milligrams of thrust'] },

  // Power
  // "Wp", "kWp", "MWp" (watt-peak): the rated power of solar panels in standard test conditions, a trade usage.
  // Lower-case symbols as forum posts write them ("500w", "2kw", "12v"); "mw" and "a" stay out: mW or MW, and the article.
  { kind: 'power', unit: 'W', symbols: ['W', 'We', 'Wt', 'Wth', 'Wp', 'w'], words: ['watt', 'watts', 'watt-peak', 'watts-peak', 'watts peak'] },
  { kind: 'power', unit: 'uW', symbols: micro('W'), words: ['microwatt', 'microwatts'] },
  { kind: 'power', unit: 'mW', symbols: ['mW'], words: ['milliwatt', 'milliwatts'] },
  { kind: 'power', unit: 'nW', symbols: ['nW'], words: ['nanowatt', 'nanowatts'] },
  { kind: 'power', unit: 'pW', symbols: ['pW'], words: ['picowatt', 'picowatts'] },
  { kind: 'power', unit: 'kW', symbols: ['kW', 'KW', 'kWe', 'kWt', 'kWth', 'kWp', 'kw'], words: ['kilowatt', 'kilowatts', 'kilowatt-peak', 'kilowatts-peak', 'kilowatts peak', 'kilowatt peak'] },
  { kind: 'power', unit: 'MW', symbols: ['MW', 'MWe', 'MWt', 'MWth', 'MWp'], words: ['megawatt', 'megawatts'] },
  { kind: 'power', unit: 'GW', symbols: ['GW', 'GWe', 'GWt', 'GWth'], words: ['gigawatt', 'gigawatts'] },
  { kind: 'power', unit: 'TW', symbols: ['TW'], words: ['terawatt', 'terawatts'] },
  { kind: 'power', unit: 'hp', symbols: ['hp', 'HP', 'bhp', 'BHP', 'shp'], words: ['horsepower', 'horse power', 'mechanical horsepower', 'brake horsepower', 'brake horse power', 'shaft horsepower', 'shaft horse power', 'horse'] },
  // The electric horsepower, 746 W exactly (NIST SP 811 Appendix B.8, "horsepower (electric)").
  { kind: 'power', unit: 'W', factor: 746, words: ['electrical horsepower', 'electrical horse power', 'electric horsepower', 'electric horse power'] },
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
    words: ['BTU per hour', 'BTUs per hour', 'Btu per hour', 'British thermal units per hour', 'British thermal unit per hour', 'BTU an hour', 'BTUs an hour', 'Btu an hour', 'BTU a hour', 'British thermal units an hour'],
  },

  // Old and specialist notations of the same units: "H.P.", "B.Th.U. per hour".
  { kind: 'power', unit: 'hp', symbols: ['H.P.', 'h.p.', 'H. P.', 'I.H.P.', 'B.H.P.', 'ihp', 'IHP'], words: ['indicated horsepower', 'indicated horse-power'] },
  { kind: 'power', unit: 'BTU/h', symbols: ['B.Th.U./h', 'B.Th.U./hr', 'B.t.u./h', 'B.t.u./hr'], words: ['B.Th.U. per hour', 'B.t.u. per hour'] },
  // Work per unit time in foot-pounds (NIST SP 811 Appendix B.8: ft·lbf/s = 1.355 818 W, ft·lbf/min =
  // 2.259 697 E-02 W), the power of old engineering texts ("33,000 foot-pounds per minute" is 1 hp).
  { kind: 'power', unit: 'W', factor: FOOT_POUND_J, symbols: ['ft·lbf/s', 'ft-lbf/s', 'ft lbf/s', 'ft·lb/s', 'ft-lb/s', 'ft-lbs/s', 'ft.lb/s'], words: ['foot-pounds per second', 'foot-pound per second', 'foot pounds per second', 'ft-lb per second', 'ft-lbs per second'] },
  { kind: 'power', unit: 'W', factor: FOOT_POUND_J / 60, symbols: ['ft·lbf/min', 'ft-lbf/min', 'ft lbf/min', 'ft·lb/min', 'ft-lb/min', 'ft-lbs/min', 'ft.lb/min'], words: ['foot-pounds per minute', 'foot-pound per minute', 'foot pounds per minute', 'ft-lb per minute', 'ft-lbs per minute'] },
  // Kilogram-force metres per second (the metric horsepower is 75 of them; NIST SP 811 Appendix B.8, kgf = 9.806 65 N).
  { kind: 'power', unit: 'W', factor: 9.80665, symbols: ['kgf·m/s', 'kgf-m/s', 'kgfm/s', 'kp·m/s', 'kpm/s', 'kp-m/s'], words: ['kilogram-metres per second', 'kilogram-meters per second', 'kilogram-force metres per second'] },
  // Ergs per second (CGS; 1 erg = 1e-7 J exactly, NIST SP 811 Appendix B.8).
  { kind: 'power', unit: 'W', factor: 1e-7, symbols: ['erg/s', 'ergs/s', 'erg s⁻¹', 'erg s^-1'], words: ['ergs per second', 'erg per second'] },

  // A ton of refrigeration, 12 000 BTU_IT/h (NIST SP 811 Appendix B.8: 3.516 853 E+03 W): said outright,
  // or as a bare "ton" of a cooling machine or a heat pump ("a 3-ton heat pump", "the chiller carries about
  // 3 tons"), which the reader keeps only where the text names such a machine (`refrigeration`).
  { kind: 'power', unit: 'BTU/h', factor: 12000, symbols: ['TR'], words: ['ton of refrigeration', 'tons of refrigeration', 'refrigeration ton', 'refrigeration tons', 'ton of cooling', 'tons of cooling'] },
  { kind: 'power', unit: 'BTU/h', factor: 12000, refrigeration: true, words: ['ton', 'tons'] },
  // Thousands of BTU per hour, as US heating and cooling trade writes them ("MBH", "kBtu/h").
  { kind: 'power', unit: 'BTU/h', factor: 1000, symbols: ['MBH', 'MBtuh', 'kBtu/h', 'kBTU/h', 'kBtuh', 'kBtu/hr', 'kBTU/hr'], words: ['thousand BTU per hour', 'thousand Btu per hour'] },
  {
    // Kilocalories per hour, the heating and refrigeration duty of metric practice: the International
    // Table calorie (4.1868 J, NIST SP 811 Appendix B.8), so 1 kcal/h = 4186.8 J / 3600 s = 1.163 W.
    kind: 'power',
    unit: 'W',
    factor: KCAL_IT_PER_HOUR_W,
    symbols: ['kcal/h', 'kcal/hr', 'kcal/hour', 'Kcal/h', 'kcal h⁻¹'],
    words: ['kilocalories per hour', 'kilocalorie per hour', 'kcal per hour', 'kilocalories an hour'],
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
  { kind: 'energy', unit: 'kWh', symbols: ['kWh', 'KWh', 'kW·h', 'kW⋅h', 'kwh', 'KWH', 'kW-hr', 'kW-hrs', 'kW hr', 'kWhr', 'kW-h', 'kw-hr', 'KW-hr', 'KWHR', 'kWhrs'], words: ['kilowatt-hour', 'kilowatt-hours'] },
  { kind: 'energy', unit: 'MWh', symbols: ['MWh', 'MW·h', 'MW⋅h'], words: ['megawatt-hour', 'megawatt-hours'] },
  { kind: 'energy', unit: 'GWh', symbols: ['GWh'], words: ['gigawatt-hour', 'gigawatt-hours'] },
  { kind: 'energy', unit: 'TWh', symbols: ['TWh'], words: ['terawatt-hour', 'terawatt-hours'] },
  { kind: 'energy', unit: 'mWh', symbols: ['mWh'], words: ['milliwatt-hour', 'milliwatt-hours'] },
  { kind: 'energy', unit: 'uWh', symbols: micro('Wh'), words: ['microwatt-hour', 'microwatt-hours'] },
  { kind: 'energy', unit: 'TJ', symbols: ['TJ'], words: ['terajoule', 'terajoules'] },
  { kind: 'energy', unit: 'PJ', symbols: ['PJ'], words: ['petajoule', 'petajoules'] },
  { kind: 'energy', unit: 'EJ', symbols: ['EJ'], words: ['exajoule', 'exajoules'] },
  // The therm: 100 000 BTU (IT), 1.055 06 × 10⁸ J (NIST SP 811, Appendix B.8, "therm (EC)"; the U.S.
  // therm, 1.054 804 × 10⁸ J, differs by 0.02 %). MMBtu: a million BTU.
  { kind: 'energy', unit: 'BTU', factor: 1e5, symbols: ['thm'], words: ['therm', 'therms'] },
  { kind: 'energy', unit: 'BTU', factor: 1e6, symbols: ['MMBtu', 'MMBTU', 'mmBtu'], words: ['million BTU', 'million Btu', 'million BTUs', 'million British thermal units'] },
  { kind: 'energy', unit: 'BTU', symbols: ['BTU', 'Btu', 'btu', 'BTUs', 'Btus'], words: ['British thermal unit', 'British thermal units'] },
  // CGS and foot-pound energy (NIST SP 811 Appendix B.8: erg = 1e-7 J; ft·lbf = 1.355 818 J), a horsepower
  // over an hour (hp × 3600 s), and a tonne of oil equivalent (10⁷ kcal_IT = 41.868 GJ).
  { kind: 'energy', unit: 'J', factor: 1e-7, symbols: ['erg', 'ergs'], words: ['erg', 'ergs'] },
  { kind: 'energy', unit: 'J', factor: FOOT_POUND_J, symbols: ['ft·lbf', 'ft-lbf', 'ft lbf', 'ft·lbs', 'ft.lbf'], words: ['foot-pound', 'foot-pounds', 'foot pound', 'foot pounds', 'foot-pound-force', 'foot-pounds-force'] },
  { kind: 'energy', unit: 'J', factor: HP_W * 3600, symbols: ['hp·h', 'hp-h', 'hp-hr', 'hp·hr', 'hph', 'HP-hr', 'HP-h'], words: ['horsepower-hour', 'horsepower-hours', 'horsepower hour', 'horsepower hours', 'horse-power-hour', 'horse-power-hours'] },
  { kind: 'energy', unit: 'J', factor: 41.868e9, symbols: ['toe'], words: ['tonne of oil equivalent', 'tonnes of oil equivalent', 'ton of oil equivalent', 'tons of oil equivalent'] },
  { kind: 'energy', unit: 'BTU', symbols: ['B.Th.U.', 'B.Th.U', 'B.t.u.', 'B.T.U.'], words: ['B.Th.U.s'] },
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
    symbols: ['km/s', 'km s^-1', 'km s⁻¹', 'km·s⁻¹', 'km/sec'],
    words: ['kilometre per second', 'kilometres per second', 'kilometer per second', 'kilometers per second', 'km per second', 'km a second', 'kilometres a second', 'kilometers a second', 'km in each second', 'km in every second', 'km in a second', 'kilometres in each second', 'kilometres in a second', 'kilometers in each second', 'kilometres every second', 'km every second'],
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
  { kind: 'speed', unit: 'cm/s', symbols: ['cm/s', 'cm s^-1', 'cm s⁻¹', 'cm/sec', 'cm./sec.', 'cm. per sec.'], words: ['centimetre per second', 'centimetres per second', 'centimeter per second', 'centimeters per second', 'cm per second'] },
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
  { kind: 'duration', unit: 'ms', symbols: ['ms', 'msec'], words: ['millisecond', 'milliseconds'] },
  { kind: 'duration', unit: 'us', symbols: ['µs', 'μs'], words: ['microsecond', 'microseconds'] },
  { kind: 'duration', unit: 'ns', symbols: ['ns'], words: ['nanosecond', 'nanoseconds'] },
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
    words: flowWords('minute'),
  },
  { kind: 'gas-flow', unit: 'L/h', symbols: ['L/h', 'l/h', 'L/hr', 'l/hr', 'LPH', 'lph'], words: flowWords('hour') },
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
