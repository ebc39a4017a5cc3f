import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { libraryShouldRevalidate } from '../../features/library/routes/library-revalidation';

// Pages inside the studio (top bar, signed-in guard). To add a feature's page: add an entry
// here with `lazy: { loader, Component }`: the page from features/<noun>/routes/<page>.tsx and a
// loader from features/<noun>/routes/loaders.ts that prefetches the page's queryOptions. Both are
// imported lazily, so the main chunk carries no page's code, API schemas or fetchers; the two
// load side by side when the page is first opened.
export const signedInRoutes = (queryClient: QueryClient): RouteObject[] => [
  {
    index: true,
    lazy: { Component: () => import('../../features/studio/routes/home-page').then((m) => m.HomePage) },
  },
  {
    path: 'library',
    shouldRevalidate: libraryShouldRevalidate,
    lazy: {
      loader: async () => (await import('../../features/library/routes/loaders')).libraryLoader(queryClient),
      Component: () => import('../../features/library/routes/library-page').then((m) => m.LibraryPage),
    },
  },
  {
    path: 'library/:motifId',
    lazy: {
      loader: async () => (await import('../../features/motifs/routes/loaders')).motifLoader(queryClient),
      Component: () => import('../../features/motifs/routes/motif-page').then((m) => m.MotifPage),
    },
  },
  {
    path: 'originals',
    lazy: {
      loader: async () => (await import('../../features/originals/routes/loaders')).originalsLoader(queryClient),
      Component: () => import('../../features/originals/routes/originals-page').then((m) => m.OriginalsPage),
    },
  },
  {
    path: 'originals/:originalId',
    lazy: {
      loader: async () => (await import('../../features/originals/routes/loaders')).originalLoader(queryClient),
      Component: () => import('../../features/originals/routes/original-page').then((m) => m.OriginalPage),
    },
  },
  {
    path: 'products',
    lazy: {
      loader: async () => (await import('../../features/products/routes/loaders')).productsLoader(queryClient),
      Component: () => import('../../features/products/routes/products-page').then((m) => m.ProductsPage),
    },
  },
  {
    path: 'products/:productId',
    lazy: {
      loader: async () => (await import('../../features/products/routes/loaders')).productLoader(queryClient),
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
    lazy: {
      loader: async () => (await import('../../features/activity/routes/loaders')).activityLoader(queryClient),
      Component: () => import('../../features/activity/routes/activity-page').then((m) => m.ActivityPage),
    },
  },
  {
    path: 'calendar',
    lazy: {
      loader: async () => (await import('../../features/calendar/routes/loaders')).calendarLoader(queryClient),
      Component: () => import('../../features/calendar/routes/calendar-page').then((m) => m.CalendarPage),
    },
  },
  {
    path: 'sales',
    lazy: {
      loader: async () => (await import('../../features/sales/routes/loaders')).salesLoader(queryClient),
      Component: () => import('../../features/sales/routes/sales-page').then((m) => m.SalesPage),
    },
  },
  {
    path: 'members',
    lazy: {
      loader: async () => (await import('../../features/studio/routes/loaders')).membersLoader(queryClient),
      Component: () => import('../../features/studio/routes/members-page').then((m) => m.MembersPage),
    },
  },
  {
    path: 'settings',
    lazy: {
      loader: async () => (await import('../../features/studio/routes/loaders')).settingsLoader(queryClient),
      Component: () => import('../../features/studio/routes/settings-page').then((m) => m.SettingsPage),
    },
  },
];
