import type { Database } from '../../db/client';
import type { ImportReport } from '../../db/schema/index';
import { recordActivity } from './record-activity';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

// The feed's line for a committed import; called inside the import's own transaction.
export function recordOriginalImported(tx: Tx, original: { id: string; studioId: string; name: string; uploadedBy: string | null }, report: ImportReport) {
  return recordActivity(tx, {
    studioId: original.studioId,
    actorId: original.uploadedBy,
    kind: 'original.imported',
    subjectType: 'original',
    subjectId: original.id,
    summary: `imported “${original.name}”: ${plural(report.created, 'new motif')}, ${plural(report.newVersions.length, 'new version')}`,
    data: { created: report.created, newVersions: report.newVersions.length, skipped: report.skipped.length },
  });
}
