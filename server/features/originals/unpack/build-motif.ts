import { alphaBounds } from '../../../lib/image/alpha-bounds';
import { encodeMotif } from '../../../lib/image/encode-motif';
import type { PixelBox, RgbaImage } from '../../../lib/image/rgba-image';
import type { UnpackedMotif } from './unpack-result';

export type MotifMetadata = Omit<UnpackedMotif,
  'left' | 'top' | 'width' | 'height' | 'pngFile' | 'thumbFile' | 'contentHash' | 'dhash' | 'colours'>;

export type MotifEncodeSettings = { outDir: string; pngCompressionLevel: number; ppi?: number };

// The visible box of a rendered motif, or null when it has no visible pixel.
export function trimBox(image: RgbaImage): PixelBox | null {
  return alphaBounds(image);
}

export async function buildMotif(
  image: RgbaImage, crop: PixelBox, metadata: MotifMetadata, baseName: string, settings: MotifEncodeSettings,
): Promise<UnpackedMotif> {
  const encoded = await encodeMotif(image, crop, { ...settings, baseName });
  return {
    ...metadata,
    left: image.left + crop.left,
    top: image.top + crop.top,
    width: crop.right - crop.left,
    height: crop.bottom - crop.top,
    ...encoded,
  };
}

export function motifBaseName(index: number): string {
  return `motif-${String(index + 1).padStart(3, '0')}`;
}
