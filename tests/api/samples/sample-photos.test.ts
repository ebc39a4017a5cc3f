import { randomBytes } from 'node:crypto';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let studioId: string;
let sampleId: string;

// 600 × 300, left half red and right half blue; stored sideways with EXIF orientation 6
// ("rotate 90° clockwise to view", EXIF 2.3 tag 0x0112), as a phone held upright writes it.
async function sidewaysJpeg(): Promise<Buffer> {
  const half = (r: number, b: number) => ({ create: { width: 300, height: 300, channels: 3 as const, background: { r, g: 0, b } } });
  const left = await sharp(half(220, 0)).png().toBuffer();
  const right = await sharp(half(0, 220)).png().toBuffer();
  return sharp({ create: { width: 600, height: 300, channels: 3, background: '#000' } })
    .composite([{ input: left, left: 0, top: 0 }, { input: right, left: 300, top: 0 }])
    .jpeg({ quality: 92 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

const pixelAt = async (image: Buffer, x: number, y: number) => {
  const { data, info } = await sharp(image).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const i = (y * info.width + x) * info.channels;
  return { r: data[i], g: data[i + 1], b: data[i + 2] };
};

const binary = (client: ApiClient, path: string) =>
  client.get(path).buffer(true).parse((res, cb) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => cb(null, Buffer.concat(chunks)));
  });

async function newSample(client: ApiClient) {
  const product = await client.post('/api/products', { name: 'Puffin Picnic mug', templateId: 'mug-11oz' });
  const sample = await client.post(`/api/products/${product.body.id}/samples`, { orderedOn: '2026-02-03', printer: 'Harbour Print Co.' });
  expect(sample.status).toBe(201);
  return { productId: product.body.id as string, sampleId: sample.body.id as string };
}

beforeAll(async () => {
  t = await createTestApp();
  const signedUp = await signUpOwner(t.app, 'Photo Studio');
  owner = signedUp.client;
  studioId = signedUp.me.studio.id;
  sampleId = (await newSample(owner)).sampleId;
}, 60_000);
afterAll(() => t.close());

describe('sample photos', () => {
  it('keeps a sideways phone JPEG whole and serves upright display and thumbnail copies', async () => {
    const jpeg = await sidewaysJpeg();
    const res = await owner.upload(`/api/samples/${sampleId}/photos`, jpeg, 'mug-front.jpg');
    expect(res.status).toBe(201);
    // recorded as seen: turned a quarter, so 300 wide and 600 tall
    expect(res.body).toMatchObject({ fileName: 'mug-front.jpg', contentType: 'image/jpeg', byteSize: jpeg.length, width: 300, height: 600 });

    const original = await binary(owner, res.body.originalUrl).expect(200);
    expect(Buffer.compare(original.body as Buffer, jpeg)).toBe(0);
    expect(original.headers['content-disposition']).toMatch(/^attachment; .*mug-front\.jpg/);
    expect(original.headers['content-type']).toBe('image/jpeg');

    const display = await binary(owner, res.body.displayUrl).expect(200);
    expect(display.headers['cache-control']).toContain('private');
    // read back with sharp's metadata as an independent reader of the served bytes
    const displayMeta = await sharp(display.body as Buffer).metadata();
    expect([displayMeta.format, displayMeta.width, displayMeta.height]).toEqual(['webp', 300, 600]);
    expect(displayMeta.orientation ?? 1).toBe(1);
    // rotated clockwise: the red left half is now on top, the blue right half at the bottom
    const top = await pixelAt(display.body as Buffer, 150, 100);
    const bottom = await pixelAt(display.body as Buffer, 150, 500);
    expect(top.r).toBeGreaterThan(150);
    expect(top.b).toBeLessThan(60);
    expect(bottom.b).toBeGreaterThan(150);
    expect(bottom.r).toBeLessThan(60);

    const thumbMeta = await sharp((await binary(owner, res.body.thumbUrl).expect(200)).body as Buffer).metadata();
    expect([thumbMeta.width, thumbMeta.height]).toEqual([160, 320]);

    const listed = await owner.get(`/api/products/${(await owner.get(`/api/products`)).body.products[0].id}/samples`);
    expect(listed.body.samples.flatMap((s: { photos: { id: string }[] }) => s.photos.map((p) => p.id))).toContain(res.body.id);
  });

  it('shrinks a large PNG for display to 2000 px on its longest side', async () => {
    const png = await sharp({ create: { width: 2600, height: 1300, channels: 3, background: '#2a6f8f' } }).png().toBuffer();
    const res = await owner.upload(`/api/samples/${sampleId}/photos`, png, 'tote.png');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ contentType: 'image/png', width: 2600, height: 1300 });
    const meta = await sharp((await binary(owner, res.body.displayUrl).expect(200)).body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([2000, 1000]);
  });

  it('refuses a PDF, a text file and an image named like a photo, saying what it is', async () => {
    const pdf = await owner.upload(`/api/samples/${sampleId}/photos`, Buffer.from('%PDF-1.7\n1 0 obj\n<<>>\nendobj\n'), 'proof.jpg');
    expect([pdf.status, pdf.body.error.code]).toEqual([415, 'photo.unsupported_type']);
    expect(pdf.body.error.message).toContain('PDF');
    const text = await owner.upload(`/api/samples/${sampleId}/photos`, Buffer.from('tracking number 12345'), 'notes.png');
    expect([text.status, text.body.error.code]).toEqual([415, 'photo.unsupported_type']);
    const heic = Buffer.concat([Buffer.from([0, 0, 0, 24]), Buffer.from('ftypheic'), Buffer.alloc(64)]);
    const heicRes = await owner.upload(`/api/samples/${sampleId}/photos`, heic, 'IMG_0001.HEIC');
    // this build of sharp has no HEVC decoder (checked at start-up); a build with one would try to read it
    expect(heicRes.status).toBe(415);
    expect(heicRes.body.error.message).toMatch(/JPEG/);
  });

  it('refuses photo changes to a reviewer, and every photo to another studio', async () => {
    const png = await sharp({ create: { width: 40, height: 40, channels: 3, background: '#ccc' } }).png().toBuffer();
    const photo = (await owner.upload(`/api/samples/${sampleId}/photos`, png, 'a.png')).body;
    const reviewer = (await addMember(t.app, owner, 'reviewer')).client;
    await binary(reviewer, photo.thumbUrl).expect(200);
    const refused = await reviewer.upload(`/api/samples/${sampleId}/photos`, png, 'b.png');
    expect([refused.status, refused.body.error.code]).toEqual([403, 'role.forbidden']);
    expect((await reviewer.delete(`/api/sample-photos/${photo.id}`)).status).toBe(403);

    const other = (await signUpOwner(t.app, 'Another Coast Studio')).client;
    for (const url of [photo.thumbUrl, photo.displayUrl, photo.originalUrl]) expect((await other.get(url)).status).toBe(404);
    expect((await other.delete(`/api/sample-photos/${photo.id}`)).status).toBe(404);
    expect((await other.upload(`/api/samples/${sampleId}/photos`, png, 'c.png')).status).toBe(404);
  }, 60_000); // signs up people (password hashing): slow on a busy machine

  it('removes the stored files with the photo, and all photos with their sample', async () => {
    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#d94' } }).png().toBuffer();
    const { sampleId: id } = await newSample(owner);
    const first = (await owner.upload(`/api/samples/${id}/photos`, png, 'one.png')).body;
    expect((await owner.upload(`/api/samples/${id}/photos`, png, 'two.png')).status).toBe(201);
    const prefix = `studios/${studioId}/samples/${id}/`;
    expect(await t.runtime.storage.list(prefix)).toHaveLength(6);

    expect((await owner.delete(`/api/sample-photos/${first.id}`)).status).toBe(204);
    expect(await t.runtime.storage.list(prefix)).toHaveLength(3);
    expect((await owner.get(first.thumbUrl)).status).toBe(404);

    expect((await owner.delete(`/api/samples/${id}`)).status).toBe(204);
    expect(await t.runtime.storage.list(prefix)).toEqual([]);
    expect((await owner.patch(`/api/samples/${id}`, { printer: 'x' })).status).toBe(404);
  });
});

describe('the photo limits', () => {
  it('answers 413 with the limit in words for a photo over it, in bytes or in pixels', async () => {
    const small = await createTestApp({ SAMPLE_PHOTO_LIMIT_BYTES: '4096', SAMPLE_PHOTO_MAX_PIXELS: '250000' });
    try {
      const client = (await signUpOwner(small.app, 'Small Limit Studio')).client;
      const { sampleId: id } = await newSample(client);
      const noisy = await sharp(randomBytes(64 * 64 * 3), { raw: { width: 64, height: 64, channels: 3 } }).png().toBuffer();
      expect(noisy.length).toBeGreaterThan(4096);
      const res = await client.upload(`/api/samples/${id}/photos`, noisy, 'big.png');
      expect([res.status, res.body.error.code]).toEqual([413, 'upload.too_large']);
      expect(res.body.error.message).toMatch(/MB/);
      // a few hundred bytes that decode to 0.36 MP: refused from the header, before any pixel is decoded
      const bomb = await sharp({ create: { width: 600, height: 600, channels: 3, background: '#fff' } }).png({ palette: true, compressionLevel: 9 }).toBuffer();
      expect(bomb.length).toBeLessThan(4096);
      const refused = await client.upload(`/api/samples/${id}/photos`, bomb, 'flat.png');
      expect([refused.status, refused.body.error.code]).toEqual([413, 'photo.too_many_pixels']);
      expect(await small.runtime.storage.list(`studios/`)).not.toContainEqual(expect.stringContaining(`/samples/${id}/`));
    } finally {
      await small.close();
    }
  }, 60_000); // signs up people (password hashing): slow on a busy machine
});
