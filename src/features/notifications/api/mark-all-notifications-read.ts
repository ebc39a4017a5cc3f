import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { notificationsKeys } from './notifications-keys';

export function markAllNotificationsRead() {
  return apiRequest('/notifications/read-all', { method: 'POST', schema: z.object({ marked: z.number() }) });
}

export function useMarkAllNotificationsRead({ mutationConfig }: { mutationConfig?: MutationConfig<typeof markAllNotificationsRead> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: markAllNotificationsRead,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: notificationsKeys.list() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
