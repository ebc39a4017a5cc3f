import { queryOptions, useQuery } from '@tanstack/react-query';
import { variantsListSchema } from '@shared/contracts/variants';
import { apiRequest } from '../../../lib/api-client';
import { productsKeys } from './products-keys';

export function getProductVariants({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(id)}/variants`, { schema: variantsListSchema, signal });
}

export const productVariantsQueryOptions = (id: string) =>
  queryOptions({ queryKey: productsKeys.variants(id), queryFn: ({ signal }) => getProductVariants({ id, signal }) });

export function useProductVariants(id: string) {
  return useQuery(productVariantsQueryOptions(id));
}
