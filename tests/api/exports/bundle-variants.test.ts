import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { createTestApp, signUpOwner, type ApiClient, type TestApp } from '../support/test-app';
import { kiteMug } from '../support/kite-mug';
import { asBuffer, waitForExport } from '../support/wait-for';

let t: TestApp;
let owner: ApiClient;
let productId: string;
const variantIds: string[] = [];

beforeAll(async () => {
  t = await createTestApp({}, { workers: true });
  owner = (await signUpOwner(t.app, 'Saltmarsh Studio')).client;
  // only the blue kite is printed, so any red in a preview comes from the blank's handle
  productId = (await kiteMug(owner, [12, 120, 220, 255])).productId;
  for (const v of [
    { name: 'Red handle', sku: 'SM-CS-MUG-RED', options: { handleColour: '#c0392b' } },
    { name: 'Black handle', sku: 'SM-CS-MUG-BLK', options: { templateVariantId: 'black-handle' } },
    { name: 'Navy body', options: { blankColour: '#1f3a5f' } },
  ]) {
    const res = await owner.post(`/api/products/${productId}/variants`, v);
    expect(res.status).toBe(201);
    variantIds.push(res.body.id);
  }
}, 60_000);
afterAll(() => t.close());

/** Pixels clearly red (red channel well above green and blue). */
function redPixels(png: Buffer): number {
  const { data } = PNG.sync.read(png);
  let n = 0;
  for (let i = 0; i < data.length; i += 4) if (data[i + 3] > 200 && data[i] > data[i + 1] + 70 && data[i] > data[i + 2] + 70) n++;
  return n;
}

describe('preflight with product variants', () => {
  it('checks text against the product’s own variants’ blanks and says which it used', async () => {
    const res = await owner.get(`/api/products/${productId}/preflight`).expect(200);
    expect(res.body.productBlanks).toEqual([
      { name: 'Red handle', body: mug11oz.blank.body },
      { name: 'Black handle', body: mug11oz.blank.body },
      { name: 'Navy body', body: '#1f3a5f' },
    ]);
  });
});

describe('export bundle with product variants', () => {
  it('names the print file each variant takes by SKU, with previews on each variant’s own blank', async () => {
    const started = await owner.post(`/api/products/${productId}/exports`, { kind: 'bundle', paper: 'a4' });
    expect(started.status).toBe(202);
    const done = await waitForExport(owner, started.body.id, 120_000);
    expect(done.status).toBe('done');
    const zip = (await asBuffer(owner.get(`/api/exports/${started.body.id}/download?file=bundle.zip`)).expect(200)).body as Buffer;
    const dir = mkdtempSync(path.join(tmpdir(), 'variants-'));
    writeFileSync(path.join(dir, 'bundle.zip'), zip);
    // Info-ZIP's unzip, an independent reader, tests every entry's CRC
    execFileSync('/usr/bin/unzip', ['-tq', 'bundle.zip'], { cwd: dir });
    const names = execFileSync('/usr/bin/zipinfo', ['-1', 'bundle.zip'], { cwd: dir, encoding: 'utf8' }).trim().split('\n');

    // the variants change only the blank, so one print file serves all three
    expect(names.filter((n) => n.startsWith('print-file'))).toEqual(['print-file.png']);
    for (const folder of ['SM-CS-MUG-RED', 'SM-CS-MUG-BLK', 'Navy-body']) {
      expect(names.filter((n) => n.startsWith(`previews/${folder}/`)).sort()).toEqual(['back', 'front', 'handle-left', 'handle-right'].map((v) => `previews/${folder}/${v}.png`));
    }
    // without product variants the template's blanks were previewed; with them, only the variants are
    expect(names.some((n) => n.startsWith('previews/white/'))).toBe(false);

    execFileSync('/usr/bin/unzip', ['-q', 'bundle.zip', 'manifest.json', 'variants.csv', 'previews/*/handle-right.png'], { cwd: dir });
    const manifest = JSON.parse(readFileSync(path.join(dir, 'manifest.json'), 'utf8'));
    expect(manifest.printFiles).toEqual([{ name: 'print-file.png', width: 2550, height: 1050, dpi: 300, variants: ['SM-CS-MUG-RED', 'SM-CS-MUG-BLK', variantIds[2]], sameDesignForAllVariants: true }]);
    expect(manifest.variants.map((v: { id: string; sku: string | null; printFile: string; previews: string }) => [v.id, v.sku, v.printFile, v.previews])).toEqual([
      [variantIds[0], 'SM-CS-MUG-RED', 'print-file.png', 'previews/SM-CS-MUG-RED/'],
      [variantIds[1], 'SM-CS-MUG-BLK', 'print-file.png', 'previews/SM-CS-MUG-BLK/'],
      [variantIds[2], null, 'print-file.png', 'previews/Navy-body/'],
    ]);
    // the blank each is printed on: its own handle colour, the template's black-handle blank, its own body colour
    expect(manifest.variants[0].blank.handle).toBe('#c0392b');
    expect(manifest.variants[1]).toMatchObject({ templateVariantId: 'black-handle', blank: mug11oz.variants.find((v) => v.id === 'black-handle')!.blank });
    expect(manifest.variants[2].blank.body).toBe('#1f3a5f');
    expect(manifest.files).toContain('variants.csv');

    // RFC 4180: CRLF line ends, one header row, a row per variant
    const csv = readFileSync(path.join(dir, 'variants.csv'), 'utf8');
    expect(csv.endsWith('\r\n')).toBe(true);
    const rows = csv.trimEnd().split('\r\n').map((l) => l.split(','));
    expect(rows[0]).toEqual(['sku', 'variant', 'print_file', 'blank_body', 'blank_handle', 'previews']);
    expect(rows.slice(1).map((r) => [r[0], r[1], r[2]])).toEqual([
      ['SM-CS-MUG-RED', 'Red handle', 'print-file.png'],
      ['SM-CS-MUG-BLK', 'Black handle', 'print-file.png'],
      ['', 'Navy body', 'print-file.png'],
    ]);

    // the handle seen from its side is red only on the red-handle variant (pngjs decodes the previews)
    const red = redPixels(readFileSync(path.join(dir, 'previews/SM-CS-MUG-RED/handle-right.png')));
    const black = redPixels(readFileSync(path.join(dir, 'previews/SM-CS-MUG-BLK/handle-right.png')));
    expect(red).toBeGreaterThan(500);
    expect(black).toBeLessThan(red / 20);
  }, 180_000);
});
