import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { NotificationsList } from '@shared/contracts/notifications';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { NotificationsControl } from './notifications-control';

const list: NotificationsList = {
  unreadCount: 1,
  notifications: [
    { id: 'n-1', kind: 'comment.added', title: 'June Abara commented on “Puffin Picnic mug”', body: 'Kite string too thin', link: '/products/p-1?thread=t-1', read: false, createdAt: '2026-03-01T10:00:00.000Z' },
    { id: 'n-2', kind: 'review.decided', title: 'June Abara approved “Lantern Walk tote”', body: '', link: '/products/p-2#review', read: true, createdAt: '2026-02-28T10:00:00.000Z' },
  ],
};

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  forgetCsrfToken();
});

describe('the notifications control', () => {
  it('counts unread notices, marks one read when opened and follows its link', async () => {
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'GET /api/notifications?limit=20': { body: list },
      'GET /api/notifications/settings': { body: { notifyByEmail: true, notifyInApp: true } },
      'POST /api/notifications/n-1/read': { body: { ok: true } },
    });
    const { router } = renderPage(<NotificationsControl />, { me: meAs('editor'), extraRoutes: [{ path: '/products/:id', element: <p>product page</p> }] });
    const button = await screen.findByRole('button', { name: 'Notifications, 1 unread' });
    expect(button.getAttribute('aria-expanded')).toBe('false');
    fireEvent.click(button);
    expect(button.getAttribute('aria-expanded')).toBe('true');
    expect(await screen.findByRole('checkbox', { name: 'By e-mail' })).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: /Unread: June Abara commented/ }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/notifications/n-1/read')).toBe(true));
    expect(router.state.location.pathname).toBe('/products/p-1');
    expect(router.state.location.search).toBe('?thread=t-1');
  });

  it('turns e-mail off from the panel, keeping the other setting', async () => {
    const { calls } = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'GET /api/notifications?limit=20': { body: { unreadCount: 0, notifications: [] } },
      'GET /api/notifications/settings': { body: { notifyByEmail: true, notifyInApp: true } },
      'PATCH /api/notifications/settings': { body: { notifyByEmail: false, notifyInApp: true } },
    });
    renderPage(<NotificationsControl />, { me: meAs('reviewer') });
    fireEvent.click(await screen.findByRole('button', { name: 'Notifications' }));
    expect(await screen.findByText(/Nothing yet/)).toBeTruthy();
    fireEvent.click(await screen.findByRole('checkbox', { name: 'By e-mail' }));
    await waitFor(() => expect((screen.getByRole('checkbox', { name: 'By e-mail' }) as HTMLInputElement).checked).toBe(false));
    expect(calls.find((c) => c.method === 'PATCH')?.body).toEqual({ notifyByEmail: false });
    expect((screen.getByRole('checkbox', { name: 'Here, in this list' }) as HTMLInputElement).checked).toBe(true);
  });
});
