import type { ProductDetail, ProductListQuery, ProductSummary } from '../../../shared/contracts/products';
import { emptyLayout, type Layout } from '../../../shared/scene/layout';
import { readSavedLayout } from '../../../shared/scene/migrate-layout';
import type { Template } from '../../../shared/templates/template-schema';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import type { TemplatesService } from '../templates/templates.service';
import type { ProductExtras } from './product-extras';
import type { MotifUse, ProductRow, ProductsRepository } from './products.repository';

// The detail as the server holds it: the layout stays the shared, read-only scene type.
export type ProductView = Omit<ProductDetail, 'layout'> & { layout: Layout };

function motifUses(layout: Layout): MotifUse[] {
  return layout.placements.flatMap((p) => (p.type === 'motif' || p.type === 'repeat' ? [{ motifId: p.motifId, placementId: p.id, version: p.version }] : []));
}

const noExtras: ProductExtras = { collectionName: null, variantCount: 0, latestSampleVerdict: null };

// Tags are the studio's own words: compared lower-cased, each once, in the order given.
export function normaliseProductTags(tags: string[]): string[] {
  return [...new Set(tags.map((t) => t.trim().replace(/\s+/g, ' ').toLowerCase()).filter(Boolean))];
}

function summary(row: ProductRow, template: Template, extras: ProductExtras = noExtras): ProductSummary {
  const layout = row.layout as Layout;
  return {
    id: row.id,
    name: row.name,
    templateId: row.templateId,
    templateName: template.name,
    stage: row.stage,
    revision: row.revision,
    placementCount: layout.placements?.length ?? 0,
    updatedAt: row.updatedAt.toISOString(),
    createdAt: row.createdAt.toISOString(),
    collectionId: row.collectionId,
    tags: row.tags,
    ...extras,
  };
}

export function createProductsService(repo: ProductsRepository, templates: TemplatesService) {
  async function templateOf(studioId: string, templateId: string): Promise<Template> {
    return templates.resolve(studioId, templateId).catch(() => {
      throw notFound('The template of this product');
    });
  }

  async function detail(studioId: string, id: string): Promise<ProductView> {
    const row = await repo.find(studioId, id);
    if (!row) throw notFound('That product');
    const template = await templateOf(studioId, row.templateId);
    const saved = readSavedLayout(row.layout);
    const layout = saved.ok ? saved.layout : emptyLayout;
    const uses = motifUses(layout);
    const known = new Map((await repo.motifsOfStudio(studioId, [...new Set(uses.map((u) => u.motifId))])).map((m) => [m.id, m]));
    const byMotif = new Map<string, ProductDetail['motifs'][number]>();
    for (const u of uses) {
      const m = known.get(u.motifId);
      if (!m) continue;
      const entry = byMotif.get(u.motifId) ?? { motifId: m.id, name: m.name, originalId: m.originalId, usedVersion: u.version, currentVersion: m.currentVersion, placementIds: [], rightsStatus: m.rightsStatus, archived: m.archived };
      entry.placementIds.push(u.placementId);
      entry.usedVersion = Math.min(entry.usedVersion, u.version);
      byMotif.set(u.motifId, entry);
    }
    const extras = (await repo.extras(studioId, [row])).get(row.id);
    return { ...summary(row, template, extras), notes: row.notes, template, layout, motifs: [...byMotif.values()] };
  }

  // Every motif a layout names must be this studio's, at a version that exists.
  async function checkMotifs(studioId: string, layout: Layout) {
    const uses = motifUses(layout);
    const ids = [...new Set(uses.map((u) => u.motifId))];
    const found = new Map((await repo.motifsOfStudio(studioId, ids)).map((m) => [m.id, m]));
    for (const u of uses) {
      const m = found.get(u.motifId);
      if (!m) throw badRequest('layout.unknown_motif', `The layout places a motif that is not in this studio’s library (${u.motifId.slice(0, 40)}).`);
      if (u.version < 1 || u.version > m.currentVersion) throw badRequest('layout.unknown_version', `“${m.name}” has no version ${u.version}.`);
    }
    return uses;
  }

  return {
    detail,
    async list(studioId: string, filters: ProductListQuery = {}): Promise<ProductSummary[]> {
      const rows = await repo.list(studioId, filters);
      const extras = await repo.extras(studioId, rows);
      const cache = new Map<string, Template>();
      const out: ProductSummary[] = [];
      for (const row of rows) {
        if (!cache.has(row.templateId)) cache.set(row.templateId, await templateOf(studioId, row.templateId).catch(() => ({ name: 'Missing template' }) as Template));
        out.push(summary(row, cache.get(row.templateId)!, extras.get(row.id)));
      }
      return out;
    },
    async create(studioId: string, userId: string, input: { name: string; templateId: string }) {
      await templates.resolve(studioId, input.templateId);
      const row = await repo.insert({ studioId, name: input.name, templateId: input.templateId, layout: emptyLayout, createdBy: userId });
      return detail(studioId, row.id);
    },
    async update(studioId: string, id: string, input: { revision: number; name?: string; notes?: string; layout?: unknown }) {
      const existing = await repo.find(studioId, id);
      if (!existing) throw notFound('That product');
      let layout: Layout | undefined;
      let uses: MotifUse[] | null = null;
      if (input.layout !== undefined) {
        const saved = readSavedLayout(input.layout);
        if (!saved.ok) throw badRequest(saved.error.code, saved.error.message);
        layout = saved.layout;
        uses = await checkMotifs(studioId, layout);
      }
      const row = await repo.saveIfRevision(studioId, id, input.revision, { name: input.name, notes: input.notes, layout }, uses);
      if (!row) {
        throw conflict('product.stale', `This product was saved elsewhere (now revision ${existing.revision}, you edited revision ${input.revision}). Reload it to see the newer layout; your changes here were not saved.`);
      }
      return detail(studioId, id);
    },
    // Name, notes, tags and collection: not part of the layout, so no layout revision is needed.
    async updateDetails(studioId: string, id: string, input: { name?: string; notes?: string; tags?: string[]; collectionId?: string | null }) {
      if (!(await repo.find(studioId, id))) throw notFound('That product');
      if (input.collectionId && !(await repo.hasCollection(studioId, input.collectionId))) {
        throw badRequest('product.unknown_collection', 'That collection is not one of this studio’s collections.', { collectionId: 'Choose a collection of this studio' });
      }
      await repo.updateDetails(studioId, id, { ...input, tags: input.tags && normaliseProductTags(input.tags) });
      return detail(studioId, id);
    },
    async remove(studioId: string, id: string) {
      if (!(await repo.find(studioId, id))) throw notFound('That product');
      await repo.remove(studioId, id);
    },
  };
}

export type ProductsService = ReturnType<typeof createProductsService>;
