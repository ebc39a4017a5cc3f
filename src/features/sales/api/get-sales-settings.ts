import { queryOptions, useQuery } from '@tanstack/react-query';
import { salesSettingsSchema } from '@shared/contracts/sales';
import { apiRequest } from '../../../lib/api-client';
import { salesKeys } from './sales-keys';

export function getSalesSettings({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/sales/settings', { schema: salesSettingsSchema, signal });
}

export const salesSettingsQueryOptions = () => queryOptions({ queryKey: salesKeys.settings(), queryFn: ({ signal }) => getSalesSettings({ signal }) });

export function useSalesSettings() {
  return useQuery(salesSettingsQueryOptions());
}
