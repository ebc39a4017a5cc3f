import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { readPsd, type Layer } from 'ag-psd';
import sharp from 'sharp';
import { ensureAgPsdImageData } from '../../server/features/originals/unpack/ag-psd-setup';
import { prewarmUnpackWorker, runUnpack } from '../../server/features/originals/unpack/run-unpack';
import type { UnpackCut } from '../../server/features/originals/unpack/unpack-result';
import { generateBenchPsds, type BenchPsd } from './psd-fixtures';

// Times, in one run, for each bench PSD: (a) ImageMagick writing every layer as PNG, (b) the
// floor (ag-psd decoding all layers + sharp writing them as PNG, two at a time, level 1, in
// this process), (c) our runUnpack in its child process, cold and with a pre-started child.
const IMAGEMAGICK = '/usr/bin/convert';

export type UnpackBenchRow = {
  file: string;
  layers: number;
  layerMegapixels: number;
  imageMagickMs: number | null;
  floorMs: number;
  ours: { cut: UnpackCut; warm: boolean; ms: number; childCpuMs: number; childPeakRssMb: number; motifs: number; parseMs: number; cutMs: number; encodeMs: number }[];
};

export async function benchUnpack(options: { log?: (line: string) => void } = {}): Promise<UnpackBenchRow[]> {
  const log = options.log ?? console.log;
  const rows: UnpackBenchRow[] = [];
  for (const psd of await generateBenchPsds()) {
    const imageMagickMs = timeImageMagick(psd);
    const floorMs = await timeFloor(psd);
    const ours: UnpackBenchRow['ours'] = [];
    for (const [cut, warm] of [['layers', false], ['layers', true], ['groups', true]] as const) ours.push(await timeOurs(psd, cut, warm));
    prewarmUnpackWorker(false);
    const row = { file: psd.name, layers: psd.layers, layerMegapixels: Math.round(psd.layerPixels / 1e5) / 10, imageMagickMs, floorMs, ours };
    rows.push(row);
    printRow(row, log);
  }
  return rows;
}

// Debian's ImageMagick policy caps its pixel cache at 256 MiB memory / 1 GiB disk, which a
// poster's 41 images at 16 bits per channel exceed; the bench raises the caps for its own runs.
const IMAGEMAGICK_POLICY = `<policymap>
  <policy domain="resource" name="memory" value="8GiB"/>
  <policy domain="resource" name="map" value="16GiB"/>
  <policy domain="resource" name="area" value="1GP"/>
  <policy domain="resource" name="disk" value="64GiB"/>
</policymap>`;

function timeImageMagick(psd: BenchPsd): number | null {
  if (!existsSync(IMAGEMAGICK)) return null;
  const dir = mkdtempSync(join(tmpdir(), 'bench-im-'));
  writeFileSync(join(dir, 'policy.xml'), IMAGEMAGICK_POLICY);
  try {
    const started = performance.now();
    const run = spawnSync(IMAGEMAGICK, [psd.file, join(dir, 'layer-%d.png')], { stdio: 'ignore', env: { ...process.env, MAGICK_CONFIGURE_PATH: dir } });
    const ms = performance.now() - started;
    return run.status === 0 ? Math.round(ms) : null;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function timeFloor(psd: BenchPsd): Promise<number> {
  ensureAgPsdImageData();
  const dir = mkdtempSync(join(tmpdir(), 'bench-floor-'));
  try {
    const started = performance.now();
    const doc = readPsd(readFileSync(psd.file), { useImageData: true, skipCompositeImageData: true, skipThumbnail: true });
    const layers: Layer[] = [];
    const collect = (list: Layer[] = []) => list.forEach((l) => (l.children ? collect(l.children) : l.imageData && layers.push(l)));
    collect(doc.children);
    let next = 0;
    const worker = async () => {
      while (next < layers.length) {
        const layer = layers[next++];
        const { width, height, data } = layer.imageData!;
        await sharp(Buffer.from(data.buffer, data.byteOffset, data.byteLength), { raw: { width, height, channels: 4 } })
          .png({ compressionLevel: 1, adaptiveFiltering: false }).toFile(join(dir, `layer-${next}.png`));
      }
    };
    await Promise.all([worker(), worker()]);
    return Math.round(performance.now() - started);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function timeOurs(psd: BenchPsd, cut: UnpackCut, warm: boolean): Promise<UnpackBenchRow['ours'][number]> {
  const dir = mkdtempSync(join(tmpdir(), 'bench-ours-'));
  try {
    // a worker keeps a loaded, warmed-up spare child between jobs
    if (warm) await prewarmUnpackWorker(true);
    const started = performance.now();
    const result = await runUnpack({ filePath: psd.file, outDir: dir, cut });
    const ms = Math.round(performance.now() - started);
    return {
      cut, warm, ms, motifs: result.motifs.length, childCpuMs: result.resources?.cpuMs ?? 0,
      childPeakRssMb: Math.round((result.resources?.peakRssBytes ?? 0) / 1048576),
      parseMs: Math.round(result.timings.parseMs), cutMs: Math.round(result.timings.cutMs), encodeMs: Math.round(result.timings.encodeMs),
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function printRow(row: UnpackBenchRow, log: (line: string) => void): void {
  const im = row.imageMagickMs;
  log(`${row.file}: ${row.layers} layers, ${row.layerMegapixels} MP of layer pixels`);
  log(`  ImageMagick convert -> PNG per layer: ${im === null ? 'not available (/usr/bin/convert missing or failed)' : `${im} ms`}`);
  log(`  floor (ag-psd read + sharp PNG level 1, 2 in flight): ${row.floorMs} ms`);
  for (const o of row.ours) {
    const vsIm = im ? ` = ${(o.ms / im).toFixed(2)}x ImageMagick` : '';
    log(`  runUnpack cut=${o.cut} ${o.warm ? 'pre-started child' : 'cold child'}: ${o.ms} ms${vsIm}, ${(o.ms / row.floorMs).toFixed(2)}x floor,`
      + ` child peak RSS ${o.childPeakRssMb} MB, child CPU ${o.childCpuMs} ms, ${o.motifs} motifs (parse ${o.parseMs}, cut ${o.cutMs}, encode ${o.encodeMs} ms)`);
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  await benchUnpack();
}
