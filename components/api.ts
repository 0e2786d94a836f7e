/**
 * The one client for Counterweight's API, which is served from the same origin as the app:
 * `apiGet` reads, `apiSend` changes things (with the session's CSRF token). Every failure becomes one of two errors:
 *  - ApiError: the server answered, with an error (our JSON shape, or something else it sent);
 *  - ApiUnreachableError: no answer at all (server down, network gone).
 */
import { keepPreviousData, QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ApiErrorBody,
  AuditListResponse,
  ChangePasswordBody,
  CitationParseResponse,
  CiteFormat,
  CiteResponse,
  DeskResponse,
  DraftDto,
  DraftResponse,
  EmailOnlyBody,
  EntryListQuery,
  EntryListResponse,
  EntryResponse,
  HealthResponse,
  OutboxResponse,
  PageQuery,
  ResetBody,
  RetireBody,
  RetireResponse,
  Role,
  SearchParams,
  SearchResponse,
  SessionResponse,
  SignInBody,
  SignUpBody,
  TaxonomyResponse,
  UpdateAccountBody,
  UserListQuery,
  UserListResponse,
  UserResponse,
  VerifyBody,
  VersionListResponse,
  WorksheetListResponse,
  WorksheetResponse,
} from '@/shared/api-types';
import type { EntryContent } from '@/shared/entries/schema';

export type {
  ChangePasswordBody,
  CitationParseResponse,
  CitationProblem,
  CiteFormat,
  CiteResponse,
  DeskResponse,
  DraftDto,
  DraftResponse,
  DraftState,
  EmailOnlyBody,
  EntryHtml,
  EntryListQuery,
  EntryListResponse,
  EntryResponse,
  EntryStateDto,
  EntrySummaryDto as EntrySummary,
  EntryVersionDto,
  DraftSummaryDto as DraftSummary,
  PageQuery,
  PersonDto,
  PublishedSummaryDto,
  ResetBody,
  SearchParams,
  SearchResponse,
  SearchResult,
  SignInBody,
  SignUpBody,
  UpdateAccountBody,
  UserListQuery,
  UserResponse,
  VerifyBody,
  VersionListResponse,
  VersionSummaryDto as VersionSummary,
  WorksheetListResponse,
  WorksheetResponse,
  WorksheetSummary,
} from '@/shared/api-types';
export { CITE_FORMATS } from '@/shared/api/constants';

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

async function fetchSession(signal?: AbortSignal): Promise<SessionResponse> {
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
  session: ['session'] as const,
  /** Everything only an admin sees; dropped when who is signed in changes. */
  admin: ['admin'] as const,
  users: ['admin', 'users'] as const,
  userList: (query: UserListQuery) => ['admin', 'users', query] as const,
  audit: ['admin', 'audit'] as const,
  auditPage: (page: PageQuery) => ['admin', 'audit', page] as const,
  outbox: ['admin', 'outbox'] as const,
  entries: ['entries'] as const,
  entryList: (query: EntryListQuery) => ['entries', 'list', query] as const,
  entry: (slug: string, version?: number) => ['entries', slug, 'version', version ?? 'latest'] as const,
  entryVersions: (slug: string) => ['entries', slug, 'versions'] as const,
  cite: (slug: string, format: CiteFormat, version: number) => ['entries', slug, 'cite', format, version] as const,
  /** The Desk and its drafts; dropped with the session like the admin data would be. */
  desk: ['desk'] as const,
  draft: (id: number) => ['desk', 'draft', id] as const,
  search: (params: SearchParams) => ['search', params] as const,
};


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

/* Accounts (the contract in shared/schemas/auth.ts and shared/api-types.ts). */


/** A query string from the values that are set, in a fixed order: `?q=ada&limit=25&offset=0`. */
function queryString(query: Record<string, string | number | undefined>): string {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(name, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** `GET /api/session`: who is signed in (null for a reader), and the CSRF token it keeps. */
export function useSession() {
  return useQuery({
    queryKey: queryKeys.session,
    queryFn: ({ signal }) => fetchSession(signal),
    staleTime: 60 * 1000,
  });
}

/** After sign-in, sign-out or a reset the session is another one: new token, new user, no admin data. */
async function sessionChanged(client: QueryClient) {
  forgetCsrfToken();
  client.removeQueries({ queryKey: queryKeys.admin });
  client.removeQueries({ queryKey: queryKeys.desk });
  await client.invalidateQueries({ queryKey: queryKeys.session });
}

/** `POST /api/auth/sign-up`: 201 with the new (unverified, not signed-in) user. */
export function useSignUp() {
  return useMutation({ mutationFn: (body: SignUpBody) => apiSend<UserResponse>('POST', '/api/auth/sign-up', body) });
}

/** `POST /api/auth/verify`: confirms the e-mail address with the token from the link. */
export function useVerify() {
  return useMutation({ mutationFn: (body: VerifyBody) => apiSend<UserResponse>('POST', '/api/auth/verify', body) });
}

/** `POST /api/auth/resend-verification`: 202 whether or not the address has an account. */
export function useResendVerification() {
  return useMutation({ mutationFn: (body: EmailOnlyBody) => apiSend<object>('POST', '/api/auth/resend-verification', body) });
}

/** `POST /api/auth/sign-in`; the session is fetched again once it succeeds. */
export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => apiSend<UserResponse>('POST', '/api/auth/sign-in', body),
    onSuccess: () => sessionChanged(client),
  });
}

/** `POST /api/auth/sign-out`; the session is fetched again once it succeeds. */
export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend('POST', '/api/auth/sign-out'),
    onSuccess: () => sessionChanged(client),
  });
}

/** `POST /api/auth/forgot`: 202 whether or not the address has an account. */
export function useForgotPassword() {
  return useMutation({ mutationFn: (body: EmailOnlyBody) => apiSend<object>('POST', '/api/auth/forgot', body) });
}

/** `POST /api/auth/reset`: a new password with the token from the link; every session of that user ends. */
export function useResetPassword() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: ResetBody) => apiSend<object>('POST', '/api/auth/reset', body),
    onSuccess: () => sessionChanged(client),
  });
}

/** `PATCH /api/account`: a new display name, shown at once wherever the session is read. */
export function useUpdateAccount() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateAccountBody) => apiSend<UserResponse>('PATCH', '/api/account', body),
    onSuccess: ({ user }) => {
      client.setQueryData<SessionResponse>(queryKeys.session, (session) => (session ? { ...session, user } : session));
    },
  });
}

/** `POST /api/account/password`. */
export function useChangePassword() {
  return useMutation({ mutationFn: (body: ChangePasswordBody) => apiSend<object>('POST', '/api/account/password', body) });
}

/** `GET /api/admin/users`: a page of users, searched by e-mail or name and filtered by role. */
export function useUserList(query: UserListQuery) {
  return useQuery({
    queryKey: queryKeys.userList(query),
    queryFn: ({ signal }) => apiGet<UserListResponse>(`/api/admin/users${queryString(query)}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/**
 * `PATCH /api/admin/users/:id/role`. The user's new role replaces the old one in every list
 * already fetched, and the audit log is fetched again to show the change.
 */
export function useSetRole() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: Role }) =>
      apiSend<UserResponse>('PATCH', `/api/admin/users/${id}/role`, { role }),
    onSuccess: ({ user }) => {
      client.setQueriesData<UserListResponse>({ queryKey: queryKeys.users }, (list) =>
        list ? { ...list, users: list.users.map((u) => (u.id === user.id ? user : u)) } : list,
      );
      return client.invalidateQueries({ queryKey: queryKeys.audit });
    },
  });
}

/** `GET /api/admin/audit`: the audit log, newest first. */
export function useAuditLog(page: PageQuery) {
  return useQuery({
    queryKey: queryKeys.auditPage(page),
    queryFn: ({ signal }) => apiGet<AuditListResponse>(`/api/admin/audit${queryString(page)}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** `GET /api/admin/outbox` (development only): the mail the local fake SMTP server caught, newest first. */
export function useOutbox() {
  return useQuery({
    queryKey: queryKeys.outbox,
    queryFn: ({ signal }) => apiGet<OutboxResponse>('/api/admin/outbox', { signal }),
  });
}

/* Entries (the contract of issue 5; content as in shared/entries/schema.ts). */



const entryPath = (slug: string) => `/api/entries/${encodeURIComponent(slug)}`;

/** `GET /api/entries`: published entries, newest revision first, filtered by law and mechanism class. */
export function useEntryList(query: EntryListQuery) {
  return useQuery({
    queryKey: queryKeys.entryList(query),
    queryFn: ({ signal }) => apiGet<EntryListResponse>(`/api/entries${queryString({ ...query })}`, { signal }),
    placeholderData: keepPreviousData,
  });
}

/** `GET /api/entries/:slug` (the latest published version) or `…/versions/:n` (that version forever). */
export function useEntry(slug: string, version?: number) {
  return useQuery({
    queryKey: queryKeys.entry(slug, version),
    queryFn: ({ signal }) =>
      apiGet<EntryResponse>(version === undefined ? entryPath(slug) : `${entryPath(slug)}/versions/${version}`, { signal }),
    // A published version never changes; the latest one changes only when a revision is approved.
    staleTime: version === undefined ? 60 * 1000 : Infinity,
  });
}

/** `GET /api/entries/:slug/versions` */
export function useEntryVersions(slug: string) {
  return useQuery({
    queryKey: queryKeys.entryVersions(slug),
    queryFn: ({ signal }) => apiGet<VersionListResponse>(`${entryPath(slug)}/versions`, { signal }),
  });
}

/** `GET /api/entries/:slug/cite?format=…&version=…`: the version itself, cited. */
export function useCite(slug: string, format: CiteFormat, version: number) {
  return useQuery({
    queryKey: queryKeys.cite(slug, format, version),
    queryFn: ({ signal }) => apiGet<CiteResponse>(`${entryPath(slug)}/cite${queryString({ format, version })}`, { signal }),
    staleTime: Infinity,
  });
}

/** `GET /api/desk`: my drafts, drafts waiting for my review, recently published. */
export function useDesk() {
  return useQuery({
    queryKey: queryKeys.desk,
    queryFn: ({ signal }) => apiGet<DeskResponse>('/api/desk', { signal }),
  });
}

/** `GET /api/drafts/:id` */
export function useDraft(id: number) {
  return useQuery({
    queryKey: queryKeys.draft(id),
    queryFn: ({ signal }) => apiGet<DraftResponse>(`/api/drafts/${id}`, { signal }),
    // The editor owns its copy while it is open; saving writes the answer back here.
    staleTime: Infinity,
  });
}

/** After a draft is made or changes state, the Desk's lists and its drafts are fetched again. */
function draftChanged(client: QueryClient) {
  return client.invalidateQueries({ queryKey: queryKeys.desk });
}

/** `POST /api/drafts`: a new entry (409 `slug_taken` naming `body.slug`). */
export function createDraft(slug: string, content: EntryContent) {
  return apiSend<DraftResponse>('POST', '/api/drafts', { slug, content });
}

/** `POST /api/entries/:slug/drafts`: a new draft of a published entry, copied from its latest version. */
export function useReviseEntry() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (slug: string) => apiSend<DraftResponse>('POST', `${entryPath(slug)}/drafts`),
    onSuccess: () => draftChanged(client),
  });
}

/** `POST /api/entries/:slug/retire`: a reason (and perhaps a published successor); the pages stay, with a notice. */
export function useRetireEntry(slug: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: RetireBody) => apiSend<RetireResponse>('POST', `${entryPath(slug)}/retire`, body),
    onSuccess: () => client.invalidateQueries({ queryKey: queryKeys.entries }),
  });
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
  return Number((payload as { draftId: unknown }).draftId);
}

type DraftAction = { id: number } & (
  | { action: 'submit'; lockVersion: number }
  | { action: 'approve'; changeNote: string }
  | { action: 'send-back'; reason: string }
);

/** `POST /api/drafts/:id/submit | approve | send-back`: the vetting workflow. */
export function useDraftAction() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, action, ...body }: DraftAction) => apiSend<unknown>('POST', `/api/drafts/${id}/${action}`, body),
    onSuccess: async (_result, { action }) => {
      await draftChanged(client);
      if (action === 'approve') await client.invalidateQueries({ queryKey: queryKeys.entries });
    },
  });
}

/** `POST /api/citations/parse`: BibTeX, RIS or CSL-JSON to CSL-JSON items, and what could not be read. */
export function useParseCitations() {
  return useMutation({
    mutationFn: (text: string) => apiSend<CitationParseResponse>('POST', '/api/citations/parse', { text }),
  });
}

/* Search (issue 6; the contract of `GET /api/search`). */


/** `GET /api/search?q=&law=&mechanism=&limit=&offset=`; the previous results stay while the next ones load. */
export function useSearch(params: SearchParams, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({
    queryKey: queryKeys.search(params),
    queryFn: ({ signal }) =>
      apiGet<SearchResponse>(
        `/api/search${queryString({ q: params.q, law: params.law, mechanism: params.mechanism, limit: params.limit, offset: params.offset })}`,
        { signal },
      ),
    placeholderData: keepPreviousData,
    enabled,
  });
}
