import type { Sequelize } from 'sequelize';
import { initAccounts } from './accounts';
import { initAudit } from './audit';
import { initClaimChecks } from './claim-checks';
import { initSubmissions } from './submissions';
import { initEntries } from './entries';
import { initOutbox } from './outbox';
import { initSynonyms } from './synonyms';
import { initTaxonomy } from './taxonomy';

export { ConservationLaw, MechanismClass } from './taxonomy';
export { EmailToken, Session, User, TOKEN_PURPOSES, type TokenPurpose } from './accounts';
export { AuditEvent, audit } from './audit';
export { SavedClaimCheck } from './claim-checks';
export { Attachment, Submission, SubmissionEntry, SubmissionEvent } from './submissions';
export { OutboxMessage } from './outbox';
export { SynonymGroup, SynonymPhrase } from './synonyms';
export { Entry, EntryLaw, EntryVersion, PublishedVersionImmutable, ENTRY_STATUSES, VERSION_STATES, type EntryStatus, type VersionState } from './entries';

/** Binds every model to this Sequelize instance. Call once per instance, before any query. */
export function initModels(sequelize: Sequelize): void {
  initTaxonomy(sequelize);
  initAccounts(sequelize);
  initAudit(sequelize);
  initOutbox(sequelize);
  initEntries(sequelize);
  initClaimChecks(sequelize);
  initSubmissions(sequelize);
  initSynonyms(sequelize);
}
