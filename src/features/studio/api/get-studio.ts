import { queryOptions, useQuery } from '@tanstack/react-query';
import { studioSettingsSchema } from '@shared/contracts/studio';
import { apiRequest } from '../../../lib/api-client';
import { studioKeys } from './studio-keys';

export function getStudio({ signal }: { signal?: AbortSignal } = {}) {
  return apiRequest('/studio', { schema: studioSettingsSchema, signal });
}

export const studioQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.settings(), queryFn: ({ signal }) => getStudio({ signal }) });

export function useStudio() {
  return useQuery(studioQueryOptions());
}
