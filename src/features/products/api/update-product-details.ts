import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productDetailSchema, type UpdateProductDetailsRequest } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from './products-keys';

export function updateProductDetails({ id, ...body }: UpdateProductDetailsRequest & { id: string }) {
  return apiRequest(`/products/${encodeURIComponent(id)}/details`, { method: 'PATCH', body, schema: productDetailSchema });
}

export function useUpdateProductDetails({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateProductDetails> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateProductDetails,
    onSuccess: (...args) => {
      queryClient.setQueryData(productsKeys.detail(args[0].id), args[0]);
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.lists() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
