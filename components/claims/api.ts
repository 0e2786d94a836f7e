/**
 * The claim check's requests (contract: shared/claims/types.ts and server/routes/claim-checks.ts),
 * made through the app's one API client: running a check, and saving, listing, reading and
 * deleting saved checks.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ClaimCheckRequest,
  ClaimCheckResult,
  SavedClaimCheckDto,
  SavedClaimCheckSummaryDto,
} from '@/shared/claims/types';
import { apiGet, apiSend } from '../api';

export type {
  ClaimCheckRequest,
  ClaimCheckResult,
  ClaimCheckRun,
  ClaimMatch,
  Figure,
  FigureInput,
  FigureKind,
  FigureRole,
  SavedClaimCheckDto,
  SavedClaimCheckSummaryDto,
} from '@/shared/claims/types';

/** The citation styles the referee paragraph comes in (the API contract's CITATION_STYLES). */
export {
  CITATION_STYLES as CLAIM_STYLES,
  CITATION_STYLE_LABEL as CLAIM_STYLE_LABEL,
  type CitationStyle as ClaimStyle,
} from '@/shared/api/constants';

export const claimKeys = {
  /** Everything of the claim check that belongs to the signed-in account or a link. */
  all: ['claim-checks'] as const,
  mine: ['claim-checks', 'mine'] as const,
  saved: (token: string) => ['claim-checks', 'saved', token] as const,
};

const savedPath = (token: string) => `/api/claim-checks/saved/${encodeURIComponent(token)}`;

/** `POST /api/claim-checks`: the text (and, on a re-run, the figures as fixed) → the result. */
export function useRunClaimCheck() {
  return useMutation({
    mutationFn: (body: ClaimCheckRequest) => apiSend<ClaimCheckResult>('POST', '/api/claim-checks', body),
  });
}

/** `POST /api/claim-checks/saved` (signed in): the check computed again, stored, and its share link. */
export function useSaveClaimCheck() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: ClaimCheckRequest) => apiSend<{ saved: SavedClaimCheckDto }>('POST', '/api/claim-checks/saved', body),
    onSuccess: ({ saved }) => {
      client.setQueryData(claimKeys.saved(saved.token), { saved });
      return client.invalidateQueries({ queryKey: claimKeys.mine });
    },
  });
}

/** `GET /api/claim-checks/saved` (signed in): the account's own saved checks, newest first. */
export function useMySavedClaimChecks(enabled: boolean) {
  return useQuery({
    queryKey: claimKeys.mine,
    queryFn: ({ signal }) => apiGet<{ saved: SavedClaimCheckSummaryDto[] }>('/api/claim-checks/saved', { signal }),
    enabled,
  });
}

/** `GET /api/claim-checks/saved/:token`: a saved check, for anyone holding its link. */
export function useSavedClaimCheck(token: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: claimKeys.saved(token),
    queryFn: ({ signal }) => apiGet<{ saved: SavedClaimCheckDto }>(savedPath(token), { signal }),
    enabled,
  });
}

/** `DELETE /api/claim-checks/saved/:token` (the owner): gone from the list, and its link answers not found. */
export function useDeleteSavedClaimCheck() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => apiSend('DELETE', savedPath(token)),
    onSuccess: async (_nothing, token) => {
      // A screen showing it asks again and learns it is gone; a cached copy elsewhere is dropped.
      client.removeQueries({ queryKey: claimKeys.saved(token), type: 'inactive' });
      await client.invalidateQueries({ queryKey: claimKeys.saved(token) });
      client.setQueryData<{ saved: SavedClaimCheckSummaryDto[] }>(claimKeys.mine, (list) =>
        list ? { saved: list.saved.filter((s) => s.token !== token) } : list,
      );
      return client.invalidateQueries({ queryKey: claimKeys.mine });
    },
  });
}
