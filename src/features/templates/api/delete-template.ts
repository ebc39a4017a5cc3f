import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from '../../products/api/products-keys';

export function deleteTemplate({ id }: { id: string }) {
  return apiRequest(`/templates/${encodeURIComponent(id)}`, { method: 'DELETE' });
}

export function useDeleteTemplate({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteTemplate> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteTemplate,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.templates() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
