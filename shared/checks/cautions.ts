/** Standard safety cautions (DESIGN.md §8), worded once. */
export const CAUTION_HIGH_VOLTAGE =
  'High voltage: thruster test rigs, RF amplifiers and beam sources run at voltages that can kill. Work only to ' +
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
