import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ActivityEvent } from '@shared/contracts/activity';
import { forgetCsrfToken } from '../../../lib/api-client';
import { fakeApi } from '../../../testing/fake-api';
import { meAs, renderPage } from '../../../testing/render-page';
import { ActivityPage } from './activity-page';

const june = '5d2a4f6b-0b8f-4c1e-9c7e-1a2b3c4d5e6f';
const event = (id: string, kind: ActivityEvent['kind'], summary: string, createdAt: string): ActivityEvent => ({
  id, kind, subjectType: 'product', subjectId: 'p-1', summary, actor: { id: june, name: 'June Abara' }, data: {}, createdAt,
});
const members = { members: [{ userId: june, name: 'June Abara', email: 'june@saltmarsh.test', role: 'reviewer', joinedAt: '2026-01-01T00:00:00.000Z' }], invitations: [] };

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  forgetCsrfToken();
});

describe('the activity page', () => {
  it('loads older events with “Load more” and filters by person through the address', async () => {
    const { calls } = fakeApi({
      'GET /api/studio/members': { body: members },
      'GET /api/activity': { body: { events: [event('e-2', 'review.approved', 'approved “Puffin Picnic mug”', '2026-03-02T10:00:00.000Z')], nextBefore: '1772445600000000.e-2' } },
      'GET /api/activity?before=1772445600000000.e-2': { body: { events: [event('e-1', 'comment.added', 'commented on “Puffin Picnic mug”', '2026-03-01T10:00:00.000Z')], nextBefore: null } },
      [`GET /api/activity?actor=${june}`]: { body: { events: [], nextBefore: null } },
    });
    const { router } = renderPage(<ActivityPage />, { path: '/activity', me: meAs('owner') });
    expect(await screen.findByRole('link', { name: 'approved “Puffin Picnic mug”' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Load more' }));
    expect(await screen.findByRole('link', { name: 'commented on “Puffin Picnic mug”' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Load more' })).toBeNull();

    fireEvent.change(await screen.findByLabelText('Person'), { target: { value: june } });
    expect(await screen.findByText('Nothing matches these filters')).toBeTruthy();
    expect(router.state.location.search).toBe(`?actor=${june}`);
    await waitFor(() => expect(calls.some((c) => c.path === `/api/activity?actor=${june}`)).toBe(true));
  });
});
