import { ApiError, ApiUnreachableError, apiGet } from './api';
import { jsonResponse, mockFetch } from './testing/render';

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
