import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { originalDetailSchema, originalSummarySchema } from '@shared/contracts/originals';
import { apiRequest } from '../../../lib/api-client';
import { compositorKeys } from './compositor-keys';

const originalsListSchema = z.object({ originals: z.array(originalSummarySchema) });

export function getTrayOriginals({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/originals', { schema: originalsListSchema, signal });
}

export function useTrayOriginals() {
  return useQuery(queryOptions({ queryKey: compositorKeys.originals(), queryFn: ({ signal }) => getTrayOriginals({ signal }) }));
}

/** An original's motifs with their offsets in it, for "place as in the original". */
export function getOriginalForPlacing({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/originals/${encodeURIComponent(id)}`, { schema: originalDetailSchema, signal });
}

export const originalForPlacingQueryOptions = (id: string) =>
  queryOptions({ queryKey: compositorKeys.original(id), queryFn: ({ signal }) => getOriginalForPlacing({ id, signal }) });
