import { motifVersionsResponseSchema } from '@shared/contracts/motifs';
import { apiRequest } from '../../../lib/api-client';

export function getMotifVersions({ id, signal }: { id: string; signal?: AbortSignal }) {
  return apiRequest(`/motifs/${encodeURIComponent(id)}/versions`, { schema: motifVersionsResponseSchema, signal });
}
