import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deltaE2000 } from '../../../shared/colour/ciede2000';
import { rgbToLab } from '../../../shared/colour/lab';
import { hexToRgb } from '../../../shared/colour/srgb';
import { seedMotifs } from '../support/library-seed';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;
let ids: Record<string, string>;

type Item = { id: string; name: string; score: number | null; colourMatch: { hex: string; deltaE: number } | null };
const names = (body: { motifs: Item[] }) => body.motifs.map((m) => m.name);

beforeAll(async () => {
  t = await createTestApp();
  const o = await signUpOwner(t.app, 'Saltmarsh Library');
  owner = o.client;
  studioId = o.me.studio.id;
  const seeded = await seedMotifs(
    t.runtime.db.db,
    studioId,
    [
      { name: 'Puffin in a red jumper', tags: ['puffin', 'spring'], colours: [{ hex: '#1d1f2a', share: 0.5 }, { hex: '#c8283c', share: 0.4 }, { hex: '#fbf7ef', share: 0.1 }] },
      { name: 'Puffin waving', tags: ['puffin', 'spring'], rightsStatus: 'unknown', colours: [{ hex: '#1d1f2a', share: 0.7 }, { hex: '#f07d28', share: 0.3 }] },
      { name: 'Fox with a lantern', tags: ['fox', 'lantern', 'autumn'], colours: [{ hex: '#d9692b', share: 0.6 }, { hex: '#f6c744', share: 0.4 }] },
      { name: 'Falling leaves', tags: ['leaf', 'autumn'], notes: 'sits under the lantern on the card', colours: [{ hex: '#a4502a', share: 1 }] },
      { name: 'Kite', tags: ['kite', 'spring'], colours: [{ hex: '#2a8cc8', share: 0.8 }, { hex: '#fbf7ef', share: 0.2 }] },
      { name: 'Old wave band', tags: ['wave'], archived: true, colours: [{ hex: '#3a7bd5', share: 1 }] },
      { name: 'Hidden sketch', tags: ['sketch'], hiddenInOriginal: true, colours: [{ hex: '#777777', share: 1 }] },
    ],
    { originalName: 'coastal-card.psd' },
  );
  const list = (await owner.get('/api/motifs?archived=include')).body as { motifs: Item[] };
  ids = Object.fromEntries(list.motifs.map((m) => [m.name, m.id]));
  expect(Object.keys(ids)).toHaveLength(seeded.motifIds.length);
}, 60_000);
afterAll(() => t.close());

describe('searching the library by words', () => {
  it('finds the puffins by name', async () => {
    const res = await owner.get('/api/motifs?q=puffin');
    expect(res.status).toBe(200);
    expect(names(res.body).sort()).toEqual(['Puffin in a red jumper', 'Puffin waving']);
  });

  it('finds the fox by a misspelt tag', async () => {
    const res = await owner.get('/api/motifs?q=lantren');
    expect(names(res.body)[0]).toBe('Fox with a lantern');
  });

  it('finds motifs as a word is being typed', async () => {
    for (const typed of ['la', 'lan', 'lant', 'lante']) {
      const res = await owner.get(`/api/motifs?q=${typed}`);
      expect({ typed, names: names(res.body) }).toEqual({ typed, names: expect.arrayContaining(['Fox with a lantern']) });
    }
  });

  it('ranks a tag match before a match in the notes', async () => {
    const res = await owner.get('/api/motifs?q=lantern');
    expect(names(res.body)).toEqual(['Fox with a lantern', 'Falling leaves']);
    expect(res.body.motifs[0].score).toBeGreaterThan(res.body.motifs[1].score);
  });

  it('searches the original name too', async () => {
    const res = await owner.get('/api/motifs?q=coastal');
    expect(res.body.total).toBe(6);
  });

  it('needs every word of the query', async () => {
    const res = await owner.get('/api/motifs?q=puffin%20waving');
    expect(names(res.body)).toEqual(['Puffin waving']);
  });
});

describe('filters', () => {
  it('combine with each other and with the words', async () => {
    const both = await owner.get('/api/motifs?q=puffin&tags=spring&rights=unknown');
    expect(names(both.body)).toEqual(['Puffin waving']);
    const tagsOnly = await owner.get('/api/motifs?tags=spring&tags=puffin');
    expect(names(tagsOnly.body).sort()).toEqual(['Puffin in a red jumper', 'Puffin waving']);
    const autumnSpring = await owner.get('/api/motifs?tags=autumn,spring');
    expect(autumnSpring.body.total).toBe(0);
  });

  it('count tags and rights within the results for the filter controls', async () => {
    const res = await owner.get('/api/motifs?tags=spring');
    expect(res.body.facets.tags).toEqual(expect.arrayContaining([{ tag: 'spring', count: 3 }, { tag: 'puffin', count: 2 }, { tag: 'kite', count: 1 }]));
    expect(res.body.facets.rights).toMatchObject({ own_work: 2, unknown: 1 });
    expect(res.body.facets.unused).toBe(3);
  });

  it('filter by hidden-in-original and by original', async () => {
    const hidden = await owner.get('/api/motifs?hiddenInOriginal=true');
    expect(names(hidden.body)).toEqual(['Hidden sketch']);
    const list = await owner.get('/api/motifs?limit=1');
    const originalId = list.body.motifs[0].originalId;
    expect((await owner.get(`/api/motifs?originalId=${originalId}`)).body.total).toBe(6);
  });

  it('leave archived motifs out unless asked, and keep them', async () => {
    const plain = await owner.get('/api/motifs');
    expect(names(plain.body)).not.toContain('Old wave band');
    expect(plain.body.facets.archived).toBe(1);
    const only = await owner.get('/api/motifs?archived=only');
    expect(names(only.body)).toEqual(['Old wave band']);
    expect((await owner.get(`/api/motifs/${ids['Old wave band']}`)).status).toBe(200);
  });

  it('sort by name and page through the results', async () => {
    const first = await owner.get('/api/motifs?sort=name&limit=2');
    expect(names(first.body)).toEqual(['Falling leaves', 'Fox with a lantern']);
    expect(first.body.nextOffset).toBe(2);
    const last = await owner.get('/api/motifs?sort=name&limit=2&offset=4');
    expect(names(last.body)).toEqual(['Puffin in a red jumper', 'Puffin waving']);
    expect(last.body.nextOffset).toBeNull();
  });

  it('refuses a malformed colour with a message', async () => {
    const res = await owner.get('/api/motifs?colour=reddish');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/#rgb or #rrggbb/);
  });
});

describe('searching by colour', () => {
  it('finds motifs whose dominant colours are within the CIEDE2000 distance, nearest first', async () => {
    const res = await owner.get(`/api/motifs?colour=${encodeURIComponent('#c32a3a')}`);
    expect(names(res.body)).toEqual(['Puffin in a red jumper']);
    const match = res.body.motifs[0].colourMatch;
    expect(match.hex).toBe('#c8283c');
    // The distance agrees with the shared CIEDE2000 code (tested against Sharma et al. 2005).
    expect(match.deltaE).toBeCloseTo(deltaE2000(rgbToLab(hexToRgb('#c32a3a')), rgbToLab(hexToRgb('#c8283c'))), 2);
  });

  it('orders the matches by distance and widens with maxDistance', async () => {
    const near = await owner.get('/api/motifs?colour=d9692b&maxDistance=5');
    expect(names(near.body)).toEqual(['Fox with a lantern']);
    const wide = await owner.get('/api/motifs?colour=d9692b&maxDistance=20');
    expect(names(wide.body)[0]).toBe('Fox with a lantern');
    expect(names(wide.body)).toEqual(expect.arrayContaining(['Falling leaves', 'Puffin waving']));
    const distances = wide.body.motifs.map((m: Item) => m.colourMatch!.deltaE);
    expect(distances[0]).toBe(0);
  });

  it('combines with words', async () => {
    const res = await owner.get('/api/motifs?colour=%231d1f2a&q=waving');
    expect(names(res.body)).toEqual(['Puffin waving']);
  });
});

describe('keeping the search fresh', () => {
  it('shows a change made through another web process at once', async () => {
    const other = await createTestApp();
    try {
      // Both processes have built their index; the change goes through the second one.
      await owner.get('/api/motifs?q=kite');
      const { ApiClient } = await import('../support/test-app');
      const elsewhere = new ApiClient(other.app);
      const signIn = await elsewhere.post('/api/auth/sign-in', { email: (await owner.get('/api/auth/me')).body.user.email, password: 'puffins-in-jumpers' });
      expect(signIn.status).toBe(200);
      const renamed = await elsewhere.patch(`/api/motifs/${ids.Kite}`, { name: 'Blue kite', tags: ['kite', 'sky'] });
      expect(renamed.status).toBe(200);
      expect(names((await owner.get('/api/motifs?q=sky')).body)).toEqual(['Blue kite']);
      expect(names((await owner.get('/api/motifs?q=blue')).body)).toEqual(['Blue kite']);
    } finally {
      await other.close();
    }
  });
});
