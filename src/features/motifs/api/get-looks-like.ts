import { queryOptions, useQuery } from '@tanstack/react-query';
import { looksLikeResponseSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import { motifKeys } from './motif-keys';

export function getLooksLike({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}/looks-like`, { schema: looksLikeResponseSchema, signal });
}

export const looksLikeQueryOptions = (id: string) =>
  queryOptions({ queryKey: motifKeys.looksLike(id), queryFn: ({ signal }) => getLooksLike({ id, signal }) });

export function useLooksLike(id: string) {
  return useQuery(looksLikeQueryOptions(id));
}
