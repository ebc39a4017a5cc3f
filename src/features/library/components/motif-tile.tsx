import { memo, type MouseEvent } from 'react';
import { Link } from 'react-router-dom';
import type { LibraryMotif } from '@shared/contracts/motifs';
import { classNames } from '../../../components/ui/class-names';
import { MotifThumbnail } from '../../motifs/components/motif-thumbnail';
import type { ClickKind } from '../selection';

type MotifTileProps = {
  motif: LibraryMotif;
  index: number;
  total: number;
  selectable: boolean;
  selected: boolean;
  /** While something is selected, a plain click adds to the selection instead of opening. */
  selecting: boolean;
  /** On the screen as the page opens: its picture is fetched at once, ahead of the rows below. */
  onScreen: boolean;
  onSelect: (id: string, kind: ClickKind) => void;
  onPickColour: (hex: string) => void;
};

const kindFromEvent = (event: MouseEvent, selecting: boolean): ClickKind | null => {
  if (event.shiftKey) return 'range';
  if (event.ctrlKey || event.metaKey) return 'toggle';
  return selecting ? 'toggle' : null;
};

export const MotifTile = memo(function MotifTile({ motif, index, total, selectable, selected, selecting, onScreen, onSelect, onPickColour }: MotifTileProps) {
  const onLinkClick = (event: MouseEvent<HTMLAnchorElement>) => {
    if (!selectable || event.button !== 0) return;
    const kind = kindFromEvent(event, selecting);
    if (!kind) return;
    event.preventDefault();
    onSelect(motif.id, kind);
  };

  return (
    <div
      role="listitem"
      aria-posinset={index + 1}
      aria-setsize={total}
      data-tile
      className={classNames(
        'group relative flex min-w-0 flex-col rounded-lg border p-1.5 transition-colors',
        selected ? 'border-tide bg-tide/10 ring-2 ring-tide' : 'border-sand bg-paper hover:border-tide/60',
        motif.archived && 'opacity-70',
      )}
    >
      <Link
        to={`/library/${motif.id}`}
        data-tile-link
        data-index={index}
        data-motif-id={motif.id}
        draggable={false}
        onClick={onLinkClick}
        className="flex min-w-0 scroll-mt-20 scroll-mb-32 flex-col gap-1.5 rounded-md"
      >
        <MotifThumbnail src={motif.thumbUrl} priority={onScreen ? 'high' : 'low'} />
        <span className="truncate px-1 font-semibold text-ink group-hover:text-tide-deep" title={motif.name}>
          {motif.name}
          {selected && <span className="sr-only">, selected</span>}
        </span>
      </Link>
      {selectable && (
        <input
          type="checkbox"
          tabIndex={-1}
          checked={selected}
          readOnly
          aria-label={`Select ${motif.name}`}
          onClick={(event) => onSelect(motif.id, event.shiftKey ? 'range' : 'toggle')}
          className={classNames(
            'absolute top-3 left-3 size-5 cursor-pointer accent-tide transition-opacity',
            selected || selecting ? 'opacity-100' : 'opacity-0 group-hover:opacity-100 group-focus-within:opacity-100',
          )}
        />
      )}
      <div className="flex h-6 items-center justify-between gap-1 px-1">
        <span className="flex gap-1">
          {motif.colours.slice(0, 5).map((colour) => (
            <button
              key={colour.hex}
              type="button"
              tabIndex={-1}
              title={`Find motifs near ${colour.hex}`}
              aria-label={`Find motifs near ${colour.hex}`}
              onClick={() => onPickColour(colour.hex)}
              className="size-4 rounded-full border border-ink/20 hover:scale-125"
              style={{ backgroundColor: colour.hex }}
            />
          ))}
        </span>
        <span className="flex min-w-0 gap-1 text-xs font-semibold text-ink-soft">
          {motif.colourMatch && <span title="Colour difference (ΔE 2000)">ΔE {motif.colourMatch.deltaE.toFixed(1)}</span>}
          {motif.hiddenInOriginal && <span title="Hidden in its original">Hidden</span>}
          {motif.archived && <span>Archived</span>}
          {motif.rightsStatus === 'unknown' && <span title="Rights not known">Rights?</span>}
        </span>
      </div>
    </div>
  );
});

export function PlaceholderTile() {
  return (
    <div role="listitem" aria-busy="true" className="flex flex-col gap-1.5 rounded-lg border border-sand bg-paper p-1.5">
      <div className="aspect-square animate-pulse rounded-md bg-sand/60" />
      <div className="mx-1 h-4 w-2/3 animate-pulse rounded bg-sand/60" />
      <div className="h-6" />
    </div>
  );
}
