import sharp from 'sharp';
import { originalDetailSchema, originalsListSchema } from '../../../shared/contracts/originals';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { psdHeader, smallCardPsd } from '../support/psd-files';
import { waitForImport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let studioId: string;
beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  const o = await signUpOwner(t.app, 'Import Studio');
  owner = o.client;
  studioId = o.me.studio.id;
}, 60_000);
afterAll(() => t.close());

async function uploadAndWait(client: ApiClient, file: Buffer, name: string, fields: Record<string, string> = {}) {
  const res = await client.upload('/api/originals', file, name, fields);
  expect(res.status).toBe(202);
  return waitForImport(client, res.body.id);
}

describe('uploading a layered PSD', () => {
  it('cuts each top-level group and loose layer into one motif, with names and offsets', async () => {
    const original = await uploadAndWait(owner, smallCardPsd(), 'puffin-card.psd');
    expect({ status: original.status, error: original.error }).toEqual({ status: 'ready', error: null });
    expect(original.width).toBe(100);
    const byName = Object.fromEntries(original.motifs.map((m: { name: string }) => [m.name, m]));
    expect(Object.keys(byName).sort()).toEqual(['Kite', 'Picnic basket', 'Puffins']);
    expect(byName['Picnic basket']).toMatchObject({ offsetX: 40, offsetY: 50, width: 24, height: 12, sourcePath: 'Picnic basket' });
    expect(byName.Puffins).toMatchObject({ offsetX: 10, offsetY: 10, width: 21, height: 30, kind: 'group' });
    expect(byName.Kite.colours[0].hex).toBe('#c8283c');
    expect(byName['Picnic basket'].suggestedTags).toEqual(expect.arrayContaining(['picnic', 'basket']));
  });

  it('serves each motif as a lossless PNG and a WebP thumbnail, only to its studio', async () => {
    const original = await uploadAndWait(owner, smallCardPsd({ kiteColour: [10, 200, 90, 255] }), 'green-kite.psd');
    const kite = original.motifs.find((m: { name: string }) => m.name === 'Kite');
    const png = await owner.get(kite.imageUrl).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(png.headers['content-type']).toBe('image/png');
    const { data, info } = await sharp(png.body as Buffer).raw().toBuffer({ resolveWithObject: true });
    expect([info.width, info.height, info.channels]).toEqual([16, 16, 4]);
    expect([...data.subarray(0, 4)]).toEqual([10, 200, 90, 255]);
    const thumb = await owner.get(kite.thumbUrl);
    expect(thumb.headers['content-type']).toBe('image/webp');

    const stranger = await signUpOwner(t.app, 'Elsewhere');
    expect((await stranger.client.get(kite.imageUrl)).status).toBe(404);
    expect((await stranger.client.get(`/api/originals/${original.id}`)).status).toBe(404);
    expect((await stranger.client.get('/api/originals')).body.originals).toHaveLength(0);
  });

  it('links the same pixels uploaded again to the existing motifs instead of duplicating them', async () => {
    const first = await uploadAndWait(owner, smallCardPsd({ kiteColour: [1, 2, 3, 255] }), 'dup-a.psd');
    const second = await uploadAndWait(owner, smallCardPsd({ kiteColour: [1, 2, 3, 255] }), 'dup-b.psd');
    expect(second.report.created).toBe(0);
    expect(second.report.linkedExisting).toHaveLength(3);
    expect(second.motifs.map((m: { id: string }) => m.id).sort()).toEqual(first.motifs.map((m: { id: string }) => m.id).sort());
  });

  it('turns a changed layer of a new version into a new motif version and reports removed ones', async () => {
    const first = await uploadAndWait(owner, smallCardPsd({ kiteColour: [90, 90, 250, 255] }), 'versioned.psd');
    const next = await uploadAndWait(owner, smallCardPsd({ kiteColour: [250, 90, 90, 255], withBasket: false }), 'versioned-2.psd', { previousOriginalId: first.id });
    expect(next.status).toBe('ready');
    const kiteBefore = first.motifs.find((m: { name: string }) => m.name === 'Kite');
    expect(next.report.newVersions).toEqual([{ sourcePath: 'Kite', motifId: kiteBefore.id, version: 2 }]);
    expect(next.report.removed.map((r: { sourcePath: string }) => r.sourcePath)).toEqual(['Picnic basket']);
    // The old version stays readable.
    const v1 = await owner.get(`/api/motifs/${kiteBefore.id}/image?version=1`);
    expect(v1.status).toBe(200);
    const current = await owner.get(`/api/motifs/${kiteBefore.id}`);
    expect(current.body.version).toBe(2);
  });

  it('re-cuts an original one motif per layer on request', async () => {
    const first = await uploadAndWait(owner, smallCardPsd({ kiteColour: [5, 5, 5, 255] }), 'recut.psd');
    const res = await owner.post(`/api/originals/${first.id}/recut`, { cut: 'layers' });
    expect(res.status).toBe(202);
    const recut = await waitForImport(owner, res.body.id);
    expect(recut.motifs.map((m: { sourcePath: string }) => m.sourcePath).sort()).toEqual(['Kite/Sail', 'Picnic basket', 'Puffins/Beak', 'Puffins/Body']);
  });
});

describe('uploading an SVG drawing', () => {
  it('stores the file unchanged, draws it without its script and names what was left out', async () => {
    const drawing = '<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" onload="alert(1)"><script>alert(2)</script><circle cx="48" cy="48" r="40" fill="#1d6f6a"/></svg>';
    const original = await uploadAndWait(owner, Buffer.from(drawing), 'tide-pool.svg');
    expect({ status: original.status, error: original.error }).toEqual({ status: 'ready', error: null });
    // the answers read as the client reads them
    expect(originalDetailSchema.parse(original).fileKind).toBe('svg');
    expect(originalsListSchema.parse((await owner.get('/api/originals').expect(200)).body).originals.some((o) => o.id === original.id && o.fileKind === 'svg')).toBe(true);
    expect(original.motifs).toHaveLength(1);
    // 96 px = 1 in (CSS), drawn at 300 ppi: the circle's 80 px are 250 px
    expect(original.motifs[0]).toMatchObject({ name: 'tide-pool', kind: 'image', width: 250, height: 250 });
    expect(original.report.leftOut).toEqual(['1 script element', '1 event handler (onload)']);
    const { rows } = await t.runtime.db.pool.query('select storage_key from originals where id = $1', [original.id]);
    expect((await t.runtime.storage.getBuffer(rows[0].storage_key)).toString('utf8')).toBe(drawing);
  });
});

describe('bad uploads', () => {
  it('refuses a file that is not a PSD or image with 415, naming what it is', async () => {
    const res = await owner.upload('/api/originals', Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n'), 'card.psd');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('upload.unsupported_type');
    expect(res.body.error.message).toMatch(/PDF/);
  });

  it('refuses an upload over the size limit with 413', async () => {
    const small = await createTestApp({ UPLOAD_LIMIT_BYTES: '2048' });
    try {
      const { client } = await signUpOwner(small.app);
      const res = await client.upload('/api/originals', Buffer.alloc(10_000, 1), 'big.psd');
      expect(res.status).toBe(413);
      expect(res.body.error.code).toBe('upload.too_large');
    } finally {
      await small.close();
    }
  });

  it('asks for a file when none is sent', async () => {
    const token = await owner.csrf();
    const res = await owner.agent.post('/api/originals').set('x-csrf-token', token).field('cut', 'groups');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('upload.missing_file');
  });

  it('fails a 16-bit PSD with a message naming the depth, keeps the file, and lets it be deleted', async () => {
    const res = await owner.upload('/api/originals', psdHeader({ depth: 16 }), 'deep.psd');
    expect(res.status).toBe(202);
    const failed = await waitForImport(owner, res.body.id);
    expect(failed.status).toBe('failed');
    expect(failed.error.code).toBe('psd.unsupported_depth');
    expect(failed.error.message).toMatch(/16-bit/);
    const key = `studios/${studioId}/originals/${res.body.id}/file`;
    expect(await t.runtime.storage.exists(key)).toBe(true);
    expect((await owner.post(`/api/originals/${res.body.id}/retry`)).status).toBe(202);
    expect((await waitForImport(owner, res.body.id)).error.code).toBe('psd.unsupported_depth');
    expect((await owner.delete(`/api/originals/${res.body.id}`)).status).toBe(204);
    expect(await t.runtime.storage.exists(key)).toBe(false);
  });

  // Header fields per Adobe's Photoshop File Formats Specification: colour mode 4 is CMYK; a PSD
  // side is 1 to 30,000 px (PSB, version 2, up to 300,000).
  it.each([
    ['a CMYK document', () => psdHeader({ mode: 4, channels: 4 }), 'psd.unsupported_mode', /CMYK.*RGB and Grayscale are/],
    ['a header claiming 30,001 px a side', () => psdHeader({ width: 30_001, height: 30_001 }), 'psd.bad_dimensions', /30001 x 30001.*1 to 30,000/],
    ['a large-document header claiming 200,000 px a side', () => psdHeader({ version: 2, width: 200_000, height: 200_000 }), 'psd.document_too_large', /200000 x 200000 pixels, more than the .* this server accepts/],
    ['a file cut off halfway', () => { const whole = smallCardPsd({ kiteColour: [7, 7, 7, 255] }); return whole.subarray(0, Math.floor(whole.length / 2)); }, /psd\.(truncated|corrupt)/, /damaged|truncated/],
  ])('fails %s with its own message and keeps the file for a retry or delete', async (_what, file, code, message) => {
    const res = await owner.upload('/api/originals', file(), 'bad.psd');
    expect(res.status).toBe(202);
    const failed = await waitForImport(owner, res.body.id);
    expect(failed.status).toBe('failed');
    expect(failed.error.code).toMatch(code);
    expect(failed.error.message).toMatch(message);
    expect(await t.runtime.storage.exists(`studios/${studioId}/originals/${res.body.id}/file`)).toBe(true);
    expect((await owner.delete(`/api/originals/${res.body.id}`)).status).toBe(204);
  });

  it('stores layer names with markup as plain text', async () => {
    const { writePsdBuffer } = await import('ag-psd');
    const { solidLayer } = await import('../support/psd-files');
    smallCardPsd();
    const psd = writePsdBuffer({ width: 20, height: 20, children: [solidLayer('<img src=x onerror=alert(1)>', 0, 0, 5, 5, [9, 9, 9, 255])] }, { generateThumbnail: false });
    const original = await uploadAndWait(owner, psd, '<script>.psd');
    expect(original.name).toBe('<script>.psd');
    expect(original.motifs[0].name).toBe('<img src=x onerror=alert(1)>');
  });
});

describe('deleting an original', () => {
  it('removes its motifs and leaves no stored object behind', async () => {
    const original = await uploadAndWait(owner, smallCardPsd({ kiteColour: [77, 11, 99, 255] }), 'to-delete.psd');
    const keys = (await t.runtime.db.pool.query('select png_key, thumb_key from motif_versions where original_id = $1', [original.id])).rows.flatMap((r) => [r.png_key, r.thumb_key]);
    const own = keys.filter((k) => k);
    expect((await owner.delete(`/api/originals/${original.id}`)).status).toBe(204);
    const kite = original.motifs.find((m: { name: string }) => m.name === 'Kite');
    expect((await owner.get(`/api/motifs/${kite.id}`)).status).toBe(404);
    for (const key of own) {
      const stillUsed = (await t.runtime.db.pool.query('select 1 from motif_versions where png_key = $1 or thumb_key = $1', [key])).rowCount;
      if (!stillUsed) expect(await t.runtime.storage.exists(key)).toBe(false);
    }
  });
});

describe('who may import', () => {
  it('refuses an upload from a reviewer before reading the file', async () => {
    const reviewer = await addMember(t.app, owner, 'reviewer');
    const res = await reviewer.client.upload('/api/originals', smallCardPsd(), 'nope.psd');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('role.forbidden');
  });
});
