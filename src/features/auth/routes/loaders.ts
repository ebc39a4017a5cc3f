import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { meQueryOptions } from '../api/get-me';
import { invitationQueryOptions } from '../api/get-invitation';

export const invitationLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    await Promise.all([
      queryClient.prefetchQuery(invitationQueryOptions(params.token ?? '')),
      queryClient.prefetchQuery(meQueryOptions()),
    ]);
    return null;
  };
