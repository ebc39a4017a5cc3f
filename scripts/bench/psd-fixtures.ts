import { existsSync } from 'node:fs';
import { mkdir, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { writePsdBuffer, type Layer } from 'ag-psd';
import { compositeOnto } from '../../server/lib/image/composite-rgba';
import type { RgbaImage } from '../../server/lib/image/rgba-image';

// The bench's layered files, written by ag-psd (RLE, its default compression): a 5 x 7 in card
// at 300 PPI with 30 layers and a 18 x 24 in poster at 300 PPI with 40 layers. Layers vary in
// size, have soft (partly transparent) edges, and a quarter carry a painted-looking texture.
export type BenchPsdSpec = { name: string; width: number; height: number; layers: number; groups: number; seed: number; coverage: number };

export const benchPsdSpecs: BenchPsdSpec[] = [
  { name: 'card', width: 1500, height: 2100, layers: 30, groups: 5, seed: 7, coverage: 2.8 },
  { name: 'poster', width: 5400, height: 7200, layers: 40, groups: 6, seed: 11, coverage: 2.8 },
];

// bump when the drawing changes, so cached files are rebuilt
const FIXTURE_VERSION = 3;

export type BenchPsd = { name: string; file: string; width: number; height: number; layers: number; layerPixels: number };

export async function generateBenchPsds(outDir = resolve('storage/bench/psd')): Promise<BenchPsd[]> {
  await mkdir(outDir, { recursive: true });
  const out: BenchPsd[] = [];
  for (const spec of benchPsdSpecs) {
    const file = join(outDir, `${spec.name}-v${FIXTURE_VERSION}.psd`);
    const layers = drawLayers(spec);
    const layerPixels = layers.reduce((sum, l) => sum + l.width * l.height, 0);
    if (!existsSync(file)) await writeFile(file, writePsdBuffer(assemble(spec, layers)));
    out.push({ name: spec.name, file, width: spec.width, height: spec.height, layers: spec.layers, layerPixels });
  }
  return out;
}

function drawLayers(spec: BenchPsdSpec): RgbaImage[] {
  const random = mulberry32(spec.seed);
  // a full-size background, then boxes whose areas add up to (coverage - 1) document areas
  const weights = Array.from({ length: spec.layers - 1 }, () => 0.15 + random());
  const sum = weights.reduce((a, b) => a + b, 0);
  const layers: RgbaImage[] = [fullLayer(spec, random)];
  weights.forEach((weight, i) => layers.push(shapeLayer(spec, (weight / sum) * (spec.coverage - 1), i % 4 === 0, random)));
  return layers;
}

function fullLayer(spec: BenchPsdSpec, random: () => number): RgbaImage {
  const { width, height } = spec;
  const data = new Uint8Array(width * height * 4);
  const top = [180 + random() * 60, 200 + random() * 40, 220];
  for (let y = 0; y < height; y++) {
    const t = y / height;
    const r = top[0] * (1 - t) + 240 * t;
    const g = top[1] * (1 - t) + 220 * t;
    const b = top[2] * (1 - t) + 180 * t;
    for (let x = 0, p = y * width * 4; x < width; x++, p += 4) {
      data[p] = r; data[p + 1] = g; data[p + 2] = b; data[p + 3] = 255;
    }
  }
  return { data, width, height, left: 0, top: 0 };
}

function shapeLayer(spec: BenchPsdSpec, share: number, textured: boolean, random: () => number): RgbaImage {
  const aspect = 0.5 + random();
  const area = Math.min(spec.width * spec.height * 0.9, share * spec.width * spec.height);
  const width = Math.max(8, Math.min(spec.width, Math.round(Math.sqrt(area * aspect))));
  const height = Math.max(8, Math.min(spec.height, Math.round(area / width)));
  const left = Math.round(random() * (spec.width - width));
  const top = Math.round(random() * (spec.height - height));
  const colour = [random() * 255, random() * 255, random() * 255];
  const data = new Uint8Array(width * height * 4);
  const noise = mulberry32(Math.floor(random() * 1e9));
  const feather = Math.max(2, Math.min(width, height) * 0.04);
  for (let y = 0; y < height; y++) {
    const dy = (y + 0.5) / height * 2 - 1;
    const shade = 0.85 + 0.15 * (y / height);
    for (let x = 0, p = y * width * 4; x < width; x++, p += 4) {
      const dx = (x + 0.5) / width * 2 - 1;
      // an ellipse with a soft rim: alpha falls off over `feather` pixels
      const edge = (1 - Math.sqrt(dx * dx + dy * dy)) * Math.min(width, height) / 2;
      if (edge <= 0) continue;
      const alpha = edge >= feather ? 255 : Math.round((edge / feather) * 255);
      const grain = textured ? (noise() - 0.5) * 14 : 0;
      data[p] = clamp(colour[0] * shade + grain);
      data[p + 1] = clamp(colour[1] * shade + grain);
      data[p + 2] = clamp(colour[2] * shade + grain);
      data[p + 3] = alpha;
    }
  }
  return { data, width, height, left, top };
}

function assemble(spec: BenchPsdSpec, layers: RgbaImage[]) {
  const merged: RgbaImage = { data: new Uint8Array(spec.width * spec.height * 4), width: spec.width, height: spec.height, left: 0, top: 0 };
  for (const layer of layers) compositeOnto(merged, layer, { blendMode: 'normal', opacity: 1 });
  const asLayer = (image: RgbaImage, name: string, blend?: Layer['blendMode']): Layer => ({
    name, left: image.left, top: image.top, ...(blend ? { blendMode: blend } : {}),
    imageData: { width: image.width, height: image.height, data: new Uint8ClampedArray(image.data.buffer) } as ImageData,
  });
  const children: Layer[] = [asLayer(layers[0], 'Background')];
  const perGroup = Math.floor((layers.length - 1) / (spec.groups + 1));
  let next = 1;
  for (let g = 0; g < spec.groups; g++) {
    const members = layers.slice(next, next + perGroup).map((l, i) => asLayer(l, `Shape ${next + i}`, i === 1 ? 'multiply' : undefined));
    next += perGroup;
    children.push({ name: `Group ${g + 1}`, opened: true, children: members });
  }
  for (; next < layers.length; next++) children.push(asLayer(layers[next], `Loose shape ${next}`));
  return {
    width: spec.width, height: spec.height, children,
    imageData: { width: spec.width, height: spec.height, data: new Uint8ClampedArray(merged.data.buffer) } as ImageData,
  };
}

function clamp(v: number): number {
  return v < 0 ? 0 : v > 255 ? 255 : v;
}

function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  for (const psd of await generateBenchPsds()) console.log(`${psd.name}: ${psd.file} (${psd.layers} layers, ${(psd.layerPixels / 1e6).toFixed(1)} MP of layer pixels)`);
}
