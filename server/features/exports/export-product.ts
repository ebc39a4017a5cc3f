import { encodePrintFile } from '../../lib/image/print-file-encode';
import { buildProofSheet } from '../../lib/pdf/proof-sheet';
import type { ObjectStorage } from '../../lib/storage';
import type { ExportFile } from '../../db/schema/index';
import { cautionsText } from '../../../shared/exports/cautions';
import { manifestMotifs, zipBundle, type BundleEntry, type Manifest } from './export-bundle';
import type { ExportRow, ExportsRepository } from './exports.repository';
import { productPreflight } from './product-preflight';
import { previewOnBlank, previewViewsOf } from './product-previews';
import { missingMotifs, productSources, renderProduct, versionKey, type SourceDeps } from './product-sources';
import { releasePrintCanvas, type PrintRender } from '../../lib/image/print-render';
import { manifestVariants, previewBlanks, variantsCsv } from './variant-print-files';

export type ExportRunnerDeps = SourceDeps & { repo: ExportsRepository; storage: Pick<ObjectStorage, 'getBuffer' | 'put'> };

export class ExportFailure extends Error {
  constructor(readonly code: string, message: string) {
    super(message);
  }
}

export const exportFileKey = (row: Pick<ExportRow, 'studioId' | 'id'>, name: string) => `studios/${row.studioId}/exports/${row.id}/${name}`;

/** Runs one export job: renders, stores each file under the export's prefix, records progress. */
export function createExportRunner(deps: ExportRunnerDeps) {
  return async function runExport(exportId: string): Promise<void> {
    const row = await deps.repo.findForJob(exportId);
    if (!row || row.status === 'done') return;
    await deps.repo.update(row.id, { status: 'running', progress: 0.02, error: null });
    let last = 0;
    const progress = async (p: number) => {
      // a row update per ~5 %, not per draw op
      if (p - last < 0.05 && p < 1) return;
      last = p;
      await deps.repo.update(row.id, { progress: Math.min(0.99, p) });
    };

    const sources = await productSources(deps, row.studioId, row.productId);
    const missing = missingMotifs(sources);
    if (missing.length) throw new ExportFailure('export.missing_motif', `${missing.length} placement(s) use a motif version that is no longer in the library; replace them, then export again.`);
    const bundle = row.kind === 'bundle';
    // the print file is encoded as it is drawn (a PNG keeping transparency is compressed band by band)
    const render = await renderProduct(sources, { encode: true, onProgress: (d) => progress(0.05 + d * (bundle ? 0.35 : 0.8)) });
    try {
      await writeExport(render);
    } finally {
      // the print file, previews and proof are written: the next export may reuse the canvas
      releasePrintCanvas(render.image);
    }

    async function writeExport(render: PrintRender): Promise<void> {
      const encoded = render.encoded ?? await encodePrintFile(render.image, sources.template.output);
      const maxBytes = sources.template.output.maxFileSizeMb * 1024 * 1024;
      if (encoded.buffer.length > maxBytes) throw new ExportFailure('export.too_large', `The print file is ${(encoded.buffer.length / 1048576).toFixed(1)} MB; this printer takes at most ${sources.template.output.maxFileSizeMb} MB.`);
      const printName = `print-file.${encoded.extension}`;
      const files: ExportFile[] = [];
      const store = async (name: string, data: Buffer | Uint8Array, contentType: string) => {
        const key = exportFileKey(row, name);
        await deps.storage.put(key, Buffer.from(data), contentType);
        files.push({ name, key, contentType, bytes: data.length });
      };
      await store(printName, encoded.buffer, encoded.contentType);

      if (bundle) {
        const entries: BundleEntry[] = [{ name: printName, data: encoded.buffer }];
        await progress(0.45);
        // Previews per product variant (its blank and handle colours), or per template blank without variants.
        const { variants } = sources;
        for (const target of previewBlanks(sources.template, variants)) {
          for (const view of previewViewsOf(sources.template)) {
            entries.push({ name: `previews/${target.folder}/${view}.png`, data: await previewOnBlank(render.image, sources.template, view, target.blank, target.templateVariantId) });
          }
        }
        const variantRows = manifestVariants(sources.template, variants, printName);
        if (variantRows.length) entries.push({ name: 'variants.csv', data: variantsCsv(variantRows) });
        await progress(0.65);
        const proofPng = encoded.contentType === 'image/png' ? encoded.buffer : (await encodePrintFile(render.image, { ...sources.template.output, format: 'png', transparency: 'keep' })).buffer;
        const proofName = `proof-sheet-${row.paper}.pdf`;
        const proofSheet = await buildProofSheet({ png: proofPng, template: sources.template, productName: sources.product.name, paper: row.paper });
        entries.push({ name: proofName, data: proofSheet });
        // also on its own, to print straight from the page without opening the zip
        await store(proofName, proofSheet, 'application/pdf');
        await progress(0.75);
        const preflight = await productPreflight(sources, null);
        const used = new Set(sources.product.layout.placements.flatMap((p) => (p.type === 'text' ? [] : [versionKey(p.motifId, p.version)])));
        entries.push({ name: 'cautions.txt', data: cautionsText(sources.template) });
        const manifest: Manifest = {
          product: { id: sources.product.id, name: sources.product.name, revision: sources.product.revision },
          template: sources.template,
          // Variants differ only in the blank, never in the layout: one print file serves them all.
          printFiles: [{
            name: printName, width: render.image.width, height: render.image.height, dpi: sources.template.output.dpi,
            variants: variantRows.map((v) => v.sku ?? v.id),
            sameDesignForAllVariants: true,
          }],
          variants: variantRows,
          motifs: manifestMotifs(sources.versions.values(), used),
          preflight: preflight.report,
          renderNotes: render.notes,
          softProof: { profile: preflight.softProof.profileName ?? '', shareOverDeltaE5: preflight.softProof.shareOverDeltaE5 },
          files: [...entries.map((e) => e.name), 'manifest.json'],
          createdAt: new Date().toISOString(),
        };
        entries.push({ name: 'manifest.json', data: JSON.stringify(manifest, null, 2) });
        await progress(0.9);
        await store('bundle.zip', await zipBundle(entries), 'application/zip');
      }
      await deps.repo.update(row.id, { status: 'done', progress: 1, files });
    }
  };
}
