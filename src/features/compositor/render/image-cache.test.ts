import { describe, expect, it, vi } from 'vitest';
import { canvasCompositeFor } from './blend-modes';
import { MotifImageCache, thumbUrl, type MotifBitmap } from './image-cache';

describe('motif image cache', () => {
  it('asks for each motif version’s thumbnail once and redraws when it arrives', async () => {
    const bitmap = { width: 32, height: 48 } as MotifBitmap;
    const load = vi.fn(async () => bitmap);
    const ready = vi.fn();
    const cache = new MotifImageCache(load, ready);
    expect(cache.get('m-puffin', 2)).toBeNull();
    expect(cache.get('m-puffin', 2)).toBeNull();
    await vi.waitFor(() => expect(ready).toHaveBeenCalledTimes(1));
    expect(cache.get('m-puffin', 2)).toBe(bitmap);
    expect(load).toHaveBeenCalledTimes(1);
    expect(cache.generation).toBe(1);
  });

  it('remembers a failed thumbnail instead of asking again on every frame', async () => {
    const load = vi.fn(async () => { throw new Error('404'); });
    const cache = new MotifImageCache(load, () => {});
    cache.get('gone', 1);
    await vi.waitFor(() => expect(cache.isFailed('gone', 1)).toBe(true));
    cache.get('gone', 1);
    expect(load).toHaveBeenCalledTimes(1);
  });

  it('asks for the small thumbnail of the exact version, never the full-resolution image', () => {
    expect(thumbUrl('m 1', 3)).toBe('/api/motifs/m%201/image?size=thumb&version=3');
  });
});

describe('blend modes', () => {
  it('draws the PSD mode names with the canvas modes of the same W3C Compositing Level 1 formula', () => {
    // W3C Compositing and Blending Level 1 §10: "color-dodge", "soft-light" … are the canvas keywords
    expect(canvasCompositeFor('normal')).toBe('source-over');
    expect(canvasCompositeFor('color dodge')).toBe('color-dodge');
    expect(canvasCompositeFor('soft light')).toBe('soft-light');
    expect(canvasCompositeFor('multiply')).toBe('multiply');
  });
});
