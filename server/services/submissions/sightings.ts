/** Sightings: a claim seen in the wild, sent with its files; and the accepted ones an entry lists. */
import type { ClaimedFigureDto, EntrySightingDto, SubmissionDto } from '../../../shared/api-types';
import { HttpError } from '../../http/errors';
import { Attachment, audit, Entry, Submission, SubmissionEntry, type User } from '../../models';
import { entrySighting, submission } from '../../presenters/submissions';
import type { SightingInput } from '../../routes/sightings/schema';
import { removeStored, type StoredFile } from '../../uploads/attachments';
import { event, load, UNSET, type SubmissionsDeps } from './common';
import type { Digest } from './digest';

export class Sightings {
  constructor(
    private readonly deps: SubmissionsDeps,
    private readonly digest: Digest,
  ) {}

  /**
   * A sighting with its stored files. The files are already in the store; if the database write
   * fails they are removed again, so that nothing is left half-stored — unless the database cannot say
   * whether the write committed, when they are kept.
   */
  async create(actor: User, input: SightingInput, figures: ClaimedFigureDto[], files: StoredFile[], origin: string): Promise<SubmissionDto> {
    let id: number;
    try {
      id = await this.deps.sequelize.transaction(async (transaction) => {
        const s = await Submission.create(
          {
            ...UNSET,
            kind: 'sighting',
            title: input.title,
            submitterId: actor.id,
            seenAtUrl: input.seenAtUrl ?? null,
            seenAtCitation: input.seenAtCitation ?? null,
            summary: input.summary,
            figures,
          },
          { transaction },
        );
        for (const f of files) {
          await Attachment.create({ submissionId: s.id, storageKey: f.key, name: f.name, mediaType: f.mediaType, size: f.size, sha256: f.sha256 }, { transaction });
        }
        await event(transaction, s.id, 'submitted', actor.id);
        await audit(transaction, { actorId: actor.id, action: 'submission.created', subjectType: 'submission', subjectId: s.id, after: { kind: 'sighting', title: s.title, attachments: files.length } });
        return s.id;
      });
    } catch (err) {
      // A write that failed at its commit may still have been committed (the database can commit and die
      // before it answers): the files are taken back only once the database says no row records them;
      // while it cannot say, they are kept (an unrecorded file is harmless, a recorded one lost is not).
      const recorded = files.length === 0 ? false : await Attachment.count({ where: { storageKey: files.map((f) => f.key) } }).then((n) => n > 0, () => null);
      if (recorded === false) await removeStored(this.deps.store, files, (key, e) => this.deps.logger?.error({ err: e, key }, 'could not remove a file of a failed sighting'));
      else if (recorded === null) this.deps.logger?.error({ keys: files.map((f) => f.key) }, 'kept the files of a sighting whose write may have committed');
      throw err;
    }
    this.digest.schedule(origin);
    return submission(await load(id));
  }

  /** The accepted sightings linked to a published (or retired) entry, newest link first. */
  async ofEntry(slug: string): Promise<EntrySightingDto[]> {
    const entry = await Entry.findOne({ where: { slug, status: ['published', 'retired'] }, attributes: ['id'] });
    if (!entry) throw new HttpError(404, 'not_found', `There is no published entry “${slug}”.`);
    const links = await SubmissionEntry.findAll({ where: { entryId: entry.id }, order: [['createdAt', 'DESC']], limit: 100 });
    if (!links.length) return [];
    const subs = await Submission.findAll({ where: { id: links.map((l) => l.submissionId), kind: 'sighting', status: 'accepted' } });
    const byId = new Map(subs.map((s) => [s.id, s]));
    return links.filter((l) => byId.has(l.submissionId)).map((l) => entrySighting(byId.get(l.submissionId)!, l));
  }
}
