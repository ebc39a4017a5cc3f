import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import type { SoftProofResult } from './soft-proof';
import { softProofPng } from './soft-proof-image';

// Three pixels: full cover, half cover, bare blank.
const render = { data: new Uint8Array([200, 30, 40, 255, 200, 30, 40, 128, 0, 0, 0, 0]), width: 3, height: 1, left: 0, top: 0 };
const half = 128 / 255;
// what the proof returns for them: the colours flattened on white, after the press round trip
const proofed = Buffer.from([180, 60, 60, Math.round(180 * half + 255 * (1 - half)), Math.round(60 * half + 255 * (1 - half)), Math.round(60 * half + 255 * (1 - half)), 255, 255, 255]);
const proof = (moved: number[]): SoftProofResult => ({
  shareOverDeltaE5: 0.5, profileName: 'test', movedMask: new Uint8Array(moved), proofed, width: 3, height: 1,
});

const decode = async (png: Buffer) => Array.from((await sharp(png).ensureAlpha().raw().toBuffer()));

describe('the soft proof image drawn by the editor', () => {
  it('keeps the render’s coverage, undoing the white flattening so edges land on the proofed colour', async () => {
    const px = await decode(await softProofPng(render, proof([0, 0, 0]), { mask: false }));
    expect(px.slice(0, 4)).toEqual([180, 60, 60, 255]);
    // the half-covered pixel: drawn over white it gives back the proofed (flattened) colour, within rounding
    expect(px[7]).toBe(128);
    for (let c = 0; c < 3; c++) expect(Math.abs(px[4 + c] * half + 255 * (1 - half) - proofed[3 + c])).toBeLessThanOrEqual(1);
    expect(px[11]).toBe(0);
  });

  it('stripes only the pixels that moved, fully opaque', async () => {
    const px = await decode(await softProofPng(render, proof([255, 0, 0]), { mask: true }));
    expect(px.slice(0, 4)).toEqual([122, 28, 70, 255]);
    expect(px.slice(4, 7)).not.toEqual([122, 28, 70]);
  });
});
