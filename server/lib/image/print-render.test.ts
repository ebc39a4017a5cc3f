import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PNG } from 'pngjs';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { compose, radians, rotate, scale, translate, type Affine } from '../../../shared/geometry';
import type { BlendMode, MotifDrawOp, RenderPlan } from '../../../shared/scene';
import { mug11oz } from '../../../shared/templates';
import { encodePrintFile, pngChunkTypes } from './print-file-encode';
import { compositeOnto } from './composite-rgba';
import { motifLayer, renderPrintFile } from './print-render';

function solid(width: number, height: number, rgba: [number, number, number, number]) {
  const data = new Uint8Array(width * height * 4);
  for (let i = 0; i < data.length; i += 4) data.set(rgba, i);
  return { data, width, height };
}

function op(motifId: string, matrix: Affine, width: number, height: number, extra: Partial<MotifDrawOp> = {}): MotifDrawOp {
  return { kind: 'motif', placementId: motifId, role: 'placement', matrix, width, height, opacity: 1, blendMode: 'normal' as BlendMode, clip: null, motifId, version: 1, recolour: { kind: 'none' }, ...extra };
}

const px = (img: { data: Uint8Array; width: number }, x: number, y: number) => [...img.data.subarray((y * img.width + x) * 4, (y * img.width + x) * 4 + 4)];

describe('print file renderer', () => {
  it('puts a motif on exactly the template pixels its matrix names', async () => {
    const plan: RenderPlan = { size: { width: 300, height: 200 }, notes: [], ops: [op('red', translate(100, 50), 10, 10)] };
    const { image } = await renderPrintFile(plan, { loadMotif: async () => solid(10, 10, [255, 0, 0, 255]) });
    expect([image.width, image.height]).toEqual([300, 200]);
    expect(px(image, 100, 50)).toEqual([255, 0, 0, 255]);
    expect(px(image, 109, 59)).toEqual([255, 0, 0, 255]);
    expect(px(image, 99, 50)[3]).toBe(0);
    expect(px(image, 110, 59)[3]).toBe(0);
    expect(px(image, 100, 60)[3]).toBe(0);
  });

  it('turns and scales a motif about its matrix like a canvas transform', async () => {
    // A 2 x 1 motif, left pixel red, right pixel blue, doubled and turned 90° clockwise (y down):
    // the source's x axis becomes the template's +y axis.
    const motif = { data: new Uint8Array([255, 0, 0, 255, 0, 0, 255, 255]), width: 2, height: 1 };
    const m = compose(scale(20), rotate(radians(Math.PI / 2)), translate(50, 10));
    const { image } = await renderPrintFile({ size: { width: 100, height: 100 }, notes: [], ops: [op('m', m, 2, 1)] }, { loadMotif: async () => motif });
    // source (0..2, 0..1) x20 -> x: 0..40 down, y: 0..20 leftwards, then moved to (50, 10): x 30..50, y 10..50
    expect(px(image, 40, 12).slice(0, 3)).toEqual([255, 0, 0]);
    expect(px(image, 40, 48).slice(0, 3)).toEqual([0, 0, 255]);
    expect(px(image, 51, 30)[3]).toBe(0);
    expect(px(image, 29, 30)[3]).toBe(0);
  });

  it('multiplies and fades layers with the W3C compositing formulas', async () => {
    const plan: RenderPlan = {
      size: { width: 4, height: 4 }, notes: [],
      ops: [op('base', translate(0, 0), 4, 4), op('ink', translate(0, 0), 4, 2, { blendMode: 'multiply' }), op('veil', translate(0, 2), 4, 2, { opacity: 0.5 })],
    };
    const colours: Record<string, [number, number, number, number]> = { base: [200, 100, 50, 255], ink: [128, 128, 128, 255], veil: [0, 0, 0, 255] };
    const { image } = await renderPrintFile(plan, { loadMotif: async (id) => solid(id === 'base' ? 4 : 4, id === 'base' ? 4 : 2, colours[id]) });
    // W3C Compositing Level 1 §10.1: multiply B = Cb·Cs, so 200·128/255 = 100.4 -> 100, 50.2 -> 50, 25.1 -> 25
    expect(px(image, 1, 0)).toEqual([100, 50, 25, 255]);
    // normal at 50 %: Co = 0.5·0 + 0.5·Cb
    expect(px(image, 1, 3)).toEqual([100, 50, 25, 255]);
  });

  it('recolours a motif before placing it and clips to the print area', async () => {
    const plan: RenderPlan = { size: { width: 20, height: 10 }, notes: [], ops: [op('m', translate(0, 0), 20, 10, { recolour: { kind: 'fill', colour: '#2e5e8c' }, clip: { x: 0, y: 0, width: 10, height: 10 } })] };
    const { image } = await renderPrintFile(plan, { loadMotif: async () => solid(20, 10, [255, 255, 255, 255]) });
    expect(px(image, 5, 5)).toEqual([0x2e, 0x5e, 0x8c, 255]);
    expect(px(image, 15, 5)[3]).toBe(0);
  });

  it('draws band by band the same pixels as compositing each whole transformed layer in turn', async () => {
    // 150 rows: three bands of the renderer, with turned motifs crossing both band edges
    const motif = { data: new Uint8Array(90 * 90 * 4), width: 90, height: 90 };
    for (let i = 0; i < motif.data.length; i += 4) motif.data.set([(i * 7) % 256, (i * 3) % 256, 120, i % 5 === 0 ? 90 : 255], i);
    // normal at full opacity and the others each take their own shortcut straight onto the canvas;
    // the expected picture composites whole sampled layers instead; the last two lie over the rest
    const modes: BlendMode[] = ['normal', 'multiply', 'overlay', 'normal', 'normal', 'screen'];
    const opacities = [1, 1, 1, 0.7, 1, 0.5];
    const ops = modes.map((blendMode, i) => op(`m${i}`, compose(translate(-45, -45), scale(1.4 - 0.2 * (i % 4)), rotate(radians(0.4 * i + 0.1)), translate(60 + 60 * (i % 4) + 25 * Math.floor(i / 4), 75)), 90, 90, { blendMode, opacity: opacities[i], clip: { x: 0, y: 3, width: 300, height: 140 } }));
    const plan: RenderPlan = { size: { width: 300, height: 150 }, notes: [], ops };
    const { image } = await renderPrintFile(plan, { loadMotif: async () => motif });
    const expected = { data: new Uint8Array(300 * 150 * 4), width: 300, height: 150, left: 0, top: 0 };
    for (const o of ops) {
      const layer = await motifLayer(motif, o, o.clip!);
      if (layer) compositeOnto(expected, layer, { blendMode: o.blendMode, opacity: o.opacity });
    }
    expect(Buffer.compare(Buffer.from(image.data), Buffer.from(expected.data))).toBe(0);
    expect(image.data.some((v, i) => i % 4 === 3 && v > 0 && Math.floor(i / 4 / 300) === 64)).toBe(true);
  });

  it('encodes the PNG print file while drawing, with the pixels it drew', async () => {
    const motif = { data: new Uint8Array(90 * 90 * 4), width: 90, height: 90 };
    for (let i = 0; i < motif.data.length; i += 4) motif.data.set([(i * 7) % 256, (i * 3) % 256, 120, i % 5 === 0 ? 90 : 255], i);
    const plan: RenderPlan = { size: { width: 300, height: 150 }, notes: [], ops: [op('m', compose(translate(-45, -45), rotate(radians(0.3)), translate(150, 75)), 90, 90)] };
    const { image, encoded } = await renderPrintFile(plan, { loadMotif: async () => motif, encode: mug11oz.output });
    expect(encoded?.contentType).toBe('image/png');
    // pngjs, an independent decoder
    expect(Buffer.compare(PNG.sync.read(encoded!.buffer).data, Buffer.from(image.data))).toBe(0);
    // a JPEG output is still encoded, by sharp, once the canvas is done
    const jpeg = await renderPrintFile(plan, { loadMotif: async () => motif, encode: { ...mug11oz.output, format: 'jpeg', transparency: 'flatten' } });
    expect(jpeg.encoded?.contentType).toBe('image/jpeg');
    expect((await sharp(jpeg.encoded!.buffer).metadata()).density).toBe(300);
  });

  it('reports text placements it cannot draw rather than dropping them silently', async () => {
    const plan: RenderPlan = {
      size: { width: 10, height: 10 }, notes: [],
      ops: [{ kind: 'text', placementId: 't1', role: 'placement', matrix: translate(0, 0), width: 5, height: 5, opacity: 1, blendMode: 'normal', clip: null, content: 'Hi', fontId: 'source-sans-3', sizePx: 10, colour: '#000000', align: 'left', letterSpacing: 0, arcDeg: 0 }],
    };
    const { notes } = await renderPrintFile(plan, { loadMotif: async () => solid(1, 1, [0, 0, 0, 0]) });
    expect(notes.map((n) => n.code)).toEqual(['render.text_skipped']);
  });
});

describe('print file encoding', () => {
  const image = { ...solid(2550, 1050, [10, 120, 200, 128]), left: 0, top: 0 };

  it('writes a 300 DPI sRGB PNG with transparency kept, read back by pngjs and ImageMagick', async () => {
    const { buffer, contentType } = await encodePrintFile(image, mug11oz.output);
    expect(contentType).toBe('image/png');
    // pngjs (an independent PNG decoder, which also checks every chunk's CRC)
    const decoded = PNG.sync.read(buffer);
    expect([decoded.width, decoded.height]).toEqual([2550, 1050]);
    expect([...decoded.data.subarray(0, 4)]).toEqual([10, 120, 200, 128]);
    const types = pngChunkTypes(buffer);
    expect(types.indexOf('sRGB')).toBeGreaterThan(0);
    expect(types.indexOf('sRGB')).toBeLessThan(types.indexOf('IDAT'));
    expect(types).not.toContain('iCCP');
    // W3C PNG spec, pHYs: 300 dpi = 11811 px/m, unit 1 (metre); whole chunk as in reference/png-phys.csv
    const at = buffer.indexOf(Buffer.from('pHYs', 'latin1')) - 4;
    expect(buffer.subarray(at, at + 21).toString('hex')).toBe('000000097048597300002e2300002e230178a53f76');
    // ImageMagick identify: PNG resolution is shown per centimetre (11811 px/m = 118.11 px/cm)
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'print-')), 'print.png');
    writeFileSync(file, buffer);
    const out = execFileSync('/usr/bin/identify', ['-format', '%w %h %x %y %U %[channels]', file], { encoding: 'utf8' });
    const [w, h, x, y, unit, channels] = out.trim().split(' ');
    expect([w, h, unit, channels]).toEqual(['2550', '1050', 'PixelsPerCentimeter', 'srgba']);
    expect(Number(x) * 2.54).toBeCloseTo(300, 2);
    expect(Number(y)).toBeCloseTo(118.11, 6);
  });

  it('flattens a JPEG print file on white and sets its density', async () => {
    const { buffer, contentType } = await encodePrintFile(image, { ...mug11oz.output, format: 'jpeg', transparency: 'flatten' });
    expect(contentType).toBe('image/jpeg');
    const meta = await sharp(buffer).metadata();
    expect([meta.width, meta.height, meta.channels, meta.density]).toEqual([2550, 1050, 3, 300]);
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'print-')), 'print.jpg');
    writeFileSync(file, buffer);
    // ImageMagick identify on the JFIF header
    expect(execFileSync('/usr/bin/identify', ['-format', '%x %y %U', file], { encoding: 'utf8' })).toBe('300 300 PixelsPerInch');
    // half-transparent (10,120,200) over white: 255 + (c - 255)·128/255 -> about (132, 188, 228)
    const { data } = await sharp(buffer).raw().toBuffer({ resolveWithObject: true });
    expect(Math.abs(data[0] - 132)).toBeLessThanOrEqual(3);
    expect(Math.abs(data[2] - 228)).toBeLessThanOrEqual(3);
  });
});

describe('text in print files', () => {
  it('draws text as filled outlines inside its box', async () => {
    const { drawTextLayer } = await import('./text-layer');
    const plan: RenderPlan = {
      size: { width: 400, height: 120 }, notes: [],
      ops: [{ kind: 'text', placementId: 't1', role: 'placement', matrix: translate(50, 20), width: 300, height: 80, opacity: 1, blendMode: 'normal', clip: null, content: 'Puffin Picnic', fontId: 'source-sans-3-700', sizePx: 60, colour: '#1f2024', align: 'centre', letterSpacing: 0, arcDeg: 0 }],
    };
    const { image, notes } = await renderPrintFile(plan, { loadMotif: async () => solid(1, 1, [0, 0, 0, 0]), drawText: drawTextLayer });
    expect(notes).toEqual([]);
    let inked = 0;
    let outside = 0;
    for (let y = 0; y < 120; y++) for (let x = 0; x < 400; x++) {
      const a = image.data[(y * 400 + x) * 4 + 3];
      if (a > 128) { if (x >= 50 && x < 350 && y >= 20 && y < 100) inked++; else outside++; }
    }
    // bold 60 px glyphs cover a good part of the box and nothing lands outside it
    expect(inked).toBeGreaterThan(3000);
    expect(outside).toBe(0);
    const dark = [...image.data.subarray(0)].findIndex((v, i) => i % 4 === 3 && v === 255);
    expect([...image.data.subarray(dark - 3, dark)]).toEqual([0x1f, 0x20, 0x24]);
  });
});
