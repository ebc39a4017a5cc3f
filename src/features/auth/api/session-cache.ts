import type { QueryClient } from '@tanstack/react-query';
import type { MeResponse } from '@shared/contracts/auth';
import { forgetCsrfToken } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

const isStudioData = (queryKey: readonly unknown[]) => queryKey[0] !== authKeys.all[0];

// A new session (sign-in, sign-up, accepted invitation) must not see anything cached for the
// previous one: drop studio data, store the new `me`, and refetch it to be sure.
export function startSession(queryClient: QueryClient, me: MeResponse): Promise<void> {
  forgetCsrfToken();
  queryClient.removeQueries({ predicate: (query) => isStudioData(query.queryKey) });
  queryClient.setQueryData(authKeys.me(), me);
  return queryClient.invalidateQueries({ queryKey: authKeys.me() });
}

// Same studio data, another studio: reset (not remove) so open pages refetch in place.
export function switchSession(queryClient: QueryClient, me: MeResponse): Promise<void> {
  queryClient.setQueryData(authKeys.me(), me);
  return Promise.all([
    queryClient.resetQueries({ predicate: (query) => isStudioData(query.queryKey) }),
    queryClient.invalidateQueries({ queryKey: authKeys.me() }),
  ]).then(() => undefined);
}

export function endSession(queryClient: QueryClient): Promise<void> {
  forgetCsrfToken();
  queryClient.removeQueries({ predicate: (query) => isStudioData(query.queryKey) });
  queryClient.setQueryData(authKeys.me(), null);
  return queryClient.invalidateQueries({ queryKey: authKeys.me() });
}
