import { readFileSync } from 'node:fs';
import { converter, displayable } from 'culori';
import { describe, expect, it } from 'vitest';
import { PRESS_PROFILE_NAME, softProof } from './soft-proof';

function image(pixels: [number, number, number, number][]) {
  const data = new Uint8Array(pixels.length * 4);
  pixels.forEach((p, i) => data.set(p, i * 4));
  return { data, width: pixels.length, height: 1 };
}

// FOGRA39L measured solids (Lab D50), reference/cmyk-solids-lab-d50.csv (icc-profiles-free)
const solids = readFileSync(new URL('../../../../shared/reference/cmyk-solids-lab-d50.csv', import.meta.url), 'utf8')
  .trim().split('\n').slice(1).map((l) => l.split(','))
  .filter((c) => c[0] === 'FOGRA39L' && c[1] !== 'paper')
  .map((c) => ({ patch: c[1], lab: { mode: 'lab' as const, l: Number(c[6]), a: Number(c[7]), b: Number(c[8]) } }));

describe('soft proof through the FOGRA39 press profile', () => {
  it('names the printing condition it represents', async () => {
    expect(PRESS_PROFILE_NAME).toMatch(/FOGRA39/);
    expect((await softProof(image([[128, 128, 128, 255]]))).profileName).toBe(PRESS_PROFILE_NAME);
  });

  it('moves saturated screen colours beyond ΔE00 5 and leaves greys alone', async () => {
    // sRGB primaries lie outside coated offset's gamut (from memory); a mid grey prints as it is
    const proof = await softProof(image([[0, 0, 255, 255], [0, 255, 0, 255], [128, 128, 128, 255], [200, 200, 200, 255]]));
    expect([...proof.movedMask]).toEqual([255, 255, 0, 0]);
    expect(proof.shareOverDeltaE5).toBe(0.5);
  });

  it('does not count bare blank (transparent pixels)', async () => {
    const proof = await softProof(image([[0, 0, 255, 255], [0, 0, 255, 0], [0, 0, 255, 10], [90, 90, 90, 255]]));
    expect(proof.shareOverDeltaE5).toBe(0.5);
  });

  it('keeps colours the press itself prints: the measured FOGRA39 solids that sRGB can show', async () => {
    // culori: mode 'lab' is CIELAB D50, converted to sRGB with Bradford adaptation
    const toRgb = converter('rgb');
    const inGamut = solids.filter((s) => displayable(s.lab));
    expect(inGamut.length).toBeGreaterThan(0);
    const pixels = inGamut.map((s) => {
      const c = toRgb(s.lab);
      return [c.r, c.g, c.b].map((v) => Math.round(v * 255)).concat(255) as [number, number, number, number];
    });
    const proof = await softProof(image(pixels));
    expect(proof.shareOverDeltaE5).toBe(0);
  });
});
