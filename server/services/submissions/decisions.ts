/**
 * The moderators' four decisions on a claimed submission, one function each: accept (a sighting
 * linked to entries; a correction passed on to the entry's editors), draft (a sighting turned into
 * a new draft entry on an editor's Desk), ask (a question for the submitter) and reject (with a
 * reason). The state each leads to is SUBMISSION_STEPS (common.ts). Every decision is audit-logged
 * in its transaction; the submitter hears of it by e-mail after the commit.
 */
import type { Transaction } from 'sequelize';
import { CORRECTION_SECTION_WORDS } from '../../../shared/api/constants';
import type { Decision, SubmissionDto } from '../../../shared/api-types';
import { can } from '../../../shared/policies';
import { draftContentSchema } from '../../../shared/schemas/drafts';
import { HttpError } from '../../http/errors';
import type { OutgoingMessage } from '../../mail/mailer';
import { correctionForwardedMessage, submissionDecidedMessage } from '../../mail/messages';
import { audit, Entry, SubmissionEntry, User, type Submission } from '../../models';
import { submission } from '../../presenters/submissions';
import type { AcceptInput, DraftDecisionInput } from '../../routes/submissions/schema';
import { editorsOf, event, load, mayStep, SUBMISSION_STEPS, type SubmissionsDeps } from './common';
import { forModerator } from './queue';

/** The word each decision leaves in the history and the audit log. */
const DECIDED: Record<Decision, string> = { accept: 'accepted', draft: 'drafted', ask: 'asked', reject: 'rejected' };

/** What one decision adds to the common part. */
interface Outcome {
  /** The note the submitter reads (the question or the reason). */
  note?: string;
  /** The titles of the entries a sighting was linked to (for the submitter's mail). */
  linked?: string[];
  /** More for the audit event. */
  after?: Record<string, unknown>;
  /** Mail beside the submitter's (a correction's editors). */
  notify?: OutgoingMessage[];
}

export class Decisions {
  constructor(private readonly deps: SubmissionsDeps) {}

  /** The part every decision shares: the claim, the state change, the history, the audit event and the submitter's mail. */
  private async decide(actor: User, id: number, decision: Decision, origin: string, apply: (s: Submission, t: Transaction, link: string) => Promise<Outcome>): Promise<void> {
    const notify: OutgoingMessage[] = [];
    await this.deps.sequelize.transaction(async (transaction) => {
      const s = await forModerator(actor, id, transaction);
      if (!mayStep(decision, s.status) || s.claimedById !== actor.id) {
        throw new HttpError(409, 'not_claimed', 'Claim this submission before deciding it, so that no other moderator decides it at the same time.');
      }
      const submitter = (await User.findByPk(s.submitterId, { transaction }))!;
      const link = `${origin}/submissions/${s.id}`;
      const before = { status: s.status };
      const outcome = await apply(s, transaction, link);
      const status = SUBMISSION_STEPS[decision].to;
      const note = outcome.note ?? null;
      s.status = status;
      s.claimedById = null;
      s.claimedAt = null;
      if (status !== 'waiting') {
        s.decision = decision;
        s.decidedById = actor.id;
        s.decidedAt = new Date();
      }
      s.decisionNote = note ?? (status === 'waiting' ? s.decisionNote : null);
      await s.save({ transaction });
      const what = DECIDED[decision];
      await event(transaction, s.id, what, actor.id, note);
      await audit(transaction, { actorId: actor.id, action: `submission.${what}`, subjectType: 'submission', subjectId: s.id, before, after: { status, ...outcome.after, ...(note ? { note } : {}) } });
      notify.push(...(outcome.notify ?? []), submissionDecidedMessage(submitter.email, submitter.displayName, s, decision, note, outcome.linked ?? [], link));
    });
    this.deps.mail('submission decision mail', notify);
  }

  /** Accept: a sighting is linked to published entries (and teaches the claim matcher); a correction goes to the entry's editors. */
  async accept(actor: User, id: number, input: AcceptInput, origin: string): Promise<SubmissionDto> {
    let linkedSlugs: string[] = [];
    await this.decide(actor, id, 'accept', origin, async (s, transaction, link) => {
      if (s.kind === 'sighting') {
        if (!input.entries.length) throw new HttpError(400, 'validation_failed', 'Check body.entries: name at least one entry to link the sighting to.', { 'body.entries': 'at least one entry' });
        const entries = await Entry.findAll({ where: { slug: input.entries, status: 'published' }, transaction });
        const missing = input.entries.filter((slug) => !entries.some((e) => e.slug === slug));
        if (missing.length) throw new HttpError(400, 'validation_failed', `Check body.entries: no published entry “${missing[0]}”.`, { 'body.entries': `no published entry “${missing[0]}”` });
        for (const e of entries) await SubmissionEntry.findOrCreate({ where: { submissionId: s.id, entryId: e.id }, transaction });
        linkedSlugs = entries.map((e) => e.slug);
        return { linked: entries.map((e) => e.title), after: { entries: linkedSlugs } };
      }
      if (input.entries.length) throw new HttpError(400, 'validation_failed', 'Check body.entries: a correction belongs to its own entry; send no entries.', { 'body.entries': 'not for a correction' });
      const entry = (await Entry.findByPk(s.entryId!, { transaction }))!;
      const section = CORRECTION_SECTION_WORDS[(s.section ?? 'other') as keyof typeof CORRECTION_SECTION_WORDS];
      const notify = (await editorsOf(entry.id, transaction)).map((editor) => correctionForwardedMessage(editor.email, editor.displayName, entry.title, s.entryVersion!, section, link));
      return { notify, after: { entry: entry.slug, forwardedTo: notify.length } };
    });
    // Accepted sightings teach the claim matcher: re-index the linked entries before answering.
    if (linkedSlugs.length) await this.deps.linked?.(linkedSlugs);
    return submission(await load(id));
  }

  /** Draft: a sighting becomes a new draft entry owned by an editor, with the sighting quoted in "how it is pitched". */
  async draft(actor: User, id: number, input: DraftDecisionInput, origin: string): Promise<SubmissionDto> {
    await this.decide(actor, id, 'draft', origin, async (s, transaction) => {
      if (s.kind !== 'sighting') throw new HttpError(400, 'validation_failed', 'Check body.decision: only a sighting can be turned into a draft entry.', { 'body.decision': 'only for sightings' });
      const editor = await User.findByPk(input.editorId, { transaction });
      if (!editor || !can(editor, 'drafts.own')) throw new HttpError(400, 'validation_failed', 'Check body.editorId: choose an editor to own the draft.', { 'body.editorId': 'not an editor' });
      const where = [s.seenAtUrl, s.seenAtCitation].filter(Boolean).join(' — ');
      const figures = (s.figures ?? []).map((f) => `- ${f.label ? `${f.label}: ` : ''}${f.quantity} (${f.display})`).join('\n');
      const content = draftContentSchema.parse({
        title: s.title.length >= 3 ? s.title.slice(0, 160) : `Sighting ${s.id}`,
        mechanismClass: input.mechanismClass,
        howItIsPitched: [`Seen in the wild (sighting ${s.id}): ${where}`, '', s.summary ?? '', figures ? `\nClaimed figures:\n${figures}` : ''].join('\n').slice(0, 6000),
      });
      const draft = await this.deps.drafts.createDraft(editor, input.slug, content, { transaction });
      const entry = (await Entry.findOne({ where: { slug: input.slug }, transaction }))!;
      s.draftEntryId = entry.id;
      return { after: { draftId: draft.id, slug: input.slug, editorId: editor.id } };
    });
    return submission(await load(id));
  }

  /** Ask: the item waits for the submitter's answer to `note`. */
  async ask(actor: User, id: number, note: string, origin: string): Promise<SubmissionDto> {
    await this.decide(actor, id, 'ask', origin, async () => ({ note }));
    return submission(await load(id));
  }

  /** Reject, with the reason the submitter reads. */
  async reject(actor: User, id: number, note: string, origin: string): Promise<SubmissionDto> {
    await this.decide(actor, id, 'reject', origin, async () => ({ note }));
    return submission(await load(id));
  }
}
