import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runUnpack } from '../../../server/features/originals/unpack/run-unpack';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import type { UnpackedMotif, UnpackProgress } from '../../../server/features/originals/unpack/unpack-result';
import { layer, solid, writeTestPsd } from './support/ag-psd-files';

// The child process is what stands between a hostile upload and the web or worker process.
const dir = mkdtempSync(join(tmpdir(), 'unpack-child-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const small = writeTestPsd({ width: 40, height: 30, children: [layer('Background', 0, 0, solid(40, 30, [250, 250, 250, 255])), layer('Kite', 5, 5, solid(10, 8, [230, 110, 80, 255]))] });
afterAll(() => rmSync(small.dir, { recursive: true, force: true }));

async function failure(promise: Promise<unknown>): Promise<UnpackError> {
  try {
    await promise;
  } catch (error) {
    expect(error).toBeInstanceOf(UnpackError);
    return error as UnpackError;
  }
  throw new Error('expected the unpack to fail');
}

describe('unpacking in a child process', () => {
  it('returns the motifs and reports progress through the phases', async () => {
    const progress: UnpackProgress[] = [];
    const result = await runUnpack({ filePath: small.file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'layers' }, (p) => progress.push(p));
    expect(result.motifs.map((m) => m.name)).toEqual(['Background', 'Kite']);
    expect(result.resources?.peakRssBytes).toBeGreaterThan(0);
    expect(progress[0]).toEqual({ phase: 'reading', percent: 0 });
    expect(progress.at(-1)?.phase).toBe('finishing');
    const percents = progress.map((p) => p.percent);
    expect(percents).toEqual([...percents].sort((a, b) => a - b));
  }, 30_000);

  it('announces each motif once its PNG and thumbnail are written, before the result', async () => {
    const outDir = mkdtempSync(join(dir, 'out-'));
    const announced: { motif: UnpackedMotif; filesThere: boolean }[] = [];
    let resultArrived = false;
    const result = await runUnpack({ filePath: small.file, outDir, cut: 'layers' }, undefined, (motif) => {
      announced.push({ motif, filesThere: !resultArrived && existsSync(join(outDir, motif.pngFile)) && existsSync(join(outDir, motif.thumbFile)) });
    });
    resultArrived = true;
    expect(announced.map((a) => a.motif.name).sort()).toEqual(['Background', 'Kite']);
    expect(announced.every((a) => a.filesThere)).toBe(true);
    expect(announced.map((a) => a.motif.contentHash).sort()).toEqual(result.motifs.map((m) => m.contentHash).sort());
  }, 30_000);

  it('stops a child that runs past the time limit', async () => {
    const error = await failure(runUnpack({ filePath: small.file, outDir: dir, cut: 'layers', limits: { timeoutMs: 30 } }));
    expect(error.code).toBe('psd.timeout');
  }, 30_000);

  it('stops a child whose resident memory passes the cap', async () => {
    // any Node process with sharp loaded is past 40 MB, so the watch must stop it
    const error = await failure(runUnpack({ filePath: small.file, outDir: dir, cut: 'layers', limits: { maxMemoryBytes: 40 * 1024 * 1024 } }));
    expect(error.code).toBe('psd.out_of_memory');
  }, 30_000);

  it('passes the child\'s refusal through with its code and message', async () => {
    const pdf = join(dir, 'brief.pdf');
    writeFileSync(pdf, '%PDF-1.7\n1 0 obj\n<<>>\nendobj\n');
    const error = await failure(runUnpack({ filePath: pdf, outDir: dir, cut: 'groups' }));
    expect(error.code).toBe('upload.unsupported_type');
    expect(error.message).toBe('This file is a PDF document; upload a layered PSD, a PNG, JPEG or WebP image, or an SVG drawing');
  }, 30_000);
});
