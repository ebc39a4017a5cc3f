import { queryOptions, useQuery } from '@tanstack/react-query';
import { invitationPreviewSchema } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import { authKeys } from './auth-keys';

export function getInvitation(token: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`/invitations/${encodeURIComponent(token)}`, { schema: invitationPreviewSchema, signal });
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, { signal }),
  });

export function useInvitation(token: string) {
  return useQuery(invitationQueryOptions(token));
}
