import { Link } from 'react-router-dom';
import type { MotifSummary } from '@shared/contracts/originals';
import { writeLibraryQuery, emptyLibraryQuery } from '@shared/library/library-address';

// Each main colour with its share of the motif's pixels; choosing one searches the library by it.
export function ColourSwatches({ colours }: { colours: MotifSummary['colours'] }) {
  if (colours.length === 0) return <p className="text-ink-soft">No colours were measured for this motif.</p>;
  return (
    <ul className="grid grid-cols-2 gap-2 sm:grid-cols-3">
      {colours.map((colour) => (
        <li key={colour.hex}>
          <Link
            to={`/library?${writeLibraryQuery({ ...emptyLibraryQuery, colour: colour.hex }).toString()}`}
            className="flex items-center gap-2 rounded-md border border-sand bg-paper p-1.5 hover:border-tide"
            aria-label={`${colour.hex}, ${Math.round(colour.share * 100)} % of the motif: find motifs with this colour`}
          >
            <span className="size-9 shrink-0 rounded border border-ink/15" style={{ backgroundColor: colour.hex }} aria-hidden="true" />
            <span className="min-w-0">
              <span className="block font-mono text-sm text-ink">{colour.hex}</span>
              <span className="block text-sm text-ink-soft tabular-nums">{Math.round(colour.share * 100)} %</span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
