import { compose, scale } from '../../../shared/geometry';
import { createScene, renderPlan, type RenderPlan, type Scene } from '../../../shared/scene';
import type { Template } from '../../../shared/templates';
import { decodeMotifPng, renderPrintFile, type LoadMotifPixels, type PrintRender } from '../../lib/image/print-render';
import type { SourcePixels } from '../../lib/image/affine-sample';
import { drawTextLayer } from '../../lib/image/text-layer';
import type { ObjectStorage } from '../../lib/storage';
import type { ProductsService, ProductView } from '../products/products.service';
import type { ExportsRepository, MotifVersionRecord } from './exports.repository';
import type { VariantRecord } from './variant-print-files';

export type ProductSources = {
  product: ProductView;
  template: Template;
  scene: Scene;
  /** Keyed `${motifId}@${version}`; only this studio's motifs. */
  versions: Map<string, MotifVersionRecord>;
  loadMotif: LoadMotifPixels;
  /** The studio's own preflight settings (its colour-group limit). */
  preflightOptions: { paletteLimit?: number };
  /** The product's own variants (blank and handle colours, SKUs), in their order. */
  variants: VariantRecord[];
};

export type SourceDeps = { products: Pick<ProductsService, 'detail'>; repo: Pick<ExportsRepository, 'motifVersions' | 'paletteLimit' | 'productVariants'>; storage: Pick<ObjectStorage, 'getBuffer'> };

export const versionKey = (motifId: string, version: number) => `${motifId}@${version}`;

/** A product with everything needed to render it; motif pixels are fetched from S3 on first use and kept for this one job. */
export async function productSources(deps: SourceDeps, studioId: string, productId: string): Promise<ProductSources> {
  const product = await deps.products.detail(studioId, productId);
  const ids = [...new Set(product.layout.placements.flatMap((p) => (p.type === 'text' ? [] : [p.motifId])))];
  const [records, paletteLimit, variants] = await Promise.all([deps.repo.motifVersions(studioId, ids), deps.repo.paletteLimit(studioId), deps.repo.productVariants(studioId, productId)]);
  const versions = new Map(records.map((v) => [versionKey(v.motifId, v.version), v]));
  const decoded = new Map<string, Promise<SourcePixels>>();
  const loadMotif: LoadMotifPixels = (motifId, version) => {
    const key = versionKey(motifId, version);
    let p = decoded.get(key);
    if (!p) {
      const record = versions.get(key);
      // Drawn as nothing: preflight reports it and an export refuses it (missingMotifs).
      p = record ? deps.storage.getBuffer(record.pngKey).then(decodeMotifPng) : Promise.resolve({ data: new Uint8Array(4), width: 1, height: 1 });
      decoded.set(key, p);
    }
    return p;
  };
  return { product, template: product.template, scene: createScene(product.layout), versions, loadMotif, preflightOptions: paletteLimit ? { paletteLimit } : {}, variants };
}

/** Placements whose motif version is not (or no longer) in the studio's library. */
export function missingMotifs(sources: ProductSources): string[] {
  return sources.product.layout.placements.flatMap((p) => (p.type !== 'text' && !sources.versions.has(versionKey(p.motifId, p.version)) ? [p.id] : []));
}

/** The same plan drawn k times smaller (previews, preflight): each matrix is followed by scale(k). */
export function scaledPlan(plan: RenderPlan, k: number): RenderPlan {
  const size = { width: Math.max(1, Math.round(plan.size.width * k)), height: Math.max(1, Math.round(plan.size.height * k)) };
  const sx = size.width / plan.size.width;
  const sy = size.height / plan.size.height;
  return {
    size,
    notes: plan.notes,
    ops: plan.ops.map((op) => ({
      ...op,
      matrix: compose(op.matrix, scale(sx, sy)),
      clip: op.clip && { x: op.clip.x * sx, y: op.clip.y * sy, width: op.clip.width * sx, height: op.clip.height * sy },
    })),
  };
}

/** The print file (k = 1) or a smaller render of it whose longer side is at most maxSide. */
export async function renderProduct(sources: ProductSources, options: { maxSide?: number; onProgress?: (done: number) => void | Promise<void>; encode?: boolean } = {}): Promise<PrintRender> {
  const plan = renderPlan(sources.scene, sources.template);
  const longest = Math.max(plan.size.width, plan.size.height);
  const k = options.maxSide && longest > options.maxSide ? options.maxSide / longest : 1;
  // only the print file itself (k = 1) is encoded, in the template's output format
  const encode = options.encode && k === 1 ? sources.template.output : undefined;
  return renderPrintFile(k === 1 ? plan : scaledPlan(plan, k), { loadMotif: sources.loadMotif, drawText: drawTextLayer, onProgress: options.onProgress, encode });
}
