/**
 * The small HTTP client of Counterweight's API, which is served from the same origin as the app:
 * `apiGet` reads, `apiSend` changes things (with the session's CSRF token). Every failure becomes one of two errors:
 *  - ApiError: the server answered, with an error (our JSON shape, or something else it sent);
 *  - ApiUnreachableError: no answer at all (server down, network gone).
 * The hooks that use it live in components/queries/<resource>.ts; the types in shared/api/.
 */
import type { ApiErrorBody, SessionResponse } from '@/shared/api-types';

export class ApiError extends Error {
  override readonly name = 'ApiError';

  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** The whole answer, for errors that carry more beside `error` (the current draft on a 409 edit_conflict). */
    readonly payload?: unknown,
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

/** One request to the API, its answer read as JSON or turned into one of the two errors above. */
async function call(path: string, init: RequestInit, acceptStatus: readonly number[] = []): Promise<unknown> {
  let response: Response;
  try {
    response = await fetch(path, { ...init, credentials: 'same-origin' });
  } catch (cause) {
    if (init.signal?.aborted) throw cause;
    throw new ApiUnreachableError(path, { cause });
  }

  if (response.status === 204) return undefined;
  const payload = await readJson(response);
  if (response.ok || acceptStatus.includes(response.status)) {
    if (payload === undefined) {
      throw new ApiError(response.status, 'invalid_response', `The server's answer to ${path} was not JSON.`);
    }
    return payload;
  }
  if (isErrorBody(payload)) {
    const { code, message, fields } = payload.error;
    throw new ApiError(response.status, code, message, fields, payload);
  }
  throw new ApiError(
    response.status,
    'http_error',
    `The server answered ${path} with HTTP ${response.status}${response.statusText ? ` ${response.statusText}` : ''}.`,
  );
}

/** GET a JSON resource from the API, e.g. `apiGet<TaxonomyResponse>('/api/taxonomy')`. */
export async function apiGet<T>(path: string, { signal, acceptStatus = [] }: GetOptions = {}): Promise<T> {
  return (await call(path, { headers: { Accept: 'application/json' }, signal }, acceptStatus)) as T;
}

/**
 * The CSRF token of this browser's session, which every state-changing request carries in the
 * `X-CSRF-Token` header. It comes with `GET /api/session`; the server may replace it when the
 * session changes (sign-in, sign-out), so it is forgotten then and fetched again.
 */
let knownCsrfToken: string | undefined;
let pendingCsrfToken: Promise<string> | undefined;

/** `GET /api/session`, keeping the CSRF token it carries. */
export async function fetchSession(signal?: AbortSignal): Promise<SessionResponse> {
  const session = await apiGet<SessionResponse>('/api/session', { signal });
  knownCsrfToken = session.csrfToken;
  return session;
}

function csrfToken(refresh: boolean): Promise<string> {
  if (!refresh && knownCsrfToken !== undefined) return Promise.resolve(knownCsrfToken);
  pendingCsrfToken ??= fetchSession()
    .then((session) => session.csrfToken)
    .finally(() => {
      pendingCsrfToken = undefined;
    });
  return pendingCsrfToken;
}

/** Drops the CSRF token, so that the next request fetches the session's current one first. */
export function forgetCsrfToken() {
  knownCsrfToken = undefined;
}

type SendMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Sends a state-changing request with a JSON body and the session's CSRF token, e.g.
 * `apiSend<UserResponse>('POST', '/api/auth/sign-in', { email, password })`, or with a FormData body (files). A 403 `csrf_failed`
 * (the session changed under us) fetches the token again and tries once more. A 204 resolves to
 * undefined. Field errors come in the ApiError's `fields`, keyed `body.<field>`.
 */
export async function apiSend<T = void>(method: SendMethod, path: string, body?: unknown): Promise<T> {
  // A FormData body (files) goes as it is: the browser sets the multipart boundary itself.
  const form = typeof FormData !== 'undefined' && body instanceof FormData;
  const send = (token: string) =>
    call(path, {
      method,
      headers: {
        Accept: 'application/json',
        'X-CSRF-Token': token,
        ...(body === undefined || form ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : form ? (body as FormData) : JSON.stringify(body),
    });
  try {
    return (await send(await csrfToken(false))) as T;
  } catch (error) {
    if (!(error instanceof ApiError && error.status === 403 && error.code === 'csrf_failed')) throw error;
    return (await send(await csrfToken(true))) as T;
  }
}


/** A query string from the values that are set, in a fixed order: `?q=ada&limit=25&offset=0`. */
export function queryString(query: Record<string, string | number | undefined>): string {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(name, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

