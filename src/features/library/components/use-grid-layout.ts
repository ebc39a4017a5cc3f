import { useLayoutEffect, useState, type RefObject } from 'react';

// Tiles at least 150 px wide (a thumbnail still readable at a glance), 14 px apart; the caption
// under each picture (name, colour dots) is a fixed height so every row is the same height.
export const MIN_TILE_PX = 150;
export const TILE_GAP_PX = 14;
export const TILE_CAPTION_PX = 58;

export type TileGeometry = { columns: number; tileWidth: number; rowHeight: number };

export function tileGeometry(width: number): TileGeometry {
  const columns = Math.max(2, Math.floor((width + TILE_GAP_PX) / (MIN_TILE_PX + TILE_GAP_PX)));
  const tileWidth = Math.max(0, (width - TILE_GAP_PX * (columns - 1)) / columns);
  return { columns, tileWidth, rowHeight: Math.round(tileWidth + TILE_CAPTION_PX + TILE_GAP_PX) };
}

// The grid's width, and its top in page coordinates (the window virtualiser's scroll margin).
// `measured` stays false until the first measurement: rows drawn before it would be laid out
// for a guessed width, then thrown away.
export function useGridBox(ref: RefObject<HTMLElement | null>) {
  const [width, setWidth] = useState(0);
  const [top, setTop] = useState(0);
  const [measured, setMeasured] = useState(false);
  useLayoutEffect(() => {
    const element = ref.current;
    if (!element) return;
    const measure = () => {
      const box = element.getBoundingClientRect();
      setWidth(box.width);
      setTop(box.top + window.scrollY);
      setMeasured(true);
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    // Filters or messages opening above the grid move it down without changing its size.
    observer.observe(document.body);
    return () => observer.disconnect();
  }, [ref]);
  return { width, top, measured };
}
