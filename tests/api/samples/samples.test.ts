import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { activityEvents } from '../../../server/db/schema/index';
import { latestSampleVerdict } from '../../../server/features/samples/samples.repository';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let reviewer: ApiClient;
let studioId: string;
let productId: string;

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Sample Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
  const product = await owner.post('/api/products', { name: 'Puffin Picnic mug', templateId: 'mug-11oz' });
  expect(product.status).toBe(201);
  productId = product.body.id;
}, 60_000);
afterAll(() => t.close());

const record = (body: object, id = productId, client = owner) => client.post(`/api/products/${id}/samples`, body);

describe('recording a sample order', () => {
  it('keeps the cost as minor units of its currency, as typed', async () => {
    const res = await record({ orderedOn: '2026-02-03', printer: 'Harbour Print Co.', cost: '12.50', currency: 'gbp', expectedOn: '2026-02-10', notes: 'Glossy finish' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ orderedOn: '2026-02-03', printer: 'Harbour Print Co.', costMinor: 1250, currency: 'GBP', expectedOn: '2026-02-10', receivedOn: null, notes: 'Glossy finish', verdict: 'pending', photos: [] });
    expect(res.body.createdBy.name).toBe('Ines Okafor');
  });

  it('reads a comma as the decimal point and knows that yen have no smaller unit', async () => {
    expect((await record({ orderedOn: '2026-02-03', cost: '7,5', currency: 'EUR' })).body.costMinor).toBe(750);
    const yen = await record({ orderedOn: '2026-02-03', cost: '1250', currency: 'JPY' });
    expect(yen.status).toBe(201);
    expect(yen.body.costMinor).toBe(1250);
    const fractionalYen = await record({ orderedOn: '2026-02-03', cost: '12.50', currency: 'JPY' });
    expect(fractionalYen.status).toBe(400);
    expect(fractionalYen.body.error.code).toBe('sample.bad_cost');
    expect(fractionalYen.body.error.fields.cost).toMatch(/JPY/);
  });

  it('refuses unknown currencies, unreadable amounts and a cost without a currency', async () => {
    const badCurrency = await record({ orderedOn: '2026-02-03', cost: '5', currency: 'XYZ' });
    expect([badCurrency.status, badCurrency.body.error.code]).toEqual([400, 'sample.bad_currency']);
    const notMoney = await record({ orderedOn: '2026-02-03', cost: 'twelve', currency: 'GBP' });
    expect([notMoney.status, notMoney.body.error.code]).toEqual([400, 'sample.bad_cost']);
    const tooPrecise = await record({ orderedOn: '2026-02-03', cost: '1.005', currency: 'GBP' });
    expect(tooPrecise.body.error.code).toBe('sample.bad_cost');
    const noCurrency = await record({ orderedOn: '2026-02-03', cost: '5' });
    expect([noCurrency.status, noCurrency.body.error.code]).toEqual([400, 'sample.currency_required']);
  });

  it('refuses impossible dates and dates before the order', async () => {
    const notADay = await record({ orderedOn: '2026-02-30' });
    expect([notADay.status, notADay.body.error.code]).toEqual([400, 'validation.failed']);
    expect(notADay.body.error.fields.orderedOn).toBeDefined();
    const early = await record({ orderedOn: '2026-02-03', receivedOn: '2026-02-01' });
    expect([early.status, early.body.error.code]).toEqual([400, 'sample.received_before_ordered']);
    expect(early.body.error.fields.receivedOn).toBeDefined();
    const expected = await record({ orderedOn: '2026-02-03', expectedOn: '2026-01-20' });
    expect(expected.body.error.code).toBe('sample.expected_before_ordered');
  });

  it('updates a sample, re-reading the amount when only the currency changes', async () => {
    const created = (await record({ orderedOn: '2026-03-01', cost: '20', currency: 'USD' })).body;
    const updated = await owner.patch(`/api/samples/${created.id}`, { receivedOn: '2026-03-08', printer: 'Dune Printworks', cost: '21.40' });
    expect(updated.status).toBe(200);
    expect(updated.body).toMatchObject({ receivedOn: '2026-03-08', printer: 'Dune Printworks', costMinor: 2140, currency: 'USD' });
    // $21.40 has cents; yen do not, so the change is refused rather than turning 2140 cents into ¥2140
    const toYen = await owner.patch(`/api/samples/${created.id}`, { currency: 'JPY' });
    expect(toYen.body.error.code).toBe('sample.bad_cost');
    const beforeOrder = await owner.patch(`/api/samples/${created.id}`, { orderedOn: '2026-03-10' });
    expect(beforeOrder.body.error.code).toBe('sample.received_before_ordered');
    const cleared = await owner.patch(`/api/samples/${created.id}`, { receivedOn: null, cost: '' });
    expect(cleared.body).toMatchObject({ receivedOn: null, costMinor: null, currency: 'USD' });
  });

  it('records the order in the studio activity', async () => {
    const rows = await t.runtime.db.db.select().from(activityEvents).where(and(eq(activityEvents.studioId, studioId), eq(activityEvents.kind, 'sample.recorded')));
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.some((r) => r.summary.includes('Harbour Print Co.'))).toBe(true);
  });
});

describe('verdicts and the latest sample', () => {
  it('asks for notes with "changes needed" and records who judged it', async () => {
    const product = (await owner.post('/api/products', { name: 'Puffin tote', templateId: 'tote-panel' })).body;
    const pid: string = product.id;
    const first = (await record({ orderedOn: '2026-04-01', printer: 'Harbour Print Co.' }, pid)).body;
    const noNotes = await owner.post(`/api/samples/${first.id}/verdict`, { verdict: 'changes_needed' });
    expect([noNotes.status, noNotes.body.error.code]).toEqual([400, 'sample.notes_required']);
    const changes = await owner.post(`/api/samples/${first.id}/verdict`, { verdict: 'changes_needed', notes: 'The wave band is cut off at the seam' });
    expect(changes.status).toBe(200);
    expect(changes.body).toMatchObject({ verdict: 'changes_needed', verdictNotes: 'The wave band is cut off at the seam', verdictBy: { name: 'Ines Okafor' } });
    expect(Date.parse(changes.body.verdictAt)).toBeGreaterThan(Date.now() - 60_000);
    expect(await latestSampleVerdict(t.runtime.db.db, pid)).toEqual({ sampleId: first.id, verdict: 'changes_needed' });

    // A second order, later: it decides now, whatever the first one said.
    const second = (await record({ orderedOn: '2026-04-20' }, pid)).body;
    const list = await owner.get(`/api/products/${pid}/samples`).expect(200);
    expect(list.body.samples.map((s: { id: string }) => s.id)).toEqual([second.id, first.id]);
    expect(list.body.latestSample).toMatchObject({ id: second.id, verdict: 'pending' });
    expect(await latestSampleVerdict(t.runtime.db.db, pid)).toEqual({ sampleId: second.id, verdict: 'pending' });

    expect((await owner.post(`/api/samples/${second.id}/verdict`, { verdict: 'approved' })).status).toBe(200);
    expect((await latestSampleVerdict(t.runtime.db.db, pid))?.verdict).toBe('approved');
    const verdicts = await t.runtime.db.db.select().from(activityEvents).where(and(eq(activityEvents.studioId, studioId), eq(activityEvents.kind, 'sample.verdict')));
    expect(verdicts.map((v) => v.subjectId)).toEqual(expect.arrayContaining([first.id, second.id]));
  });

  it('answers null for a product that has no sample yet', async () => {
    const bare = (await owner.post('/api/products', { name: 'Lantern Walk card', templateId: 'mug-11oz' })).body;
    expect(await latestSampleVerdict(t.runtime.db.db, bare.id)).toBeNull();
    expect((await owner.get(`/api/products/${bare.id}/samples`).expect(200)).body).toMatchObject({ samples: [], latestSample: null });
  });
});

describe('who may touch samples', () => {
  it('lets a reviewer read samples but not record or judge them', async () => {
    const sample = (await record({ orderedOn: '2026-05-01' })).body;
    await reviewer.get(`/api/products/${productId}/samples`).expect(200);
    for (const res of [
      await record({ orderedOn: '2026-05-02' }, productId, reviewer),
      await reviewer.post(`/api/samples/${sample.id}/verdict`, { verdict: 'approved' }),
      await reviewer.patch(`/api/samples/${sample.id}`, { printer: 'x' }),
      await reviewer.delete(`/api/samples/${sample.id}`),
    ]) {
      expect([res.status, res.body.error.code]).toEqual([403, 'role.forbidden']);
    }
  }, 60_000);

  it('answers 404 to another studio for the product and its samples', async () => {
    const sample = (await record({ orderedOn: '2026-05-01' })).body;
    const other = (await signUpOwner(t.app, 'Another Coast Studio')).client;
    expect((await other.get(`/api/products/${productId}/samples`)).status).toBe(404);
    expect((await record({ orderedOn: '2026-05-01' }, productId, other)).status).toBe(404);
    expect((await other.patch(`/api/samples/${sample.id}`, { printer: 'x' })).status).toBe(404);
    expect((await other.post(`/api/samples/${sample.id}/verdict`, { verdict: 'approved' })).status).toBe(404);
    expect((await other.delete(`/api/samples/${sample.id}`)).status).toBe(404);
    expect((await owner.get(`/api/products/${productId}/samples`)).body.samples.some((s: { id: string }) => s.id === sample.id)).toBe(true);
  }, 60_000); // signs up people (password hashing): slow on a busy machine
});
