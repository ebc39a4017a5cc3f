import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { products } from '../../../server/db/schema/index';
import { addDays, todayUtc } from '../../../shared/calendar/calendar-days';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let reviewer: ApiClient;
const today = todayUtc();
const ids: Record<string, string> = {};

async function collection(client: ApiClient, name: string, launchInDays: number | null) {
  const launchDate = launchInDays === null ? null : addDays(today, launchInDays);
  const res = await client.post('/api/collections', {
    name,
    launchDate,
    seasonStart: launchDate,
    seasonEnd: launchDate && addDays(launchDate, 90),
  });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

async function product(client: ApiClient, name: string, collectionId: string, stage: 'idea' | 'drafting' | 'sampling' | 'ready' | 'listed' | 'retired') {
  const res = await client.post('/api/products', { name, templateId: mug11oz.id });
  expect(res.status).toBe(201);
  const details = await client.patch(`/api/products/${res.body.id}/details`, { collectionId });
  expect(details.status).toBe(200);
  // Stage rules are tested with the stage routes; here only the stage itself matters.
  await t.runtime.db.db.update(products).set({ stage }).where(eq(products.id, res.body.id));
  return res.body.id as string;
}

const flagsOf = (body: { collections: { products: { name: string; flag: string }[] }[] }) =>
  Object.fromEntries(body.collections.flatMap((c) => c.products.map((p) => [p.name, p.flag])));

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Calendar Studio');
  owner = signedUp.client;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
  // Launch in 10 weeks: with the default 8 weeks, ready by in 14 days (at risk).
  ids.spring = await collection(owner, 'Coastal Spring', 70);
  // Launch in 30 days: ready by was 26 days ago (late).
  ids.lantern = await collection(owner, 'Lantern Walk', 30);
  ids.far = await collection(owner, 'Winter Far Away', 900);
  ids.undated = await collection(owner, 'Someday Shells', null);
  ids.mug = await product(owner, 'Puffin Picnic mug', ids.spring, 'drafting');
  ids.tote = await product(owner, 'Puffin Picnic tote', ids.spring, 'ready');
  ids.stickers = await product(owner, 'Puffin sticker sheet', ids.spring, 'retired');
  ids.fox = await product(owner, 'Fox lantern mug', ids.lantern, 'sampling');
  ids.leaves = await product(owner, 'Falling leaves card', ids.lantern, 'listed');
  ids.idea = await product(owner, 'Lantern idea', ids.lantern, 'idea');
}, 60_000);
afterAll(() => t.close());

describe('the season calendar', () => {
  it('lists collections with their ready-by dates and each product\'s flag, by stage', async () => {
    const res = await reviewer.get('/api/calendar').expect(200);
    expect(res.body).toMatchObject({ today, readyWeeksBeforeLaunch: 8, atRiskDays: 14 });
    const names = res.body.collections.map((c: { name: string }) => c.name);
    expect(names).toEqual(['Lantern Walk', 'Coastal Spring']);
    const spring = res.body.collections.find((c: { id: string }) => c.id === ids.spring);
    expect(spring).toMatchObject({ launchDate: addDays(today, 70), readyBy: addDays(today, 14), seasonEnd: addDays(today, 160), lateCount: 0, atRiskCount: 1 });
    expect(spring.products.map((p: { stage: string }) => p.stage)).toEqual(['drafting', 'ready', 'retired']);
    expect(flagsOf(res.body)).toEqual({
      'Puffin Picnic mug': 'at_risk',
      'Puffin Picnic tote': 'ready',
      'Puffin sticker sheet': 'retired',
      'Fox lantern mug': 'late',
      'Falling leaves card': 'ready',
      'Lantern idea': 'late',
    });
    const fox = res.body.collections[0].products.find((p: { id: string }) => p.id === ids.fox);
    expect(fox.daysUntilReadyBy).toBe(-26);
    expect(res.body.undated).toEqual([{ id: ids.undated, name: 'Someday Shells', productCount: 0 }]);
  });

  it('shows only the collections of the span asked for', async () => {
    const later = await owner.get(`/api/calendar?from=${addDays(today, 800)}&to=${addDays(today, 1000)}`).expect(200);
    expect(later.body.collections.map((c: { name: string }) => c.name)).toEqual(['Winter Far Away']);
    const bad = await owner.get(`/api/calendar?from=${today}&to=${addDays(today, -1)}`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('to');
    expect((await owner.get('/api/calendar?from=2027-02-30')).status).toBe(400);
  });

  it('lists late products first, then at-risk ones, for the home page', async () => {
    const res = await reviewer.get('/api/calendar/flags').expect(200);
    expect(res.body.flags.map((f: { id: string; flag: string }) => [f.id, f.flag])).toEqual([
      // equally late: by name
      [ids.fox, 'late'],
      [ids.idea, 'late'],
      [ids.mug, 'at_risk'],
    ]);
    expect(res.body.flags[2]).toMatchObject({ collectionId: ids.spring, collectionName: 'Coastal Spring', readyBy: addDays(today, 14), launchDate: addDays(today, 70) });
  });

  it('moves the flags when the studio changes its weeks before launch', async () => {
    expect((await owner.patch('/api/studio', { readyWeeksBeforeLaunch: 12 })).status).toBe(200);
    const stricter = await owner.get('/api/calendar').expect(200);
    expect(flagsOf(stricter.body)['Puffin Picnic mug']).toBe('late');
    expect(stricter.body.collections.find((c: { id: string }) => c.id === ids.spring).readyBy).toBe(addDays(today, -14));
    expect((await owner.patch('/api/studio', { readyWeeksBeforeLaunch: 2 })).status).toBe(200);
    const looser = await owner.get('/api/calendar/flags').expect(200);
    // Lantern Walk launches in 30 days: ready by in 16 days, more than two weeks away
    expect(looser.body.flags).toEqual([]);
    const cal = await owner.get('/api/calendar').expect(200);
    expect(flagsOf(cal.body)).toMatchObject({ 'Puffin Picnic mug': 'on_track', 'Fox lantern mug': 'on_track' });
    await owner.patch('/api/studio', { readyWeeksBeforeLaunch: 8 });
  });

  it('flags a product no more once it reaches ready', async () => {
    await t.runtime.db.db.update(products).set({ stage: 'ready' }).where(eq(products.id, ids.fox));
    const res = await owner.get('/api/calendar/flags').expect(200);
    expect(res.body.flags.map((f: { id: string }) => f.id)).not.toContain(ids.fox);
    await t.runtime.db.db.update(products).set({ stage: 'sampling' }).where(eq(products.id, ids.fox));
  });

  it('never shows another studio\'s collections or products', async () => {
    const other = await signUpOwner(t.app, 'Another Coast Studio');
    const theirs = await collection(other.client, 'Their Spring', 20);
    await product(other.client, 'Their late mug', theirs, 'drafting');
    const mine = await owner.get('/api/calendar').expect(200);
    expect(JSON.stringify(mine.body)).not.toContain('Their');
    const mineFlags = await owner.get('/api/calendar/flags').expect(200);
    expect(JSON.stringify(mineFlags.body)).not.toContain('Their');
    const theirFlags = await other.client.get('/api/calendar/flags').expect(200);
    expect(theirFlags.body.flags.map((f: { name: string }) => f.name)).toEqual(['Their late mug']);
  });
});
