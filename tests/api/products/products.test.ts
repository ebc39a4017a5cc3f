import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { templatePixelSize } from '../../../shared/templates/template-geometry';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { smallCardPsd } from '../support/psd-files';
import { waitForImport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let motifs: { id: string; name: string; width: number; height: number; version: number }[];

beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  owner = (await signUpOwner(t.app, 'Product Studio')).client;
  const upload = await owner.upload('/api/originals', smallCardPsd({ kiteColour: [12, 120, 220, 255] }), 'puffin-picnic.psd');
  motifs = (await waitForImport(owner, upload.body.id)).motifs;
}, 60_000);
afterAll(() => t.close());

const motifPlacement = (m: (typeof motifs)[number], id: string, x: number) => ({
  type: 'motif', id, motifId: m.id, version: m.version, naturalWidth: m.width, naturalHeight: m.height,
  x, y: 400, scale: 4, rotationDeg: 0, flipX: false, flipY: false, opacity: 1, blendMode: 'normal', locked: false, hidden: false,
});

describe('templates', () => {
  it('lists the built-in presets with their exact print-file size', async () => {
    const res = await owner.get('/api/templates').expect(200);
    const mug = res.body.templates.find((e: { template: { id: string } }) => e.template.id === mug11oz.id);
    expect(mug.source).toBe('built-in');
    expect(templatePixelSize(mug.template)).toEqual(templatePixelSize(mug11oz));
  });

  it('lets an editor add a studio template from the printer’s figures and rejects impossible ones', async () => {
    const { id: _id, ...figures } = mug11oz;
    const created = await owner.post('/api/templates', { template: { ...figures, name: 'Harbour Print Co. 11 oz' } });
    expect(created.status).toBe(201);
    expect(created.body.name).toBe('Harbour Print Co. 11 oz');
    const bad = await owner.post('/api/templates', { template: { ...figures, output: { ...figures.output, dpi: 150 } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('template.invalid');
    expect(bad.body.error.message).toMatch(/DPI/);
  });
});

describe('products', () => {
  it('creates a mug product, saves a layout and records which motif versions it uses', async () => {
    const created = await owner.post('/api/products', { name: 'Coastal Spring mug', templateId: mug11oz.id });
    expect(created.status).toBe(201);
    expect(created.body.layout.placements).toEqual([]);
    const layout = { version: 2, mirror: false, placements: [motifPlacement(motifs[0], 'p1', 300), motifPlacement(motifs[1], 'p2', 900)] };
    const saved = await owner.patch(`/api/products/${created.body.id}`, { revision: created.body.revision, layout });
    expect(saved.status).toBe(200);
    expect(saved.body.revision).toBe(created.body.revision + 1);
    expect(saved.body.motifs.map((m: { motifId: string }) => m.motifId).sort()).toEqual([motifs[0].id, motifs[1].id].sort());
    const { rows } = await t.runtime.db.pool.query('select motif_id, version from product_motifs where product_id = $1 order by placement_id', [created.body.id]);
    expect(rows).toEqual([{ motif_id: motifs[0].id, version: 1 }, { motif_id: motifs[1].id, version: 1 }]);
    // The library answers "where used" and refuses to delete a used motif.
    const motifPage = await owner.get(`/api/motifs/${motifs[0].id}`).expect(200);
    expect(motifPage.body.usage).toEqual([{ productId: created.body.id, productName: 'Coastal Spring mug', stage: 'drafting', placementId: 'p1', version: 1 }]);
    const del = await owner.delete(`/api/motifs/${motifs[0].id}`);
    expect(del.status).toBe(409);
    expect(del.body.error.code).toBe('motif.in_use');
    const used = await owner.get('/api/motifs?usage=used').expect(200);
    const items = used.body.motifs ?? used.body.items;
    expect(items.map((m: { id: string }) => m.id).sort()).toEqual([motifs[0].id, motifs[1].id].sort());
    const reloaded = await owner.get(`/api/products/${created.body.id}`).expect(200);
    expect(reloaded.body.layout.placements.map((p: { x: number }) => p.x)).toEqual([300, 900]);
  });

  it('refuses a stale save from a second tab with a clear conflict', async () => {
    const created = await owner.post('/api/products', { name: 'Tote', templateId: mug11oz.id });
    const first = await owner.patch(`/api/products/${created.body.id}`, { revision: created.body.revision, name: 'Tote (tab one)' });
    expect(first.status).toBe(200);
    const stale = await owner.patch(`/api/products/${created.body.id}`, { revision: created.body.revision, name: 'Tote (tab two)' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('product.stale');
    expect((await owner.get(`/api/products/${created.body.id}`)).body.name).toBe('Tote (tab one)');
  });

  it('refuses a layout naming a motif of another studio', async () => {
    const stranger = await signUpOwner(t.app, 'Other Shore');
    const created = await stranger.client.post('/api/products', { name: 'Borrowed', templateId: mug11oz.id });
    const layout = { version: 2, mirror: false, placements: [motifPlacement(motifs[0], 'p1', 300)] };
    const res = await stranger.client.patch(`/api/products/${created.body.id}`, { revision: 1, layout });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('layout.unknown_motif');
    expect((await stranger.client.get(`/api/products`)).body.products).toHaveLength(1);
    expect((await owner.get(`/api/products/${created.body.id}`)).status).toBe(404);
  });

  it('refuses a malformed layout and keeps the saved one', async () => {
    const created = await owner.post('/api/products', { name: 'Card', templateId: mug11oz.id });
    const res = await owner.patch(`/api/products/${created.body.id}`, { revision: 1, layout: { version: 2, placements: [{ type: 'motif', id: 'x' }] } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('layout.invalid');
    expect((await owner.get(`/api/products/${created.body.id}`)).body.revision).toBe(1);
  });

  it('lets a reviewer look but not compose', async () => {
    const reviewer = await addMember(t.app, owner, 'reviewer');
    expect((await reviewer.client.get('/api/products')).status).toBe(200);
    const res = await reviewer.client.post('/api/products', { name: 'Nope', templateId: mug11oz.id });
    expect(res.status).toBe(403);
  });
});
