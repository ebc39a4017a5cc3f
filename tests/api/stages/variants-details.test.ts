import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let reviewer: ApiClient;

beforeAll(async () => {
  t = await createTestApp();
  owner = (await signUpOwner(t.app, 'Variant Studio')).client;
  reviewer = (await addMember(t.app, owner, 'reviewer')).client;
}, 60_000);
afterAll(() => t.close());

async function newProduct(name: string) {
  const res = await owner.post('/api/products', { name, templateId: mug11oz.id });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

describe('variants and SKUs', () => {
  it('adds variants with their SKU and options, lists them in order and counts them in the list', async () => {
    const id = await newProduct('Puffin Picnic mug');
    const navy = await owner.post(`/api/products/${id}/variants`, { name: 'Navy handle', sku: 'PUF-MUG-NVY', options: { templateVariantId: mug11oz.variants[0].id, size: '11 oz' } });
    expect(navy.status).toBe(201);
    expect(navy.body).toMatchObject({ name: 'Navy handle', sku: 'PUF-MUG-NVY', position: 0, options: { size: '11 oz' } });
    const plain = await owner.post(`/api/products/${id}/variants`, { name: 'White', sku: '' });
    expect(plain.body).toMatchObject({ sku: null, position: 1 });
    const list = await reviewer.get(`/api/products/${id}/variants`).expect(200);
    expect(list.body.variants.map((v: { name: string }) => v.name)).toEqual(['Navy handle', 'White']);
    const products = await owner.get('/api/products').expect(200);
    expect(products.body.products.find((p: { id: string }) => p.id === id).variantCount).toBe(2);
    const { rows } = await t.runtime.db.pool.query("select count(*)::int as n from activity_events where subject_id = $1 and kind = 'product.variants_changed'", [id]);
    expect(rows[0].n).toBe(2);
  });

  it('refuses a SKU already used in the studio, whatever its case, naming the product that has it', async () => {
    const mug = await newProduct('Lantern Walk mug');
    const tote = await newProduct('Lantern Walk tote');
    await owner.post(`/api/products/${mug}/variants`, { name: 'Black', sku: 'LAN-MUG-BLK' }).then((r) => expect(r.status).toBe(201));
    const clash = await owner.post(`/api/products/${tote}/variants`, { name: 'Natural', sku: 'lan-mug-blk' });
    expect(clash.status).toBe(409);
    expect(clash.body.error.code).toBe('variant.sku_taken');
    expect(clash.body.error.message).toContain('Lantern Walk mug');
    const natural = await owner.post(`/api/products/${tote}/variants`, { name: 'Natural', sku: 'LAN-TOTE-NAT' });
    const renamed = await owner.patch(`/api/products/${tote}/variants/${natural.body.id}`, { sku: 'LAN-MUG-BLK' });
    expect(renamed.status).toBe(409);
    // Keeping its own SKU is not a clash with itself.
    const same = await owner.patch(`/api/products/${tote}/variants/${natural.body.id}`, { sku: 'lan-tote-nat', name: 'Natural canvas' });
    expect(same.status).toBe(200);
    expect(same.body).toMatchObject({ sku: 'lan-tote-nat', name: 'Natural canvas' });
  });

  it('refuses a blank the template does not have and a SKU with spaces', async () => {
    const id = await newProduct('Sticker mug');
    const badBlank = await owner.post(`/api/products/${id}/variants`, { name: 'Gold', options: { templateVariantId: 'gold-leaf' } });
    expect(badBlank.status).toBe(400);
    expect(badBlank.body.error.code).toBe('variant.unknown_blank');
    const badSku = await owner.post(`/api/products/${id}/variants`, { name: 'Odd', sku: 'has spaces' });
    expect(badSku.status).toBe(400);
    expect((await owner.get(`/api/products/${id}/variants`)).body.variants).toEqual([]);
  });

  it('deletes a variant, refuses reviewers and hides another studio’s variants', async () => {
    const id = await newProduct('Kite card');
    const v = await owner.post(`/api/products/${id}/variants`, { name: 'A6', sku: 'KITE-A6' });
    expect((await reviewer.post(`/api/products/${id}/variants`, { name: 'A5' })).status).toBe(403);
    expect((await reviewer.delete(`/api/products/${id}/variants/${v.body.id}`)).status).toBe(403);
    const other = (await signUpOwner(t.app, 'Elsewhere Studio')).client;
    expect((await other.get(`/api/products/${id}/variants`)).status).toBe(404);
    expect((await other.patch(`/api/products/${id}/variants/${v.body.id}`, { name: 'Mine' })).status).toBe(404);
    expect((await other.delete(`/api/products/${id}/variants/${v.body.id}`)).status).toBe(404);
    expect((await owner.delete(`/api/products/${id}/variants/${v.body.id}`)).status).toBe(204);
    expect((await owner.delete(`/api/products/${id}/variants/${v.body.id}`)).status).toBe(404);
    // The SKU is free again once its variant is gone.
    expect((await owner.post(`/api/products/${id}/variants`, { name: 'A6 again', sku: 'KITE-A6' })).status).toBe(201);
  });
});

describe('product details and list filters', () => {
  it('sets collection, tags and notes without a layout revision, and filters the list by them', async () => {
    const collection = await owner.post('/api/collections', { name: 'Coastal Spring' });
    expect(collection.status).toBe(201);
    const id = await newProduct('Coastal Spring tote');
    const before = (await owner.get(`/api/products/${id}`)).body;
    const saved = await owner.patch(`/api/products/${id}/details`, { collectionId: collection.body.id, tags: ['Gift', ' gift ', 'Bestseller'], notes: 'Natural canvas only' });
    expect(saved.status).toBe(200);
    expect(saved.body).toMatchObject({ collectionId: collection.body.id, collectionName: 'Coastal Spring', tags: ['gift', 'bestseller'], notes: 'Natural canvas only', revision: before.revision });
    const byTag = await owner.get('/api/products?tag=Gift').expect(200);
    expect(byTag.body.products.map((p: { id: string }) => p.id)).toEqual([id]);
    const byCollection = await owner.get(`/api/products?collectionId=${collection.body.id}&stage=drafting&templateId=${mug11oz.id}`).expect(200);
    expect(byCollection.body.products.map((p: { id: string }) => p.id)).toEqual([id]);
    expect((await owner.get('/api/products?stage=listed').expect(200)).body.products.map((p: { id: string }) => p.id)).not.toContain(id);
    expect((await owner.get('/api/products?stage=nowhere')).status).toBe(400);
    const cleared = await owner.patch(`/api/products/${id}/details`, { collectionId: null });
    expect(cleared.body.collectionId).toBeNull();
  });

  it('refuses another studio’s collection and an empty change, keeping what was there', async () => {
    const other = (await signUpOwner(t.app, 'Far Shore Studio')).client;
    const theirs = await other.post('/api/collections', { name: 'Lantern Walk' });
    const id = await newProduct('Lantern card');
    const res = await owner.patch(`/api/products/${id}/details`, { collectionId: theirs.body.id });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('product.unknown_collection');
    expect((await owner.patch(`/api/products/${id}/details`, {})).status).toBe(400);
    expect((await reviewer.patch(`/api/products/${id}/details`, { notes: 'x' })).status).toBe(403);
    expect((await other.patch(`/api/products/${id}/details`, { notes: 'x' })).status).toBe(404);
    expect((await owner.get(`/api/products/${id}`)).body.collectionId).toBeNull();
  });
});
