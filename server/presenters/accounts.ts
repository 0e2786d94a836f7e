/**
 * Accounts as the API sends them (shared/api/accounts.ts): a user, an audit event, an outbox
 * message. The models build these themselves (`toDto()`, which the tests also read rows with);
 * the routes go through here so that every answer's shape is found under server/presenters/.
 */
import type { AuditEventDto, OutboxMessageDto, UserDto } from '../../shared/api-types';
import type { AuditEvent, OutboxMessage, User } from '../models';

export const user = (u: User): UserDto => u.toDto();
export const auditEvent = (e: AuditEvent): AuditEventDto => e.toDto();
export const outboxMessage = (m: OutboxMessage): OutboxMessageDto => m.toDto();
