// @vitest-environment happy-dom
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { MembersResponse } from '@shared/contracts/studio';
import { forgetCsrfToken } from '../../../lib/api-client';
import { apiError, fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { MembersPage } from './members-page';

const members: MembersResponse = {
  members: [
    { userId: 'user-ines', name: 'Ines Okafor', email: 'ines@saltmarsh.test', role: 'owner', joinedAt: '2025-02-01T10:00:00Z' },
    { userId: 'user-teodor', name: 'Teodor Vance', email: 'teodor@saltmarsh.test', role: 'editor', joinedAt: '2025-02-03T10:00:00Z' },
    { userId: 'user-june', name: 'June Abara', email: 'june@saltmarsh.test', role: 'reviewer', joinedAt: '2025-02-04T10:00:00Z' },
  ],
  invitations: [
    {
      id: 'inv-1',
      email: 'sam@saltmarsh.test',
      role: 'editor',
      invitedBy: 'Ines Okafor',
      createdAt: '2025-03-01T10:00:00Z',
      expiresAt: '2025-03-15T10:00:00Z',
    },
  ],
};

beforeEach(() => forgetCsrfToken());
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('members page', () => {
  it('shows a reviewer the members and invitations but no invite, role or remove controls', async () => {
    fakeApi({ 'GET /api/studio/members': { body: members } });
    renderPage(<MembersPage />, { me: meAs('reviewer', { user: { id: 'user-june', name: 'June Abara', email: 'june@saltmarsh.test' } }) });

    await screen.findByRole('rowheader', { name: /Teodor Vance/ });
    expect(screen.getByText('sam@saltmarsh.test')).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Invite someone' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Send invitation' })).toBeNull();
    expect(screen.queryAllByRole('combobox')).toHaveLength(0);
    expect(screen.queryByRole('button', { name: /remove/i })).toBeNull();
    expect(screen.queryByRole('button', { name: /withdraw/i })).toBeNull();
  });

  it('gives an owner the invite form, a role choice per member and a way to remove them', async () => {
    fakeApi({ 'GET /api/studio/members': { body: members } });
    renderPage(<MembersPage />, { me: meAs('owner') });

    await screen.findByRole('rowheader', { name: /Teodor Vance/ });
    expect(screen.getByRole('heading', { name: 'Invite someone' })).toBeTruthy();
    expect(screen.getByRole('combobox', { name: 'Role of Teodor Vance' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Remove Teodor Vance' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Withdraw the invitation to sam@saltmarsh.test' })).toBeTruthy();
  });

  it("shows the server's reason beside the email field when the person is already a member", async () => {
    fakeApi({
      'GET /api/studio/members': { body: members },
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/studio/invitations': apiError(409, 'invitation.already_member', 'Teodor Vance is already in this studio.', {
        email: 'Already a member',
      }),
    });
    renderPage(<MembersPage />, { me: meAs('owner') });
    await screen.findByRole('rowheader', { name: /Teodor Vance/ });

    const form = screen.getByRole('button', { name: 'Send invitation' }).closest('form') as HTMLFormElement;
    fireEvent.change(within(form).getByLabelText('E-mail address'), { target: { value: 'teodor@saltmarsh.test' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Send invitation' }));

    expect((await within(form).findByRole('alert')).textContent).toContain('Teodor Vance is already in this studio.');
    expect(within(form).getByText('Already a member')).toBeTruthy();
  });

  it('shows a loading state, then a retryable error with the API message', async () => {
    fakeApi({ 'GET /api/studio/members': apiError(500, 'server.error', 'Something went wrong on our side; nothing was changed.') });
    renderPage(<MembersPage />, { me: meAs('owner') });

    expect(screen.getByRole('status').textContent).toContain('Loading members');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Something went wrong on our side; nothing was changed.');
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
