import { endianness } from 'node:os';
import { channelRows, decodeChannel, type ChannelRows } from './decode-channel';
import type { ScannedLayerRecord } from './scan-layer-records';
import type { GrayImage, RgbaImage } from '../../../lib/image/rgba-image';

// Spec channel ids: 0..2 colour (0 is gray in Grayscale mode), -1 transparency, -2 layer mask.
const TRANSPARENCY = -1;
const LAYER_MASK = -2;
const LITTLE_ENDIAN = endianness() === 'LE';
const ZERO_ROW = new Uint8Array(0);

export function decodeLayerPixels(file: Buffer, record: ScannedLayerRecord, large: boolean, colourModeCode: number): RgbaImage | null {
  const width = record.right - record.left;
  const height = record.bottom - record.top;
  if (width === 0 || height === 0) return null;
  const what = `Layer ${record.index + 1}`;
  const grayscale = colourModeCode === 1;
  // slots r, g, b, a; spot and extra channels (3+ in RGB, 1+ in Grayscale) are not colour
  const sources: (ChannelRows | null)[] = [null, null, null, null];
  for (const channel of record.channels) {
    const slot = channel.id === TRANSPARENCY ? 3 : channel.id;
    if (slot < 0 || slot > 3 || (grayscale && slot !== 0 && slot !== 3)) continue;
    sources[slot] = channelRows(file, channel, width, height, large, `${what}, channel ${channel.id}`);
  }
  if (grayscale) sources[1] = sources[2] = sources[0];
  const data = new Uint8Array(width * height * 4);
  // as ag-psd does: a missing transparency channel (or one without data) means opaque
  const opaque = sources[3] === null;
  const zero = ZERO_ROW.length >= width ? ZERO_ROW : new Uint8Array(width);
  if (LITTLE_ENDIAN) {
    const out = new Uint32Array(data.buffer, data.byteOffset, width * height);
    for (let y = 0; y < height; y++) {
      const r = sources[0]?.row(y) ?? zero;
      const g = sources[1] === sources[0] ? r : sources[1]?.row(y) ?? zero;
      const b = sources[2] === sources[0] ? r : sources[2]?.row(y) ?? zero;
      const a = sources[3]?.row(y) ?? zero;
      const base = y * width;
      if (opaque) for (let x = 0; x < width; x++) out[base + x] = (r[x] | (g[x] << 8) | (b[x] << 16) | 0xff000000) >>> 0;
      else for (let x = 0; x < width; x++) out[base + x] = (r[x] | (g[x] << 8) | (b[x] << 16) | (a[x] << 24)) >>> 0;
    }
  } else {
    for (let y = 0; y < height; y++) {
      const rows = [0, 1, 2, 3].map((c) => sources[c]?.row(y).slice() ?? zero);
      for (let x = 0, p = y * width * 4; x < width; x++, p += 4) {
        data[p] = rows[0][x]; data[p + 1] = rows[1][x]; data[p + 2] = rows[2][x]; data[p + 3] = opaque ? 255 : rows[3][x];
      }
    }
  }
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
