import { describe, expect, it } from 'vitest';
import {
  applyClick,
  clickKindOf,
  emptySelection,
  isSelected,
  lassoSelect,
  selectAllOfFilter,
  selectedCount,
  tilesInRect,
  type Selection,
} from './selection';

const ids = ['puffin', 'basket', 'kite', 'wave', 'title', 'fox'];
const chosen = (selection: Selection) => [...selection.ids].sort();
const none = { shiftKey: false, ctrlKey: false, metaKey: false };

describe('library selection', () => {
  it('reads Shift as a range, Ctrl or Cmd as a toggle and a plain click as "only this one"', () => {
    expect(clickKindOf(none)).toBe('replace');
    expect(clickKindOf({ ...none, ctrlKey: true })).toBe('toggle');
    expect(clickKindOf({ ...none, metaKey: true })).toBe('toggle');
    expect(clickKindOf({ ...none, shiftKey: true, metaKey: true })).toBe('range');
  });

  it('a plain click selects only the clicked motif', () => {
    const two = applyClick(applyClick(emptySelection, ids, 'kite', 'toggle'), ids, 'wave', 'toggle');
    expect(chosen(applyClick(two, ids, 'fox', 'replace'))).toEqual(['fox']);
  });

  it('Ctrl-click adds a motif and a second Ctrl-click takes it away again', () => {
    let selection = applyClick(emptySelection, ids, 'puffin', 'replace');
    selection = applyClick(selection, ids, 'wave', 'toggle');
    expect(chosen(selection)).toEqual(['puffin', 'wave']);
    selection = applyClick(selection, ids, 'puffin', 'toggle');
    expect(chosen(selection)).toEqual(['wave']);
  });

  it('Shift-click selects every motif between the last click and this one, in grid order, either direction', () => {
    const fromBasket = applyClick(emptySelection, ids, 'basket', 'replace');
    expect(chosen(applyClick(fromBasket, ids, 'title', 'range'))).toEqual(['basket', 'kite', 'title', 'wave']);
    const fromTitle = applyClick(emptySelection, ids, 'title', 'replace');
    expect(chosen(applyClick(fromTitle, ids, 'kite', 'range'))).toEqual(['kite', 'title', 'wave']);
  });

  it('keeps the range anchor, so a second Shift-click extends from the same place', () => {
    let selection = applyClick(emptySelection, ids, 'kite', 'replace');
    selection = applyClick(selection, ids, 'title', 'range');
    selection = applyClick(selection, ids, 'fox', 'range');
    expect(chosen(selection)).toEqual(['fox', 'kite', 'title', 'wave']);
    expect(selection.anchor).toBe('kite');
  });

  it('"select all of this filter" counts every match, also those not loaded yet', () => {
    const all = selectAllOfFilter();
    expect(isSelected(all, 'not-loaded-yet')).toBe(true);
    expect(selectedCount(all, 10_000)).toBe(10_000);
  });

  it('Ctrl-click after "select all" leaves out just that motif from what is on screen', () => {
    const selection = applyClick(selectAllOfFilter(), ids, 'kite', 'toggle');
    expect(selection.all).toBe(false);
    expect(chosen(selection)).toEqual(['basket', 'fox', 'puffin', 'title', 'wave']);
  });

  it('a lasso replaces the selection, or adds to it with a modifier held', () => {
    const base = applyClick(emptySelection, ids, 'fox', 'replace');
    expect(chosen(lassoSelect(base, ids, ['puffin', 'basket'], false))).toEqual(['basket', 'puffin']);
    expect(chosen(lassoSelect(base, ids, ['puffin', 'basket'], true))).toEqual(['basket', 'fox', 'puffin']);
  });
});

describe('lasso geometry', () => {
  // 4 columns of 100 px (90 px tile, 10 px gap), rows of 150 px, 10 tiles: the last row holds 2.
  const layout = { columns: 4, columnWidth: 100, rowHeight: 150, gap: 10, count: 10 };

  it('finds the tiles a rectangle touches, whichever corner the drag started from', () => {
    expect(tilesInRect({ left: 150, top: 10, right: 250, bottom: 160 }, layout)).toEqual([1, 2, 5, 6]);
    expect(tilesInRect({ left: 250, top: 160, right: 150, bottom: 10 }, layout)).toEqual([1, 2, 5, 6]);
  });

  it('does not count a tile whose gap the drag started in', () => {
    expect(tilesInRect({ left: 95, top: 145, right: 120, bottom: 200 }, layout)).toEqual([5]);
  });

  it('stops at the last tile of a short last row and at the grid edges', () => {
    expect(tilesInRect({ left: -50, top: 290, right: 5000, bottom: 5000 }, layout)).toEqual([4, 5, 6, 7, 8, 9]);
  });

  it('finds nothing in an empty grid', () => {
    expect(tilesInRect({ left: 0, top: 0, right: 500, bottom: 500 }, { ...layout, count: 0 })).toEqual([]);
  });
});
