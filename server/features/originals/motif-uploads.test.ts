import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { ObjectStorage } from '../../lib/storage';
import { motifPngKey, motifThumbKey } from './motif-keys';
import { createMotifUploads } from './motif-uploads';
import type { UnpackedMotif } from './unpack/unpack-result';

const outDir = mkdtempSync(join(tmpdir(), 'motif-uploads-'));
afterAll(() => rmSync(outDir, { recursive: true, force: true }));

function motif(n: number, pngBytes = 10 + n): UnpackedMotif {
  const pngFile = `motif-00${n}.png`;
  const thumbFile = `motif-00${n}.thumb.webp`;
  writeFileSync(join(outDir, pngFile), Buffer.alloc(pngBytes, n));
  writeFileSync(join(outDir, thumbFile), Buffer.alloc(3, n));
  return {
    name: `Motif ${n}`, sourcePath: `Motif ${n}`, kind: 'layer', hidden: false, left: 0, top: 0, width: 1, height: 1, opacity: 1, blendMode: 'normal',
    pngFile, thumbFile, contentHash: String(n).repeat(64).slice(0, 64), dhash: '0', colours: [], suggestedTags: [],
  };
}

function fakeStorage(options: { failAfter?: number; delayMs?: number } = {}) {
  const objects = new Map<string, number>();
  let inFlight = 0;
  let peak = 0;
  let puts = 0;
  const storage = {
    async put(key: string, body: Buffer) {
      if (options.failAfter !== undefined && ++puts > options.failAfter) throw new Error('storage unreachable');
      inFlight++;
      peak = Math.max(peak, inFlight);
      await new Promise((r) => setTimeout(r, options.delayMs ?? 1));
      objects.set(key, body.byteLength);
      inFlight--;
    },
  } as unknown as ObjectStorage;
  return { storage, objects, peak: () => peak };
}

const studioId = 'studio-1';

describe('storing motifs while the unpack goes on', () => {
  it('stores announced motifs at once and reports each PNG size, storing nothing twice', async () => {
    const { storage, objects } = fakeStorage();
    const uploads = createMotifUploads({ storage, studioId, outDir, concurrency: 2, studioHasPixels: async () => false });
    const [a, b] = [motif(1), motif(2)];
    uploads.early(a);
    uploads.early(a);
    const sizes = await uploads.store([a, b]);
    expect(sizes).toEqual(new Map([[a.contentHash, 11], [b.contentHash, 12]]));
    expect([...objects.keys()].sort()).toEqual([motifPngKey(studioId, a.contentHash), motifPngKey(studioId, b.contentHash), motifThumbKey(studioId, a.contentHash), motifThumbKey(studioId, b.contentHash)].sort());
    expect(uploads.completed).toBe(2);
  });

  it('skips early the pixels the studio has, yet stores them when asked to', async () => {
    const { storage, objects } = fakeStorage();
    const known = motif(3);
    const uploads = createMotifUploads({ storage, studioId, outDir, concurrency: 2, studioHasPixels: async (hash) => hash === known.contentHash });
    uploads.early(known);
    expect(await uploads.settledKeys()).toEqual([]);
    expect(objects.size).toBe(0);
    expect((await uploads.store([known])).get(known.contentHash)).toBe(13);
    expect(objects.size).toBe(2);
  });

  it('keeps no more motifs in flight than its concurrency', async () => {
    const fake = fakeStorage({ delayMs: 5 });
    const uploads = createMotifUploads({ storage: fake.storage, studioId, outDir, concurrency: 2, studioHasPixels: async () => false });
    const many = [4, 5, 6, 7, 8].map((n) => motif(n));
    for (const m of many) uploads.early(m);
    await uploads.store(many);
    // two motifs at once, each a PNG and a thumbnail
    expect(fake.peak()).toBe(4);
    expect(fake.objects.size).toBe(10);
  });

  it('fails the store with the first storage error and lists what it may have written', async () => {
    const { storage } = fakeStorage({ failAfter: 2 });
    const uploads = createMotifUploads({ storage, studioId, outDir, concurrency: 1, studioHasPixels: async () => false });
    const [a, b, c] = [motif(1), motif(2), motif(3)];
    for (const m of [a, b, c]) uploads.early(m);
    await expect(uploads.store([a, b, c])).rejects.toThrow('storage unreachable');
    const keys = await uploads.settledKeys();
    expect(keys).toContain(motifPngKey(studioId, a.contentHash));
    expect(keys).toContain(motifPngKey(studioId, b.contentHash));
    // after the failure nothing more is put
    expect(keys).not.toContain(motifPngKey(studioId, c.contentHash));
  });

  it('refuses a file name from the unpack that leaves its folder', async () => {
    const { storage } = fakeStorage();
    const uploads = createMotifUploads({ storage, studioId, outDir, concurrency: 1, studioHasPixels: async () => false });
    await expect(uploads.store([{ ...motif(9), pngFile: '../../etc/passwd' }])).rejects.toThrow('unexpected motif file name');
  });

  it('counts an upload settled only once both of its puts have ended, even when one fails', async () => {
    const landed: string[] = [];
    // the thumbnail's put fails at once while the PNG's is still on its way
    const storage = {
      async put(key: string) {
        if (key.endsWith('.webp')) throw new Error('storage unreachable');
        await new Promise((r) => setTimeout(r, 30));
        landed.push(key);
      },
    } as unknown as ObjectStorage;
    const uploads = createMotifUploads({ storage, studioId, outDir, concurrency: 2, studioHasPixels: async () => false });
    const m = motif(7);
    await expect(uploads.store([m])).rejects.toThrow('storage unreachable');
    const keys = await uploads.settledKeys();
    // what a clean-up removes next is already all there is
    expect(landed).toEqual([motifPngKey(studioId, m.contentHash)]);
    expect(keys).toContain(motifPngKey(studioId, m.contentHash));
  });
});
