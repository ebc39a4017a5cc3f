import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { LoadingState } from '../components/ui/spinner';
import { AppLayout } from './routes/app-layout';
import { requireSignedIn } from './routes/guards';
import { NotFoundPage } from './routes/not-found-page';
import { RootLayout } from './routes/root-layout';
import { RouteErrorPage } from './routes/route-error-page';
import { signedInRoutes } from './routes/signed-in-routes';
import { SignedOutLayout } from './routes/signed-out-layout';
import { signedOutRoutes } from './routes/signed-out-routes';

export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      element: <RootLayout />,
      errorElement: <RouteErrorPage />,
      hydrateFallbackElement: <LoadingState label="Opening Motifold…" className="justify-center py-24" />,
      children: [
        { element: <SignedOutLayout />, children: [...signedOutRoutes(queryClient), { path: '*', element: <NotFoundPage /> }] },
        {
          path: '/',
          element: <AppLayout />,
          loader: requireSignedIn(queryClient),
          children: signedInRoutes(queryClient),
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createAppRoutes(queryClient));
}
