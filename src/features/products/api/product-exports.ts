import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { exportStatusSchema, type CreateExportRequest, type ExportStatusView } from '@shared/contracts/exports';
import { apiRequest } from '../../../lib/api-client';

const createdSchema = z.object({ id: z.string() });

export function createProductExport({ productId, request }: { productId: string; request: CreateExportRequest }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/exports`, { method: 'POST', body: request, schema: createdSchema });
}

export function getExport({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/exports/${encodeURIComponent(id)}`, { schema: exportStatusSchema, signal });
}

export const exportFinished = (e: ExportStatusView | undefined) => e?.status === 'done' || e?.status === 'failed';

// Polled while the job runs (progress comes from the job itself), then left alone.
export const exportQueryOptions = (id: string) =>
  queryOptions({
    queryKey: ['exports', 'detail', id] as const,
    queryFn: ({ signal }) => getExport({ id, signal }),
    refetchInterval: (query) => (exportFinished(query.state.data) ? false : 700),
    refetchOnWindowFocus: false,
  });

export function useExport(id: string | null) {
  return useQuery({ ...exportQueryOptions(id ?? ''), enabled: id !== null });
}

export function useCreateProductExport() {
  return useMutation({ mutationFn: createProductExport });
}

/** The address a finished export's file downloads from (a plain link: the browser saves it). */
export const exportDownloadUrl = (exportId: string, file: string) =>
  `/api/exports/${encodeURIComponent(exportId)}/download?${new URLSearchParams({ file })}`;
