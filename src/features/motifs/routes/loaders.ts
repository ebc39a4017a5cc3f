import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { motifQueryOptions } from '../api/get-motif';

export const motifLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    if (params.motifId) await queryClient.prefetchQuery(motifQueryOptions(params.motifId));
    return null;
  };
