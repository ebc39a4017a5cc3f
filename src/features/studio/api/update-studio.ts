import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { updateStudioRequestSchema } from '@shared/contracts/studio';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { authKeys } from '../../auth/api/auth-keys';
import { studioKeys } from './studio-keys';

export type UpdateStudioRequest = z.infer<typeof updateStudioRequestSchema>;

export function updateStudio(data: UpdateStudioRequest) {
  return apiRequest('/studio', { method: 'PATCH', body: data });
}

export function useUpdateStudio({ mutationConfig }: { mutationConfig?: MutationConfig<typeof updateStudio> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: updateStudio,
    onSuccess: (...args) => {
      // The studio's name also shows in the top bar and switcher, which read `me`.
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: studioKeys.settings() }),
        queryClient.invalidateQueries({ queryKey: authKeys.me() }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
