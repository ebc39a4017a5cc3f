import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { passwordResetConfirmSchema } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';

export type PasswordResetConfirm = z.infer<typeof passwordResetConfirmSchema>;

export function confirmPasswordReset(data: PasswordResetConfirm) {
  return apiRequest('/auth/password-reset/confirm', { method: 'POST', body: data });
}

export function useConfirmPasswordReset({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof confirmPasswordReset> } = {}) {
  return useMutation({ ...mutationConfig, mutationFn: confirmPasswordReset });
}
