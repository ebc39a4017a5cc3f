// Which motifs of the library grid are selected for a bulk edit. Pure, so the click rules are
// tested without a browser. `all` stands for "every motif the current filter shows", loaded or
// not; the bulk edit then sends the filter instead of ids.
export type Selection = {
  readonly all: boolean;
  readonly ids: ReadonlySet<string>;
  /** Where the last plain or toggling click landed; a Shift-click selects from here. */
  readonly anchor: string | null;
};

export const emptySelection: Selection = { all: false, ids: new Set(), anchor: null };

export type ClickKind = 'replace' | 'toggle' | 'range';

type Modifiers = { shiftKey: boolean; ctrlKey: boolean; metaKey: boolean };

// Ctrl on most systems, Cmd on macOS: both toggle, as people expect from file lists.
export function clickKindOf(event: Modifiers): ClickKind {
  if (event.shiftKey) return 'range';
  if (event.ctrlKey || event.metaKey) return 'toggle';
  return 'replace';
}

export const isSelected = (selection: Selection, id: string) => selection.all || selection.ids.has(id);

export const selectedCount = (selection: Selection, total: number) => (selection.all ? total : selection.ids.size);

export const hasSelection = (selection: Selection) => selection.all || selection.ids.size > 0;

function rangeBetween(orderedIds: readonly string[], from: string, to: string): string[] {
  const a = orderedIds.indexOf(from);
  const b = orderedIds.indexOf(to);
  if (a < 0 || b < 0) return [to];
  return orderedIds.slice(Math.min(a, b), Math.max(a, b) + 1);
}

// Leaving "all of the filter" for a hand-made change starts from what is on screen.
const explicit = (selection: Selection, loadedIds: readonly string[]): Set<string> =>
  selection.all ? new Set(loadedIds) : new Set(selection.ids);

export function applyClick(selection: Selection, orderedIds: readonly string[], id: string, kind: ClickKind): Selection {
  if (kind === 'replace') return { all: false, ids: new Set([id]), anchor: id };
  const ids = explicit(selection, orderedIds);
  if (kind === 'toggle') {
    if (ids.has(id)) ids.delete(id);
    else ids.add(id);
    return { all: false, ids, anchor: id };
  }
  for (const each of rangeBetween(orderedIds, selection.anchor ?? id, id)) ids.add(each);
  return { all: false, ids, anchor: selection.anchor ?? id };
}

export const selectAllOfFilter = (): Selection => ({ all: true, ids: new Set(), anchor: null });

// A lasso drawn from `base` (the selection when the drag began): it replaces the selection,
// or with Shift/Ctrl/Cmd held adds to it.
export function lassoSelect(base: Selection, loadedIds: readonly string[], inside: readonly string[], additive: boolean): Selection {
  const ids = additive ? explicit(base, loadedIds) : new Set<string>();
  for (const id of inside) ids.add(id);
  return { all: false, ids, anchor: inside[inside.length - 1] ?? base.anchor };
}

export type GridLayout = {
  columns: number;
  /** Width of one tile and the gap after it, in CSS pixels. */
  columnWidth: number;
  rowHeight: number;
  /** Space after each tile (right and below), which touches no tile. */
  gap: number;
  count: number;
};

export type Rect = { left: number; top: number; right: number; bottom: number };

// Indices of the tiles a rectangle touches, by geometry alone: a virtualised grid has most of
// its tiles unmounted, so they cannot be hit-tested in the DOM.
export function tilesInRect(rect: Rect, layout: GridLayout): number[] {
  const { columns, columnWidth, rowHeight, gap, count } = layout;
  if (columns < 1 || count < 1 || columnWidth <= 0 || rowHeight <= 0) return [];
  const left = Math.max(0, Math.min(rect.left, rect.right));
  const right = Math.max(rect.left, rect.right);
  const top = Math.max(0, Math.min(rect.top, rect.bottom));
  const bottom = Math.max(rect.top, rect.bottom);
  // A start inside the gap after a tile does not touch that tile.
  const after = (edge: number, size: number) => Math.floor(edge / size) + (edge % size > size - gap ? 1 : 0);
  const firstColumn = after(left, columnWidth);
  const lastColumn = Math.min(columns - 1, Math.floor(right / columnWidth));
  const firstRow = after(top, rowHeight);
  const lastRow = Math.min(Math.ceil(count / columns) - 1, Math.floor(bottom / rowHeight));
  const indices: number[] = [];
  for (let row = firstRow; row <= lastRow; row++) {
    for (let column = firstColumn; column <= lastColumn; column++) {
      const index = row * columns + column;
      if (index < count) indices.push(index);
    }
  }
  return indices;
}
