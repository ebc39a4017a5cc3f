import { eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { motifs, motifVersions, originalMotifs, originals, type ImportReport } from '../../db/schema/index';
import { recordLibraryChange } from '../motifs/library-changes';
import type { MatchDecision } from './motif-matching';
import { motifPngKey, motifThumbKey } from './motif-keys';
import type { OriginalRow } from './originals.repository';
import type { UnpackResult } from './unpack/unpack-result';

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

// Everything the user sees of an import appears in this one transaction, or not at all.
// False when the original is no longer ours to finish (deleted, or claimed by another worker).
export async function commitImport(db: Database, { original, result, decisions, firstNewIndex, pngBytes, report }: ImportToCommit): Promise<boolean> {
  const originalId = original.id;
  return db.transaction(async (tx) => {
    const [still] = await tx.select({ status: originals.status }).from(originals).where(eq(originals.id, originalId)).for('update');
    if (!still || still.status !== 'importing') return false;
    const newIds = new Map<number, string>();
    const links: (typeof originalMotifs.$inferInsert)[] = [];
    for (let i = 0; i < result.motifs.length; i++) {
      const m = result.motifs[i];
      const d = decisions[i];
      const versionRow = (motifId: string, version: number) => ({
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
      if (d.kind === 'new') {
        const first = firstNewIndex.get(m.contentHash)!;
        if (first !== i) {
          links.push({ originalId, motifId: newIds.get(first)!, version: 1, sourcePath: m.sourcePath, position: i, linkedExisting: true });
          report.linkedExisting.push({ sourcePath: m.sourcePath, motifId: newIds.get(first)!, motifName: result.motifs[first].name });
          continue;
        }
        const [row] = await tx
          .insert(motifs)
          .values({
            studioId: original.studioId,
            originalId,
            name: m.name,
            sourcePath: m.sourcePath,
            kind: original.fileKind === 'psd' ? m.kind : 'image',
            hiddenInOriginal: m.hidden,
            tags: m.suggestedTags,
            suggestedTags: m.suggestedTags,
          })
          .returning({ id: motifs.id });
        newIds.set(i, row.id);
        await tx.insert(motifVersions).values(versionRow(row.id, 1));
        links.push({ originalId, motifId: row.id, version: 1, sourcePath: m.sourcePath, position: i });
        report.created++;
      } else if (d.kind === 'new-version') {
        await tx.insert(motifVersions).values(versionRow(d.motifId, d.version));
        await tx
          .update(motifs)
          .set({ currentVersion: d.version, name: m.name, sourcePath: m.sourcePath, hiddenInOriginal: m.hidden, updatedAt: new Date() })
          .where(eq(motifs.id, d.motifId));
        links.push({ originalId, motifId: d.motifId, version: d.version, sourcePath: m.sourcePath, position: i });
        report.newVersions.push({ sourcePath: m.sourcePath, motifId: d.motifId, version: d.version });
      } else if (d.kind === 'unchanged') {
        links.push({ originalId, motifId: d.motifId, version: d.version, sourcePath: m.sourcePath, position: i });
        report.unchanged.push({ sourcePath: m.sourcePath, motifId: d.motifId });
      } else {
        links.push({ originalId, motifId: d.motifId, version: d.version, sourcePath: m.sourcePath, position: i, linkedExisting: true });
        report.linkedExisting.push({ sourcePath: m.sourcePath, motifId: d.motifId, motifName: d.name });
      }
    }
    if (links.length) await tx.insert(originalMotifs).values(links).onConflictDoNothing();
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
      .where(eq(originals.id, originalId));
    // Last in the transaction: tells every web process's library which motifs to re-read.
    await recordLibraryChange(tx, original.studioId, links.map((l) => l.motifId));
    return true;
  });
}
