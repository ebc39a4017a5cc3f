import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { activityLoader } from '../../features/activity/routes/loaders';
import { libraryLoader, libraryShouldRevalidate } from '../../features/library/routes/loaders';
import { motifLoader } from '../../features/motifs/routes/loaders';
import { originalLoader, originalsLoader } from '../../features/originals/routes/loaders';
import { productLoader, productsLoader } from '../../features/products/routes/loaders';
import { membersLoader, settingsLoader } from '../../features/studio/routes/loaders';
import { calendarLoader } from '../../features/calendar/routes/loaders';
import { salesLoader } from '../../features/sales/routes/loaders';

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
    loader: libraryLoader(queryClient),
    shouldRevalidate: libraryShouldRevalidate,
    lazy: { Component: () => import('../../features/library/routes/library-page').then((m) => m.LibraryPage) },
  },
  {
    path: 'library/:motifId',
    loader: motifLoader(queryClient),
    lazy: { Component: () => import('../../features/motifs/routes/motif-page').then((m) => m.MotifPage) },
  },
  {
    path: 'originals',
    loader: originalsLoader(queryClient),
    lazy: {
      Component: () => import('../../features/originals/routes/originals-page').then((m) => m.OriginalsPage),
    },
  },
  {
    path: 'originals/:originalId',
    loader: originalLoader(queryClient),
    lazy: {
      Component: () => import('../../features/originals/routes/original-page').then((m) => m.OriginalPage),
    },
  },
  {
    path: 'products',
    loader: productsLoader(queryClient),
    lazy: {
      Component: () => import('../../features/products/routes/products-page').then((m) => m.ProductsPage),
    },
  },
  {
    path: 'products/:productId',
    loader: productLoader(queryClient),
    lazy: {
      Component: () => import('../../features/products/routes/product-page').then((m) => m.ProductPage),
    },
  },
  {
    path: 'products/:productId/layout',
    lazy: {
      Component: () => import('../../features/products/routes/product-editor-page').then((m) => m.ProductEditorPage),
    },
  },
  {
    path: 'templates',
    lazy: { Component: () => import('../../features/templates/routes/templates-page').then((m) => m.TemplatesPage) },
  },
  {
    path: 'templates/new',
    lazy: { Component: () => import('../../features/templates/routes/template-page').then((m) => m.TemplatePage) },
  },
  {
    path: 'templates/:templateId',
    lazy: { Component: () => import('../../features/templates/routes/template-page').then((m) => m.TemplatePage) },
  },
  {
    path: 'activity',
    loader: activityLoader(queryClient),
    lazy: { Component: () => import('../../features/activity/routes/activity-page').then((m) => m.ActivityPage) },
  },
  {
    path: 'calendar',
    loader: calendarLoader(queryClient),
    lazy: { Component: () => import('../../features/calendar/routes/calendar-page').then((m) => m.CalendarPage) },
  },
  {
    path: 'sales',
    loader: salesLoader(queryClient),
    lazy: { Component: () => import('../../features/sales/routes/sales-page').then((m) => m.SalesPage) },
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
