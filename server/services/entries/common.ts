/** What the entry services share: their dependencies, the people a version is loaded with, the usual 404s. */
import type { Sequelize, Transaction } from 'sequelize';
import { HttpError } from '../../http/errors';
import type { SendAfterCommit } from '../../mail/after-commit';
import { Entry, User } from '../../models';

export interface EntriesDeps {
  sequelize: Sequelize;
  /** Sends mail once the change is committed and the answer has gone (server/mail/after-commit.ts). */
  mail: SendAfterCommit;
  /** Called after an entry was published or retired (the search index re-reads it). */
  changed?: (slug: string) => Promise<void>;
}

export const notFound = (slug: string) => new HttpError(404, 'not_found', `There is no published entry “${slug}”.`);
export const draftNotFound = (id: number) => new HttpError(404, 'not_found', `There is no open draft ${id}.`);

/** A version's author and reviewer, loaded with it. */
export const PEOPLE = [
  { model: User, as: 'author', attributes: ['id', 'displayName', 'email'] },
  { model: User, as: 'reviewer', attributes: ['id', 'displayName', 'email'] },
];

/** An entry that has a published version (published or retired), or 404; row-locked inside a transaction. */
export async function publishedEntry(slug: string, transaction?: Transaction): Promise<Entry> {
  const entry = await Entry.findOne({ where: { slug }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  if (!entry || !entry.currentVersionId) throw notFound(slug);
  return entry;
}
