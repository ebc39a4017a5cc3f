import { useMutation, useQueryClient } from '@tanstack/react-query';
import { uploadOriginalResponseSchema, type OriginalSummary } from '@shared/contracts/originals';
import type { MutationConfig } from '../../../lib/query-client';
import { uploadRequest, type UploadProgress } from '../../../lib/upload-request';
import { originalsKeys } from './originals-keys';

export type UploadOriginalInput = {
  file: File;
  cut: OriginalSummary['cut'];
  previousOriginalId?: string;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

export function uploadOriginal({ file, cut, previousOriginalId, onProgress, signal }: UploadOriginalInput) {
  const form = new FormData();
  // Fields before the file: the server reads them while the file is still streaming in.
  form.append('cut', cut);
  if (previousOriginalId) form.append('previousOriginalId', previousOriginalId);
  form.append('file', file, file.name);
  return uploadRequest('/originals', { form, schema: uploadOriginalResponseSchema, onProgress, signal });
}

export function useUploadOriginal({ mutationConfig }: { mutationConfig?: MutationConfig<typeof uploadOriginal> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: uploadOriginal,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: originalsKeys.lists() });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
