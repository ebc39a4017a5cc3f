import { mapPlacements, type Placement } from '@shared/scene';
import { Button } from '../../../components/ui/button';
import type { ProductEditor } from '../editor';
import { motifFromRepeat, repeatFromMotif } from '../repeat-convert';
import { NumberField } from './number-field';

export function RepeatFields({ editor, p }: { editor: ProductEditor; p: Placement }) {
  const ids = [p.id];
  const swap = (fn: (q: Placement) => Placement) => editor.change((l) => mapPlacements(l, ids, fn));
  if (p.type === 'motif') {
    return (
      <section className="mb-4">
        <Button size="sm" variant="secondary" onClick={() => swap((q) => (q.type === 'motif' ? repeatFromMotif(q) : q))}>Tile across the print area</Button>
      </section>
    );
  }
  if (p.type !== 'repeat') return null;
  return (
    <section className="mb-4 space-y-1.5">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Pattern</h3>
      <NumberField label="Gap across" value={p.spacingX} unit="px" digits={0} onCommit={(v) => v >= 0 && swap((q) => (q.type === 'repeat' ? { ...q, spacingX: v } : q))} />
      <NumberField label="Gap down" value={p.spacingY} unit="px" digits={0} onCommit={(v) => v >= 0 && swap((q) => (q.type === 'repeat' ? { ...q, spacingY: v } : q))} />
      <label className="flex items-center gap-2">
        <input type="checkbox" checked={p.halfDrop} onChange={(e) => swap((q) => (q.type === 'repeat' ? { ...q, halfDrop: e.target.checked } : q))} />
        Half-drop (every other column drops half a step)
      </label>
      <p className="text-xs text-ink-soft">Move the pattern to shift where the tiles fall.</p>
      <Button size="sm" variant="secondary" onClick={() => swap((q) => (q.type === 'repeat' ? motifFromRepeat(q) : q))}>Back to a single motif</Button>
    </section>
  );
}
