import { useMutation, useQueryClient } from '@tanstack/react-query';
import { studioDataImportReportSchema } from '@shared/contracts/studio-data';
import { apiRequest } from '../../../lib/api-client';
import type { MutationConfig } from '../../../lib/query-client';
import { studioKeys } from './studio-keys';

// The export is a plain download (GET /api/studio/data-export as an attachment); see StudioDataCard.
export const studioDataExportUrl = '/api/studio/data-export';

// 50 MB: the server's limit for this one request.
export const STUDIO_DATA_FILE_LIMIT_BYTES = 50 * 1024 * 1024;

export function importStudioData(document: unknown) {
  return apiRequest('/studio/data-import', { method: 'POST', body: document, schema: studioDataImportReportSchema });
}

export function useImportStudioData({ mutationConfig }: { mutationConfig?: MutationConfig<typeof importStudioData> } = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...restConfig } = mutationConfig ?? {};
  return useMutation({
    ...restConfig,
    mutationFn: importStudioData,
    onSuccess: (...args) => {
      // Everything of the studio changed: library, products, calendar, settings.
      const refreshed = queryClient.invalidateQueries({ queryKey: studioKeys.all });
      onSuccess?.(...args);
      return refreshed;
    },
  });
}
