import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import type { MeResponse } from '@shared/contracts/auth';
import { SessionProvider } from '../features/auth/components/session';

export function testQueryClient() {
  return new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
}

type RenderPageOptions = { path?: string; url?: string; me?: MeResponse; extraRoutes?: RouteObject[] };

// One page inside a memory router and a fresh query cache, optionally signed in as `me`.
export function renderPage(page: ReactNode, { path = '/', url = path, me, extraRoutes = [] }: RenderPageOptions = {}) {
  const queryClient = testQueryClient();
  const element = me ? <SessionProvider me={me}>{page}</SessionProvider> : page;
  const router = createMemoryRouter([{ path, element }, ...extraRoutes], { initialEntries: [url] });
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient };
}

export function meAs(role: MeResponse['role'], overrides: Partial<MeResponse> = {}): MeResponse {
  const studio = role ? { id: '6f0c2a4e-8d1b-4c3a-9e57-2b1d0c9a7f10', name: 'Saltmarsh Studio', role } : null;
  return {
    user: { id: 'user-ines', name: 'Ines Okafor', email: 'ines@saltmarsh.test' },
    studio,
    role,
    studios: studio ? [studio] : [],
    ...overrides,
  };
}
