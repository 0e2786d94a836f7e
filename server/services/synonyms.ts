/**
 * The trade's synonym groups (issue 11): listed for anyone, created, changed and removed by
 * editors. Each write runs in one transaction with its audit event; a phrase belongs to one group
 * only (compared as the matcher compares it, so "Cavities" and "cavity" are one phrase); an edit
 * names the version it was made on and is refused with 409 edit_conflict when another editor
 * changed the group since. After the commit the search index of this server is rebuilt with the
 * new groups before the answer goes; other app servers see the change through the watermark.
 */
import { Op, UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { SynonymGroupDto, SynonymGroupInput, SynonymGroupUpdate } from '../../shared/api/synonyms';
import { fieldsError, HttpError } from '../http/errors';
import { audit, SynonymGroup, SynonymPhrase, type User } from '../models';
import { phraseKey } from '../search/synonyms';

export interface SynonymsDeps {
  sequelize: Sequelize;
  /** Called after every committed change (the search index rebuilds with the new groups). */
  changed?: () => Promise<void>;
}

const notFound = (id: number) => new HttpError(404, 'not_found', `There is no synonym group ${id}; it may have been removed.`);

export function groupDto(g: SynonymGroup): SynonymGroupDto {
  const phrases = [...(g.phrases ?? [])].sort((a, b) => a.position - b.position || a.id - b.id);
  return { id: g.id, terms: phrases.map((p) => p.phrase), note: g.note, version: g.version, updatedAt: g.updatedAt.toISOString() };
}

/**
 * The match key of each term, or a 400 naming `<where>.<i>` for a term with no word the matcher
 * can use, or the same as an earlier term of the group.
 */
export function termKeys(terms: string[], where = 'body.terms'): string[] {
  const fields: Record<string, string> = {};
  const seen = new Map<string, number>();
  const keys = terms.map((t, i) => {
    const key = phraseKey(t);
    if (!key) fields[`${where}.${i}`] = `“${t}” has only words too common to match on (such as “the”, “of”)`;
    else if (key.length > 190) fields[`${where}.${i}`] = 'too long';
    else if (seen.has(key)) fields[`${where}.${i}`] = `the same, for matching, as “${terms[seen.get(key)!]}” above`;
    else seen.set(key, i);
    return key;
  });
  if (Object.keys(fields).length) throw fieldsError('validation_failed', fields);
  return keys;
}

export class Synonyms {
  constructor(private readonly deps: SynonymsDeps) {}

  async list(): Promise<SynonymGroupDto[]> {
    const groups = await SynonymGroup.findAll({ include: [{ model: SynonymPhrase, as: 'phrases' }], order: [['position', 'ASC'], ['id', 'ASC']] });
    return groups.map(groupDto);
  }

  private async load(id: number, transaction?: Transaction, lock = false): Promise<SynonymGroup> {
    const g = await SynonymGroup.findByPk(id, { transaction, lock: lock ? transaction?.LOCK.UPDATE : undefined });
    if (!g) throw notFound(id);
    g.phrases = await SynonymPhrase.findAll({ where: { groupId: id }, transaction });
    return g;
  }

  /** 409 synonym_taken naming each term that another group already holds. */
  private async refuseTaken(terms: string[], keys: string[], ownId: number | null, transaction: Transaction): Promise<void> {
    const taken = await SynonymPhrase.findAll({
      where: { matchKey: keys, ...(ownId ? { groupId: { [Op.ne]: ownId } } : {}) },
      transaction,
    });
    if (!taken.length) return;
    const fields: Record<string, string> = {};
    for (const p of taken) {
      const i = keys.indexOf(p.matchKey);
      fields[`body.terms.${i}`] = `“${terms[i]}” is already in another group (as “${p.phrase}”, group ${p.groupId}); a word or phrase belongs to one group`;
    }
    const names = Object.keys(fields);
    throw new HttpError(409, 'synonym_taken', `Check ${names.join(', ')}: ${fields[names[0]]}.`, fields);
  }

  private async writePhrases(groupId: number, terms: string[], keys: string[], transaction: Transaction): Promise<void> {
    try {
      await SynonymPhrase.bulkCreate(
        terms.map((phrase, position) => ({ groupId, phrase, matchKey: keys[position], position })),
        { transaction },
      );
    } catch (err) {
      // Another editor added the same phrase to another group at the same moment.
      if (err instanceof UniqueConstraintError) {
        throw new HttpError(409, 'synonym_taken', 'Check body.terms: one of these words or phrases was just added to another group. Reload and try again.', {
          'body.terms': 'one is already in another group',
        });
      }
      throw err;
    }
  }

  private async afterChange(): Promise<void> {
    await this.deps.changed?.();
  }

  async create(actor: User, input: SynonymGroupInput): Promise<SynonymGroupDto> {
    const keys = termKeys(input.terms);
    const id = await this.deps.sequelize.transaction(async (transaction) => {
      await this.refuseTaken(input.terms, keys, null, transaction);
      const last = (await SynonymGroup.max('position', { transaction })) as number | null;
      const g = await SynonymGroup.create({ note: input.note, position: (last ?? -1) + 1 }, { transaction });
      await this.writePhrases(g.id, input.terms, keys, transaction);
      await audit(transaction, { actorId: actor.id, action: 'synonyms.created', subjectType: 'synonym_group', subjectId: g.id, after: { terms: input.terms, note: input.note } });
      return g.id;
    });
    await this.afterChange();
    return groupDto(await this.load(id));
  }

  async update(actor: User, id: number, input: SynonymGroupUpdate): Promise<SynonymGroupDto> {
    const keys = termKeys(input.terms);
    await this.deps.sequelize.transaction(async (transaction) => {
      const g = await this.load(id, transaction, true);
      if (g.version !== input.version) {
        throw new HttpError(
          409,
          'edit_conflict',
          `This group was changed after you opened it (you have version ${input.version}, it is now at ${g.version}). Its current words are in this answer: merge your change into them and save again.`,
          { 'body.version': `now ${g.version}` },
          { group: groupDto(g) },
        );
      }
      await this.refuseTaken(input.terms, keys, id, transaction);
      const before = groupDto(g);
      await SynonymPhrase.destroy({ where: { groupId: id }, transaction });
      await this.writePhrases(id, input.terms, keys, transaction);
      g.note = input.note;
      g.version = g.version + 1;
      g.changed('version', true);
      await g.save({ transaction });
      await audit(transaction, {
        actorId: actor.id,
        action: 'synonyms.updated',
        subjectType: 'synonym_group',
        subjectId: id,
        before: { terms: before.terms, note: before.note, version: before.version },
        after: { terms: input.terms, note: input.note, version: g.version },
      });
    });
    await this.afterChange();
    return groupDto(await this.load(id));
  }

  async remove(actor: User, id: number): Promise<void> {
    await this.deps.sequelize.transaction(async (transaction) => {
      const g = await this.load(id, transaction, true);
      const before = groupDto(g);
      await g.destroy({ transaction });
      await audit(transaction, { actorId: actor.id, action: 'synonyms.deleted', subjectType: 'synonym_group', subjectId: id, before: { terms: before.terms, note: before.note, version: before.version } });
    });
    await this.afterChange();
  }
}
