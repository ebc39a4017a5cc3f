import { queryOptions, useQuery } from '@tanstack/react-query';
import { healthResponseSchema } from '@shared/contracts/studio';
import { apiRequest } from '../../../lib/api-client';
import { healthKeys } from './health-keys';

export function getHealth({ signal }: { signal?: AbortSignal } = {}) {
  // A degraded service answers 503 with the same body, which is exactly what the notice needs.
  return apiRequest('/health', { schema: healthResponseSchema, signal, answerStatuses: [503] });
}

export const healthQueryOptions = () =>
  queryOptions({
    queryKey: healthKeys.all,
    queryFn: ({ signal }) => getHealth({ signal }),
    staleTime: 60_000,
    refetchInterval: 120_000,
    retry: false,
  });

export function useHealth(enabled = true) {
  return useQuery({ ...healthQueryOptions(), enabled });
}
