import type { QueryClient } from '@tanstack/react-query';
import { salesImportsQueryOptions } from '../api/get-sales-imports';
import { salesSummaryQueryOptions } from '../api/get-sales-summary';
import { salesSettingsQueryOptions } from '../api/get-sales-settings';
import { periodPresets } from '../components/period-picker';

// Starts the page's first questions (the last 12 months under the studio's rule) while its code loads.
export const salesLoader = (queryClient: QueryClient) => async () => {
  await Promise.all([
    queryClient.prefetchQuery(salesSummaryQueryOptions({ ...periodPresets['12m'].period(), split: undefined, currency: undefined })),
    queryClient.prefetchQuery(salesSettingsQueryOptions()),
    queryClient.prefetchQuery(salesImportsQueryOptions()),
  ]);
  return null;
};
