import { useMutation, useQueryClient } from '@tanstack/react-query';
import { moveStageResponseSchema, type ProductStage } from '@shared/contracts/stages';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { productsKeys } from './products-keys';

export type MoveProductStageInput = { id: string; to: ProductStage; note: string; override: boolean };

// An override goes through its own owner-only route; the server records it as one.
export function moveProductStage({ id, to, note, override }: MoveProductStageInput) {
  const path = `/products/${encodeURIComponent(id)}/stage${override ? '/override' : ''}`;
  return apiRequest(path, { method: 'POST', body: { to, note }, schema: moveStageResponseSchema });
}

export function useMoveProductStage({ mutationConfig }: { mutationConfig?: MutationConfig<typeof moveProductStage> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: moveProductStage,
    onSuccess: (...args) => {
      const id = args[1].id;
      // The detail stays "fresh forever" for the editor; its stage is set here instead of refetched.
      queryClient.setQueryData(productsKeys.detail(id), (old: unknown) => (old && typeof old === 'object' ? { ...old, stage: args[0].stage } : old));
      const refreshed = Promise.all([
        queryClient.invalidateQueries({ queryKey: productsKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: productsKeys.stages(id) }),
      ]);
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
