import { and, eq, inArray } from 'drizzle-orm';
import type { Database } from '../../server/db/client';
import { activityEvents, collections, motifs, motifVersions, originals, productMotifs, products, productVariants, stageMoves, users } from '../../server/db/schema/index';
import { runBulkAction } from '../../server/features/motifs/bulk-edit';
import { recordLibraryChange } from '../../server/features/motifs/library-changes';
import type { Runtime } from '../../server/runtime';
import { demoAccounts } from './demo-accounts';
import { daysAgo, demoCalendar, type DemoCalendar } from './demo-dates';
import { buildLayout, motifKey, type MotifIndex } from './demo-layouts';
import { demoCollectionNotes, demoProducts, type DemoCollectionName, type DemoPerson, type DemoProduct } from './demo-products';
import { ensureDemoReviews } from './demo-reviews';
import { ensureDemoSales } from './demo-sales-import';
import { ensureDemoSamples } from './demo-samples';

// The demo studio's life: its two collections on the calendar, six products at different
// stages with their history and SKUs, samples with photos, review threads and a season of
// shop sales. Idempotent: every record is looked up by name first and left alone if present.

export type DemoPeople = Record<DemoPerson, string>;
export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
export type DemoContext = { runtime: Runtime; db: Database; studioId: string; people: DemoPeople; cal: DemoCalendar; index: MotifIndex };

// The demo PSDs are stored under their file names; the scenario calls them by title.
const originalTitles: Record<string, string> = { 'puffin-picnic.psd': 'Puffin Picnic', 'lantern-walk.psd': 'Lantern Walk' };

async function loadPeople(db: Database): Promise<DemoPeople> {
  const rows = await db.select({ id: users.id, email: users.email }).from(users).where(inArray(users.email, demoAccounts.map((a) => a.email)));
  const idOf = (email: string) => {
    const row = rows.find((r) => r.email === email);
    if (!row) throw new Error(`The demo account ${email} is missing`);
    return row.id;
  };
  return { ines: idOf('ines@saltmarsh.test'), teodor: idOf('teodor@saltmarsh.test'), june: idOf('june@saltmarsh.test') };
}

async function loadMotifIndex(db: Database, studioId: string): Promise<MotifIndex> {
  const rows = await db
    .select({ id: motifs.id, name: motifs.name, version: motifs.currentVersion, hidden: motifs.hiddenInOriginal, original: originals.name, width: motifVersions.width, height: motifVersions.height, offsetX: motifVersions.offsetX, offsetY: motifVersions.offsetY })
    .from(motifs)
    .innerJoin(originals, eq(originals.id, motifs.originalId))
    .innerJoin(motifVersions, and(eq(motifVersions.motifId, motifs.id), eq(motifVersions.version, motifs.currentVersion)))
    .where(and(eq(motifs.studioId, studioId), eq(motifs.archived, false)));
  const index: MotifIndex = new Map();
  for (const r of rows) {
    const originalName = originalTitles[r.original] ?? r.original;
    index.set(motifKey(originalName, r.name), { id: r.id, version: r.version, width: r.width, height: r.height, offsetX: r.offsetX, offsetY: r.offsetY, hiddenInOriginal: r.hidden, name: r.name, originalName });
  }
  return index;
}

/** An activity entry dated when it happened in the demo's story (recordActivity dates it now). */
export async function recordDemoActivity(tx: Tx | Database, values: typeof activityEvents.$inferInsert & { createdAt: Date }): Promise<void> {
  await tx.insert(activityEvents).values(values);
}

async function ensureCollections(ctx: DemoContext): Promise<Map<DemoCollectionName, string>> {
  const { db, studioId, cal, index } = ctx;
  const out = new Map<DemoCollectionName, string>();
  const windows: Record<DemoCollectionName, DemoCalendar['coastalSpring']> = { 'Coastal Spring': cal.coastalSpring, 'Lantern Walk': cal.lanternWalk };
  for (const name of Object.keys(windows) as DemoCollectionName[]) {
    const [existing] = await db.select({ id: collections.id }).from(collections).where(and(eq(collections.studioId, studioId), eq(collections.name, name))).limit(1);
    if (existing) {
      out.set(name, existing.id);
      continue;
    }
    const { notes, motifs: members } = demoCollectionNotes[name];
    const id = await db.transaction(async (tx) => {
      const [row] = await tx.insert(collections).values({ studioId, name, notes, ...windows[name] }).returning({ id: collections.id });
      const ids = members.names.flatMap((n) => index.get(motifKey(members.original, n))?.id ?? []);
      await runBulkAction(tx, studioId, ids, { type: 'add-to-collection', collectionId: row.id });
      return row.id;
    });
    console.log(`  collection ${name}: launch ${windows[name].launchDate}`);
    out.set(name, id);
  }
  return out;
}

async function insertProduct(ctx: DemoContext, spec: DemoProduct, collectionId: string): Promise<void> {
  const { studioId, people, cal, index } = ctx;
  const { layout } = buildLayout(spec.recipe, spec.templateId, index);
  const created = daysAgo(cal, spec.moves[0].daysAgo, 9, 30);
  const last = daysAgo(cal, Math.min(...spec.moves.map((m) => m.daysAgo)), 15, 10);
  await ctx.db.transaction(async (tx) => {
    const [row] = await tx
      .insert(products)
      .values({
        studioId, name: spec.name, templateId: spec.templateId, layout, revision: spec.revision, stage: spec.moves[spec.moves.length - 1].to,
        notes: spec.notes, tags: spec.tags, collectionId, createdBy: people[spec.createdBy], createdAt: created, updatedAt: last,
      })
      .returning({ id: products.id });
    const uses = layout.placements.flatMap((p) => (p.type === 'motif' ? [{ productId: row.id, motifId: p.motifId, placementId: p.id, version: p.version }] : []));
    if (uses.length) await tx.insert(productMotifs).values(uses);
    if (spec.variants.length) {
      await tx.insert(productVariants).values(spec.variants.map((v, position) => ({ studioId, productId: row.id, name: v.name, sku: v.sku, options: v.options, position, createdAt: created })));
    }
    await recordDemoActivity(tx, { studioId, actorId: people[spec.createdBy], kind: 'product.created', subjectType: 'product', subjectId: row.id, summary: `started “${spec.name}”`, data: { templateId: spec.templateId, stage: spec.moves[0].to }, createdAt: created });
    let from: DemoProduct['moves'][number]['to'] | null = null;
    for (const [i, move] of spec.moves.entries()) {
      const at = i === 0 ? created : daysAgo(cal, move.daysAgo, 11 + (i % 5), 15 * i);
      await tx.insert(stageMoves).values({ studioId, productId: row.id, fromStage: from, toStage: move.to, movedBy: people[move.by], note: move.note ?? '', override: move.override ?? false, createdAt: at });
      if (i > 0) {
        await recordDemoActivity(tx, {
          studioId, actorId: people[move.by], kind: 'product.stage_moved', subjectType: 'product', subjectId: row.id,
          summary: `moved “${spec.name}” to ${move.to}${move.override ? ' without an approved sample' : ''}`,
          data: { from, to: move.to, override: move.override ?? false, note: move.note ?? '' }, createdAt: at,
        });
      }
      from = move.to;
    }
    // "where used" and the library's usage counts in every web process
    await recordLibraryChange(tx, studioId, [...new Set(uses.map((u) => u.motifId))]);
  });
}

async function ensureProducts(ctx: DemoContext, collectionIds: Map<DemoCollectionName, string>): Promise<Map<string, string>> {
  const { db, studioId } = ctx;
  const have = async () => new Map((await db.select({ id: products.id, name: products.name }).from(products).where(and(eq(products.studioId, studioId), inArray(products.name, demoProducts.map((p) => p.name))))).map((r) => [r.name, r.id]));
  const before = await have();
  for (const spec of demoProducts) {
    if (before.has(spec.name)) continue;
    await insertProduct(ctx, spec, collectionIds.get(spec.collection)!);
    console.log(`  product ${spec.name}: ${spec.moves[spec.moves.length - 1].to}`);
  }
  return have();
}

function stopwatch() {
  let last = performance.now();
  const steps: string[] = [];
  const lap = (name: string) => {
    const now = performance.now();
    steps.push(`${name} ${((now - last) / 1000).toFixed(1)} s`);
    last = now;
  };
  return Object.assign(lap, { summary: () => steps.join(', ') });
}

export async function seedDemoLife(runtime: Runtime, studioId: string): Promise<void> {
  const started = performance.now();
  const db = runtime.db.db;
  const [people, index] = await Promise.all([loadPeople(db), loadMotifIndex(db, studioId)]);
  const ctx: DemoContext = { runtime, db, studioId, people, cal: demoCalendar(), index };
  const lap = stopwatch();
  const collectionIds = await ensureCollections(ctx);
  const productIds = await ensureProducts(ctx, collectionIds);
  lap('collections and products');
  await ensureDemoSamples(ctx, productIds);
  lap('samples');
  await ensureDemoReviews(ctx, productIds);
  lap('reviews');
  await ensureDemoSales(ctx);
  lap('sales');
  console.log(`  demo studio life in ${((performance.now() - started) / 1000).toFixed(1)} s (${lap.summary()})`);
}
