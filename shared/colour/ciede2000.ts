import type { Lab } from './lab';

export type Ciede2000Weights = { kL: number; kC: number; kH: number };

const DEG = Math.PI / 180;
const POW25_7 = 25 ** 7;

function hueDegrees(b: number, a: number): number {
  // Sharma et al. 2005, eq. 4: h' = 0 when a' = b = 0.
  if (a === 0 && b === 0) return 0;
  const h = Math.atan2(b, a) / DEG;
  return h < 0 ? h + 360 : h;
}

// CIEDE2000 as written in Sharma, Wu & Dalal 2005, eq. 1–17, including their notes on the
// hue difference and mean hue when a chroma is zero and when hues straddle 0°/360°.
export function deltaE2000(x: Lab, y: Lab, k: Ciede2000Weights = { kL: 1, kC: 1, kH: 1 }): number {
  const c1 = Math.hypot(x.a, x.b);
  const c2 = Math.hypot(y.a, y.b);
  const cBar7 = ((c1 + c2) / 2) ** 7;
  const g = 0.5 * (1 - Math.sqrt(cBar7 / (cBar7 + POW25_7)));
  const a1p = (1 + g) * x.a;
  const a2p = (1 + g) * y.a;
  const c1p = Math.hypot(a1p, x.b);
  const c2p = Math.hypot(a2p, y.b);
  const h1p = hueDegrees(x.b, a1p);
  const h2p = hueDegrees(y.b, a2p);

  const dLp = y.l - x.l;
  const dCp = c2p - c1p;
  const chromaProduct = c1p * c2p;
  let dhp = 0;
  if (chromaProduct !== 0) {
    dhp = h2p - h1p;
    if (dhp > 180) dhp -= 360;
    else if (dhp < -180) dhp += 360;
  }
  const dHp = 2 * Math.sqrt(chromaProduct) * Math.sin((dhp / 2) * DEG);

  const lBarP = (x.l + y.l) / 2;
  const cBarP = (c1p + c2p) / 2;
  let hBarP = h1p + h2p;
  if (chromaProduct !== 0) {
    if (Math.abs(h1p - h2p) <= 180) hBarP /= 2;
    else hBarP = hBarP < 360 ? (hBarP + 360) / 2 : (hBarP - 360) / 2;
  }

  const t =
    1 -
    0.17 * Math.cos((hBarP - 30) * DEG) +
    0.24 * Math.cos(2 * hBarP * DEG) +
    0.32 * Math.cos((3 * hBarP + 6) * DEG) -
    0.2 * Math.cos((4 * hBarP - 63) * DEG);
  const dTheta = 30 * Math.exp(-(((hBarP - 275) / 25) ** 2));
  const cBarP7 = cBarP ** 7;
  const rC = 2 * Math.sqrt(cBarP7 / (cBarP7 + POW25_7));
  const lBarMinus50Sq = (lBarP - 50) ** 2;
  const sL = 1 + (0.015 * lBarMinus50Sq) / Math.sqrt(20 + lBarMinus50Sq);
  const sC = 1 + 0.045 * cBarP;
  const sH = 1 + 0.015 * cBarP * t;
  const rT = -Math.sin(2 * dTheta * DEG) * rC;

  const lTerm = dLp / (k.kL * sL);
  const cTerm = dCp / (k.kC * sC);
  const hTerm = dHp / (k.kH * sH);
  return Math.sqrt(lTerm * lTerm + cTerm * cTerm + hTerm * hTerm + rT * cTerm * hTerm);
}
