import { hashKey, MutationCache, QueryCache, QueryClient, type UseMutationOptions } from '@tanstack/react-query';
import { isApiRequestError, type ApiRequestError } from './api-client';

// Query key of the signed-in session; kept here (not in the auth feature) so the cache can
// sign the client out when any request finds the session gone, without an import cycle.
export const sessionQueryKey = ['auth', 'me'] as const;

// `auth.required` means the session expired or was signed out elsewhere; a 401 for a wrong
// password carries another code and must not sign anyone out.
function isSessionGone(error: unknown): boolean {
  return isApiRequestError(error) && error.code === 'auth.required';
}

export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isSessionGone(error) && query.queryHash !== hashKey(sessionQueryKey)) {
          queryClient.setQueryData(sessionQueryKey, null);
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error) => {
        if (isSessionGone(error)) {
          queryClient.setQueryData(sessionQueryKey, null);
        }
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: true,
        // A 4xx answer will not change by asking again; network trouble and 5xx might.
        retry: (failureCount, error) =>
          !(isApiRequestError(error) && error.status >= 400 && error.status < 500) && failureCount < 2,
      },
      mutations: { retry: false },
    },
  });
  return queryClient;
}

export const queryClient = createQueryClient();

// Options a feature hook accepts from its caller; the hook adds its own cache work around them.
export type MutationConfig<Fetcher extends (variables: never) => Promise<unknown>> = Omit<
  UseMutationOptions<Awaited<ReturnType<Fetcher>>, ApiRequestError, Parameters<Fetcher>[0]>,
  'mutationFn'
>;
