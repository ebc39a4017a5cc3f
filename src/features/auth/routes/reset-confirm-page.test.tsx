// @vitest-environment happy-dom
import { cleanup, fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { forgetCsrfToken } from '../../../lib/api-client';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { renderPage } from '../../../testing/render-page';
import { ResetConfirmPage } from './reset-confirm-page';

const token = 'k_iBfsHugGkcZqeqDuSgQOuhWmdGuTiKVFD';

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const choose = (password: string, again = password) => {
  fireEvent.change(screen.getByLabelText('New password'), { target: { value: password } });
  fireEvent.change(screen.getByLabelText('New password again'), { target: { value: again } });
  fireEvent.click(screen.getByRole('button', { name: 'Save new password' }));
};

describe('choosing a new password from a reset link', () => {
  it('asks for the same password twice before sending anything', async () => {
    const api = fakeApi({});
    renderPage(<ResetConfirmPage />, { path: '/reset-password', url: `/reset-password?token=${token}` });
    choose('saltmarsh-demo', 'saltmarsh-dem0');
    expect(await screen.findByText('The two passwords are different')).toBeTruthy();
    expect(api.calls).toHaveLength(0);
  });

  it('sends the token with the new password and confirms the change', async () => {
    const api = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/auth/password-reset/confirm': { status: 204 },
    });
    renderPage(<ResetConfirmPage />, { path: '/reset-password', url: `/reset-password?token=${token}` });
    choose('a long new passphrase');
    expect(await screen.findByRole('heading', { name: 'Your password is changed' })).toBeTruthy();
    expect(api.calls.find((call) => call.method === 'POST')?.body).toEqual({ token, password: 'a long new passphrase' });
  });

  it("replaces the form with the server's reason and a way to ask again when the link is spent", async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/auth/password-reset/confirm': apiError(400, 'reset.used', 'This reset link has already been used.'),
    });
    renderPage(<ResetConfirmPage />, { path: '/reset-password', url: `/reset-password?token=${token}` });
    choose('a long new passphrase');
    expect((await screen.findByRole('alert')).textContent).toContain('This reset link has already been used.');
    expect(screen.queryByLabelText('New password')).toBeNull();
    expect(screen.getByRole('link', { name: 'Ask for a new link' }).getAttribute('href')).toBe('/forgot-password');
  });
});
