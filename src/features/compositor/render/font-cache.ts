import opentype from 'opentype.js';
import type { FontStack, OutlineFont } from '@shared/text/outline-font';
import { fontFilesOf } from '@shared/text/shipped-fonts';
import { fontFileUrls } from './font-files';

type Entry = { state: 'loading' } | { state: 'ready'; stack: FontStack } | { state: 'failed'; error: string };

/**
 * The shipped fonts, fetched and parsed by opentype.js on first use. The canvas draws text from
 * their outlines, exactly as the print file does; until a font arrives, text shows as a faint box.
 */
class FontCache {
  private entries = new Map<string, Entry>();
  private listeners = new Set<() => void>();
  /** Bumped whenever a font arrives or fails, so views know to redraw. */
  generation = 0;

  get(fontId: string): FontStack | null {
    const files = fontFilesOf(fontId);
    const key = files[0].key;
    const entry = this.entries.get(key);
    if (entry?.state === 'ready') return entry.stack;
    if (!entry) this.load(key, files.map((f) => fontFileUrls[f.key]).filter(Boolean));
    return null;
  }

  failure(fontId: string): string | null {
    const entry = this.entries.get(fontFilesOf(fontId)[0].key);
    return entry?.state === 'failed' ? entry.error : null;
  }

  /** Resolves when the font is ready (or failed), for measuring before placing text. */
  async ready(fontId: string): Promise<FontStack | null> {
    const found = this.get(fontId);
    if (found) return found;
    return new Promise((resolve) => {
      const done = () => {
        const stack = this.get(fontId);
        if (stack || this.failure(fontId)) {
          this.listeners.delete(done);
          resolve(stack);
        }
      };
      this.listeners.add(done);
    });
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private load(key: string, urls: string[]): void {
    this.entries.set(key, { state: 'loading' });
    Promise.all(
      urls.map(async (url) => {
        const res = await fetch(url);
        if (!res.ok) throw new Error(`font file answered ${res.status}`);
        return opentype.parse(await res.arrayBuffer()) as unknown as OutlineFont;
      }),
    )
      .then((stack) => this.entries.set(key, { state: 'ready', stack }))
      .catch((error: unknown) => this.entries.set(key, { state: 'failed', error: error instanceof Error ? error.message : String(error) }))
      .finally(() => {
        this.generation += 1;
        for (const listener of [...this.listeners]) listener();
      });
  }
}

export const fontCache = new FontCache();
