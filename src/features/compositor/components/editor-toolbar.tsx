import { Button } from '../../../components/ui/button';
import type { ProductEditor } from '../editor';
import { overlayLabels, type OverlayName } from '../overlay-settings';
import { runCommand } from '../tools/run-command';
import { SelectTool } from '../tools/select-tool';
import { zoomStep } from '../viewport';
import { addPlacement } from '@shared/scene';
import { frontCentre } from '../place-motifs';
import { newTextPlacement } from '../text-measure';
import { useEditorSelector } from './use-editor-state';

type EditorToolbarProps = { editor: ProductEditor; screen: () => { width: number; height: number } };

export function EditorToolbar({ editor, screen }: EditorToolbarProps) {
  const state = useEditorSelector(editor, (s) => ({
    canUndo: s.canUndo, canRedo: s.canRedo, hasSelection: s.selection.length > 0, viewport: s.viewport,
    overlays: s.overlays, rulerUnit: s.rulerUnit, mirror: s.scene.layout.mirror, hasGuideImage: s.guideImage !== null,
  }));
  const has = state.hasSelection;
  // The toolbar's commands never cancel a drag, so a throwaway tool is enough for the context.
  const run = (command: Parameters<typeof runCommand>[1]) => runCommand(editor, command, { tool: new SelectTool(editor), screen: screen() });
  const zoom = (direction: 'in' | 'out') => {
    const s = screen();
    editor.setViewport(zoomStep(editor.viewport, direction, { x: s.width / 2, y: s.height / 2 }));
  };
  const addText = () => {
    const t = newTextPlacement(frontCentre(editor.geometry), editor.template.dpi);
    editor.change((l) => addPlacement(l, t), [t.id]);
  };
  const isWrap = editor.geometry.wrap !== null;
  // a toggle only for guides this template has
  const overlayNames = (Object.keys(overlayLabels) as OverlayName[]).filter((name) => name !== 'guideImage' || state.hasGuideImage);
  return (
    <div role="toolbar" aria-label="Editing" className="flex flex-wrap items-center gap-1.5">
      <Button size="sm" variant="secondary" disabled={!state.canUndo} onClick={() => editor.undo()}>Undo</Button>
      <Button size="sm" variant="secondary" disabled={!state.canRedo} onClick={() => editor.redo()}>Redo</Button>
      <span className="mx-1 h-6 w-px bg-sand" aria-hidden="true" />
      <Button size="sm" variant="quiet" onClick={addText}>Add text</Button>
      <Button size="sm" variant="quiet" disabled={!has} onClick={() => run({ type: 'duplicate' })}>Copy</Button>
      <Button size="sm" variant="quiet" disabled={!has} onClick={() => run({ type: 'reorder', move: 'forward' })}>Bring forward</Button>
      <Button size="sm" variant="quiet" disabled={!has} onClick={() => run({ type: 'reorder', move: 'backward' })}>Send back</Button>
      <Button size="sm" variant="quiet" disabled={!has} onClick={() => run({ type: 'delete' })}>Remove</Button>
      <span className="mx-1 h-6 w-px bg-sand" aria-hidden="true" />
      <Button size="sm" variant="quiet" aria-label="Zoom out" onClick={() => zoom('out')}>−</Button>
      <span className="w-14 text-center text-sm tabular-nums" aria-label="Zoom">{Math.round(state.viewport.zoom * 100)} %</span>
      <Button size="sm" variant="quiet" aria-label="Zoom in" onClick={() => zoom('in')}>+</Button>
      <Button size="sm" variant="quiet" onClick={() => editor.fit(screen())}>Whole file</Button>
      <span className="mx-1 h-6 w-px bg-sand" aria-hidden="true" />
      <details className="relative">
        <summary className="cursor-pointer rounded-md px-3 py-1 text-sm font-semibold text-tide-deep hover:bg-sand/60">Guides</summary>
        <fieldset className="absolute left-0 z-20 mt-1 w-48 space-y-1 rounded-md border border-sand bg-paper p-2 shadow-lg">
          <legend className="sr-only">Guides to show</legend>
          {overlayNames.map((name) => (
            <label key={name} className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={state.overlays[name]} onChange={() => editor.toggleOverlay(name)} />
              {overlayLabels[name]}
            </label>
          ))}
        </fieldset>
      </details>
      <Button size="sm" variant="quiet" aria-label={`Rulers in ${state.rulerUnit === 'in' ? 'inches' : 'millimetres'}; switch`}
        onClick={() => editor.setRulerUnit(state.rulerUnit === 'in' ? 'mm' : 'in')}>
        {state.rulerUnit === 'in' ? 'Inches' : 'Millimetres'}
      </Button>
      {isWrap && (
        <label className="flex items-center gap-1.5 px-2 text-sm" title="Copies the layout to the other side of the mug, so left- and right-handed drinkers both see it">
          <input type="checkbox" checked={state.mirror} onChange={(e) => editor.change((l) => ({ ...l, mirror: e.target.checked }))} />
          Both sides
        </label>
      )}
      <Button size="sm" variant="quiet" onClick={() => editor.setHelpOpen(true)}>Shortcuts</Button>
    </div>
  );
}
