import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { uploadRequest, type UploadProgress } from '../../../lib/upload-request';
import { productsKeys } from '../../products/api/products-keys';

const guideImageSchema = z.object({ guideImageUrl: z.string(), width: z.number(), height: z.number() });

export function uploadGuideImage({ id, file, onProgress }: { id: string; file: File; onProgress?: (p: UploadProgress) => void }) {
  const form = new FormData();
  form.append('file', file);
  return uploadRequest(`/templates/${encodeURIComponent(id)}/guide-image`, { form, schema: guideImageSchema, onProgress, method: 'PUT' });
}

export function deleteGuideImage({ id }: { id: string }) {
  return apiRequest(`/templates/${encodeURIComponent(id)}/guide-image`, { method: 'DELETE' });
}

export function useUploadGuideImage({ mutationConfig }: { mutationConfig?: MutationConfig<typeof uploadGuideImage> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: uploadGuideImage,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.templates() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}

export function useDeleteGuideImage({ mutationConfig }: { mutationConfig?: MutationConfig<typeof deleteGuideImage> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: deleteGuideImage,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: productsKeys.templates() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
