import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { samples } from '../../../server/db/schema/index';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let editor: ApiClient;
let reviewer: ApiClient;
let studioId: string;

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Stage Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  editor = (await addMember(t.app, owner, 'editor')).client;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
}, 60_000);
afterAll(() => t.close());

async function newProduct(name = 'Puffin Picnic mug') {
  const res = await owner.post('/api/products', { name, templateId: mug11oz.id });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

// Samples are recorded through their own API elsewhere; here the gate only reads the table.
async function recordSample(productId: string, verdict: 'pending' | 'approved' | 'changes_needed', orderedOn: string) {
  await t.runtime.db.db.insert(samples).values({ studioId, productId, orderedOn, printer: 'Harbour Print Co.', verdict });
}

async function walkTo(client: ApiClient, productId: string, stages: string[]) {
  for (const to of stages) {
    const res = await client.post(`/api/products/${productId}/stage`, { to });
    expect({ to, status: res.status, body: res.body }).toMatchObject({ to, status: 200 });
  }
}

describe('moving a product between stages', () => {
  it('records the first stage and the creation when a product is started', async () => {
    const id = await newProduct('Lantern Walk tote');
    const history = await reviewer.get(`/api/products/${id}/stages`).expect(200);
    expect(history.body.moves).toHaveLength(1);
    expect(history.body.moves[0]).toMatchObject({ fromStage: null, toStage: 'drafting', override: false, movedBy: { name: 'Ines Okafor' } });
    const { rows } = await t.runtime.db.pool.query('select kind from activity_events where subject_id = $1', [id]);
    expect(rows.map((r) => r.kind)).toEqual(['product.created']);
  });

  it('lets an editor move a product one stage on, with a note, and keeps the history with names', async () => {
    const id = await newProduct();
    const moved = await editor.post(`/api/products/${id}/stage`, { to: 'proofing', note: 'Layout done, proofing on the printer’s site' });
    expect(moved.status).toBe(200);
    expect(moved.body).toMatchObject({ stage: 'proofing', move: { fromStage: 'drafting', toStage: 'proofing', movedBy: { name: 'Teodor Vance' }, override: false } });
    const detail = await owner.get(`/api/products/${id}`).expect(200);
    expect(detail.body.stage).toBe('proofing');
    const history = await owner.get(`/api/products/${id}/stages`).expect(200);
    expect(history.body.moves.map((m: { toStage: string; note: string }) => [m.toStage, m.note])).toEqual([
      ['drafting', ''],
      ['proofing', 'Layout done, proofing on the printer’s site'],
    ]);
    const { rows } = await t.runtime.db.pool.query("select summary, data from activity_events where subject_id = $1 and kind = 'product.stage_moved'", [id]);
    expect(rows).toHaveLength(1);
    expect(rows[0].data).toMatchObject({ from: 'drafting', to: 'proofing', override: false });
  });

  it('refuses a reviewer, a skipped stage and an unknown stage, and leaves the stage as it was', async () => {
    const id = await newProduct();
    const byReviewer = await reviewer.post(`/api/products/${id}/stage`, { to: 'proofing' });
    expect(byReviewer.status).toBe(403);
    const skip = await editor.post(`/api/products/${id}/stage`, { to: 'ready' });
    expect(skip.status).toBe(400);
    expect(skip.body.error.code).toBe('stage.not_allowed');
    expect(skip.body.error.message).toMatch(/Proofing/);
    const nonsense = await editor.post(`/api/products/${id}/stage`, { to: 'shipped' });
    expect(nonsense.status).toBe(400);
    expect((await owner.get(`/api/products/${id}`)).body.stage).toBe('drafting');
    expect((await owner.get(`/api/products/${id}/stages`)).body.moves).toHaveLength(1);
  });

  it('goes back any number of stages and retires from anywhere', async () => {
    const id = await newProduct();
    await walkTo(editor, id, ['proofing', 'sampling', 'idea', 'retired', 'drafting']);
    expect((await owner.get(`/api/products/${id}`)).body.stage).toBe('drafting');
  });
});

describe('the sample gate', () => {
  it('refuses ready without a sample, and with a latest sample that needs changes', async () => {
    const id = await newProduct();
    await walkTo(editor, id, ['proofing', 'sampling']);
    const none = await editor.post(`/api/products/${id}/stage`, { to: 'ready' });
    expect(none.status).toBe(409);
    expect(none.body.error.code).toBe('stage.needs_approved_sample');
    await recordSample(id, 'approved', '2026-01-10');
    await recordSample(id, 'changes_needed', '2026-02-01');
    const changes = await editor.post(`/api/products/${id}/stage`, { to: 'ready' });
    expect(changes.status).toBe(409);
    expect(changes.body.error.message).toMatch(/needs changes/);
    expect((await owner.get(`/api/products/${id}`)).body.stage).toBe('sampling');
  });

  it('lets the product through once its latest sample is approved, and shows the verdict in the list', async () => {
    const id = await newProduct('Coastal Spring mug');
    await walkTo(editor, id, ['proofing', 'sampling']);
    await recordSample(id, 'changes_needed', '2026-01-10');
    await recordSample(id, 'approved', '2026-02-01');
    await walkTo(editor, id, ['ready', 'listed']);
    const list = await reviewer.get('/api/products').expect(200);
    expect(list.body.products.find((p: { id: string }) => p.id === id)).toMatchObject({ stage: 'listed', latestSampleVerdict: 'approved' });
  });

  it('lets an owner override with a note, recorded as an override; an editor may not, nor an owner without a note', async () => {
    const id = await newProduct();
    await walkTo(editor, id, ['proofing', 'sampling']);
    const byEditor = await editor.post(`/api/products/${id}/stage`, { to: 'ready', override: true, note: 'Trust me' });
    expect(byEditor.status).toBe(403);
    expect(byEditor.body.error.code).toBe('stage.override_forbidden');
    const noNote = await owner.post(`/api/products/${id}/stage`, { to: 'ready', override: true });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.code).toBe('stage.override_needs_note');
    const overridden = await owner.post(`/api/products/${id}/stage`, { to: 'ready', override: true, note: 'Same blank as the spring mug, sample approved there' });
    expect(overridden.status).toBe(200);
    expect(overridden.body.move).toMatchObject({ toStage: 'ready', override: true, movedBy: { name: 'Ines Okafor' } });
    const history = await owner.get(`/api/products/${id}/stages`).expect(200);
    expect(history.body.moves.at(-1)).toMatchObject({ toStage: 'ready', override: true, note: 'Same blank as the spring mug, sample approved there' });
  });

  it('offers the override as its own owner-only route too', async () => {
    const id = await newProduct();
    await walkTo(editor, id, ['proofing', 'sampling']);
    expect((await editor.post(`/api/products/${id}/stage/override`, { to: 'ready', note: 'Please' })).status).toBe(403);
    const res = await owner.post(`/api/products/${id}/stage/override`, { to: 'ready', note: 'Printer swapped blanks, sample not needed' });
    expect(res.status).toBe(200);
    expect(res.body.move).toMatchObject({ override: true, toStage: 'ready' });
  });

  it('answers 404 for another studio’s product, for moves and for history', async () => {
    const id = await newProduct();
    const other = (await signUpOwner(t.app, 'Other Harbour Studio')).client;
    expect((await other.post(`/api/products/${id}/stage`, { to: 'proofing' })).status).toBe(404);
    expect((await other.get(`/api/products/${id}/stages`)).status).toBe(404);
    expect((await owner.get(`/api/products/${id}`)).body.stage).toBe('drafting');
  });
});
