import type { Rect } from '@shared/geometry';
import {
  createHistory, createScene, selectionBounds, updateScene,
  type History, type Layout, type Scene, type SnapGuide,
} from '@shared/scene';
import { templateGeometry, type Template, type TemplateGeometry } from '@shared/templates';
import type { MotifBitmap } from './render/image-cache';
import { defaultOverlays, type OverlayName, type OverlaySettings, type RulerUnit } from './overlay-settings';
import { fitViewport, type Viewport } from './viewport';

/** What React and the renderer read; a new object whenever anything in it changes. */
export type EditorState = {
  readonly scene: Scene;
  readonly selection: readonly string[];
  readonly viewport: Viewport;
  readonly overlays: OverlaySettings;
  readonly rulerUnit: RulerUnit;
  /** Guides of the snap that the current drag landed on. */
  readonly guides: readonly SnapGuide[];
  /** The marquee being dragged, in template px. */
  readonly marquee: Rect | null;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  /** The layout as of the last finished change (not a gesture in progress): what autosave saves. */
  readonly committedLayout: Layout;
  readonly helpOpen: boolean;
  /** The server's soft proof of the saved design, drawn instead of the artwork while "as printed" is on. */
  readonly printView: MotifBitmap | null;
  /** The template's printer's guide image once loaded; null when the template has none. Never printed. */
  readonly guideImage: MotifBitmap | null;
};

type Listener = () => void;

// 200 steps: the issue asks for at least 100; snapshots share unchanged placements, so this is cheap.
const HISTORY_LIMIT = 200;
// The panels' pace during a pointer gesture: ten updates a second read as live, and a re-render of
// React's panels each pointer move costs the frame its budget (style, layout, paint, a wider repaint).
export const PANEL_CATCH_UP_MS = 100;

/** `pointer`: a drag on the canvas, whose panels catch up every PANEL_CATCH_UP_MS; `field`: an input driving its own preview, told at once. */
export type GestureSource = 'pointer' | 'field';

/**
 * The product editor's document and view state, outside React. Every change goes through
 * `change` (one history entry) or a gesture (`beginGesture` → `previewGesture`… → `commitGesture`
 * or `cancelGesture`), so undo steps match what the user did. The canvas hears of every change
 * (`subscribeFrames`); the panels (`subscribe`) of every change too, except during a pointer gesture,
 * when they catch up at most every PANEL_CATCH_UP_MS and at its end.
 */
export class ProductEditor {
  readonly template: Template;
  readonly geometry: TemplateGeometry;
  private history: History;
  private state: EditorState;
  private listeners = new Set<Listener>();
  private frameListeners = new Set<Listener>();
  private gestureStart: Scene | null = null;
  private gestureSource: GestureSource = 'field';
  private panelTimer: ReturnType<typeof setTimeout> | null = null;

  constructor(template: Template, layout?: Layout, viewport: Viewport = { zoom: 0.1, panX: 0, panY: 0 }) {
    this.template = template;
    this.geometry = templateGeometry(template);
    const scene = createScene(layout);
    this.history = createHistory(scene, HISTORY_LIMIT);
    this.state = {
      scene, selection: [], viewport, overlays: defaultOverlays, rulerUnit: template.unit,
      guides: [], marquee: null, canUndo: false, canRedo: false, committedLayout: scene.layout, helpOpen: false, printView: null, guideImage: null,
    };
  }

  /** The panels' subscription (React's useSyncExternalStore). */
  subscribe = (listener: Listener): (() => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  /** Every change as it happens, for what draws each frame (the canvas). */
  subscribeFrames = (listener: Listener): (() => void) => {
    this.frameListeners.add(listener);
    return () => this.frameListeners.delete(listener);
  };

  getState = (): EditorState => this.state;

  get scene(): Scene { return this.state.scene; }
  get layout(): Layout { return this.state.scene.layout; }
  get selection(): readonly string[] { return this.state.selection; }
  get viewport(): Viewport { return this.state.viewport; }
  get inGesture(): boolean { return this.gestureStart !== null; }
  /** The layout at the start of the gesture in progress; null between gestures. */
  get gestureSnapshot(): Layout | null { return this.gestureStart?.layout ?? null; }

  private set(patch: Partial<EditorState>): void {
    this.state = { ...this.state, ...patch, canUndo: this.history.canUndo, canRedo: this.history.canRedo };
    for (const l of this.frameListeners) l();
    if (this.gestureStart && this.gestureSource === 'pointer') {
      this.panelTimer ??= setTimeout(this.tellPanels, PANEL_CATCH_UP_MS);
    } else {
      this.tellPanels();
    }
  }

  private tellPanels = (): void => {
    if (this.panelTimer !== null) clearTimeout(this.panelTimer);
    this.panelTimer = null;
    for (const l of this.listeners) l();
  };

  /** One undoable change; returns false when it changed nothing. */
  change(fn: (layout: Layout) => Layout, selection?: readonly string[]): boolean {
    if (this.gestureStart) this.commitGesture();
    const next = updateScene(this.scene, fn);
    if (next === this.scene) {
      if (selection) this.select(selection);
      return false;
    }
    this.history.push(next);
    this.set({ scene: next, committedLayout: next.layout, ...(selection ? { selection: this.keepExisting(selection, next.layout) } : {}) });
    return true;
  }

  /** Starts a gesture; previews are computed from this snapshot, never from the previous preview. */
  beginGesture(source: GestureSource = 'field'): Layout {
    if (!this.gestureStart) {
      this.gestureStart = this.scene;
      this.gestureSource = source;
    }
    return this.gestureStart.layout;
  }

  previewGesture(fn: (snapshot: Layout) => Layout, extra: { guides?: readonly SnapGuide[]; marquee?: Rect | null } = {}): void {
    const start = this.gestureStart ?? this.scene;
    // Versions grow from the current preview, so every frame of a drag has a new version.
    const layout = fn(start.layout);
    const scene = layout === this.scene.layout ? this.scene : { layout, sceneVersion: this.scene.sceneVersion + 1 };
    this.set({ scene, guides: extra.guides ?? [], marquee: extra.marquee ?? null });
  }

  /** Ends the gesture as one history entry (none when it ended where it began). */
  commitGesture(): void {
    const start = this.gestureStart;
    this.gestureStart = null;
    if (!start) return;
    if (this.scene.layout !== start.layout) this.history.push(this.scene);
    this.set({ guides: [], marquee: null, committedLayout: this.history.present.layout });
  }

  /** Escape: back to the snapshot taken at pointer-down. */
  cancelGesture(): void {
    const start = this.gestureStart;
    this.gestureStart = null;
    if (!start) return;
    const scene = this.scene.layout === start.layout ? this.scene : { layout: start.layout, sceneVersion: this.scene.sceneVersion + 1 };
    this.set({ scene, guides: [], marquee: null });
  }

  undo(): void {
    if (this.gestureStart) this.cancelGesture();
    const scene = this.history.undo();
    if (scene) this.set({ scene, committedLayout: scene.layout, selection: this.keepExisting(this.selection, scene.layout) });
  }

  redo(): void {
    if (this.gestureStart) this.cancelGesture();
    const scene = this.history.redo();
    if (scene) this.set({ scene, committedLayout: scene.layout, selection: this.keepExisting(this.selection, scene.layout) });
  }

  select(ids: readonly string[]): void {
    const next = this.keepExisting(ids, this.layout);
    if (sameIds(next, this.selection)) return;
    this.set({ selection: next });
  }

  toggleSelected(id: string): void {
    this.select(this.selection.includes(id) ? this.selection.filter((s) => s !== id) : [...this.selection, id]);
  }

  selectionBounds(): Rect | null {
    return selectionBounds(this.layout, this.selection);
  }

  setViewport(viewport: Viewport): void {
    const v = this.viewport;
    if (v.zoom === viewport.zoom && v.panX === viewport.panX && v.panY === viewport.panY) return;
    this.set({ viewport });
  }

  /** The whole print file and a little pasteboard in view. */
  fit(screen: { width: number; height: number }): void {
    this.setViewport(fitViewport(this.geometry.bleedRect, screen, 40));
  }

  toggleOverlay(name: OverlayName): void {
    this.set({ overlays: { ...this.state.overlays, [name]: !this.state.overlays[name] } });
  }

  setRulerUnit(rulerUnit: RulerUnit): void {
    this.set({ rulerUnit });
  }

  setHelpOpen(helpOpen: boolean): void {
    if (helpOpen !== this.state.helpOpen) this.set({ helpOpen });
  }

  setPrintView(printView: MotifBitmap | null): void {
    if (printView !== this.state.printView) this.set({ printView });
  }

  setGuideImage(guideImage: MotifBitmap | null): void {
    if (guideImage !== this.state.guideImage) this.set({ guideImage });
  }

  /** After loading a saved layout (e.g. reload after a conflict): a fresh history. */
  replaceLayout(layout: Layout): void {
    this.gestureStart = null;
    const scene = { layout, sceneVersion: this.scene.sceneVersion + 1 };
    this.history = createHistory(scene, HISTORY_LIMIT);
    this.set({ scene, committedLayout: layout, selection: this.keepExisting(this.selection, layout), guides: [], marquee: null });
  }

  private keepExisting(ids: readonly string[], layout: Layout): readonly string[] {
    const present = new Set(layout.placements.map((p) => p.id));
    return [...new Set(ids)].filter((id) => present.has(id));
  }
}

const sameIds = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((id, i) => id === b[i]);
