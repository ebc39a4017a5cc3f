import { useMutation, useQueryClient } from '@tanstack/react-query';
import { variantSchema, type CreateVariantRequest, type UpdateVariantRequest } from '@shared/contracts/variants';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from './products-keys';

export type SaveVariantInput = { productId: string } & ({ variantId: string; changes: UpdateVariantRequest } | { variantId?: undefined; changes: CreateVariantRequest });

// Adds a variant, or changes one when `variantId` is given.
export function saveProductVariant({ productId, variantId, changes }: SaveVariantInput) {
  const base = `/products/${encodeURIComponent(productId)}/variants`;
  return variantId
    ? apiRequest(`${base}/${encodeURIComponent(variantId)}`, { method: 'PATCH', body: changes, schema: variantSchema })
    : apiRequest(base, { method: 'POST', body: changes, schema: variantSchema });
}

export function useSaveProductVariant({ mutationConfig }: { mutationConfig?: MutationConfig<typeof saveProductVariant> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: saveProductVariant,
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
