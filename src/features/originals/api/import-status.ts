import type { OriginalSummary } from '@shared/contracts/originals';

export const isImporting = (original: Pick<OriginalSummary, 'status'>) =>
  original.status === 'queued' || original.status === 'importing';

// How often to ask about an import in progress: quick at first, calmer for long imports.
export function importPollInterval(startedAt: number, now = Date.now()): number {
  const seconds = (now - startedAt) / 1000;
  return seconds < 30 ? 700 : seconds < 120 ? 1500 : 3000;
}
