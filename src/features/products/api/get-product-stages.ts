import { queryOptions, useQuery } from '@tanstack/react-query';
import { stageHistorySchema } from '@shared/contracts/stages';
import { apiRequest } from '../../../lib/api-client';
import { productsKeys } from './products-keys';

export function getProductStages({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(id)}/stages`, { schema: stageHistorySchema, signal });
}

export const productStagesQueryOptions = (id: string) =>
  queryOptions({ queryKey: productsKeys.stages(id), queryFn: ({ signal }) => getProductStages({ id, signal }) });

export function useProductStages(id: string) {
  return useQuery(productStagesQueryOptions(id));
}
