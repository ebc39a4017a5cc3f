import { sql } from 'drizzle-orm';
import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLibraryCache } from '../../../server/features/motifs/library-cache';
import { warmSignedInStudios } from '../../../server/features/motifs/library-start-warm';
import { libraryWarmUp } from '../../../server/features/motifs/library-warm-up';
import { sessions } from '../../../server/db/schema/index';
import { seedMotifs } from '../support/library-seed';
import { createTestApp, signUpOwner, type TestApp } from '../support/test-app';

let t: TestApp;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const o = await signUpOwner(t.app, 'Saltmarsh Warm-up');
  studioId = o.me.studio.id;
  await seedMotifs(t.runtime.db.db, studioId, [
    { name: 'Puffin with kite', tags: ['puffin'], colours: [{ hex: '#1d1f2a', share: 1 }] },
    { name: 'Picnic basket', tags: ['picnic'], colours: [{ hex: '#a4502a', share: 1 }] },
  ], { originalName: 'puffin-picnic.psd' });
}, 60_000);
afterAll(() => t.close());

describe("a studio's search library", () => {
  it('is built once for requests that arrive together', async () => {
    const cache = createLibraryCache(t.runtime.db.db);
    const [a, b, c] = await Promise.all([cache.get(studioId), cache.get(studioId), cache.get(studioId)]);
    expect(a).toBe(b);
    expect(b).toBe(c);
    expect(cache.stats()).toMatchObject({ builds: 1, studios: 1 });
  });

  it('starts building on warm-up, and the first search shares that build', async () => {
    const cache = createLibraryCache(t.runtime.db.db);
    cache.warm(studioId);
    cache.warm(studioId);
    await cache.get(studioId);
    expect(cache.stats()).toMatchObject({ builds: 1, studios: 1 });
  });

  it("is warmed by a signed-in studio's page loads, not by its edits or signed-out requests", async () => {
    const warmed: string[] = [];
    const app = express();
    app.use((req, _res, next) => {
      if (req.headers['x-studio']) req.auth = { studioId: String(req.headers['x-studio']) } as typeof req.auth;
      next();
    });
    app.use(libraryWarmUp({ warm: (id) => warmed.push(id) }));
    app.get('/api/notifications', (_req, res) => res.json({ ok: true }));
    app.get('/library', (_req, res) => res.send('shell'));
    app.post('/api/motifs/bulk', (_req, res) => res.json({ ok: true }));
    expect((await request(app).get('/api/notifications').set('x-studio', studioId)).status).toBe(200);
    await request(app).get('/api/notifications');
    await request(app).get('/library').set('x-studio', 'not-api');
    await request(app).post('/api/motifs/bulk').set('x-studio', 'an-edit');
    expect(warmed).toEqual([studioId]);
  });
});

describe('search libraries at server start', () => {
  it('are built for studios whose people are still signed in, and for no others', async () => {
    const other = await signUpOwner(t.app, 'Saltmarsh Signed Out');
    // the signed-out studio's sessions have expired (as after a sign-out or a long absence)
    await t.runtime.db.db.execute(sql`update ${sessions} set expire = now() - interval '1 minute' where sess->>'studioId' = ${other.me.studio.id}`);
    // high limits: other test files' studios with live sessions share this database
    const cache = createLibraryCache(t.runtime.db.db, { maxStudios: 1000 });
    const warmed = await warmSignedInStudios(t.runtime.db.db, cache, 1000);
    expect(warmed).toContain(studioId);
    expect(warmed).not.toContain(other.me.studio.id);
    expect(cache.stats()).toMatchObject({ builds: warmed.length, studios: warmed.length });
  });
});
