import { queryOptions, useQuery } from '@tanstack/react-query';
import { motifSalesSchema, type SalesSummaryQuery } from '@shared/contracts/sales';
import { apiRequest } from '../../../lib/api-client';
import { salesQueryString } from './get-sales-summary';
import { salesKeys } from './sales-keys';

export function getMotifSales(motifId: string, query: SalesSummaryQuery, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`/motifs/${encodeURIComponent(motifId)}/sales${salesQueryString(query)}`, { schema: motifSalesSchema, signal });
}

export const motifSalesQueryOptions = (motifId: string, query: SalesSummaryQuery) =>
  queryOptions({ queryKey: salesKeys.motif(motifId, query), queryFn: ({ signal }) => getMotifSales(motifId, query, { signal }) });

export function useMotifSales(motifId: string, query: SalesSummaryQuery) {
  return useQuery(motifSalesQueryOptions(motifId, query));
}
