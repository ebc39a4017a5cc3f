import { useMutation, useQueryClient } from '@tanstack/react-query';
import { uploadSamplePhotoResponseSchema } from '@shared/contracts/samples';
import type { MutationConfig } from '../../../lib/query-client';
import { uploadRequest, type UploadProgress } from '../../../lib/upload-request';
import { sampleKeys } from './sample-keys';

export type UploadSamplePhotoInput = {
  sampleId: string;
  productId: string;
  file: File;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

export function uploadSamplePhoto({ sampleId, file, onProgress, signal }: UploadSamplePhotoInput) {
  const form = new FormData();
  form.append('file', file, file.name);
  return uploadRequest(`/samples/${encodeURIComponent(sampleId)}/photos`, { form, schema: uploadSamplePhotoResponseSchema, onProgress, signal });
}

export function useUploadSamplePhoto({ mutationConfig }: { mutationConfig?: MutationConfig<typeof uploadSamplePhoto> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: uploadSamplePhoto,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: sampleKeys.forProduct(args[1].productId) });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
