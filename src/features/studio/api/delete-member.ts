import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { authKeys } from '../../auth/api/auth-keys';
import { studioKeys } from './studio-keys';

export function deleteMember({ userId }: { userId: string }) {
  return apiRequest(`/studio/members/${encodeURIComponent(userId)}`, { method: 'DELETE' });
}

export function useDeleteMember({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteMember> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteMember,
    onSuccess: (...args) => {
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: studioKeys.members() }),
        queryClient.invalidateQueries({ queryKey: authKeys.me() }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
