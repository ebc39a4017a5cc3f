import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiErrorFromText } from '../../../lib/api-client';
import type { MotifBitmap } from '../render/image-cache';
import { compositorKeys } from './compositor-keys';

export type SoftProofImage = { bitmap: MotifBitmap; share: number; profileName: string };

// About the canvas's size on a large screen; the server caps it at 2600.
const SOFT_PROOF_SIDE = 1600;

export async function getSoftProof({ productId, mask, signal }: { productId: string; mask: boolean; signal?: AbortSignal }): Promise<SoftProofImage> {
  let response: Response;
  try {
    response = await fetch(`/api/products/${encodeURIComponent(productId)}/soft-proof.png?mask=${mask ? 1 : 0}&side=${SOFT_PROOF_SIDE}`, { credentials: 'same-origin', signal });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw apiErrorFromText(0, '');
  }
  if (!response.ok) throw apiErrorFromText(response.status, await response.text().catch(() => ''));
  const bitmap = await createImageBitmap(await response.blob());
  return {
    bitmap,
    share: Number(response.headers.get('X-Soft-Proof-Share') ?? 0),
    profileName: decodeURIComponent(response.headers.get('X-Soft-Proof-Profile') ?? ''),
  };
}

export const softProofQueryOptions = (productId: string, revision: number, mask: boolean) =>
  queryOptions({
    queryKey: compositorKeys.softProof(productId, revision, mask),
    queryFn: ({ signal }) => getSoftProof({ productId, mask, signal }),
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 60_000,
    refetchOnWindowFocus: false,
  });

export function useSoftProof(productId: string, revision: number, mask: boolean, enabled: boolean) {
  return useQuery({ ...softProofQueryOptions(productId, revision, mask), enabled });
}
