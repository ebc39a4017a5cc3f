import { deltaE2000 } from '../colour/ciede2000';
import type { Lab } from '../colour/lab';

export type PaletteEntry = { hex: string; share: number; lab: Lab };
export type ColourMatchResult = { hex: string; share: number; deltaE: number; rank: number };

// ΔE00 ≥ |ΔL*| / S_L, because the chroma and hue terms with the rotation term form a
// non-negative quadratic (|R_T| < 2), and S_L (Sharma et al. 2005, eq. 16) is at most
// 1 + 0.015·50² / √(20 + 50²) ≈ 1.747 over L* 0–100. So a colour whose lightness alone is
// farther than 1.75 × the limit cannot match, and the full formula is skipped for it.
export const MAX_LIGHTNESS_WEIGHT = 1 + (0.015 * 2500) / Math.sqrt(2520);

export function lightnessRulesOut(target: Lab, candidate: Lab, maxDistance: number): boolean {
  return Math.abs(target.l - candidate.l) > maxDistance * MAX_LIGHTNESS_WEIGHT;
}

// A motif matches through its best palette colour within maxDistance. Ranking adds up to half the
// limit for a colour that covers little of the motif: a kite that is mostly this red should come
// before a puffin with a red speck of a marginally closer red, yet an exact match still beats a
// merely similar colour covering everything.
export function bestColourMatch(target: Lab, palette: readonly PaletteEntry[], maxDistance: number): ColourMatchResult | null {
  let best: ColourMatchResult | null = null;
  for (const entry of palette) {
    if (lightnessRulesOut(target, entry.lab, maxDistance)) continue;
    const deltaE = deltaE2000(target, entry.lab);
    if (deltaE > maxDistance) continue;
    const share = Math.min(1, Math.max(0, entry.share));
    const rank = deltaE + 0.5 * maxDistance * (1 - share);
    if (!best || rank < best.rank) best = { hex: entry.hex, share: entry.share, deltaE, rank };
  }
  return best;
}
