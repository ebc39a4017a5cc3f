import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { productPreflightSchema } from '@shared/contracts/exports';
import { apiRequest } from '../../../lib/api-client';
import { compositorKeys } from './compositor-keys';

export function getProductPreflight({ productId, signal }: { productId: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/preflight`, { schema: productPreflightSchema, signal });
}

export const productPreflightQueryOptions = (productId: string, revision: number) =>
  queryOptions({
    queryKey: compositorKeys.preflight(productId, revision),
    queryFn: ({ signal }) => getProductPreflight({ productId, signal }),
    // the last save's facts stay on screen while the next save's are measured
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

export function useProductPreflight(productId: string, revision: number) {
  return useQuery(productPreflightQueryOptions(productId, revision));
}
