import { useMutation, useQueryClient } from '@tanstack/react-query';
import { meResponseSchema, type SignUpRequest } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { startSession } from './session-cache';

export function signUp(data: SignUpRequest) {
  return apiRequest('/auth/sign-up', { method: 'POST', body: data, schema: meResponseSchema });
}

export function useSignUp({ mutationConfig }: { mutationConfig?: MutationConfig<typeof signUp> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: signUp,
    onSuccess: (...args) => {
      const refreshed = startSession(queryClient, args[0]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
