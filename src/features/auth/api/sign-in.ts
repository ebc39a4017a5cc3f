import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponseSchema, type SignInRequest } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { startSession } from './session-cache';

export function signIn(data: SignInRequest) {
  return apiRequest('/auth/sign-in', { method: 'POST', body: data, schema: meResponseSchema });
}

export function useSignIn({ mutationConfig }: { mutationConfig?: MutationConfig<typeof signIn> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: signIn,
    onSuccess: (...args) => {
      const refreshed = startSession(queryClient, args[0]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
