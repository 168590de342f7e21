import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';

type ApiClientModule = typeof import('../../../src/lib/api-client');

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

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

describe('apiClient.postForm', () => {
  it('sends the FormData itself with the CSRF header and no content-type, so the browser writes the boundary', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { token: 'tok-9' })).mockResolvedValueOnce(json(201, { thing: { id: 3 } }));
    const form = new FormData();
    form.set('kind', 'tds');
    await expect(client.apiClient.postForm('/api/things/3/documents', form, thingSchema)).resolves.toEqual({ thing: { id: 3 } });
    const [url, init] = fetchMock.mock.calls[1];
    expect(url).toBe('/api/things/3/documents');
    expect(init).toMatchObject({ method: 'POST', credentials: 'same-origin' });
    expect(init.body).toBe(form);
    expect(init.headers['x-csrf-token']).toBe('tok-9');
    expect(init.headers['content-type']).toBeUndefined();
  });

  it('turns a 413 envelope into an ApiError with the field message', async () => {
    const tooLarge = { error: { code: 'payload_too_large', message: 'The file is larger than 20 MB', fields: { file: 'At most 20 MB' } } };
    fetchMock.mockResolvedValueOnce(json(200, { token: 't' })).mockResolvedValueOnce(json(413, tooLarge));
    const error = await client.apiClient.postForm('/api/things/3/documents', new FormData(), thingSchema).catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 413, code: 'payload_too_large', fields: { file: 'At most 20 MB' } });
  });
});
