import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { studioKeys } from './studio-keys';

export function deleteInvitation({ invitationId }: { invitationId: string }) {
  return apiRequest(`/studio/invitations/${encodeURIComponent(invitationId)}`, { method: 'DELETE' });
}

export function useDeleteInvitation({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof deleteInvitation> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteInvitation,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: studioKeys.members() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
