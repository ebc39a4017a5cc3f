import { applyRecolour, type Recolour } from '@shared/colour';

/** Something drawImage accepts whose pixel size we know: an ImageBitmap, or a canvas holding a recoloured copy. */
export type MotifBitmap = CanvasImageSource & { readonly width: number; readonly height: number };

export type LoadThumb = (motifId: string, version: number) => Promise<MotifBitmap>;

type Entry = { status: 'loading' } | { status: 'ready'; bitmap: MotifBitmap } | { status: 'failed' };

// Recoloured copies are small (thumbs are at most 320 px) but a wrap can use many; keep the recent ones.
const RECOLOUR_LIMIT = 200;

export const thumbUrl = (motifId: string, version: number) =>
  `/api/motifs/${encodeURIComponent(motifId)}/image?size=thumb&version=${version}`;

export const loadThumbOverHttp: LoadThumb = async (motifId, version) => {
  const response = await fetch(thumbUrl(motifId, version), { credentials: 'same-origin' });
  if (!response.ok) throw new Error(`thumbnail ${motifId} v${version}: HTTP ${response.status}`);
  return createImageBitmap(await response.blob());
};

/**
 * Display bitmaps of motif versions (the library's WebP thumbnails, never full resolution), and
 * recoloured copies computed with the same pixel functions the print file uses. `generation`
 * grows whenever a bitmap arrives, so the canvas knows to draw again.
 */
export class MotifImageCache {
  private thumbs = new Map<string, Entry>();
  private recoloured = new Map<string, MotifBitmap>();
  generation = 0;

  constructor(
    private readonly load: LoadThumb = loadThumbOverHttp,
    private readonly onReady: () => void = () => {},
  ) {}

  get(motifId: string, version: number): MotifBitmap | null {
    const key = `${motifId}@${version}`;
    const entry = this.thumbs.get(key);
    if (entry?.status === 'ready') return entry.bitmap;
    if (!entry) {
      this.thumbs.set(key, { status: 'loading' });
      this.load(motifId, version).then(
        (bitmap) => this.settle(key, { status: 'ready', bitmap }),
        () => this.settle(key, { status: 'failed' }),
      );
    }
    return null;
  }

  isFailed(motifId: string, version: number): boolean {
    return this.thumbs.get(`${motifId}@${version}`)?.status === 'failed';
  }

  /** The thumbnail with the placement's recolour applied; null while the thumbnail loads. */
  getRecoloured(motifId: string, version: number, recolour: Recolour): MotifBitmap | null {
    const base = this.get(motifId, version);
    if (!base || recolour.kind === 'none') return base;
    const key = `${motifId}@${version}:${JSON.stringify(recolour)}`;
    const hit = this.recoloured.get(key);
    if (hit) {
      // refresh its place in the least-recently-used order
      this.recoloured.delete(key);
      this.recoloured.set(key, hit);
      return hit;
    }
    const copy = recolourBitmap(base, recolour);
    if (!copy) return base;
    this.recoloured.set(key, copy);
    if (this.recoloured.size > RECOLOUR_LIMIT) this.recoloured.delete(this.recoloured.keys().next().value as string);
    return copy;
  }

  private settle(key: string, entry: Entry): void {
    this.thumbs.set(key, entry);
    this.generation += 1;
    this.onReady();
  }
}

function makeCanvas(width: number, height: number): HTMLCanvasElement | OffscreenCanvas | null {
  if (typeof OffscreenCanvas !== 'undefined') return new OffscreenCanvas(width, height);
  if (typeof document === 'undefined') return null;
  const c = document.createElement('canvas');
  c.width = width;
  c.height = height;
  return c;
}

function recolourBitmap(bitmap: MotifBitmap, recolour: Recolour): MotifBitmap | null {
  const canvas = makeCanvas(bitmap.width, bitmap.height);
  const ctx = canvas?.getContext('2d') as CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D | null | undefined;
  if (!canvas || !ctx) return null;
  ctx.drawImage(bitmap, 0, 0);
  const image = ctx.getImageData(0, 0, bitmap.width, bitmap.height);
  image.data.set(applyRecolour(image.data, recolour));
  ctx.putImageData(image, 0, 0);
  return canvas;
}
