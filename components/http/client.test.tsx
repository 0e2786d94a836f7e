import { ApiError, apiGet, apiSend, ApiUnreachableError, forgetCsrfToken } from './client';
import { jsonResponse, mockFetch } from '../testing/render';

describe('apiGet', () => {
  it('returns the JSON body of a 2xx answer', async () => {
    mockFetch({ '/api/health': () => jsonResponse(200, { status: 'ok', db: 'up', version: '0.1.0' }) });
    await expect(apiGet('/api/health')).resolves.toEqual({ status: 'ok', db: 'up', version: '0.1.0' });
  });

  it('turns our JSON error shape into an ApiError with status, code, message and fields', async () => {
    mockFetch({
      '/api/things': () =>
        jsonResponse(400, {
          error: {
            code: 'validation_failed',
            message: 'Check body.title: Required.',
            fields: { 'body.title': 'Required' },
          },
        }),
    });
    const error = await apiGet('/api/things').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      name: 'ApiError',
      status: 400,
      code: 'validation_failed',
      message: 'Check body.title: Required.',
      fields: { 'body.title': 'Required' },
    });
  });

  it('makes an ApiError of an answer that is not our shape', async () => {
    mockFetch({ '/api/taxonomy': () => jsonResponse(502, '<html>Bad gateway</html>', 'Bad Gateway') });
    const error = await apiGet('/api/taxonomy').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 502, code: 'http_error', fields: undefined });
    expect((error as ApiError).message).toBe('The server answered /api/taxonomy with HTTP 502 Bad Gateway.');
  });

  it('makes an ApiError of a 2xx answer that is not JSON', async () => {
    mockFetch({ '/api/taxonomy': () => jsonResponse(200, 'not json') });
    await expect(apiGet('/api/taxonomy')).rejects.toMatchObject({ status: 200, code: 'invalid_response' });
  });

  it('reports a network failure as ApiUnreachableError, keeping the cause', async () => {
    const cause = new TypeError('Failed to fetch');
    mockFetch({
      '/api/taxonomy': () => {
        throw cause;
      },
    });
    const error = await apiGet('/api/taxonomy').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiUnreachableError);
    expect(error).not.toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ path: '/api/taxonomy', cause });
  });

  it('lets a cancelled request stay a cancellation', async () => {
    const abort = new DOMException('The operation was aborted.', 'AbortError');
    mockFetch({
      '/api/taxonomy': () => {
        throw abort;
      },
    });
    const controller = new AbortController();
    controller.abort();
    await expect(apiGet('/api/taxonomy', { signal: controller.signal })).rejects.toBe(abort);
  });

  it('takes a listed non-2xx status as an answer (health reports 503 with its body)', async () => {
    mockFetch({ '/api/health': () => jsonResponse(503, { status: 'degraded', db: 'down', version: '0.1.0' }) });
    await expect(apiGet('/api/health', { acceptStatus: [503] })).resolves.toMatchObject({ db: 'down' });
    await expect(apiGet('/api/health')).rejects.toMatchObject({ status: 503, code: 'http_error' });
  });
});

describe('apiSend', () => {
  beforeEach(() => forgetCsrfToken());

  const headersOf = (init?: RequestInit) => (init?.headers ?? {}) as Record<string, string>;

  it('fetches the session for its CSRF token first, then sends JSON with it, same-origin', async () => {
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'tok-first' }),
      '/api/auth/forgot': () => jsonResponse(202, {}),
    });
    await expect(apiSend('POST', '/api/auth/forgot', { email: 'esther.mbeki@example.org' })).resolves.toEqual({});
    await apiSend('POST', '/api/auth/forgot', { email: 'esther.mbeki@example.org' });

    const paths = fetchMock.mock.calls.map(([path]) => path);
    expect(paths).toEqual(['/api/session', '/api/auth/forgot', '/api/auth/forgot']);
    const [, init] = fetchMock.mock.calls[1];
    expect(init).toMatchObject({ method: 'POST', credentials: 'same-origin', body: JSON.stringify({ email: 'esther.mbeki@example.org' }) });
    expect(headersOf(init)).toMatchObject({ 'X-CSRF-Token': 'tok-first', 'Content-Type': 'application/json' });
  });

  it('takes a refused token (403 csrf_failed) as a changed session: new token, one retry', async () => {
    let sessions = 0;
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: `tok-${++sessions}` }),
      '/api/account': (init) =>
        headersOf(init)['X-CSRF-Token'] === 'tok-2'
          ? jsonResponse(200, { user: { displayName: 'Esther Mbeki' } })
          : jsonResponse(403, { error: { code: 'csrf_failed', message: 'The form is out of date. Reload the page.' } }),
    });
    await expect(apiSend('PATCH', '/api/account', { displayName: 'Esther Mbeki' })).resolves.toMatchObject({
      user: { displayName: 'Esther Mbeki' },
    });
    expect(fetchMock.mock.calls.map(([path]) => path)).toEqual(['/api/session', '/api/account', '/api/session', '/api/account']);
  });

  it('retries only once', async () => {
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'tok-stale' }),
      '/api/auth/sign-out': () => jsonResponse(403, { error: { code: 'csrf_failed', message: 'Refused.' } }),
    });
    await expect(apiSend('POST', '/api/auth/sign-out')).rejects.toMatchObject({ status: 403, code: 'csrf_failed' });
    expect(fetchMock.mock.calls.filter(([path]) => path === '/api/auth/sign-out')).toHaveLength(2);
  });

  it('resolves a 204 to undefined and sends no body when there is none', async () => {
    const fetchMock = mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'tok' }),
      '/api/auth/sign-out': () => jsonResponse(204, undefined),
    });
    await expect(apiSend('POST', '/api/auth/sign-out')).resolves.toBeUndefined();
    const [, init] = fetchMock.mock.calls[1];
    expect(init?.body).toBeUndefined();
    expect(headersOf(init)['Content-Type']).toBeUndefined();
  });

  it('passes on field errors keyed body.<field>', async () => {
    mockFetch({
      '/api/session': () => jsonResponse(200, { user: null, csrfToken: 'tok' }),
      '/api/auth/sign-up': () =>
        jsonResponse(409, {
          error: { code: 'email_taken', message: 'That address has an account.', fields: { 'body.email': 'taken' } },
        }),
    });
    await expect(apiSend('POST', '/api/auth/sign-up', {})).rejects.toMatchObject({
      status: 409,
      code: 'email_taken',
      fields: { 'body.email': 'taken' },
    });
  });
});
