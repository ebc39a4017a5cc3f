import type { QueryClient } from '@tanstack/react-query';
import { redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { safeReturnPath, signInPath } from '../../lib/return-path';

// Route loaders, so a page is never drawn for the wrong kind of visitor.
export const requireSignedIn =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) {
      const url = new URL(request.url);
      throw redirect(signInPath(url.pathname + url.search));
    }
    return null;
  };

export const requireSignedOut =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me) throw redirect(safeReturnPath(new URL(request.url).searchParams.get('returnTo')));
    return null;
  };
