import { inflateSync } from 'node:zlib';
import type { ScannedChannel } from './scan-layer-records';
import { UnpackError } from './unpack-error';

// Decodes one 8-bit channel into every `step`-th byte of `target`, starting at `offset`.
// Adobe Photoshop File Formats Specification, "Channel image data": 0 raw; 1 RLE, i.e. one
// byte count per row (2 bytes in PSD, 4 in PSB) then PackBits rows; 2 zip; 3 zip with
// prediction (each byte stored as the difference from its left neighbour).
export function decodeChannel(
  file: Buffer, channel: ScannedChannel, width: number, height: number, large: boolean,
  target: Uint8Array, offset: number, step: number, what: string,
): void {
  if (width === 0 || height === 0 || channel.dataLength === 0) return;
  const data = file.subarray(channel.dataOffset, channel.dataOffset + channel.dataLength);
  switch (channel.compression) {
    case 0: return copyRaw(data, width * height, target, offset, step, what);
    case 1: return decodeRle(data, width, height, large, target, offset, step, what);
    case 2: return copyRaw(inflateBounded(data, width * height, what), width * height, target, offset, step, what);
    case 3: {
      const plain = inflateBounded(data, width * height, what);
      undoPrediction(plain, width, height);
      return copyRaw(plain, width * height, target, offset, step, what);
    }
    default:
      throw new UnpackError('psd.corrupt', `${what} uses an unknown compression (${channel.compression})`);
  }
}

function copyRaw(data: Uint8Array, pixels: number, target: Uint8Array, offset: number, step: number, what: string): void {
  if (data.length < pixels) throw new UnpackError('psd.corrupt', `${what} holds fewer pixels than its size declares`);
  if (step === 1 && offset === 0) {
    target.set(data.subarray(0, pixels));
    return;
  }
  for (let i = 0, p = offset; i < pixels; i++, p += step) target[p] = data[i];
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

function decodeRle(
  data: Uint8Array, width: number, height: number, large: boolean,
  target: Uint8Array, offset: number, step: number, what: string,
): void {
  // decode into a plane first (native fill/set for long runs), then spread it out: about
  // twice as fast as writing every byte with a stride
  const plane = step === 1 && offset === 0 ? target : scratchPlane(width * height);
  const countBytes = large ? 4 : 2;
  let position = height * countBytes;
  if (position > data.length) throw new UnpackError('psd.corrupt', `${what} ends inside its RLE row table`);
  const view = new DataView(data.buffer, data.byteOffset, data.byteLength);
  for (let y = 0; y < height; y++) {
    const rowBytes = large ? view.getUint32(y * 4) : view.getUint16(y * 2);
    const rowEnd = position + rowBytes;
    if (rowEnd > data.length) throw new UnpackError('psd.corrupt', `${what} declares more RLE data than it holds`);
    unpackBitsRow(data, position, rowEnd, plane, y * width, y * width + width);
    position = rowEnd;
  }
  if (plane !== target) spread(plane, width * height, target, offset, step);
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

function spread(plane: Uint8Array, pixels: number, target: Uint8Array, offset: number, step: number): void {
  for (let i = 0, p = offset; i < pixels; i++, p += step) target[p] = plane[i];
}

let scratch = new Uint8Array(0);

// one plane reused across channels and layers (decoding is synchronous and single-threaded)
function scratchPlane(pixels: number): Uint8Array {
  if (scratch.length < pixels) scratch = new Uint8Array(pixels);
  const plane = scratch.subarray(0, pixels);
  plane.fill(0);
  return plane;
}

export function releaseScratchPlane(): void {
  scratch = new Uint8Array(0);
}
