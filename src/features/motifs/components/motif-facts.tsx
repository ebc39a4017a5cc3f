import { displaySourcePath } from '../../../../shared/library/source-path';
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { MotifDetail } from '@shared/contracts/motifs';
import { printSizesOf } from '@shared/library/print-size';

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5 sm:flex-row sm:gap-3">
      <dt className="text-ink-soft sm:w-40 sm:shrink-0">{term}</dt>
      <dd className="min-w-0 break-words text-ink tabular-nums">{children}</dd>
    </div>
  );
}

const kindWords: Record<MotifDetail['kind'], string> = {
  group: 'A layer group, flattened',
  layer: 'One layer',
  text: 'A text layer',
  image: 'A whole flat image or drawing',
};

// Pixel size and the largest print it makes without enlarging (the server's figures, or the same
// shared helper when an older answer lacks them).
export function MotifFacts({ motif }: { motif: MotifDetail }) {
  const printSizes = motif.printSizes.length > 0 ? motif.printSizes : printSizesOf(motif.width, motif.height);
  const { original } = motif;
  return (
    <dl className="flex flex-col gap-2.5">
      <Fact term="Pixels">
        {motif.width} × {motif.height} px
      </Fact>
      {printSizes.map((size) => (
        <Fact key={size.ppi} term={`Largest print at ${size.ppi} PPI`}>
          {size.widthIn} × {size.heightIn} in <span className="text-ink-soft">({size.widthMm} × {size.heightMm} mm)</span>
        </Fact>
      ))}
      <Fact term="Cut from">
        <Link to={`/originals/${original.id}`} className="font-semibold text-tide-deep underline">
          {original.name}
        </Link>
      </Fact>
      {motif.kind !== 'image' && <Fact term="Layer path">{displaySourcePath(original.sourcePath)}</Fact>}
      <Fact term="Place in the original">
        {original.offsetX}, {original.offsetY} px from the top left
        {original.width && original.height ? ` of ${original.width} × ${original.height} px` : ''}
        {original.position !== null && motif.kind !== 'image' ? `; number ${original.position + 1} in its layer order` : ''}
      </Fact>
      <Fact term="Kind">
        {kindWords[motif.kind]}
        {motif.hiddenInOriginal ? '; hidden in the original' : ''}
      </Fact>
      <Fact term="Opacity and blending">
        {Math.round(motif.opacity * 100)} %, {motif.blendMode}
      </Fact>
      {motif.text && (
        <Fact term="Text">
          “{motif.text.content}”
          {motif.text.fontName ? `, ${motif.text.fontName}` : ''}
          {motif.text.sizePt ? ` ${motif.text.sizePt} pt` : ''}
        </Fact>
      )}
    </dl>
  );
}
