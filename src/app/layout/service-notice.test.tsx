// @vitest-environment happy-dom
import { QueryClientProvider } from '@tanstack/react-query';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi } from '../../testing/fake-api';
import { testQueryClient } from '../../testing/render-page';
import { ServiceNotice } from './service-notice';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const renderNotice = (firstCheckAfterMs = 0) =>
  render(
    <QueryClientProvider client={testQueryClient()}>
      <ServiceNotice firstCheckAfterMs={firstCheckAfterMs} />
      <p>page</p>
    </QueryClientProvider>,
  );

describe('service notice', () => {
  it('names what is affected when the health check answers 503 with a service down', async () => {
    fakeApi({
      'GET /api/health': { status: 503, body: { status: 'degraded', services: { database: 'up', storage: 'down', mail: 'up' } } },
    });
    renderNotice();
    const notice = await screen.findByRole('status');
    expect(notice.textContent).toContain('uploading and opening files');
    expect(notice.textContent).not.toContain('sending e-mail');
  });

  it('waits for the page to load before checking', async () => {
    const api = fakeApi({ 'GET /api/health': { body: { status: 'ok', services: { database: 'up', storage: 'up', mail: 'up' } } } });
    renderNotice(200);
    await new Promise((resolve) => setTimeout(resolve, 100));
    expect(api.calls).toHaveLength(0);
    await vi.waitFor(() => expect(api.calls).toHaveLength(1));
  });

  it('stays out of the way while everything is up', async () => {
    const api = fakeApi({ 'GET /api/health': { body: { status: 'ok', services: { database: 'up', storage: 'up', mail: 'up' } } } });
    renderNotice();
    await vi.waitFor(() => expect(api.calls).toHaveLength(1));
    // let the answer reach the component before checking that nothing appeared
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(screen.queryByRole('status')).toBeNull();
  });
});
