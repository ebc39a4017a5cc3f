import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { authKeys } from './auth-keys';
import { endSession } from './session-cache';

export function signOut() {
  return apiRequest('/auth/sign-out', { method: 'POST' });
}

export function useSignOut({ mutationConfig }: { mutationConfig?: MutationConfig<typeof signOut> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    // The signed-in layout watches this key so it does not bounce to sign-in with a return
    // path while a deliberate sign-out is on its way.
    mutationKey: authKeys.signOut(),
    mutationFn: signOut,
    onSuccess: (...args) => {
      const refreshed = endSession(queryClient);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
