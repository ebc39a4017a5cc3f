import { useMutation, useQueryClient } from '@tanstack/react-query';
import { uploadOriginalResponseSchema, type OriginalSummary } from '@shared/contracts/originals';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { originalsKeys } from './originals-keys';

// Starts a new import of the same stored file, cut the other way; answers with the new original.
export function recutOriginal({ id, cut }: { id: string; cut: OriginalSummary['cut'] }) {
  return apiRequest(`/originals/${encodeURIComponent(id)}/recut`, {
    method: 'POST',
    body: { cut },
    schema: uploadOriginalResponseSchema,
  });
}

export function useRecutOriginal({ mutationConfig }: { mutationConfig?: MutationConfig<typeof recutOriginal> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: recutOriginal,
    onSuccess: (...args) => {
      const refreshed = queryClient.invalidateQueries({ queryKey: originalsKeys.all });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
