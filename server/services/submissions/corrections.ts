/** Corrections: a reported error against one published entry version; and the accepted ones on an editor's Desk. */
import { Op } from 'sequelize';
import type { SubmissionDto, SubmissionSummaryDto } from '../../../shared/api-types';
import { CORRECTION_SECTION_WORDS } from '../../../shared/api/constants';
import { HttpError } from '../../http/errors';
import { audit, Entry, EntryVersion, Submission, type User } from '../../models';
import { submission, submissionSummary } from '../../presenters/submissions';
import type { CorrectionInput } from '../../routes/corrections/schema';
import { event, include, load, UNSET, type SubmissionsDeps } from './common';
import type { Digest } from './digest';

export class Corrections {
  constructor(
    private readonly deps: SubmissionsDeps,
    private readonly digest: Digest,
  ) {}

  async create(actor: User, input: CorrectionInput, origin: string): Promise<SubmissionDto> {
    const entry = await Entry.findOne({ where: { slug: input.entry, status: ['published', 'retired'] } });
    if (!entry) throw new HttpError(404, 'not_found', `There is no published entry “${input.entry}”.`, { 'body.entry': 'no published entry with this permalink' });
    const version = await EntryVersion.findOne({ where: { entryId: entry.id, number: input.version, state: 'published' }, attributes: ['id', 'number'] });
    if (!version) throw new HttpError(404, 'not_found', `“${entry.title}” has no version ${input.version}.`, { 'body.version': 'no such published version' });
    const id = await this.deps.sequelize.transaction(async (transaction) => {
      const s = await Submission.create(
        {
          ...UNSET,
          kind: 'correction',
          title: `${entry.title} (version ${input.version}): ${CORRECTION_SECTION_WORDS[input.section]}`.slice(0, 200),
          submitterId: actor.id,
          entryId: entry.id,
          entryVersion: input.version,
          section: input.section,
          whatIsWrong: input.whatIsWrong,
          suggestedFix: input.suggestedFix,
          sources: input.sources || null,
        },
        { transaction },
      );
      await event(transaction, s.id, 'submitted', actor.id);
      await audit(transaction, { actorId: actor.id, action: 'submission.created', subjectType: 'submission', subjectId: s.id, after: { kind: 'correction', entry: entry.slug, version: input.version, section: input.section } });
      return s.id;
    });
    this.digest.schedule(origin);
    return submission(await load(id));
  }

  /** Accepted corrections of the entries this editor wrote or reviewed, newest first. */
  async onDesk(viewer: User): Promise<SubmissionSummaryDto[]> {
    const versions = await EntryVersion.findAll({
      where: { state: 'published', [Op.or]: [{ authorId: viewer.id }, { reviewerId: viewer.id }] },
      attributes: ['entryId'],
    });
    const entryIds = [...new Set(versions.map((v) => v.entryId))];
    if (!entryIds.length) return [];
    const rows = await Submission.findAll({ where: { kind: 'correction', status: 'accepted', entryId: entryIds }, include: include(false), order: [['decidedAt', 'DESC'], ['id', 'DESC']], limit: 100 });
    return rows.map(submissionSummary);
  }
}
