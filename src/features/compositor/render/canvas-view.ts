import type { ProductEditor, EditorState } from '../editor';
import { drawEditorChrome } from './draw-chrome';
import { drawScene } from './draw-scene';
import { fontCache } from './font-cache';
import { MotifImageCache, type LoadThumb } from './image-cache';
import { StillLayerCache } from './still-layer-cache';

type Drawn = { state: EditorState; generation: number; fonts: number; width: number; height: number; dpr: number };

/**
 * Ties an editor to a canvas: redraws on the next animation frame, and only when the scene
 * version, view, selection, guides or a newly arrived bitmap differ from the last frame drawn.
 */
export class CanvasView {
  readonly images: MotifImageCache;
  private frame: number | null = null;
  private last: Drawn | null = null;
  private size = { width: 0, height: 0 };
  private unsubscribe: () => void;
  private still = new StillLayerCache();
  /** For the bench and tests: how many frames actually drew. */
  framesDrawn = 0;
  /** For the bench: the time spent in this view's own drawing, in ms, over all frames. */
  drawMs = 0;

  constructor(private readonly canvas: HTMLCanvasElement, private readonly editor: ProductEditor, loadThumb?: LoadThumb) {
    this.images = new MotifImageCache(loadThumb, () => this.request());
    const offEditor = editor.subscribeFrames(() => this.request());
    const offFonts = fontCache.subscribe(() => this.request());
    this.unsubscribe = () => {
      offEditor();
      offFonts();
    };
  }

  resize(width: number, height: number): void {
    const dpr = globalThis.devicePixelRatio || 1;
    this.size = { width, height };
    this.canvas.width = Math.max(1, Math.round(width * dpr));
    this.canvas.height = Math.max(1, Math.round(height * dpr));
    this.canvas.style.width = `${width}px`;
    this.canvas.style.height = `${height}px`;
    this.last = null;
    this.request();
  }

  get screen() {
    return this.size;
  }

  request(): void {
    if (this.frame !== null) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = null;
      this.draw();
    });
  }

  draw(): void {
    const state = this.editor.getState();
    const dpr = globalThis.devicePixelRatio || 1;
    const { width, height } = this.size;
    const l = this.last;
    if (l && l.state.scene.sceneVersion === state.scene.sceneVersion && l.state.viewport === state.viewport && l.state.selection === state.selection &&
      l.state.overlays === state.overlays && l.state.guides === state.guides && l.state.marquee === state.marquee && l.state.rulerUnit === state.rulerUnit && l.state.printView === state.printView && l.state.guideImage === state.guideImage &&
      l.generation === this.images.generation && l.fonts === fontCache.generation && l.width === width && l.height === height && l.dpr === dpr) return;
    const ctx = this.canvas.getContext('2d');
    if (!ctx || width === 0 || height === 0) return;
    const began = performance.now();
    const { template, geometry, gestureSnapshot: snapshot } = this.editor;
    // during a gesture the placements it leaves alone come from the still layers (see StillLayerCache)
    if (!snapshot) this.still.forget();
    const fromStill = snapshot !== null && this.still.draw(ctx, {
      scene: state.scene, snapshot, template, geometry, images: this.images, fontGeneration: fontCache.generation,
      viewport: state.viewport, overlays: state.overlays, guideImage: state.guideImage, printView: state.printView, screen: this.size, dpr,
    });
    if (!fromStill) {
      drawScene(ctx, state.scene, template, this.images, state.viewport, state.overlays, { dpr, geometry, screen: this.size, printView: state.printView, guideImage: state.guideImage });
    }
    drawEditorChrome(ctx, state, this.editor.selectionBounds(), this.editor.geometry, this.editor.template.dpi, this.size, dpr);
    this.framesDrawn += 1;
    this.drawMs += performance.now() - began;
    // read by the drag bench; an attribute write costs no layout
    this.canvas.dataset.framesDrawn = String(this.framesDrawn);
    this.canvas.dataset.drawMs = this.drawMs.toFixed(2);
    this.last = { state, generation: this.images.generation, fonts: fontCache.generation, width, height, dpr };
  }

  dispose(): void {
    if (this.frame !== null) cancelAnimationFrame(this.frame);
    this.unsubscribe();
  }
}
