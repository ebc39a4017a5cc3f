import { displaySourcePath } from '../../../../shared/library/source-path';
import { Link } from 'react-router-dom';
import type { OriginalDetail } from '@shared/contracts/originals';
import { Badge } from '../../../components/ui/badge';
import { EmptyState } from '../../../components/ui/empty-state';
import { MotifThumbnail } from '../../motifs/components/motif-thumbnail';

type OriginalMotif = OriginalDetail['motifs'][number];

export function OriginalMotifs({ motifs }: { motifs: OriginalMotif[] }) {
  if (motifs.length === 0) {
    return <EmptyState title="No motifs from this original">Nothing in the file could be cut into a motif; the import report says why.</EmptyState>;
  }
  return (
    <ul className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-4">
      {motifs.map((motif) => (
        <li key={motif.id}>
          <Link
            to={`/library/${motif.id}`}
            className="group flex h-full flex-col gap-2 rounded-lg border border-sand bg-paper p-2 hover:border-tide"
          >
            <MotifThumbnail src={motif.thumbUrl} />
            <span className="min-w-0 px-1">
              <span className="block font-semibold break-words text-ink group-hover:text-tide-deep">{motif.name}</span>
              <span className="block text-sm break-words text-ink-soft">{displaySourcePath(motif.sourcePath)}</span>
              <span className="mt-1 flex flex-wrap gap-1">
                {motif.hiddenInOriginal && <Badge tone="ochre">Hidden in the original</Badge>}
                {motif.linkedExisting && <Badge tone="tide">Already in the library</Badge>}
                {motif.version > 1 && <Badge>Version {motif.version}</Badge>}
                {motif.kind === 'text' && <Badge>Text</Badge>}
              </span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
