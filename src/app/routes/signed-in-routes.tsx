import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { membersLoader, settingsLoader } from '../../features/studio/routes/loaders';

// Pages inside the studio (top bar, signed-in guard). To add a feature's page: add an entry
// here with `lazy: { Component }` pointing at features/<noun>/routes/<page>.tsx, and a loader
// from features/<noun>/routes/loaders.ts that prefetches the page's queryOptions.
export const signedInRoutes = (queryClient: QueryClient): RouteObject[] => [
  {
    index: true,
    lazy: { Component: () => import('../../features/studio/routes/home-page').then((m) => m.HomePage) },
  },
  {
    path: 'library',
    lazy: { Component: () => import('../../features/library/routes/library-page').then((m) => m.LibraryPage) },
  },
  {
    path: 'originals',
    lazy: {
      Component: () => import('../../features/originals/routes/originals-page').then((m) => m.OriginalsPage),
    },
  },
  {
    path: 'products',
    lazy: {
      Component: () => import('../../features/products/routes/products-page').then((m) => m.ProductsPage),
    },
  },
  {
    path: 'members',
    loader: membersLoader(queryClient),
    lazy: { Component: () => import('../../features/studio/routes/members-page').then((m) => m.MembersPage) },
  },
  {
    path: 'settings',
    loader: settingsLoader(queryClient),
    lazy: { Component: () => import('../../features/studio/routes/settings-page').then((m) => m.SettingsPage) },
  },
];
