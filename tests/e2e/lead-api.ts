import { request, type APIRequestContext } from '@playwright/test';
import { expect } from './fixtures';
import { demo, demoPassword } from './helpers';

export interface LeadApi {
  context: APIRequestContext;
  csrf: string;
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
  return { context, csrf, get, send };
}

/** A session booked now, and how to give its booth and sprayer back. */
export interface BookedNow {
  id: number;
  /** Cancels the session; run it in a `finally`, so a failing test never leaves the sprayer busy. */
  cancel: () => Promise<void>;
}

const demoBooth = 'Booth 1 (cross-draft)';
const demoSprayer = 'Mina Castell';

/**
 * Books Booth 1 for Mina (the demo sprayer) from five minutes ago for two hours, planned with
 * `items`, with a reason so any hour and any rack space will do. The demo week (or an earlier run)
 * may have the booth or Mina booked then: whatever clashes with exactly that span is cancelled first.
 */
export async function bookSprayerNow(api: LeadApi, items: { partId: number; stepPosition: number }[], reason = 'Browser test: booked whatever the hour'): Promise<BookedNow> {
  const now = Date.now();
  const span = { start: new Date(now - 5 * 60_000).toISOString(), end: new Date(now + 2 * 3_600_000).toISOString() };
  const booth = (await api.get<{ items: { id: number; name: string }[] }>('/api/booths')).items.find((b) => b.name === demoBooth)!;
  const sprayer = (await api.get<{ items: { id: number; name: string }[] }>(`/api/sprayers?boothId=${booth.id}`)).items.find((s) => s.name === demoSprayer)!;
  await clearSpan(api, span, { boothIds: [booth.id], sprayerId: sprayer.id });
  const { spraySession } = await api.send<{ spraySession: { id: number } }>('POST', '/api/spray-sessions', { boothId: booth.id, sprayerId: sprayer.id, ...span, items, override: { reason } });
  const cancel = async () => {
    const res = await api.context.fetch(`/api/spray-sessions/${spraySession.id}`, { method: 'PATCH', headers: { 'x-csrf-token': api.csrf }, data: { state: 'cancelled' } });
    // A clean-up that fails must not hide why the test failed; the next booking clears the span anyway.
    if (!res.ok()) console.warn(`Could not cancel spray session ${spraySession.id}: ${res.status()}`);
  };
  return { id: spraySession.id, cancel };
}

/** The demo booths' and Mina's ids, found by name. */
export async function demoShop(api: LeadApi): Promise<{ boothIds: number[]; sprayerId: number }> {
  const booths = (await api.get<{ items: { id: number }[] }>('/api/booths')).items;
  const sprayer = (await api.get<{ items: { id: number; name: string }[] }>('/api/sprayers')).items.find((s) => s.name === demoSprayer)!;
  return { boothIds: booths.map((b) => b.id), sprayerId: sprayer.id };
}

/**
 * Makes room in a busy shop: cancels every session in `boothIds`, or given to `sprayerId`, that
 * overlaps the span (the demo week books the booths through the working day).
 */
export async function clearSpan(api: LeadApi, span: { start: string; end: string }, whose: { boothIds: number[]; sprayerId: number }): Promise<void> {
  const around = `from=${encodeURIComponent(span.start)}&to=${encodeURIComponent(span.end)}`;
  const { items } = await api.get<{ items: { id: number; state: string; boothId: number; sprayerId: number | null }[] }>(`/api/spray-sessions?${around}`);
  for (const old of items) {
    if (old.state !== 'cancelled' && (old.sprayerId === whose.sprayerId || whose.boothIds.includes(old.boothId))) await api.send('PATCH', `/api/spray-sessions/${old.id}`, { state: 'cancelled' });
  }
}
