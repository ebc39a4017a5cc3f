import { useMutation, useQueryClient } from '@tanstack/react-query';
import { notificationSettingsSchema, type UpdateNotificationSettingsRequest } from '@shared/contracts/notifications';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { notificationsKeys } from './notifications-keys';

export function updateNotificationSettings(body: UpdateNotificationSettingsRequest) {
  return apiRequest('/notifications/settings', { method: 'PATCH', body, schema: notificationSettingsSchema });
}

export function useUpdateNotificationSettings({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateNotificationSettings> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateNotificationSettings,
    onSuccess: (...args) => {
      queryClient.setQueryData(notificationsKeys.settings(), args[0]);
      onSuccess?.(...args);
    },
  });
}
