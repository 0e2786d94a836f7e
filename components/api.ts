/**
 * The one client for Counterweight's API, which is served from the same origin as the app.
 * Every failure becomes one of two errors:
 *  - ApiError: the server answered, with an error (our JSON shape, or something else it sent);
 *  - ApiUnreachableError: no answer at all (server down, network gone).
 */
import { QueryClient, useQuery } from '@tanstack/react-query';
import type { ApiErrorBody, HealthResponse, TaxonomyResponse } from '@/shared/api-types';
import type { Worksheet } from '@/shared/worksheet/schema';

export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export class ApiUnreachableError extends Error {
  override readonly name = 'ApiUnreachableError';

  constructor(readonly path: string, options?: { cause?: unknown }) {
    super(`Counterweight's server could not be reached (${path}).`, options);
  }
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const { error } = value as { error: unknown };
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as { code?: unknown }).code === 'string' &&
    typeof (error as { message?: unknown }).message === 'string'
  );
}

async function readJson(response: Response): Promise<unknown> {
  try {
    return await response.json();
  } catch {
    return undefined;
  }
}

export interface GetOptions {
  signal?: AbortSignal;
  /** Non-2xx statuses whose body is still a regular answer (health sends 503 with its report). */
  acceptStatus?: readonly number[];
}

/** GET a JSON resource from the API, e.g. `apiGet<TaxonomyResponse>('/api/taxonomy')`. */
export async function apiGet<T>(path: string, { signal, acceptStatus = [] }: GetOptions = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, { headers: { Accept: 'application/json' }, signal });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiUnreachableError(path, { cause });
  }

  const payload = await readJson(response);
  if (response.ok || acceptStatus.includes(response.status)) {
    if (payload === undefined) {
      throw new ApiError(response.status, 'invalid_response', `The server's answer to ${path} was not JSON.`);
    }
    return payload as T;
  }
  if (isErrorBody(payload)) {
    const { code, message, fields } = payload.error;
    throw new ApiError(response.status, code, message, fields);
  }
  throw new ApiError(
    response.status,
    'http_error',
    `The server answered ${path} with HTTP ${response.status}${response.statusText ? ` ${response.statusText}` : ''}.`,
  );
}

/** Retry once, and only what may pass on a second try: no answer at all, or a 5xx. */
function shouldRetry(failureCount: number, error: Error): boolean {
  if (failureCount >= 1) return false;
  return error instanceof ApiUnreachableError || (error instanceof ApiError && error.status >= 500);
}

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { retry: shouldRetry } } });
}

export const queryKeys = {
  health: ['health'] as const,
  taxonomy: ['taxonomy'] as const,
  worksheets: ['worksheets'] as const,
  worksheet: (name: string) => ['worksheets', name] as const,
};

/** One starter worksheet as `GET /api/worksheets` lists it. */
export interface WorksheetSummary {
  name: string;
  title: string;
  summary: string;
}

/** `GET /api/worksheets` */
export interface WorksheetListResponse {
  worksheets: WorksheetSummary[];
}

/** `GET /api/worksheets/:name` */
export interface WorksheetResponse {
  worksheet: Worksheet;
}

/** `GET /api/health`; a degraded server (503) is data here, not an error. */
export function useHealth() {
  return useQuery({
    queryKey: queryKeys.health,
    queryFn: ({ signal }) => apiGet<HealthResponse>('/api/health', { signal, acceptStatus: [503] }),
  });
}

/** `GET /api/taxonomy`: conservation laws and mechanism classes. */
export function useTaxonomy() {
  return useQuery({
    queryKey: queryKeys.taxonomy,
    queryFn: ({ signal }) => apiGet<TaxonomyResponse>('/api/taxonomy', { signal }),
    staleTime: 5 * 60 * 1000,
  });
}

/** `GET /api/worksheets`: the starter worksheets, by name, title and summary. */
export function useWorksheetList() {
  return useQuery({
    queryKey: queryKeys.worksheets,
    queryFn: ({ signal }) => apiGet<WorksheetListResponse>('/api/worksheets', { signal }),
    staleTime: 5 * 60 * 1000,
  });
}

/** `GET /api/worksheets/:name`: one worksheet, to evaluate in the browser. */
export function useWorksheet(name: string) {
  return useQuery({
    queryKey: queryKeys.worksheet(name),
    queryFn: ({ signal }) => apiGet<WorksheetResponse>(`/api/worksheets/${encodeURIComponent(name)}`, { signal }),
    staleTime: 5 * 60 * 1000,
  });
}
