import { queryOptions, useQuery } from '@tanstack/react-query';
import { productDetailSchema } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';
import { productsKeys } from './products-keys';

export function getProduct({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(id)}`, { schema: productDetailSchema, signal });
}

// The editor owns the layout once loaded; refetching behind its back would fight autosave.
export const productQueryOptions = (id: string) =>
  queryOptions({ queryKey: productsKeys.detail(id), queryFn: ({ signal }) => getProduct({ id, signal }), staleTime: Infinity, refetchOnWindowFocus: false });

export function useProduct(id: string) {
  return useQuery(productQueryOptions(id));
}
