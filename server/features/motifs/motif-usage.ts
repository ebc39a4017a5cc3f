import type { MotifUsage } from '../../../shared/contracts/motifs';

// Where motifs are used. Products and their placements do not exist yet, so today every motif
// is unused and these answer accordingly; the products feature fills them in (a query over its
// placements) and calls recordLibraryChange when placements change, so "most used" and the
// used/unused filter stay fresh. Delete refuses a motif whenever motifUsage lists anything.
export async function motifUsage(_studioId: string, _motifId: string): Promise<MotifUsage[]> {
  return [];
}

// Number of placements per motif, for the motifs given (all of the studio's when omitted).
export async function motifUsageCounts(_studioId: string, _motifIds?: readonly string[]): Promise<Map<string, number>> {
  return new Map();
}
