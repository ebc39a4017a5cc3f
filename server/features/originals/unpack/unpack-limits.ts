// Bounds that keep one hostile or oversized original from taking the server down. Sizes are
// checked from the file's structure before any pixel buffer is allocated.
export type UnpackLimits = {
  maxFileBytes: number;
  // width x height of the document (and of a flat image)
  maxDocumentPixels: number;
  // width x height of any one layer or layer mask
  maxLayerPixels: number;
  // sum of width x height over all layers and masks
  maxTotalLayerPixels: number;
  maxLayers: number;
  // wall clock for the whole unpack, child start included
  timeoutMs: number;
  // resident memory of the child; the parent kills it above this
  maxMemoryBytes: number;
  // V8 heap of the child (pixel buffers live outside it, hence the RSS watch as well)
  maxHeapMb: number;
  // encodes kept in flight while the next layer is decoded (each holds one RGBA buffer)
  encodesInFlight: number;
  // zlib level of the PNG masters: 1 is ~1.8x faster than 6 for ~40 % larger files
  pngCompressionLevel: number;
};

const MiB = 1024 * 1024;

export const defaultUnpackLimits: UnpackLimits = {
  maxFileBytes: 1024 * MiB,
  // 12,000 x 12,000: a 40 x 40 in poster at 300 PPI
  maxDocumentPixels: 144_000_000,
  maxLayerPixels: 144_000_000,
  maxTotalLayerPixels: 600_000_000,
  maxLayers: 2000,
  timeoutMs: 180_000,
  maxMemoryBytes: 2048 * MiB,
  maxHeapMb: 1024,
  encodesInFlight: 2,
  pngCompressionLevel: 1,
};

export function resolveUnpackLimits(overrides?: Partial<UnpackLimits>): UnpackLimits {
  const limits = { ...defaultUnpackLimits };
  for (const [key, value] of Object.entries(overrides ?? {}) as [keyof UnpackLimits, number | undefined][]) {
    if (typeof value === 'number' && Number.isFinite(value) && value > 0) limits[key] = value;
  }
  limits.encodesInFlight = Math.max(1, Math.min(8, Math.floor(limits.encodesInFlight)));
  limits.pngCompressionLevel = Math.max(0, Math.min(9, Math.floor(limits.pngCompressionLevel)));
  return limits;
}
