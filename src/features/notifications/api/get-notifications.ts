import { queryOptions, useQuery } from '@tanstack/react-query';
import { notificationsListSchema } from '@shared/contracts/notifications';
import { apiRequest } from '../../../lib/api-client';
import { notificationsKeys } from './notifications-keys';

export function getNotifications({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/notifications?limit=20', { schema: notificationsListSchema, signal });
}

// Checked once a minute and whenever the window comes back, so the badge stays current without a socket.
export const notificationsQueryOptions = () =>
  queryOptions({ queryKey: notificationsKeys.list(), queryFn: ({ signal }) => getNotifications({ signal }), staleTime: 15_000, refetchInterval: 60_000 });

export function useNotifications() {
  return useQuery(notificationsQueryOptions());
}
