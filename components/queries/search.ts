/** `GET /api/search` (the contract in shared/api/search.ts). */
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { SearchParams, SearchResponse } from '@/shared/api-types';
import { apiGet, queryString } from '../http/client';

export const searchKeys = {
  all: ['search'] as const,
  results: (params: SearchParams) => ['search', params] as const,
};

/** `GET /api/search?q=&law=&mechanism=&limit=&offset=`; the previous results stay while the next ones load. */
export function useSearch(params: SearchParams, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: searchKeys.results(params),
    queryFn: ({ signal }) =>
      apiGet<SearchResponse>(
        `/api/search${queryString({ q: params.q, law: params.law, mechanism: params.mechanism, limit: params.limit, offset: params.offset })}`,
        { signal },
      ),
    placeholderData: keepPreviousData,
    enabled,
  });
}
