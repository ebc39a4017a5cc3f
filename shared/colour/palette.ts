import { linearRgbToOklab, type Oklab } from './oklab';
import { BYTE_TO_LINEAR, rgbToHex } from './srgb';

export type DominantColour = { hex: string; share: number; oklab: Oklab };

export type DominantColourOptions = {
  /** Most swatches to return (default 6). */
  max?: number;
  /** Pixels with alpha below this are ignored (default 128). */
  alphaThreshold?: number;
  /** Most pixels read, on a fixed stride (default 40 000), so big motifs stay fast. */
  sampleLimit?: number;
  /** Clusters whose centres are closer than this OKLab distance become one swatch. */
  mergeDistance?: number;
};

// About 1.5 just-noticeable differences; an OKLab JND of ~0.02 is from memory.
const DEFAULT_MERGE_DISTANCE = 0.03;
const MAX_ITERATIONS = 30;
const SEED = 0x6d6f7469;

type WeightedColours = { keys: number[]; lab: Float64Array; weight: Float64Array; total: number };

/** Swatches of a motif: k-means++ in OKLab on a deterministic sample, biggest share first. */
export function dominantColours(
  rgba: Uint8Array | Uint8ClampedArray,
  width: number,
  height: number,
  options: DominantColourOptions = {},
): DominantColour[] {
  const max = clampInt(options.max ?? 6, 1, 64);
  const alphaThreshold = options.alphaThreshold ?? 128;
  const sampleLimit = clampInt(options.sampleLimit ?? 40_000, 1, 4_000_000);
  const mergeDistance = options.mergeDistance ?? DEFAULT_MERGE_DISTANCE;

  const colours = sampleOpaqueColours(rgba, width, height, alphaThreshold, sampleLimit);
  if (colours.total === 0) return [];

  let centres = seedCentres(colours, max, mulberry32(SEED));
  centres = refine(colours, centres);
  centres = refine(colours, mergeClose(colours, centres, mergeDistance));

  const assignment = assign(colours, centres);
  const swatches: DominantColour[] = [];
  for (let c = 0; c < centres.length / 3; c++) {
    let weight = 0;
    let best = -1;
    let bestDistance = Infinity;
    for (let i = 0; i < colours.keys.length; i++) {
      if (assignment[i] !== c) continue;
      weight += colours.weight[i];
      const d = distanceSq(colours.lab, i, centres, c);
      if (d < bestDistance) [bestDistance, best] = [d, i];
    }
    if (best < 0) continue;
    // The swatch is a real colour of the motif (the one nearest its cluster's centre), so a
    // colour swap picked from it matches those pixels exactly.
    const key = colours.keys[best];
    swatches.push({
      hex: rgbToHex({ r: key >> 16, g: (key >> 8) & 0xff, b: key & 0xff }),
      share: weight / colours.total,
      oklab: { l: colours.lab[best * 3], a: colours.lab[best * 3 + 1], b: colours.lab[best * 3 + 2] },
    });
  }
  return swatches.sort((x, y) => y.share - x.share || (x.hex < y.hex ? -1 : x.hex > y.hex ? 1 : 0));
}

function sampleOpaqueColours(
  rgba: Uint8Array | Uint8ClampedArray,
  width: number,
  height: number,
  alphaThreshold: number,
  sampleLimit: number,
): WeightedColours {
  const w = Number.isFinite(width) ? Math.max(0, Math.floor(width)) : 0;
  const h = Number.isFinite(height) ? Math.max(0, Math.floor(height)) : 0;
  const pixels = Math.min(w * h, Math.floor(rgba.length / 4));
  const counts = new Map<number, number>();
  let total = 0;
  if (pixels > 0) {
    let stride = Math.max(1, Math.ceil(pixels / sampleLimit));
    // A stride sharing a factor with the width revisits the same columns on every row.
    while (stride > 1 && gcd(stride, w) > 1) stride++;
    for (let p = 0; p < pixels; p += stride) {
      const i = p * 4;
      if (rgba[i + 3] < alphaThreshold) continue;
      const key = (rgba[i] << 16) | (rgba[i + 1] << 8) | rgba[i + 2];
      counts.set(key, (counts.get(key) ?? 0) + 1);
      total++;
    }
  }
  const keys = [...counts.keys()];
  const lab = new Float64Array(keys.length * 3);
  const weight = new Float64Array(keys.length);
  keys.forEach((key, i) => {
    const o = linearRgbToOklab(BYTE_TO_LINEAR[key >> 16], BYTE_TO_LINEAR[(key >> 8) & 0xff], BYTE_TO_LINEAR[key & 0xff]);
    lab[i * 3] = o.l;
    lab[i * 3 + 1] = o.a;
    lab[i * 3 + 2] = o.b;
    weight[i] = counts.get(key) ?? 0;
  });
  return { keys, lab, weight, total };
}

/** k-means++ seeding; the first centre is the most frequent colour so the seed matters less. */
function seedCentres(colours: WeightedColours, k: number, random: () => number): Float64Array {
  const n = colours.keys.length;
  let first = 0;
  for (let i = 1; i < n; i++) if (colours.weight[i] > colours.weight[first]) first = i;
  const chosen = [first];
  const nearest = new Float64Array(n).fill(Infinity);
  while (chosen.length < Math.min(k, n)) {
    const last = chosen[chosen.length - 1];
    let sum = 0;
    for (let i = 0; i < n; i++) {
      nearest[i] = Math.min(nearest[i], distanceSq(colours.lab, i, colours.lab, last));
      sum += nearest[i] * colours.weight[i];
    }
    if (sum <= 1e-12) break; // every colour already sits on a centre
    let target = random() * sum;
    let pick = n - 1;
    for (let i = 0; i < n; i++) {
      target -= nearest[i] * colours.weight[i];
      if (target <= 0 && nearest[i] > 0) {
        pick = i;
        break;
      }
    }
    chosen.push(pick);
  }
  const centres = new Float64Array(chosen.length * 3);
  chosen.forEach((p, c) => centres.set(colours.lab.subarray(p * 3, p * 3 + 3), c * 3));
  return centres;
}

/** Lloyd iterations; empty clusters are dropped. */
function refine(colours: WeightedColours, start: Float64Array): Float64Array {
  let centres = start;
  let previous: Int32Array | null = null;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    const assignment = assign(colours, centres);
    if (previous && assignment.every((c, i) => c === previous![i])) break;
    previous = assignment;
    const k = centres.length / 3;
    const sums = new Float64Array(k * 4);
    for (let i = 0; i < assignment.length; i++) {
      const c = assignment[i];
      const w = colours.weight[i];
      sums[c * 4] += colours.lab[i * 3] * w;
      sums[c * 4 + 1] += colours.lab[i * 3 + 1] * w;
      sums[c * 4 + 2] += colours.lab[i * 3 + 2] * w;
      sums[c * 4 + 3] += w;
    }
    const next: number[] = [];
    for (let c = 0; c < k; c++) {
      const w = sums[c * 4 + 3];
      if (w > 0) next.push(sums[c * 4] / w, sums[c * 4 + 1] / w, sums[c * 4 + 2] / w);
    }
    if (next.length !== centres.length) previous = null;
    centres = Float64Array.from(next);
  }
  return centres;
}

function mergeClose(colours: WeightedColours, start: Float64Array, mergeDistance: number): Float64Array {
  const assignment = assign(colours, start);
  const k = start.length / 3;
  const clusters = Array.from({ length: k }, (_, c) => ({ lab: Array.from(start.subarray(c * 3, c * 3 + 3)), weight: 0 }));
  assignment.forEach((c, i) => (clusters[c].weight += colours.weight[i]));
  const limitSq = mergeDistance * mergeDistance;
  for (;;) {
    let pair: [number, number] | null = null;
    let closest = limitSq;
    for (let i = 0; i < clusters.length; i++)
      for (let j = i + 1; j < clusters.length; j++) {
        const d = distanceSq(clusters[i].lab, 0, clusters[j].lab, 0);
        if (d < closest) [closest, pair] = [d, [i, j]];
      }
    if (!pair) break;
    const [x, y] = [clusters[pair[0]], clusters[pair[1]]];
    const total = x.weight + y.weight || 1;
    x.lab = x.lab.map((v, axis) => (v * x.weight + y.lab[axis] * y.weight) / total);
    x.weight += y.weight;
    clusters.splice(pair[1], 1);
  }
  return Float64Array.from(clusters.flatMap((c) => c.lab));
}

function assign(colours: WeightedColours, centres: Float64Array): Int32Array {
  const k = centres.length / 3;
  const assignment = new Int32Array(colours.keys.length);
  for (let i = 0; i < assignment.length; i++) {
    let best = 0;
    let bestDistance = Infinity;
    for (let c = 0; c < k; c++) {
      const d = distanceSq(colours.lab, i, centres, c);
      if (d < bestDistance) [bestDistance, best] = [d, c];
    }
    assignment[i] = best;
  }
  return assignment;
}

function distanceSq(a: ArrayLike<number>, i: number, b: ArrayLike<number>, j: number): number {
  const dl = a[i * 3] - b[j * 3];
  const da = a[i * 3 + 1] - b[j * 3 + 1];
  const db = a[i * 3 + 2] - b[j * 3 + 2];
  return dl * dl + da * da + db * db;
}

function clampInt(v: number, lo: number, hi: number): number {
  return Number.isFinite(v) ? Math.min(hi, Math.max(lo, Math.floor(v))) : lo;
}

function gcd(a: number, b: number): number {
  while (b) [a, b] = [b, a % b];
  return a;
}

function mulberry32(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
