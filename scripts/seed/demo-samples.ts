import { createHash } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { and, eq, inArray } from 'drizzle-orm';
import { createSampleRequestSchema, sampleVerdictRequestSchema } from '../../shared/contracts/samples';
import { readSavedLayout } from '../../shared/scene';
import { findBuiltInTemplate } from '../../shared/templates';
import { activityEvents, motifVersions, products, samplePhotos, samples } from '../../server/db/schema/index';
import { createSamplesRepository } from '../../server/features/samples/samples.repository';
import { createSamplesService } from '../../server/features/samples/samples.service';
import { storageRoot } from '../services/repo-paths';
import { addDays, daysAgo, isoDate } from './demo-dates';
import type { DemoContext } from './demo-life';
import type { DemoPerson } from './demo-products';
import { drawSamplePhoto, motifLoader, PHOTO_DRAWING_VERSION, renderFlatProductPreview, type PhotoScene } from './demo-sample-photos';

// Samples of the tote (came back soft: changes needed) and the sticker sheet (approved), each
// with the studio's own photos, recorded through the samples service and then dated to when
// they happened in the story.

type DemoSample = {
  product: string;
  by: DemoPerson;
  orderedDaysAgo: number;
  expectedAfterDays: number;
  receivedAfterDays: number;
  printer: string;
  cost: string;
  currency: string;
  notes: string;
  verdict: { by: DemoPerson; afterDays: number; verdict: 'approved' | 'changes_needed'; notes: string };
  photos: (PhotoScene & { fileName: string })[];
};

const demoSamples: DemoSample[] = [
  {
    product: 'Puffin Picnic tote',
    by: 'teodor',
    orderedDaysAgo: 38,
    expectedAfterDays: 7,
    receivedAfterDays: 8,
    printer: 'Harbourside Print Co.',
    cost: '14.50',
    currency: 'GBP',
    notes: 'One natural canvas tote, screen-printed from the proof of revision 4.',
    verdict: {
      by: 'ines',
      afterDays: 9,
      verdict: 'changes_needed',
      notes: 'The print is soft: the artwork was enlarged past its own pixels. Redraw the picnic at print size, and lift the wave band about 2 cm clear of the bottom seam.',
    },
    photos: [
      { fileName: 'IMG_4127.jpg', kind: 'tote', angleDeg: -4, table: 'oak', zoom: 0.72 },
      { fileName: 'IMG_4129.jpg', kind: 'tote', angleDeg: 7, table: 'ash', zoom: 0.66 },
    ],
  },
  {
    product: 'Coastal Spring sticker sheet',
    by: 'teodor',
    orderedDaysAgo: 178,
    expectedAfterDays: 10,
    receivedAfterDays: 11,
    printer: 'Sticky Tide Stickers',
    cost: '6.80',
    currency: 'GBP',
    notes: 'One sheet on white vinyl, kiss-cut.',
    verdict: { by: 'ines', afterDays: 12, verdict: 'approved', notes: 'Colours match the proof, cut lines sit well inside the artwork.' },
    photos: [{ fileName: 'IMG_2203.jpg', kind: 'sheet', angleDeg: 3, table: 'oak', zoom: 0.74 }],
  },
];

export async function ensureDemoSamples(ctx: DemoContext, productIds: Map<string, string>): Promise<void> {
  const { db, studioId } = ctx;
  const todo: { spec: DemoSample; productId: string }[] = [];
  for (const spec of demoSamples) {
    const productId = productIds.get(spec.product);
    if (!productId) continue;
    const [existing] = await db.select({ id: samples.id }).from(samples).where(and(eq(samples.studioId, studioId), eq(samples.productId, productId))).limit(1);
    if (!existing) todo.push({ spec, productId });
  }
  if (todo.length === 0) return;
  // Drawing is the slow part (a 12 MP JPEG each): all photos at once, on every core.
  const drawn = await Promise.all(todo.map(({ spec, productId }) => photosOf(ctx, productId, spec)));
  for (const [i, { spec, productId }] of todo.entries()) await recordSample(ctx, productId, spec, drawn[i]);
}

async function recordSample(ctx: DemoContext, productId: string, spec: DemoSample, photos: Buffer[]): Promise<void> {
  const { db, studioId, people, cal, runtime } = ctx;
  const service = createSamplesService({ repo: createSamplesRepository(db), storage: runtime.storage, maxPixels: runtime.config.SAMPLE_PHOTO_MAX_PIXELS, photoLimitBytes: runtime.config.SAMPLE_PHOTO_LIMIT_BYTES });
  const ordered = daysAgo(cal, spec.orderedDaysAgo);
  const sample = await service.record(studioId, people[spec.by], productId, createSampleRequestSchema.parse({
    orderedOn: isoDate(ordered), printer: spec.printer, cost: spec.cost, currency: spec.currency, notes: spec.notes,
    expectedOn: isoDate(addDays(ordered, spec.expectedAfterDays)), receivedOn: isoDate(addDays(ordered, spec.receivedAfterDays)),
  }));
  const spool = path.join(runtime.config.STORAGE_DIR, 'demo');
  await mkdir(spool, { recursive: true });
  const photoIds = await Promise.all(
    spec.photos.map(async (photo, i) => {
      // the service takes the upload's spool file and removes it when done
      const file = path.join(spool, `${sample.id}-${photo.fileName}`);
      await writeFile(file, photos[i]);
      const stored = await service.addPhoto({ studioId, userId: people[spec.by], sampleId: sample.id, filePath: file, fileName: photo.fileName, byteSize: photos[i].length });
      return stored.id;
    }),
  );
  await service.verdict(studioId, people[spec.verdict.by], sample.id, sampleVerdictRequestSchema.parse({ verdict: spec.verdict.verdict, notes: spec.verdict.notes }));
  await backdate(ctx, sample.id, photoIds, {
    recorded: ordered,
    photographed: daysAgo(cal, spec.orderedDaysAgo - spec.receivedAfterDays, 16, 40),
    judged: daysAgo(cal, spec.orderedDaysAgo - spec.verdict.afterDays, 10, 20),
  });
  console.log(`  sample of ${spec.product}: ${spec.verdict.verdict}, ${photoIds.length} photo(s)`);
}

// Drawn photos are kept under storage/demo/sample-photos by what they show (the layout without
// its random ids, the motifs' content hashes, the scene), so a fresh database seeds in a moment.
const photoCacheDir = path.join(storageRoot, 'demo', 'sample-photos');

async function photosOf(ctx: DemoContext, productId: string, spec: DemoSample): Promise<Buffer[]> {
  const source = await productSource(ctx, productId);
  let preview: Promise<Buffer> | undefined;
  return Promise.all(
    spec.photos.map(async (photo) => {
      const key = createHash('sha256').update(JSON.stringify({ v: PHOTO_DRAWING_VERSION, look: source.look, photo })).digest('hex').slice(0, 32);
      const file = path.join(photoCacheDir, `${key}.jpg`);
      const cached = await readFile(file).catch(() => null);
      if (cached) return cached;
      preview ??= source.render();
      const jpeg = await drawSamplePhoto(await preview, photo);
      await mkdir(photoCacheDir, { recursive: true });
      await writeFile(file, jpeg);
      return jpeg;
    }),
  );
}

async function productSource(ctx: DemoContext, productId: string) {
  const [row] = await ctx.db.select({ layout: products.layout, templateId: products.templateId }).from(products).where(eq(products.id, productId));
  const template = findBuiltInTemplate(row.templateId);
  const saved = readSavedLayout(row.layout);
  if (!template || !saved.ok) throw new Error(`The demo product ${productId} cannot be previewed`);
  const layout = saved.layout;
  const ids = [...new Set(layout.placements.flatMap((p) => (p.type === 'text' ? [] : [p.motifId])))];
  const versions = await ctx.db
    .select({ motifId: motifVersions.motifId, version: motifVersions.version, pngKey: motifVersions.pngKey, contentHash: motifVersions.contentHash })
    .from(motifVersions)
    .where(inArray(motifVersions.motifId, ids));
  const versionOf = (motifId: string, version: number) => versions.find((x) => x.motifId === motifId && x.version === version);
  const look = {
    templateId: row.templateId,
    mirror: layout.mirror,
    placements: layout.placements.map((p) => {
      const { id: _id, ...rest } = p;
      return p.type === 'text' ? rest : { ...rest, motifId: versionOf(p.motifId, p.version)?.contentHash ?? p.motifId };
    }),
  };
  const load = motifLoader((motifId, version) => {
    const v = versionOf(motifId, version);
    if (!v) throw new Error(`Motif ${motifId}@${version} is missing`);
    return ctx.runtime.storage.getBuffer(v.pngKey);
  });
  return { look, render: () => renderFlatProductPreview(layout, template, load) };
}

// The service dates everything now; the story dates it to the order, the arrival and the verdict.
async function backdate(ctx: DemoContext, sampleId: string, photoIds: string[], at: { recorded: Date; photographed: Date; judged: Date }) {
  const { db } = ctx;
  await db.transaction(async (tx) => {
    await tx.update(samples).set({ createdAt: at.recorded, updatedAt: at.judged, verdictAt: at.judged }).where(eq(samples.id, sampleId));
    if (photoIds.length) await tx.update(samplePhotos).set({ createdAt: at.photographed }).where(inArray(samplePhotos.id, photoIds));
    await tx.update(activityEvents).set({ createdAt: at.recorded }).where(and(eq(activityEvents.subjectId, sampleId), eq(activityEvents.kind, 'sample.recorded')));
    await tx.update(activityEvents).set({ createdAt: at.judged }).where(and(eq(activityEvents.subjectId, sampleId), eq(activityEvents.kind, 'sample.verdict')));
  });
}
