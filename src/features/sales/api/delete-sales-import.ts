import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { salesKeys } from './sales-keys';

export function deleteSalesImport(id: string) {
  return apiRequest(`/sales/imports/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useDeleteSalesImport({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteSalesImport,
    onSuccess: async () => {
      onSuccess?.();
      return queryClient.invalidateQueries({ queryKey: salesKeys.all });
    },
  });
}
