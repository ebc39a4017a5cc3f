import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { motifListResponseSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';
import { compositorKeys } from './compositor-keys';

// A tray shows a screenful; the library page is the place to browse everything.
const TRAY_LIMIT = 60;

export function getTrayMotifs({ q, signal }: { q: string; signal?: AbortSignal }) {
  const params = new URLSearchParams({ limit: String(TRAY_LIMIT) });
  if (q.trim()) params.set('q', q.trim());
  return apiRequest(`/motifs?${params}`, { schema: motifListResponseSchema, signal });
}

export const trayMotifsQueryOptions = (q: string) =>
  queryOptions({ queryKey: compositorKeys.tray(q.trim()), queryFn: ({ signal }) => getTrayMotifs({ q, signal }), placeholderData: keepPreviousData });

export function useTrayMotifs(q: string) {
  return useQuery(trayMotifsQueryOptions(q));
}
