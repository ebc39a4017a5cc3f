import type PgBoss from 'pg-boss';
import { createExportsRepository } from '../features/exports/exports.repository';
import { createExportRunner, ExportFailure } from '../features/exports/export-product';
import { createProductsRepository } from '../features/products/products.repository';
import { createProductsService } from '../features/products/products.service';
import { createTemplatesRepository } from '../features/templates/templates.repository';
import { createTemplatesService } from '../features/templates/templates.service';
import { HttpError } from '../lib/http-error';
import { setDrawThreads, warmDrawThreads } from '../lib/image/draw-threads';
import type { Runtime } from '../runtime';
import { queueNames, type ExportJobData } from './queue';

// One export at a time per process: a print file render holds the whole canvas in memory.
export async function startExportWorkers(runtime: Runtime): Promise<() => Promise<void>> {
  const repo = createExportsRepository(runtime.db.db);
  const products = createProductsService(createProductsRepository(runtime.db.db), createTemplatesService(createTemplatesRepository(runtime.db.db), runtime.storage));
  const runExport = createExportRunner({ repo, products, storage: runtime.storage });
  if (runtime.config.PRINT_DRAW_THREADS !== undefined) setDrawThreads(runtime.config.PRINT_DRAW_THREADS);
  // loaded now so the first print file is drawn on all of them; tests start them on first use
  if (runtime.config.NODE_ENV !== 'test') void warmDrawThreads();
  const id = await runtime.queue.boss.work<ExportJobData>(
    queueNames.exportProduct,
    { includeMetadata: true, pollingIntervalSeconds: 0.5, batchSize: 1 },
    async (jobs: PgBoss.JobWithMetadata<ExportJobData>[]) => {
      for (const job of jobs) {
        try {
          await runExport(job.data.exportId);
        } catch (err) {
          // Known failures (missing motif, file too large, product gone) are final; others retry.
          const known = err instanceof ExportFailure || err instanceof HttpError;
          if (known || job.retryCount >= job.retryLimit) {
            const code = err instanceof ExportFailure || err instanceof HttpError ? err.code : 'export.failed';
            await repo.update(job.data.exportId, { status: 'failed', error: { code, message: known ? (err as Error).message : `The export could not be completed (${(err as Error).message}). Try again later.` } });
            if (known) continue;
          }
          throw err;
        }
      }
    },
  );
  return async () => {
    await runtime.queue.boss.offWork({ id } as PgBoss.OffWorkOptions).catch(() => {});
  };
}
