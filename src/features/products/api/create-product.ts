import { useMutation, useQueryClient } from '@tanstack/react-query';
import { productDetailSchema } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from './products-keys';

export function createProduct(body: { name: string; templateId: string }) {
  return apiRequest('/products', { method: 'POST', body, schema: productDetailSchema });
}

export function useCreateProduct({ mutationConfig }: { mutationConfig?: MutationConfig<typeof createProduct> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: createProduct,
    onSuccess: (...args) => {
      queryClient.setQueryData(productsKeys.detail(args[0].id), args[0]);
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.lists() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
