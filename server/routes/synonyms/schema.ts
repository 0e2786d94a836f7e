/**
 * Requests of /api/synonyms. The group's body is shared with the app's editor and the synonym
 * file (shared/synonyms.ts): synonymGroupCreateSchema (`terms`, `note`) for POST,
 * synonymGroupUpdateSchema (`terms`, `note`, `version` as edited) for PUT.
 */
import { idParams } from '../common-schema';

export { synonymGroupCreateSchema, synonymGroupUpdateSchema } from '../../../shared/synonyms';

/** `:id` of a synonym group. */
export const groupIdParams = idParams('a group number', { max: 4_000_000_000, everywhere: true });
