import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOriginalImporter, type RunUnpack } from '../../../server/features/originals/import-original';
import { createOriginalsRepository } from '../../../server/features/originals/originals.repository';
import { runUnpack } from '../../../server/features/originals/unpack/run-unpack';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import { mkdtemp, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { Readable } from 'node:stream';
import { createOriginalsCleanup } from '../../../server/features/originals/originals-cleanup';
import { createOriginalsService } from '../../../server/features/originals/originals.service';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { smallCardPsd } from '../support/psd-files';

let t: TestApp;
let owner: ApiClient;
let studioId: string;
let userId: string;
beforeAll(async () => {
  // No workers: the test drives the importer itself, as a worker would.
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Atomic Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  userId = signedUp.me.user.id;
}, 60_000);
afterAll(() => t.close());

// Stored through the real upload service, but not queued: other test files run workers on the
// shared queue, and each test here must be the only one driving the importer of its original.
async function storedOriginal(fileName: string, kiteColour: [number, number, number, number]) {
  const repo = createOriginalsRepository(t.runtime.db.db);
  const service = createOriginalsService({ repo, storage: t.runtime.storage, queue: { enqueueImport: async () => {} }, cleanup: createOriginalsCleanup(t.runtime.db.db, t.runtime.storage) });
  const file = path.join(await mkdtemp(path.join(os.tmpdir(), 'atomic-')), fileName);
  const psd = smallCardPsd({ kiteColour });
  await writeFile(file, psd);
  const { id } = await service.upload({ studioId, userId, filePath: file, fileName, byteSize: psd.length, cut: 'groups' });
  return { repo, id };
}

describe('an import interrupted halfway', () => {
  it('shows nothing of the original until a retry from the stored file commits it all at once', async () => {
    const { repo, id } = await storedOriginal('interrupted.psd', [42, 42, 200, 255]);

    // The storage goes away after the unpack, before anything is committed.
    let puts = 0;
    const failingStorage = { ...t.runtime.storage, put: async (...args: Parameters<typeof t.runtime.storage.put>) => {
      if (++puts > 2) throw new Error('storage unreachable');
      return t.runtime.storage.put(...args);
    } };
    const crashing = createOriginalImporter({ db: t.runtime.db.db, repo, storage: failingStorage, runUnpack: runUnpack as RunUnpack });
    await expect(crashing(id)).rejects.toThrow('storage unreachable');

    const during = await owner.get(`/api/originals/${id}`);
    expect(during.body.status).toBe('queued');
    expect(during.body.motifs).toHaveLength(0);
    const library = await owner.get('/api/motifs');
    expect(library.body.motifs.filter((m: { originalId: string }) => m.originalId === id)).toHaveLength(0);
    // the motifs it stored while unpacking are gone again: no row refers to them
    expect(await t.runtime.storage.list(`studios/${studioId}/motifs/`)).toEqual([]);

    const healthy = createOriginalImporter({ db: t.runtime.db.db, repo, storage: t.runtime.storage, runUnpack: runUnpack as RunUnpack });
    expect(await healthy(id)).toBe('imported');
    const after = await owner.get(`/api/originals/${id}`);
    expect(after.body.status).toBe('ready');
    expect(after.body.motifs).toHaveLength(3);
    // A second delivery of the same job finds it done and changes nothing.
    expect(await healthy(id)).toBe('skipped');
    expect(await t.runtime.storage.list(`studios/${studioId}/motifs/`)).toHaveLength(6);
  }, 60_000);

  it('leaves no stored motif behind when the file turns out unreadable after some motifs were stored', async () => {
    const { repo, id } = await storedOriginal('broken-late.psd', [200, 42, 42, 255]);
    const before = await t.runtime.storage.list(`studios/${studioId}/motifs/`);

    // every motif announced (and stored) before a layer further on proves unreadable
    let announced = 0;
    const failingLate: RunUnpack = async (input, onProgress, onMotif) => {
      await runUnpack(input, onProgress, (m) => {
        announced++;
        onMotif?.(m);
      });
      throw new UnpackError('psd.corrupt', 'The PSD file could not be read (layer 4 is damaged); it is damaged or truncated');
    };
    const importer = createOriginalImporter({ db: t.runtime.db.db, repo, storage: t.runtime.storage, runUnpack: failingLate });
    expect(await importer(id)).toBe('failed');
    expect(announced).toBe(3);

    const failed = await owner.get(`/api/originals/${id}`);
    expect(failed.body.status).toBe('failed');
    expect(failed.body.error.code).toBe('psd.corrupt');
    expect(await t.runtime.storage.list(`studios/${studioId}/motifs/`)).toEqual(before);
    // the original itself is kept, to retry or delete
    expect(await t.runtime.storage.exists(`studios/${studioId}/originals/${id}/file`)).toBe(true);
  }, 60_000);

  it('shows the download of the stored file as the start of reading, by bytes, before the unpack goes on from there', async () => {
    const { repo, id } = await storedOriginal('slow-fetch.psd', [42, 200, 42, 255]);
    // a storage that hands the file over in 8 parts, 120 ms apart, as a far bucket would
    const slowStorage = { ...t.runtime.storage, get: async (key: string) => {
      const bytes = await t.runtime.storage.getBuffer(key);
      const part = Math.ceil(bytes.length / 8);
      async function* parts() {
        for (let at = 0; at < bytes.length; at += part) {
          await new Promise((r) => setTimeout(r, 120));
          yield bytes.subarray(at, at + part);
        }
      }
      return { body: Readable.from(parts()), contentLength: bytes.length };
    } };
    const written: [string, number][] = [];
    const watchedRepo = { ...repo, setProgress: async (originalId: string, phase: Parameters<typeof repo.setProgress>[1], percent: number) => {
      if (originalId === id) written.push([phase, percent]);
      return repo.setProgress(originalId, phase, percent);
    } };
    const importer = createOriginalImporter({ db: t.runtime.db.db, repo: watchedRepo, storage: slowStorage, runUnpack: runUnpack as RunUnpack });
    expect(await importer(id)).toBe('imported');
    const percents = written.map(([, percent]) => percent);
    // never backwards; several steps within the download's first 10 %, then the unpack above it
    expect(percents).toEqual([...percents].sort((a, b) => a - b));
    const fetching = written.filter(([phase, percent]) => phase === 'reading' && percent <= 10);
    expect(fetching.length).toBeGreaterThanOrEqual(3);
    expect(fetching.some(([, percent]) => percent > 0 && percent < 10)).toBe(true);
    expect(written.filter(([phase]) => phase === 'cutting').every(([, percent]) => percent >= 10)).toBe(true);
    expect((await owner.get(`/api/originals/${id}`)).body.status).toBe('ready');
  }, 60_000);
});
