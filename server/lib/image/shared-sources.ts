import type { DrawLayer } from './draw-bands';

// Sources are copied into one shared arena kept between renders: on this kind of host the first
// write to fresh memory costs far more than the copy itself (measured: 40 MB first touched in
// 120-170 ms, rewritten in 2.5 ms), so reusing the pages keeps the copy cheap. A render that
// outgrows the arena, or runs while another holds it, gets fresh memory for the rest; the arena
// then grows, up to ARENA_KEEP_BYTES, for the next one.
const ARENA_KEEP_BYTES = 256 * 1024 * 1024;
let arena: SharedArrayBuffer | null = null;
let arenaBusy = false;

type SourceData = Uint8Array | Uint8ClampedArray;

/**
 * Shared copies of one render's sources for the draw threads: `share` gives a layer whose pixels
 * sit in shared memory (a source placed twice is copied once), `release` hands the arena back
 * once no thread reads it.
 */
export function sharedMemory(): { share(layer: DrawLayer): DrawLayer; release(): void } {
  const own = !arenaBusy;
  if (own) arenaBusy = true;
  let at = 0;
  let needed = 0;
  // a source used by several layers (the same motif placed twice) is copied once
  const copies = new Map<SourceData, Uint8Array>();
  const shared = (data: SourceData): Uint8Array => {
    if (data.buffer instanceof SharedArrayBuffer) return new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
    let copy = copies.get(data);
    if (copy) return copy;
    const bytes = Math.ceil(data.byteLength / 16) * 16;
    needed += bytes;
    if (own && arena && at + bytes <= arena.byteLength) {
      copy = new Uint8Array(arena, at, data.byteLength);
      at += bytes;
    } else {
      copy = new Uint8Array(new SharedArrayBuffer(data.byteLength));
    }
    copy.set(data);
    copies.set(data, copy);
    return copy;
  };
  return {
    share: (layer) =>
      layer.kind === 'motif'
        ? { ...layer, motif: { ...layer.motif, pixels: { ...layer.motif.pixels, data: shared(layer.motif.pixels.data) } } }
        : { ...layer, image: { ...layer.image, data: shared(layer.image.data) } },
    release() {
      if (!own) return;
      if (needed > (arena?.byteLength ?? 0) && needed <= ARENA_KEEP_BYTES) arena = new SharedArrayBuffer(needed);
      arenaBusy = false;
    },
  };
}
