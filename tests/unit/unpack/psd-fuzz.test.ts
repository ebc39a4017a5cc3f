import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { writePsdBuffer } from 'ag-psd';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { runUnpack } from '../../../server/features/originals/unpack/run-unpack';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import { resolveUnpackLimits } from '../../../server/features/originals/unpack/unpack-limits';
import { unpackPsd } from '../../../server/features/originals/unpack/unpack-psd';
import { layer, pixels, solid } from './support/ag-psd-files';

// Truncations and byte flips of a small valid PSD: the unpack must always end, within a time
// bound, in a result or an UnpackError, and stay within a memory bound. The in-process core
// takes most runs (fast); a few go through the child process like production.
const seed = Number(process.env.FUZZ_SEED ?? 20240611);
const dir = mkdtempSync(join(tmpdir(), 'unpack-fuzz-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const gradient = (w: number, h: number) => pixels(w, h, Array.from({ length: w * h }, (_, i) => [i & 255, (i * 3) & 255, 90, i % 5 === 0 ? 0 : 255]));
const valid = writePsdBuffer({
  width: 48, height: 32,
  children: [
    layer('Background', 0, 0, solid(48, 32, [240, 235, 220, 255])),
    { name: 'Puffin', opened: true, children: [
      layer('Body', 4, 4, gradient(20, 16)),
      layer('Shade', 10, 8, solid(12, 10, [40, 40, 60, 200]), { blendMode: 'multiply', opacity: 0.7 }),
    ] },
    layer('Kite', 30, 2, gradient(14, 12), { hidden: true }),
  ],
});

const limits = resolveUnpackLimits({ maxDocumentPixels: 4_000_000, maxLayerPixels: 4_000_000, maxTotalLayerPixels: 16_000_000, timeoutMs: 10_000, maxMemoryBytes: 700 * 1024 * 1024 });
const MiB = 1024 * 1024;

type Mutation = { kind: 'truncate'; at: number } | { kind: 'flip'; at: number[]; values: number[] } | { kind: 'field'; at: number; value: number };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  fc.record({ kind: fc.constant('truncate' as const), at: fc.integer({ min: 0, max: valid.length - 1 }) }),
  fc.record({
    kind: fc.constant('flip' as const),
    at: fc.array(fc.integer({ min: 0, max: valid.length - 1 }), { minLength: 1, maxLength: 8 }),
    values: fc.array(fc.integer({ min: 0, max: 255 }), { minLength: 8, maxLength: 8 }),
  }),
  // a 4-byte length or size field overwritten with an extreme value
  fc.record({ kind: fc.constant('field' as const), at: fc.integer({ min: 0, max: Math.min(valid.length - 4, 2000) }), value: fc.constantFrom(0, 1, 0x7fffffff, 0xffffffff, 30_000, 300_001, 65_535) }),
);

function mutate(m: Mutation): Buffer {
  if (m.kind === 'truncate') return Buffer.from(valid.subarray(0, m.at));
  const bytes = Buffer.from(valid);
  if (m.kind === 'flip') m.at.forEach((at, i) => (bytes[at] = m.values[i]));
  else bytes.writeUInt32BE(m.value, m.at);
  return bytes;
}

describe('unpacking damaged PSD files', () => {
  it('always ends in motifs or an UnpackError, quickly and within a memory bound (in process)', async () => {
    const outDir = mkdtempSync(join(dir, 'core-'));
    const baseline = process.memoryUsage().rss;
    let rejected = 0;
    await fc.assert(fc.asyncProperty(mutation, async (m) => {
      const started = performance.now();
      try {
        await unpackPsd(mutate(m), { outDir, cut: 'groups', limits });
      } catch (error) {
        if (!(error instanceof UnpackError)) throw error;
        rejected++;
      }
      expect(performance.now() - started).toBeLessThan(3000);
      expect(process.memoryUsage().rss - baseline).toBeLessThan(400 * MiB);
    }), { seed, numRuns: 150 });
    // most damage must be caught, not silently imported
    expect(rejected).toBeGreaterThan(20);
  }, 60_000);

  it('never takes the parent down when the child process meets a damaged file', async () => {
    const outcomes: string[] = [];
    await fc.assert(fc.asyncProperty(mutation, async (m) => {
      const file = join(dir, `fuzz-${outcomes.length}.psd`);
      writeFileSync(file, mutate(m));
      const started = performance.now();
      try {
        const result = await runUnpack({ filePath: file, outDir: mkdtempSync(join(dir, 'child-')), cut: 'layers', limits });
        expect(result.resources?.peakRssBytes ?? 0).toBeLessThan(limits.maxMemoryBytes);
        outcomes.push('ok');
      } catch (error) {
        expect(error).toBeInstanceOf(UnpackError);
        outcomes.push((error as UnpackError).code);
      }
      expect(performance.now() - started).toBeLessThan(limits.timeoutMs + 2000);
    }), { seed, numRuns: 3 });
    expect(outcomes).toHaveLength(3);
    expect(outcomes).not.toContain('unpack.crashed');
  }, 60_000);
});
