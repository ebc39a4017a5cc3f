import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { kiteMug } from '../support/kite-mug';
import { asBuffer } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let productId: string;

// A saturated blue outside what coated offset paper prints (from memory), so the proof moves it.
const KITE: [number, number, number, number] = [12, 120, 220, 255];

beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  owner = (await signUpOwner(t.app, 'Saltmarsh Studio')).client;
  productId = (await kiteMug(owner, KITE)).productId;
}, 60_000);
afterAll(() => t.close());

const pixel = (png: PNG, x: number, y: number) => Array.from(png.data.subarray((y * png.width + x) * 4, (y * png.width + x) * 4 + 4));

describe('the soft proof image for the editor', () => {
  it('renders the design through the press profile at the asked size, with the moved share and the condition in headers', async () => {
    const res = await asBuffer(owner.get(`/api/products/${productId}/soft-proof.png?side=600`)).expect(200);
    expect(res.headers['content-type']).toBe('image/png');
    // decoded with pngjs, an independent PNG reader
    const png = PNG.sync.read(res.body as Buffer);
    expect(png.width).toBe(600);
    expect(png.height).toBe(Math.round((600 * 1050) / 2550));
    expect(Number(res.headers['x-soft-proof-share'])).toBeGreaterThan(0);
    expect(decodeURIComponent(res.headers['x-soft-proof-profile'])).toMatch(/FOGRA39/);
    // the middle of the kite: still bluish, but not the screen's blue any more, and fully covered
    const [r, g, b, a] = pixel(png, 300, 124);
    expect(a).toBe(255);
    expect(b).toBeGreaterThan(r);
    expect(Math.abs(r - KITE[0]) + Math.abs(g - KITE[1]) + Math.abs(b - KITE[2])).toBeGreaterThan(20);
    // bare blank stays transparent, so the editor draws it over the blank's colour
    expect(pixel(png, 5, 5)[3]).toBe(0);
  });

  it('stripes the colours that move more than ΔE00 5 when the mask is asked for', async () => {
    const plain = PNG.sync.read((await asBuffer(owner.get(`/api/products/${productId}/soft-proof.png?side=600`)).expect(200)).body as Buffer);
    const masked = PNG.sync.read((await asBuffer(owner.get(`/api/products/${productId}/soft-proof.png?side=600&mask=1`)).expect(200)).body as Buffer);
    const row = Array.from({ length: 24 }, (_, i) => pixel(masked, 290 + i, 124));
    // stripes: both the dark and the light marking colour appear along a short row
    expect(row.some(([r, g, b]) => r === 255 && g === 255 && b === 255)).toBe(true);
    expect(row.some(([r, g, b]) => r === 122 && g === 28 && b === 70)).toBe(true);
    const plainRow = Array.from({ length: 24 }, (_, i) => pixel(plain, 290 + i, 124));
    expect(plainRow).not.toEqual(row);
  });

  it('refuses a size out of range and another studio’s product', async () => {
    const res = await owner.get(`/api/products/${productId}/soft-proof.png?side=50`);
    expect(res.status).toBe(400);
    const stranger = (await signUpOwner(t.app, 'Another Coast Studio')).client;
    expect((await stranger.get(`/api/products/${productId}/soft-proof.png`)).status).toBe(404);
  });
});
