// What the editor's drag bench runs against: the real app in this process (built client, the
// bench's Postgres, fake S3 and mail), a fresh studio with motifs that have real thumbnails, and
// a mug-wrap product holding 60 placements.
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { randomBytes } from 'node:crypto';
import { cp, rm } from 'node:fs/promises';
import path from 'node:path';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { eq } from 'drizzle-orm';
import { productDetailSchema } from '../../shared/contracts/products';
import { createMotifPlacement, LAYOUT_VERSION } from '../../shared/scene';
import { mug11oz, templateGeometry } from '../../shared/templates';
import { createApp } from '../../server/app';
import { parseConfig } from '../../server/config';
import { motifs, motifVersions } from '../../server/db/schema/index';
import { featureRouters } from '../../server/features/feature-routers';
import { openRuntime, type Runtime } from '../../server/runtime';
import { seedMotifs } from '../../tests/api/support/library-seed';
import { clientOutDir } from '../services/client-build';
import { storageRoot } from '../services/repo-paths';

export const PLACEMENTS = 60;
const MOTIF_KINDS = 20;
// the size imports make thumbnails, so the canvas draws what it draws for real motifs
const THUMB_SIDE = 320;

export type DragBenchApp = { appUrl: string; runtime: Runtime; close(): Promise<void> };

/** The app in-process on a free port, serving a private copy of the built client (a build meanwhile cannot empty it). */
export async function startBenchApp(): Promise<DragBenchApp> {
  const clientDir = path.join(storageRoot, 'bench', `compositor-client-${process.pid}`);
  await rm(clientDir, { recursive: true, force: true });
  await cp(clientOutDir, clientDir, { recursive: true });
  // bound first to learn the port, so the app's config names its own address
  const server: Server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const appUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const close = async (runtime?: Runtime) => {
    server.closeAllConnections?.();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await runtime?.close();
    await rm(clientDir, { recursive: true, force: true });
  };
  let runtime: Runtime | undefined;
  try {
    const config = parseConfig({ ...process.env, NODE_ENV: 'test', APP_URL: appUrl, SESSION_SECRET: randomBytes(24).toString('hex'), RATE_LIMIT_SIGN_UP: '100' });
    runtime = await openRuntime(config);
    const opened = runtime;
    server.on('request', createApp({ ...opened, clientDir, extraRouters: (shared) => featureRouters(opened, shared) }));
    return { appUrl, runtime: opened, close: () => close(opened) };
  } catch (error) {
    await close(runtime);
    throw error;
  }
}

/** Signs a new owner up in the page's browser context and returns the new studio's id. */
export async function signUpOwner(page: Page, appUrl: string): Promise<string> {
  const api = page.context().request;
  const csrf = (await (await api.get(`${appUrl}/api/auth/csrf`)).json()).csrfToken as string;
  const res = await api.post(`${appUrl}/api/auth/sign-up`, {
    headers: { 'x-csrf-token': csrf },
    data: { name: 'Ines Okafor', email: `bench-drag-${Date.now()}@saltmarsh.test`, password: 'puffins-in-jumpers', studioName: 'Saltmarsh drag bench' },
  });
  if (res.status() !== 201) throw new Error(`bench sign-up failed: ${res.status()} ${await res.text()}`);
  return (await res.json()).studio.id as string;
}

const palette = ['#c8283c', '#f07d28', '#2a8cc8', '#5b8c5a', '#6b4e9b', '#a4502a', '#1d1f2a', '#e2553f', '#9fc5e8', '#777777'];

/** 20 motifs of 1200 × 975 px with PNG masters (the print check reads them) and 320 px WebP thumbnails, written straight to the tables and storage. */
export async function seedDragMotifs(runtime: Runtime, studioId: string): Promise<{ id: string; version: number; width: number; height: number }[]> {
  const specs = Array.from({ length: MOTIF_KINDS }, (_, i) => ({ name: `Puffin ${i + 1}`, colours: [{ hex: palette[i % palette.length] }], width: 1200, height: 975 }));
  const { motifIds } = await seedMotifs(runtime.db.db, studioId, specs, { originalName: 'drag-bench.psd' });
  const rows = await runtime.db.db
    .select({ id: motifs.id, version: motifVersions.version, thumbKey: motifVersions.thumbKey, pngKey: motifVersions.pngKey, width: motifVersions.width, height: motifVersions.height, colours: motifVersions.colours })
    .from(motifVersions).innerJoin(motifs, eq(motifs.id, motifVersions.motifId))
    .where(eq(motifs.studioId, studioId));
  for (const row of rows) {
    const drawing = drawingOf(row.colours[0]?.hex ?? '#808080');
    await runtime.storage.put(row.pngKey, await sharp(drawing).resize(row.width, row.height).png({ compressionLevel: 1 }).toBuffer(), 'image/png');
    await runtime.storage.put(row.thumbKey, await sharp(drawing).resize(THUMB_SIDE).webp({ quality: 82, alphaQuality: 90, effort: 1 }).toBuffer(), 'image/webp');
  }
  return rows.filter((r) => motifIds.includes(r.id)).map(({ id, version, width, height }) => ({ id, version, width, height }));
}

// a blob, an eye and a smile: some edges and some transparency, like a cut-out motif
function drawingOf(hex: string): Buffer {
  return Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="320" height="260"><ellipse cx="160" cy="130" rx="150" ry="110" fill="${hex}"/>`
    + '<circle cx="110" cy="100" r="28" fill="#fbf7ef"/><path d="M40 200 Q160 120 280 200" stroke="#1d1f2a" stroke-width="10" fill="none"/></svg>');
}

/** A mug-wrap product: 59 placements in a 10 × 6 grid over the wrap and the dragged one last (on top) at the file's centre. */
export async function createDragProduct(page: Page, appUrl: string, seeded: { id: string; version: number; width: number; height: number }[]): Promise<string> {
  const api = page.context().request;
  const csrf = async () => (await (await api.get(`${appUrl}/api/auth/csrf`)).json()).csrfToken as string;
  const token = await csrf();
  const created = productDetailSchema.parse(await (await api.post(`${appUrl}/api/products`, { headers: { 'x-csrf-token': token }, data: { name: 'Drag bench', templateId: mug11oz.id } })).json());
  const g = templateGeometry(mug11oz);
  const placements = Array.from({ length: PLACEMENTS }, (_, i) => {
    const m = seeded[i % seeded.length];
    const last = i === PLACEMENTS - 1;
    const x = last ? g.size.width / 2 : g.printArea.x + ((i % 10) + 0.5) * (g.printArea.width / 10);
    const y = last ? g.size.height / 2 : g.printArea.y + (Math.floor(i / 10) + 0.5) * (g.printArea.height / 6);
    const scale = Math.min(1, 180 / Math.max(m.width, m.height));
    return createMotifPlacement({ id: `bench-${i}`, motifId: m.id, version: m.version, naturalWidth: m.width, naturalHeight: m.height, x, y, scale, rotationDeg: (i * 7) % 45 });
  });
  const patched = await api.patch(`${appUrl}/api/products/${created.id}`, { headers: { 'x-csrf-token': token }, data: { revision: created.revision, layout: { version: LAYOUT_VERSION, placements, mirror: false } } });
  if (!patched.ok()) throw new Error(`saving the bench layout failed: HTTP ${patched.status()} ${await patched.text()}`);
  return created.id;
}
