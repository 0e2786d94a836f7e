/** Standard safety cautions (DESIGN.md §8), worded once. */
export const CAUTION_HIGH_VOLTAGE =
  'High voltage: thruster test rigs, RF amplifiers, pulsed coils and beam sources run at voltages that can kill. Work only to ' +
  'your local electrical codes and your institution\'s licensed practice (interlocks, lock-out, discharge of stored energy).';
export const CAUTION_RF =
  'Microwave and RF exposure: resonant cavities and amplifiers can leak power above exposure limits, and ' +
  'opening a cavity while it is powered is dangerous. Follow your local exposure regulations and licensed RF safety practice.';
export const CAUTION_VACUUM =
  'Vacuum and pressure vessels: chambers, viewports and gas lines can implode or burst. Use rated vessels and ' +
  'relief devices and follow local pressure-equipment codes and licensed practice.';
export const CAUTION_ROTATING =
  'Rotating and reciprocating masses: flywheels, eccentric masses and fast-moving sliders store energy that can ' +
  'break loose. Guard them and follow local machinery-safety codes and licensed practice.';
export const CAUTION_RADIATION =
  'Particle beams: accelerated charges and the targets they strike produce ionizing radiation. Work only under ' +
  'a licensed radiation-safety programme and local regulations.';
export const CAUTION_SPARK_GAP =
  'Spark gaps and arcs: they make ozone and nitrogen oxides, ultraviolet light and broadband RF interference, and ' +
  'they run at high voltage. Ventilate, shield and enclose them, and follow local electrical codes, radio-emission ' +
  'rules and licensed practice.';
export const CAUTION_HYDROGEN =
  'Hydrogen and oxyhydrogen gas: hydrogen burns in air over a wide range of mixtures, and a hydrogen–oxygen mixture ' +
  'ignites with a very small spark and can detonate. Never store the mixed gas, vent it away from sparks, use ' +
  'flashback arrestors, and follow local gas-safety codes and licensed practice.';
export const CAUTION_MAINS =
  'Mains electricity: heaters, heat pumps, chargers and bench supplies on the mains can kill. Work on them only ' +
  'isolated and to your local wiring codes, with a residual-current device, or leave it to a licensed electrician.';
export const CAUTION_HEAT =
  'Heat and working fluids: boilers, steam, hot surfaces and refrigerant circuits burn and scald, and some working ' +
  'fluids are flammable, toxic or displace air. Follow local rules for pressure equipment and refrigerants and ' +
  'licensed practice.';
export const CAUTION_BATTERIES =
  'Batteries and capacitor banks: short-circuit currents melt tools and wiring, lead-acid cells give off hydrogen, ' +
  'and lithium cells can burn when abused; capacitors stay charged after the supply is off. Fuse every lead, ' +
  'discharge stores before touching, and follow local electrical codes and licensed practice.';
export const CAUTION_PROPELLANTS =
  'Propellants and pressurised tanks: rocket propellants burn or explode, some are toxic, and their tanks and lines ' +
  'are pressure vessels. Test only at licensed sites, under local explosives and pressure-equipment regulations ' +
  'and licensed practice.';
export const CAUTION_LASER =
  'Lasers and intense light: a laser beam, direct or reflected, can injure the eye, and powerful ones burn skin and ' +
  'start fires. Use eye protection rated for the wavelength, enclose the beam path, and follow your local laser-safety ' +
  'rules and licensed practice.';
export const CAUTION_CHEMICALS =
  'Chemicals: electrolytes such as potassium and sodium hydroxide burn skin and eyes, fine metal powders and metal ' +
  'hydrides can catch fire in air, and some salts and solvents are toxic. Wear eye and skin protection, keep the safety ' +
  'data sheets at hand, and follow local rules for hazardous substances and licensed practice.';
export const CAUTION_RADIOACTIVE =
  'Ionizing radiation: nuclear reactions, neutron sources, radioactive materials and tritium give off neutrons, gamma ' +
  'rays or charged particles that harm people nearby, and neutrons make materials radioactive. Work only under a ' +
  'licensed radiation-safety programme, with calibrated detectors, and follow local regulations.';
export const CAUTION_VEHICLES =
  'Vehicles under test: moving vehicles, rotating wheels and drivelines, and traction batteries at hundreds of volts ' +
  'can kill. Test on a closed track or a dynamometer, not on public roads, and follow local road-traffic, vehicle-safety ' +
  'and electrical codes and licensed practice.';
