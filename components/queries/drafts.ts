/**
 * The Desk and the vetting workflow (editors): `/api/desk`, `/api/drafts/*`, and the citation
 * parser the editor uses (the contract in shared/api/drafts.ts and shared/api/entries.ts).
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CitationParseResponse, DeskResponse, DraftDto, DraftResponse, DraftExistsExtra } from '@/shared/api-types';
import type { EntryContent } from '@/shared/entries/schema';
import { ApiError, apiGet, apiSend } from '../http/client';
import { userKey } from './client';
import { entryKeys, entryPath } from './entries';
import { staleTimes } from './staleTimes';

/** The Desk and its drafts belong to the signed-in editor. */
export const deskKeys = {
  all: userKey('desk'),
  draft: (id: number) => userKey('desk', 'draft', id),
};

/** `GET /api/desk`: my drafts, drafts waiting for my review, recently published. */
export function useDesk() {
  return useQuery({
    queryKey: deskKeys.all,
    queryFn: ({ signal }) => apiGet<DeskResponse>('/api/desk', { signal }),
  });
}

/** `GET /api/drafts/:id` */
export function useDraft(id: number) {
  return useQuery({
    queryKey: deskKeys.draft(id),
    queryFn: ({ signal }) => apiGet<DraftResponse>(`/api/drafts/${id}`, { signal }),
    staleTime: staleTimes.openDraft,
  });
}

/** `POST /api/drafts`: a new entry (409 `slug_taken` naming `body.slug`). */
export function createDraft(slug: string, content: EntryContent) {
  return apiSend<DraftResponse>('POST', '/api/drafts', { slug, content });
}

/** `PUT /api/drafts/:id`: 409 `edit_conflict` when `lockVersion` is stale, with the current draft in the body. */
export function saveDraft(id: number, content: EntryContent, lockVersion: number) {
  return apiSend<DraftResponse>('PUT', `/api/drafts/${id}`, { content, lockVersion });
}

/** The current draft a 409 `edit_conflict` carries beside its error. */
export function draftOfConflict(error: unknown): DraftDto | undefined {
  if (!(error instanceof ApiError) || error.code !== 'edit_conflict') return undefined;
  const { payload } = error;
  if (typeof payload !== 'object' || payload === null || !('draft' in payload)) return undefined;
  return (payload as DraftResponse).draft;
}

/** The id of the draft already open for an entry, from a 409 `draft_exists` when revising it. */
export function openDraftOf(error: unknown): number | undefined {
  if (!(error instanceof ApiError) || error.code !== 'draft_exists') return undefined;
  const { payload } = error;
  if (typeof payload !== 'object' || payload === null || !('draftId' in payload)) return undefined;
  return Number((payload as DraftExistsExtra).draftId);
}

type DraftAction = { id: number } & (
  | { action: 'submit'; lockVersion: number }
  | { action: 'approve'; changeNote: string }
  | { action: 'send-back'; reason: string }
);

/** `POST /api/entries/:slug/drafts`: a new draft of a published entry, copied from its latest version (409 `draft_exists`). */
export function useReviseEntry() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (slug: string) => apiSend<DraftResponse>('POST', `${entryPath(slug)}/drafts`),
    onSuccess: () => client.invalidateQueries({ queryKey: deskKeys.all }),
  });
}

/** `POST /api/drafts/:id/submit | approve | send-back`: the vetting workflow. After it the Desk is fetched again, and after an approval the library too. */
export function useDraftAction() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, action, ...body }: DraftAction) => apiSend<unknown>('POST', `/api/drafts/${id}/${action}`, body),
    onSuccess: async (_result, { action }) => {
      await client.invalidateQueries({ queryKey: deskKeys.all });
      if (action === 'approve') await client.invalidateQueries({ queryKey: entryKeys.all });
    },
  });
}

/** `POST /api/citations/parse`: BibTeX, RIS or CSL-JSON to CSL-JSON items, and what could not be read. */
export function useParseCitations() {
  return useMutation({
    mutationFn: (text: string) => apiSend<CitationParseResponse>('POST', '/api/citations/parse', { text }),
  });
}
