import { request, type APIRequestContext } from '@playwright/test';
import { expect } from './fixtures';
import { demo, demoPassword } from './helpers';

export interface LeadApi {
  context: APIRequestContext;
  get: <T>(path: string) => Promise<T>;
  send: <T>(method: 'POST' | 'PATCH', path: string, body: object) => Promise<T>;
}

/** The finishing lead's own API session: books what the sprayer works on, and reads what the server holds. */
export async function leadApi(baseURL: string): Promise<LeadApi> {
  const context = await request.newContext({ baseURL });
  const token = async () => (await (await context.get('/api/auth/csrf')).json()).token as string;
  const login = await context.post('/api/auth/login', {
    headers: { 'x-csrf-token': await token() },
    data: { email: demo.lead.email, password: demoPassword },
  });
  expect(login.ok()).toBe(true);
  const csrf = await token();
  const get = async <T>(path: string): Promise<T> => {
    const res = await context.get(path);
    expect(res.ok(), `GET ${path}`).toBe(true);
    return res.json();
  };
  const send = async <T>(method: 'POST' | 'PATCH', path: string, body: object): Promise<T> => {
    const res = await context.fetch(path, { method, headers: { 'x-csrf-token': csrf }, data: body });
    expect(res.ok(), `${method} ${path}: ${await res.text()}`).toBe(true);
    return res.json();
  };
  return { context, get, send };
}
