import { formatMegapixels } from './psd-header';
import type { LayerScan } from './scan-layer-records';
import { UnpackError } from './unpack-error';
import type { UnpackLimits } from './unpack-limits';

// Checked on the scanned records, before any pixel buffer exists: a 900-byte file can declare
// a 20,000 x 20,000 layer, and decoding it would allocate 1.6 GB.
export function checkLayerBudget(scan: LayerScan, limits: UnpackLimits): { totalPixels: number; largestPixels: number } {
  if (scan.records.length > limits.maxLayers) {
    throw new UnpackError('psd.too_many_layers',
      `The file has ${scan.records.length} layers; this server accepts up to ${limits.maxLayers}`);
  }
  let totalPixels = 0;
  let largestPixels = 0;
  for (const record of scan.records) {
    const areas = [(record.right - record.left) * (record.bottom - record.top)];
    if (record.mask) areas.push((record.mask.right - record.mask.left) * (record.mask.bottom - record.mask.top));
    for (const pixels of areas) {
      if (pixels > limits.maxLayerPixels) {
        throw new UnpackError('psd.layer_too_large',
          `Layer ${record.index + 1} is ${formatMegapixels(pixels)}, more than the ${formatMegapixels(limits.maxLayerPixels)} one layer may have`);
      }
      totalPixels += pixels;
      largestPixels = Math.max(largestPixels, pixels);
    }
  }
  if (totalPixels > limits.maxTotalLayerPixels) {
    throw new UnpackError('psd.layers_too_large',
      `The layers add up to ${formatMegapixels(totalPixels)}, more than the ${formatMegapixels(limits.maxTotalLayerPixels)} this server unpacks from one file`);
  }
  return { totalPixels, largestPixels };
}
