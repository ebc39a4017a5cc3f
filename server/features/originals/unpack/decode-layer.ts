import { decodeChannel } from './decode-channel';
import type { ScannedLayerRecord } from './scan-layer-records';
import type { RgbaImage, GrayImage } from '../../../lib/image/rgba-image';

// Spec channel ids: 0..2 colour (0 is gray in Grayscale mode), -1 transparency, -2 layer mask.
const TRANSPARENCY = -1;
const LAYER_MASK = -2;

export function decodeLayerPixels(file: Buffer, record: ScannedLayerRecord, large: boolean, colourModeCode: number): RgbaImage | null {
  const width = record.right - record.left;
  const height = record.bottom - record.top;
  if (width === 0 || height === 0) return null;
  const data = new Uint8Array(width * height * 4);
  const what = `Layer ${record.index + 1}`;
  const grayscale = colourModeCode === 1;
  let hasAlpha = false;
  for (const channel of record.channels) {
    const slot = channel.id === TRANSPARENCY ? 3 : channel.id;
    // spot and extra channels (ids 3+ in RGB, 1+ in Grayscale) do not form the layer's colour
    if (slot < 0 || slot > 3 || (grayscale && slot !== 0 && slot !== 3)) continue;
    decodeChannel(file, channel, width, height, large, data, slot, 4, `${what}, channel ${channel.id}`);
    if (slot === 3) hasAlpha = true;
  }
  if (grayscale) spreadGray(data);
  if (!hasAlpha) for (let p = 3; p < data.length; p += 4) data[p] = 255;
  return { data, width, height, left: record.left, top: record.top };
}

// The layer's own pixel mask when it is present and enabled, with the colour outside its box.
export function decodeLayerMask(file: Buffer, record: ScannedLayerRecord, large: boolean): (GrayImage & { defaultColor: number }) | null {
  const mask = record.mask;
  const channel = record.channels.find((c) => c.id === LAYER_MASK);
  if (!mask || mask.disabled || !channel) return null;
  const width = mask.right - mask.left;
  const height = mask.bottom - mask.top;
  const data = new Uint8Array(width * height);
  if (width > 0 && height > 0) {
    decodeChannel(file, channel, width, height, large, data, 0, 1, `The mask of layer ${record.index + 1}`);
  }
  return { data, width, height, left: mask.left, top: mask.top, defaultColor: mask.defaultColor };
}

function spreadGray(data: Uint8Array): void {
  for (let p = 0; p < data.length; p += 4) {
    data[p + 1] = data[p];
    data[p + 2] = data[p];
  }
}
