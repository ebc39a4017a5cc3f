import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, motifVersions, originalMotifs, originals, type ImportReport } from '../../db/schema/index';
import { recordOriginalImported } from '../activity/record-import';
import { recordLibraryChange } from '../motifs/library-changes';
import type { MatchDecision } from './motif-matching';
import { motifPngKey, motifThumbKey } from './motif-keys';
import type { OriginalRow } from './originals.repository';
import type { UnpackedMotif, UnpackResult } from './unpack/unpack-result';

export type ImportToCommit = {
  original: OriginalRow;
  result: UnpackResult;
  decisions: MatchDecision[];
  // the first index of each new content hash: later identical layers link to it
  firstNewIndex: Map<string, number>;
  pngBytes: Map<string, number>;
  // filled in here with what each motif became
  report: ImportReport;
};

type MotifInsert = typeof motifs.$inferInsert;
type VersionInsert = typeof motifVersions.$inferInsert;
type LinkInsert = typeof originalMotifs.$inferInsert;

// Rows per INSERT: 1,000 motif versions use ~17,000 of Postgres's 65,535 bind parameters.
const ROWS_PER_INSERT = 1000;

// Everything the user sees of an import appears in this one transaction, or not at all.
// False when the original is no longer ours to finish (deleted, or claimed by another worker).
export async function commitImport(db: Database, toCommit: ImportToCommit): Promise<boolean> {
  const { original } = toCommit;
  return db.transaction(async (tx) => {
    const [still] = await tx.select({ status: originals.status }).from(originals).where(eq(originals.id, original.id)).for('update');
    if (!still || still.status !== 'importing') return false;
    const rows = importRows(toCommit);
    // One multi-row INSERT per table (a round trip each, not one per motif); motifs first, as
    // versions and links refer to them.
    for (const chunk of chunks(rows.newMotifs)) await tx.insert(motifs).values(chunk);
    for (const chunk of chunks(rows.versions)) await tx.insert(motifVersions).values(chunk);
    for (const update of rows.motifUpdates) {
      await tx.update(motifs).set({ ...update.set, updatedAt: new Date() }).where(eq(motifs.id, update.motifId));
    }
    for (const chunk of chunks(rows.links)) await tx.insert(originalMotifs).values(chunk).onConflictDoNothing();
    const { result, report } = toCommit;
    await tx
      .update(originals)
      .set({
        status: 'ready',
        phase: 'done',
        percent: 100,
        width: result.document.width,
        height: result.document.height,
        layerCount: result.document.layerCount,
        report,
        importedAt: new Date(),
      })
      .where(eq(originals.id, original.id));
    await recordOriginalImported(tx, original, report);
    // Last in the transaction: tells every web process's library which motifs to re-read.
    await recordLibraryChange(tx, original.studioId, rows.links.map((l) => l.motifId));
    return true;
  });
}

type ImportRows = {
  newMotifs: MotifInsert[];
  versions: VersionInsert[];
  motifUpdates: { motifId: string; set: Pick<MotifInsert, 'currentVersion' | 'name' | 'sourcePath' | 'hiddenInOriginal'> }[];
  links: LinkInsert[];
};

// What each cut motif becomes in the tables, and in the report. New motifs get their ids here,
// so versions and links can name them before anything is written.
function importRows({ original, result, decisions, firstNewIndex, pngBytes, report }: ImportToCommit): ImportRows {
  const originalId = original.id;
  const rows: ImportRows = { newMotifs: [], versions: [], motifUpdates: [], links: [] };
  const newIds = new Map<number, string>();
  const versionRow = (m: UnpackedMotif, motifId: string, version: number): VersionInsert => ({
    motifId,
    studioId: original.studioId,
    version,
    originalId,
    contentHash: m.contentHash,
    dhash: m.dhash,
    pngKey: motifPngKey(original.studioId, m.contentHash),
    thumbKey: motifThumbKey(original.studioId, m.contentHash),
    pngBytes: pngBytes.get(m.contentHash) ?? 0,
    width: m.width,
    height: m.height,
    offsetX: m.left,
    offsetY: m.top,
    opacity: m.opacity,
    blendMode: m.blendMode,
    text: m.text ?? null,
    colours: m.colours,
  });
  result.motifs.forEach((m, i) => {
    const d = decisions[i];
    const link = { originalId, sourcePath: m.sourcePath, position: i };
    if (d.kind === 'new') {
      const first = firstNewIndex.get(m.contentHash)!;
      if (first !== i) {
        rows.links.push({ ...link, motifId: newIds.get(first)!, version: 1, linkedExisting: true });
        report.linkedExisting.push({ sourcePath: m.sourcePath, motifId: newIds.get(first)!, motifName: result.motifs[first].name });
        return;
      }
      const id = randomUUID();
      newIds.set(i, id);
      rows.newMotifs.push({
        id,
        studioId: original.studioId,
        originalId,
        name: m.name,
        sourcePath: m.sourcePath,
        kind: original.fileKind === 'psd' ? m.kind : 'image',
        hiddenInOriginal: m.hidden,
        tags: m.suggestedTags,
        suggestedTags: m.suggestedTags,
      });
      rows.versions.push(versionRow(m, id, 1));
      rows.links.push({ ...link, motifId: id, version: 1 });
      report.created++;
    } else if (d.kind === 'new-version') {
      rows.versions.push(versionRow(m, d.motifId, d.version));
      rows.motifUpdates.push({ motifId: d.motifId, set: { currentVersion: d.version, name: m.name, sourcePath: m.sourcePath, hiddenInOriginal: m.hidden } });
      rows.links.push({ ...link, motifId: d.motifId, version: d.version });
      report.newVersions.push({ sourcePath: m.sourcePath, motifId: d.motifId, version: d.version });
    } else if (d.kind === 'unchanged') {
      rows.links.push({ ...link, motifId: d.motifId, version: d.version });
      report.unchanged.push({ sourcePath: m.sourcePath, motifId: d.motifId });
    } else {
      rows.links.push({ ...link, motifId: d.motifId, version: d.version, linkedExisting: true });
      report.linkedExisting.push({ sourcePath: m.sourcePath, motifId: d.motifId, motifName: d.name });
    }
  });
  return rows;
}

function chunks<T>(items: T[]): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += ROWS_PER_INSERT) out.push(items.slice(i, i + ROWS_PER_INSERT));
  return out;
}
