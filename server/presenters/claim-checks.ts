/** Saved claim checks as the API sends them (shared/api/claim-checks.ts): one with its result, and a row of "my saved checks". */
import type { SavedClaimCheckDto, SavedClaimCheckSummaryDto } from '../../shared/api-types';
import type { SavedClaimCheck, User } from '../models';

/** The share link of a saved check (the screen's route). */
export const shareUrl = (origin: string, token: string) => `${origin}/check/${token}`;

/** A saved check with its result; `mine` tells its owner. */
export function savedClaimCheck(row: SavedClaimCheck, viewer: User | undefined, origin: string): SavedClaimCheckDto {
  return {
    token: row.token,
    url: shareUrl(origin, row.token),
    createdAt: row.createdAt.toISOString(),
    text: row.text,
    style: row.style,
    figures: row.figures,
    result: row.result,
    mine: viewer !== undefined && viewer.id === row.ownerId,
  };
}

/** A saved check in its owner's list: the start of its text and its best match. */
export function savedClaimCheckSummary(row: SavedClaimCheck, origin: string): SavedClaimCheckSummaryDto {
  return {
    token: row.token,
    url: shareUrl(origin, row.token),
    createdAt: row.createdAt.toISOString(),
    preview: row.text.replace(/\s+/g, ' ').trim().slice(0, 120),
    topMatch: row.topMatch,
  };
}
