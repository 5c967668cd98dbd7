import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { api, ApiError, apiRequest, fieldErrorsOf } from './api-client';

function stubFetch(response: Response | (() => Promise<Response>)) {
  const fetchMock = vi.fn(typeof response === 'function' ? response : async () => response);
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(ApiError);
    return error as ApiError;
  }
  throw new Error('expected the request to fail');
}

describe('apiRequest', () => {
  it('when the server answers with the error shape, then an ApiError carries its status, code, message and details', async () => {
    const details = { fieldErrors: { email: ['Enter a valid e-mail address'] } };
    stubFetch(json(400, { error: { code: 'validation_failed', message: 'Check the highlighted fields.', details } }));

    const error = await caught(api.post('/api/auth/register', { email: 'x' }));

    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('Check the highlighted fields.');
    expect(error.details).toEqual(details);
    expect(fieldErrorsOf(error)).toEqual({ email: ['Enter a valid e-mail address'] });
  });

  it('when a 401 comes back, then the code and message are the server’s', async () => {
    stubFetch(json(401, { error: { code: 'unauthenticated', message: 'E-mail or password is wrong.' } }));
    const error = await caught(api.post('/api/auth/login', {}));
    expect(error).toMatchObject({ status: 401, code: 'unauthenticated', message: 'E-mail or password is wrong.' });
  });

  it('when a proxy answers 502 with HTML, then a generic internal ApiError is thrown', async () => {
    stubFetch(new Response('<html>Bad gateway</html>', { status: 502, headers: { 'Content-Type': 'text/html' } }));
    const error = await caught(api.get('/api/auth/me'));
    expect(error).toMatchObject({ status: 502, code: 'internal' });
    expect(error.message).toMatch(/went wrong/);
  });

  it('when a 429 has no error body, then the code falls back to rate_limited', async () => {
    stubFetch(new Response('', { status: 429 }));
    const error = await caught(api.post('/api/auth/login', {}));
    expect(error).toMatchObject({ status: 429, code: 'rate_limited' });
  });

  it('when the body is JSON but not the error shape, then the status fallback is used', async () => {
    stubFetch(json(404, { message: 'nope' }));
    const error = await caught(api.get('/api/nothing'));
    expect(error).toMatchObject({ status: 404, code: 'not_found' });
  });

  it('when the network fails, then an ApiError with status 0 and code network_error is thrown', async () => {
    stubFetch(async () => {
      throw new TypeError('Failed to fetch');
    });
    const error = await caught(api.get('/api/auth/me'));
    expect(error).toMatchObject({ status: 0, code: 'network_error' });
  });

  it('when the request is aborted, then the AbortError passes through unchanged', async () => {
    stubFetch(async () => {
      throw new DOMException('The operation was aborted.', 'AbortError');
    });
    await expect(api.get('/api/auth/me')).rejects.toMatchObject({ name: 'AbortError' });
  });

  it('when the reply is 204, then the result is undefined', async () => {
    stubFetch(new Response(null, { status: 204 }));
    await expect(api.post('/api/auth/logout')).resolves.toBeUndefined();
  });

  it('when a body is sent, then it goes as JSON with same-origin credentials', async () => {
    const fetchMock = stubFetch(json(200, { ok: true }));
    await apiRequest('/api/auth/login', { method: 'POST', body: { email: 'a@example.test', password: 'pw' } });

    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/auth/login');
    expect(init.method).toBe('POST');
    expect(init.credentials).toBe('same-origin');
    expect(init.body).toBe(JSON.stringify({ email: 'a@example.test', password: 'pw' }));
    expect(init.headers).toMatchObject({ 'Content-Type': 'application/json', Accept: 'application/json' });
  });

  it('when a schema is given and the reply matches, then the parsed value is returned', async () => {
    stubFetch(json(200, { user: { id: 'u1' }, extra: true }));
    const reply = await api.get('/api/x', { schema: z.object({ user: z.object({ id: z.string() }) }) });
    expect(reply).toEqual({ user: { id: 'u1' } });
  });

  it('when a schema is given and the reply does not match, then code invalid_response is thrown', async () => {
    stubFetch(json(200, { user: { id: 42 } }));
    const error = await caught(api.get('/api/x', { schema: z.object({ user: z.object({ id: z.string() }) }) }));
    expect(error).toMatchObject({ status: 200, code: 'invalid_response' });
  });
});

describe('fieldErrorsOf', () => {
  it('when the error has no field errors, then an empty object is returned', () => {
    expect(fieldErrorsOf(new ApiError({ status: 401, code: 'unauthenticated', message: 'x' }))).toEqual({});
    expect(fieldErrorsOf(new Error('plain'))).toEqual({});
  });

  it('when field errors hold non-strings, then only the strings are kept', () => {
    const error = new ApiError({ status: 400, code: 'validation_failed', message: 'x', details: { fieldErrors: { a: ['one', 2], b: 'bad' } } });
    expect(fieldErrorsOf(error)).toEqual({ a: ['one'] });
  });
});
