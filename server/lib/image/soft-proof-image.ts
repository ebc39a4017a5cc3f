import sharp from 'sharp';
import type { RgbaImage } from './rgba-image';
import type { SoftProofResult } from './soft-proof';

// Stripes over colours the press moves: dark and light in turn, so they show on any colour (our own marking).
const MARK_DARK = [122, 28, 70] as const;
const MARK_LIGHT = [255, 255, 255] as const;
// Stripe period in pixels of the returned image, diagonal so it never lines up with artwork edges.
const STRIPE_PX = 6;

/**
 * The design as the press would show it, as an RGBA PNG the editor draws over the blank: the
 * soft proof's colours with the render's own coverage (the white flattening undone, so a
 * half-covered edge drawn over white gives back exactly the proofed colour). With `mask`, the
 * pixels that moved more than ΔE00 5 are striped.
 */
export async function softProofPng(render: RgbaImage, proof: SoftProofResult, options: { mask: boolean }): Promise<Buffer> {
  const { width, height } = proof;
  const out = Buffer.alloc(width * height * 4);
  const src = render.data;
  const back = proof.proofed;
  for (let p = 0; p < width * height; p++) {
    const a = src[p * 4 + 3];
    const o = p * 4;
    if (a === 0) continue;
    if (options.mask && proof.movedMask[p] === 255) {
      const x = p % width;
      const y = (p - x) / width;
      const mark = Math.floor((x + y) / STRIPE_PX) % 2 === 0 ? MARK_DARK : MARK_LIGHT;
      out[o] = mark[0];
      out[o + 1] = mark[1];
      out[o + 2] = mark[2];
      out[o + 3] = 255;
      continue;
    }
    const k = a / 255;
    for (let c = 0; c < 3; c++) {
      // proofed = k·colour + (1 − k)·255  =>  colour = (proofed − (1 − k)·255) / k
      const v = (back[p * 3 + c] - (1 - k) * 255) / k;
      out[o + c] = v < 0 ? 0 : v > 255 ? 255 : Math.round(v);
    }
    out[o + 3] = a;
  }
  return sharp(out, { raw: { width, height, channels: 4 } }).png({ compressionLevel: 6 }).toBuffer();
}
