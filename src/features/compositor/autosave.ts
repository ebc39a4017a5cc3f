import type { Layout } from '@shared/scene';

export type SaveStatus =
  | { kind: 'saved'; revision: number }
  | { kind: 'pending'; revision: number }
  | { kind: 'saving'; revision: number }
  /** Another tab or person saved first; nothing more is saved until the user reloads. */
  | { kind: 'conflict'; revision: number; message: string }
  | { kind: 'error'; revision: number; message: string };

export type SaveLayout = (layout: Layout, revision: number) => Promise<{ revision: number }>;

export type SaveFailure = { code: string; message: string };

type Timers = { set: (fn: () => void, ms: number) => unknown; clear: (handle: unknown) => void };

const realTimers: Timers = { set: (fn, ms) => setTimeout(fn, ms), clear: (h) => clearTimeout(h as ReturnType<typeof setTimeout>) };

// About a second after the last change: long enough to batch a burst of nudges, short enough that
// closing the tab loses little.
export const AUTOSAVE_DELAY_MS = 1_000;

/**
 * Saves the layout a moment after it stops changing, sending the revision it was loaded at. A
 * 409 'product.stale' means another save came first: it stops and says so rather than overwrite.
 */
export class Autosaver {
  private status: SaveStatus;
  private timer: unknown = null;
  private latest: Layout;
  private savedLayout: Layout;
  private inFlight = false;
  private listeners = new Set<() => void>();

  constructor(
    initial: Layout,
    revision: number,
    private readonly save: SaveLayout,
    private readonly toFailure: (error: unknown) => SaveFailure,
    private readonly delayMs = AUTOSAVE_DELAY_MS,
    private readonly timers: Timers = realTimers,
  ) {
    this.latest = initial;
    this.savedLayout = initial;
    this.status = { kind: 'saved', revision };
  }

  subscribe = (fn: () => void) => {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  };

  getStatus = (): SaveStatus => this.status;

  /** Call with the committed layout after every finished change. */
  changed(layout: Layout): void {
    this.latest = layout;
    if (this.status.kind === 'conflict') return;
    if (layout === this.savedLayout && !this.inFlight) {
      this.cancelTimer();
      this.setStatus({ kind: 'saved', revision: this.status.revision });
      return;
    }
    this.setStatus({ kind: this.inFlight ? 'saving' : 'pending', revision: this.status.revision });
    this.schedule();
  }

  /** Saves now (leaving the page, or a retry after an error). */
  async flush(): Promise<void> {
    this.cancelTimer();
    if (this.status.kind === 'conflict' || this.inFlight || this.latest === this.savedLayout) return;
    const layout = this.latest;
    const revision = this.status.revision;
    this.inFlight = true;
    this.setStatus({ kind: 'saving', revision });
    try {
      const saved = await this.save(layout, revision);
      this.savedLayout = layout;
      this.inFlight = false;
      if (this.latest !== layout) {
        this.setStatus({ kind: 'pending', revision: saved.revision });
        this.schedule();
      } else {
        this.setStatus({ kind: 'saved', revision: saved.revision });
      }
    } catch (error) {
      this.inFlight = false;
      const failure = this.toFailure(error);
      if (failure.code === 'product.stale') {
        this.setStatus({ kind: 'conflict', revision, message: 'Someone saved this product in another tab or on another device after you opened it. Reload to see their version; your changes since then are not saved.' });
      } else {
        this.setStatus({ kind: 'error', revision, message: failure.message });
      }
    }
  }

  /** After reloading the product: start again from its saved layout and revision. */
  reset(layout: Layout, revision: number): void {
    this.cancelTimer();
    this.latest = layout;
    this.savedLayout = layout;
    this.inFlight = false;
    this.setStatus({ kind: 'saved', revision });
  }

  get hasUnsavedChanges(): boolean {
    return this.latest !== this.savedLayout;
  }

  dispose(): void {
    this.cancelTimer();
  }

  private schedule(): void {
    this.cancelTimer();
    this.timer = this.timers.set(() => {
      this.timer = null;
      void this.flush();
    }, this.delayMs);
  }

  private cancelTimer(): void {
    if (this.timer !== null) this.timers.clear(this.timer);
    this.timer = null;
  }

  private setStatus(status: SaveStatus): void {
    this.status = status;
    for (const l of this.listeners) l();
  }
}

export function describeSaveStatus(s: SaveStatus): string {
  switch (s.kind) {
    case 'saved': return `Saved · revision ${s.revision}`;
    case 'pending': return 'Unsaved changes';
    case 'saving': return 'Saving…';
    case 'conflict': return s.message;
    case 'error': return `Not saved: ${s.message}`;
  }
}
