import type { SalesSummaryQuery } from '@shared/contracts/sales';

// General to specific, so invalidating `all` refreshes every sales view after an import.
export const salesKeys = {
  all: ['sales'] as const,
  summaries: () => [...salesKeys.all, 'summary'] as const,
  summary: (query: SalesSummaryQuery) => [...salesKeys.summaries(), query] as const,
  motif: (motifId: string, query: SalesSummaryQuery) => [...salesKeys.all, 'motif', motifId, query] as const,
  imports: () => [...salesKeys.all, 'imports'] as const,
  settings: () => [...salesKeys.all, 'settings'] as const,
};
