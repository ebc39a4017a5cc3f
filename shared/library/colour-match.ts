import { deltaE2000 } from '../colour/ciede2000';
import type { Lab } from '../colour/lab';

export type PaletteEntry = { hex: string; share: number; lab: Lab };
export type ColourMatchResult = { hex: string; share: number; deltaE: number; rank: number };

// ΔE00 ≥ |ΔL*| / S_L, because the chroma and hue terms with the rotation term form a
// non-negative quadratic (|R_T| < 2), with S_L = 1 + 0.015 (L̄ − 50)² / √(20 + (L̄ − 50)²)
// (Sharma et al. 2005, eq. 16). S_L is at most ≈ 1.747 over L* 0–100, which rules most colours
// out with one subtraction; the exact S_L of the pair rules out more, and only the rest need
// the full formula.
export const MAX_LIGHTNESS_WEIGHT = 1 + (0.015 * 2500) / Math.sqrt(2520);

export function lightnessRulesOut(target: Lab, candidate: Lab, maxDistance: number): boolean {
  const dL = Math.abs(target.l - candidate.l);
  if (dL > maxDistance * MAX_LIGHTNESS_WEIGHT) return true;
  const m = (target.l + candidate.l) / 2 - 50;
  const sL = 1 + (0.015 * m * m) / Math.sqrt(20 + m * m);
  return dL / sL > maxDistance;
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
