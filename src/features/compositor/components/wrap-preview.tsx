import { useEffect, useMemo, useRef, useState } from 'react';
import { blankColoursOf, printHiddenOn, templateGeometry, type Template } from '@shared/templates';
import { WRAP_VIEWS, wrapCylinder, type WrapView } from '@shared/wrap';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select-field';
import type { ProductEditor } from '../editor';
import { drawMugSide, drawStrip } from '../render/draw-wrap-preview';
import { MotifImageCache, type LoadThumb } from '../render/image-cache';

const viewLabels: Record<WrapView, string> = { front: 'Front', 'handle-right': 'Handle right', back: 'Back', 'handle-left': 'Handle left' };

// CSS px of each side's picture, and of the strip the sides are cut from (its height).
const SIDE = { width: 60, height: 64 };
const STRIP_HEIGHT = 160;

/**
 * The layout as it is now, wrapped round the mug and seen from four sides, in the blank colour the
 * artist picks (heat-changing blanks: cold and warm). Redrawn after each change; the server draws
 * the same views for the product page and the export.
 */
export function WrapPreview({ editor, template, loadThumb }: { editor: ProductEditor; template: Template; loadThumb?: LoadThumb }) {
  const geometry = useMemo(() => templateGeometry(template), [template]);
  const isWrap = wrapCylinder(geometry) !== null;
  const [open, setOpen] = useState(true);
  const [variantId, setVariantId] = useState<string>('');
  const canvases = useRef<Partial<Record<WrapView, HTMLCanvasElement | null>>>({});
  const [drawn, setDrawn] = useState(0);
  // one cache of display bitmaps for the panel's life, whatever the colour picked or Hide/Show
  const redraw = useRef<() => void>(() => {});
  const cache = useMemo(() => new MotifImageCache(loadThumb, () => redraw.current()), [loadThumb]);

  useEffect(() => {
    if (!isWrap || !open) return;
    let frame = 0;
    let disposed = false;
    const draw = () => {
      frame = 0;
      if (disposed) return;
      const dpr = window.devicePixelRatio || 1;
      const stripScale = (STRIP_HEIGHT * dpr) / geometry.size.height;
      const strip = drawStrip(editor.getState().scene, template, geometry, images, stripScale);
      const blank = blankColoursOf(template, variantId || null);
      for (const view of WRAP_VIEWS) {
        const canvas = canvases.current[view];
        const ctx = canvas?.getContext('2d');
        if (!canvas || !ctx) continue;
        canvas.width = Math.round(SIDE.width * dpr);
        canvas.height = Math.round(SIDE.height * dpr);
        drawMugSide(ctx, canvas.width, canvas.height, strip, stripScale, geometry, view, blank, printHiddenOn(template, variantId));
      }
      setDrawn((n) => n + 1);
    };
    const request = () => {
      if (!frame && !disposed) frame = requestAnimationFrame(draw);
    };
    // thumbnails arriving later redraw whichever drawing is current
    redraw.current = request;
    const images = cache;
    request();
    // panels hear of selection changes too: redraw only when the layout itself changed
    let scene = editor.getState().scene;
    const off = editor.subscribe(() => {
      const next = editor.getState().scene;
      if (next === scene) return;
      scene = next;
      request();
    });
    return () => {
      disposed = true;
      off();
      if (frame) cancelAnimationFrame(frame);
    };
  }, [editor, template, geometry, isWrap, open, variantId, cache]);

  if (!isWrap) return null;
  const variants = [{ value: '', label: 'Standard blank' }, ...template.variants.map((v) => ({ value: v.id, label: v.name }))];
  const hidden = printHiddenOn(template, variantId);
  return (
    <section aria-labelledby="wrap-preview-heading" className="border-t border-l border-sand bg-paper px-3 py-2 text-sm" data-testid="wrap-preview" data-drawn={drawn}>
      <div className="flex items-center gap-2">
        <h2 id="wrap-preview-heading" className="mr-auto text-base font-semibold text-ink">On the mug</h2>
        <Button size="sm" variant="quiet" aria-expanded={open} aria-controls="wrap-preview-sides" onClick={() => setOpen(!open)}>{open ? 'Hide' : 'Show'}</Button>
      </div>
      {open && (
        <div id="wrap-preview-sides" className="mt-1 flex flex-col gap-2">
          {template.variants.length > 0 && (
            <Select aria-label="Blank colour" value={variantId} options={variants} className="border-sand text-sm" onChange={(e) => setVariantId(e.target.value)} />
          )}
          {hidden && <p className="text-xs text-ink-soft">Cold, this blank’s coating hides the design; it shows once a hot drink is poured.</p>}
          <div className="grid grid-cols-4 gap-0.5" title="A quick look from the library’s thumbnails; the product page shows the full-size previews.">
            {WRAP_VIEWS.map((view) => (
              <figure key={view} className="m-0 flex flex-col items-center">
                <canvas ref={(el) => { canvases.current[view] = el; }} style={{ width: SIDE.width, height: SIDE.height }} role="img" aria-label={`The mug seen from the ${viewLabels[view].toLowerCase()} side`} />
                <figcaption className="text-[11px] leading-tight text-ink-soft">{viewLabels[view]}</figcaption>
              </figure>
            ))}
          </div>
        </div>
      )}
    </section>
  );
}
