import type { ReactNode } from 'react';
import {
  alignPlacements, blendModeSchema, distributePlacements, effectivePpi, flipPlacements, mapPlacements,
  removePlacements, setHidden, setLocked, setRotation, type Alignment, type Placement,
} from '@shared/scene';
import type { Recolour } from '@shared/colour';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select-field';
import type { ProductEditor } from '../editor';
import { placedSizePx, ppiLevel, pxToUnit } from '../placement-measures';
import { blendModeLabels } from '../render/blend-modes';
import { NumberField } from './number-field';
import { RecolourFields } from './recolour-fields';
import { RepeatFields } from './repeat-fields';
import { TextFields } from './text-fields';
import { useEditorSelector } from './use-editor-state';

export function Inspector({ editor }: { editor: ProductEditor }) {
  const selected = useEditorSelector(editor, (s) => s.scene.layout.placements.filter((p) => s.selection.includes(p.id)));
  const unit = useEditorSelector(editor, (s) => s.rulerUnit);
  const selection = useEditorSelector(editor, (s) => s.selection);
  return (
    <aside aria-label="Selection" className="min-h-0 flex-1 overflow-y-auto border-l border-sand bg-paper p-3 text-sm">
      {selected.length === 0 && <p className="text-ink-soft">Pick a placement on the product to see and change its size, turn and colour.</p>}
      {selected.length === 1 && <SinglePlacement editor={editor} p={selected[0]} unit={unit} />}
      {selected.length > 1 && <SeveralPlacements editor={editor} ids={selection} />}
    </aside>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className="mb-4 space-y-1.5">
      <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">{title}</h3>
      {children}
    </section>
  );
}

function SinglePlacement({ editor, p, unit }: { editor: ProductEditor; p: Placement; unit: 'in' | 'mm' }) {
  const dpi = editor.template.dpi;
  const ids = [p.id];
  const size = placedSizePx(p);
  const edit = (fn: (q: Placement) => Placement) => editor.change((l) => mapPlacements(l, ids, fn));
  const live = (fn: (q: Placement) => Placement) => {
    editor.beginGesture();
    editor.previewGesture((l) => mapPlacements(l, ids, fn));
  };
  const done = () => editor.commitGesture();
  const setWidth = (px: number) => {
    if (px > 0 && p.type !== 'text') edit((q) => (q.type === 'text' ? q : { ...q, scale: (q.scale * px) / size.width }));
  };
  const ppi = effectivePpi(p, editor.template);
  const level = ppi === null ? null : ppiLevel(ppi, dpi);
  const u = (px: number) => pxToUnit(px, dpi, unit);
  const disabled = p.locked;

  return (
    <div>
      <h2 className="mb-3 text-base font-semibold text-ink">{p.type === 'text' ? 'Text' : p.type === 'repeat' ? 'Repeat' : 'Motif'}</h2>
      <Section title="Position (centre)">
        <NumberField label="Across" value={p.x} unit="px" disabled={disabled} onCommit={(x) => edit((q) => ({ ...q, x }))} />
        <NumberField label="Down" value={p.y} unit="px" disabled={disabled} onCommit={(y) => edit((q) => ({ ...q, y }))} />
        <p className="text-xs text-ink-soft">{`${u(p.x).toFixed(2)} × ${u(p.y).toFixed(2)} ${unit} from the file’s corner`}</p>
      </Section>
      <Section title="Size">
        <NumberField label="Width" value={size.width} unit="px" disabled={disabled || p.type === 'text'} onCommit={setWidth} />
        <p className="text-xs text-ink-soft">{`${size.width.toFixed(0)} × ${size.height.toFixed(0)} px · ${u(size.width).toFixed(2)} × ${u(size.height).toFixed(2)} ${unit}`}</p>
        {p.type !== 'text' && (
          <NumberField label="Scale" value={p.scale * 100} unit="%" disabled={disabled} onCommit={(s) => s > 0 && edit((q) => (q.type === 'text' ? q : { ...q, scale: s / 100 }))} />
        )}
        {ppi !== null && (
          <p data-testid="effective-ppi" className={level === 'fine' ? 'text-xs text-kelp' : level === 'below-template' ? 'text-xs font-semibold text-ochre' : 'text-xs font-semibold text-rust'}>
            Prints at {Math.round(ppi)} PPI
            {level === 'below-template' && ` — below the template’s ${dpi} DPI`}
            {level === 'too-low' && ' — too low, it will look soft; make it smaller'}
          </p>
        )}
      </Section>
      <Section title="Turn and mirror">
        <NumberField label="Turn" value={p.rotationDeg} unit="°" disabled={disabled} onCommit={(deg) => editor.change((l) => setRotation(l, ids, deg))} />
        <div className="flex gap-2">
          <Button size="sm" variant="secondary" disabled={disabled} aria-pressed={p.flipX} onClick={() => editor.change((l) => flipPlacements(l, ids, 'horizontal'))}>Mirror left–right</Button>
          <Button size="sm" variant="secondary" disabled={disabled} aria-pressed={p.flipY} onClick={() => editor.change((l) => flipPlacements(l, ids, 'vertical'))}>Upside down</Button>
        </div>
      </Section>
      <Section title="Mixing">
        <label className="block text-xs text-ink-soft">
          Opacity: {Math.round(p.opacity * 100)} %
          <input type="range" min={0} max={100} value={Math.round(p.opacity * 100)} className="block w-full"
            onChange={(e) => live((q) => ({ ...q, opacity: Number(e.target.value) / 100 }))} onPointerUp={done} onKeyUp={done} onBlur={done} />
        </label>
        <Select aria-label="Blend mode" value={p.blendMode} className="border-sand text-sm"
          options={blendModeSchema.options.map((m) => ({ value: m, label: blendModeLabels[m] }))}
          onChange={(e) => edit((q) => ({ ...q, blendMode: blendModeSchema.parse(e.target.value) }))} />
      </Section>
      {p.type === 'text' && <TextFields editor={editor} p={p} />}
      <RepeatFields editor={editor} p={p} />
      {p.type !== 'text' && (
        <div className="mb-4">
          <RecolourFields value={p.recolour as Recolour} onDone={done}
            onChange={(recolour) => live((q) => (q.type === 'text' ? q : { ...q, recolour }))} />
        </div>
      )}
      <Section title="Keep">
        <label className="flex items-center gap-2"><input type="checkbox" checked={p.locked} onChange={(e) => editor.change((l) => setLocked(l, ids, e.target.checked))} /> Locked in place</label>
        <label className="flex items-center gap-2"><input type="checkbox" checked={p.hidden} onChange={(e) => editor.change((l) => setHidden(l, ids, e.target.checked))} /> Hidden (not printed)</label>
      </Section>
      <AlignButtons editor={editor} ids={ids} toPrintArea />
      <Button size="sm" variant="danger" className="mt-3" onClick={() => editor.change((l) => removePlacements(l, ids), [])}>Remove from the product</Button>
    </div>
  );
}

function SeveralPlacements({ editor, ids }: { editor: ProductEditor; ids: readonly string[] }) {
  return (
    <div>
      <h2 className="mb-3 text-base font-semibold text-ink">{ids.length} placements</h2>
      <AlignButtons editor={editor} ids={ids} toPrintArea={false} />
      <Section title="Spread out evenly">
        <div className="flex gap-2">
          <Button size="sm" variant="secondary" disabled={ids.length < 3} onClick={() => editor.change((l) => distributePlacements(l, ids, 'horizontal'))}>Across</Button>
          <Button size="sm" variant="secondary" disabled={ids.length < 3} onClick={() => editor.change((l) => distributePlacements(l, ids, 'vertical'))}>Down</Button>
        </div>
      </Section>
      <Section title="Keep">
        <div className="flex flex-wrap gap-2">
          <Button size="sm" variant="secondary" onClick={() => editor.change((l) => setLocked(l, ids, true))}>Lock all</Button>
          <Button size="sm" variant="secondary" onClick={() => editor.change((l) => setLocked(l, ids, false))}>Unlock all</Button>
          <Button size="sm" variant="secondary" onClick={() => editor.change((l) => flipPlacements(l, ids, 'horizontal'))}>Mirror each</Button>
        </div>
      </Section>
      <Button size="sm" variant="danger" onClick={() => editor.change((l) => removePlacements(l, ids), [])}>Remove all {ids.length}</Button>
    </div>
  );
}

const alignments: Array<{ a: Alignment; label: string }> = [
  { a: 'left', label: 'Left edges' }, { a: 'centre', label: 'Centres across' }, { a: 'right', label: 'Right edges' },
  { a: 'top', label: 'Top edges' }, { a: 'middle', label: 'Centres down' }, { a: 'bottom', label: 'Bottom edges' },
];

function AlignButtons({ editor, ids, toPrintArea }: { editor: ProductEditor; ids: readonly string[]; toPrintArea: boolean }) {
  const reference = toPrintArea ? editor.geometry.printArea : undefined;
  return (
    <Section title={toPrintArea ? 'Line up with the print area' : 'Line up'}>
      <div className="grid grid-cols-3 gap-1">
        {alignments.map(({ a, label }) => (
          <Button key={a} size="sm" variant="secondary" className="px-1 text-xs" onClick={() => editor.change((l) => alignPlacements(l, ids, a, reference))}>{label}</Button>
        ))}
      </div>
    </Section>
  );
}
