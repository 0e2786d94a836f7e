/**
 * The moderators' digest: what arrives within `digestMs` is gathered into one message per
 * moderator, so that a busy hour sends one mail rather than dozens.
 */
import { Op } from 'sequelize';
import { queueDigestMessage } from '../../mail/messages';
import { Submission, User } from '../../models';
import type { SubmissionsDeps } from './common';

export class Digest {
  private timer: NodeJS.Timeout | null = null;
  private run: Promise<void> | null = null;

  /** The origin for the digest's link: PUBLIC_URL, else that of the request that scheduled it. */
  origin = '';

  constructor(private readonly deps: Pick<SubmissionsDeps, 'sequelize' | 'mailer' | 'later' | 'digestMs'>) {}

  /** Gathers what arrives within digestMs into one message per moderator. */
  schedule(origin?: string): void {
    if (origin) this.origin = origin;
    if (this.timer) return;
    this.timer = setTimeout(() => {
      this.timer = null;
      this.deps.later('moderators digest', async () => {
        await this.send();
      });
    }, this.deps.digestMs) as unknown as NodeJS.Timeout;
    this.timer.unref();
  }

  /**
   * Sends the digest of submissions no digest has listed yet. The rows are marked inside a
   * transaction with SKIP LOCKED, so that two app servers never list the same item twice.
   */
  async send(): Promise<number> {
    if (this.run) await this.run.catch(() => {});
    let count = 0;
    this.run = (async () => {
      const items = await this.deps.sequelize.transaction(async (transaction) => {
        const rows = await Submission.findAll({
          where: { moderatorsNotifiedAt: null, status: 'open' },
          order: [['id', 'ASC']],
          limit: 500,
          lock: transaction.LOCK.UPDATE,
          skipLocked: true,
          transaction,
        });
        if (!rows.length) return [];
        await Submission.update({ moderatorsNotifiedAt: new Date() }, { where: { id: rows.map((r) => r.id) }, transaction, silent: true });
        return rows.map((r) => ({ kind: r.kind, title: r.title }));
      });
      count = items.length;
      if (!items.length) return;
      const moderators = await User.findAll({ where: { role: 'moderator', emailVerifiedAt: { [Op.ne]: null } } });
      for (const m of moderators) await this.deps.mailer.send(queueDigestMessage(m.email, m.displayName, items, `${this.origin}/queue`));
    })();
    await this.run;
    return count;
  }

  stop(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
  }
}
