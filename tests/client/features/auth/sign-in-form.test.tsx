// @vitest-environment jsdom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { SignInForm } from '../../../../src/features/auth/components/sign-in-form';

const json = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

function renderForm(onSignedIn = vi.fn()) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(
    <QueryClientProvider client={queryClient}>
      <SignInForm onSignedIn={onSignedIn} />
    </QueryClientProvider>,
  );
  return { onSignedIn, queryClient };
}

function fillAndSubmit(email: string, password: string) {
  fireEvent.change(screen.getByLabelText('E-mail'), { target: { value: email } });
  fireEvent.change(screen.getByLabelText('Password'), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

let fetchMock: ReturnType<typeof vi.fn>;
beforeEach(() => {
  fetchMock = vi.fn();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('SignInForm', () => {
  it('checks the fields with the shared login schema before sending anything', async () => {
    renderForm();
    fillAndSubmit('not-an-email', '');
    expect(await screen.findByText('Enter an e-mail address')).toBeTruthy();
    expect(screen.getByText('Enter your password')).toBeTruthy();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('shows the server’s message when the password is wrong', async () => {
    fetchMock.mockImplementation((url: string) =>
      Promise.resolve(
        url === '/api/auth/csrf' ? json(200, { token: 't' }) : json(401, { error: { code: 'unauthenticated', message: 'E-mail or password is wrong' } }),
      ),
    );
    const { onSignedIn } = renderForm();
    fillAndSubmit('lead@larchmere.test', 'wrong-password');
    expect((await screen.findByRole('alert')).textContent).toContain('E-mail or password is wrong');
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('signs in, keeps the user, fetches a fresh CSRF token and moves on', async () => {
    const user = { id: 2, email: 'lead@larchmere.test', name: 'Dev Okafor', role: 'lead', units: 'metric', siteId: 1 };
    fetchMock.mockImplementation((url: string) =>
      Promise.resolve(url === '/api/auth/csrf' ? json(200, { token: 't' }) : json(200, { user })),
    );
    const { onSignedIn, queryClient } = renderForm();
    fillAndSubmit('Lead@Larchmere.test ', 'finish-demo-2026');
    await waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(queryClient.getQueryData(['auth', 'me'])).toEqual(user);
    const loginCall = fetchMock.mock.calls.find((call) => call[0] === '/api/auth/login');
    expect(JSON.parse(loginCall![1].body)).toEqual({ email: 'lead@larchmere.test', password: 'finish-demo-2026' });
    const urls = fetchMock.mock.calls.map((call) => call[0]);
    expect(urls.lastIndexOf('/api/auth/csrf')).toBeGreaterThan(urls.indexOf('/api/auth/login'));
  });
});
