import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cardA6 } from '../../../shared/templates/built-in-flat';
import { addMember, ApiClient, createTestApp, signUpOwner, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: ApiClient;
let templateId: string;

const { id: _id, ...cardSpec } = cardA6;

async function putGuide(client: ApiClient, id: string, file: Buffer, name = 'guide.png') {
  const token = await client.csrf();
  return client.agent.put(`/api/templates/${id}/guide-image`).set('x-csrf-token', token).attach('file', file, name);
}

beforeAll(async () => {
  t = await createTestApp();
  owner = (await signUpOwner(t.app, 'Guide Studio')).client;
  const created = await owner.post('/api/templates', { template: { ...cardSpec, name: 'Harbour Press A6' } });
  expect(created.status).toBe(201);
  templateId = created.body.id;
}, 60_000);
afterAll(() => t.close());

describe('a studio template\'s guide image', () => {
  it('stores a downscaled, re-encoded copy and lists its address with the template', async () => {
    const big = await sharp({ create: { width: 6000, height: 3000, channels: 4, background: { r: 200, g: 30, b: 30, alpha: 0.5 } } }).png().toBuffer();
    const res = await putGuide(owner, templateId, big);
    expect(res.status).toBe(200);
    expect([res.body.width, res.body.height]).toEqual([4000, 2000]);
    const list = await owner.get('/api/templates').expect(200);
    const entry = list.body.templates.find((e: { template: { id: string } }) => e.template.id === templateId);
    expect(entry.guideImageUrl).toBe(res.body.guideImageUrl);
    const image = await owner.get(res.body.guideImageUrl).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(image.status).toBe(200);
    expect(image.headers['content-type']).toBe('image/webp');
    // read back with sharp's own decoder: lossless WebP keeps the half-transparent red (the
    // downscale works on premultiplied values, so a channel may round by one level)
    const { data, info } = await sharp(image.body as Buffer).raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height, info.channels]).toEqual([4000, 2000, 4]);
    Array.from(data.subarray(0, 4)).forEach((value, i) => expect(Math.abs(value - [200, 30, 30, 128][i])).toBeLessThanOrEqual(1));
  });

  it('replaces the old drawing and removes it on request', async () => {
    const small = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#123456' } }).jpeg().toBuffer();
    const first = await putGuide(owner, templateId, small, 'guide.jpg');
    expect(first.status).toBe(200);
    expect([first.body.width, first.body.height]).toEqual([400, 300]);
    expect((await owner.delete(`/api/templates/${templateId}/guide-image`)).status).toBe(204);
    const list = await owner.get('/api/templates').expect(200);
    expect(list.body.templates.find((e: { template: { id: string } }) => e.template.id === templateId).guideImageUrl).toBeNull();
    expect((await owner.get(first.body.guideImageUrl)).status).toBe(404);
  });

  it('refuses files that are not images, built-in templates and reviewers', async () => {
    const pdf = await putGuide(owner, templateId, Buffer.from('%PDF-1.7\n%\xe2\xe3\n1 0 obj\n'), 'guide.pdf');
    expect(pdf.status).toBe(415);
    expect(pdf.body.error.code).toBe('guide.unsupported_type');
    const png = await sharp({ create: { width: 10, height: 10, channels: 3, background: '#fff' } }).png().toBuffer();
    const builtIn = await putGuide(owner, 'card-a6', png);
    expect(builtIn.status).toBe(400);
    expect(builtIn.body.error.code).toBe('template.built_in');
    const reviewer = (await addMember(t.app, owner, 'reviewer')).client;
    expect((await putGuide(reviewer, templateId, png)).status).toBe(403);
  });

  it('answers 404 to another studio', async () => {
    const other = (await signUpOwner(t.app, 'Other Shore')).client;
    const png = await sharp({ create: { width: 10, height: 10, channels: 3, background: '#fff' } }).png().toBuffer();
    expect((await putGuide(other, templateId, png)).status).toBe(404);
    expect((await other.get(`/api/templates/${templateId}/guide-image`)).status).toBe(404);
  });
});
