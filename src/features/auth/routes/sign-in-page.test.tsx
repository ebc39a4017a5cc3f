// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { forgetCsrfToken } from '../../../lib/api-client';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { SignInPage } from './sign-in-page';

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const fill = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const submit = () => fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

describe('sign-in page', () => {
  it("shows the server's message when the password is wrong, and moves focus to it", async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/auth/sign-in': apiError(401, 'auth.invalid_credentials', 'That e-mail address and password do not match an account.'),
    });
    renderPage(<SignInPage />, { path: '/sign-in' });
    fill('E-mail address', 'ines@saltmarsh.test');
    fill('Password', 'not-the-password');
    submit();

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('That e-mail address and password do not match an account.');
    await waitFor(() => expect(document.activeElement).toBe(alert));
  });

  it('checks the form before sending anything and focuses the first field to fix', async () => {
    const api = fakeApi({});
    renderPage(<SignInPage />, { path: '/sign-in' });
    fill('E-mail address', 'not an address');
    submit();

    const email = screen.getByLabelText('E-mail address');
    await waitFor(() => expect(email.getAttribute('aria-invalid')).toBe('true'));
    expect(screen.getByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByText('Enter your password')).toBeTruthy();
    await waitFor(() => expect(document.activeElement).toBe(email));
    expect(api.calls).toHaveLength(0);
  });

  it('goes back to the page that asked for sign-in once signed in', async () => {
    const api = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/auth/sign-in': { body: meAs('owner') },
      'GET /api/auth/me': { body: meAs('owner') },
    });
    const { router } = renderPage(<SignInPage />, {
      path: '/sign-in',
      url: '/sign-in?returnTo=%2Fmembers',
      extraRoutes: [{ path: '/members', element: <p>Members page</p> }],
    });
    fill('E-mail address', ' Ines@Saltmarsh.test ');
    fill('Password', 'saltmarsh-demo');
    submit();

    await screen.findByText('Members page');
    expect(router.state.location.pathname).toBe('/members');
    // The shared schema trims and lower-cases the address before it is sent.
    expect(api.calls.find((call) => call.path === '/api/auth/sign-in')?.body).toEqual({
      email: 'ines@saltmarsh.test',
      password: 'saltmarsh-demo',
    });
  });
});
