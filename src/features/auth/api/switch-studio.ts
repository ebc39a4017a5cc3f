import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { meResponseSchema, switchStudioRequestSchema } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { switchSession } from './session-cache';

export type SwitchStudioRequest = z.infer<typeof switchStudioRequestSchema>;

export function switchStudio(data: SwitchStudioRequest) {
  return apiRequest('/auth/switch-studio', { method: 'POST', body: data, schema: meResponseSchema });
}

export function useSwitchStudio({ mutationConfig }: { mutationConfig?: MutationConfig<typeof switchStudio> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: switchStudio,
    onSuccess: (...args) => {
      const refreshed = switchSession(queryClient, args[0]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
