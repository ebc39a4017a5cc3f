import { queryOptions, useQuery } from '@tanstack/react-query';
import { notificationSettingsSchema } from '@shared/contracts/notifications';
import { apiRequest } from '../../../lib/api-client';
import { notificationsKeys } from './notifications-keys';

export function getNotificationSettings({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/notifications/settings', { schema: notificationSettingsSchema, signal });
}

export const notificationSettingsQueryOptions = () =>
  queryOptions({ queryKey: notificationsKeys.settings(), queryFn: ({ signal }) => getNotificationSettings({ signal }) });

export function useNotificationSettings({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...notificationSettingsQueryOptions(), enabled });
}
