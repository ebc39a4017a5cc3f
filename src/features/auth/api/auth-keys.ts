import { sessionQueryKey } from '../../../lib/query-client';

export const authKeys = {
  all: ['auth'] as const,
  me: () => sessionQueryKey,
  invitations: () => [...authKeys.all, 'invitations'] as const,
  invitation: (token: string) => [...authKeys.invitations(), token] as const,
  signOut: () => [...authKeys.all, 'sign-out'] as const,
};
