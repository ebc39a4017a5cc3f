import { queryOptions, useQuery } from '@tanstack/react-query';
import { templatesListSchema } from '@shared/contracts/products';
import { apiRequest } from '../../../lib/api-client';
import { productsKeys } from './products-keys';

export function getTemplates({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/templates', { schema: templatesListSchema, signal });
}

export const templatesQueryOptions = () =>
  queryOptions({ queryKey: productsKeys.templates(), queryFn: ({ signal }) => getTemplates({ signal }), staleTime: 5 * 60_000 });

export function useTemplates() {
  return useQuery(templatesQueryOptions());
}
