/** The role words of the figure reader's vocabulary (shared/claims/figures-vocabulary.ts). */
import type { FigureRole } from '../types';

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
    before: ['excess', 'surplus', 'extra', 'net gain', 'net surplus', 'anomalous', 'unexplained', 'over-unity', 'overunity', '(?:output|out) exceed(?:s|ed|ing)? (?:the |its )?(?:input|consumption|supply) by', 'exceed(?:s|ed|ing)? (?:the |its )?(?:(?:electrical|electric|power|drive) )?(?:input|consumption|supply)(?: power)? by(?: (?:about|some|roughly|between|from))?'],
    after: ['excess', 'surplus', 'extra', '(?:from|out of) (?:nowhere|thin air|nothing)', 'more(?= than)', 'more(?= (?:[\\p{L}-]+ ){1,3}?than (?:that|this|it|what (?:it|they) (?:draws?|takes?|uses?|consumes?|gets?))(?!\\p{L}))', 'above(?= (?:the|its) input)', 'in excess', 'net gain',
      // "released 5.1 W more heat than the alumina dummy at the same input": more than a control run.
      'more(?= (?:[\\p{L}-]+ ){0,3}?than (?:the|a|an|its) (?:[\\p{L}-]+ ){0,2}?(?:dumm(?:y|ies)|blanks?|controls?|reference|inactive|calibration) )',
      // "2.1 kW more heat out than electricity in", "800 W more power at the crank than the cell takes": more
      // than what the machine itself takes.
      'more(?= (?:[\\p{L}-]+ ){0,5}?than (?:(?:the|its|it|they) )?(?:[\\p{L}-]+ ){0,2}?(?:takes|draws|uses|consumes|(?:goes |put |fed )?in(?=[,.;:)—–]| (?:and|—|–)|$)))',
      // "3.8 W more heat leaving the cell than the electrical power going in": more than what the device takes.
      'more(?= (?:[\\p{L}-]+ ){0,5}?than (?:the|its) (?:(?:electrical|electric|input|drive|supply) )?(?:power|energy|electricity|work|input)(?: (?:going in|put in|fed in|fed to it|supplied|drawn|consumed|taken|it (?:draws|takes|uses|consumes))|(?=[,.;)]| (?:and|over|during|for|in)\\b)))'],
  },
  {
    role: 'in',
    before: [
      // "which puts the water power at roughly 1.2 kW": the power of the flow a turbine or a collector takes.
      '(?:water|hydro|wind|stream|river) power (?:at|of|is|was|comes to|works out at)',
      // "The tank holds the equivalent of twelve kilowatt-hours": what a store holds is what it has to give.
      '(?:tanks?|batter(?:y|ies)|stores?|packs?|banks?|cylinders?|reservoirs?|capacitors?|accumulators?) holds?(?: (?:the equivalent of|about|some|roughly|up to))?(?:,? say,?)?',
      // "its 22.2 V, 10 Ah pack (222 Wh)": a store's energy in brackets after it is what it holds.
      '(?:batter(?:y|ies)|packs?|banks?|accumulators?) ?\\(',
      // "Feed it 5 V at 2 A": what a reader is told to give the device.
      '(?<![\\w-])(?:feed|feeding|give|giving|supply|supplying) (?:it|them|the (?:unit|device|box|board|module|converter|circuit|motor))(?: with)?(?:,? (?:what|say|um|uh|er|like),?)?',
      // A store's sheet labels its sides: "Charging from standstill: 2.04 kWh", "Charge energy = 15 kWh".
      '(?<=(?:^|\\n|[.;|•]) *)(?:re)?charg(?:e|ing)(?: (?:energy|input|side|in))?(?: [\\w-]+){0,8}?[^\\S\\n]*[:=](?=[^\\S\\n]*$)',
      '(?:battery|batteries|supply|mains|grid|source|pack|socket|outlet|rail|bus|line)(?: (?:that|which))? (?:supplying|supplies|supplied|providing|provides|delivering|delivers|gave up|gives up|feeding|feeds|fed|powering|powers|driving|drives|shows|showed|reads|read)',
      '(?:bench |lab |laboratory |power |mains )?(?:supply|mains|grid|socket|outlet) (?:provided|delivered|gave|powered|drove)',
      'meter (?:read|reads|recorded|records|showed|shows|measured|logged)', '(?:panel|input|source|PV|primary|supply|generator) side', 'primary',
      'draw(?:s|n|ing)?', 'drew', 'consum(?:e|es|ed|ing|ption)', 'inputs?',
      // "charges its coil with 50 J per cycle": what the device puts into its own coil or capacitor goes in.
      '(?:charg(?:es|ed|ing)|energi[sz](?:es|ed|ing)|pumps?|pumped|pumping) (?:its|the) (?:[\\w-]+ )?(?:coils?|capacitors?|caps?|inductors?|primary|tank circuit|capacitor bank) (?:up )?with',
      // "From a battery bank I give it 12 A at 24 V": what the writer gives the device goes in.
      '(?:I|we|you) (?:give|gave|feed|fed|supply|supplied|put in|apply|applied) (?:it|them|the (?:device|unit|machine|heater|motor|coil|circuit|cell|prototype))(?: with)?',
      // "hydrogen with a chemical energy of 120 MJ", "fuel energy: 40 MJ": what the fuel brings in.
      '(?:chemical|fuel) energy(?: content)?(?: of| is| was|:)?', 'supplied (?:with|by)',
      // "with the input stage supplied at 12 V and 2.1 A": what the device's stage is run at goes in.
      '(?<!(?:output|outputs|load|loads|grid|secondary)(?: (?:is|are|was|were|being))? )supplied (?:at|from)', '(?:is|was|are|were|being) supplied', 'supply(?: of| power| voltage| current|:)?', 'power supply', 'fed',
      // "the engine gave the dynamo about two kilowatts": what a generator is given is its input.
      '(?:gave|gives|give|delivered|delivers|supplied|supplies|fed|feeds|feeding) (?:the|its|a|an) (?:[\\w-]+ )?(?:dynamos?|generators?|alternators?)(?: with)?(?: (?:about|some|roughly|nearly|around))?',
      // A log's shorthand labels: "compressor + fan 2.31 kW", "heat in 6.9 kW", "Burner heat into the head 10.1 kW".
      'compressors?(?: (?:\\+|and|&) (?:the )?fans?)?(?: power| input| draw| elec(?:trical)?)?(?=[^\\S\\n]*[:=]?[^\\S\\n]*$)', 'compressors? (?:averag(?:ing|ed|es)|running at|drawing|pulling)', '(?:burner |gas |fuel )?heat (?:in|into (?:the |its )?(?:heater |hot )?(?:head|engine|end|side|receiver|cylinder|boiler|modules?|cycle|TEG))(?=[^\\S\\n]*[:=]?[^\\S\\n]*$)',
      'mains', '(?:taken|drawn|pulled) (?:from|off) the (?:wall|wall socket|socket|outlet|plug|grid)(?: socket)?(?:[^\\S\\n]*:)?', 'uses', 'used', 'using', '(?:annual|yearly|daily|weekly|monthly|energy|electricity|power|standby) use(?: of| is| was|:)?', 'requir(?:e|es|ed|ing)', 'absorb(?:s|ed|ing)?', 'takes', 'taking', 'powered by',
      '(?:for|per) (?:every|each)', 'put in', '(?:is|was|were|being)? ?given(?= *$)', '(?:electricity|electric(?:al)?(?: power| energy)?|power|energy|work|fuel|gas|drive|DC|AC|mains|grid|heat|thermal|optical|light|mechanical|shaft|hydraulic|solar|sun|battery|pack) in(?:[^\\S\\n]*\\([^()\\n]{0,25}\\))?[^\\S\\n]*[:=]?(?=[^\\S\\n]*$)', '(?<=(?:^|\\n|[;|•])[^\\S\\n]*)(?:in|input)(?:[^\\S\\n]*\\([^()\\n]{0,25}\\))?[^\\S\\n]*[:=]?(?=[^\\S\\n]*$)', 'charged (?:with|at)', 'charging at', 'pedall?(?:ing|ed|s)? (?:at|with)(?: (?:about|some|roughly|around|nearly|a steady))?', '(?:re)?charge (?:it|them|the (?:battery|pack|bank|store|unit|cells?)) (?:with|at|using)(?: (?:about|some|roughly|around|nearly))?', 'charged', 'fed (?:with|by|from)', '(?:is|are|was|were|being) fed', 'drive power', 'driving power', 'uptake', 'power uptake', 'intake', 'fed with', 'fed by', // ("from the 2 kW supply", not "calculated from the temperature rise of the salt, was 41 MJ".)
      // "makes 40 W of light with 60 W", "moves 40 W of heat with 60 W of electricity": after what it gives, what it takes.
      'of (?:visible )?(?:light|heat|warmth|cooling|refrigeration|electricity|electrical power|mechanical power|shaft power|work|sound|radio power|microwaves) (?:with|for|on)(?: (?:only|just|about|roughly|some|a mere))?(?= *$)',
      // "4.1 kW thermal from 1.2 kW electrical": the power a power said just before comes from.
      '\\d[\\d.,]*[^\\S\\n]*(?:[kMG]?W|watts?|kilowatts?|megawatts?)(?:[^\\S\\n]+(?:thermal|electrical|electric|mechanical|of (?:heat|warmth|warm air|hot air|hot water|cooling|light|electricity|shaft power)))?[^\\S\\n]+from(?:[^\\S\\n]+(?:just|only|about|roughly|some|a mere))?(?=[^\\S\\n]*$)',
      // "makes 1 600 lumen with 13 W", "gives 4 kW of heat on 1 kW": what it makes, said as a figure, it makes
      // with what goes in. (Not "supplies the engine with 6 kW", "gives it back with up to 100 kW".)
      '(?:makes?|making|made|gives?|giving|gave|produces?|producing|produced|delivers?|delivering|delivered|generates?|generating|generated|emits?|emitting|emitted|moves?|moving|moved|pumps?|pumping|pumped|removes?|removing|removed|extracts?|extracting|extracted|heats?|heating|heated)(?:[^\\S\\n]+(?:about|some|roughly|nearly|over|up to|around))?[^\\S\\n]+\\d[\\d.,\\u00a0\\u202f ]*(?:[^\\S\\n]*[\\p{L}µ°%²³/-]+){1,5}?[^\\S\\n]+(?:with|on|using)(?:[^\\S\\n]+(?:only|just|about|roughly|some|a mere))?(?=[^\\S\\n]*$)',
      'from a(?=(?:[^\\S\\n]+[\\p{L}\\d.,-]+){0,2}[^\\S\\n]*$)', 'from the(?=(?:[^\\S\\n]+[\\p{L}\\d.,-]+){0,2}[^\\S\\n]*$)', 'from (?:its|their|our|your)(?=(?:[^\\S\\n]+[\\p{L}\\d.,-]+){0,2}[^\\S\\n]*$)', 'from (?:about|around|roughly|some|nearly|approximately|approx\\.|ca\\.|~|just|only|a mere|merely)', 'for (?:only |just |a mere |about |roughly )?(?=$)', '(?<![\\w-])charge(?=[^\\S\\n]*$)', '(?:start-?up|initial|one-?time|priming|first) charge of', 'comes? from (?:its|the|a|an)', 'powered by (?:its|the|a|an)', 'pumped by (?:its|the|a|an)', 'driven by', 'driven with', 'excited by', 'excited with',
      'pumped with', 'pumping', 'pump power', 'at the input', 'on the input', 'input side', 'electrical input', 'energy cost', 'costs?', 'needs?',
      'needing', 'eats?', 'pulls?', 'pulling', 'runs? (?:on|off)', 'running (?:on|off)', 'operat(?:es|ing|ed) (?:on|at|from)', '(?:burners?|flames?|combustion|furnaces?) (?:released|releases|releasing|supplied|supplies|supplying|fed|feeds|feeding)', 'driven (?:at|with)', 'supply of', 'battery',
      'wall socket', 'socket', 'plug', 'in:', 'with only', 'on only', 'on just', 'with just', 'spent', 'spends?', 'dissipat(?:e|es|ed|ing)',
      'took', 'turned by', 'by a', 'fuel', '(?:energy|heat|calorific) (?:content|value)(?: of (?:the |its )?(?:fuel|gas|diesel|petrol|coal|wood))?(?:[^\\S\\n]+[\\w\x27\u2019-]+){0,5}?[^\\S\\n]+(?:put|puts|estimated|given|stated|reckoned|calculated|taken) (?:it |them )?(?:at|as)', 'containing', 'P_?\\{?in\\}?', 'E_?\\{?in\\}?', 'Pin', 'invest(?:s|ed|ing)?', 'gas input', 'fuel input',
      // "36 W for a heat flow of 150 W", "a thermal input of 2 kW": the heat a converter takes.
      'for (?:a|an|the) (?:heat flow|heat flux|heat input|thermal input|heat supply) of', '(?:fuel|hydrogen|gas|heat|steam|propane|methane|diesel|biogas|natural gas) feed(?: rate)?', '(?:heat|thermal) input(?: of| was| is|:)?',
      // "received solar energy on its aperture totalling 27 kWh": the sunlight a collector or a cell takes.
      '(?:received|receives|receiving|intercepted|intercepts) (?:[\\w-]+ ){0,2}?(?:solar |sun |incident )?(?:energy|radiation|irradiation|sunlight|insolation|light)(?: [\\w-]+){0,4}? (?:totalling|totaling|amounting to|of)',
      // "the laptop charger is rated 65 W": what a charger or an adapter gives is what the charged device takes.
      '(?:charger|adapter|adaptor|PSU|power brick)(?: is| was)?(?: rated)?(?: at| for)?',
      // A worked line: "in = 2 kW × 2400 s = 4.8 MJ".
      '(?<![\\w-])in ?=',
      // "heat released in the boiler 21.4 GWh": the heat a station's boiler or a reactor's core gives its steam is the engine's input.
      '(?:heat|energy) (?:released|liberated|generated|produced|supplied|raised) (?:in|by|from) (?:the |its )?(?:boilers?|furnaces?|burners?|combustion(?: chamber)?|reactor(?: core)?|core|fire ?box)(?:[^\\S\\n]*[:=])?',
      // "the heat supplied to the engine was 250 W": what is supplied to the machine is its input.
      '(?:heat|power|energy|electricity|fuel|current|work) (?:supplied|fed|given) (?:in)?to (?:the|its|a|an) (?:[\\w-]+ ){0,2}?(?:engines?|motors?|devices?|machines?|heaters?|converters?|modules?|cells?|reactors?|thrusters?|coils?|generators?|prototypes?|rigs?)(?: (?:was|is|were|of|came to|amounted to|totall?ed))?',
    ],
    after: [
      // "plugging in at the 2 MW shore charger": what a charger gives is what the pack takes in.
      '(?:(?:shore|fast|rapid|wall|home|mains|onboard|on-board|depot|DC|AC|EV|public|solar|trickle)[- ])?chargers?(?!\\p{L})',
      // "The ½ hp motor turns the generator": a motor's rating, the motor driving the generator, is what the generator is given.
      // ("a 1.5–1.8 kW induction motor turns a ~2 kW alternator": the motor's kind named, the generator's rating hedged.)
      '(?:(?:induction|DC|AC|brushless|brushed|universal|stepper|servo|synchronous|three-phase|single-phase|hub|treadmill|washing-machine|scrap|old|small|big|little) )?(?:electric |drive |driving )?motors?(?: (?:that|which))? (?:(?:really|then|just|only) )?(?:turns?|drives?|runs?|run|spins?|powers?) (?:the|a|an|its|our|their|this|that) (?:[\\w~≈.,–-]+ ){0,3}?(?:generators?|alternators?|dynamos?|generator heads?|gensets?)(?!\\p{L})',
      // "ran nine days on a single 10 kWh charge": the store's charge is what the device had to run on.
      '(?:charge|battery charge|full charge)(?= *(?:[,.;:)]|$|and|of|in|lasts?|lasted|runs?|ran|will|would|gives?|gave|is|was))',
      // "with 180 W of heat passing through it": the heat a thermoelectric module takes.
      'of heat (?:passing|flowing|going|moving) (?:through|across) (?:it|them|the (?:module|modules|TEG|device|element|junction))',
      'of (?:pedall?ing|cranking|muscle power|human power|human effort|effort|shaking|winding)',
      // "500 W at the primary, 650 W at the secondary": a transformer's primary winding takes its input.
      '(?:at|on|in|into|through) (?:the|its) primary(?: (?:side|winding|coil|terminals))?(?!\\p{L})', 
      // "an electric motor of 5 hp drives, through a gearbox, a generator": what drives the generator is the set's input.
      '(?:drives|driving|drove|turns|turning|spins|spinning)(?:,[^.;!?\\n]{0,60},)? (?:a|the|its) (?:[\\w-]+ )?(?:generators?|alternators?|dynamos?)', 'from the (?:wall|mains|socket|outlet|plug|grid|(?:bench |power |lab |DC |AC )?supply|battery|batteries)', 'compressors?',
      '(?:that |which )?(?:it|the (?:device|unit|rig|machine|system|motor|circuit|cell|coil)) (?:draws|drew|consumes|consumed|uses|used|takes|took|needs|is fed|was fed|receives|received|is given|was given|pulls|requires|is supplied with|was supplied with|is fed with|was fed with|runs on|ran on)',
      '(?:was|were|is|are) (?:consumed|drawn|used|supplied|burned|burnt|fed in|put in)', 'drive power',
      // "the 960 W the motor is said to draw".
      '(?:that |which )?(?:it|the (?:[\\w-]+ )?(?:device|unit|rig|machine|system|motor|circuit|cell|coil|heater|pump)) (?:is|was|are|were) (?:said|claimed|reported|supposed|rated) to (?:draw|take|use|consume|need)',
      // "2.4e-3 J going into the coil per pulse": what goes into the device's own part.
      '(?:going|goes|go|went|fed|put|flowing|flows) in(?:to (?:the|its) (?:[\\w-]+ )?(?:coils?|device|unit|circuit|primary|input|driver|cell|stack|drive|cavity|thruster|module|rig|system|elements?|heaters?|filaments?|windings?|resistors?))?(?! (?:the|a|an) (?:load|grid|battery|cap|capacitor|tank|store|heater))',
      '(?:which|that) (?:is|are|was|were) (?:put|fed) in(?:to it)?', 'of (?:input|supply|alternator|battery|mains|grid|compressor|drive|motor) (?:power|energy|electricity)', 'of excitation', 'of drive', '(?:battery )?pack', 'battery', 'of (?:chemical|fuel) (?:power|energy)', 'chemical (?:power|energy)', '\\((?:LHV|HHV)\\)', 'of drive(?: power)?', 'uptake',
      'spent(?= (?:in|on|over|during|for|to|by)\\b|[,.;:)])', 'inputs?(?! (?:leaves|leaving|left|comes? out|came out|emerges?|emerging|is emitted|was emitted|is given off|ends? up|ended up|becomes|became|is turned into|is converted (?:in)?to))', '(?:"|“)?drawn(?! from (?:the )?(?:quantum )?(?:vacuum|zero[- ]point|a?ether|nowhere|nothing|thin air))', 'consumed', 'consumption', 'supplied', 'used', 'absorbed', 'draw', 'fed', 
      // "a 65 W charger": see the same word before the figure.
      '(?:USB[- ]?C |fast |wall |mains |GaN |travel )?(?:charger|adapter|adaptor|PSU|power brick)(?! (?:delivers|gives|puts|supplies|outputs))',
      // "about 120 W of sunlight falls on its folds": the light a panel takes.
      'of (?:sun)?light (?:falls|falling|fell|lands|landing|shines|shining|arrives|arriving|strikes|striking|hits|hitting)',
      // "2.0 mW of 405 nm light on the detector", "5 W of laser light onto the cell": the light a detector or a converter takes.
      'of (?:[\\w.-]+ ){0,3}?(?:light|laser light|radiation|illumination|beam) (?:on|onto|incident on|into|falling on) (?:the|its|a|an) (?:[\\w-]+ )?(?:detectors?|photodiodes?|diodes?|sensors?|cells?|panels?|photocells?|receivers?|absorbers?|targets?|samples?|chips?|junctions?|modules?|converters?)', 'of (?:incident |incoming )?(?:sunlight|solar (?:power|radiation|energy)|irradiance)', '(?:home |storage |lithium |lead-acid )?battery', 'of fuel', 'of gas', 'of diesel', 'in(?=\\s*(?:and\\b|,|to\\b))', 'of input', 'of supply', 'supply',
      // "the array feeds 8.2 A at 36 V into the charge controller": what goes into a converter is its input.
      'into (?:the|its|a|an) (?:[\\w\\x27\\u2019-]+ )?(?:controllers?|inverters?|converters?|regulators?|MPPTs?|chargers?|rectifiers?|electroly[sz]ers?)',
      // "a rider puts about 120 W into the cranks": what the rider gives the pedals is the machine's input.
      'into (?:the|its|their|his|her) (?:cranks?|pedals?|treadles?)',
      // "each press puts 6.0e-4 J of mechanical work into the piezo stack": what is put into a harvester or a transducer is what it takes.
      '(?:of (?:[\\w-]+ )?(?:work|energy|power) )?into (?:the|its|a|an) (?:[\\w-]+ )?(?:stacks?|transducers?|harvesters?|piezos?|piezoelectric (?:elements?|discs?|crystals?))'],
  },
  {
    role: 'out',
    before: [
      // "On its trial it developed 412 indicated horse-power", "indicated 140 H.P. on test": what an engine develops is its output.
      'develop(?:s|ed|ing)?', 'indicated(?= *(?:about |some |roughly |over |nearly )?$)',
      // "converting 4.5 % of the heat it passes into electricity — 12 W": the electricity a converter makes, said right after.
      '(?:into|to|as) (?:electricity|electrical power|electric power|usable power)(?: *[—–:]| *,| +-)(?= *(?:about |some |roughly |around |nearly |just |only )?$)',
      // "the battery sees somewhere between 300 and 400 W": what reaches the store at the end of the chain.
      '(?:the |its )?(?:batter(?:y|ies)|bank|pack) (?:sees|saw)(?: (?:somewhere|about|around|roughly|only|just))?(?: between)?',
      // "… take out 12 V at 3 A", "you get back 1.3 kWh": what a reader is told to take from the device.
      '(?<![\\w-])(?:take|get|pull)s? (?:out|back)(?: of it)?',
      // "pushes 150 W of clean AC into your appliances".
      // (Not a supply's: "its 48 V battery can push up to 30 A into the hub motor".)
      '(?<!(?:batter(?:y|ies)|suppl(?:y|ies)|mains|grid|packs?|sources?|cells?|chargers?) (?:can |could |will |would |may )?)push(?:es|ed|ing)?(?: out)?(?= *(?:about |some |roughly |up to )?$)',
      // "Discharge into the resistor bank down to standstill: 1.79 kWh", "Discharge energy: 13.2 kWh".
      '(?<=(?:^|\\n|[.;|•]) *)discharg(?:e|ing)(?: (?:energy|output|side|out))?(?: [\\w-]+){0,8}?[^\\S\\n]*[:=](?=[^\\S\\n]*$)',
      // "up to 10 hours at half load (2.5 kW)": the load a source carries is what it gives.
      '(?:at|on|under) (?:(?:half|full|quarter|three-quarters?|part|partial|light|low|(?:\\d+ ?%|\\d+ per ?cent)) )load(?: of| \\()',
      // "Pedalling at 150 W for an hour charged the battery with 0.12 kWh": what a device charges a store with is what it gives.
      '(?:re)?charg(?:ed|es|ing) (?:the|its|a|an) (?:[\\w-]+ )?(?:battery|batteries|pack|bank|cells?|store|phone|capacitors?|supercaps?)(?: (?:with|to|by))?(?: (?:about|some|roughly|around|nearly|only|just))?',
      // "charge it with 15 kWh and you draw 13.5 kWh": what the user draws from a store is what it gives.
      '(?:you|we|I|users?|owners?|the (?:house|home|household|load|car|van|inverter)) (?:can |could |will |then )?(?:draw|draws|drew|drawn|take|takes|took|get|gets|got|pull|pulls|pulled)(?: (?:back|out))?(?: (?:about|some|roughly|around|nearly|up to))?',
      // "generator output into the site battery: 18 A at 48 V": what goes into a store is the device's output.
      '(?:output|delivered|feeds?|fed|sends?|sent|charging current|charge) (?:in)?to (?:the |its |a )?(?:[\\w-]+ )?(?:battery|batteries|pack|bank|grid|store|load)(?:[^\\S\\n]*[:=])?',
      // (Before the plain word "output" below: the first alternative that fits wins.)
      // "its output meter logged 250 kWh" (before the input's plain "meter logged").
      '(?:output|load|export|generation) (?:meter|counter|logger|log)s? (?:[\\w-]+ )?(?:read|reads|recorded|records|showed|shows|measured|logged|logs|registered|counted|gave)',
      'outputs? (?:to|into) (?:the |its |a |an )?(?:[\\w-]+ ){0,3}?(?:is|was|are|were|of|at|reaches|reached)',
      '(?:loads?|load resistors?|resistors?|dummy loads?|lamps?|heaters?|heating elements?) (?:(?:on|across|at) (?:the |its )?(?:secondary|output)(?: side| winding| terminals)? )?(?:is |was |are |were )?(?:(?:said|reported|measured|found|seen|observed|shown|calculated|estimated) to )?(?:dissipat\\w*|consum\\w*|absorb\\w*|tak(?:e|es|ing))', '(?:the |its )?(?:batter(?:y|ies)|cells?|capacitors?|water|tank|store|flywheel|load)(?: bank| pack)? (?:accepted|absorbed|received|took up|takes up|stored|gained|was given)', 'deliver(?:s|ed|ing)?', 'produc(?:e|es|ed|ing|tion)', 'outputs?', '(?:heating|cooling|refrigerating) (?:capacity|duty)', 'generat(?:e|es|ed|ing|ion)', 'yield(?:s|ed|ing)?',
      '(?:burns?|burned|burnt|burning) (?:for|to give|to yield|to release)', '(?:raised|raises|increased|increases|boosted|added to) (?:the |its )?(?:heat|energy|enthalpy|charge|temperature)(?: [\\w-]+){0,5}? by', '(?:electricity|electric(?:al)?(?: power| energy)?|power|energy|work|heat|light|optical(?: power)?|thermal(?: power)?|mechanical(?: power)?|hydraulic(?: power)?|shaft(?: power)?|DC|AC|mains|grid|battery|pack) out(?:[^\\S\\n]*\\([^()\\n]{0,25}\\))?[^\\S\\n]*(?:[^\\S\\n]*[:=])?(?=[^\\S\\n]*$)', '(?<=(?:^|\\n|[;|•])[^\\S\\n]*)(?:out|output)(?:[^\\S\\n]*\\([^()\\n]{0,25}\\))?[^\\S\\n]*[:=]?(?=[^\\S\\n]*$)', '(?:(?<!(?:much|more|less|of|the|its|their|our|electric|electrical|input|output|shaft|total|rated|peak|full|no|enough|little|some|any|what|mean|average|useful) )powers?|powered|powering|lights?|lit|lighting|keeps?|kept|drives?|drove|driving|driven|ran|run) (?:a|an|the|our|my|their|two|three|four|several)', '(?:shone|shines|shining|glow(?:s|ed|ing)?|burn(?:s|ed|ing)|lit) (?:at|with)(?= *$)', 'charg(?:e|es|ed|ing) (?:a|an|the|its|their|our) (?:[\\w-]+ ){0,2}(?:batter(?:y|ies)|cells?|packs?|capacitors?|banks?) (?:with|at)', 'return(?:s|ed|ing)?', 'provid(?:e|es|ed|ing)', 'releas(?:e|es|ed|ing)', 'gives?', 'giving', 'gave', 'puts? out',
      '(?:turn(?:s|ed|ing)?|convert(?:s|ed|ing)?|chang(?:es|ed|ing)) (?:it|this|that|them|these|those) into(?: (?:about|some|roughly|nearly|around))?',
      'emit(?:s|ted|ting)?', 'harvest(?:s|ed|ing)?', 'recover(?:s|ed|ing)?', 'puts? out', 'pumps? out', 'sends? back', 'feeds? back',
      '(?<!(?:of|a|an|the|its|our|their|his|her|my|your|this|that) )(?:lights?|lighting|lit|powers?|powering|runs?|running|drives?|driving|feeds?|feeding) (?:a|an|the|its|two|three|four|several)? ?(?:[\\w-]+ ){0,4}?(?:taking|drawing|using|consuming|rated at|that (?:take|takes|draw|draws|use|uses|consume|consumes))', 'drives? (?:a|an|the|its)', 'driving (?:a|an|the|its)', 'running (?:a|an|the|its)', 'turning (?:a|an|the|its)', 'logged', 'feeds', 'feeding', 'sells?', 'sold', 'fill(?:s|ed|ing)? (?:a|an|the)', 'charg(?:es|ed|ing) (?:a|an|the|its) (?:[\\w-]+ ){0,2}(?:batter(?:y|ies)|cells?|capacitors?|accumulators?)(?: (?:bank|pack|stack))?(?: (?:at|with|to))?', 'charg(?:es|ed|ing) (?:a|an|the|its)', 'powers(?! (?:of|between|from|ranging|in the range|up to|above|below)\\b)', 'powering', 'export(?:s|ed|ing)?', 'made', 'makes', 'to make', 'making', 'supplies', 'supplying', 'supplied', 'putting out', '(?<!(?:tanks?|batter(?:y|ies)|stores?|packs?|banks?|cylinders?|reservoirs?|capacitors?|cells?|flywheels?|accumulators?) )holds',
      '(?:is |was |are |were )?(?:said|claimed|reported|supposed|meant) to have (?:stored|received|absorbed|gained|taken up|banked)', 'on the (?:dummy )?load', 'into the (?:dummy )?load', 'lights?', 'lighting', 'heats (?:up |the |a |an |our |your )', 'heating (?:up |the |a |an |our |your )', 'load of', 'into a load', 'came out', 'comes out', 'out of it',
      // A log's shorthand labels: "heat to loop 9.47 kW", "Shaft 3.12 kW", "Brake 1.85 kW", "Cooling 352 kW".
      '(?:heat|heating) to (?:the )?(?:loop|water|load|house|home|floor|floors|rads?|radiators?|circuit|tank|room|building|space)(?=[^\\S\\n]*[:=]?[^\\S\\n]*$)', '(?:shaft|brake)(?: power| output)?(?=[^\\S\\n]*[:=]?[^\\S\\n]*$)', '(?:cooling|refrigerating)(?: capacity| duty| power| output)?(?=[^\\S\\n]*[:=]?[^\\S\\n]*$)',
      // A log's "Load: 40 W lamp".
      '(?<=(?:^|\\n)[^\\S\\n]*)loads?[^\\S\\n]*[:=]',
      'got out', 'gets out', 'obtained', 'measured at the output', 'at the output', 'on the output', 'output side', 'useful', 'electrical output',
      'supplies a', 'supplying a', '(?:can|could|will|would|may|might|should|shall|must|able to) (?:supply|provide)', 'give', 'gives back', 'returns', 'return of', 'keeps?', 'kept', 'ran (?:a|an|the)', 'runs? (?:a|an|the)', 'gain(?:s|ed)?',
      '(?:battery|output|load|consumer|secondary|grid) side', 'secondary', 'puts(?! (?:it |them )?at)', 'put(?! (?:it |them )?at)',
      // "the pulse-tube stage lifts 0.15 W at 4.2 K": the heat a cooler lifts is what it gives (its cooling).
      '(?:lifts|lifting|lifted)(?= (?:about |only |just |roughly |some |up to )?$)', 'turns? out', 'discharg(?:ed|ing|es)(?: at)?', '(?:can|could|will|would|to) discharge(?: at)?', 'gave back', 'on the shaft', 'at the shaft', '(?:generators?|alternators?|dynamos?)(?: (?!(?:is|was|are|were|being|been)\\b)[\\w-]+){0,5}? (?:sends?|sent|pushes|pushed|returns?|returned|puts? back|delivers|supplies)', '(?:shaft|brake) (?:power|output)(?:\x27s|\u2019s)?', '(?:propulsive|shaft|brake|mechanical) \\((?:shaft|brake|propulsive|mechanical)\\) (?:power|output)', 'propulsive (?:power|output)', 'dump(?:s|ed)?', '(?<![\\w-])out ?=', 'P_?\\{?out\\}?', 'E_?\\{?out\\}?', 'W_?\\{?out\\}?', 'P_?o', 'Pout', 'into the (?:load|grid|house|battery|bath|tank)',
    ],
    after: [
      // "recorded 46 W of heat leaving it", "120 W coming out of the reactor": what leaves the device is its output.
      // "about 4.5 W leaves as visible light": what leaves as light, work or electricity is given out.
      '(?:leaves?|left|leaving|comes? out|came out|coming out|goes out|went out|emerges?|emerged|emerging|is given off|is emitted|is radiated) as (?:visible |useful |usable )?(?:light|electricity|work|motion|sound|radio waves)',
      '(?:of (?:[\\w-]+ ){0,2}?(?:heat|power|energy|electricity|light|warmth) )?(?:leaving|leaves|left|exiting|exits|exited|flowing out of|flows out of|coming out of|comes out of|came out of|given off by|released by|emitted by|radiated by) (?:it|them|the (?:[\\w-]+ )?(?:cell|device|reactor|unit|box|module|core|rig|engine|motor|heater|machine|system|prototype|stack|apparatus|tube|vessel|generator))(?![\\w-])',
      // "4.4 W of the input leaves as visible light": the part of the input that comes out as the output.
      'of (?:the|its) (?:[\\w-]+ )?(?:input|power|energy|electricity)(?: [\\w-]+)? (?:leaves|leaving|left|comes? out|came out|emerges?|emerging|is emitted|was emitted|is given off|ends? up|ended up|becomes|became|is turned into|is converted (?:in)?to)',
      // "8.9 kWh ended up in the stored water": what reaches the heated water or the load is what the device gives.
      '(?:ended|ends|end|finished) up (?:in|as) (?:the |its )?(?:[\\w-]+ )?(?:water|tank|cylinder|load|room|rooms|house|building|heat|light)',
      // "650 W at the secondary": what a transformer's secondary winding gives is its output.
      '(?:at|on|from|out of) (?:the|its) secondary(?: (?:side|winding|coil|terminals))?(?!\\p{L})',
      // "seven kilowatts to the wheels": what reaches the wheels is what the drive gives.
      '(?:to|at) the (?:driven )?wheels?',
      // "4.1 kW thermal from 1.2 kW electrical": what comes from another power is the output.
      '(?:(?:thermal|electrical|electric|mechanical|of (?:heat|warmth|warm air|hot air|hot water|cooling|light|electricity|shaft power))[^\\S\\n]+)?from(?=[^\\S\\n]+(?:(?:just|only|about|roughly|some|a mere)[^\\S\\n]+)?\\d[\\d.,]*[^\\S\\n]*(?:[kMG]?W|watts?|kilowatts?|megawatts?)(?![\\p{L}/·]))',
      // "heats the house with 12 kW of warm air": warm air or hot water given is output.
      'of (?:warm|hot|heated) (?:air|water)',
      // "its combustion adds up to 2.1 kW to the engine's output": what is added to an output is output.
      '(?:to|onto) (?:the |its |an? )?(?:[\\w-]+(?:\'s|’s)? )?(?:output|power output|shaft output|electrical output)',
      // "3.1e-2 J coming out into the cap on the collector side": what comes out of the device.
      '(?:coming|comes|came|going|goes|went|flowing|flows) out(?! of (?:the|a|an) (?:wall|mains|socket|supply|grid|battery))',
      // "for every 10 kWh we put in, about 8.6 kWh comes back out": what a store gives back.
      '(?:coming|comes|came) back(?: out)?(?! (?:in|into|to (?:the|its) (?:input|supply|source)))',
      // "1.5 kW of hydraulic power at the duty point": what a pump gives the water.
      'of hydraulic (?:power|output|work)',
      // "produces 100 kW gross, 35 kW net after the pumps": a plant's gross and net outputs.
      '(?:gross|net)(?= *(?:[,.;)]|$|after|of|output|electrical|electric|to the grid|at the|once|when|and))(?! (?:input|consumption|import|draw|gain|surplus|excess))',
      // "980 W, or 1.33 PS, of useful work": what the device gives.
      '(?:,[^\\S\\n]*or[^\\S\\n]+[\\d.,]+[^\\S\\n]*[\\p{L}]{1,4},[^\\S\\n]*)?of useful (?:work|power|output|mechanical (?:work|power)|lifting (?:work|power))',
      // A rating said before what makes power: "the 600 MW coal unit", "a 5 kW genset" (not a motor or engine, which may be what drives the device).
      '(?<!(?:of|from|off|by|on)[^\\S\\n]+(?:the[^\\S\\n]+|its[^\\S\\n]+|a[^\\S\\n]+|an[^\\S\\n]+)?)(?:(?!(?:from|off|of|to|by|at|in|on|into|onto|with|for|the|a|an|its|their|our|and|or|per)\\b)[\\w-]+ ){0,2}(?:power plants?|power stations?|plants?|(?:coal|steam|gas|nuclear|geothermal|hydro|wind|solar|CCGT|generating|(?:coal|gas|oil|lignite|biomass)-fired) units?|gensets?|generating sets?|generators?|turbines?)(?! (?:draws?|takes?|consumes?|uses?|needs?|is fed|was fed|runs? on))',
      '(?:that |which )?(?:it|the (?:device|unit|rig|machine|system|motor|circuit|cell|coil)) (?:delivers|delivered|produces|produced|gives|gave|generates|generated|puts out|returns|returned|yields|yielded)',
      // "1.35 kW going out to the pump": what is sent on to a load.
      '(?:going|goes|went|sent|flowing|flows|flowed)(?: back)? out(?= to )', '(?:going|goes|went|sent|flowing|flows|flowed) to (?:the|its|a|an) (?:[\\w-]+ )?(?:house|home|grid|load|network|building|motor|lamp|heater|pump|device|lights?|appliance)',
      'to (?:the|its|their|a|an) (?:house|home|grid|load|network|building|car|motor|lamp|heater|pump|phone|device|string|bulb|lamps|wheel|laptop|computer|tablet|appliance|consumer|user|bank|lights?|heating|tank)', 'into the (?:[\\w\\x27\\u2019-]+ )?(?:battery|pack|grid|load|bank|network|mains|store|tank|reservoir|pond|basin|line|lines|feeder|busbar)(?: bank)?', 'net(?= (?:output|from|at|to|into|of electricity|electrical)|[,.;]|$)', '(?:was|were|is|are) (?:delivered|produced|generated|returned|exported|recovered)',
      'on (?:the|its) (?:shaft|output(?: terminals)?|load)', 'at (?:the|its) (?:output )?terminals', 'at the (?:crank|output |drive |propeller |main )?shaft', 'at the (?:winch |cable |rope )?(?:drum|hook|wheels?|axles?|spindle|propeller|rotor hub|crank)', 'at the (?:wheels?|axles?|flywheel|crank)', 'of shaft power', 'on its output terminals',
      // "4.8 kWh 'drawn from the vacuum'": what a claimed source gives, not what it takes.
      '(?:"|“|\x27|‘)?(?:drawn|taken|extracted|harvested|pulled|pumped|tapped) from (?:the )?(?:quantum )?(?:vacuum|zero[- ]point(?: field| energy)?|a?ether|nowhere|nothing|thin air)',
      // "… and 1.8e-4 J of it reaches the radio": the part of what went in that reaches the load.
      // "fed 42 kWh into the export meter": what is counted going out is the device's output.
      '(?:in)?to (?:the|its|an|a) (?:[\\w-]+ )?(?:export|output|generation) meters?',
      'of (?:it|that|this|them) (?:reaches|reached|gets? to|got to|arrives? at|makes? it to|made it to|is delivered to|was delivered to)',
      'heating(?: capacity| output| power| duty)?', 'cooling(?: capacity| output| power| duty)',
      // "Cascadia 3.5: 3.5 kW of cooling, COP 3.6": the cold a cooler gives (not cooling water, a cooling fan or tower).
      'of (?:refrigeration|cooling)(?! (?:water|towers?|fans?|fins?|air|loops?|circuits?|jackets?|systems?|plant|demand|load))', 'of heat(?:ing)? output', '(?:of )?heat (?:leaving|coming out of|given off by|emitted by|released by) (?:the|its)', 'exported',
      // "47 MW leaves the station": what a plant or a converter sends on.
      '(?:leaves?|left|leaving) (?:the |its )?(?:station|plant|site|unit|generator|alternator|inverter|converter|terminals|building|works|farm|array|stack|module)',
      // "Runtime test (250 W AC load)", "a 600 W resistive load": the load a supply or a store carries (a bare "2 kW load" may be the device).
      '(?:AC|DC|resistive|constant|dummy|test|inverter) load(?! (?:of|on|from) (?:the |its )?(?:grid|mains|supply|network|source))', 'outputs?', 'delivered', 'produced', 'generated', 'comes? out', 'came out', 'out of', 'gained', 'returned', 'yielded', 'recovered', 'released', 'out(?=\\s+of\\s+(?:it|the))', 'of output', 'at the output', '(?:reached|reaches|reach|went to|goes to|got to|arrived at|made it to) (?:the |its )?(?:wheels?|shaft|axles?|load|output|grid|battery|house|home|motor|radiators?|rooms?|floors?|tanks?|cylinders?|pool|building)', '(?:going|flowing|goes|flows|went|flowed) (?:in)?to (?:the |its )?(?:battery|grid|load|tank|house|home|radiators?)', 'back(?! (?:in|into|to (?:the|its) (?:input|supply|source)))'],
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
      '(?:on|at) the hot (?:face|side|end|plate|junction)', 'hot face', 'surface(?: water| layer)?', 'source', 'flames?', 'steam', 'hot', 'boiler', 'furnace', 'exhaust', 'waste heat', 'supply', 'flow', 'output', 'hot side', 'inlet', 'emitter', 'underfloor', 'receiver', 'absorber', 'heater head', 'hot plate', 'hot junction',
      'loop', 'tank', 'radiators?', '(?:turbine|compressor) inlet', 'firing', 'combustion', 'hot gas', 'heater head', 'collector', 'hot end',
      '(?:as|for|is|being) (?:the |its |our |a )?(?:hot|warm|hotter|warmer|heat) (?:side|end|source|reservoir|bath)',
    ],
  },
  {
    role: 'cold',
    before: [
      'T_?(?:c|cold|C|0|amb)', 'brine', 'ground ?water', 'deep(?: water)?', 'bottom water', 'cold', 'colder', 'coldest', 'ambient', 'room', 'sink', 'outside', 'outdoors?', 'river', 'sea', 'seawater', 'lake', 'ocean',
      'ground', 'environment', 'surroundings', 'atmosphere', 'cooling water', 'ice', 'condenser', 'low-temperature', 'air', 'outside air', 'outdoor air', 'cooling (?:loops?|circuits?|jackets?|towers?|systems?)',
      'from', 'freezer', 'fridge', 'inside the fridge', 'cabinet', 'cold store', 'evaporator', 'extract(?:s|ed|ing)? heat from', 'draw(?:s|n|ing)? heat from',
      'well water', 'groundwater', 'borehole', 'winter', 'bottom', 'lower', 'rejects? heat (?:to|at)', 'reject(?:s|ed|ing)?', 'cooled to', 'chilled to',
      'cool(?:s|ed|ing)? (?:\\w+ )?to', 'keeps? (?:\\w+ )?at', 'frozen',
    ],
    after: ['deep(?:er)? (?:water|layer)', 'sink', 'ambient', 'borehole', 'brine', 'ground loop', 'ground water', 'groundwater', 'well water', 'chilled water', 'cold water', '(?:chiller |process )?coolant', 'room', 'outside', 'outdoors?', 'environment', 'surroundings', 'cold', 'river', 'seawater', 'cold side', 'air', 'outdoor', 'ground', '(?:winter|wintry|frosty|freezing|January|February|December)[- ](?:day|night|morning|evening|spell)s?', '(?:as|for|is|being) (?:the |its |our |a )?(?:cold|cool|colder|cooler) (?:side|end|sink|reservoir|bath)'],
  },
];

export const MASS_ROLES: readonly RoleWords[] = [
  {
    role: 'wet',
    before: [
      'wet', 'fuell?ed', 'fully fuell?ed', 'initial', 'starting', 'start', 'launch', 'lift-?off', 'lifts? off (?:at|with)', 'take-?off', 'gross', 'total', 'loaded', 'full',
      'at launch', 'at ignition', 'before the burn', 'starts? (?:out )?(?:at|with)', 'begins? (?:at|with)',
      // A model rocket's listing: "Ready to fly with motor: 1.2 lb".
      'ready[- ]to[- ]fly(?: (?:weight|mass))?(?: with (?:the |a )?motor(?: installed| loaded)?)?(?:[^\\S\\n]*[:=])?', 'with (?:the |a )?motor (?:installed|loaded)(?:[^\\S\\n]*[:=])?',
    ],
    after: [
      '(?:lift-?off|launch|initial|gross|total|wet|fuell?ed|starting|ignition|take-?off) mass', 'wet', 'fuell?ed', 'at launch', 'at lift-?off', 'at the start',
      'when (?:fully )?(?:fuell?ed|loaded)', ',[^\\S\\n]*(?:fully[^\\S\\n]+)?(?:fuell?ed|wet)(?=[^\\S\\n]*(?:[;.)\\n]|$))', 'at separation',
      'initially', 'fully loaded', 'fully fuell?ed', 'loaded', 'in all', 'in total', 'all told', 'gross', 'total',
    ],
  },
  {
    role: 'dry',
    before: [
      // "mass after all usable propellant is burned, stage and payload: 520 kg" (before the propellant words,
      // the longest fitting words win).
      '(?:mass )?(?:after|once|when) (?:all )?(?:the |its )?(?:usable |useable )?(?:propellant|fuel)s? (?:is|are|has been|have been|was|were) (?:all )?(?:burn(?:ed|t)|used(?: up)?|spent|consumed|expended|gone)(?:[^\\S\\n]*[,:;]?[^\\S\\n]*(?:[\\w-]+ ){0,3}?[\\w-]*[:=,]?)?',
      'dry', 'empty of (?:propellant|fuel)', 'empty', 'final', 'burn-?out', 'burns? out (?:at|with)', '(?:burnt|burned) out', 'at burn-?out', 'after burn-?out', '(?:,[^\\S\\n]*)?leaving(?: (?:only|just|about|some))?', 'end-of-burn', 'after the burn', 'unfuell?ed', 'structural', 'inert', '(?:burn(?:s|ing|ed|t)?|drops?|dropping|dropped|falls?|falling|fell) (?:down )?to', 'ends? (?:up )?(?:at|with)', 'ending (?:up )?(?:at|with)'],
    after: ['(?:dry|empty|final|burn-?out|structural) mass', '\\((?:empty|dry|unfuell?ed|when empty)\\)',
      // "The 12 kg cubesat (dry) carries 1.4 kg of butane": the craft named, then said dry.
      '(?:[\\w-]+ ){1,2}\\((?:empty|dry|unfuell?ed|when empty)\\)', 'dry', 'empty',
      // "800 kg of propellant and 200 kg of structure and motor": what is left when the propellant is gone.
      'of (?:structure|structures|hardware|tankage|airframe|structure and (?:engines?|motors?|payload|avionics))',
      'when (?:(?:its|the) tanks? (?:are|is) |it is )?(?:empty|dry)', ',[^\\S\\n]*(?:empty|dry)(?=[^\\S\\n]*(?:[;.)\\n]|$))', 'at burn-?out', 'at cut-?off', 'at (?:engine )?shutdown', 'at MECO', 'after the burn', 'when empty', 'at the end',
      '(?:once|when|after) (?:all )?(?:the |its )?(?:usable |useable )?(?:propellant|fuel)s? (?:is|are|has been|have been|was|were) (?:all )?(?:burn(?:ed|t)|used(?: up)?|spent|consumed|expended|gone)'],
  },
  {
    role: 'propellant',
    before: [
      // (Not a kind of stage or engine: "the storable-propellant stage weighs 2,300 kg" is the stage's whole mass.)
      'propellants?(?! (?:stages?|engines?|tanks?|rockets?|thrusters?|motors?|systems?|feed|lines?|valves?)(?!\\p{L}))', 'fuel', 'reaction mass', 'propellant (?:mass|load|loading)', 'mass of (?:propellant|fuel|reaction mass)', 'fuel (?:mass|load)', 'propellant[:=]', 'reaction mass (?:of|is)',
      '(?:carries|carrying|loaded with|tanks? (?:hold|holds|of)|burns?|burning|expels?|expelling)',
    ],
    after: [
      '(?:would be|will be|is to be|must be|should be) (?:the )?(?:propellant|fuel|reaction mass)',
      '(?:is|are|was|were|of) (?:the |its )?(?:hydrazine|propellant|fuel|xenon|krypton|kerosene|water|reaction mass|nitrogen|helium|butane|propane|iodine|argon|ammonia|nitrous(?: oxide)?|paraffin|ethanol|alcohol|methanol|sugar|APCP|HTPB|solid propellant|(?:hydrogen )?peroxide|oxidi[sz]er|LOX|liquid oxygen|methane|hydrogen|grain)',
      // "1.65 t of MMH/MON propellant", "of storable bipropellant": the propellant named by its make-up.
      'of (?:the |its )?(?:[\\w/+-]+ ){1,2}?(?:(?:bi|mono)?propellants?|reaction mass)(?! (?:tanks?|lines?|feed|system|valves?|pumps?|plumbing|hardware|module))',
      '(?:difference|rest|remainder|balance) (?:is|being|was) (?:propellant|fuel)', 'of (?:that|it|which|this)(?: being| is| was)? (?:[\\w-]+ )?(?:(?:bi|mono)propellants?|propellant|fuel|reaction mass|xenon|krypton|argon|iodine|hydrazine|kerosene|water|nitrogen|helium|methane|hydrogen|ammonia|oxidi[sz]er)',
      '(?:is|are|was|were) (?:liquid oxygen|LOX|liquid hydrogen|methane|oxidi[sz]er)', 'of cold-gas propellant',
      'of (?:[\\w-]+ )?(?:nitrogen|helium|butane|propane|CO2|carbon dioxide|ammonia|iodine|bismuth|caesium|cesium|mercury|argon|nitrous oxide|LOX|liquid oxygen|RP-?1|hydrogen peroxide)', 'of [\\w-]+ propellant', 'of propellant', 'of fuel', 'of reaction mass', 'of xenon', 'of krypton', 'of argon', 'of hydrazine', 'of kerosene', 'of hydrogen', 'of methane',
      'of water', 'of oxidi[sz]er', 'of liquid', 'propellant', 'fuel', 'of bipropellant', 'of monopropellant',
      'of (?:[\\w-]+ )?(?:deuterium|tritium|helium-3|lithium|boron|uranium|plutonium|antimatter|fusion fuel|fissile fuel|pellets|solid fuel|solid propellant|grain|ice)(?: pellets| fuel| propellant)?',
    ],
  },
];

export const SPEED_ROLES: readonly RoleWords[] = [
  {
    role: 'exhaust',
    before: ['v_?e(?:x|xh)?', 'u_?e', 'c_?e', 'exhausts? at', 'exhausts?', '(?:is|are|was|were|being) exhausted at', 'jet', 'ejection', 'effective exhaust', 'exit', 'nozzle', 'expelled at', 'ejected at', 'thrown out at', 'leaves? at', '(?:expels?|expelling|ejects?|ejecting|vents?|venting|throws?|fires?|firing|shoots?)(?: (?:it|them|its [\\w-]+|the [\\w-]+|[\\w-]+ ions|propellant|gas|mass|xenon|nitrogen|ions|plasma))?(?: out)? at', 'leaves? the (?:nozzle|thruster|engine) at', '(?:throws?|throwing|threw|spits?|spitting|blows?|blowing|pushes|pushing|shoots?|shooting) out (?:its |the )?[\\w-]+ at', '(?:accelerates?|accelerated|accelerating)(?: the| its)? (?:propellant|gas|xenon|krypton|argon|iodine|ions|plasma|exhaust|reaction mass|ion beam)(?: ions)? to(?: (?:about|around|roughly|some|nearly|over|up to))?', '(?:ioni[sz]es|ioni[sz]ed|ioni[sz]ing|heats|heated|heating) (?:the |its )?(?:[\\w-]+ ){0,2}?(?:propellant|gas|xenon|krypton|argon|iodine|hydrogen|water) and (?:then )?accelerates? (?:it|them) to(?: (?:about|around|roughly|some|nearly|over|up to))?'],
    after: ['exhaust', 'jet', 'exhaust velocity', 'exhaust speed'],
  },
  {
    role: 'delta-v',
    before: ['Δv', 'Δ-v', 'delta-?v', 'delta v', 'dv', 'velocity change', 'change in velocity', 'change of velocity', 'speed change', 'change in speed', 'velocity increment', 'Δ ?V'],
    after: ['of Δv', 'of delta-?v', 'of velocity change', 'Δv', 'delta-?v', 'of Δ-v'],
  },
];
