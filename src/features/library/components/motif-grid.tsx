import { useWindowVirtualizer } from '@tanstack/react-virtual';
import { useEffect, useRef, type KeyboardEvent } from 'react';
import type { LibraryMotif } from '@shared/contracts/motifs';
import { classNames } from '../../../components/ui/class-names';
import { isSelected, tilesInRect, type ClickKind, type Rect, type Selection } from '../selection';
import type { VisibleRange } from '../use-library-results';
import { MotifTile, PlaceholderTile } from './motif-tile';
import { TILE_GAP_PX, tileGeometry, useGridBox } from './use-grid-layout';
import { useLasso } from './use-lasso';

type MotifGridProps = {
  total: number;
  motifAt: (index: number) => LibraryMotif | undefined;
  onVisibleRange: (range: VisibleRange) => void;
  selectable: boolean;
  selection: Selection;
  selecting: boolean;
  onSelect: (id: string, kind: ClickKind) => void;
  onLasso: (insideIds: string[], additive: boolean) => void;
  onLassoStart: () => void;
  onSelectAll: () => void;
  onClearSelection: () => void;
  onPickColour: (hex: string) => void;
  dimmed?: boolean;
  label: string;
};

const moves: Record<string, (index: number, columns: number) => number> = {
  ArrowRight: (i) => i + 1,
  ArrowLeft: (i) => i - 1,
  ArrowDown: (i, c) => i + c,
  ArrowUp: (i, c) => i - c,
};

// Only the rows near the screen exist in the page; the list's height stands for all of them,
// so the scrollbar is true to the whole library.
export function MotifGrid(props: MotifGridProps) {
  const { total, motifAt, onVisibleRange, selectable, selection, selecting, onSelect, dimmed, label } = props;
  const gridRef = useRef<HTMLDivElement>(null);
  const { width, top, measured } = useGridBox(gridRef);
  const { columns, rowHeight } = tileGeometry(width);
  const rowCount = Math.ceil(total / columns);

  const virtualizer = useWindowVirtualizer({
    count: rowCount,
    estimateSize: () => rowHeight,
    overscan: 3,
    scrollMargin: top,
    // Room for the bulk bar along the bottom, so a tile reached by keyboard is not hidden under it.
    scrollPaddingEnd: 120,
  });
  useEffect(() => virtualizer.measure(), [virtualizer, rowHeight]);
  const rows = measured ? virtualizer.getVirtualItems() : [];
  // Rows on the screen now load their pictures first; the overscan rows below wait their turn.
  const viewTop = virtualizer.scrollOffset ?? 0;
  const viewBottom = viewTop + (virtualizer.scrollRect?.height ?? window.innerHeight);

  const first = rows.length ? rows[0].index * columns : 0;
  const last = rows.length ? Math.min(total, (rows[rows.length - 1].index + 1) * columns) - 1 : -1;
  useEffect(() => onVisibleRange({ first, last }), [first, last, onVisibleRange]);

  const lasso = useLasso(gridRef, selectable, {
    onLassoStart: props.onLassoStart,
    onLasso: (rect: Rect, additive: boolean) => {
      const inside = tilesInRect(rect, { columns, columnWidth: (width + TILE_GAP_PX) / columns, rowHeight, gap: TILE_GAP_PX, count: total });
      props.onLasso(inside.map((i) => motifAt(i)?.id).filter((id): id is string => Boolean(id)), additive);
    },
  });

  const focusTile = (index: number) => {
    virtualizer.scrollToIndex(Math.floor(index / columns), { align: 'auto' });
    // The row may only exist after the virtualiser has drawn it.
    const tryFocus = (attempts: number) => {
      const link = gridRef.current?.querySelector<HTMLElement>(`[data-tile-link][data-index="${index}"]`);
      if (link) link.focus();
      else if (attempts > 0) requestAnimationFrame(() => tryFocus(attempts - 1));
    };
    requestAnimationFrame(() => tryFocus(5));
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const target = event.target as HTMLElement;
    const index = Number(target.dataset.index);
    if (!target.hasAttribute('data-tile-link') || Number.isNaN(index)) return;
    const move = moves[event.key];
    if (move) {
      const next = move(index, columns);
      if (next >= 0 && next < total) {
        event.preventDefault();
        focusTile(next);
      }
    } else if (selectable && event.key === ' ') {
      event.preventDefault();
      const id = target.dataset.motifId;
      if (id) onSelect(id, event.shiftKey ? 'range' : 'toggle');
    } else if (selectable && event.key.toLowerCase() === 'a' && (event.ctrlKey || event.metaKey)) {
      event.preventDefault();
      props.onSelectAll();
    } else if (selectable && event.key === 'Escape' && selecting) {
      event.preventDefault();
      props.onClearSelection();
    }
  };

  return (
    <div
      ref={gridRef}
      role="list"
      aria-label={label}
      aria-busy={dimmed || undefined}
      onKeyDown={onKeyDown}
      {...lasso.handlers}
      className={classNames('relative select-none transition-opacity', dimmed && 'opacity-60')}
      style={{ height: virtualizer.getTotalSize() }}
    >
      {rows.map((row) => {
        const start = row.index * columns;
        const count = Math.min(columns, total - start);
        const onScreen = row.end > viewTop && row.start < viewBottom;
        return (
          <div
            key={row.key}
            role="none"
            className="absolute inset-x-0 top-0 grid"
            style={{
              transform: `translateY(${row.start - virtualizer.options.scrollMargin}px)`,
              height: rowHeight - TILE_GAP_PX,
              gridTemplateColumns: `repeat(${columns}, minmax(0, 1fr))`,
              columnGap: TILE_GAP_PX,
            }}
          >
            {Array.from({ length: count }, (_, offset) => {
              const index = start + offset;
              const motif = motifAt(index);
              return motif ? (
                <MotifTile
                  key={motif.id}
                  motif={motif}
                  index={index}
                  total={total}
                  selectable={selectable}
                  selected={isSelected(selection, motif.id)}
                  selecting={selecting}
                  onScreen={onScreen}
                  onSelect={onSelect}
                  onPickColour={props.onPickColour}
                />
              ) : (
                <PlaceholderTile key={`placeholder-${index}`} />
              );
            })}
          </div>
        );
      })}
      {lasso.rect && (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute z-10 rounded-sm border-2 border-tide bg-tide/15"
          style={{
            left: lasso.rect.left,
            top: lasso.rect.top,
            width: lasso.rect.right - lasso.rect.left,
            height: lasso.rect.bottom - lasso.rect.top,
          }}
        />
      )}
    </div>
  );
}
