import type { Readable } from 'node:stream';
import { PRODUCT_EXPORTS_LISTED, type CreateExportRequest, type ExportStatusView, type PreviewView } from '../../../shared/contracts/exports';
import type { JobQueue } from '../../jobs/queue';
import { notFound } from '../../lib/http-error';
import type { ObjectStorage } from '../../lib/storage';
import type { ProductsService } from '../products/products.service';
import type { ExportRow, ExportsRepository } from './exports.repository';
import { productPreflight, type ProductPreflight } from './product-preflight';
import { assertPreviewable, PREVIEW_RENDER_SIDE, productPreview } from './product-previews';
import { productSoftProofPng } from './product-soft-proof';
import { productSources, renderProduct } from './product-sources';

type Deps = { repo: ExportsRepository; products: Pick<ProductsService, 'detail'>; storage: ObjectStorage; queue: Pick<JobQueue, 'enqueueExport'> };

function view(row: ExportRow): ExportStatusView {
  return {
    id: row.id,
    productId: row.productId,
    kind: row.kind,
    status: row.status,
    progress: row.progress,
    files: row.files.map((f) => ({ name: f.name, contentType: f.contentType, bytes: f.bytes })),
    error: row.error ?? null,
    productRevision: row.productRevision,
    createdAt: row.createdAt.toISOString(),
  };
}

export function createExportsService(deps: Deps) {
  const { repo, products, storage, queue } = deps;
  return {
    async request(studioId: string, userId: string, productId: string, input: CreateExportRequest): Promise<{ id: string }> {
      const product = await products.detail(studioId, productId); // 404 for another studio's product
      const row = await repo.insert({ studioId, productId, productRevision: product.revision, kind: input.kind, paper: input.paper, createdBy: userId });
      await queue.enqueueExport(row.id);
      return { id: row.id };
    },
    /** The product's latest exports, so files made earlier stay at hand after leaving the page. */
    async listForProduct(studioId: string, productId: string): Promise<{ exports: ExportStatusView[] }> {
      await products.detail(studioId, productId); // 404 for another studio's product
      return { exports: (await repo.listForProduct(studioId, productId, PRODUCT_EXPORTS_LISTED)).map(view) };
    },
    async status(studioId: string, id: string): Promise<ExportStatusView> {
      const row = await repo.find(studioId, id);
      if (!row) throw notFound('That export');
      return view(row);
    },
    async download(studioId: string, id: string, fileName: string): Promise<{ body: Readable; contentType: string; name: string; bytes: number }> {
      const row = await repo.find(studioId, id);
      const file = row?.files.find((f) => f.name === fileName);
      if (!row || !file) throw notFound('That file');
      const stored = await storage.get(file.key);
      return { body: stored.body, contentType: file.contentType, name: file.name, bytes: file.bytes };
    },
    async preflight(studioId: string, productId: string, variantId: string | null): Promise<ProductPreflight> {
      return productPreflight(await productSources(deps, studioId, productId), variantId);
    },
    /** The design through the press profile, for the editor's "as printed" view. */
    async softProofImage(studioId: string, productId: string, options: { side: number; mask: boolean }) {
      return productSoftProofPng(await productSources(deps, studioId, productId), options);
    },
    async preview(studioId: string, productId: string, previewView: PreviewView, variantId: string | null): Promise<Buffer> {
      const sources = await productSources(deps, studioId, productId);
      assertPreviewable(sources.template, previewView, variantId);
      const render = await renderProduct(sources, { maxSide: PREVIEW_RENDER_SIDE });
      return productPreview(render.image, sources.template, previewView, variantId);
    },
  };
}

export type ExportsService = ReturnType<typeof createExportsService>;
