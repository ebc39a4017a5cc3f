import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { exportStatusSchema, productExportsSchema, type CreateExportRequest, type ExportStatusView } from '@shared/contracts/exports';
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

export function getProductExports({ productId, signal }: { productId: string; signal?: AbortSignal }) {
  return apiRequest(`/products/${encodeURIComponent(productId)}/exports`, { schema: productExportsSchema, signal });
}

export const productExportsKey = (productId: string) => ['exports', 'product', productId] as const;

// The product's earlier exports, so files made before stay at hand after leaving the page.
export function useProductExports(productId: string) {
  return useQuery({
    queryKey: productExportsKey(productId),
    queryFn: ({ signal }) => getProductExports({ productId, signal }),
    // while one of them is still being made (in another tab, or by someone else), look again
    refetchInterval: (query) => (query.state.data?.exports.some((e) => e.status === 'queued' || e.status === 'running') ? 2000 : false),
  });
}

// The list of earlier exports is refreshed by the panel when a job ends (product-exports.tsx).
export function useCreateProductExport() {
  return useMutation({ mutationFn: createProductExport });
}

/** The address a finished export's file downloads from (a plain link: the browser saves it). */
export const exportDownloadUrl = (exportId: string, file: string) =>
  `/api/exports/${encodeURIComponent(exportId)}/download?${new URLSearchParams({ file })}`;
