/**
 * The claim check (issue 6, item 4): a pasted text → matched entries, figures, the checks they
 * allow (run), and the referee paragraph with references; and saved checks shared by an
 * unguessable token. The pure parts live in shared/claims/ (figures, plan, paragraph); this service
 * adds the search index, the entry versions being cited, and the table of saved checks.
 */
import crypto from 'node:crypto';
import type { Response } from 'express';
import type { Sequelize } from 'sequelize';
import type { ParagraphEntry } from '../../shared/claims/paragraph';
import {
  type ClaimCheckResult,
  type ClaimMatch,
  type FigureInput,
  type SavedClaimCheckDto,
  type SavedClaimCheckSummaryDto,
} from '../../shared/claims/types';
import type { CitationStyle, CslItem } from '../../shared/entries/citations';
import { computeFor, type ComputePool } from '../compute/pool';
import { HttpError } from '../http/errors';
import { SavedClaimCheck, type User } from '../models';
import { permalink } from '../../shared/permalink';
import { citedItem } from '../presenters/citation';
import { savedClaimCheck, savedClaimCheckSummary } from '../presenters/claim-checks';
import type { ClaimCheckInput } from '../routes/claim-checks/schema';
import { matchClaim } from '../search/claim-match';
import { withFindingEntries } from '../search/claim-findings';
import type { SearchIndex } from '../search';
import type { Library } from './entries';

export type { ClaimCheckInput };

/** Entries the paragraph names: the best match and up to two related ones. */
const PARAGRAPH_ENTRIES = 3;

export interface ClaimChecksDeps {
  sequelize: Sequelize;
  index: SearchIndex;
  /** The published library, for the cited versions. */
  library: Library;
  /** The worker threads that read the text and run the checks (issue 13). */
  compute: ComputePool;
}

export class ClaimChecks {
  constructor(private readonly deps: ClaimChecksDeps) {}

  /**
   * Runs the check. Reading the figures (from the reader's list, each checked, 400 naming the one
   * that fails, or from the text) and running the checks happen in the compute pool's worker
   * threads (`res` gets Retry-After when its queue is full); matching runs here, on the index.
   */
  async run(input: ClaimCheckInput, origin: string, res: Response): Promise<ClaimCheckResult> {
    const { figures, signalled, leads } = await computeFor(res, this.deps.compute, {
      kind: 'claimRead',
      text: input.text,
      ...(input.figures ? { figures: input.figures as FigureInput[] } : {}),
    });
    await this.deps.index.ready();
    const hits = withFindingEntries(this.deps.index, input.text, matchClaim(this.deps.index, input.text, { classes: signalled }), leads);
    const cited: (ParagraphEntry | null)[] = await Promise.all(
      hits.map(async (h): Promise<ParagraphEntry | null> => {
        const { slug, version: n } = h.entry;
        let version, authors;
        try {
          ({ version, authors } = await this.deps.library.versionRow(slug, n));
        } catch (err) {
          // Retired or gone since the index last refreshed: leave it out.
          if (err instanceof HttpError && err.status === 404) return null;
          throw err;
        }
        const url = permalink(origin, slug, n);
        const match: ClaimMatch = { slug, title: h.entry.title, version: n, score: h.score, terms: h.terms, words: h.words, url, inBrief: h.entry.inBrief, ...(h.finding ? { finding: h.finding } : {}) };
        return {
          match,
          item: citedItem(slug, version, url, { authors }),
          sources: (version.content.sources ?? []).map((s) => s.csl as CslItem),
          questions: version.content.questionsToAsk ?? [],
          laws: h.entry.laws.map((l) => this.deps.index.laws.get(l) ?? l),
          replies: version.content.repliesAndAnswers ?? [],
        };
      }),
    );
    const entries = cited.filter((e): e is ParagraphEntry => e !== null);
    const classes = hits.filter((h) => entries.some((e) => e.match.slug === h.entry.slug)).map((h) => h.entry.mechanismClass).filter((c): c is string => c !== null);
    const { checks, needs, notes, paragraphs } = await computeFor(res, this.deps.compute, {
      kind: 'claimPlan',
      text: input.text,
      figures,
      classes,
      entries: entries.slice(0, PARAGRAPH_ENTRIES),
      style: input.style,
    });
    if (!figures.length) notes.unshift('No figures with units were found in the text; add them by hand to run the checks.');
    if (!entries.length) notes.unshift('No entry of the library matched this text closely.');
    return {
      style: input.style,
      variant: input.variant,
      textLength: input.text.length,
      matches: entries.map((e) => e.match),
      figures,
      checks,
      needs,
      paragraph: paragraphs[input.variant],
      paragraphs,
      notes,
    };
  }

  async save(owner: User, input: ClaimCheckInput, origin: string, res: Response): Promise<SavedClaimCheckDto> {
    const result = await this.run(input, origin, res);
    const row = await this.deps.sequelize.transaction((transaction) =>
      SavedClaimCheck.create(
        {
          // 192 random bits: the link is the only key to a saved check.
          token: crypto.randomBytes(24).toString('base64url'),
          ownerId: owner.id,
          text: input.text,
          style: input.style as CitationStyle,
          figures: (input.figures as FigureInput[] | undefined) ?? null,
          result,
          topMatch: result.matches[0]?.title.slice(0, 160) ?? null,
        },
        { transaction },
      ),
    );
    return savedClaimCheck(row, owner, origin);
  }

  async listMine(owner: User, origin: string): Promise<SavedClaimCheckSummaryDto[]> {
    const rows = await SavedClaimCheck.findAll({
      where: { ownerId: owner.id },
      attributes: ['token', 'text', 'topMatch', 'createdAt'],
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
      limit: 200,
    });
    return rows.map((r) => savedClaimCheckSummary(r, origin));
  }

  private async find(token: string): Promise<SavedClaimCheck> {
    const row = await SavedClaimCheck.findOne({ where: { token } });
    if (!row) throw new HttpError(404, 'not_found', 'There is no saved claim check at this link: it was deleted, or the link is mistyped.');
    return row;
  }

  async read(token: string, viewer: User | undefined, origin: string): Promise<SavedClaimCheckDto> {
    return savedClaimCheck(await this.find(token), viewer, origin);
  }

  async delete(actor: User, token: string): Promise<void> {
    await this.deps.sequelize.transaction(async (transaction) => {
      const row = await SavedClaimCheck.findOne({ where: { token }, transaction, lock: transaction.LOCK.UPDATE });
      if (!row) throw new HttpError(404, 'not_found', 'There is no saved claim check at this link: it was deleted, or the link is mistyped.');
      if (row.ownerId !== actor.id) throw new HttpError(403, 'not_owner', 'Only the account that saved this claim check may delete it.');
      await row.destroy({ transaction });
    });
  }
}
