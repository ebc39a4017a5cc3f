import { useMutation, useQueryClient } from '@tanstack/react-query';
import { salesSettingsSchema, type SalesSplitRule } from '@shared/contracts/sales';
import { apiRequest } from '../../../lib/api-client';
import { salesKeys } from './sales-keys';

export function updateSalesSettings(splitRule: SalesSplitRule) {
  return apiRequest('/sales/settings', { method: 'PATCH', body: { splitRule }, schema: salesSettingsSchema });
}

export function useUpdateSalesSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSalesSettings,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: salesKeys.all }),
  });
}
