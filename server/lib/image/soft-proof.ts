import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { deltaE2000, rgbToLab, type Lab } from '../../../shared/colour';
import type { SoftProof } from '../../../shared/preflight';
import type { SourcePixels } from './affine-sample';

/** Shipped with its zlib licence text beside it (ISOcoated_v2_300_bas.LICENCE.txt). */
export const PRESS_PROFILE_PATH = fileURLToPath(new URL('../../assets/icc/ISOcoated_v2_300_bas.icc', import.meta.url));
// The profile's own description and the condition it characterises (FOGRA39 data, from its targ tag).
export const PRESS_PROFILE_NAME = 'ISO Coated v2 300% (FOGRA39: ISO 12647-2 coated paper, offset), basICColor';

// ΔE00 above which a colour visibly changes on press; the threshold (a team choice).
export const SOFT_PROOF_DELTA_E = 5;
// Pixels less covered than this are mostly bare blank and are not counted (a team choice).
const INK_ALPHA = 128;

export type SoftProofResult = SoftProof & {
  profileName: string;
  /** 255 where an inked pixel moved more than SOFT_PROOF_DELTA_E. */
  movedMask: Uint8Array;
  /** The design as the press would show it: sRGB after the round trip, 3 channels, flattened on white. */
  proofed: Buffer;
  width: number;
  height: number;
};

/**
 * Sends the render RGB → CMYK (the press profile, sharp/lcms default intent) → sRGB and measures,
 * per inked pixel, how far its colour moved in CIEDE2000. Pixels are flattened on white first,
 * as the ink would sit on a white blank.
 */
export async function softProof(image: SourcePixels): Promise<SoftProofResult> {
  const { width, height } = image;
  const rgba = Buffer.from(image.data.buffer, image.data.byteOffset, image.data.byteLength);
  const flat = await sharp(rgba, { raw: { width, height, channels: 4 } }).flatten({ background: '#ffffff' }).raw().toBuffer();
  const cmyk = await sharp(flat, { raw: { width, height, channels: 3 } }).withIccProfile(PRESS_PROFILE_PATH).toColourspace('cmyk').tiff().toBuffer();
  const back = await sharp(cmyk).toColourspace('srgb').removeAlpha().raw().toBuffer();
  const movedMask = new Uint8Array(width * height);
  const labCache = new Map<number, Lab>();
  const lab = (r: number, g: number, b: number) => {
    const key = (r << 16) | (g << 8) | b;
    let v = labCache.get(key);
    if (!v) {
      v = rgbToLab({ r, g, b });
      if (labCache.size < 200_000) labCache.set(key, v);
    }
    return v;
  };
  let inked = 0;
  let moved = 0;
  for (let i = 0, p = 0; p < width * height; p++, i += 3) {
    if (image.data[p * 4 + 3] < INK_ALPHA) continue;
    inked++;
    const d = deltaE2000(lab(flat[i], flat[i + 1], flat[i + 2]), lab(back[i], back[i + 1], back[i + 2]));
    if (d > SOFT_PROOF_DELTA_E) {
      moved++;
      movedMask[p] = 255;
    }
  }
  return { shareOverDeltaE5: inked === 0 ? 0 : moved / inked, profileName: PRESS_PROFILE_NAME, movedMask, proofed: back, width, height };
}
