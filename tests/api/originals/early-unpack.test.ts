import { existsSync } from 'node:fs';
import { mkdtemp, readdir, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createEarlyUnpacks } from '../../../server/features/originals/early-unpacks';
import { createOriginalImporter, type ImportPhaseTimings, type RunUnpack } from '../../../server/features/originals/import-original';
import { createOriginalsCleanup } from '../../../server/features/originals/originals-cleanup';
import { createOriginalsRepository } from '../../../server/features/originals/originals.repository';
import { createOriginalsService } from '../../../server/features/originals/originals.service';
import { runUnpack } from '../../../server/features/originals/unpack/run-unpack';
import type { ObjectStorage } from '../../../server/lib/storage';
import { smallCardPsd, type Rgba } from '../support/psd-files';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;
let userId: string;
let tmpRoot: string;
beforeAll(async () => {
  // No workers: the test drives the importer itself, as the in-process worker would.
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Early Unpack Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  userId = signedUp.me.user.id;
  tmpRoot = await mkdtemp(path.join(os.tmpdir(), 'early-unpack-test-'));
}, 60_000);
afterAll(() => t.close());

// The upload service and the importer of one process, sharing its early unpacks.
function oneProcess(storage: ObjectStorage = t.runtime.storage, unpack: RunUnpack = runUnpack as RunUnpack) {
  const repo = createOriginalsRepository(t.runtime.db.db);
  const earlyUnpacks = createEarlyUnpacks({ runUnpack: unpack, tmpRoot, maxRunning: 1 });
  const cleanup = createOriginalsCleanup(t.runtime.db.db, t.runtime.storage);
  // not queued: other test files run workers on the shared queue; this test drives the importer
  const service = createOriginalsService({ repo, storage, queue: { enqueueImport: async () => {} }, cleanup, earlyUnpacks });
  const timings: ImportPhaseTimings[] = [];
  const importer = (s: ObjectStorage = t.runtime.storage) =>
    createOriginalImporter({ db: t.runtime.db.db, repo, storage: s, runUnpack: unpack, earlyUnpacks, tmpRoot, onTimings: (x) => timings.push(x) });
  return { service, importer, earlyUnpacks, timings };
}

async function uploadFile(service: ReturnType<typeof oneProcess>['service'], name: string, kiteColour: Rgba) {
  const dir = await mkdtemp(path.join(tmpRoot, 'upload-'));
  const file = path.join(dir, name);
  const psd = smallCardPsd({ kiteColour });
  await writeFile(file, psd);
  const upload = () => service.upload({ studioId, userId, filePath: file, fileName: name, byteSize: psd.length, cut: 'groups' });
  return { file, upload };
}

const earlyFolders = async () => (await readdir(tmpRoot)).filter((n) => n.startsWith('motifold-early-'));

describe('an upload unpacked while it is stored', () => {
  it('is imported from the local file without downloading it back, and leaves no local file behind', async () => {
    const { service, importer, earlyUnpacks, timings } = oneProcess();
    const { file, upload } = await uploadFile(service, 'early.psd', [12, 200, 140, 255]);
    const { id } = await upload();
    expect(earlyUnpacks.pending).toBe(1);

    expect(await importer()(id)).toBe('imported');
    expect(timings[0].unpackedEarly).toBe(true);
    expect(timings[0].downloadMs).toBe(0);
    const detail = await owner.get(`/api/originals/${id}`);
    expect(detail.body.status).toBe('ready');
    expect(detail.body.motifs.map((m: { name: string }) => m.name)).toEqual(['Puffins', 'Kite', 'Picnic basket']);
    // the original itself is stored unchanged, to retry or re-cut from
    expect(await t.runtime.storage.exists(`studios/${studioId}/originals/${id}/file`)).toBe(true);
    expect(existsSync(file)).toBe(false);
    expect(earlyUnpacks.pending).toBe(0);
    expect(await earlyFolders()).toEqual([]);
  }, 60_000);

  it('is thrown away when the original cannot be stored: no row, no local file, nothing stored', async () => {
    const failingStorage = { ...t.runtime.storage, put: async () => { throw new Error('storage unreachable'); } };
    const { service, earlyUnpacks } = oneProcess(failingStorage);
    const { file, upload } = await uploadFile(service, 'never-stored.psd', [200, 12, 140, 255]);
    const before = (await owner.get('/api/originals')).body.originals.length;

    await expect(upload()).rejects.toThrow('storage unreachable');
    expect((await owner.get('/api/originals')).body.originals).toHaveLength(before);
    expect(earlyUnpacks.pending).toBe(0);
    expect(existsSync(file)).toBe(false);
    expect(await earlyFolders()).toEqual([]);
  }, 60_000);

  it('after an interrupted import, is retried from the stored file and committed all at once', async () => {
    const { service, importer, earlyUnpacks, timings } = oneProcess();
    const { upload } = await uploadFile(service, 'interrupted-early.psd', [140, 12, 200, 255]);
    const { id } = await upload();
    expect(earlyUnpacks.pending).toBe(1);
    const motifKeys = () => t.runtime.storage.list(`studios/${studioId}/motifs/`);
    const storedBefore = await motifKeys();

    // The storage goes away after one motif put (the kite's is the only new pixels), before
    // anything is committed.
    let puts = 0;
    const failingStorage = { ...t.runtime.storage, put: async (...args: Parameters<ObjectStorage['put']>) => {
      if (++puts > 1) throw new Error('storage unreachable');
      return t.runtime.storage.put(...args);
    } };
    await expect(importer(failingStorage)(id)).rejects.toThrow('storage unreachable');
    expect(puts).toBeGreaterThan(1);
    // the interrupted attempt took the early unpack and threw it away
    expect(earlyUnpacks.pending).toBe(0);
    const during = await owner.get(`/api/originals/${id}`);
    expect(during.body.status).toBe('queued');
    expect(during.body.motifs).toHaveLength(0);
    expect(await motifKeys()).toEqual(storedBefore);

    // the retry has no early unpack left: it downloads the stored file
    expect(await importer()(id)).toBe('imported');
    expect(timings).toHaveLength(1);
    expect(timings[0].unpackedEarly).toBe(false);
    expect(timings[0].downloadMs).toBeGreaterThan(0);
    expect((await owner.get(`/api/originals/${id}`)).body.motifs).toHaveLength(3);
    expect(await earlyFolders()).toEqual([]);
  }, 60_000);

  it('is not used by a job whose row names other bytes', async () => {
    const { service, importer, earlyUnpacks, timings } = oneProcess();
    const { upload } = await uploadFile(service, 'tampered.psd', [40, 40, 40, 255]);
    const { id } = await upload();
    // as if the row had been written for a different stored file than the one unpacked here
    const repo = createOriginalsRepository(t.runtime.db.db);
    await repo.setStatus(id, 'queued', { fileSha256: '0'.repeat(64) });

    expect(await importer()(id)).toBe('imported');
    expect(timings[0].unpackedEarly).toBe(false);
    expect(earlyUnpacks.pending).toBe(0);
    expect(await earlyFolders()).toEqual([]);
  }, 60_000);
});
