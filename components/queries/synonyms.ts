/** Desk → Synonyms (editors): `/api/synonyms` (the contract in shared/api/synonyms.ts). */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { SynonymGroupResponse, SynonymListResponse } from '@/shared/api-types';
import { apiGet, apiSend } from '../http/client';
import { userKey } from './client';

export const synonymKeys = { all: userKey('synonyms') };

/** `GET /api/synonyms`: every group, in the order of the list. */
export function useSynonymGroups() {
  return useQuery({ queryKey: synonymKeys.all, queryFn: ({ signal }) => apiGet<SynonymListResponse>('/api/synonyms', { signal }) });
}

/** `DELETE /api/synonyms/:id`. */
export function useRemoveSynonymGroup(id: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend('DELETE', `/api/synonyms/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: synonymKeys.all }),
  });
}

export interface SynonymGroupSave {
  terms: string[];
  note: string | null;
  /** The version last read; only when changing a group (409 `edit_conflict` with the current group when stale). */
  version?: number;
}

/**
 * `POST /api/synonyms` (a new group) or `PUT /api/synonyms/:id` (changing group `id`); the list is
 * fetched again before `onSaved` runs.
 */
export function useSaveSynonymGroup(id: number | undefined, { onSaved, onError }: { onSaved?: () => void; onError?: (error: Error) => void } = {}) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ terms, note, version }: SynonymGroupSave) =>
      id !== undefined
        ? apiSend<SynonymGroupResponse>('PUT', `/api/synonyms/${id}`, { terms, note, version })
        : apiSend<SynonymGroupResponse>('POST', '/api/synonyms', { terms, note }),
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: synonymKeys.all });
      onSaved?.();
    },
    onError,
  });
}
