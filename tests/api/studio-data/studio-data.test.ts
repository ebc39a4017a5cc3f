import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comments, commentThreads, reviewDecisions, reviewRequests, salesImports, salesRows } from '../../../server/db/schema/index';
import { studioDataDocumentSchema, type StudioDataDocument } from '../../../shared/contracts/studio-data';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { seedMotifs } from '../support/library-seed';
import { addMember, ApiClient, createTestApp, signUpOwner, type TestApp } from '../support/test-app';

let t: TestApp;
let ines: { client: ApiClient; email: string; userId: string; studioId: string };
let editor: ApiClient;
let reviewer: ApiClient;
let exported: StudioDataDocument;
let seededKeys: string[];

const uuid = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;

// Ids become labels in order of first appearance, so two exports of the same records compare equal.
function normalise(doc: StudioDataDocument) {
  const { exportedAt: _e, source: _s, members: _m, studio, activity, ...rest } = doc;
  const labels = new Map<string, string>([[doc.source.studioId, 'studio']]);
  const body = { studio: { ...studio, name: '(name)' }, activity: activity.filter((a) => a.kind !== 'studio.data_imported'), ...rest };
  return JSON.parse(JSON.stringify(body).replace(uuid, (id) => {
    if (!labels.has(id)) labels.set(id, `id-${labels.size}`);
    return labels.get(id)!;
  }));
}

async function buildStudio() {
  const db = t.runtime.db.db;
  const seeded = await seedMotifs(db, ines.studioId, [
    { name: 'Puffin in a jumper', tags: ['puffin', 'spring'], colours: [{ hex: '#1f3a5f' }, { hex: '#f2c14e' }] },
    { name: 'Picnic basket', tags: ['picnic'], colours: [{ hex: '#8b5a2b' }] },
    { name: 'Kite', tags: ['spring'] },
  ], { storage: t.runtime.storage, originalName: 'puffin-picnic.psd' });
  const originalKey = `studios/${ines.studioId}/originals/${seeded.originalId}/file`;
  await t.runtime.storage.put(originalKey, Buffer.from('8BPS stand-in'), 'image/vnd.adobe.photoshop');
  seededKeys = [originalKey, ...seeded.keys];
  const [puffin, basket] = seeded.motifIds;

  const c = ines.client;
  const collection = await c.post('/api/collections', { name: 'Coastal Spring', seasonStart: '2027-03-01', seasonEnd: '2027-05-31', launchDate: '2027-03-15' });
  expect(collection.status).toBe(201);
  expect((await c.post(`/api/collections/${collection.body.id}/motifs`, { ids: [puffin, basket] })).status).toBe(200);
  const { id: _id, ...figures } = mug11oz;
  const template = await c.post('/api/templates', { template: { ...figures, name: 'Harbour Print Co. 11 oz' } });
  expect(template.status).toBe(201);

  const product = await c.post('/api/products', { name: 'Puffin Picnic mug', templateId: template.body.id });
  expect(product.status).toBe(201);
  const placement = (motifId: string, id: string, x: number) => ({
    type: 'motif', id, motifId, version: 1, naturalWidth: 600, naturalHeight: 450,
    x, y: 400, scale: 1, rotationDeg: 0, flipX: false, flipY: false, opacity: 1, blendMode: 'normal', locked: false, hidden: false,
  });
  const saved = await c.patch(`/api/products/${product.body.id}`, { revision: 1, layout: { version: 2, mirror: false, placements: [placement(puffin, 'p1', 300), placement(basket, 'p2', 900)] } });
  expect(saved.status).toBe(200);
  expect((await c.patch(`/api/products/${product.body.id}/details`, { collectionId: collection.body.id, tags: ['mug', 'gift'], notes: 'Handle on the right' })).status).toBe(200);
  await c.post('/api/products', { name: 'Lantern Walk tote', templateId: mug11oz.id });
  expect((await c.post(`/api/products/${product.body.id}/stage`, { to: 'proofing', note: 'Proof on the printer’s site' })).status).toBe(200);
  const variant = await c.post(`/api/products/${product.body.id}/variants`, { name: 'Navy handle', sku: 'PUF-MUG-NAVY' });
  expect(variant.status).toBe(201);

  const sample = await c.post(`/api/products/${product.body.id}/samples`, { orderedOn: '2027-01-10', printer: 'Harbour Print Co.', cost: '12.50', currency: 'GBP' });
  expect(sample.status).toBe(201);
  const photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#1f3a5f' } }).jpeg().toBuffer();
  expect((await c.upload(`/api/samples/${sample.body.id}/photos`, photo, 'mug-front.jpg')).status).toBe(201);
  expect((await c.post(`/api/samples/${sample.body.id}/verdict`, { verdict: 'approved' })).status).toBe(200);

  // Review and sales rows straight into their tables: their routes have their own tests.
  const [thread] = await db.insert(commentThreads).values({
    studioId: ines.studioId, productId: product.body.id, productRevision: 2, createdBy: ines.userId,
    anchor: { surface: 'layout', x: 310, y: 400, placementId: 'p1' },
  }).returning();
  await db.insert(comments).values({ studioId: ines.studioId, threadId: thread.id, authorId: ines.userId, body: 'Could the puffin face the handle?' });
  await db.insert(reviewRequests).values({ studioId: ines.studioId, productId: product.body.id, requestedBy: ines.userId, productRevision: 2, note: 'Ready for a look' });
  await db.insert(reviewDecisions).values({ studioId: ines.studioId, productId: product.body.id, reviewerId: ines.userId, decision: 'approved', productRevision: 2 });
  const [sales] = await db.insert(salesImports).values({
    studioId: ines.studioId, fileName: 'shop-2027-03.csv', fileSha256: 'ab'.repeat(32), rowCount: 2, mapping: { date: 'Sale Date', sku: 'SKU' }, importedBy: ines.userId,
  }).returning();
  await db.insert(salesRows).values([
    { studioId: ines.studioId, importId: sales.id, line: 2, soldOn: '2027-03-16', sku: 'PUF-MUG-NAVY', variantId: variant.body.id, productId: product.body.id, quantity: 2, revenueMinor: 3600, currency: 'GBP' },
    { studioId: ines.studioId, importId: sales.id, line: 3, soldOn: '2027-03-17', sku: 'UNKNOWN-1', quantity: 1, revenueMinor: 900, currency: 'GBP', rowKey: 'order-7:UNKNOWN-1' },
  ]);
  return { productId: product.body.id as string, puffin };
}

let built: Awaited<ReturnType<typeof buildStudio>>;

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Saltmarsh Studio');
  ines = { client: signedUp.client, email: signedUp.email, userId: signedUp.me.user.id, studioId: signedUp.me.studio.id };
  editor = (await addMember(t.app, ines.client, 'editor')).client;
  reviewer = (await addMember(t.app, ines.client, 'reviewer')).client;
  built = await buildStudio();
}, 90_000);
afterAll(() => t.close());

describe('exporting the studio\'s data', () => {
  it('writes every record, the members without secrets, and the objects they name', async () => {
    const res = await ines.client.get('/api/studio/data-export').expect(200);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?saltmarsh-studio-data-\d{4}-\d{2}-\d{2}\.json/);
    exported = studioDataDocumentSchema.parse(res.body);
    expect(exported).toMatchObject({ format: 'motifold.studio-data', version: 1, source: { studioId: ines.studioId, studioName: 'Saltmarsh Studio' } });
    expect(exported.members.map((m) => m.role)).toEqual(['owner', 'editor', 'reviewer']);
    expect(JSON.stringify(exported)).not.toMatch(/passwordHash|argon2|\$scrypt/);
    const counts = Object.fromEntries(Object.entries(exported).filter(([, v]) => Array.isArray(v)).map(([k, v]) => [k, (v as unknown[]).length]));
    expect(counts).toMatchObject({
      originals: 1, motifs: 3, motifVersions: 3, originalMotifs: 3, collections: 1, collectionMotifs: 2, templates: 1, products: 2, productMotifs: 2,
      variants: 1, samples: 1, samplePhotos: 1, commentThreads: 1, comments: 1, reviewRequests: 1, reviewDecisions: 1, salesImports: 1, salesRows: 2,
    });
    expect(exported.stageMoves.map((m) => m.toStage)).toEqual(['drafting', 'drafting', 'proofing']);
    expect(exported.tags).toEqual([{ tag: 'gift', motifs: 0, products: 1 }, { tag: 'mug', motifs: 0, products: 1 }, { tag: 'picnic', motifs: 1, products: 0 }, { tag: 'puffin', motifs: 1, products: 0 }, { tag: 'spring', motifs: 2, products: 0 }]);
    const keys = exported.objects.map((o) => o.key);
    for (const k of seededKeys) expect(keys).toContain(k);
    expect(keys).toHaveLength(1 + 6 + 3);
    expect(exported.objects.find((o) => o.key === exported.samplePhotos[0].originalKey)?.bytes).toBe(exported.samplePhotos[0].byteSize);
  });

  it('is for owners only', async () => {
    expect((await editor.get('/api/studio/data-export')).status).toBe(403);
    expect((await reviewer.get('/api/studio/data-export')).status).toBe(403);
    expect((await editor.post('/api/studio/data-import', exported)).status).toBe(403);
  });
});

describe('importing into another studio', () => {
  it('refuses a studio that already has records', async () => {
    const res = await ines.client.post('/api/studio/data-import', exported);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('studio.not_empty');
  });

  it('refuses a malformed file with the path of its first problem, and imports nothing', async () => {
    const empty = await signUpOwner(t.app, 'Empty Cove');
    const notOurs = await empty.client.post('/api/studio/data-import', { format: 'something-else' });
    expect(notOurs.status).toBe(400);
    expect(notOurs.body.error).toMatchObject({ code: 'studio_data.invalid' });
    expect(notOurs.body.error.message).toMatch(/at format: Not a studio data file/);
    const badDate = await empty.client.post('/api/studio/data-import', { ...exported, collections: [{ ...exported.collections[0], launchDate: '15/03/2027' }] });
    expect(badDate.status).toBe(400);
    expect(badDate.body.error.fields).toHaveProperty(['collections.0.launchDate']);
    const dangling = await empty.client.post('/api/studio/data-import', { ...exported, motifs: [{ ...exported.motifs[0], originalId: '00000000-0000-4000-8000-000000000000' }, ...exported.motifs.slice(1)] });
    expect(dangling.status).toBe(400);
    expect(dangling.body.error.fields).toHaveProperty(['motifs.0.originalId']);
    expect((await empty.client.get('/api/collections').expect(200)).body.collections).toEqual([]);
    expect((await empty.client.get('/api/products').expect(200)).body.products).toEqual([]);
  });

  it('round-trips: export, import into an empty studio, export again gives the same document', async () => {
    // A second owner starts an empty studio and makes Ines an owner there too.
    const harbour = await signUpOwner(t.app, 'New Harbour Studio');
    const invite = await harbour.client.post('/api/studio/invitations', { email: ines.email, role: 'editor' });
    expect(invite.status).toBe(201);
    const { mailsTo, linkIn } = await import('../support/inbox');
    const [mail] = await mailsTo(ines.email);
    const token = linkIn(mail, /\/invitations\/[A-Za-z0-9_-]+/).split('/').pop()!;
    expect((await ines.client.post(`/api/invitations/${token}/accept`, {})).status).toBe(200);
    expect((await harbour.client.patch(`/api/studio/members/${ines.userId}`, { role: 'owner' })).status).toBe(200);

    const res = await ines.client.post('/api/studio/data-import', exported);
    expect(res.status).toBe(200);
    expect(res.body.imported).toMatchObject({ motifs: 3, products: 2, salesRows: 2, activity: exported.activity.length });
    expect(res.body.matchedPeople.map((p: { email: string }) => p.email)).toEqual([ines.email]);
    expect(res.body.unmatchedPeople).toHaveLength(2);
    expect(res.body.objectsCopied).toBe(exported.objects.length);
    expect(res.body.missingObjects).toEqual([]);

    const again = await ines.client.get('/api/studio/data-export').expect(200);
    const second = studioDataDocumentSchema.parse(again.body);
    expect(second.source.studioId).not.toBe(ines.studioId);
    expect(second.activity.filter((a) => a.kind === 'studio.data_imported')).toHaveLength(1);
    expect(normalise(second)).toEqual(normalise(exported));

    // new ids everywhere, references followed, objects readable under the new studio
    const product = second.products.find((p) => p.name === 'Puffin Picnic mug')!;
    expect(product.id).not.toBe(built.productId);
    const placements = product.layout.placements.map((p) => ({ motifId: String(p.motifId) }));
    expect(second.motifs.map((m) => m.id)).toContain(placements[0].motifId);
    expect(placements[0].motifId).not.toBe(built.puffin);
    expect(product.templateId).toBe(second.templates[0].id);
    for (const o of second.objects) {
      expect(o.key.startsWith(`studios/${second.source.studioId}/`)).toBe(true);
      expect(await t.runtime.storage.exists(o.key)).toBe(true);
    }
    const library = await ines.client.get('/api/motifs').expect(200);
    expect(JSON.stringify(library.body)).toContain('Puffin in a jumper');
    const calendar = await ines.client.get('/api/calendar?from=2027-01-01&to=2027-12-31').expect(200);
    expect(calendar.body.collections.map((c: { name: string }) => c.name)).toEqual(['Coastal Spring']);
  });

  it('copies no objects from a studio the importer does not own, and says which are missing', async () => {
    const stranger = await signUpOwner(t.app, 'Stranger Shore');
    const res = await stranger.client.post('/api/studio/data-import', exported);
    expect(res.status).toBe(200);
    expect(res.body.objectsCopied).toBe(0);
    expect(res.body.missingObjects).toHaveLength(exported.objects.length);
    expect(res.body.missingObjects[0].reason).toMatch(/not one you own/);
    // nobody of the file is a member there: every person reference is empty
    expect(res.body.matchedPeople).toEqual([]);
    const doc = studioDataDocumentSchema.parse((await stranger.client.get('/api/studio/data-export').expect(200)).body);
    expect(doc.products.every((p) => p.createdBy === null)).toBe(true);
    expect(doc.comments[0].authorId).toBeNull();
  });
});
