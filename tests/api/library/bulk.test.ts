import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { seedMotifs } from '../support/library-seed';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const o = await signUpOwner(t.app, 'Bulk Studio');
  owner = o.client;
  studioId = o.me.studio.id;
}, 60_000);
afterAll(() => t.close());

const gulls = (n: number, prefix: string) => Array.from({ length: n }, (_, i) => ({ name: `${prefix} gull ${i + 1}`, tags: i % 2 ? ['gull', 'coast'] : ['gull'] }));

// Every query the app sends, whichever pool client sends it.
async function statementsDuring<T>(work: () => Promise<T>): Promise<{ result: T; statements: number }> {
  const spy = vi.spyOn(pg.Client.prototype, 'query');
  try {
    const result = await work();
    return { result, statements: spy.mock.calls.length };
  } finally {
    spy.mockRestore();
  }
}

describe('bulk edits', () => {
  it('tags 500 selected motifs in one request, in a few statements', async () => {
    const { motifIds } = await seedMotifs(t.runtime.db.db, studioId, gulls(500, 'Herring'));
    const started = performance.now();
    const { result: res, statements } = await statementsDuring(() => owner.post('/api/motifs/bulk', { ids: motifIds, action: { type: 'tag', tags: ['Coastal Spring', 'coast'] } }));
    const ms = performance.now() - started;
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ matched: 500, changed: 500 });
    expect(ms).toBeLessThan(3000);
    // Session, access and the edit itself: the count does not grow with the selection.
    expect(statements).toBeLessThan(20);
    const tagged = await owner.get('/api/motifs?tags=coastal%20spring&limit=500');
    expect(tagged.body.total).toBe(500);
    // Existing tags keep their place and nothing is doubled.
    const one = tagged.body.motifs.find((m: { name: string }) => m.name === 'Herring gull 2');
    expect(one.tags).toEqual(['gull', 'coast', 'coastal spring']);
    const again = await owner.post('/api/motifs/bulk', { ids: motifIds, action: { type: 'tag', tags: ['coast'] } });
    expect(again.body).toEqual({ matched: 500, changed: 0 });
  });

  it('applies an action to everything a filter shows', async () => {
    await seedMotifs(t.runtime.db.db, studioId, gulls(30, 'Black-headed'));
    const res = await owner.post('/api/motifs/bulk', { filter: { q: 'black-headed' }, action: { type: 'set-rights', rights: { status: 'licensed', attributionRequired: true } } });
    expect(res.body).toEqual({ matched: 30, changed: 30 });
    const licensed = await owner.get('/api/motifs?rights=licensed&limit=500');
    expect(licensed.body.total).toBe(30);
    expect(licensed.body.motifs.every((m: { attributionRequired: boolean }) => m.attributionRequired)).toBe(true);
  });

  it('untags, archives and unarchives', async () => {
    const { motifIds } = await seedMotifs(t.runtime.db.db, studioId, gulls(10, 'Kittiwake'));
    expect((await owner.post('/api/motifs/bulk', { ids: motifIds, action: { type: 'untag', tags: ['gull'] } })).body.changed).toBe(10);
    expect((await owner.get('/api/motifs?q=kittiwake&tags=gull')).body.total).toBe(0);
    expect((await owner.post('/api/motifs/bulk', { ids: motifIds.slice(0, 4), action: { type: 'archive' } })).body.changed).toBe(4);
    expect((await owner.get('/api/motifs?q=kittiwake')).body.total).toBe(6);
    expect((await owner.post('/api/motifs/bulk', { filter: { q: 'kittiwake', archived: 'only' }, action: { type: 'unarchive' } })).body.changed).toBe(4);
    expect((await owner.get('/api/motifs?q=kittiwake')).body.total).toBe(10);
  });

  it('adds to and removes from a collection', async () => {
    const { motifIds } = await seedMotifs(t.runtime.db.db, studioId, gulls(5, 'Common'));
    const collection = await owner.post('/api/collections', { name: 'Gulls of the bay' });
    const add = await owner.post('/api/motifs/bulk', { ids: motifIds, action: { type: 'add-to-collection', collectionId: collection.body.id } });
    expect(add.body).toEqual({ matched: 5, changed: 5 });
    expect((await owner.get(`/api/motifs?collectionId=${collection.body.id}`)).body.total).toBe(5);
    const remove = await owner.post('/api/motifs/bulk', { ids: motifIds.slice(0, 2), action: { type: 'remove-from-collection', collectionId: collection.body.id } });
    expect(remove.body.changed).toBe(2);
    expect((await owner.get(`/api/collections/${collection.body.id}`)).body.motifCount).toBe(3);
  });

  it('asks for either ids or a filter, not both or neither', async () => {
    expect((await owner.post('/api/motifs/bulk', { action: { type: 'archive' } })).status).toBe(400);
    const both = await owner.post('/api/motifs/bulk', { ids: [crypto.randomUUID()], filter: {}, action: { type: 'archive' } });
    expect(both.status).toBe(400);
    expect((await owner.post('/api/motifs/bulk', { ids: ['not-an-id'], action: { type: 'archive' } })).status).toBe(400);
  });
});
