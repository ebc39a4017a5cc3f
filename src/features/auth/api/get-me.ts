import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema, type MeResponse } from '@shared/contracts/auth';
import { apiRequest, isApiRequestError } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

// Signed out is an ordinary state, not an error: a 401 reads as `null`.
export async function getMe({ signal }: { signal?: AbortSignal } = {}): Promise<MeResponse | null> {
  try {
    return await apiRequest('/auth/me', { schema: meResponseSchema, signal });
  } catch (error) {
    if (isApiRequestError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe({ signal }),
    staleTime: 60_000,
  });

export function useMe() {
  return useQuery(meQueryOptions());
}
