/**
 * The moderators' requests (contract: shared/api/submissions.ts): the queue, claiming and
 * releasing an item, deciding it, and the editors a new draft may be given to.
 */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { DecideBody, EditorsResponse, PersonRef, QueueQuery, QueueResponse, SubmissionResponse, UserListResponse } from '@/shared/api-types';
import { ApiError, apiGet, apiSend } from '../http/client';
import { staleTimes } from './staleTimes';
import { submissionChanged, submissionKeys } from './submissions';

export type QueueFilters = QueueQuery;

export function queuePath({ kind, status, mine }: QueueFilters): string {
  const params = new URLSearchParams();
  if (kind) params.set('kind', kind);
  if (status) params.set('status', status);
  if (mine) params.set('mine', '1');
  const text = params.toString();
  return `/api/queue${text ? `?${text}` : ''}`;
}

/** `GET /api/queue`: open items, oldest first, with counts whatever the filters. */
export function useQueue(userId: number, filters: QueueFilters) {
  return useQuery({
    queryKey: [...submissionKeys.queue(userId), filters],
    queryFn: ({ signal }) => apiGet<QueueResponse>(queuePath(filters), { signal }),
    placeholderData: keepPreviousData,
  });
}

function useItemAction<B>(id: number, path: (body: B) => { action: string; body?: unknown }) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: B) => {
      const { action, body: sent } = path(body);
      return apiSend<SubmissionResponse>('POST', `/api/submissions/${id}/${action}`, sent);
    },
    onSuccess: ({ submission }) => submissionChanged(client, submission),
  });
}

/** `POST /api/submissions/:id/claim`: take the item up (409 claimed_by_other, 403 own_submission …). */
export const useClaim = (id: number) => useItemAction<void>(id, () => ({ action: 'claim' }));

/** `POST /api/submissions/:id/release`: put it back in the queue. */
export const useRelease = (id: number) => useItemAction<void>(id, () => ({ action: 'release' }));

/** `POST /api/submissions/:id/decide` (the holder of the claim). */
export const useDecide = (id: number) => useItemAction<DecideBody>(id, (body) => ({ action: 'decide', body }));

export interface EditorsAnswer {
  /** null when no list can be had: the moderator types an editor's account number. */
  editors: PersonRef[] | null;
}

/**
 * The editors a draft may be given to: `GET /api/queue/editors` where the server has it; for an
 * admin, the user list filtered by role; otherwise none (typed by account number).
 */
export function useEditors(isAdmin: boolean, enabled: boolean) {
  return useQuery({
    queryKey: submissionKeys.editors(isAdmin),
    enabled,
    staleTime: staleTimes.editors,
    queryFn: async ({ signal }): Promise<EditorsAnswer> => {
      try {
        const answer = await apiGet<PersonRef[] | EditorsResponse>('/api/queue/editors', { signal });
        return { editors: Array.isArray(answer) ? answer : answer.editors };
      } catch (error) {
        if (!(error instanceof ApiError && (error.status === 404 || error.status === 403))) throw error;
      }
      if (!isAdmin) return { editors: null };
      const list = await apiGet<UserListResponse>('/api/admin/users?role=editor&limit=100', { signal });
      return { editors: list.users.map((u) => ({ id: u.id, displayName: u.displayName })) };
    },
  });
}
