import { queryOptions, useQuery } from '@tanstack/react-query';
import { productSamplesResponseSchema } from '@shared/contracts/samples';
import { apiRequest } from '../../../lib/api-client';
import { sampleKeys } from './sample-keys';

export function getProductSamples({ productId, signal }: { productId: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/samples`, { schema: productSamplesResponseSchema, signal });
}

export const productSamplesQueryOptions = (productId: string) =>
  queryOptions({
    queryKey: sampleKeys.forProduct(productId),
    queryFn: ({ signal }) => getProductSamples({ productId, signal }),
  });

export function useProductSamples(productId: string) {
  return useQuery(productSamplesQueryOptions(productId));
}
