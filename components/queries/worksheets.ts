/** The starter worksheets: `GET /api/worksheets`, `GET /api/worksheets/:name`. */
import { useQuery } from '@tanstack/react-query';
import type { WorksheetListResponse, WorksheetResponse } from '@/shared/api-types';
import { apiGet } from '../http/client';
import { staleTimes } from './staleTimes';

export const worksheetKeys = {
  all: ['worksheets'] as const,
  one: (name: string) => ['worksheets', name] as const,
};

/** `GET /api/worksheets`: the starter worksheets, by name, title and summary. */
export function useWorksheetList() {
  return useQuery({
    queryKey: worksheetKeys.all,
    queryFn: ({ signal }) => apiGet<WorksheetListResponse>('/api/worksheets', { signal }),
    staleTime: staleTimes.reference,
  });
}

/** `GET /api/worksheets/:name`: one worksheet, to evaluate in the browser. */
export function useWorksheet(name: string) {
  return useQuery({
    queryKey: worksheetKeys.one(name),
    queryFn: ({ signal }) => apiGet<WorksheetResponse>(`/api/worksheets/${encodeURIComponent(name)}`, { signal }),
    staleTime: staleTimes.reference,
  });
}
