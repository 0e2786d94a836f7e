import type { Sequelize } from 'sequelize';
import { initTaxonomy } from './taxonomy';

export { ConservationLaw, MechanismClass } from './taxonomy';

/** Binds every model to this Sequelize instance. Call once per instance, before any query. */
export function initModels(sequelize: Sequelize): void {
  initTaxonomy(sequelize);
}
