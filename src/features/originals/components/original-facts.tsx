import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { OriginalSummary } from '@shared/contracts/originals';
import { largestPrintSize } from '@shared/library/print-size';
import { formatDay } from '../../../lib/format';
import { formatBytes } from '../file-check';
import { cutWords, fileKindWords } from '../import-words';
import { StatusBadge } from './status-badge';

// 300 PPI: common practice for print viewed close up.
const PRINT_PPI = 300;

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-sm text-ink-soft">{term}</dt>
      <dd className="font-semibold break-words text-ink tabular-nums">{children}</dd>
    </div>
  );
}

/** A layered PSD (or PSB): flat images and SVG drawings are one motif, whatever the cut. */
export const isLayered = (original: Pick<OriginalSummary, 'fileKind'>) => original.fileKind === 'psd';

export function OriginalFacts({ original, previousName }: { original: OriginalSummary; previousName?: string }) {
  const print = original.width && original.height ? largestPrintSize(original.width, original.height, PRINT_PPI) : null;
  // layers and the way they were cut mean something only for a layered file
  const layered = isLayered(original);
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-4 sm:grid-cols-3 lg:grid-cols-6">
      <Fact term="Status">
        <StatusBadge original={original} />
      </Fact>
      <Fact term="Kind">{fileKindWords[original.fileKind]}</Fact>
      <Fact term="Pixels">{original.width && original.height ? `${original.width} × ${original.height} px` : 'Not read yet'}</Fact>
      <Fact term={`At ${PRINT_PPI} PPI`}>{print ? `${print.widthIn} × ${print.heightIn} in` : '–'}</Fact>
      {layered && <Fact term="Layers">{original.layerCount ?? '–'}</Fact>}
      <Fact term="File size">{formatBytes(original.byteSize)}</Fact>
      {layered && <Fact term="Cut">{cutWords[original.cut].label}</Fact>}
      <Fact term="Motifs">{original.motifCount}</Fact>
      <Fact term="Uploaded">{formatDay(original.createdAt)}</Fact>
      {original.previousOriginalId && (
        <Fact term="New version of">
          <Link to={`/originals/${original.previousOriginalId}`} className="text-tide-deep underline">
            {previousName ?? 'the earlier original'}
          </Link>
        </Fact>
      )}
    </dl>
  );
}
