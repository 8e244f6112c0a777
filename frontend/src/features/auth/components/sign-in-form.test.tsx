import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { requestPath } from '../../../test/fake-api';
import { SignInForm } from './sign-in-form';

function renderSignIn() {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const onSignedIn = vi.fn();
  render(
    <QueryClientProvider client={queryClient}>
      <SignInForm onSignedIn={onSignedIn} />
    </QueryClientProvider>,
  );
  return { onSignedIn };
}

function json(body: unknown, status = 200) {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

afterEach(() => vi.unstubAllGlobals());

describe('SignInForm', () => {
  it('lists the demo accounts from the API and fills the form from one', async () => {
    const fetchMock = vi.fn(async (request: Request) => {
      const url = requestPath(request);
      if (url === '/api/auth/demo-accounts') {
        return json({
          enabled: true,
          password: 'thermbay-demo',
          accounts: [
            { email: 'grower@example.com', name: 'Demo Grower', description: 'Grows on the demo farm' },
            { email: 'adviser@example.com', name: 'Demo Adviser', description: 'Advises the demo farm' },
          ],
        });
      }
      throw new Error(`unexpected ${url}`);
    });
    vi.stubGlobal('fetch', fetchMock);
    const user = userEvent.setup();
    renderSignIn();

    const list = await screen.findByRole('list', { name: 'Demo accounts' });
    expect(list.textContent).toContain('grower@example.com');
    expect(list.textContent).toContain('adviser@example.com');
    expect(screen.getByText('thermbay-demo')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: /Demo Grower/ }));
    expect((screen.getByLabelText(/E-mail/) as HTMLInputElement).value).toBe('grower@example.com');
    expect((screen.getByLabelText(/Password/) as HTMLInputElement).value).toBe('thermbay-demo');
  });

  it('shows no demo section when demo accounts are disabled, and signs in', async () => {
    vi.stubGlobal('fetch', async (request: Request) => {
      const url = requestPath(request);
      if (url === '/api/auth/demo-accounts') return json({ enabled: false, password: null, accounts: [] });
      if (url === '/api/auth/login') {
        return json({
          accessToken: 'jwt',
          user: { id: 1, email: 'a@b.co', name: 'A', siteRole: 'user', unitSystem: 'si' },
        });
      }
      throw new Error(`unexpected ${url}`);
    });
    const user = userEvent.setup();
    const { onSignedIn } = renderSignIn();

    await user.type(screen.getByLabelText(/E-mail/), 'a@b.co');
    await user.type(screen.getByLabelText(/Password/), 'secret-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(expect.objectContaining({ email: 'a@b.co' })));
    expect(screen.queryByRole('list', { name: 'Demo accounts' })).toBeNull();
    expect(localStorage.getItem('thermbay.accessToken')).toBe('jwt');
  });
});
