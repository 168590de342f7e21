// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Rack } from '../../../../shared/schemas/rack';
import { RackForm } from '../../../../src/features/racks/components/rack-form';
import { RacksTable } from '../../../../src/features/racks/components/racks-table';
import { SiteSwitcher } from '../../../../src/features/sites/components/site-switcher';
import type { SiteScope } from '../../../../src/features/sites/hooks/use-site-scope';
import { siteViewFor } from '../../../../src/features/sites/utils/site-view';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
const stamp = '2026-01-01T00:00:00.000Z';
const sites = [
  { id: 1, name: 'Main site', createdAt: stamp, updatedAt: stamp },
  { id: 2, name: 'Riverside works', createdAt: stamp, updatedAt: stamp },
];
const rack: Rack = { id: 5, name: 'Trolley', location: 'drying-room', shelves: 4, shelfAreaM2: 1, dryingTempC: null, siteId: 2, totalAreaM2: 4, createdAt: stamp, updatedAt: stamp };

function withQueries(children: ReactNode) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(<QueryClientProvider client={queryClient}>{children}</QueryClientProvider>);
}

let fetchMock: ReturnType<typeof vi.fn>;
beforeEach(() => {
  fetchMock = vi.fn((url: string) => Promise.resolve(url === '/api/auth/csrf' ? json(200, { token: 't' }) : json(201, { rack })));
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

async function saveRack() {
  fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Trolley' } });
  fireEvent.click(screen.getByRole('button', { name: 'Save rack' }));
  await waitFor(() => expect(fetchMock.mock.calls.some((call) => call[0] === '/api/racks')).toBe(true));
  const sent = fetchMock.mock.calls.find((call) => call[0] === '/api/racks')!;
  return JSON.parse(sent[1].body) as Record<string, unknown>;
}

describe('the Site select on a form', () => {
  it('is not there for a one-site shop, and the rack is sent without a site (the server puts it on the user’s own)', async () => {
    const view = siteViewFor({ role: 'admin', siteId: 1 }, [sites[0]]);
    withQueries(<RackForm siteChoice={view?.choice} onDone={vi.fn()} />);
    expect(screen.queryByLabelText('Site')).toBeNull();
    expect(await saveRack()).not.toHaveProperty('siteId');
  });

  it('is not there for a lead, whatever the number of sites', () => {
    const view = siteViewFor({ role: 'lead', siteId: 2 }, sites);
    withQueries(<RackForm siteChoice={view?.choice} onDone={vi.fn()} />);
    expect(screen.queryByLabelText('Site')).toBeNull();
  });

  it('lets an admin of several sites choose, starting at their own site, and sends the choice', async () => {
    const view = siteViewFor({ role: 'admin', siteId: 1 }, sites);
    withQueries(<RackForm siteChoice={view?.choice} onDone={vi.fn()} />);
    const select = screen.getByLabelText('Site') as HTMLSelectElement;
    expect(select.value).toBe('1');
    expect([...select.options].map((option) => option.text)).toEqual(['Main site', 'Riverside works']);
    fireEvent.change(select, { target: { value: '2' } });
    expect(await saveRack()).toMatchObject({ name: 'Trolley', siteId: 2 });
  });

  it('shows a server refusal beside the Site select', async () => {
    fetchMock.mockImplementation((url: string) =>
      Promise.resolve(
        url === '/api/auth/csrf'
          ? json(200, { token: 't' })
          : json(403, { error: { code: 'forbidden', message: 'Only an admin can put things on another site', fields: { siteId: 'Your own site only' } } }),
      ),
    );
    const view = siteViewFor({ role: 'admin', siteId: 1 }, sites);
    withQueries(<RackForm siteChoice={view?.choice} onDone={vi.fn()} />);
    await saveRack();
    expect(await screen.findByText('Your own site only')).toBeTruthy();
    expect(screen.getByLabelText('Site').getAttribute('aria-invalid')).toBe('true');
  });
});

describe('the Site column and the site switcher', () => {
  it('adds a Site column only when given site names', () => {
    const { unmount } = render(<RacksTable racks={[rack]} units="metric" />);
    expect(screen.queryByRole('columnheader', { name: 'Site' })).toBeNull();
    unmount();
    render(<RacksTable racks={[rack]} units="metric" siteNames={siteViewFor({ role: 'admin', siteId: 1 }, sites)?.names} />);
    expect(screen.getByRole('columnheader', { name: 'Site' })).toBeTruthy();
    expect(screen.getByRole('cell', { name: 'Riverside works' })).toBeTruthy();
  });

  it('renders nothing in a one-site shop', () => {
    const scope: SiteScope = { view: siteViewFor({ role: 'admin', siteId: 1 }, [sites[0]]), siteId: undefined, setSiteId: vi.fn() };
    const { container } = render(<SiteSwitcher scope={scope} />);
    expect(container.innerHTML).toBe('');
  });

  it('offers an admin every site or one, and reports the choice', () => {
    const setSiteId = vi.fn();
    const scope: SiteScope = { view: siteViewFor({ role: 'admin', siteId: 1 }, sites), siteId: undefined, setSiteId };
    render(<SiteSwitcher scope={scope} />);
    const select = screen.getByLabelText('Site') as HTMLSelectElement;
    expect([...select.options].map((option) => option.text)).toEqual(['All sites', 'Main site', 'Riverside works']);
    fireEvent.change(select, { target: { value: '2' } });
    expect(setSiteId).toHaveBeenLastCalledWith(2);
    fireEvent.change(select, { target: { value: '' } });
    expect(setSiteId).toHaveBeenLastCalledWith(undefined);
  });
});
