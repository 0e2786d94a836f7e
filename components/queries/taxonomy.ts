/** `GET /api/taxonomy`: conservation laws and mechanism classes. */
import { useQuery } from '@tanstack/react-query';
import type { TaxonomyResponse } from '@/shared/api-types';
import { apiGet } from '../http/client';
import { staleTimes } from './staleTimes';

export const taxonomyKeys = { all: ['taxonomy'] as const };

/** `GET /api/taxonomy`: conservation laws and mechanism classes. */
export function useTaxonomy() {
  return useQuery({
    queryKey: taxonomyKeys.all,
    queryFn: ({ signal }) => apiGet<TaxonomyResponse>('/api/taxonomy', { signal }),
    staleTime: staleTimes.reference,
  });
}
