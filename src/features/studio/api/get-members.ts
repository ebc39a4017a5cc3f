import { queryOptions, useQuery } from '@tanstack/react-query';
import { membersResponseSchema } from '@shared/contracts/studio';
import { apiRequest } from '../../../lib/api-client';
import { studioKeys } from './studio-keys';

export function getMembers({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/studio/members', { schema: membersResponseSchema, signal });
}

export const membersQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.members(), queryFn: ({ signal }) => getMembers({ signal }) });

export function useMembers() {
  return useQuery(membersQueryOptions());
}
