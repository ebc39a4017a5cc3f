import { queryOptions, useQuery } from '@tanstack/react-query';
import { originalsListSchema } from '@shared/contracts/originals';
import { apiRequest } from '../../../lib/api-client';
import { originalsKeys } from './originals-keys';
import { isImporting } from './import-status';

export function getOriginals({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/originals', { schema: originalsListSchema, signal });
}

export const originalsQueryOptions = () =>
  queryOptions({
    queryKey: originalsKeys.lists(),
    queryFn: ({ signal }) => getOriginals({ signal }),
    // The list's badges follow running imports too, more slowly than the detail's bar.
    refetchInterval: (query) => (query.state.data?.originals.some(isImporting) ? 3000 : false),
  });

export function useOriginals() {
  return useQuery(originalsQueryOptions());
}
