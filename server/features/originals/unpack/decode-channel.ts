import { inflateSync } from 'node:zlib';
import type { ScannedChannel } from './scan-layer-records';
import { UnpackError } from './unpack-error';

// One 8-bit channel, read row by row. Adobe Photoshop File Formats Specification, "Channel
// image data": 0 raw; 1 RLE, i.e. one byte count per row (2 bytes in PSD, 4 in PSB) then
// PackBits rows; 2 zip; 3 zip with prediction (each byte stored as the difference from its
// left neighbour). RLE rows are unpacked into a small reused buffer, so a layer is assembled
// row by row without a full-size plane per channel.
export type ChannelRows = { row(y: number): Uint8Array };

export function channelRows(
  file: Buffer, channel: ScannedChannel, width: number, height: number, large: boolean, what: string,
): ChannelRows | null {
  if (width === 0 || height === 0 || channel.dataLength === 0) return null;
  const data = file.subarray(channel.dataOffset, channel.dataOffset + channel.dataLength);
  switch (channel.compression) {
    case 0: return planeRows(checkedPlane(data, width * height, what), width);
    case 1: return rleRows(data, width, height, large, what);
    case 2: return planeRows(checkedPlane(inflateBounded(data, width * height, what), width * height, what), width);
    case 3: {
      const plane = checkedPlane(inflateBounded(data, width * height, what), width * height, what);
      undoPrediction(plane, width, height);
      return planeRows(plane, width);
    }
    default:
      throw new UnpackError('psd.corrupt', `${what} uses an unknown compression (${channel.compression})`);
  }
}

// Decodes one channel into every `step`-th byte of `target`, starting at `offset`.
export function decodeChannel(
  file: Buffer, channel: ScannedChannel, width: number, height: number, large: boolean,
  target: Uint8Array, offset: number, step: number, what: string,
): void {
  const rows = channelRows(file, channel, width, height, large, what);
  if (!rows) return;
  for (let y = 0; y < height; y++) {
    const row = rows.row(y);
    if (step === 1) target.set(row, offset + y * width);
    else for (let x = 0, p = offset + y * width * step; x < width; x++, p += step) target[p] = row[x];
  }
}

function planeRows(plane: Uint8Array, width: number): ChannelRows {
  return { row: (y) => plane.subarray(y * width, y * width + width) };
}

function checkedPlane(data: Uint8Array, pixels: number, what: string): Uint8Array {
  if (data.length < pixels) throw new UnpackError('psd.corrupt', `${what} holds fewer pixels than its size declares`);
  return data;
}

// A zip channel can declare a few bytes and inflate to gigabytes: stop at the layer's size.
function inflateBounded(data: Uint8Array, expected: number, what: string): Buffer {
  try {
    return inflateSync(data, { maxOutputLength: Math.max(1, expected) });
  } catch (error) {
    const code = (error as { code?: string }).code;
    if (code === 'ERR_BUFFER_TOO_LARGE' || error instanceof RangeError) {
      throw new UnpackError('psd.corrupt', `${what} inflates to more data than its size declares; the file is damaged or hostile`);
    }
    throw new UnpackError('psd.corrupt', `${what} has damaged zip data`);
  }
}

function undoPrediction(data: Uint8Array, width: number, height: number): void {
  for (let y = 0; y < height; y++) {
    let p = y * width;
    const end = p + width;
    for (p++; p < end; p++) data[p] = (data[p] + data[p - 1]) & 0xff;
  }
}

function rleRows(data: Uint8Array, width: number, height: number, large: boolean, what: string): ChannelRows {
  const countBytes = large ? 4 : 2;
  const tableEnd = height * countBytes;
  if (tableEnd > data.length) throw new UnpackError('psd.corrupt', `${what} ends inside its RLE row table`);
  const view = new DataView(data.buffer, data.byteOffset, data.byteLength);
  const starts = new Float64Array(height + 1);
  starts[0] = tableEnd;
  for (let y = 0; y < height; y++) starts[y + 1] = starts[y] + (large ? view.getUint32(y * 4) : view.getUint16(y * 2));
  if (starts[height] > data.length) throw new UnpackError('psd.corrupt', `${what} declares more RLE data than it holds`);
  const buffer = new Uint8Array(width);
  return {
    row(y) {
      buffer.fill(0);
      unpackBitsRow(data, starts[y], starts[y + 1], buffer, 0, width);
      return buffer;
    },
  };
}

// PackBits: header n in 0..127 copies n+1 literal bytes; 129..255 repeats the next byte 257-n
// times; 128 is a no-op. Runs past the row's end are cut, as readers do; a short row stays 0.
function unpackBitsRow(data: Uint8Array, start: number, end: number, out: Uint8Array, p: number, stop: number): void {
  let i = start;
  while (i < end && p < stop) {
    const header = data[i++];
    if (header < 128) {
      const n = Math.min(header + 1, end - i, stop - p);
      if (n > 48) out.set(data.subarray(i, i + n), p);
      else for (let j = 0; j < n; j++) out[p + j] = data[i + j];
      i += header + 1;
      p += n;
    } else if (header > 128) {
      if (i >= end) break;
      const n = Math.min(257 - header, stop - p);
      const value = data[i++];
      if (n > 32) out.fill(value, p, p + n);
      else for (let j = 0; j < n; j++) out[p + j] = value;
      p += n;
    }
  }
}
