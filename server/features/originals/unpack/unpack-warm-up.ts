import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writePsdBuffer } from 'ag-psd';
import { resolveUnpackLimits } from './unpack-limits';
import { unpackPsd } from './unpack-psd';

// A spare child unpacks a small generated PSD while it waits, so V8 has optimised the decode and
// compositing loops and sharp has started its encoders before a real file arrives (the first
// pass over a layer's pixels runs about 3x slower than later ones).
export async function warmUpUnpacker(): Promise<void> {
  const size = 384;
  const pixels = (seed: number, alpha: (i: number) => number) => {
    const data = new Uint8ClampedArray(size * size * 4);
    for (let i = 0; i < size * size; i++) data.set([(i * seed) & 255, (i >> 3) & 255, seed, alpha(i)], i * 4);
    return { width: size, height: size, data, colorSpace: 'srgb' } as ImageData;
  };
  const file = writePsdBuffer({
    width: size, height: size,
    children: [
      { name: 'Background', left: 0, top: 0, imageData: pixels(3, () => 255) },
      { name: 'Group', opened: true, children: [
        { name: 'Soft', left: 0, top: 0, imageData: pixels(7, (i) => i & 255) },
        { name: 'Shade', left: 0, top: 0, blendMode: 'multiply', opacity: 0.6, imageData: pixels(11, (i) => (i % 3 ? 255 : 0)) },
      ] },
    ],
  });
  const outDir = mkdtempSync(join(tmpdir(), 'motifold-warm-up-'));
  try {
    for (const cut of ['layers', 'groups', 'layers'] as const) await unpackPsd(Buffer.from(file), { outDir, cut, limits: resolveUnpackLimits() });
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}
