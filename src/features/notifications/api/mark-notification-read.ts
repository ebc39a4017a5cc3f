import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { notificationsKeys } from './notifications-keys';

export function markNotificationRead({ id }: { id: string }) {
  return apiRequest(`/notifications/${encodeURIComponent(id)}/read`, { method: 'POST', schema: z.object({ ok: z.boolean() }) });
}

export function useMarkNotificationRead({ mutationConfig }: { mutationConfig?: MutationConfig<typeof markNotificationRead> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: markNotificationRead,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: notificationsKeys.list() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
