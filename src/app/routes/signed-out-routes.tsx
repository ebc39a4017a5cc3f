import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { invitationLoader } from '../../features/auth/routes/loaders';
import { requireSignedOut } from './guards';

// Pages for people who are not signed in. Reset and invitation links work either way: a
// signed-in person may open a teammate's invitation or a reset link from their inbox.
export const signedOutRoutes = (queryClient: QueryClient): RouteObject[] => [
  {
    loader: requireSignedOut(queryClient),
    children: [
      {
        path: 'sign-in',
        lazy: { Component: () => import('../../features/auth/routes/sign-in-page').then((m) => m.SignInPage) },
      },
      {
        path: 'sign-up',
        lazy: { Component: () => import('../../features/auth/routes/sign-up-page').then((m) => m.SignUpPage) },
      },
      {
        path: 'forgot-password',
        lazy: {
          Component: () =>
            import('../../features/auth/routes/reset-request-page').then((m) => m.ResetRequestPage),
        },
      },
    ],
  },
  {
    path: 'reset-password',
    lazy: {
      Component: () => import('../../features/auth/routes/reset-confirm-page').then((m) => m.ResetConfirmPage),
    },
  },
  {
    path: 'invitations/:token',
    loader: invitationLoader(queryClient),
    lazy: {
      Component: () =>
        import('../../features/auth/routes/accept-invitation-page').then((m) => m.AcceptInvitationPage),
    },
  },
];
