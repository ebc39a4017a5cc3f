import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sampleSchema, type UpdateSampleRequest } from '@shared/contracts/samples';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from '../../products/api/products-keys';
import { sampleKeys } from './sample-keys';

export function updateSample({ id, changes }: { id: string; productId: string; changes: UpdateSampleRequest }) {
  return apiRequest(`/samples/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes, schema: sampleSchema });
}

export function useUpdateSample({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateSample> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateSample,
    onSuccess: (...args) => {
      // The latest sample decides the product's way to ready: its page and the product lists show it.
      const { productId } = args[1];
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: sampleKeys.forProduct(productId) }),
        queryClient.invalidateQueries({ queryKey: productsKeys.detail(productId) }),
        queryClient.invalidateQueries({ queryKey: productsKeys.lists() }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
