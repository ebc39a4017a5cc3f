import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { acceptInvitationRequestSchema, meResponseSchema } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { startSession } from './session-cache';

export type AcceptInvitation = z.infer<typeof acceptInvitationRequestSchema> & { token: string };

export function acceptInvitation({ token, ...body }: AcceptInvitation) {
  return apiRequest(`/invitations/${encodeURIComponent(token)}/accept`, {
    method: 'POST',
    body,
    schema: meResponseSchema,
  });
}

export function useAcceptInvitation({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof acceptInvitation> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: acceptInvitation,
    onSuccess: (...args) => {
      const refreshed = startSession(queryClient, args[0]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
