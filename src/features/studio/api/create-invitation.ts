import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { createInvitationRequestSchema, pendingInvitationSchema } from '@shared/contracts/studio';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { studioKeys } from './studio-keys';

export type CreateInvitationRequest = z.infer<typeof createInvitationRequestSchema>;

export function createInvitation(data: CreateInvitationRequest) {
  return apiRequest('/studio/invitations', { method: 'POST', body: data, schema: pendingInvitationSchema });
}

export function useCreateInvitation({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof createInvitation> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createInvitation,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: studioKeys.members() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
