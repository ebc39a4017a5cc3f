import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { addMember, createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { kiteMug, motifPlacement, type ImportedMotif } from '../support/kite-mug';
import { asBuffer, waitForExport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let productId: string;
let kite: ImportedMotif;

// The kite's sail: a saturated blue, well outside what coated offset paper prints (from memory).
const KITE: [number, number, number, number] = [12, 120, 220, 255];

const binary = (res: { body: unknown }) => res.body as Buffer;
beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  owner = (await signUpOwner(t.app, 'Saltmarsh Studio')).client;
  // The kite sits on the front centre (x 1275); the puffins to its left, multiplied.
  const made = await kiteMug(owner, KITE, (motifs) => [motifPlacement(motifs.find((m) => m.name === 'Puffins')!, 'puffins', 700, 525, { blendMode: 'multiply', opacity: 0.8 })]);
  productId = made.productId;
  kite = made.kite;
}, 60_000);
afterAll(() => t.close());

describe('print file export', () => {
  it('renders the print file as a job and serves a PNG at the exact pixel size and DPI', async () => {
    const started = await owner.post(`/api/products/${productId}/exports`, {});
    expect(started.status).toBe(202);
    const done = await waitForExport(owner, started.body.id);
    expect(done.status).toBe('done');
    expect(done.progress).toBe(1);
    expect(done.files.map((f: { name: string }) => f.name)).toEqual(['print-file.png']);

    const res = await asBuffer(owner.get(`/api/exports/${started.body.id}/download?file=print-file.png`)).expect(200);
    expect(res.headers['content-type']).toBe('image/png');
    const png = binary(res);
    // pngjs, an independent decoder: 8.5 x 3.5 in at 300 DPI = 2550 x 1050 px, RGBA kept
    const decoded = PNG.sync.read(png);
    expect([decoded.width, decoded.height]).toEqual([2550, 1050]);
    const at = (x: number, y: number) => [...decoded.data.subarray((y * 2550 + x) * 4, (y * 2550 + x) * 4 + 4)];
    expect(at(1275, 525)).toEqual(KITE);
    expect(at(5, 5)[3]).toBe(0);
    // ImageMagick identify: size and resolution as written (11811 px/m shown as 118.11 px/cm)
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'export-')), 'print-file.png');
    writeFileSync(file, png);
    const [w, h, x, , unit] = execFileSync('/usr/bin/identify', ['-format', '%w %h %x %y %U', file], { encoding: 'utf8' }).trim().split(' ');
    expect([w, h, unit]).toEqual(['2550', '1050', 'PixelsPerCentimeter']);
    expect(Number(x) * 2.54).toBeCloseTo(300, 2);
  });

  it('keeps exports inside the studio: other studios get 404, reviewers may look but not export', async () => {
    const started = await owner.post(`/api/products/${productId}/exports`, {});
    const stranger = (await signUpOwner(t.app, 'Other Shore')).client;
    expect((await stranger.get(`/api/exports/${started.body.id}`)).status).toBe(404);
    expect((await stranger.get(`/api/exports/${started.body.id}/download?file=print-file.png`)).status).toBe(404);
    expect((await stranger.post(`/api/products/${productId}/exports`, {})).status).toBe(404);
    expect((await stranger.get(`/api/products/${productId}/previews/front.png`)).status).toBe(404);
    const reviewer = (await addMember(t.app, owner, 'reviewer')).client;
    expect((await reviewer.post(`/api/products/${productId}/exports`, {})).status).toBe(403);
    expect((await reviewer.get(`/api/exports/${started.body.id}`)).status).toBe(200);
    await waitForExport(owner, started.body.id);
    expect((await owner.get(`/api/exports/${started.body.id}/download?file=..%2Fsecret`)).status).toBe(404);
  });

  it('lists the product’s exports newest first, with the layout revision each was made from', async () => {
    const latest = await owner.post(`/api/products/${productId}/exports`, {});
    await waitForExport(owner, latest.body.id);
    const res = await owner.get(`/api/products/${productId}/exports`).expect(200);
    const listed = res.body.exports as { id: string; createdAt: string; productRevision: number; status: string }[];
    expect(listed[0]).toMatchObject({ id: latest.body.id, status: 'done' });
    expect(listed.length).toBeGreaterThanOrEqual(2);
    expect(listed.map((e) => e.createdAt)).toEqual([...listed.map((e) => e.createdAt)].sort().reverse());
    const product = await owner.get(`/api/products/${productId}`).expect(200);
    expect(listed[0].productRevision).toBe(product.body.revision);
    const stranger = (await signUpOwner(t.app, 'Far Harbour')).client;
    expect((await stranger.get(`/api/products/${productId}/exports`)).status).toBe(404);
  });
});

describe('preflight on the server', () => {
  it('reports low resolution, the palette and a FOGRA39 soft proof measured from the pixels', async () => {
    const res = await owner.get(`/api/products/${productId}/preflight`).expect(200);
    const rules = res.body.report.findings.map((f: { rule: string; severity: string; placementId?: string }) => `${f.rule}:${f.severity}:${f.placementId ?? ''}`);
    // a 16 px kite drawn 10x larger is 30 PPI at 300 DPI: below 150, a problem (common practice)
    expect(rules).toContain('resolution:problem:kite');
    expect(res.body.softProof.profileName).toMatch(/FOGRA39/);
    expect(res.body.softProof.shareOverDeltaE5).toBeGreaterThan(0);
    expect(res.body.softProof.shareOverDeltaE5).toBeLessThanOrEqual(1);
    expect(res.body.palette.length).toBeGreaterThanOrEqual(2);
    expect(res.body.motifs.find((m: { id: string }) => m.id === kite.id)).toMatchObject({ width: kite.width, height: kite.height, rightsStatus: 'own_work', hasTransparency: false });
  });

  it('counts colour groups against the limit the studio set, and says which limit it used', async () => {
    const paletteOf = async () => {
      const res = await owner.get(`/api/products/${productId}/preflight`).expect(200);
      return { limit: res.body.paletteLimit, finding: res.body.report.findings.find((f: { rule: string }) => f.rule === 'palette'), groups: res.body.palette.length };
    };
    const usual = await paletteOf();
    expect(usual.limit).toBe(6);
    expect((await owner.patch('/api/studio', { paletteLimit: 1 })).status).toBe(200);
    try {
      const strict = await paletteOf();
      expect(strict.limit).toBe(1);
      expect(strict.groups).toBeGreaterThan(1);
      expect(strict.finding).toMatchObject({ severity: 'warning', message: expect.stringContaining('the studio’s limit is 1') });
    } finally {
      await owner.patch('/api/studio', { paletteLimit: 6 });
    }
  });
});

describe('previews', () => {
  it('renders the mug from each side in the chosen handle colour and refuses unknown views', async () => {
    const front = binary(await asBuffer(owner.get(`/api/products/${productId}/previews/front.png`)).expect(200));
    const decoded = PNG.sync.read(front);
    // the kite faces the viewer on the front: the middle of the preview is the kite's blue, shaded
    const mid = (Math.floor(decoded.height / 2) * decoded.width + Math.floor(decoded.width / 2)) * 4;
    expect(decoded.data[mid + 2]).toBeGreaterThan(decoded.data[mid]);
    const side = await owner.get(`/api/products/${productId}/previews/handle-right.png?variant=black-handle`);
    expect(side.status).toBe(200);
    expect((await owner.get(`/api/products/${productId}/previews/top.png`)).status).toBe(404);
    expect((await owner.get(`/api/products/${productId}/previews/flat.png`)).body.error.code).toBe('preview.unknown_view');
    expect((await owner.get(`/api/products/${productId}/previews/front.png?variant=plaid`)).body.error.code).toBe('preview.unknown_variant');
  });
});

describe('export bundle', () => {
  it('zips print file, previews per variant, proof sheet, manifest and cautions', async () => {
    const started = await owner.post(`/api/products/${productId}/exports`, { kind: 'bundle', paper: 'letter' });
    const done = await waitForExport(owner, started.body.id, 90_000);
    expect(done.status).toBe('done');
    expect(done.files.map((f: { name: string }) => f.name).sort()).toEqual(['bundle.zip', 'print-file.png', 'proof-sheet-letter.pdf']);
    // the proof sheet downloads on its own too: a PDF (ISO 32000 files start with %PDF-)
    const proof = binary(await asBuffer(owner.get(`/api/exports/${started.body.id}/download?file=proof-sheet-letter.pdf`)).expect(200));
    expect(proof.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const zip = binary(await asBuffer(owner.get(`/api/exports/${started.body.id}/download?file=bundle.zip`)).expect(200));
    const dir = mkdtempSync(path.join(tmpdir(), 'bundle-'));
    writeFileSync(path.join(dir, 'bundle.zip'), zip);
    // Info-ZIP's unzip, an independent reader, tests every entry's CRC
    execFileSync('/usr/bin/unzip', ['-tq', 'bundle.zip'], { cwd: dir });
    const names = execFileSync('/usr/bin/zipinfo', ['-1', 'bundle.zip'], { cwd: dir, encoding: 'utf8' }).trim().split('\n');
    expect(names).toContain('print-file.png');
    expect(names).toContain('proof-sheet-letter.pdf');
    expect(names).toContain('cautions.txt');
    expect(names).toContain('previews/black-handle/front.png');
    expect(names.filter((n) => n.startsWith('previews/white/'))).toHaveLength(4);
    execFileSync('/usr/bin/unzip', ['-q', 'bundle.zip', 'manifest.json', 'cautions.txt'], { cwd: dir });
    const manifest = JSON.parse(readFileSync(path.join(dir, 'manifest.json'), 'utf8'));
    expect(manifest.template.id).toBe(mug11oz.id);
    expect(manifest.motifs).toHaveLength(2);
    expect(manifest.motifs.map((m: { motifId: string }) => m.motifId)).toContain(kite.id);
    expect(manifest.motifs[0].rights.status).toBe('own_work');
    expect(manifest.preflight.findings.length).toBeGreaterThan(0);
    const cautions = readFileSync(path.join(dir, 'cautions.txt'), 'utf8');
    expect(cautions).toMatch(/dishwasher/i);
    expect(cautions).toMatch(/microwave/i);
    expect(cautions).toMatch(/heat-changing/i);
    expect(cautions).toMatch(/printer's instructions/);
  }, 120_000);
});
