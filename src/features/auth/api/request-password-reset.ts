import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import { passwordResetRequestSchema } from '@shared/contracts/auth';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';

export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

// Answers 202 whether or not the address has an account, so the page never reveals which.
export function requestPasswordReset(data: PasswordResetRequest) {
  return apiRequest('/auth/password-reset/request', { method: 'POST', body: data });
}

export function useRequestPasswordReset({
  mutationConfig,
}: { mutationConfig?: MutationConfig<typeof requestPasswordReset> } = {}) {
  return useMutation({ ...mutationConfig, mutationFn: requestPasswordReset });
}
