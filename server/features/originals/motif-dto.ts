import type { MotifSummary } from '../../../shared/contracts/originals';
import type { motifs, motifVersions } from '../../db/schema/index';

type MotifRow = typeof motifs.$inferSelect;
type VersionRow = typeof motifVersions.$inferSelect;

export function toMotifSummary(motif: MotifRow, version: VersionRow): MotifSummary {
  const v = version.version;
  return {
    id: motif.id,
    name: motif.name,
    sourcePath: motif.sourcePath,
    kind: motif.kind,
    hiddenInOriginal: motif.hiddenInOriginal,
    archived: motif.archived,
    version: v,
    width: version.width,
    height: version.height,
    offsetX: version.offsetX,
    offsetY: version.offsetY,
    opacity: version.opacity,
    blendMode: version.blendMode,
    colours: version.colours,
    tags: motif.tags,
    suggestedTags: motif.suggestedTags,
    text: version.text ?? null,
    originalId: motif.originalId,
    // The version in the address lets browsers cache images for good.
    thumbUrl: `/api/motifs/${motif.id}/image?size=thumb&version=${v}`,
    imageUrl: `/api/motifs/${motif.id}/image?version=${v}`,
    createdAt: motif.createdAt.toISOString(),
    rightsStatus: motif.rightsStatus,
    attributionRequired: motif.attributionRequired,
    updatedAt: motif.updatedAt.toISOString(),
  };
}
