/**
 * The published library: `/api/entries` (list, a version, the versions, the citation), and the
 * editors' retire (the contract in shared/api/entries.ts); revising an entry starts a draft (drafts.ts).
 */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CiteFormat,
  CiteResponse,
  EntryListQuery,
  EntryListResponse,
  EntryResponse,
  RetireBody,
  RetireResponse,
  VersionListResponse,
} from '@/shared/api-types';
import { apiGet, apiSend, queryString } from '../http/client';
import { staleTimes } from './staleTimes';

export const entryKeys = {
  all: ['entries'] as const,
  list: (query: EntryListQuery) => ['entries', 'list', query] as const,
  one: (slug: string, version?: number) => ['entries', slug, 'version', version ?? 'latest'] as const,
  versions: (slug: string) => ['entries', slug, 'versions'] as const,
  cite: (slug: string, format: CiteFormat, version: number) => ['entries', slug, 'cite', format, version] as const,
};

export const entryPath = (slug: string) => `/api/entries/${encodeURIComponent(slug)}`;

/** `GET /api/entries`: published entries, newest revision first, filtered by law and mechanism class. */
export function useEntryList(query: EntryListQuery) {
  return useQuery({
    queryKey: entryKeys.list(query),
    queryFn: ({ signal }) => apiGet<EntryListResponse>(`/api/entries${queryString({ ...query })}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** `GET /api/entries/:slug` (the latest published version) or `…/versions/:n` (that version forever). */
export function useEntry(slug: string, version?: number) {
  return useQuery({
    queryKey: entryKeys.one(slug, version),
    queryFn: ({ signal }) =>
      apiGet<EntryResponse>(version === undefined ? entryPath(slug) : `${entryPath(slug)}/versions/${version}`, { signal }),
    staleTime: version === undefined ? staleTimes.latestVersion : staleTimes.publishedVersion,
  });
}

/** `GET /api/entries/:slug/versions` */
export function useEntryVersions(slug: string) {
  return useQuery({
    queryKey: entryKeys.versions(slug),
    queryFn: ({ signal }) => apiGet<VersionListResponse>(`${entryPath(slug)}/versions`, { signal }),
  });
}

/** `GET /api/entries/:slug/cite?format=…&version=…`: the version itself, cited. */
export function useCite(slug: string, format: CiteFormat, version: number) {
  return useQuery({
    queryKey: entryKeys.cite(slug, format, version),
    queryFn: ({ signal }) => apiGet<CiteResponse>(`${entryPath(slug)}/cite${queryString({ format, version })}`, { signal }),
    staleTime: staleTimes.publishedVersion,
  });
}

/** `POST /api/entries/:slug/retire`: a reason (and perhaps a published successor); the pages stay, with a notice. */
export function useRetireEntry(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: RetireBody) => apiSend<RetireResponse>('POST', `${entryPath(slug)}/retire`, body),
    onSuccess: () => client.invalidateQueries({ queryKey: entryKeys.all }),
  });
}
