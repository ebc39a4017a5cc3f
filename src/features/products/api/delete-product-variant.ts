import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from './products-keys';

export function deleteProductVariant({ productId, variantId }: { productId: string; variantId: string }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/variants/${encodeURIComponent(variantId)}`, { method: 'DELETE' });
}

export function useDeleteProductVariant({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteProductVariant> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteProductVariant,
    onSuccess: (...args) => {
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: productsKeys.variants(args[1].productId) }),
        queryClient.invalidateQueries({ queryKey: productsKeys.lists() }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
