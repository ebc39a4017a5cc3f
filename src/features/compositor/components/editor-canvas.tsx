import { useEffect, useRef, type DragEvent, type PointerEvent } from 'react';
import type { Vec } from '@shared/geometry';
import type { ProductEditor } from '../editor';
import type { PlaceableMotif } from '../place-motifs';
import { CanvasView } from '../render/canvas-view';
import type { LoadThumb } from '../render/image-cache';
import { commandForKey, isTypingTarget } from '../tools/keyboard';
import { runCommand } from '../tools/run-command';
import { TouchPinch } from '../tools/pinch';
import { SelectTool } from '../tools/select-tool';
import { panBy, screenPoint, screenToTemplate, zoomAbout } from '../viewport';
import { MOTIF_DRAG_TYPE, readMotifDrag } from './tray-drag';

type EditorCanvasProps = {
  editor: ProductEditor;
  onDropMotif: (motif: PlaceableMotif, at: Vec) => void;
  loadThumb?: LoadThumb;
};

/** The canvas: pointer gestures go to the select tool, keys to the shortcut table, wheel to the view. */
export function EditorCanvas({ editor, onDropMotif, loadThumb }: EditorCanvasProps) {
  const wrapRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const viewRef = useRef<CanvasView | null>(null);
  const toolRef = useRef<SelectTool | null>(null);
  const panRef = useRef<{ last: Vec } | null>(null);
  const spaceRef = useRef(false);
  const pinchRef = useRef(new TouchPinch());

  useEffect(() => {
    const canvas = canvasRef.current;
    const wrap = wrapRef.current;
    if (!canvas || !wrap) return;
    const view = new CanvasView(canvas, editor, loadThumb);
    const tool = new SelectTool(editor);
    viewRef.current = view;
    toolRef.current = tool;
    let fitted = false;
    const observer = new ResizeObserver(() => {
      const { width, height } = wrap.getBoundingClientRect();
      view.resize(width, height);
      if (!fitted && width > 0) {
        fitted = true;
        editor.fit({ width, height });
      }
    });
    observer.observe(wrap);

    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const rect = canvas.getBoundingClientRect();
      const at = { x: e.clientX - rect.left, y: e.clientY - rect.top };
      // pinch on a trackpad arrives as a wheel with ctrlKey
      if (e.ctrlKey || e.metaKey) editor.setViewport(zoomAbout(editor.viewport, editor.viewport.zoom * Math.exp(-e.deltaY * 0.002), at));
      else editor.setViewport(panBy(editor.viewport, -e.deltaX, -e.deltaY));
    };
    canvas.addEventListener('wheel', onWheel, { passive: false });

    const onKeyDown = (e: KeyboardEvent) => {
      if (isTypingTarget(e.target) || e.defaultPrevented) return;
      if (e.key === ' ') {
        spaceRef.current = true;
        // held over the canvas, Space pans the view instead of scrolling the page
        if (e.target === canvas) e.preventDefault();
        return;
      }
      const command = commandForKey(e);
      if (command && runCommand(editor, command, { tool, screen: view.screen })) e.preventDefault();
    };
    const onKeyUp = (e: KeyboardEvent) => {
      if (e.key === ' ') spaceRef.current = false;
    };
    window.addEventListener('keydown', onKeyDown);
    window.addEventListener('keyup', onKeyUp);
    return () => {
      observer.disconnect();
      canvas.removeEventListener('wheel', onWheel);
      window.removeEventListener('keydown', onKeyDown);
      window.removeEventListener('keyup', onKeyUp);
      view.dispose();
    };
  }, [editor, loadThumb]);

  const local = (e: { clientX: number; clientY: number }) => {
    const rect = canvasRef.current!.getBoundingClientRect();
    return screenPoint(e.clientX - rect.left, e.clientY - rect.top);
  };
  const mods = (e: PointerEvent) => ({ shift: e.shiftKey, alt: e.altKey });

  const onPointerDown = (e: PointerEvent<HTMLCanvasElement>) => {
    e.currentTarget.setPointerCapture(e.pointerId);
    e.currentTarget.focus();
    if (e.pointerType === 'touch') {
      const role = pinchRef.current.down(e.pointerId, local(e), editor.viewport);
      // a second finger makes it a pinch: whatever the first finger began is undone
      if (role === 'pinch') toolRef.current?.cancel();
      if (role !== 'tool') return;
    }
    if (e.button === 1 || spaceRef.current) {
      panRef.current = { last: { x: e.clientX, y: e.clientY } };
      return;
    }
    if (e.button !== 0) return;
    toolRef.current?.pointerDown(local(e), mods(e));
  };
  const onPointerMove = (e: PointerEvent<HTMLCanvasElement>) => {
    if (e.pointerType === 'touch') {
      const pinched = pinchRef.current.move(e.pointerId, local(e));
      if (pinched) editor.setViewport(pinched);
      if (pinchRef.current.active) return;
    }
    const pan = panRef.current;
    if (pan) {
      editor.setViewport(panBy(editor.viewport, e.clientX - pan.last.x, e.clientY - pan.last.y));
      pan.last = { x: e.clientX, y: e.clientY };
      return;
    }
    toolRef.current?.pointerMove(local(e), mods(e));
  };
  const onPointerUp = (e: PointerEvent<HTMLCanvasElement>) => {
    if (e.pointerType === 'touch') {
      const pinching = pinchRef.current.active;
      pinchRef.current.up(e.pointerId);
      if (pinching) return;
    }
    if (panRef.current) panRef.current = null;
    else toolRef.current?.pointerUp();
  };
  const onPointerCancel = (e: PointerEvent<HTMLCanvasElement>) => {
    if (e.pointerType === 'touch') pinchRef.current.up(e.pointerId);
    toolRef.current?.cancel();
  };

  const onDragOver = (e: DragEvent) => {
    if (e.dataTransfer.types.includes(MOTIF_DRAG_TYPE)) {
      e.preventDefault();
      e.dataTransfer.dropEffect = 'copy';
    }
  };
  const onDrop = (e: DragEvent) => {
    const motif = readMotifDrag(e.dataTransfer);
    if (!motif) return;
    e.preventDefault();
    onDropMotif(motif, screenToTemplate(editor.viewport, local(e)));
  };

  return (
    <div ref={wrapRef} className="relative h-full min-h-0 w-full overflow-hidden" onDragOver={onDragOver} onDrop={onDrop}>
      <canvas
        ref={canvasRef}
        tabIndex={0}
        aria-label="Product layout. Drag motifs here; pinch with two fingers to zoom; press ? for the keyboard shortcuts."
        data-testid="editor-canvas"
        className="absolute inset-0 touch-none outline-none focus-visible:ring-2 focus-visible:ring-tide"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerCancel={onPointerCancel}
      />
    </div>
  );
}
