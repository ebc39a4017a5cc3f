import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudioRole } from '@shared/auth/permissions';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { authKeys } from '../../auth/api/auth-keys';
import { studioKeys } from './studio-keys';

export function updateMember({ userId, role }: { userId: string; role: StudioRole }) {
  return apiRequest(`/studio/members/${encodeURIComponent(userId)}`, { method: 'PATCH', body: { role } });
}

export function useUpdateMember({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateMember> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateMember,
    onSuccess: (...args) => {
      // An owner may change their own role, which changes what `me` allows.
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: studioKeys.members() }),
        queryClient.invalidateQueries({ queryKey: authKeys.me() }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
