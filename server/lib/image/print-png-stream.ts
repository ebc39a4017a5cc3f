import { constants, crc32, createDeflate } from 'node:zlib';
import type { RgbaImage } from './rgba-image';

// W3C PNG specification (second edition): signature, chunk layout (length, type, data, CRC-32
// over type and data), IHDR, sRGB, pHYs, IDAT (one zlib stream over filtered scanlines), IEND.
const SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

// zlib's output buffer per call into the thread pool: larger than one compressed band of the
// 11 oz mug wrap (about 120 kB), so a band is compressed in one trip while JS draws the next.
const DEFLATE_CHUNK = 512 * 1024;

export type PngRowStream = {
  /** Rows [top, bottom) of the image, in order from the top; resolves once zlib has taken them. */
  writeRows: (image: RgbaImage, top: number, bottom: number) => Promise<void>;
  /** The whole PNG, after the last row. */
  finish: () => Promise<Buffer>;
};

/**
 * An 8-bit RGBA PNG written as its rows arrive: each band of scanlines (filter type 0, None, as
 * the print settings ask for no adaptive filtering) goes straight into a zlib deflate stream at
 * `level`, which compresses on libuv's thread pool while the caller draws the next band. Tagged
 * sRGB (rendering intent 0) and with the DPI in pHYs, like the sharp-encoded print file.
 */
export function pngRowStream(width: number, height: number, options: { dpi: number; level: number }): PngRowStream {
  const deflate = createDeflate({ level: options.level, chunkSize: DEFLATE_CHUNK, strategy: constants.Z_DEFAULT_STRATEGY });
  const compressed: Buffer[] = [];
  deflate.on('data', (chunk: Buffer) => compressed.push(chunk));
  const done = new Promise<void>((resolve, reject) => {
    deflate.once('end', resolve);
    deflate.once('error', reject);
  });
  done.catch(() => undefined);
  let next = 0;
  const stride = width * 4;

  return {
    async writeRows(image, top, bottom) {
      if (image.width !== width || top !== next || bottom > height || bottom <= top) throw new Error(`PNG rows ${top}..${bottom} out of order (expected from ${next}, ${height} rows of ${width} px)`);
      const lines = Buffer.allocUnsafe((bottom - top) * (stride + 1));
      for (let y = top, at = 0; y < bottom; y++, at += stride + 1) {
        lines[at] = 0; // filter type None
        lines.set(image.data.subarray(y * stride, (y + 1) * stride), at + 1);
      }
      next = bottom;
      // zlib takes the buffer as it is and compresses it on the thread pool; waiting one macrotask
      // lets the stream start it (or hand over the band queued before it) before drawing goes on
      deflate.write(lines);
      await new Promise((resolve) => setImmediate(resolve));
    },
    async finish() {
      if (next !== height) throw new Error(`PNG has ${next} of ${height} rows`);
      deflate.end();
      await done;
      const idat = Buffer.concat(compressed);
      return Buffer.concat([SIGNATURE, chunk('IHDR', ihdr(width, height)), chunk('sRGB', Buffer.from([0])), chunk('pHYs', phys(options.dpi)), chunk('IDAT', idat), chunk('IEND', Buffer.alloc(0))]);
    },
  };
}

function chunk(type: string, data: Buffer): Buffer {
  const out = Buffer.allocUnsafe(12 + data.length);
  out.writeUInt32BE(data.length, 0);
  out.write(type, 4, 'latin1');
  data.copy(out, 8);
  out.writeUInt32BE(crc32(out.subarray(4, 8 + data.length)) >>> 0, 8 + data.length);
  return out;
}

function ihdr(width: number, height: number): Buffer {
  const data = Buffer.alloc(13);
  data.writeUInt32BE(width, 0);
  data.writeUInt32BE(height, 4);
  data[8] = 8; // bit depth
  data[9] = 6; // colour type: truecolour with alpha
  // compression 0 (deflate), filter method 0, no interlace: already zero
  return data;
}

// pHYs: pixels per metre on both axes, unit 1 (metre); 1 inch = 0.0254 m.
function phys(dpi: number): Buffer {
  const data = Buffer.alloc(9);
  const perMetre = Math.round(dpi / 0.0254);
  data.writeUInt32BE(perMetre, 0);
  data.writeUInt32BE(perMetre, 4);
  data[8] = 1;
  return data;
}
