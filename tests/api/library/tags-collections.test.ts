import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedMotifs } from '../support/library-seed';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const o = await signUpOwner(t.app, 'Tags Studio');
  owner = o.client;
  studioId = o.me.studio.id;
}, 60_000);
afterAll(() => t.close());

type TagCount = { tag: string; count: number; archivedCount: number };
const countOf = (tags: TagCount[], tag: string) => tags.find((t) => t.tag === tag);

describe("the studio's tags", () => {
  it('lists every tag with how many motifs carry it, most used first', async () => {
    await seedMotifs(t.runtime.db.db, studioId, [
      { name: 'Fox one', tags: ['fox', 'autumn'] },
      { name: 'Fox two', tags: ['fox'] },
      { name: 'Old fox', tags: ['fox'], archived: true },
    ]);
    const res = await owner.get('/api/tags');
    expect(res.status).toBe(200);
    expect(res.body.tags[0]).toEqual({ tag: 'fox', count: 2, archivedCount: 1 });
    expect(countOf(res.body.tags, 'autumn')).toEqual({ tag: 'autumn', count: 1, archivedCount: 0 });
  });

  it('renames a tag on every motif, and search finds the new name', async () => {
    await seedMotifs(t.runtime.db.db, studioId, [{ name: 'Lamp', tags: ['lanturn', 'night'] }, { name: 'Lamp two', tags: ['night', 'lanturn'] }]);
    const res = await owner.post('/api/tags/rename', { from: 'lanturn', to: 'Lantern' });
    expect(res.status).toBe(200);
    expect(res.body.changed).toBe(2);
    expect(countOf(res.body.tags, 'lanturn')).toBeUndefined();
    expect(countOf(res.body.tags, 'lantern')?.count).toBe(2);
    const found = await owner.get('/api/motifs?tags=lantern&sort=name');
    expect(found.body.motifs.map((m: { tags: string[] }) => m.tags)).toEqual([['lantern', 'night'], ['night', 'lantern']]);
  });

  it('merges several tags into one without doubling it', async () => {
    await seedMotifs(t.runtime.db.db, studioId, [
      { name: 'Shell a', tags: ['shell', 'seashell'] },
      { name: 'Shell b', tags: ['sea shell'] },
      { name: 'Shell c', tags: ['beach', 'shells'] },
    ]);
    const res = await owner.post('/api/tags/merge', { from: ['seashell', 'sea shell', 'shells'], into: 'shell' });
    expect(res.body.changed).toBe(3);
    const shells = await owner.get('/api/motifs?tags=shell&sort=name');
    expect(shells.body.motifs.map((m: { tags: string[] }) => m.tags)).toEqual([['shell'], ['shell'], ['beach', 'shell']]);
    expect((await owner.post('/api/tags/merge', { from: ['shell'], into: 'shell' })).status).toBe(400);
  });
});

describe('collections', () => {
  it('creates, lists, changes and deletes a collection with its season and launch date', async () => {
    const created = await owner.post('/api/collections', { name: 'Coastal Spring', notes: 'mugs, totes, stickers', seasonStart: '2026-03-01', seasonEnd: '2026-05-31', launchDate: '2026-02-15' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: 'Coastal Spring', seasonStart: '2026-03-01', seasonEnd: '2026-05-31', launchDate: '2026-02-15', motifCount: 0 });
    const id = created.body.id;
    expect((await owner.post('/api/collections', { name: 'coastal spring' })).body.error.code).toBe('collection.name_taken');

    const patched = await owner.patch(`/api/collections/${id}`, { launchDate: null, notes: 'mugs first' });
    expect(patched.body).toMatchObject({ launchDate: null, notes: 'mugs first', seasonStart: '2026-03-01' });
    expect((await owner.patch(`/api/collections/${id}`, { seasonEnd: '2026-01-01' })).status).toBe(400);

    const list = await owner.get('/api/collections');
    expect(list.body.collections.map((c: { name: string }) => c.name)).toContain('Coastal Spring');
    expect((await owner.delete(`/api/collections/${id}`)).status).toBe(204);
    expect((await owner.get(`/api/collections/${id}`)).status).toBe(404);
  });

  it('refuses a season that ends before it starts and a date that does not exist', async () => {
    const backwards = await owner.post('/api/collections', { name: 'Backwards', seasonStart: '2026-06-01', seasonEnd: '2026-03-01' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.seasonEnd).toMatch(/ends before it starts/);
    expect((await owner.post('/api/collections', { name: 'Leap', launchDate: '2026-02-30' })).status).toBe(400);
  });

  it('holds motifs: add, preview, filter the library by it, remove; deleting it keeps the motifs', async () => {
    const { motifIds } = await seedMotifs(t.runtime.db.db, studioId, [{ name: 'Lantern fox' }, { name: 'Falling leaf' }, { name: 'Acorn' }]);
    const collection = (await owner.post('/api/collections', { name: 'Lantern Walk' })).body;
    const add = await owner.post(`/api/collections/${collection.id}/motifs`, { ids: motifIds });
    expect(add.body).toEqual({ matched: 3, changed: 3, motifCount: 3 });
    const detail = await owner.get(`/api/collections/${collection.id}`);
    expect(detail.body.preview.map((m: { name: string }) => m.name).sort()).toEqual(['Acorn', 'Falling leaf', 'Lantern fox']);
    const inLibrary = await owner.get(`/api/motifs?collectionId=${collection.id}`);
    expect(inLibrary.body.total).toBe(3);
    expect(inLibrary.body.facets.collections).toEqual([{ id: collection.id, name: 'Lantern Walk', count: 3 }]);
    await owner.patch(`/api/collections/${collection.id}`, { name: 'Lantern Walk 2026' });
    const renamed = await owner.get(`/api/motifs?collectionId=${collection.id}`);
    expect(renamed.body.facets.collections[0].name).toBe('Lantern Walk 2026');
    await owner.patch(`/api/collections/${collection.id}`, { name: 'Lantern Walk' });
    const motif = await owner.get(`/api/motifs/${motifIds[0]}`);
    expect(motif.body.collections).toEqual([{ id: collection.id, name: 'Lantern Walk' }]);

    const removed = await owner.send('delete', `/api/collections/${collection.id}/motifs`, { ids: [motifIds[2]] });
    expect(removed.body).toMatchObject({ changed: 1, motifCount: 2 });
    expect((await owner.delete(`/api/collections/${collection.id}`)).status).toBe(204);
    expect((await owner.get(`/api/motifs/${motifIds[0]}`)).body.collections).toEqual([]);
    expect((await owner.get(`/api/motifs?collectionId=${collection.id}`)).body.total).toBe(0);
  });

  it("keeps another studio's collections and motifs out of reach", async () => {
    const { motifIds } = await seedMotifs(t.runtime.db.db, studioId, [{ name: 'Our puffin' }]);
    const ours = (await owner.post('/api/collections', { name: 'Ours' })).body;
    const stranger = (await signUpOwner(t.app, 'Other Coast')).client;
    expect((await stranger.get(`/api/collections/${ours.id}`)).status).toBe(404);
    expect((await stranger.patch(`/api/collections/${ours.id}`, { name: 'Theirs' })).status).toBe(404);
    expect((await stranger.post(`/api/collections/${ours.id}/motifs`, { ids: motifIds })).status).toBe(404);
    const theirs = (await stranger.post('/api/collections', { name: 'Theirs' })).body;
    const smuggled = await stranger.post(`/api/collections/${theirs.id}/motifs`, { ids: motifIds });
    expect(smuggled.body).toEqual({ matched: 0, changed: 0, motifCount: 0 });
    expect((await stranger.get('/api/collections')).body.collections.map((c: { name: string }) => c.name)).toEqual(['Theirs']);
  });
});
