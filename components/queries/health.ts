/** `GET /api/health`. */
import { useQuery } from '@tanstack/react-query';
import type { HealthResponse } from '@/shared/api-types';
import { apiGet } from '../http/client';

export const healthKeys = { all: ['health'] as const };

/** `GET /api/health`; a degraded server (503) is data here, not an error. */
export function useHealth() {
  return useQuery({
    queryKey: healthKeys.all,
    queryFn: ({ signal }) => apiGet<HealthResponse>('/api/health', { signal, acceptStatus: [503] }),
  });
}
