import { queryOptions, useQuery } from '@tanstack/react-query';
import { salesImportListSchema } from '@shared/contracts/sales';
import { apiRequest } from '../../../lib/api-client';
import { salesKeys } from './sales-keys';

export function getSalesImports({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/sales/imports', { schema: salesImportListSchema, signal });
}

export const salesImportsQueryOptions = () => queryOptions({ queryKey: salesKeys.imports(), queryFn: ({ signal }) => getSalesImports({ signal }) });

export function useSalesImports() {
  return useQuery(salesImportsQueryOptions());
}
