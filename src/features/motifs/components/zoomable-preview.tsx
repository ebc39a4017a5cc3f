import { useEffect, useId, useLayoutEffect, useRef, useState, type KeyboardEvent, type PointerEvent, type WheelEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { checkerboardStyle } from '../../../components/ui/checkerboard';
import { nextZoom, fitZoom, ZOOM_MAX, ZOOM_MIN } from '../zoom';

type ZoomablePreviewProps = { src: string; width: number; height: number; name: string };

// The motif at any size from "fits the box" to 16x, on a checkerboard: + and − (or Ctrl and the
// wheel) zoom, arrows or a drag move around, 0 fits it again.
export function ZoomablePreview({ src, width, height, name }: ZoomablePreviewProps) {
  const boxRef = useRef<HTMLDivElement>(null);
  const helpId = useId();
  const [box, setBox] = useState({ w: 0, h: 0 });
  const [zoom, setZoom] = useState<number | 'fit'>('fit');
  const drag = useRef<{ x: number; y: number; left: number; top: number } | null>(null);

  useLayoutEffect(() => {
    const element = boxRef.current;
    if (!element) return;
    const observer = new ResizeObserver(() => setBox({ w: element.clientWidth, h: element.clientHeight }));
    observer.observe(element);
    setBox({ w: element.clientWidth, h: element.clientHeight });
    return () => observer.disconnect();
  }, []);

  const fit = fitZoom(width, height, box.w - 32, box.h - 32);
  const scale = zoom === 'fit' ? fit : zoom;
  const shownW = Math.max(1, Math.round(width * scale));
  const shownH = Math.max(1, Math.round(height * scale));

  // Zooming keeps the middle of the view in the middle.
  const zoomTo = (next: number | 'fit') => {
    const element = boxRef.current;
    const target = next === 'fit' ? fit : next;
    if (element && next !== 'fit') {
      const cx = (element.scrollLeft + element.clientWidth / 2) / scale;
      const cy = (element.scrollTop + element.clientHeight / 2) / scale;
      requestAnimationFrame(() => {
        element.scrollLeft = cx * target - element.clientWidth / 2;
        element.scrollTop = cy * target - element.clientHeight / 2;
      });
    }
    setZoom(next);
  };

  useEffect(() => setZoom('fit'), [src]);

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === '+' || event.key === '=') zoomTo(nextZoom(scale, 'in'));
    else if (event.key === '-' || event.key === '_') zoomTo(nextZoom(scale, 'out'));
    else if (event.key === '0') zoomTo('fit');
    else if (event.key === '1') zoomTo(1);
    else return;
    event.preventDefault();
  };

  const onWheel = (event: WheelEvent<HTMLDivElement>) => {
    if (!event.ctrlKey && !event.metaKey) return;
    event.preventDefault();
    zoomTo(nextZoom(scale, event.deltaY < 0 ? 'in' : 'out'));
  };

  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    const element = boxRef.current;
    if (!element || event.button !== 0) return;
    drag.current = { x: event.clientX, y: event.clientY, left: element.scrollLeft, top: element.scrollTop };
    element.setPointerCapture(event.pointerId);
  };
  const onPointerMove = (event: PointerEvent<HTMLDivElement>) => {
    const element = boxRef.current;
    if (!element || !drag.current) return;
    element.scrollLeft = drag.current.left - (event.clientX - drag.current.x);
    element.scrollTop = drag.current.top - (event.clientY - drag.current.y);
  };

  const percent = Math.round(scale * 100);
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2" role="toolbar" aria-label="Preview size">
        <Button size="sm" variant="secondary" onClick={() => zoomTo(nextZoom(scale, 'out'))} disabled={scale <= ZOOM_MIN} aria-label="Zoom out">
          −
        </Button>
        <span className="min-w-14 text-center text-sm font-semibold text-ink tabular-nums" aria-live="polite">
          {percent} %
        </span>
        <Button size="sm" variant="secondary" onClick={() => zoomTo(nextZoom(scale, 'in'))} disabled={scale >= ZOOM_MAX} aria-label="Zoom in">
          +
        </Button>
        <Button size="sm" variant={zoom === 'fit' ? 'primary' : 'secondary'} onClick={() => zoomTo('fit')} aria-pressed={zoom === 'fit'}>
          Fit
        </Button>
        <Button size="sm" variant={zoom === 1 ? 'primary' : 'secondary'} onClick={() => zoomTo(1)} aria-pressed={zoom === 1}>
          Actual pixels
        </Button>
      </div>
      <div
        ref={boxRef}
        tabIndex={0}
        role="img"
        aria-label={`${name}, ${width} × ${height} px, shown at ${percent} %`}
        aria-describedby={helpId}
        onKeyDown={onKeyDown}
        onWheel={onWheel}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={() => (drag.current = null)}
        onPointerCancel={() => (drag.current = null)}
        className="relative h-[min(70vh,34rem)] cursor-grab overflow-auto rounded-lg border border-sand active:cursor-grabbing"
        style={checkerboardStyle(14)}
      >
        <div className="flex min-h-full min-w-full items-center justify-center p-4" style={{ width: shownW + 32, height: shownH + 32 }}>
          <img
            src={src}
            alt=""
            draggable={false}
            width={shownW}
            height={shownH}
            style={{ width: shownW, height: shownH, imageRendering: scale >= 3 ? 'pixelated' : 'auto' }}
            className="max-w-none shrink-0"
          />
        </div>
      </div>
      <p id={helpId} className="text-sm text-ink-soft">
        Keys: + and − zoom, 0 fits, 1 shows actual pixels, arrows move. With the mouse: Ctrl and the wheel zoom, drag to move.
      </p>
    </div>
  );
}
