import { useRef } from 'react';
import { mapPlacements, textPlacementSchema, type Layout, type TextPlacement } from '@shared/scene';
import type { ProductEditor } from '../editor';
import { remeasured } from '../text-measure';
import { NumberField } from './number-field';

// The range the saved form accepts (the scene's text schema).
const arcRange = textPlacementSchema.shape.arcDeg.unwrap();
export const ARC_MIN_DEG = arcRange.minValue ?? -360;
export const ARC_MAX_DEG = arcRange.maxValue ?? 360;

const clampArc = (deg: number) => Math.min(ARC_MAX_DEG, Math.max(ARC_MIN_DEG, Math.round(deg)));

export function withArc(layout: Layout, id: string, arcDeg: number, dpi: number): Layout {
  return mapPlacements(layout, [id], (q) => (q.type === 'text' ? remeasured({ ...q, arcDeg }, dpi) : q));
}

/**
 * How far the line of text bends, in degrees of a circle: 0 straight, above 0 bowed upwards
 * (a rainbow), below 0 bowed downwards (a smile). A slider drag is one undo step.
 */
export function ArcField({ editor, p }: { editor: ProductEditor; p: TextPlacement }) {
  const dpi = editor.template.dpi;
  const dragging = useRef(false);
  const set = (deg: number) => {
    const arcDeg = clampArc(deg);
    if (dragging.current) editor.previewGesture((l) => withArc(l, p.id, arcDeg, dpi));
    else editor.change((l) => withArc(l, p.id, arcDeg, dpi));
  };
  const endDrag = () => {
    if (!dragging.current) return;
    dragging.current = false;
    editor.commitGesture();
  };
  return (
    <div className="space-y-1" role="group" aria-label="Curve of the line">
      <NumberField label="Curve" value={p.arcDeg} unit="°" digits={0} onCommit={(deg) => Number.isFinite(deg) && set(deg)} />
      <div className="flex items-center gap-1.5 pl-[4.375rem]">
        <input type="range" min={ARC_MIN_DEG} max={ARC_MAX_DEG} step={5} value={p.arcDeg}
          aria-label="Curve in degrees" aria-valuetext={describeArc(p.arcDeg)}
          onPointerDown={() => {
            dragging.current = true;
            editor.beginGesture();
          }}
          onPointerUp={endDrag} onPointerCancel={endDrag} onBlur={endDrag}
          onChange={(e) => set(Number(e.target.value))}
          className="w-full min-w-0 accent-tide" />
        <button type="button" className="shrink-0 rounded px-1 text-xs text-tide-deep underline-offset-2 hover:underline disabled:text-ink-soft disabled:no-underline"
          disabled={p.arcDeg === 0} onClick={() => set(0)}>Straight</button>
      </div>
      <p className="pl-[4.375rem] text-[11px] leading-tight text-ink-soft">Above 0° the middle rises; below 0° it dips.</p>
    </div>
  );
}

export function describeArc(deg: number): string {
  if (deg === 0) return 'straight';
  return `${Math.abs(deg)} degrees, bowed ${deg > 0 ? 'upwards' : 'downwards'}`;
}
