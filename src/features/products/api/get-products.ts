import { queryOptions, useQuery } from '@tanstack/react-query';
import { productsListSchema } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';
import { productsKeys } from './products-keys';

export function getProducts({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/products', { schema: productsListSchema, signal });
}

export const productsQueryOptions = () =>
  queryOptions({ queryKey: productsKeys.lists(), queryFn: ({ signal }) => getProducts({ signal }) });

export function useProducts() {
  return useQuery(productsQueryOptions());
}
