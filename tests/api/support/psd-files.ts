import { initializeCanvas, writePsdBuffer, type Layer } from 'ag-psd';

let ready = false;
function ensureAgPsd() {
  if (ready) return;
  initializeCanvas(
    () => {
      throw new Error('no canvas in tests');
    },
    (w, h) => ({ width: w, height: h, data: new Uint8ClampedArray(w * h * 4), colorSpace: 'srgb' }) as ImageData,
  );
  ready = true;
}

export type Rgba = [number, number, number, number];

export function solidLayer(name: string, left: number, top: number, width: number, height: number, colour: Rgba, extra: Partial<Layer> = {}): Layer {
  const data = new Uint8ClampedArray(width * height * 4);
  for (let i = 0; i < width * height; i++) data.set(colour, i * 4);
  return { name, left, top, right: left + width, bottom: top + height, imageData: { width, height, data, colorSpace: 'srgb' } as ImageData, ...extra };
}

// A small layered card written with ag-psd: two groups and a loose layer.
export function smallCardPsd(options: { kiteColour?: Rgba; withBasket?: boolean } = {}): Buffer {
  ensureAgPsd();
  const children: Layer[] = [
    { name: 'Puffins', opened: true, children: [solidLayer('Body', 10, 10, 20, 30, [30, 30, 40, 255]), solidLayer('Beak', 25, 15, 6, 4, [240, 120, 30, 255])] },
    { name: 'Kite', children: [solidLayer('Sail', 60, 5, 16, 16, options.kiteColour ?? [200, 40, 60, 255])] },
  ];
  if (options.withBasket ?? true) children.push(solidLayer('Picnic basket', 40, 50, 24, 12, [160, 110, 60, 255]));
  return writePsdBuffer({ width: 100, height: 80, children }, { generateThumbnail: false });
}

// A valid 26-byte header followed by nothing: enough for the header checks to speak.
export function psdHeader(fields: { version?: number; channels?: number; height?: number; width?: number; depth?: number; mode?: number }): Buffer {
  const b = Buffer.alloc(26 + 4 * 5);
  b.write('8BPS', 0, 'latin1');
  b.writeUInt16BE(fields.version ?? 1, 4);
  b.writeUInt16BE(fields.channels ?? 3, 12);
  b.writeUInt32BE(fields.height ?? 10, 14);
  b.writeUInt32BE(fields.width ?? 10, 18);
  b.writeUInt16BE(fields.depth ?? 8, 22);
  b.writeUInt16BE(fields.mode ?? 3, 24);
  return b;
}
