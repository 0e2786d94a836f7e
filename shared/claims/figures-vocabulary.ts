/**
 * The vocabulary the figure reader (reader.ts) and the planner (plan.ts) read: the written forms of
 * each unit a claim uses, with the mathjs unit and the kind of figure (vocabulary/units.ts), the
 * words that give a figure its role (vocabulary/roles.ts), and the other words that say what a
 * figure or a device is (vocabulary/words.ts).
 */
export { C_M_PER_S, UNIT_FORMS, type UnitForm } from './vocabulary/units';
export { MASS_ROLES, POWER_ENERGY_ROLES, SPEED_ROLES, TEMPERATURE_ROLES, type RoleWords } from './vocabulary/roles';
export * from './vocabulary/words';
