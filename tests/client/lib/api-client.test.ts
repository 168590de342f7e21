import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';

type ApiClientModule = typeof import('../../../src/lib/api-client');

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
const envelope = (code: string, message: string, fields?: Record<string, string>) => ({ error: { code, message, ...(fields ? { fields } : {}) } });

let client: ApiClientModule;
let fetchMock: ReturnType<typeof vi.fn>;

beforeEach(async () => {
  // A fresh module per test, so the cached CSRF token does not leak between tests.
  vi.resetModules();
  client = await import('../../../src/lib/api-client');
  fetchMock = vi.fn();
  vi.stubGlobal('fetch', fetchMock);
});

afterEach(() => {
  vi.unstubAllGlobals();
});

const thingSchema = z.object({ thing: z.object({ id: z.number() }) });

describe('apiClient', () => {
  it('parses a success body with the schema it is given and sends the session cookie', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { thing: { id: 7 } }));
    await expect(client.apiClient.get('/api/things/7', thingSchema)).resolves.toEqual({ thing: { id: 7 } });
    expect(fetchMock).toHaveBeenCalledWith('/api/things/7', expect.objectContaining({ method: 'GET', credentials: 'same-origin' }));
  });

  it('puts query parameters on the address and leaves out empty ones', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { thing: { id: 1 } }));
    await client.apiClient.get('/api/things', thingSchema, { query: { page: 2, pageSize: 50, q: undefined } });
    expect(fetchMock.mock.calls[0][0]).toBe('/api/things?page=2&pageSize=50');
  });

  it('turns the error envelope into an ApiError with status, code and field messages', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { token: 't1' })).mockResolvedValueOnce(json(400, envelope('validation_failed', 'Check the form', { name: 'Enter a name' })));
    const error = await client.apiClient.post('/api/things', {}, thingSchema).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(client.ApiError);
    expect(error).toMatchObject({ status: 400, code: 'validation_failed', message: 'Check the form', fields: { name: 'Enter a name' } });
  });

  it('fetches the CSRF token once and sends it on every non-GET request', async () => {
    fetchMock
      .mockResolvedValueOnce(json(200, { token: 'tok-1' }))
      .mockResolvedValueOnce(json(201, { thing: { id: 1 } }))
      .mockResolvedValueOnce(json(200, { thing: { id: 1 } }));
    await client.apiClient.post('/api/things', { a: 1 }, thingSchema);
    await client.apiClient.patch('/api/things/1', { a: 2 }, thingSchema);
    const urls = fetchMock.mock.calls.map((call) => call[0]);
    expect(urls).toEqual(['/api/auth/csrf', '/api/things', '/api/things/1']);
    for (const call of fetchMock.mock.calls.slice(1)) expect(call[1].headers['x-csrf-token']).toBe('tok-1');
    expect(fetchMock.mock.calls[1][1].body).toBe(JSON.stringify({ a: 1 }));
  });

  it('refetches the token and retries once when the server says csrf_invalid', async () => {
    fetchMock
      .mockResolvedValueOnce(json(200, { token: 'old' }))
      .mockResolvedValueOnce(json(403, envelope('csrf_invalid', 'Bad token')))
      .mockResolvedValueOnce(json(200, { token: 'new' }))
      .mockResolvedValueOnce(json(201, { thing: { id: 3 } }));
    await expect(client.apiClient.post('/api/things', {}, thingSchema)).resolves.toEqual({ thing: { id: 3 } });
    expect(fetchMock.mock.calls[3][1].headers['x-csrf-token']).toBe('new');
  });

  it('gives up after one retry so a broken token cannot loop', async () => {
    fetchMock
      .mockResolvedValueOnce(json(200, { token: 'a' }))
      .mockResolvedValueOnce(json(403, envelope('csrf_invalid', 'Bad token')))
      .mockResolvedValueOnce(json(200, { token: 'b' }))
      .mockResolvedValueOnce(json(403, envelope('csrf_invalid', 'Bad token')));
    await expect(client.apiClient.post('/api/things', {}, thingSchema)).rejects.toMatchObject({ status: 403, code: 'csrf_invalid' });
    expect(fetchMock).toHaveBeenCalledTimes(4);
  });

  it('does not retry a 403 that is about permissions', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { token: 'a' })).mockResolvedValueOnce(json(403, envelope('forbidden', 'Not allowed')));
    await expect(client.apiClient.post('/api/things', {}, thingSchema)).rejects.toMatchObject({ code: 'forbidden' });
    expect(fetchMock).toHaveBeenCalledTimes(2);
  });

  it('reports a success body of the wrong shape instead of passing it on', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { thing: { id: 'seven' } }));
    await expect(client.apiClient.get('/api/things/7', thingSchema)).rejects.toMatchObject({ code: 'bad_response' });
  });

  it('reports an error page that is not JSON as a plain ApiError', async () => {
    fetchMock.mockResolvedValueOnce(new Response('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' }));
    await expect(client.apiClient.get('/api/things/7', thingSchema)).rejects.toMatchObject({ status: 502, code: 'internal' });
  });

  it('reports an unreachable server as a network error', async () => {
    fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    await expect(client.apiClient.get('/api/things/7', thingSchema)).rejects.toMatchObject({ status: 0, code: 'network' });
  });

  it('accepts 204 No Content where no body is expected', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { token: 'a' })).mockResolvedValueOnce(new Response(null, { status: 204 }));
    await expect(client.apiRequestNoContent('POST', '/api/auth/logout')).resolves.toBeUndefined();
  });
});
