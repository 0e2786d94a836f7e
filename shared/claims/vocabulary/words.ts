/**
 * The other words of the figure reader's vocabulary (shared/claims/figures-vocabulary.ts): what makes
 * a number a quantum efficiency, a COP, a difference, a specific impulse or a label; what says a
 * device is a heat engine, a heat pump or a cooler, throws out propellant or not, runs by itself or
 * harvests an outside flow; hedges; the connectors before a bare number.
 */

/** Words that make a percentage (or a bare ratio) a quantum efficiency: particles out per particle in. */
export const QUANTUM_EFFICIENCY_WORDS = [
  'quantum efficienc(?:y|ies)', 'quantum yields?', 'EQEs?', 'IQEs?', 'QEs?', 'photon yields?', 'photons? per electrons?', 'electrons? per photons?',
  'carrier multiplication', 'exciton multiplication', 'multiple exciton generation', 'singlet fission', 'photon upconversion', 'quantum-cutting', 'quantum cutting',
  'photons? per (?:injected |absorbed )?(?:electrons?|carriers?)', 'electrons? per (?:incident |absorbed )?photons?', 'external quantum', 'internal quantum',
];

/** Words that make "350 % efficient" a heating COP (heat pumps deliver more heat than the work they take). */
export const HEAT_PUMP_WORDS = [
  // (Not a heat pump the device is said to beat: "beating every heat pump", "better than any heat pump".)
  '(?<!(?<![\\w-])(?:every|any|all|than|unlike|beat|beats|beating|outperforms?|outperforming|outdoes|outdoing|rivals?|rivall?ing|no|not|without|nor|is it|isn\x27t|isn\u2019t|nothing like|unlike|not like|instead of)\\s+(?:(?:a|an|the|any|every|all|most|modern|best)\\s+)?(?:[\\w-]+\\s+)?)heat[- ]pumps?', 'air[- ]source', 'ground[- ]source', 'water[- ]source', 'geothermal heat', 'heat[- ]pumping', 'ASHPs?', 'GSHPs?', 'air[- ]to[- ](?:water|air)',
  'water[- ]to[- ]water', 'brine[- ]to[- ]water', 'ground[- ]loops?',
  // A mechanical vapour recompression evaporator is a heat pump working across a small lift.
  '(?:mechanical )?vapou?r[- ]recompression', 'MVR',
  // A reversible air conditioner or mini split said to be heating: "My 12,000 BTU mini split (heat mode)".
  '(?:mini[- ]?splits?|split (?:units?|systems?)|air[- ]conditioners?|AC units?|aircons?)(?: [\\w,-]+){0,2}? ?\\(?(?:in |on |set to )?heat(?:ing)? mode\\)?',
  // A refrigerating dehumidifier gives out its compressor's work and the heat of the water it condenses.
  'dehumidifiers?', 'heat[- ]pump (?:dryers?|driers?|water heaters?|tumble dryers?)',
  // A ductless split air conditioner, in the trade, is a heat pump that runs either way.
  'mini[- ]?splits?', '(?:ton|ductless|inverter) splits?', 'ductless (?:splits?|units?|systems?|heads?)',
  // A machine that moves heat, said so: "takes the heat out of the milk as it cools it and puts it into the wash water".
  '(?:takes?|taking|took|draws?|drawing|pulls?|pulling|extracts?|extracting|removes?|removing|recovers?|recovering) (?:the )?(?:waste )?heat (?:out of|from) (?:the |its )?[\\w-]+(?: [\\w-]+){0,8}? (?:and )?(?:puts?|putting|pumps?|pumping|moves?|moving|delivers?|delivering|dumps?|dumping|transfers?|transferring|gives?|giving) it (?:in)?to',
  // A log's shorthand: "air/water HP prototype", "brine/water HP", "A/W HP", "HP-12 spot reading" beside a COP.
  '(?:air|water|brine|ground|A|W|B)\\s*/\\s*(?:water|air|W|A)\\s+HPs?', '(?<![\\w-])(?<![\\d.,]\\s*)(?<!(?:horse ?power|brake|shaft)\\s*)HPs?(?=\\s+(?:prototype|bench|test|rig|install))', 'flow temperature',
  // A heat pump's rating point (EN 14511 notation): "A7/W35", "B0/W35", "A2/W55", "W10/W35".
  '(?<![\\p{L}\\d])[ABW][-−]?\\d{1,2}\\s*/\\s*W\\d{2}(?![\\p{L}\\d])', '(?<!(?:oil-filled|oil|electric|electrical|resistive|resistance|panel|storage|fan|convector|infrared|IR|bar|halogen|quartz)[- ])(?<!(?:incl\\.|including|excluding|plus) )(?<!(?:engine|car|truck|lorry|genset|generator|coolant|motor)(?:\x27s|\u2019s)?[- ])(?<!(?:out|up|away|off) (?:through|via) (?:the|its) )radiators?(?![\\s-]+(?:area|surface|fins?|panels?|emissivity|mass))', 'underfloor', 'space heating', 'domestic hot water', 'DHW', '(?:mov(?:es?|ing|ed)|pump(?:s|ing|ed)?|lift(?:s|ing|ed)?) heat', 'pump(?:s|ing|ed)? (?:the )?warmth',
];
/** Words that make a percentage a cooling COP ("300 % efficient" for an air conditioner). */
export const COOLING_MACHINE_WORDS = [
  // (Not a heat exchanger called a cooler: "lube-oil cooler", "charge-air cooler", "water cooler" of a circuit.)
  '(?<!(?:oil|lube|lube-oil|lubricating oil|air|charge-air|charge air|water|fluid|EGR|gas|liquid|process|coolant|jacket|exhaust|steam|condensate|hydraulic|transformer)[- ])coolers?', 'cold (?:room|store|storage)s?', 'Peltier (?:stages?|modules?|elements?|coolers?|devices?|units?|plates?)', 'thermoelectric coolers?', 'TECs?', 'cool ?box(?:es)?', 'cooler box(?:es)?', 'ice makers?', 'refrigerators?', 'refrigeration (?:units?|systems?|plants?|machines?)', '(?:refrigeration |freezer )?condensing units?', 'air[- ]condition\\w*', 'chillers?', 'fridges?', 'freezers?', 'cryocoolers?', 'pulse[- ]tubes?(?: (?:coolers?|refrigerators?|stages?|variants?))?', 'Gifford[- ]McMahon(?: (?:coolers?|stages?))?', 'heat pumps? in cooling', 'mini[- ]?splits?', 'split (?:units?|systems?|air[- ]conditioners?)', 'AC units?', '(?:window|portable|room|wall|ducted|rooftop|car|central) (?:AC|A/C)', 'A/C', 'air ?cons?', 'aircons?'];

/** Words that make a temperature a difference: before ("ΔT of 20 K") or after ("a 20 K difference"). */
export const DIFFERENCE_BEFORE = [
  'ΔT', 'Δ T', 'delta[- ]?T', 'dT', 'temperature (?:difference|gradient|drop|rise|lift|span|spread|differential|swing|excursion|change|increase|gap)s?', 'gap of',
  // "the difference — some 15 degrees Fahrenheit on a summer day — between …": the difference, then the figure in a dash's aside.
  '(?:the|a|this|that) difference(?=[^\\S\\n]*[—–(])[^\\S\\n]*[—–(]',
  'differences? of', 'differential of', 'gradient of', 'rise of', 'drop of', 'lift of', '(?<!(?:to|can|could|will|would|cannot|and) )lift', 'spread of', 'span of', 'increase of', 'swing of', 'change of',
  '(?:pump(?:s|ing)?|lift(?:s|ing)?|rais(?:es|ing)|mov(?:es|ing)) (?:the )?heat(?: up)?(?: by| through| across)?', 'through', 'heats? (?:\\w+ )?by', 'warms? (?:\\w+ )?by', 'cools? (?:\\w+ )?by', 'raises? (?:\\w+ )?by', 'lowers? (?:\\w+ )?by', 'rises? by', 'drops? by',
  '(?:only |just )?across(?: (?:only|just|a|an))*', 'spanning', '(?:rais|lower|increas|decreas|heat|warm|cool|drop|lift)(?:e|es|ed|ing|s)? (?:the )?temperature (?:of )?(?:[\\w-]+ ){0,3}by', '(?:colder|cooler|hotter|warmer|lower|higher) than (?:the |its )?(?:[\\w-]+ ){0,3}by', 'differ(?:s|ing)? by', 'apart by', 'separated by', 'rose by', 'fell by', 'falls? by', 'climbs? by', 'warmer by', 'cooler by', 'hotter by', 'colder by', 'increases? by', 'decreases? by', 'only', 'a mere', 'just',
];
export const DIFFERENCE_AFTER = [
  '(?:temperature )?(?:difference|differential|gradient|drop|rise|lift|span|spread|swing|excursion|delta|split|increase|decrease|gap)s?',
  '(?:warmer|hotter|cooler|colder|higher|lower|above|below|over|under)(?: than)?', 'by which', 'ΔT', 'delta[- ]?T', 'of (?:temperature )?(?:difference|gradient|lift|rise|drop)',
  'between', 'apart', 'across', 'of heating', 'of warming', 'of cooling',
];

/** Words before a number of seconds that make it a specific impulse. */
export const ISP_WORDS = ['I_?sp', 'Isp', 'ISP', 'I sp', 'specific impulses?', 'specific impulse \\(Isp\\)'];

/** Words that say a device is a heat engine (so an efficiency is a Carnot claim). */
export const HEAT_ENGINE_WORDS = [
  'heat motors?', 'thermoacoustic', 'of the heat', 'of the heat (?:it|that)', 'heat (?:it|that it) (?:draws|takes|absorbs|collects|gathers)', 'heat engines?', 'engines?', 'turbines?', 'Stirling\\w*', '\\p{L}+motoren?', 'cooling water', 'condenser', 'heat sink', 'hot side', 'cold side', 'hot (?:head|end|plate|face|junction|source)s?', 'cold (?:end|plate|face|junction|sink)s?', 'reservoirs?',
  'source temperature', 'thermoelectric\\w*',
  // "η = 0.62 for the cycle operating between T_h = 550 K and T_c = 300 K": a cycle run between two temperatures.
  '(?:cycles?|engines?|machines?) (?:operating|running|working|that (?:operates|runs|works)) between', 'T_\\{?h(?:ot)?\\}?', 'T_\\{?c(?:old)?\\}?', 'thermo-?electric\\w*', 'thermionic', 'thermophotovoltaic\\w*', 'TPV', 'Stirling',
  'Rankine', 'ORC', 'steam', 'thermal converters?', 'heat converters?', 'heat to (?:work|power|electricity)', 'converts? (?:\\w+ )?heat', 'waste[- ]heat', 'thermal (?:to|into) (?:electric|mechanical)',
  'Seebeck', 'Peltier', 'generators? running on heat', 'heat-driven', 'thermal generator', 'TEG', 'heat recovery', 'power plant', 'power station', 'combustion', 'binary(?:[- ]cycle)? (?:power )?plants?', 'geothermal (?:power )?plants?', 'thermal efficiency', 'Carnot efficiency',
  'diesel', 'petrol', 'gasoline', 'ambient heat', '(?:harvests?|draws?|takes?|extracts?) (?:the )?(?:warmth|heat) (?:of|from)', 'warmth of', 'of (?:the |its )?(?:absorbed |incoming |collected |input )?heat(?: [\\w-]+){0,4}? (?:as|into|to) (?:useful )?(?:work|electricity|power|motion)', '(?:dumps?|rejects?|sheds?|throws? away) (?:the rest|what is left|(?:its |the )?(?:waste )?heat)', 'heat (?:is )?rejected', 'heat of the (?:air|sea|room|surroundings)', 'temperature difference', 'thermal gradient',
];

/** A device said to throw out nothing: the photon-rocket bound applies to its thrust. */
export const PROPELLANT_FREE_WORDS = [
  // ("no air flow or propellant": before the shorter "no air flow" below, so that the propellant is part of the match.)
  'no (?:[\\w-]+ ){0,2}(?:or|nor) (?:any )?(?:propellant|reaction mass|exhaust)',
  // "Nothing leaves the ring: zero mass flow": no mass thrown out.
  '(?:zero|no|nil) (?:net )?mass (?:flow|loss)(?: rate)?', 'without (?:[\\w-]+,? ){1,3}(?:or|nor) (?:any )?(?:propellant|reaction mass|exhaust)', 'neither (?:[\\w-]+ ){0,2}nor (?:any )?(?:propellant|reaction mass|exhaust)',
  // "which is free of any exhaust or propeller": a device said to have neither.
  '(?:free|clear) of (?:any )?(?:exhaust|propellant|reaction mass|propellers?|rotors?|jets?)(?:,? (?:or|and|nor) (?:any )?(?:exhaust|propellant|reaction mass|propellers?|rotors?|jets?))*',
  'propellant[- ]?(?:free|less)', 'reaction[- ]?less', 'reactionless', 'without (?:spending|using|burning|consuming|expending|carrying|needing|requiring|taking) (?:any |(?:a|one|an?) (?:single )?(?:gram|kilogram|milligram|ounce|drop|atom|molecule|scrap|bit|speck) of )?(?:propellant|fuel|reaction mass)',
  '(?:ion(?:ic)? wind|air currents?|convection) (?:cannot|can ?not|can\'t|could not|is not|isn\'t) (?:be )?(?:the )?(?:cause|explanation|source)', 'rul(?:e|es|ed|ing) out (?:ion(?:ic)? wind|air currents?|convection)',
  'without (?:any )?(?:expelling|ejecting|emitting|throwing|shedding|venting)(?: (?:out )?(?:any )?(?:propellant|mass|reaction mass|material|matter|exhaust|gas))?',
  'without (?:any )?(?:propellant|reaction mass|exhaust)', '(?:without|with no) (?:the |any )?(?:emission|ejection|expulsion|release|loss|use) of (?:any )?(?:propellant|mass|reaction mass|matter|exhaust)', 'nothing (?:else )?(?:leaves|is expelled|is ejected|comes out)', '(?:needing|needs|requires|requiring|with) no working fluid', 'with nothing leaving(?: it)?',
  'never (?:runs?|running|ran) out of (?:propellant|fuel)', '(?:does|do|did) not (?:need|use|require|carry|expel) (?:any )?(?:propellant|reaction mass)', '(?:doesn\'t|don\'t|doesn’t|don’t) (?:need|use|require|carry|expel) (?:any )?(?:propellant|reaction mass)', '(?:with|by) pure light', 'pure light alone', 'no fuel(?=[,;.]| and| or| no| nor)', 'photon[- ](?:thruster|rocket|drive|propulsion)(?: (?:bound|limit))?', '(?<!(?:would|could|can|will|does|did|do)(?:n\'t|n’t| not)[^.;!?\n]{0,60}|cannot[^.;!?\n]{0,60})(?:no air|nothing) to push (?:on|against)', 'no (?:ion(?:ic)? wind|corona|air to push)(?: [\\w-]+){0,2} (?:is |was |can be |could be )?(?:possible|present|sustained)',
  'lasers?', 'laser[- ](?:thrusters?|diodes?|light|propulsion|arrays?|bars?|beams?)', 'photons?', 'beam leaving', 'quantum vacuum', 'virtual particles',
  'pushes? (?:against|on|off) (?:the )?(?:quantum )?vacuum', 'pushing (?:against|on|off) (?:the )?(?:[\\w-]+ ){0,3}?vacuum', 'recoil', 'collimated', 'light (?:alone|only)', 'radiators?',
  'thermal (?:radiation|recoil|photons?)', 'nothing but light', 'only light', 'waste heat (?:rejected|radiated)', 'photon (?:limit|pressure|bound)', 'radiation pressure',
  'no (?:propellers?|air ?flow|fans?|downwash|rotor wash)', 'no air (?:is )?(?:moved|pushed|blown|displaced|thrown)', 'nothing (?:is |gets )?(?:blown|pushed|thrown|forced) (?:down(?:wards?)?|out|back(?:wards?)?)', 'not (?:a|one) (?:gram|drop|ounce|bit|molecule|atom) of (?:propellant|fuel|reaction mass|gas)',
  'no (?:propellant|fuel|reaction mass|exhaust) (?:at all|whatsoever|of any kind)',
  'nothing (?:is )?(?:coming|going|being (?:thrown|blown|pushed)) (?:out|down|back)', 'no props?', 'no air (?:blowing|moving|being (?:blown|pushed))',
  // (a sheet's row: "Reaction mass expelled ....... none", "Propellant: nil", "Propellant consumed = 0 g")
  '(?:propellant|reaction mass|exhaust|working fluid)(?: (?:expelled|used|consumed|ejected|carried|flow|mass|use))?[ \\t.…:=–—-]*(?:none|nil|zero|0 (?:g|kg|mg))(?![\\w.])',
  'no (?:propellant|reaction mass|exhaust|expelled mass|mass is expelled)', '(?:zero|nil|0) (?:propellant|reaction mass|exhaust)', 'propellant(?: used)?[^\\S\\n]*[:=][^\\S\\n]*(?:none|nil|zero|0 ?(?:g|kg)?)(?![\\w.])',
  // A sheet's row: "Propellant ............... none", "Propellant / exhaust | none", "Propellant\tnot required".
  '(?:propellant|reaction mass|exhaust)s?(?:[^\\S\\n]*(?:/|and|or)[^\\S\\n]*(?:propellant|exhaust|reaction mass))?(?:[^\\S\\n]+(?:used|required|consumption|mass|flow))?[^\\S\\n]*(?:\\.{2,}|…+|[|\\t:=])[^\\S\\n]*(?:none|nil|zero|not (?:required|needed|used)|n/a)(?!\\p{L})', 'expels? no (?:propellant|mass|gas|reaction mass|matter)',
  // "ejects no reaction mass", "w/o any propellant", "works just as well in hard vacuum (no air needed)".
  '(?:ejects?|ejecting|expelling|throws? out|throwing out|vents?|venting|sheds?|shedding|carries|carrying) no (?:[\\w-]+ )?(?:propellant|reaction mass|exhaust|mass|matter)', 'w/o?(?:ut)? (?:any )?(?:propellant|reaction mass|exhaust)',
  'no air (?:is )?(?:needed|required)', '(?<!(?:not|n\x27t|n\u2019t|never|cannot|nor) )(?:works?|working|operates?|operating|functions?|functioning)(?: (?!not|never)[\\w-]+){0,3}? (?:in|under) (?:a |hard |high |deep |full )?vacuum',
  '(?:hard |high )?vacuum,? where no (?:ion(?:ic)? wind|air)', 'no ion(?:ic)? wind (?:can|could) (?:form|arise|act)', 'radiating (?:panel|face|surface|plate)s?', 'beam(?:s|ing)? (?:[\\w-]+ ){0,3}?in (?:one|a single) direction', 'radiat(?:es?|ing|ed)(?: [\\w-]+){0,4}? (?:out of|from|off) (?:one|a single|its|the) (?:face|side|surface)', '(?:infrared|IR|heat) lamps?', 'flashlights?', 'LEDs?(?= [^.;!?]{0,60}(?:push|thrust|recoil))', 'thermal emission', '(?:transient )?mass[- ]fluctuations?', 'mass(?: is (?:said|claimed) to| that)? (?:swings?|fluctuates?|oscillates?|varies)', 'mass (?:is |being |gets )?(?:modulated|made to (?:swing|vary|fluctuate))', 'mass[- ]modulat\\w*', 'Mach effect', 'expels? nothing', 'ejects? nothing', 'emits? nothing',
  'closed[- ](?:cavity|resonator|system|box|container|frame|vessel|frustum|loop drive)', '(?:hermetically )?sealed', 'enclosed', 'cavity', 'EM ?drive',
  'inertial (?:propulsion|drive|thrust)', 'field propulsion', 'unidirectional (?:force|thrust)', 'net thrust from inside', 'fuel-?less (?:thruster|drive|propulsion)',
  'pushes? (?:itself|against nothing)', 'self-propell\\w*', 'frustum', 'tapered (?:cavity|resonator|copper)',
  'microwave (?:thruster|drive|cavity|resonator)', 'resonant cavity', 'RF (?:thruster|cavity)', 'gyroscopic (?:thrust|lift|propulsion|drive|thruster)',
  'precession (?:drive|thruster|lift)', 'anti-?gravity', 'space drive', 'inertia drive', 'oscillation thruster', 'shuttl\\w+ masses', 'internal masses',
  'no (?:external )?reaction', 'momentum from nothing', 'stationary thruster', '(?:reaction mass|propellant|exhaust|mass expelled)[:,]? (?:none|zero|nil|0 kg)',
  // "with nothing ejected", "no mass leaving it", "nothing escaping": said after the noun as well.
  '(?:with )?nothing (?:being )?(?:ejected|expelled|emitted|escaping|vented|thrown out|leaving(?: it| the \\w+)?)',
  '(?:with )?no (?:mass|matter|material|gas|propellant|particles?|ions?) (?:being )?(?:leaving|escaping|ejected|expelled|emitted|vented|thrown out|leaves|escapes)',
  // "No gas, no ions leaving the jar": a list of what is said not to leave.
  'no (?:gas|ions?|particles?|mass|matter|exhaust|air),? (?:(?:and|or|nor) )?no (?:gas|ions?|particles?|mass|matter|exhaust|air) (?:leaving|escaping|coming out|expelled|ejected|thrown out)',
  // "No mass was expelled during the run", "independent of any reaction mass", "it does not use any propellant".
  'no (?:mass|matter|material|gas|propellant|reaction mass|exhaust|particles?) (?:was|is|were|are|has been|had been|gets|got) (?:ever )?(?:expelled|ejected|emitted|vented|lost|used|consumed|thrown out|released)',
  'independent(?:ly)? of (?:any )?(?:propellant|reaction mass|exhaust|expelled mass)', 'free of (?:any )?(?:propellant|reaction mass|exhaust)',
  '(?:does not|doesn\x27t|doesn\u2019t|do not|don\x27t|never|need not|needn\x27t) (?:need|use|require|expel|eject|consume|carry|burn) (?:any )?(?:propellant|reaction mass|exhaust|mass)',
];
/** A device said to carry and expel propellant: the photon-rocket bound does not apply, the rocket equation does. */
export const PROPELLANT_WORDS = [
  // (Not a lamp's gas: "a 2.2 kW xenon arc lamp".)
  'propellant', '(?:xenon|krypton|argon)(?![- ](?:(?:arc|short-arc|flash|discharge|filled)[- ])?(?:lamps?|bulbs?|flash\\w*|headlights?|tubes?|lights?))', 'hydrazine', 'kerosene', 'oxidi[sz]er', 'fuel tanks?', 'exhaust (?:velocity|speed)', 'Isp', 'specific impulse',
  'ion (?:thruster|engine|drive)', 'Hall(?:-effect)? (?:thruster|effect thruster)', 'rocket', '(?<!(?:brass|steel|tungsten|lead|copper|internal|inner|oscillating|moving|shuttling|vibrating|sliding|rotating|enclosed|sealed|on-board|onboard)[- ])reaction mass(?! (?:with|inside|within|in the (?:housing|box|case|enclosure)|back and forth|to and fro))', 'mass flow', 'nozzle', 'ejects?', 'expels?',
  'plasma thruster', 'resistojet', 'arcjet', 'electrospray(?: thrusters?| propulsion)?', 'colloid thrusters?', 'ionic liquids?', 'FEEP', 'field[- ]emission (?:electric )?(?:propulsion|thrusters?)',
  '(?:emit(?:s|ting|ted)?|spray(?:s|ing|ed)?|eject(?:s|ing|ed)?|expel(?:s|ling|led)?) (?:charged |tiny |fine )?(?:droplets|ions|charged particles|particles|plasma)', 'pulsed plasma thrusters?', 'cold[- ]gas', 'monopropellant', 'bipropellant', 'solid motor', 'jet engine', 'turbofan', 'propeller',
  'fans?', 'air-breathing', '(?:towing |traction |power )?kites?', 'rotor sails?', 'Flettner rotors?', 'wind[- ]assist(?:ed|ance)?', 'solar sails?', 'ion[- ]wind', 'ionic wind', 'corona(?: discharge)?', 'electrohydrodynamic', 'EHD', 'ionocraft', 'ablation', 'ablative', '(?:pushed|driven|propelled|illuminated|accelerated) by (?:a |an |the )?(?:[\\w-]+ ){0,3}?(?:lasers?|beams?|sunlight|light)',
  'ground(?:-based)? lasers?', 'laser-pushed', '(?:lasers?|beams?|light) (?:pointed|aimed|shone|shining|fired|directed) (?:at|on|onto) (?:a |an |the )?(?:[\\w-]+ ){0,3}?(?:mirrors?|sails?|reflectors?|craft|probes?|targets?)', '(?:light|beam) (?:bounces|is reflected|reflects) back(?! and forth)', '(?:twice|2 ?×? ?) ?P ?/ ?c', 'beamed (?:power|energy) from',
  // (A tether that pushes — an electrodynamic one — not one the device is held or weighed on: "the force gauge on
  // the tether read 12 N", "hovers on its tethers".)
  '(?<!(?:on|to|by|from|under) (?:its |a |an |the |their |his |her )?(?:[\\w-]+ )?)tethers?',
  // Things that push on air or water (lawfully far above P/c).
  '(?:drone|quadcopter|multicopter|multirotor) (?:motors?|propellers?|rotors?|arms?|props?)', '(?:drone|quadcopter|multicopter) makers? (?:advertis|claim|sell|quot|rate|list|say|state|promis|offer)\\w*', 'quadcopters?', 'multicopters?', 'multirotors?', 'helicopters?',
  '(?:agricultural|delivery|camera|racing|crop[- ]spraying|survey|photography|FPV|hobby|consumer|cargo|military|inspection) drones?', 'drone spec(?:ification)?s?',
  // (Not a gyroscope's spinning masses: "a gyroscope lift module, four rotors at 12,000 rpm".)
  '(?<!(?:gyro\\w*|flywheels?|precess\\w*|eccentric|counter-rotating)[^.;!?\\n]{0,60})(?:four|six|eight|main|tail) rotors?(?! (?:inside|in a|in the|within|enclosed|sealed))',
  'lifters?(?=[^.;!?]{0,80}(?:\\d ?kV|kilovolts?))', 'in (?:the )?(?:open|room|ambient|free|still|ordinary) air', 'rotor blades?', 'propellers?', 'props?', '(?:RC|R/C|radio[- ]controlled|model) (?:planes?|aircraft|airplanes?|aeroplanes?|helis?|gliders?|boats?)', '(?:air|aero)planes?', 'aircraft', 'paramotors?', 'hovercraft', 'ducted fans?', 'EDFs?', 'outboards?', 'boats?', 'water jets?', '(?:balsa|foil|ion|ionic|corona|EHD|high-voltage)[\\w-]*(?: [\\w-]+)? lifters?',
  'pushes? (?:on|against) (?:the )?(?:air|water)', 'tractors?',
  // Sails and kites push on the wind (a light sail, pushed by light, is above).
  'wing[- ]?sails?', 'sailing (?:drones?|boats?|ships?|yachts?|dinghies|dinghy|craft|vessels?|cargo ships?)', 'sailboats?', 'sails? (?:catch(?:es|ing)?|fill(?:s|ed|ing)? with|in) (?:the )?wind', '(?:wind|traction|kite)[- ]?kites?', '(?:driven|pushed|propelled) by (?:the )?wind',
  // (A radiometer's vanes are pushed by the gas the light warms, not by the light; a critic's "like a radiometer" names none.)
  '(?:the|a|its|our|this|my) radiometer(?:\'s|’s)? (?:vanes?|spins?|turns?|rotor|mill)', 'radiometer vanes', '(?:warm(?:ed)?|heated|hot) (?:gas|air) (?:pushes|pushing|push|drives)',
];

/** Phrases that say a device needs no input (the input power is then 0). */
export const SELF_RUNNING_WORDS = [
  'self-?running', 'self-?sustain(?:ing|ed|s)', 'self-?powered', 'self-?looped', 'self-?looping', 'self-?feeding', 'self-?charging', 'self-?perpetuating',
  'needs? no (?:external )?(?:power|energy|input|supply|fuel|battery|electricity|source)', 'requires? no (?:external )?(?:power|energy|input|supply|fuel|electricity|source)',
  'without (?:any )?(?:external )?(?:power|energy|input|supply|fuel|electricity)(?: source| supply| input)?', '(?:without|never) (?:taking|drawing|using|consuming|pulling|needing) (?:a single|so much as a|even one|one) (?:watt(?:-hour)?|Wh|kWh|joule|milliamp|amp)(?: (?:from|out of) (?:the|its) (?:battery|pack|cells?))?', 'no (?:external )?(?:power|energy) (?:input|source|supply)',
  'no (?:external )?input(?! (?:power |energy )?(?:figures?|numbers?|values?|data|measurements?|readings?))', '(?<!(?:input|output|supply|source|the|its|of|rated|electrical|shaft)[^\\S\\n]+)powers? itself', '(?:drawing|draws|consuming|consumes|using|uses|taking|takes) nothing', 'with nothing (?:going )?in',
  'no connection to (?:the )?(?:grid|mains|supply|power)', 'no (?:external |outside )?(?:supply|power supply|power source|source|battery|mains) (?:is |was )?(?:connected|attached|plugged in|hooked up)', '(?:with )?no (?:mains|grid|wall|external power|outside power) (?:connection|hook-?up|supply|feed)', 'not connected to (?:the )?(?:grid|mains|any (?:supply|source))', 'zero input', 'runs? on its own (?:output|power)', 'unplugged', 'disconnected from the (?:mains|supply|grid|battery)',
  'feeds? (?:its own )?output back', '(?:takes|draws|uses|consumes|needs) no (?:power|energy|input|current|electricity|fuel)(?: at all)?',
  'with nothing (?:plugged in|connected|attached)(?: to drive it)?', '(?:with )?nothing (?:else )?(?:supplied|fed|put in|added|given) to it', 'nothing (?:plugged in|connected) to (?:drive|power|run) it',
  '(?:with )?nothing (?:(?:was|is|were|else)[^\\S\\n]+)?(?:driving|powering|feeding|turning|running) it', 'nothing (?:else )?(?:drives|drove|powers|powered|feeds|fed|turns|turned|runs|ran) it',
  // "with no battery and no plug", "no fuel, no wires": two or more supplies said to be absent.
  '(?:with )?no (?:battery|batteries|plug|wires?|cables?|mains|fuel|supply|power supply|grid connection)(?:,? (?:and |or |nor )?no (?:battery|batteries|plug|wires?|cables?|mains|fuel|supply|power supply|grid connection))+',
  '(?:turns|spins|runs|goes) (?:all |completely |entirely )?on (?:its|their) own', '(?:turns|spins|runs|keeps going|keeps turning|goes|turning|spinning) (?:on )?by itself',
  '(?:battery|supply|mains|power|source) (?:is |was |being )?(?:disconnected|taken out|removed|unplugged)', '(?:turning|running|spinning|going) on its own', '(?:battery|supply) (?:taken out|removed)',
  // "Nothing enters or leaves the box", "nothing goes in": a sealed box said to take in nothing.
  'nothing (?:enters|goes in(?:to it)?|comes in|is fed in|gets in|enters or leaves|goes in or (?:out|comes out))', 'nothing connected to it', 'with nothing connected', 'disconnected from', '(?:any |an )?outside (?:source|supply|power)', 'without (?:drawing|taking|using|consuming) anything(?: from outside)?',
  'no (?:electrical |electric |external |mechanical |outside )?(?:input|supply|power source|energy source)',
  // "with no electrical or fuel input": every input named absent.
  'no (?:electrical|electric|external|mechanical|outside|fuel|chemical)(?:,? (?:or|and|nor) (?:electrical|electric|external|mechanical|outside|fuel|chemical))+ (?:inputs?|supply|supplies|power|energy)', 'no power at all', 'with no input', 'loop(?:ed|s)? (?:the )?output back', 'perpetual', 'runs? (?:by itself|on its own|forever|indefinitely)',
  // A sheet's label said to be empty: "Input: none", "Power source: nil".
  '(?:(?:electrical|electric|power|energy|external) )?(?:input|supply|power source|energy source)(?: (?:power|energy))?[^\\S\\n]*[:=][^\\S\\n]*(?:none|nil|nothing|zero|not needed|not required)',
  // "No mains, no battery in the box", "nothing connected but the lamp".
  'no mains,? (?:and |or |nor )?no batter(?:y|ies)', 'no batter(?:y|ies),? (?:and |or |nor )?no mains', 'nothing (?:else )?(?:is )?connected (?:but|except) (?:the |its |a )?(?:lamp|load|bulb|fan|motor|sensor|resistor)',
  'no fuel', 'fuel-?less', 'free energy', 'no (?:motor|engine|drive|battery) and no (?:other )?(?:input|supply|power)', 'no other (?:input|supply|power source|energy source|source of (?:power|energy))',
];
/** Where "self-powered" is lawful: the device harvests an outside flow of energy. */
export const HARVEST_WORDS = [
  // An engine on the heat of its surroundings takes heat in: "draws heat from the surrounding air".
  '(?:draws?|drawing|takes?|taking|extracts?|extracting|absorbs?|absorbing|pulls?|pulling) (?:its |the )?(?:low-grade |ambient |waste )?heat from', 'ambient heat', 'heat of the (?:air|sea|surroundings|environment)',
  'harvest\\w*', 'thermoelectric', 'Seebeck', 'TEGs?', 'solar', 'photovoltaic', 'sunlight', 'light', 'vibrations?', 'body heat', 'thermal gradient', 'temperature difference', 'wind', 'tides?',
  'waves?', 'radio waves', 'RF energy', 'ambient (?:light|RF|vibration)', 'piezo\\w*', 'triboelectric',
  // A device set on or over a fire or a hot surface takes its heat ("sits on the wood stove and starts turning by itself").
  // People's muscles, a wound spring, a boiler's hot water, the warmth of a body: each a supply the text names.
  '(?:press(?:ing|es|ed)?|push(?:ing|es|ed)?|click(?:ing|s|ed)?) (?:of )?(?:the |a |its |each )?(?:button|switch|key|lever)s?', 'hand-?(?:cranked|powered|driven)', '(?:by |after |from )cranking', 'pedall?(?:ing|ed|s)?', 'wind-?up',
  'self-?winding', 'winds? (?:itself|up)', 'wound (?:up|by hand)', 'mainsprings?', 'spring-?(?:driven|powered|wound)', '(?:wound|coiled|its|tensioned|compressed) springs?', 'muscle(?: power)?', 'kinetic', 'footsteps?', 'shak(?:e|es|ing|en)', '(?:body|wrist|arm) (?:motion|movement)s?',
  'runs? on (?:the )?(?:warmth|heat|motion|movement)', 'pull-?back (?:toys?|cars?|motors?|springs?|mechanisms?)', 'after (?:you |being |it is |it\x27s |one |a )?(?:pull|wind|wound|lift|shak|press|fill)\\w*', 'warmth of (?:your|the|a|its)', 'heat of (?:your|the|a) (?:hand|wrist|body|skin)',
  '(?:from|by) (?:the |a |its |our )?(?:gas |oil |wood |pellet |electric )?(?:boiler|furnace|heating system|central heating|district heating)',
  // Water running downhill: a wheel or turbine in a stream takes the stream's power.
  'water ?wheels?', 'waterwheels?', 'mill ?(?:races?|streams?|ponds?|wheels?)', 'streams?', 'rivers?', 'brooks?', 'becks?', 'falling water', 'hydraulic rams?', 'ram[- ]pumps?', 'hydrams?', 'water rams?', 'drive (?:water|pipe|flow)', 'sling pumps?', 'spiral pumps?', 'coil pumps?', 'hydro(?:electric|power)?', 'pico-?hydro', 'micro-?hydro', '(?:water|river|tidal|ocean) currents?', 'weirs?', 'dams?', 'head of water',
  'stoves?', 'wood-?burners?', 'log[- ]burners?', 'hobs?', 'fireplaces?', 'hearths?', 'candles?', 'flames?', 'hot ?plates?', 'stove ?tops?', 'exhaust (?:pipes?|manifolds?|gas(?:es)?)', 'waste heat',
  'nuclear', 'radioisotope', 'RTG', 'decay', 'chemical', 'fuel cell', 'reactors?', 'fission', 'tidal', 'geothermal', 'hot springs?', 'volcan\\w*', 'ocean thermal', 'OTEC', 'hot (?:rock|brine|well)s?',
  // A vehicle or set that burns fuel (a "self-charging" hybrid charges from its engine).
  'petrol', 'gasoline', 'diesel', 'combustion engine', '(?:petrol|diesel|gas) engine', 'burns? (?:fuel|petrol|diesel|gas)', 'regenerative braking', 'braking',
  // Heat passed on from a warmer body to a cooler one with nothing driving it: the heat it "moves" comes from
  // outside ("the heat pipe moves 200 W with no electrical input", "a passive cooling tower rejects 40 kW").
  'heat[- ]?pipes?', 'thermo-?syphons?', 'thermo-?siphons?', 'vapou?r chambers?', 'cooling towers?', 'heat[- ]?sinks?', 'heat exchangers?', 'radiative(?:ly)? cool\\w*', 'passive(?:ly)? cool\\w*',
  'natural (?:convection|circulation|draught|draft)', 'convection', '(?:moves?|moving|carries|carrying|carry|transfers?|transferring|transports?|transporting|conducts?|conducting|rejects?|rejecting|sheds?|shedding) (?:about |some |up to )?(?:[\\d.,]+ ?(?:k|M)?W (?:of )?)?(?:the )?heat',
];

/** Nouns after "5K" that make the K a thousand ("5K cycles"), not kelvins. */
export const THOUSAND_NOUNS = [
  'start(?:s|[–-]stop)?', 'charges?', 'discharges?', 'operations?', 'actuations?', 'revs?', 'kilomet(?:re|er)s?', 'cycles?', 'hours?', 'hrs?', 'rpm', 'RPM', 'revolutions?', 'rotations?', 'runs?', 'tests?', 'trials?', 'units?', 'miles?', 'km', 'steps?', 'iterations?',
  // Units that no temperature comes before ("100k BTU/h", "5K lbs of thrust").
  'BTUs?', 'lbs?', 'lbf',
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
export const COP_COOLING = [
  // (Not the adjective of a device that does not get hot: "Board runs cool", "stays cool to the touch".)
  // (Nor a plant's cooling water or tower a heat pump draws its heat from: "lifts waste heat from the 25 °C cooling-water return".)
  'cool(?:s|ed|ing|er|ers)(?![- ](?:water|towers?|circuits?|loops?|returns?|oil|jackets?))', '(?<!(?:runs?|running|ran|stays?|stayed|staying|keeps?|kept|remains?|remained|feels?|felt|quite|very|fairly|nice and|is|was|are|were) )cool(?! to the touch)', 'refrigerat\\w*', 'chillers?', 'freezers?', 'fridges?', 'air[- ]condition\\w*', 'cryocoolers?'];
export const COP_HEATING = ['heating', 'heat[- ]pumps?', 'heaters?', 'warming', 'heat output', 'flow temperature', 'hot water', 'DHW', 'underfloor', 'radiators?'];

/** Words before a number that make it a label, not a figure ("Figure 2 A", "Section 3.2", "p. 12"). */
export const LABEL_WORDS = [
  'fig(?:ure)?s?\\.?', 'tables?', 'tab\\.', 'sections?', 'sec\\.', 'eqs?\\.?', 'equations?', 'refs?\\.?', 'references?',
  'pp?\\.', 'pages?', 'chapters?', 'ch\\.', 'nos?\\.', 'nr\\.', 'appendix', 'items?', 'lines?', 'col\\.', 'vol\\.', 'volume',
  'issue', 'step', 'example', 'grant',
];

/** Words between the efficiency keyword and a percentage that say it is a change, not an efficiency. */
export const EFFICIENCY_CHANGE_WORDS = ['(?<!(?:divided|multiplied)[^\\S\\n]+)by', 'increas\\w*', 'improv\\w*', 'gains?', 'drops?', 'dropped', 'loss(?:es)?', 'rais\\w*', 'boost\\w*', 'points?'];

/** Words allowed between "efficiency"/"COP" and a bare number ("an efficiency of 0.62", "COP = 4"). */
export const BARE_CONNECTORS = [
  'of', 'is', 'was', 'were', 'be', 'between', 'from', 'ranging from', 'ranges? from', 'lies', 'lay', 'sits', 'stands', 'varies', 'measures', 'measured', 'reads', 'read', 'shows', 'showed', 'comes? (?:in |out )?(?:at|to)', 'turns? out (?:at|to)', 'ends? up (?:at|as)',
  'came (?:in |out )?(?:at|to)', 'came out', 'comes out', 'turned out (?:at|to)', 'works? out (?:at|to)', 'measured at', 'rated at', 'runs at', 'ran at', 'reached', 'in the range', 'range', 'reaching', 'ca\\.?', 'approx\\.?', 'c\\.', '~', '≈', 'reached', 'reaches', 'near', 'about', 'around', 'approximately', 'roughly',
  'up to', 'above', 'over', 'exceeding', 'as high as', 'at least', 'no less than', 'not less than', 'more than', 'equal to', 'rated', 'value', 'measured', 'a', 'an', 'the', 'somewhere', 'anywhere', 'of the order of', 'on the order of',
  // "the COP falls to 2.2 at −10 °C", "efficiency rises to 41 %": a value said through its change.
  '(?:falls?|fell|falling|drops?|dropped|dropping|dips?|dipped|sinks?|sank|rises?|rose|rising|climbs?|climbed|improves?|improved|increases?|increased|decreases?|decreased|goes (?:up|down)|went (?:up|down)) to',
  'stated as', 'given as', 'quoted as', 'reported as', '(?<=(?:performance|COP|efficiency)\\)?[^\\S\\n]+)as', '(?:measured|found|determined|calculated|estimated|recorded|logged|put) as', 'varied', 'ranged', 'averaged', 'averaging', 'averages', 'stood at', 'came to', '(?:measured|found|determined|reported|estimated|calculated|said|claimed|shown) to be', 'at (?:this|that|these|those|the|full|part|rated) (?:operating point|load|conditions?|speed|point|test point|rating point|(?:temperature )?difference|lift|temperatures?|ΔT)', '(?:here|there|then|now|thus|therefore|so)',
];
