/**
 * The claim check: running a check, and saving, listing, reading and deleting saved checks
 * (`/api/claim-checks`; the contract in shared/api/claim-checks.ts and shared/claims/types.ts).
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ClaimCheckRequest,
  ClaimCheckResult,
  SavedClaimCheckListResponse,
  SavedClaimCheckResponse,
} from '@/shared/api-types';
import { apiGet, apiSend } from '../http/client';
import { userKey } from './client';

export const claimCheckKeys = {
  /** The signed-in account's own saved checks. */
  mine: userKey('claim-checks', 'mine'),
  /** A saved check, for anyone holding its link. */
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
    mutationFn: (body: ClaimCheckRequest) => apiSend<SavedClaimCheckResponse>('POST', '/api/claim-checks/saved', body),
    onSuccess: ({ saved }) => {
      client.setQueryData<SavedClaimCheckResponse>(claimCheckKeys.saved(saved.token), { saved });
      return client.invalidateQueries({ queryKey: claimCheckKeys.mine });
    },
  });
}

/** `GET /api/claim-checks/saved` (signed in): the account's own saved checks, newest first. */
export function useMySavedClaimChecks(enabled: boolean) {
  return useQuery({
    queryKey: claimCheckKeys.mine,
    queryFn: ({ signal }) => apiGet<SavedClaimCheckListResponse>('/api/claim-checks/saved', { signal }),
    enabled,
  });
}

/** `GET /api/claim-checks/saved/:token`: a saved check, for anyone holding its link. */
export function useSavedClaimCheck(token: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: claimCheckKeys.saved(token),
    queryFn: ({ signal }) => apiGet<SavedClaimCheckResponse>(savedPath(token), { signal }),
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
      client.removeQueries({ queryKey: claimCheckKeys.saved(token), type: 'inactive' });
      await client.invalidateQueries({ queryKey: claimCheckKeys.saved(token) });
      client.setQueryData<SavedClaimCheckListResponse>(claimCheckKeys.mine, (list) =>
        list ? { saved: list.saved.filter((s) => s.token !== token) } : list,
      );
      return client.invalidateQueries({ queryKey: claimCheckKeys.mine });
    },
  });
}
