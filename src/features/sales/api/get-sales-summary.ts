import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { salesSummarySchema, type SalesSummaryQuery } from '@shared/contracts/sales';
import { apiRequest } from '../../../lib/api-client';
import { salesKeys } from './sales-keys';

export const salesQueryString = (query: SalesSummaryQuery) => {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const text = params.toString();
  return text ? `?${text}` : '';
};

export function getSalesSummary(query: SalesSummaryQuery, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`/sales/summary${salesQueryString(query)}`, { schema: salesSummarySchema, signal });
}

export const salesSummaryQueryOptions = (query: SalesSummaryQuery) =>
  queryOptions({ queryKey: salesKeys.summary(query), queryFn: ({ signal }) => getSalesSummary(query, { signal }), placeholderData: keepPreviousData });

export function useSalesSummary(query: SalesSummaryQuery) {
  return useQuery(salesSummaryQueryOptions(query));
}
