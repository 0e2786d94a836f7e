/** The Desk (editors): my drafts, drafts waiting for my review, recently published versions. */
import { Op } from 'sequelize';
import type { DeskResponse } from '../../../shared/api-types';
import { Entry, EntryVersion, type User } from '../../models';
import { desk } from '../../presenters/entries';
import { PEOPLE } from './common';

export class Desk {
  async read(actor: User): Promise<DeskResponse> {
    const include = [{ model: Entry, as: 'entry', attributes: ['slug'] }, ...PEOPLE];
    const [mine, toReview, recent] = await Promise.all([
      EntryVersion.findAll({ where: { authorId: actor.id, state: ['draft', 'in_review'] }, include, order: [['updatedAt', 'DESC'], ['id', 'DESC']], limit: 100 }),
      EntryVersion.findAll({ where: { authorId: { [Op.ne]: actor.id }, state: 'in_review' }, include, order: [['submittedAt', 'ASC'], ['id', 'ASC']], limit: 100 }),
      EntryVersion.findAll({ where: { state: 'published' }, include, order: [['publishedAt', 'DESC'], ['id', 'DESC']], limit: 20 }),
    ]);
    return desk(mine, toReview, recent);
  }
}
