import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { motifs, motifVersions } from '../../../server/db/schema/index';
import { recordLibraryChange } from '../../../server/features/motifs/library-changes';
import { seedMotifs } from '../support/library-seed';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const o = await signUpOwner(t.app, 'Motif Page Studio');
  owner = o.client;
  studioId = o.me.studio.id;
}, 60_000);
afterAll(() => t.close());

const db = () => t.runtime.db.db;

// A second version with its own pixels, as a re-import of a changed layer would add.
async function addVersion(motifId: string, hash: string) {
  const [v1] = await db().select().from(motifVersions).where(eq(motifVersions.motifId, motifId));
  const { id: _id, createdAt: _c, ...copy } = v1;
  const pngKey = `studios/${studioId}/motifs/${hash}.png`;
  const thumbKey = `studios/${studioId}/motifs/${hash}.thumb.webp`;
  await db().insert(motifVersions).values({ ...copy, version: 2, contentHash: hash, pngKey, thumbKey, width: 1200, height: 900 });
  await t.runtime.storage.put(pngKey, Buffer.from('v2'), 'image/png');
  await t.runtime.storage.put(thumbKey, Buffer.from('v2'), 'image/webp');
  await db().update(motifs).set({ currentVersion: 2 }).where(eq(motifs.id, motifId));
  await db().transaction((tx) => recordLibraryChange(tx, studioId, [motifId]));
  return [pngKey, thumbKey];
}

describe("a motif's page", () => {
  it('shows its print sizes at 300 and 150 PPI, its original and place there, and where it is used', async () => {
    const { motifIds, originalId } = await seedMotifs(db(), studioId, [{ name: 'Wave band', width: 1500, height: 2100, tags: ['wave'] }], { originalName: 'puffin-picnic.psd' });
    const res = await owner.get(`/api/motifs/${motifIds[0]}`);
    expect(res.status).toBe(200);
    // 1500 × 2100 px is 5 × 7 in at 300 PPI, 127 × 177.8 mm (paper-sizes.csv, "Card 5x7 in").
    expect(res.body.printSizes).toEqual([
      { ppi: 300, widthIn: 5, heightIn: 7, widthMm: 127, heightMm: 177.8 },
      { ppi: 150, widthIn: 10, heightIn: 14, widthMm: 254, heightMm: 355.6 },
    ]);
    expect(res.body.original).toMatchObject({ id: originalId, name: 'puffin-picnic.psd', position: 0, width: 3000, sourcePath: 'Wave band' });
    expect(res.body.rights).toEqual({ status: 'own_work', source: '', licence: '', attributionRequired: false });
    expect(res.body.usage).toEqual([]);
    expect(res.body.versions).toHaveLength(1);
  });

  it('saves name, tags, notes and rights, and search sees them', async () => {
    const { motifIds } = await seedMotifs(db(), studioId, [{ name: 'Sandwich' }]);
    const res = await owner.patch(`/api/motifs/${motifIds[0]}`, {
      name: 'Cucumber sandwich',
      tags: ['Picnic ', 'food', 'picnic'],
      notes: 'from the 2024 card',
      rightsStatus: 'licensed',
      rightsSource: 'Bought from a stock site',
      rightsLicence: 'Standard licence, print runs up to 500',
      attributionRequired: true,
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ name: 'Cucumber sandwich', tags: ['picnic', 'food'], notes: 'from the 2024 card', rightsStatus: 'licensed', attributionRequired: true });
    expect(res.body.rights.licence).toBe('Standard licence, print runs up to 500');
    const found = await owner.get('/api/motifs?q=cucumber&rights=licensed');
    expect(found.body.motifs.map((m: { id: string }) => m.id)).toEqual([motifIds[0]]);
    expect((await owner.patch(`/api/motifs/${motifIds[0]}`, { tags: ['a,b'] })).status).toBe(400);
  });

  it('lists its versions and restores an old one as the newest, keeping the others readable', async () => {
    const { motifIds } = await seedMotifs(db(), studioId, [{ name: 'Kite' }], { storage: t.runtime.storage });
    const id = motifIds[0];
    await addVersion(id, 'b'.repeat(64));
    const before = await owner.get(`/api/motifs/${id}/versions`);
    expect(before.body.versions.map((v: { version: number; current: boolean }) => [v.version, v.current])).toEqual([[2, true], [1, false]]);
    const restored = await owner.post(`/api/motifs/${id}/versions/1/restore`);
    expect(restored.status).toBe(200);
    expect(restored.body.version).toBe(3);
    expect(restored.body.width).toBe(600);
    expect(restored.body.versions[0]).toMatchObject({ version: 3, current: true, samePixelsAs: 1 });
    expect((await owner.get(`/api/motifs/${id}/image?version=2`)).status).toBe(200);
    expect((await owner.post(`/api/motifs/${id}/versions/3/restore`)).body.error.code).toBe('motif.version_current');
    expect((await owner.post(`/api/motifs/${id}/versions/9/restore`)).status).toBe(404);
  });
});

describe('deleting a motif', () => {
  it('removes an unused motif and every stored object only it used', async () => {
    const { motifIds, keys } = await seedMotifs(db(), studioId, [{ name: 'Doomed gull' }, { name: 'Surviving gull' }], { storage: t.runtime.storage });
    const [doomed, survivor] = motifIds;
    const v2Keys = await addVersion(doomed, 'c'.repeat(64));
    // The survivor shares the doomed motif's second-version pixels (objects are per content).
    await db().insert(motifVersions).values({ ...(await db().select().from(motifVersions).where(eq(motifVersions.motifId, survivor)))[0], id: undefined, version: 2, contentHash: 'c'.repeat(64), pngKey: v2Keys[0], thumbKey: v2Keys[1] });
    const doomedOwn = keys.slice(0, 2);
    for (const key of [...doomedOwn, ...v2Keys]) expect(await t.runtime.storage.exists(key)).toBe(true);

    expect((await owner.delete(`/api/motifs/${doomed}`)).status).toBe(204);
    expect((await owner.get(`/api/motifs/${doomed}`)).status).toBe(404);
    for (const key of doomedOwn) expect(await t.runtime.storage.exists(key)).toBe(false);
    // Nothing of the deleted motif's own is left under the studio's motif prefix.
    const left = await t.runtime.storage.list(`studios/${studioId}/motifs/`);
    expect(left.filter((k) => doomedOwn.includes(k))).toEqual([]);
    for (const key of v2Keys) expect(await t.runtime.storage.exists(key)).toBe(true);
    expect((await owner.get(`/api/motifs/${survivor}`)).status).toBe(200);
    expect((await owner.get('/api/motifs?q=doomed')).body.total).toBe(0);
  });

  it('archives as the everyday delete: hidden from the library, still there', async () => {
    const { motifIds } = await seedMotifs(db(), studioId, [{ name: 'Retired lighthouse' }]);
    expect((await owner.patch(`/api/motifs/${motifIds[0]}`, { archived: true })).status).toBe(200);
    expect((await owner.get('/api/motifs?q=lighthouse')).body.total).toBe(0);
    expect((await owner.get('/api/motifs?q=lighthouse&archived=only')).body.total).toBe(1);
    expect((await owner.get(`/api/motifs/${motifIds[0]}`)).body.archived).toBe(true);
  });
});

describe('who may change motifs', () => {
  it('lets a reviewer look but not change anything', async () => {
    const { motifIds } = await seedMotifs(db(), studioId, [{ name: 'Reviewed puffin' }]);
    const reviewer = (await addMember(t.app, owner, 'reviewer')).client;
    expect((await reviewer.get(`/api/motifs/${motifIds[0]}`)).status).toBe(200);
    expect((await reviewer.get('/api/motifs?q=reviewed')).body.total).toBe(1);
    for (const res of [
      await reviewer.patch(`/api/motifs/${motifIds[0]}`, { name: 'Changed' }),
      await reviewer.delete(`/api/motifs/${motifIds[0]}`),
      await reviewer.post('/api/motifs/bulk', { ids: motifIds, action: { type: 'archive' } }),
      await reviewer.post('/api/tags/rename', { from: 'a', to: 'b' }),
      await reviewer.post('/api/collections', { name: 'Not mine' }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('role.forbidden');
    }
    expect((await owner.get(`/api/motifs/${motifIds[0]}`)).body.name).toBe('Reviewed puffin');
  });

  it("answers 404 for another studio's motif and changes nothing", async () => {
    const { motifIds } = await seedMotifs(db(), studioId, [{ name: 'Private fox' }]);
    const stranger = (await signUpOwner(t.app, 'Elsewhere Studio')).client;
    const id = motifIds[0];
    expect((await stranger.get(`/api/motifs/${id}`)).status).toBe(404);
    expect((await stranger.get(`/api/motifs/${id}/looks-like`)).status).toBe(404);
    expect((await stranger.get(`/api/motifs/${id}/versions`)).status).toBe(404);
    expect((await stranger.patch(`/api/motifs/${id}`, { name: 'Mine now' })).status).toBe(404);
    expect((await stranger.delete(`/api/motifs/${id}`)).status).toBe(404);
    const bulk = await stranger.post('/api/motifs/bulk', { ids: [id], action: { type: 'archive' } });
    expect(bulk.body).toEqual({ matched: 0, changed: 0 });
    expect((await stranger.get('/api/motifs?q=fox')).body.total).toBe(0);
    expect((await owner.get(`/api/motifs/${id}`)).body).toMatchObject({ name: 'Private fox', archived: false });
  });
});
