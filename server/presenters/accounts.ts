/**
 * Accounts as the API sends them (shared/api/accounts.ts): a user and an outbox message (an
 * audit event: presenters/audit.ts, which joins the names its sentence reads). The models build these themselves (`toDto()`, which the tests also read rows with);
 * the routes go through here so that every answer's shape is found under server/presenters/.
 */
import type { OutboxMessageDto, UserDto } from '../../shared/api-types';
import type { OutboxMessage, User } from '../models';

export const user = (u: User): UserDto => u.toDto();
export const outboxMessage = (m: OutboxMessage): OutboxMessageDto => m.toDto();
