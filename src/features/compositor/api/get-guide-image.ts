import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiErrorFromText } from '../../../lib/api-client';
import { templatesQueryOptions } from '../../products/api/get-templates';
import type { MotifBitmap } from '../render/image-cache';
import { compositorKeys } from './compositor-keys';

/** The printer's guide image at the address the template list gives (GET /api/templates/:id/guide-image?v=…). */
export async function getGuideImage({ url, signal }: { url: string; signal?: AbortSignal }): Promise<MotifBitmap> {
  let response: Response;
  try {
    response = await fetch(url, { credentials: 'same-origin', signal });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw apiErrorFromText(0, '');
  }
  if (!response.ok) throw apiErrorFromText(response.status, await response.text().catch(() => ''));
  return createImageBitmap(await response.blob());
}

// The address carries the stored image's stamp, so one address is one image for good.
export const guideImageQueryOptions = (url: string) =>
  queryOptions({
    queryKey: compositorKeys.guideImage(url),
    queryFn: ({ signal }) => getGuideImage({ url, signal }),
    staleTime: Infinity,
    gcTime: 5 * 60_000,
    refetchOnWindowFocus: false,
  });

/** The guide image of a template, or null while it loads and when the template has none. */
export function useGuideImage(templateId: string): MotifBitmap | null {
  const templates = useQuery(templatesQueryOptions());
  const url = templates.data?.templates.find((t) => t.template.id === templateId)?.guideImageUrl ?? null;
  const image = useQuery({ ...guideImageQueryOptions(url ?? ''), enabled: url !== null });
  return url ? image.data ?? null : null;
}
