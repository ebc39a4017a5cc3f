import { queryOptions, useQuery } from '@tanstack/react-query';
import { motifDetailSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import { motifKeys } from './motif-keys';

export function getMotif({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}`, { schema: motifDetailSchema, signal });
}

export const motifQueryOptions = (id: string) =>
  queryOptions({ queryKey: motifKeys.detail(id), queryFn: ({ signal }) => getMotif({ id, signal }) });

export function useMotif(id: string) {
  return useQuery(motifQueryOptions(id));
}
