import { writePsdBuffer, type Layer } from 'ag-psd';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { waitForImport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;

beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  owner = (await signUpOwner(t.app, 'Looks Like Studio')).client;
}, 60_000);
afterAll(() => t.close());

type Rgba = [number, number, number, number];
const INK: Rgba = [29, 31, 42, 255];
const BEAK: Rgba = [240, 125, 40, 255];

// A puffin-like figure in unit coordinates: body, head and beak; transparent around it.
function puffinAt(u: number, v: number): Rgba | null {
  if ((u - 0.62) ** 2 / 0.02 + (v - 0.25) ** 2 / 0.004 < 1 && u > 0.6) return BEAK;
  if ((u - 0.45) ** 2 + (v - 0.25) ** 2 < 0.03) return INK;
  if ((u - 0.45) ** 2 / 0.09 + (v - 0.68) ** 2 / 0.1 < 1) return INK;
  return null;
}

// A red diamond kite.
function kiteAt(u: number, v: number): Rgba | null {
  return Math.abs(u - 0.5) + Math.abs(v - 0.5) < 0.45 ? [200, 40, 60, 255] : null;
}

function drawnLayer(name: string, left: number, top: number, size: number, shape: (u: number, v: number) => Rgba | null): Layer {
  const data = new Uint8ClampedArray(size * size * 4);
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      const colour = shape((x + 0.5) / size, (y + 0.5) / size);
      if (colour) data.set(colour, (y * size + x) * 4);
    }
  }
  return { name, left, top, right: left + size, bottom: top + size, imageData: { width: size, height: size, data, colorSpace: 'srgb' } as ImageData };
}

describe('finding the same artwork twice', () => {
  it('finds the same character drawn at two sizes, nearest first, and not an unrelated motif; colour search finds the kite', async () => {
    const psd = writePsdBuffer(
      {
        width: 400,
        height: 300,
        children: [drawnLayer('Puffin small', 10, 10, 64, puffinAt), drawnLayer('Puffin large', 100, 10, 200, puffinAt), drawnLayer('Kite', 310, 200, 80, kiteAt)],
      },
      { generateThumbnail: false },
    );
    const upload = await owner.upload('/api/originals', psd, 'two-puffins.psd');
    expect(upload.status).toBe(202);
    const original = await waitForImport(owner, upload.body.id, 60_000);
    expect({ status: original.status, error: original.error }).toEqual({ status: 'ready', error: null });
    const byName = Object.fromEntries(original.motifs.map((m: { name: string; id: string }) => [m.name, m.id]));

    const res = await owner.get(`/api/motifs/${byName['Puffin small']}/looks-like`);
    expect(res.status).toBe(200);
    expect(res.body.maxDistance).toBe(10);
    expect(res.body.motifs.map((m: { name: string }) => m.name)).toEqual(['Puffin large']);
    expect(res.body.motifs[0].distance).toBeLessThanOrEqual(10);

    const kite = await owner.get(`/api/motifs?colour=${encodeURIComponent('#c8283c')}`);
    expect(kite.body.motifs.map((m: { name: string }) => m.name)).toEqual(['Kite']);
  }, 90_000);
});
