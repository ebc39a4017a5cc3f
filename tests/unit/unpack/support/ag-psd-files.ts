import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writePsdBuffer, type Layer, type Psd } from 'ag-psd';

export function pixels(width: number, height: number, rgba: number[][]): ImageData {
  const data = new Uint8ClampedArray(width * height * 4);
  rgba.forEach((px, i) => data.set(px, i * 4));
  return { width, height, data, colorSpace: 'srgb' } as ImageData;
}

export function solid(width: number, height: number, rgba: number[]): ImageData {
  return pixels(width, height, Array.from({ length: width * height }, () => rgba));
}

export function layer(name: string, left: number, top: number, imageData: ImageData, extra: Partial<Layer> = {}): Layer {
  return { name, left, top, imageData, ...extra };
}

// Writes a PSD with ag-psd (RLE) into a fresh temporary folder; returns its path and the folder.
export function writeTestPsd(psd: Psd, fileName = 'test.psd'): { file: string; dir: string } {
  const dir = mkdtempSync(join(tmpdir(), 'unpack-test-'));
  const file = join(dir, fileName);
  writeFileSync(file, writePsdBuffer(psd));
  return { file, dir };
}
