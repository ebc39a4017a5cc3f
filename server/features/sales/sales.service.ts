import type { SalesSplitRule } from '../../../shared/contracts/sales';
import { notFound } from '../../lib/http-error';
import { createSalesImports, toSalesImport } from './sales-import';
import { createSalesSummaries } from './sales-summary';
import type { SalesRepository } from './sales.repository';

export function createSalesService(repo: SalesRepository) {
  const imports = createSalesImports(repo);
  const summaries = createSalesSummaries(repo);
  return {
    preview: imports.preview,
    importFile: imports.importFile,
    summary: summaries.summary,
    motifSales: summaries.motifSales,

    async list(studioId: string) {
      return (await repo.list(studioId)).map((r) => toSalesImport(r.import, r.userName));
    },

    // Undoing an import takes its rows with it (the rows reference the import, on delete cascade).
    async remove(studioId: string, id: string) {
      if (!(await repo.remove(studioId, id))) throw notFound('That sales import');
    },

    async settings(studioId: string) {
      const s = await repo.settings(studioId);
      return { splitRule: s.splitRule, columnMapping: s.mapping };
    },

    async setSplitRule(studioId: string, splitRule: SalesSplitRule) {
      await repo.setSplitRule(studioId, splitRule);
      return this.settings(studioId);
    },
  };
}

export type SalesService = ReturnType<typeof createSalesService>;
