/**
 * The claim check: `POST /api/claim-checks` and the saved checks under `/api/claim-checks/saved`.
 * The request and result shapes belong to the claim check's pure parts (shared/claims/types.ts)
 * and are re-exported here with the answers' envelopes.
 */
import type { SavedClaimCheckDto, SavedClaimCheckSummaryDto } from '../claims/types';

export type {
  ClaimCheckRequest,
  ClaimCheckResult,
  ClaimCheckRun,
  ClaimMatch,
  Figure,
  FigureInput,
  FigureKind,
  FigureRole,
  ParagraphVariant,
  SavedClaimCheckDto,
  SavedClaimCheckSummaryDto,
} from '../claims/types';

/** `POST /api/claim-checks/saved` (201) and `GET /api/claim-checks/saved/:token` */
export interface SavedClaimCheckResponse {
  saved: SavedClaimCheckDto;
}

/** `GET /api/claim-checks/saved` (signed in): the account's own saved checks, newest first. */
export interface SavedClaimCheckListResponse {
  saved: SavedClaimCheckSummaryDto[];
}
