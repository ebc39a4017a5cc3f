import { queryOptions, useQuery } from '@tanstack/react-query';
import { originalDetailSchema } from '@shared/contracts/originals';
import { apiRequest } from '../../../lib/api-client';
import { importPollInterval, isImporting } from './import-status';
import { originalsKeys } from './originals-keys';

export function getOriginal({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/originals/${encodeURIComponent(id)}`, { schema: originalDetailSchema, signal });
}

// Polls while the import is queued or running, and stops once it is ready or failed.
export const originalQueryOptions = (id: string) =>
  queryOptions({
    queryKey: originalsKeys.detail(id),
    queryFn: ({ signal }) => getOriginal({ id, signal }),
    refetchInterval: (query) => {
      const original = query.state.data;
      return original && isImporting(original) ? importPollInterval(Date.parse(original.createdAt)) : false;
    },
    refetchIntervalInBackground: true,
  });

export function useOriginal(id: string) {
  return useQuery(originalQueryOptions(id));
}
